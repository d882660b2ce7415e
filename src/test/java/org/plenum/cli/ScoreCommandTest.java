package org.plenum.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plenum.io.CsvImporter;
import org.plenum.io.ImportKind;
import org.plenum.io.Progress;
import org.plenum.store.Workspace;
import org.plenum.testing.TestWorkspace;

/**
 * {@code plenum score} end to end on a small invented workspace (sanity data, not a proof of any number):
 * 8 items in two groups, monthly actuals 2025-01..2025-12, stat and final forecasts in cycles
 * 2025-02..2025-08 at lags 0..2, and three meeting decisions made through {@code plenum decide}.
 *
 * <p>At lag 1 the cycles 2025-02..2025-08 target 2025-03..2025-09: 7 periods × 8 items = 56 pairs with an
 * actual and a naive placebo (A of 2025-01..2025-07). Item I08 has no final forecast for 2025-09, so
 * 55 pairs are scored and 1 is left out.
 */
class ScoreCommandTest {
    private static final String[] STEPS = {"naive", "stat", "meeting", "final"};

    @TempDir
    Path dir;
    Path db;

    @BeforeEach
    void workspace() throws Exception {
        db = dir.resolve("score.db");
        StringBuilder items = new StringBuilder("item,description,group,region,unit_value,channel\n");
        StringBuilder actuals = new StringBuilder("item,period,quantity\n");
        StringBuilder forecasts = new StringBuilder("item,period,cycle,step,quantity\n");
        for (int i = 1; i <= 8; i++) {
            String item = String.format("I%02d", i);
            int level = 50 + 10 * i;
            items.append(item).append(",Item ").append(i).append(',').append(i <= 4 ? "g1" : "g2").append(',')
                    .append(i % 2 == 0 ? "north" : "south").append(",2.5,").append(i <= 6 ? "retail" : "online")
                    .append('\n');
            for (int month = 1; month <= 12; month++) {
                actuals.append(item).append(',').append(month(month)).append(',')
                        .append(level + (month * 7 + i * 3) % 11 - 5).append('\n');
            }
            for (int cycle = 2; cycle <= 8; cycle++) {
                for (int lag = 0; lag <= 2; lag++) {
                    int period = cycle + lag;
                    int stat = level + (period * 5 + i) % 7 - 3;
                    int fin = stat + (i + period) % 3 - 1;
                    forecasts.append(item).append(',').append(month(period)).append(',').append(month(cycle))
                            .append(",stat,").append(stat).append('\n');
                    if (!(i == 8 && cycle == 8 && lag == 1)) {
                        forecasts.append(item).append(',').append(month(period)).append(',').append(month(cycle))
                                .append(",final,").append(fin).append('\n');
                    }
                }
            }
        }
        try (Workspace ws = Workspace.create(db, List.of("stat", "meeting", "final"), "meeting", TestWorkspace.TIMEOUT)) {
            CsvImporter importer = new CsvImporter(ws, Progress.NONE);
            importer.importFile(ImportKind.ITEMS, TestWorkspace.write(dir, "items.csv", items.toString()), false);
            importer.importFile(ImportKind.ACTUALS, TestWorkspace.write(dir, "actuals.csv", actuals.toString()), false);
            importer.importFile(ImportKind.FORECASTS, TestWorkspace.write(dir, "forecasts.csv", forecasts.toString()),
                    false);
        }
        decide("I01", "2025-05", "2025-06", "--qty", "90", "buyer confirmed a display order", "promotion");
        decide("I05", "2025-06", "2025-07", "--pct", "-10", "competitor back in stock", "competitor");
        decide("I06", "2025-04", "2025-05", "--keep", null, "no new information", "other");
    }

    private static String month(int m) {
        return String.format("2025-%02d", m);
    }

    private void decide(String item, String cycle, String period, String mode, String value, String reason,
            String tag) {
        List<String> args = new ArrayList<>(List.of("decide", "--db", db.toString(), item, "--cycle", cycle,
                "--period", period, mode));
        if (value != null) {
            args.add(value);
        }
        args.addAll(List.of("--reason", reason, "--tag", tag, "--minutes", "4"));
        CliRun run = CliRun.of(args.toArray(String[]::new));
        assertEquals(0, run.code(), run.err());
    }

