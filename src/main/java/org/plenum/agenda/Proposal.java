package org.plenum.agenda;

/**
 * A change a planner is about to make on the adjustment form: the item, the value before
 * (the previous step's) and the proposed new value, exact in millionths. Direction and size
 * follow from the two values.
 */
public record Proposal(int item, long priorMicros, long newMicros) {
    public Proposal {
        if (priorMicros < 0 || newMicros < 0) {
            throw new IllegalArgumentException("quantities cannot be negative: " + priorMicros + ", " + newMicros);
        }
    }
}
