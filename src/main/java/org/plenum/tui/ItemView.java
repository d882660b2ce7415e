package org.plenum.tui;

import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.input.KeyType;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.SortedMap;
import org.plenum.agenda.AgendaRow;
import org.plenum.app.Meeting;
import org.plenum.core.Decision;
import org.plenum.core.Period;
import org.plenum.core.Quantity;
import org.plenum.score.AdjustmentOutcome;

/**
 * One item: its history chart with the statistical forecast and the meeting's decisions drawn
 * after it (the chart's numbers one key away), the target periods with every step's value and
 * who decided, its own and its group's track record, and its past decisions with their outcomes.
 */
final class ItemView implements View {
    /** Periods of history the chart shows before the cycle. */
    static final int HISTORY = 30;

    private final Room room;
    private final boolean full;
    private String code;
    private Meeting.ItemDetail detail;
    private boolean numbers;

    ItemView(Room room, String code) {
        this(room, code, false);
    }

    /** @param full the view shown with {@code 4}: without the key line, for a shared screen */
    ItemView(Room room, String code, boolean full) {
        this.room = room;
        this.full = full;
        show(code);
    }

    private void show(String item) {
        code = item;
        detail = room.meeting.item(item);
        room.opened(item);
    }

    String code() {
        return code;
    }

    boolean full() {
        return full;
    }

    Meeting.ItemDetail detail() {
        return detail;
    }

    @Override
    public String name() {
        return "item " + code;
    }

    @Override
    public void refreshed() {
        detail = room.meeting.item(code);
    }

    /** Opens the adjustment form on this item, offering back a draft left unsaved. */
    void adjust() {
        if (detail.decisionPeriods().isEmpty()) {
            room.say(code + " has no target period at the decision lags in this cycle", Look.Role.WARN);
            return;
        }
        room.open(new AdjustForm(room, this, room.meeting.draft(code)));
    }

    @Override
    public boolean handle(KeyStroke key) {
        char c = Keys.typed(key);
        switch (c) {
            case 'a' -> adjust();
            case 'k' -> room.keep(code);
            case 't' -> room.table(code);
            case 'v' -> numbers = !numbers;
            case 'n', 'p' -> {
                Optional<String> next = room.neighbour(code, c == 'n' ? 1 : -1);
                next.ifPresentOrElse(this::show, () -> room.say(c == 'n' ? "last item of the agenda"
                        : "first item of the agenda"));
            }
            default -> {
                return Keys.type(key, KeyType.Enter) && adjustOnEnter();
            }
        }
        return true;
    }

    private boolean adjustOnEnter() {
        adjust();
        return true;
    }

    @Override
    public void draw(Painter body) {
        Look look = room.look;
        Optional<AgendaRow> row = room.row(code);
        String group = detail.item().group() == null ? "no group" : "group " + detail.item().group();
        body.text(0, 0, code + "  " + detail.item().description() + "  " + group
                + (detail.item().region() == null ? "" : "  region " + detail.item().region())
                + row.map(r -> "  class " + r.abc() + r.xyz()).orElse("")
                + "  " + room.state.status(code).word(), Look.Role.TITLE);
        body.text(0, 1, row.map(this::numbersLine).orElse("not on this cycle's agenda"), Look.Role.PLAIN);
        int y = 2;
        int chartHeight = Math.max(3, Math.min(8, body.rows() - 14));
        if (numbers) {
            y = chartNumbers(body, y, chartHeight + 1);
        } else {
            y = chart(body, y, chartHeight);
        }
        y = targets(body, y + 1);
        past(body, y + 1);
    }

    private String numbersLine(AgendaRow r) {
        String unit = r.stake().unitValue().isPresent() ? "" : " units";
        String record = String.format(Locale.ROOT, "track %s (own %s, n %d; %s %s)", Text.ratio(
                OptionalDouble.of(r.trackRecord().shrunk())), Text.ratio(r.trackRecord().own()), r.trackRecord().n(),
                detail.item().group() == null ? "workspace" : "group", Text.ratio(OptionalDouble.of(
                        r.trackRecord().parent())));
        return String.format(Locale.ROOT, "rank %d  stake %s%s (%s MAE %s x %d)  %s  %s  gain %+.0f%%  prio %s%s",
                r.rank(), Text.amount(r.stake().value()), unit, r.stake().basis().word(), Text.amount(r.stake().mae()),
                r.stake().periods(), record, r.trackRecord().evidence().label().text(), r.trackRecord().gain() * 100,
                Text.amount(r.priority()), r.tags().isEmpty() ? "" : "  tags " + String.join(",", r.tags()))
                + (r.handsOff() ? "  HANDS OFF: review has made this worse" : "");
    }

