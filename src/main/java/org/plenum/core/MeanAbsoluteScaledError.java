package org.plenum.core;

import java.util.OptionalDouble;

/**
 * Mean absolute scaled error, {@code MASE = mean|e_t| / Q}, where {@code e_t = A_t − F_t} and the
 * scale {@code Q} is the in-sample MAE of the naive ({@code m = 1}) or seasonal naive (lag {@code m})
 * forecast over the training values: {@code Q = (1/(T − m)) Σ_{t=m+1..T} |y_t − y_{t−m}|}.
 *
 * <p>Source: Hyndman, R. J., &amp; Koehler, A. B. (2006), "Another look at measures of forecast
 * accuracy", <i>International Journal of Forecasting</i> 22(4), 679–688 (one-step naive scale); the
 * seasonal scale as in Hyndman &amp; Athanasopoulos, <i>Forecasting: Principles and Practice</i>.
 * Below 1 means better than the in-sample (seasonal) naive. When {@code Q = 0} (every training value
 * equals the one {@code m} periods earlier) or {@code T ≤ m} the measure is undefined and empty is
 * returned, never infinity and never a guarded division by a tiny number.
 */
public final class MeanAbsoluteScaledError {
    private MeanAbsoluteScaledError() {
    }

    /**
     * The exact in-sample naive scale.
     *
     * @param lag the seasonal period {@code m} (1 = one-step naive)
     * @param differences number of lagged differences {@code T − m} (0 when {@code T ≤ m})
     * @param absoluteDifferenceMicros {@code Σ|y_t − y_{t−m}|} in millionths of a unit
     */
    public record Scale(int lag, int differences, long absoluteDifferenceMicros) {
        /** Whether {@code Q} exists and is positive, decided on the exact sum. */
        public boolean isDefined() {
            return differences > 0 && absoluteDifferenceMicros != 0;
        }

        /** {@code Q} in units; empty when it is zero or cannot be computed. */
        public OptionalDouble value() {
            return isDefined()
                    ? OptionalDouble.of(MicrosSum.units(absoluteDifferenceMicros / (double) differences))
                    : OptionalDouble.empty();
        }
    }

    /**
     * A MASE with its parts.
     *
     * @param pairs number of scored (actual, forecast) pairs
     * @param absoluteErrorMicros {@code Σ|A − F|} over those pairs, in millionths of a unit
     * @param scale the in-sample naive scale it is divided by
     */
    public record Result(int pairs, long absoluteErrorMicros, Scale scale) {
        /** The MASE; empty without pairs or without a positive scale. */
        public OptionalDouble value() {
            OptionalDouble mae = meanAbsoluteError();
            OptionalDouble q = scale.value();
            return mae.isPresent() && q.isPresent() ? OptionalDouble.of(mae.getAsDouble() / q.getAsDouble())
                    : OptionalDouble.empty();
        }

        /** The numerator, MAE over the scored pairs, in units; empty without pairs. */
        public OptionalDouble meanAbsoluteError() {
            return pairs == 0 ? OptionalDouble.empty()
                    : OptionalDouble.of(MicrosSum.units(absoluteErrorMicros / (double) pairs));
        }
    }

    /**
     * The in-sample MAE of the lag-{@code m} naive forecast over the training values.
     *
     * @param trainingMicros training values {@code y_1..y_T} in time order, millionths of a unit
     * @param lag {@code m ≥ 1}
     * @throws IllegalArgumentException when {@code lag < 1}
     */
    public static Scale scale(long[] trainingMicros, int lag) {
        if (lag < 1) {
            throw new IllegalArgumentException("the naive lag must be at least 1, was " + lag);
        }
        MicrosSum sum = new MicrosSum("sum of in-sample naive absolute errors");
        for (int t = lag; t < trainingMicros.length; t++) {
            sum.add(MicrosSum.absDifference(trainingMicros[t], trainingMicros[t - lag]));
        }
        return new Scale(lag, Math.max(0, trainingMicros.length - lag), sum.total());
    }

    /**
     * Scores forecasts against actuals on a given scale.
     *
     * @throws IllegalArgumentException when the arrays differ in length
     */
    public static Result of(long[] actualMicros, long[] forecastMicros, Scale scale) {
        MicrosSum.requireSameLength(actualMicros, forecastMicros);
        MicrosSum errors = new MicrosSum("sum of absolute errors");
        for (int t = 0; t < actualMicros.length; t++) {
            errors.add(MicrosSum.absDifference(actualMicros[t], forecastMicros[t]));
        }
        return new Result(actualMicros.length, errors.total(), scale);
    }

    /** Scores forecasts, scaled by the lag-{@code m} naive MAE of {@code trainingMicros}. */
    public static Result of(long[] actualMicros, long[] forecastMicros, long[] trainingMicros, int lag) {
        return of(actualMicros, forecastMicros, scale(trainingMicros, lag));
    }

    /** MASE over many items: each pair scaled by its own item's Q, then averaged. */
    public record Pooled(OptionalDouble value, int used, int leftOut) {}

    /**
     * MASE pooled over items of different sizes: the mean of the scaled errors |e_t| / Q_t,
     * where each pair's Q is the in-sample (seasonal) naive MAE of its own item before the cycle
     * in which the forecast was issued. Pairs whose Q is undefined (NaN) or zero are left out and
     * counted.
     */
    public static Pooled pooled(long[] absoluteErrorMicros, double[] scaleMicros) {
        double sum = 0;
        int used = 0;
        for (int i = 0; i < absoluteErrorMicros.length; i++) {
            double q = scaleMicros[i];
            if (Double.isFinite(q) && q > 0) {
                sum += absoluteErrorMicros[i] / q;
                used++;
            }
        }
        return new Pooled(used == 0 ? OptionalDouble.empty() : OptionalDouble.of(sum / used), used,
                absoluteErrorMicros.length - used);
    }
}
