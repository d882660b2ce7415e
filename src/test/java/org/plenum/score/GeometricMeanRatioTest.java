package org.plenum.score;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import java.util.OptionalDouble;
import org.apache.commons.math3.stat.StatUtils;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.simple.RandomSource;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.plenum.core.FvaFixture;

class GeometricMeanRatioTest {

    private static final List<FvaFixture.Pair> ADJUSTED = FvaFixture.adjusted();

    private static long[] finalErrors() {
        return ADJUSTED.stream().mapToLong(p -> p.actual() - p.fin()).toArray();
    }

    private static long[] statErrors() {
        return ADJUSTED.stream().mapToLong(p -> p.actual() - p.stat()).toArray();
    }

    @ParameterizedTest(name = "{0}: RAE {1}")
    @CsvSource({"A1, 2", "A2, 0.25", "A3, 0.5", "B1, 0.625", "B2, 0.5", "B3, 1.5", "C1, 5", "C2, 1", "C3, 0.5", "C5, 0.8"})
    void givesEachAdjustmentsRelativeAbsoluteError(String label, double rae) {
        FvaFixture.Pair pair = ADJUSTED.stream().filter(p -> p.label().equals(label)).findFirst().orElseThrow();
        // METHODS R2 [computed here]: per-adjustment RAE = |A − F| / |A − S|.
        assertEquals(rae, GeometricMeanRatio.relativeAbsoluteError(pair.actual() - pair.fin(), pair.actual() - pair.stat())
                .getAsDouble(), 1e-15);
    }

    @Test
    void hasNoFiniteRatioWhenTheBenchmarkWasExact() {
        // METHODS R2 [computed here]: C4 (S 205 = A 205, F 200) has RAE ∞, reported as no ratio.
        assertEquals(OptionalDouble.empty(), GeometricMeanRatio.relativeAbsoluteError(5_000_000, 0));
        assertEquals(OptionalDouble.empty(), GeometricMeanRatio.relativeAbsoluteError(0, 0));
        assertEquals(0.0, GeometricMeanRatio.relativeAbsoluteError(0, 3).getAsDouble(), 0);
    }

    @Test
    void leavesOutTheInfiniteRatioOfTheFixture() {
        GeometricMeanRatio.Result result = GeometricMeanRatio.of(finalErrors(), statErrors());
        // METHODS R2 [computed here]: GMRAE excluding non-finite 0.8649502499 over 10 values (1e-9);
        // METHODS B1 [computed here] gives the same geometric mean from the log-scale t-interval.
        assertEquals(0.8649502499, result.value().getAsDouble(), 1e-9);
        assertEquals(10, result.ratiosUsed());
        assertEquals(1, result.benchmarkExact());
        assertEquals(0, result.candidateExact());
        assertEquals(0, result.bothExact());
    }

    @Test
    void winsorisesTheFixtureToTheArmstrongCollopyBounds() {
        GeometricMeanRatio.Result result =
                GeometricMeanRatio.of(finalErrors(), statErrors(), GeometricMeanRatio.Variant.WINSORISED);
        // METHODS R2 [computed here]: winsorised to [0.01, 10] with ∞ → 10: 1.0805087761 over 11 values (1e-9).
        assertEquals(1.0805087761, result.value().getAsDouble(), 1e-9);
        assertEquals(11, result.ratiosUsed());
        assertEquals(1, result.benchmarkExact());
    }

    @Test
    void countsExactHitsApartAndLeavesOutZeroOverZero() {
        long[] candidate = {0, 0, 4, 2};
        long[] benchmark = {3, 0, 0, 8};
        GeometricMeanRatio.Result excluded = GeometricMeanRatio.of(candidate, benchmark);
        assertEquals(0.25, excluded.value().getAsDouble(), 1e-15);
        assertEquals(1, excluded.ratiosUsed());
        assertEquals(1, excluded.candidateExact());
        assertEquals(1, excluded.benchmarkExact());
        assertEquals(1, excluded.bothExact());
        GeometricMeanRatio.Result winsorised = GeometricMeanRatio.of(candidate, benchmark, GeometricMeanRatio.Variant.WINSORISED);
        // 0 → 0.01, ∞ → 10, 0/0 left out: (0.01 · 10 · 0.25)^(1/3).
        assertEquals(Math.cbrt(0.025), winsorised.value().getAsDouble(), 1e-15);
        assertEquals(3, winsorised.ratiosUsed());
    }

    @Test
    void clampsFiniteRatiosWhenWinsorising() {
        // 1/200 → 0.01 and 300/2 → 10: (0.01 · 10)^(1/2).
        GeometricMeanRatio.Result result =
                GeometricMeanRatio.of(new long[] {1, 300}, new long[] {200, 2}, GeometricMeanRatio.Variant.WINSORISED);
        assertEquals(Math.sqrt(0.1), result.value().getAsDouble(), 1e-15);
    }

    @Test
    void isEmptyWithoutAUsableRatio() {
        assertEquals(OptionalDouble.empty(), GeometricMeanRatio.of(new long[0], new long[0]).value());
        assertEquals(OptionalDouble.empty(), GeometricMeanRatio.of(new long[] {0, 5}, new long[] {4, 0}).value());
        assertEquals(OptionalDouble.empty(),
                GeometricMeanRatio.of(new long[] {0}, new long[] {0}, GeometricMeanRatio.Variant.WINSORISED).value());
    }

    @Test
    void agreesWithCommonsMathOnRandomErrors() {
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(42L);
        long[] candidate = new long[500];
        long[] benchmark = new long[500];
        double[] ratios = new double[500];
        for (int t = 0; t < 500; t++) {
            candidate[t] = (rng.nextBoolean() ? 1 : -1) * (1 + rng.nextLong(50_000_000_000L));
            benchmark[t] = (rng.nextBoolean() ? 1 : -1) * (1 + rng.nextLong(50_000_000_000L));
            ratios[t] = Math.abs(candidate[t]) / (double) Math.abs(benchmark[t]);
        }
        // Reference: Apache Commons Math 3.6.1 StatUtils.geometricMean on the same ratios.
        assertEquals(StatUtils.geometricMean(ratios), GeometricMeanRatio.of(candidate, benchmark).value().getAsDouble(), 1e-12);
    }

    @Test
    void refusesUnpairedErrors() {
        assertThrows(IllegalArgumentException.class, () -> GeometricMeanRatio.of(new long[1], new long[2]));
    }
}
