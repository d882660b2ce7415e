package org.plenum.cli;

import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.input.KeyType;
import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.PrintWriter;
import java.lang.management.ManagementFactory;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.TimeUnit;
import java.util.function.Supplier;
import org.plenum.app.Agenda;
import org.plenum.app.ImportBenchmark;
import org.plenum.app.Meeting;
import org.plenum.app.ScreenBenchmark;
import org.plenum.app.ScreenBenchmark.Latencies;
import org.plenum.app.ScreenBenchmark.ScreenRun;
import org.plenum.app.Workspaces;
import org.plenum.tui.Look;
import org.plenum.tui.MeetingTerminal;
import org.plenum.tui.ScreenProbe;
import org.plenum.tui.Sources;

/**
 * {@code plenum bench screen}: the meeting screen on a generated agenda, in Lanterna's virtual
 * terminal. Each measured run is a fresh JVM started as the launcher starts one, which opens or
 * joins the meeting, paints the agenda and then answers a fixed script of keys; the parent times
 * the first painted agenda from just before its {@code ProcessBuilder.start()}. Runs of each
 * {@link Mode}: the screen that opens a new meeting ranks the cycle; one that joins the open
 * meeting reads the agenda the meeting keeps.
 */
final class ScreenBench {
    /** Targets of the issue: first agenda within 1.5 s of starting the process, p99 of a key within one 60 Hz frame. */
    static final double FIRST_PAINT_TARGET_S = 1.5;
    static final double KEY_P99_TARGET_MS = 16;
    static final long HEAP_TARGET_BYTES = 512L << 20;
    /** The kinds of key the script presses, in the order they are reported. */
    static final List<String> KINDS = List.of("down", "up", "pagedown", "end-home", "open", "back");
    /** Stages of a run, in order, as the child marks them. */
    static final List<String> STAGES = List.of("jvm", "command", "joined", "placeholder", "ranked", "painted",
            "settled");

    private final PlenumCommand root;
    private final int items;
    private final int runs;
    private final String heap;
    private final List<int[]> sizes;
    private final Path keep;

    ScreenBench(PlenumCommand root, int items, int runs, String heap, String sizes, Path keep) {
        this.keep = keep;
        this.root = root;
        this.items = items;
        this.runs = runs;
        this.heap = heap;
        this.sizes = parseSizes(sizes);
    }

    static List<int[]> parseSizes(String text) {
        List<int[]> out = new ArrayList<>();
        for (String s : text.split(",")) {
            String[] f = s.strip().toLowerCase(Locale.ROOT).split("x");
            try {
                int columns = Integer.parseInt(f[0]);
                int rows = Integer.parseInt(f[1]);
                if (f.length != 2 || columns < 80 || rows < 24) {
                    throw new NumberFormatException();
                }
                out.add(new int[] {columns, rows});
            } catch (RuntimeException e) {
                throw new org.plenum.app.UsageException("--size: expected COLUMNSxROWS of at least 80x24, found \""
                        + s + "\"");
            }
        }
        return out;
    }

    /** The parent: generates the workspace, runs the children, reports medians. */
    int report() throws IOException, InterruptedException {
        PrintWriter out = root.spec.commandLine().getOut();
        Path dir = keep != null ? Files.createDirectories(keep) : Files.createTempDirectory("plenum-bench-screen-");
        Path db = dir.resolve("screen.db");
        try {
            if (keep != null && Files.exists(db)) {
                out.printf(Locale.ROOT, "reusing the workspace %s (made by an earlier --keep)%n", db);
            } else {
                out.printf(Locale.ROOT, "generating a workspace of %,d items in %s%n", items, dir);
                out.flush();
                long t0 = System.nanoTime();
                ScreenBenchmark.Generated g = ScreenBenchmark.generate(root.workspaces, dir, db, items);
                out.printf(Locale.ROOT, "  %,d items, %,d actuals, %,d stat forecasts, %,d past decisions, %,d"
                        + " events; %.0f MB database; generated and imported in %.1f s%n", g.items(), g.actuals(),
                        g.forecasts(), g.decisions(), g.events(), g.bytes() / 1048576.0,
                        (System.nanoTime() - t0) / 1e9);
            }
            for (int[] size : sizes) {
                for (Mode mode : Mode.values()) {
                    reportSize(out, db, size, mode);
                }
            }
        } finally {
            if (keep == null) {
                BenchCommand.deleteTree(dir);
            }
        }
        return ExitCodes.OK;
    }

