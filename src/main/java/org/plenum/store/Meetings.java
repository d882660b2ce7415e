package org.plenum.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.plenum.core.Frequency;
import org.plenum.core.Period;

/**
 * The meetings of a workspace and what their screens share: who joined, what is on the table,
 * unsaved form input. Every write is one short transaction, so several processes can share a
 * meeting on one file.
 */
public final class Meetings {
    private static final String SELECT = "SELECT id, cycle, facilitator, budget_minutes, started_at, ended_at,"
            + " total_minutes FROM meetings";

    private final Workspace workspace;

    public Meetings(Workspace workspace) {
        this.workspace = workspace;
    }

    /**
     * A meeting as stored.
     *
     * @param budgetMinutes the time box, or null when none was given
     * @param endedAt null while the meeting is open
     * @param totalMinutes null while the meeting is open
     */
    public record Meeting(long id, Period cycle, String facilitator, Integer budgetMinutes, Instant startedAt,
            Instant endedAt, Integer totalMinutes) {
        public boolean isOpen() {
            return endedAt == null;
        }
    }

    /** Someone who joined a meeting; {@code leftAt} is null while their screen runs. */
    public record Person(String name, Instant joinedAt, Instant seenAt, Instant leftAt) {}

    /** An item put on the table. */
    public record Tabled(String item, Instant at) {}

    /**
     * The cycle's open meeting, started now with {@code person} as facilitator when there is
     * none. One transaction: two people opening at once get the same meeting.
     */
    public Meeting openOrStart(Period cycle, String person, Integer budgetMinutes, Instant now) {
        return workspace.write(c -> {
            Optional<Meeting> open = open(c, cycle);
            if (open.isPresent()) {
                return open.get();
            }
            try (PreparedStatement ps = c.prepareStatement("INSERT INTO meetings(cycle, facilitator, budget_minutes,"
                    + " started_at) VALUES (?, ?, ?, ?)")) {
                ps.setInt(1, cycle.index());
                ps.setString(2, person);
                if (budgetMinutes == null) {
                    ps.setNull(3, java.sql.Types.INTEGER);
                } else {
                    ps.setInt(3, budgetMinutes);
                }
                ps.setString(4, now.toString());
                ps.executeUpdate();
            }
            return open(c, cycle).orElseThrow();
        });
    }

    /** The open meetings, oldest first. */
    public List<Meeting> openMeetings() {
        return workspace.read(c -> list(c, SELECT + " WHERE ended_at IS NULL ORDER BY id", null));
    }

    /** The latest cycle with forecasts of the process's first step. */
    public Optional<Period> latestCycle() {
        return workspace.read(c -> {
            try (Statement st = c.createStatement(); ResultSet rs = st.executeQuery("SELECT max(cycle) FROM forecasts"
                    + " WHERE step_id = (SELECT id FROM steps ORDER BY position LIMIT 1)")) {
                rs.next();
                int cycle = rs.getInt(1);
                return rs.wasNull() ? Optional.empty() : Optional.of(new Period(
                        Meta.get(c, Meta.FREQUENCY).map(Frequency::ofWord).orElseThrow(), cycle));
            }
        });
    }

    public Optional<Meeting> meeting(long id) {
        return workspace.read(c -> list(c, SELECT + " WHERE id = ?", id).stream().findFirst());
    }

    /** Marks {@code person} present in the meeting now, joining it the first time. */
    public void seen(long meeting, String person, Instant now) {
        workspace.write(c -> {
            try (PreparedStatement ps = c.prepareStatement("INSERT INTO meeting_people(meeting_id, person, joined_at,"
                    + " seen_at) VALUES (?, ?, ?, ?) ON CONFLICT(meeting_id, person) DO UPDATE SET seen_at ="
                    + " excluded.seen_at, left_at = NULL")) {
                ps.setLong(1, meeting);
                ps.setString(2, person);
                ps.setString(3, now.toString());
                ps.setString(4, now.toString());
                ps.executeUpdate();
            }
            return null;
        });
    }

    /** Marks {@code person}'s screen closed. */
    public void left(long meeting, String person, Instant now) {
        workspace.write(c -> {
            try (PreparedStatement ps = c.prepareStatement("UPDATE meeting_people SET left_at = ? WHERE meeting_id = ?"
                    + " AND person = ?")) {
                ps.setString(1, now.toString());
                ps.setLong(2, meeting);
                ps.setString(3, person);
                ps.executeUpdate();
            }
            return null;
        });
    }

    /** Everyone who joined, in order of joining. */
    public List<Person> people(long meeting) {
        return workspace.read(c -> {
            try (PreparedStatement ps = c.prepareStatement("SELECT person, joined_at, seen_at, left_at FROM"
                    + " meeting_people WHERE meeting_id = ? ORDER BY joined_at, person")) {
                ps.setLong(1, meeting);
                List<Person> out = new ArrayList<>();
                try (ResultSet rs = ps.executeQuery()) {
                    while (rs.next()) {
                        out.add(new Person(rs.getString(1), Instant.parse(rs.getString(2)), Instant.parse(rs.getString(3)),
                                rs.getString(4) == null ? null : Instant.parse(rs.getString(4))));
                    }
                }
                return out;
            }
        });
    }

