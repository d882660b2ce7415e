package org.plenum.score;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.stream.IntStream;
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
        return of(PairErrors.of(set), placebo, bootstrap);
    }

    /** The scorecard over every pair of the set behind {@code errors}. */
    public static Scorecard of(PairErrors errors, Placebo placebo, BootstrapInterval bootstrap) {
        PairedSet set = errors.set();
        return of(errors, placebo, bootstrap, new int[][] {allRows(set.size())}, new int[] {set.leftOut()}).get(0);
    }

    /**
     * One scorecard per group of rows of the set (a breakdown's groups; each group non-empty and
     * sorted by item). Every (group, step) is scored independently, in parallel. Without a
     * bootstrap, comparisons carry no interval: breakdowns leave it out, because a thousand draws
     * per group and step cost more than all the rest of the scorecard.
     *
     * @param leftOut the pairs left out of each group
     */
    public static List<Scorecard> of(PairErrors errors, Placebo placebo, BootstrapInterval bootstrap, int[][] rows,
            int[] leftOut) {
        PairedSet set = errors.set();
        int sources = set.sources().size();
        WilcoxonSignedRank.Result[][] tests = new WilcoxonSignedRank.Result[sources][];
        int[] group = groupOfRow(rows, set.size());
        IntStream.range(1, sources).parallel().forEach(s -> tests[s] = WilcoxonSignedRank.twoSided()
                .test(errors.vsPrevious(s), group, rows.length));
        Part[] parts = new Part[rows.length * sources];
        IntStream.range(0, parts.length).parallel().forEach(t -> {
            int g = t / sources;
            int s = t % sources;
            parts[t] = Part.of(errors, s, rows[g], s == 0 ? null : tests[s][g], bootstrap);
        });
        List<Scorecard> cards = new ArrayList<>();
        for (int g = 0; g < rows.length; g++) {
            cards.add(assemble(set, placebo, Arrays.copyOfRange(parts, g * sources, (g + 1) * sources), rows[g].length,
                    leftOut[g]));
        }
        return cards;
    }

    /** One (group, step): its accuracy measures and, after the placebo, its comparison's parts. */
    private record Part(Wape.Result wape, PercentageBias.Result bias, MeanAbsoluteScaledError.Pooled mase,
            AvgRelMae.Result avgRelMae, Optional<BootstrapInterval.Interval> interval, GeometricMeanRatio.Result ratio,
            WilcoxonSignedRank.Result wilcoxon) {

        static Part of(PairErrors errors, int s, int[] rows, WilcoxonSignedRank.Result wilcoxon,
                BootstrapInterval bootstrap) {
            PairedSet set = errors.set();
            long[] actuals = pick(set.actuals(), rows);
            long[] forecasts = pick(set.forecasts()[s], rows);
            long[] absolute = pick(errors.absolute(s), rows);
            MeanAbsoluteScaledError.Pooled mase = MeanAbsoluteScaledError.pooled(absolute, pick(set.scales(), rows));
            if (s == 0) {
                return new Part(Wape.of(actuals, forecasts), PercentageBias.of(actuals, forecasts), mase, null,
                        Optional.empty(), null, null);
            }
            long[] previous = pick(errors.absolute(s - 1), rows);
            AvgRelMae.Result avgRelMae = AvgRelMae.of(perItem(set.items(), rows, absolute, previous));
            return new Part(Wape.of(actuals, forecasts), PercentageBias.of(actuals, forecasts), mase, avgRelMae,
                    bootstrap == null ? Optional.empty() : bootstrap.of(avgRelMae.logRatios()),
                    GeometricMeanRatio.of(absolute, previous), wilcoxon);
        }
    }

    private static Scorecard assemble(PairedSet set, Placebo placebo, Part[] parts, int pairs, int leftOut) {
        List<StepScore> steps = new ArrayList<>();
        OptionalDouble placeboAccuracy = parts[0].wape().accuracy();
        for (int s = 0; s < parts.length; s++) {
            Part part = parts[s];
            OptionalDouble accuracy = part.wape().accuracy();
            Optional<Comparison> vsPrevious = s == 0 ? Optional.empty()
                    : Optional.of(new Comparison(set.sources().get(s - 1),
                            difference(accuracy, parts[s - 1].wape().accuracy()), part.avgRelMae(), part.interval(),
                            part.ratio(), part.wilcoxon(), Evidence.of(part.wilcoxon(), part.avgRelMae().value())));
            steps.add(new StepScore(set.sources().get(s), pairs, part.wape().meanAbsoluteError(), part.wape().value(),
                    accuracy, part.bias().value(), part.mase().value(), part.mase().leftOut(), vsPrevious,
                    s == 0 ? OptionalDouble.empty() : difference(accuracy, placeboAccuracy)));
        }
        return new Scorecard(set.lag(), placebo, pairs, leftOut, steps);
    }

    /** The group of each row of the set, −1 for rows in no group. */
    private static int[] groupOfRow(int[][] rows, int size) {
        int[] group = new int[size];
        Arrays.fill(group, -1);
        for (int g = 0; g < rows.length; g++) {
            for (int row : rows[g]) {
                group[row] = g;
            }
        }
        return group;
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

    /** The column's values at {@code rows}; the column itself when the rows are all of it (nothing writes to either). */
    private static long[] pick(long[] column, int[] rows) {
        if (rows.length == column.length) {
            return column;
        }
        long[] out = new long[rows.length];
        for (int i = 0; i < rows.length; i++) {
            out[i] = column[rows[i]];
        }
        return out;
    }

    private static double[] pick(double[] column, int[] rows) {
        if (rows.length == column.length) {
            return column;
        }
        double[] out = new double[rows.length];
        for (int i = 0; i < rows.length; i++) {
            out[i] = column[rows[i]];
        }
        return out;
    }
}
