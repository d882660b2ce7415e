package org.plenum.core;

import java.math.BigDecimal;
import java.math.RoundingMode;

/**
 * A non-negative demand or forecast quantity held exactly, in millionths of a unit.
 *
 * <p>Scoring compares differences with zero and with size-class boundaries, which binary floating
 * point gets wrong ({@code 0.21 - 0.20 != 0.01} in doubles), so quantities are subtracted as
 * scaled integers and turned into {@code double} only for ratios, logs and means.
 */
public record Quantity(long micros) implements Comparable<Quantity> {
    public static final int SCALE = 6;
    public static final Quantity ZERO = new Quantity(0);
    private static final long UNIT = 1_000_000L;
    /** Whole units are capped so that sums of a few million quantities cannot overflow a long. */
    private static final int MAX_WHOLE_DIGITS = 12;

    public Quantity {
        if (micros < 0) {
            throw new IllegalArgumentException("a quantity cannot be negative: " + micros + " micros");
        }
    }

    /**
     * Reads a plain decimal such as {@code 1250}, {@code 0.5} or {@code 12.000001}.
     *
     * @throws ValueException for signs, exponents, separators, more than 6 decimals, or any other text
     */
    public static Quantity parse(String text) {
        return new Quantity(parseMicros(text));
    }

    /** The same as {@link #parse} without the allocation, for bulk readers. */
    public static long parseMicros(String text) {
        int n = text.length();
        if (n > 0 && text.charAt(0) == '-' && n > 1 && Character.isDigit(text.charAt(1))) {
            throw new ValueException("a non-negative quantity");
        }
        long whole = 0;
        int i = 0;
        while (i < n && isDigit(text.charAt(i))) {
            whole = whole * 10 + (text.charAt(i++) - '0');
            if (i > MAX_WHOLE_DIGITS) {
                throw new ValueException("a quantity below 10^12");
            }
        }
        if (i == 0 || (i < n && text.charAt(i) != '.')) {
            throw new ValueException("a non-negative decimal number like 1250 or 12.5");
        }
        return whole * UNIT + fractionMicros(text, i);
    }

    private static long fractionMicros(String text, int dot) {
        int n = text.length();
        if (dot == n) {
            return 0;
        }
        if (dot == n - 1) {
            throw new ValueException("digits after the decimal point");
        }
        if (n - dot - 1 > SCALE) {
            throw new ValueException("at most 6 decimal places");
        }
        long fraction = 0;
        for (int i = dot + 1; i < n; i++) {
            char c = text.charAt(i);
            if (!isDigit(c)) {
                throw new ValueException("a non-negative decimal number like 1250 or 12.5");
            }
            fraction = fraction * 10 + (c - '0');
        }
        for (int i = n - dot - 1; i < SCALE; i++) {
            fraction *= 10;
        }
        return fraction;
    }

    private static boolean isDigit(char c) {
        return c >= '0' && c <= '9';
    }

    /** The exact quantity nearest to {@code value}, halves to even. */
    public static Quantity of(BigDecimal value) {
        BigDecimal micros = value.setScale(SCALE, RoundingMode.HALF_EVEN).movePointRight(SCALE);
        return new Quantity(micros.longValueExact());
    }

    public static Quantity ofUnits(long units) {
        return new Quantity(Math.multiplyExact(units, UNIT));
    }

    public BigDecimal toBigDecimal() {
        return BigDecimal.valueOf(micros, SCALE);
    }

    /** This minus {@code other}, exactly, as millionths of a unit (may be negative). */
    public long minusMicros(Quantity other) {
        return Math.subtractExact(micros, other.micros);
    }

    public boolean isZero() {
        return micros == 0;
    }

    @Override
    public int compareTo(Quantity other) {
        return Long.compare(micros, other.micros);
    }

    /** Plain decimal without trailing zeros: {@code 1250}, {@code 12.5}. */
    @Override
    public String toString() {
        return format(micros);
    }

    /** Plain decimal of a signed number of millionths, without trailing zeros. */
    public static String format(long micros) {
        return BigDecimal.valueOf(micros, SCALE).stripTrailingZeros().toPlainString();
    }
}
