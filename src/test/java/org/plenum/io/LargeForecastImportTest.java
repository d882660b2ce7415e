package org.plenum.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;
import static org.plenum.io.ImportFixtures.query;

import java.io.BufferedWriter;
import java.io.File;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plenum.core.Period;
import org.plenum.store.Workspace;

/**
 * A million forecast rows stream through the importer: once in this JVM, and once through
 * {@code plenum import} in a child JVM capped at 256 MB of heap, which holds only if the rows are
 * never all in memory at once. Checks counts and content, not speed (that is the benchmark's job).
 */
class LargeForecastImportTest {
    static final int ITEMS = 3_500;
    static final int ROWS = 1_000_000;

    @TempDir
    static Path files;
    static Path items;
    static Path forecasts;
    /** The sum of all quantities written, in micros, to compare with what is stored. */
    static long totalMicros;

    @BeforeAll
    static void writeFiles() throws Exception {
        items = files.resolve("items.csv");
        try (BufferedWriter w = Files.newBufferedWriter(items, StandardCharsets.UTF_8)) {
            w.write("item,description,group\n");
            for (int i = 1; i <= ITEMS; i++) {
                w.write(item(i) + ",Demo item " + i + ",G" + (i % 12) + "\n");
            }
        }
        // Item fastest, then 12 lags of 24 monthly cycles from 2024-01 (286 of the 288 pairs are used).
        String[] months = new String[24 + 12];
        for (int m = 0; m < months.length; m++) {
            months[m] = Period.parse("2024-01").plus(m).toString();
        }
        forecasts = files.resolve("forecasts.csv");
        long sum = 0;
        try (BufferedWriter w = Files.newBufferedWriter(forecasts, StandardCharsets.UTF_8)) {
            w.write("item,period,cycle,step,quantity\n");
            for (int r = 0; r < ROWS; r++) {
                int k = r / ITEMS;
                int cycle = k / 12;
                int quantity = r % 10_000;
                boolean half = r % 4 == 0;
                sum += quantity * 1_000_000L + (half ? 500_000 : 0);
                w.write(item(r % ITEMS + 1) + "," + months[cycle + k % 12] + "," + months[cycle] + ","
                        + (r % 2 == 0 ? "stat" : "final") + "," + quantity + (half ? ".5" : "") + "\n");
            }
        }
        totalMicros = sum;
    }

    private static String item(int i) {
        return String.format("D-%04d", i);
    }

    @Test
    void importsAMillionRowsAndReportsProgressInBytes(@TempDir Path dir) throws Exception {
        Path db = ImportFixtures.emptyWorkspace(dir);
        ImportFixtures.importFile(db, ImportKind.ITEMS, items, false);
        List<Long> advanced = new CopyOnWriteArrayList<>();
        List<Long> started = new CopyOnWriteArrayList<>();
        Progress progress = new Progress() {
            @Override
            public void start(long totalBytes) {
                started.add(totalBytes);
            }

            @Override
            public void advance(long bytesRead) {
                advanced.add(bytesRead);
            }
        };

        ImportResult result;
        try (Workspace ws = Workspace.open(db, ImportFixtures.TIMEOUT)) {
            result = new CsvImporter(ws, progress).importFile(ImportKind.FORECASTS, forecasts, false);
        }

        assertEquals(ROWS, result.rows());
        assertStored(db);
        long size = Files.size(forecasts);
        assertEquals(List.of(size), started);
        assertTrue(advanced.size() >= ROWS / CsvImporter.BATCH, "at least once a batch: " + advanced.size());
        List<Long> sorted = new ArrayList<>(advanced);
        sorted.sort(null);
        assertEquals(sorted, advanced, "bytes read never go back");
        assertTrue(advanced.get(0) > 0 && advanced.get(advanced.size() - 1) <= size, advanced.toString());
    }

    @Test
    void importsAMillionRowsThroughTheCommandLineInA256MbHeap(@TempDir Path dir) throws Exception {
        Path db = dir.resolve("big.db");

        run(dir, "init", "--db", db.toString());
        run(dir, "import", "items", items.toString(), "--db", db.toString());
        String out = run(dir, "import", "forecasts", forecasts.toString(), "--db", db.toString());

        assertTrue(out.startsWith("imported 1,000,000 rows of forecasts from " + forecasts), out);
        assertStored(db);
    }

    private static void assertStored(Path db) throws Exception {
        assertEquals(List.of(ROWS + "|" + totalMicros + "|" + ITEMS),
                query(db, "SELECT count(*), sum(quantity), count(DISTINCT item_id) FROM forecasts"));
        assertEquals(List.of("stat|" + ROWS / 2, "final|" + ROWS / 2),
                query(db, "SELECT s.name, count(*) FROM forecasts f JOIN steps s ON s.id = f.step_id"
                        + " GROUP BY s.name ORDER BY s.position"));
    }

    /** Runs {@code plenum ARGS} in a child JVM with at most 256 MB of heap; returns its standard output. */
    private static String run(Path dir, String... args) throws Exception {
        String classPath = System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
        List<String> command = new ArrayList<>(List.of(
                Path.of(System.getProperty("java.home"), "bin", "java").toString(), "-Xmx256m",
                // An OutOfMemoryError must end the run with a failure, never let it look finished.
                "-XX:+ExitOnOutOfMemoryError", "-Djava.awt.headless=true",
                "-cp", classPath, "org.plenum.cli.Main"));
        command.addAll(List.of(args));
        String name = "plenum-" + args[0] + (args[1].startsWith("-") ? "" : "-" + args[1]);
        File out = dir.resolve(name + ".out").toFile();
        File err = dir.resolve(name + ".err").toFile();
        Process child = new ProcessBuilder(command).redirectOutput(out).redirectError(err).start();
        if (!child.waitFor(5, TimeUnit.MINUTES)) {
            child.destroyForcibly();
            fail("plenum " + String.join(" ", args) + " did not finish");
        }
        String stdout = Files.readString(out.toPath());
        assertEquals(0, child.exitValue(), "plenum " + String.join(" ", args) + ": " + Files.readString(err.toPath()));
        return stdout;
    }
}
