package org.plenum.cli;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Arrays;
import java.util.concurrent.Callable;
import java.util.stream.Stream;
import org.plenum.app.ImportBenchmark;
import org.plenum.app.ImportBenchmark.Run;
import org.plenum.app.ScoreBenchmark;
import org.plenum.score.BootstrapInterval;
import org.plenum.store.Sqlite3Shell;
import org.plenum.app.UsageException;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;

@Command(name = "bench", mixinStandardHelpOptions = true,
        description = {"Benchmarks, medians of several runs against a reference measured in the same run.",
            "bench import: generate a forecasts CSV, import it with every check on, against the sqlite3 shell's"
                + " .import of the same file.",
            "bench score: generate a workspace of --rows scored pairs; full scorecard, three breakdowns and the"
                + " bootstrap, against sqlite3 computing the plain per-step sums.",
            "bench agenda: generate a workspace of --items items (36 months, 24 cycles of stat forecasts at lags"
                + " 0-5, a decision per two items); rank the last cycle, against sqlite3 merely reading the same"
                + " forecast rows.",
            "bench screen: the meeting screen on a generated --items agenda in Lanterna's virtual terminal, as the"
                + " screen that opens a new meeting (ranks the agenda) and as one that joins it (reads the agenda kept"
                + " with the meeting): first painted agenda from process start, key-to-repaint latency, peak heap."})
final class BenchCommand implements Callable<Integer> {
    @ParentCommand
    PlenumCommand root;

    @Parameters(index = "0", paramLabel = "WHAT", description = "import, score, agenda or screen")
    String what;

    @Option(names = "--rows", defaultValue = "1000000",
            description = "Forecast rows (import) or scored pairs (score); default ${DEFAULT-VALUE}.")
    int rows;

    @Option(names = "--items", description = "Items of the workspace (agenda: default 100000; screen: 50000).")
    Integer items;

    @Option(names = "--runs", defaultValue = "5", description = "Runs of each side; medians are reported (default: ${DEFAULT-VALUE}).")
    int runs;

    @Option(names = "--heap", description = "-Xmx of the measured JVM (default: 256m for import, 512m for score and agenda).")
    String heap;

    @Option(names = "--size", defaultValue = "120x40,80x24",
            description = "Terminal sizes (screen), COLUMNSxROWS, comma-separated; default ${DEFAULT-VALUE}.")
    String size;

    @Option(names = "--keep", paramLabel = "DIR",
            description = "Score and screen: generate the workspace into DIR and keep it; reuse it when DIR holds one.")
    Path keep;

    @Option(names = "--run-once", hidden = true, paramLabel = "DIR")
    Path runOnceDir;

    @Override
    public Integer call() throws IOException, InterruptedException {
        if (what.equals("screen")) {
            ScreenBench bench = new ScreenBench(root, items == null ? 50_000 : items, runs, heap == null ? "512m" : heap, size, keep);
            return runOnceDir != null ? bench.runOnce(runOnceDir) : bench.report();
        }
        if (!what.equals("import") && !what.equals("score") && !what.equals("agenda")) {
            throw new UsageException("bench: expected import, score, agenda or screen, found \"" + what + "\"");
        }
        if (heap == null) {
            heap = what.equals("import") ? "256m" : "512m";
        }
        if (what.equals("agenda")) {
            return new AgendaBench(root, runs, items == null ? 100_000 : items, heap, this::child).run(runOnceDir);
        }
        if (runOnceDir != null && what.equals("score")) {
            Run run = ScoreBenchmark.runOnce(root.workspaces, runOnceDir.resolve("score.db"));
            root.spec.commandLine().getOut().println(run.line());
            return ExitCodes.OK;
        }
        if (what.equals("score")) {
            return benchScore();
        }
        if (runOnceDir != null) {
            Run run = ImportBenchmark.runOnce(root.workspaces, runOnceDir, runOnceDir.resolve("run.db"));
            root.spec.commandLine().getOut().println(run.line());
            return ExitCodes.OK;
        }
        PrintWriter out = root.spec.commandLine().getOut();
        Path dir = Files.createTempDirectory("plenum-bench-");
        try {
            out.printf(Locale.ROOT, "generating %,d forecast rows in %s%n", rows, dir);
            ImportBenchmark.generate(dir, rows);
            report(out, dir);
        } finally {
            deleteTree(dir);
        }
        return ExitCodes.OK;
    }

    /**
     * Runs Plenum and the sqlite3 reference alternately, so that both see the same load on a
     * shared machine, and reports medians and the median of the per-pair ratios.
     */
    private void report(PrintWriter out, Path dir) throws IOException, InterruptedException {
        long size = Files.size(dir.resolve("forecasts.csv"));
        boolean reference = ImportBenchmark.sqlite3Installed();
        long[] ours = new long[runs];
        long[] heaps = new long[runs];
        long[] theirs = new long[runs];
        double[] ratios = new double[runs];
        for (int i = 0; i < runs; i++) {
            Run r = childRun(dir);
            ours[i] = r.nanos();
            heaps[i] = r.peakHeapBytes();
            String line = String.format(Locale.ROOT, "  run %d: plenum %.3f s, peak heap %.0f MB", i + 1,
                    r.nanos() / 1e9, r.peakHeapBytes() / 1048576.0);
            if (reference) {
                theirs[i] = ImportBenchmark.sqlite3Import(dir, dir.resolve("sqlite3-" + i + ".db"));
                ratios[i] = (double) ours[i] / theirs[i];
                line += String.format(Locale.ROOT, "; sqlite3 %.3f s; ratio %.2f", theirs[i] / 1e9, ratios[i]);
            }
            out.println(line);
        }
        long median = ImportBenchmark.median(ours);
        out.printf(Locale.ROOT, "plenum import: %,d rows, %.1f MB, median %.3f s = %,.0f rows/s; peak heap %.0f MB"
                + " (max of runs, -Xmx%s)%n", rows, size / 1048576.0, median / 1e9, rows / (median / 1e9),
                Arrays.stream(heaps).max().orElse(0) / 1048576.0, heap);
        if (!reference) {
            out.println("sqlite3 is not installed: no reference time (apt-get install sqlite3)");
            return;
        }
        Arrays.sort(ratios);
        out.printf(Locale.ROOT, "sqlite3 .import of the same file: median %.3f s; ratio plenum/sqlite3: median %.2f"
                + " (target <= 1.5), median of the medians %.2f%n", ImportBenchmark.median(theirs) / 1e9,
                ratios.length % 2 == 1 ? ratios[ratios.length / 2]
                        : (ratios[ratios.length / 2 - 1] + ratios[ratios.length / 2]) / 2,
                (double) median / ImportBenchmark.median(theirs));
    }

