package org.plenum.score;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.plenum.core.Period;
import org.plenum.core.Series;

class PairedSetTest {
    private static final long UNIT = 1_000_000L;
    private static final int P0 = Period.parse("2026-01").index();

    // ---------------------------------------------------------------------------------------------
    // Hand-built fixture, two items, monthly periods P0 = 2026-01 .. P0+5, whole units.
    //
    // actuals  item 1: P0 10, P1 12, P2 15, P3 11, P4 20          (none at P5)
    //          item 2:        P1 100, P2 90, P3 95                (none at P0, none at P4)
    // stat     item 1: P0 11, P1 13, P2 14, P3 12, P4 18, P5 30
    //          item 2:        P1 98,  P2 92, P3 97, P4 99
    // final    item 1:        P1 12,  P2 15,        P4 19         (none at P0, P3)
    //          item 2:        P1 99,  P2 91, P3 96
    //
    // At lag 0 (cycle = period) the naive placebo of period t is A(t − 1). Pair by pair:
    //   (1,P0) actual, stat; no final, no A(P0−1)        → left out
    //   (1,P1) A 12, naive A(P0) = 10, stat 13, final 12 → kept
    //   (1,P2) A 15, naive 12, stat 14, final 15         → kept
    //   (1,P3) A 11, naive 15, stat 12; no final         → left out
    //   (1,P4) A 20, naive 11, stat 18, final 19         → kept
    //   (1,P5) no actual                                 → neither kept nor counted
    //   (2,P1) A 100, stat 98, final 99; no A(2,P0)      → left out (only the placebo is missing)
    //   (2,P2) A 90, naive 100, stat 92, final 91        → kept
    //   (2,P3) A 95, naive 90, stat 97, final 96         → kept
    //   (2,P4) no actual                                 → neither kept nor counted
    // So 5 pairs are kept and 3 left out.
    // ---------------------------------------------------------------------------------------------

    private static Series series(long[][] rows) {
        Series.Builder b = new Series.Builder();
        for (long[] r : rows) {
            b.add((int) r[0], P0 + (int) r[1], r[2] * UNIT);
        }
        return b.build();
    }

    private static final Series ACTUALS = series(new long[][] {
        {1, 0, 10}, {1, 1, 12}, {1, 2, 15}, {1, 3, 11}, {1, 4, 20},
        {2, 1, 100}, {2, 2, 90}, {2, 3, 95}});
    private static final Series STAT = series(new long[][] {
        {1, 0, 11}, {1, 1, 13}, {1, 2, 14}, {1, 3, 12}, {1, 4, 18}, {1, 5, 30},
        {2, 1, 98}, {2, 2, 92}, {2, 3, 97}, {2, 4, 99}});
    private static final Series FINAL = series(new long[][] {
        {1, 1, 12}, {1, 2, 15}, {1, 4, 19},
        {2, 1, 99}, {2, 2, 91}, {2, 3, 96}});

    private static PairedSet fixtureAtLagZero() {
        return PairedSet.of(ACTUALS, List.of("stat", "final"), List.of(STAT, FINAL), 0, Placebo.NAIVE, 12);
    }

    private static long[] units(long... values) {
        return Arrays.stream(values).map(v -> v * UNIT).toArray();
    }

    @Test
    void keepsOnlyPairsWithAnActualThePlaceboAndEveryStep() {
        PairedSet set = fixtureAtLagZero();
        // Arithmetic in the fixture comment above: 5 kept.
        assertEquals(5, set.size());
        assertArrayEquals(new int[] {1, 1, 1, 2, 2}, Arrays.copyOf(set.items(), set.size()));
        assertArrayEquals(new int[] {P0 + 1, P0 + 2, P0 + 4, P0 + 2, P0 + 3}, Arrays.copyOf(set.periods(), set.size()));
        assertArrayEquals(units(12, 15, 20, 90, 95), Arrays.copyOf(set.actuals(), set.size()));
        assertArrayEquals(units(13, 14, 18, 92, 97), Arrays.copyOf(set.forecasts()[1], set.size()));
        assertArrayEquals(units(12, 15, 19, 91, 96), Arrays.copyOf(set.forecasts()[2], set.size()));
    }

    @Test
    void namesThePlaceboFirstThenTheStepsInOrder() {
        assertEquals(List.of("naive", "stat", "final"), fixtureAtLagZero().sources());
        PairedSet seasonal = PairedSet.of(ACTUALS, List.of("stat", "final"), List.of(STAT, FINAL), 0, Placebo.SEASONAL,
                12);
        assertEquals(List.of("seasonal_naive", "stat", "final"), seasonal.sources());
    }

