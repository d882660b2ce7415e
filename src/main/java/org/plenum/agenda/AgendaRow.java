package org.plenum.agenda;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * One ranked item with every number behind its rank.
 *
 * @param priority empty when the stake is unknown
 * @param abc A, B or C
 * @param xyz X, Y, Z, or "-" with fewer than two known periods
 * @param cv the coefficient of variation behind {@code xyz}
 * @param eventFactor the factor applied to the priority (1 without an event tag)
 * @param aboveCut empty without a time budget
 */
public record AgendaRow(int rank, Candidate item, Stake stake, TrackRecord trackRecord, OptionalDouble priority,
        String abc, String xyz, OptionalDouble cv, double eventFactor, double expectedMinutes,
        Optional<Boolean> aboveCut) {

    public String code() {
        return item.code();
    }

    public List<String> tags() {
        return item.tags();
    }

    public boolean handsOff() {
        return trackRecord.handsOff();
    }
}
