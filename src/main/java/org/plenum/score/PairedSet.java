package org.plenum.score;

import java.util.Arrays;
import java.util.List;
import org.plenum.core.Series;

/**
 * The (item, period) pairs at one lag on which every compared forecast — the placebo first, then
 * each step in process order — and the actual are known (DESIGN §5). All forecasts are scored on
 * exactly these pairs; a pair that has an actual and some but not all forecasts is left out and
 * counted.
 *
 * @param forecasts {@code forecasts[s][i]}: source s (0 = placebo) for pair i, in millionths
 * @param scales the MASE scale of each pair's item at its cycle, NaN where undefined
 * @param leftOutItems item of each left-out pair, so that a breakdown can count its own
 * @param leftOutPeriods target period of each left-out pair
 */
public record PairedSet(List<String> sources, int lag, int[] items, int[] periods, long[] actuals,
        long[][] forecasts, double[] scales, int size, int[] leftOutItems, int[] leftOutPeriods) {

    /** Pairs with an actual and some but not all forecasts. */
    public int leftOut() {
        return leftOutItems.length;
    }

    /** The pairs of {@code steps} (sorted series at {@code lag}) that the placebo and actuals complete. */
    public static PairedSet of(Series actuals, List<String> stepNames, List<Series> steps, int lag, Placebo placebo,
            int seasonLength) {
        ActualHistory history = new ActualHistory(actuals, placebo.scaleOffset(seasonLength));
        Builder b = new Builder(steps.size() + 1);
        int[] cursor = new int[steps.size()];
        while (true) {
            long key = smallestKey(steps, cursor);
            if (key == Long.MAX_VALUE) {
                break;
            }
            int item = (int) (key >> 32);
            int period = (int) key;
            b.offer(history, item, period, lag, placebo, seasonLength, steps, cursor, key);
        }
        List<String> sources = new java.util.ArrayList<>();
        sources.add(placebo.stepName());
        sources.addAll(stepNames);
        return b.build(List.copyOf(sources), lag);
    }

    private static long key(Series s, int i) {
        return ((long) s.items()[i] << 32) | (s.periods()[i] & 0xFFFFFFFFL);
    }

    private static long smallestKey(List<Series> steps, int[] cursor) {
        long min = Long.MAX_VALUE;
        for (int s = 0; s < steps.size(); s++) {
            if (cursor[s] < steps.get(s).size()) {
                min = Math.min(min, key(steps.get(s), cursor[s]));
            }
        }
        return min;
    }

    /** Collects pairs into growing columns. */
    private static final class Builder {
        private int[] items = new int[1024];
        private int[] periods = new int[1024];
        private long[] actuals = new long[1024];
        private long[][] forecasts;
        private double[] scales = new double[1024];
        private int size;
        private final Series.Builder leftOut = new Series.Builder();
        private final long[] row;

        Builder(int sources) {
            forecasts = new long[sources][1024];
            row = new long[sources];
        }

        void offer(ActualHistory history, int item, int period, int lag, Placebo placebo, int m, List<Series> steps,
                int[] cursor, long key) {
            int present = 0;
            for (int s = 0; s < steps.size(); s++) {
                Series series = steps.get(s);
                if (cursor[s] < series.size() && key(series, cursor[s]) == key) {
                    row[s + 1] = series.quantities()[cursor[s]++];
                    present++;
                } else {
                    row[s + 1] = -1;
                }
            }
            int actual = history.find(item, period);
            if (actual < 0) {
                return;
            }
            int cycle = period - lag;
            int source = history.find(item, placebo.source(period, cycle, m));
            row[0] = source < 0 ? -1 : history.quantity(source);
            present += source < 0 ? 0 : 1;
            if (present < row.length) {
                leftOut.add(item, period, 0);
                return;
            }
            add(item, period, history.quantity(actual), history.scale(item, cycle));
        }

        private void add(int item, int period, long actual, double scale) {
            if (size == items.length) {
                int n = size * 2;
                items = Arrays.copyOf(items, n);
                periods = Arrays.copyOf(periods, n);
                actuals = Arrays.copyOf(actuals, n);
                scales = Arrays.copyOf(scales, n);
                for (int s = 0; s < forecasts.length; s++) {
                    forecasts[s] = Arrays.copyOf(forecasts[s], n);
                }
            }
            items[size] = item;
            periods[size] = period;
            actuals[size] = actual;
            scales[size] = scale;
            for (int s = 0; s < row.length; s++) {
                forecasts[s][size] = row[s];
            }
            size++;
        }

        PairedSet build(List<String> sources, int lag) {
            Series out = leftOut.build();
            // Columns of exactly the set's size: a scorecard over all pairs then reads them as they are.
            long[][] trimmed = new long[forecasts.length][];
            for (int s = 0; s < forecasts.length; s++) {
                trimmed[s] = Arrays.copyOf(forecasts[s], size);
            }
            return new PairedSet(sources, lag, Arrays.copyOf(items, size), Arrays.copyOf(periods, size),
                    Arrays.copyOf(actuals, size), trimmed, Arrays.copyOf(scales, size), size,
                    Arrays.copyOf(out.items(), out.size()), Arrays.copyOf(out.periods(), out.size()));
        }
    }
}
