package org.plenum.tui;

import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.input.KeyType;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import org.plenum.agenda.AgendaRow;
import org.plenum.app.Meeting;

/**
 * The ranked agenda with every number behind each rank, the cut line where the time budget runs
 * out, hands-off items marked, a status per item and a text filter.
 */
final class AgendaView implements View {
    private final Room room;
    private String filter = "";
    private boolean typingFilter;
    private int selected;
    private int first;
    private List<AgendaRow> shown = List.of();
    /** The agenda and the filter {@code shown} was worked out from. */
    private List<AgendaRow> filtered;
    private String filteredBy;
    /** The index in {@code shown} before which the cut line is drawn; −1 for none. */
    private int cut = -1;
    private long aboveCut;
    private long handsOff;
    private int page = 10;
    /** Where the list started, and how many rows it had, when it was last drawn (0: not yet). */
    private int drawnFirst;
    private int drawnAt;

    AgendaView(Room room) {
        this.room = room;
    }

    @Override
    public String name() {
        return "agenda";
    }

    Optional<String> selectedCode() {
        refilter();
        return selected < shown.size() ? Optional.of(shown.get(selected).code()) : Optional.empty();
    }

    @Override
    public void refreshed() {
        refilter();
    }

    /**
     * The rows the filter lets through, worked out again only when the agenda or the filter
     * changed: a key must not walk fifty thousand rows to move the selection by one.
     */
    private void refilter() {
        List<AgendaRow> all = room.agendaRows();
        if (all != filtered || !filter.equals(filteredBy)) {
            String needle = filter.toLowerCase(Locale.ROOT);
            List<AgendaRow> out = needle.isEmpty() ? all : new ArrayList<>();
            if (!needle.isEmpty()) {
                for (AgendaRow r : all) {
                    if (matches(r, needle)) {
                        out.add(r);
                    }
                }
            }
            if (all != filtered) {
                aboveCut = all.stream().filter(r -> r.aboveCut().orElse(false)).count();
                handsOff = all.stream().filter(AgendaRow::handsOff).count();
            }
            shown = out;
            cut = firstBelowCut(out);
            filtered = all;
            filteredBy = filter;
        }
        selected = Math.max(0, Math.min(selected, shown.size() - 1));
    }

    /** The index of the first shown row below the cut line, −1 when none is. */
    private static int firstBelowCut(List<AgendaRow> rows) {
        for (int i = 0; i < rows.size(); i++) {
            if (rows.get(i).aboveCut().isPresent() && !rows.get(i).aboveCut().get()) {
                return i;
            }
        }
        return -1;
    }

    private static boolean matches(AgendaRow r, String needle) {
        String hay = (r.code() + " " + r.item().description() + " " + (r.item().group() == null ? "" : r.item().group())
                + " " + String.join(" ", r.tags()) + (r.handsOff() ? " hands off" : "")).toLowerCase(Locale.ROOT);
        return hay.contains(needle);
    }

    @Override
    public boolean handle(KeyStroke key) {
        if (typingFilter) {
            return filterKey(key);
        }
        refilter();
        int moved = Keys.move(key, selected, shown.size(), page, false);
        if (moved >= 0) {
            selected = moved;
            return true;
        }
        char c = Keys.typed(key);
        if (c == '/') {
            typingFilter = true;
            return true;
        }
        if (Keys.type(key, KeyType.Escape) && !filter.isEmpty()) {
            filter = "";
            refilter();
            return true;
        }
        Optional<String> code = selectedCode();
        if (code.isEmpty()) {
            return false;
        }
        if (Keys.type(key, KeyType.Enter)) {
            room.open(new ItemView(room, code.get()));
        } else if (c == 't') {
            room.table(code.get());
        } else if (c == 'a') {
            ItemView item = new ItemView(room, code.get());
            room.open(item);
            item.adjust();
        } else if (c == 'k') {
            room.keep(code.get());
        } else {
            return false;
        }
        return true;
    }

    private boolean filterKey(KeyStroke key) {
        if (Keys.type(key, KeyType.Escape)) {
            filter = "";
            typingFilter = false;
        } else if (Keys.type(key, KeyType.Enter)) {
            typingFilter = false;
        } else if (Keys.type(key, KeyType.Backspace)) {
            filter = filter.isEmpty() ? "" : filter.substring(0, filter.length() - 1);
        } else if (Keys.typed(key) != 0) {
            filter += Keys.typed(key);
        } else {
            int moved = Keys.move(key, selected, shown.size(), page, false);
            if (moved >= 0) {
                selected = moved;
            }
        }
        selected = 0;
        refilter();
        return true;
    }

