package org.plenum.agenda;

/**
 * Shrinks a ratio estimated from {@code n} observations toward its parent's, in log space:
 * {@code log r̂ = (n·log r + k·log r_parent) / (n + k)} (DESIGN §6, {@code k = 5}).
 *
 * <p>This is the credibility weighting of Bühlmann (1967), "Experience rating and credibility",
 * <i>ASTIN Bulletin</i> 4(3), 199–207: the own estimate gets the weight {@code Z = n/(n + k)} and
 * the collective one {@code 1 − Z} (recalled from memory, not checked against the paper). Working
 * on {@code log r} keeps r and 1/r equally far from 1, as AvgRelMAE does. With {@code n = 0} the
 * parent's ratio is returned; as {@code n} grows the own ratio takes over.
 */
public final class CredibilityShrinkage {
    /** DESIGN §6's default: five observations weigh as much as the parent's record. */
    public static final double DEFAULT_K = 5;

    private CredibilityShrinkage() {}

    /**
     * @param n observations behind {@code ratio} (0 allowed, then {@code ratio} is ignored)
     * @param ratio the own ratio, positive
     * @param parentRatio the parent's ratio, positive
     * @param k the parent's weight in observations, positive
     */
    public static double shrink(long n, double ratio, double parentRatio, double k) {
        if (n < 0 || !(k > 0) || !(parentRatio > 0) || (n > 0 && !(ratio > 0))) {
            throw new IllegalArgumentException("shrinkage needs n >= 0, k > 0 and positive ratios: n=" + n + ", r="
                    + ratio + ", parent=" + parentRatio + ", k=" + k);
        }
        if (n == 0) {
            return parentRatio;
        }
        return Math.exp((n * Math.log(ratio) + k * Math.log(parentRatio)) / (n + k));
    }
}
