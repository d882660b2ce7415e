package org.plenum.core;

import java.util.OptionalDouble;

/**
 * Volume-weighted percentage bias, {@code Σ(F − A) / ΣA}: positive means the forecast ran above
 * the actuals (over-forecasting), negative below.
 *
 * <p>Common practice rather than a single published measure: it is the bias counterpart of WAPE
 * (see {@link Wape}). Its sign is the opposite of the mean error {@code ME = mean(A − F)}, which is
 * why a screen should say it in words ("forecast above actual by 3.2%") rather than show a bare sign.
 */
public final class PercentageBias {
    private PercentageBias() {
    }

    /**
     * The exact sums behind a percentage bias.
     *
     * @param pairs number of (actual, forecast) pairs
     * @param forecastMinusActualMicros {@code Σ(F − A)} in millionths of a unit
     * @param actualMicros {@code ΣA} in millionths of a unit
     */
    public record Result(int pairs, long forecastMinusActualMicros, long actualMicros) {
        /** The bias as a fraction (0.032 = forecast 3.2% above actual); empty when the actuals sum to zero. */
        public OptionalDouble value() {
            return actualMicros == 0 ? OptionalDouble.empty()
                    : OptionalDouble.of(forecastMinusActualMicros / (double) actualMicros);
        }
    }

    /**
     * Sums signed errors and actuals exactly.
     *
     * @param actualMicros actuals, in millionths of a unit
     * @param forecastMicros forecasts for the same pairs, in the same order
     * @throws IllegalArgumentException when the arrays differ in length
     * @throws ArithmeticException when a sum leaves the long range
     */
    public static Result of(long[] actualMicros, long[] forecastMicros) {
        MicrosSum.requireSameLength(actualMicros, forecastMicros);
        MicrosSum overForecast = new MicrosSum("sum of forecast minus actual");
        MicrosSum actuals = new MicrosSum("sum of actuals");
        for (int t = 0; t < actualMicros.length; t++) {
            overForecast.add(Math.subtractExact(forecastMicros[t], actualMicros[t]));
            actuals.add(actualMicros[t]);
        }
        return new Result(actualMicros.length, overForecast.total(), actuals.total());
    }
}
