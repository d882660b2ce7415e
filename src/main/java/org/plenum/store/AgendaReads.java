package org.plenum.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.stream.Collectors;
import java.util.stream.IntStream;
import org.plenum.core.CycleSeries;
import org.plenum.core.ScoredChange;
import org.plenum.core.Series;

/**
 * What the agenda reads from a workspace: the statistical step's forecasts around a cycle, the
 * actuals before it, the human steps' past values, minutes and event tags. Periods and cycles are
 * {@code Period.index} values, quantities millionths.
 *
 * <p>Windowed reads walk the items table and seek into each item's key range ({@code CROSS JOIN}
 * fixes that loop order in SQLite), because the forecasts are keyed step, item, cycle: a condition
 * on the cycle alone would otherwise scan every forecast of the step.
 */
public final class AgendaReads {
    private final Workspace workspace;

    public AgendaReads(Workspace workspace) {
        this.workspace = workspace;
    }

    /** An item as the agenda shows it; {@code group} and {@code unitValueMicros} may be null. */
    public record ItemRow(int id, String code, String description, String group, Long unitValueMicros) {}

    /** An event tag on an item's period: imported, or a decision's tag. */
    public record TaggedPeriod(int item, int period, String tag) {}

    /** Minutes recorded on an item in one cycle, in millionths of a minute. */
    public record MinutesSpent(int item, int cycle, long minutesMicros) {}

