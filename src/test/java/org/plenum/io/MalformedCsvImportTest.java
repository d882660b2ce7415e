package org.plenum.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.plenum.io.ImportFixtures.cli;
import static org.plenum.io.ImportFixtures.dump;
import static org.plenum.io.ImportFixtures.fixture;
import static org.plenum.io.ImportFixtures.importFile;
import static org.plenum.io.ImportFixtures.rowsOf;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.temporal.IsoFields;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;
import org.plenum.core.BadInputException;
import org.plenum.io.ImportFixtures.CliResult;
import org.plenum.io.ImportFixtures.Setup;

/**
 * Every malformed file under {@code malformed/} is refused with one problem at the right line and
 * column, through the importer and through {@code plenum import}, and leaves the workspace exactly
 * as it was.
 */
class MalformedCsvImportTest {
    @TempDir
    Path dir;

    /*
     * Columns: fixture | kind | workspace it is imported into | line | column | part of the message.
     * LINE is the physical line the record starts on; COLUMN the 1-based field, or for bytes that
     * are not UTF-8 the character in the line. Separators and quoting follow RFC 4180 (comma,
     * quotes doubled inside quoted fields, nothing after a closing quote); bytes follow the Unicode
     * Standard, table 3-7 (well-formed UTF-8 byte sequences); weeks follow ISO 8601.
     */
    @ParameterizedTest(name = "{0} -> {3}:{4}")
    @CsvSource(delimiter = '|', quoteCharacter = '\'', textBlock = """
        forecasts-missing-column.csv             | FORECASTS | MONTHLY    | 1 | 1  | expected the columns item, period, cycle, step, quantity, missing cycle
        forecasts-duplicate-column.csv           | FORECASTS | MONTHLY    | 1 | 6  | expected each column once, found "period" again
        forecasts-unknown-column.csv             | FORECASTS | MONTHLY    | 1 | 6  | expected only the columns item, period, cycle, step, quantity, found "note"
        forecasts-empty-column-name.csv          | FORECASTS | MONTHLY    | 1 | 3  | expected a column name, found an empty one
        items-reserved-attribute.csv             | ITEMS     | MONTHLY    | 1 | 3  | found "lag"
        items-attribute-with-space.csv           | ITEMS     | MONTHLY    | 1 | 3  | found "pack size"
        forecasts-semicolons.csv                 | FORECASTS | MONTHLY    | 1 | 1  | expected comma-separated columns, found ";" between the column names
        empty.csv                                | FORECASTS | MONTHLY    | 1 | 1  | expected a header row item,period,cycle,step,quantity, found an empty file
        forecasts-header-only.csv                | FORECASTS | MONTHLY    | 1 | 1  | expected at least one data row after the header, found none
        forecasts-decimal-comma.csv              | FORECASTS | MONTHLY    | 3 | 5  | expected a non-negative decimal number like 1250 or 12.5, found "12,5"
        actuals-not-a-number.csv                 | ACTUALS   | MONTHLY    | 3 | 3  | expected a non-negative decimal number like 1250 or 12.5, found "abc"
        forecasts-negative-quantity.csv          | FORECASTS | MONTHLY    | 2 | 5  | expected a non-negative quantity, found "-4"
        forecasts-seven-decimals.csv             | FORECASTS | MONTHLY    | 4 | 5  | expected at most 6 decimal places, found "1.1234567"
        forecasts-empty-quantity.csv             | FORECASTS | MONTHLY    | 2 | 5  | found an empty field
        items-negative-unit-value.csv            | ITEMS     | MONTHLY    | 2 | 3  | expected a non-negative quantity, found "-1.5"
        items-code-with-spaces.csv               | ITEMS     | MONTHLY    | 2 | 1  | expected an item code of at most 64 printable characters without surrounding spaces, found " P-500"
        forecasts-unknown-item.csv               | FORECASTS | MONTHLY    | 3 | 1  | expected an item of the workspace (import it in the items file first), found "P-999"
        forecasts-unknown-step.csv               | FORECASTS | MONTHLY    | 2 | 4  | expected one of the imported steps final, stat, found "consensus"
        forecasts-ledger-step.csv                | FORECASTS | MONTHLY    | 2 | 4  | (meeting comes from the decision ledger, not from files), found "meeting"
        forecasts-month-then-week.csv            | FORECASTS | NO_PERIODS | 3 | 2  | expected a monthly period YYYY-MM, like 2026-03 as earlier in this file, found "2026-W20"
        actuals-weekly-in-monthly-workspace.csv  | ACTUALS   | MONTHLY    | 2 | 2  | expected a monthly period YYYY-MM, like 2026-03 as everywhere in this workspace, found "2026-W10"
        forecasts-month-13.csv                   | FORECASTS | MONTHLY    | 2 | 2  | expected a month 01..12 in YYYY-MM, found "2026-13"
        actuals-week-53-of-2025.csv              | ACTUALS   | NO_PERIODS | 3 | 2  | expected a week 01..52 of 2025, found "2025-W53"
        forecasts-lag-negative.csv               | FORECASTS | MONTHLY    | 2 | 2  | expected a period at or after the cycle 2026-04 (lag 0 or more), found "2026-03"
        forecasts-duplicate-key.csv              | FORECASTS | MONTHLY    | 5 | 1  | expected each item, period, cycle and step once per file, found "it again (first on line 2)"
        actuals-duplicate-key.csv                | ACTUALS   | MONTHLY    | 4 | 1  | expected each item and period once per file, found "it again (first on line 2)"
        forecasts-key-in-workspace.csv           | FORECASTS | MONTHLY    | 3 | 1  | expected an item, period, cycle and step not yet in the workspace, found one it already holds (use --replace to overwrite it)
        forecasts-key-in-workspace-item-last.csv | FORECASTS | MONTHLY    | 2 | 5  | found one it already holds (use --replace to overwrite it)
        actuals-key-in-workspace.csv             | ACTUALS   | MONTHLY    | 2 | 1  | expected an item and period not yet in the workspace
        items-key-in-workspace.csv               | ITEMS     | MONTHLY    | 3 | 1  | expected an item not yet in the workspace
        events-unknown-tag.csv                   | EVENTS    | MONTHLY    | 3 | 3  | expected one of the workspace's tags promotion, price change, new listing, delisting, holiday, weather, supply limit, customer information, competitor, other (add one with: plenum tags add NAME), found "flash sale"
        forecasts-too-many-fields.csv            | FORECASTS | MONTHLY    | 3 | 6  | expected 5 fields as in the header, found 6
        forecasts-too-few-fields.csv             | FORECASTS | MONTHLY    | 2 | 5  | expected 5 fields as in the header, found 4
        forecasts-blank-lines-then-bad.csv       | FORECASTS | MONTHLY    | 5 | 5  | found "x"
        forecasts-unterminated-quote.csv         | FORECASTS | MONTHLY    | 3 | 1  | expected a closing quote for the field opened here, found the end of the file
        forecasts-text-after-closing-quote.csv   | FORECASTS | MONTHLY    | 2 | 1  | expected a comma or the end of the line after a closing quote, found more text
        forecasts-text-after-closing-quote-in-cycle.csv | FORECASTS | MONTHLY | 2 | 3 | expected a comma or the end of the line after a closing quote, found more text
        forecasts-header-text-after-closing-quote.csv | FORECASTS | MONTHLY | 1 | 1 | expected a comma or the end of the line after a closing quote, found more text
        items-latin1.csv                         | ITEMS     | MONTHLY    | 3 | 10 | expected UTF-8 text, found byte 0xE9
        items-byte-ff.csv                        | ITEMS     | MONTHLY    | 2 | 20 | expected UTF-8 text, found byte 0xFF
        items-overlong-utf8.csv                  | ITEMS     | MONTHLY    | 2 | 11 | expected UTF-8 text, found byte 0xC0
        items-truncated-utf8.csv                 | ITEMS     | MONTHLY    | 3 | 9  | expected UTF-8 text, found byte 0xC3 and then the end of the file
        """)
    void refusesTheFileAtItsLineAndColumnAndChangesNothing(String name, ImportKind kind, Setup setup, int line,
            int column, String fragment) throws Exception {
        Path db = setup.create(dir);
        List<String> before = dump(db);
        Path file = fixture("malformed/" + name);

        BadInputException e = assertThrows(BadInputException.class, () -> importFile(db, kind, file, false));
        assertEquals(2, e.problems().size(), "one problem and the closing line: " + e.problems());
        String problem = e.problems().get(0);
        assertTrue(problem.startsWith(file + ":" + line + ":" + column + ": expected "), problem);
        assertTrue(problem.contains(fragment), problem);
        assertEquals(file + ": nothing was imported", e.problems().get(1));
        assertEquals(before, dump(db));

        CliResult run = cli("import", kind.word(), file.toString(), "--db", db.toString());
        assertEquals(2, run.code(), run.err());
        assertEquals(e.problems(), run.errLines());
        assertEquals("", run.out());
        assertEquals(before, dump(db));
    }

