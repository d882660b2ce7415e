package org.plenum.score;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.util.Arrays;
import java.util.List;
import java.util.OptionalDouble;
import java.util.stream.LongStream;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.simple.RandomSource;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.plenum.core.FvaFixture;
import org.plenum.score.WilcoxonSignedRank.Alternative;
import org.plenum.score.WilcoxonSignedRank.Method;

class WilcoxonSignedRankTest {

    /** Hollander & Wolfe (1973) depression scores, first (x) and second (y) visit: METHODS data set HW. */
    private static final long[] HW_X = micros("1.83", "0.50", "1.62", "2.48", "1.68", "1.88", "1.55", "3.06", "1.30");
    private static final long[] HW_Y = micros("0.878", "0.647", "0.598", "2.05", "1.06", "1.29", "1.06", "3.14", "1.29");
    /** SciPy's wilcoxon docstring example (Fisher's Zea mays height differences): METHODS W5. */
    private static final long[] ZEA_MAYS = LongStream.of(6, 8, 14, 16, 23, 24, 28, 29, 41, -48, 49, 56, 60, -67, 75)
            .map(d -> d * 1_000_000).toArray();

    private static final WilcoxonSignedRank TEST = WilcoxonSignedRank.twoSided();

    private static long[] micros(String... decimals) {
        return Arrays.stream(decimals).mapToLong(d -> new BigDecimal(d).movePointRight(6).longValueExact()).toArray();
    }

    private static long[] minus(long[] x, long[] y) {
        long[] d = new long[x.length];
        Arrays.setAll(d, i -> x[i] - y[i]);
        return d;
    }

    private static double p(WilcoxonSignedRank.Result result) {
        return result.pValue().getAsDouble();
    }

    @Test
    void subtractsTheDecimalScoresExactly() {
        // 1.30 − 1.29 is 0.010000000000000009 in doubles; in millionths it is exactly 0.01.
        assertEquals(10_000L, minus(HW_X, HW_Y)[8]);
    }

    @Test
    void reproducesRsPairedExampleOneSided() {
        WilcoxonSignedRank.Result result = TEST.with(Alternative.GREATER).test(minus(HW_X, HW_Y));
        // METHODS W1 [printed]: R wilcox.test(x, y, paired = TRUE, alternative = "greater"): V = 40, p = 0.01953 = 10/512.
        assertEquals(40.0, result.statistic(), 0);
        assertEquals(0.01953125, p(result), 1e-15);
        assertEquals(Method.EXACT, result.method());
        assertEquals(9, result.n());
        assertFalse(result.ties());
    }

    @Test
    void reproducesRsPairedExampleTwoSided() {
        // METHODS W2 [computed here, and Commons Math 3 exact agrees]: two-sided exact p = 0.0390625.
        assertEquals(0.0390625, p(TEST.test(minus(HW_X, HW_Y))), 1e-15);
        assertEquals(commonsMathExact(minus(HW_X, HW_Y)), p(TEST.test(minus(HW_X, HW_Y))), 1e-15);
        WilcoxonSignedRank.Result reversed = TEST.with(Alternative.LESS).test(minus(HW_Y, HW_X));
        // METHODS W2 [printed]: wilcox.test(y − x, alternative = "less"): V = 5, p = 0.01953.
        assertEquals(5.0, reversed.statistic(), 0);
        assertEquals(0.01953, p(reversed), 5e-6);
    }

    @Test
    void reproducesTheLargeSampleApproximationWithoutContinuityCorrection() {
        WilcoxonSignedRank normal = TEST.withExact(false).withContinuityCorrection(false).with(Alternative.GREATER);
        WilcoxonSignedRank.Result result = normal.test(minus(HW_X, HW_Y));
        // METHODS W3 [printed]: R exact = FALSE, correct = FALSE, one-sided p = 0.01908 (±5e-6);
        // full digits 0.019075855086707567 [computed here, SciPy].
        assertEquals(0.01908, p(result), 5e-6);
        assertEquals(0.019075855086707567, p(result), 1e-15);
        assertEquals(Method.NORMAL, result.method());
    }

