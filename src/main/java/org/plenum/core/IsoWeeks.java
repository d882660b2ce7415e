package org.plenum.core;

import java.time.DayOfWeek;
import java.time.LocalDate;

/**
 * ISO-8601 week-year rules, written out so that tests can check them against
 * {@code java.time.temporal.IsoFields} as an independent reference.
 */
final class IsoWeeks {
    private IsoWeeks() {}

    /** Week 1 is the week holding the year's first Thursday, so it holds 4 January. */
    static LocalDate mondayOfWeekOne(int year) {
        LocalDate fourth = LocalDate.of(year, 1, 4);
        return fourth.minusDays(fourth.getDayOfWeek().getValue() - 1L);
    }

    /** A year has 53 weeks when it starts on a Thursday, or is a leap year starting on a Wednesday. */
    static int weeksIn(int year) {
        DayOfWeek first = LocalDate.of(year, 1, 1).getDayOfWeek();
        boolean leap = LocalDate.of(year, 1, 1).isLeapYear();
        return first == DayOfWeek.THURSDAY || (leap && first == DayOfWeek.WEDNESDAY) ? 53 : 52;
    }

    /** The week-based year of the week starting on {@code monday}: the year of its Thursday. */
    static int weekYear(LocalDate monday) {
        return monday.plusDays(3).getYear();
    }
}
