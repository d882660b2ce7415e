package org.plenum.agenda;

import java.util.Arrays;
import java.util.OptionalDouble;
import org.plenum.core.MeanAbsoluteScaledError;

/**
 * The in-sample MAE of the naive forecast, {@code mean |A_t − A_(t−1)|} over every pair of
 * consecutive known periods before the cycle: the stake's fallback for an item without a recent
 * error (DESIGN §6). A gap in the actuals breaks the pairs, so each unbroken run is scaled by
 * {@link MeanAbsoluteScaledError#scale} (Hyndman &amp; Koehler 2006, the MASE scale with m = 1) and
 * the runs' sums and counts are pooled.
 */
final class NaiveMae {
    private NaiveMae() {}

    /** The pooled scale of the item's actuals before {@code cycle}. */
    static MeanAbsoluteScaledError.Scale of(History history, int item, int cycle) {
        long[][] known = history.actualsBefore(item, cycle);
        return of(known[0], known[1]);
    }

    /** @param periods known periods in order; {@code quantities} their actuals */
    static MeanAbsoluteScaledError.Scale of(long[] periods, long[] quantities) {
        int differences = 0;
        long sum = 0;
        int runStart = 0;
        for (int i = 1; i <= periods.length; i++) {
            if (i == periods.length || periods[i] != periods[i - 1] + 1) {
                MeanAbsoluteScaledError.Scale run = MeanAbsoluteScaledError.scale(
                        Arrays.copyOfRange(quantities, runStart, i), 1);
                differences += run.differences();
                sum = Math.addExact(sum, run.absoluteDifferenceMicros());
                runStart = i;
            }
        }
        return new MeanAbsoluteScaledError.Scale(1, differences, sum);
    }

    /** The mean in units, zero included; empty without a single pair of consecutive periods. */
    static OptionalDouble mean(MeanAbsoluteScaledError.Scale scale) {
        return scale.differences() == 0 ? OptionalDouble.empty()
                : OptionalDouble.of(scale.absoluteDifferenceMicros() / 1e6 / scale.differences());
    }
}
