package org.plenum.demo;

/**
 * The statistical forecast of every cycle: additive Holt-Winters with a 12-month season for
 * regular items and simple exponential smoothing for intermittent ones, fitted afresh each cycle
 * on the actuals known then.
 */
final class StatForecaster {

    private static final Components SEASONAL = Components.seasonal(12);

    private StatForecaster() {
    }

    /**
     * Forecasts for cycles {@link DemoMonths#FIRST_CYCLE} … {@link DemoMonths#UPCOMING_CYCLE}:
     * row {@code c − FIRST_CYCLE} holds lags 0 … HORIZON−1 of cycle c, fitted on months 0 … c−1
     * only, rounded to whole units and floored at 0 because demand cannot be negative.
     */
    static long[][] forecasts(Item item, long[] demand) {
        Components components = item.intermittent() ? Components.LEVEL : SEASONAL;
        long[][] out = new long[DemoMonths.UPCOMING_CYCLE - DemoMonths.FIRST_CYCLE + 1][];
        for (int c = DemoMonths.FIRST_CYCLE; c <= DemoMonths.UPCOMING_CYCLE; c++) {
            double[] history = new double[c];
            for (int t = 0; t < c; t++) {
                history[t] = demand[t];
            }
            double[] forecast = HoltWintersFitter.fit(history, components).forecast(DemoMonths.HORIZON);
            out[c - DemoMonths.FIRST_CYCLE] = wholeUnits(forecast);
        }
        return out;
    }

    private static long[] wholeUnits(double[] forecast) {
        long[] out = new long[forecast.length];
        for (int i = 0; i < forecast.length; i++) {
            out[i] = Math.max(0, Math.round(forecast[i]));
        }
        return out;
    }
}
