package org.plenum.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Types;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.plenum.core.Decision;
import org.plenum.core.Frequency;
import org.plenum.core.Period;
import org.plenum.core.Quantity;

/**
 * The decision ledger: append-only in the database itself (triggers refuse UPDATE and DELETE).
 * A new decision for the same item, cycle, period and step supersedes the one standing before.
 */
public final class Ledger {
    private static final String SELECT = "SELECT d.id, d.batch, i.item, d.cycle, d.period, s.name, d.prior,"
            + " d.quantity, d.kept, d.reason, d.tag, d.author, d.minutes, d.recorded_at, d.supersedes,"
            + " (SELECT n.id FROM decisions n WHERE n.supersedes = d.id), d.meeting_id"
            + " FROM decisions d JOIN items i ON i.id = d.item_id JOIN steps s ON s.id = d.step_id";

    private final Workspace workspace;

    public Ledger(Workspace workspace) {
        this.workspace = workspace;
    }

    /**
     * Appends the drafts in one transaction as one batch, each superseding the decision that stood
     * for its key, and returns them as stored.
     */
    public List<Long> append(List<DecisionDraft> drafts) {
        return workspace.write(c -> {
            long batch = nextBatch(c);
            List<Long> ids = new ArrayList<>();
            try (PreparedStatement ps = c.prepareStatement("INSERT INTO decisions(batch, item_id, cycle, period,"
                    + " step_id, prior, quantity, kept, reason, tag, author, minutes, recorded_at, supersedes,"
                    + " meeting_id) VALUES (?, (SELECT id FROM items WHERE item = ?), ?, ?,"
                    + " (SELECT id FROM steps WHERE name = ?), ?, ?, ?, ?, ?, ?, ?, ?, ?, ?) RETURNING id")) {
                for (DecisionDraft d : drafts) {
                    bind(ps, batch, d, standing(c, d).orElse(null));
                    try (ResultSet rs = ps.executeQuery()) {
                        rs.next();
                        ids.add(rs.getLong(1));
                    }
                }
            }
            return ids;
        });
    }

    /** Every decision, oldest first; only those of {@code cycle} when it is not {@code null}. */
    public List<Decision> entries(Period cycle) {
        return cycle == null ? query("", null) : query(" WHERE d.cycle = ?", cycle.index());
    }

    /** The decisions made in a meeting, oldest first. */
    public List<Decision> ofMeeting(long meeting) {
        return query(" WHERE d.meeting_id = ?", meeting);
    }

    /** Every decision on one item, oldest first. */
    public List<Decision> ofItem(String item) {
        return query(" WHERE i.item = ?", item);
    }

    private List<Decision> query(String where, Object parameter) {
        Frequency frequency = workspace.frequency();
        return workspace.read(c -> {
            try (PreparedStatement ps = c.prepareStatement(SELECT + where + " ORDER BY d.id")) {
                if (parameter != null) {
                    ps.setObject(1, parameter);
                }
                List<Decision> out = new ArrayList<>();
                try (ResultSet rs = ps.executeQuery()) {
                    while (rs.next()) {
                        out.add(decision(rs, frequency));
                    }
                }
                return out;
            }
        });
    }

    private static long nextBatch(Connection c) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT coalesce(max(batch), 0) + 1 FROM decisions");
                ResultSet rs = ps.executeQuery()) {
            rs.next();
            return rs.getLong(1);
        }
    }

    /** The decision standing for the draft's key: the newest, which nothing supersedes yet. */
    private static Optional<Long> standing(Connection c, DecisionDraft d) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT max(d.id) FROM decisions d"
                + " JOIN items i ON i.id = d.item_id JOIN steps s ON s.id = d.step_id"
                + " WHERE i.item = ? AND d.cycle = ? AND d.period = ? AND s.name = ?")) {
            ps.setString(1, d.item());
            ps.setInt(2, d.cycle().index());
            ps.setInt(3, d.period().index());
            ps.setString(4, d.step());
            try (ResultSet rs = ps.executeQuery()) {
                rs.next();
                long id = rs.getLong(1);
                return rs.wasNull() ? Optional.empty() : Optional.of(id);
            }
        }
    }

    private static void bind(PreparedStatement ps, long batch, DecisionDraft d, Long supersedes) throws SQLException {
        ps.setLong(1, batch);
        ps.setString(2, d.item());
        ps.setInt(3, d.cycle().index());
        ps.setInt(4, d.period().index());
        ps.setString(5, d.step());
        ps.setLong(6, d.prior().micros());
        ps.setLong(7, d.quantity().micros());
        ps.setInt(8, d.kept() ? 1 : 0);
        ps.setString(9, d.reason());
        ps.setString(10, d.tag());
        ps.setString(11, d.author());
        if (d.minutes() == null) {
            ps.setNull(12, Types.INTEGER);
        } else {
            ps.setLong(12, d.minutes().micros());
        }
        ps.setString(13, d.recordedAt().toString());
        setNullable(ps, 14, supersedes);
        setNullable(ps, 15, d.meeting());
    }

    private static void setNullable(PreparedStatement ps, int index, Long value) throws SQLException {
        if (value == null) {
            ps.setNull(index, Types.INTEGER);
        } else {
            ps.setLong(index, value);
        }
    }

    private static Decision decision(ResultSet rs, Frequency f) throws SQLException {
        long minutes = rs.getLong(13);
        Quantity minutesOrNull = rs.wasNull() ? null : new Quantity(minutes);
        return new Decision(rs.getLong(1), rs.getLong(2), rs.getString(3), new Period(f, rs.getInt(4)),
                new Period(f, rs.getInt(5)), rs.getString(6), new Quantity(rs.getLong(7)), new Quantity(rs.getLong(8)),
                rs.getInt(9) == 1, rs.getString(10), rs.getString(11), rs.getString(12), minutesOrNull,
                Instant.parse(rs.getString(14)), nullableLong(rs, 15), nullableLong(rs, 16), nullableLong(rs, 17));
    }

    private static Long nullableLong(ResultSet rs, int index) throws SQLException {
        long v = rs.getLong(index);
        return rs.wasNull() ? null : v;
    }
}