    @Test
    void reproducesTheLargeSampleApproximationWithContinuityCorrection() {
        WilcoxonSignedRank normal = TEST.withExact(false);
        // METHODS W3 [computed here]: with continuity correction one-sided 0.0220054920, two-sided 0.0440109840 (1e-10).
        assertEquals(0.0220054920, p(normal.with(Alternative.GREATER).test(minus(HW_X, HW_Y))), 1e-10);
        assertEquals(0.0440109840, p(normal.test(minus(HW_X, HW_Y))), 1e-10);
    }

    @Test
    void testsOneSampleAgainstALocation() {
        WilcoxonSignedRank.Result twoSided = TEST.withMu(1_600_000).test(HW_X);
        // METHODS W4 [printed]: wilcox.test(x, mu = 1.6): V = 29, p = 0.4961 (±5e-5).
        assertEquals(29.0, twoSided.statistic(), 0);
        assertEquals(0.4961, p(twoSided), 5e-5);
        WilcoxonSignedRank.Result greater = TEST.withMu(3_000_000).with(Alternative.GREATER).test(HW_X);
        // METHODS W4 [printed]: wilcox.test(x, mu = 3, alternative = "greater"): V = 1, p = 0.998 (±5e-4).
        assertEquals(1.0, greater.statistic(), 0);
        assertEquals(0.998, p(greater), 5e-4);
    }

    @Test
    void reproducesSciPysZeaMaysExample() {
        WilcoxonSignedRank.Result greater = TEST.with(Alternative.GREATER).test(ZEA_MAYS);
        // METHODS W5 [from memory of the SciPy docs; reproduced with SciPy]: W+ = 96, p = 0.0206298828125.
        assertEquals(96.0, greater.statistic(), 0);
        assertEquals(0.0206298828125, p(greater), 1e-15);
        WilcoxonSignedRank.Result twoSided = TEST.test(ZEA_MAYS);
        // METHODS W5 (as above): two-sided exact p = 0.041259765625, min(W+, W−) = 24.
        assertEquals(0.041259765625, p(twoSided), 1e-15);
        assertEquals(24.0, twoSided.n() * (twoSided.n() + 1) / 2.0 - twoSided.statistic(), 0);
        // Independent reference for the unverified docs value: Commons Math 3.6.1 exact two-sided p.
        assertEquals(commonsMathExact(ZEA_MAYS), p(twoSided), 1e-15);
    }

    @Test
    void dropsTheZeroAndUsesTheNormalApproximationForTheFixturesTies() {
        List<FvaFixture.Pair> adjusted = FvaFixture.adjusted();
        long[] d = adjusted.stream().mapToLong(p -> Math.abs(p.actual() - p.stat()) - Math.abs(p.actual() - p.fin())).toArray();
        WilcoxonSignedRank.Result result = TEST.with(Alternative.GREATER).withContinuityCorrection(false).test(d);
        // METHODS R2 [computed here, cross-checked with SciPy]: one zero dropped, six |d| = 5 tie,
        // W+ = 28.5, normal approximation (variance 91.875) without continuity correction, "F better" p = 0.4584544870 (1e-8).
        assertEquals(1, result.zerosDropped());
        assertEquals(10, result.n());
        assertTrue(result.ties());
        assertEquals(Method.NORMAL, result.method());
        assertEquals(28.5, result.statistic(), 0);
        assertEquals(0.4584544870, p(result), 1e-8);
    }

    @Test
    void dropsZerosBeforeRankingLikeWilcoxonNotPratt() {
        long[] withZeros = {0, 0, 1, 2, 3, -4, 5, 6};
        WilcoxonSignedRank.Result result = TEST.test(withZeros);
        // Ranked without the zeros: 1+2+3+5+6 = 17 (Pratt's method would rank them and give 27).
        assertEquals(17.0, result.statistic(), 0);
        assertEquals(2, result.zerosDropped());
        assertEquals(Method.EXACT, result.method());
        assertEquals(TEST.test(new long[] {1, 2, 3, -4, 5, 6}).pValue(), result.pValue());
    }

