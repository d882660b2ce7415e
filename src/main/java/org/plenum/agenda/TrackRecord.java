package org.plenum.agenda;

import java.util.OptionalDouble;
import org.plenum.score.Evidence;

/**
 * How much human review has helped an item: AvgRelMAE of the reviewed forecast against the
 * statistical one over the item's past changed pairs, shrunk toward its group's (and the group's
 * toward the workspace's) by {@link CredibilityShrinkage}.
 *
 * @param own the item's own ratio; empty when it has no changed pair or a zero MAE on either side
 * @param n the changed pairs behind {@code own} (0 when {@code own} is empty): the {@code n} of the shrinkage
 * @param parent the shrunk ratio of the item's group (the workspace's for an item without a group)
 * @param shrunk {@code r̂}, the track record shown and used
 * @param evidence the signed-rank evidence of the narrowest pool with enough pairs to tell
 * @param pool which pool that evidence comes from
 */
public record TrackRecord(OptionalDouble own, long n, double parent, double shrunk, Evidence evidence, Pool pool) {
    /** Whose changed pairs an evidence rests on. */
    public enum Pool {
        ITEM("item"), GROUP("group"), WORKSPACE("workspace");

        private final String word;

        Pool(String word) {
            this.word = word;
        }

        public String word() {
            return word;
        }
    }

    /** Expected gain {@code g = 1 − r̂}: the share of the statistical error review is expected to remove. */
    public double gain() {
        return 1 - shrunk;
    }

    /** Review has destroyed value here: {@code r̂ > 1} and the evidence says "worse" (DESIGN §6). */
    public boolean handsOff() {
        return shrunk > 1 && evidence.label() == Evidence.Label.WORSE;
    }
}
