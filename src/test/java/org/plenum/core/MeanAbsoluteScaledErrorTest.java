package org.plenum.core;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Arrays;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class MeanAbsoluteScaledErrorTest {

    private static final MeanAbsoluteScaledError.Scale SEASONAL = MeanAbsoluteScaledError.scale(AusBeer.TRAIN, 4);
    private static final MeanAbsoluteScaledError.Scale LAG_ONE = MeanAbsoluteScaledError.scale(AusBeer.TRAIN, 1);

    @Test
    void scalesByTheInSampleSeasonalNaive() {
        // METHODS A5 [printed]: seasonal naive training MAE 14.3 over 60 residuals, naive 54.73016 over 63.
        assertEquals(60, SEASONAL.differences());
        assertEquals(858_000_000L, SEASONAL.absoluteDifferenceMicros());
        assertEquals(14.3, SEASONAL.value().getAsDouble(), 5e-6);
        assertEquals(63, LAG_ONE.differences());
        assertEquals(54.73016, LAG_ONE.value().getAsDouble(), 5e-6);
    }

    @ParameterizedTest(name = "BEER {0}: MASE {1}")
    @CsvSource({"mean, 2.435315", "naive, 4.013986", "seasonal naive, 0.9370629", "drift, 4.117216"})
    void reproducesTheBeerTestMase(String method, double mase) {
        // METHODS A1–A4 [printed]: R forecast::accuracy test-set MASE with the seasonal scale Q = 14.3 (±5e-6).
        MeanAbsoluteScaledError.Result result = MeanAbsoluteScaledError.of(AusBeer.TEST, WapeTest.beerForecast(method), SEASONAL);
        assertEquals(mase, result.value().getAsDouble(), 5e-6);
    }

    @Test
    void changesMarkedlyWithTheWrongScale() {
        // METHODS §2.1 pitfall [computed here]: seasonal naive MASE 0.937 on the seasonal scale, 0.245 on lag 1.
        assertEquals(0.245, MeanAbsoluteScaledError.of(AusBeer.TEST, AusBeer.SEASONAL_NAIVE, LAG_ONE).value().getAsDouble(), 5e-4);
    }

    @Test
    void givesOneForTheSeasonalNaiveInSample() {
        // METHODS A5 [printed]: seasonal naive in-sample MASE 1, mean method in-sample MAE 35.23438, MASE 2.463942.
        long[] fitted = Arrays.copyOfRange(AusBeer.TRAIN, 0, 60);
        long[] actual = Arrays.copyOfRange(AusBeer.TRAIN, 4, 64);
        assertEquals(1.0, MeanAbsoluteScaledError.of(actual, fitted, SEASONAL).value().getAsDouble(), 1e-12);
        long[] mean = new long[64];
        Arrays.fill(mean, 435_375_000L);
        MeanAbsoluteScaledError.Result inSampleMean = MeanAbsoluteScaledError.of(AusBeer.TRAIN, mean, SEASONAL);
        // 35.234375 exactly (2255/64) [computed here]; R prints it to 7 digits as 35.23438, a half-way case.
        assertEquals(35.234375, inSampleMean.meanAbsoluteError().getAsDouble(), 1e-12);
        assertEquals(35.23438, inSampleMean.meanAbsoluteError().getAsDouble(), 5e-6 + 1e-12);
        assertEquals(2.463942, inSampleMean.value().getAsDouble(), 5e-6);
    }

    @Test
    void matchesHuggingFaceEvaluate() {
        long[] predictions = micros(2.5, 0, 2, 8, 1.25);
        long[] references = micros(3, -0.5, 2, 7, 2);
        long[] training = micros(5, 0.5, 4, 6, 3, 5, 2);
        // METHODS A8 [printed]: HF evaluate mase.py docstring, m = 1 → 0.18333333333333335 (1e-12).
        assertEquals(0.18333333333333335,
                MeanAbsoluteScaledError.of(references, predictions, training, 1).value().getAsDouble(), 1e-12);
    }

    @Test
    void matchesRMetricsScaledByTheActualsThemselves() {
        long[] actual = micros(1.1, 1.9, 3.0, 4.4, 5.0, 5.6);
        long[] predicted = micros(0.9, 1.8, 2.5, 4.5, 5.0, 6.2);
        // METHODS A9 [printed]: R Metrics::mase(actual, predicted) = 0.2777778 (±5e-8), scale from the actual vector.
        MeanAbsoluteScaledError.Result result = MeanAbsoluteScaledError.of(actual, predicted, actual, 1);
        assertEquals(0.2777778, result.value().getAsDouble(), 5e-8);
        // METHODS A9 [computed here]: MAE 0.25.
        assertEquals(0.25, result.meanAbsoluteError().getAsDouble(), 1e-12);
    }

    @Test
    void isUndefinedForAConstantTrainingSeries() {
        MeanAbsoluteScaledError.Scale flat = MeanAbsoluteScaledError.scale(micros(5, 5, 5), 1);
        assertFalse(flat.isDefined());
        assertEquals(OptionalDouble.empty(), MeanAbsoluteScaledError.of(micros(4), micros(5), flat).value());
    }

    @Test
    void isUndefinedWhenTheTrainingSeriesIsNoLongerThanTheLag() {
        MeanAbsoluteScaledError.Scale tooShort = MeanAbsoluteScaledError.scale(micros(1, 2, 3, 4), 4);
        assertEquals(0, tooShort.differences());
        assertEquals(OptionalDouble.empty(), tooShort.value());
        assertEquals(OptionalDouble.empty(), MeanAbsoluteScaledError.of(micros(4), micros(5), tooShort).value());
    }

    @Test
    void isUndefinedWithoutPairs() {
        MeanAbsoluteScaledError.Result none = MeanAbsoluteScaledError.of(new long[0], new long[0], SEASONAL);
        assertEquals(OptionalDouble.empty(), none.value());
        assertEquals(OptionalDouble.empty(), none.meanAbsoluteError());
    }

    @Test
    void refusesALagBelowOne() {
        assertThrows(IllegalArgumentException.class, () -> MeanAbsoluteScaledError.scale(AusBeer.TRAIN, 0));
    }

    /** Decimal literals as exact millionths (via their shortest decimal text). */
    private static long[] micros(double... values) {
        return Arrays.stream(values).mapToLong(v -> new java.math.BigDecimal(Double.toString(v))
                .movePointRight(6).longValueExact()).toArray();
    }
}