    private CliRun score(String... extra) {
        List<String> args = new ArrayList<>(List.of("score", "--db", db.toString(), "--draws", "200"));
        args.addAll(List.of(extra));
        return CliRun.of(args.toArray(String[]::new));
    }

    @SuppressWarnings("unchecked")
    private static Map<String, Object> object(Object o) {
        return (Map<String, Object>) assertInstanceOf(Map.class, o);
    }

    @SuppressWarnings("unchecked")
    private static List<Object> array(Object o) {
        return (List<Object>) assertInstanceOf(List.class, o);
    }

    private Map<String, Object> json(String... extra) {
        List<String> args = new ArrayList<>(List.of("--format", "json"));
        args.addAll(List.of(extra));
        CliRun run = score(args.toArray(String[]::new));
        assertEquals(0, run.code(), run.err());
        String text = run.out().strip();
        assertEquals(1, text.lines().count(), "one JSON object on one line: " + text);
        return object(MiniJson.parse(text));
    }

    @Test
    void jsonPrintsTheContractsKeysForEveryStep() {
        Map<String, Object> root = json("--lag", "1");
        assertEquals(1.0, root.get("lag"));
        assertEquals("naive", root.get("placebo"));
        // Pair arithmetic in the class comment: 56 with an actual and a placebo, I08 2025-09 misses final.
        assertEquals(55.0, root.get("pairs"));
        assertEquals(1.0, root.get("left_out"));
        List<Object> steps = array(root.get("steps"));
        assertEquals(STEPS.length, steps.size());
        for (int s = 0; s < steps.size(); s++) {
            Map<String, Object> step = object(steps.get(s));
            assertEquals(STEPS[s], step.get("step"), "the placebo first, then the workspace's steps in order");
            assertEquals(55.0, step.get("n"));
            for (String key : List.of("mae", "wape", "accuracy", "bias")) {
                assertInstanceOf(Double.class, step.get(key), STEPS[s] + "." + key + " in " + step);
            }
            // Fractions, not percent: 1 − WAPE.
            assertEquals(1 - (Double) step.get("wape"), (Double) step.get("accuracy"), 1e-9);
            if (s == 0) {
                assertFalse(step.containsKey("fva_vs_prev"), step.toString());
            } else {
                for (String key : List.of("fva_vs_prev", "fva_vs_placebo", "avg_rel_mae_vs_prev", "p_value")) {
                    assertTrue(step.containsKey(key), STEPS[s] + " lacks " + key + ": " + step);
                }
                assertInstanceOf(Double.class, step.get("fva_vs_prev"));
                assertInstanceOf(String.class, step.get("evidence"));
            }
        }
    }

    @Test
    void jsonFvaIsTheDifferenceOfTheAccuracies() {
        List<Object> steps = array(json().get("steps"));
        for (int s = 1; s < steps.size(); s++) {
            Map<String, Object> step = object(steps.get(s));
            double accuracy = (Double) step.get("accuracy");
            double previous = (Double) object(steps.get(s - 1)).get("accuracy");
            double placebo = (Double) object(steps.get(0)).get("accuracy");
            // Printed with 10 significant digits, so compare at 1e-9.
            assertEquals(accuracy - previous, (Double) step.get("fva_vs_prev"), 1e-9, step.toString());
            assertEquals(accuracy - placebo, (Double) step.get("fva_vs_placebo"), 1e-9, step.toString());
        }
    }

