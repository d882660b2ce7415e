package org.plenum.app;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.plenum.core.Frequency;
import org.plenum.core.Period;
import java.util.function.Function;
import org.plenum.core.ScoredChange;
import org.plenum.score.BootstrapInterval;
import org.plenum.score.DecisionLens;
import org.plenum.score.LensGroup;
import org.plenum.score.ReasonWords;
import org.plenum.score.TimeAndMoney;
import org.plenum.store.LensReads;
import org.plenum.score.PairErrors;
import org.plenum.score.PairedSet;
import org.plenum.score.Placebo;
import org.plenum.score.Scorecard;
import org.plenum.store.Catalog;
import org.plenum.store.ScoreReads;
import org.plenum.core.Series;
import org.plenum.store.Workspace;

/** Scores every step of the process at one lag against the placebo (DESIGN §5), optionally by group. */
public final class Score {
    /** Fields a scorecard can be broken down by, besides the free item attributes. */
    static final List<String> PAIR_FIELDS = List.of("group", "region", "item", "cycle");
    /** Fields only decisions have: the lens alone is broken down by them. */
    static final List<String> DECISION_FIELDS = List.of("author", "tag", "reason", "direction", "size");

    private Score() {}

    /** The scorecard of all pairs, one breakdown per field asked for, and the decision lens. */
    public record Report(Scorecard all, List<Breakdown> breakdowns, Lens lens) {}

    /**
     * One field's breakdown: a scorecard per value (empty for fields only decisions have, such as
     * author) and the lens over the decisions per value.
     */
    public record Breakdown(String field, Map<String, Scorecard> scorecards, List<LensGroup> lens) {}

    /**
     * The decision lens: the ledger's standing decisions by class and direction, the imported
     * steps' changes by class, time and money.
     */
    public record Lens(String ledgerStep, List<LensGroup> classes, List<LensGroup> directions,
            List<LensGroup> importedClasses, TimeAndMoney time) {}

    /** @param fields breakdown fields, none when null or empty */
    public static Report run(Workspaces workspaces, Path db, int lag, Placebo placebo, List<String> fields, int draws) {
        return run(workspaces, db, lag, placebo, fields, draws, true);
    }

    /**
     * @param withLens false leaves the decision lens out (its fields are then empty), for callers
     *     that need the scorecards only
     */
    public static Report run(Workspaces workspaces, Path db, int lag, Placebo placebo, List<String> fields, int draws,
            boolean withLens) {
        List<String> by = fields == null ? List.of() : fields;
        try (Workspace ws = workspaces.open(db)) {
            Catalog catalog = ws.processSteps();
            Frequency frequency = catalog.frequency();
            if (frequency == null) {
                throw new UsageException("the workspace holds no periods yet: import actuals and forecasts first");
            }
            ScoreReads reads = new ScoreReads(ws);
            checkFields(by, fields(reads));
            List<Series> read = ParallelReads.of(workspaces, db, catalog.stepNames(), catalog.ledgerStep(), lag);
            PairedSet set = pairedSet(read, catalog, lag, placebo);
            Series actuals = read.get(0);
            read = null; // the steps' series are in the set now: a million rows each the heap need not keep
            BootstrapInterval bootstrap = BootstrapInterval.withDefaults().withDraws(draws);
            PairErrors errors = PairErrors.of(set);
            Scorecard all = Scorecard.of(errors, placebo, bootstrap);
            LensReads lensReads = new LensReads(ws);
            List<ScoredChange> decisions = withLens ? lensReads.decisions() : List.of();
            DecisionLens lens = withLens ? new DecisionLens(actuals) : null;
            List<Breakdown> breakdowns = new ArrayList<>();
            for (String field : by) {
                breakdowns.add(new Breakdown(field, DECISION_FIELDS.contains(field) ? Map.of()
                        : breakdown(reads, errors, placebo, field, frequency),
                        withLens ? lens.groups(decisions, keys(reads, field, frequency)) : List.of()));
            }
            return new Report(all, breakdowns, withLens ? lens(catalog.ledgerStep(), lens, lensReads, decisions,
                    reads.unitValues()) : null);
        }
    }

