package org.plenum.agenda;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

class CutLineTest {
    @Test
    void theLineFallsWhereTheBudgetRunsOut() {
        // Budget 10: 3 + 4 = 7, + 3 = 10 (fits exactly), + 2 = 12 does not fit; the later 0.5 does not jump the line.
        assertEquals(List.of(true, true, true, false, false),
                CutLine.of(10, new double[] {3, 4, 3, 2, 0.5}, new boolean[5]));
    }

    @Test
    void handsOffItemsTakeNoTimeAndAreNeverAbove() {
        assertEquals(List.of(true, false, true),
                CutLine.of(6, new double[] {3, 100, 3}, new boolean[] {false, true, false}));
    }

    @Test
    void aFirstItemLongerThanTheBudgetLeavesNothingAbove() {
        assertEquals(List.of(false, false), CutLine.of(2, new double[] {3, 1}, new boolean[2]));
    }
}