    @Test
    void theWorkspacesOfTheCasesHoldRowsInEveryTableTheyCheck() throws Exception {
        List<String> monthly = dump(Setup.MONTHLY.create(dir.resolve("monthly")));
        for (String table : List.of("items", "item_attributes", "actuals", "forecasts", "events", "decisions",
                "meta", "steps", "tags")) {
            assertTrue(rowsOf(monthly, table) > 0, table);
        }
        assertTrue(monthly.contains("meta|String:frequency|String:monthly"), monthly.toString());
        List<String> noPeriods = dump(Setup.NO_PERIODS.create(dir.resolve("items-only")));
        assertEquals(3, rowsOf(noPeriods, "items"));
        assertTrue(noPeriods.stream().noneMatch(r -> r.startsWith("meta|String:frequency|")), noPeriods.toString());
    }

    /** The week cases lean on ISO 8601 week numbering; java.time's IsoFields is the independent reference. */
    @Test
    void isoWeekYearsOfTheFixturesHaveTheWeeksTheCasesAssume() {
        assertEquals(52, IsoFields.WEEK_OF_WEEK_BASED_YEAR.rangeRefinedBy(LocalDate.of(2025, 6, 1)).getMaximum());
        assertEquals(53, IsoFields.WEEK_OF_WEEK_BASED_YEAR.rangeRefinedBy(LocalDate.of(2026, 6, 1)).getMaximum());
    }

