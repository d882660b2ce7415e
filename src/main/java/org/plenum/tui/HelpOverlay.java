package org.plenum.tui;

import java.util.ArrayList;
import java.util.List;

/** Every key of the current view and the keys all views share, over the body; any key closes it. */
final class HelpOverlay {
    static final List<String[]> SHARED = List.of(new String[] {"1 2 3 4", "agenda, ledger, scorecard, full item view"},
            new String[] {"Esc", "back"}, new String[] {"f", "follow the tabled item on or off"},
            new String[] {"R", "rank the agenda again on current data (facilitator)"},
            new String[] {"X", "close the meeting, write its minutes (facilitator)"},
            new String[] {"?", "this help"}, new String[] {"q", "quit (asks first)"});

    private final Room room;

    HelpOverlay(Room room) {
        this.room = room;
    }

    void draw(Painter body, View view) {
        List<String[]> keys = new ArrayList<>(view.help());
        keys.addAll(SHARED);
        int width = Math.min(body.columns() - 4, 72);
        int height = Math.min(body.rows() - 2, keys.size() + 3);
        Painter box = body.band(1, height).column(2, width);
        box.clear();
        box.line(0, " keys: " + view.name() + " (any key closes)", Look.Role.BAR);
        for (int i = 0; i < keys.size() && i + 1 < height - 1; i++) {
            box.text(1, i + 1, Text.pad(keys.get(i)[0], 20, room.look) + keys.get(i)[1]);
        }
        box.line(height - 1, "", Look.Role.BAR);
    }
}
