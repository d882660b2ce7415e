package org.plenum.app;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.SplittableRandom;
import org.plenum.core.Period;
import org.plenum.core.Quantity;
import org.plenum.io.CsvImporter;
import org.plenum.io.ImportKind;
import org.plenum.io.Progress;
import org.plenum.store.DecisionDraft;
import org.plenum.store.Ledger;
import org.plenum.store.Workspace;

/**
 * The meeting screen's benchmark workspace and its figures: a generated workspace whose agenda
 * ranks every item with a recent error, a track record and a cut line, imported through the real
 * importer; and the summaries (median, p99, max) of what a measured run reports.
 *
 * <p>Per item: {@value #HISTORY} months of actuals before the cycle; {@code stat} forecasts at the
 * decision lags 1–3 from {@value #PAST_CYCLES} cycles before the meeting's cycle and in it (the
 * recent-error window of DESIGN §6 needs six earlier cycles with known actuals); one earlier
 * meeting decision in six (item, cycle) pairs at lag 1, mostly helping, in one group mostly
 * hurting (so that some items are "hands off"); an event tag on one item in fifty.
 */
public final class ScreenBenchmark {
    /** The meeting's cycle. */
    public static final Period CYCLE = Period.month(2026, 1);
    /** The decision lags of the meeting, as {@code plenum meet} defaults them. */
    public static final int[] LAGS = {1, 2, 3};
    /** The meeting's time budget in minutes: the cut line falls after a few dozen items. */
    public static final int BUDGET_MINUTES = 90;
    static final int HISTORY = 30;
    static final int PAST_CYCLES = 9;
    static final long SEED = 20261202L;

    private ScreenBenchmark() {}

    /** The item code of the {@code i}-th generated item (1-based): invented, {@code S-000001}. */
    public static String code(int i) {
        return "S-" + String.format(Locale.ROOT, "%06d", i);
    }

    /** What {@link #generate} wrote. */
    public record Generated(int items, long actuals, long forecasts, int decisions, int events, long bytes) {}

