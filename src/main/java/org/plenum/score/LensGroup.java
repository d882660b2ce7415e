package org.plenum.score;

import java.util.OptionalDouble;

/**
 * The decision lens over one group of changes (a size class, a direction, an author, ...).
 *
 * @param shareRight of changes whose prior was not exact, the share moved towards the actual
 * @param shareOvershoot of those moved the right way, the share that went past the actual
 * @param shareOptimistic the share whose new value ended above the actual
 * @param shareImproved the share whose absolute error went down
 * @param bias Σ(new − actual) / Σ actual, positive = above the actual
 * @param ratio geometric mean of |e_new| / |e_prior| per change, exact hits counted apart
 * @param wilcoxon two-sided signed-rank test of |e_prior| − |e_new|
 * @param medianScaledSize median of |new − prior| over the item's in-sample naive MAE
 */
public record LensGroup(String key, int count, OptionalDouble shareRight, OptionalDouble shareOvershoot,
        OptionalDouble shareOptimistic, OptionalDouble shareImproved, OptionalDouble bias,
        GeometricMeanRatio.Result ratio, WilcoxonSignedRank.Result wilcoxon, Evidence evidence,
        OptionalDouble medianScaledSize) {}
