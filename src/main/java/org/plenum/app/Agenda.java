package org.plenum.app;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;
import java.util.concurrent.Executor;
import java.util.concurrent.Executors;
import org.plenum.agenda.AdjustmentGuidance;
import org.plenum.agenda.AgendaRanking;
import org.plenum.agenda.AgendaRow;
import org.plenum.agenda.AgendaSettings;
import org.plenum.agenda.Candidate;
import org.plenum.agenda.ExpectedMinutes;
import org.plenum.agenda.History;
import org.plenum.agenda.RecentError;
import org.plenum.agenda.ReviewedPairs;
import org.plenum.agenda.TrackRecords;
import org.plenum.core.CycleSeries;
import org.plenum.core.Frequency;
import org.plenum.core.Period;
import org.plenum.core.ScoredChange;
import org.plenum.core.Series;
import org.plenum.core.ValueException;
import org.plenum.store.AgendaReads;
import org.plenum.store.Catalog;
import org.plenum.store.LensReads;
import org.plenum.store.Step;
import org.plenum.store.Workspace;

/**
 * Ranks a cycle's candidate items for the meeting (DESIGN §6), and builds the adjustment form's
 * guidance. Reads from the store, ranks in the pure {@code agenda} package.
 */
public final class Agenda {
    /** The tag a decision carries when nothing in particular happened: it flags no event. */
    static final String NO_EVENT_TAG = "other";

