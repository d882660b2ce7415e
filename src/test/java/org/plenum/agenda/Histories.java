package org.plenum.agenda;

import org.plenum.core.CycleSeries;
import org.plenum.core.Series;

/** Builds small histories for the agenda's tests: rows given in item, cycle, period order. */
final class Histories {
    private final CycleSeries.Builder stat = new CycleSeries.Builder();
    private final Series.Builder actuals = new Series.Builder();

    /** A statistical forecast in whole units. */
    Histories forecast(int item, int cycle, int period, long units) {
        stat.add(item, cycle, period, units * 1_000_000L);
        return this;
    }

    /** An actual in whole units. */
    Histories actual(int item, int period, long units) {
        actuals.add(item, period, units * 1_000_000L);
        return this;
    }

    Histories actualMicros(int item, int period, long micros) {
        actuals.add(item, period, micros);
        return this;
    }

    Histories forecastMicros(int item, int cycle, int period, long micros) {
        stat.add(item, cycle, period, micros);
        return this;
    }

    CycleSeries statSeries() {
        return stat.build();
    }

    Series actualSeries() {
        return actuals.build();
    }

    History build() {
        return History.of(stat.build(), actuals.build());
    }
}
