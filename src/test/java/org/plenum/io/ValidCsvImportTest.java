package org.plenum.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.plenum.io.ImportFixtures.cli;
import static org.plenum.io.ImportFixtures.dump;
import static org.plenum.io.ImportFixtures.emptyWorkspace;
import static org.plenum.io.ImportFixtures.fixture;
import static org.plenum.io.ImportFixtures.importFile;
import static org.plenum.io.ImportFixtures.query;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.temporal.IsoFields;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plenum.core.BadInputException;
import org.plenum.core.Frequency;
import org.plenum.core.Period;
import org.plenum.io.ImportFixtures.CliResult;
import org.plenum.io.ImportFixtures.Setup;
import org.plenum.store.Workspace;

/** Files that are right, in the forms people actually save them, land in the workspace as written. */
class ValidCsvImportTest {
    /** Forecasts with their step name, cycle and period as Period.index values, quantity in micros. */
    private static final String FORECASTS = "SELECT i.item, s.name, f.cycle, f.period, f.quantity FROM forecasts f"
            + " JOIN items i ON i.id = f.item_id JOIN steps s ON s.id = f.step_id ORDER BY 1, 2, 3, 4";

    @TempDir
    Path dir;

    private static int index(String period) {
        return Period.parse(period).index();
    }

    private static String forecast(String item, String step, String cycle, String period, long micros) {
        return item + "|" + step + "|" + index(cycle) + "|" + index(period) + "|" + micros;
    }

    /** The UTF-8 byte order mark EF BB BF (Unicode Standard, section 23.8) is not part of the first column name. */
    @Test
    void acceptsAUtf8ByteOrderMarkBeforeTheHeader() throws Exception {
        Path db = Setup.MONTHLY.create(dir);
        Path file = fixture("valid/items-bom.csv");
        assertEquals(0xEF, Files.readAllBytes(file)[0] & 0xFF);

        assertEquals(1, importFile(db, ImportKind.ITEMS, file, false).rows());

        assertEquals(List.of("P-600|Cr\u00e8me fra\u00eeche 200 ml|dairy"),
                query(db, "SELECT item, description, item_group FROM items WHERE item LIKE '%P-600%'"));
    }

    @Test
    void readsColumnsInAnyOrderWithNamesInAnyCaseAndSurroundingSpaces() throws Exception {
        Path db = Setup.MONTHLY.create(dir);

        assertEquals(2, importFile(db, ImportKind.FORECASTS, fixture("valid/forecasts-any-order.csv"), false).rows());

        assertEquals(List.of(forecast("P-300", "final", "2026-05", "2026-06", 11_000_000L),
                forecast("P-300", "stat", "2026-05", "2026-05", 10_500_000L)),
                query(db, FORECASTS).stream().filter(r -> r.startsWith("P-300|")).toList());
    }

    @Test
    void skipsBlankLinesBetweenAndAfterRecords() throws Exception {
        Path db = Setup.MONTHLY.create(dir);

        assertEquals(2, importFile(db, ImportKind.FORECASTS, fixture("valid/forecasts-blank-lines.csv"), false).rows());

        assertEquals(List.of(forecast("P-300", "stat", "2026-05", "2026-05", 10_000_000L),
                forecast("P-300", "stat", "2026-05", "2026-06", 11_000_000L)),
                query(db, FORECASTS).stream().filter(r -> r.startsWith("P-300|")).toList());
    }

    /** RFC 4180 section 2.6-2.7: a quoted field may hold commas, and a quote inside it is written twice. */
    @Test
    void readsQuotedDescriptionsWithCommasAndDoubledQuotes() throws Exception {
        Path db = Setup.MONTHLY.create(dir);

        importFile(db, ImportKind.ITEMS, fixture("valid/items-quoted-description.csv"), false);

        assertEquals(List.of("P-700|Tea, green \"sencha\", 20 bags|drinks", "P-701|\"Morning\" blend|drinks"),
                query(db, "SELECT item, description, item_group FROM items WHERE item >= 'P-7' ORDER BY item"));
    }

    @Test
    void acceptsSixDecimalPlacesExactly() throws Exception {
        Path db = Setup.MONTHLY.create(dir);
        Path file = dir.resolve("forecasts-six-decimals.csv");
        Files.writeString(file, "item,period,cycle,step,quantity\nP-300,2026-05,2026-05,stat,1.123456\n"
                + "P-300,2026-06,2026-05,stat,0.000001\nP-300,2026-07,2026-05,stat,999999999999.999999\n");

        importFile(db, ImportKind.FORECASTS, file, false);

        assertEquals(List.of(forecast("P-300", "stat", "2026-05", "2026-05", 1_123_456L),
                forecast("P-300", "stat", "2026-05", "2026-06", 1L),
                forecast("P-300", "stat", "2026-05", "2026-07", 999_999_999_999_999_999L)),
                query(db, FORECASTS).stream().filter(r -> r.startsWith("P-300|")).toList());
    }

    @Test
    void replaceOverwritesAHeldForecastWithTheExactNewValue() throws Exception {
        Path db = Setup.MONTHLY.create(dir);
        List<String> before = query(db, FORECASTS);
        String held = forecast("P-100", "stat", "2026-04", "2026-05", 127_250_000L);
        assertTrue(before.contains(held), before.toString());

        ImportResult result = importFile(db, ImportKind.FORECASTS, fixture("valid/forecasts-replace.csv"), true);

        assertEquals(2, result.rows());
        List<String> expected = new ArrayList<>(before);
        expected.set(expected.indexOf(held), forecast("P-100", "stat", "2026-04", "2026-05", 123_456_789L));
        expected.add(forecast("P-300", "stat", "2026-04", "2026-05", 1L));
        expected.sort(null);
        List<String> after = query(db, FORECASTS);
        assertEquals(expected, after.stream().sorted().toList());
    }

