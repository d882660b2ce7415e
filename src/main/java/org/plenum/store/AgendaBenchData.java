package org.plenum.store;

import java.sql.PreparedStatement;
import java.sql.SQLException;
import java.sql.Statement;
import org.plenum.core.Frequency;

/**
 * Fills a new workspace with the agenda benchmark's invented data inside SQLite itself
 * ({@code INSERT … SELECT} over recursive counters), because writing and importing fourteen
 * million forecast rows as CSV would take longer than every timed run together. The values come
 * from integer hashes, so every run of the benchmark sees the same workspace. This bypasses the
 * import's checks: the data are generated valid, and are for timing only.
 *
 * <p>Layout: monthly; actuals of {@code months} periods from {@code firstPeriod}; {@code stat}
 * forecasts at lags 0–5 in the last {@code cycles} of those periods; ledger decisions at lags 1–3
 * in earlier cycles, with their minutes; a promotion for one item in fifty in the last cycle's
 * next period.
 */
public final class AgendaBenchData {
    private AgendaBenchData() {}

    /** What to generate. */
    public record Shape(int items, int firstPeriod, int months, int cycles, int maxLag, int decisions) {}

    public static void fill(Workspace ws, Shape s) {
        ws.write(c -> {
            Meta.put(c, Meta.FREQUENCY, Frequency.MONTHLY.word());
            int firstCycle = s.firstPeriod() + s.months() - s.cycles();
            int lastCycle = s.firstPeriod() + s.months() - 1;
            try (Statement st = c.createStatement()) {
                st.execute(counter("n", s.items()) + "INSERT INTO items(id, item, description, item_group, unit_value)"
                        + " SELECT i, printf('A-%06d', i), 'Bench item ' || i, 'G' || (i % 50),"
                        + " CASE WHEN i % 10 = 0 THEN NULL ELSE (1 + i % 40) * 1000000 END FROM n");
                st.execute(counter("n", s.items()) + ", m(k) AS (SELECT 0 UNION ALL SELECT k + 1 FROM m WHERE k < "
                        + (s.months() - 1) + ") INSERT INTO actuals(item_id, period, quantity) SELECT i, "
                        + s.firstPeriod() + " + k, " + demand("i", s.firstPeriod() + " + k") + " FROM n CROSS JOIN m");
                int stat = stepId(c, "stat");
                st.execute(counter("n", s.items()) + ", cy(c) AS (SELECT " + firstCycle + " UNION ALL SELECT c + 1 FROM cy"
                        + " WHERE c < " + lastCycle + "), lg(l) AS (SELECT 0 UNION ALL SELECT l + 1 FROM lg WHERE l < "
                        + s.maxLag() + ") INSERT INTO forecasts(item_id, step_id, cycle, period, quantity) SELECT i, "
                        + stat + ", c, c + l, max(0, " + demand("i", "c + l") + " + ((i * 31 + c * 17 + l * 7) % 41 - 20)"
                        + " * 1000000) FROM n CROSS JOIN cy CROSS JOIN lg");
                decisions(c, s, stat, stepId(c, "meeting"), lastCycle);
                st.execute("INSERT INTO events(item_id, period, tag, note) SELECT id, " + (lastCycle + 1)
                        + ", 'promotion', '' FROM items WHERE id % 50 = 0");
            }
            return null;
        });
    }

    /**
     * Decisions on stat forecasts at lags 1–3 of cycles before the last, one (item, cycle, lag) in
     * about every 137 (more than 50,000 for 100,000 items), up to the number asked for.
     */
    private static void decisions(java.sql.Connection c, Shape s, int stat, int meeting, int lastCycle)
            throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO decisions(id, batch, item_id, cycle, period,"
                + " step_id, prior, quantity, kept, reason, tag, author, minutes, recorded_at) SELECT row_number() OVER ()"
                + ", row_number() OVER (), f.item_id, f.cycle, f.period, ?, f.quantity,"
                + " f.quantity * (80 + (f.item_id * 13 + f.cycle) % 46) / 100, 0, 'bench decision',"
                + " CASE WHEN f.item_id % 3 = 0 THEN 'promotion' ELSE 'other' END, 'bench',"
                + " (2 + f.item_id % 5) * 1000000, '2026-01-05T09:00:00Z' FROM forecasts f WHERE f.step_id = ?"
                + " AND f.cycle < ? AND f.period - f.cycle BETWEEN 1 AND 3"
                + " AND (f.item_id * 131 + f.cycle * 7 + f.period) % 137 = 0 LIMIT ?")) {
            ps.setInt(1, meeting);
            ps.setInt(2, stat);
            ps.setInt(3, lastCycle);
            ps.setInt(4, s.decisions());
            ps.executeUpdate();
        }
    }

    /** A recursive counter {@code name(i)} from 1 to {@code to}. */
    private static String counter(String name, int to) {
        return "WITH RECURSIVE " + name + "(i) AS (SELECT 1 UNION ALL SELECT i + 1 FROM " + name + " WHERE i < " + to
                + ")";
    }

    /** Demand of an item in a period, millionths: a level per item, a season, a hashed wiggle. */
    private static String demand(String item, String period) {
        return "((100 + " + item + " % 400) + ((" + period + ") % 12) * 5 + ((" + item + " * 7919 + (" + period
                + ") * 104729) % 61)) * 1000000";
    }

    private static int stepId(java.sql.Connection c, String name) throws SQLException {
        return Catalogs.steps(c).stream().filter(st -> st.name().equals(name)).findFirst().orElseThrow().id();
    }
}
