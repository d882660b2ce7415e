package org.plenum.score;

import java.util.stream.IntStream;

/**
 * The exact absolute error of every source on every pair of a {@link PairedSet}, and for each step
 * its differences from the previous source's errors, ranked for the Wilcoxon test. Computed once
 * per set: the whole scorecard and every breakdown of it read the same columns, and a million
 * differences are sorted once per step instead of once per breakdown. Immutable.
 */
public final class PairErrors {
    private final PairedSet set;
    private final long[][] absolute;
    private final WilcoxonSignedRank.Ranking[] vsPrevious;

    private PairErrors(PairedSet set, long[][] absolute, WilcoxonSignedRank.Ranking[] vsPrevious) {
        this.set = set;
        this.absolute = absolute;
        this.vsPrevious = vsPrevious;
    }

    /** The errors of {@code set}; the steps are ranked in parallel, each independently. */
    public static PairErrors of(PairedSet set) {
        int sources = set.sources().size();
        long[][] absolute = new long[sources][];
        IntStream.range(0, sources).parallel().forEach(s -> absolute[s] = absoluteErrors(set, s));
        WilcoxonSignedRank.Ranking[] vsPrevious = new WilcoxonSignedRank.Ranking[sources];
        IntStream.range(1, sources).parallel().forEach(s -> vsPrevious[s] = WilcoxonSignedRank.twoSided()
                .rank(differences(absolute[s - 1], absolute[s])));
        return new PairErrors(set, absolute, vsPrevious);
    }

    public PairedSet set() {
        return set;
    }

    /** {@code |A − F|} of source {@code s} (0 = the placebo) for each pair, in millionths. */
    long[] absolute(int s) {
        return absolute[s];
    }

    /** {@code |e(previous)| − |e(step s)|} for each pair, ranked; s ≥ 1. */
    WilcoxonSignedRank.Ranking vsPrevious(int s) {
        return vsPrevious[s];
    }

    private static long[] absoluteErrors(PairedSet set, int s) {
        long[] actuals = set.actuals();
        long[] forecasts = set.forecasts()[s];
        long[] errors = new long[set.size()];
        for (int i = 0; i < errors.length; i++) {
            errors[i] = Math.abs(actuals[i] - forecasts[i]);
        }
        return errors;
    }

    private static long[] differences(long[] previous, long[] step) {
        long[] d = new long[step.length];
        for (int i = 0; i < d.length; i++) {
            d[i] = previous[i] - step[i];
        }
        return d;
    }
}
