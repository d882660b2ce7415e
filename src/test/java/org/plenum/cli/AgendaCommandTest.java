package org.plenum.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.plenum.io.CsvImporter;
import org.plenum.io.ImportKind;
import org.plenum.io.Progress;
import org.plenum.store.Workspace;
import org.plenum.testing.TestWorkspace;

/**
 * {@code plenum agenda} on a small workspace whose ranking is worked out by hand (below). Cycle
 * 2026-06, lags 1-2: its target periods are 2026-07 (lag 1) and 2026-08 (lag 2); actuals are known
 * up to 2026-05.
 *
 * <pre>
 * Stake = recent MAE × target periods × unit value (1 when unknown):
 *   P1 (unit 2): cycle 2026-03 → 04: stat 110, A 100, |e| 10; → 05: 90, |e| 10;
 *                cycle 2026-04 → 05: 120, |e| 20 (→ 06 is the ranked cycle itself: not known yet,
 *                although the workspace already holds its actual).
 *                MAE 40/3 = 13.333; 2 periods → 13.333 × 2 × 2 = 53.333
 *   P2 (none):   cycle 2026-04 → 05: 130, |e| 30. MAE 30; 1 period (lag 1 only) → 30
 *   P3 (unit 1): no past forecast; naive MAE of 100, 104, 98, 98, 110 = (4 + 6 + 0 + 12)/4 = 5.5;
 *                2 periods → 11.   P6 is P3's twin: 11.
 *   P4 (unit 1): cycle 2026-04 → 05: 104, |e| 4. MAE 4; 2 periods → 8
 *
 * Changed pairs (the latest human step against stat), AvgRelMAE per item:
 *   P1: final 105 and 95 for stat 110 and 90: |e| 10 → 5 twice, r = 10/20 = 0.5, n = 2
 *   P2: meeting decision 130 → 110: |e| 30 → 10, r = 1/3, n = 1
 *   P4: final 104 → 116: |e| 4 → 16, r = 4, n = 1
 *   workspace: (2 ln 0.5 + ln 1/3 + ln 4)/4 = (−1.386294 − 1.098612 + 1.386294)/4 = −0.274653
 *              → r_ws = 0.759836; group g (P1, P2, P4) has the same r, shrunk: (4 ln r + 5 ln r_ws)/9 → 0.759836;
 *              group h (P3, P6) has no pairs → r_ws.
 *   P1: (2 ln 0.5 + 5 ln 0.759836)/7 = (−1.386294 − 1.373265)/7 = −0.394223 → r̂ = 0.674204, g = 0.325796
 *   P2: (ln 1/3 + 5 ln 0.759836)/6 = (−1.098612 − 1.373265)/6 = −0.411980 → r̂ = 0.662338, g = 0.337662
 *   P3, P6: r̂ = 0.759836, g = 0.240164
 *   P4: (ln 4 + 5 ln 0.759836)/6 = (1.386294 − 1.373265)/6 = 0.002172 → r̂ = 1.002174, g = −0.002174
 *
 * Priority = stake × max(g, 0.05) × 1.5 with an event tag in the window:
 *   P1 53.333 × 0.325796 = 17.375797;  P2 30 × 0.337662 = 10.129867;  P3 = P6 = 11 × 0.240164 = 2.641807;
 *   P4 8 × 0.05 × 1.5 = 0.6 (a promotion on 2026-07; P1's promotion on 2026-09 lies outside the window)
 * Order: P1, P2, P3, P6 (tie broken by item code), P4. P5 has stat forecasts, but none in 2026-06;
 * P7 only at lag 0: neither is a candidate.
 * Cut line with --budget 10: P1 3 min (default) → 3; P2 6 min (its one timed decision) → 9; P3 → 12: cut.
 * ABC by volume (P2 has no unit value), last 12 months: P3 510, P6 510, P1 200, P4 200, P2 100 of 1520;
 *   starts 0, 33.6%, 67.1%, 80.3%, 93.4% → A, A, A, B, B.
 * </pre>
 */
class AgendaCommandTest {
    @TempDir
    Path dir;
    Path db;

