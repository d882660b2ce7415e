package org.plenum.core;

/**
 * A change a person made to a forecast whose target period now has an actual: a standing ledger
 * decision, or an imported step's value that differs from the step before it. Quantities and
 * minutes are millionths; author, tag, reason and minutes are null for imported changes.
 */
public record ScoredChange(String source, int item, int cycle, int period, long prior, long quantity, long actual,
        boolean kept, String author, String tag, String reason, Long minutes) {}
