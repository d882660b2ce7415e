package org.plenum.agenda;

import java.util.Arrays;

/** Where each item's rows start and end in a column sorted by item id. */
final class ItemRanges {
    private final int[] start;
    private final int[] end;

    ItemRanges(int[] items, int size) {
        int max = 0;
        for (int i = 0; i < size; i++) {
            max = Math.max(max, items[i]);
        }
        start = new int[max + 1];
        end = new int[max + 1];
        Arrays.fill(start, -1);
        for (int i = 0; i < size; i++) {
            if (i > 0 && items[i] < items[i - 1]) {
                throw new IllegalArgumentException("rows must be sorted by item id");
            }
            if (start[items[i]] < 0) {
                start[items[i]] = i;
            }
            end[items[i]] = i + 1;
        }
    }

    /** First row of the item, or the end of an empty range. */
    int from(int item) {
        return item < start.length && start[item] >= 0 ? start[item] : 0;
    }

    /** One past the item's last row; {@code from(item)} when it has none. */
    int to(int item) {
        return item < start.length && start[item] >= 0 ? end[item] : 0;
    }
}
