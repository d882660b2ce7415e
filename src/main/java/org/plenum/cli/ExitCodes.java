package org.plenum.cli;

/** Exit codes of every command (DESIGN §4). */
final class ExitCodes {
    static final int OK = 0;
    static final int USAGE = 1;
    static final int BAD_INPUT = 2;
    static final int BUSY = 3;

    private ExitCodes() {}
}
