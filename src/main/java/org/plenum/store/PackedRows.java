package org.plenum.store;

import org.plenum.core.Series;

/**
 * Reads one item's {@code period,quantity;period,quantity;...} text back into sorted columns. The
 * text is read as the bytes SQLite gives (ASCII digits, signs and separators), so that a million
 * values are never decoded into strings.
 */
final class PackedRows {
    private PackedRows() {}

    static void parse(int item, byte[] text, Series.Builder out) {
        int first = out.size();
        int pos = 0;
        boolean sorted = true;
        while (pos < text.length) {
            int comma = indexOf(text, (byte) ',', pos);
            int end = indexOf(text, (byte) ';', comma);
            int period = (int) number(text, pos, comma);
            sorted &= out.size() == first || out.lastPeriod() < period;
            out.add(item, period, number(text, comma + 1, end));
            pos = end + 1;
        }
        if (!sorted) {
            out.sortFrom(first);
        }
    }

    private static int indexOf(byte[] text, byte b, int from) {
        for (int i = from; i < text.length; i++) {
            if (text[i] == b) {
                return i;
            }
        }
        return text.length;
    }

    private static long number(byte[] s, int from, int to) {
        boolean negative = s[from] == '-';
        long v = 0;
        for (int i = negative ? from + 1 : from; i < to; i++) {
            v = v * 10 + (s[i] - '0');
        }
        return negative ? -v : v;
    }
}
