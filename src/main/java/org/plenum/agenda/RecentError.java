package org.plenum.agenda;

import java.util.OptionalDouble;

/**
 * An item's recent MAE of the statistical forecast at the decision lags (DESIGN §6): the mean of
 * every known absolute error {@code |A − F|} of the {@value #CYCLES} latest cycles before the
 * ranked cycle in which at least one of the item's forecasts at those lags has a known actual of
 * a period before the ranked cycle. Each (cycle, target period) error counts once.
 *
 * <p>This is Plenum's rule, built on the MAE (Hyndman &amp; Athanasopoulos, <i>Forecasting:
 * Principles and Practice</i>, §3.4): the window keeps the stake about how the forecast is doing
 * now, not years ago.
 *
 * @param absoluteErrorMicros Σ|A − F| over the errors used
 * @param errors how many errors were used
 * @param cycles how many cycles they came from (at most {@value #CYCLES})
 */
public record RecentError(long absoluteErrorMicros, int errors, int cycles) {
    /** How many of the latest cycles with a known error make "recent". */
    public static final int CYCLES = 6;

    /** The MAE in units; empty when no error was known. */
    public OptionalDouble mae() {
        return errors == 0 ? OptionalDouble.empty() : OptionalDouble.of(absoluteErrorMicros / 1e6 / errors);
    }

    /** Whether fewer than {@value #CYCLES} cycles were found, so older history might still add some. */
    public boolean isShort() {
        return cycles < CYCLES;
    }

    /**
     * The recent error of {@code item} at {@code cycle}; the history holds only forecasts at the
     * decision lags.
     */
    static RecentError of(History history, int item, int cycle) {
        long[] sum = new long[1];
        int[] counts = new int[2]; // errors, cycles
        int[] current = {Integer.MIN_VALUE};
        history.forecastsNewestFirst(item, (c, period, forecast) -> {
            if (c >= cycle || period >= cycle) {
                return true;
            }
            long actual = history.actual(item, period);
            if (actual < 0) {
                return true;
            }
            if (c != current[0]) {
                if (counts[1] == CYCLES) {
                    return false;
                }
                current[0] = c;
                counts[1]++;
            }
            sum[0] = Math.addExact(sum[0], Math.abs(actual - forecast));
            counts[0]++;
            return true;
        });
        return new RecentError(sum[0], counts[0], counts[1]);
    }
}
