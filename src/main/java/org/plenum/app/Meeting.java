package org.plenum.app;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.SortedMap;
import java.util.TreeMap;
import org.plenum.core.Decision;
import org.plenum.core.Frequency;
import org.plenum.core.Period;
import org.plenum.core.Quantity;
import org.plenum.core.ValueException;
import org.plenum.io.ForecastCsv;
import org.plenum.score.AdjustmentOutcome;
import org.plenum.score.Placebo;
import org.plenum.store.Catalog;
import org.plenum.store.ItemReads;
import org.plenum.store.Ledger;
import org.plenum.store.MeetingAgendas;
import org.plenum.store.Meetings;
import org.plenum.store.Step;
import org.plenum.store.Workspace;

/**
 * One screen's place in a cycle's meeting. The first to open a cycle's meeting is its
 * facilitator (who tables items and closes it); everyone after is a planner. Each screen has its
 * own connection; screens see each other's work through the database alone. Not thread-safe:
 * the screen's UI thread owns it.
 */
public final class Meeting implements AutoCloseable {
    /** Someone counts as connected while their screen has checked in within this time. */
    public static final Duration PRESENT_WITHIN = Duration.ofSeconds(30);

    public enum Role { FACILITATOR, PLANNER }

    /** Where an item stands in this meeting. */
    public enum Status {
        NOT_YET("not yet"), TABLED("tabled"), ADJUSTED("adjusted"), KEPT("kept");

        private final String word;

        Status(String word) {
            this.word = word;
        }

        public String word() {
            return word;
        }
    }

    /**
     * What every screen shows about the meeting, read at one moment.
     *
     * @param present the people whose screens are running, facilitator first
     * @param onTable the item on the table now
     * @param decisions this meeting's decisions, oldest first, superseded ones included
     * @param statuses the status of each item the meeting has touched
     */
    public record State(Meetings.Meeting meeting, List<Meetings.Person> people, List<String> present,
            Optional<String> onTable, List<Meetings.Tabled> tabled, List<Decision> decisions,
            Map<String, Status> statuses) {
        public Status status(String item) {
            return statuses.getOrDefault(item, Status.NOT_YET);
        }
    }

    /**
     * A past decision on an item with what happened.
     *
     * @param actual the actual of its target period, when known
     * @param outcome direction, aim and effect against the actual, when known
     */
    public record PastDecision(Decision decision, Optional<Quantity> actual, Optional<AdjustmentOutcome> outcome) {}

    /**
     * Everything the item view shows about one item in the meeting's cycle.
     *
     * @param steps each step's values for the cycle by target period, in process order (the
     *     ledger step's are the standing decisions over the previous step)
     * @param naive the naive forecast (last actual before the cycle) of each target period
     * @param decisionPeriods the target periods at the meeting's decision lags
     * @param past every decision ever made on the item, newest first
     */
    public record ItemDetail(ItemReads.Item item, SortedMap<Period, Quantity> actuals,
            Map<String, SortedMap<Period, Quantity>> steps, SortedMap<Period, Quantity> naive,
            List<Period> decisionPeriods, SortedMap<Period, List<String>> events, List<PastDecision> past) {}

    /** What closing wrote. */
    public record Closed(Path minutes, Path forecast, int totalMinutes) {}

    private final Workspace workspace;
    private final Meetings meetings;
    private final Clock clock;
    private final String person;
    private final Meetings.Meeting meeting;
    private final Role role;
    private final List<Integer> lags;
    private long seenVersion = Long.MIN_VALUE;

    private Meeting(Workspace workspace, Clock clock, String person, Meetings.Meeting meeting, List<Integer> lags) {
        this.workspace = workspace;
        this.meetings = new Meetings(workspace);
        this.clock = clock;
        this.person = person;
        this.meeting = meeting;
        this.role = meeting.facilitator().equals(person) ? Role.FACILITATOR : Role.PLANNER;
        this.lags = List.copyOf(lags);
    }

    /**
     * Opens the cycle's meeting, starting it when none is open.
     *
     * @param cycleText the cycle, or null for the one open meeting (or, with none open, the latest
     *     cycle with forecasts of the first step)
     * @param budgetMinutes the time box of a meeting this call starts; ignored when joining
     * @param lags the decision lags: target periods {@code cycle + lag} are preselected in forms;
     *     once the meeting's agenda is kept, the lags it was ranked at apply to every screen
     */
    public static Meeting join(Workspaces workspaces, Path db, String cycleText, Integer budgetMinutes,
            List<Integer> lags, String person, Clock clock) {
        if (budgetMinutes != null && budgetMinutes <= 0) {
            throw new UsageException("--budget: expected minutes above 0, found " + budgetMinutes);
        }
        if (person == null || person.isBlank()) {
            throw new UsageException("no user name: set USER to the name decisions should carry");
        }
        Workspace ws = workspaces.open(db);
        try {
            Period cycle = cycle(ws, cycleText);
            Meetings.Meeting m = new Meetings(ws).openOrStart(cycle, person, budgetMinutes, clock.instant());
            List<Integer> meetingLags = new MeetingAgendas(ws).lags(m.id())
                    .map(kept -> Arrays.stream(kept).boxed().toList()).orElse(lags);
            Meeting joined = new Meeting(ws, clock, person, m, meetingLags);
            joined.heartbeat();
            return joined;
        } catch (RuntimeException e) {
            ws.close();
            throw e;
        }
    }

