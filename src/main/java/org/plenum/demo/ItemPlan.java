package org.plenum.demo;

import java.util.List;

/**
 * Everything simulated for one item.
 *
 * @param item    the catalogue entry
 * @param demand  simulated demand of months 0 … SIMULATED−1; months before ACTUALS are the actuals
 * @param events  the item's events
 * @param stat    stat forecasts, row {@code cycle − FIRST_CYCLE}, column lag
 * @param reviews reviews of past cycles, index {@code cycle − FIRST_CYCLE}, null where none
 */
record ItemPlan(Item item, long[] demand, List<DemoEvent> events, long[][] stat, Review[] reviews) {

    long[] stat(int cycle) {
        return stat[cycle - DemoMonths.FIRST_CYCLE];
    }

    /** The review of a past cycle, or null if the item was not looked at. */
    Review review(int cycle) {
        return reviews[cycle - DemoMonths.FIRST_CYCLE];
    }

    /** Final forecasts of a past cycle: the review's, or the stat ones where nobody changed them. */
    long[] finals(int cycle) {
        Review review = review(cycle);
        return review == null ? stat(cycle) : review.finals();
    }
}
