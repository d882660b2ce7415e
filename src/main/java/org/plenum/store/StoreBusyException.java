package org.plenum.store;

/**
 * Another process held the workspace's write lock for longer than the busy timeout. SQLite's own
 * busy handler has already waited with growing pauses before this is thrown; the caller should
 * report it in one line and let the user try again.
 */
public final class StoreBusyException extends StoreException {
    private static final long serialVersionUID = 1L;

    public StoreBusyException(String message, Throwable cause) {
        super(message, cause);
    }
}