    @BeforeEach
    void workspace() throws Exception {
        db = dir.resolve("agenda.db");
        String items = "item,description,group,unit_value\nP1,\"=Pan, large\",g,2\nP2,Kettle,g,\nP3,Twine,h,1\n"
                + "P4,Shears,g,1\nP5,Gloves,g,1\nP6,Twine twin,h,1\nP7,Trowel,h,1\n";
        StringBuilder actuals = new StringBuilder("item,period,quantity\n"
                + "P1,2026-04,100\nP1,2026-05,100\nP1,2026-06,100\nP2,2026-05,100\nP4,2026-04,100\nP4,2026-05,100\n");
        for (String item : List.of("P3", "P6")) {
            int[] values = {100, 104, 98, 98, 110};
            for (int m = 1; m <= 5; m++) {
                actuals.append(item).append(",2026-0").append(m).append(',').append(values[m - 1]).append('\n');
            }
        }
        String forecasts = "item,period,cycle,step,quantity\n"
                + "P1,2026-04,2026-03,stat,110\nP1,2026-05,2026-03,stat,90\nP1,2026-05,2026-04,stat,120\n"
                + "P1,2026-06,2026-04,stat,500\nP1,2026-07,2026-06,stat,100\nP1,2026-08,2026-06,stat,100\n"
                + "P1,2026-04,2026-03,final,105\nP1,2026-05,2026-03,final,95\n"
                + "P2,2026-05,2026-04,stat,130\nP2,2026-07,2026-06,stat,100\n"
                + "P3,2026-07,2026-06,stat,100\nP3,2026-08,2026-06,stat,100\n"
                + "P4,2026-05,2026-04,stat,104\nP4,2026-05,2026-04,final,116\n"
                + "P4,2026-07,2026-06,stat,100\nP4,2026-08,2026-06,stat,100\n"
                + "P5,2026-06,2026-05,stat,100\nP5,2026-07,2026-06,final,100\n"
                + "P6,2026-07,2026-06,stat,100\nP6,2026-08,2026-06,stat,100\nP7,2026-06,2026-06,stat,100\n";
        String events = "item,period,tag\nP4,2026-07,promotion\nP1,2026-09,promotion\nP5,2026-07,holiday\n";
        try (Workspace ws = Workspace.create(db, List.of("stat", "meeting", "final"), "meeting", TestWorkspace.TIMEOUT)) {
            CsvImporter importer = new CsvImporter(ws, Progress.NONE);
            importer.importFile(ImportKind.ITEMS, TestWorkspace.write(dir, "items.csv", items), false);
            importer.importFile(ImportKind.ACTUALS, TestWorkspace.write(dir, "actuals.csv", actuals.toString()), false);
            importer.importFile(ImportKind.FORECASTS, TestWorkspace.write(dir, "forecasts.csv", forecasts), false);
            importer.importFile(ImportKind.EVENTS, TestWorkspace.write(dir, "events.csv", events), false);
        }
        CliRun decided = CliRun.of("decide", "--db", db.toString(), "P2", "--cycle", "2026-04", "--period", "2026-05",
                "--qty", "110", "--reason", "customer cut the order", "--tag", "customer information", "--minutes",
                "6");
        assertEquals(0, decided.code(), decided.err());
    }

    private CliRun agenda(String... extra) {
        List<String> args = new ArrayList<>(List.of("agenda", "--db", db.toString(), "--cycle", "2026-06"));
        args.addAll(List.of(extra));
        return CliRun.of(args.toArray(String[]::new));
    }

    private List<CSVRecord> csv(String... extra) throws Exception {
        List<String> args = new ArrayList<>(List.of(extra));
        args.addAll(List.of("--format", "csv"));
        CliRun run = agenda(args.toArray(String[]::new));
        assertEquals(0, run.code(), run.err());
        try (CSVParser p = CSVParser.builder().setReader(new StringReader(run.out()))
                .setFormat(CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get()).get()) {
            assertEquals(AgendaFormats.COLUMNS, p.getHeaderNames().subList(0, AgendaFormats.COLUMNS.size()),
                    "DESIGN §6's columns first, in order");
            return p.getRecords();
        }
    }

    @Test
    void ranksTheHandWorkedWorkspace() throws Exception {
        List<CSVRecord> rows = csv("--lags", "1-2", "--budget", "10");
        assertEquals(List.of("P1", "P2", "P3", "P6", "P4"), rows.stream().map(r -> r.get("item")).toList());
        double[][] expected = { // stake, track_record, gain, priority (worked in the class comment)
            {53.333333, 0.674204, 0.325796, 17.375797}, {30, 0.662338, 0.337662, 10.129867},
            {11, 0.759836, 0.240164, 2.641807}, {11, 0.759836, 0.240164, 2.641807}, {8, 1.002174, -0.002174, 0.6}};
        String[] columns = {"stake", "track_record", "gain", "priority"};
        for (int i = 0; i < rows.size(); i++) {
            assertEquals(Integer.toString(i + 1), rows.get(i).get("rank"));
            for (int c = 0; c < columns.length; c++) {
                assertEquals(expected[i][c], Double.parseDouble(rows.get(i).get(columns[c])), 5e-6,
                        rows.get(i).get("item") + " " + columns[c]);
            }
        }
        assertEquals(List.of("2", "1", "0", "0", "1"), rows.stream().map(r -> r.get("track_n")).toList());
        assertEquals(List.of("A", "B", "A", "A", "B"), rows.stream().map(r -> r.get("abc")).toList());
        assertEquals(List.of("X", "-", "X", "X", "X"), rows.stream().map(r -> r.get("xyz")).toList());
        assertEquals(List.of("", "", "", "", "promotion"), rows.stream().map(r -> r.get("tags")).toList());
        assertEquals(List.of("3", "6", "3", "3", "3"), rows.stream().map(r -> r.get("expected_minutes")
                .replaceFirst("\\.0$", "")).toList());
        assertEquals(List.of("true", "true", "false", "false", "false"), rows.stream().map(r -> r.get("above_cut"))
                .toList());
        assertEquals(List.of("recent", "recent", "naive", "naive", "recent"), rows.stream()
                .map(r -> r.get("stake_basis")).toList());
        assertTrue(rows.stream().noneMatch(r -> r.get("hands_off").equals("true")));
        assertEquals("'=Pan, large", rows.get(0).get("description"), "a text cell a spreadsheet would run is made inert");
    }

