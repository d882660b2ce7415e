package org.plenum.tui;

import com.googlecode.lanterna.TerminalSize;
import com.googlecode.lanterna.graphics.TextGraphics;
import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.input.KeyType;
import com.googlecode.lanterna.screen.Screen;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.time.Duration;
import java.util.List;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.Executor;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.function.BooleanSupplier;
import org.plenum.app.Meeting;

/**
 * The meeting screen: a top line (workspace, cycle, clock, who is connected, the tabled item),
 * the current view, and a bottom line with the keys that work here and the last message. One UI
 * thread runs everything; input, the change watcher and the clock only post tasks to it.
 */
public final class MeetingScreen {
    /** How often a screen looks for other screens' commits: refreshes arrive within a second. */
    public static final Duration WATCH_EVERY = Duration.ofMillis(300);

    private final Screen screen;
    private final Room room;
    private final Glyphs glyphs;
    private final BlockingQueue<Runnable> tasks = new LinkedBlockingQueue<>();
    private final HelpOverlay help;
    private boolean helpShown;
    private boolean quitAsked;
    private boolean closeAsked;

    public MeetingScreen(Screen screen, Meeting meeting, Look look, Sources sources, Executor background) {
        this.screen = screen;
        this.room = new Room(meeting, look, sources, background, tasks::add);
        this.glyphs = new Glyphs(look);
        this.help = new HelpOverlay(room);
        room.open(new AgendaView(room));
        room.load();
    }

    /** Whether the user has quit. */
    public boolean finished() {
        return room.quit;
    }

