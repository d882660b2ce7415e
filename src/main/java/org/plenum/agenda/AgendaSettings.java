package org.plenum.agenda;

import java.util.OptionalDouble;

/**
 * The agenda's knobs, with DESIGN §6's defaults where it names one and Plenum's own elsewhere
 * (docs/choices.md).
 *
 * @param k shrinkage weight of the parent's record, in pairs (DESIGN: 5)
 * @param gainFloor the least gain credited to review, so that a big stake is never ranked as nothing (DESIGN: 0.05)
 * @param eventFactor priority multiplier for an item with an event tag in the decision window (Plenum: 1.5)
 * @param defaultMinutes expected minutes of an item never timed (DESIGN: 3)
 * @param budgetMinutes the meeting's time budget; empty for no cut line
 * @param abc ABC thresholds (common practice 0.80 / 0.95)
 * @param abcBasis what ABC shares are of
 * @param xyz XYZ thresholds (common practice 0.5 / 1.0)
 */
public record AgendaSettings(double k, double gainFloor, double eventFactor, double defaultMinutes,
        OptionalDouble budgetMinutes, double[] abc, AbcBasis abcBasis, double[] xyz) {

    /** What ABC shares are shares of. */
    public enum AbcBasis {
        /** Value when every candidate has a unit value, else volume. */
        AUTO,
        /** Volume times unit value (items without one count as zero value). */
        VALUE,
        /** Volume in units. */
        VOLUME
    }

    public AgendaSettings {
        if (!(k > 0) || !(gainFloor >= 0 && gainFloor < 1) || !(eventFactor >= 1) || !(defaultMinutes > 0)) {
            throw new IllegalArgumentException("agenda settings out of range: k=" + k + ", gain floor=" + gainFloor
                    + ", event factor=" + eventFactor + ", default minutes=" + defaultMinutes);
        }
        abc = abc.clone();
        xyz = xyz.clone();
    }

    public static AgendaSettings defaults() {
        return new AgendaSettings(CredibilityShrinkage.DEFAULT_K, Priority.DEFAULT_GAIN_FLOOR,
                Priority.DEFAULT_EVENT_FACTOR, ExpectedMinutes.DEFAULT_MINUTES, OptionalDouble.empty(),
                new double[] {0.80, 0.95}, AbcBasis.AUTO, new double[] {0.5, 1.0});
    }

    public AgendaSettings withBudget(double minutes) {
        return new AgendaSettings(k, gainFloor, eventFactor, defaultMinutes, OptionalDouble.of(minutes), abc, abcBasis,
                xyz);
    }

    public AgendaSettings withEventFactor(double factor) {
        return new AgendaSettings(k, gainFloor, factor, defaultMinutes, budgetMinutes, abc, abcBasis, xyz);
    }

    public AgendaSettings withGainFloor(double floor) {
        return new AgendaSettings(k, floor, eventFactor, defaultMinutes, budgetMinutes, abc, abcBasis, xyz);
    }

    public AgendaSettings withAbc(double a, double b, AbcBasis basis) {
        return new AgendaSettings(k, gainFloor, eventFactor, defaultMinutes, budgetMinutes, new double[] {a, b}, basis,
                xyz);
    }

    public AgendaSettings withXyz(double x, double y) {
        return new AgendaSettings(k, gainFloor, eventFactor, defaultMinutes, budgetMinutes, abc, abcBasis,
                new double[] {x, y});
    }
}
