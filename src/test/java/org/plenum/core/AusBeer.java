package org.plenum.core;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.Arrays;

/**
 * Australian quarterly beer production, fpp2 {@code ausbeer} 1992Q1–2010Q2 (METHODS §9 data set BEER):
 * training 1992Q1–2007Q4 (64 values), test 2008Q1–2010Q2 (10 values), and the four benchmark
 * forecasts of FPP2 §3.4 over the test quarters. Quantities in millionths.
 */
public final class AusBeer {
    private AusBeer() {
    }

    public static final long[] TRAIN = units(
            443, 410, 420, 532, 433, 421, 410, 512, 449, 381, 423, 531, 426, 408, 416, 520,
            409, 398, 398, 507, 432, 398, 406, 526, 428, 397, 403, 517, 435, 383, 424, 521,
            421, 402, 414, 500, 451, 380, 416, 492, 428, 408, 406, 506, 435, 380, 421, 490,
            435, 390, 412, 454, 416, 403, 408, 482, 438, 386, 405, 491, 427, 383, 394, 473);

    public static final long[] TEST = units(420, 390, 410, 488, 415, 398, 419, 488, 414, 374);

    /** Mean of the training values, 435.375 (exact in millionths: 27864/64). */
    static final long[] MEAN = flat(435_375_000L);
    /** Last training value, 473. */
    static final long[] NAIVE = flat(473_000_000L);
    /** Same quarter of the last training year. */
    public static final long[] SEASONAL_NAIVE = units(427, 383, 394, 473, 427, 383, 394, 473, 427, 383);

    /**
     * Drift {@code 473 + h·(473 − 443)/63}, rounded to the nearest millionth (not exact in decimals:
     * each value moves by at most 5e-7, far inside the printed tolerance of 5e-6).
     */
    static long[] drift() {
        long[] forecast = new long[TEST.length];
        for (int h = 1; h <= forecast.length; h++) {
            BigDecimal slope = BigDecimal.valueOf(30).divide(BigDecimal.valueOf(63), 20, RoundingMode.HALF_EVEN);
            BigDecimal value = BigDecimal.valueOf(473).add(slope.multiply(BigDecimal.valueOf(h)));
            forecast[h - 1] = value.setScale(6, RoundingMode.HALF_EVEN).movePointRight(6).longValueExact();
        }
        return forecast;
    }

    private static long[] units(int... values) {
        return Arrays.stream(values).mapToLong(v -> v * 1_000_000L).toArray();
    }

    private static long[] flat(long micros) {
        long[] forecast = new long[TEST.length];
        Arrays.fill(forecast, micros);
        return forecast;
    }
}
