package org.plenum.score;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.plenum.core.Period;
import org.plenum.core.ScoredChange;
import org.plenum.core.Series;

/**
 * The decision lens on the 11 adjustments of METHODS §9 R2 (prior = S, new = F, actual = A). R2's values
 * are [computed here] in METHODS: a regression guard, not an external proof.
 */
class DecisionLensTest {
    private static final long UNIT = 1_000_000L;
    private static final int P0 = Period.parse("2026-01").index();

    private static final int[][] ACTUAL = {{100, 120, 90, 110}, {0, 40, 55}, {200, 210, 190, 205, 220}};
    private static final int[][] STAT = {{105, 112, 100, 104}, {8, 30, 45}, {198, 205, 200, 205, 210}};
    private static final int[][] FINAL = {{110, 118, 95, 104}, {5, 45, 70}, {190, 215, 185, 200, 228}};

    private static Series actuals() {
        Series.Builder b = new Series.Builder();
        for (int i = 0; i < 3; i++) {
            for (int t = 0; t < ACTUAL[i].length; t++) {
                b.add(i + 1, P0 + t, ACTUAL[i][t] * UNIT);
            }
        }
        return b.build();
    }

    /** The adjusted pairs of R2 (all but A4, where S = F = 104), labelled "A1" ... "C5". */
    private static List<ScoredChange> adjustments() {
        List<ScoredChange> out = new ArrayList<>();
        for (int i = 0; i < 3; i++) {
            for (int t = 0; t < ACTUAL[i].length; t++) {
                if (STAT[i][t] != FINAL[i][t]) {
                    out.add(change(i + 1, t, STAT[i][t], FINAL[i][t], ACTUAL[i][t], "ABC".charAt(i) + "" + (t + 1)));
                }
            }
        }
        return out;
    }

    private static ScoredChange change(int item, int t, long prior, long quantity, long actual, String label) {
        return new ScoredChange("meeting", item, P0 + t, P0 + t, prior * UNIT, quantity * UNIT, actual * UNIT, false,
                "ana", "other", label, null);
    }

    private static ScoredChange labelled(String label) {
        return adjustments().stream().filter(c -> c.reason().equals(label)).findFirst().orElseThrow();
    }

    private static LensGroup all() {
        List<LensGroup> groups = new DecisionLens(actuals()).groups(adjustments(), c -> List.of("all"));
        assertEquals(1, groups.size());
        return groups.get(0);
    }

    @Test
    void countsElevenAdjustments() {
        // METHODS §9 R2: 11 adjustments (A4 unadjusted).
        assertEquals(11, adjustments().size());
        assertEquals(11, all().count());
    }

    @Test
    void shareRightIsEightOfTheTenAdjustmentsThatHadADirectionToGet() {
        // METHODS §9 R2: wrong direction A1 and C1; unneeded C4 (S exact, need = 0), which has no right way.
        // Aimed = 11 − 1 (C4) = 10; right = 10 − 2 (A1, C1) = 8 → 8/10 = 0.8.
        assertEquals(0.8, all().shareRight().getAsDouble(), 1e-12);
    }

    @Test
    void shareOvershootIsFiveOfTheEightRightOnes() {
        // METHODS §9 R2: overshoots B2, B3, C2, C3, C5, all of them right-direction → 5/8 = 0.625.
        assertEquals(0.625, all().shareOvershoot().getAsDouble(), 1e-12);
    }

    @Test
    void shareOptimisticCountsNewValuesAboveTheActual() {
        // F > A [computed here from the R2 columns]: A1 110>100, A3 95>90, B1 5>0, B2 45>40, B3 70>55,
        // C2 215>210, C5 228>220 → 7; not A2 118<120, C1 190<200, C3 185<190, C4 200<205 → 7/11.
        assertEquals(7 / 11.0, all().shareOptimistic().getAsDouble(), 1e-12);
    }

    @Test
    void shareImprovedIsSixOfEleven() {
        // METHODS §9 R2: improved A2, A3, B1, B2, C3, C5 = 6; worsened 4; tie C2 (not improved) → 6/11.
        assertEquals(6 / 11.0, all().shareImproved().getAsDouble(), 1e-12);
    }

