package org.plenum.core;

import java.time.DayOfWeek;
import java.time.LocalDate;

/**
 * A month ({@code 2026-03}) or an ISO-8601 week ({@code 2026-W09}), as a position on a line of
 * equally spaced periods so that lags and seasonal offsets are plain subtraction.
 *
 * <p>The index of a month is {@code year * 12 + month - 1}. The index of a week is the number of
 * weeks from the Monday 1969-12-29 to the week's Monday, so ISO years of 52 and 53 weeks need no
 * special case in arithmetic: only parsing and printing know about them.
 */
public record Period(Frequency frequency, int index) implements Comparable<Period> {

    private static final long WEEK_ZERO_MONDAY = LocalDate.of(1969, 12, 29).toEpochDay();

    public Period {
        if (frequency == null) {
            throw new IllegalArgumentException("a period needs a frequency");
        }
    }

    public static Period month(int year, int month) {
        if (month < 1 || month > 12) {
            throw new IllegalArgumentException("month must be 1..12: " + month);
        }
        return new Period(Frequency.MONTHLY, year * 12 + month - 1);
    }

    /** ISO week {@code week} of ISO week-based year {@code year}. */
    public static Period week(int year, int week) {
        if (week < 1 || week > IsoWeeks.weeksIn(year)) {
            throw new IllegalArgumentException(
                    "week must be 1.." + IsoWeeks.weeksIn(year) + " in " + year + ": " + week);
        }
        long monday = IsoWeeks.mondayOfWeekOne(year).toEpochDay() + 7L * (week - 1);
        return new Period(Frequency.WEEKLY, Math.toIntExact((monday - WEEK_ZERO_MONDAY) / 7));
    }

    /** The week that contains {@code date}. */
    public static Period weekOf(LocalDate date) {
        long monday = date.with(DayOfWeek.MONDAY).toEpochDay();
        return new Period(Frequency.WEEKLY, Math.toIntExact(Math.floorDiv(monday - WEEK_ZERO_MONDAY, 7)));
    }

    /**
     * Reads {@code YYYY-MM} or {@code YYYY-Www}.
     *
     * @throws IllegalArgumentException naming what was expected, when the text is neither
     */
    public static Period parse(String text) {
        return PeriodParser.parse(text);
    }

    /**
     * Reads a period that must be of {@code expected} frequency (any, when {@code expected} is
     * null), the workspace's.
     *
     * @throws ValueException naming what was expected
     */
    public static Period parse(String text, Frequency expected) {
        Period p = parse(text);
        if (expected != null && p.frequency() != expected) {
            throw new ValueException("a " + expected.word() + " period " + expected.pattern());
        }
        return p;
    }

    /** The period {@code n} steps later (earlier when negative). */
    public Period plus(int n) {
        return new Period(frequency, Math.addExact(index, n));
    }

    /** How many periods {@code earlier} lies before this one: the lag of a forecast issued then. */
    public int minus(Period earlier) {
        requireSameFrequency(earlier);
        return index - earlier.index;
    }

    /** The period one season earlier: 12 months, or 52 weeks. */
    public Period seasonBefore() {
        return plus(-frequency.seasonLength());
    }

    public int year() {
        return frequency == Frequency.MONTHLY ? Math.floorDiv(index, 12) : IsoWeeks.weekYear(monday());
    }

    /** Month 1..12, or ISO week 1..53. */
    public int number() {
        if (frequency == Frequency.MONTHLY) {
            return Math.floorMod(index, 12) + 1;
        }
        return (int) ((monday().toEpochDay() - IsoWeeks.mondayOfWeekOne(year()).toEpochDay()) / 7) + 1;
    }

    /** The Monday that starts this week; only for weekly periods. */
    public LocalDate monday() {
        if (frequency != Frequency.WEEKLY) {
            throw new IllegalStateException("a month has no Monday: " + this);
        }
        return LocalDate.ofEpochDay(WEEK_ZERO_MONDAY + 7L * index);
    }

    @Override
    public int compareTo(Period other) {
        requireSameFrequency(other);
        return Integer.compare(index, other.index);
    }

    @Override
    public String toString() {
        return frequency == Frequency.MONTHLY
                ? String.format("%04d-%02d", year(), number())
                : String.format("%04d-W%02d", year(), number());
    }

    private void requireSameFrequency(Period other) {
        if (other.frequency != frequency) {
            throw new IllegalArgumentException("cannot compare " + this + " with " + other);
        }
    }
}
