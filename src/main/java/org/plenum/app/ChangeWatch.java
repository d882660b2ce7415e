package org.plenum.app;

import java.nio.file.Path;
import org.plenum.store.Meetings;
import org.plenum.store.Workspace;

/**
 * Notices other processes' commits to a workspace by polling SQLite's {@code data_version} on a
 * connection of its own, so a screen's watcher thread never touches the UI thread's connection.
 */
public final class ChangeWatch implements AutoCloseable {
    private final Workspace workspace;
    private final Meetings meetings;
    private long seen;

    private ChangeWatch(Workspace workspace) {
        this.workspace = workspace;
        this.meetings = new Meetings(workspace);
        this.seen = meetings.dataVersion();
    }

    public static ChangeWatch open(Workspaces workspaces, Path db) {
        return new ChangeWatch(workspaces.open(db));
    }

    /** Whether anyone committed since the last call. */
    public boolean changed() {
        long now = meetings.dataVersion();
        boolean changed = now != seen;
        seen = now;
        return changed;
    }

    @Override
    public void close() {
        workspace.close();
    }
}