    /** History before the cycle, then the target periods: the decision where there is one, else the first step. */
    private List<Period> chartPeriods() {
        Period cycle = room.meeting.cycle();
        List<Period> periods = new ArrayList<>();
        for (int i = HISTORY; i >= 1; i--) {
            periods.add(cycle.plus(-i));
        }
        SortedMap<Period, Quantity> first = firstStep();
        for (Period p : first.keySet()) {
            if (p.compareTo(cycle) >= 0) {
                periods.add(p);
            }
        }
        return periods;
    }

    private SortedMap<Period, Quantity> firstStep() {
        return detail.steps().values().iterator().next();
    }

    private SortedMap<Period, Quantity> ledgerStepDecisions() {
        SortedMap<Period, Quantity> out = new java.util.TreeMap<>();
        for (Decision d : standingThisCycle()) {
            out.put(d.period(), d.quantity());
        }
        return out;
    }

    private List<Decision> standingThisCycle() {
        List<Decision> out = new ArrayList<>();
        for (Meeting.PastDecision p : detail.past()) {
            Decision d = p.decision();
            if (d.cycle().equals(room.meeting.cycle()) && d.supersededBy() == null) {
                out.add(d);
            }
        }
        return out;
    }

    private int chart(Painter body, int y, int height) {
        Period cycle = room.meeting.cycle();
        SortedMap<Period, Quantity> first = firstStep();
        SortedMap<Period, Quantity> decided = ledgerStepDecisions();
        List<Period> periods = chartPeriods();
        int labelWidth = 7;
        int width = Math.max(0, body.columns() - labelWidth - 1);
        if (periods.size() > width) {
            periods = periods.subList(periods.size() - width, periods.size());
        }
        List<HistoryChart.Bar> bars = new ArrayList<>();
        for (Period p : periods) {
            boolean target = p.compareTo(cycle) >= 0;
            Quantity q = target ? first.get(p) : detail.actuals().get(p);
            Quantity mark = target ? decided.get(p) : null;
            bars.add(new HistoryChart.Bar(q == null ? Double.NaN : units(q), target,
                    mark == null ? Double.NaN : units(mark)));
        }
        List<String> lines = HistoryChart.lines(bars, height, labelWidth, room.look);
        for (int i = 0; i < lines.size(); i++) {
            body.text(0, y + i, lines.get(i));
        }
        y += lines.size();
        if (!periods.isEmpty()) {
            int now = periods.indexOf(cycle.plus(-1));
            String axis = " ".repeat(labelWidth) + periods.get(0);
            String legend = "  " + room.look.fullBlock() + " actual  " + (room.look.unicode() ? "▒" : "+") + " "
                    + detail.steps().keySet().iterator().next() + "  " + (room.look.unicode() ? "◆" : "o") + " decided";
            body.text(0, y, axis + legend, Look.Role.DIM);
            if (now >= 0) {
                body.text(labelWidth + now, y + 1, "^ " + cycle.plus(-1) + ", last period before the cycle",
                        Look.Role.DIM);
            }
            y += 2;
        }
        return y;
    }

    private int chartNumbers(Painter body, int y, int rows) {
        Period cycle = room.meeting.cycle();
        List<Period> periods = chartPeriods();
        SortedMap<Period, Quantity> first = firstStep();
        body.text(0, y++, "the chart's numbers (v: chart)", Look.Role.DIM);
        int perLine = Math.max(1, body.columns() / 16);
        int needed = (periods.size() + perLine - 1) / perLine;
        int start = Math.max(0, needed - rows) * perLine;
        StringBuilder line = new StringBuilder();
        int n = 0;
        for (int i = start; i < periods.size(); i++) {
            Period p = periods.get(i);
            Quantity q = p.compareTo(cycle) >= 0 ? first.get(p) : detail.actuals().get(p);
            line.append(Text.pad(p + (p.compareTo(cycle) >= 0 ? "f" : "") + " " + (q == null ? "-" : q), 16, room.look));
            if (++n % perLine == 0) {
                body.text(0, y++, line.toString());
                line.setLength(0);
            }
        }
        if (line.length() > 0) {
            body.text(0, y++, line.toString());
        }
        return y;
    }