    @Test
    void findsTiesOnTheExactValues() {
        // 1.30 − 1.29 and 0.21 − 0.20 are both exactly 0.01 (in doubles they differ): a tie, so no exact test.
        long[] d = {minus(HW_X, HW_Y)[8], micros("0.21")[0] - micros("0.20")[0], 3, -7};
        WilcoxonSignedRank.Result result = TEST.test(d);
        assertTrue(result.ties());
        assertEquals(Method.NORMAL, result.method());
    }

    @Test
    void hasNoPValueWithoutPairs() {
        WilcoxonSignedRank.Result result = TEST.test(new long[0]);
        assertEquals(OptionalDouble.empty(), result.pValue());
        assertEquals(Method.NONE, result.method());
        assertEquals(0, result.n());
    }

    @Test
    void givesOneWhenEveryDifferenceIsZero() {
        WilcoxonSignedRank.Result result = TEST.test(new long[] {0, 0, 0});
        assertEquals(1.0, p(result), 0);
        assertEquals(3, result.zerosDropped());
        assertEquals(Method.NONE, result.method());
    }

    @ParameterizedTest(name = "n = {0}")
    @ValueSource(ints = {1, 2, 48, 49})
    void usesTheExactDistributionBelowFiftyTieFreePairs(int n) {
        assertEquals(Method.EXACT, TEST.test(distinctSigned(n, 3)).method());
    }

    @ParameterizedTest(name = "n = {0}")
    @ValueSource(ints = {50, 51, 200})
    void usesTheNormalApproximationFromFiftyPairs(int n) {
        assertEquals(Method.NORMAL, TEST.test(distinctSigned(n, 5)).method());
    }

    @Test
    void agreesWithCommonsMathExactOnRandomTieFreeSamples() {
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(7L);
        for (int trial = 0; trial < 60; trial++) {
            long[] d = distinctSigned(1 + rng.nextInt(20), rng.nextLong());
            WilcoxonSignedRank.Result ours = TEST.test(d);
            double sum = d.length * (d.length + 1) / 2.0;
            // Reference: Commons Math 3.6.1 exact two-sided p (n ≤ 30, no ties or zeros, where the conventions agree;
            // n ≤ 20 here because it enumerates all 2^n sign patterns); its statistic is max(W+, W−).
            assertEquals(Math.max(ours.statistic(), sum - ours.statistic()), commonsMathStatistic(d), 0);
            assertEquals(commonsMathExact(d), p(ours), 1e-12, () -> Arrays.toString(d));
        }
    }

    /** Distinct non-zero sizes with random signs (invented data for invariants only). */
    private static long[] distinctSigned(int n, long seed) {
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(seed);
        long[] d = new long[n];
        for (int i = 0; i < n; i++) {
            d[i] = (i + 1) * 1_000L + rng.nextInt(1_000); // distinct magnitudes
            d[i] *= rng.nextBoolean() ? 1 : -1;
        }
        return d;
    }

    private static double commonsMathExact(long[] d) {
        double[] x = Arrays.stream(d).asDoubleStream().toArray();
        double p = new org.apache.commons.math3.stat.inference.WilcoxonSignedRankTest()
                .wilcoxonSignedRankTest(x, new double[x.length], true);
        return Math.min(1, p); // Commons Math 3 does not clip 2·P(W ≥ Wmax) at 1
    }

    private static double commonsMathStatistic(long[] d) {
        double[] x = Arrays.stream(d).asDoubleStream().toArray();
        return new org.apache.commons.math3.stat.inference.WilcoxonSignedRankTest().wilcoxonSignedRank(x, new double[x.length]);
    }
}
