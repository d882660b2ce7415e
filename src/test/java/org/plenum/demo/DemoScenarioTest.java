package org.plenum.demo;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.YearMonth;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Pattern;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Checks the generated demo files: determinism, the file contract the rest of Plenum reads, and
 * (as a sanity check, not a proof) that the simulated review shows the behaviours it was built with.
 */
class DemoScenarioTest {

    private static final String[] FILES = {"items.csv", "actuals.csv", "forecasts.csv", "events.csv", "decisions.csv"};
    private static final Set<String> TAGS = Set.of("promotion", "price change", "new listing", "delisting",
            "holiday", "weather", "supply limit", "customer information", "competitor", "other");
    private static final Pattern QUANTITY = Pattern.compile("\\d+(\\.\\d{1,6})?");
    private static final Pattern MINUTES = Pattern.compile("\\d+(\\.\\d)?");
    private static final Pattern MONTH = Pattern.compile("\\d{4}-\\d{2}");

    @TempDir
    static Path first;
    @TempDir
    static Path second;

    private static Set<String> items;
    private static Map<String, Long> actuals;
    /** Key item|cycle|period|step. */
    private static Map<String, Long> forecasts;

    @BeforeAll
    static void generate() throws IOException {
        DemoScenario.writeTo(first);
        DemoScenario.writeTo(second);
        items = new HashSet<>();
        for (CSVRecord r : read(first, "items.csv")) {
            assertTrue(items.add(r.get("item")), "duplicate item " + r.get("item"));
        }
        actuals = keyed(first, "actuals.csv", "item", "period");
        forecasts = keyed(first, "forecasts.csv", "item", "cycle", "period", "step");
    }

    private static List<CSVRecord> read(Path dir, String name) throws IOException {
        CSVFormat format = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get();
        try (Reader reader = Files.newBufferedReader(dir.resolve(name), StandardCharsets.UTF_8);
             CSVParser parser = CSVParser.builder().setReader(reader).setFormat(format).get()) {
            return parser.getRecords();
        }
    }

    /** Quantity by key; fails on a repeated key or a malformed quantity. */
    private static Map<String, Long> keyed(Path dir, String name, String... key) throws IOException {
        Map<String, Long> out = new HashMap<>();
        for (CSVRecord r : read(dir, name)) {
            String quantity = r.get("quantity");
            assertTrue(QUANTITY.matcher(quantity).matches(), name + " quantity " + quantity);
            assertTrue(items.contains(r.get("item")), name + " unknown item " + r.get("item"));
            assertEquals(null, out.put(key(r, key), Long.parseLong(quantity)), name + " duplicate " + key(r, key));
        }
        return out;
    }

    private static String key(CSVRecord r, String... columns) {
        StringBuilder out = new StringBuilder();
        for (String c : columns) {
            out.append(r.get(c)).append('|');
        }
        return out.toString();
    }

    @Test
    void twoRunsWriteByteIdenticalFiles() throws IOException {
        for (String name : FILES) {
            assertArrayEquals(Files.readAllBytes(first.resolve(name)), Files.readAllBytes(second.resolve(name)), name);
        }
    }

    @Test
    void shippedDemoDataIsWhatTheGeneratorWrites() throws IOException {
        Path shipped = Path.of("demo-data");
        assumeTrue(Files.isDirectory(shipped), "no demo-data directory in " + Path.of("").toAbsolutePath());
        for (String name : FILES) {
            assertArrayEquals(Files.readAllBytes(first.resolve(name)), Files.readAllBytes(shipped.resolve(name)),
                    name + " is stale: run DemoScenario to regenerate demo-data");
        }
    }

    @Test
    void filesHaveTheAgreedHeadersAndLineEnds() throws IOException {
        String[] headers = {
            "item,description,group,region,unit_value,channel", "item,period,quantity",
            "item,period,cycle,step,quantity", "item,period,tag,note",
            "item,cycle,period,action,quantity,reason,tag,author,minutes,recorded_at",
        };
        for (int i = 0; i < FILES.length; i++) {
            String text = Files.readString(first.resolve(FILES[i]), StandardCharsets.UTF_8);
            assertTrue(text.startsWith(headers[i] + "\n"), FILES[i]);
            assertFalse(text.contains("\r"), FILES[i] + " has CR line ends");
            assertTrue(text.endsWith("\n"), FILES[i]);
        }
    }

