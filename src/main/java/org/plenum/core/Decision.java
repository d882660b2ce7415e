package org.plenum.core;

import java.time.Instant;

/**
 * One entry of the decision ledger: for an item and one target period of a cycle, what a person
 * decided for a process step, against the value of the step before it.
 *
 * @param kept the item was reviewed and left as it was ({@code quantity == prior})
 * @param minutes time spent, or {@code null} when not recorded
 * @param supersedes the decision this one corrects, or {@code null}
 * @param supersededBy the later decision that corrects this one, or {@code null} while it stands
 * @param meeting the meeting it was made in, or {@code null} when logged outside one
 */
public record Decision(long id, long batch, String item, Period cycle, Period period, String step, Quantity prior,
        Quantity quantity, boolean kept, String reason, String tag, String author, Quantity minutes,
        Instant recordedAt, Long supersedes, Long supersededBy, Long meeting) {

    /** Signed change from the prior value, exact, in millionths of a unit. */
    public long changeMicros() {
        return quantity.minusMicros(prior);
    }
}
