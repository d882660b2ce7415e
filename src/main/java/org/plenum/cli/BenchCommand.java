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
import org.plenum.app.UsageException;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;

@Command(name = "bench", mixinStandardHelpOptions = true,
        description = "Benchmarks. bench import: generate a forecasts CSV, import it with every check on, compare"
                + " with the sqlite3 shell's .import of the same file.")
final class BenchCommand implements Callable<Integer> {
    @ParentCommand
    PlenumCommand root;

    @Parameters(index = "0", paramLabel = "WHAT", description = "import")
    String what;

    @Option(names = "--rows", defaultValue = "1000000", description = "Rows in the forecasts file (default: ${DEFAULT-VALUE}).")
    int rows;

    @Option(names = "--runs", defaultValue = "5", description = "Runs of each side; medians are reported (default: ${DEFAULT-VALUE}).")
    int runs;

    @Option(names = "--heap", defaultValue = "256m", description = "-Xmx of the importing JVM (default: ${DEFAULT-VALUE}).")
    String heap;

    @Option(names = "--run-once", hidden = true, paramLabel = "DIR")
    Path runOnceDir;

    @Override
    public Integer call() throws IOException, InterruptedException {
        if (!what.equals("import")) {
            throw new UsageException("bench: expected import, found \"" + what + "\"");
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

    /** Each run in a fresh JVM with the heap limit, as a user's import would run. */
    private Run childRun(Path dir) throws IOException, InterruptedException {
        Path runDir = Files.createTempDirectory(dir, "run-");
        Files.copy(dir.resolve("items.csv"), runDir.resolve("items.csv"));
        Files.createSymbolicLink(runDir.resolve("forecasts.csv"), dir.resolve("forecasts.csv"));
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        String classpath = System.getProperty("java.class.path");
        List<String> cmd = new ArrayList<>(List.of(java, "-Xmx" + heap, "-Djava.awt.headless=true", "-cp", classpath,
                Main.class.getName(), "bench", "import", "--run-once", runDir.toString()));
        Process p = new ProcessBuilder(cmd).redirectError(ProcessBuilder.Redirect.INHERIT).start();
        String line;
        try (BufferedReader r = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8))) {
            line = r.readLine();
        }
        if (p.waitFor() != 0 || line == null) {
            throw new IllegalStateException("the benchmark run failed (exit " + p.exitValue() + ")");
        }
        deleteTree(runDir);
        return Run.parse(line);
    }

    private static void deleteTree(Path dir) throws IOException {
        try (Stream<Path> paths = Files.walk(dir)) {
            for (Path p : paths.sorted(Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(p);
            }
        }
    }
}