    @Test
    void countsPairsWithAnActualButAMissingStepOrPlaceboAsLeftOut() {
        // (1,P0) misses final and the placebo, (1,P3) misses final, (2,P1) misses only the placebo: 3.
        // (1,P5) and (2,P4) have forecasts but no actual and are not counted.
        assertEquals(3, fixtureAtLagZero().leftOut());
    }

    @Test
    void doesNotCountPairsWithoutAnActualEvenWhenEveryStepHasOne() {
        // Every step forecasts P5 and P6 for item 1, where there is no actual: nothing kept, nothing left out.
        Series stat = series(new long[][] {{1, 5, 30}, {1, 6, 31}});
        Series fin = series(new long[][] {{1, 5, 29}, {1, 6, 33}});
        PairedSet set = PairedSet.of(ACTUALS, List.of("stat", "final"), List.of(stat, fin), 0, Placebo.NAIVE, 12);
        assertEquals(0, set.size());
        assertEquals(0, set.leftOut());
    }

    @Test
    void naivePlaceboAtLagZeroIsTheActualOfThePeriodBefore() {
        // Naive of period t issued at cycle t (lag 0) = A(cycle − 1) = A(t − 1): rows (1,P1) (1,P2) (1,P4)
        // (2,P2) (2,P3) → A(1,P0) 10, A(1,P1) 12, A(1,P3) 11, A(2,P1) 100, A(2,P2) 90.
        PairedSet set = fixtureAtLagZero();
        assertArrayEquals(units(10, 12, 11, 100, 90), Arrays.copyOf(set.forecasts()[0], set.size()));
    }

    @Test
    void naivePlaceboAtLagTwoIsTheLastActualBeforeTheCycle() {
        // At lag 2, period t was forecast at cycle t − 2, which knew actuals up to t − 3:
        //   (1,P2) cycle P0: A(1,P0−1) unknown → left out
        //   (1,P3) cycle P1: naive A(1,P0) = 10     (1,P4) cycle P2: naive A(1,P1) = 12
        //   (2,P3) cycle P1: A(2,P0) unknown → left out
        Series stat = series(new long[][] {{1, 2, 14}, {1, 3, 12}, {1, 4, 18}, {2, 3, 97}});
        PairedSet set = PairedSet.of(ACTUALS, List.of("stat"), List.of(stat), 2, Placebo.NAIVE, 12);
        assertEquals(2, set.size());
        assertEquals(2, set.leftOut());
        assertArrayEquals(new int[] {P0 + 3, P0 + 4}, Arrays.copyOf(set.periods(), 2));
        assertArrayEquals(units(10, 12), Arrays.copyOf(set.forecasts()[0], 2));
        assertEquals(2, set.lag());
    }

    @Test
    void naiveScaleIsTheInSampleMaeOfTheItemsActualsBeforeTheCycle() {
        // Lag 0, so the cycle is the row's period; scale = mean |A_t − A_(t−1)| over known t < cycle:
        //   (1,P1): only A(P0) before → no difference → NaN
        //   (1,P2): |12 − 10| = 2 → 2
        //   (1,P4): |12 − 10|, |15 − 12|, |11 − 15| = 2, 3, 4 → 3
        //   (2,P2): only A(P1) before → NaN
        //   (2,P3): |90 − 100| = 10 → 10
        double[] scales = Arrays.copyOf(fixtureAtLagZero().scales(), 5);
        assertTrue(Double.isNaN(scales[0]), () -> Arrays.toString(scales));
        assertEquals(2.0 * UNIT, scales[1], 0);
        assertEquals(3.0 * UNIT, scales[2], 0);
        assertTrue(Double.isNaN(scales[3]), () -> Arrays.toString(scales));
        assertEquals(10.0 * UNIT, scales[4], 0);
    }

    // ---------------------------------------------------------------------------------------------
    // METHODS §9 BEER (fpp2 ausbeer), quarters as periods with m = 4. Train 1992Q1–2007Q4 (64),
    // test 2008Q1–2010Q2 (10). One cycle: the first test quarter, so a forecast of test quarter h
    // (h = 1..10) is at lag h − 1 and every row's in-sample scale covers exactly the training set.
    // ---------------------------------------------------------------------------------------------