    private static Period cycle(Workspace ws, String text) {
        Frequency frequency = ws.frequency();
        if (frequency == null) {
            throw new UsageException("the workspace holds no periods yet: import actuals and forecasts first");
        }
        if (text != null) {
            try {
                return Period.parse(text, frequency);
            } catch (ValueException e) {
                throw new UsageException("--cycle: expected " + e.getMessage() + ", found \"" + text + "\"");
            }
        }
        List<Meetings.Meeting> open = new Meetings(ws).openMeetings();
        if (open.size() == 1) {
            return open.get(0).cycle();
        }
        if (open.size() > 1) {
            throw new UsageException("--cycle: expected one of the open meetings' cycles ("
                    + String.join(", ", open.stream().map(m -> m.cycle().toString()).toList()) + ")");
        }
        return new Meetings(ws).latestCycle().orElseThrow(() -> new UsageException(
                "--cycle: no cycle has forecasts yet; import forecasts first"));
    }

    /** The database's file name, for the top line. */
    public String workspaceName() {
        return workspace.path().getFileName().toString();
    }

    /**
     * Every item's actuals over the {@code periods} periods before {@code cycle}, in units (NaN
     * where missing): the agenda's sparklines. Its own connection, so it can run off the UI thread.
     */
    public static Map<String, double[]> recentActuals(Workspaces workspaces, Path db, Period cycle, int periods) {
        try (Workspace ws = workspaces.open(db)) {
            return new ItemReads(ws).actualsWindow(cycle.plus(-periods), periods);
        }
    }

    public Role role() {
        return role;
    }

    public String person() {
        return person;
    }

    public Meetings.Meeting info() {
        return meeting;
    }

    public Period cycle() {
        return meeting.cycle();
    }

    public List<Integer> lags() {
        return lags;
    }

    public Instant now() {
        return clock.instant();
    }

    /** Whether anyone has committed to the workspace since the last call (the first call says yes). */
    public boolean changed() {
        long version = meetings.dataVersion();
        boolean changed = version != seenVersion;
        seenVersion = version;
        return changed;
    }

    /** Tells the other screens this one is still here. */
    public void heartbeat() {
        meetings.seen(meeting.id(), person, clock.instant());
    }

    public State state() {
        Instant now = clock.instant();
        Meetings.Meeting current = meetings.meeting(meeting.id()).orElseThrow();
        List<Meetings.Person> people = meetings.people(meeting.id());
        List<String> present = new ArrayList<>();
        for (Meetings.Person p : people) {
            if (p.leftAt() == null && Duration.between(p.seenAt(), now).compareTo(PRESENT_WITHIN) <= 0) {
                present.add(p.name());
            }
        }
        present.sort((a, b) -> a.equals(meeting.facilitator()) ? -1 : b.equals(meeting.facilitator()) ? 1
                : a.compareTo(b));
        List<Meetings.Tabled> tabled = meetings.tabled(meeting.id());
        List<Decision> decisions = new Ledger(workspace).ofMeeting(meeting.id());
        return new State(current, people, present, tabled.isEmpty() ? Optional.empty()
                : Optional.of(tabled.get(tabled.size() - 1).item()), tabled, decisions, statuses(tabled, decisions));
    }

    /** Adjusted when a standing decision changed the number, kept when all left it, tabled when only discussed. */
    private static Map<String, Status> statuses(List<Meetings.Tabled> tabled, List<Decision> decisions) {
        Map<String, Status> out = new LinkedHashMap<>();
        for (Meetings.Tabled t : tabled) {
            out.put(t.item(), Status.TABLED);
        }
        for (Decision d : decisions) {
            if (d.supersededBy() != null) {
                continue;
            }
            Status now = d.changeMicros() != 0 ? Status.ADJUSTED : Status.KEPT;
            out.merge(d.item(), now, (a, b) -> a == Status.ADJUSTED || b == Status.ADJUSTED ? Status.ADJUSTED : b);
        }
        return out;
    }

    /** Puts an item on the table; only the facilitator may. */
    public void table(String item) {
        requireFacilitator("table an item");
        meetings.table(meeting.id(), item, clock.instant());
    }

    /** Records a decision of this screen's person in this meeting. */
    public List<Decide.Recorded> decide(DecisionRequest request) {
        DecisionRequest mine = new DecisionRequest(request.item(), meeting.cycle().toString(), request.periods(),
                request.quantity(), request.percent(), request.keep(), request.reason(), request.tag(),
                request.minutes(), request.step(), person);
        List<Decide.Recorded> recorded = Decide.record(workspace, mine, meeting.id());
        meetings.dropDraft(meeting.id(), person, request.item());
        return recorded;
    }

    public void saveDraft(String item, String fields) {
        meetings.saveDraft(meeting.id(), person, item, fields, clock.instant());
    }