    /** One reader thread for the whole process; daemon, so it never keeps the JVM alive. */
    private static final Executor READER = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "plenum-agenda-read");
        t.setDaemon(true);
        return t;
    });

    private Agenda() {}

    private static <T> T join(CompletableFuture<T> read) {
        try {
            return read.join();
        } catch (CompletionException e) {
            throw e.getCause() instanceof RuntimeException r ? r : e;
        }
    }

    /**
     * The ranked agenda.
     *
     * @param ledgerStep the workspace's ledger step, for the report
     * @param byValue whether ABC shares are of value (else of volume)
     */
    public record Report(Period cycle, int[] lags, List<AgendaRow> rows, boolean byValue, String statStep) {}

    /**
     * @param cycleText the cycle as typed ({@code --cycle})
     * @param lags the decision lags, each at least 0
     * @throws UsageException for a malformed or unknown cycle, or a cycle without statistical forecasts at those lags
     */
    public static Report run(Workspaces workspaces, Path db, String cycleText, int[] lags, AgendaSettings settings) {
        try (Workspace ws = workspaces.open(db)) {
            Catalog catalog = ws.processSteps();
            Period cycle = cycle(cycleText, catalog.frequency());
            Step stat = catalog.steps().get(0);
            AgendaReads reads = new AgendaReads(ws);
            int c = cycle.index();
            int windowStart = windowStart(c, lags);
            int actualsStart = Math.min(windowStart, c - catalog.frequency().seasonLength());
            // The largest read runs on a second connection while this one reads everything else: two cores.
            CompletableFuture<CycleSeries> windowRead = CompletableFuture.supplyAsync(() -> {
                try (Workspace other = workspaces.open(db)) {
                    return new AgendaReads(other).forecastsAround(stat.id(), windowStart, c, lags);
                }
            }, READER);
            List<AgendaReads.ItemRow> items = reads.items();
            Series actuals = reads.actualsBetween(actualsStart, c - 1);
            Map<Integer, Map<Integer, Set<String>>> tags = tags(reads, c, lags);
            List<ScoredChange> human = humanValues(reads, catalog, stat, c, lags);
            ExpectedMinutes minutes = new ExpectedMinutes(settings.defaultMinutes());
            reads.minutesBefore(c).forEach(m -> minutes.addCycle(m.item(), m.minutesMicros()));
            CycleSeries window = join(windowRead);
            List<Candidate> candidates = candidates(window, items, c, tags);
            if (candidates.isEmpty()) {
                throw noCandidates(reads, cycle, stat, lags);
            }
            History history = History.of(window, actuals);
            Set<Integer> shortWindows = AgendaRanking.needingOlderHistory(candidates, history, c);
            if (!shortWindows.isEmpty()) {
                history = history.withOlder(reads.forecastsBefore(stat.id(), shortWindows, windowStart, c, lags),
                        reads.actualsBefore(shortWindows, actualsStart));
            }
            Map<Integer, String> groups = groups(items);
            TrackRecords records = new TrackRecords(ReviewedPairs.changed(human, catalog.stepNames()), groups,
                    settings.k());
            List<AgendaRow> rows = AgendaRanking.rank(new AgendaRanking.Input(c, catalog.frequency().seasonLength(),
                    candidates, history, records, minutes), settings);
            return new Report(cycle, lags.clone(), rows, AgendaRanking.abcByValue(candidates, settings), stat.name());
        }
    }

    /**
     * The first cycle of the window read for every item: when nothing is missing, the six latest
     * cycles with a known error are {@code cycle − 1 − min lag} and the five before it. Items with
     * gaps have their older rows read apart.
     */
    static int windowStart(int cycle, int[] lags) {
        return cycle - RecentError.CYCLES - java.util.Arrays.stream(lags).min().orElseThrow();
    }

    /** The adjustment form's guidance over every standing ledger decision with an actual. */
    public static AdjustmentGuidance guidance(Workspaces workspaces, Path db) {
        try (Workspace ws = workspaces.open(db)) {
            return new AdjustmentGuidance(new LensReads(ws).decisions(), groups(new AgendaReads(ws).items()));
        }
    }

    private static Period cycle(String text, Frequency frequency) {
        if (frequency == null) {
            throw new UsageException("the workspace holds no periods yet: import forecasts first");
        }
        try {
            return Period.parse(text, frequency);
        } catch (IllegalArgumentException e) {
            // ValueException names what was expected; the plain parser's messages say the same less kindly.
            throw new UsageException("--cycle: expected " + (e instanceof ValueException v ? v.getMessage()
                    : "a " + frequency.word() + " period " + frequency.pattern()) + ", found \"" + text + "\"");
        }
    }

    private static UsageException noCandidates(AgendaReads reads, Period cycle, Step stat, int[] lags) {
        String lagText = java.util.Arrays.toString(lags).replaceAll("[\\[\\] ]", "");
        if (!reads.anyForecastIn(cycle.index())) {
            return new UsageException("no forecasts were issued in cycle " + cycle + ": expected a cycle the"
                    + " workspace holds forecasts of (import them first)");
        }
        return new UsageException("cycle " + cycle + " has no " + stat.name() + " forecasts at lags " + lagText
                + ": nothing to rank (try other --lags)");
    }

    /** Items with statistical forecasts in the cycle, with their target periods and event tags. */
    private static List<Candidate> candidates(CycleSeries window, List<AgendaReads.ItemRow> items, int cycle,
            Map<Integer, Map<Integer, Set<String>>> tags) {
        AgendaReads.ItemRow[] byId = new AgendaReads.ItemRow[items.isEmpty() ? 1 : items.get(items.size() - 1).id() + 1];
        items.forEach(i -> byId[i.id()] = i);
        List<Candidate> out = new ArrayList<>();
        int i = 0;
        while (i < window.size()) {
            int item = window.items()[i];
            int first = i;
            while (i < window.size() && window.items()[i] == item) {
                i++;
            }
            // The ranked cycle is the latest in the window, so its rows close the item's range.
            int start = i;
            while (start > first && window.cycles()[start - 1] == cycle) {
                start--;
            }
            if (start < i) {
                int[] periods = java.util.Arrays.copyOfRange(window.periods(), start, i);
                AgendaReads.ItemRow row = byId[item];
                out.add(new Candidate(item, row.code(), row.description(), row.group(), row.unitValueMicros(), periods,
                        tagsOf(tags.get(item), periods)));
            }
        }
        return out;
    }

    private static List<String> tagsOf(Map<Integer, Set<String>> byPeriod, int[] periods) {
        if (byPeriod == null) {
            return List.of();
        }
        Set<String> out = new TreeSet<>();
        for (int p : periods) {
            out.addAll(byPeriod.getOrDefault(p, Set.of()));
        }
        return List.copyOf(out);
    }

    /** Event tags by item and period in the decision window: imported events and the cycle's decisions. */
    private static Map<Integer, Map<Integer, Set<String>>> tags(AgendaReads reads, int cycle, int[] lags) {
        int from = cycle + java.util.Arrays.stream(lags).min().orElseThrow();
        int to = cycle + java.util.Arrays.stream(lags).max().orElseThrow();
        List<AgendaReads.TaggedPeriod> all = new ArrayList<>(reads.eventsBetween(from, to));
        all.addAll(reads.decisionTags(cycle, NO_EVENT_TAG));
        Map<Integer, Map<Integer, Set<String>>> out = new HashMap<>();
        for (AgendaReads.TaggedPeriod t : all) {
            out.computeIfAbsent(t.item(), k -> new HashMap<>()).computeIfAbsent(t.period(), k -> new TreeSet<>())
                    .add(t.tag());
        }
        return out;
    }

    /** Every human step's past values: the ledger's standing decisions and each imported step after the first. */
    private static List<ScoredChange> humanValues(AgendaReads reads, Catalog catalog, Step stat, int cycle, int[] lags) {
        List<ScoredChange> out = new ArrayList<>();
        for (Step step : catalog.steps().subList(1, catalog.steps().size())) {
            out.addAll(reads.humanValues(step, step.name().equals(catalog.ledgerStep()), stat.id(), cycle, lags));
        }
        return out;
    }

    private static Map<Integer, String> groups(List<AgendaReads.ItemRow> items) {
        Map<Integer, String> out = new HashMap<>();
        items.stream().filter(i -> i.group() != null).forEach(i -> out.put(i.id(), i.group()));
        return out;
    }
}
