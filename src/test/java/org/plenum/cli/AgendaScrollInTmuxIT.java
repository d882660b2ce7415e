package org.plenum.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Scrolling the agenda in a real terminal (tmux) moves the terminal's lines and sends only the
 * lines that came into view. What the terminal then shows must be exactly what a full redraw
 * shows: after a walk up and down the agenda, the screen is compared, attributes included, with
 * the one Lanterna draws whole after a resize.
 */
class AgendaScrollInTmuxIT {
    @TempDir
    Path dir;

    @Test
    void aScrolledAgendaShowsWhatAFullRedrawShows() throws Exception {
        Assumptions.assumeTrue(Terminals.available("tmux"), "tmux is not installed");
        Path db = dir.resolve("meeting.db");
        Processes.Result built = Processes.plenum(dir, List.of("demo", "--no-tui", "--db", db.toString(), "--data",
                Processes.root().resolve("demo-data").toString()));
        assertEquals(0, built.code(), built.err());
        Terminals.Session s = new Terminals.Session(null, "scroll");
        try {
            s.start(120, 32, "LANG=C.UTF-8 " + Path.of(System.getProperty("java.home"), "bin", "java") + " -jar "
                    + Processes.jar() + " meet --db " + db + " --budget 30; sleep 600");
            s.await("[agenda]", 30_000);
            s.await("   1 KG-", 30_000);
            walk(s, "Down", 45);
            walk(s, "Up", 7);
            walk(s, "Down", 3);
            walk(s, "PageDown", 2);
            walk(s, "Up", 30);
            walk(s, "Down", 12);
            // Back over the cut line (after rank 15 at 30 minutes): a scrolled list with the rule in it.
            walk(s, "Home", 1);
            walk(s, "Down", 40);
            walk(s, "Up", 30);
            List<String> scrolled = settled(s);
            assertTrue(String.join("\n", scrolled).contains("cut line"), "the walk passes the cut line:\n" + scrolled);

            s.tmux("resize-window", "-t", "scroll", "-x", "100");
            s.await("[agenda]", 5_000);
            Thread.sleep(300);
            s.tmux("resize-window", "-t", "scroll", "-x", "120");
            Thread.sleep(300);
            List<String> redrawn = settled(s);
            // The top line holds the running clock; everything under it must agree cell for cell.
            assertEquals(body(scrolled), body(redrawn));
        } finally {
            s.stop();
        }
    }

    private static void walk(Terminals.Session s, String key, int times) throws Exception {
        String[] keys = new String[times];
        Arrays.fill(keys, key);
        s.press(keys);
    }

    /** The screen with its attributes, once two looks 300 ms apart agree below the top line. */
    private static List<String> settled(Terminals.Session s) throws Exception {
        List<String> last = capture(s);
        for (int i = 0; i < 40; i++) {
            Thread.sleep(300);
            List<String> now = capture(s);
            if (body(now).equals(body(last))) {
                return now;
            }
            last = now;
        }
        throw new AssertionError("the screen did not settle:\n" + String.join("\n", last));
    }

    private static List<String> capture(Terminals.Session s) throws Exception {
        return new ArrayList<>(List.of(s.tmux("capture-pane", "-e", "-p", "-t", "scroll").out().split("\n", -1)));
    }

    private static List<String> body(List<String> screen) {
        return screen.size() <= 1 ? Collections.emptyList() : screen.subList(1, screen.size());
    }
}
