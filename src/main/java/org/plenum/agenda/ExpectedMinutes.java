package org.plenum.agenda;

import java.util.HashMap;
import java.util.Map;

/**
 * The minutes an item is expected to take in the meeting: the average, over the past cycles in
 * which minutes were recorded on it, of the minutes recorded on it in that cycle; a default
 * (3 minutes, DESIGN §6) for an item never timed. Decisions without minutes do not count, so they
 * do not pull the average down.
 */
public final class ExpectedMinutes {
    /** DESIGN §6's default for an item without timed decisions. */
    public static final double DEFAULT_MINUTES = 3;

    private final double defaultMinutes;
    private final Map<Integer, double[]> totals = new HashMap<>();

    public ExpectedMinutes(double defaultMinutes) {
        if (!(defaultMinutes > 0)) {
            throw new IllegalArgumentException("default minutes must be positive: " + defaultMinutes);
        }
        this.defaultMinutes = defaultMinutes;
    }

    /** Adds the minutes recorded on {@code item} in one cycle, in millionths of a minute. */
    public void addCycle(int item, long minutesMicros) {
        double[] t = totals.computeIfAbsent(item, i -> new double[2]);
        t[0] += minutesMicros / 1e6;
        t[1]++;
    }

    public double of(int item) {
        double[] t = totals.get(item);
        return t == null ? defaultMinutes : t[0] / t[1];
    }
}
