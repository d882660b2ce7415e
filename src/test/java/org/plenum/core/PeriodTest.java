package org.plenum.core;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.DayOfWeek;
import java.time.LocalDate;
import java.time.YearMonth;
import java.time.temporal.ChronoUnit;
import java.time.temporal.IsoFields;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/** Period arithmetic, checked against java.time (an implementation of ISO 8601 outside our code). */
class PeriodTest {

    @Test
    void weekOfEveryDayMatchesIsoFields() {
        // Reference: java.time.temporal.IsoFields, ISO-8601 week-based year and week of that year.
        for (LocalDate d = LocalDate.of(1995, 1, 1); d.isBefore(LocalDate.of(2045, 1, 1)); d = d.plusDays(1)) {
            Period p = Period.weekOf(d);
            assertEquals(d.get(IsoFields.WEEK_BASED_YEAR), p.year(), d.toString());
            assertEquals(d.get(IsoFields.WEEK_OF_WEEK_BASED_YEAR), p.number(), d.toString());
            assertEquals(d.with(DayOfWeek.MONDAY), p.monday());
        }
    }

    @Test
    void weeksPerYearMatchIsoFields() {
        int fiftyThree = 0;
        for (int year = 1970; year <= 2100; year++) {
            long max = LocalDate.of(year, 6, 1).range(IsoFields.WEEK_OF_WEEK_BASED_YEAR).getMaximum();
            assertEquals(max, IsoWeeks.weeksIn(year), "ISO weeks in " + year);
            fiftyThree += max == 53 ? 1 : 0;
        }
        // 71 of every 400 ISO years have 53 weeks; 131 years hold 23 of them here (counted by java.time above).
        assertTrue(fiftyThree > 20 && fiftyThree < 26);
    }

    @Test
    void weekLagsEqualWeeksBetweenMondays() {
        // Lag arithmetic across 52- and 53-week years equals java.time's count of weeks between the Mondays.
        LocalDate start = LocalDate.of(2019, 12, 30);
        Period origin = Period.weekOf(start);
        for (int n = 0; n < 600; n += 7) {
            Period later = origin.plus(n);
            assertEquals(n, later.minus(origin));
            assertEquals(n, ChronoUnit.WEEKS.between(origin.monday(), later.monday()));
            assertEquals(later, Period.parse(later.toString()));
        }
    }

    @ParameterizedTest
    @CsvSource({
        "2026-W53, 1, 2027-W01", // 2026 has 53 ISO weeks (it starts on a Thursday)
        "2020-W53, 1, 2021-W01", // 2020: a leap year starting on a Wednesday
        "2021-W52, 1, 2022-W01", // 2021 has 52
        "2027-W01, -52, 2026-W02", // one season (52 weeks) back from a year after a 53-week year
        "2026-12, 1, 2027-01",
        "2026-01, -13, 2024-12",
    })
    void addsPeriods(String from, int n, String expected) {
        assertEquals(expected, Period.parse(from).plus(n).toString());
        assertEquals(n, Period.parse(expected).minus(Period.parse(from)));
    }

    @Test
    void monthsMatchYearMonth() {
        YearMonth ym = YearMonth.of(2019, 1);
        Period p = Period.month(2019, 1);
        for (int i = 0; i < 200; i++) {
            assertEquals(ym.plusMonths(i).toString(), p.plus(i).toString());
        }
        assertEquals("2025-12", Period.parse("2026-12").seasonBefore().toString());
    }

    @ParameterizedTest
    @ValueSource(strings = {"2026-13", "2026-00", "2025-W53", "2026-W54", "2026-W00", "2026-3", "26-03", "2026/03",
        " 2026-03", "2026-w05", "2026-W5", "", "2026-03-01", "0026-03", "3026-W09"})
    void refusesMalformedPeriods(String text) {
        ValueException e = assertThrows(ValueException.class, () -> Period.parse(text));
        assertTrue(e.expected().contains("period") || e.expected().contains("month") || e.expected().contains("week"));
    }

    @Test
    void ordersWithinOneFrequencyOnly() {
        assertTrue(Period.parse("2026-01").compareTo(Period.parse("2026-02")) < 0);
        assertThrows(IllegalArgumentException.class, () -> Period.parse("2026-01").compareTo(Period.parse("2026-W01")));
    }
}
