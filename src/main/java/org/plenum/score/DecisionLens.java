package org.plenum.score;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.TreeMap;
import java.util.function.Function;
import org.plenum.core.ScoredChange;
import org.plenum.core.Series;

/**
 * What people's changes did, change by change (DESIGN §5, METHODS §4): grouped by direction and
 * size class, or by any other key, each group with its direction-right, overshoot and optimism
 * shares, its geometric-mean error ratio and the signed-rank evidence.
 */
public final class DecisionLens {
    private final ActualHistory history;

    /** @param actuals every actual, for each item's volatility (its in-sample naive MAE) */
    public DecisionLens(Series actuals) {
        this.history = new ActualHistory(actuals, 1);
    }

    /**
     * The class of a change: its direction and size, e.g. "up 15-35%", "up over 100%", "set to
     * zero", "up from zero"; "kept" for a review without change.
     */
    public static String sizeClass(ScoredChange c) {
        if (c.kept() || c.quantity() == c.prior()) {
            return "kept";
        }
        SizeClass size = SizeClass.of(c.prior(), c.quantity());
        return switch (size) {
            case OVER_100_UP -> "up over 100%";
            case SET_TO_ZERO -> "set to zero";
            case FROM_ZERO -> "up from zero";
            default -> direction(c) + " " + size.label();
        };
    }

    public static String direction(ScoredChange c) {
        return c.quantity() > c.prior() ? "up" : c.quantity() < c.prior() ? "down" : "kept";
    }

    /** One group per key, in key order; a change with several keys (reason words) counts in each. */
    public List<LensGroup> groups(List<ScoredChange> changes, Function<ScoredChange, List<String>> keys) {
        Map<String, List<ScoredChange>> byKey = new TreeMap<>();
        for (ScoredChange c : changes) {
            for (String key : keys.apply(c)) {
                byKey.computeIfAbsent(key, k -> new ArrayList<>()).add(c);
            }
        }
        List<LensGroup> out = new ArrayList<>();
        byKey.forEach((key, group) -> out.add(group(key, group)));
        return out;
    }

    LensGroup group(String key, List<ScoredChange> changes) {
        int n = changes.size();
        long[] priorErrors = new long[n];
        long[] newErrors = new long[n];
        long[] differences = new long[n];
        double[] scaled = new double[n];
        int right = 0;
        int aimed = 0;
        int overshoot = 0;
        int optimistic = 0;
        int improved = 0;
        long overForecast = 0;
        long actualSum = 0;
        int scaledCount = 0;
        for (int i = 0; i < n; i++) {
            ScoredChange c = changes.get(i);
            AdjustmentOutcome o = AdjustmentOutcome.of(c.prior(), c.quantity(), c.actual());
            priorErrors[i] = Math.abs(c.actual() - c.prior());
            newErrors[i] = Math.abs(c.actual() - c.quantity());
            differences[i] = priorErrors[i] - newErrors[i];
            boolean hasAim = o.aim() == AdjustmentOutcome.Aim.RIGHT_DIRECTION
                    || o.aim() == AdjustmentOutcome.Aim.WRONG_DIRECTION;
            aimed += hasAim ? 1 : 0;
            right += o.aim() == AdjustmentOutcome.Aim.RIGHT_DIRECTION ? 1 : 0;
            overshoot += o.overshoot() ? 1 : 0;
            optimistic += c.quantity() > c.actual() ? 1 : 0;
            improved += o.effect() == AdjustmentOutcome.Effect.IMPROVED ? 1 : 0;
            overForecast = Math.addExact(overForecast, c.quantity() - c.actual());
            actualSum = Math.addExact(actualSum, c.actual());
            double scale = history.scale(c.item(), c.cycle());
            if (Double.isFinite(scale) && scale > 0) {
                scaled[scaledCount++] = Math.abs(c.quantity() - c.prior()) / scale;
            }
        }
        GeometricMeanRatio.Result ratio = GeometricMeanRatio.of(newErrors, priorErrors);
        WilcoxonSignedRank.Result wilcoxon = WilcoxonSignedRank.twoSided().test(differences);
        return new LensGroup(key, n, share(right, aimed), share(overshoot, right), share(optimistic, n),
                share(improved, n), actualSum == 0 ? OptionalDouble.empty()
                        : OptionalDouble.of(overForecast / (double) actualSum),
                ratio, wilcoxon, Evidence.of(wilcoxon, ratio.value()), median(scaled, scaledCount));
    }

    private static OptionalDouble share(int part, int whole) {
        return whole == 0 ? OptionalDouble.empty() : OptionalDouble.of(part / (double) whole);
    }

    private static OptionalDouble median(double[] values, int count) {
        if (count == 0) {
            return OptionalDouble.empty();
        }
        double[] sorted = Arrays.copyOf(values, count);
        Arrays.sort(sorted);
        return OptionalDouble.of(count % 2 == 1 ? sorted[count / 2] : (sorted[count / 2 - 1] + sorted[count / 2]) / 2);
    }
}
