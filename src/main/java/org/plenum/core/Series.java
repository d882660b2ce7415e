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

        public int size() {
            return size;
        }

        /** The period of the row added last; there must be one. */
        public int lastPeriod() {
            return periods[size - 1];
        }

        /**
         * Sorts the rows from {@code from} on by period: they must all be of one item. For reads
         * whose order SQL does not promise (a group_concat keeps the scan order, usually sorted).
         */
        public void sortFrom(int from) {
            Integer[] order = new Integer[size - from];
            for (int i = 0; i < order.length; i++) {
                order[i] = from + i;
            }
            Arrays.sort(order, (a, b) -> Integer.compare(periods[a], periods[b]));
            int[] p = Arrays.copyOfRange(periods, from, size);
            long[] q = Arrays.copyOfRange(quantities, from, size);
            for (int i = 0; i < order.length; i++) {
                periods[from + i] = p[order[i] - from];
                quantities[from + i] = q[order[i] - from];
            }
        }

        public Series build() {
            return new Series(items, periods, quantities, size);
        }
    }
}