    @Test
    void seasonalPlaceboIsNamedSeasonalNaive() throws Exception {
        // A seasonal naive at lag 1 needs the actual 12 months before the target; 2025 alone has none, so add 2024.
        StringBuilder actuals = new StringBuilder("item,period,quantity\n");
        for (int i = 1; i <= 8; i++) {
            for (int month = 1; month <= 12; month++) {
                actuals.append(String.format("I%02d,2024-%02d,%d%n", i, month, 40 + 10 * i + month % 5));
            }
        }
        try (Workspace ws = Workspace.open(db, TestWorkspace.TIMEOUT)) {
            new CsvImporter(ws, Progress.NONE).importFile(ImportKind.ACTUALS,
                    TestWorkspace.write(dir, "actuals2024.csv", actuals.toString()), false);
        }
        Map<String, Object> root = json("--placebo", "seasonal");
        List<Object> steps = array(root.get("steps"));
        assertEquals("seasonal_naive", object(steps.get(0)).get("step"));
        assertEquals("stat", object(steps.get(1)).get("step"));
        assertEquals(55.0, root.get("pairs"));
    }

    @Test
    void tableFitsEightyColumns() {
        CliRun run = score("--format", "table");
        assertEquals(0, run.code(), run.err());
        assertTrue(run.out().contains("meeting"), run.out());
        List<String> tooWide = run.out().lines().filter(l -> l.length() > 80).toList();
        assertTrue(tooWide.isEmpty(), "lines over 80 characters:\n" + String.join("\n", tooWide));
    }

    @Test
    void csvHasAHeaderAndOneRowPerStep() {
        CliRun run = score("--format", "csv");
        assertEquals(0, run.code(), run.err());
        List<String> lines = run.out().strip().lines().toList();
        assertEquals(1 + STEPS.length, lines.size(), run.out());
        List<String> header = List.of(lines.get(0).split(",", -1));
        assertTrue(header.containsAll(List.of("step", "n", "mae", "wape", "accuracy", "bias", "fva_vs_prev",
                "avg_rel_mae_vs_prev", "p_value")), lines.get(0));
        int stepColumn = header.indexOf("step");
        for (int s = 0; s < STEPS.length; s++) {
            String[] cells = lines.get(1 + s).split(",", -1);
            assertEquals(header.size(), cells.length, lines.get(1 + s));
            assertEquals(STEPS[s], cells[stepColumn]);
            assertEquals("55", cells[header.indexOf("n")]);
        }
    }

    @Test
    void unknownByFieldExitsOneNamingTheValidFields() {
        CliRun run = score("--by", "colour");
        assertEquals(1, run.code(), run.err());
        for (String field : List.of("group", "region", "item", "cycle", "author", "tag", "reason", "direction", "size",
                "channel")) {
            assertTrue(run.err().contains(field), "the message names " + field + ": " + run.err());
        }
        assertTrue(run.err().contains("colour"), run.err());
        assertFalse(run.err().contains("Exception"), run.err());
    }

    @Test
    void aLagWithoutDataExitsOneWithAClearMessage() {
        CliRun run = score("--lag", "40");
        assertEquals(1, run.code(), run.err());
        assertTrue(run.err().contains("no scored pairs at lag 40"), run.err());
        assertFalse(run.err().contains("Exception"), run.err());
        assertEquals("", run.out());
    }

    @Test
    void byGroupGivesOneBlockPerGroup() {
        // "by":{...} is left open by DESIGN §4; today it maps each --by field to its blocks, one per value.
        Map<String, Object> by = object(json("--by", "group").get("by"));
        assertEquals(List.of("group"), List.copyOf(by.keySet()));
        List<Object> groups = array(by.get("group"));
        assertEquals(List.of("g1", "g2"), groups.stream().map(g -> object(g).get("value")).toList());
        // g1 = I01..I04: 4 × 7 = 28 pairs; g2 = I05..I08: 28 − 1 (I08 2025-09) = 27.
        assertEquals(28.0, object(groups.get(0)).get("pairs"));
        assertEquals(27.0, object(groups.get(1)).get("pairs"));
        for (Object g : groups) {
            List<Object> steps = array(object(g).get("steps"));
            assertEquals(List.of(STEPS), steps.stream().map(st -> object(st).get("step")).toList());
        }
        CliRun table = score("--by", "group");
        assertEquals(0, table.code(), table.err());
        assertTrue(table.out().contains("group = g1: 28 pairs"), table.out());
        assertTrue(table.out().contains("group = g2: 27 pairs"), table.out());
        assertFalse(table.out().contains("group = g3"), table.out());
    }

