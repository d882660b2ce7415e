package org.plenum.core;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.Function;

/**
 * The end-to-end FVA fixture R2 of METHODS §9: three items with integer actual / naive / statistical /
 * final values, so every expected number there is exact arithmetic. Its expected values are tagged
 * [computed here] in METHODS (a regression guard, not an external proof). Quantities in millionths.
 */
public final class FvaFixture {
    private FvaFixture() {
    }

    /** One item's columns, in period order. */
    public record Sku(String name, long[] actual, long[] naive, long[] stat, long[] fin) {
        public int periods() {
            return actual.length;
        }
    }

    /** One (item, period) pair, labelled like METHODS ("A1" = item A, first period). */
    public record Pair(String label, long actual, long naive, long stat, long fin) {
        public boolean adjusted() {
            return stat != fin;
        }
    }

    public static final List<Sku> SKUS = List.of(
            sku("A", new int[] {100, 120, 90, 110}, new int[] {95, 100, 120, 90}, new int[] {105, 112, 100, 104},
                    new int[] {110, 118, 95, 104}),
            sku("B", new int[] {0, 40, 55}, new int[] {10, 0, 40}, new int[] {8, 30, 45}, new int[] {5, 45, 70}),
            sku("C", new int[] {200, 210, 190, 205, 220}, new int[] {195, 200, 210, 190, 205},
                    new int[] {198, 205, 200, 205, 210}, new int[] {190, 215, 185, 200, 228}));

    private static Sku sku(String name, int[] actual, int[] naive, int[] stat, int[] fin) {
        return new Sku(name, micros(actual), micros(naive), micros(stat), micros(fin));
    }

    /** Whole units as millionths. */
    public static long[] micros(int... units) {
        return Arrays.stream(units).mapToLong(u -> u * 1_000_000L).toArray();
    }

    /** All 12 pairs, item by item. */
    public static List<Pair> pairs() {
        List<Pair> pairs = new ArrayList<>();
        for (Sku s : SKUS) {
            for (int t = 0; t < s.periods(); t++) {
                pairs.add(new Pair(s.name() + (t + 1), s.actual()[t], s.naive()[t], s.stat()[t], s.fin()[t]));
            }
        }
        return pairs;
    }

    /** The 11 adjusted pairs (A4 was left unadjusted). */
    public static List<Pair> adjusted() {
        return pairs().stream().filter(Pair::adjusted).toList();
    }

    /** One column pooled over all items, e.g. {@code pooled(Sku::actual)}. */
    public static long[] pooled(Function<Sku, long[]> column) {
        return SKUS.stream().map(column).flatMapToLong(Arrays::stream).toArray();
    }

    /** {@code Σ|A − F|} in millionths, done independently of the classes under test. */
    public static long absErrorSum(long[] actual, long[] forecast) {
        long sum = 0;
        for (int t = 0; t < actual.length; t++) {
            sum += Math.abs(actual[t] - forecast[t]);
        }
        return sum;
    }
}