    /** Writes the CSV files into {@code dir} and builds the workspace {@code db} from them. */
    public static Generated generate(Workspaces workspaces, Path dir, Path db, int items) {
        List<DecisionDraft> decisions = new ArrayList<>();
        long[] counts = new long[3]; // actuals, forecasts, events
        Instant at = Instant.parse("2025-12-01T09:00:00Z");
        Period firstActual = CYCLE.plus(-HISTORY);
        try (BufferedWriter itemsOut = writer(dir, "items", "item,description,group,region,unit_value");
                BufferedWriter actualsOut = writer(dir, "actuals", "item,period,quantity");
                BufferedWriter forecastsOut = writer(dir, "forecasts", "item,period,cycle,step,quantity");
                BufferedWriter eventsOut = writer(dir, "events", "item,period,tag,note")) {
            for (int i = 1; i <= items; i++) {
                SplittableRandom random = new SplittableRandom(SEED * 31 + i);
                String code = code(i);
                int group = i % 20;
                itemsOut.write(code + ",Bench item " + i + " of group " + group + ",G" + group + ",R" + (i % 3) + ","
                        + (1 + i % 50) + (i % 4 == 0 ? ".25" : "") + "\n");
                long level = 20 + random.nextInt(2000);
                long[] actual = new long[HISTORY];
                for (int t = 0; t < HISTORY; t++) {
                    double season = 1 + 0.3 * Math.sin(2 * Math.PI * (firstActual.plus(t).index() % 12) / 12.0);
                    actual[t] = Math.max(0, Math.round(level * season * (0.7 + 0.6 * random.nextDouble())));
                    actualsOut.write(code + "," + firstActual.plus(t) + "," + actual[t] + "\n");
                    counts[0]++;
                }
                for (int back = PAST_CYCLES; back >= 0; back--) {
                    Period cycle = CYCLE.plus(-back);
                    for (int lag : LAGS) {
                        Period target = cycle.plus(lag);
                        long stat = Math.max(0, Math.round(level * (0.75 + 0.5 * random.nextDouble())));
                        forecastsOut.write(code + "," + target + "," + cycle + ",stat," + stat + "\n");
                        counts[1]++;
                        int t = target.minus(firstActual);
                        if (lag == 1 && target.compareTo(CYCLE) < 0 && random.nextInt(6) == 0) {
                            // Mostly toward the actual; group 7's planners mostly push the wrong way.
                            double toward = group == 7 ? -1.2 + 1.4 * random.nextDouble() : -0.4 + 1.6 * random.nextDouble();
                            long decided = Math.max(0, Math.round(stat + (actual[t] - stat) * toward));
                            decisions.add(new DecisionDraft(code, cycle, target, Workspaces.DEFAULT_LEDGER_STEP,
                                    Quantity.ofUnits(stat), Quantity.ofUnits(decided), false, "bench decision",
                                    "other", "bench", Quantity.ofUnits(1 + random.nextInt(6)), at, null));
                        }
                    }
                }
                if (i % 50 == 0) {
                    eventsOut.write(code + "," + CYCLE.plus(1) + ",promotion,bench event\n");
                    counts[2]++;
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        try (Workspace ws = workspaces.create(db, Workspaces.DEFAULT_STEPS, Workspaces.DEFAULT_LEDGER_STEP)) {
            CsvImporter importer = new CsvImporter(ws, Progress.NONE);
            for (ImportKind kind : List.of(ImportKind.ITEMS, ImportKind.ACTUALS, ImportKind.FORECASTS, ImportKind.EVENTS)) {
                importer.importFile(kind, dir.resolve(kind.word() + ".csv"), false);
            }
            new Ledger(ws).append(decisions);
        }
        try {
            return new Generated(items, counts[0], counts[1], decisions.size(), (int) counts[2], Files.size(db));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static BufferedWriter writer(Path dir, String kind, String header) throws IOException {
        BufferedWriter w = Files.newBufferedWriter(dir.resolve(kind + ".csv"), StandardCharsets.UTF_8);
        w.write(header + "\n");
        return w;
    }

    /**
     * Latencies of one kind of key, in nanoseconds: median, 99th percentile (nearest rank) and
     * maximum.
     */
    public record Latencies(int count, long median, long p99, long max) {
        public static Latencies of(long[] nanos) {
            long[] sorted = nanos.clone();
            Arrays.sort(sorted);
            int n = sorted.length;
            if (n == 0) {
                return new Latencies(0, 0, 0, 0);
            }
            return new Latencies(n, ImportBenchmark.median(sorted), sorted[nearestRank(n, 0.99)], sorted[n - 1]);
        }

        /** The nearest-rank percentile's index (Hyndman &amp; Fan 1996, definition 1). */
        static int nearestRank(int n, double p) {
            return Math.max(0, Math.min(n - 1, (int) Math.ceil(p * n) - 1));
        }

        String field() {
            return count + ":" + median + ":" + p99 + ":" + max;
        }

        static Latencies parseField(String text) {
            String[] f = text.split(":");
            return new Latencies(Integer.parseInt(f[0]), Long.parseLong(f[1]), Long.parseLong(f[2]),
                    Long.parseLong(f[3]));
        }
    }

    /**
     * What one measured run reports, as one line {@code key=value ...}: instants as microseconds
     * since the epoch (the parent subtracts its own {@code ProcessBuilder.start()} instant),
     * latencies per key kind, the peak heap.
     *
     * @param marks named instants of the run, in order (JVM start, command entered, joined, agenda
     *     ranked, agenda painted, ...)
     * @param keys latencies by key kind
     * @param peakHeapBytes the sum of the heap pools' peaks over the whole run
     * @param agendaRows the rows the agenda ranked
     */
    public record ScreenRun(Map<String, Long> marks, Map<String, Latencies> keys, long peakHeapBytes, int agendaRows) {
        public String line() {
            StringBuilder b = new StringBuilder("screen-run rows=" + agendaRows + " heap=" + peakHeapBytes);
            marks.forEach((k, v) -> b.append(" mark.").append(k).append('=').append(v));
            keys.forEach((k, v) -> b.append(" key.").append(k).append('=').append(v.field()));
            return b.toString();
        }

        public static ScreenRun parse(String line) {
            Map<String, Long> marks = new LinkedHashMap<>();
            Map<String, Latencies> keys = new LinkedHashMap<>();
            long heap = 0;
            int rows = 0;
            String[] fields = line.strip().split(" ");
            if (!fields[0].equals("screen-run")) {
                throw new IllegalArgumentException("not a screen run: " + line);
            }
            for (String f : Arrays.copyOfRange(fields, 1, fields.length)) {
                int eq = f.indexOf('=');
                String k = f.substring(0, eq);
                String v = f.substring(eq + 1);
                if (k.equals("rows")) {
                    rows = Integer.parseInt(v);
                } else if (k.equals("heap")) {
                    heap = Long.parseLong(v);
                } else if (k.startsWith("mark.")) {
                    marks.put(k.substring(5), Long.parseLong(v));
                } else if (k.startsWith("key.")) {
                    keys.put(k.substring(4), Latencies.parseField(v));
                }
            }
            return new ScreenRun(marks, keys, heap, rows);
        }
    }

    /** Microseconds since the epoch, from the wall clock (both processes read the same one). */
    public static long epochMicros(Instant t) {
        return t.getEpochSecond() * 1_000_000L + t.getNano() / 1_000;
    }

    public static long nowMicros() {
        return epochMicros(Instant.now());
    }

    /** The heap in use at its peak: the sum of the heap pools' peaks (as the other benchmarks report). */
    public static long peakHeap() {
        return ImportBenchmark.peakHeap();
    }
}