    private static final int[] BEER_TRAIN = {
        443, 410, 420, 532, 433, 421, 410, 512, 449, 381, 423, 531, 426, 408, 416, 520,
        409, 398, 398, 507, 432, 398, 406, 526, 428, 397, 403, 517, 435, 383, 424, 521,
        421, 402, 414, 500, 451, 380, 416, 492, 428, 408, 406, 506, 435, 380, 421, 490,
        435, 390, 412, 454, 416, 403, 408, 482, 438, 386, 405, 491, 427, 383, 394, 473};
    private static final int[] BEER_TEST = {420, 390, 410, 488, 415, 398, 419, 488, 414, 374};
    /** 1992Q1 as a period index (year·4 + quarter − 1); any consecutive integers would do. */
    private static final int Q0 = 1992 * 4;
    /** 2008Q1, the cycle: the first period not in the training set. */
    private static final int CYCLE = Q0 + BEER_TRAIN.length;
    private static final int BEER = 7;

    private static Series beerActuals() {
        Series.Builder b = new Series.Builder();
        for (int t = 0; t < BEER_TRAIN.length; t++) {
            b.add(BEER, Q0 + t, BEER_TRAIN[t] * UNIT);
        }
        for (int h = 1; h <= BEER_TEST.length; h++) {
            b.add(BEER, CYCLE + h - 1, BEER_TEST[h - 1] * UNIT);
        }
        return b.build();
    }

    /** One step's forecast of test quarter h, issued at the cycle 2008Q1 (lag h − 1). */
    private static Series oneForecast(int h, long micros) {
        Series.Builder b = new Series.Builder();
        b.add(BEER, CYCLE + h - 1, micros);
        return b.build();
    }

    /** Two imported steps: the mean 435.375 and the flat naive 473 of FPP2 §3.4, at test quarter h. */
    private static PairedSet beerAt(int h, Placebo placebo) {
        return PairedSet.of(beerActuals(), List.of("mean", "last_value"),
                List.of(oneForecast(h, 435_375_000L), oneForecast(h, 473 * UNIT)), h - 1, placebo, 4);
    }

    @ParameterizedTest(name = "h = {0}")
    @ValueSource(ints = {1, 2, 3, 4, 5, 6, 7, 8, 9, 10})
    void seasonalPlaceboReproducesTheSeasonalNaiveForecastsOfTheBeerData(int h) {
        // METHODS §9 E4 [printed, exact]: seasonal-naive forecasts for h = 1..10 from the end of 2007Q4
        // are 427, 383, 394, 473, 427, 383, 394, 473, 427, 383 (FPP2 §3.1: y_{T+h−m(k+1)}, k = ⌊(h−1)/m⌋).
        long[] expected = units(427, 383, 394, 473, 427, 383, 394, 473, 427, 383);
        PairedSet set = beerAt(h, Placebo.SEASONAL);
        assertEquals(1, set.size());
        assertEquals(0, set.leftOut());
        assertEquals(expected[h - 1], set.forecasts()[0][0]);
        assertEquals(BEER_TEST[h - 1] * UNIT, set.actuals()[0]);
    }

    @Test
    void seasonalScaleBeforeTheFirstTestQuarterIsTheTrainingSeasonalNaiveMae() {
        // METHODS §9 A5 [printed R output]: seasonal naive in-sample MAE (60 residuals) = 14.3.
        // 858 / 60 = 14.3 units; in micros 14 300 000 exactly. Same for every h: the cycle is the same.
        for (int h = 1; h <= 10; h++) {
            assertEquals(14.3 * UNIT, beerAt(h, Placebo.SEASONAL).scales()[0], 1e-6, "h = " + h);
        }
    }

    @Test
    void naiveScaleBeforeTheFirstTestQuarterIsTheTrainingLagOneMae() {
        // METHODS §9 A5 [printed R output]: naive in-sample MAE (63 residuals) = 54.73016 (±5e-6 units).
        for (int h = 1; h <= 10; h++) {
            assertEquals(54.73016 * UNIT, beerAt(h, Placebo.NAIVE).scales()[0], 5e-6 * UNIT, "h = " + h);
        }
    }

