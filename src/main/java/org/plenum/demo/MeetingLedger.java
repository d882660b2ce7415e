package org.plenum.demo;

import java.time.DayOfWeek;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.temporal.TemporalAdjusters;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * Turns the simulated reviews of the recent cycles into ledger rows with meeting timestamps.
 *
 * <p>Each cycle's meeting starts at 09:00 UTC on the first Wednesday of the cycle month and walks
 * through the items group by group, in id order; a discussion is recorded when it starts and the
 * clock moves on by its length. A discussion's minutes are shared equally among its rows (one row
 * per changed or looked-at period), so summing a cycle's minutes gives the meeting's length.
 */
final class MeetingLedger {

    private MeetingLedger() {
    }

    /** Ledger rows of cycles FIRST_LEDGER_CYCLE … UPCOMING_CYCLE−1, by cycle, time, item, period. */
    static List<Decision> decisions(List<ItemPlan> plans) {
        List<ItemPlan> order = new ArrayList<>(plans);
        order.sort(Comparator.comparing((ItemPlan p) -> p.item().group()).thenComparing(p -> p.item().id()));
        List<Decision> out = new ArrayList<>();
        for (int c = DemoMonths.FIRST_LEDGER_CYCLE; c < DemoMonths.UPCOMING_CYCLE; c++) {
            Instant clock = meetingStart(c);
            for (ItemPlan plan : order) {
                Review review = plan.review(c);
                if (review != null) {
                    out.addAll(rows(plan.item().id(), c, review, clock));
                    clock = clock.plusSeconds(Math.round(review.minutes() * 60));
                }
            }
        }
        return out;
    }

    static Instant meetingStart(int cycle) {
        return DemoMonths.month(cycle).atDay(1).with(TemporalAdjusters.firstInMonth(DayOfWeek.WEDNESDAY))
                .atTime(9, 0).toInstant(ZoneOffset.UTC);
    }

    private static List<Decision> rows(String item, int cycle, Review review, Instant at) {
        boolean[] covered = review.reviewed();
        int count = 0;
        for (boolean c : covered) {
            count += c ? 1 : 0;
        }
        double share = Math.max(0.1, Math.round(review.minutes() / count * 10) / 10.0);
        List<Decision> out = new ArrayList<>();
        for (int lag = 0; lag < covered.length; lag++) {
            if (covered[lag]) {
                out.add(new Decision(item, cycle, cycle + lag, review.direction() != Direction.KEEP,
                        review.finals()[lag], review.reason(), review.tag(), review.author(), share, at));
            }
        }
        return out;
    }
}
