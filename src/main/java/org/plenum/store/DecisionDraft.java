package org.plenum.store;

import java.time.Instant;
import org.plenum.core.Period;
import org.plenum.core.Quantity;

/** A decision about to be appended to the ledger; the ledger assigns id, batch and what it supersedes. */
public record DecisionDraft(String item, Period cycle, Period period, String step, Quantity prior, Quantity quantity,
        boolean kept, String reason, String tag, String author, Quantity minutes, Instant recordedAt, Long meeting) {}
