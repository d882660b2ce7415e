package org.plenum.demo;

/**
 * The simulated review of one item in one cycle.
 *
 * @param direction up, down, set to zero, or keep (looked at, left alone)
 * @param tag       the tag the planner gave
 * @param reason    the planner's written reason
 * @param author    the planner
 * @param minutes   minutes the discussion took in total
 * @param finals    the final quantity of lags 0 … HORIZON−1; equal to stat where not changed
 * @param reviewed  for each lag, whether the decision covers it: a change, or for a keep the lags
 *                  that were looked at
 */
record Review(Direction direction, EventTag tag, String reason, String author, double minutes,
              long[] finals, boolean[] reviewed) {
}
