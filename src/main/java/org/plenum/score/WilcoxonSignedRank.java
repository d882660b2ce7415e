package org.plenum.score;

import java.util.Arrays;
import java.util.Objects;
import java.util.OptionalDouble;
import org.apache.commons.statistics.distribution.NormalDistribution;
import org.apache.commons.statistics.inference.AlternativeHypothesis;
import org.apache.commons.statistics.inference.ContinuityCorrection;
import org.apache.commons.statistics.inference.PValueMethod;
import org.apache.commons.statistics.inference.WilcoxonSignedRankTest;

/**
 * The Wilcoxon signed-rank test on exact paired differences, following the convention of R's
 * {@code wilcox.test} and SciPy's default: zero differences are dropped before ranking (Wilcoxon's
 * method, not Pratt's), the exact null distribution is used when fewer than {@value #EXACT_BELOW}
 * non-zero differences remain and none of their sizes tie, and otherwise the normal approximation
 * with tie correction and (by default) a continuity correction of 0.5 towards the mean.
 *
 * <p>Sources: Wilcoxon, F. (1945), "Individual comparisons by ranking methods", <i>Biometrics
 * Bulletin</i> 1(6), 80–83; Hollander, M., &amp; Wolfe, D. A. (1973), <i>Nonparametric Statistical
 * Methods</i>, Wiley. The p-values are computed by Apache Commons Statistics 1.1; this class decides
 * zeros, ties and the method itself, on the exact values, because the library ranks zeros (Pratt)
 * and picks the exact method up to 50 values inclusive.
 *
 * <p>For scoring a step, pass {@code d_i = |e_i(previous)| − |e_i(step)|}: positive differences mean
 * the step was closer, so the statistic {@code W+} above its null mean {@code n(n+1)/4} favours the step.
 * Immutable; {@link #twoSided()} gives the default configuration.
 */
public final class WilcoxonSignedRank {
    /** The exact null distribution is used below this many non-zero differences (as R). */
    public static final int EXACT_BELOW = 50;

    private static final WilcoxonSignedRank TWO_SIDED = new WilcoxonSignedRank(Alternative.TWO_SIDED, true, true, 0);

    private final Alternative alternative;
    private final boolean continuityCorrection;
    private final boolean exactAllowed;
    private final long muMicros;

    /** The alternative hypothesis about the differences {@code d − mu}. */
    public enum Alternative {
        /** The differences are not centred on {@code mu}. */
        TWO_SIDED(AlternativeHypothesis.TWO_SIDED),
        /** The differences tend to exceed {@code mu} (for {@code |e_prev| − |e_step|}: the step is better). */
        GREATER(AlternativeHypothesis.GREATER_THAN),
        /** The differences tend to fall below {@code mu}. */
        LESS(AlternativeHypothesis.LESS_THAN);

        private final AlternativeHypothesis library;

        Alternative(AlternativeHypothesis library) {
            this.library = library;
        }
    }

    /** How the p-value was obtained. */
    public enum Method {
        /** The exact null distribution of {@code W+}. */
        EXACT,
        /** The normal approximation with tie correction. */
        NORMAL,
        /** No test was run: there were no pairs, or every difference was zero. */
        NONE
    }

    /**
     * A test outcome.
     *
     * @param statistic {@code W+}, the sum of the ranks of the positive differences (R's {@code V}); may end in .5 with ties
     * @param n non-zero differences ranked
     * @param zerosDropped zero differences dropped before ranking
     * @param ties whether two non-zero differences had the same size
     * @param method how the p-value was obtained
     * @param alternative the alternative tested
     * @param continuityCorrection whether a continuity correction was applied (only matters for {@link Method#NORMAL})
     * @param pValue empty without pairs; 1 when every difference was zero
     */
    public record Result(double statistic, int n, int zerosDropped, boolean ties, Method method, Alternative alternative,
            boolean continuityCorrection, OptionalDouble pValue) {
        /** The null mean of {@code W+}, {@code n(n+1)/4}: a statistic above it leans to positive differences. */
        public double nullMean() {
            return n * (n + 1.0) / 4;
        }
    }

    private WilcoxonSignedRank(Alternative alternative, boolean continuityCorrection, boolean exactAllowed,
            long muMicros) {
        this.alternative = alternative;
        this.continuityCorrection = continuityCorrection;
        this.exactAllowed = exactAllowed;
        this.muMicros = muMicros;
    }

    /** Two-sided, with continuity correction, {@code mu = 0}: the convention of R's defaults. */
    public static WilcoxonSignedRank twoSided() {
        return TWO_SIDED;
    }

    public WilcoxonSignedRank with(Alternative newAlternative) {
        return new WilcoxonSignedRank(Objects.requireNonNull(newAlternative), continuityCorrection, exactAllowed,
                muMicros);
    }

    /** Whether the normal approximation shifts {@code W+} by 0.5 towards its mean (default on, as R). */
    public WilcoxonSignedRank withContinuityCorrection(boolean enabled) {
        return new WilcoxonSignedRank(alternative, enabled, exactAllowed, muMicros);
    }

    /**
     * Whether the exact distribution may be used for small tie-free samples (default on); off always
     * uses the normal approximation, like R's {@code exact = FALSE}.
     */
    public WilcoxonSignedRank withExact(boolean allowed) {
        return new WilcoxonSignedRank(alternative, continuityCorrection, allowed, muMicros);
    }

