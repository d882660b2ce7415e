package org.plenum.score;

import java.util.Arrays;
import org.plenum.core.Series;

/**
 * Every item's actuals with fast lookups: the actual of a period, and the in-sample MAE of the
 * naive (or seasonal naive) over the periods known before a cycle — the MASE scale of Hyndman
 * and Koehler (2006), computed from prefix sums so that each lookup is a binary search.
 */
final class ActualHistory {
    private final Series actuals;
    private final int[] itemStart;
    private final int[] itemEnd;
    private final long[] scaleSum;
    private final int[] scaleCount;

    ActualHistory(Series actuals, int scaleOffset) {
        this.actuals = actuals;
        int maxItem = 0;
        for (int i = 0; i < actuals.size(); i++) {
            maxItem = Math.max(maxItem, actuals.items()[i]);
        }
        itemStart = new int[maxItem + 2];
        itemEnd = new int[maxItem + 2];
        Arrays.fill(itemStart, -1);
        for (int i = 0; i < actuals.size(); i++) {
            int item = actuals.items()[i];
            if (itemStart[item] < 0) {
                itemStart[item] = i;
            }
            itemEnd[item] = i + 1;
        }
        scaleSum = new long[actuals.size()];
        scaleCount = new int[actuals.size()];
        prefixScale(scaleOffset);
    }

    private void prefixScale(int offset) {
        long sum = 0;
        int count = 0;
        for (int i = 0; i < actuals.size(); i++) {
            int item = actuals.items()[i];
            if (i == itemStart[item]) {
                sum = 0;
                count = 0;
            }
            int earlier = find(item, actuals.periods()[i] - offset);
            if (earlier >= 0) {
                sum = Math.addExact(sum, Math.abs(actuals.quantities()[i] - actuals.quantities()[earlier]));
                count++;
            }
            scaleSum[i] = sum;
            scaleCount[i] = count;
        }
    }

    /** Position of the item's actual of {@code period}, or −1 when it is not known. */
    int find(int item, int period) {
        if (item >= itemStart.length || itemStart[item] < 0) {
            return -1;
        }
        int pos = Arrays.binarySearch(actuals.periods(), itemStart[item], itemEnd[item], period);
        return pos >= 0 ? pos : -1;
    }

    long quantity(int position) {
        return actuals.quantities()[position];
    }

    /**
     * The MASE scale of an item at a cycle: mean |A_t − A_(t−offset)| over the known pairs with
     * t before the cycle, in millionths; NaN when there is no such pair or the mean is zero.
     */
    double scale(int item, int cycle) {
        if (item >= itemStart.length || itemStart[item] < 0) {
            return Double.NaN;
        }
        int pos = Arrays.binarySearch(actuals.periods(), itemStart[item], itemEnd[item], cycle - 1);
        int last = pos >= 0 ? pos : -pos - 2;
        if (last < itemStart[item] || scaleCount[last] == 0 || scaleSum[last] == 0) {
            return Double.NaN;
        }
        return scaleSum[last] / (double) scaleCount[last];
    }
}