    @Test
    void replaceThroughTheCommandLineReportsTheRowsImported() throws Exception {
        Path db = Setup.MONTHLY.create(dir);
        Path file = fixture("valid/forecasts-replace.csv");

        CliResult refused = cli("import", "forecasts", file.toString(), "--db", db.toString());
        assertEquals(2, refused.code());
        assertTrue(refused.err().startsWith(file + ":2:1: expected an item, period, cycle and step not yet in the"
                + " workspace"), refused.err());

        CliResult run = cli("import", "forecasts", file.toString(), "--db", db.toString(), "--replace");
        assertEquals(0, run.code(), run.err());
        assertTrue(run.out().startsWith("imported 2 rows of forecasts from " + file + " in "), run.out());
        assertEquals("", run.err());
        assertTrue(query(db, FORECASTS).contains(forecast("P-100", "stat", "2026-04", "2026-05", 123_456_789L)));
    }

    @Test
    void replaceStillRefusesTheSameKeyTwiceInOneFile() throws Exception {
        Path db = Setup.MONTHLY.create(dir);
        List<String> before = dump(db);
        Path file = fixture("valid/forecasts-replace-duplicate.csv");

        BadInputException e = assertThrows(BadInputException.class,
                () -> importFile(db, ImportKind.FORECASTS, file, true));

        assertEquals(List.of(file + ":3:1: expected each item, period, cycle and step once per file, found \"it again"
                + " (first on line 2)\"", file + ": nothing was imported"), e.problems());
        assertEquals(before, dump(db));
    }

    @Test
    void storesFurtherItemColumnsAsAttributesUnderLowerCaseNames() throws Exception {
        Path db = Setup.MONTHLY.create(dir);

        importFile(db, ImportKind.ITEMS, fixture("valid/items-attributes.csv"), false);

        assertEquals(List.of("P-800|channel|retail", "P-800|pack_size|6", "P-800|shelf_life_days|365",
                "P-801|pack_size|12"),
                query(db, "SELECT i.item, a.name, a.value FROM item_attributes a JOIN items i ON i.id = a.item_id"
                        + " WHERE i.item >= 'P-8' ORDER BY 1, 2"));
    }

    @Test
    void theFirstFileWithPeriodsFixesTheFrequencyAndLaterFilesMustFollowIt() throws Exception {
        Path db = emptyWorkspace(dir);
        importFile(db, ImportKind.ITEMS, fixture("valid/items.csv"), false);
        assertNull(frequency(db), "items bring no periods");
        assertThrows(BadInputException.class,
                () -> importFile(db, ImportKind.ACTUALS, fixture("malformed/actuals-week-53-of-2025.csv"), false));
        assertNull(frequency(db), "a refused file fixes nothing");

        importFile(db, ImportKind.ACTUALS, fixture("valid/actuals-weekly-year-end.csv"), false);
        assertEquals(Frequency.WEEKLY, frequency(db));

        Path monthly = fixture("valid/forecasts-monthly.csv");
        BadInputException e = assertThrows(BadInputException.class,
                () -> importFile(db, ImportKind.FORECASTS, monthly, false));
        assertEquals(monthly + ":2:2: expected a weekly period ISO week YYYY-Www, like 2026-W09 as everywhere in this"
                + " workspace, found \"2027-01\"", e.problems().get(0));
        assertEquals(Frequency.WEEKLY, frequency(db));
    }

    /** ISO 8601 week numbering, with java.time's IsoFields as the independent reference: 2026 has 53 weeks. */
    @Test
    void importsAWeeklyFileWithWeek53IntoAnEmptyWorkspace() throws Exception {
        LocalDate monday53 = LocalDate.of(2026, 12, 28);
        assertEquals(53, monday53.get(IsoFields.WEEK_OF_WEEK_BASED_YEAR));
        assertEquals(2026, monday53.get(IsoFields.WEEK_BASED_YEAR));
        assertEquals(1, monday53.plusWeeks(1).get(IsoFields.WEEK_OF_WEEK_BASED_YEAR));
        Path db = emptyWorkspace(dir);
        importFile(db, ImportKind.ITEMS, fixture("valid/items.csv"), false);

        ImportResult result = importFile(db, ImportKind.ACTUALS, fixture("valid/actuals-weekly-year-end.csv"), false);

        assertEquals(3, result.rows());
        assertEquals(monday53, Period.parse("2026-W53").monday());
        int w53 = index("2026-W53");
        assertEquals(List.of((w53 - 1) + "|10000000", w53 + "|11000000", (w53 + 1) + "|12000000"),
                query(db, "SELECT period, quantity FROM actuals ORDER BY period"));
        try (Workspace ws = Workspace.open(db, ImportFixtures.TIMEOUT)) {
            assertEquals(Frequency.WEEKLY, ws.summary().frequency());
            assertEquals(3, ws.summary().actuals());
            assertEquals(Period.parse("2027-W01"), ws.summary().lastActual());
        }
    }

    private static Frequency frequency(Path db) {
        try (Workspace ws = Workspace.open(db, ImportFixtures.TIMEOUT)) {
            return ws.catalog().frequency();
        }
    }
}
