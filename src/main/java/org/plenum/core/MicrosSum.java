package org.plenum.core;

/**
 * An exact running sum of quantities in millionths of a unit, for the error measures of this package.
 *
 * <p>Sums stay exact so that "the total error is zero" and "the actuals sum to zero" are decided on
 * integers; they are turned into {@code double} only when a ratio or mean is finally taken. A sum
 * that leaves the {@code long} range throws instead of wrapping round silently.
 */
final class MicrosSum {
    private final String what;
    private long total;

    /** @param what the quantity being summed, named in the overflow message */
    MicrosSum(String what) {
        this.what = what;
    }

    void add(long micros) {
        try {
            total = Math.addExact(total, micros);
        } catch (ArithmeticException overflow) {
            throw new ArithmeticException("the exact " + what + " exceeds " + Long.MAX_VALUE
                    + " millionths (about 9.2 trillion units); score the data in smaller parts");
        }
    }

    long total() {
        return total;
    }

    /** {@code |a − b|} exactly; throws only for differences beyond the long range. */
    static long absDifference(long a, long b) {
        return Math.absExact(Math.subtractExact(a, b));
    }

    /** Rejects paired arrays of different lengths, naming both lengths. */
    static void requireSameLength(long[] actual, long[] forecast) {
        if (actual.length != forecast.length) {
            throw new IllegalArgumentException("actuals and forecasts must be paired: " + actual.length
                    + " actuals, " + forecast.length + " forecasts");
        }
    }

    /** Millionths of a unit as units, for the final division. */
    static double units(double micros) {
        return micros / 1_000_000.0;
    }
}
