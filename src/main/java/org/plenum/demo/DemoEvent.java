package org.plenum.demo;

/**
 * A tagged event on one item in one month, as written to {@code events.csv}.
 *
 * @param item   item id
 * @param period month index on the {@link DemoMonths} line
 * @param tag    tag from the fixed vocabulary
 * @param note   a short human note
 */
record DemoEvent(String item, int period, EventTag tag, String note) {
}
