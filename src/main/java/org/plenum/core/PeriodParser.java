package org.plenum.core;

/** Strict reading of {@code YYYY-MM} and {@code YYYY-Www}: no spaces, no short forms. */
final class PeriodParser {
    private PeriodParser() {}

    /** Demand history and forecasts lie in these years; anything else is a typo such as 0026. */
    static final int FIRST_YEAR = 1900;
    static final int LAST_YEAR = 2999;

    static Period parse(String text) {
        Period p = parseAnyYear(text);
        if (p.year() < FIRST_YEAR || p.year() > LAST_YEAR) {
            throw new ValueException("a period in the years " + FIRST_YEAR + " to " + LAST_YEAR);
        }
        return p;
    }

    private static Period parseAnyYear(String text) {
        if (text != null && text.length() == 7 && digits(text, 0, 4) && text.charAt(4) == '-' && digits(text, 5, 7)) {
            int month = Integer.parseInt(text.substring(5, 7));
            if (month >= 1 && month <= 12) {
                return Period.month(Integer.parseInt(text.substring(0, 4)), month);
            }
            throw new ValueException("a month 01..12 in YYYY-MM");
        }
        if (text != null && text.length() == 8 && digits(text, 0, 4) && text.startsWith("-W", 4) && digits(text, 6, 8)) {
            int year = Integer.parseInt(text.substring(0, 4));
            int week = Integer.parseInt(text.substring(6, 8));
            if (week >= 1 && week <= IsoWeeks.weeksIn(year)) {
                return Period.week(year, week);
            }
            throw new ValueException("a week 01.." + IsoWeeks.weeksIn(year) + " of " + year);
        }
        throw new ValueException("a period YYYY-MM (like 2026-03) or YYYY-Www (like 2026-W09)");
    }

    private static boolean digits(String s, int from, int to) {
        for (int i = from; i < to; i++) {
            char c = s.charAt(i);
            if (c < '0' || c > '9') {
                return false;
            }
        }
        return true;
    }
}
