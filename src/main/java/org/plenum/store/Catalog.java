package org.plenum.store;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.plenum.core.Frequency;

/**
 * What a reader of files needs to know about a workspace to check references: its frequency
 * ({@code null} until the first periods arrive), steps in order, the ledger's step, item ids by
 * code and the event tags in use.
 */
public record Catalog(Frequency frequency, List<Step> steps, String ledgerStep, Map<String, Integer> items,
        Set<String> tags) {

    public Optional<Step> step(String name) {
        return steps.stream().filter(s -> s.name().equals(name)).findFirst();
    }

    /** The step before {@code step} in the process order, if any. */
    public Optional<Step> previous(Step step) {
        return steps.stream().filter(s -> s.position() < step.position()).reduce((a, b) -> b);
    }

    public List<String> stepNames() {
        return steps.stream().map(Step::name).toList();
    }
}
