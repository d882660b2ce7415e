package org.plenum.app;

/** The command was asked for something it cannot do as asked (exit code 1). */
public final class UsageException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public UsageException(String message) {
        super(message);
    }
}
