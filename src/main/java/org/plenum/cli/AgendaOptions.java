package org.plenum.cli;

import java.util.TreeSet;
import org.plenum.agenda.AgendaSettings;
import org.plenum.app.UsageException;

/** Reads the agenda's options as typed; each problem is a usage error naming the option and what it expects. */
final class AgendaOptions {
    /** Longer than any review horizon: three years of weeks. */
    static final int MAX_LAG = 156;

    /** {@code 1-3}, {@code 2} or {@code 0,1,2}: distinct lags, ascending. */
    int[] lags(String text) {
        String expected = "--lags: expected a range like 1-3 or a list like 0,1,2 of lags from 0 to " + MAX_LAG
                + ", found \"" + text + "\"";
        TreeSet<Integer> lags = new TreeSet<>();
        for (String part : text.split(",", -1)) {
            String[] ends = part.strip().split("-", -1);
            if (ends.length > 2) {
                throw new UsageException(expected);
            }
            int from = lag(ends[0], expected);
            int to = ends.length == 2 ? lag(ends[1], expected) : from;
            if (to < from) {
                throw new UsageException(expected);
            }
            for (int l = from; l <= to; l++) {
                lags.add(l);
            }
        }
        return lags.stream().mapToInt(Integer::intValue).toArray();
    }

    private static int lag(String text, String expected) {
        if (!text.strip().matches("\\d{1,3}")) {
            throw new UsageException(expected);
        }
        int lag = Integer.parseInt(text.strip());
        if (lag > MAX_LAG) {
            throw new UsageException(expected);
        }
        return lag;
    }

    AgendaSettings settings(String budget, String eventFactor, String gainFloor, String abc,
            AgendaSettings.AbcBasis abcBy, String xyz) {
        AgendaSettings s = AgendaSettings.defaults()
                .withEventFactor(number("--event-factor", eventFactor, 1, 1000, true, "a factor of at least 1, like 1.5"))
                .withGainFloor(number("--gain-floor", gainFloor, 0, 1, true, "a fraction from 0 to below 1, like 0.05"));
        double[] shares = pair("--abc", abc, "two cumulative shares in percent, the first below the second, like 80,95");
        if (!(shares[0] > 0 && shares[0] < shares[1] && shares[1] <= 100)) {
            throw new UsageException("--abc: expected two cumulative shares in percent, 0 < A < B <= 100, like 80,95,"
                    + " found \"" + abc + "\"");
        }
        double[] cv = pair("--xyz", xyz, "two coefficients of variation, the first below the second, like 0.5,1.0");
        if (!(cv[0] > 0 && cv[0] < cv[1])) {
            throw new UsageException("--xyz: expected two coefficients of variation, 0 < X < Y, like 0.5,1.0, found \""
                    + xyz + "\"");
        }
        s = s.withAbc(shares[0] / 100, shares[1] / 100, abcBy).withXyz(cv[0], cv[1]);
        return budget == null ? s
                : s.withBudget(number("--budget", budget, 0, 100_000, false, "minutes greater than 0, like 90"));
    }

    /** A finite decimal in range; {@code lowInclusive} says whether {@code low} itself is allowed. */
    private static double number(String option, String text, double low, double high, boolean lowInclusive,
            String expected) {
        try {
            double v = Double.parseDouble(text.strip());
            boolean aboveLow = lowInclusive ? v >= low : v > low;
            if (Double.isFinite(v) && aboveLow && v < high && !text.strip().matches(".*[a-zA-Z].*")) {
                return v;
            }
        } catch (NumberFormatException e) {
            // fall through to the message
        }
        throw new UsageException(option + ": expected " + expected + ", found \"" + text + "\"");
    }

    private static double[] pair(String option, String text, String expected) {
        String[] parts = text.split(",", -1);
        if (parts.length != 2) {
            throw new UsageException(option + ": expected " + expected + ", found \"" + text + "\"");
        }
        return new double[] {number(option, parts[0], 0, 1e6, false, expected),
            number(option, parts[1], 0, 1e6, false, expected)};
    }
}
