package org.plenum.store;

import java.sql.Connection;
import org.plenum.core.Series;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.Map;

/** What scoring reads from a workspace, as sorted columns (see {@link Series}). */
public final class ScoreReads {
    private final Workspace workspace;

    public ScoreReads(Workspace workspace) {
        this.workspace = workspace;
    }

    /** Every actual, by item and period. */
    public Series actuals() {
        return series("SELECT item_id, period, quantity FROM actuals ORDER BY item_id, period");
    }

    /**
     * One step's forecasts at one lag (period − cycle), keyed by target period. For the ledger's
     * step: the standing decision where there is one, else the previous step's value.
     */
    public Series stepAtLag(String stepName, int lag) {
        Catalog catalog = workspace.catalog();
        Step step = catalog.step(stepName).orElseThrow(() -> new IllegalArgumentException("unknown step " + stepName));
        if (!step.name().equals(catalog.ledgerStep())) {
            return series("SELECT item_id, period, quantity FROM forecasts WHERE step_id = " + step.id()
                    + " AND period - cycle = " + lag + " ORDER BY item_id, period");
        }
        // The ledger step is never first and is the only step not imported, so its predecessor is imported.
        Step previous = catalog.previous(step).orElseThrow();
        return series("SELECT f.item_id, f.period, coalesce((SELECT d.quantity FROM decisions d"
                + " WHERE d.item_id = f.item_id AND d.cycle = f.cycle AND d.period = f.period AND d.step_id = "
                + step.id() + " ORDER BY d.id DESC LIMIT 1), f.quantity) FROM forecasts f WHERE f.step_id = "
                + previous.id() + " AND f.period - f.cycle = " + lag + " ORDER BY f.item_id, f.period");
    }

    /** Item codes by id. */
    public Map<Integer, String> itemCodes() {
        Map<Integer, String> codes = new HashMap<>();
        workspace.catalog().items().forEach((code, id) -> codes.put(id, code));
        return codes;
    }

    /** One attribute of every item that has it: group, region, unit_value or a free attribute. */
    public Map<Integer, String> attribute(String name) {
        String sql = switch (name) {
            case "group" -> "SELECT id, item_group FROM items WHERE item_group IS NOT NULL";
            case "region" -> "SELECT id, region FROM items WHERE region IS NOT NULL";
            case "item" -> "SELECT id, item FROM items";
            default -> null;
        };
        return workspace.read(c -> sql == null ? freeAttribute(c, name) : pairs(c, sql));
    }

    /** Names of the free attributes any item carries. */
    public java.util.List<String> attributeNames() {
        return workspace.read(c -> {
            java.util.List<String> names = new java.util.ArrayList<>();
            try (PreparedStatement ps = c.prepareStatement("SELECT DISTINCT name FROM item_attributes ORDER BY name");
                    ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    names.add(rs.getString(1));
                }
            }
            return names;
        });
    }

    /** Money per unit by item id, in millionths, for the items that have one. */
    public Map<Integer, Long> unitValues() {
        return workspace.read(c -> {
            Map<Integer, Long> values = new HashMap<>();
            try (PreparedStatement ps = c.prepareStatement("SELECT id, unit_value FROM items WHERE unit_value IS NOT NULL");
                    ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    values.put(rs.getInt(1), rs.getLong(2));
                }
            }
            return values;
        });
    }

    private static Map<Integer, String> freeAttribute(Connection c, String name) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT item_id, value FROM item_attributes WHERE name = ?")) {
            ps.setString(1, name);
            Map<Integer, String> values = new LinkedHashMap<>();
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    values.put(rs.getInt(1), rs.getString(2));
                }
            }
            return values;
        }
    }

    private static Map<Integer, String> pairs(Connection c, String sql) throws SQLException {
        Map<Integer, String> values = new LinkedHashMap<>();
        try (PreparedStatement ps = c.prepareStatement(sql); ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                values.put(rs.getInt(1), rs.getString(2));
            }
        }
        return values;
    }

    private Series series(String sql) {
        return workspace.read(c -> {
            Series.Builder b = new Series.Builder();
            try (PreparedStatement ps = c.prepareStatement(sql); ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    b.add(rs.getInt(1), rs.getInt(2), rs.getLong(3));
                }
            }
            return b.build();
        });
    }
}
