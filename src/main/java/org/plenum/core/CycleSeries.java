package org.plenum.core;

import java.util.Arrays;

/**
 * Forecasts keyed by item, cycle and target period, in columns sorted by item id, then cycle, then
 * period: the shape in which the agenda reads a few million statistical forecasts without a few
 * million objects. Cycles and periods are {@code Period.index} values; quantities are millionths.
 */
public record CycleSeries(int[] items, int[] cycles, int[] periods, long[] quantities, int size) {

    public static final class Builder {
        private int[] items = new int[1024];
        private int[] cycles = new int[1024];
        private int[] periods = new int[1024];
        private long[] quantities = new long[1024];
        private int size;

        public void add(int item, int cycle, int period, long quantity) {
            if (size == items.length) {
                items = Arrays.copyOf(items, size * 2);
                cycles = Arrays.copyOf(cycles, size * 2);
                periods = Arrays.copyOf(periods, size * 2);
                quantities = Arrays.copyOf(quantities, size * 2);
            }
            items[size] = item;
            cycles[size] = cycle;
            periods[size] = period;
            quantities[size++] = quantity;
        }

        public CycleSeries build() {
            return new CycleSeries(items, cycles, periods, quantities, size);
        }
    }
}
