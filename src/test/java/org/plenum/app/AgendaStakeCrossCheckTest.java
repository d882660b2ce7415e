package org.plenum.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plenum.agenda.AgendaRow;
import org.plenum.agenda.AgendaSettings;
import org.plenum.agenda.Stake;
import org.plenum.core.Period;
import org.plenum.io.CsvImporter;
import org.plenum.io.ImportKind;
import org.plenum.io.Progress;
import org.plenum.store.Workspace;
import org.plenum.testing.TestWorkspace;

/**
 * The stake's MAE as {@code plenum agenda} computes it (a window of recent cycles read by key
 * ranges, older rows only for items whose window is short) against a plain re-reading of DESIGN
 * §6 written here: every forecast and actual in maps, the six latest qualifying cycles found by
 * walking back one cycle at a time. Random gaps in actuals and forecasts, and items whose recent
 * cycles are all missing, exercise the windowing. Invented data: a check of the reading, not of
 * any published number.
 */
class AgendaStakeCrossCheckTest {
    private static final Period FIRST = Period.month(2023, 1);
    private static final int MONTHS = 36;
    private static final Period CYCLE = FIRST.plus(MONTHS - 1);
    private static final int[] LAGS = {1, 2, 3};

    @TempDir
    Path dir;

    private final Map<String, TreeMap<Integer, Long>> actuals = new HashMap<>();
    /** item → cycle → period → forecast (micros). */
    private final Map<String, TreeMap<Integer, TreeMap<Integer, Long>>> stat = new HashMap<>();

    @Test
    void stakesMatchAPlainReadingOfTheRule() throws Exception {
        Path db = generate(new SplittableRandom(4242));
        Agenda.Report report = Agenda.run(new Workspaces(Map.of()), db, CYCLE.toString(), LAGS,
                AgendaSettings.defaults());
        int checked = 0;
        int naive = 0;
        for (AgendaRow row : report.rows()) {
            double[] expected = expectedMae(row.code());
            Stake stake = row.stake();
            if (expected == null) {
                assertEquals(Stake.Basis.NONE, stake.basis(), row.code());
                continue;
            }
            assertEquals(expected[1] == 1 ? Stake.Basis.NAIVE : Stake.Basis.RECENT, stake.basis(), row.code());
            assertEquals(expected[0], stake.mae().getAsDouble(), 1e-9, row.code());
            int periods = stat.get(row.code()).getOrDefault(CYCLE.index(), new TreeMap<>()).size();
            assertEquals(periods, stake.periods(), row.code());
            naive += expected[1] == 1 ? 1 : 0;
            checked++;
        }
        assertTrue(checked > 100 && naive > 5, checked + " items checked, " + naive + " by the naive MAE");
    }

    /** {mae, 1 when naive} or null when neither exists. */
    private double[] expectedMae(String item) {
        TreeMap<Integer, Long> a = actuals.getOrDefault(item, new TreeMap<>());
        long sum = 0;
        int n = 0;
        int cycles = 0;
        for (int c = CYCLE.index() - 1; c >= FIRST.index() && cycles < 6; c--) {
            int before = n;
            for (Map.Entry<Integer, Long> f : stat.get(item).getOrDefault(c, new TreeMap<>()).entrySet()) {
                int period = f.getKey();
                if (period < CYCLE.index() && a.containsKey(period)) {
                    sum += Math.abs(a.get(period) - f.getValue());
                    n++;
                }
            }
            cycles += n > before ? 1 : 0;
        }
        if (n > 0) {
            return new double[] {sum / 1e6 / n, 0};
        }
        long diff = 0;
        int pairs = 0;
        for (Map.Entry<Integer, Long> e : a.headMap(CYCLE.index()).entrySet()) {
            Long previous = a.get(e.getKey() - 1);
            if (previous != null) {
                diff += Math.abs(e.getValue() - previous);
                pairs++;
            }
        }
        return pairs == 0 ? null : new double[] {diff / 1e6 / pairs, 1};
    }

    private Path generate(SplittableRandom random) throws Exception {
        StringBuilder items = new StringBuilder("item,description,group,unit_value\n");
        StringBuilder actualRows = new StringBuilder("item,period,quantity\n");
        StringBuilder forecastRows = new StringBuilder("item,period,cycle,step,quantity\n");
        for (int i = 0; i < 160; i++) {
            String item = String.format("X%03d", i);
            items.append(item).append(",x,g").append(i % 4).append(',').append(i % 3 == 0 ? "" : "1.5").append('\n');
            TreeMap<Integer, Long> a = new TreeMap<>();
            int firstActual = i % 7 == 0 ? MONTHS - 3 : random.nextInt(6);
            for (int m = firstActual; m < MONTHS; m++) {
                if (random.nextInt(100) < 15) {
                    continue;
                }
                long q = random.nextInt(50_000) * 1000L;
                a.put(FIRST.plus(m).index(), q);
                actualRows.append(item).append(',').append(FIRST.plus(m)).append(',').append(q / 1e6).append('\n');
            }
            actuals.put(item, a);
            TreeMap<Integer, TreeMap<Integer, Long>> f = new TreeMap<>();
            boolean recentGap = i % 5 == 0; // no forecasts in the twelve cycles before the ranked one
            boolean none = i % 11 == 0; // no past forecast at all: the naive fallback
            for (int c = 0; c < MONTHS; c++) {
                boolean ranked = c == MONTHS - 1;
                if (!ranked && (none || (recentGap && c >= MONTHS - 13))) {
                    continue;
                }
                for (int lag = 0; lag <= 4; lag++) {
                    if (random.nextInt(100) < 25 && !(ranked && lag == 1)) {
                        continue;
                    }
                    long q = random.nextInt(50_000) * 1000L;
                    Period cycle = FIRST.plus(c);
                    if (lag >= 1 && lag <= 3) {
                        f.computeIfAbsent(cycle.index(), k -> new TreeMap<>()).put(cycle.plus(lag).index(), q);
                    }
                    forecastRows.append(item).append(',').append(cycle.plus(lag)).append(',').append(cycle)
                            .append(",stat,").append(q / 1e6).append('\n');
                }
            }
            stat.put(item, f);
        }
        Path db = dir.resolve("cross.db");
        try (Workspace ws = Workspace.create(db, List.of("stat", "meeting", "final"), "meeting", TestWorkspace.TIMEOUT)) {
            CsvImporter importer = new CsvImporter(ws, Progress.NONE);
            importer.importFile(ImportKind.ITEMS, TestWorkspace.write(dir, "items.csv", items.toString()), false);
            importer.importFile(ImportKind.ACTUALS, TestWorkspace.write(dir, "actuals.csv", actualRows.toString()),
                    false);
            importer.importFile(ImportKind.FORECASTS, TestWorkspace.write(dir, "forecasts.csv",
                    forecastRows.toString()), false);
        }
        return db;
    }
}