    @Test
    void theOrderIsTheSameEveryTime() {
        String first = agenda("--lags", "1-2", "--format", "csv").out();
        for (int i = 0; i < 3; i++) {
            assertEquals(first, agenda("--lags", "1-2", "--format", "csv").out());
        }
    }

    @Test
    void jsonCarriesTheContractsColumnsForEveryRow() {
        CliRun run = agenda("--lags", "1-2", "--format", "json", "--limit", "2");
        assertEquals(0, run.code(), run.err());
        Map<?, ?> root = assertInstanceOf(Map.class, ScoreCommandTest.MiniJson.parse(run.out().strip()));
        assertEquals("2026-06", root.get("cycle"));
        assertEquals(5.0, root.get("candidates"));
        List<?> rows = assertInstanceOf(List.class, root.get("rows"));
        assertEquals(2, rows.size(), "--limit 2");
        for (Object o : rows) {
            Map<?, ?> row = assertInstanceOf(Map.class, o);
            for (String column : AgendaFormats.COLUMNS) {
                assertTrue(row.containsKey(column), column + " in " + row);
            }
        }
        Map<?, ?> first = assertInstanceOf(Map.class, rows.get(0));
        assertEquals("P1", first.get("item"));
        assertEquals(17.375797, (Double) first.get("priority"), 5e-6);
        assertEquals(Boolean.FALSE, first.get("hands_off"));
        assertEquals(null, first.get("above_cut"), "no budget, no cut line");
    }

    @Test
    void theTableFitsEightyColumnsAndDrawsTheCut() {
        CliRun run = agenda("--lags", "1-2", "--budget", "10");
        assertEquals(0, run.code(), run.err());
        run.out().lines().forEach(line -> assertTrue(line.length() <= 80, line.length() + ": " + line));
        List<String> lines = run.out().lines().toList();
        int cut = lines.indexOf(lines.stream().filter(l -> l.startsWith("---- cut")).findFirst().orElseThrow());
        assertTrue(lines.get(cut - 1).contains("P2") && lines.get(cut + 1).contains("P3"), run.out());
    }

    @Test
    void defaultLagsAreOneToThree() throws Exception {
        // Lag 3 adds nothing here (no forecast of 2026-09 in the cycle), so the ranking holds.
        assertEquals(List.of("P1", "P2", "P3", "P6", "P4"), csv().stream().map(r -> r.get("item")).toList());
    }

    @Test
    void aCycleWithoutForecastsIsAClearUsageError() {
        CliRun run = CliRun.of("agenda", "--db", db.toString(), "--cycle", "2027-01");
        assertEquals(ExitCodes.USAGE, run.code());
        assertEquals("", run.out());
        assertTrue(run.err().contains("no forecasts were issued in cycle 2027-01"), run.err());
    }

    @Test
    void aCycleWithoutStatForecastsAtTheLagsSaysSo() {
        CliRun run = agenda("--lags", "5");
        assertEquals(ExitCodes.USAGE, run.code());
        assertTrue(run.err().contains("cycle 2026-06 has no stat forecasts at lags 5"), run.err());
    }

    @ParameterizedTest(name = "{0} {1}")
    @CsvSource({
        "--cycle, 2026-13, '--cycle: expected'",
        "--cycle, 2026-W05, '--cycle: expected a monthly period'",
        "--lags, 3-1, '--lags: expected a range like 1-3'",
        "--lags, one, '--lags: expected a range like 1-3'",
        "--lags, 1-2-3, '--lags: expected a range like 1-3'",
        "--limit, 0, '--limit: expected a whole number of rows, at least 1'",
        "--limit, x, '--limit'",
        "--budget, -5, '--budget: expected minutes greater than 0'",
        "--budget, soon, '--budget: expected minutes greater than 0'",
        "--event-factor, 0.5, '--event-factor: expected a factor of at least 1'",
        "--abc, '95,80', '--abc: expected two cumulative shares'",
        "--xyz, '1', '--xyz: expected two coefficients'"})
    void badOptionsAreUsageErrorsNamingTheOption(String option, String value, String message) {
        List<String> args = new ArrayList<>(List.of("agenda", "--db", db.toString()));
        if (!option.equals("--cycle")) {
            args.addAll(List.of("--cycle", "2026-06"));
        }
        args.addAll(List.of(option, value));
        CliRun run = CliRun.of(args.toArray(String[]::new));
        assertEquals(ExitCodes.USAGE, run.code(), run.err());
        assertTrue(run.err().contains(message), run.err());
        assertEquals("", run.out());
    }
}
