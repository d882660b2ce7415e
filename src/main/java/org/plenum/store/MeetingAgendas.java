package org.plenum.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Instant;
import java.util.Arrays;
import java.util.Optional;

/**
 * The agenda each meeting was ranked with (schema v3): kept once, by whichever screen ranked it
 * first, and read by every screen after. The rows are one value in a format the app writes and
 * reads; this class keeps it with what it was ranked with.
 */
public final class MeetingAgendas {
    private final Workspace workspace;

    public MeetingAgendas(Workspace workspace) {
        this.workspace = workspace;
    }

    /**
     * A kept agenda.
     *
     * @param lags the decision lags it was ranked at
     * @param byValue whether its ABC classes are of value (else of volume)
     * @param statStep the step it ranked the errors of
     * @param rowCount how many rows {@code rows} holds
     * @param format the version of the rows' format
     */
    public record Kept(int[] lags, boolean byValue, String statStep, Instant rankedAt, int rowCount, int format,
            byte[] rows) {}

    /** The agenda kept for {@code meeting}, if one was. */
    public Optional<Kept> of(long meeting) {
        return workspace.read(c -> read(c, meeting));
    }

    /**
     * Keeps {@code agenda} as the meeting's unless another screen kept one first, in one
     * transaction; returns the agenda the meeting now has (this one, or the earlier one).
     */
    public Kept keep(long meeting, Kept agenda) {
        return workspace.write(c -> {
            Optional<Kept> earlier = read(c, meeting);
            if (earlier.isPresent()) {
                return earlier.get();
            }
            insert(c, meeting, 1, agenda);
            return agenda;
        });
    }

    private static void insert(Connection c, long meeting, int ranking, Kept agenda) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO meeting_agendas(meeting_id, ranking, ranked_at,"
                + " lags, by_value, stat_step, row_count, format, rows) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?)")) {
            ps.setLong(1, meeting);
            ps.setInt(2, ranking);
            ps.setString(3, agenda.rankedAt().toString());
            ps.setString(4, String.join(",", Arrays.stream(agenda.lags()).mapToObj(Integer::toString).toList()));
            ps.setInt(5, agenda.byValue() ? 1 : 0);
            ps.setString(6, agenda.statStep());
            ps.setInt(7, agenda.rowCount());
            ps.setInt(8, agenda.format());
            ps.setBytes(9, agenda.rows());
            ps.executeUpdate();
        }
    }

    /**
     * How many times the meeting's agenda has been ranked (1 once kept, one more each time it is
     * ranked again); 0 before it is first kept. A cheap look for screens watching it change.
     */
    public int ranking(long meeting) {
        return workspace.read(c -> ranking(c, meeting));
    }

    /** The decision lags the meeting's kept agenda was ranked at, if it has one (without reading its rows). */
    public Optional<int[]> lags(long meeting) {
        return workspace.read(c -> {
            try (PreparedStatement ps = c.prepareStatement("SELECT lags FROM meeting_agendas WHERE meeting_id = ?")) {
                ps.setLong(1, meeting);
                try (ResultSet rs = ps.executeQuery()) {
                    return rs.next() ? Optional.of(ints(rs.getString(1))) : Optional.empty();
                }
            }
        });
    }

    /** Puts {@code agenda} in the place of the meeting's kept agenda, if any, in one transaction. */
    public Kept replace(long meeting, Kept agenda) {
        return workspace.write(c -> {
            int previous = ranking(c, meeting);
            try (PreparedStatement ps = c.prepareStatement("DELETE FROM meeting_agendas WHERE meeting_id = ?")) {
                ps.setLong(1, meeting);
                ps.executeUpdate();
            }
            insert(c, meeting, previous + 1, agenda);
            return agenda;
        });
    }

    private static int ranking(Connection c, long meeting) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT ranking FROM meeting_agendas WHERE meeting_id = ?")) {
            ps.setLong(1, meeting);
            try (ResultSet rs = ps.executeQuery()) {
                return rs.next() ? rs.getInt(1) : 0;
            }
        }
    }

    private static Optional<Kept> read(Connection c, long meeting) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT lags, by_value, stat_step, ranked_at, row_count, format,"
                + " rows FROM meeting_agendas WHERE meeting_id = ?")) {
            ps.setLong(1, meeting);
            try (ResultSet rs = ps.executeQuery()) {
                if (!rs.next()) {
                    return Optional.empty();
                }
                return Optional.of(new Kept(ints(rs.getString(1)), rs.getInt(2) == 1, rs.getString(3),
                        Instant.parse(rs.getString(4)), rs.getInt(5), rs.getInt(6), rs.getBytes(7)));
            }
        }
    }

    private static int[] ints(String commaSeparated) {
        return commaSeparated.isEmpty() ? new int[0]
                : Arrays.stream(commaSeparated.split(",")).mapToInt(Integer::parseInt).toArray();
    }
}
