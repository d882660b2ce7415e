package org.plenum.tui;

import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.input.KeyType;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.SortedMap;
import org.plenum.agenda.Advice;
import org.plenum.agenda.Proposal;
import org.plenum.app.DecisionRequest;
import org.plenum.core.Period;
import org.plenum.core.Quantity;
import org.plenum.core.ValueException;

/**
 * The adjustment form of UX.md: target periods (the decision lags preselected; Space toggles),
 * the new quantity (absolute {@code 1250} or relative {@code +12%}), a reason, an event tag and
 * the minutes spent (prefilled from the time the item has been open). As the planner types it
 * shows the change and the record of similar past decisions, and warns without blocking. Every
 * change is kept as a draft in the workspace, so a dropped connection loses nothing.
 */
final class AdjustForm implements View {
    enum Field { PERIODS, QUANTITY, REASON, TAG, MINUTES }

    private final Room room;
    private final ItemView item;
    private final List<Period> periods;
    private final boolean[] chosen;
    private final SortedMap<Period, Quantity> priors;
    private final List<String> tags;
    private final Map<Field, StringBuilder> text = new LinkedHashMap<>();
    private Field field = Field.QUANTITY;
    private int periodCursor;
    private int tag;
    private boolean discardAsked;
    private final String initial;

    AdjustForm(Room room, ItemView item, Optional<String> draft) {
        this.room = room;
        this.item = item;
        this.periods = new ArrayList<>(item.detail().steps().values().iterator().next().keySet());
        this.chosen = new boolean[periods.size()];
        for (int i = 0; i < periods.size(); i++) {
            chosen[i] = item.detail().decisionPeriods().contains(periods.get(i));
        }
        this.priors = room.meeting.priors(item.detail());
        this.tags = room.meeting.tags();
        this.tag = Math.max(0, tags.indexOf("other"));
        for (Field f : List.of(Field.QUANTITY, Field.REASON, Field.MINUTES)) {
            text.put(f, new StringBuilder());
        }
        String minutes = room.minutesOpen(item.code());
        text.get(Field.MINUTES).append(minutes == null ? "" : minutes);
        this.initial = encode();
        draft.ifPresent(d -> {
            decode(d);
            room.say("your unsaved input on " + item.code() + " is back");
        });
    }

    @Override
    public String name() {
        return "adjust " + item.code();
    }

    @Override
    public boolean holdsInput() {
        return !encode().equals(initial);
    }

    @Override
    public boolean handle(KeyStroke key) {
        boolean asked = discardAsked;
        discardAsked = false;
        String before = encode();
        if (Keys.type(key, KeyType.Escape)) {
            if (holdsInput() && !asked) {
                discardAsked = true;
                room.say("Esc again discards this input; any other key goes on", Look.Role.WARN);
            } else {
                room.meeting.dropDraft(item.code());
                room.back();
            }
            return true;
        }
        if (Keys.type(key, KeyType.Tab) || Keys.type(key, KeyType.ArrowDown)) {
            field = Field.values()[(field.ordinal() + 1) % Field.values().length];
        } else if (Keys.type(key, KeyType.ReverseTab) || Keys.type(key, KeyType.ArrowUp)) {
            field = Field.values()[(field.ordinal() + Field.values().length - 1) % Field.values().length];
        } else if (Keys.type(key, KeyType.Enter)) {
            save();
            return true;
        } else if (field == Field.PERIODS) {
            periodsKey(key);
        } else if (field == Field.TAG) {
            tagKey(key);
        } else {
            textKey(key, text.get(field));
        }
        if (!encode().equals(before)) {
            room.meeting.saveDraft(item.code(), encode());
        }
        return true;
    }

    private void periodsKey(KeyStroke key) {
        if (Keys.type(key, KeyType.ArrowLeft)) {
            periodCursor = Math.max(0, periodCursor - 1);
        } else if (Keys.type(key, KeyType.ArrowRight)) {
            periodCursor = Math.min(periods.size() - 1, periodCursor + 1);
        } else if (Keys.is(key, ' ')) {
            chosen[periodCursor] = !chosen[periodCursor];
        }
    }

    private void tagKey(KeyStroke key) {
        char c = Keys.typed(key);
        if (Keys.type(key, KeyType.ArrowLeft)) {
            tag = (tag + tags.size() - 1) % tags.size();
        } else if (Keys.type(key, KeyType.ArrowRight) || c == ' ') {
            tag = (tag + 1) % tags.size();
        } else if (c != 0) {
            for (int i = 1; i <= tags.size(); i++) {
                int candidate = (tag + i) % tags.size();
                if (tags.get(candidate).startsWith(String.valueOf(c).toLowerCase(Locale.ROOT))) {
                    tag = candidate;
                    break;
                }
            }
        }
    }