    @Test
    void catalogueHasGroupsRegionsChannelsAndMostlyValues() throws IOException {
        List<CSVRecord> rows = read(first, "items.csv");
        assertEquals(300, rows.size());
        Set<String> groups = new HashSet<>();
        Set<String> regions = new HashSet<>();
        int blank = 0;
        for (CSVRecord r : rows) {
            assertTrue(r.get("item").matches("KG-\\d{4}"), r.get("item"));
            assertTrue(Set.of("retail", "wholesale", "online").contains(r.get("channel")));
            groups.add(r.get("group"));
            regions.add(r.get("region"));
            blank += r.get("unit_value").isEmpty() ? 1 : 0;
            assertTrue(r.get("unit_value").isEmpty() || r.get("unit_value").matches("\\d+\\.\\d{2}"));
        }
        assertTrue(groups.size() >= 5 && groups.size() <= 8, groups.toString());
        assertEquals(3, regions.size());
        assertTrue(blank > 0 && blank < 30, "blank unit values " + blank);
    }

    @Test
    void everyItemHas48MonthsOfActualsAndAboutATenthAreIntermittent() {
        assertEquals(300 * 48, actuals.size());
        int intermittent = 0;
        for (String item : items) {
            int zeros = 0;
            for (int t = 0; t < 48; t++) {
                Long q = actuals.get(item + "|" + YearMonth.of(2022, 12).plusMonths(t) + "|");
                assertTrue(q != null, item + " month " + t);
                zeros += q == 0 ? 1 : 0;
            }
            intermittent += zeros >= 24 ? 1 : 0;
        }
        assertTrue(intermittent >= 15 && intermittent <= 60, "intermittent items " + intermittent);
    }

    @Test
    void statCoversCycles2025To2026DecemberAndFinalStopsBeforeTheUpcomingCycle() {
        for (String item : items) {
            for (int c = 0; c < 24; c++) {
                YearMonth cycle = YearMonth.of(2025, 1).plusMonths(c);
                for (int lag = 0; lag < 6; lag++) {
                    String key = item + "|" + cycle + "|" + cycle.plusMonths(lag) + "|";
                    assertTrue(forecasts.containsKey(key + "stat|"), key);
                    assertEquals(c < 23, forecasts.containsKey(key + "final|"), key);
                }
            }
        }
        assertEquals(300 * 24 * 6 + 300 * 23 * 6, forecasts.size());
    }

    @Test
    void eventsUseTheVocabularyAndReachIntoTheUpcomingWindow() throws IOException {
        Set<String> keys = new HashSet<>();
        int upcoming = 0;
        for (CSVRecord r : read(first, "events.csv")) {
            assertTrue(TAGS.contains(r.get("tag")), r.get("tag"));
            assertTrue(items.contains(r.get("item")));
            assertTrue(MONTH.matcher(r.get("period")).matches());
            assertTrue(keys.add(key(r, "item", "period", "tag")), "duplicate event " + key(r, "item", "period", "tag"));
            String p = r.get("period");
            upcoming += p.compareTo("2026-12") >= 0 && p.compareTo("2027-05") <= 0 ? 1 : 0;
            assertTrue(p.compareTo("2027-05") <= 0, p);
        }
        assertTrue(upcoming >= 20, "events in the upcoming window " + upcoming);
    }

    @Test
    void ledgerRowsMatchTheForecastsTheyDecided() throws IOException {
        Set<String> keys = new HashSet<>();
        for (CSVRecord r : read(first, "decisions.csv")) {
            String key = key(r, "item", "cycle", "period");
            assertTrue(keys.add(key), "duplicate decision " + key);
            assertTrue(r.get("cycle").compareTo("2026-06") >= 0 && r.get("cycle").compareTo("2026-11") <= 0, key);
            Long stat = forecasts.get(key + "stat|");
            Long fin = forecasts.get(key + "final|");
            assertTrue(stat != null && fin != null, "no forecast for decision " + key);
            if (r.get("action").equals("adjust")) {
                assertEquals(fin, Long.parseLong(r.get("quantity")), key);
                assertTrue(!fin.equals(stat), "adjust without change " + key);
            } else {
                assertEquals("keep", r.get("action"));
                assertEquals("", r.get("quantity"));
                assertEquals(stat, fin, key);
            }
            checkDecisionFields(r, key);
        }
    }

