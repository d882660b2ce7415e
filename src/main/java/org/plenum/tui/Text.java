package org.plenum.tui;

import java.util.Locale;
import java.util.OptionalDouble;

/** Fitting and formatting text for fixed-width cells. */
final class Text {
    private Text() {}

    /** {@code text} cut to {@code width} columns, ending in the ellipsis when cut. */
    static String fit(String text, int width, Look look) {
        if (width <= 0) {
            return "";
        }
        String clean = text.replace('\t', ' ').replace('\n', ' ').replace('\r', ' ');
        if (clean.length() <= width) {
            return clean;
        }
        String ellipsis = look.ellipsis();
        return width <= ellipsis.length() ? clean.substring(0, width)
                : clean.substring(0, width - ellipsis.length()) + ellipsis;
    }

    /** Left-aligned in {@code width} columns. */
    static String pad(String text, int width, Look look) {
        String fitted = fit(text, width, look);
        return fitted + " ".repeat(Math.max(0, width - fitted.length()));
    }

    /** Right-aligned in {@code width} columns. */
    static String right(String text, int width, Look look) {
        String fitted = fit(text, width, look);
        return " ".repeat(Math.max(0, width - fitted.length())) + fitted;
    }

    /** A quantity for a narrow column: 1234, 12.5k, 3.4M; "-" when absent. */
    static String amount(OptionalDouble value) {
        return value.isPresent() ? amount(value.getAsDouble()) : "-";
    }

    static String amount(double v) {
        double a = Math.abs(v);
        if (a >= 1e9) {
            return String.format(Locale.ROOT, "%.1fG", v / 1e9);
        }
        if (a >= 1e6) {
            return String.format(Locale.ROOT, "%.1fM", v / 1e6);
        }
        if (a >= 1e4) {
            return String.format(Locale.ROOT, "%.1fk", v / 1e3);
        }
        if (a >= 100 || v == Math.rint(v)) {
            return String.format(Locale.ROOT, "%.0f", v);
        }
        return String.format(Locale.ROOT, "%.1f", v);
    }

    /** A ratio with two decimals, "-" when absent. */
    static String ratio(OptionalDouble value) {
        return value.isPresent() ? String.format(Locale.ROOT, "%.2f", value.getAsDouble()) : "-";
    }

    /** A fraction as signed points: 0.052 → "+5.2". */
    static String points(OptionalDouble value) {
        return value.isPresent() ? String.format(Locale.ROOT, "%+.1f", value.getAsDouble() * 100) : "-";
    }

    /** A fraction as a percentage: 0.052 → "5.2%". */
    static String percent(OptionalDouble value) {
        return value.isPresent() ? String.format(Locale.ROOT, "%.1f%%", value.getAsDouble() * 100) : "-";
    }

    static String minutes(long seconds) {
        return String.format(Locale.ROOT, "%d:%02d", seconds / 60, seconds % 60);
    }
}
