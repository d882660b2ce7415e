package org.plenum.demo;

import java.util.List;

/**
 * Simulates the past reviews that turned each stat forecast into a final one.
 *
 * <p>The behaviours follow what forecasting research reports about judgmental adjustments:
 * most item-cycles are left alone; upward changes are the more frequent and lean optimistic;
 * downward changes are more often informed; many changes are tiny; a few forecasts are set to
 * zero. An "informed" planner is simulated by letting the review see the simulated demand of the
 * window and move part of the way towards it; an uninformed one moves by a random amount.
 *
 * <p>One decision is made per item and cycle. Its change applies from lag 0 (or the lag of the
 * event behind it) up to a last lag drawn from 2–5, because reviews focus on the near months;
 * later lags keep the stat value.
 */
final class ReviewSimulator {

    static final double ADJUST_WITHOUT_EVENT = 0.15;
    static final double ADJUST_WITH_EVENT = 0.45;
    static final double KEEP_WITHOUT_EVENT = 0.04;
    static final double KEEP_WITH_EVENT = 0.3;
    static final double ZERO_ON_EXIT_EVENT = 0.3;
    static final double ZERO_AT_RANDOM = 0.02;
    static final double TINY = 0.35;
    static final double TINY_UP = 0.65;
    static final double INFORMED_WITH_EVENT = 0.75;
    static final double INFORMED_WITHOUT_EVENT = 0.35;
    static final double UNINFORMED_UP = 0.8;
    static final String[] PLANNERS = {"amara", "jonas", "li", "priya"};

    private static final EventTag[] HUNCH_TAGS = {EventTag.CUSTOMER_INFORMATION, EventTag.OTHER, EventTag.COMPETITOR};

    /** How a planner decided to change one item-cycle, before it is applied to the lags. */
    private record Plan(Direction direction, double factor, EventTag tag, boolean tiny) {
    }

    private ReviewSimulator() {
    }

    /**
     * Reviews of past cycles {@link DemoMonths#FIRST_CYCLE} … UPCOMING_CYCLE−1, indexed by
     * {@code cycle − FIRST_CYCLE}; {@code null} where the item was not looked at.
     */
    static Review[] reviews(Item item, long[] demand, List<DemoEvent> events, long[][] stat, Dice dice) {
        Review[] out = new Review[DemoMonths.UPCOMING_CYCLE - DemoMonths.FIRST_CYCLE];
        for (int c = DemoMonths.FIRST_CYCLE; c < DemoMonths.UPCOMING_CYCLE; c++) {
            long[] cycleStat = stat[c - DemoMonths.FIRST_CYCLE];
            out[c - DemoMonths.FIRST_CYCLE] = review(item, c, demand, knownEvent(events, c), cycleStat, dice);
        }
        return out;
    }

    /**
     * The event in the cycle's window that planners would have heard of in time and would talk
     * about: the earliest one, except that a recurring holiday gives way to any other event.
     * Null when there is none.
     */
    private static DemoEvent knownEvent(List<DemoEvent> events, int cycle) {
        DemoEvent holiday = null;
        for (DemoEvent e : events) {
            if (e.period() >= cycle && e.period() < cycle + DemoMonths.HORIZON && e.tag().knownAhead()) {
                if (e.tag() != EventTag.HOLIDAY) {
                    return e;
                }
                holiday = holiday == null ? e : holiday;
            }
        }
        return holiday;
    }

    private static Review review(Item item, int cycle, long[] demand, DemoEvent event, long[] stat, Dice dice) {
        if (!dice.chance(event == null ? ADJUST_WITHOUT_EVENT : ADJUST_WITH_EVENT)) {
            return keepOrNothing(item, event, stat, dice);
        }
        int first = event == null ? 0 : event.period() - cycle;
        int last = Math.max(dice.between(2, DemoMonths.HORIZON - 1), first);
        Plan plan = plan(item, event, ratio(demand, stat, cycle, last), dice);
        // Only a set-to-zero for a leaving line or a supply stop starts at the event's month.
        int from = plan.direction() == Direction.ZERO && event != null && plan.tag() == event.tag() ? first : 0;
        boolean[] changed = new boolean[stat.length];
        long[] finals = apply(stat, from, last, plan, changed);
        if (!any(changed)) {
            return keepOrNothing(item, event, stat, dice);
        }
        double minutes = plan.direction() == Direction.ZERO ? dice.uniform(1.5, 5) : plan.tiny() ? dice.uniform(0.3, 1.5) : dice.uniform(1, 6);
        return new Review(plan.direction(), plan.tag(), ReasonBook.reason(plan.tag(), plan.direction(), dice),
                author(item, dice), minutes, finals, changed);
    }

