package org.plenum.demo;

import java.time.Instant;

/**
 * One row of the past decision ledger, {@code decisions.csv}.
 *
 * @param item       item id
 * @param cycle      month index of the cycle
 * @param period     month index of the forecast period
 * @param adjust     true for {@code adjust}, false for {@code keep}
 * @param quantity   the final quantity for an adjust; ignored for a keep
 * @param reason     the planner's written reason
 * @param tag        tag from the vocabulary
 * @param author     planner name
 * @param minutes    this row's share of the discussion time, one decimal
 * @param recordedAt when the decision was recorded in the meeting
 */
record Decision(String item, int cycle, int period, boolean adjust, long quantity, String reason,
                EventTag tag, String author, double minutes, Instant recordedAt) {
}
