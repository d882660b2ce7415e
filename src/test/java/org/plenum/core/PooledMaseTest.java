package org.plenum.core;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.junit.jupiter.api.Test;

/** MASE pooled over items, each pair scaled by its own item's in-sample naive MAE. */
class PooledMaseTest {

    private static long[] absoluteErrors(long[] actual, long[] forecast) {
        long[] e = new long[actual.length];
        for (int i = 0; i < e.length; i++) {
            e[i] = Math.abs(actual[i] - forecast[i]);
        }
        return e;
    }

    @Test
    void equalsTheSingleSeriesMaseForOneItem() {
        // BEER test set, seasonal naive, Q = 14.3: MASE 0.9370629 (R forecast::accuracy output, METHODS A3).
        double[] scales = new double[AusBeer.TEST.length];
        Arrays.fill(scales, 14.3e6);
        MeanAbsoluteScaledError.Pooled pooled = MeanAbsoluteScaledError.pooled(
                absoluteErrors(AusBeer.TEST, AusBeer.SEASONAL_NAIVE), scales);
        assertEquals(0.9370629, pooled.value().getAsDouble(), 5e-7);
        assertEquals(10, pooled.used());
    }

    @Test
    void averagesScaledErrorsAcrossItemsOfDifferentSize() {
        // Two items: the same relative error on a 1000× larger item gives the same scaled error
        // (Hyndman & Koehler 2006: scaled errors are independent of the scale of the data).
        long[] errors = {2_000_000, 2_000_000_000L};
        double[] scales = {4e6, 4e9};
        assertEquals(0.5, MeanAbsoluteScaledError.pooled(errors, scales).value().getAsDouble(), 1e-12);
    }

    @Test
    void leavesOutPairsWithoutAScale() {
        MeanAbsoluteScaledError.Pooled pooled = MeanAbsoluteScaledError.pooled(new long[] {1_000_000, 5, 7},
                new double[] {2e6, Double.NaN, 0});
        assertEquals(0.5, pooled.value().getAsDouble(), 1e-12);
        assertEquals(2, pooled.leftOut());
        assertTrue(MeanAbsoluteScaledError.pooled(new long[] {1}, new double[] {Double.NaN}).value().isEmpty());
    }
}
