package org.plenum.score;

import java.util.OptionalDouble;
import org.plenum.core.MeanAbsoluteScaledError;

/**
 * The size class of a change from a prior to a new quantity, by the relative change
 * {@code (new − prior) / prior}, decided exactly on the millionths (never on a double ratio, where
 * 0.20 → 0.21 comes out just under +5%).
 *
 * <p>Bands of {@code |change|}: under 5%, 5–15%, 15–35%, 35–100% (up or down), 100% or more up. Every
 * lower bound is inclusive: exactly 5% is in 5–15%, exactly 15% in 15–35%, exactly 35% in 35–100%,
 * exactly +100% (doubling) in {@link #OVER_100_UP}. A change to zero from a positive prior is
 * {@link #SET_TO_ZERO}; from a zero prior the relative size is undefined and the class is
 * {@link #FROM_ZERO}. No change at all is {@link #UNDER_5}. The bands are Plenum's (DESIGN §5);
 * Fildes et al. (2009, <i>IJF</i> 25(1), 3–23) likewise measure adjustments relative to the system forecast.
 */
public enum SizeClass {
    UNDER_5("under 5%"),
    FROM_5_TO_15("5-15%"),
    FROM_15_TO_35("15-35%"),
    FROM_35_TO_100("35-100%"),
    OVER_100_UP("over 100% up"),
    SET_TO_ZERO("set to zero"),
    FROM_ZERO("from zero");

    /** Lower bounds, in percent, of the bands from {@link #FROM_5_TO_15} to {@link #OVER_100_UP}. */
    private static final int[] LOWER_BOUNDS_PERCENT = {5, 15, 35, 100};
    private static final SizeClass[] BANDS = {UNDER_5, FROM_5_TO_15, FROM_15_TO_35, FROM_35_TO_100, OVER_100_UP};

    private final String label;

    SizeClass(String label) {
        this.label = label;
    }

    /** A short ASCII label for screens and exports. */
    public String label() {
        return label;
    }

    /**
     * The class of the change from {@code priorMicros} to {@code newMicros}.
     *
     * @throws IllegalArgumentException when a quantity is negative
     */
    public static SizeClass of(long priorMicros, long newMicros) {
        requireQuantity(priorMicros);
        requireQuantity(newMicros);
        if (priorMicros == 0) {
            return FROM_ZERO;
        }
        if (newMicros == 0) {
            return SET_TO_ZERO;
        }
        long change = Math.abs(newMicros - priorMicros); // both non-negative: no overflow
        int band = 0;
        // |change| / prior >= bound / 100  <=>  100·|change| >= bound·prior, compared in 128 bits.
        while (band < LOWER_BOUNDS_PERCENT.length
                && compareProducts(change, 100, priorMicros, LOWER_BOUNDS_PERCENT[band]) >= 0) {
            band++;
        }
        return BANDS[band];
    }

    /** The relative change {@code (new − prior) / prior} as a fraction (0.05 = +5%); empty when the prior is zero. */
    public static OptionalDouble relativeChange(long priorMicros, long newMicros) {
        return priorMicros == 0 ? OptionalDouble.empty()
                : OptionalDouble.of(Math.subtractExact(newMicros, priorMicros) / (double) priorMicros);
    }

    /**
     * The volatility-scaled size {@code |new − prior| / Q}, {@code Q} the in-sample naive MAE of the
     * item before the cycle; unit-free. Empty when {@code Q} is zero or could not be computed.
     */
    public static OptionalDouble scaledChange(long priorMicros, long newMicros, MeanAbsoluteScaledError.Scale scale) {
        if (!scale.isDefined()) {
            return OptionalDouble.empty();
        }
        double change = Math.absExact(Math.subtractExact(newMicros, priorMicros));
        return OptionalDouble.of(change * scale.differences() / scale.absoluteDifferenceMicros());
    }

    /** Compares {@code a·x} with {@code b·y} exactly, for non-negative {@code a, b} and positive {@code x, y}. */
    static int compareProducts(long a, int x, long b, int y) {
        long highA = Math.multiplyHigh(a, x);
        long highB = Math.multiplyHigh(b, y);
        return highA != highB ? Long.compare(highA, highB) : Long.compareUnsigned(a * x, b * y);
    }

    private static void requireQuantity(long micros) {
        if (micros < 0) {
            throw new IllegalArgumentException("a quantity cannot be negative: " + micros + " micros");
        }
    }
}
