package org.plenum.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ConcurrentLinkedQueue;
import java.util.concurrent.CountDownLatch;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plenum.core.Period;
import org.plenum.testing.TestWorkspace;

/** Eight planners' scripts log decisions into one workspace at the same moment, each in its own process. */
class ConcurrentDecideIT {
    static final int WORKERS = 8;
    static final int DECISIONS_EACH = 25;

    @TempDir
    Path dir;

    @Test
    void everyDecisionOfEightConcurrentProcessesLands() throws Exception {
        Path db = workspaceWithEightItems();
        CountDownLatch start = new CountDownLatch(1);
        ConcurrentLinkedQueue<String> failures = new ConcurrentLinkedQueue<>();
        List<Thread> workers = new ArrayList<>();
        for (int w = 1; w <= WORKERS; w++) {
            String item = "P" + w;
            Thread t = new Thread(() -> logDecisions(db, item, start, failures));
            workers.add(t);
            t.start();
        }
        start.countDown();
        for (Thread t : workers) {
            t.join();
        }
        assertTrue(failures.isEmpty(), String.join("\n", failures));
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + db); Statement st = c.createStatement()) {
            var rs = st.executeQuery("SELECT count(*), count(DISTINCT batch), count(DISTINCT item_id) FROM decisions");
            rs.next();
            assertEquals(WORKERS * DECISIONS_EACH, rs.getInt(1));
            assertEquals(WORKERS * DECISIONS_EACH, rs.getInt(2));
            assertEquals(WORKERS, rs.getInt(3));
            // Re-decisions on a period supersede the standing one: one standing decision per item and period.
            rs = st.executeQuery("SELECT count(*) FROM decisions d WHERE NOT EXISTS"
                    + " (SELECT 1 FROM decisions n WHERE n.supersedes = d.id)");
            rs.next();
            assertEquals(WORKERS * 6, rs.getInt(1));
        }
    }

    private static void logDecisions(Path db, String item, CountDownLatch start, ConcurrentLinkedQueue<String> failures) {
        try {
            start.await();
            Period cycle = Period.parse("2026-12");
            for (int i = 0; i < DECISIONS_EACH; i++) {
                Processes.Result r = Processes.plenum(db.getParent(), List.of("decide", item, "--db", db.toString(),
                        "--cycle", cycle.toString(), "--period", cycle.plus(i % 6).toString(), "--qty",
                        Integer.toString(100 + i), "--reason", "scripted decision " + i, "--tag", "other",
                        "--minutes", "1"));
                if (r.code() != 0) {
                    failures.add(item + " #" + i + " exit " + r.code() + ": " + r.err());
                }
            }
        } catch (Exception e) {
            failures.add(item + ": " + e);
        }
    }

    private Path workspaceWithEightItems() throws Exception {
        StringBuilder items = new StringBuilder("item,description\n");
        StringBuilder forecasts = new StringBuilder("item,period,cycle,step,quantity\n");
        Period cycle = Period.parse("2026-12");
        for (int w = 1; w <= WORKERS; w++) {
            items.append("P").append(w).append(",Item ").append(w).append('\n');
            for (int lag = 0; lag < 6; lag++) {
                forecasts.append("P").append(w).append(',').append(cycle.plus(lag)).append(',').append(cycle)
                        .append(",stat,").append(50 + lag).append('\n');
            }
        }
        Path db = dir.resolve("shared.db");
        assertEquals(0, CliRun.of("init", "--db", db.toString()).code());
        assertEquals(0, CliRun.of("import", "items", TestWorkspace.write(dir, "i.csv", items.toString()).toString(),
                "--db", db.toString()).code());
        assertEquals(0, CliRun.of("import", "forecasts", TestWorkspace.write(dir, "f.csv", forecasts.toString())
                .toString(), "--db", db.toString()).code());
        return db;
    }
}
