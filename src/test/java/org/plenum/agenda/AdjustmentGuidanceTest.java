package org.plenum.agenda;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.plenum.core.ScoredChange;
import org.plenum.score.Evidence;

class AdjustmentGuidanceTest {
    private static final long UNIT = 1_000_000L;

    /**
     * {@code n} decisions on {@code item} raising the prior by 20% ("up 15-35%"), each landing one unit
     * below the actual, so each improved by a different amount (0.2 × prior − 0).
     */
    private static void raisedAndRight(List<ScoredChange> out, int item, int n) {
        for (int i = 0; i < n; i++) {
            long prior = (100 + i) * UNIT;
            long raised = prior / 5 * 6;
            out.add(new ScoredChange("meeting", item, i, i + 1, prior, raised, raised + UNIT, false, "a", "other",
                    "reason", null));
        }
    }

    private static final Map<Integer, String> GROUPS = Map.of(1, "kitchen", 2, "garden", 3, "kitchen");

    @Test
    void thirtySimilarDecisionsInTheGroupSpeakForThemselves() {
        List<ScoredChange> past = new ArrayList<>();
        raisedAndRight(past, 1, 30);
        Advice a = new AdjustmentGuidance(past, GROUPS).advise(new Proposal(3, 200 * UNIT, 250 * UNIT));
        assertEquals("up 15-35%", a.sizeClass());
        assertEquals("group kitchen, up 15-35%", a.pool());
        assertEquals(30, a.count());
        assertEquals(1.0, a.shareRight().getAsDouble(), 0);
        assertEquals(0.0, a.shareOvershoot().getAsDouble(), 0);
        // Every difference |e_prior| − |e_new| positive and none tied: W+ = n(n+1)/2 and the exact
        // two-sided p-value is 2 · 2^−30 (Wilcoxon 1945; Hollander & Wolfe 1973).
        assertEquals(Evidence.Label.BETTER, a.evidence().label());
        assertEquals(2 * Math.pow(2, -30), a.evidence().pValue().getAsDouble(), 1e-20);
        assertTrue(a.sentence().startsWith("30 similar past decisions (group kitchen, up 15-35%) made the forecast"
                + " better"), a.sentence());
    }

    @Test
    void aSmallGroupFallsBackToAllGroups() {
        List<ScoredChange> past = new ArrayList<>();
        raisedAndRight(past, 1, 10);
        raisedAndRight(past, 2, 25);
        Advice a = new AdjustmentGuidance(past, GROUPS).advise(new Proposal(3, 200 * UNIT, 250 * UNIT));
        assertEquals("all groups, up 15-35%", a.pool());
        assertEquals(35, a.count());
    }

    @Test
    void underThirtyEverywhereIsTooFewToTellWhateverTheRatio() {
        List<ScoredChange> past = new ArrayList<>();
        raisedAndRight(past, 1, 29);
        Advice a = new AdjustmentGuidance(past, GROUPS).advise(new Proposal(3, 200 * UNIT, 250 * UNIT));
        assertEquals("all groups, up", a.pool());
        assertEquals(Evidence.Label.TOO_FEW_TO_TELL, a.evidence().label());
        assertEquals("Too few to tell: only 29 similar past decisions (all groups, up) with an actual.", a.sentence());
        assertTrue(a.errorRatio().getAsDouble() < 1);
    }

    @Test
    void noHistorySaysSo() {
        Advice a = new AdjustmentGuidance(List.of(), GROUPS).advise(new Proposal(3, 200 * UNIT, 150 * UNIT));
        assertEquals("down 15-35%", a.sizeClass());
        assertEquals(0, a.count());
        assertEquals(Evidence.Label.TOO_FEW_TO_TELL, a.evidence().label());
    }

    @Test
    void warnsOnTinyAdjustmentsAndOnSettingToZero() {
        AdjustmentGuidance g = new AdjustmentGuidance(List.of(), GROUPS);
        // 0.20 → 0.21 is exactly +5%: not tiny (SizeClass decides it exactly); 0.21 → 0.2195 is +4.5%.
        assertEquals(List.of(), g.advise(new Proposal(1, 200_000, 210_000)).warnings());
        assertEquals(1, g.advise(new Proposal(1, 210_000, 219_450)).warnings().size());
        assertTrue(g.advise(new Proposal(1, 210_000, 219_450)).warnings().get(0).startsWith("Tiny adjustment"));
        assertTrue(g.advise(new Proposal(1, 210_000, 0)).warnings().get(0).startsWith("Setting the forecast to zero"));
        assertEquals("set to zero", g.advise(new Proposal(1, 210_000, 0)).sizeClass());
    }

    @Test
    void keptDecisionsAreNotAdjustments() {
        List<ScoredChange> past = new ArrayList<>();
        for (int i = 0; i < 40; i++) {
            past.add(new ScoredChange("meeting", 1, i, i + 1, 100 * UNIT, 100 * UNIT, 90 * UNIT, true, "a", "other",
                    "no news", null));
        }
        assertEquals(0, new AdjustmentGuidance(past, GROUPS).advise(new Proposal(1, 100 * UNIT, 90 * UNIT)).count());
    }
}
