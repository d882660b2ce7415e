package org.plenum.score;

/**
 * The benchmark every step is compared with, computed from actuals alone (METHODS §6): the
 * naive forecast (the last actual known when the forecast was issued) or the seasonal naive
 * (the same period one season earlier, going back whole seasons until it was known).
 */
public enum Placebo {
    NAIVE("naive"),
    SEASONAL("seasonal_naive");

    private final String stepName;

    Placebo(String stepName) {
        this.stepName = stepName;
    }

    /** The name it has among the steps of a scorecard. */
    public String stepName() {
        return stepName;
    }

    /**
     * The period whose actual is the placebo forecast of {@code period} issued at {@code cycle}
     * (which knows actuals up to {@code cycle − 1}), as period indexes.
     */
    public int source(int period, int cycle, int seasonLength) {
        if (this == NAIVE) {
            return cycle - 1;
        }
        int lead = period - cycle + 1;
        int seasonsBack = (lead + seasonLength - 1) / seasonLength;
        return period - seasonsBack * seasonLength;
    }

    /** The in-sample scale's offset: 1 period for the naive, one season for the seasonal naive. */
    public int scaleOffset(int seasonLength) {
        return this == NAIVE ? 1 : seasonLength;
    }
}
