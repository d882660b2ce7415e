package org.plenum.demo;

/**
 * A smoothing method with fitted parameters and the run that produced its in-sample error.
 *
 * @param method the method with the fitted α, β, γ
 * @param start  the starting state the method was run from
 * @param run    the run over the fitting series; {@code run.sse()} is the minimised objective
 */
public record HoltWintersFit(HoltWinters method, SmoothingState start, Smoothed run) {

    /** Forecasts 1..{@code horizon} periods after the last fitted observation. */
    public double[] forecast(int horizon) {
        return run.forecast(horizon);
    }
}
