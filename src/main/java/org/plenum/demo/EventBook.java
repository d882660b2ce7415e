package org.plenum.demo;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * The events of one item and what they do to its demand: a factor per month that multiplies the
 * item's regular demand. At most one event per tag and month, so event keys never repeat.
 */
final class EventBook {

    private final String item;
    private final double[] factor = new double[DemoMonths.SIMULATED];
    private final Map<Integer, Map<EventTag, String>> notes = new TreeMap<>();

    EventBook(String item) {
        this.item = item;
        Arrays.fill(factor, 1);
    }

    boolean has(int month, EventTag tag) {
        return notes.getOrDefault(month, Map.of()).containsKey(tag);
    }

    boolean hasAny(int month) {
        return notes.containsKey(month);
    }

    /** Tags {@code month} and scales that month's demand; ignored if the tag is already there. */
    void once(int month, EventTag tag, String note, double scale) {
        if (month < 0 || month >= factor.length || has(month, tag)) {
            return;
        }
        notes.computeIfAbsent(month, m -> new EnumMap<>(EventTag.class)).put(tag, note);
        factor[month] *= scale;
    }

    /** Tags {@code month} and scales demand from that month on: a lasting change of level. */
    void from(int month, EventTag tag, String note, double scale) {
        if (month < 0 || month >= factor.length || has(month, tag)) {
            return;
        }
        once(month, tag, note, scale);
        for (int t = month + 1; t < factor.length; t++) {
            factor[t] *= scale;
        }
    }

    /** Scales one month without tagging it, for knock-on effects nobody records. */
    void untagged(int month, double scale) {
        if (month >= 0 && month < factor.length) {
            factor[month] *= scale;
        }
    }

    double factor(int month) {
        return factor[month];
    }

    /** All events, by month and then tag order. */
    List<DemoEvent> events() {
        List<DemoEvent> out = new ArrayList<>();
        notes.forEach((month, byTag) -> byTag.forEach((tag, note) -> out.add(new DemoEvent(item, month, tag, note))));
        out.sort(Comparator.comparingInt(DemoEvent::period).thenComparing(DemoEvent::tag));
        return out;
    }
}
