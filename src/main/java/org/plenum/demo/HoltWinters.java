package org.plenum.demo;

/**
 * Additive exponential smoothing with fixed smoothing parameters: simple exponential smoothing,
 * Holt's linear trend method and the additive Holt-Winters method.
 *
 * <p>Method: C. C. Holt (1957), "Forecasting seasonals and trends by exponentially weighted moving
 * averages", ONR Memorandum 52; P. R. Winters (1960), "Forecasting sales by exponentially weighted
 * moving averages", Management Science 6(3); equations as in R. J. Hyndman &amp; G. Athanasopoulos,
 * <i>Forecasting: Principles and Practice</i>, 2nd ed., §7.1 (simple exponential smoothing) and
 * §7.3 (Holt-Winters additive method). For each observation y_t, with season length m:
 *
 * <pre>
 *   ŷ_t = ℓ_{t−1} + b_{t−1} + s_{t−m}                      (one-step forecast)
 *   ℓ_t = α (y_t − s_{t−m}) + (1 − α)(ℓ_{t−1} + b_{t−1})
 *   b_t = β (ℓ_t − ℓ_{t−1}) + (1 − β) b_{t−1}
 *   s_t = γ (y_t − ℓ_t) + (1 − γ) s_{t−m}
 * </pre>
 *
 * Missing components are zero. The seasonal equation is Winters' original form; FPP §7.3 shows it
 * equals the book's form with γ_book = γ (1 − α), so every γ in [0, 1] is admissible here and the
 * fitter can use plain box bounds. β is the book's β*.
 *
 * @param components which components the method carries
 * @param alpha      level smoothing α in [0, 1]
 * @param beta       trend smoothing β in [0, 1]; ignored without a trend
 * @param gamma      seasonal smoothing γ in [0, 1]; ignored without a season
 */
public record HoltWinters(Components components, double alpha, double beta, double gamma) {

    public HoltWinters {
        requireUnit("alpha", alpha);
        requireUnit("beta", beta);
        requireUnit("gamma", gamma);
    }

    /** Simple exponential smoothing with level smoothing {@code alpha}. */
    public static HoltWinters ses(double alpha) {
        return new HoltWinters(Components.LEVEL, alpha, 0, 0);
    }

    private static void requireUnit(String name, double value) {
        if (!(value >= 0 && value <= 1)) {
            throw new IllegalArgumentException(name + " must lie in [0, 1]: " + value);
        }
    }

    /** Smooths {@code y} from the deterministic {@link SmoothingState#initial} state. */
    public Smoothed smooth(double[] y) {
        return smooth(y, SmoothingState.initial(y, components));
    }

    /**
     * Runs the recursions over {@code y} starting from {@code start} (the state at time 0).
     *
     * @throws IllegalArgumentException if the start state's season length does not match
     */
    public Smoothed smooth(double[] y, SmoothingState start) {
        Pass pass = new Pass(start);
        int n = y.length;
        double[] fitted = new double[n];
        double[] levels = new double[n];
        double[] trends = new double[n];
        double sse = 0;
        for (int t = 0; t < n; t++) {
            fitted[t] = pass.step(y[t]);
            sse += (y[t] - fitted[t]) * (y[t] - fitted[t]);
            levels[t] = pass.level;
            trends[t] = pass.trend;
        }
        return new Smoothed(fitted, levels, trends, pass.state(), sse);
    }

    /** The sum of squared one-step errors of {@link #smooth}, without keeping the path: for fitting. */
    public double sse(double[] y, SmoothingState start) {
        Pass pass = new Pass(start);
        double sse = 0;
        for (double value : y) {
            double error = value - pass.step(value);
            sse += error * error;
        }
        return sse;
    }

    /** One run of the recursions; the seasonal indices live in a ring indexed by t mod m. */
    private final class Pass {
        private double level;
        private double trend;
        private final double[] ring;
        private int t;

        Pass(SmoothingState start) {
            ring = start.season();
            if (ring.length != components.period()) {
                throw new IllegalArgumentException("start state has " + ring.length
                        + " seasonal indices, method needs " + components.period());
            }
            level = start.level();
            trend = components.trend() ? start.trend() : 0;
        }

        /** Takes observation y_t and returns its one-step forecast ŷ_t, made before seeing it. */
        double step(double y) {
            int m = ring.length;
            // Slot t mod m holds s_{t−m}; it is overwritten by s_t below.
            double past = m == 0 ? 0 : ring[t % m];
            double forecast = level + trend + past;
            double newLevel = alpha * (y - past) + (1 - alpha) * (level + trend);
            if (components.trend()) {
                trend = beta * (newLevel - level) + (1 - beta) * trend;
            }
            if (m > 0) {
                ring[t % m] = gamma * (y - newLevel) + (1 - gamma) * past;
            }
            level = newLevel;
            t++;
            return forecast;
        }

        /** The state now, seasonal indices rotated so that the oldest comes first. */
        SmoothingState state() {
            int m = ring.length;
            double[] season = new double[m];
            for (int i = 0; i < m; i++) {
                season[i] = ring[(t + i) % m];
            }
            return new SmoothingState(level, trend, season);
        }
    }
}
