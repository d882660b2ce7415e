package org.plenum.agenda;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.plenum.core.AusBeer;

class RecentErrorTest {

    @Test
    void isTheMaeOfTheErrorsOfOneCycle() {
        // FPP2 §3.4, Australian beer: the seasonal naive's test MAE is 13.4 (book table and R
        // forecast::accuracy output, METHODS A3). Ten forecasts of one earlier cycle at lags 0..9.
        Histories h = new Histories();
        for (int lag = 0; lag < 10; lag++) {
            h.forecastMicros(1, 80, 80 + lag, AusBeer.SEASONAL_NAIVE[lag]);
        }
        for (int lag = 0; lag < 10; lag++) {
            h.actualMicros(1, 80 + lag, AusBeer.TEST[lag]);
        }
        RecentError e = RecentError.of(h.build(), 1, 100);
        assertEquals(13.4, e.mae().getAsDouble(), 5e-7);
        assertEquals(10, e.errors());
        assertEquals(1, e.cycles());
    }

    /** Cycles 1..10, one lag-1 forecast each whose absolute error is the cycle number; actuals of periods 2..11. */
    private static Histories lagOneErrorsEqualToTheCycle(int missingActual) {
        Histories h = new Histories();
        for (int c = 1; c <= 11; c++) {
            h.forecast(1, c, c + 1, 100 + c);
        }
        for (int p = 2; p <= 12; p++) {
            if (p != missingActual) {
                h.actual(1, p, 100);
            }
        }
        return h;
    }

    @Test
    void takesTheSixLatestCyclesWhoseTargetLiesBeforeTheCycle() {
        // Ranking cycle 12: cycle 11 targets period 12, not before the cycle, so it is not known yet
        // although the workspace holds its actual. Latest six: cycles 10..5, errors 10+9+8+7+6+5 = 45 → 7.5.
        RecentError e = RecentError.of(lagOneErrorsEqualToTheCycle(-1).build(), 1, 12);
        assertEquals(7.5, e.mae().getAsDouble(), 1e-12);
        assertEquals(6, e.cycles());
        assertFalse(e.isShort());
    }

    @Test
    void skipsACycleWithoutAKnownActual() {
        // Period 9 (cycle 8's target) has no actual: the six cycles are 10, 9, 7, 6, 5, 4 → 41 / 6.
        RecentError e = RecentError.of(lagOneErrorsEqualToTheCycle(9).build(), 1, 12);
        assertEquals(41.0 / 6, e.mae().getAsDouble(), 1e-12);
    }

    @Test
    void countsEveryKnownErrorOfACycleOnce() {
        // Cycle 5 at lags 1 and 2 (errors 4 and 6), cycle 6 at lag 1 (error 2); cycle 6's lag-2 target
        // (period 8) is the ranked cycle itself. MAE = (4 + 6 + 2) / 3 = 4.
        History h = new Histories().forecast(1, 5, 6, 104).forecast(1, 5, 7, 94).forecast(1, 6, 7, 102)
                .forecast(1, 6, 8, 50).actual(1, 6, 100).actual(1, 7, 100).actual(1, 8, 100).build();
        RecentError e = RecentError.of(h, 1, 8);
        assertEquals(4.0, e.mae().getAsDouble(), 1e-12);
        assertEquals(3, e.errors());
        assertEquals(2, e.cycles());
        assertTrue(e.isShort());
    }

    @Test
    void fallsBackToTheNaiveMaeOverConsecutiveKnownPeriods() {
        // FPP2 §3.4 beer training data: the in-sample naive MAE is 54.73016 over 63 differences
        // (R forecast::accuracy training-set output, METHODS A5).
        Histories h = new Histories();
        for (int t = 0; t < AusBeer.TRAIN.length; t++) {
            h.actualMicros(1, t, AusBeer.TRAIN[t]);
        }
        Stake stake = Stake.of(h.build(), 1, 64, 1, null);
        assertEquals(Stake.Basis.NAIVE, stake.basis());
        assertEquals(54.73016, stake.mae().getAsDouble(), 5e-6);
    }

    @Test
    void aGapBreaksTheNaivePairs() {
        // Known periods 1, 2, 3, 5, 6 with actuals 10, 14, 11, 30, 26: pairs (1,2), (2,3), (5,6) only →
        // (4 + 3 + 4) / 3; the jump from 11 to 30 across the gap is not a naive error.
        History h = new Histories().actual(1, 1, 10).actual(1, 2, 14).actual(1, 3, 11).actual(1, 5, 30)
                .actual(1, 6, 26).build();
        assertEquals(11.0 / 3, NaiveMae.mean(NaiveMae.of(h, 1, 7)).getAsDouble(), 1e-12);
    }

    @Test
    void stakeIsMaeTimesPeriodsTimesUnitValue() {
        // MAE 7.5 (the six-cycle case above) × 3 target periods × 2.5 per unit = 56.25 in money.
        History h = lagOneErrorsEqualToTheCycle(-1).build();
        assertEquals(56.25, Stake.of(h, 1, 12, 3, 2_500_000L).value().getAsDouble(), 1e-9);
        assertEquals(22.5, Stake.of(h, 1, 12, 3, null).value().getAsDouble(), 1e-9);
        assertEquals(Stake.Basis.RECENT, Stake.of(h, 1, 12, 3, null).basis());
    }

    @Test
    void noErrorAndNoTwoConsecutiveActualsLeaveTheStakeUnknown() {
        History h = new Histories().actual(1, 3, 10).actual(1, 5, 12).build();
        Stake stake = Stake.of(h, 1, 8, 3, null);
        assertEquals(Stake.Basis.NONE, stake.basis());
        assertTrue(stake.value().isEmpty());
    }

    @Test
    void olderHistoryExtendsAShortWindow() {
        // The window holds cycles 9 and 10 only; older rows bring cycles 3..8. Six latest: 10..5.
        Histories window = new Histories();
        Histories older = new Histories();
        for (int c = 3; c <= 10; c++) {
            (c >= 9 ? window : older).forecast(1, c, c + 1, 100 + c);
        }
        for (int p = 4; p <= 11; p++) {
            (p >= 10 ? window : older).actual(1, p, 100);
        }
        History shortWindow = window.build();
        assertTrue(RecentError.of(shortWindow, 1, 12).isShort());
        History full = older.build();
        History both = shortWindow.withOlder(older.statSeries(), older.actualSeries());
        assertEquals(7.5, RecentError.of(both, 1, 12).mae().getAsDouble(), 1e-12);
        assertEquals(6, RecentError.of(full, 1, 12).cycles());
    }
}
