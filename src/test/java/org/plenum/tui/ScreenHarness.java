package org.plenum.tui;

import com.googlecode.lanterna.SGR;
import com.googlecode.lanterna.TerminalSize;
import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.input.KeyType;
import com.googlecode.lanterna.screen.TerminalScreen;
import com.googlecode.lanterna.terminal.virtual.DefaultVirtualTerminal;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.plenum.agenda.AgendaSettings;
import org.plenum.app.Agenda;
import org.plenum.app.Meeting;
import org.plenum.app.MeetingAgenda;
import org.plenum.app.Score;
import org.plenum.app.Workspaces;
import org.plenum.score.Placebo;

/**
 * One person's meeting screen on Lanterna's virtual terminal, driven on the test thread as
 * PLATFORM.md advises: queue keys, run one step, read the screen's text back.
 */
final class ScreenHarness implements AutoCloseable {
    final DefaultVirtualTerminal terminal;
    final MeetingScreen screen;
    final Meeting meeting;
    final MeetingFixture.TestClock clock;

    private ScreenHarness(DefaultVirtualTerminal terminal, MeetingScreen screen, Meeting meeting,
            MeetingFixture.TestClock clock) {
        this.terminal = terminal;
        this.screen = screen;
        this.meeting = meeting;
        this.clock = clock;
    }

    static ScreenHarness open(Path db, String person, Integer budget, Look look, MeetingFixture.TestClock clock)
            throws Exception {
        return open(db, person, budget, look, clock, new TerminalSize(120, 40));
    }

    static ScreenHarness open(Path db, String person, Integer budget, Look look, MeetingFixture.TestClock clock,
            TerminalSize size) throws Exception {
        Workspaces workspaces = new Workspaces(Map.of());
        int[] lags = {1, 2, 3};
        Meeting meeting = Meeting.join(workspaces, db, MeetingFixture.CYCLE.toString(), budget, List.of(1, 2, 3), person,
                clock);
        Integer minutes = meeting.info().budgetMinutes();
        AgendaSettings settings = minutes == null ? AgendaSettings.defaults() : AgendaSettings.defaults()
                .withBudget(minutes);
        long id = meeting.info().id();
        Sources sources = new Sources(() -> MeetingAgenda.of(workspaces, db, id, MeetingFixture.CYCLE, lags, settings,
                clock), () -> MeetingAgenda.rankAgain(workspaces, db, id, MeetingFixture.CYCLE, lags, settings, clock),
                () -> Agenda.guidance(workspaces, db),
                () -> Score.run(workspaces, db, 1, Placebo.NAIVE, List.of(), 200, false),
                () -> Meeting.recentActuals(workspaces, db, MeetingFixture.CYCLE, 12));
        DefaultVirtualTerminal terminal = new DefaultVirtualTerminal(size);
        TerminalScreen lanterna = new TerminalScreen(terminal);
        lanterna.startScreen();
        MeetingScreen screen = new MeetingScreen(lanterna, meeting, look, sources, Runnable::run);
        ScreenHarness h = new ScreenHarness(terminal, screen, meeting, clock);
        h.step();
        return h;
    }

    void step() {
        screen.step();
    }

    /** Types each character of {@code text}, then steps. */
    ScreenHarness type(String text) {
        for (char c : text.toCharArray()) {
            terminal.addInput(new KeyStroke(c, false, false));
        }
        step();
        return this;
    }

    ScreenHarness press(KeyType type) {
        terminal.addInput(new KeyStroke(type));
        step();
        return this;
    }

    ScreenHarness press(KeyStroke key) {
        terminal.addInput(key);
        step();
        return this;
    }

    List<String> lines() {
        TerminalSize size = terminal.getTerminalSize();
        List<String> out = new ArrayList<>();
        for (int r = 0; r < size.getRows(); r++) {
            StringBuilder line = new StringBuilder();
            for (int c = 0; c < size.getColumns(); c++) {
                line.append(terminal.getCharacter(c, r).getCharacterString());
            }
            out.add(line.toString().stripTrailing());
        }
        return out;
    }

    String text() {
        return String.join("\n", lines());
    }

    String line(int row) {
        return lines().get(row);
    }

    /** The first row whose text contains {@code needle}, or −1. */
    int rowOf(String needle) {
        List<String> lines = lines();
        for (int i = 0; i < lines.size(); i++) {
            if (lines.get(i).contains(needle)) {
                return i;
            }
        }
        return -1;
    }

    boolean reversed(int column, int row) {
        return terminal.getCharacter(column, row).getModifiers().contains(SGR.REVERSE);
    }

    @Override
    public void close() {
        meeting.close();
    }
}
