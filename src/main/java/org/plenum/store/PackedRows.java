package org.plenum.store;

import java.util.Arrays;
import org.plenum.core.Series;

/** Reads one item's {@code period,quantity;period,quantity;...} text back into sorted columns. */
final class PackedRows {
    private PackedRows() {}

    static void parse(int item, String text, Series.Builder out) {
        int n = 1;
        for (int i = 0; i < text.length(); i++) {
            n += text.charAt(i) == ';' ? 1 : 0;
        }
        int[] periods = new int[n];
        long[] quantities = new long[n];
        int pos = 0;
        for (int k = 0; k < n; k++) {
            int comma = text.indexOf(',', pos);
            int end = text.indexOf(';', comma);
            if (end < 0) {
                end = text.length();
            }
            periods[k] = (int) number(text, pos, comma);
            quantities[k] = number(text, comma + 1, end);
            pos = end + 1;
        }
        sortByPeriod(periods, quantities);
        for (int k = 0; k < n; k++) {
            out.add(item, periods[k], quantities[k]);
        }
    }

    /** group_concat keeps the scan order, which SQL does not promise; a sort makes sure. */
    private static void sortByPeriod(int[] periods, long[] quantities) {
        for (int k = 1; k < periods.length; k++) {
            if (periods[k - 1] > periods[k]) {
                Integer[] order = new Integer[periods.length];
                for (int i = 0; i < order.length; i++) {
                    order[i] = i;
                }
                Arrays.sort(order, (a, b) -> Integer.compare(periods[a], periods[b]));
                int[] p = periods.clone();
                long[] q = quantities.clone();
                for (int i = 0; i < order.length; i++) {
                    periods[i] = p[order[i]];
                    quantities[i] = q[order[i]];
                }
                return;
            }
        }
    }

    private static long number(String s, int from, int to) {
        boolean negative = s.charAt(from) == '-';
        long v = 0;
        for (int i = negative ? from + 1 : from; i < to; i++) {
            v = v * 10 + (s.charAt(i) - '0');
        }
        return negative ? -v : v;
    }
}
