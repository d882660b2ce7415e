package org.plenum.score;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.function.Function;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.simple.RandomSource;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.plenum.core.FvaFixture;
import org.plenum.core.FvaFixture.Sku;

class AvgRelMaeTest {

    /** METHODS R1: (n_i, r_i) = (4, 0.8), (2, 1.2), (6, 0.75), as error sums with exactly those ratios. */
    private static final List<AvgRelMae.Series> R1 = List.of(
            new AvgRelMae.Series(4, 3_200_000, 4_000_000),
            new AvgRelMae.Series(2, 1_200_000, 1_000_000),
            new AvgRelMae.Series(6, 4_500_000, 6_000_000));

    /** Per-item error sums of the R2 fixture, candidate against benchmark, over the same periods. */
    static List<AvgRelMae.Series> r2(Function<Sku, long[]> candidate, Function<Sku, long[]> benchmark) {
        return FvaFixture.SKUS.stream().map(s -> new AvgRelMae.Series(s.periods(),
                FvaFixture.absErrorSum(s.actual(), candidate.apply(s)),
                FvaFixture.absErrorSum(s.actual(), benchmark.apply(s)))).toList();
    }

    private static Function<Sku, long[]> column(String step) {
        return switch (step) {
            case "naive" -> Sku::naive;
            case "stat" -> Sku::stat;
            default -> Sku::fin;
        };
    }

    @Test
    void weighsSeriesByTheirPeriods() {
        // METHODS R1 [computed here]: exp((4 ln 0.8 + 2 ln 1.2 + 6 ln 0.75)/12) = 0.8287511964 (1e-9).
        assertEquals(0.8287511964, AvgRelMae.of(R1).value().getAsDouble(), 1e-9);
    }

    @Test
    void canGiveEverySeriesOneVote() {
        // METHODS R1 [computed here]: (0.8 · 1.2 · 0.75)^(1/3) = 0.72^(1/3) = 0.8962809493 (1e-9).
        assertEquals(0.8962809493, AvgRelMae.of(R1, AvgRelMae.Weighting.EQUAL).value().getAsDouble(), 1e-9);
    }

    @ParameterizedTest(name = "{0} vs {1}: {2}")
    @CsvSource({"final, stat, 0.9782533570", "stat, naive, 0.4092868110", "final, naive, 0.4003861968"})
    void scoresTheFvaFixtureFromItsRawValues(String candidate, String benchmark, double expected) {
        AvgRelMae.Result result = AvgRelMae.of(r2(column(candidate), column(benchmark)));
        // METHODS R2 [computed here]: AvgRelMAE with weights 4/3/5 (1e-9).
        assertEquals(expected, result.value().getAsDouble(), 1e-9);
        assertEquals(3, result.seriesUsed());
        assertEquals(0, result.seriesLeftOut());
        assertEquals(12, result.pairsUsed());
    }

    @Test
    void exposesPerSeriesLogRatiosAndWeights() {
        AvgRelMae.LogRatios ratios = AvgRelMae.of(r2(Sku::fin, Sku::stat)).logRatios();
        // METHODS R2 [computed here]: per-SKU r (F vs S) A 0.7931034483, B 0.8928571429, C 1.2222222222.
        double[] expected = {0.7931034483, 0.8928571429, 1.2222222222};
        double[] weights = {4, 3, 5};
        for (int i = 0; i < 3; i++) {
            assertEquals(expected[i], Math.exp(ratios.logRatio(i)), 1e-9);
            assertEquals(weights[i], ratios.weight(i), 0);
        }
    }

    @Test
    void givesTheUnweightedFixtureValue() {
        // METHODS R2 [computed here]: unweighted geometric mean of the per-SKU ratios 0.9529877769 (1e-9).
        assertEquals(0.9529877769, AvgRelMae.of(r2(Sku::fin, Sku::stat), AvgRelMae.Weighting.EQUAL).value().getAsDouble(), 1e-9);
    }

    @Test
    void leavesOutAndCountsSeriesWithAZeroMae() {
        List<AvgRelMae.Series> series = new ArrayList<>(R1);
        series.add(new AvgRelMae.Series(5, 0, 2_000_000)); // candidate exact: ln 0 undefined
        series.add(new AvgRelMae.Series(7, 2_000_000, 0)); // benchmark exact: ratio undefined
        AvgRelMae.Result result = AvgRelMae.of(series);
        assertEquals(0.8287511964, result.value().getAsDouble(), 1e-9); // METHODS R1 [computed here]
        assertEquals(3, result.seriesUsed());
        assertEquals(2, result.seriesLeftOut());
        assertEquals(12, result.pairsUsed());
        assertEquals(3, result.logRatios().size());
    }

    @Test
    void isEmptyWhenNoSeriesCanBeScored() {
        assertEquals(OptionalDouble.empty(), AvgRelMae.of(List.of()).value());
        AvgRelMae.Result allExact = AvgRelMae.of(List.of(new AvgRelMae.Series(3, 0, 0)));
        assertEquals(OptionalDouble.empty(), allExact.value());
        assertEquals(1, allExact.seriesLeftOut());
    }

    @Test
    void isExactlyOneForIdenticalForecasts() {
        List<AvgRelMae.Series> same = randomSeries(200, 7).stream()
                .map(s -> new AvgRelMae.Series(s.periods(), s.benchmarkAbsErrorMicros(), s.benchmarkAbsErrorMicros())).toList();
        assertEquals(1.0, AvgRelMae.of(same).value().getAsDouble(), 0);
    }

    @Test
    void ignoresTheUnitOfTheQuantities() {
        List<AvgRelMae.Series> series = randomSeries(200, 11);
        List<AvgRelMae.Series> scaled = series.stream().map(s -> new AvgRelMae.Series(s.periods(),
                s.candidateAbsErrorMicros() * 1000, s.benchmarkAbsErrorMicros() * 1000)).toList();
        // Scale-free by construction: the same ratios to the last bit.
        assertEquals(AvgRelMae.of(series).value().getAsDouble(), AvgRelMae.of(scaled).value().getAsDouble(), 0);
    }

    @Test
    void turnsIntoItsReciprocalWhenCandidateAndBenchmarkSwap() {
        List<AvgRelMae.Series> series = randomSeries(200, 13);
        List<AvgRelMae.Series> swapped = series.stream().map(s -> new AvgRelMae.Series(s.periods(),
                s.benchmarkAbsErrorMicros(), s.candidateAbsErrorMicros())).toList();
        assertEquals(1.0, AvgRelMae.of(series).value().getAsDouble() * AvgRelMae.of(swapped).value().getAsDouble(), 1e-14);
    }

    @Test
    void refusesSeriesWithoutPeriodsOrWithNegativeErrors() {
        assertThrows(IllegalArgumentException.class, () -> new AvgRelMae.Series(0, 1, 1));
        assertThrows(IllegalArgumentException.class, () -> new AvgRelMae.Series(1, -1, 1));
    }

    /** Invented series for the invariants only (never as a reference value). */
    static List<AvgRelMae.Series> randomSeries(int count, long seed) {
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(seed);
        List<AvgRelMae.Series> series = new ArrayList<>();
        for (int i = 0; i < count; i++) {
            series.add(new AvgRelMae.Series(1 + rng.nextInt(24), 1 + rng.nextLong(1_000_000_000_000L),
                    1 + rng.nextLong(1_000_000_000_000L)));
        }
        return series;
    }
}