    /**
     * How the measured screen meets its meeting: the first screen of a new meeting ranks the
     * cycle and keeps the agenda with the meeting; a screen joining an open meeting (a planner, or
     * anyone coming back) reads the kept agenda.
     */
    enum Mode {
        OPEN("opens a new meeting: ranks the agenda"), JOIN("joins the open meeting: reads its kept agenda");

        final String text;

        Mode(String text) {
            this.text = text;
        }
    }

    private void reportSize(PrintWriter out, Path db, int[] size, Mode mode) throws IOException, InterruptedException {
        String sizeText = size[0] + "x" + size[1];
        out.printf(Locale.ROOT, "%s, the screen %s%n", sizeText, mode.text);
        List<ScreenRun> done = new ArrayList<>();
        List<Map<String, Long>> sinceStart = new ArrayList<>();
        long[] firstPaint = new long[runs];
        for (int i = 0; i < runs; i++) {
            if (mode == Mode.OPEN) {
                closeOpenMeeting(db);
            }
            List<String> args = List.of("bench", "screen", "--run-once", db.getParent().toString(), "--size", sizeText);
            long before = ScreenBenchmark.nowMicros();
            ScreenRun run = child(args);
            done.add(run);
            Map<String, Long> since = new LinkedHashMap<>();
            run.marks().forEach((k, v) -> since.put(k, v - before));
            sinceStart.add(since);
            firstPaint[i] = since.get("painted");
            List<String> parts = new ArrayList<>();
            for (String stage : STAGES) {
                parts.add(String.format(Locale.ROOT, "%s %.0f", stage, since.get(stage) / 1e3));
            }
            StringBuilder line = new StringBuilder(String.format(Locale.ROOT, "  run %d %s: first agenda %.3f s"
                    + " (ms after start: %s)", i + 1, sizeText, firstPaint[i] / 1e6, String.join(", ", parts)));
            for (String kind : KINDS) {
                line.append(String.format(Locale.ROOT, "; %s p99 %.1f", kind, run.keys().get(kind).p99() / 1e6));
            }
            line.append(String.format(Locale.ROOT, " ms; peak heap %.0f MB", run.peakHeapBytes() / 1048576.0));
            out.println(line);
            out.flush();
        }
        long paint = ImportBenchmark.median(firstPaint);
        long peak = done.stream().mapToLong(ScreenRun::peakHeapBytes).max().orElse(0);
        out.printf(Locale.ROOT, "plenum bench screen %s %s, %,d-item agenda: first painted agenda median %.3f s from"
                + " ProcessBuilder.start() (target <= %.1f s); peak heap %.0f MB (max of runs, sum of pool peaks;"
                + " -Xmx%s; target <= 512 MB)%n", sizeText, mode.name().toLowerCase(Locale.ROOT),
                done.get(0).agendaRows(), paint / 1e6,
                FIRST_PAINT_TARGET_S, peak / 1048576.0, heap);
        out.printf(Locale.ROOT, "  stages, median ms after ProcessBuilder.start(): %s%n", String.join(", ",
                STAGES.stream().map(s -> String.format(Locale.ROOT, "%s %.0f", s, ImportBenchmark.median(
                        sinceStart.stream().mapToLong(m -> m.get(s)).toArray()) / 1e3)).toList()));
        out.printf(Locale.ROOT, "  %-9s %6s %9s %9s %9s %9s  (ms; median over runs of each run's median and p99;"
                + " max of all runs)%n", "key", "n/run", "median", "p99", "worst p99", "max");
        for (String kind : KINDS) {
            List<Latencies> ls = done.stream().map(r -> r.keys().get(kind)).toList();
            out.printf(Locale.ROOT, "  %-9s %6d %9.2f %9.2f %9.2f %9.2f%s%n", kind, ls.get(0).count(),
                    ImportBenchmark.median(ls.stream().mapToLong(Latencies::median).toArray()) / 1e6,
                    ImportBenchmark.median(ls.stream().mapToLong(Latencies::p99).toArray()) / 1e6,
                    ls.stream().mapToLong(Latencies::p99).max().orElse(0) / 1e6,
                    ls.stream().mapToLong(Latencies::max).max().orElse(0) / 1e6,
                    ImportBenchmark.median(ls.stream().mapToLong(Latencies::p99).toArray()) / 1e6
                            <= KEY_P99_TARGET_MS ? "" : "  (over the 16 ms target)");
        }
        out.flush();
    }