    @Test
    void scorecardMaseOfTheSeasonalNaiveOverTheTestQuartersMatchesTheBook() {
        // Each lag h − 1 gives one pair, all with the same training scale Q = 14.3, so the pooled MASE over
        // the 10 test quarters is the mean of the per-lag scorecard MASEs: mean|e|/Q.
        // METHODS §9 A3 [printed R forecast::accuracy output]: seasonal naive MASE 0.9370629 (±5e-6);
        // A1 [printed]: mean method MASE 2.435315 (±5e-6); A2 [printed]: naive (flat 473) MASE 4.013986 (±5e-6).
        double[] sums = new double[3];
        double maeSum = 0;
        for (int h = 1; h <= 10; h++) {
            Scorecard card = Scorecard.of(beerAt(h, Placebo.SEASONAL), Placebo.SEASONAL,
                    BootstrapInterval.withDefaults());
            assertEquals(List.of("seasonal_naive", "mean", "last_value"),
                    card.steps().stream().map(StepScore::step).toList());
            for (int s = 0; s < 3; s++) {
                StepScore step = card.steps().get(s);
                assertEquals(0, step.maseLeftOut());
                sums[s] += step.mase().getAsDouble();
            }
            maeSum += card.steps().get(0).mae().getAsDouble();
        }
        assertEquals(0.9370629, sums[0] / 10, 5e-6);
        assertEquals(2.435315, sums[1] / 10, 5e-6);
        assertEquals(4.013986, sums[2] / 10, 5e-6);
        // METHODS §9 A3 [printed]: seasonal naive test MAE 13.4.
        assertEquals(13.4, maeSum / 10, 1e-9);
    }

    @Test
    void lagOneScaleGivesTheMuchSmallerSeasonalNaiveMase() {
        // METHODS §2.1 [computed here]: scaling the seasonal naive by the lag-1 naive MAE (54.73) instead of the
        // seasonal one gives 0.245 instead of 0.937 (13.4 / 54.73016). Printed to 3 digits: ±5e-4.
        // The seasonal-naive values enter as an imported step scored under the naive placebo.
        long[] seasonal = units(427, 383, 394, 473, 427, 383, 394, 473, 427, 383);
        double sum = 0;
        for (int h = 1; h <= 10; h++) {
            PairedSet set = PairedSet.of(beerActuals(), List.of("snaive"), List.of(oneForecast(h, seasonal[h - 1])),
                    h - 1, Placebo.NAIVE, 4);
            sum += Scorecard.of(set, Placebo.NAIVE, BootstrapInterval.withDefaults()).steps().get(1).mase()
                    .getAsDouble();
        }
        assertEquals(0.245, sum / 10, 5e-4);
    }

    // ---------------------------------------------------------------------------------------------
    // METHODS §9 R2, scored through the Scorecard. Items A = 1, B = 2, C = 3, lag 0 (cycle = period).
    // The N column is A(t − 1) for every period after the first (A: 100 120 90 → N 100 120 90 ...), so
    // putting one more actual before each item's first period — A 95, B 10, C 195, the first N values —
    // makes the naive placebo A(cycle − 1) equal the N column exactly, and R2's "naive" is the placebo.
    // ---------------------------------------------------------------------------------------------

    private static final int[][] R2_ACTUAL = {{100, 120, 90, 110}, {0, 40, 55}, {200, 210, 190, 205, 220}};
    private static final int[][] R2_NAIVE = {{95, 100, 120, 90}, {10, 0, 40}, {195, 200, 210, 190, 205}};
    private static final int[][] R2_STAT = {{105, 112, 100, 104}, {8, 30, 45}, {198, 205, 200, 205, 210}};
    private static final int[][] R2_FINAL = {{110, 118, 95, 104}, {5, 45, 70}, {190, 215, 185, 200, 228}};

    static Series r2Actuals() {
        Series.Builder b = new Series.Builder();
        for (int i = 0; i < 3; i++) {
            b.add(i + 1, P0 - 1, R2_NAIVE[i][0] * UNIT); // the actual before the first period
            for (int t = 0; t < R2_ACTUAL[i].length; t++) {
                b.add(i + 1, P0 + t, R2_ACTUAL[i][t] * UNIT);
            }
        }
        return b.build();
    }

    static Series r2Column(int[][] column) {
        Series.Builder b = new Series.Builder();
        for (int i = 0; i < 3; i++) {
            for (int t = 0; t < column[i].length; t++) {
                b.add(i + 1, P0 + t, column[i][t] * UNIT);
            }
        }
        return b.build();
    }

    private static Scorecard r2Scorecard() {
        PairedSet set = PairedSet.of(r2Actuals(), List.of("stat", "final"),
                List.of(r2Column(R2_STAT), r2Column(R2_FINAL)), 0, Placebo.NAIVE, 12);
        return Scorecard.of(set, Placebo.NAIVE, BootstrapInterval.withDefaults());
    }

    @Test
    void naivePlaceboOfTheR2FixtureIsItsNaiveColumn() {
        PairedSet set = PairedSet.of(r2Actuals(), List.of("stat", "final"),
                List.of(r2Column(R2_STAT), r2Column(R2_FINAL)), 0, Placebo.NAIVE, 12);
        assertEquals(12, set.size());
        assertEquals(0, set.leftOut());
        // METHODS §9 R2 N column, A 95 100 120 90 | B 10 0 40 | C 195 200 210 190 205, item by item.
        assertArrayEquals(units(95, 100, 120, 90, 10, 0, 40, 195, 200, 210, 190, 205),
                Arrays.copyOf(set.forecasts()[0], 12));
    }

