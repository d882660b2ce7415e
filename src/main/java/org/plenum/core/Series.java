package org.plenum.core;

import java.util.Arrays;

/**
 * Quantities keyed by item and period, in columns sorted by item id then period: the shape in
 * which scoring reads a million values without a million objects. Periods are
 * {@code Period.index} values; quantities are millionths of a unit.
 */
public record Series(int[] items, int[] periods, long[] quantities, int size) {

    public static final class Builder {
        private int[] items = new int[1024];
        private int[] periods = new int[1024];
        private long[] quantities = new long[1024];
        private int size;

        public void add(int item, int period, long quantity) {
            if (size == items.length) {
                items = Arrays.copyOf(items, size * 2);
                periods = Arrays.copyOf(periods, size * 2);
                quantities = Arrays.copyOf(quantities, size * 2);
            }
            items[size] = item;
            periods[size] = period;
            quantities[size++] = quantity;
        }

        public Series build() {
            return new Series(items, periods, quantities, size);
        }
    }
}
