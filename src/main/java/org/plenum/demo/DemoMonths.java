package org.plenum.demo;

import java.time.YearMonth;
import java.time.temporal.ChronoUnit;

/**
 * The demo's time line: month 0 is 2022-12; actuals cover months 0–47 (2022-12 … 2026-11);
 * forecast cycles run 25–48 (2025-01 … 2026-12), month 48 being the upcoming cycle; the simulated
 * demand, which only the review simulation can peek at, runs to month 53 (2027-05), the last period
 * a forecast of the upcoming cycle targets.
 */
final class DemoMonths {

    static final YearMonth FIRST = YearMonth.of(2022, 12);
    static final int ACTUALS = 48;
    static final int FIRST_CYCLE = 25;
    /** The upcoming cycle: it gets a stat forecast but no review yet. */
    static final int UPCOMING_CYCLE = 48;
    /** Lags 0 … HORIZON−1 are forecast in every cycle. */
    static final int HORIZON = 6;
    static final int SIMULATED = UPCOMING_CYCLE + HORIZON;
    /** Cycles whose review is written to the decision ledger: 2026-06 … 2026-11. */
    static final int FIRST_LEDGER_CYCLE = 42;

    private DemoMonths() {
    }

    static YearMonth month(int index) {
        return FIRST.plusMonths(index);
    }

    /** {@code YYYY-MM}, the period and cycle format of every demo file. */
    static String label(int index) {
        return month(index).toString();
    }

    /** Calendar month 1–12 of a month index. */
    static int calendarMonth(int index) {
        return month(index).getMonthValue();
    }

    static int index(YearMonth month) {
        return (int) FIRST.until(month, ChronoUnit.MONTHS);
    }
}