    private int targets(Painter body, int y) {
        Period cycle = room.meeting.cycle();
        List<String> steps = new ArrayList<>(detail.steps().keySet());
        StringBuilder header = new StringBuilder(String.format(Locale.ROOT, "%-8s %3s %9s", "period", "lag", "naive"));
        for (String step : steps) {
            header.append(String.format(Locale.ROOT, " %9s", Text.fit(step, 9, room.look)));
        }
        body.text(0, y++, header + "  decided by", Look.Role.DIM);
        Map<Period, List<String>> by = new java.util.HashMap<>();
        for (Decision d : standingThisCycle()) {
            by.computeIfAbsent(d.period(), k -> new ArrayList<>()).add(d.author() + (d.kept() ? " (kept)" : ""));
        }
        for (Period p : firstStep().keySet()) {
            boolean decisionLag = detail.decisionPeriods().contains(p);
            StringBuilder line = new StringBuilder(String.format(Locale.ROOT, "%-8s %3d %9s", p, p.minus(cycle),
                    show(detail.naive().get(p))));
            for (String step : steps) {
                line.append(String.format(Locale.ROOT, " %9s", show(detail.steps().get(step).get(p))));
            }
            line.append("  ").append(String.join(", ", by.getOrDefault(p, List.of())));
            List<String> events = detail.events().get(p);
            if (events != null) {
                line.append("  [").append(String.join(",", events)).append(']');
            }
            body.text(0, y++, line.toString(), decisionLag ? Look.Role.PLAIN : Look.Role.DIM);
        }
        return y;
    }

    private void past(Painter body, int y) {
        List<Meeting.PastDecision> scored = detail.past().stream()
                .filter(p -> !p.decision().cycle().equals(room.meeting.cycle()) && p.decision().supersededBy() == null)
                .toList();
        if (y >= body.rows()) {
            return;
        }
        body.text(0, y++, "past decisions (" + scored.size() + "): cycle period prior " + room.look.arrow()
                + " new, actual, effect", Look.Role.DIM);
        for (Meeting.PastDecision p : scored) {
            if (y >= body.rows()) {
                break;
            }
            Decision d = p.decision();
            String effect = p.outcome().map(o -> o.effect() == AdjustmentOutcome.Effect.IMPROVED ? "helped"
                    : o.effect() == AdjustmentOutcome.Effect.WORSENED ? "hurt" : "no difference").orElse("no actual yet");
            Look.Role role = effect.equals("helped") ? Look.Role.GOOD : effect.equals("hurt") ? Look.Role.BAD
                    : Look.Role.PLAIN;
            body.text(0, y++, String.format(Locale.ROOT, "%-8s %-8s %s %s %s, actual %s, %s  %s: %s", d.cycle(),
                    d.period(), d.prior(), room.look.arrow(), d.quantity(), p.actual().map(Quantity::toString).orElse("-"),
                    effect, d.author(), d.reason()), role);
        }
    }

    private static String show(Quantity q) {
        return q == null ? "-" : Text.amount(units(q));
    }

    static double units(Quantity q) {
        return q.micros() / 1e6;
    }

    @Override
    public String hints() {
        return "a adjust  k keep  t table  n/p next/prev  v " + (numbers ? "chart" : "numbers") + "  Esc back";
    }

    @Override
    public List<String[]> help() {
        return List.of(new String[] {"a or Enter", "adjust this item"}, new String[] {"k", "keep: reviewed, no change"},
                new String[] {"t", "table this item (facilitator)"}, new String[] {"n p", "next, previous agenda item"},
                new String[] {"v", "the chart's numbers, or the chart"}, new String[] {"Esc", "back"});
    }
}
