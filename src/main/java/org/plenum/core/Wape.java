package org.plenum.core;

import java.util.OptionalDouble;

/**
 * Weighted absolute percentage error, {@code WAPE = Σ|A − F| / Σ|A|}, over paired actuals and forecasts.
 *
 * <p>Source: Kolassa, S., &amp; Schütz, W. (2007), <i>Foresight</i> 6, 40–43, who present it as the
 * MAD/Mean ratio (MAE divided by the mean actual over the same pairs) and prefer it to the MAPE for
 * low-volume items, because single zero actuals no longer break it. Demand is never negative, so
 * {@code Σ|A|} equals {@code ΣA} here; the absolute value keeps the measure defined for any input.
 * Forecast accuracy {@code = 1 − WAPE} is common practice, not a published measure.
 *
 * <p>Numerator and denominator are summed over all pairs first and divided once: averaging per-item
 * WAPEs would give a different number.
 */
public final class Wape {
    private Wape() {
    }

    /**
     * The exact sums behind a WAPE.
     *
     * @param pairs number of (actual, forecast) pairs
     * @param absoluteErrorMicros {@code Σ|A − F|} in millionths of a unit
     * @param absoluteActualMicros {@code Σ|A|} in millionths of a unit
     */
    public record Result(int pairs, long absoluteErrorMicros, long absoluteActualMicros) {
        /** WAPE as a fraction (0.05 = 5%); empty when the actuals sum to zero (no pairs included). */
        public OptionalDouble value() {
            return absoluteActualMicros == 0 ? OptionalDouble.empty()
                    : OptionalDouble.of(absoluteErrorMicros / (double) absoluteActualMicros);
        }

        /**
         * Accuracy {@code 1 − WAPE}, unfloored (it goes below zero when the errors exceed the
         * volume; a screen may floor it at 0); empty when WAPE is.
         */
        public OptionalDouble accuracy() {
            OptionalDouble wape = value();
            return wape.isPresent() ? OptionalDouble.of(1 - wape.getAsDouble()) : wape;
        }

        /** The mean absolute error over the same pairs, in units (the "MAD" of MAD/Mean); empty without pairs. */
        public OptionalDouble meanAbsoluteError() {
            return pairs == 0 ? OptionalDouble.empty()
                    : OptionalDouble.of(MicrosSum.units(absoluteErrorMicros / (double) pairs));
        }
    }

    /**
     * Sums absolute errors and absolute actuals exactly.
     *
     * @param actualMicros actuals, in millionths of a unit
     * @param forecastMicros forecasts for the same pairs, in the same order
     * @throws IllegalArgumentException when the arrays differ in length
     * @throws ArithmeticException when a sum leaves the long range
     */
    public static Result of(long[] actualMicros, long[] forecastMicros) {
        MicrosSum.requireSameLength(actualMicros, forecastMicros);
        MicrosSum errors = new MicrosSum("sum of absolute errors");
        MicrosSum actuals = new MicrosSum("sum of absolute actuals");
        for (int t = 0; t < actualMicros.length; t++) {
            errors.add(MicrosSum.absDifference(actualMicros[t], forecastMicros[t]));
            actuals.add(Math.absExact(actualMicros[t]));
        }
        return new Result(actualMicros.length, errors.total(), actuals.total());
    }
}