    @Test
    void scoresTheR2FixtureStepByStep() {
        Scorecard card = r2Scorecard();
        assertEquals(12, card.pairs());
        assertEquals(0, card.leftOut());
        StepScore n = card.steps().get(0);
        StepScore s = card.steps().get(1);
        StepScore f = card.steps().get(2);
        assertEquals(List.of("naive", "stat", "final"), List.of(n.step(), s.step(), f.step()));
        // METHODS §9 R2 [computed here], tolerance 1e-9: pooled MAE N 17.0833333333, S 7.0, F 6.75.
        assertEquals(17.0833333333, n.mae().getAsDouble(), 1e-9);
        assertEquals(7.0, s.mae().getAsDouble(), 1e-9);
        assertEquals(6.75, f.mae().getAsDouble(), 1e-9);
        // R2 [computed here]: WAPE N 0.1331168831, S 0.0545454545, F 0.0525974026.
        assertEquals(0.1331168831, n.wape().getAsDouble(), 1e-9);
        assertEquals(0.0545454545, s.wape().getAsDouble(), 1e-9);
        assertEquals(0.0525974026, f.wape().getAsDouble(), 1e-9);
        assertEquals(1 - 0.0525974026, f.accuracy().getAsDouble(), 1e-9);
        // R2 [computed here]: percentage bias Σ(F−A)/ΣA N −0.0551948052, S −0.0116883117, F +0.0162337662.
        assertEquals(-0.0551948052, n.bias().getAsDouble(), 1e-9);
        assertEquals(-0.0116883117, s.bias().getAsDouble(), 1e-9);
        assertEquals(0.0162337662, f.bias().getAsDouble(), 1e-9);
        for (StepScore step : card.steps()) {
            assertEquals(12, step.n());
        }
    }

    @Test
    void comparesEachR2StepWithThePreviousOneAndThePlacebo() {
        Scorecard card = r2Scorecard();
        assertTrue(card.steps().get(0).vsPrevious().isEmpty());
        assertTrue(card.steps().get(0).fvaVsPlacebo().isEmpty());
        Comparison sVsN = card.steps().get(1).vsPrevious().orElseThrow();
        Comparison fVsS = card.steps().get(2).vsPrevious().orElseThrow();
        assertEquals("naive", sVsN.against());
        assertEquals("stat", fVsS.against());
        // METHODS §9 R2 [computed here]: AvgRelMAE(F vs S), weights 4/3/5 = 0.9782533570; S vs N 0.4092868110.
        assertEquals(0.9782533570, fVsS.avgRelMae().value().getAsDouble(), 1e-9);
        assertEquals(0.4092868110, sVsN.avgRelMae().value().getAsDouble(), 1e-9);
        assertEquals(0, fVsS.avgRelMae().seriesLeftOut());
        // R2 [computed here]: FVA in WAPE S vs N +0.0785714286, F vs S +0.0019480519 (accuracy differences).
        assertEquals(0.0785714286, sVsN.fva().getAsDouble(), 1e-9);
        assertEquals(0.0019480519, fVsS.fva().getAsDouble(), 1e-9);
        // From R2's Σ|e| [computed here]: F vs placebo = (205 − 81)/1540 = 0.0805194805; S vs placebo = S vs N.
        assertEquals(0.0805194805, card.steps().get(2).fvaVsPlacebo().getAsDouble(), 1e-9);
        assertEquals(0.0785714286, card.steps().get(1).fvaVsPlacebo().getAsDouble(), 1e-9);
        // 12 pairs are fewer than 30: no finding, whatever the numbers.
        assertEquals(Evidence.Label.TOO_FEW_TO_TELL, fVsS.evidence().label());
        assertEquals(Evidence.Label.TOO_FEW_TO_TELL, sVsN.evidence().label());
    }

    @Test
    void ranksTheFinalVsStatDifferencesLikeTheR2WilcoxonCheck() {
        // METHODS §9 R2 [computed here]: over the 11 adjustments d = |e_S| − |e_F| gives W+ = 28.5 with one zero
        // dropped; the 12th pair (A4, unadjusted) is one more zero difference.
        WilcoxonSignedRank.Result w = r2Scorecard().steps().get(2).vsPrevious().orElseThrow().wilcoxon();
        assertEquals(28.5, w.statistic(), 0);
        assertEquals(10, w.n());
        assertEquals(2, w.zerosDropped());
    }
}
