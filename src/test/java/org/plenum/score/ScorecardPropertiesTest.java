package org.plenum.score;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.function.LongUnaryOperator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.plenum.core.Period;
import org.plenum.core.Series;

/**
 * Properties of the scorecard on invented random data (fixed seeds). These are properties, not proofs:
 * the data are made up and only the relations between the outputs are asserted.
 */
class ScorecardPropertiesTest {
    private static final int P0 = Period.parse("2025-01").index();
    private static final int ITEMS = 25;
    private static final int PERIODS = 30;
    private static final int LAG = 1;

    /** Invented actuals and three steps at lag 1; "meeting" is an exact copy of "stat". */
    private record World(Series actuals, Series stat, Series meeting, Series fin) {
        World map(LongUnaryOperator f) {
            return new World(map(actuals, f), map(stat, f), map(meeting, f), map(fin, f));
        }

        private static Series map(Series s, LongUnaryOperator f) {
            long[] q = new long[s.size()];
            for (int i = 0; i < s.size(); i++) {
                q[i] = f.applyAsLong(s.quantities()[i]);
            }
            return new Series(s.items(), s.periods(), q, s.size());
        }
    }

    private static World world(long seed) {
        SplittableRandom rng = new SplittableRandom(seed);
        Series.Builder actuals = new Series.Builder();
        Series.Builder stat = new Series.Builder();
        Series.Builder fin = new Series.Builder();
        for (int item = 1; item <= ITEMS; item++) {
            long level = rng.nextLong(5_000_000L, 500_000_000L); // 5 to 500 units, in micros
            for (int t = 0; t < PERIODS; t++) {
                long actual = Math.max(0, level + rng.nextLong(-level / 3, level / 3 + 1));
                actuals.add(item, P0 + t, actual);
                if (t >= LAG + 1) { // cycle t − 1 ≥ P0 + 1, so the naive placebo A(cycle − 1) exists
                    long s = Math.max(0, actual + rng.nextLong(-level / 4, level / 4 + 1));
                    long f = Math.max(0, s + rng.nextLong(-level / 5, level / 5 + 1));
                    stat.add(item, P0 + t, s);
                    fin.add(item, P0 + t, f);
                }
            }
        }
        Series st = stat.build();
        Series copy = new Series(st.items().clone(), st.periods().clone(), st.quantities().clone(), st.size());
        return new World(actuals.build(), st, copy, fin.build());
    }

    private static Scorecard card(World w, Placebo placebo) {
        PairedSet set = PairedSet.of(w.actuals(), List.of("stat", "meeting", "final"),
                List.of(w.stat(), w.meeting(), w.fin()), LAG, placebo, 12);
        return Scorecard.of(set, placebo, BootstrapInterval.withDefaults().withDraws(200));
    }

    private static Comparison vs(Scorecard card, String step) {
        return card.steps().stream().filter(s -> s.step().equals(step)).findFirst().orElseThrow().vsPrevious()
                .orElseThrow();
    }

    @ParameterizedTest(name = "seed {0}")
    @ValueSource(longs = {1, 2, 3})
    void aStepIdenticalToItsPredecessorAddsExactlyNothing(long seed) {
        Scorecard card = card(world(seed), Placebo.NAIVE);
        assertEquals(ITEMS * (PERIODS - 2), card.pairs());
        Comparison same = vs(card, "meeting");
        assertEquals("stat", same.against());
        assertEquals(0.0, same.fva().getAsDouble(), 0);
        assertEquals(1.0, same.avgRelMae().value().getAsDouble(), 0);
        assertEquals(1.0, same.wilcoxon().pValue().getAsDouble(), 0);
        assertNotEquals(Evidence.Label.BETTER, same.evidence().label());
        assertNotEquals(Evidence.Label.WORSE, same.evidence().label());
        // The next step is compared with an exact copy of stat, so it reads as if compared with stat itself.
        PairedSet withoutCopy = PairedSet.of(world(seed).actuals(), List.of("stat", "final"),
                List.of(world(seed).stat(), world(seed).fin()), LAG, Placebo.NAIVE, 12);
        Comparison direct = vs(Scorecard.of(withoutCopy, Placebo.NAIVE, BootstrapInterval.withDefaults().withDraws(200)),
                "final");
        assertEquals(direct.avgRelMae().value().getAsDouble(), vs(card, "final").avgRelMae().value().getAsDouble(), 0);
        assertEquals(direct.wilcoxon().pValue().getAsDouble(), vs(card, "final").wilcoxon().pValue().getAsDouble(), 0);
    }

