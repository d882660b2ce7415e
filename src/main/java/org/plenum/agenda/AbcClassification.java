package org.plenum.agenda;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * ABC classes by share of value (or volume), Pareto style (common practice; METHODS §7): items
 * sorted by value, largest first, and each classed by the cumulative share at which it
 * <i>starts</i> — A below the first threshold (default 80%), B below the second (default 95%),
 * C from there on. An item that crosses a boundary thus stays in the class where it starts.
 * Ties in value are ordered by item code. Values are summed exactly; with a total of zero every
 * item is C.
 */
public final class AbcClassification {
    private final BigDecimal a;
    private final BigDecimal b;

    /** @param a upper cumulative share of A, {@code 0 < a < b <= 1}; {@code b} of B */
    public AbcClassification(double a, double b) {
        if (!(a > 0 && a < b && b <= 1)) {
            throw new IllegalArgumentException("ABC thresholds need 0 < A < B <= 1, found " + a + " and " + b);
        }
        this.a = BigDecimal.valueOf(a);
        this.b = BigDecimal.valueOf(b);
    }

    /** One item's exact value: volume in millionths, times the unit value in millionths when by value. */
    public record Value(String item, BigInteger amount) {}

    /** The class of every item, by item code. */
    public Map<String, String> classes(List<Value> values) {
        List<Value> sorted = new ArrayList<>(values);
        sorted.sort(Comparator.comparing(Value::amount).reversed().thenComparing(Value::item));
        BigInteger total = sorted.stream().map(Value::amount).reduce(BigInteger.ZERO, BigInteger::add);
        BigDecimal totalDecimal = new BigDecimal(total);
        // The two boundaries, as exact amounts, once: an item starts in A while the amount before
        // it is below a·total, in B while below b·total.
        BigDecimal endOfA = a.multiply(totalDecimal);
        BigDecimal endOfB = b.multiply(totalDecimal);
        Map<String, String> out = new HashMap<>();
        BigInteger before = BigInteger.ZERO;
        for (Value v : sorted) {
            BigDecimal start = new BigDecimal(before);
            String cls = total.signum() == 0 ? "C"
                    : start.compareTo(endOfA) < 0 ? "A"
                    : start.compareTo(endOfB) < 0 ? "B" : "C";
            out.put(v.item(), cls);
            before = before.add(v.amount());
        }
        return out;
    }
}