    @Test
    void biasIsTheVolumeWeightedOverForecastOfTheAdjustedPairs() {
        // [computed here from R2]: Σ(F − A) over the 11 = 10 − 2 + 5 + 5 + 5 + 15 − 10 + 5 − 5 − 5 + 8 = 31;
        // ΣA = 1540 − 110 (A4) = 1430 → 31/1430. (Check: R2's F bias 0.0162337662·1540 = 25 = 31 + (104 − 110).)
        assertEquals(31 / 1430.0, all().bias().getAsDouble(), 1e-12);
    }

    @Test
    void geometricMeanRatioLeavesOutTheInfiniteRatio() {
        GeometricMeanRatio.Result ratio = all().ratio();
        // METHODS §9 R2: RAE |A−F|/|A−S| = 2, 0.25, 0.5, 0.625, 0.5, 1.5, 5, 1, 0.5, ∞ (C4), 0.8;
        // GMRAE excluding non-finite = 0.8649502499 over 10 values (1e-9).
        assertEquals(0.8649502499, ratio.value().getAsDouble(), 1e-9);
        assertEquals(10, ratio.ratiosUsed());
        assertEquals(1, ratio.benchmarkExact());
        assertEquals(0, ratio.candidateExact());
        // ... and it is the GeometricMeanRatio of the same per-change errors.
        List<ScoredChange> changes = adjustments();
        long[] newErrors = changes.stream().mapToLong(c -> Math.abs(c.actual() - c.quantity())).toArray();
        long[] priorErrors = changes.stream().mapToLong(c -> Math.abs(c.actual() - c.prior())).toArray();
        assertEquals(GeometricMeanRatio.of(newErrors, priorErrors), ratio);
    }

    @Test
    void testsThePairedAbsoluteErrorsAndSaysTooFewToTell() {
        LensGroup g = all();
        // METHODS §9 R2: d = |e_S| − |e_F| = −5, 6, 5, 3, 5, −5, −8, 0, 5, −5, 2; one zero dropped; W+ = 28.5.
        assertEquals(28.5, g.wilcoxon().statistic(), 0);
        assertEquals(10, g.wilcoxon().n());
        assertEquals(1, g.wilcoxon().zerosDropped());
        assertEquals(WilcoxonSignedRank.Method.NORMAL, g.wilcoxon().method()); // six |d| tie at 5
        assertEquals(Evidence.Label.TOO_FEW_TO_TELL, g.evidence().label());
    }

    @Test
    void splitsByDirectionUpAndDown() {
        List<LensGroup> groups = new DecisionLens(actuals()).groups(adjustments(),
                c -> List.of(DecisionLens.direction(c)));
        assertEquals(List.of("down", "up"), groups.stream().map(LensGroup::key).toList());
        LensGroup down = groups.get(0);
        LensGroup up = groups.get(1);
        // METHODS §9 R2: positive 6 (A1, A2, B2, B3, C2, C5), negative 5 (A3, B1, C1, C3, C4).
        assertEquals(6, up.count());
        assertEquals(5, down.count());
        // Up: A1 wrong, the other 5 right → 5/6. Down: C1 wrong, C4 unneeded, A3 B1 C3 right → 3/4.
        assertEquals(5 / 6.0, up.shareRight().getAsDouble(), 1e-12);
        assertEquals(3 / 4.0, down.shareRight().getAsDouble(), 1e-12);
        // Improved: up A2, B2, C5 → 3/6; down A3, B1, C3 → 3/5.
        assertEquals(0.5, up.shareImproved().getAsDouble(), 1e-12);
        assertEquals(0.6, down.shareImproved().getAsDouble(), 1e-12);
        // Up RAEs 2, 0.25, 0.5, 1.5, 1, 0.8: product 0.3 → 0.3^(1/6) [computed here].
        assertEquals(Math.pow(0.3, 1 / 6.0), up.ratio().value().getAsDouble(), 1e-12);
        // Down RAEs 0.5, 0.625, 5, 0.5 and C4 infinite: product 0.78125 → 0.78125^(1/4) [computed here].
        assertEquals(Math.pow(0.78125, 1 / 4.0), down.ratio().value().getAsDouble(), 1e-12);
        assertEquals(1, down.ratio().benchmarkExact());
    }

