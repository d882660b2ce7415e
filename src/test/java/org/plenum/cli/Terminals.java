package org.plenum.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * tmux sessions run as a given operating-system user, each user with a tmux server of its own
 * (so the pane's terminal belongs to that user, as a real login's would), for end-to-end tests
 * of the meeting screen.
 */
final class Terminals {
    /** The test users {@code .ci/run} creates, in the group {@link #GROUP}. */
    static final List<String> PLANNERS = List.of("plenum-p1", "plenum-p2");
    static final String GROUP = "plenum-e2e";

    private Terminals() {}

    /** One tmux session; {@code user} null runs as the test's own user. */
    record Session(String user, String name) {
        /** Starts the session on a fresh server: one left over from an interrupted run is killed first. */
        void start(int columns, int rows, String command) throws Exception {
            tmux("kill-server");
            Processes.Result started = tmux("new-session", "-d", "-s", name, "-x", Integer.toString(columns), "-y", Integer.toString(rows), command);
            if (started.code() != 0) {
                throw new AssertionError("tmux did not start " + name + ": " + started.err());
            }
            tmux("set", "-sg", "escape-time", "10");
        }

        /** Types {@code text} literally. */
        void type(String text) throws Exception {
            tmux("send-keys", "-t", name, "-l", text);
        }

        /** Presses named keys (tmux names: Enter, Tab, Escape, Down). */
        void press(String... keys) throws Exception {
            List<String> args = new ArrayList<>(List.of("send-keys", "-t", name));
            args.addAll(List.of(keys));
            tmux(args.toArray(String[]::new));
        }

        String screen() throws Exception {
            return tmux("capture-pane", "-p", "-t", name).out();
        }

        /** Waits until the screen shows {@code text}; the screen as last seen, or an AssertionError. */
        String await(String text, long millis) throws Exception {
            long deadline = System.nanoTime() + millis * 1_000_000;
            String seen = screen();
            while (!seen.contains(text)) {
                if (System.nanoTime() > deadline) {
                    throw new AssertionError((user == null ? "facilitator" : user) + "'s screen did not show \"" + text
                            + "\" within " + millis + " ms:\n" + seen);
                }
                Thread.sleep(50);
                seen = screen();
            }
            return seen;
        }

        /** Waits until the screen no longer shows {@code text}. */
        void awaitGone(String text, long millis) throws Exception {
            long deadline = System.nanoTime() + millis * 1_000_000;
            while (screen().contains(text)) {
                if (System.nanoTime() > deadline) {
                    throw new AssertionError("the screen still shows \"" + text + "\":\n" + screen());
                }
                Thread.sleep(50);
            }
        }

        void stop() throws Exception {
            tmux("kill-server");
        }

        Processes.Result tmux(String... args) throws Exception {
            List<String> cmd = new ArrayList<>(List.of("tmux", "-L", "plenum-e2e-" + name));
            cmd.addAll(List.of(args));
            return Processes.run(Path.of("/"), user == null ? cmd : List.of("su", user, "-c", shell(cmd)), 30);
        }
    }

    static boolean available(String command) {
        try {
            return Processes.run(Path.of("/"), List.of("sh", "-c", "command -v " + command), 10).code() == 0;
        } catch (Exception e) {
            return false;
        }
    }

    static boolean userExists(String user) {
        try {
            return Processes.run(Path.of("/"), List.of("id", user), 10).code() == 0;
        } catch (Exception e) {
            return false;
        }
    }

    /** Words quoted for sh. */
    static String shell(List<String> words) {
        StringBuilder out = new StringBuilder();
        for (String w : words) {
            out.append(out.length() == 0 ? "" : " ").append('\'').append(w.replace("'", "'\\''")).append('\'');
        }
        return out.toString();
    }
}