    private int benchScore() throws IOException, InterruptedException {
        PrintWriter out = root.spec.commandLine().getOut();
        Path dir = keep != null ? Files.createDirectories(keep) : Files.createTempDirectory("plenum-bench-score-");
        try {
            if (Files.exists(dir.resolve("score.db"))) {
                out.printf(Locale.ROOT, "reusing the workspace in %s%n", dir);
            } else {
                out.printf(Locale.ROOT, "generating a workspace of %,d scored pairs in %s%n", rows, dir);
                ScoreBenchmark.generate(root.workspaces, dir, dir.resolve("score.db"), rows);
            }
            boolean reference = ImportBenchmark.sqlite3Installed();
            long[] ours = new long[runs];
            long[] theirs = new long[runs];
            long[] inputs = new long[runs];
            long peak = 0;
            int pairs = 0;
            for (int i = 0; i < runs; i++) {
                Run r = child(List.of("bench", "score", "--run-once", dir.toString()));
                ours[i] = r.nanos();
                peak = Math.max(peak, r.peakHeapBytes());
                pairs = (int) r.rows();
                String line = String.format(Locale.ROOT, "  run %d: plenum %.3f s, peak heap %.0f MB", i + 1,
                        r.nanos() / 1e9, r.peakHeapBytes() / 1048576.0);
                if (reference) {
                    theirs[i] = Sqlite3Shell.perStepSums(dir.resolve("score.db"), 1);
                    inputs[i] = Sqlite3Shell.scoreInputs(dir.resolve("score.db"), 1);
                    line += String.format(Locale.ROOT, "; sqlite3 sums %.3f s, reading the inputs %.3f s",
                            theirs[i] / 1e9, inputs[i] / 1e9);
                }
                out.println(line);
            }
            long median = ImportBenchmark.median(ours);
            out.printf(Locale.ROOT, "plenum score: %,d pairs, 4 sources, scorecard + %s breakdowns + %d-draw bootstrap"
                    + ": median %.3f s; peak heap %.0f MB (sum of pool peaks; -Xmx%s)%n", pairs,
                    String.join("/", ScoreBenchmark.BREAKDOWNS), BootstrapInterval.DEFAULT_DRAWS, median / 1e9,
                    peak / 1048576.0, heap);
            if (reference) {
                long floor = ImportBenchmark.median(theirs);
                out.printf(Locale.ROOT, "sqlite3 plain per-step sums: median %.3f s; ratio plenum/sqlite3 %.2f"
                        + " (target <= 1.0)%n", floor / 1e9, (double) median / floor);
                long read = ImportBenchmark.median(inputs);
                out.printf(Locale.ROOT, "sqlite3 merely reading the rows a scorecard reads: median %.3f s (%.2f x the"
                        + " sums; plenum %.2f x this)%n", read / 1e9, (double) read / floor, (double) median / read);
            } else {
                out.println("sqlite3 is not installed: no reference time (apt-get install sqlite3)");
            }
        } finally {
            if (keep == null) {
                deleteTree(dir);
            }
        }
        return ExitCodes.OK;
    }

    /** Each run in a fresh JVM with the heap limit, as a user's import would run. */
    private Run childRun(Path dir) throws IOException, InterruptedException {
        Path runDir = Files.createTempDirectory(dir, "run-");
        Files.copy(dir.resolve("items.csv"), runDir.resolve("items.csv"));
        Files.createSymbolicLink(runDir.resolve("forecasts.csv"), dir.resolve("forecasts.csv"));
        Run run = child(List.of("bench", "import", "--run-once", runDir.toString()));
        deleteTree(runDir);
        return run;
    }

    Run child(List<String> args) throws IOException, InterruptedException {
        List<String> cmd = new ArrayList<>(childJvm(heap));
        cmd.addAll(args);
        Process p = new ProcessBuilder(cmd).redirectError(ProcessBuilder.Redirect.INHERIT).start();
        String line;
        try (BufferedReader r = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8))) {
            line = r.readLine();
        }
        if (p.waitFor() != 0 || line == null) {
            throw new IllegalStateException("the benchmark run failed (exit " + p.exitValue() + ")");
        }
        return Run.parse(line);
    }

    /** The command line of a measured JVM up to its arguments. */
    static List<String> childJvm(String heap) {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        String classpath = System.getProperty("java.class.path");
        // The same JVM options as the plenum launcher, so that a run is timed as users run it.
        return List.of(java, "-Xmx" + heap, "-XX:+UseParallelGC", "-Djava.awt.headless=true", "-cp", classpath,
                Main.class.getName());
    }

    static void deleteTree(Path dir) throws IOException {
        try (Stream<Path> paths = Files.walk(dir)) {
            for (Path p : paths.sorted(Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(p);
            }
        }
    }
}