    /**
     * The byte cases must really hold bytes that are not UTF-8 (Unicode Standard, table 3-7, well-formed
     * UTF-8 byte sequences): a fixture re-saved as UTF-8 by an editor would otherwise pass for the
     * wrong reason.
     */
    @Test
    void theByteFixturesHoldTheBytesTheirCasesName() throws Exception {
        byte[] latin1 = Files.readAllBytes(fixture("malformed/items-latin1.csv"));
        String line3 = new String(latin1, StandardCharsets.ISO_8859_1).split("\n")[2];
        assertEquals("P-402,Caf\u00e9 cr\u00e8me beans 250 g,drinks", line3);
        assertEquals(10, line3.indexOf('\u00e9') + 1);
        assertEquals(2, count(latin1, (byte) 0xE9) + count(latin1, (byte) 0xE8));
        byte[] ff = Files.readAllBytes(fixture("malformed/items-byte-ff.csv"));
        assertEquals(1, count(ff, (byte) 0xFF));
        String line2 = new String(ff, StandardCharsets.UTF_8).split("\n")[1];
        assertEquals(20, line2.indexOf('\uFFFD') + 1, line2);
        byte[] overlong = Files.readAllBytes(fixture("malformed/items-overlong-utf8.csv"));
        assertEquals(1, count(overlong, (byte) 0xC0));
    }

    /**
     * A quoted description over lines 2-3 (RFC 4180 section 2.6 allows line breaks inside quotes),
     * then a record without an item code: the problem is on line 4, the physical line, with LF or
     * CRLF line ends (RFC 4180 section 2.1).
     */
    @ParameterizedTest
    @ValueSource(strings = {"items-multiline-then-bad.csv", "items-multiline-then-bad-crlf.csv"})
    void countsTheLinesInsideAQuotedFieldInTheLineOfALaterRecord(String name) throws Exception {
        Path db = Setup.MONTHLY.create(dir);
        List<String> before = dump(db);
        Path file = fixture("malformed/" + name);

        BadInputException e = assertThrows(BadInputException.class,
                () -> importFile(db, ImportKind.ITEMS, file, false));

        assertEquals(List.of(file + ":4:1: expected an item code, found an empty field",
                file + ": nothing was imported"), e.problems());
        assertEquals(before, dump(db));
    }

    /**
     * {@code 0026-W09} for {@code 2026-W09} is a one-key typo; it is a valid ISO week of year 26, so
     * the file is well-formed, but its weeks lie before the first week the store can key. That must
     * still come back as bad input at its line, not as an internal error.
     */
    @Test
    void refusesForecastWeeksBeforeTheStorableRangeAsBadInputAtTheirLine() throws Exception {
        Path db = Setup.NO_PERIODS.create(dir);
        List<String> before = dump(db);
        Path file = dir.resolve("forecasts-year-26.csv");
        Files.writeString(file, "item,period,cycle,step,quantity\nP-100,0026-W10,0026-W09,stat,5\n");

        BadInputException e = assertThrows(BadInputException.class,
                () -> importFile(db, ImportKind.FORECASTS, file, false));

        assertTrue(e.problems().get(0).startsWith(file + ":2:"), e.problems().toString());
        assertEquals(before, dump(db));
        CliResult run = cli("import", "forecasts", file.toString(), "--db", db.toString());
        assertEquals(2, run.code(), run.err());
    }

    @Test
    void refusesAMissingFileWithExitCodeTwo() throws Exception {
        Path db = Setup.MONTHLY.create(dir);
        List<String> before = dump(db);
        Path file = dir.resolve("no-such-forecasts.csv");

        CliResult run = cli("import", "forecasts", file.toString(), "--db", db.toString());

        assertEquals(2, run.code());
        assertEquals(List.of(file + ": no such file"), run.errLines());
        assertEquals(before, dump(db));
    }

    private static int count(byte[] bytes, byte b) {
        int n = 0;
        for (byte x : bytes) {
            n += x == b ? 1 : 0;
        }
        return n;
    }
}
