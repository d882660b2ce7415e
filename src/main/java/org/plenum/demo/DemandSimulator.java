package org.plenum.demo;

/**
 * Draws the monthly demand of one item over the simulated span, in whole units.
 *
 * <p>A regular item's expected demand is a base level × yearly growth × its group's season
 * (scaled by an item-specific amplitude) × the factors of its events; the quantity is that times
 * log-normal noise, rounded. An intermittent item sells in a month with a fixed probability and
 * then a small log-normal quantity.
 */
final class DemandSimulator {

    private DemandSimulator() {
    }

    /** Demand for months 0 … {@link DemoMonths#SIMULATED}−1. */
    static long[] demand(Item item, EventBook events, Dice dice) {
        return item.intermittent() ? intermittent(events, dice) : regular(item, events, dice);
    }

    private static long[] regular(Item item, EventBook events, Dice dice) {
        double base = Math.max(8, dice.logNormal(160, 0.9));
        double growth = Math.min(0.25, Math.max(-0.15, 0.03 + 0.07 * dice.normal()));
        double amplitude = dice.uniform(0.5, 1.3);
        double sigma = dice.uniform(0.08, 0.22);
        long[] out = new long[DemoMonths.SIMULATED];
        for (int t = 0; t < out.length; t++) {
            double season = 1 + amplitude * (item.group().seasonFactor(DemoMonths.calendarMonth(t)) - 1);
            double mean = base * StrictMath.pow(1 + growth, t / 12.0) * season * events.factor(t);
            // The −σ²/2 keeps the noise mean-neutral, so it spreads demand without lifting it.
            out[t] = Math.max(0, Math.round(mean * StrictMath.exp(sigma * dice.normal() - sigma * sigma / 2)));
        }
        return out;
    }

    private static long[] intermittent(EventBook events, Dice dice) {
        double probability = dice.uniform(0.15, 0.45);
        double size = dice.uniform(1.5, 8);
        long[] out = new long[DemoMonths.SIMULATED];
        for (int t = 0; t < out.length; t++) {
            double factor = events.factor(t);
            if (dice.chance(probability * Math.min(1, factor))) {
                out[t] = Math.max(1, Math.round(dice.logNormal(size, 0.5) * Math.max(1, factor)));
            }
        }
        return out;
    }
}
