package org.plenum.store;

import org.plenum.core.CycleSeries;

/** Reads one item's {@code cycle,period,quantity;...} text back into sorted columns. */
final class PackedTriples {
    private PackedTriples() {}

    static void parse(int item, String text, CycleSeries.Builder out) {
        int n = 1;
        for (int i = 0; i < text.length(); i++) {
            n += text.charAt(i) == ';' ? 1 : 0;
        }
        int[] cycles = new int[n];
        int[] periods = new int[n];
        long[] quantities = new long[n];
        int pos = 0;
        boolean sorted = true;
        for (int k = 0; k < n; k++) {
            int first = text.indexOf(',', pos);
            int second = text.indexOf(',', first + 1);
            int end = text.indexOf(';', second);
            if (end < 0) {
                end = text.length();
            }
            cycles[k] = (int) number(text, pos, first);
            periods[k] = (int) number(text, first + 1, second);
            quantities[k] = number(text, second + 1, end);
            sorted &= k == 0 || cycles[k - 1] < cycles[k] || (cycles[k - 1] == cycles[k] && periods[k - 1] <= periods[k]);
            pos = end + 1;
        }
        if (sorted) {
            for (int k = 0; k < n; k++) {
                out.add(item, cycles[k], periods[k], quantities[k]);
            }
            return;
        }
        // group_concat keeps the scan order, which SQL does not promise; a sort makes sure.
        Integer[] order = new Integer[n];
        for (int k = 0; k < n; k++) {
            order[k] = k;
        }
        java.util.Arrays.sort(order, (a, b) -> cycles[a] != cycles[b] ? Integer.compare(cycles[a], cycles[b])
                : Integer.compare(periods[a], periods[b]));
        for (int k : order) {
            out.add(item, cycles[k], periods[k], quantities[k]);
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