    /** Tests {@code d − mu} instead of {@code d} (one-sample location test), {@code mu} in millionths. */
    public WilcoxonSignedRank withMu(long newMuMicros) {
        return new WilcoxonSignedRank(alternative, continuityCorrection, exactAllowed, newMuMicros);
    }

    /**
     * Tests paired differences given exactly in millionths of a unit.
     *
     * @throws ArithmeticException when {@code d − mu} leaves the long range
     */
    public Result test(long[] differenceMicros) {
        long[] nonZero = Arrays.stream(differenceMicros).map(d -> Math.subtractExact(d, muMicros))
                .filter(d -> d != 0).toArray();
        int zeros = differenceMicros.length - nonZero.length;
        if (nonZero.length == 0) {
            OptionalDouble p = zeros == 0 ? OptionalDouble.empty() : OptionalDouble.of(1);
            return new Result(0, 0, zeros, false, Method.NONE, alternative, continuityCorrection, p);
        }
        Ranked ranked = Ranked.of(nonZero);
        boolean ties = ranked.tieTerm() > 0;
        if (!(exactAllowed && nonZero.length < EXACT_BELOW && !ties)) {
            return new Result(ranked.positiveRankSum(), nonZero.length, zeros, ties, Method.NORMAL, alternative,
                    continuityCorrection, OptionalDouble.of(normalPValue(ranked, nonZero.length)));
        }
        WilcoxonSignedRankTest.Result library = configured(Method.EXACT).test(SignedRanks.of(nonZero).values());
        return new Result(library.getStatistic(), nonZero.length, zeros, false, Method.EXACT, alternative,
                continuityCorrection, OptionalDouble.of(library.getPValue()));
    }

    /**
     * The normal approximation as R's {@code wilcox.test} computes it (Hollander and Wolfe 1973):
     * mean n(n+1)/4, variance n(n+1)(2n+1)/24 − Σ(t³ − t)/48 over tie groups, and a continuity
     * correction of 0.5 towards the mean. Written out on primitives rather than handed to the
     * library because the library ranks boxed objects, which a million pairs make slow.
     */
    private double normalPValue(Ranked ranked, int n) {
        double mean = n * (n + 1.0) / 4;
        double variance = n * (n + 1.0) * (2.0 * n + 1) / 24 - ranked.tieTerm() / 48;
        double shift = ranked.positiveRankSum() - mean;
        double correction = !continuityCorrection ? 0
                : switch (alternative) {
                    case TWO_SIDED -> Math.signum(shift) * 0.5;
                    case GREATER -> 0.5;
                    case LESS -> -0.5;
                };
        double z = (shift - correction) / Math.sqrt(variance);
        double upper = STANDARD_NORMAL.survivalProbability(z);
        double lower = STANDARD_NORMAL.cumulativeProbability(z);
        return switch (alternative) {
            case TWO_SIDED -> Math.min(1, 2 * Math.min(lower, upper));
            case GREATER -> upper;
            case LESS -> lower;
        };
    }

    private static final NormalDistribution STANDARD_NORMAL = NormalDistribution.of(0, 1);

    /**
     * Average ranks of |d| over primitive longs: the sum of the ranks of positive differences and
     * the tie term Σ(t³ − t), both decided on the exact values.
     */
    private record Ranked(double positiveRankSum, double tieTerm) {
        static Ranked of(long[] nonZero) {
            long[] keyed = new long[nonZero.length];
            for (int i = 0; i < nonZero.length; i++) {
                // |d| in the high bits, the sign in the lowest: sorting groups equal sizes together.
                keyed[i] = Math.multiplyExact(Math.absExact(nonZero[i]), 2) | (nonZero[i] > 0 ? 1 : 0);
            }
            Arrays.sort(keyed);
            double positive = 0;
            double tieTerm = 0;
            for (int start = 0; start < keyed.length; ) {
                int end = start;
                int positives = 0;
                while (end < keyed.length && keyed[end] >> 1 == keyed[start] >> 1) {
                    positives += (int) (keyed[end++] & 1);
                }
                double t = end - start;
                positive += positives * (start + 1 + end) / 2.0;
                tieTerm += t * t * t - t;
                start = end;
            }
            return new Ranked(positive, tieTerm);
        }
    }

    private WilcoxonSignedRankTest configured(Method method) {
        return WilcoxonSignedRankTest.withDefaults()
                .with(alternative.library)
                .with(method == Method.EXACT ? PValueMethod.EXACT : PValueMethod.ASYMPTOTIC)
                .with(continuityCorrection ? ContinuityCorrection.ENABLED : ContinuityCorrection.DISABLED);
    }

    /**
     * Non-zero differences replaced by {@code sign(d) · (dense rank of |d|)}: the test depends only on
     * signs and on the order and ties of the sizes, and these small integers are exact doubles, so the
     * library sees exactly the ties found here on the longs (sizes beyond 2^53 millionths would not
     * survive a conversion to double).
     */
    private record SignedRanks(double[] values, boolean ties) {
        static SignedRanks of(long[] nonZero) {
            long[] sizes = Arrays.stream(nonZero).map(Math::absExact).sorted().toArray();
            long[] distinct = Arrays.stream(sizes).distinct().toArray();
            double[] values = new double[nonZero.length];
            for (int i = 0; i < nonZero.length; i++) {
                int rank = Arrays.binarySearch(distinct, Math.absExact(nonZero[i])) + 1;
                values[i] = Long.signum(nonZero[i]) * (double) rank;
            }
            return new SignedRanks(values, distinct.length < sizes.length);
        }
    }
}