    @Test
    void byGroupReportsEachGroupsOwnLeftOutPairs() {
        // DESIGN §5: the number left out is reported. The one pair left out (I08 2025-09, no final) is in g2.
        List<Object> groups = array(object(json("--by", "group").get("by")).get("group"));
        assertEquals(0.0, object(groups.get(0)).get("left_out"), "g1");
        assertEquals(1.0, object(groups.get(1)).get("left_out"), "g2");
    }

    @Test
    void lensCountsTheStandingDecisionsWithAnActual() {
        Map<String, Object> lens = object(json().get("lens"));
        assertEquals("meeting", lens.get("step"));
        List<Object> directions = array(lens.get("directions"));
        // Three decisions: I01 up (stat → 90), I05 down 10%, I06 kept.
        Map<String, Double> counts = new LinkedHashMap<>();
        directions.forEach(d -> counts.put((String) object(d).get("key"), (Double) object(d).get("n")));
        assertEquals(Map.of("down", 1.0, "kept", 1.0, "up", 1.0), counts);
        assertNotNull(lens.get("time"));
    }

    /** Just enough JSON to read the score contract: objects, arrays, strings, numbers, true/false/null. */
    static final class MiniJson {
        private final String s;
        private int i;

        private MiniJson(String s) {
            this.s = s;
        }

        static Object parse(String text) {
            MiniJson p = new MiniJson(text);
            Object v = p.value();
            p.space();
            if (p.i != text.length()) {
                throw new IllegalArgumentException("trailing text at " + p.i + ": " + text.substring(p.i));
            }
            return v;
        }

        private void space() {
            while (i < s.length() && Character.isWhitespace(s.charAt(i))) {
                i++;
            }
        }

        private void expect(char c) {
            space();
            if (i >= s.length() || s.charAt(i) != c) {
                throw new IllegalArgumentException("expected '" + c + "' at " + i + " in " + s);
            }
            i++;
        }

        private Object value() {
            space();
            char c = s.charAt(i);
            if (c == '{') {
                Map<String, Object> m = new LinkedHashMap<>();
                i++;
                space();
                if (s.charAt(i) == '}') {
                    i++;
                    return m;
                }
                do {
                    space();
                    String key = string();
                    expect(':');
                    if (m.put(key, value()) != null) {
                        throw new IllegalArgumentException("duplicate key " + key);
                    }
                    space();
                } while (s.charAt(i++) == ',');
                if (s.charAt(i - 1) != '}') {
                    throw new IllegalArgumentException("expected '}' at " + (i - 1));
                }
                return m;
            }
            if (c == '[') {
                List<Object> a = new ArrayList<>();
                i++;
                space();
                if (s.charAt(i) == ']') {
                    i++;
                    return a;
                }
                do {
                    a.add(value());
                    space();
                } while (s.charAt(i++) == ',');
                if (s.charAt(i - 1) != ']') {
                    throw new IllegalArgumentException("expected ']' at " + (i - 1));
                }
                return a;
            }
            if (c == '"') {
                return string();
            }
            for (String word : List.of("true", "false", "null")) {
                if (s.startsWith(word, i)) {
                    i += word.length();
                    return word.equals("null") ? null : Boolean.valueOf(word);
                }
            }
            int start = i;
            while (i < s.length() && "+-0123456789.eE".indexOf(s.charAt(i)) >= 0) {
                i++;
            }
            return Double.valueOf(s.substring(start, i));
        }

        private String string() {
            expect('"');
            StringBuilder b = new StringBuilder();
            while (s.charAt(i) != '"') {
                char c = s.charAt(i++);
                if (c == '\\') {
                    char e = s.charAt(i++);
                    switch (e) {
                        case 'n' -> b.append('\n');
                        case 't' -> b.append('\t');
                        case 'r' -> b.append('\r');
                        case 'u' -> {
                            b.append((char) Integer.parseInt(s.substring(i, i + 4), 16));
                            i += 4;
                        }
                        default -> b.append(e);
                    }
                } else {
                    b.append(c);
                }
            }
            i++;
            return b.toString();
        }
    }
}
