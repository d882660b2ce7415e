package org.plenum.tui;

import java.nio.file.Path;
import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import org.plenum.core.Period;
import org.plenum.core.Quantity;
import org.plenum.io.CsvImporter;
import org.plenum.io.ImportKind;
import org.plenum.io.Progress;
import org.plenum.store.DecisionDraft;
import org.plenum.store.Ledger;
import org.plenum.store.Workspace;
import org.plenum.testing.TestWorkspace;

/**
 * A small workspace for screen tests, built through the real import: eight items in two groups,
 * three years of monthly actuals, stat and final forecasts for every cycle at lags 0 to 3, and a
 * few past ledger decisions. The numbers follow simple formulas; screen tests check what is
 * shown and stored, not statistics.
 */
final class MeetingFixture {
    static final Period CYCLE = Period.month(2026, 12);
    static final List<String> ITEMS = List.of("A1", "A2", "A3", "A4", "B1", "B2", "B3", "B4");

    private MeetingFixture() {}

    static Path create(Path dir) throws Exception {
        Path db = dir.resolve("meet.db");
        StringBuilder items = new StringBuilder("item,description,group,region,unit_value\n");
        StringBuilder actuals = new StringBuilder("item,period,quantity\n");
        StringBuilder forecasts = new StringBuilder("item,period,cycle,step,quantity\n");
        for (int i = 0; i < ITEMS.size(); i++) {
            String item = ITEMS.get(i);
            items.append(item).append(",Item ").append(item).append(',').append(i < 4 ? "pans" : "pots")
                    .append(",north,").append(1 + i).append('\n');
            for (Period p = Period.month(2024, 1); p.compareTo(CYCLE) < 0; p = p.plus(1)) {
                actuals.append(item).append(',').append(p).append(',').append(demand(i, p)).append('\n');
            }
            for (Period c = Period.month(2025, 1); c.compareTo(CYCLE) <= 0; c = c.plus(1)) {
                for (int lag = 0; lag <= 3; lag++) {
                    Period p = c.plus(lag);
                    long stat = demand(i, p) + (lag + 1) * (i % 3 == 0 ? 9 : -7);
                    forecasts.append(item).append(',').append(p).append(',').append(c).append(",stat,").append(stat)
                            .append('\n');
                    if (c.compareTo(CYCLE) < 0) {
                        forecasts.append(item).append(',').append(p).append(',').append(c).append(",final,")
                                .append(stat + (i % 2 == 0 ? 3 : -2)).append('\n');
                    }
                }
            }
        }
        try (Workspace ws = Workspace.create(db, List.of("stat", "meeting", "final"), "meeting", TestWorkspace.TIMEOUT)) {
            CsvImporter importer = new CsvImporter(ws, Progress.NONE);
            importer.importFile(ImportKind.ITEMS, TestWorkspace.write(dir, "items.csv", items.toString()), false);
            importer.importFile(ImportKind.ACTUALS, TestWorkspace.write(dir, "actuals.csv", actuals.toString()), false);
            importer.importFile(ImportKind.FORECASTS, TestWorkspace.write(dir, "f.csv", forecasts.toString()), false);
            new Ledger(ws).append(pastDecisions(ws));
        }
        return db;
    }

    /** Demand with a season and a trend, different per item. */
    static long demand(int item, Period p) {
        return 100 + 20L * item + (p.index() % 12) * (3 + item) + (p.index() % 5) * 2;
    }

    private static List<DecisionDraft> pastDecisions(Workspace ws) {
        List<DecisionDraft> drafts = new ArrayList<>();
        Instant at = Instant.parse("2026-06-01T09:00:00Z");
        for (int i = 0; i < ITEMS.size(); i++) {
            for (Period c = Period.month(2026, 3); c.compareTo(Period.month(2026, 9)) < 0; c = c.plus(1)) {
                Period p = c.plus(1);
                Quantity prior = ws.stepValues(ITEMS.get(i), "stat", c).get(p);
                long change = i % 2 == 0 ? 12 : -10;
                drafts.add(new DecisionDraft(ITEMS.get(i), c, p, "meeting", prior,
                        new Quantity(Math.max(0, prior.micros() + change * 1_000_000)), false, "past review",
                        "other", "earlier", Quantity.ofUnits(2), at, null));
            }
        }
        return drafts;
    }

    /** A clock the test moves by hand. */
    static final class TestClock extends Clock {
        private Instant now = Instant.parse("2026-12-02T09:00:00Z");

        void advance(Duration d) {
            now = now.plus(d);
        }

        @Override
        public Instant instant() {
            return now;
        }

        @Override
        public java.time.ZoneId getZone() {
            return ZoneOffset.UTC;
        }

        @Override
        public Clock withZone(java.time.ZoneId zone) {
            return this;
        }
    }
}