    /** Every item, by id. */
    public List<ItemRow> items() {
        return workspace.read(c -> {
            List<ItemRow> out = new ArrayList<>();
            try (PreparedStatement ps = c.prepareStatement(
                    "SELECT id, item, description, item_group, unit_value FROM items ORDER BY id");
                    ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    long value = rs.getLong(5);
                    Long unitValue = rs.wasNull() ? null : value;
                    out.add(new ItemRow(rs.getInt(1), rs.getString(2), rs.getString(3), rs.getString(4), unitValue));
                }
            }
            return out;
        });
    }

    /**
     * One step's forecasts at the given lags issued in cycles {@code fromCycle..cycle}: all of
     * cycle {@code cycle}, and of the earlier cycles those whose target period lies before it.
     */
    public CycleSeries forecastsAround(int stepId, int fromCycle, int cycle, int[] lags) {
        // Item, cycle offset and lag packed into one integer: each row then costs the driver two
        // column reads instead of four, most of the time a read of two million rows takes.
        String sql = "SELECT (i.id << 20) | ((f.cycle - " + fromCycle + ") << 10) | (f.period - f.cycle), f.quantity"
                + window(stepId, fromCycle, cycle, lags) + " ORDER BY i.id, f.cycle, f.period";
        return workspace.read(c -> {
            CycleSeries.Builder b = new CycleSeries.Builder();
            try (PreparedStatement ps = c.prepareStatement(sql); ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    long key = rs.getLong(1);
                    int cycleOfRow = fromCycle + (int) ((key >> 10) & 1023);
                    b.add((int) (key >> 20), cycleOfRow, cycleOfRow + (int) (key & 1023), rs.getLong(2));
                }
            }
            return b.build();
        });
    }

    /**
     * The rows {@link #forecastsAround} reads, as one plain statement: for the benchmark's
     * reference, the sqlite3 shell merely reading them.
     */
    public static String forecastsAroundPlain(int stepId, int fromCycle, int cycle, int[] lags) {
        return "SELECT i.id, f.cycle, f.period, f.quantity" + window(stepId, fromCycle, cycle, lags);
    }

    /** Every value is an int, so it is written into the statement. */
    private static String window(int stepId, int fromCycle, int cycle, int[] lags) {
        if (cycle - fromCycle >= 1024 || IntStream.of(lags).anyMatch(l -> l < 0 || l >= 1024)) {
            throw new IllegalArgumentException("a window of at most 1023 cycles and lags below 1024 can be read");
        }
        return " FROM items i CROSS JOIN forecasts f ON f.step_id = " + stepId + " AND f.item_id = i.id AND f.cycle"
                + " BETWEEN " + fromCycle + " AND " + cycle + " WHERE f.period - f.cycle IN (" + list(lags) + ")"
                + " AND (f.period < " + cycle + " OR f.cycle = " + cycle + ")";
    }

    /** Actuals of periods {@code from..to}, every item. */
    public Series actualsBetween(int from, int to) {
        if (to - from >= 1 << 20) {
            throw new IllegalArgumentException("too long a window of actuals: " + from + ".." + to);
        }
        String sql = "SELECT (i.id << 20) | (a.period - " + from + "), a.quantity FROM items i CROSS JOIN actuals a"
                + " ON a.item_id = i.id AND a.period BETWEEN " + from + " AND " + to + " ORDER BY i.id, a.period";
        return workspace.read(c -> {
            Series.Builder b = new Series.Builder();
            try (PreparedStatement ps = c.prepareStatement(sql); ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    long key = rs.getLong(1);
                    b.add((int) (key >> 20), from + (int) (key & ((1 << 20) - 1)), rs.getLong(2));
                }
            }
            return b.build();
        });
    }

    /**
     * For a few items, one step's forecasts at the given lags issued before {@code beforeCycle}
     * whose target period lies before {@code cycle}: one key-range seek per item.
     */
    public CycleSeries forecastsBefore(int stepId, Collection<Integer> itemIds, int beforeCycle, int cycle,
            int[] lags) {
        String sql = "SELECT cycle, period, quantity FROM forecasts WHERE step_id = ? AND item_id = ? AND cycle < ?"
                + " AND period < ? AND period - cycle IN (" + list(lags) + ") ORDER BY cycle, period";
        return workspace.read(c -> {
            CycleSeries.Builder b = new CycleSeries.Builder();
            try (PreparedStatement ps = c.prepareStatement(sql)) {
                for (int item : sorted(itemIds)) {
                    bind(ps, stepId, item, beforeCycle, cycle);
                    try (ResultSet rs = ps.executeQuery()) {
                        while (rs.next()) {
                            b.add(item, rs.getInt(1), rs.getInt(2), rs.getLong(3));
                        }
                    }
                }
            }
            return b.build();
        });
    }

    /** For a few items, their actuals of periods before {@code beforePeriod}. */
    public Series actualsBefore(Collection<Integer> itemIds, int beforePeriod) {
        return workspace.read(c -> {
            Series.Builder b = new Series.Builder();
            try (PreparedStatement ps = c.prepareStatement(
                    "SELECT period, quantity FROM actuals WHERE item_id = ? AND period < ? ORDER BY period")) {
                for (int item : sorted(itemIds)) {
                    bind(ps, item, beforePeriod);
                    try (ResultSet rs = ps.executeQuery()) {
                        while (rs.next()) {
                            b.add(item, rs.getInt(1), rs.getLong(2));
                        }
                    }
                }
            }
            return b.build();
        });
    }

    /**
     * The values a human step gave in cycles before {@code cycle}, at the given lags, for target
     * periods before {@code cycle} that have an actual and a forecast of {@code statStepId}: as
     * changes with {@code prior} = the statistical forecast and {@code source} = the step's name.
     * For the ledger's step these are its standing decisions (kept ones included); for an imported
     * step, its forecasts.
     */
    public List<ScoredChange> humanValues(Step step, boolean ledger, int statStepId, int cycle, int[] lags) {
        String from = ledger
                ? "SELECT h.item_id, h.cycle, h.period, h.quantity, s.quantity, a.quantity FROM decisions h"
                : "SELECT h.item_id, h.cycle, h.period, h.quantity, s.quantity, a.quantity FROM forecasts h";
        // CROSS JOIN keeps the human step's rows as the outer loop, with key lookups into the others.
        String sql = from + " CROSS JOIN forecasts s ON s.step_id = ? AND s.item_id = h.item_id AND s.cycle = h.cycle"
                + " AND s.period = h.period CROSS JOIN actuals a ON a.item_id = h.item_id AND a.period = h.period"
                + " WHERE h.step_id = ? AND h.cycle < ? AND h.period < ? AND h.period - h.cycle IN (" + list(lags) + ")"
                + (ledger ? " AND NOT EXISTS (SELECT 1 FROM decisions n WHERE n.supersedes = h.id)" : "")
                // in key order, so that the lookups into forecasts and actuals walk their pages in order
                + " ORDER BY h.item_id, h.cycle, h.period";
        return workspace.read(c -> {
            List<ScoredChange> out = new ArrayList<>();
            try (PreparedStatement ps = c.prepareStatement(sql)) {
                bind(ps, statStepId, step.id(), cycle, cycle);
                try (ResultSet rs = ps.executeQuery()) {
                    while (rs.next()) {
                        out.add(new ScoredChange(step.name(), rs.getInt(1), rs.getInt(2), rs.getInt(3), rs.getLong(5),
                                rs.getLong(4), rs.getLong(6), false, null, null, null, null));
                    }
                }
            }
            return out;
        });
    }

    /** Minutes recorded per item and cycle before {@code cycle}, superseded decisions included: time spent is spent. */
    public List<MinutesSpent> minutesBefore(int cycle) {
        return workspace.read(c -> {
            List<MinutesSpent> out = new ArrayList<>();
            try (PreparedStatement ps = c.prepareStatement("SELECT item_id, cycle, sum(minutes) FROM decisions"
                    + " WHERE minutes IS NOT NULL AND cycle < ? GROUP BY item_id, cycle")) {
                bind(ps, cycle);
                try (ResultSet rs = ps.executeQuery()) {
                    while (rs.next()) {
                        out.add(new MinutesSpent(rs.getInt(1), rs.getInt(2), rs.getLong(3)));
                    }
                }
            }
            return out;
        });
    }

    /** Imported events on periods {@code from..to}. */
    public List<TaggedPeriod> eventsBetween(int from, int to) {
        return tagged("SELECT item_id, period, tag FROM events WHERE period BETWEEN ? AND ?", from, to);
    }

    /**
     * Tags of the standing decisions of {@code cycle} other than {@code excludedTag} (every
     * decision carries a tag; the catch-all one flags no event).
     */
    public List<TaggedPeriod> decisionTags(int cycle, String excludedTag) {
        return workspace.read(c -> {
            try (PreparedStatement ps = c.prepareStatement("SELECT d.item_id, d.period, d.tag FROM decisions d"
                    + " WHERE d.cycle = ? AND d.tag <> ? AND NOT EXISTS (SELECT 1 FROM decisions n"
                    + " WHERE n.supersedes = d.id)")) {
                ps.setInt(1, cycle);
                ps.setString(2, excludedTag);
                return taggedRows(ps);
            }
        });
    }

    /** Whether any step has a forecast issued in {@code cycle}: a slow scan, for error messages only. */
    public boolean anyForecastIn(int cycle) {
        return workspace.read(c -> {
            try (PreparedStatement ps = c.prepareStatement("SELECT EXISTS (SELECT 1 FROM forecasts WHERE cycle = ?)")) {
                bind(ps, cycle);
                try (ResultSet rs = ps.executeQuery()) {
                    return rs.next() && rs.getInt(1) == 1;
                }
            }
        });
    }

    private List<TaggedPeriod> tagged(String sql, int from, int to) {
        return workspace.read(c -> {
            try (PreparedStatement ps = c.prepareStatement(sql)) {
                bind(ps, from, to);
                return taggedRows(ps);
            }
        });
    }

    private static List<TaggedPeriod> taggedRows(PreparedStatement ps) throws SQLException {
        List<TaggedPeriod> out = new ArrayList<>();
        try (ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                out.add(new TaggedPeriod(rs.getInt(1), rs.getInt(2), rs.getString(3)));
            }
        }
        return out;
    }

    private static void bind(PreparedStatement ps, int... values) throws SQLException {
        for (int i = 0; i < values.length; i++) {
            ps.setInt(i + 1, values[i]);
        }
    }

    /** Lags are ints checked by the caller, so they can be written into the statement. */
    private static String list(int[] lags) {
        if (lags.length == 0) {
            throw new IllegalArgumentException("at least one lag is needed");
        }
        return IntStream.of(lags).mapToObj(Integer::toString).collect(Collectors.joining(","));
    }

    private static List<Integer> sorted(Collection<Integer> ids) {
        return ids.stream().sorted().toList();
    }
}
