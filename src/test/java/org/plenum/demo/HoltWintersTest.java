package org.plenum.demo;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class HoltWintersTest {

    /**
     * Annual oil production in Saudi Arabia 1996–2007 (R package fpp, series {@code oil}), as
     * copied into statsmodels' test suite, statsmodels/tsa/holtwinters/tests/test_holtwinters.py.
     */
    private static final double[] OIL = {
        446.6565229, 454.4733065, 455.662974, 423.6322388, 456.2713279, 440.5880501,
        425.3325201, 485.1494479, 506.0481621, 526.7919833, 514.268889, 494.2110193,
    };

    /** Air passengers in Australia 1990–2004 (R package fpp, {@code ausair}), same test suite. */
    private static final double[] AUSAIR = {
        17.5534, 21.8601, 23.8866, 26.9293, 26.8885, 28.8314, 30.0751, 30.9535,
        30.1857, 31.5797, 32.577569, 33.477398, 39.021581, 41.386432, 41.596552,
    };

    /** Quarterly international visitor nights in Australia 2005–2010 (fpp {@code austourists}), same test suite. */
    private static final double[] AUST = {
        41.727458, 24.04185, 32.328103, 37.328708, 46.213153, 29.346326, 36.48291, 42.977719,
        48.901525, 31.180221, 37.717881, 40.420211, 51.206863, 31.887228, 40.978263, 43.772491,
        55.558567, 33.850915, 42.076383, 45.642292, 59.76678, 35.191877, 44.319737, 47.913736,
    };

    private static SmoothingState levelOnly(double level) {
        return new SmoothingState(level, 0, new double[0]);
    }

    @Test
    void sesWithAlphaPointTwoMatchesPublishedLevelsAndForecast() {
        Smoothed run = HoltWinters.ses(0.2).smooth(OIL, levelOnly(OIL[0]));
        // statsmodels test_holtwinters.py, test_simple_exp_smoothing (fit1.level), values from R fpp ses().
        double[] published = {
            446.6565229, 448.2198796, 449.7084985, 444.4932466, 446.8488628, 445.5967003,
            441.5438642, 450.2649810, 461.4216172, 474.4956904, 482.4503301, 484.8024680,
        };
        assertArrayEquals(published, run.levels(), 1e-4);
        // Same test, fit1.forecast(1) == 484.802468.
        assertEquals(484.802468, run.forecast(1)[0], 1e-4);
    }

    @Test
    void sesWithAlphaPointSixMatchesPublishedForecast() {
        Smoothed run = HoltWinters.ses(0.6).smooth(OIL, levelOnly(OIL[0]));
        // statsmodels test_holtwinters.py, test_simple_exp_smoothing: fit2.forecast(1) == 501.837461.
        assertEquals(501.837461, run.forecast(1)[0], 1e-4);
    }

    @Test
    void sesDefaultStartIsFirstObservation() {
        // statsmodels' "legacy-heuristic" start, ℓ0 = y1, is our default; same published forecast as above.
        assertEquals(484.802468, HoltWinters.ses(0.2).smooth(OIL).forecast(1)[0], 1e-4);
    }

    @Test
    void sesForecastIsFlat() {
        // FPP 2nd ed. §7.1: ŷ_{T+h|T} = ℓ_T for every h.
        double[] f = HoltWinters.ses(0.2).smooth(OIL).forecast(3);
        assertEquals(f[0], f[2], 0);
    }

    @Test
    void holtLinearTrendMatchesPublishedTrendsFittedValuesAndForecasts() {
        HoltWinters holt = new HoltWinters(new Components(true, 0), 0.8, 0.2, 0);
        // ℓ0 = y1, b0 = y2 − y1: statsmodels' "legacy-heuristic" start, which is our default for Holt.
        Smoothed run = holt.smooth(AUSAIR);
        // statsmodels test_holtwinters.py, test_holt: fit1.trend (values from R fpp holt()).
        double[] trends = {
            3.617628, 3.59006512, 3.33438212, 3.23657639, 2.69263502, 2.46388914, 2.2229097,
            1.95959226, 1.47054601, 1.3604894, 1.28045881, 1.20355193, 1.88267152, 2.09564416, 1.83655482,
        };
        assertArrayEquals(trends, run.trends(), 1e-4);
        // Same test, fit1.fittedfcast: one-step forecasts of y1..y15, then of y16.
        double[] fitted = {
            21.8601, 22.032368, 25.48461872, 27.54058587, 30.28813356, 30.26106173, 31.58122149,
            32.599234, 33.24223906, 32.26755382, 33.07776017, 33.95806605, 34.77708354,
            40.05535303, 43.21586036,
        };
        assertArrayEquals(fitted, run.fitted(), 1e-4);
        assertEquals(43.75696849, run.forecast(1)[0], 1e-4);
        // Same test, fit1.forecast(5), published to 2 decimals.
        assertArrayEquals(new double[] {43.76, 45.59, 47.43, 49.27, 51.10}, run.forecast(5), 0.005);
    }

    @Test
    void fittedSesAlphaMatchesPublishedOptimumForItsStartLevel() {
        // statsmodels test_holtwinters.py, test_simple_exp_smoothing: with the level estimated too, the
        // least-squares optimum is α = 0.891998 at ℓ0 = 447.47844 and forecast 496.493543. A joint
        // optimum is also the optimum in α alone with ℓ0 held there, so our 1-D search must find it.
        HoltWintersFit fit = HoltWintersFitter.fit(OIL, Components.LEVEL, levelOnly(447.47844));
        assertEquals(0.891998, fit.method().alpha(), 1e-4);
        assertEquals(496.493543, fit.forecast(1)[0], 1e-3);
    }

    @Test
    void exactLinePlusSeasonIsReproducedAndContinued() {
        int m = 12;
        double[] pattern = {-30, -20, 5, 25, 40, 35, 10, 0, -5, -15, -25, -20};
        double[] y = new double[36];
        for (int t = 0; t < y.length; t++) {
            y[t] = 200 + 3 * (t + 1) + pattern[t % m];
        }
        HoltWintersFit fit = HoltWintersFitter.fit(y, Components.seasonal(m));
        // The series is exactly ℓ0 + b0 t + s_t, so the default start reproduces it with any α, β, γ.
        assertTrue(fit.run().sse() < 1e-12, "sse " + fit.run().sse());
        double[] forecast = fit.forecast(24);
        for (int h = 1; h <= 24; h++) {
            int t = y.length + h;
            assertEquals(200 + 3 * t + pattern[(t - 1) % m], forecast[h - 1], 1e-6, "h=" + h);
        }
    }

    @Test
    void fittedSseIsNoWorseThanAnyPointOfAGrid() {
        Components components = Components.seasonal(4);
        HoltWintersFit fit = HoltWintersFitter.fit(AUST, components);
        double gridBest = Double.MAX_VALUE;
        for (int a = 0; a <= 20; a++) {
            for (int b = 0; b <= 20; b++) {
                for (int g = 0; g <= 20; g++) {
                    HoltWinters method = new HoltWinters(components, a / 20.0, b / 20.0, g / 20.0);
                    gridBest = Math.min(gridBest, method.smooth(AUST).sse());
                }
            }
        }
        assertTrue(fit.run().sse() <= gridBest + 1e-9, fit.run().sse() + " > grid " + gridBest);
    }

    @Test
    void fittedParametersStayWithinTheUnitInterval() {
        // A series accelerating ever faster: unconstrained least squares would want α > 1 for SES.
        double[] y = new double[30];
        for (int t = 0; t < y.length; t++) {
            y[t] = Math.pow(t + 1, 3);
        }
        HoltWintersFit ses = HoltWintersFitter.fit(y, Components.LEVEL);
        assertEquals(1, ses.method().alpha(), 1e-6);
        for (Components c : new Components[] {new Components(true, 0), Components.seasonal(12), Components.seasonal(4)}) {
            HoltWinters method = HoltWintersFitter.fit(y, c).method();
            for (double p : new double[] {method.alpha(), method.beta(), method.gamma()}) {
                assertTrue(p >= 0 && p <= 1, c + " gave " + method);
            }
        }
    }

    @Test
    void rejectsParametersOutsideTheUnitIntervalAndTooShortSeries() {
        assertThrows(IllegalArgumentException.class, () -> HoltWinters.ses(1.01));
        assertThrows(IllegalArgumentException.class, () -> new HoltWinters(Components.LEVEL, 0.5, -0.1, 0));
        assertThrows(IllegalArgumentException.class, () -> SmoothingState.initial(new double[23], Components.seasonal(12)));
        assertThrows(IllegalArgumentException.class, () -> new Components(false, 1));
    }
}