    /** Puts {@code item} on the table of an open meeting. */
    public void table(long meeting, String item, Instant now) {
        workspace.write(c -> {
            try (PreparedStatement ps = c.prepareStatement("INSERT INTO meeting_tabled(meeting_id, item_id, tabled_at)"
                    + " SELECT ?, id, ? FROM items WHERE item = ?")) {
                ps.setLong(1, meeting);
                ps.setString(2, now.toString());
                ps.setString(3, item);
                if (ps.executeUpdate() != 1) {
                    throw new StoreException("no item " + item + " in the workspace");
                }
            }
            return null;
        });
    }

    /** Every tabling of the meeting, in order; the last is on the table now. */
    public List<Tabled> tabled(long meeting) {
        return workspace.read(c -> {
            try (PreparedStatement ps = c.prepareStatement("SELECT i.item, t.tabled_at FROM meeting_tabled t JOIN items i"
                    + " ON i.id = t.item_id WHERE t.meeting_id = ? ORDER BY t.id")) {
                ps.setLong(1, meeting);
                List<Tabled> out = new ArrayList<>();
                try (ResultSet rs = ps.executeQuery()) {
                    while (rs.next()) {
                        out.add(new Tabled(rs.getString(1), Instant.parse(rs.getString(2))));
                    }
                }
                return out;
            }
        });
    }

    /** Keeps a form's unsaved fields (the caller's own encoding), replacing the previous draft. */
    public void saveDraft(long meeting, String person, String item, String fields, Instant now) {
        workspace.write(c -> {
            try (PreparedStatement ps = c.prepareStatement("INSERT OR REPLACE INTO form_drafts(meeting_id, person,"
                    + " item_id, fields, saved_at) SELECT ?, ?, id, ?, ? FROM items WHERE item = ?")) {
                ps.setLong(1, meeting);
                ps.setString(2, person);
                ps.setString(3, fields);
                ps.setString(4, now.toString());
                ps.setString(5, item);
                ps.executeUpdate();
            }
            return null;
        });
    }

    public Optional<String> draft(long meeting, String person, String item) {
        return workspace.read(c -> {
            try (PreparedStatement ps = c.prepareStatement("SELECT d.fields FROM form_drafts d JOIN items i ON"
                    + " i.id = d.item_id WHERE d.meeting_id = ? AND d.person = ? AND i.item = ?")) {
                ps.setLong(1, meeting);
                ps.setString(2, person);
                ps.setString(3, item);
                try (ResultSet rs = ps.executeQuery()) {
                    return rs.next() ? Optional.of(rs.getString(1)) : Optional.empty();
                }
            }
        });
    }

    /** Items for which {@code person} has unsaved input in the meeting. */
    public List<String> draftItems(long meeting, String person) {
        return workspace.read(c -> {
            try (PreparedStatement ps = c.prepareStatement("SELECT i.item FROM form_drafts d JOIN items i ON"
                    + " i.id = d.item_id WHERE d.meeting_id = ? AND d.person = ? ORDER BY d.saved_at")) {
                ps.setLong(1, meeting);
                ps.setString(2, person);
                List<String> out = new ArrayList<>();
                try (ResultSet rs = ps.executeQuery()) {
                    while (rs.next()) {
                        out.add(rs.getString(1));
                    }
                }
                return out;
            }
        });
    }

    public void dropDraft(long meeting, String person, String item) {
        workspace.write(c -> {
            try (PreparedStatement ps = c.prepareStatement("DELETE FROM form_drafts WHERE meeting_id = ? AND person = ?"
                    + " AND item_id = (SELECT id FROM items WHERE item = ?)")) {
                ps.setLong(1, meeting);
                ps.setString(2, person);
                ps.setString(3, item);
                ps.executeUpdate();
            }
            return null;
        });
    }

    /** Closes an open meeting; false when it was already closed (by another screen). */
    public boolean close(long meeting, Instant end, int totalMinutes) {
        return workspace.write(c -> {
            try (PreparedStatement ps = c.prepareStatement("UPDATE meetings SET ended_at = ?, total_minutes = ? WHERE"
                    + " id = ? AND ended_at IS NULL")) {
                ps.setString(1, end.toString());
                ps.setInt(2, totalMinutes);
                ps.setLong(3, meeting);
                return ps.executeUpdate() == 1;
            }
        });
    }

    /**
     * SQLite's {@code PRAGMA data_version} of this connection: it changes when another connection
     * commits, and reading it costs microseconds, so a screen can poll it to notice other screens.
     */
    public long dataVersion() {
        return workspace.read(c -> {
            try (Statement st = c.createStatement(); ResultSet rs = st.executeQuery("PRAGMA data_version")) {
                rs.next();
                return rs.getLong(1);
            }
        });
    }

    private Optional<Meeting> open(Connection c, Period cycle) throws SQLException {
        return list(c, SELECT + " WHERE cycle = " + cycle.index() + " AND ended_at IS NULL", null).stream().findFirst();
    }

    private List<Meeting> list(Connection c, String sql, Long id) throws SQLException {
        Frequency frequency = Meta.get(c, Meta.FREQUENCY).map(Frequency::ofWord).orElseThrow();
        try (PreparedStatement ps = c.prepareStatement(sql)) {
            if (id != null) {
                ps.setLong(1, id);
            }
            List<Meeting> out = new ArrayList<>();
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    out.add(new Meeting(rs.getLong(1), new Period(frequency, rs.getInt(2)), rs.getString(3),
                            (Integer) rs.getObject(4), Instant.parse(rs.getString(5)),
                            rs.getString(6) == null ? null : Instant.parse(rs.getString(6)),
                            (Integer) rs.getObject(7)));
                }
            }
            return out;
        }
    }
}
