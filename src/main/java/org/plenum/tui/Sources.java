package org.plenum.tui;

import java.util.function.Supplier;
import org.plenum.agenda.AdjustmentGuidance;
import org.plenum.app.Agenda;
import org.plenum.app.Score;

/**
 * The meeting screen's slow reads, each on its own connection: they run off the UI thread, so
 * the screen answers keys while the agenda is ranked or the scorecard computed.
 *
 * @param agenda the meeting's agenda (ranked, or read as the meeting keeps it)
 * @param rankAgain the cycle ranked again now and kept as the meeting's agenda (facilitator)
 */
public record Sources(Supplier<Agenda.Report> agenda, Supplier<Agenda.Report> rankAgain,
        Supplier<AdjustmentGuidance> guidance, Supplier<Score.Report> scorecard,
        Supplier<java.util.Map<String, double[]>> history) {}
