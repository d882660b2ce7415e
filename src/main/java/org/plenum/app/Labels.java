package org.plenum.app;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.plenum.core.Frequency;
import org.plenum.core.Period;
import org.plenum.score.PairedSet;

/**
 * The value of a breakdown field for each scored pair, as a small integer label, so that a
 * million pairs are grouped without a million strings or boxed integers.
 */
final class Labels {
    private final List<String> names;
    private final int[] byItem;
    private final int[] byPeriod;
    private final int periodBase;

    private Labels(List<String> names, int[] byItem, int[] byPeriod, int periodBase) {
        this.names = names;
        this.byItem = byItem;
        this.byPeriod = byPeriod;
        this.periodBase = periodBase;
    }

    /** Labels by an item attribute; items without a value share the label "(none)". */
    static Labels ofItems(PairedSet set, Map<Integer, String> values) {
        int maxItem = 0;
        for (int i = 0; i < set.size(); i++) {
            maxItem = Math.max(maxItem, set.items()[i]);
        }
        for (int item : set.leftOutItems()) {
            maxItem = Math.max(maxItem, item);
        }
        List<String> names = new ArrayList<>();
        Map<String, Integer> index = new HashMap<>();
        int[] byItem = new int[maxItem + 1];
        for (int item = 0; item <= maxItem; item++) {
            byItem[item] = index.computeIfAbsent(values.getOrDefault(item, "(none)"), k -> {
                names.add(k);
                return names.size() - 1;
            });
        }
        return new Labels(names, byItem, null, 0);
    }

    /** Labels by the cycle in which each pair's forecast was issued. */
    static Labels ofCycles(PairedSet set, Frequency frequency) {
        int min = Integer.MAX_VALUE;
        int max = Integer.MIN_VALUE;
        for (int i = 0; i < set.size(); i++) {
            min = Math.min(min, set.periods()[i]);
            max = Math.max(max, set.periods()[i]);
        }
        for (int p : set.leftOutPeriods()) {
            min = Math.min(min, p);
            max = Math.max(max, p);
        }
        List<String> names = new ArrayList<>();
        int[] byPeriod = new int[Math.max(0, max - min + 1)];
        for (int p = min; p <= max; p++) {
            byPeriod[p - min] = names.size();
            names.add(new Period(frequency, p - set.lag()).toString());
        }
        return new Labels(names, null, byPeriod, min);
    }

    List<String> names() {
        return names;
    }

    int label(int item, int period) {
        return byItem != null ? byItem[item] : byPeriod[period - periodBase];
    }

    /** The rows of each label, in row order (so each group stays sorted by item). */
    int[][] rows(int[] items, int[] periods, int size) {
        int[] counts = new int[names.size()];
        for (int i = 0; i < size; i++) {
            counts[label(items[i], periods[i])]++;
        }
        int[][] rows = new int[names.size()][];
        for (int g = 0; g < rows.length; g++) {
            rows[g] = new int[counts[g]];
        }
        int[] filled = new int[names.size()];
        for (int i = 0; i < size; i++) {
            int g = label(items[i], periods[i]);
            rows[g][filled[g]++] = i;
        }
        return rows;
    }

    int[] counts(int[] items, int[] periods) {
        int[] counts = new int[names.size()];
        for (int i = 0; i < items.length; i++) {
            counts[label(items[i], periods[i])]++;
        }
        return counts;
    }
}
