package org.plenum.score;

import java.util.Optional;
import java.util.OptionalDouble;

/**
 * One row of the process scorecard: how accurate a forecast source was on the paired set, and —
 * for every source after the placebo — how it compares with the source before it.
 *
 * @param mae mean absolute error in units
 * @param wape Σ|e| / ΣA as a fraction
 * @param accuracy 1 − WAPE, not floored
 * @param bias Σ(F − A) / ΣA as a fraction: positive means the forecast was above the actual
 * @param maseLeftOut pairs without a defined MASE scale (constant or too short history)
 * @param vsPrevious the comparison with the previous source; empty for the placebo
 * @param fvaVsPlacebo accuracy minus the placebo's accuracy, in fractions; empty for the placebo
 */
public record StepScore(String step, int n, OptionalDouble mae, OptionalDouble wape, OptionalDouble accuracy,
        OptionalDouble bias, OptionalDouble mase, int maseLeftOut, Optional<Comparison> vsPrevious,
        OptionalDouble fvaVsPlacebo) {}
