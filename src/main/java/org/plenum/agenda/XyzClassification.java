package org.plenum.agenda;

import java.util.OptionalDouble;

/**
 * XYZ classes by the coefficient of variation of period demand, {@code CV = s / mean} with the
 * sample standard deviation {@code s} (divisor n − 1): X up to the first threshold (default 0.5),
 * Y up to the second (default 1.0), Z above (common practice; METHODS §7). A mean of zero is Z
 * (no demand); fewer than two known periods give no class ("-").
 */
public final class XyzClassification {
    private final double x;
    private final double y;

    /** @param x upper CV of X, {@code 0 < x < y}; {@code y} of Y */
    public XyzClassification(double x, double y) {
        if (!(x > 0 && x < y)) {
            throw new IllegalArgumentException("XYZ thresholds need 0 < X < Y, found " + x + " and " + y);
        }
        this.x = x;
        this.y = y;
    }

    /** The sample coefficient of variation; empty for fewer than two values or a zero mean. */
    public static OptionalDouble coefficientOfVariation(long[] quantitiesMicros) {
        int n = quantitiesMicros.length;
        if (n < 2) {
            return OptionalDouble.empty();
        }
        double mean = 0;
        for (long q : quantitiesMicros) {
            mean += q;
        }
        mean /= n;
        if (mean == 0) {
            return OptionalDouble.empty();
        }
        double squares = 0;
        for (long q : quantitiesMicros) {
            squares += (q - mean) * (q - mean);
        }
        return OptionalDouble.of(Math.sqrt(squares / (n - 1)) / mean);
    }

    /** X, Y, Z, or "-" when there are fewer than two values. */
    public String classOf(long[] quantitiesMicros) {
        if (quantitiesMicros.length < 2) {
            return "-";
        }
        OptionalDouble cv = coefficientOfVariation(quantitiesMicros);
        if (cv.isEmpty()) {
            return "Z";
        }
        return cv.getAsDouble() <= x ? "X" : cv.getAsDouble() <= y ? "Y" : "Z";
    }
}
