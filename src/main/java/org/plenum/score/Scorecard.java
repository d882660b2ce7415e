package org.plenum.score;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.plenum.core.MeanAbsoluteScaledError;
import org.plenum.core.PercentageBias;
import org.plenum.core.Wape;

/**
 * The process scorecard (DESIGN §5): placebo → each configured step, scored on one paired set,
 * each step compared with the one before it and with the placebo.
 */
public record Scorecard(int lag, Placebo placebo, int pairs, int leftOut, List<StepScore> steps) {

    /** The scorecard over every pair of {@code set}. */
    public static Scorecard of(PairedSet set, Placebo placebo, BootstrapInterval bootstrap) {
        return of(set, placebo, bootstrap, allRows(set.size()), set.leftOut());
    }

    /**
     * The scorecard over the given rows of {@code set} (a breakdown's group), rows sorted by item.
     * Without a bootstrap, comparisons carry no interval: breakdowns leave it out, because a
     * thousand draws per group and step cost more than all the rest of the scorecard.
     */
    public static Scorecard of(PairedSet set, Placebo placebo, BootstrapInterval bootstrap, int[] rows, int leftOut) {
        long[] actuals = pick(set.actuals(), rows);
        long[][] errors = new long[set.sources().size()][];
        List<StepScore> steps = new ArrayList<>();
        OptionalDouble placeboAccuracy = OptionalDouble.empty();
        for (int s = 0; s < set.sources().size(); s++) {
            long[] forecasts = pick(set.forecasts()[s], rows);
            errors[s] = absoluteErrors(actuals, forecasts);
            Wape.Result wape = Wape.of(actuals, forecasts);
            Optional<Comparison> vsPrevious = s == 0 ? Optional.empty()
                    : Optional.of(compare(set, rows, errors[s], errors[s - 1], wape.accuracy(),
                            steps.get(s - 1).accuracy(), set.sources().get(s - 1), bootstrap));
            if (s == 0) {
                placeboAccuracy = wape.accuracy();
            }
            MeanAbsoluteScaledError.Pooled mase = MeanAbsoluteScaledError.pooled(errors[s], pickScales(set.scales(), rows));
            steps.add(new StepScore(set.sources().get(s), rows.length, wape.meanAbsoluteError(), wape.value(),
                    wape.accuracy(), PercentageBias.of(actuals, forecasts).value(), mase.value(), mase.leftOut(),
                    vsPrevious, s == 0 ? OptionalDouble.empty() : difference(wape.accuracy(), placeboAccuracy)));
        }
        return new Scorecard(set.lag(), placebo, rows.length, leftOut, steps);
    }

    private static Comparison compare(PairedSet set, int[] rows, long[] errors, long[] previousErrors,
            OptionalDouble accuracy, OptionalDouble previousAccuracy, String previous, BootstrapInterval bootstrap) {
        // bootstrap may be null: see of(PairedSet, Placebo, BootstrapInterval, int[], int)
        AvgRelMae.Result avgRelMae = AvgRelMae.of(perItem(set.items(), rows, errors, previousErrors));
        long[] differences = new long[errors.length];
        for (int i = 0; i < errors.length; i++) {
            differences[i] = previousErrors[i] - errors[i];
        }
        WilcoxonSignedRank.Result wilcoxon = WilcoxonSignedRank.twoSided().test(differences);
        return new Comparison(previous, difference(accuracy, previousAccuracy), avgRelMae,
                bootstrap == null ? Optional.empty() : bootstrap.of(avgRelMae.logRatios()),
                GeometricMeanRatio.of(errors, previousErrors), wilcoxon,
                Evidence.of(wilcoxon, avgRelMae.value()));
    }

    /** One AvgRelMAE series per item: its rows are contiguous because pairs are sorted by item. */
    private static List<AvgRelMae.Series> perItem(int[] items, int[] rows, long[] errors, long[] previousErrors) {
        List<AvgRelMae.Series> series = new ArrayList<>();
        int start = 0;
        for (int i = 1; i <= rows.length; i++) {
            if (i == rows.length || items[rows[i]] != items[rows[start]]) {
                long candidate = 0;
                long benchmark = 0;
                for (int j = start; j < i; j++) {
                    candidate = Math.addExact(candidate, errors[j]);
                    benchmark = Math.addExact(benchmark, previousErrors[j]);
                }
                series.add(new AvgRelMae.Series(i - start, candidate, benchmark));
                start = i;
            }
        }
        return series;
    }

    static long[] absoluteErrors(long[] actuals, long[] forecasts) {
        long[] errors = new long[actuals.length];
        for (int i = 0; i < actuals.length; i++) {
            errors[i] = Math.abs(actuals[i] - forecasts[i]);
        }
        return errors;
    }

    private static OptionalDouble difference(OptionalDouble a, OptionalDouble b) {
        return a.isPresent() && b.isPresent() ? OptionalDouble.of(a.getAsDouble() - b.getAsDouble())
                : OptionalDouble.empty();
    }

    static int[] allRows(int size) {
        int[] rows = new int[size];
        for (int i = 0; i < size; i++) {
            rows[i] = i;
        }
        return rows;
    }

    private static long[] pick(long[] column, int[] rows) {
        long[] out = new long[rows.length];
        for (int i = 0; i < rows.length; i++) {
            out[i] = column[rows[i]];
        }
        return out;
    }

    private static double[] pickScales(double[] column, int[] rows) {
        double[] out = new double[rows.length];
        for (int i = 0; i < rows.length; i++) {
            out[i] = column[rows[i]];
        }
        return out;
    }
}
