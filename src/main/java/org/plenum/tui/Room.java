package org.plenum.tui;

import java.time.Duration;
import java.time.Instant;
import java.util.ArrayDeque;
import java.util.Deque;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.Executor;
import java.util.function.Consumer;
import java.util.function.Supplier;
import org.plenum.agenda.AdjustmentGuidance;
import org.plenum.agenda.AgendaRow;
import org.plenum.app.Agenda;
import org.plenum.app.DecisionRequest;
import org.plenum.app.Meeting;
import org.plenum.app.Score;

/**
 * What every view of one screen shares, owned by the UI thread: the meeting and its last read
 * state, the agenda and the other slow reads once they arrive, the stack of open views, the
 * message on the bottom line.
 */
final class Room {
    /** How often a screen tells the others it is still there. */
    static final Duration HEARTBEAT = Duration.ofSeconds(10);
    /** The reads that follow the agenda's: the guidance and the sparklines. */
    private static final int READS_AFTER_AGENDA = 2;

    final Meeting meeting;
    final Look look;
    private final Sources sources;
    private final Executor background;
    private final Consumer<Runnable> post;
    private final Deque<View> views = new ArrayDeque<>();

    Meeting.State state;
    Agenda.Report agenda;
    String agendaProblem;
    AdjustmentGuidance guidance;
    Score.Report scorecard;
    String scorecardProblem;
    private boolean scorecardAsked;
    private Map<String, AgendaRow> rowsByCode = Map.of();
    private Map<String, double[]> history = Map.of();
    private int loadsArrived;
    /** Which ranking of the meeting's kept agenda is shown (see {@link Meeting#agendaRanking}). */
    private int agendaRanking;
    /** An agenda is being ranked or read in the background. */
    private boolean agendaLoading;

    String message = "";
    Look.Role messageRole = Look.Role.PLAIN;
    boolean follow;
    boolean quit;
    private String lastOnTable;
    private Instant lastHeartbeat;
    /** When the item view of each item was last opened: the form's minutes start there. */
    private final Map<String, Instant> openedAt = new HashMap<>();

    Room(Meeting meeting, Look look, Sources sources, Executor background, Consumer<Runnable> post) {
        this.meeting = meeting;
        this.look = look;
        this.sources = sources;
        this.background = background;
        this.post = post;
        this.follow = meeting.role() == Meeting.Role.PLANNER;
        this.lastHeartbeat = meeting.now();
        this.state = meeting.state();
        this.lastOnTable = state.onTable().orElse(null);
    }

    /**
     * Reads the agenda in the background, then the guidance and the sparklines: the agenda is
     * what the screen waits for, so it has the cores to itself.
     */
    void load() {
        agendaLoading = true;
        background.execute(() -> {
            Runnable show = outcome(sources.agenda(), this::show, this::agendaFailed);
            // Queued before the agenda is shown, so that whoever waits for the agenda finds them queued.
            later(sources.guidance(), g -> loaded(() -> guidance = g),
                    problem -> loaded(() -> say("guidance unavailable: " + problem, Look.Role.WARN)));
            later(sources.history(), h -> loaded(() -> history = h), problem -> loaded(() -> history = Map.of()));
            post.accept(show);
        });
    }

    /** Puts {@code report} on every view, noting which ranking of the meeting's kept agenda it is. */
    private void show(Agenda.Report report) {
        agenda = report;
        agendaProblem = null;
        agendaLoading = false;
        agendaRanking = meeting.agendaRanking();
        Map<String, AgendaRow> byCode = new HashMap<>();
        report.rows().forEach(r -> byCode.put(r.code(), r));
        rowsByCode = byCode;
        views.forEach(View::refreshed);
    }

    private void agendaFailed(String problem) {
        agendaLoading = false;
        if (agenda == null) {
            agendaProblem = problem;
        } else {
            say("the agenda stays as it was: " + problem, Look.Role.BAD);
        }
    }

    /**
     * The facilitator ranks the cycle again with the data as they stand now (say, after
     * corrected forecasts were imported); every screen then shows the new agenda.
     */
    void rankAgain() {
        if (!isFacilitator()) {
            say("only the facilitator (" + state.meeting().facilitator() + ") ranks the agenda again", Look.Role.WARN);
            return;
        }
        if (agendaLoading) {
            say("the agenda is being ranked or read already");
            return;
        }
        agendaLoading = true;
        say("ranking the agenda again with the data as they stand now" + look.ellipsis());
        later(sources.rankAgain(), report -> {
            show(report);
            say("the agenda is ranked again: " + report.rows().size() + " items");
        }, this::agendaFailed);
    }

    /** Another screen kept a new agenda for the meeting (the facilitator ranked it again): read it. */
    private void followAgenda() {
        if (agendaLoading || agenda == null) {
            return;
        }
        if (meeting.agendaRanking() > agendaRanking) {
            agendaLoading = true;
            later(sources.agenda(), report -> {
                show(report);
                say("the facilitator ranked the agenda again");
            }, this::agendaFailed);
        }
    }

