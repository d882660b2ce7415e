package org.plenum.score;

import java.util.Optional;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.simple.RandomSource;
import org.apache.commons.statistics.descriptive.Quantile;

/**
 * A percentile bootstrap 95% interval for AvgRelMAE: resample the series (items) with replacement,
 * each with its weight, recompute the weighted geometric mean, and take the 2.5% and 97.5% quantiles
 * of the resampled values.
 *
 * <p>Source: Efron, B., &amp; Tibshirani, R. J. (1993), <i>An Introduction to the Bootstrap</i>,
 * Chapman &amp; Hall (percentile interval). Whole series are resampled, not single periods, because the
 * statistic is built from per-series ratios. Quantiles use Hyndman &amp; Fan's type 7 (Hyndman, R. J.,
 * &amp; Fan, Y. (1996), <i>The American Statistician</i> 50(4), 361–365), R's and NumPy's default,
 * through Commons Statistics {@code Quantile} with {@code HF7}.
 *
 * <p>Random draws come from Commons RNG {@code XO_RO_SHI_RO_128_PP} with a fixed seed, so the same
 * input always gives the same interval. Immutable.
 */
public final class BootstrapInterval {
    /** Default number of resamples. */
    public static final int DEFAULT_DRAWS = 1000;
    /** Default seed: an arbitrary fixed constant (the year of Efron &amp; Tibshirani), so reruns agree. */
    public static final long DEFAULT_SEED = 1993L;
    /** The interval's coverage. */
    public static final double LEVEL = 0.95;

    private static final Quantile HF7 = Quantile.withDefaults().with(Quantile.EstimationMethod.HF7).withCopy(false);
    private static final BootstrapInterval DEFAULT = new BootstrapInterval(DEFAULT_DRAWS, DEFAULT_SEED);

    private final int draws;
    private final long seed;

    /**
     * A bootstrap interval.
     *
     * @param lower the 2.5% quantile of the resampled AvgRelMAEs
     * @param upper the 97.5% quantile
     * @param draws number of resamples
     * @param seed the generator's seed
     */
    public record Interval(double lower, double upper, int draws, long seed) {
        /** Whether {@code value} lies in {@code [lower, upper]}. */
        public boolean contains(double value) {
            return lower <= value && value <= upper;
        }
    }

    private BootstrapInterval(int draws, long seed) {
        if (draws < 1) {
            throw new IllegalArgumentException("a bootstrap needs at least one draw, was " + draws);
        }
        this.draws = draws;
        this.seed = seed;
    }

    /** {@value #DEFAULT_DRAWS} draws with seed {@value #DEFAULT_SEED}. */
    public static BootstrapInterval withDefaults() {
        return DEFAULT;
    }

    public BootstrapInterval withDraws(int newDraws) {
        return new BootstrapInterval(newDraws, seed);
    }

    public BootstrapInterval withSeed(long newSeed) {
        return new BootstrapInterval(draws, newSeed);
    }

    /** The interval for the AvgRelMAE behind {@code ratios}; empty when no series was scored. */
    public Optional<Interval> of(AvgRelMae.LogRatios ratios) {
        if (ratios.size() == 0) {
            return Optional.empty();
        }
        double tail = (1 - LEVEL) / 2;
        double[] bounds = HF7.evaluate(resample(ratios), tail, 1 - tail);
        return Optional.of(new Interval(bounds[0], bounds[1], draws, seed));
    }

    /** The resampled AvgRelMAEs, one per draw, in draw order; {@code ratios} must not be empty. */
    double[] resample(AvgRelMae.LogRatios ratios) {
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(seed);
        int series = ratios.size();
        int[] drawn = new int[series]; // reused for every draw: no allocation in the loop
        double[] values = new double[draws];
        for (int b = 0; b < draws; b++) {
            for (int j = 0; j < series; j++) {
                drawn[j] = rng.nextInt(series);
            }
            values[b] = ratios.geometricMean(drawn);
        }
        return values;
    }
}