    public Optional<String> draft(String item) {
        return meetings.draft(meeting.id(), person, item);
    }

    public void dropDraft(String item) {
        meetings.dropDraft(meeting.id(), person, item);
    }

    /** The values this meeting's decisions change: the ledger step's predecessor's, by target period. */
    public SortedMap<Period, Quantity> priors(ItemDetail detail) {
        String ledgerStep = workspace.ledgerStep();
        SortedMap<Period, Quantity> previous = new TreeMap<>();
        for (Map.Entry<String, SortedMap<Period, Quantity>> e : detail.steps().entrySet()) {
            if (e.getKey().equals(ledgerStep)) {
                return previous;
            }
            previous = e.getValue();
        }
        return previous;
    }

    /** Items this person left unsaved input on, oldest first. */
    public List<String> draftItems() {
        return meetings.draftItems(meeting.id(), person);
    }

    /** How many times the meeting's agenda has been ranked and kept: 0 before the first time. */
    public int agendaRanking() {
        return new MeetingAgendas(workspace).ranking(meeting.id());
    }

    /** The event tags the workspace knows, for the form's pick list. */
    public List<String> tags() {
        return workspace.tags().stream().sorted().toList();
    }

    public ItemDetail item(String code) {
        ItemReads reads = new ItemReads(workspace);
        ItemReads.Item item = reads.item(code).orElseThrow(() -> new UsageException("no item " + code));
        Catalog catalog = workspace.processSteps();
        Map<String, SortedMap<Period, Quantity>> steps = new LinkedHashMap<>();
        for (Step step : catalog.steps()) {
            steps.put(step.name(), workspace.stepValues(code, step.name(), meeting.cycle()));
        }
        SortedMap<Period, Quantity> actuals = reads.actuals(code);
        SortedMap<Period, Quantity> first = steps.values().iterator().next();
        SortedMap<Period, Quantity> naive = new TreeMap<>();
        List<Period> decisionPeriods = new ArrayList<>();
        int m = catalog.frequency().seasonLength();
        for (Period p : first.keySet()) {
            Period source = new Period(p.frequency(), Placebo.NAIVE.source(p.index(), meeting.cycle().index(), m));
            Quantity q = actuals.get(source);
            if (q != null) {
                naive.put(p, q);
            }
            if (lags.contains(p.minus(meeting.cycle()))) {
                decisionPeriods.add(p);
            }
        }
        List<PastDecision> past = new ArrayList<>();
        for (Decision d : new Ledger(workspace).ofItem(code)) {
            Optional<Quantity> actual = Optional.ofNullable(actuals.get(d.period()));
            past.add(0, new PastDecision(d, actual, actual.map(a -> AdjustmentOutcome.of(d.prior().micros(),
                    d.quantity().micros(), a.micros()))));
        }
        return new ItemDetail(item, actuals, steps, naive, decisionPeriods, reads.events(code), past);
    }

    /**
     * Closes the meeting (facilitator only): records its end and total minutes and writes, beside
     * the database, its minutes as Markdown and the meeting step's forecast of every reviewed item
     * as a forecasts file.
     *
     * @param notReached items of the agenda below the cut line that nobody reviewed, in agenda order
     */
    public Closed close(List<String> notReached) {
        requireFacilitator("close the meeting");
        Instant end = clock.instant();
        int total = (int) Math.round(Duration.between(meeting.startedAt(), end).toSeconds() / 60.0);
        State state = state();
        Path dir = workspace.path().toAbsolutePath().getParent();
        String base = meeting.cycle() + "-meeting-" + meeting.id();
        Path forecast = dir.resolve(base + "-forecast.csv");
        Path minutes = dir.resolve(base + "-minutes.md");
        ForecastCsv.write(forecast, reviewedForecast(state));
        write(minutes, MeetingMinutes.markdown(state, end, total, notReached));
        if (!meetings.close(meeting.id(), end, total)) {
            throw new UsageException("the meeting was already closed");
        }
        return new Closed(minutes, forecast, total);
    }

    /** The ledger step's value of every reviewed item's target periods: decisions, or the previous step's value. */
    private List<ForecastCsv.Row> reviewedForecast(State state) {
        String step = workspace.ledgerStep();
        List<ForecastCsv.Row> rows = new ArrayList<>();
        for (String item : new java.util.TreeSet<>(state.statuses().keySet())) {
            workspace.stepValues(item, step, meeting.cycle()).forEach((period, quantity) -> rows.add(
                    new ForecastCsv.Row(item, period, meeting.cycle(), step, quantity)));
        }
        return rows;
    }

    private static void write(Path file, String text) {
        try {
            Files.writeString(file, text, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException("writing " + file, e);
        }
    }

    private void requireFacilitator(String what) {
        if (role != Role.FACILITATOR) {
            throw new UsageException("only the facilitator (" + meeting.facilitator() + ") can " + what);
        }
    }

    /** Marks this screen gone and closes its connection. */
    @Override
    public void close() {
        try {
            meetings.left(meeting.id(), person, clock.instant());
        } finally {
            workspace.close();
        }
    }
}
