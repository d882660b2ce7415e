package org.plenum.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plenum.store.Summary;
import org.plenum.store.Workspace;

/** The benchmark's generated workspace has the shape the issue asks for (timing lives in {@code plenum bench agenda}). */
class AgendaBenchmarkTest {
    @TempDir
    Path dir;

    @Test
    void generatesTheIssuesShapeAndRanksEveryItem() {
        Workspaces workspaces = new Workspaces(Map.of());
        Path db = dir.resolve("agenda.db");
        AgendaBenchmark.generate(workspaces, db, 300);
        try (Workspace ws = workspaces.open(db)) {
            Summary s = ws.summary();
            assertEquals(300, s.items());
            assertEquals(300 * 36, s.actuals());
            assertEquals(150, s.decisions(), "a decision per two items (50,000 for 100,000)");
        }
        ImportBenchmark.Run run = AgendaBenchmark.runOnce(workspaces, db);
        assertEquals(300, run.rows());
        assertTrue(run.peakHeapBytes() > 0);
        assertEquals(300L * 24 * 6, AgendaBenchmark.forecastRows(300));
        try (Workspace ws = workspaces.open(db)) {
            assertEquals(Map.of("stat", 300 * 24 * 6, "meeting", 0, "final", 0), ws.summary().forecastsByStep());
        }
    }
}
