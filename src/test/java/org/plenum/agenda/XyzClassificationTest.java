package org.plenum.agenda;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.SplittableRandom;
import org.apache.commons.statistics.descriptive.Mean;
import org.apache.commons.statistics.descriptive.StandardDeviation;
import org.junit.jupiter.api.Test;

class XyzClassificationTest {
    private static final XyzClassification XYZ = new XyzClassification(0.5, 1.0);

    private static long[] units(long... values) {
        return Arrays.stream(values).map(v -> v * 1_000_000L).toArray();
    }

    @Test
    void coefficientOfVariationMatchesCommonsStatistics() {
        // Reference: Apache Commons Statistics' sample standard deviation (n − 1) over its mean.
        SplittableRandom random = new SplittableRandom(7);
        for (int trial = 0; trial < 200; trial++) {
            long[] q = random.longs(2 + random.nextInt(30), 0, 5_000_000_000L).toArray();
            double[] d = Arrays.stream(q).asDoubleStream().toArray();
            double expected = StandardDeviation.of(d).getAsDouble() / Mean.of(d).getAsDouble();
            assertEquals(expected, XyzClassification.coefficientOfVariation(q).getAsDouble(), 1e-12 * expected);
        }
    }

    @Test
    void classesByThresholdsInclusive() {
        // 2, 4, 6: mean 4, s = 2, CV = 0.5 exactly → X (METHODS §7: X for CV ≤ 0.5).
        assertEquals("X", XYZ.classOf(units(2, 4, 6)));
        // 1, 3: mean 2, s = √2, CV = 0.7071 → Y.
        assertEquals("Y", XYZ.classOf(units(1, 3)));
        // 0, 0, 9: mean 3, s = √27, CV = 1.732 → Z.
        assertEquals("Z", XYZ.classOf(units(0, 0, 9)));
    }

    @Test
    void noDemandIsZAndFewerThanTwoValuesHaveNoClass() {
        assertEquals("Z", XYZ.classOf(units(0, 0, 0)));
        assertTrue(XyzClassification.coefficientOfVariation(units(0, 0)).isEmpty());
        assertEquals("-", XYZ.classOf(units(5)));
    }
}
