package org.plenum.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.util.Optional;
import java.util.SortedMap;
import java.util.TreeMap;
import org.plenum.core.Frequency;
import org.plenum.core.Period;
import org.plenum.core.Quantity;

/** What the item view of the meeting screen reads about one item. */
public final class ItemReads {
    private final Workspace workspace;

    public ItemReads(Workspace workspace) {
        this.workspace = workspace;
    }

    /**
     * An item's master data.
     *
     * @param group null when not given
     * @param region null when not given
     * @param unitValue money per unit, or null when not given
     */
    public record Item(String code, String description, String group, String region, Quantity unitValue) {}

    public Optional<Item> item(String code) {
        return workspace.read(c -> {
            try (PreparedStatement ps = c.prepareStatement("SELECT item, description, item_group, region, unit_value"
                    + " FROM items WHERE item = ?")) {
                ps.setString(1, code);
                try (ResultSet rs = ps.executeQuery()) {
                    if (!rs.next()) {
                        return Optional.empty();
                    }
                    long value = rs.getLong(5);
                    Quantity unitValue = rs.wasNull() ? null : new Quantity(value);
                    return Optional.of(new Item(rs.getString(1), rs.getString(2), rs.getString(3), rs.getString(4),
                            unitValue));
                }
            }
        });
    }

    /** Every actual of the item, by period. */
    public SortedMap<Period, Quantity> actuals(String code) {
        Frequency frequency = workspace.frequency();
        return workspace.read(c -> {
            SortedMap<Period, Quantity> out = new TreeMap<>();
            try (PreparedStatement ps = c.prepareStatement("SELECT a.period, a.quantity FROM actuals a JOIN items i"
                    + " ON i.id = a.item_id WHERE i.item = ? ORDER BY a.period")) {
                ps.setString(1, code);
                try (ResultSet rs = ps.executeQuery()) {
                    while (rs.next()) {
                        out.put(new Period(frequency, rs.getInt(1)), new Quantity(rs.getLong(2)));
                    }
                }
            }
            return out;
        });
    }

    /**
     * Every item's actuals over {@code count} periods from {@code first}, in units, NaN where
     * there is none: the sparklines of the agenda, read in one pass with one text row per item.
     */
    public java.util.Map<String, double[]> actualsWindow(Period first, int count) {
        return workspace.read(c -> {
            java.util.Map<String, double[]> out = new java.util.HashMap<>();
            try (PreparedStatement ps = c.prepareStatement("SELECT i.item, group_concat(a.period || ',' || a.quantity,"
                    + " ';') FROM actuals a JOIN items i ON i.id = a.item_id WHERE a.period >= ? AND a.period < ?"
                    + " GROUP BY a.item_id")) {
                ps.setInt(1, first.index());
                ps.setInt(2, first.index() + count);
                try (ResultSet rs = ps.executeQuery()) {
                    while (rs.next()) {
                        double[] values = new double[count];
                        java.util.Arrays.fill(values, Double.NaN);
                        for (String pair : rs.getString(2).split(";")) {
                            int comma = pair.indexOf(',');
                            values[Integer.parseInt(pair, 0, comma, 10) - first.index()] =
                                    Long.parseLong(pair, comma + 1, pair.length(), 10) / 1e6;
                        }
                        out.put(rs.getString(1), values);
                    }
                }
            }
            return out;
        });
    }

    /** The event tags of the item's target periods, by period. */
    public SortedMap<Period, java.util.List<String>> events(String code) {
        Frequency frequency = workspace.frequency();
        return workspace.read(c -> {
            SortedMap<Period, java.util.List<String>> out = new TreeMap<>();
            try (PreparedStatement ps = c.prepareStatement("SELECT e.period, e.tag FROM events e JOIN items i"
                    + " ON i.id = e.item_id WHERE i.item = ? ORDER BY e.period, e.tag")) {
                ps.setString(1, code);
                try (ResultSet rs = ps.executeQuery()) {
                    while (rs.next()) {
                        out.computeIfAbsent(new Period(frequency, rs.getInt(1)), k -> new java.util.ArrayList<>())
                                .add(rs.getString(2));
                    }
                }
            }
            return out;
        });
    }
}