    @ParameterizedTest(name = "seed {0}")
    @ValueSource(longs = {4, 5, 6})
    void multiplyingEveryQuantityBySevenLeavesTheUnitFreeNumbersAlone(long seed) {
        World w = world(seed);
        for (Placebo placebo : Placebo.values()) {
            Scorecard base = card(w, placebo);
            Scorecard scaled = card(w.map(q -> 7 * q), placebo);
            assertEquals(base.pairs(), scaled.pairs());
            for (int s = 0; s < base.steps().size(); s++) {
                StepScore a = base.steps().get(s);
                StepScore b = scaled.steps().get(s);
                String what = placebo + " " + a.step();
                assertEquals(a.wape().getAsDouble(), b.wape().getAsDouble(), 1e-12, what);
                assertEquals(a.accuracy().getAsDouble(), b.accuracy().getAsDouble(), 1e-12, what);
                assertEquals(a.bias().getAsDouble(), b.bias().getAsDouble(), 1e-12, what);
                assertEquals(a.maseLeftOut(), b.maseLeftOut(), what);
                assertTrue(a.mase().isPresent(), what);
                assertEquals(a.mase().getAsDouble(), b.mase().getAsDouble(), 1e-12, what);
                // MAE is in units, so it does scale: 7 times as large.
                assertEquals(7 * a.mae().getAsDouble(), b.mae().getAsDouble(), 1e-9 * b.mae().getAsDouble(), what);
                if (s > 0) {
                    Comparison ca = a.vsPrevious().orElseThrow();
                    Comparison cb = b.vsPrevious().orElseThrow();
                    assertEquals(ca.avgRelMae().value().getAsDouble(), cb.avgRelMae().value().getAsDouble(), 1e-12,
                            what);
                    assertEquals(ca.wilcoxon().pValue().getAsDouble(), cb.wilcoxon().pValue().getAsDouble(), 1e-12,
                            what);
                    assertEquals(ca.fva().getAsDouble(), cb.fva().getAsDouble(), 1e-12, what);
                    assertEquals(ca.evidence().label(), cb.evidence().label(), what);
                }
            }
        }
    }

    @ParameterizedTest(name = "seed {0}")
    @ValueSource(longs = {7, 8, 9})
    void swappingTwoStepsInvertsAvgRelMae(long seed) {
        World w = world(seed);
        BootstrapInterval bootstrap = BootstrapInterval.withDefaults().withDraws(200);
        Scorecard forward = Scorecard.of(PairedSet.of(w.actuals(), List.of("stat", "final"),
                List.of(w.stat(), w.fin()), LAG, Placebo.NAIVE, 12), Placebo.NAIVE, bootstrap);
        Scorecard backward = Scorecard.of(PairedSet.of(w.actuals(), List.of("final", "stat"),
                List.of(w.fin(), w.stat()), LAG, Placebo.NAIVE, 12), Placebo.NAIVE, bootstrap);
        Comparison finalVsStat = vs(forward, "final");
        Comparison statVsFinal = vs(backward, "stat");
        double r = finalVsStat.avgRelMae().value().getAsDouble();
        assertNotEquals(1.0, r, 1e-6); // the property would be empty at r = 1
        assertEquals(1 / r, statVsFinal.avgRelMae().value().getAsDouble(), 1e-12);
        // The two-sided test only flips the sign of every difference: same p, opposite FVA.
        assertEquals(finalVsStat.wilcoxon().pValue().getAsDouble(), statVsFinal.wilcoxon().pValue().getAsDouble(),
                1e-12);
        assertEquals(-finalVsStat.fva().getAsDouble(), statVsFinal.fva().getAsDouble(), 1e-12);
    }

    /**
     * {@code n} items with one pair each at lag 1: actual 100 at the placebo's period and at the target,
     * stat off by 10 + i units, final off by 1 unit, so final is better on every pair and every difference
     * (9 + i units) has its own size: no ties, no zeros.
     */
    private static Comparison finalClearlyBetterOn(int n) {
        Series.Builder actuals = new Series.Builder();
        Series.Builder stat = new Series.Builder();
        Series.Builder fin = new Series.Builder();
        for (int i = 1; i <= n; i++) {
            actuals.add(i, P0, 100_000_000L);
            actuals.add(i, P0 + 2, 100_000_000L);
            stat.add(i, P0 + 2, (110L + i) * 1_000_000L);
            fin.add(i, P0 + 2, 101_000_000L);
        }
        PairedSet set = PairedSet.of(actuals.build(), List.of("stat", "final"), List.of(stat.build(), fin.build()), LAG,
                Placebo.NAIVE, 12);
        assertEquals(n, set.size());
        return vs(Scorecard.of(set, Placebo.NAIVE, BootstrapInterval.withDefaults().withDraws(200)), "final");
    }

    @Test
    void fewerThanThirtyPairsAreTooFewToTellHoweverClearTheyLook() {
        Comparison c = finalClearlyBetterOn(29);
        assertEquals(29, c.wilcoxon().n());
        // All 29 differences positive: the exact two-sided p is 2/2^29, far below 0.05 ...
        assertTrue(c.wilcoxon().pValue().getAsDouble() < 1e-6, c.wilcoxon().toString());
        assertTrue(c.avgRelMae().value().getAsDouble() < 1);
        // ... and still DESIGN §5 says: fewer than 30 pairs → "too few to tell".
        assertEquals("too few to tell", c.evidence().label().text());
    }

    @Test
    void thirtyPairsAreEnoughForAFinding() {
        // The counterpart at the boundary: the same pattern on 30 pairs supports "better".
        assertEquals("better", finalClearlyBetterOn(30).evidence().label().text());
    }

    @Test
    void randomWorldsHaveEnoughPairsForTheRuleToApply() {
        // Guard for the properties above: they run on 700 pairs, and the random final differs from stat.
        Scorecard card = card(world(1), Placebo.NAIVE);
        List<String> labels = new ArrayList<>();
        card.steps().forEach(s -> s.vsPrevious().ifPresent(c -> labels.add(c.evidence().label().text())));
        assertEquals(3, labels.size());
        assertNotEquals("too few to tell", labels.get(2));
    }
}