    @ParameterizedTest(name = "{0} → {1}")
    @CsvSource({
        // METHODS §9 R2 relative sizes 100·adj/S and DESIGN §5 bands (lower bounds inclusive):
        "A1, up under 5%",    // +4.7619%
        "A2, up 5-15%",       // +5.3571%
        "A3, down 5-15%",     // exactly −5.0%
        "B1, down 35-100%",   // −37.5%
        "B2, up 35-100%",     // +50.0%
        "B3, up 35-100%",     // +55.5556%
        "C1, down under 5%",  // −4.0404%
        "C4, down under 5%"}) // −2.4390%
    void namesTheSizeClassOfEachAdjustment(String label, String expected) {
        assertEquals(expected, DecisionLens.sizeClass(labelled(label)));
    }

    @Test
    void namesKeptChangesAndChangesToZero() {
        ScoredChange kept = new ScoredChange("meeting", 1, P0, P0, 50 * UNIT, 50 * UNIT, 40 * UNIT, true, "ana",
                "other", "no news", null);
        assertEquals("kept", DecisionLens.sizeClass(kept));
        assertEquals("kept", DecisionLens.direction(kept));
        ScoredChange zero = change(1, 0, 8, 0, 0, "delisted");
        assertEquals("set to zero", DecisionLens.sizeClass(zero));
        ScoredChange doubled = change(1, 0, 50, 100, 90, "promo");
        // Doubling is the top band, "over 100%" (the exact wording of that key is left open here).
        assertTrue(DecisionLens.sizeClass(doubled).startsWith("up ") && DecisionLens.sizeClass(doubled).contains("100%"),
                DecisionLens.sizeClass(doubled));
    }

    @Test
    void aChangeWithSeveralKeysCountsInEachGroup() {
        List<LensGroup> groups = new DecisionLens(actuals()).groups(adjustments(),
                c -> c.reason().startsWith("A") ? List.of("A", "first") : List.of("rest"));
        assertEquals(List.of("A", "first", "rest"), groups.stream().map(LensGroup::key).toList());
        assertEquals(3, groups.get(0).count()); // A1, A2, A3
        assertEquals(3, groups.get(1).count());
        assertEquals(8, groups.get(2).count());
    }

    @Test
    void medianScaledSizeDividesTheChangeByTheItemsInSampleNaiveMae() {
        // Invented, sanity check of the arithmetic: item 9 has actuals 10, 14, 12 at P0..P0+2, so before cycle
        // P0+3 the naive MAE is (|14 − 10| + |12 − 14|)/2 = 3. Changes 30 → 36, 30 → 27, 30 → 42 have scaled
        // sizes 6/3 = 2, 3/3 = 1, 12/3 = 4: median 2.
        Series.Builder b = new Series.Builder();
        b.add(9, P0, 10 * UNIT);
        b.add(9, P0 + 1, 14 * UNIT);
        b.add(9, P0 + 2, 12 * UNIT);
        b.add(9, P0 + 3, 33 * UNIT);
        List<ScoredChange> changes = List.of(
                new ScoredChange("meeting", 9, P0 + 3, P0 + 3, 30 * UNIT, 36 * UNIT, 33 * UNIT, false, "a", "t", "r", null),
                new ScoredChange("meeting", 9, P0 + 3, P0 + 3, 30 * UNIT, 27 * UNIT, 33 * UNIT, false, "a", "t", "r", null),
                new ScoredChange("meeting", 9, P0 + 3, P0 + 3, 30 * UNIT, 42 * UNIT, 33 * UNIT, false, "a", "t", "r", null));
        LensGroup g = new DecisionLens(b.build()).groups(changes, c -> List.of("x")).get(0);
        assertEquals(2.0, g.medianScaledSize().getAsDouble(), 1e-12);
        assertTrue(g.shareRight().isPresent());
    }
}
