package org.plenum.app;

import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.plenum.core.Decision;
import org.plenum.core.Quantity;
import org.plenum.store.Meetings;

/**
 * The minutes of a meeting as Markdown: the record a facilitator circulates afterwards. Pure:
 * composed from the meeting's state, written by the caller.
 */
final class MeetingMinutes {
    private static final DateTimeFormatter TIME = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm 'UTC'", Locale.ROOT)
            .withZone(ZoneOffset.UTC);

    private MeetingMinutes() {}

    static String markdown(Meeting.State state, Instant end, int totalMinutes, List<String> notReached) {
        Meetings.Meeting m = state.meeting();
        StringBuilder out = new StringBuilder();
        out.append("# Minutes of the demand review, cycle ").append(m.cycle()).append("\n\n");
        out.append("- Facilitator: ").append(escape(m.facilitator())).append('\n');
        out.append("- Took part: ").append(String.join(", ", state.people().stream()
                .map(p -> escape(p.name())).toList())).append('\n');
        out.append("- Started ").append(TIME.format(m.startedAt())).append(", ended ").append(TIME.format(end))
                .append(": ").append(totalMinutes).append(" minutes");
        if (m.budgetMinutes() != null) {
            int over = totalMinutes - m.budgetMinutes();
            out.append(" of a ").append(m.budgetMinutes()).append("-minute budget")
                    .append(over > 0 ? " (" + over + " over)" : over < 0 ? " (" + -over + " to spare)" : "");
        }
        out.append('\n');
        Map<String, List<Decision>> byItem = discussed(state);
        long decisionMicros = 0;
        out.append("\n## Items discussed, in order\n\n");
        if (byItem.isEmpty()) {
            out.append("None.\n");
        }
        int n = 0;
        for (Map.Entry<String, List<Decision>> e : byItem.entrySet()) {
            out.append(++n).append(". **").append(escape(e.getKey())).append("**: ")
                    .append(state.status(e.getKey()).word()).append('\n');
            for (Decision d : e.getValue()) {
                decisionMicros += d.minutes() == null ? 0 : d.minutes().micros();
                out.append("   - ").append(d.period()).append(": ")
                        .append(d.kept() ? "kept at " + d.quantity() : d.prior() + " → " + d.quantity() + " ("
                                + change(d) + ")")
                        .append(", ").append(escape(d.author()))
                        .append(d.minutes() == null ? "" : ", " + d.minutes() + " min")
                        .append(", tag ").append(escape(d.tag()))
                        .append(d.supersedes() != null ? ", corrects an earlier entry" : "")
                        .append(": ").append(escape(d.reason())).append('\n');
            }
        }
        out.append("\n## Not reached (below the cut line)\n\n");
        if (notReached.isEmpty()) {
            out.append("None.\n");
        }
        for (String item : notReached) {
            out.append("- ").append(escape(item)).append('\n');
        }
        out.append("\n## Time\n\n- Minutes logged on decisions: ").append(Quantity.format(decisionMicros))
                .append("\n- Meeting time used: ").append(totalMinutes).append(m.budgetMinutes() == null ? ""
                        : " of " + m.budgetMinutes()).append(" minutes\n");
        return out.toString();
    }

    /** Items in the order they were first tabled or decided, each with its standing decisions. */
    private static Map<String, List<Decision>> discussed(Meeting.State state) {
        record Touch(Instant at, String item) {}
        List<Touch> touches = new ArrayList<>();
        state.tabled().forEach(t -> touches.add(new Touch(t.at(), t.item())));
        state.decisions().forEach(d -> touches.add(new Touch(d.recordedAt(), d.item())));
        touches.sort(java.util.Comparator.comparing(Touch::at));
        Map<String, List<Decision>> byItem = new LinkedHashMap<>();
        touches.forEach(t -> byItem.putIfAbsent(t.item(), new ArrayList<>()));
        for (Decision d : state.decisions()) {
            if (d.supersededBy() == null) {
                byItem.get(d.item()).add(d);
            }
        }
        return byItem;
    }

    private static String change(Decision d) {
        if (d.prior().isZero()) {
            return "from zero";
        }
        double pct = 100.0 * d.changeMicros() / d.prior().micros();
        return String.format(Locale.ROOT, "%+.1f%%", pct);
    }

    /** Typed text cannot start a heading, a list or a link, or break the line it is on. */
    static String escape(String text) {
        StringBuilder out = new StringBuilder();
        for (char ch : text.replaceAll("\\s+", " ").strip().toCharArray()) {
            if ("\\`*_[]<>#|".indexOf(ch) >= 0) {
                out.append('\\');
            }
            out.append(ch);
        }
        return out.toString();
    }
}