    private static void checkDecisionFields(CSVRecord r, String key) {
        assertTrue(TAGS.contains(r.get("tag")), key);
        assertTrue(Set.of("amara", "jonas", "li", "priya").contains(r.get("author")), key);
        assertTrue(r.get("reason").split(" ").length >= 4, "reason too short " + key);
        assertTrue(MINUTES.matcher(r.get("minutes")).matches() && Double.parseDouble(r.get("minutes")) > 0, key);
        assertTrue(r.get("recorded_at").matches("\\d{4}-\\d{2}-\\d{2}T\\d{2}:\\d{2}:\\d{2}Z"), key);
        Instant at = Instant.parse(r.get("recorded_at"));
        assertEquals(YearMonth.parse(r.get("cycle")), YearMonth.from(at.atZone(ZoneOffset.UTC)), key);
    }

    @Test
    void everyAdjustedPeriodOfTheLedgerCyclesIsInTheLedger() throws IOException {
        Set<String> logged = new HashSet<>();
        for (CSVRecord r : read(first, "decisions.csv")) {
            logged.add(key(r, "item", "cycle", "period"));
        }
        forecasts.forEach((key, fin) -> {
            String[] k = key.split("\\|");
            boolean ledgerCycle = k[1].compareTo("2026-06") >= 0;
            String base = k[0] + "|" + k[1] + "|" + k[2] + "|";
            if (k[3].equals("final") && ledgerCycle && !fin.equals(forecasts.get(base + "stat|"))) {
                assertTrue(logged.contains(base), "adjusted but not logged " + base);
            }
        });
    }

    /** Per past (item, cycle): +1 raised, −1 lowered (including set to zero), 0 untouched. */
    private static Map<String, Integer> directions() {
        Map<String, Integer> out = new HashMap<>();
        forecasts.forEach((key, fin) -> {
            String[] k = key.split("\\|");
            if (k[3].equals("final")) {
                long stat = forecasts.get(k[0] + "|" + k[1] + "|" + k[2] + "|stat|");
                out.merge(k[0] + "|" + k[1], Long.signum(fin - stat), (a, b) -> a != 0 ? a : b);
            }
        });
        return out;
    }

    @Test
    void aboutAQuarterOfItemCyclesAreAdjustedMostlyUpwards() {
        Map<String, Integer> directions = directions();
        long up = directions.values().stream().filter(d -> d > 0).count();
        long down = directions.values().stream().filter(d -> d < 0).count();
        double share = (up + down) / (double) directions.size();
        assertTrue(share >= 0.20 && share <= 0.30, "adjusted share " + share);
        assertTrue(up > down, up + " up vs " + down + " down");
    }

    @Test
    void downwardAdjustmentsImproveMoreOftenThanUpwardOnes() {
        int[] better = new int[2];
        int[] total = new int[2];
        forecasts.forEach((key, fin) -> {
            String[] k = key.split("\\|");
            Long actual = actuals.get(k[0] + "|" + k[2] + "|");
            long stat = k[3].equals("final") ? forecasts.get(k[0] + "|" + k[1] + "|" + k[2] + "|stat|") : fin;
            if (actual == null || stat == fin) {
                return;
            }
            int side = fin > stat ? 0 : 1;
            total[side]++;
            better[side] += Math.abs(fin - actual) < Math.abs(stat - actual) ? 1 : 0;
        });
        double upRate = better[0] / (double) total[0];
        double downRate = better[1] / (double) total[1];
        assertTrue(downRate > upRate, "down " + downRate + " vs up " + upRate);
    }

    @Test
    void someForecastsAreSetToZeroAndManyChangesAreTiny() {
        int zeros = 0;
        int tiny = 0;
        int changed = 0;
        List<String> keys = new ArrayList<>(forecasts.keySet());
        for (String key : keys) {
            String[] k = key.split("\\|");
            if (!k[3].equals("final")) {
                continue;
            }
            long fin = forecasts.get(key);
            long stat = forecasts.get(k[0] + "|" + k[1] + "|" + k[2] + "|stat|");
            if (fin != stat) {
                changed++;
                zeros += fin == 0 ? 1 : 0;
                tiny += stat > 0 && Math.abs(fin - stat) < 0.05 * stat ? 1 : 0;
            }
        }
        assertTrue(zeros > 0 && zeros < 0.1 * changed, zeros + " zeros of " + changed);
        assertTrue(tiny > 0.2 * changed, tiny + " tiny of " + changed);
    }
}
