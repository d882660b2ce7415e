package org.plenum.agenda;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.plenum.core.ScoredChange;

class ReviewedPairsTest {
    private static final List<String> STEPS = List.of("stat", "meeting", "final");

    private static ScoredChange value(String step, int item, int period, long stat, long value) {
        return new ScoredChange(step, item, 10, period, stat, value, 100, false, null, null, null, null);
    }

    @Test
    void theLatestHumanStepDecidesWhetherThePairWasChanged() {
        List<ScoredChange> changed = ReviewedPairs.changed(List.of(
                value("meeting", 1, 11, 50, 60), value("final", 1, 11, 50, 50), // final undid the meeting
                value("final", 1, 12, 50, 70), value("meeting", 1, 12, 50, 65), // final wins, in any order
                value("meeting", 2, 11, 50, 55), // only the meeting spoke
                value("meeting", 3, 11, 50, 50)), STEPS); // kept
        assertEquals(List.of(value("final", 1, 12, 50, 70), value("meeting", 2, 11, 50, 55)), changed);
    }
}
