package org.plenum.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.LinkedHashMap;
import java.util.Map;
import org.plenum.core.Frequency;
import org.plenum.core.Period;

/**
 * What a workspace holds, in counts.
 *
 * @param forecastsByStep forecast rows per step (the ledger's step counts standing decisions)
 * @param firstActual first period with an actual, or {@code null}
 * @param lastCycle latest cycle with forecasts, or {@code null}
 */
public record Summary(Frequency frequency, String ledgerStep, int items, int groups, int regions, int actuals, Period firstActual,
        Period lastActual, Map<String, Integer> forecastsByStep, Period firstCycle, Period lastCycle, int events,
        int decisions, int decidedCycles) {

    static Summary of(Connection c) throws SQLException {
        Frequency f = Meta.get(c, Meta.FREQUENCY).map(Frequency::ofWord).orElse(null);
        Map<String, Integer> byStep = new LinkedHashMap<>();
        try (PreparedStatement ps = c.prepareStatement("SELECT s.name, (SELECT count(*) FROM forecasts f"
                + " WHERE f.step_id = s.id) FROM steps s ORDER BY s.position"); ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                byStep.put(rs.getString(1), rs.getInt(2));
            }
        }
        return new Summary(f, Meta.get(c, Meta.LEDGER_STEP).orElse(""), count(c, "SELECT count(*) FROM items"),
                count(c, "SELECT count(DISTINCT item_group) FROM items"),
                count(c, "SELECT count(DISTINCT region) FROM items"), count(c, "SELECT count(*) FROM actuals"),
                period(c, f, "SELECT min(period) FROM actuals"), period(c, f, "SELECT max(period) FROM actuals"),
                byStep, period(c, f, "SELECT min(cycle) FROM forecasts"),
                period(c, f, "SELECT max(cycle) FROM forecasts"), count(c, "SELECT count(*) FROM events"),
                count(c, "SELECT count(*) FROM decisions"), count(c, "SELECT count(DISTINCT cycle) FROM decisions"));
    }

    private static int count(Connection c, String sql) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement(sql); ResultSet rs = ps.executeQuery()) {
            rs.next();
            return rs.getInt(1);
        }
    }

    private static Period period(Connection c, Frequency f, String sql) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement(sql); ResultSet rs = ps.executeQuery()) {
            rs.next();
            int index = rs.getInt(1);
            return rs.wasNull() || f == null ? null : new Period(f, index);
        }
    }
}
