package org.plenum.score;

import java.util.Arrays;
import java.util.List;
import java.util.OptionalDouble;

/**
 * AvgRelMAE: the geometric mean of per-series relative MAEs, weighted by each series' number of
 * scored periods, {@code AvgRelMAE = exp(Σ n_i ln r_i / Σ n_i)} with
 * {@code r_i = MAE_i(candidate) / MAE_i(benchmark)}.
 *
 * <p>Source: Davydenko, A., &amp; Fildes, R. (2013), "Measuring forecasting accuracy: The case of
 * judgmental adjustments to SKU-level demand forecasts", <i>International Journal of Forecasting</i>
 * 29(3), 510–522. Below 1 the candidate (e.g. the meeting's forecast) was more accurate than the
 * benchmark (e.g. the statistical forecast); {@code (1 − AvgRelMAE)·100%} is the average improvement.
 * Because {@code r} and {@code 1/r} lie equally far from 1 on the log scale, gains and losses count
 * evenly.
 *
 * <p>Both MAEs of a series must come from the same periods, so {@code r_i} is simply the ratio of the
 * two sums of absolute errors. A series where either sum is zero has an undefined or zero ratio
 * (whose log is minus infinity); it is left out and counted, as Plenum's documented choice.
 */
public final class AvgRelMae {
    private AvgRelMae() {
    }

    /** How series are weighted in the geometric mean. */
    public enum Weighting {
        /** By number of scored periods, as Davydenko &amp; Fildes (2013): Plenum's default. */
        PERIODS,
        /** One vote per series, as the unweighted form used per horizon in the R package forvision. */
        EQUAL
    }

    /**
     * One series' exact absolute errors over the same scored periods.
     *
     * @param periods number of scored periods {@code n_i}, at least 1
     * @param candidateAbsErrorMicros {@code Σ|e|} of the candidate, millionths of a unit
     * @param benchmarkAbsErrorMicros {@code Σ|e|} of the benchmark over the same periods
     */
    public record Series(int periods, long candidateAbsErrorMicros, long benchmarkAbsErrorMicros) {
        public Series {
            if (periods < 1 || candidateAbsErrorMicros < 0 || benchmarkAbsErrorMicros < 0) {
                throw new IllegalArgumentException("a series needs at least one period and non-negative error sums: "
                        + periods + " periods, " + candidateAbsErrorMicros + " and " + benchmarkAbsErrorMicros);
            }
        }

        /** Whether both MAEs are positive, so that {@code ln r_i} is finite. */
        boolean isScorable() {
            return candidateAbsErrorMicros != 0 && benchmarkAbsErrorMicros != 0;
        }

        /** {@code ln r_i}; the equal periods cancel in the ratio of the two MAEs. */
        double logRatio() {
            return Math.log(candidateAbsErrorMicros / (double) benchmarkAbsErrorMicros);
        }
    }

    /**
     * An AvgRelMAE with what went into it.
     *
     * @param value the weighted geometric mean; empty when no series could be scored
     * @param seriesUsed series with both MAEs positive
     * @param seriesLeftOut series left out because one of their MAEs was zero
     * @param pairsUsed {@code Σ n_i} over the series used
     * @param logRatios the per-series {@code ln r_i} and weights, for intervals and plots
     */
    public record Result(OptionalDouble value, int seriesUsed, int seriesLeftOut, long pairsUsed, LogRatios logRatios) {
    }

    /** AvgRelMAE weighted by periods (Davydenko &amp; Fildes 2013). */
    public static Result of(List<Series> series) {
        return of(series, Weighting.PERIODS);
    }

    /** AvgRelMAE with the given weighting. */
    public static Result of(List<Series> series, Weighting weighting) {
        int used = (int) series.stream().filter(Series::isScorable).count();
        double[] logs = new double[used];
        double[] weights = new double[used];
        long pairs = 0;
        int i = 0;
        for (Series s : series) {
            if (s.isScorable()) {
                logs[i] = s.logRatio();
                weights[i++] = weighting == Weighting.PERIODS ? s.periods() : 1;
                pairs += s.periods();
            }
        }
        LogRatios ratios = new LogRatios(logs, weights);
        return new Result(ratios.geometricMean(), used, series.size() - used, pairs, ratios);
    }

    /**
     * Per-series log ratios {@code ln r_i} with their weights: the one place where the weighted
     * geometric mean {@code exp(Σ w_i ln r_i / Σ w_i)} is computed, for the point estimate and for
     * every bootstrap resample alike. Immutable.
     */
    public static final class LogRatios {
        private final double[] logs;
        private final double[] weights;
        /** {@code w_i (ln r_i − ln r_0)}: centring on the first log makes equal ratios give back exactly that ratio. */
        private final double[] centredProducts;
        private final double reference;

        LogRatios(double[] logs, double[] weights) {
            if (logs.length != weights.length) {
                throw new IllegalArgumentException(logs.length + " log ratios but " + weights.length + " weights");
            }
            this.logs = logs.clone();
            this.weights = weights.clone();
            this.reference = logs.length == 0 ? 0 : logs[0];
            this.centredProducts = new double[logs.length];
            for (int i = 0; i < logs.length; i++) {
                centredProducts[i] = weights[i] * (logs[i] - reference);
            }
        }

        public int size() {
            return logs.length;
        }

        /** {@code ln r_i} of the {@code i}-th series used, in input order. */
        public double logRatio(int i) {
            return logs[i];
        }

        /** The weight of the {@code i}-th series used ({@code n_i}, or 1 when equally weighted). */
        public double weight(int i) {
            return weights[i];
        }

        /** The weighted geometric mean over all series; empty when there are none. */
        public OptionalDouble geometricMean() {
            if (logs.length == 0) {
                return OptionalDouble.empty();
            }
            double products = 0;
            double weightSum = 0;
            for (int i = 0; i < logs.length; i++) {
                products += centredProducts[i];
                weightSum += weights[i];
            }
            return OptionalDouble.of(Math.exp(reference + products / weightSum));
        }

        /**
         * The weighted geometric mean over the series at {@code indices} (repeats allowed): one
         * bootstrap resample. Allocation-free so it can run a thousand times over 100,000 series.
         */
        double geometricMean(int[] indices) {
            double products = 0;
            double weightSum = 0;
            for (int index : indices) {
                products += centredProducts[index];
                weightSum += weights[index];
            }
            return Math.exp(reference + products / weightSum);
        }

        @Override
        public boolean equals(Object other) {
            return other instanceof LogRatios that && Arrays.equals(logs, that.logs)
                    && Arrays.equals(weights, that.weights);
        }

        @Override
        public int hashCode() {
            return 31 * Arrays.hashCode(logs) + Arrays.hashCode(weights);
        }

        @Override
        public String toString() {
            return "LogRatios[size=" + logs.length + "]";
        }
    }
}
