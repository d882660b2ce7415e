package org.plenum.score;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.plenum.core.FvaFixture.Sku;

class BootstrapIntervalTest {

    /** The R2 fixture's AvgRelMAE of final against stat, weights 4/3/5. */
    private static final AvgRelMae.Result R2 = AvgRelMae.of(AvgRelMaeTest.r2(Sku::fin, Sku::stat));

    /** METHODS B2 [computed here]: sorted statistics of all 27 ordered resamples of the 3 series (±1e-6). */
    private static final double[] B2_SORTED = {
        0.793103, 0.819148, 0.819148, 0.819148, 0.851532, 0.851532, 0.851532, 0.892857, 0.936631, 0.936631,
        0.936631, 0.978253, 0.978253, 0.978253, 0.978253, 0.978253, 0.978253, 1.029835, 1.029835, 1.029835,
        1.080158, 1.080158, 1.080158, 1.136791, 1.136791, 1.136791, 1.222222};

    @Test
    void enumeratesTheExhaustiveBootstrapOfTheFixture() {
        double[] all = new double[27];
        int k = 0;
        for (int a = 0; a < 3; a++) {
            for (int b = 0; b < 3; b++) {
                for (int c = 0; c < 3; c++) {
                    all[k++] = R2.logRatios().geometricMean(new int[] {a, b, c});
                }
            }
        }
        Arrays.sort(all);
        // METHODS B2 [computed here]: the 27 values, median (14th) = the point estimate 0.9782533570.
        assertArrayEquals(B2_SORTED, all, 1e-6);
        assertEquals(0.7931034483, all[0], 1e-9);
        assertEquals(1.2222222222, all[26], 1e-9);
        assertEquals(0.9782533570, all[13], 1e-9);
    }

    @Test
    void drawsOnlyValuesTheExhaustiveBootstrapAllows() {
        double[] distinct = Arrays.stream(B2_SORTED).distinct().toArray();
        assertEquals(10, distinct.length);
        for (double value : BootstrapInterval.withDefaults().resample(R2.logRatios())) {
            // METHODS B2 [computed here]: every resample is one of the 10 distinct exhaustive values (±1e-6).
            assertTrue(Arrays.stream(distinct).anyMatch(v -> Math.abs(v - value) < 1e-6), () -> "drew " + value);
        }
    }

    @Test
    void boundsTheFixtureInsideTheExhaustiveRange() {
        BootstrapInterval.Interval interval = BootstrapInterval.withDefaults().of(R2.logRatios()).orElseThrow();
        // METHODS B2 [computed here]: the resampled values range over [0.7931034483, 1.2222222222].
        assertTrue(interval.lower() >= 0.7931034483 - 1e-9, () -> interval.toString());
        assertTrue(interval.upper() <= 1.2222222222 + 1e-9, () -> interval.toString());
        // METHODS R2 [computed here]: the point estimate 0.9782533570 lies inside.
        assertTrue(interval.contains(R2.value().getAsDouble()), () -> interval.toString());
        assertEquals(BootstrapInterval.DEFAULT_DRAWS, interval.draws());
        assertEquals(BootstrapInterval.DEFAULT_SEED, interval.seed());
    }

    @Test
    void isDegenerateWhenEveryRatioIsEqual() {
        List<AvgRelMae.Series> equal = new ArrayList<>();
        for (int i = 1; i <= 50; i++) {
            equal.add(new AvgRelMae.Series(i % 7 + 1, 3_000_000L * i, 4_000_000L * i));
        }
        AvgRelMae.Result result = AvgRelMae.of(equal);
        BootstrapInterval.Interval interval = BootstrapInterval.withDefaults().of(result.logRatios()).orElseThrow();
        assertEquals(0.75, result.value().getAsDouble(), 1e-15);
        assertEquals(result.value().getAsDouble(), interval.lower(), 0);
        assertEquals(result.value().getAsDouble(), interval.upper(), 0);
    }

    @Test
    void repeatsItselfForTheSameSeed() {
        AvgRelMae.LogRatios ratios = AvgRelMae.of(AvgRelMaeTest.randomSeries(300, 5)).logRatios();
        BootstrapInterval bootstrap = BootstrapInterval.withDefaults().withSeed(12345L);
        assertEquals(bootstrap.of(ratios), bootstrap.of(ratios));
        assertArrayEquals(bootstrap.resample(ratios), bootstrap.resample(ratios), 0);
        assertFalse(Arrays.equals(bootstrap.resample(ratios), bootstrap.withSeed(54321L).resample(ratios)));
    }

    @Test
    void containsThePointEstimateOnRandomSeries() {
        AvgRelMae.Result result = AvgRelMae.of(AvgRelMaeTest.randomSeries(300, 17));
        BootstrapInterval.Interval interval = BootstrapInterval.withDefaults().of(result.logRatios()).orElseThrow();
        assertTrue(interval.contains(result.value().getAsDouble()), () -> interval + " vs " + result.value());
        assertTrue(interval.lower() < interval.upper());
    }

    @Test
    void hasNoIntervalWithoutSeries() {
        assertEquals(Optional.empty(), BootstrapInterval.withDefaults().of(AvgRelMae.of(List.of()).logRatios()));
    }

    @Test
    void honoursTheNumberOfDraws() {
        assertEquals(250, BootstrapInterval.withDefaults().withDraws(250).resample(R2.logRatios()).length);
        assertThrows(IllegalArgumentException.class, () -> BootstrapInterval.withDefaults().withDraws(0));
    }

    @Test
    void resamplesAHundredThousandSeriesAroundThePointEstimate() {
        // Speed is measured by `plenum bench score`, not here: build machines are shared and noisy.
        AvgRelMae.Result result = AvgRelMae.of(AvgRelMaeTest.randomSeries(100_000, 23));
        BootstrapInterval.Interval interval = BootstrapInterval.withDefaults().of(result.logRatios()).orElseThrow();
        assertTrue(interval.contains(result.value().getAsDouble()), interval.toString());
        assertTrue(interval.upper() - interval.lower() < 0.05, "100,000 series give a narrow interval: " + interval);
    }
}
