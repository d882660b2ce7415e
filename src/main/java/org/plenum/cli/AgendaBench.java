package org.plenum.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.plenum.app.AgendaBenchmark;
import org.plenum.app.ImportBenchmark;
import org.plenum.app.ImportBenchmark.Run;
import org.plenum.app.UsageException;

/**
 * {@code plenum bench agenda}: each Plenum run in a fresh JVM with the heap limit, alternating
 * with the sqlite3 shell reading the same forecast rows, so both see the same load on a shared
 * machine; medians of the runs and the ratio of the medians.
 */
final class AgendaBench {
    /** Runs one child JVM with the given arguments and reads its result line. */
    interface Child {
        Run run(List<String> args) throws IOException, InterruptedException;
    }

    private final PlenumCommand root;
    private final int runs;
    private final int items;
    private final String heap;
    private final Child child;

    AgendaBench(PlenumCommand root, int runs, int items, String heap, Child child) {
        if (runs < 1 || items < 1) {
            throw new UsageException("bench agenda: expected --runs and --items of at least 1, found " + runs + " and "
                    + items);
        }
        this.root = root;
        this.runs = runs;
        this.items = items;
        this.heap = heap;
        this.child = child;
    }

    int run(Path runOnceDir) throws IOException, InterruptedException {
        if (runOnceDir != null) {
            Run r = AgendaBenchmark.runOnce(root.workspaces, runOnceDir.resolve("agenda.db"));
            root.spec.commandLine().getOut().println(r.line());
            return ExitCodes.OK;
        }
        PrintWriter out = root.spec.commandLine().getOut();
        Path dir = Files.createTempDirectory("plenum-bench-agenda-");
        try {
            Path db = dir.resolve("agenda.db");
            out.printf(Locale.ROOT, "generating %,d items, %,d stat forecast rows in %s%n", items,
                    AgendaBenchmark.forecastRows(items), dir);
            out.flush();
            long t0 = System.nanoTime();
            AgendaBenchmark.generate(root.workspaces, db, items);
            out.printf(Locale.ROOT, "  generated in %.1f s, %.0f MB%n", (System.nanoTime() - t0) / 1e9,
                    Files.size(db) / 1048576.0);
            measure(out, dir, db);
        } finally {
            BenchCommand.deleteTree(dir);
        }
        return ExitCodes.OK;
    }

    private void measure(PrintWriter out, Path dir, Path db) throws IOException, InterruptedException {
        boolean reference = ImportBenchmark.sqlite3Installed();
        long[] ours = new long[runs];
        long[] heaps = new long[runs];
        long[] theirs = new long[runs];
        long ranked = 0;
        for (int i = 0; i < runs; i++) {
            Run r = child.run(List.of("bench", "agenda", "--run-once", dir.toString()));
            ours[i] = r.nanos();
            heaps[i] = r.peakHeapBytes();
            ranked = r.rows();
            String line = String.format(Locale.ROOT, "  run %d: plenum %.3f s, peak heap %.0f MB", i + 1,
                    r.nanos() / 1e9, r.peakHeapBytes() / 1048576.0);
            if (reference) {
                theirs[i] = AgendaBenchmark.sqlite3Floor(root.workspaces, db);
                line += String.format(Locale.ROOT, "; sqlite3 reading the forecast rows %.3f s", theirs[i] / 1e9);
            }
            out.println(line);
            out.flush();
        }
        long median = ImportBenchmark.median(ours);
        out.printf(Locale.ROOT, "plenum agenda: %,d items ranked (cycle %s, lags 1-3), open to sorted agenda: median"
                + " %.3f s (target < 1 s); peak heap %.0f MB median, %.0f MB max (sum of pool peaks; -Xmx%s; target"
                + " <= 512 MB)%n", ranked, AgendaBenchmark.CYCLE, median / 1e9,
                ImportBenchmark.median(heaps) / 1048576.0, Arrays.stream(heaps).max().orElse(0) / 1048576.0, heap);
        if (reference) {
            long floor = ImportBenchmark.median(theirs);
            out.printf(Locale.ROOT, "sqlite3 merely reading the same stat forecast rows: median %.3f s; ratio"
                    + " plenum/sqlite3 %.2f (target <= 2.0)%n", floor / 1e9, (double) median / floor);
        } else {
            out.println("sqlite3 is not installed: no reference time (apt-get install sqlite3)");
        }
    }
}