    private static void textKey(KeyStroke key, StringBuilder value) {
        if (Keys.type(key, KeyType.Backspace)) {
            if (value.length() > 0) {
                value.setLength(value.length() - 1);
            }
        } else if (Keys.typed(key) != 0) {
            value.append(Keys.typed(key));
        }
    }

    /** The quantity as typed: absolute, or a relative change in percent. */
    private record Change(String absolute, BigDecimal percent) {}

    private Optional<Change> change() {
        String typed = text.get(Field.QUANTITY).toString().strip();
        if (typed.isEmpty()) {
            return Optional.empty();
        }
        try {
            if (typed.endsWith("%")) {
                return Optional.of(new Change(null, new BigDecimal(typed.substring(0, typed.length() - 1).strip())));
            }
            Quantity.parse(typed);
            return Optional.of(new Change(typed, null));
        } catch (NumberFormatException | ValueException e) {
            return Optional.empty();
        }
    }

    private List<String> chosenPeriods() {
        List<String> out = new ArrayList<>();
        for (int i = 0; i < periods.size(); i++) {
            if (chosen[i]) {
                out.add(periods.get(i).toString());
            }
        }
        return out;
    }

    private void save() {
        List<String> problems = new ArrayList<>();
        if (chosenPeriods().isEmpty()) {
            problems.add("choose at least one period (Space)");
        }
        if (change().isEmpty()) {
            problems.add("type the new quantity, e.g. 1250, +12% or -30%");
        }
        String reason = text.get(Field.REASON).toString().strip();
        int words = reason.isEmpty() ? 0 : reason.split("\\s+").length;
        if (words < 2) {
            problems.add("say why in a few words");
        } else if (tags.get(tag).equals("other") && words < 3) {
            problems.add("tag \"other\": the reason must say what happened");
        }
        if (!problems.isEmpty()) {
            room.say(String.join("; ", problems), Look.Role.BAD);
            return;
        }
        Change c = change().orElseThrow();
        String minutes = text.get(Field.MINUTES).toString().strip();
        room.meeting.decide(new DecisionRequest(item.code(), room.meeting.cycle().toString(), chosenPeriods(),
                c.absolute(), c.percent(), false, reason, tags.get(tag), minutes.isEmpty() ? null : minutes, null, null));
        room.back();
        room.reload();
        room.say("saved: " + item.code() + " " + String.join(", ", chosenPeriods()) + " " + text.get(Field.QUANTITY));
    }

    /** Sum of the chosen periods' priors and of their new values, in millionths; empty without a valid quantity. */
    private Optional<long[]> totals() {
        Optional<Change> c = change();
        if (c.isEmpty()) {
            return Optional.empty();
        }
        long prior = 0;
        long next = 0;
        for (int i = 0; i < periods.size(); i++) {
            Quantity p = priors.get(periods.get(i));
            if (!chosen[i] || p == null) {
                continue;
            }
            prior += p.micros();
            next += c.get().absolute() != null ? Quantity.parse(c.get().absolute()).micros()
                    : p.toBigDecimal().multiply(BigDecimal.valueOf(100).add(c.get().percent()))
                            .divide(BigDecimal.valueOf(100)).movePointRight(Quantity.SCALE).longValue();
        }
        return Optional.of(new long[] {Math.max(0, prior), Math.max(0, next)});
    }

