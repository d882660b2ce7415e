package org.plenum.score;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Set;
import java.util.function.Predicate;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.plenum.core.FvaFixture;
import org.plenum.score.AdjustmentOutcome.Aim;
import org.plenum.score.AdjustmentOutcome.Direction;
import org.plenum.score.AdjustmentOutcome.Effect;

class AdjustmentOutcomeTest {

    private static AdjustmentOutcome outcome(FvaFixture.Pair pair) {
        return AdjustmentOutcome.of(pair.stat(), pair.fin(), pair.actual());
    }

    private static FvaFixture.Pair pair(String label) {
        return FvaFixture.pairs().stream().filter(p -> p.label().equals(label)).findFirst().orElseThrow();
    }

    private static Set<String> adjustedWhere(Predicate<AdjustmentOutcome> test) {
        return FvaFixture.adjusted().stream().filter(p -> test.test(outcome(p))).map(FvaFixture.Pair::label)
                .collect(Collectors.toSet());
    }

    @ParameterizedTest(name = "{0}: {1} {2}, overshoot {3}, harmful {4}, {5}, optimistic {6}")
    @CsvSource({
        // pair, direction, aim,         overshoot, harmful, effect,   F > A
        "A1, UP,   WRONG_DIRECTION, false, false, WORSENED, true",
        "A2, UP,   RIGHT_DIRECTION, false, false, IMPROVED, false",
        "A3, DOWN, RIGHT_DIRECTION, false, false, IMPROVED, true",
        "A4, KEPT, NO_ADJUSTMENT,   false, false, TIE,      false",
        "B1, DOWN, RIGHT_DIRECTION, false, false, IMPROVED, true",
        "B2, UP,   RIGHT_DIRECTION, true,  false, IMPROVED, true",
        "B3, UP,   RIGHT_DIRECTION, true,  true,  WORSENED, true",
        "C1, DOWN, WRONG_DIRECTION, false, false, WORSENED, false",
        "C2, UP,   RIGHT_DIRECTION, true,  false, TIE,      true",
        "C3, DOWN, RIGHT_DIRECTION, true,  false, IMPROVED, false",
        "C4, DOWN, UNNEEDED,        false, false, WORSENED, false",
        "C5, UP,   RIGHT_DIRECTION, true,  false, IMPROVED, true"})
    void classifiesEachPairOfTheFvaFixture(String label, Direction direction, Aim aim, boolean overshoot,
            boolean harmful, Effect effect, boolean optimistic) {
        // METHODS R2 [computed here] with the rules of METHODS §4 (direction, aim, overshoot, effect);
        // optimism is F > A read off the fixture's values.
        assertEquals(new AdjustmentOutcome(direction, aim, overshoot, harmful, effect, optimistic), outcome(pair(label)));
    }

    @Test
    void countsTheFixturesAdjustmentsAsMethodsLists() {
        List<FvaFixture.Pair> adjusted = FvaFixture.adjusted();
        // METHODS R2 [computed here]: 11 adjustments (A4 unadjusted), positive 6, negative 5.
        assertEquals(11, adjusted.size());
        assertEquals(6, adjustedWhere(o -> o.direction() == Direction.UP).size());
        assertEquals(5, adjustedWhere(o -> o.direction() == Direction.DOWN).size());
        // METHODS R2 [computed here]: wrong direction A1, C1; unneeded C4.
        assertEquals(Set.of("A1", "C1"), adjustedWhere(o -> o.aim() == Aim.WRONG_DIRECTION));
        assertEquals(Set.of("C4"), adjustedWhere(o -> o.aim() == Aim.UNNEEDED));
        // METHODS R2 [computed here]: overshoots B2, B3, C2, C3, C5; harmful only B3.
        assertEquals(Set.of("B2", "B3", "C2", "C3", "C5"), adjustedWhere(AdjustmentOutcome::overshoot));
        assertEquals(Set.of("B3"), adjustedWhere(AdjustmentOutcome::harmfulOvershoot));
        // METHODS R2 [computed here]: improved A2, A3, B1, B2, C3, C5; worsened A1, B3, C1, C4; tie C2.
        assertEquals(Set.of("A2", "A3", "B1", "B2", "C3", "C5"), adjustedWhere(o -> o.effect() == Effect.IMPROVED));
        assertEquals(Set.of("A1", "B3", "C1", "C4"), adjustedWhere(o -> o.effect() == Effect.WORSENED));
        assertEquals(Set.of("C2"), adjustedWhere(o -> o.effect() == Effect.TIE));
    }

    @Test
    void treatsAnOvershootOfExactlyTwiceTheNeedAsATie() {
        // 0.20 → 0.22 with actual 0.21: |adj| = 2|need| exactly in millionths (not in doubles).
        AdjustmentOutcome outcome = AdjustmentOutcome.of(200_000, 220_000, 210_000);
        assertTrue(outcome.overshoot());
        assertFalse(outcome.harmfulOvershoot());
        assertEquals(Effect.TIE, outcome.effect());
        // One millionth further is harmful and worse than the prior.
        AdjustmentOutcome further = AdjustmentOutcome.of(200_000, 220_001, 210_000);
        assertTrue(further.harmfulOvershoot());
        assertEquals(Effect.WORSENED, further.effect());
    }

    @Test
    void landingExactlyOnTheActualIsNoOvershoot() {
        AdjustmentOutcome outcome = AdjustmentOutcome.of(100_000_000, 120_000_000, 120_000_000);
        assertEquals(Aim.RIGHT_DIRECTION, outcome.aim());
        assertFalse(outcome.overshoot());
        assertEquals(Effect.IMPROVED, outcome.effect());
        assertFalse(outcome.optimistic());
    }

    @Test
    void keepsAnUnneededAdjustmentApartFromTheWrongDirection() {
        AdjustmentOutcome outcome = AdjustmentOutcome.of(50_000_000, 60_000_000, 50_000_000);
        assertEquals(Aim.UNNEEDED, outcome.aim());
        assertFalse(outcome.overshoot());
        assertEquals(Effect.WORSENED, outcome.effect());
        assertTrue(outcome.optimistic());
    }

    @Test
    void handlesTheLargestQuantitiesWithoutOverflow() {
        long max = 999_999_999_999_999_999L; // just under 10^12 units, the largest importable quantity
        AdjustmentOutcome outcome = AdjustmentOutcome.of(0, max, max / 3);
        assertTrue(outcome.harmfulOvershoot());
        assertEquals(Effect.WORSENED, outcome.effect());
    }
}
