package org.plenum.score;

import java.util.Optional;
import java.util.OptionalDouble;

/**
 * A forecast source against the source before it on the same pairs.
 *
 * @param fva accuracy(this) − accuracy(previous), as a fraction (0.05 = 5 points)
 * @param avgRelMae Davydenko and Fildes' AvgRelMAE, items weighted by their periods
 * @param interval a bootstrap 95% interval for AvgRelMAE, items resampled
 * @param ratio the geometric mean of per-pair |e| ratios, with exact hits counted apart
 * @param wilcoxon two-sided signed-rank test of |e_previous| − |e_this|
 * @param evidence what the test supports saying, in words
 */
public record Comparison(String against, OptionalDouble fva, AvgRelMae.Result avgRelMae,
        Optional<BootstrapInterval.Interval> interval, GeometricMeanRatio.Result ratio,
        WilcoxonSignedRank.Result wilcoxon, Evidence evidence) {}
