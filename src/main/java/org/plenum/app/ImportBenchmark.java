package org.plenum.app;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.SplittableRandom;
import org.plenum.core.Period;
import org.plenum.io.CsvImporter;
import org.plenum.io.ImportKind;
import org.plenum.io.Progress;
import org.plenum.store.Sqlite3Shell;
import org.plenum.store.Workspace;

/**
 * The import benchmark: a generated forecasts file of a given size, imported with every check
 * on, against the sqlite3 shell's own {@code .import} of the same file as the reference.
 */
public final class ImportBenchmark {
    /** Rows per item: 2 steps × 24 cycles × 6 lags. */
    static final int ROWS_PER_ITEM = 2 * 24 * 6;

    private ImportBenchmark() {}

    /** Writes {@code items.csv} and a {@code forecasts.csv} of exactly {@code rows} data rows into {@code dir}. */
    public static void generate(Path dir, int rows) {
        int items = (rows + ROWS_PER_ITEM - 1) / ROWS_PER_ITEM;
        SplittableRandom random = new SplittableRandom(20261202L);
        try (BufferedWriter w = Files.newBufferedWriter(dir.resolve("items.csv"), StandardCharsets.UTF_8)) {
            w.write("item,description,group\n");
            for (int i = 1; i <= items; i++) {
                w.write(itemCode(i) + ",Bench item " + i + ",G" + (i % 10) + "\n");
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        try (BufferedWriter w = Files.newBufferedWriter(dir.resolve("forecasts.csv"), StandardCharsets.UTF_8)) {
            w.write("item,period,cycle,step,quantity\n");
            int written = 0;
            Period first = Period.month(2024, 12);
            outer:
            for (int i = 1; i <= items; i++) {
                for (String step : new String[] {"stat", "final"}) {
                    for (int c = 0; c < 24; c++) {
                        for (int lag = 0; lag < 6; lag++) {
                            if (written++ == rows) {
                                break outer;
                            }
                            Period cycle = first.plus(c);
                            w.write(itemCode(i) + "," + cycle.plus(lag) + "," + cycle + "," + step + ","
                                    + random.nextInt(5000) + (random.nextInt(4) == 0 ? ".5" : "") + "\n");
                        }
                    }
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static String itemCode(int i) {
        return String.format("B-%06d", i);
    }

    /** One timed run in this JVM: a fresh workspace, items untimed, then the forecasts file. */
    public static Run runOnce(Workspaces workspaces, Path dir, Path db) {
        try (Workspace ws = workspaces.create(db, Workspaces.DEFAULT_STEPS, Workspaces.DEFAULT_LEDGER_STEP)) {
            CsvImporter importer = new CsvImporter(ws, Progress.NONE);
            importer.importFile(ImportKind.ITEMS, dir.resolve("items.csv"), false);
            System.gc();
            ManagementFactory.getMemoryPoolMXBeans().forEach(MemoryPoolMXBean::resetPeakUsage);
            long t0 = System.nanoTime();
            long rows = importer.importFile(ImportKind.FORECASTS, dir.resolve("forecasts.csv"), false).rows();
            long nanos = System.nanoTime() - t0;
            return new Run(rows, nanos, peakHeap());
        }
    }

    /** The sum of the heap pools' peaks since the reset: an upper bound of the heap in use. */
    static long peakHeap() {
        return ManagementFactory.getMemoryPoolMXBeans().stream().filter(p -> p.getType() == MemoryType.HEAP)
                .mapToLong(p -> p.getPeakUsage().getUsed()).sum();
    }

    /** One measurement: rows imported, wall time, peak heap in bytes. */
    public record Run(long rows, long nanos, long peakHeapBytes) {
        public String line() {
            return rows + " " + nanos + " " + peakHeapBytes;
        }

        public static Run parse(String line) {
            String[] f = line.strip().split(" ");
            return new Run(Long.parseLong(f[0]), Long.parseLong(f[1]), Long.parseLong(f[2]));
        }
    }

    /** Times the sqlite3 shell loading the same file into a table keyed like ours; returns nanoseconds. */
    public static long sqlite3Import(Path dir, Path db) {
        return Sqlite3Shell.importForecasts(dir.resolve("forecasts.csv"), db);
    }

    public static boolean sqlite3Installed() {
        return Sqlite3Shell.installed();
    }

    public static long median(long[] values) {
        long[] sorted = values.clone();
        Arrays.sort(sorted);
        int n = sorted.length;
        return n % 2 == 1 ? sorted[n / 2] : (sorted[n / 2 - 1] + sorted[n / 2]) / 2;
    }
}
