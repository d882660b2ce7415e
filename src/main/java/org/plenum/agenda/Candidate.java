package org.plenum.agenda;

import java.util.List;

/**
 * An item with statistical forecasts in the ranked cycle at the decision lags.
 *
 * @param id the workspace's item id
 * @param group null when the item has none
 * @param unitValueMicros money per unit in millionths; null when unknown
 * @param targetPeriods the item's target periods in the cycle at the decision lags
 * @param tags event tags on those periods, sorted, each once
 */
public record Candidate(int id, String code, String description, String group, Long unitValueMicros,
        int[] targetPeriods, List<String> tags) {
    public Candidate {
        targetPeriods = targetPeriods.clone();
        tags = List.copyOf(tags);
    }
}
