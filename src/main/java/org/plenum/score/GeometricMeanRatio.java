package org.plenum.score;

import java.util.Objects;
import java.util.OptionalDouble;
import org.apache.commons.statistics.descriptive.GeometricMean;

/**
 * The geometric mean of per-pair relative absolute errors {@code RAE_t = |e_t(candidate)| / |e_t(benchmark)|}
 * (GMRAE), e.g. the per-decision ratio {@code |e_new| / |e_prior|}. Below 1 the candidate was closer.
 *
 * <p>Source: Armstrong, J. S., &amp; Collopy, F. (1992), "Error measures for generalizing about
 * forecasting methods: Empirical comparisons", <i>International Journal of Forecasting</i> 8(1),
 * 69–80. Ratios are never averaged arithmetically: the geometric mean treats r and 1/r evenly.
 *
 * <p>Zero errors are decided on the exact values and never silently turned into 0 or infinity:
 * a pair where only the candidate is exact ("exact hit", ratio 0), where only the benchmark is exact
 * (ratio infinite) or where both are (0/0) is counted apart. The {@link Variant#EXCLUDING_ZERO_AND_INFINITE}
 * variant leaves all three out; {@link Variant#WINSORISED} clamps every ratio to
 * [{@value #WINSOR_LOW}, {@value #WINSOR_HIGH}], so exact hits count as 0.01 and infinite ratios as 10,
 * and leaves out only 0/0 (winsorising bounds as attributed to Armstrong &amp; Collopy; recalled,
 * not checked against the paper).
 */
public final class GeometricMeanRatio {
    /** Lower winsorising bound for a relative absolute error. */
    public static final double WINSOR_LOW = 0.01;
    /** Upper winsorising bound for a relative absolute error. */
    public static final double WINSOR_HIGH = 10;

    private GeometricMeanRatio() {
    }

    /** How zero and infinite ratios are treated. */
    public enum Variant {
        /** Only finite, positive ratios enter the mean; the rest are counted. */
        EXCLUDING_ZERO_AND_INFINITE,
        /** Ratios clamped to [0.01, 10], exact hits and infinite ratios included; 0/0 still left out. */
        WINSORISED
    }

    /**
     * A GMRAE with its counts; {@code ratiosUsed + candidateExact + benchmarkExact + bothExact}
     * equals the number of pairs in the exclusion variant.
     *
     * @param value the geometric mean; empty when no ratio could be used
     * @param variant how zero and infinite ratios were treated
     * @param ratiosUsed ratios that entered the mean
     * @param candidateExact pairs where only the candidate error was zero (exact hits)
     * @param benchmarkExact pairs where only the benchmark error was zero (infinite ratio)
     * @param bothExact pairs where both errors were zero (0/0, always left out)
     */
    public record Result(OptionalDouble value, Variant variant, int ratiosUsed, int candidateExact, int benchmarkExact,
            int bothExact) {
    }

    /**
     * One pair's relative absolute error {@code |candidate error| / |benchmark error|}.
     *
     * @return the ratio (0 for an exact hit); empty when the benchmark error is zero (ratio infinite or 0/0)
     */
    public static OptionalDouble relativeAbsoluteError(long candidateErrorMicros, long benchmarkErrorMicros) {
        long benchmark = Math.absExact(benchmarkErrorMicros);
        return benchmark == 0 ? OptionalDouble.empty()
                : OptionalDouble.of(Math.absExact(candidateErrorMicros) / (double) benchmark);
    }

    /** GMRAE leaving out zero and infinite ratios. */
    public static Result of(long[] candidateErrorMicros, long[] benchmarkErrorMicros) {
        return of(candidateErrorMicros, benchmarkErrorMicros, Variant.EXCLUDING_ZERO_AND_INFINITE);
    }

    /**
     * GMRAE over paired errors (signed or absolute; only their size matters), in millionths of a unit.
     *
     * @throws IllegalArgumentException when the arrays differ in length
     */
    public static Result of(long[] candidateErrorMicros, long[] benchmarkErrorMicros, Variant variant) {
        if (candidateErrorMicros.length != benchmarkErrorMicros.length) {
            throw new IllegalArgumentException("errors must be paired: " + candidateErrorMicros.length
                    + " candidate errors, " + benchmarkErrorMicros.length + " benchmark errors");
        }
        Tally tally = new Tally(variant);
        for (int t = 0; t < candidateErrorMicros.length; t++) {
            tally.add(Math.absExact(candidateErrorMicros[t]), Math.absExact(benchmarkErrorMicros[t]));
        }
        return tally.result();
    }

    /** Counts the exact cases of one pass and feeds the usable ratios to a geometric mean. */
    private static final class Tally {
        private final Variant variant;
        private final GeometricMean mean = GeometricMean.create();
        private int used;
        private int candidateExact;
        private int benchmarkExact;
        private int bothExact;

        Tally(Variant variant) {
            this.variant = Objects.requireNonNull(variant);
        }

        void add(long candidate, long benchmark) {
            if (candidate == 0 && benchmark == 0) {
                bothExact++; // 0/0 has no ratio in either variant
                return;
            }
            candidateExact += candidate == 0 ? 1 : 0;
            benchmarkExact += benchmark == 0 ? 1 : 0;
            if (variant == Variant.WINSORISED || (candidate != 0 && benchmark != 0)) {
                mean.accept(ratio(candidate, benchmark, variant));
                used++;
            }
        }

        Result result() {
            OptionalDouble value = used == 0 ? OptionalDouble.empty() : OptionalDouble.of(mean.getAsDouble());
            return new Result(value, variant, used, candidateExact, benchmarkExact, bothExact);
        }
    }

    /** The ratio of two absolute errors, not both zero; clamped when winsorising. */
    private static double ratio(long candidate, long benchmark, Variant variant) {
        if (variant == Variant.EXCLUDING_ZERO_AND_INFINITE) {
            return candidate / (double) benchmark;
        }
        if (benchmark == 0) {
            return WINSOR_HIGH;
        }
        return Math.min(WINSOR_HIGH, Math.max(WINSOR_LOW, candidate / (double) benchmark));
    }
}
