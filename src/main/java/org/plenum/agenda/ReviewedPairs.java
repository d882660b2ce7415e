package org.plenum.agenda;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.plenum.core.ScoredChange;

/**
 * The past (item, cycle, period) pairs where a person changed the statistical forecast. Several
 * human steps may hold a value for one pair (the meeting's decision, then an imported final): the
 * value of the latest step in the process order is what review finally sent out, so it alone is
 * compared with the statistical forecast. A pair counts as changed when that value differs from
 * the statistical forecast, exactly.
 */
public final class ReviewedPairs {
    private ReviewedPairs() {}

    /**
     * @param values each human step's values as changes ({@code prior} = the statistical forecast,
     *     {@code source} = the step's name)
     * @param stepOrder the steps' names in process order
     * @return the changed pairs, each with the latest step's value, in item, cycle, period order
     */
    public static List<ScoredChange> changed(List<ScoredChange> values, List<String> stepOrder) {
        Map<Key, ScoredChange> latest = new HashMap<>();
        for (ScoredChange v : values) {
            latest.merge(new Key(v.item(), v.cycle(), v.period()), v,
                    (a, b) -> stepOrder.indexOf(b.source()) > stepOrder.indexOf(a.source()) ? b : a);
        }
        List<ScoredChange> out = new ArrayList<>();
        for (ScoredChange v : latest.values()) {
            if (v.quantity() != v.prior()) {
                out.add(v);
            }
        }
        out.sort((a, b) -> a.item() != b.item() ? Integer.compare(a.item(), b.item())
                : a.cycle() != b.cycle() ? Integer.compare(a.cycle(), b.cycle()) : Integer.compare(a.period(), b.period()));
        return out;
    }

    private record Key(int item, int cycle, int period) {}
}
