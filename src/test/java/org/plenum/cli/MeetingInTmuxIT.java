package org.plenum.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;

/**
 * The facilitator and two planners, each a different operating-system user in a real terminal
 * (tmux), on one database: each logs a decision by typing keys; every other screen shows it within
 * 2 seconds, and the ledger holds exactly what was typed.
 */
class MeetingInTmuxIT {
    /** Who decides what, in order: the item, the typed quantity, the reason. */
    private record Typed(String author, String item, String quantity, String reason) {}

    @Test
    void everyScreenShowsEveryDecisionWithinTwoSeconds() throws Exception {
        // .ci/run installs tmux and creates the test users; elsewhere this test is skipped, not failed.
        Assumptions.assumeTrue(Terminals.available("tmux"), "tmux is not installed");
        Assumptions.assumeTrue(Terminals.PLANNERS.stream().allMatch(Terminals::userExists),
                "the test users " + Terminals.PLANNERS + " do not exist (.ci/run creates them as root)");
        Path dir = sharedDirectory();
        Path db = dir.resolve("meeting.db");
        Processes.Result built = Processes.plenum(dir, List.of("demo", "--no-tui", "--db", db.toString(), "--data",
                Processes.root().resolve("demo-data").toString()));
        assertEquals(0, built.code(), built.err());
        Processes.run(dir, List.of("chgrp", "-R", Terminals.GROUP, dir.toString()), 10);
        Processes.run(dir, List.of("chmod", "660", db.toString()), 10);

        String me = System.getProperty("user.name");
        List<Terminals.Session> screens = List.of(new Terminals.Session(null, "fac"),
                new Terminals.Session(Terminals.PLANNERS.get(0), "p1"), new Terminals.Session(Terminals.PLANNERS.get(1),
                        "p2"));
        List<String> names = List.of(me, Terminals.PLANNERS.get(0), Terminals.PLANNERS.get(1));
        try {
            for (int i = 0; i < screens.size(); i++) {
                screens.get(i).start(120, 32, "cd " + dir + " && LANG=C.UTF-8 " + java() + " -jar " + Processes.jar()
                        + " meet --db " + db + " --budget 30 2>>" + dir.resolve("err-" + i + ".txt") + "; sleep 600");
                // the facilitator first: whoever opens the meeting first facilitates
                screens.get(i).await("[agenda]", 30_000);
            }
            screens.get(0).await(names.get(1), 5_000);
            screens.get(0).await(names.get(2), 5_000);
            for (Terminals.Session s : screens) {
                s.type("2");
                s.await("this meeting's decisions", 5_000);
            }
            List<Typed> typed = List.of(new Typed(names.get(0), "KG-0010", "1111", "facilitator saw the spring plan"),
                    new Typed(names.get(1), "KG-0020", "2222", "planner one heard of a listing"),
                    new Typed(names.get(2), "KG-0030", "3333", "planner two saw the competitor price"));
            for (int i = 0; i < typed.size(); i++) {
                Typed t = typed.get(i);
                Terminals.Session s = screens.get(i);
                s.type("1/" + t.item());
                s.press("Enter");
                s.await("filter: " + t.item(), 5_000);
                s.type("a");
                s.await("adjust " + t.item(), 5_000);
                s.type(t.quantity());
                s.press("Tab");
                s.type(t.reason());
                s.press("Enter");
                s.await("saved: " + t.item(), 5_000);
                long saved = System.nanoTime();
                s.type("2");
                for (Terminals.Session other : screens) {
                    if (other != s) {
                        long left = 2_000 - (System.nanoTime() - saved) / 1_000_000;
                        other.await(t.reason(), Math.max(0, left));
                    }
                }
            }
            for (Terminals.Session s : screens) {
                String seen = s.await("9 standing", 2_000);
                for (Typed t : typed) {
                    assertTrue(seen.contains(t.reason()), seen);
                }
            }
            assertLedgerHolds(dir, db, typed);
            for (int i = 0; i < screens.size(); i++) {
                String err = Files.exists(dir.resolve("err-" + i + ".txt")) ? Files.readString(dir.resolve("err-" + i
                        + ".txt")) : "";
                assertEquals("", err.strip(), "nothing on standard error while the screen ran");
            }
        } finally {
            for (Terminals.Session s : screens) {
                try {
                    s.stop();
                } catch (Exception | AssertionError e) {
                    // already gone
                }
            }
        }
    }

    private static void assertLedgerHolds(Path dir, Path db, List<Typed> typed) throws Exception {
        Processes.Result export = Processes.plenum(dir, List.of("export", "ledger", "--db", db.toString(), "--cycle",
                "2026-12"));
        assertEquals(0, export.code(), export.err());
        List<CSVRecord> rows = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(export.out())).getRecords();
        List<String> expected = new ArrayList<>();
        for (Typed t : typed) {
            for (String period : List.of("2027-01", "2027-02", "2027-03")) {
                expected.add(String.join("|", t.item(), period, "meeting", "adjust", t.quantity(), t.reason(), "other",
                        t.author(), "1"));
            }
        }
        List<String> actual = rows.stream().filter(r -> !r.get("meeting").isEmpty()).map(r -> String.join("|", r.get("item"), r.get("period"), r.get("step"),
                r.get("action"), r.get("quantity"), r.get("reason"), r.get("tag"), r.get("author"), r.get("meeting")))
                .toList();
        assertEquals(expected, actual);
    }

    /** A directory every test user may write, shared through the group (as README's "Sharing a workspace"). */
    private static Path sharedDirectory() throws Exception {
        Path dir = Files.createTempDirectory(Path.of("/tmp"), "plenum-meet-e2e-");
        Processes.run(dir, List.of("chgrp", Terminals.GROUP, dir.toString()), 10);
        Files.setPosixFilePermissions(dir, PosixFilePermissions.fromString("rwxrwx---"));
        Processes.run(dir, List.of("chmod", "g+s", dir.toString()), 10);
        return dir;
    }

    private static String java() {
        return Path.of(System.getProperty("java.home"), "bin", "java").toString();
    }
}
