package org.plenum.agenda;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.math.BigInteger;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

class AbcClassificationTest {
    private static AbcClassification.Value v(String item, long amount) {
        return new AbcClassification.Value(item, BigInteger.valueOf(amount));
    }

    @Test
    void classesByTheCumulativeShareWhereAnItemStarts() {
        // METHODS §7 (common practice, 80/15/5). Values 50, 25, 10, 8, 4, 2, 1 of a total of 100, largest
        // first; each item's cumulative share at its start: 0, 50, 75, 85, 93, 97, 99 (percent).
        // A below 80: p, q, r (r starts at 75 and crosses 80: it stays A). B below 95: s, t. C: u, w.
        Map<String, String> classes = new AbcClassification(0.80, 0.95).classes(List.of(v("u", 2), v("p", 50),
                v("s", 8), v("q", 25), v("w", 1), v("r", 10), v("t", 4)));
        assertEquals(Map.of("p", "A", "q", "A", "r", "A", "s", "B", "t", "B", "u", "C", "w", "C"), classes);
    }

    @Test
    void aStartExactlyOnTheBoundaryBelongsToTheNextClass() {
        // 80 then 20: the second starts at exactly 80%, which is not below 80%.
        assertEquals(Map.of("a", "A", "b", "B"), new AbcClassification(0.80, 0.95).classes(List.of(v("a", 80),
                v("b", 20))));
    }

    @Test
    void tiesAreOrderedByItemCode() {
        // Equal values 50 and 50 with thresholds 40/95: the first by code starts at 0 (A), the second at 50 (B).
        assertEquals(Map.of("k1", "A", "k2", "B"), new AbcClassification(0.40, 0.95).classes(List.of(v("k2", 50),
                v("k1", 50))));
    }

    @Test
    void aTotalOfZeroMakesEveryItemC() {
        assertEquals(Map.of("a", "C", "b", "C"), new AbcClassification(0.80, 0.95).classes(List.of(v("a", 0),
                v("b", 0))));
    }

    @Test
    void refusesThresholdsOutOfOrder() {
        assertThrows(IllegalArgumentException.class, () -> new AbcClassification(0.95, 0.80));
    }
}
