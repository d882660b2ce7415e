package org.plenum.core;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class WapeTest {

    static long[] beerForecast(String method) {
        return switch (method) {
            case "mean" -> AusBeer.MEAN;
            case "naive" -> AusBeer.NAIVE;
            case "seasonal naive" -> AusBeer.SEASONAL_NAIVE;
            case "drift" -> AusBeer.drift();
            default -> throw new IllegalArgumentException(method);
        };
    }

    @ParameterizedTest(name = "BEER {0}: WAPE {1}")
    @CsvSource({
        // method,         WAPE,      accuracy
        "mean,           0.0826020, 0.9173980",
        "naive,          0.1361480, 0.8638520",
        "seasonal naive, 0.0317837, 0.9682163"})
    void weighsBeerTestErrorsByVolume(String method, double wape, double accuracy) {
        Wape.Result result = Wape.of(AusBeer.TEST, beerForecast(method));
        // METHODS A10 [computed here]: ΣA = 4216, WAPE and accuracy = 1 − WAPE (±1e-6).
        assertEquals(4216_000_000L, result.absoluteActualMicros());
        assertEquals(wape, result.value().getAsDouble(), 1e-6);
        assertEquals(accuracy, result.accuracy().getAsDouble(), 1e-6);
    }

    @ParameterizedTest(name = "BEER {0}: MAE {1}")
    @CsvSource({"mean, 34.825", "naive, 57.4", "seasonal naive, 13.4", "drift, 58.87619"})
    void givesTheBeerTestMae(String method, double mae) {
        // METHODS A1–A4 [printed]: R forecast::accuracy test-set MAE (±5e-6).
        assertEquals(mae, Wape.of(AusBeer.TEST, beerForecast(method)).meanAbsoluteError().getAsDouble(), 5e-6);
    }

    @Test
    void keepsTheSumsExact() {
        // METHODS A10 [computed here]: seasonal naive Σ|e| = 134, mean Σ|e| = 348.25.
        assertEquals(134_000_000L, Wape.of(AusBeer.TEST, AusBeer.SEASONAL_NAIVE).absoluteErrorMicros());
        assertEquals(348_250_000L, Wape.of(AusBeer.TEST, AusBeer.MEAN).absoluteErrorMicros());
    }

    @ParameterizedTest(name = "R2 {0}: WAPE {1}, MAE {2}")
    @CsvSource({"naive, 0.1331168831, 17.0833333333, 205", "stat, 0.0545454545, 7.0, 84", "final, 0.0525974026, 6.75, 81"})
    void poolsTheFvaFixture(String step, double wape, double mae, long absErrorUnits) {
        long[] actual = FvaFixture.pooled(FvaFixture.Sku::actual);
        long[] forecast = FvaFixture.pooled(switch (step) {
            case "naive" -> FvaFixture.Sku::naive;
            case "stat" -> FvaFixture.Sku::stat;
            default -> FvaFixture.Sku::fin;
        });
        Wape.Result result = Wape.of(actual, forecast);
        // METHODS R2 [computed here]: Σ|e| N 205, S 84, F 81; ΣA = 1540; pooled WAPE and MAE (1e-9).
        assertEquals(absErrorUnits * 1_000_000L, result.absoluteErrorMicros());
        assertEquals(1540_000_000L, result.absoluteActualMicros());
        assertEquals(wape, result.value().getAsDouble(), 1e-9);
        assertEquals(mae, result.meanAbsoluteError().getAsDouble(), 1e-9);
    }

    @Test
    void isUndefinedWithoutVolume() {
        assertEquals(OptionalDouble.empty(), Wape.of(new long[0], new long[0]).value());
        assertEquals(OptionalDouble.empty(), Wape.of(new long[0], new long[0]).meanAbsoluteError());
        Wape.Result zeroActuals = Wape.of(new long[] {0, 0}, new long[] {3_000_000, 1_000_000});
        assertEquals(OptionalDouble.empty(), zeroActuals.value());
        assertEquals(OptionalDouble.empty(), zeroActuals.accuracy());
        assertEquals(2.0, zeroActuals.meanAbsoluteError().getAsDouble(), 0);
    }

    @Test
    void copesWithSingleZeroActuals() {
        // Σ|e| = 1 + 2, ΣA = 0 + 10: the zero actual does not break the measure (Kolassa & Schütz 2007).
        assertEquals(0.3, Wape.of(new long[] {0, 10_000_000}, new long[] {1_000_000, 8_000_000}).value().getAsDouble(), 1e-15);
    }

    @Test
    void leavesAccuracyUnflooredWhenErrorsExceedVolume() {
        // Σ|e| = 30 against ΣA = 10: WAPE 3, accuracy −2 (a screen floors it, an export does not).
        assertEquals(-2.0, Wape.of(new long[] {10_000_000}, new long[] {40_000_000}).accuracy().getAsDouble(), 0);
    }

    @Test
    void refusesUnpairedArrays() {
        assertThrows(IllegalArgumentException.class, () -> Wape.of(new long[2], new long[3]));
    }

    @Test
    void saysWhichSumOverflowed() {
        long big = Long.MAX_VALUE / 2 + 1;
        ArithmeticException overflow = assertThrows(ArithmeticException.class,
                () -> Wape.of(new long[] {big, big}, new long[] {0, 0}));
        assertTrue(overflow.getMessage().contains("sum of absolute errors"), overflow.getMessage());
    }
}