    private static void checkFields(List<String> by, List<String> known) {
        for (String field : by) {
            if (!known.contains(field)) {
                throw new UsageException("--by: expected one of " + String.join(", ", known) + ", found \"" + field
                        + "\"");
            }
        }
    }

    /** @param read the actuals, then each step's series at the lag */
    private static PairedSet pairedSet(List<Series> read, Catalog catalog, int lag, Placebo placebo) {
        PairedSet set = PairedSet.of(read.get(0), catalog.stepNames(), read.subList(1, read.size()), lag, placebo,
                catalog.frequency().seasonLength());
        if (set.size() == 0) {
            throw new UsageException("no scored pairs at lag " + lag + ": no (item, period) has an actual, the "
                    + placebo.stepName() + " placebo and every step's forecast (" + set.leftOut() + " left out)");
        }
        return set;
    }

    /**
     * One scorecard per value of {@code by}. Rows are grouped through integer labels (a label per
     * item, or per cycle); the groups share the set's ranked errors.
     */
    private static Map<String, Scorecard> breakdown(ScoreReads reads, PairErrors errors, Placebo placebo, String by,
            Frequency frequency) {
        PairedSet set = errors.set();
        Labels labels = by.equals("cycle") ? Labels.ofCycles(set, frequency) : Labels.ofItems(set, reads.attribute(by));
        int[][] rows = labels.rows(set.items(), set.periods(), set.size());
        int[] leftOut = labels.counts(set.leftOutItems(), set.leftOutPeriods());
        List<Integer> scored = new ArrayList<>();
        for (int g = 0; g < rows.length; g++) {
            if (rows[g].length > 0) {
                scored.add(g);
            }
        }
        // Intervals are drawn for the whole scorecard only (see Scorecard.of).
        List<Scorecard> cards = Scorecard.of(errors, placebo, null,
                scored.stream().map(g -> rows[g]).toArray(int[][]::new),
                scored.stream().mapToInt(g -> leftOut[g]).toArray());
        Map<String, Scorecard> out = new TreeMap<>();
        for (int k = 0; k < scored.size(); k++) {
            out.put(labels.names().get(scored.get(k)), cards.get(k));
        }
        return out;
    }

    static List<String> fields(ScoreReads reads) {
        List<String> all = new ArrayList<>(PAIR_FIELDS);
        all.addAll(DECISION_FIELDS);
        all.addAll(reads.attributeNames());
        return all;
    }

    private static Lens lens(String ledgerStep, DecisionLens lens, LensReads reads, List<ScoredChange> decisions,
            Map<Integer, Long> unitValues) {
        return new Lens(ledgerStep, lens.groups(decisions, c -> List.of(DecisionLens.sizeClass(c))),
                lens.groups(decisions, c -> List.of(DecisionLens.direction(c))),
                lens.groups(reads.importedChanges(), c -> List.of(c.source() + " " + DecisionLens.sizeClass(c))),
                TimeAndMoney.of(decisions, reads.minutesByCycle().values(), unitValues));
    }

    /** How a decision is keyed for a breakdown; a reason counts under each of its words. */
    private static Function<ScoredChange, List<String>> keys(ScoreReads reads, String by, Frequency frequency) {
        return switch (by) {
            case "author" -> c -> List.of(c.author());
            case "tag" -> c -> List.of(c.tag());
            case "reason" -> c -> ReasonWords.of(c.reason());
            case "direction" -> c -> List.of(DecisionLens.direction(c));
            case "size" -> c -> List.of(DecisionLens.sizeClass(c));
            case "cycle" -> c -> List.of(new Period(frequency, c.cycle()).toString());
            default -> {
                Map<Integer, String> values = reads.attribute(by);
                yield c -> List.of(values.getOrDefault(c.item(), "(none)"));
            }
        };
    }
}
