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
        return packed("actuals", "1 = 1");
    }

    /**
     * One step's forecasts at one lag (period − cycle), keyed by target period. For the ledger's
     * step: the standing decision where there is one, else the previous step's value.
     */
    public Series stepAtLag(String stepName, int lag) {
        Catalog catalog = workspace.processSteps();
        Step step = catalog.step(stepName).orElseThrow(() -> new IllegalArgumentException("unknown step " + stepName));
        if (!step.name().equals(catalog.ledgerStep())) {
            return packed("forecasts", "step_id = " + step.id() + " AND period - cycle = " + lag);
        }
        // The ledger step is never first and is the only step not imported, so its predecessor is imported.
        Step previous = catalog.previous(step).orElseThrow();
        return overlay(stepAtLag(previous.name(), lag), decidedAtLag(lag));
    }

    /** The ledger's standing decisions at one lag, keyed by target period. */
    public Series decidedAtLag(int lag) {
        Catalog catalog = workspace.processSteps();
        Step step = catalog.step(catalog.ledgerStep()).orElseThrow();
        return series("SELECT d.item_id, d.period, d.quantity FROM decisions d WHERE d.step_id = " + step.id()
                + " AND d.period - d.cycle = " + lag
                + " AND NOT EXISTS (SELECT 1 FROM decisions n WHERE n.supersedes = d.id) ORDER BY d.item_id, d.period");
    }

    /**
     * The previous step's values with the standing decisions put over them: one merge of two
     * sorted columns, instead of a correlated lookup for each of a million rows.
     */
    public static Series overlay(Series base, Series decided) {
        long[] quantities = base.quantities().clone();
        int d = 0;
        for (int i = 0; i < base.size() && d < decided.size(); i++) {
            while (d < decided.size() && compare(decided, d, base, i) < 0) {
                d++;
            }
            if (d < decided.size() && compare(decided, d, base, i) == 0) {
                quantities[i] = decided.quantities()[d++];
            }
        }
        return new Series(base.items(), base.periods(), quantities, base.size());
    }

    private static int compare(Series a, int i, Series b, int j) {
        int byItem = Integer.compare(a.items()[i], b.items()[j]);
        return byItem != 0 ? byItem : Integer.compare(a.periods()[i], b.periods()[j]);
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

    /**
     * Reads (period, quantity) of {@code table}'s rows matching {@code where}, one text row per
     * item built by SQLite's group_concat. A million values then cost forty thousand trips
     * through the driver instead of a million, which is most of the time a plain read takes.
     */
    private Series packed(String table, String where) {
        String sql = "SELECT item_id, group_concat(period || ',' || quantity, ';') FROM " + table + " WHERE " + where
                + " GROUP BY item_id ORDER BY item_id";
        return workspace.read(c -> {
            Series.Builder b = new Series.Builder();
            try (PreparedStatement ps = c.prepareStatement(sql); ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    PackedRows.parse(rs.getInt(1), rs.getBytes(2), b);
                }
            }
            return b.build();
        });
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
