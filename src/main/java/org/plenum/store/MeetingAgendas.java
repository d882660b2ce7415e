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
            try (PreparedStatement ps = c.prepareStatement("INSERT INTO meeting_agendas(meeting_id, ranked_at, lags,"
                    + " by_value, stat_step, row_count, format, rows) VALUES (?, ?, ?, ?, ?, ?, ?, ?)")) {
                ps.setLong(1, meeting);
                ps.setString(2, agenda.rankedAt().toString());
                ps.setString(3, String.join(",", Arrays.stream(agenda.lags()).mapToObj(Integer::toString).toList()));
                ps.setInt(4, agenda.byValue() ? 1 : 0);
                ps.setString(5, agenda.statStep());
                ps.setInt(6, agenda.rowCount());
                ps.setInt(7, agenda.format());
                ps.setBytes(8, agenda.rows());
                ps.executeUpdate();
            }
            return agenda;
        });
    }

    private static Optional<Kept> read(Connection c, long meeting) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT lags, by_value, stat_step, ranked_at, row_count, format,"
                + " rows FROM meeting_agendas WHERE meeting_id = ?")) {
            ps.setLong(1, meeting);
            try (ResultSet rs = ps.executeQuery()) {
                if (!rs.next()) {
                    return Optional.empty();
                }
                String lags = rs.getString(1);
                return Optional.of(new Kept(lags.isEmpty() ? new int[0]
                        : Arrays.stream(lags.split(",")).mapToInt(Integer::parseInt).toArray(), rs.getInt(2) == 1,
                        rs.getString(3), Instant.parse(rs.getString(4)), rs.getInt(5), rs.getInt(6), rs.getBytes(7)));
            }
        }
    }
}
