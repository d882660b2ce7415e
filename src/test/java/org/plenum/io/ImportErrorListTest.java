package org.plenum.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.plenum.io.ImportFixtures.cli;
import static org.plenum.io.ImportFixtures.dump;
import static org.plenum.io.ImportFixtures.fixture;
import static org.plenum.io.ImportFixtures.importFile;

import java.io.BufferedWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plenum.core.BadInputException;
import org.plenum.core.Period;
import org.plenum.io.ImportFixtures.CliResult;
import org.plenum.io.ImportFixtures.Setup;

/** A file with many problems: the first 20 by line, a count of the rest, and nothing imported. */
class ImportErrorListTest {
    private static final Pattern WHERE = Pattern.compile(":(\\d+):(\\d+): expected ");

    @TempDir
    Path dir;

    /**
     * {@code forecasts-fifty-bad-rows.csv} has 60 data rows on lines 2-61: those on lines divisible by
     * 6 are good, every other one has one bad field, at column (line mod 5) + 1.
     */
    @Test
    void showsTheFirstTwentyProblemsByLineAndCountsTheOtherThirty() throws Exception {
        Path db = Setup.MONTHLY.create(dir);
        List<String> before = dump(db);
        Path file = fixture("malformed/forecasts-fifty-bad-rows.csv");

        BadInputException e = assertThrows(BadInputException.class,
                () -> importFile(db, ImportKind.FORECASTS, file, false));

        List<String> problems = e.problems();
        assertEquals(22, problems.size(), problems.toString());
        List<Integer> badLines = new ArrayList<>();
        for (int line = 2; badLines.size() < 20; line++) {
            if (line % 6 != 0) {
                badLines.add(line);
            }
        }
        for (int i = 0; i < 20; i++) {
            int line = badLines.get(i);
            assertTrue(problems.get(i).startsWith(file + ":" + line + ":" + (line % 5 + 1) + ": expected "),
                    problems.get(i));
        }
        assertEquals(file + ": ... and 30 more problems (50 in all)", problems.get(20));
        assertEquals(file + ": nothing was imported", problems.get(21));
        assertEquals(before, dump(db));

        CliResult run = cli("import", "forecasts", file.toString(), "--db", db.toString());
        assertEquals(2, run.code());
        assertEquals(problems, run.errLines());
        assertEquals(before, dump(db));
    }

    /**
     * Keys the workspace already holds are found by the writing thread while the reading thread goes
     * on finding bad fields further down, so the problems arrive out of order; they are shown by line.
     * The 7 held keys stand in the first batch of 10,000 records (handed to the writer because it is
     * clean), the 43 bad quantities after it.
     */
    @Test
    void sortsProblemsFoundWhileWritingAmongThoseFoundWhileReading() throws Exception {
        Path db = Setup.MONTHLY.create(dir);
        List<String> before = dump(db);
        List<String> held = Files.readAllLines(fixture("setup/forecasts.csv")).subList(1, 8);
        List<Integer> heldLines = List.of(1001, 2001, 3001, 4001, 5001, 6001, 7001);
        Path file = dir.resolve("forecasts-12000.csv");
        try (BufferedWriter w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            w.write("item,period,cycle,step,quantity\n");
            Period first = Period.parse("2000-01");
            for (int line = 2; line <= 12_001; line++) {
                int k = line - 2;
                int held0 = heldLines.indexOf(line);
                if (held0 >= 0) {
                    w.write(held.get(held0) + "\n");
                } else {
                    Period cycle = first.plus(k / 6 / 12);
                    String quantity = line >= 10_501 && line < 10_544 ? "many" : Integer.toString(k);
                    w.write("P-" + (k % 3 + 1) + "00," + cycle.plus(k / 6 % 12) + "," + cycle + ","
                            + (k / 3 % 2 == 0 ? "stat" : "final") + "," + quantity + "\n");
                }
            }
        }

        BadInputException e = assertThrows(BadInputException.class,
                () -> importFile(db, ImportKind.FORECASTS, file, false));

        List<String> problems = e.problems();
        assertEquals(22, problems.size(), problems.toString());
        for (int i = 0; i < 7; i++) {
            assertEquals(file + ":" + heldLines.get(i) + ":1: expected an item, period, cycle and step not yet in the"
                    + " workspace, found one it already holds (use --replace to overwrite it)", problems.get(i));
        }
        for (int i = 7; i < 20; i++) {
            assertEquals(file + ":" + (10_501 + i - 7) + ":5: expected a non-negative decimal number like 1250 or"
                    + " 12.5, found \"many\"", problems.get(i));
        }
        assertEquals(file + ": ... and 30 more problems (50 in all)", problems.get(20));
        assertEquals(before, dump(db));
    }

    /** Beyond a few screens of problems only the count grows; the first 20 by line stay the ones shown. */
    @Test
    void keepsTheFirstTwentyByLineOfAFileWhereEveryRowIsBad() throws Exception {
        Path db = Setup.MONTHLY.create(dir);
        List<String> before = dump(db);
        Path file = dir.resolve("actuals-500-bad.csv");
        StringBuilder text = new StringBuilder("item,period,quantity\n");
        for (int i = 0; i < 500; i++) {
            text.append("P-300,").append(Period.parse("1990-01").plus(i)).append(",-").append(i + 1).append('\n');
        }
        Files.writeString(file, text);

        BadInputException e = assertThrows(BadInputException.class,
                () -> importFile(db, ImportKind.ACTUALS, file, false));

        List<String> problems = e.problems();
        assertEquals(22, problems.size());
        List<Integer> lines = new ArrayList<>();
        for (String p : problems.subList(0, 20)) {
            Matcher m = WHERE.matcher(p.substring(file.toString().length()));
            assertTrue(m.lookingAt(), p);
            lines.add(Integer.parseInt(m.group(1)));
            assertEquals("3", m.group(2), p);
        }
        List<Integer> expected = new ArrayList<>();
        for (int line = 2; line <= 21; line++) {
            expected.add(line);
        }
        assertEquals(expected, lines);
        assertEquals(file + ": ... and 480 more problems (500 in all)", problems.get(20));
        assertEquals(file + ": nothing was imported", problems.get(21));
        assertEquals(before, dump(db));
    }
}
