package org.plenum.demo;

/**
 * What running a smoothing method over a series produced.
 *
 * <p>All arrays have one entry per observation: entry {@code t} belongs to observation
 * {@code y[t]}. Arrays are handed out as they are, for speed; callers must not change them.
 *
 * @param fitted one-step forecasts: {@code fitted[t]} is the forecast of {@code y[t]} made from
 *               the state after {@code y[t-1]} (for t = 0, from the starting state)
 * @param levels the level after each observation, ℓ1..ℓn
 * @param trends the trend after each observation, b1..bn (all 0 without a trend)
 * @param end    the state after the last observation, from which forecasts are made
 * @param sse    the sum of squared one-step errors, Σ (y[t] − fitted[t])²
 */
public record Smoothed(double[] fitted, double[] levels, double[] trends, SmoothingState end, double sse) {

    /** Forecasts 1..{@code horizon} periods after the last observation. */
    public double[] forecast(int horizon) {
        double[] out = new double[horizon];
        for (int h = 1; h <= horizon; h++) {
            out[h - 1] = end.forecast(h);
        }
        return out;
    }
}
