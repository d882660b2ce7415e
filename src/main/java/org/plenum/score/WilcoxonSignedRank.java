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
        return test(rank(differenceMicros), new int[differenceMicros.length], 1)[0];
    }

    /**
     * Ranks the sizes of {@code d − mu} once, for {@link #test(Ranking, int[], int)}.
     *
     * @throws ArithmeticException when {@code d − mu} leaves the long range
     */
    public Ranking rank(long[] differenceMicros) {
        long[] shifted = new long[differenceMicros.length];
        for (int i = 0; i < shifted.length; i++) {
            shifted[i] = Math.subtractExact(differenceMicros[i], muMicros);
        }
        return Ranking.of(shifted);
    }

    /**
     * Tests each group of one ranked sample: {@code group[i]} is the group of difference {@code i}
     * (from 0 to {@code groups − 1}, or negative for none). The result is exactly what
     * {@link #test(long[])} gives on each group's differences alone — ranks within a group are the
     * group's own — but the sample is sorted once for all groups: a group's members meet in the
     * sample's size order, so one pass over that order ranks every group.
     */
    public Result[] test(Ranking ranking, int[] group, int groups) {
        GroupRanks ranks = GroupRanks.of(ranking, group, groups);
        Result[] results = new Result[groups];
        long[][] exactSamples = null;
        for (int g = 0; g < groups; g++) {
            int n = ranks.n[g];
            int zeros = ranks.zeros[g];
            boolean ties = ranks.tieTerm[g] > 0;
            if (n == 0) {
                OptionalDouble p = zeros == 0 ? OptionalDouble.empty() : OptionalDouble.of(1);
                results[g] = new Result(0, 0, zeros, false, Method.NONE, alternative, continuityCorrection, p);
            } else if (!(exactAllowed && n < EXACT_BELOW && !ties)) {
                results[g] = new Result(ranks.positive[g], n, zeros, ties, Method.NORMAL, alternative,
                        continuityCorrection, OptionalDouble.of(normalPValue(ranks.positive[g], ranks.tieTerm[g], n)));
            } else {
                exactSamples = exactSamples != null ? exactSamples : ranking.nonZeroByGroup(group, ranks.n);
                WilcoxonSignedRankTest.Result library = configured(Method.EXACT)
                        .test(SignedRanks.of(exactSamples[g]).values());
                results[g] = new Result(library.getStatistic(), n, zeros, false, Method.EXACT, alternative,
                        continuityCorrection, OptionalDouble.of(library.getPValue()));
            }
        }
        return results;
    }

    /**
     * The normal approximation as R's {@code wilcox.test} computes it (Hollander and Wolfe 1973):
     * mean n(n+1)/4, variance n(n+1)(2n+1)/24 − Σ(t³ − t)/48 over tie groups, and a continuity
     * correction of 0.5 towards the mean. Written out on primitives rather than handed to the
     * library because the library ranks boxed objects, which a million pairs make slow.
     */
    private double normalPValue(double positiveRankSum, double tieTerm, int n) {
        double mean = n * (n + 1.0) / 4;
        double variance = n * (n + 1.0) * (2.0 * n + 1) / 24 - tieTerm / 48;
        double shift = positiveRankSum - mean;
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
     * A sample of exact differences with the sizes of its non-zero ones ranked: each difference's
     * dense size rank, and the non-zero differences in increasing size. Built once per sample
     * (one sort of primitive longs) and shared by every grouping of it. Immutable.
     */
    public static final class Ranking {
        private final long[] differences;
        /** Indices of the non-zero differences, smallest |d| first (equal sizes in index order). */
        private final int[] bySize;
        /**
         * For each entry of {@code bySize}: {@code 2 · size rank + (1 if d > 0)}. Walking the sizes
         * then reads this array in order instead of two arrays at random places.
         */
        private final int[] signedRankBySize;

        private Ranking(long[] differences, int[] bySize, int[] signedRankBySize) {
            this.differences = differences;
            this.bySize = bySize;
            this.signedRankBySize = signedRankBySize;
        }

        /**
         * Sorts the non-zero differences by size once. Each is packed with its index into one
         * long, {@code |d| << indexBits | index}, when the largest size leaves room: one primitive
         * sort then yields the order, equal sizes in index order, with no lookups; otherwise the
         * sizes are sorted and each difference finds its rank by binary search.
         */
        static Ranking of(long[] differences) {
            int nonZero = 0;
            long largest = 0;
            for (long d : differences) {
                nonZero += d != 0 ? 1 : 0;
                largest = Math.max(largest, Math.absExact(d));
            }
            int indexBits = Math.max(1, 64 - Long.numberOfLeadingZeros(differences.length));
            return largest < 1L << (63 - indexBits) ? packed(differences, nonZero, indexBits)
                    : searched(differences, nonZero);
        }

        private static Ranking packed(long[] differences, int nonZero, int indexBits) {
            long[] keys = new long[nonZero];
            int k = 0;
            for (int i = 0; i < differences.length; i++) {
                if (differences[i] != 0) {
                    keys[k++] = Math.abs(differences[i]) << indexBits | i;
                }
            }
            Arrays.sort(keys);
            long mask = (1L << indexBits) - 1;
            int[] bySize = new int[nonZero];
            int[] signedRanks = new int[nonZero];
            int rank = -1;
            long previousSize = -1;
            for (int p = 0; p < nonZero; p++) {
                int i = (int) (keys[p] & mask);
                long size = keys[p] >>> indexBits;
                rank += size != previousSize ? 1 : 0;
                previousSize = size;
                bySize[p] = i;
                signedRanks[p] = 2 * rank + (differences[i] > 0 ? 1 : 0);
            }
            return new Ranking(differences, bySize, signedRanks);
        }

        private static Ranking searched(long[] differences, int nonZero) {
            long[] sizes = new long[nonZero];
            int k = 0;
            for (long d : differences) {
                if (d != 0) {
                    sizes[k++] = Math.absExact(d);
                }
            }
            Arrays.sort(sizes);
            int distinct = 0;
            for (int i = 0; i < sizes.length; i++) {
                if (i == 0 || sizes[i] != sizes[i - 1]) {
                    sizes[distinct++] = sizes[i];
                }
            }
            int[] sizeRank = new int[differences.length];
            int[] firstOfRank = new int[distinct + 1];
            for (int i = 0; i < differences.length; i++) {
                sizeRank[i] = differences[i] == 0 ? -1
                        : Arrays.binarySearch(sizes, 0, distinct, Math.absExact(differences[i]));
                if (sizeRank[i] >= 0) {
                    firstOfRank[sizeRank[i] + 1]++;
                }
            }
            for (int r = 0; r < distinct; r++) {
                firstOfRank[r + 1] += firstOfRank[r];
            }
            int[] bySize = new int[nonZero];
            for (int i = 0; i < differences.length; i++) {
                if (sizeRank[i] >= 0) {
                    bySize[firstOfRank[sizeRank[i]]++] = i;
                }
            }
            int[] signedRanks = new int[nonZero];
            for (int p = 0; p < nonZero; p++) {
                signedRanks[p] = 2 * sizeRank[bySize[p]] + (differences[bySize[p]] > 0 ? 1 : 0);
            }
            return new Ranking(differences, bySize, signedRanks);
        }

        public int size() {
            return differences.length;
        }

        /** Each group's non-zero differences, in sample order; {@code counts[g]} of them. */
        long[][] nonZeroByGroup(int[] group, int[] counts) {
            long[][] out = new long[counts.length][];
            int[] filled = new int[counts.length];
            for (int g = 0; g < counts.length; g++) {
                out[g] = new long[counts[g]];
            }
            for (int i = 0; i < differences.length; i++) {
                if (group[i] >= 0 && differences[i] != 0) {
                    out[group[i]][filled[group[i]]++] = differences[i];
                }
            }
            return out;
        }
    }

    /**
     * Per group: the sum of the average ranks of its positive differences, the tie term Σ(t³ − t)
     * over its tie groups, and its counts. Equal sizes within a group are consecutive in the
     * sample's size order, so a group's tie group closes when the next size of that group arrives.
     */
    private static final class GroupRanks {
        final double[] positive;
        final double[] tieTerm;
        final int[] n;
        final int[] zeros;
        private final int[] openRank;
        private final int[] openCount;
        private final int[] openPositives;

        private GroupRanks(int groups) {
            positive = new double[groups];
            tieTerm = new double[groups];
            n = new int[groups];
            zeros = new int[groups];
            openRank = new int[groups];
            openCount = new int[groups];
            openPositives = new int[groups];
            Arrays.fill(openRank, -1);
        }

        static GroupRanks of(Ranking ranking, int[] group, int groups) {
            if (group.length != ranking.size()) {
                throw new IllegalArgumentException(ranking.size() + " differences but " + group.length + " group labels");
            }
            GroupRanks ranks = new GroupRanks(groups);
            for (int i = 0; i < group.length; i++) {
                if (group[i] >= 0 && ranking.differences[i] == 0) {
                    ranks.zeros[group[i]]++;
                }
            }
            int[] bySize = ranking.bySize;
            int[] signedRanks = ranking.signedRankBySize;
            for (int p = 0; p < bySize.length; p++) {
                int g = group[bySize[p]];
                if (g < 0) {
                    continue;
                }
                int rank = signedRanks[p] >> 1;
                if (rank != ranks.openRank[g]) {
                    ranks.close(g);
                    ranks.openRank[g] = rank;
                }
                ranks.openCount[g]++;
                ranks.openPositives[g] += signedRanks[p] & 1;
            }
            for (int g = 0; g < groups; g++) {
                ranks.close(g);
            }
            return ranks;
        }

        /** Ends group g's current tie group: its members share the ranks n+1 … n+t, on average n + (t+1)/2. */
        private void close(int g) {
            double t = openCount[g];
            positive[g] += openPositives[g] * (n[g] + (t + 1) / 2);
            tieTerm[g] += t * t * t - t;
            n[g] += openCount[g];
            openCount[g] = 0;
            openPositives[g] = 0;
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
