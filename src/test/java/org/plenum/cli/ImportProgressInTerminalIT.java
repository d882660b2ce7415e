package org.plenum.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plenum.app.ImportBenchmark;

/**
 * A long import in a real terminal (tmux) shows a progress bar on standard error; the same import
 * with standard error redirected prints only the one-line summary.
 */
class ImportProgressInTerminalIT {
    @TempDir
    Path dir;

    @Test
    void showsAProgressBarInATerminalAndOnlyTheSummaryOtherwise() throws Exception {
        // .ci/run installs tmux; on a developer's machine without it this test is skipped, not failed.
        Assumptions.assumeTrue(tmuxInstalled(), "tmux is not installed (apt-get install tmux)");
        ImportBenchmark.generate(dir, 300_000);
        Path db = dir.resolve("w.db");
        assertEquals(0, CliRun.of("init", "--db", db.toString()).code());
        assertEquals(0, CliRun.of("import", "items", dir.resolve("items.csv").toString(), "--db", db.toString()).code());

        String session = "plenum-progress-" + ProcessHandle.current().pid();
        Path screen = dir.resolve("screen.txt");
        String command = "java -jar " + Processes.jar() + " import forecasts " + dir.resolve("forecasts.csv") + " --db "
                + db + "; echo EXIT=$?; sleep 30";
        tmux("new-session", "-d", "-s", session, "-x", "120", "-y", "20", command);
        try {
            String seen = "";
            boolean sawBar = false;
            for (int i = 0; i < 300 && !seen.contains("EXIT="); i++) {
                Thread.sleep(100);
                seen = tmux("capture-pane", "-p", "-t", session).out();
                sawBar |= seen.contains("import forecasts") && seen.contains("%") && seen.contains("MB");
            }
            Files.writeString(screen, seen);
            assertTrue(seen.contains("EXIT=0"), seen);
            assertTrue(sawBar, "a progress bar was drawn: " + seen);
            assertTrue(seen.contains("imported 300,000 rows of forecasts"), seen);
        } finally {
            tmux("kill-session", "-t", session);
        }

        Path again = dir.resolve("again.db");
        assertEquals(0, CliRun.of("init", "--db", again.toString()).code());
        assertEquals(0, CliRun.of("import", "items", dir.resolve("items.csv").toString(), "--db", again.toString())
                .code());
        Processes.Result piped = Processes.plenum(dir, List.of("import", "forecasts",
                dir.resolve("forecasts.csv").toString(), "--db", again.toString()));
        assertEquals(0, piped.code(), piped.err());
        assertTrue(piped.out().startsWith("imported 300,000 rows of forecasts"), piped.out());
        assertFalse(piped.err().contains("%"), "no progress bar when standard error is not a terminal: " + piped.err());
    }

    private static boolean tmuxInstalled() {
        try {
            return tmux("-V").code() == 0;
        } catch (Exception e) {
            return false;
        }
    }

    private static Processes.Result tmux(String... args) throws Exception {
        List<String> cmd = new java.util.ArrayList<>(List.of("tmux"));
        cmd.addAll(List.of(args));
        return Processes.run(Path.of("."), cmd, 30);
    }
}
