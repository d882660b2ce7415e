package org.plenum.score;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.util.OptionalDouble;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.simple.RandomSource;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.plenum.core.FvaFixture;
import org.plenum.core.MeanAbsoluteScaledError;

class SizeClassTest {

    private static long micros(String decimal) {
        return new BigDecimal(decimal).movePointRight(6).longValueExact();
    }

    @ParameterizedTest(name = "{0}: {1}% → {2}")
    @CsvSource({
        "A1, 4.7619, UNDER_5", "A2, 5.3571, FROM_5_TO_15", "A3, -5.0, FROM_5_TO_15", "B1, -37.5, FROM_35_TO_100",
        "B2, 50.0, FROM_35_TO_100", "B3, 55.5556, FROM_35_TO_100", "C1, -4.0404, UNDER_5", "C2, 4.8780, UNDER_5",
        "C3, -7.5, FROM_5_TO_15", "C4, -2.4390, UNDER_5", "C5, 8.5714, FROM_5_TO_15"})
    void sizesTheFixturesAdjustments(String label, double percent, SizeClass expected) {
        FvaFixture.Pair pair = FvaFixture.adjusted().stream().filter(p -> p.label().equals(label)).findFirst().orElseThrow();
        // METHODS R2 [computed here]: relative size 100·adj/S, printed to 4 decimals (±5e-5 points).
        assertEquals(percent, 100 * SizeClass.relativeChange(pair.stat(), pair.fin()).getAsDouble(), 5e-5);
        // Classes by DESIGN §5 bands; A3 is exactly −5%, which belongs to 5–15% (lower bounds inclusive).
        assertEquals(expected, SizeClass.of(pair.stat(), pair.fin()));
    }

    @ParameterizedTest(name = "{0} → {1}: {2}")
    @CsvSource({
        "0.20, 0.21, FROM_5_TO_15", "0.20, 0.209999, UNDER_5", "0.20, 0.19, FROM_5_TO_15", "0.20, 0.190001, UNDER_5",
        "100, 115, FROM_15_TO_35", "100, 114.999999, FROM_5_TO_15", "100, 85, FROM_15_TO_35",
        "100, 135, FROM_35_TO_100", "100, 134.999999, FROM_15_TO_35", "100, 65, FROM_35_TO_100",
        "100, 200, OVER_100_UP", "100, 199.999999, FROM_35_TO_100", "100, 0.000001, FROM_35_TO_100",
        "100, 0, SET_TO_ZERO", "0, 5, FROM_ZERO", "0, 0, FROM_ZERO", "7, 7, UNDER_5",
        "0.000001, 999999999999.999999, OVER_100_UP", "999999999999.999999, 0.000001, FROM_35_TO_100"})
    void decidesTheBoundariesExactly(String prior, String next, SizeClass expected) {
        assertEquals(expected, SizeClass.of(micros(prior), micros(next)));
    }

    @Test
    void avoidsTheFloatingPointTrapAtFivePercent() {
        // In doubles (0.21 − 0.20)/0.20 = 0.04999999999999990 would fall under 5%; exactly it is +5%.
        assertTrue((0.21 - 0.20) / 0.20 < 0.05);
        assertEquals(SizeClass.FROM_5_TO_15, SizeClass.of(micros("0.20"), micros("0.21")));
    }

    @Test
    void agreesWithBigIntegerArithmeticOnRandomChanges() {
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(99L);
        int[] bounds = {5, 15, 35, 100};
        for (int i = 0; i < 20_000; i++) {
            long prior = 20 * (1 + rng.nextLong(49_999_999_999_999_999L));
            // Within one millionth of a band boundary, up or down: where a double ratio would go wrong.
            long boundary = prior / 100 * bounds[rng.nextInt(4)] * (rng.nextBoolean() ? 1 : -1);
            long next = Math.max(0, prior + boundary + rng.nextInt(3) - 1);
            assertEquals(referenceClass(prior, next), SizeClass.of(prior, next), prior + " → " + next);
            long anyNext = rng.nextLong(1_000_000_000_000_000_000L);
            assertEquals(referenceClass(prior, anyNext), SizeClass.of(prior, anyNext), prior + " → " + anyNext);
        }
    }

    /** The same bands with BigInteger cross-multiplication, as an independent reference. */
    private static SizeClass referenceClass(long prior, long next) {
        if (next == 0) {
            return SizeClass.SET_TO_ZERO;
        }
        BigInteger hundredChange = BigInteger.valueOf(next).subtract(BigInteger.valueOf(prior)).abs().multiply(BigInteger.valueOf(100));
        int[] bounds = {5, 15, 35, 100};
        SizeClass[] classes = {SizeClass.UNDER_5, SizeClass.FROM_5_TO_15, SizeClass.FROM_15_TO_35, SizeClass.FROM_35_TO_100};
        for (int b = 0; b < bounds.length; b++) {
            if (hundredChange.compareTo(BigInteger.valueOf(prior).multiply(BigInteger.valueOf(bounds[b]))) < 0) {
                return classes[b];
            }
        }
        return SizeClass.OVER_100_UP;
    }

    @Test
    void comparesProductsBeyondTheLongRange() {
        assertEquals(1, SizeClass.compareProducts(Long.MAX_VALUE, 100, Long.MAX_VALUE, 99));
        assertEquals(0, SizeClass.compareProducts(Long.MAX_VALUE / 5 * 5, 20, Long.MAX_VALUE / 5 * 5, 20));
        assertEquals(-1, SizeClass.compareProducts(3, 5, 4, 4));
    }

    @Test
    void hasNoRelativeChangeFromZero() {
        assertEquals(OptionalDouble.empty(), SizeClass.relativeChange(0, 5_000_000));
        assertEquals(0.05, SizeClass.relativeChange(micros("0.20"), micros("0.21")).getAsDouble(), 1e-15);
    }

    @Test
    void scalesTheChangeByTheInSampleNaiveMae() {
        // Training 10, 12, 9, 13: lag-1 naive MAE = (2 + 3 + 4)/3 = 3, so a change of 6 is 2 naive errors.
        MeanAbsoluteScaledError.Scale scale = MeanAbsoluteScaledError.scale(FvaFixture.micros(10, 12, 9, 13), 1);
        assertEquals(2.0, SizeClass.scaledChange(micros("50"), micros("44"), scale).getAsDouble(), 1e-15);
    }

    @Test
    void hasNoScaledChangeWithoutANaiveScale() {
        MeanAbsoluteScaledError.Scale flat = MeanAbsoluteScaledError.scale(FvaFixture.micros(7, 7, 7), 1);
        MeanAbsoluteScaledError.Scale tooShort = MeanAbsoluteScaledError.scale(FvaFixture.micros(7), 1);
        assertEquals(OptionalDouble.empty(), SizeClass.scaledChange(1, 2, flat));
        assertEquals(OptionalDouble.empty(), SizeClass.scaledChange(1, 2, tooShort));
    }

    @Test
    void refusesNegativeQuantities() {
        assertThrows(IllegalArgumentException.class, () -> SizeClass.of(-1, 5));
        assertThrows(IllegalArgumentException.class, () -> SizeClass.of(5, -1));
    }

    @Test
    void labelsInAscii() {
        for (SizeClass size : SizeClass.values()) {
            assertTrue(size.label().chars().allMatch(c -> c < 128), size.label());
        }
    }
}
