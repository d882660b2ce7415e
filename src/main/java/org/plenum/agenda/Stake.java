package org.plenum.agenda;

import java.util.OptionalDouble;

/**
 * What an item's statistical forecast stands to get wrong in the cycle (DESIGN §6): its expected
 * absolute error over the target periods, {@code MAE × periods × unit value} (unit value 1 when
 * unknown, so the stake is then in units).
 *
 * @param value the stake; empty when the item has neither a recent error nor two consecutive actuals
 * @param mae the MAE it rests on, in units
 * @param basis where the MAE came from
 * @param periods the item's target periods in the cycle at the decision lags
 * @param unitValue money per unit, when known
 */
public record Stake(OptionalDouble value, OptionalDouble mae, Basis basis, int periods, OptionalDouble unitValue) {
    /** Where the MAE came from. */
    public enum Basis {
        /** The recent MAE of the statistical forecast. */
        RECENT("recent"),
        /** The in-sample naive MAE, for an item without a recent error. */
        NAIVE("naive"),
        /** Neither could be computed. */
        NONE("none");

        private final String word;

        Basis(String word) {
            this.word = word;
        }

        public String word() {
            return word;
        }
    }

    static Stake of(History history, int item, int cycle, int periods, Long unitValueMicros) {
        OptionalDouble unitValue = unitValueMicros == null ? OptionalDouble.empty()
                : OptionalDouble.of(unitValueMicros / 1e6);
        RecentError recent = RecentError.of(history, item, cycle);
        OptionalDouble mae = recent.mae();
        Basis basis = Basis.RECENT;
        if (mae.isEmpty()) {
            mae = NaiveMae.mean(NaiveMae.of(history, item, cycle));
            basis = mae.isPresent() ? Basis.NAIVE : Basis.NONE;
        }
        OptionalDouble value = mae.isEmpty() ? OptionalDouble.empty()
                : OptionalDouble.of(mae.getAsDouble() * periods * unitValue.orElse(1));
        return new Stake(value, mae, basis, periods, unitValue);
    }
}