    /**
     * Handles every key and task waiting now, looks for other screens' commits, and draws: one
     * turn of the loop, which tests drive on their own thread.
     */
    public void step() {
        try {
            KeyStroke key;
            while ((key = screen.pollInput()) != null && !room.quit) {
                handle(key);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        runTasks();
        if (room.checkForChanges()) {
            runTasks(); // what the change set off, when it is already done (the tests' executor runs it at once)
        }
        draw();
    }

    /**
     * Waits up to {@code wait} for a posted task (a background read arriving), then does what
     * {@link #step()} does: for a driver on its own thread that must not spin while the agenda is
     * ranked, as the production loop blocks on its queue.
     */
    public void step(Duration wait) throws InterruptedException {
        Runnable task = tasks.poll(wait.toNanos(), java.util.concurrent.TimeUnit.NANOSECONDS);
        if (task != null) {
            task.run();
        }
        step();
    }

    /** Posts a task for the UI thread (from the input, watcher and clock threads). */
    public void post(Runnable task) {
        tasks.add(task);
    }

    /** One second passed: the clock moves and the screen checks in now and then. */
    public void tick() {
        room.tick();
    }

    /** Someone may have committed: read the shared state again if so. */
    public void lookForChanges() {
        room.checkForChanges();
    }

    /**
     * The production loop on the calling thread: waits for tasks (no busy loop), runs them all,
     * draws once. Returns when the user quits or {@code stop} says so.
     */
    public void runUntilQuit(BooleanSupplier stop) throws InterruptedException {
        draw();
        while (!room.quit && !stop.getAsBoolean()) {
            Runnable task = tasks.poll(1, java.util.concurrent.TimeUnit.SECONDS);
            if (task != null) {
                task.run();
                runTasks();
            }
            if (!room.quit) {
                draw();
            }
        }
    }

    /** A key from the input thread. */
    public void key(KeyStroke key) {
        post(() -> handle(key));
    }

    private void runTasks() {
        Runnable task;
        while ((task = tasks.poll()) != null) {
            task.run();
        }
    }

    void handle(KeyStroke key) {
        String before = room.message;
        boolean wasAsking = quitAsked || closeAsked;
        try {
            dispatch(key);
        } catch (RuntimeException e) {
            room.say(e.getMessage() == null ? e.toString() : e.getMessage(), Look.Role.BAD);
        }
        if (wasAsking && room.message.equals(before) && !quitAsked && !closeAsked) {
            room.say("");
        }
    }

    private void dispatch(KeyStroke key) {
        if (quitAsked) {
            quitAsked = false;
            if (Keys.is(key, 'q') || Keys.is(key, 'y')) {
                room.quit = true;
            }
            return;
        }
        if (closeAsked) {
            closeAsked = false;
            if (Keys.is(key, 'y')) {
                closeMeeting();
            } else {
                room.say("the meeting stays open");
            }
            return;
        }
        if (helpShown) {
            helpShown = false;
            return;
        }
        room.say("");
        if (Keys.ctrl(key, 'c')) {
            askQuit();
            return;
        }
        View view = room.top();
        if (view.handle(key)) {
            return;
        }
        char c = Keys.typed(key);
        if (Keys.type(key, KeyType.Escape)) {
            room.back();
        } else if (c == '?') {
            helpShown = true;
        } else if (c == 'q') {
            askQuit();
        } else if (c == '1') {
            room.toAgenda();
        } else if (c == '2') {
            room.openFromAgenda(new LedgerView(room));
        } else if (c == '3') {
            room.openFromAgenda(new ScorecardView(room));
        } else if (c == '4') {
            java.util.Optional<String> code = room.top() instanceof ItemView item ? java.util.Optional.of(item.code())
                    : room.top() instanceof AgendaView agenda ? agenda.selectedCode() : room.state.onTable();
            code.ifPresentOrElse(k -> room.openFromAgenda(new ItemView(room, k, true)),
                    () -> room.say("no item selected or on the table"));
        } else if (c == 'f') {
            room.follow = !room.follow;
            room.say(room.follow ? "following the tabled item" : "not following the tabled item");
        } else if (c == 'R') {
            room.rankAgain();
        } else if (c == 'X') {
            if (!room.isFacilitator()) {
                room.say("only the facilitator closes the meeting", Look.Role.WARN);
            } else {
                closeAsked = true;
                room.say("close the meeting and write its minutes? y: close, any other key: stay", Look.Role.WARN);
            }
        } else {
            room.say("that key does nothing here: ? lists the keys", Look.Role.WARN);
        }
    }

    private void askQuit() {
        boolean unsaved = room.top().holdsInput();
        quitAsked = true;
        room.say(unsaved ? "the form holds input (kept as a draft for your return): q again to quit"
                : "q again to quit, any other key to stay", Look.Role.WARN);
    }

    private void closeMeeting() {
        List<String> notReached = room.agendaRows().stream()
                .filter(r -> r.aboveCut().map(above -> !above).orElse(false))
                .map(r -> r.code())
                .filter(code -> room.state.status(code) == Meeting.Status.NOT_YET)
                .toList();
        Meeting.Closed closed = room.meeting.close(notReached);
        room.reload();
        room.say("closed after " + closed.totalMinutes() + " min; minutes in " + closed.minutes());
    }

    void draw() {
        try {
            TerminalSize resized = screen.doResizeIfNecessary();
            TerminalSize size = screen.getTerminalSize();
            TextGraphics g = screen.newTextGraphics();
            Painter whole = Painter.whole(g, glyphs, screen::scrollLines, size);
            whole.clear();
            topLine(whole.band(0, 1));
            Painter body = whole.band(1, Math.max(0, size.getRows() - 2));
            room.top().draw(body);
            if (helpShown) {
                help.draw(body, room.top());
            }
            bottomLine(whole.band(size.getRows() - 1, 1));
            screen.setCursorPosition(null);
            screen.refresh(resized != null ? Screen.RefreshType.COMPLETE : Screen.RefreshType.DELTA);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private void topLine(Painter line) {
        Meeting.State s = room.state;
        long seconds = Math.max(0, Duration.between(s.meeting().startedAt(), room.meeting.now()).toSeconds());
        String clock = Text.minutes(seconds) + (s.meeting().budgetMinutes() == null ? ""
                : " of " + s.meeting().budgetMinutes() + ":00");
        String people = String.join(" ", s.present().stream()
                .map(p -> p.equals(s.meeting().facilitator()) ? p + "*" : p).toList());
        String closed = s.meeting().isOpen() ? "" : "  CLOSED";
        String text = "Plenum  " + room.meeting.workspaceName() + "  cycle " + s.meeting().cycle() + "  " + clock
                + closed + "  " + people + "  table: " + s.onTable().orElse("-");
        // The view's name closes the line whatever its width: on a narrow terminal the rest is cut.
        String view = "  [" + room.top().name() + "]";
        line.line(0, Text.pad(text, Math.max(0, line.columns() - view.length()), room.look) + view, Look.Role.BAR);
    }

    private void bottomLine(Painter line) {
        String hints = room.top() instanceof ItemView item && item.full() ? "" : room.top().hints() + "  ? help  q quit";
        if (room.message.isEmpty()) {
            line.line(0, hints, Look.Role.BAR);
        } else {
            line.line(0, room.message, room.messageRole == Look.Role.PLAIN ? Look.Role.BAR : room.messageRole);
        }
    }
}
