package org.plenum.store;

import java.nio.file.Path;

/** There is no workspace database at the path given, or there already is one where a new one was asked for. */
public final class NoWorkspaceException extends StoreException {
    private static final long serialVersionUID = 1L;

    public NoWorkspaceException(String message) {
        super(message);
    }

    static NoWorkspaceException missing(Path db) {
        return new NoWorkspaceException("no workspace at " + db + " (create one with: plenum init --db " + db + ")");
    }

    static NoWorkspaceException exists(Path db) {
        return new NoWorkspaceException("a workspace already exists at " + db);
    }
}
