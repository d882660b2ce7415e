package org.plenum.agenda;

import java.util.OptionalDouble;

/**
 * DESIGN §6's priority: {@code stake × max(g, g_floor)}, times an event factor when the item
 * carries an event tag in the decision window. The floor keeps an item whose review has no
 * record of helping (or a record of hurting, without evidence) ranked by its stake among its
 * like rather than dropped to nothing.
 */
public final class Priority {
    /** DESIGN §6's floor on the gain. */
    public static final double DEFAULT_GAIN_FLOOR = 0.05;
    /** Plenum's choice: an event in the window makes an item half again as pressing. */
    public static final double DEFAULT_EVENT_FACTOR = 1.5;

    private Priority() {}

    /** Empty when the stake is unknown. */
    public static OptionalDouble of(OptionalDouble stake, double gain, double gainFloor, boolean event,
            double eventFactor) {
        if (stake.isEmpty()) {
            return OptionalDouble.empty();
        }
        return OptionalDouble.of(stake.getAsDouble() * Math.max(gain, gainFloor) * (event ? eventFactor : 1));
    }
}