    @Override
    public void draw(Painter body) {
        item.draw(body.band(0, Math.max(0, body.rows() - 12)));
        Painter form = body.band(Math.max(0, body.rows() - 12), 12);
        form.clear();
        form.line(0, "adjust " + item.code() + "  (Tab next field, Enter save, Esc cancel)", Look.Role.TITLE);
        StringBuilder p = new StringBuilder();
        for (int i = 0; i < periods.size(); i++) {
            String box = chosen[i] ? "[x]" : "[ ]";
            Quantity prior = priors.get(periods.get(i));
            p.append(i == periodCursor && field == Field.PERIODS ? ">" : " ").append(box).append(periods.get(i))
                    .append(prior == null ? "" : "=" + prior).append(' ');
        }
        row(form, 1, Field.PERIODS, "periods", p.toString());
        row(form, 2, Field.QUANTITY, "quantity", text.get(Field.QUANTITY) + cursor(Field.QUANTITY)
                + "   (1250, +12%, -30%)");
        row(form, 3, Field.REASON, "reason", text.get(Field.REASON) + cursor(Field.REASON));
        row(form, 4, Field.TAG, "tag", (room.look.unicode() ? "◂ " : "< ") + tags.get(tag)
                + (room.look.unicode() ? " ▸" : " >") + "   (Left/Right or a letter)");
        row(form, 5, Field.MINUTES, "minutes", text.get(Field.MINUTES) + cursor(Field.MINUTES));
        Optional<long[]> totals = totals();
        if (totals.isEmpty()) {
            form.text(2, 7, "change: type a quantity to see it and the record of similar decisions", Look.Role.DIM);
            return;
        }
        long prior = totals.get()[0];
        long next = totals.get()[1];
        String pct = prior == 0 ? "from zero" : String.format(Locale.ROOT, "%+.1f%%", 100.0 * (next - prior) / prior);
        form.text(2, 7, "change: " + Quantity.format(prior) + " " + room.look.arrow() + " " + Quantity.format(next)
                + " (" + pct + ") over " + chosenPeriods().size() + " period(s)");
        Optional<Advice> advice = advice(prior, next);
        if (advice.isEmpty()) {
            form.text(2, 8, room.guidance == null ? "record of similar decisions: loading" + room.look.ellipsis()
                    : "no record: the item is not on this cycle's agenda", Look.Role.DIM);
            return;
        }
        Advice a = advice.get();
        form.text(2, 8, "similar decisions (" + a.pool() + "): " + a.count() + ", error ratio "
                + Text.ratio(a.errorRatio()) + ", right way " + Text.percent(a.shareRight()) + ", overshot "
                + Text.percent(a.shareOvershoot()));
        form.text(2, 9, a.sentence());
        for (int i = 0; i < a.warnings().size() && 10 + i < form.rows(); i++) {
            form.text(2, 10 + i, "warning: " + a.warnings().get(i), Look.Role.WARN);
        }
    }

    private Optional<Advice> advice(long prior, long next) {
        if (room.guidance == null) {
            return Optional.empty();
        }
        return room.row(item.code()).map(r -> room.guidance.advise(new Proposal(r.item().id(), prior, next)));
    }

    private String cursor(Field f) {
        return field == f ? "_" : "";
    }

    private void row(Painter form, int y, Field f, String label, String value) {
        form.text(0, y, (field == f ? "> " : "  ") + Text.pad(label, 9, room.look) + value,
                field == f ? Look.Role.SELECTED : Look.Role.PLAIN);
    }

    /** One {@code name=value} line per field; backslashes and line breaks escaped. */
    private String encode() {
        StringBuilder out = new StringBuilder();
        out.append("periods=").append(String.join(",", chosenPeriods())).append('\n');
        out.append("quantity=").append(escape(text.get(Field.QUANTITY).toString())).append('\n');
        out.append("reason=").append(escape(text.get(Field.REASON).toString())).append('\n');
        out.append("tag=").append(escape(tags.get(tag))).append('\n');
        out.append("minutes=").append(escape(text.get(Field.MINUTES).toString())).append('\n');
        return out.toString();
    }

    private void decode(String draft) {
        for (String line : draft.split("\n")) {
            int eq = line.indexOf('=');
            if (eq < 0) {
                continue;
            }
            String name = line.substring(0, eq);
            String value = unescape(line.substring(eq + 1));
            switch (name) {
                case "periods" -> {
                    List<String> wanted = List.of(value.split(","));
                    for (int i = 0; i < periods.size(); i++) {
                        chosen[i] = wanted.contains(periods.get(i).toString());
                    }
                }
                case "quantity" -> set(Field.QUANTITY, value);
                case "reason" -> set(Field.REASON, value);
                case "minutes" -> set(Field.MINUTES, value);
                case "tag" -> tag = Math.max(0, tags.indexOf(value)) ;
                default -> { }
            }
        }
    }

    private void set(Field f, String value) {
        text.get(f).setLength(0);
        text.get(f).append(value);
    }

    private static String escape(String s) {
        return s.replace("\\", "\\\\").replace("\n", "\\n");
    }

    private static String unescape(String s) {
        StringBuilder out = new StringBuilder();
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c == '\\' && i + 1 < s.length()) {
                char n = s.charAt(++i);
                out.append(n == 'n' ? '\n' : n);
            } else {
                out.append(c);
            }
        }
        return out.toString();
    }

    @Override
    public String hints() {
        return "Tab next  Shift-Tab back  Space toggle period  Enter save  Esc cancel";
    }

    @Override
    public List<String[]> help() {
        return List.of(new String[] {"Tab Shift-Tab", "next, previous field"},
                new String[] {"Left Right Space", "periods: move, toggle; tag: choose"},
                new String[] {"Enter", "save the decision (one ledger row per period)"},
                new String[] {"Esc", "cancel (asks when input would be lost)"});
    }
}
