package org.plenum.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/** Queries behind {@link Catalog}. */
final class Catalogs {
    private Catalogs() {}

    /** The catalog, with item ids and tags only when {@code full}. */
    static Catalog of(Connection c, boolean full) throws SQLException {
        return new Catalog(Meta.get(c, Meta.FREQUENCY).map(org.plenum.core.Frequency::ofWord).orElse(null), steps(c),
                Meta.get(c, Meta.LEDGER_STEP).orElseThrow(), full ? itemIds(c) : Map.of(), full ? tags(c) : Set.of());
    }

    static Map<String, Integer> itemIds(Connection c) throws SQLException {
        Map<String, Integer> ids = new HashMap<>();
        try (PreparedStatement ps = c.prepareStatement("SELECT item, id FROM items"); ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                ids.put(rs.getString(1), rs.getInt(2));
            }
        }
        return ids;
    }

    static List<Step> steps(Connection c) throws SQLException {
        List<Step> steps = new ArrayList<>();
        try (PreparedStatement ps = c.prepareStatement("SELECT id, name, position FROM steps ORDER BY position");
                ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                steps.add(new Step(rs.getInt(1), rs.getString(2), rs.getInt(3)));
            }
        }
        return steps;
    }

    static Set<String> tags(Connection c) throws SQLException {
        Set<String> tags = new LinkedHashSet<>();
        try (PreparedStatement ps = c.prepareStatement("SELECT name FROM tags ORDER BY builtin DESC, rowid");
                ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                tags.add(rs.getString(1));
            }
        }
        return tags;
    }
}
