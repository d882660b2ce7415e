package org.plenum.tui;

import com.googlecode.lanterna.SGR;
import com.googlecode.lanterna.TextColor;
import java.util.Map;

/**
 * How the screen draws: the glyphs the terminal can show (Unicode blocks and lines, or plain
 * ASCII) and whether colour may be used ({@code NO_COLOR} set: bold and reverse only).
 *
 * @param sparks eight glyphs from lowest to highest, for sparklines and charts
 * @param rule the glyph of a horizontal rule
 * @param ellipsis what ends a truncated text
 * @param arrow what separates a value before and after a change
 */
public record Look(boolean unicode, boolean colour, String sparks, char rule, String ellipsis, String arrow,
        char fullBlock) {

    public static Look of(boolean unicode, boolean colour) {
        return unicode ? new Look(true, colour, "▁▂▃▄▅▆▇█", '─', "…", "→", '█')
                : new Look(false, colour, "_.-:=+*#", '-', "~", "->", '#');
    }

    /**
     * Unicode unless {@code ascii} is asked for or the locale (the first set of LC_ALL, LC_CTYPE,
     * LANG) does not say UTF-8; colour unless NO_COLOR is set (https://no-color.org).
     */
    public static Look fromEnvironment(Map<String, String> env, boolean ascii) {
        String locale = "";
        for (String name : new String[] {"LC_ALL", "LC_CTYPE", "LANG"}) {
            String value = env.get(name);
            if (value != null && !value.isEmpty()) {
                locale = value;
                break;
            }
        }
        String lower = locale.toLowerCase(java.util.Locale.ROOT);
        boolean utf8 = lower.contains("utf-8") || lower.contains("utf8");
        String noColor = env.get("NO_COLOR");
        return of(utf8 && !ascii, noColor == null || noColor.isEmpty());
    }

    /** A role a piece of text plays on screen. */
    public enum Role { PLAIN, TITLE, SELECTED, DIM, WARN, GOOD, BAD, BAR }

    TextColor foreground(Role role) {
        if (!colour) {
            return TextColor.ANSI.DEFAULT;
        }
        return switch (role) {
            case WARN -> TextColor.ANSI.YELLOW;
            case GOOD -> TextColor.ANSI.GREEN;
            case BAD -> TextColor.ANSI.RED;
            case DIM -> TextColor.ANSI.BLACK_BRIGHT;
            case TITLE -> TextColor.ANSI.CYAN;
            default -> TextColor.ANSI.DEFAULT;
        };
    }

    TextColor background(Role role) {
        return colour && role == Role.BAR ? TextColor.ANSI.BLUE : TextColor.ANSI.DEFAULT;
    }

    /** Selection and bars are reverse video with or without colour, so colour is never the only mark. */
    SGR[] modifiers(Role role) {
        return switch (role) {
            case SELECTED -> new SGR[] {SGR.REVERSE};
            case BAR -> colour ? new SGR[] {SGR.BOLD} : new SGR[] {SGR.REVERSE};
            case TITLE, WARN, BAD -> new SGR[] {SGR.BOLD};
            default -> new SGR[0];
        };
    }

    /** A sparkline of {@code values} scaled between their minimum and maximum; NaN draws a space. */
    public String sparkline(double[] values) {
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (double v : values) {
            if (!Double.isNaN(v)) {
                min = Math.min(min, v);
                max = Math.max(max, v);
            }
        }
        StringBuilder out = new StringBuilder();
        for (double v : values) {
            if (Double.isNaN(v)) {
                out.append(' ');
            } else {
                int level = max == min ? 3 : (int) Math.round((v - min) / (max - min) * 7);
                out.append(sparks.charAt(level));
            }
        }
        return out.toString();
    }
}
