package org.plenum.tui;

import com.googlecode.lanterna.TerminalSize;
import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.screen.TerminalScreen;
import com.googlecode.lanterna.terminal.virtual.DefaultVirtualTerminal;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.time.Duration;
import java.util.concurrent.Executor;
import java.util.regex.Pattern;
import org.plenum.app.Meeting;

/**
 * A meeting screen on Lanterna's virtual terminal, driven on the calling thread (PLATFORM.md A2):
 * what the screen benchmark times. A key press is timed from handing the key to the terminal to
 * the end of the repaint ({@code screen.refresh} into the virtual terminal's buffer).
 */
public final class ScreenProbe implements AutoCloseable {
    /** The agenda's first row: the rank 1 in its column, after the hands-off mark. */
    private static final Pattern FIRST_ROW = Pattern.compile("^[ !] {3}1 \\S");

    private final DefaultVirtualTerminal terminal;
    private final TerminalScreen screen;
    private final MeetingScreen meeting;

    public ScreenProbe(Meeting meeting, Look look, Sources sources, Executor background, int columns, int rows) {
        try {
            this.terminal = new DefaultVirtualTerminal(new TerminalSize(columns, rows));
            this.screen = new TerminalScreen(terminal);
            screen.startScreen();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        this.meeting = new MeetingScreen(screen, meeting, look, sources, background);
    }

    /** One turn of the screen's loop. */
    public void step() {
        meeting.step();
    }

    /** One turn of the loop after waiting up to {@code wait} for a background result. */
    public void step(Duration wait) throws InterruptedException {
        meeting.step(wait);
    }

    /** Presses {@code key} and returns the nanoseconds until the screen was repainted. */
    public long press(KeyStroke key) {
        long t0 = System.nanoTime();
        terminal.addInput(key);
        meeting.step();
        return System.nanoTime() - t0;
    }

    /** Whether the terminal shows the agenda's first row. */
    public boolean showsFirstAgendaRow() {
        int rows = terminal.getTerminalSize().getRows();
        for (int r = 1; r < rows - 1; r++) {
            if (FIRST_ROW.matcher(line(r)).find()) {
                return true;
            }
        }
        return false;
    }

    /** The terminal's row {@code row} as text. */
    public String line(int row) {
        int columns = terminal.getTerminalSize().getColumns();
        StringBuilder b = new StringBuilder(columns);
        for (int c = 0; c < columns; c++) {
            b.append(terminal.getCharacter(c, row).getCharacterString());
        }
        return b.toString();
    }

    /** The name of the view on top, as the top line shows it ({@code agenda}, {@code item S-000001}). */
    public String view() {
        String top = line(0).strip();
        int open = top.lastIndexOf('[');
        return open < 0 || !top.endsWith("]") ? "" : top.substring(open + 1, top.length() - 1);
    }

    @Override
    public void close() {
        try {
            screen.stopScreen();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
