package org.plenum.app;

import java.nio.file.Path;
import java.time.Clock;
import java.util.List;
import java.util.Optional;
import org.plenum.agenda.AgendaRow;
import org.plenum.agenda.AgendaSettings;
import org.plenum.core.Period;
import org.plenum.store.MeetingAgendas;
import org.plenum.store.StoreException;
import org.plenum.store.Workspace;

/**
 * A meeting's agenda is ranked once and kept with the meeting: every screen of the meeting shows
 * the same order with the same numbers from start to close, even when data arrive meanwhile, and
 * a screen that joins (or comes back after a dropped connection) reads it instead of ranking the
 * cycle again.
 */
public final class MeetingAgenda {
    private MeetingAgenda() {}

    /**
     * The meeting's kept agenda; when it has none yet, the cycle ranked now with {@code lags} and
     * {@code settings}, and kept (unless another screen kept one first: then that one). On its own
     * connection, so that it can run off the UI thread.
     */
    public static Agenda.Report of(Workspaces workspaces, Path db, long meeting, Period cycle, int[] lags,
            AgendaSettings settings, Clock clock) {
        try (Workspace ws = workspaces.open(db)) {
            MeetingAgendas agendas = new MeetingAgendas(ws);
            Optional<MeetingAgendas.Kept> earlier = agendas.of(meeting);
            if (earlier.isPresent()) {
                return report(ws, meeting, cycle, earlier.get());
            }
            Agenda.Report ranked = Agenda.run(workspaces, db, cycle.toString(), lags, settings);
            MeetingAgendas.Kept ours = kept(ranked, clock);
            MeetingAgendas.Kept kept = agendas.keep(meeting, ours);
            return kept == ours ? ranked : report(ws, meeting, cycle, kept);
        }
    }

    /**
     * Ranks the cycle again with the data as they stand now and keeps that agenda in the place of
     * the meeting's (the facilitator's choice, e.g. after corrected forecasts were imported); the
     * other screens notice and read it.
     */
    public static Agenda.Report rankAgain(Workspaces workspaces, Path db, long meeting, Period cycle, int[] lags,
            AgendaSettings settings, Clock clock) {
        Agenda.Report ranked = Agenda.run(workspaces, db, cycle.toString(), lags, settings);
        try (Workspace ws = workspaces.open(db)) {
            new MeetingAgendas(ws).replace(meeting, kept(ranked, clock));
        }
        return ranked;
    }

    private static MeetingAgendas.Kept kept(Agenda.Report ranked, Clock clock) {
        return new MeetingAgendas.Kept(ranked.lags(), ranked.byValue(), ranked.statStep(), clock.instant(),
                ranked.rows().size(), AgendaRowsFormat.VERSION, AgendaRowsFormat.encode(ranked.rows()));
    }

    private static Agenda.Report report(Workspace ws, long meeting, Period cycle, MeetingAgendas.Kept kept) {
        String where = ws.path() + ": meeting " + meeting + "'s agenda";
        if (kept.format() != AgendaRowsFormat.VERSION) {
            throw new StoreException(where + " is kept in format " + kept.format() + "; this Plenum reads format "
                    + AgendaRowsFormat.VERSION);
        }
        List<AgendaRow> rows;
        try {
            rows = AgendaRowsFormat.decode(kept.rows());
        } catch (IllegalArgumentException e) {
            throw new StoreException(where + " cannot be read: " + e.getMessage(), e);
        }
        if (rows.size() != kept.rowCount()) {
            throw new StoreException(where + " holds " + rows.size() + " rows where " + kept.rowCount()
                    + " were kept");
        }
        return new Agenda.Report(cycle, kept.lags(), rows, kept.byValue(), kept.statStep());
    }
}
