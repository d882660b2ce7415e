package org.plenum.io;

/** Told how far a long read has come, in bytes of the input file; called from the reading thread. */
public interface Progress {
    Progress NONE = new Progress() {};

    default void start(long totalBytes) {}

    default void advance(long bytesRead) {}

    default void finish() {}
}
