package org.plenum.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.SortedMap;
import java.util.TreeMap;
import org.plenum.core.Frequency;
import org.plenum.core.Period;
import org.plenum.core.Quantity;

/** Reads one step's forecast of one item in one cycle, by target period. */
final class StepValues {
    private StepValues() {}

    static SortedMap<Period, Quantity> of(Connection c, Catalog catalog, String item, String stepName, Period cycle)
            throws SQLException {
        Step step = catalog.step(stepName).orElseThrow(() -> new IllegalArgumentException("unknown step " + stepName));
        if (!step.name().equals(catalog.ledgerStep())) {
            return imported(c, catalog.frequency(), item, step, cycle);
        }
        SortedMap<Period, Quantity> values = catalog.previous(step)
                .map(p -> {
                    try {
                        return of(c, catalog, item, p.name(), cycle);
                    } catch (SQLException e) {
                        throw new StoreException(e.getMessage(), e);
                    }
                })
                .orElseGet(TreeMap::new);
        values.putAll(decided(c, catalog.frequency(), item, step, cycle));
        return values;
    }

    private static SortedMap<Period, Quantity> imported(Connection c, Frequency f, String item, Step step, Period cycle)
            throws SQLException {
        return query(c, f, "SELECT f.period, f.quantity FROM forecasts f JOIN items i ON i.id = f.item_id"
                + " WHERE i.item = ? AND f.step_id = ? AND f.cycle = ?", item, step, cycle);
    }

    /** The standing decision of each period: the newest one, which nothing supersedes. */
    private static SortedMap<Period, Quantity> decided(Connection c, Frequency f, String item, Step step, Period cycle)
            throws SQLException {
        return query(c, f, "SELECT d.period, d.quantity FROM decisions d JOIN items i ON i.id = d.item_id"
                + " WHERE i.item = ? AND d.step_id = ? AND d.cycle = ?"
                + " AND NOT EXISTS (SELECT 1 FROM decisions n WHERE n.supersedes = d.id)", item, step, cycle);
    }

    private static SortedMap<Period, Quantity> query(Connection c, Frequency f, String sql, String item, Step step,
            Period cycle) throws SQLException {
        SortedMap<Period, Quantity> values = new TreeMap<>();
        try (PreparedStatement ps = c.prepareStatement(sql)) {
            ps.setString(1, item);
            ps.setInt(2, step.id());
            ps.setInt(3, cycle.index());
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    values.put(new Period(f, rs.getInt(1)), new Quantity(rs.getLong(2)));
                }
            }
        }
        return values;
    }
}
