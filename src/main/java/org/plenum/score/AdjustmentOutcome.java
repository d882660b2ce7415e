package org.plenum.score;

/**
 * How one adjustment of a prior forecast {@code S} to a new forecast {@code F} fared against the
 * actual {@code A}, with {@code adj = F − S} and {@code need = A − S}, all decided on exact millionths.
 *
 * <p>These are Plenum's own operational rules (METHODS §4), built on ideas used by Fildes, Goodwin,
 * Lawrence &amp; Nikolopoulos (2009, <i>IJF</i> 25(1), 3–23) and Petropoulos, Fildes &amp; Goodwin
 * (2016, <i>EJOR</i> 249(3), 842–852):
 * <ul>
 * <li>right direction: {@code need ≠ 0} and {@code sign(adj) = sign(need)}; wrong direction: the
 *     opposite sign; unneeded: {@code need = 0} (the prior was exact, so any change worsens it);
 * <li>overshoot: right direction and {@code |adj| > |need|} (the new forecast lands beyond the
 *     actual); harmful overshoot: {@code |adj| > 2|need|}, where it becomes worse than the prior
 *     ({@code |adj| = 2|need|} is a tie, not harmful);
 * <li>improved / worsened / tie: {@code |A − F|} below / above / equal to {@code |A − S|};
 * <li>optimistic: {@code F > A}.
 * </ul>
 * A kept forecast ({@code adj = 0}) has direction {@link Direction#KEPT}, aim
 * {@link Aim#NO_ADJUSTMENT}, no overshoot and effect {@link Effect#TIE}; it belongs in no adjustment
 * statistic.
 */
public record AdjustmentOutcome(Direction direction, Aim aim, boolean overshoot, boolean harmfulOvershoot,
        Effect effect, boolean optimistic) {

    /** Which way the forecast was moved. */
    public enum Direction { UP, DOWN, KEPT }

    /** Whether the move pointed towards the actual. */
    public enum Aim { RIGHT_DIRECTION, WRONG_DIRECTION, UNNEEDED, NO_ADJUSTMENT }

    /** Whether the new forecast's absolute error is smaller than the prior's. */
    public enum Effect { IMPROVED, WORSENED, TIE }

    /**
     * Classifies one adjusted pair.
     *
     * @param priorMicros the forecast before the step ({@code S}), millionths of a unit
     * @param newMicros the forecast after the step ({@code F})
     * @param actualMicros the actual ({@code A})
     * @throws ArithmeticException when a difference leaves the long range
     */
    public static AdjustmentOutcome of(long priorMicros, long newMicros, long actualMicros) {
        long adj = Math.subtractExact(newMicros, priorMicros);
        long need = Math.subtractExact(actualMicros, priorMicros);
        Aim aim = aim(adj, need);
        long adjSize = Math.absExact(adj);
        long needSize = Math.absExact(need);
        boolean overshoot = aim == Aim.RIGHT_DIRECTION && adjSize > needSize;
        // |adj| > 2|need| written as a difference, which cannot overflow for non-negative sizes.
        boolean harmful = overshoot && adjSize - needSize > needSize;
        Effect effect = effect(Math.absExact(Math.subtractExact(actualMicros, newMicros)), needSize);
        return new AdjustmentOutcome(direction(adj), aim, overshoot, harmful, effect, newMicros > actualMicros);
    }

    private static Direction direction(long adj) {
        return adj > 0 ? Direction.UP : adj < 0 ? Direction.DOWN : Direction.KEPT;
    }

    private static Aim aim(long adj, long need) {
        if (adj == 0) {
            return Aim.NO_ADJUSTMENT;
        }
        if (need == 0) {
            return Aim.UNNEEDED;
        }
        return Long.signum(adj) == Long.signum(need) ? Aim.RIGHT_DIRECTION : Aim.WRONG_DIRECTION;
    }

    private static Effect effect(long newError, long priorError) {
        int order = Long.compare(newError, priorError);
        return order < 0 ? Effect.IMPROVED : order > 0 ? Effect.WORSENED : Effect.TIE;
    }
}
