package org.plenum.app;

import java.nio.file.Path;
import org.plenum.io.CsvImporter;
import org.plenum.io.ImportKind;
import org.plenum.io.ImportResult;
import org.plenum.io.Progress;
import org.plenum.store.Workspace;

/** Imports one file into a workspace. */
public final class Imports {
    private Imports() {}

    public static ImportResult run(Workspaces workspaces, Path db, ImportKind kind, Path file, boolean replace,
            Progress progress) {
        try (Workspace ws = workspaces.open(db)) {
            return new CsvImporter(ws, progress).importFile(kind, file, replace);
        }
    }
}