    @Override
    public void draw(Painter body) {
        refilter();
        if (room.agenda == null) {
            body.text(1, 1, room.agendaProblem != null ? "no agenda: " + room.agendaProblem : "ranking the agenda"
                    + room.look.ellipsis(), room.agendaProblem != null ? Look.Role.BAD : Look.Role.DIM);
            return;
        }
        List<AgendaRow> all = room.agendaRows();
        String budget = room.state.meeting().budgetMinutes() == null ? "no time budget"
                : aboveCut + " above the cut (" + room.state.meeting().budgetMinutes() + " min)";
        body.text(0, 0, String.format(Locale.ROOT, "%,d items  %s  %d hands off%s", all.size(), budget, handsOff,
                typingFilter || !filter.isEmpty() ? "  filter: " + filter + (typingFilter ? "_" : "") : ""),
                Look.Role.TITLE);
        Columns columns = Columns.forWidth(body.columns());
        body.text(0, 1, columns.header(), Look.Role.DIM);
        int rows = body.rows() - 2;
        page = Math.max(1, rows - 1);
        int lines = shown.size() + (cut >= 0 ? 1 : 0);
        int selectedLine = shown.isEmpty() ? 0 : lineOf(selected);
        if (selectedLine < first) {
            first = selectedLine;
        } else if (selectedLine >= first + rows) {
            first = selectedLine - rows + 1;
        }
        first = Math.max(0, Math.min(first, Math.max(0, lines - rows)));
        if (drawnAt == rows) {
            // The list moved by a few lines: over SSH, a scroll and the new lines instead of a screenful.
            body.scrolled(2, 2 + rows - 1, first - drawnFirst);
        }
        drawnFirst = first;
        drawnAt = rows;
        for (int i = 0; i < rows && first + i < lines; i++) {
            int line = first + i;
            if (line == cut) {
                String rule = String.valueOf(room.look.rule()).repeat(4);
                body.text(0, 2 + i, rule + " cut line: the " + room.state.meeting().budgetMinutes()
                        + "-minute budget runs out here " + rule, Look.Role.WARN);
            } else {
                int index = cut >= 0 && line > cut ? line - 1 : line;
                AgendaRow row = shown.get(index);
                Look.Role role = index == selected ? Look.Role.SELECTED : row.handsOff() ? Look.Role.WARN
                        : row.aboveCut().map(a -> a ? Look.Role.PLAIN : Look.Role.DIM).orElse(Look.Role.PLAIN);
                body.line(2 + i, columns.row(row, status(row), room.look, room.sparkline(row.code())), role);
            }
        }
        if (shown.isEmpty()) {
            body.text(1, 3, filter.isEmpty() ? "no candidate items in this cycle" : "no item matches \"" + filter + "\"",
                    Look.Role.DIM);
        }
    }

    private String status(AgendaRow row) {
        Meeting.Status status = room.state.status(row.code());
        String onTable = room.state.onTable().filter(row.code()::equals).isPresent() ? "ON TABLE" : null;
        if (onTable != null) {
            return onTable;
        }
        if (status == Meeting.Status.NOT_YET && row.handsOff()) {
            return "hands off";
        }
        return status.word();
    }

    /** The list line of shown row {@code index}: one further down from the cut line on. */
    private int lineOf(int index) {
        return cut >= 0 && index >= cut ? index + 1 : index;
    }

    @Override
    public String hints() {
        return typingFilter ? "type to filter  Enter done  Esc clear" : "Enter open  a adjust  k keep  t table  / filter"
                + "  2 ledger  3 scorecard";
    }

    @Override
    public List<String[]> help() {
        return List.of(new String[] {"Up Down j", "move"}, new String[] {"PgUp PgDn Home End", "page, first, last"},
                new String[] {"Enter", "open the item"}, new String[] {"a", "adjust the item"},
                new String[] {"k", "keep: reviewed, no change"}, new String[] {"t", "table the item (facilitator)"},
                new String[] {"/", "filter by item, description, group, tag; Esc clears"});
    }

    /** The agenda's columns for a screen width: the essentials at 80, description and sparkline when wider. */
    record Columns(int descriptionWidth, int sparkWidth) {
        static final int SPARK = 12;

        static Columns forWidth(int width) {
            int spare = width - 80;
            int spark = spare >= SPARK + 1 ? SPARK : 0;
            int description = Math.max(0, Math.min(30, spare - (spark > 0 ? spark + 1 : 0) - 1));
            return new Columns(description >= 8 ? description : 0, spark);
        }

        String header() {
            return String.format(Locale.ROOT, " %4s %-10s %-8s %7s %5s %3s %5s %7s %-2s %-9s", "rank", "item", "group",
                    "stake", "track", "n", "gain", "prio", "cl", "status")
                    + (descriptionWidth > 0 ? " " + padRight("description", descriptionWidth) : "")
                    + (sparkWidth > 0 ? " " + padRight("history", sparkWidth) : "") + " tags";
        }

        String row(AgendaRow r, String status, Look look, double[] history) {
            String mark = r.handsOff() ? "!" : " ";
            String text = mark + String.format(Locale.ROOT, "%4d %-10s %-8s %7s %5s %3d %5s %7s %-2s %-9s", r.rank(),
                    Text.fit(r.code(), 10, look), Text.fit(r.item().group() == null ? "-" : r.item().group(), 8, look),
                    Text.amount(r.stake().value()), Text.ratio(OptionalDouble.of(r.trackRecord().shrunk())),
                    r.trackRecord().n(), String.format(Locale.ROOT, "%+.0f%%", r.trackRecord().gain() * 100),
                    Text.amount(r.priority()), r.abc() + r.xyz(), Text.fit(status, 9, look));
            if (descriptionWidth > 0) {
                text += " " + Text.pad(r.item().description(), descriptionWidth, look);
            }
            if (sparkWidth > 0) {
                text += " " + Text.pad(history == null ? "" : look.sparkline(history), sparkWidth, look);
            }
            return text + " " + String.join(",", r.tags());
        }

        private static String padRight(String s, int width) {
            return s.length() >= width ? s.substring(0, width) : s + " ".repeat(width - s.length());
        }
    }
}
