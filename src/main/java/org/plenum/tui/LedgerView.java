package org.plenum.tui;

import com.googlecode.lanterna.input.KeyStroke;
import java.time.ZoneId;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.plenum.core.Decision;

/** This meeting's decisions, newest first: who, what, why, minutes; corrected entries marked. */
final class LedgerView implements View {
    private static final DateTimeFormatter TIME = DateTimeFormatter.ofPattern("HH:mm", Locale.ROOT)
            .withZone(ZoneId.systemDefault());

    private final Room room;
    private int selected;
    private int first;
    private int page = 10;

    LedgerView(Room room) {
        this.room = room;
    }

    @Override
    public String name() {
        return "ledger";
    }

    private List<Decision> newestFirst() {
        List<Decision> out = new ArrayList<>(room.state.decisions());
        java.util.Collections.reverse(out);
        return out;
    }

    @Override
    public boolean handle(KeyStroke key) {
        List<Decision> rows = newestFirst();
        int moved = Keys.move(key, selected, rows.size(), page, true);
        if (moved >= 0) {
            selected = moved;
            return true;
        }
        if (Keys.type(key, com.googlecode.lanterna.input.KeyType.Enter) && selected < rows.size()) {
            room.open(new ItemView(room, rows.get(selected).item()));
            return true;
        }
        return false;
    }

    @Override
    public void draw(Painter body) {
        List<Decision> rows = newestFirst();
        long standing = rows.stream().filter(d -> d.supersededBy() == null).count();
        body.text(0, 0, "this meeting's decisions: " + standing + " standing, " + (rows.size() - standing)
                + " corrected", Look.Role.TITLE);
        body.text(0, 1, String.format(Locale.ROOT, "%-5s %-10s %-8s %17s %-8s %5s %-13s %s", "time", "item", "period",
                "prior " + room.look.arrow() + " new", "author", "min", "tag", "reason"), Look.Role.DIM);
        int visible = body.rows() - 2;
        page = Math.max(1, visible - 1);
        selected = Math.max(0, Math.min(selected, rows.size() - 1));
        if (selected < first) {
            first = selected;
        } else if (selected >= first + visible) {
            first = selected - visible + 1;
        }
        for (int i = 0; i < visible && first + i < rows.size(); i++) {
            Decision d = rows.get(first + i);
            String change = d.kept() ? "kept " + d.quantity() : d.prior() + " " + room.look.arrow() + " " + d.quantity();
            String line = String.format(Locale.ROOT, "%-5s %-10s %-8s %17s %-8s %5s %-13s %s", TIME.format(d.recordedAt()),
                    Text.fit(d.item(), 10, room.look), d.period(), Text.fit(change, 17, room.look),
                    Text.fit(d.author(), 8, room.look), d.minutes() == null ? "-" : String.format(Locale.ROOT, "%.1f", d.minutes().micros() / 1e6),
                    Text.fit(d.tag(), 13, room.look), (d.supersededBy() != null ? "(corrected) " : "") + d.reason());
            Look.Role role = first + i == selected ? Look.Role.SELECTED
                    : d.supersededBy() != null ? Look.Role.DIM : Look.Role.PLAIN;
            body.line(2 + i, line, role);
        }
        if (rows.isEmpty()) {
            body.text(1, 3, "no decision in this meeting yet", Look.Role.DIM);
        }
    }

    @Override
    public String hints() {
        return "Enter open item  1 agenda  3 scorecard";
    }

    @Override
    public List<String[]> help() {
        return List.of(new String[] {"Up Down j k", "move"}, new String[] {"Enter", "open the decision's item"});
    }
}
