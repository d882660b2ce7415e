package org.plenum.agenda;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.plenum.core.ScoredChange;
import org.plenum.score.Evidence;

class TrackRecordsTest {
    private static final double K = CredibilityShrinkage.DEFAULT_K;

    /** {@code pairs} changed pairs of an item: statistical error {@code statError}, reviewed error {@code reviewedError}. */
    private static void pairs(List<ScoredChange> out, int item, int pairs, long statError, long reviewedError) {
        for (int p = 0; p < pairs; p++) {
            long actual = 1_000_000_000L;
            out.add(new ScoredChange("final", item, p, p + 1, actual - statError * 1_000_000L,
                    actual + reviewedError * 1_000_000L, actual, false, null, null, null, null));
        }
    }

    /**
     * Group g1: item 1 with 100 pairs at ratio 0.5, item 2 without pairs, item 3 with 4 pairs at ratio 2;
     * group g2: item 4 with 10 pairs at ratio 1; item 5 has no group and no pairs.
     */
    private static TrackRecords workspace() {
        List<ScoredChange> changed = new ArrayList<>();
        pairs(changed, 1, 100, 10, 5);
        pairs(changed, 3, 4, 10, 20);
        pairs(changed, 4, 10, 8, 8);
        return new TrackRecords(changed, Map.of(1, "g1", 2, "g1", 3, "g1", 4, "g2"), K);
    }

    // AvgRelMAE (Davydenko & Fildes 2013) weights each item's log ratio by its pairs:
    private static final double WORKSPACE = Math.exp((100 * Math.log(0.5) + 4 * Math.log(2) + 10 * Math.log(1)) / 114);
    private static final double G1 = CredibilityShrinkage.shrink(104,
            Math.exp((100 * Math.log(0.5) + 4 * Math.log(2)) / 104), WORKSPACE, K);

    @Test
    void anItemWithManyPairsKeepsItsOwnRecord() {
        TrackRecord t = workspace().of(1);
        assertEquals(100, t.n());
        assertEquals(0.5, t.own().getAsDouble(), 1e-12);
        assertEquals(CredibilityShrinkage.shrink(100, 0.5, G1, K), t.shrunk(), 1e-12);
        assertEquals(0.5, t.shrunk(), 0.02);
        assertEquals(TrackRecord.Pool.ITEM, t.pool());
    }

    @Test
    void anItemWithoutPairsTakesItsGroupsRecord() {
        TrackRecord t = workspace().of(2);
        assertEquals(0, t.n());
        assertTrue(t.own().isEmpty());
        assertEquals(G1, t.shrunk(), 1e-12);
        assertEquals(G1, t.parent(), 1e-12);
        assertEquals(TrackRecord.Pool.GROUP, t.pool());
    }

    @Test
    void aGroupShrinksTowardTheWorkspaceAndAnItemWithoutGroupTakesTheWorkspaces() {
        assertEquals(WORKSPACE, workspace().of(5).shrunk(), 1e-12);
        // g2: 10 pairs at ratio 1 shrunk toward the workspace: exp((10·0 + 5·ln W) / 15).
        assertEquals(Math.exp(5 * Math.log(WORKSPACE) / 15), workspace().of(4).parent(), 1e-12);
    }

    @Test
    void fewPairsLeanOnTheGroup() {
        // Item 3: 4 pairs at ratio 2, so (4·ln 2 + 5·ln G1) / 9 in logs.
        TrackRecord t = workspace().of(3);
        assertEquals(Math.exp((4 * Math.log(2) + 5 * Math.log(G1)) / 9), t.shrunk(), 1e-12);
    }

    @Test
    void anItemWhoseReviewedErrorsAreAllZeroHasNoRatioOfItsOwn() {
        List<ScoredChange> changed = new ArrayList<>();
        pairs(changed, 1, 3, 10, 0);
        pairs(changed, 2, 6, 10, 9);
        TrackRecord t = new TrackRecords(changed, Map.of(1, "g", 2, "g"), K).of(1);
        assertEquals(0, t.n());
        assertTrue(t.own().isEmpty());
    }

    @Test
    void reviewThatMadeThingsWorseWithEvidenceIsHandsOff() {
        // 40 pairs, each reviewed error 1..40 units above the statistical one: every difference
        // |e_stat| − |e_reviewed| is negative and no two tie, so W+ = 0 and the exact two-sided
        // p-value is 2 · 2^−40 (only one of the 2^40 equally likely sign patterns gives W+ = 0;
        // Wilcoxon 1945, Hollander & Wolfe 1973).
        List<ScoredChange> changed = new ArrayList<>();
        for (int p = 1; p <= 40; p++) {
            long actual = 1_000_000_000L;
            changed.add(new ScoredChange("meeting", 7, p, p + 1, actual - 10_000_000L, actual + (10L + p) * 1_000_000L,
                    actual, false, null, null, null, null));
        }
        TrackRecord t = new TrackRecords(changed, Map.of(7, "g"), K).of(7);
        assertEquals(Evidence.Label.WORSE, t.evidence().label());
        assertEquals(2 * Math.pow(2, -40), t.evidence().pValue().getAsDouble(), 1e-25);
        assertTrue(t.shrunk() > 1);
        assertTrue(t.handsOff());
    }

    @Test
    void underThirtyPairsEverywhereIsTooFewToTellAndNeverHandsOff() {
        List<ScoredChange> changed = new ArrayList<>();
        pairs(changed, 7, 29, 10, 30);
        TrackRecord t = new TrackRecords(changed, Map.of(7, "g"), K).of(7);
        assertTrue(t.shrunk() > 1);
        assertEquals(Evidence.Label.TOO_FEW_TO_TELL, t.evidence().label());
        assertEquals(TrackRecord.Pool.WORKSPACE, t.pool());
        assertFalse(t.handsOff());
    }

    @Test
    void withoutAnyHistoryTheRecordIsNeutral() {
        TrackRecord t = new TrackRecords(List.of(), Map.of(1, "g"), K).of(1);
        assertEquals(1.0, t.shrunk(), 0);
        assertEquals(0.0, t.gain(), 0);
        assertFalse(t.handsOff());
    }
}
