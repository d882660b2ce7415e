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
        Tally t = new Tally(changes.size());
        changes.forEach(c -> t.add(c, history.scale(c.item(), c.cycle())));
        GeometricMeanRatio.Result ratio = GeometricMeanRatio.of(t.newErrors, t.priorErrors);
        WilcoxonSignedRank.Result wilcoxon = WilcoxonSignedRank.twoSided().test(t.differences);
        return new LensGroup(key, t.n, share(t.right, t.aimed), share(t.overshoot, t.right), share(t.optimistic, t.n),
                share(t.improved, t.n), t.actualSum == 0 ? OptionalDouble.empty()
                        : OptionalDouble.of(t.overForecast / (double) t.actualSum),
                ratio, wilcoxon, Evidence.of(wilcoxon, ratio.value()), median(t.scaled, t.scaledCount));
    }

    /** The counts and columns of one group, gathered change by change. */
    private static final class Tally {
        final long[] priorErrors;
        final long[] newErrors;
        final long[] differences;
        final double[] scaled;
        int n;
        int right;
        int aimed;
        int overshoot;
        int optimistic;
        int improved;
        long overForecast;
        long actualSum;
        int scaledCount;

        Tally(int size) {
            priorErrors = new long[size];
            newErrors = new long[size];
            differences = new long[size];
            scaled = new double[size];
        }

        void add(ScoredChange c, double scale) {
            AdjustmentOutcome o = AdjustmentOutcome.of(c.prior(), c.quantity(), c.actual());
            priorErrors[n] = Math.abs(c.actual() - c.prior());
            newErrors[n] = Math.abs(c.actual() - c.quantity());
            differences[n] = priorErrors[n] - newErrors[n];
            n++;
            aimed += o.aim() == AdjustmentOutcome.Aim.RIGHT_DIRECTION || o.aim() == AdjustmentOutcome.Aim.WRONG_DIRECTION
                    ? 1 : 0;
            right += o.aim() == AdjustmentOutcome.Aim.RIGHT_DIRECTION ? 1 : 0;
            overshoot += o.overshoot() ? 1 : 0;
            optimistic += c.quantity() > c.actual() ? 1 : 0;
            improved += o.effect() == AdjustmentOutcome.Effect.IMPROVED ? 1 : 0;
            overForecast = Math.addExact(overForecast, c.quantity() - c.actual());
            actualSum = Math.addExact(actualSum, c.actual());
            if (Double.isFinite(scale) && scale > 0) {
                scaled[scaledCount++] = Math.abs(c.quantity() - c.prior()) / scale;
            }
        }
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
