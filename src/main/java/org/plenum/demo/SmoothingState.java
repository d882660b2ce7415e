package org.plenum.demo;

import java.util.Arrays;

/**
 * The state of an additive exponential smoothing method after some observation: level, trend and
 * the last {@code m} seasonal indices.
 *
 * <p>{@code season} is ordered oldest first, so {@code season[0]} is the index of the period one
 * full season before the next one. The array is copied in and out, so a state never changes.
 *
 * @param level  the level ℓ
 * @param trend  the slope b per period; 0 when the method has no trend
 * @param season the seasonal indices s, oldest first; empty when the method has no season
 */
public record SmoothingState(double level, double trend, double[] season) {

    public SmoothingState {
        season = season.clone();
    }

    @Override
    public double[] season() {
        return season.clone();
    }

    /**
     * The deterministic starting state at time 0 for smoothing {@code y} with {@code components}.
     *
     * <ul>
     *   <li>No trend, no season: ℓ0 = y1 (the simple start statsmodels calls "legacy-heuristic").
     *   <li>Trend, no season: ℓ0 = y1 and b0 = y2 − y1 (likewise).
     *   <li>Season of m, no trend: ℓ0 = mean of the first season; s = y1..ym minus ℓ0.
     *   <li>Season of m and trend: b0 = (mean of 2nd season − mean of 1st season) / m, and ℓ0 is the
     *       mean of the first season moved back to time 0 along that slope, ℓ0 = mean1 − b0 (m+1)/2;
     *       the seasonal indices are the first-season deviations from that line, yi − (ℓ0 + i b0).
     *       Moving the level back to time 0 keeps the first season's deviations free of trend, so an
     *       exact straight line plus a repeating season is reproduced from the first observation.
     * </ul>
     *
     * @throws IllegalArgumentException if {@code y} is shorter than {@link Components#minimumLength}
     */
    public static SmoothingState initial(double[] y, Components components) {
        if (y.length < components.minimumLength()) {
            throw new IllegalArgumentException("need at least " + components.minimumLength()
                    + " observations, got " + y.length);
        }
        if (!components.seasonal()) {
            double trend = components.trend() ? y[1] - y[0] : 0;
            return new SmoothingState(y[0], trend, new double[0]);
        }
        int m = components.period();
        double first = mean(y, 0, m);
        double trend = components.trend() ? (mean(y, m, 2 * m) - first) / m : 0;
        double level = first - trend * (m + 1) / 2.0;
        double[] season = new double[m];
        for (int i = 0; i < m; i++) {
            season[i] = y[i] - (level + trend * (i + 1));
        }
        return new SmoothingState(level, trend, season);
    }

    private static double mean(double[] y, int from, int to) {
        double sum = 0;
        for (int i = from; i < to; i++) {
            sum += y[i];
        }
        return sum / (to - from);
    }

    /**
     * The point forecast {@code h} periods ahead: ℓ + h·b + s_{t+h−m(k+1)} with k = ⌊(h−1)/m⌋,
     * that is the seasonal index of the same position in the last observed season.
     *
     * @throws IllegalArgumentException if {@code h < 1}
     */
    public double forecast(int h) {
        if (h < 1) {
            throw new IllegalArgumentException("the horizon starts at 1: " + h);
        }
        double seasonal = season.length == 0 ? 0 : season[(h - 1) % season.length];
        return level + h * trend + seasonal;
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof SmoothingState s
                && Double.compare(level, s.level) == 0
                && Double.compare(trend, s.trend) == 0
                && Arrays.equals(season, s.season);
    }

    @Override
    public int hashCode() {
        return 31 * (31 * Double.hashCode(level) + Double.hashCode(trend)) + Arrays.hashCode(season);
    }

    @Override
    public String toString() {
        return "SmoothingState[level=" + level + ", trend=" + trend + ", season=" + Arrays.toString(season) + "]";
    }
}