    /**
     * One of the two reads after the agenda arrived. With the last one the screen holds what it
     * keeps for the whole meeting (agenda, guidance, sparklines: about a hundred megabytes on a
     * 50,000-item agenda), and it asks for one collection then, while the user reads the agenda
     * just painted: otherwise the young collections of the first seconds of scrolling copy that
     * data until it is old, pausing keys for 15 to 120 ms (measured on {@code bench screen}).
     */
    private void loaded(Runnable arrival) {
        arrival.run();
        if (++loadsArrived == READS_AFTER_AGENDA) {
            System.gc();
        }
    }

    /** The item's recent actuals for its sparkline; null until read. */
    double[] sparkline(String code) {
        return history.get(code);
    }

    /** The scorecard, computed once, the first time a view asks. */
    void wantScorecard() {
        if (!scorecardAsked) {
            scorecardAsked = true;
            later(sources.scorecard(), r -> scorecard = r, problem -> scorecardProblem = problem);
        }
    }

    private <T> void later(Supplier<T> work, Consumer<T> done, Consumer<String> failed) {
        background.execute(() -> post.accept(outcome(work, done, failed)));
    }

    /** Does {@code work} on this (background) thread; what the UI thread then does with its result or failure. */
    private static <T> Runnable outcome(Supplier<T> work, Consumer<T> done, Consumer<String> failed) {
        try {
            T result = work.get();
            return () -> done.accept(result);
        } catch (RuntimeException e) {
            String text = e.getMessage() == null ? e.toString() : e.getMessage();
            return () -> failed.accept(text);
        }
    }

    Optional<AgendaRow> row(String code) {
        return Optional.ofNullable(rowsByCode.get(code));
    }

    List<AgendaRow> agendaRows() {
        return agenda == null ? List.of() : agenda.rows();
    }

    View top() {
        return views.peek();
    }

    void open(View view) {
        views.push(view);
    }

    /** Back to the previous view; the agenda is never closed. */
    void back() {
        if (views.size() > 1) {
            views.pop();
        }
    }

    /** Back to the agenda, closing everything above it. */
    void toAgenda() {
        while (views.size() > 1) {
            views.pop();
        }
    }

    /** Replaces everything above the agenda with {@code view}. */
    void openFromAgenda(View view) {
        while (views.size() > 1) {
            views.pop();
        }
        views.push(view);
    }

    boolean isFacilitator() {
        return meeting.role() == Meeting.Role.FACILITATOR;
    }

    void say(String text, Look.Role role) {
        message = text;
        messageRole = role;
    }

    void say(String text) {
        say(text, Look.Role.PLAIN);
    }

    /** Reads the shared state again if anyone committed since the last look; true when it did. */
    boolean checkForChanges() {
        if (!meeting.changed()) {
            return false;
        }
        reload();
        return true;
    }

    void reload() {
        state = meeting.state();
        String onTable = state.onTable().orElse(null);
        if (onTable != null && !onTable.equals(lastOnTable)) {
            lastOnTable = onTable;
            if (follow && !isFacilitator()) {
                openFromAgenda(new ItemView(this, onTable));
                say("now on the table: " + onTable + " (f: stop following)");
            }
        }
        views.forEach(View::refreshed);
        followAgenda();
    }

    /** Once a second: the clock moves, and now and then this screen checks in. */
    void tick() {
        Instant now = meeting.now();
        if (Duration.between(lastHeartbeat, now).compareTo(HEARTBEAT) >= 0) {
            lastHeartbeat = now;
            meeting.heartbeat();
        }
    }

    void table(String code) {
        if (!isFacilitator()) {
            say("only the facilitator (" + state.meeting().facilitator() + ") tables items", Look.Role.WARN);
            return;
        }
        meeting.table(code);
        reload();
        say(code + " is on the table");
    }

    /** Records "reviewed, no change" for the item's decision periods. */
    void keep(String code) {
        Meeting.ItemDetail detail = meeting.item(code);
        if (detail.decisionPeriods().isEmpty()) {
            say(code + " has no target period at the decision lags in this cycle", Look.Role.WARN);
            return;
        }
        List<String> periods = detail.decisionPeriods().stream().map(Object::toString).toList();
        meeting.decide(new DecisionRequest(code, meeting.cycle().toString(), periods, null, null, true,
                "reviewed, no change", "other", minutesOpen(code), null, null));
        reload();
        say(code + " kept for " + String.join(", ", periods));
    }

    void opened(String code) {
        openedAt.put(code, meeting.now());
    }

    long secondsOpen(String code) {
        Instant at = openedAt.get(code);
        return at == null ? 0 : Math.max(0, Duration.between(at, meeting.now()).toSeconds());
    }

    /** Minutes since the item was opened, to a tenth; null (unknown) when it was never opened here. */
    String minutesOpen(String code) {
        if (!openedAt.containsKey(code)) {
            return null;
        }
        return java.math.BigDecimal.valueOf(secondsOpen(code)).divide(java.math.BigDecimal.valueOf(60), 1,
                java.math.RoundingMode.HALF_EVEN).toPlainString();
    }

    /** Items in agenda order after the current filter is not applied: for n / p in the item view. */
    Optional<String> neighbour(String code, int step) {
        List<AgendaRow> rows = agendaRows();
        for (int i = 0; i < rows.size(); i++) {
            if (rows.get(i).code().equals(code)) {
                int j = i + step;
                return j >= 0 && j < rows.size() ? Optional.of(rows.get(j).code()) : Optional.empty();
            }
        }
        return Optional.empty();
    }
}
