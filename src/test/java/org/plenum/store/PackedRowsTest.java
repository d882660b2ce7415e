package org.plenum.store;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import org.junit.jupiter.api.Test;
import org.plenum.core.Series;

class PackedRowsTest {

    @Test
    void readsPairsBackInPeriodOrderWhateverOrderTheyCameIn() {
        Series.Builder b = new Series.Builder();
        // SQLite hands the packed text over as its bytes.
        PackedRows.parse(7, "24313,5000000;24311,0;-3650,123456789012".getBytes(StandardCharsets.US_ASCII), b);
        PackedRows.parse(9, "24312,1".getBytes(StandardCharsets.US_ASCII), b);
        Series s = b.build();
        assertEquals(4, s.size());
        assertArrayEquals(new int[] {7, 7, 7, 9}, Arrays.copyOf(s.items(), 4));
        // Weeks before 1970 have negative indexes (Period counts weeks from 1969-12-29).
        assertArrayEquals(new int[] {-3650, 24311, 24313, 24312}, Arrays.copyOf(s.periods(), 4));
        assertArrayEquals(new long[] {123456789012L, 0, 5000000, 1}, Arrays.copyOf(s.quantities(), 4));
    }

    @Test
    void mergesStandingDecisionsOverThePreviousStep() {
        Series.Builder base = new Series.Builder();
        base.add(1, 10, 100);
        base.add(1, 11, 110);
        base.add(2, 10, 200);
        Series.Builder decided = new Series.Builder();
        decided.add(1, 11, 999);
        decided.add(2, 10, 0);
        Series merged = ScoreReads.overlay(base.build(), decided.build());
        assertArrayEquals(new long[] {100, 999, 0}, Arrays.copyOf(merged.quantities(), 3));
    }
}
