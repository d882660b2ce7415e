package org.plenum.app;

import java.nio.file.Path;
import java.util.Set;
import org.plenum.core.EventTags;
import org.plenum.store.Workspace;

/** The workspace's event-tag vocabulary: the starting list plus the workspace's own. */
public final class Tags {
    private Tags() {}

    public static Set<String> list(Workspaces workspaces, Path db) {
        try (Workspace ws = workspaces.open(db)) {
            return ws.catalog().tags();
        }
    }

    /** @return false when the tag was already there */
    public static boolean add(Workspaces workspaces, Path db, String tag) {
        if (!EventTags.isWellFormed(tag)) {
            throw new org.plenum.core.BadInputException("tag: expected lower-case words of letters, digits and"
                    + " hyphens with single spaces (at most 40 characters), found \"" + tag + "\"");
        }
        try (Workspace ws = workspaces.open(db)) {
            return ws.addTag(tag);
        }
    }
}
