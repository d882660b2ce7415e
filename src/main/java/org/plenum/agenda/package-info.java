/**
 * Ranking the cycle's candidate items for the meeting, and guidance for the adjustment form (DESIGN
 * §6): stake, track record with its shrinkage, gain, priority, ABC/XYZ classes, event signals,
 * hands-off warnings and the cut line. Pure: values in, values out; no I/O, no SQL. Depends on
 * {@code core} and on {@code score} for the published measures (AvgRelMAE, the signed-rank test,
 * evidence, size classes), never on {@code store}, {@code io}, {@code app} or the front ends.
 */
package org.plenum.agenda;
