package org.plenum.tui;

import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.input.KeyType;
import com.googlecode.lanterna.screen.TerminalScreen;
import com.googlecode.lanterna.terminal.DefaultTerminalFactory;
import com.googlecode.lanterna.terminal.Terminal;
import com.googlecode.lanterna.terminal.ansi.UnixTerminal;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.function.BooleanSupplier;
import org.plenum.app.Meeting;

/**
 * Runs a meeting screen in the real terminal: the terminal set up as PLATFORM.md advises
 * (text terminal forced, Ctrl+C trapped, split escape sequences waited for), one thread blocked
 * reading keys, one polling for other screens' commits, one ticking the clock; the UI thread
 * sleeps until one of them posts a task.
 */
public final class MeetingTerminal {
    private MeetingTerminal() {}

    /**
     * Runs until the user quits or the terminal goes away (a dropped SSH connection): typed
     * input is already kept as a draft by then.
     *
     * @param changed true when another process has committed (on a connection of its own)
     */
    public static void run(Meeting meeting, Look look, Sources sources, BooleanSupplier changed) throws IOException,
            InterruptedException {
        Terminal terminal = new DefaultTerminalFactory(System.out, System.in, look.unicode() ? StandardCharsets.UTF_8
                : StandardCharsets.US_ASCII).setForceTextTerminal(true)
                .setUnixTerminalCtrlCBehaviour(UnixTerminal.CtrlCBehaviour.TRAP).createTerminal();
        if (terminal instanceof UnixTerminal unix) {
            unix.getInputDecoder().setTimeoutUnits(1);
        }
        TerminalScreen screen = new TerminalScreen(terminal);
        ExecutorService background = background();
        AtomicBoolean gone = new AtomicBoolean();
        screen.startScreen();
        try {
            MeetingScreen meet = new MeetingScreen(screen, meeting, look, sources, background);
            terminal.addResizeListener((t, size) -> meet.post(() -> { }));
            Thread input = daemon("plenum-meet-keys").newThread(() -> readKeys(screen, meet, gone));
            Thread watch = daemon("plenum-meet-watch").newThread(() -> {
                while (!gone.get()) {
                    sleep(MeetingScreen.WATCH_EVERY.toMillis());
                    if (changed.getAsBoolean()) {
                        meet.post(meet::lookForChanges);
                    }
                }
            });
            Thread clock = daemon("plenum-meet-clock").newThread(() -> {
                while (!gone.get()) {
                    sleep(1000);
                    meet.post(meet::tick);
                }
            });
            input.start();
            watch.start();
            clock.start();
            meet.runUntilQuit(gone::get);
        } finally {
            gone.set(true);
            background.shutdownNow();
            screen.stopScreen();
        }
    }

    /** The screen's workers for its slow reads: two daemon threads (also what {@code bench screen} runs on). */
    public static ExecutorService background() {
        return Executors.newFixedThreadPool(2, daemon("plenum-meet-work"));
    }

    private static void readKeys(TerminalScreen screen, MeetingScreen meet, AtomicBoolean gone) {
        try {
            while (!gone.get()) {
                KeyStroke key = screen.readInput();
                if (key == null || key.getKeyType() == KeyType.EOF) {
                    break;
                }
                meet.key(key);
            }
        } catch (IOException | RuntimeException e) {
            // the terminal went away
        }
        gone.set(true);
        meet.post(() -> { });
    }

    private static void sleep(long millis) {
        try {
            Thread.sleep(millis);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    private static java.util.concurrent.ThreadFactory daemon(String name) {
        return r -> {
            Thread t = new Thread(r, name);
            t.setDaemon(true);
            return t;
        };
    }
}
