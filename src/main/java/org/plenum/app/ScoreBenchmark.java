package org.plenum.app;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.plenum.core.Period;
import org.plenum.core.Quantity;
import org.plenum.io.CsvImporter;
import org.plenum.io.ImportKind;
import org.plenum.io.Progress;
import org.plenum.score.BootstrapInterval;
import org.plenum.score.Placebo;
import org.plenum.store.DecisionDraft;
import org.plenum.store.Ledger;
import org.plenum.store.Workspace;

/**
 * The scoring benchmark: a generated workspace of a given number of scored (item, period) pairs
 * at lag 1 with three steps (stat, meeting from the ledger, final) plus the placebo; one run is
 * the full scorecard, three breakdowns and the bootstrap, from opening the database.
 */
public final class ScoreBenchmark {
    static final int CYCLES = 25;
    static final Period FIRST_CYCLE = Period.month(2024, 1);
    /** Breakdowns each run computes. */
    public static final List<String> BREAKDOWNS = List.of("group", "region", "cycle");

    private ScoreBenchmark() {}

    /** Builds the workspace at {@code db} with {@code pairs} scored pairs (rounded to whole items). */
    public static void generate(Workspaces workspaces, Path dir, Path db, int pairs) {
        int items = Math.max(1, pairs / CYCLES);
        SplittableRandom random = new SplittableRandom(20261202L);
        write(dir.resolve("items.csv"), "item,description,group,region,unit_value\n", items, (w, i) ->
                w.write(code(i) + ",Bench item," + "G" + (i % 20) + ",R" + (i % 3) + "," + (1 + i % 50) + "\n"));
        write(dir.resolve("actuals.csv"), "item,period,quantity\n", items, (w, i) -> {
            for (Period p = FIRST_CYCLE.plus(-3); p.compareTo(FIRST_CYCLE.plus(CYCLES + 1)) < 0; p = p.plus(1)) {
                w.write(code(i) + "," + p + "," + (100 + random.nextInt(200)) + "\n");
            }
        });
        write(dir.resolve("forecasts.csv"), "item,period,cycle,step,quantity\n", items, (w, i) -> {
            for (String step : new String[] {"stat", "final"}) {
                for (int c = 0; c < CYCLES; c++) {
                    Period cycle = FIRST_CYCLE.plus(c);
                    w.write(code(i) + "," + cycle.plus(1) + "," + cycle + "," + step + "," + (120 + random.nextInt(160))
                            + "\n");
                }
            }
        });
        try (Workspace ws = workspaces.create(db, Workspaces.DEFAULT_STEPS, Workspaces.DEFAULT_LEDGER_STEP)) {
            CsvImporter importer = new CsvImporter(ws, Progress.NONE);
            for (ImportKind kind : List.of(ImportKind.ITEMS, ImportKind.ACTUALS, ImportKind.FORECASTS)) {
                importer.importFile(kind, dir.resolve(kind.word() + ".csv"), false);
            }
            new Ledger(ws).append(decisions(items, random));
        }
    }

    /**
     * One decision in twenty (item, cycle) pairs at lag 1, as a meeting would leave them. Their
     * priors are nominal: the timed scorecard reads only the decided quantities.
     */
    private static List<DecisionDraft> decisions(int items, SplittableRandom random) {
        List<DecisionDraft> drafts = new ArrayList<>();
        Instant at = Instant.parse("2026-01-05T09:00:00Z");
        for (int i = 1; i <= items; i++) {
            for (int c = 0; c < CYCLES; c++) {
                if (random.nextInt(20) == 0) {
                    Period cycle = FIRST_CYCLE.plus(c);
                    drafts.add(new DecisionDraft(code(i), cycle, cycle.plus(1), "meeting", Quantity.ofUnits(200),
                            Quantity.ofUnits(150 + random.nextInt(100)), false, "bench decision", "other", "bench",
                            Quantity.ofUnits(2), at, null));
                }
            }
        }
        return drafts;
    }

    private interface Rows {
        void write(BufferedWriter w, int item) throws IOException;
    }

    private static void write(Path file, String header, int items, Rows rows) {
        try (BufferedWriter w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            w.write(header);
            for (int i = 1; i <= items; i++) {
                rows.write(w, i);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static String code(int i) {
        return String.format("S-%06d", i);
    }

    /** One timed run in this JVM: nanoseconds and peak heap bytes, as "pairs nanos heap". */
    public static ImportBenchmark.Run runOnce(Workspaces workspaces, Path db) {
        System.gc();
        ManagementFactory.getMemoryPoolMXBeans().forEach(MemoryPoolMXBean::resetPeakUsage);
        long t0 = System.nanoTime();
        Score.Report report = Score.run(workspaces, db, 1, Placebo.NAIVE, BREAKDOWNS, BootstrapInterval.DEFAULT_DRAWS,
                false);
        long nanos = System.nanoTime() - t0;
        return new ImportBenchmark.Run(report.all().pairs(), nanos, ImportBenchmark.peakHeap());
    }
}
