package org.plenum.core;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

class QuantityTest {

    @ParameterizedTest
    @CsvSource({"0,0", "1250,1250000000", "12.5,12500000", "0.000001,1", "7.100000,7100000", "00012.25,12250000"})
    void parsesExactly(String text, long micros) {
        assertEquals(micros, Quantity.parse(text).micros());
        // Reference: java.math.BigDecimal reading the same text.
        assertEquals(new BigDecimal(text).movePointRight(6).longValueExact(), micros);
    }

    @Test
    void subtractsExactlyWhereDoublesDoNot() {
        // In IEEE 754 doubles 0.21 - 0.20 is 0.009999999999999981, not 0.01 (the reason quantities are scaled).
        assertTrue(0.21 - 0.20 != 0.01);
        assertEquals(10_000, Quantity.parse("0.21").minusMicros(Quantity.parse("0.20")));
        assertEquals(Quantity.parse("0.01").micros(), Quantity.parse("0.21").minusMicros(Quantity.parse("0.20")));
    }

    @ParameterizedTest
    @ValueSource(strings = {"-5", "-0.5", "1.0000001", "1e3", "1,000", "12,5", " 12", "12 ", "+3", "", ".5", "5.",
        "abc", "NaN", "1234567890123"})
    void refusesWhatIsNotAPlainNonNegativeDecimal(String text) {
        assertThrows(ValueException.class, () -> Quantity.parse(text));
    }

    @Test
    void namesWhatWasExpected() {
        assertEquals("a non-negative quantity", assertThrows(ValueException.class, () -> Quantity.parse("-3")).expected());
        assertEquals("at most 6 decimal places",
                assertThrows(ValueException.class, () -> Quantity.parse("1.1234567")).expected());
    }

    @Test
    void printsWithoutTrailingZeros() {
        assertEquals("12.5", Quantity.parse("12.500").toString());
        assertEquals("1250", Quantity.parse("1250").toString());
        assertEquals("-0.25", Quantity.format(-250_000));
    }
}
