package org.plenum.testing;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import org.plenum.io.CsvImporter;
import org.plenum.io.ImportKind;
import org.plenum.io.Progress;
import org.plenum.store.Workspace;

/** A small workspace for tests: two items and a cycle of stat forecasts, built through the real import. */
public final class TestWorkspace {
    public static final Duration TIMEOUT = Duration.ofSeconds(5);

    private TestWorkspace() {}

    public static Path create(Path dir) throws Exception {
        Path db = dir.resolve("w.db");
        try (Workspace ws = Workspace.create(db, List.of("stat", "meeting", "final"), "meeting", TIMEOUT)) {
            CsvImporter importer = new CsvImporter(ws, Progress.NONE);
            importer.importFile(ImportKind.ITEMS, write(dir, "items.csv",
                    "item,description,group,region,unit_value\nA1,Widget,g1,north,2.5\nA2,Gadget,g2,south,\n"), false);
            importer.importFile(ImportKind.FORECASTS, write(dir, "forecasts.csv", "item,period,cycle,step,quantity\n"
                    + "A1,2026-12,2026-12,stat,100\nA1,2027-01,2026-12,stat,110.5\nA1,2027-02,2026-12,stat,0\n"
                    + "A2,2026-12,2026-12,stat,7\n"), false);
        }
        return db;
    }

    public static Path write(Path dir, String name, String text) throws Exception {
        Path p = dir.resolve(name);
        Files.writeString(p, text, StandardCharsets.UTF_8);
        return p;
    }
}
