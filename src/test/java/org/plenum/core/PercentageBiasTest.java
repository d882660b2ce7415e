package org.plenum.core;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class PercentageBiasTest {

    @ParameterizedTest(name = "BEER {0}: bias {1}")
    @CsvSource({"mean, 0.0326731", "naive, 0.1219165", "seasonal naive, -0.0123340"})
    void signsOverForecastsPositive(String method, double bias) {
        // METHODS A10 [computed here]: Σ(F − A)/ΣA on the BEER test quarters (±1e-6).
        assertEquals(bias, PercentageBias.of(AusBeer.TEST, WapeTest.beerForecast(method)).value().getAsDouble(), 1e-6);
    }

    @Test
    void isTheOppositeSignOfTheMeanError() {
        // METHODS A3 [printed]: seasonal naive ME = mean(A − F) = 5.2, so Σ(F − A) = −52 over 10 quarters.
        assertEquals(-52_000_000L, PercentageBias.of(AusBeer.TEST, AusBeer.SEASONAL_NAIVE).forecastMinusActualMicros());
    }

    @ParameterizedTest(name = "R2 {0}: bias {1}")
    @CsvSource({"naive, -0.0551948052", "stat, -0.0116883117", "final, 0.0162337662"})
    void poolsTheFvaFixture(String step, double bias) {
        long[] actual = FvaFixture.pooled(FvaFixture.Sku::actual);
        long[] forecast = FvaFixture.pooled(switch (step) {
            case "naive" -> FvaFixture.Sku::naive;
            case "stat" -> FvaFixture.Sku::stat;
            default -> FvaFixture.Sku::fin;
        });
        // METHODS R2 [computed here]: pooled percentage bias (1e-9).
        assertEquals(bias, PercentageBias.of(actual, forecast).value().getAsDouble(), 1e-9);
    }

    @Test
    void isExactlyZeroWhenOverAndUnderForecastsCancel() {
        // 0.21 − 0.20 and 0.19 − 0.20 cancel exactly in millionths (not in doubles).
        PercentageBias.Result result = PercentageBias.of(new long[] {200_000, 200_000}, new long[] {210_000, 190_000});
        assertEquals(0L, result.forecastMinusActualMicros());
        assertEquals(0.0, result.value().getAsDouble(), 0);
    }

    @Test
    void isUndefinedWhenActualsSumToZero() {
        assertEquals(OptionalDouble.empty(), PercentageBias.of(new long[0], new long[0]).value());
        assertEquals(OptionalDouble.empty(), PercentageBias.of(new long[] {0}, new long[] {5_000_000}).value());
    }

    @Test
    void refusesUnpairedArraysAndOverflow() {
        assertThrows(IllegalArgumentException.class, () -> PercentageBias.of(new long[1], new long[0]));
        ArithmeticException overflow = assertThrows(ArithmeticException.class,
                () -> PercentageBias.of(new long[] {Long.MAX_VALUE, 1}, new long[] {Long.MAX_VALUE, 1}));
        assertTrue(overflow.getMessage().contains("sum of actuals"), overflow.getMessage());
    }
}