    private static Plan plan(Item item, DemoEvent event, double ratio, Dice dice) {
        boolean exitEvent = event != null && (event.tag() == EventTag.DELISTING || event.tag() == EventTag.SUPPLY_LIMIT);
        if (exitEvent && dice.chance(ZERO_ON_EXIT_EVENT)) {
            return new Plan(Direction.ZERO, 0, event.tag(), false);
        }
        if (dice.chance(ZERO_AT_RANDOM)) {
            return new Plan(Direction.ZERO, 0, dice.pick(ReasonBook.ZERO_TAGS), false);
        }
        if (dice.chance(TINY)) {
            boolean up = dice.chance(TINY_UP);
            double size = dice.uniform(0.01, 0.049);
            return new Plan(up ? Direction.UP : Direction.DOWN, up ? 1 + size : 1 - size, tagFor(item, event, up, dice), true);
        }
        if (dice.chance(event == null ? INFORMED_WITHOUT_EVENT : INFORMED_WITH_EVENT)) {
            return informed(event, ratio, dice);
        }
        boolean up = dice.chance(UNINFORMED_UP);
        double factor = up ? 1 + dice.uniform(0.06, 0.4) : 1 - dice.uniform(0.06, 0.3);
        return new Plan(up ? Direction.UP : Direction.DOWN, factor, tagFor(item, event, up, dice), false);
    }

    /**
     * Moves part of the way (40–100%) towards the simulated demand; upward moves add 5–30% of
     * optimism on top, which is what makes even informed increases overshoot.
     */
    private static Plan informed(DemoEvent event, double ratio, Dice dice) {
        boolean up = ratio >= 1;
        double share = dice.uniform(0.4, 1.0);
        double factor = up ? 1 + share * (Math.min(ratio, 3) - 1) + dice.uniform(0.05, 0.3) : 1 - share * (1 - ratio);
        EventTag tag = event != null ? event.tag() : dice.chance(0.7) ? EventTag.CUSTOMER_INFORMATION : EventTag.OTHER;
        return new Plan(up ? Direction.UP : Direction.DOWN, factor, tag, false);
    }

    /** The event's tag when there is one, else a hunch tag, weather only for outdoor goods. */
    private static EventTag tagFor(Item item, DemoEvent event, boolean up, Dice dice) {
        if (event != null) {
            return event.tag();
        }
        if (item.group().outdoor() && dice.chance(0.25)) {
            return EventTag.WEATHER;
        }
        if (!up && dice.chance(0.15)) {
            return EventTag.SUPPLY_LIMIT;
        }
        return dice.pick(HUNCH_TAGS);
    }

    /** Simulated demand over stat forecast in lags 0 … last; +∞ when the stat is all zero. */
    private static double ratio(long[] demand, long[] stat, int cycle, int last) {
        double truth = 0;
        double forecast = 0;
        for (int lag = 0; lag <= last; lag++) {
            truth += demand[cycle + lag];
            forecast += stat[lag];
        }
        return forecast == 0 ? Double.POSITIVE_INFINITY : truth / forecast;
    }

    private static long[] apply(long[] stat, int from, int last, Plan plan, boolean[] changed) {
        long[] finals = stat.clone();
        for (int lag = from; lag <= last; lag++) {
            long value = Math.max(0, Math.round(stat[lag] * plan.factor()));
            if (plan.tiny() && value == stat[lag] && stat[lag] >= 20) {
                // A tiny change still moves at least one unit, as a planner typing it would.
                value += plan.direction() == Direction.UP ? 1 : -1;
            }
            finals[lag] = value;
            changed[lag] = value != stat[lag];
        }
        return finals;
    }

    private static Review keepOrNothing(Item item, DemoEvent event, long[] stat, Dice dice) {
        if (!dice.chance(event == null ? KEEP_WITHOUT_EVENT : KEEP_WITH_EVENT)) {
            return null;
        }
        EventTag tag = event == null ? EventTag.OTHER : event.tag();
        boolean[] looked = {true, true, true, false, false, false};
        return new Review(Direction.KEEP, tag, ReasonBook.reason(tag, Direction.KEEP, dice), author(item, dice),
                dice.uniform(0.3, 1.5), stat.clone(), looked);
    }

    /** Usually the group's planner; now and then a colleague covers. */
    private static String author(Item item, Dice dice) {
        return dice.chance(0.12) ? dice.pick(PLANNERS) : item.group().planner();
    }

    private static boolean any(boolean[] flags) {
        for (boolean f : flags) {
            if (f) {
                return true;
            }
        }
        return false;
    }
}
