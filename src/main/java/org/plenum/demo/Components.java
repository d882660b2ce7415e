package org.plenum.demo;

/**
 * Which components an additive exponential smoothing method carries besides the level.
 *
 * <p>{@code Components(false, 0)} is simple exponential smoothing, {@code (true, 0)} is Holt's
 * linear trend method and {@code (true, m)} is the additive Holt-Winters method with a season of
 * {@code m} periods.
 *
 * @param trend  whether the method keeps a trend (slope) component
 * @param period season length in periods, or 0 for no seasonal component; never 1, because a
 *               season of one period is indistinguishable from the level
 */
public record Components(boolean trend, int period) {

    /** Simple exponential smoothing: a level only. */
    public static final Components LEVEL = new Components(false, 0);

    public Components {
        if (period < 0 || period == 1) {
            throw new IllegalArgumentException("a season needs 0 (none) or at least 2 periods: " + period);
        }
    }

    /** Trend and additive season of {@code period} periods. */
    public static Components seasonal(int period) {
        return new Components(true, period);
    }

    public boolean seasonal() {
        return period > 0;
    }

    /**
     * The fewest observations {@link SmoothingState#initial} needs: one for the level, two for a
     * trend, one season for a season and two seasons for a season with a trend.
     */
    public int minimumLength() {
        if (seasonal()) {
            return trend ? 2 * period : period;
        }
        return trend ? 2 : 1;
    }
}
