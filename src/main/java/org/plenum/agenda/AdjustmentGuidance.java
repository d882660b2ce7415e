package org.plenum.agenda;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.function.Predicate;
import org.plenum.core.ScoredChange;
import org.plenum.core.Series;
import org.plenum.score.DecisionLens;
import org.plenum.score.Evidence;
import org.plenum.score.LensGroup;
import org.plenum.score.SizeClass;

/**
 * Guidance for the adjustment form, the entry point the meeting screen calls: given a proposed
 * change, the record of similar past decisions — same group, direction and size class, or, while
 * that pool holds fewer than {@value Evidence#MIN_PAIRS} decisions, all groups with that direction
 * and size class, then all groups with that direction — with count, geometric-mean error ratio,
 * share in the right direction and share overshooting (the decision lens of DESIGN §5), and a
 * sentence that follows the evidence rules: "too few to tell" under 30 decisions, "better" or
 * "worse" only with p &lt; 0.05 from the two-sided signed-rank test. When no pool reaches 30, the
 * widest is shown. Kept decisions are not adjustments and are left out.
 */
public final class AdjustmentGuidance {
    private final List<ScoredChange> past;
    private final Map<Integer, String> groups;
    private final DecisionLens lens = new DecisionLens(new Series(new int[0], new int[0], new long[0], 0));

    /**
     * @param pastDecisions standing ledger decisions whose target period has an actual
     * @param groups each item's group; items missing have none
     */
    public AdjustmentGuidance(List<ScoredChange> pastDecisions, Map<Integer, String> groups) {
        this.past = pastDecisions.stream().filter(c -> !c.kept() && c.quantity() != c.prior()).toList();
        this.groups = Map.copyOf(groups);
    }

    public Advice advise(Proposal proposal) {
        // A change record only to name the proposal's class the way the lens names past ones.
        ScoredChange asChange = new ScoredChange("proposal", proposal.item(), 0, 0, proposal.priorMicros(),
                proposal.newMicros(), 0, false, null, null, null, null);
        String sizeClass = DecisionLens.sizeClass(asChange);
        String direction = DecisionLens.direction(asChange);
        List<String> warnings = warnings(proposal);
        if (sizeClass.equals("kept")) {
            return new Advice(sizeClass, "none", 0, OptionalDouble.empty(), OptionalDouble.empty(),
                    OptionalDouble.empty(), tooFew(0), "No change proposed.", warnings);
        }
        String group = groups.get(proposal.item());
        List<Pool> pools = new ArrayList<>();
        if (group != null) {
            pools.add(new Pool("group " + group + ", " + sizeClass,
                    c -> group.equals(groups.get(c.item())) && DecisionLens.sizeClass(c).equals(sizeClass)));
        }
        pools.add(new Pool("all groups, " + sizeClass, c -> DecisionLens.sizeClass(c).equals(sizeClass)));
        pools.add(new Pool("all groups, " + direction, c -> DecisionLens.direction(c).equals(direction)));
        List<ScoredChange> chosen = List.of();
        String name = pools.get(pools.size() - 1).name();
        for (Pool p : pools) {
            chosen = past.stream().filter(p.test()).toList();
            name = p.name();
            if (chosen.size() >= Evidence.MIN_PAIRS) {
                break;
            }
        }
        if (chosen.isEmpty()) {
            return new Advice(sizeClass, name, 0, OptionalDouble.empty(), OptionalDouble.empty(),
                    OptionalDouble.empty(), tooFew(0), "No similar past decision has an actual yet: no record to go by.",
                    warnings);
        }
        LensGroup g = lens.groups(chosen, c -> List.of(sizeClass)).get(0);
        return new Advice(sizeClass, name, g.count(), g.ratio().value(), g.shareRight(), g.shareOvershoot(),
                g.evidence(), sentence(name, g), warnings);
    }

    private record Pool(String name, Predicate<ScoredChange> test) {}

    private static Evidence tooFew(int pairs) {
        return new Evidence(Evidence.Label.TOO_FEW_TO_TELL, OptionalDouble.empty(), pairs);
    }

    static String sentence(String pool, LensGroup g) {
        String subject = g.count() + " similar past decision" + (g.count() == 1 ? "" : "s") + " (" + pool + ")";
        String detail = String.format(Locale.ROOT, "error ratio %s, p = %s; %s went the right way, %s overshot",
                number(g.ratio().value(), "%.2f"), number(g.evidence().pValue(), "%.3f"), share(g.shareRight()),
                share(g.shareOvershoot()));
        return switch (g.evidence().label()) {
            case TOO_FEW_TO_TELL -> "Too few to tell: only " + subject + " with an actual.";
            case BETTER -> subject + " made the forecast better (" + detail + ").";
            case WORSE -> subject + " made the forecast worse (" + detail + ").";
            case NO_CLEAR_DIFFERENCE -> subject + ": no clear difference from the forecast before them (" + detail
                    + ").";
        };
    }

    private static List<String> warnings(Proposal p) {
        List<String> out = new ArrayList<>();
        if (p.newMicros() == p.priorMicros()) {
            return out;
        }
        SizeClass size = SizeClass.of(p.priorMicros(), p.newMicros());
        if (size == SizeClass.UNDER_5) {
            out.add("Tiny adjustment (under 5%): check that it is worth the meeting's time.");
        }
        if (size == SizeClass.SET_TO_ZERO) {
            out.add("Setting the forecast to zero: it says nothing at all will sell in these periods.");
        }
        return out;
    }

    private static String number(OptionalDouble v, String format) {
        return v.isPresent() ? String.format(Locale.ROOT, format, v.getAsDouble()) : "-";
    }

    private static String share(OptionalDouble v) {
        return v.isPresent() ? String.format(Locale.ROOT, "%.0f%%", 100 * v.getAsDouble()) : "-";
    }
}