    /** Closes the cycle's open meeting, if any, so that the next screen starts a new one (its minutes land beside the db). */
    private void closeOpenMeeting(Path db) {
        try (Meeting meeting = join(db)) {
            meeting.close(List.of());
        }
    }

    /** The benchmark's meeting, as {@code plenum meet} with its cycle, budget and lags would join it. */
    private Meeting join(Path db) {
        return Meeting.join(root.workspaces, db, ScreenBenchmark.CYCLE.toString(), ScreenBenchmark.BUDGET_MINUTES,
                Arrays.stream(ScreenBenchmark.LAGS).boxed().toList(), System.getProperty("user.name"),
                Clock.systemUTC());
    }

    /** One measured run in a fresh JVM started like the launcher's; the instants of its line are the wall clock's. */
    private ScreenRun child(List<String> args) throws IOException, InterruptedException {
        List<String> cmd = new ArrayList<>(BenchCommand.childJvm(heap));
        String extra = root.env.get("PLENUM_JAVA_OPTS");
        if (extra != null && !extra.isBlank()) {
            cmd.addAll(1, Arrays.asList(extra.strip().split("\\s+")));
        }
        cmd.addAll(args);
        Process p = new ProcessBuilder(cmd).redirectError(ProcessBuilder.Redirect.INHERIT).start();
        String found = null;
        try (BufferedReader r = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8))) {
            String line;
            while ((line = r.readLine()) != null) {
                if (line.startsWith("screen-run ")) {
                    found = line;
                }
            }
        }
        if (p.waitFor() != 0 || found == null) {
            throw new IllegalStateException("the benchmark run failed (exit " + p.exitValue() + ")");
        }
        return ScreenRun.parse(found);
    }

    /**
     * The child: joins the meeting on {@code dir/screen.db} as {@code plenum meet} would, paints
     * the agenda, presses the script's keys; prints one {@code screen-run} line.
     */
    int runOnce(Path dir) throws InterruptedException {
        Map<String, Long> marks = new LinkedHashMap<>();
        marks.put("jvm", ManagementFactory.getRuntimeMXBean().getStartTime() * 1000);
        marks.put("command", ScreenBenchmark.nowMicros());
        int[] size = sizes.get(0);
        Path db = dir.resolve("screen.db");
        Workspaces workspaces = root.workspaces;
        long[] ranked = new long[1];
        ExecutorService background = MeetingTerminal.background();
        try (Meeting meeting = join(db)) {
            marks.put("joined", ScreenBenchmark.nowMicros());
            Sources plain = MeetCommand.sources(workspaces, db, meeting);
            Supplier<Agenda.Report> agenda = () -> {
                Agenda.Report report = plain.agenda().get();
                ranked[0] = ScreenBenchmark.nowMicros();
                return report;
            };
            Sources sources = new Sources(agenda, plain.rankAgain(), plain.guidance(), plain.scorecard(),
                    plain.history());
            try (ScreenProbe probe = new ScreenProbe(meeting, Look.of(true, true), sources, background, size[0],
                    size[1])) {
                probe.step();
                marks.put("placeholder", ScreenBenchmark.nowMicros());
                long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(120);
                while (!probe.showsFirstAgendaRow()) {
                    if (System.nanoTime() > deadline) {
                        throw new IllegalStateException("no agenda after 120 s: " + probe.line(2).strip());
                    }
                    probe.step(Duration.ofMillis(100));
                }
                marks.put("painted", ScreenBenchmark.nowMicros());
                marks.put("ranked", ranked[0]);
                // The other reads (guidance, sparklines) land before keys are timed: their work is not a key's.
                background.shutdown();
                if (!background.awaitTermination(120, TimeUnit.SECONDS)) {
                    throw new IllegalStateException("the background reads did not finish");
                }
                probe.step();
                marks.put("settled", ScreenBenchmark.nowMicros());
                Map<String, Latencies> keys = script(probe);
                marks.put("end", ScreenBenchmark.nowMicros());
                Map<String, Long> ordered = new LinkedHashMap<>();
                for (String k : List.of("jvm", "command", "joined", "placeholder", "ranked", "painted",
                        "settled", "end")) {
                    ordered.put(k, marks.get(k));
                }
                ScreenRun run = new ScreenRun(ordered, keys, ScreenBenchmark.peakHeap(), rows(probe));
                PrintWriter out = root.spec.commandLine().getOut();
                out.println(run.line());
                out.flush();
            }
        } finally {
            background.shutdownNow();
        }
        return ExitCodes.OK;
    }

    /** The agenda's row count, read off its title line ("50,000 items ..."). */
    private static int rows(ScreenProbe probe) {
        String title = probe.line(1).strip();
        String count = title.substring(0, title.indexOf(' ')).replace(",", "");
        return Integer.parseInt(count);
    }

    /**
     * The keys: 600 down, 300 page down, 600 up; then 200 times open the selected item, back, page
     * down; then 25 times End and Home. Each key is checked to have done its work (outside the timing).
     */
    static Map<String, Latencies> script(ScreenProbe probe) {
        Map<String, long[]> nanos = new LinkedHashMap<>();
        int[] counts = new int[KINDS.size()];
        for (String k : KINDS) {
            nanos.put(k, new long[2000]);
        }
        KeyStroke down = new KeyStroke(KeyType.ArrowDown);
        KeyStroke up = new KeyStroke(KeyType.ArrowUp);
        KeyStroke pageDown = new KeyStroke(KeyType.PageDown);
        KeyStroke enter = new KeyStroke(KeyType.Enter);
        KeyStroke escape = new KeyStroke(KeyType.Escape);
        for (int i = 0; i < 600; i++) {
            record(nanos, counts, "down", probe.press(down));
        }
        for (int i = 0; i < 300; i++) {
            record(nanos, counts, "pagedown", probe.press(pageDown));
        }
        for (int i = 0; i < 600; i++) {
            record(nanos, counts, "up", probe.press(up));
        }
        for (int i = 0; i < 200; i++) {
            record(nanos, counts, "open", probe.press(enter));
            expect(probe, "item ");
            record(nanos, counts, "back", probe.press(escape));
            expect(probe, "agenda");
            record(nanos, counts, "pagedown", probe.press(pageDown));
        }
        for (int i = 0; i < 25; i++) {
            record(nanos, counts, "end-home", probe.press(new KeyStroke(KeyType.End)));
            record(nanos, counts, "end-home", probe.press(new KeyStroke(KeyType.Home)));
        }
        Map<String, Latencies> out = new LinkedHashMap<>();
        for (int k = 0; k < KINDS.size(); k++) {
            out.put(KINDS.get(k), Latencies.of(Arrays.copyOf(nanos.get(KINDS.get(k)), counts[k])));
        }
        return out;
    }

    private static void record(Map<String, long[]> nanos, int[] counts, String kind, long value) {
        nanos.get(kind)[counts[KINDS.indexOf(kind)]++] = value;
    }

    private static void expect(ScreenProbe probe, String viewPrefix) {
        if (!probe.view().startsWith(viewPrefix)) {
            throw new IllegalStateException("expected the " + viewPrefix.strip() + " view, found \"" + probe.view()
                    + "\": " + probe.line(probe.line(0).isBlank() ? 1 : 0).strip());
        }
    }
}
