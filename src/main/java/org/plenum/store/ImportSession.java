package org.plenum.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.plenum.core.Frequency;
import org.plenum.store.Rows.ActualRow;
import org.plenum.store.Rows.EventRow;
import org.plenum.store.Rows.ForecastRow;
import org.plenum.store.Rows.ItemRow;

/**
 * One file's import as one write transaction: rows go in batches through prepared statements,
 * and nothing is visible to others until {@link #commit()}. Closing without committing rolls
 * everything back, so a file with any bad row leaves the workspace unchanged.
 *
 * <p>Each insert method returns the lines of rows whose key was already in the workspace; with
 * {@code replace} those rows overwrite the stored value instead and nothing is returned.
 */
public final class ImportSession implements AutoCloseable {
    private final Workspace workspace;
    private final Connection c;
    private final boolean replace;
    private final List<PreparedStatement> statements = new ArrayList<>();
    private PreparedStatement items;
    private PreparedStatement attributes;
    private PreparedStatement actuals;
    private PreparedStatement forecasts;
    private PreparedStatement events;
    private boolean open;

    ImportSession(Workspace workspace, Connection c, boolean replace) throws SQLException {
        this.workspace = workspace;
        this.c = c;
        this.replace = replace;
        try (Statement st = c.createStatement()) {
            st.execute("BEGIN IMMEDIATE");
        }
        open = true;
    }

    public List<Integer> insertItems(List<ItemRow> rows) {
        return run(conn -> {
            if (items == null) {
                items = prepare("INSERT INTO items(item, description, item_group, region, unit_value) VALUES (?,?,?,?,?)"
                        + (replace ? " ON CONFLICT(item) DO UPDATE SET description = excluded.description,"
                                + " item_group = excluded.item_group, region = excluded.region,"
                                + " unit_value = excluded.unit_value" : " ON CONFLICT(item) DO NOTHING"));
                attributes = prepare("INSERT INTO item_attributes(item_id, name, value)"
                        + " VALUES ((SELECT id FROM items WHERE item = ?), ?, ?)"
                        + " ON CONFLICT(item_id, name) DO UPDATE SET value = excluded.value");
            }
            for (ItemRow r : rows) {
                items.setString(1, r.item());
                items.setString(2, r.description());
                items.setString(3, r.group());
                items.setString(4, r.region());
                setNullableLong(items, 5, r.unitValue());
                items.addBatch();
            }
            List<Integer> conflicts = conflicts(rows, items.executeBatch(), ItemRow::line);
            for (ItemRow r : rows) {
                for (Map.Entry<String, String> a : r.attributes().entrySet()) {
                    attributes.setString(1, r.item());
                    attributes.setString(2, a.getKey());
                    attributes.setString(3, a.getValue());
                    attributes.addBatch();
                }
            }
            attributes.executeBatch();
            return conflicts;
        });
    }

    public List<Integer> insertActuals(List<ActualRow> rows) {
        return run(conn -> {
            if (actuals == null) {
                actuals = prepare("INSERT INTO actuals(item_id, period, quantity) VALUES (?,?,?)"
                        + onConflict("item_id, period", "quantity = excluded.quantity"));
            }
            for (ActualRow r : rows) {
                actuals.setInt(1, r.itemId());
                actuals.setInt(2, r.period());
                actuals.setLong(3, r.quantity());
                actuals.addBatch();
            }
            return conflicts(rows, actuals.executeBatch(), ActualRow::line);
        });
    }

    public List<Integer> insertForecasts(List<ForecastRow> rows) {
        return run(conn -> {
            if (forecasts == null) {
                forecasts = prepare("INSERT INTO forecasts(item_id, step_id, cycle, period, quantity) VALUES (?,?,?,?,?)"
                        + onConflict("step_id, item_id, cycle, period", "quantity = excluded.quantity"));
            }
            for (ForecastRow r : rows) {
                forecasts.setInt(1, r.itemId());
                forecasts.setInt(2, r.stepId());
                forecasts.setInt(3, r.cycle());
                forecasts.setInt(4, r.period());
                forecasts.setLong(5, r.quantity());
                forecasts.addBatch();
            }
            return conflicts(rows, forecasts.executeBatch(), ForecastRow::line);
        });
    }

    public List<Integer> insertEvents(List<EventRow> rows) {
        return run(conn -> {
            if (events == null) {
                events = prepare("INSERT INTO events(item_id, period, tag, note) VALUES (?,?,?,?)"
                        + onConflict("item_id, period, tag", "note = excluded.note"));
            }
            for (EventRow r : rows) {
                events.setInt(1, r.itemId());
                events.setInt(2, r.period());
                events.setString(3, r.tag());
                events.setString(4, r.note());
                events.addBatch();
            }
            return conflicts(rows, events.executeBatch(), EventRow::line);
        });
    }

    /** Fixes the workspace's frequency; done by the first file that brings periods. */
    public void setFrequency(Frequency frequency) {
        run(conn -> {
            Meta.put(c, Meta.FREQUENCY, frequency.word());
            return null;
        });
    }

    public void commit() {
        run(conn -> {
            closeStatements();
            try (Statement st = c.createStatement()) {
                st.execute("COMMIT");
            }
            open = false;
            return null;
        });
    }

    /** Rolls back unless committed. */
    @Override
    public void close() {
        if (!open) {
            return;
        }
        open = false;
        try {
            closeStatements();
            try (Statement st = c.createStatement()) {
                st.execute("ROLLBACK");
            }
        } catch (SQLException e) {
            throw workspace.translate(e);
        }
    }

    private String onConflict(String key, String update) {
        return replace ? " ON CONFLICT(" + key + ") DO UPDATE SET " + update : " ON CONFLICT(" + key + ") DO NOTHING";
    }

    private PreparedStatement prepare(String sql) throws SQLException {
        PreparedStatement ps = c.prepareStatement(sql);
        statements.add(ps);
        return ps;
    }

    private void closeStatements() throws SQLException {
        for (PreparedStatement ps : statements) {
            ps.close();
        }
        statements.clear();
        items = attributes = actuals = forecasts = events = null;
    }

    private static void setNullableLong(PreparedStatement ps, int index, Long value) throws SQLException {
        if (value == null) {
            ps.setNull(index, java.sql.Types.INTEGER);
        } else {
            ps.setLong(index, value);
        }
    }

    /** Rows the database did not insert (update count 0) hit a key that was already there. */
    private static <R> List<Integer> conflicts(List<R> rows, int[] counts, java.util.function.ToIntFunction<R> line) {
        List<Integer> out = new ArrayList<>();
        for (int i = 0; i < counts.length; i++) {
            if (counts[i] == 0) {
                out.add(line.applyAsInt(rows.get(i)));
            }
        }
        return out;
    }

    private <T> T run(SqlWork<T> work) {
        try {
            return work.run(c);
        } catch (SQLException e) {
            throw workspace.translate(e);
        }
    }
}
