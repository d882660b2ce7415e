package org.plenum.tui;

import java.util.function.Supplier;
import org.plenum.agenda.AdjustmentGuidance;
import org.plenum.app.Agenda;
import org.plenum.app.Score;

/**
 * The meeting screen's slow reads, each on its own connection: they run off the UI thread, so
 * the screen answers keys while the agenda is ranked or the scorecard computed.
 */
public record Sources(Supplier<Agenda.Report> agenda, Supplier<AdjustmentGuidance> guidance,
        Supplier<Score.Report> scorecard, Supplier<java.util.Map<String, double[]>> history) {}
