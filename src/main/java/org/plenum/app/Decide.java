package org.plenum.app;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.SortedMap;
import org.plenum.core.BadInputException;
import org.plenum.core.Frequency;
import org.plenum.core.Period;
import org.plenum.core.Quantity;
import org.plenum.core.ValueException;
import org.plenum.store.Catalog;
import org.plenum.store.DecisionDraft;
import org.plenum.store.Ledger;
import org.plenum.store.Step;
import org.plenum.store.Workspace;

/**
 * Records a decision without the meeting screen: one ledger row per target period, saved as one
 * batch. Every problem is found before anything is written.
 */
public final class Decide {
    private static final BigDecimal HUNDRED = BigDecimal.valueOf(100);

    private Decide() {}

    /** A decision recorded for one period: what it changed. */
    public record Recorded(long id, Period period, Quantity prior, Quantity quantity, boolean kept) {}

    public static List<Recorded> run(Workspaces workspaces, Path db, DecisionRequest request) {
        try (Workspace ws = workspaces.open(db)) {
            return record(ws, request, null);
        }
    }

    /** Checks and records a decision on an open workspace, in {@code meeting} when it is not null. */
    static List<Recorded> record(Workspace ws, DecisionRequest request, Long meeting) {
        List<DecisionDraft> drafts = drafts(ws, request, meeting);
        List<Long> ids = new Ledger(ws).append(drafts);
        List<Recorded> out = new ArrayList<>();
        for (int i = 0; i < drafts.size(); i++) {
            DecisionDraft d = drafts.get(i);
            out.add(new Recorded(ids.get(i), d.period(), d.prior(), d.quantity(), d.kept()));
        }
        return out;
    }

    static List<DecisionDraft> drafts(Workspace ws, DecisionRequest r, Long meeting) {
        // Steps, the one item and the tags only: the whole catalog lists every item, which a
        // meeting's save must not wait for.
        Catalog catalog = ws.processSteps();
        List<String> problems = new ArrayList<>();
        Step step = step(catalog, r.step(), problems);
        if (!ws.hasItem(r.item())) {
            problems.add("item: expected an item of the workspace, found \"" + r.item() + "\"");
        }
        if (r.reason() == null || r.reason().isBlank()) {
            problems.add("--reason: expected a few words saying why, found an empty reason");
        }
        Set<String> tags = ws.tags();
        if (!tags.contains(r.tag())) {
            problems.add("--tag: expected one of " + String.join(", ", tags) + ", found \"" + r.tag() + "\"");
        }
        Quantity minutes = optionalQuantity("--minutes", r.minutes(), problems);
        Quantity absolute = optionalQuantity("--qty", r.quantity(), problems);
        Period cycle = period("--cycle", r.cycle(), catalog.frequency(), problems);
        List<Period> periods = new ArrayList<>();
        for (String p : r.periods()) {
            Period period = period("--period", p, catalog.frequency(), problems);
            if (period != null && periods.contains(period)) {
                problems.add("--period: expected each period once, found " + p + " twice");
            }
            periods.add(period);
        }
        if (r.percent() != null && r.percent().compareTo(HUNDRED.negate()) < 0) {
            problems.add("--pct: expected a change of -100% or more, found " + r.percent().toPlainString() + "%");
        }
        if (!problems.isEmpty() || step == null) {
            throw new BadInputException(problems);
        }
        Step previous = catalog.previous(step).orElseThrow();
        SortedMap<Period, Quantity> priors = ws.stepValues(r.item(), previous.name(), cycle);
        checkHorizon(r.item(), previous, cycle, periods, priors);
        return drafts(r, cycle, step, periods, priors, absolute, minutes, meeting);
    }

    private static List<DecisionDraft> drafts(DecisionRequest r, Period cycle, Step step, List<Period> periods,
            SortedMap<Period, Quantity> priors, Quantity absolute, Quantity minutes, Long meeting) {
        Instant now = Instant.now().truncatedTo(java.time.temporal.ChronoUnit.MILLIS);
        List<DecisionDraft> drafts = new ArrayList<>();
        for (int i = 0; i < periods.size(); i++) {
            Period p = periods.get(i);
            Quantity prior = priors.get(p);
            Quantity quantity = r.keep() ? prior : absolute != null ? absolute : scaled(prior, r.percent());
            drafts.add(new DecisionDraft(r.item(), cycle, p, step.name(), prior, quantity, r.keep(), r.reason().strip(),
                    r.tag(), r.author(), share(minutes, i, periods.size()), now, meeting));
        }
        return drafts;
    }

    /** {@code prior × (1 + percent/100)}, to the nearest millionth, halves to even. */
    static Quantity scaled(Quantity prior, BigDecimal percent) {
        BigDecimal factor = HUNDRED.add(percent).divide(HUNDRED);
        return Quantity.of(prior.toBigDecimal().multiply(factor).setScale(Quantity.SCALE, RoundingMode.HALF_EVEN));
    }

    /**
     * The minutes of a decision over several periods are split evenly across its rows, the
     * remainder on the first row, so that sums per item, meeting or author stay exact.
     */
    static Quantity share(Quantity minutes, int index, int count) {
        if (minutes == null) {
            return null;
        }
        long each = minutes.micros() / count;
        return new Quantity(index == 0 ? minutes.micros() - each * (count - 1) : each);
    }

    private static void checkHorizon(String item, Step previous, Period cycle, List<Period> periods,
            SortedMap<Period, Quantity> priors) {
        if (priors.isEmpty()) {
            throw new BadInputException("--cycle: expected a cycle in which " + item + " has a " + previous.name()
                    + " forecast, found " + cycle + " without one");
        }
        List<String> problems = new ArrayList<>();
        for (Period p : periods) {
            if (!priors.containsKey(p)) {
                problems.add("--period: expected a period of cycle " + cycle + "'s horizon for " + item + " ("
                        + priors.firstKey() + " to " + priors.lastKey() + "), found " + p);
            }
        }
        if (!problems.isEmpty()) {
            throw new BadInputException(problems);
        }
    }

    private static Step step(Catalog catalog, String name, List<String> problems) {
        String wanted = name == null ? catalog.ledgerStep() : name;
        Step step = catalog.step(wanted).orElse(null);
        if (step == null || step.position() == 1) {
            problems.add("--step: expected one of the review steps "
                    + String.join(", ", catalog.stepNames().subList(1, catalog.steps().size())) + ", found \"" + wanted
                    + "\"");
            return null;
        }
        return step;
    }

    private static Period period(String option, String text, Frequency frequency, List<String> problems) {
        try {
            return Period.parse(text, frequency);
        } catch (ValueException e) {
            problems.add(option + ": expected " + e.expected() + ", found \"" + text + "\"");
            return null;
        }
    }

    private static Quantity optionalQuantity(String option, String text, List<String> problems) {
        if (text == null) {
            return null;
        }
        try {
            return Quantity.parse(text);
        } catch (ValueException e) {
            problems.add(option + ": expected " + e.expected() + ", found \"" + text + "\"");
            return null;
        }
    }
}
