package org.plenum.agenda;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class CredibilityShrinkageTest {

    @Test
    void weighsOwnAndParentLogsByPairsAndK() {
        // DESIGN §6 with n = 10, r = 0.8, r_parent = 1.2, k = 5, worked by hand:
        // (10·ln 0.8 + 5·ln 1.2) / 15 = (−2.2314355 + 0.9116078) / 15 = −0.0879885 → r̂ = e^−0.0879885 = 0.9157714
        assertEquals(0.9157714, CredibilityShrinkage.shrink(10, 0.8, 1.2, 5), 5e-8);
    }

    @Test
    void isBuhlmannsCredibilityWeightingOfTheLogs() {
        // Bühlmann (1967): estimate = Z·own + (1 − Z)·collective with Z = n / (n + k), here on log r.
        double z = 12 / 17.0;
        double expected = Math.exp(z * Math.log(0.6) + (1 - z) * Math.log(0.95));
        assertEquals(expected, CredibilityShrinkage.shrink(12, 0.6, 0.95, 5), 1e-15);
    }

    @Test
    void withoutPairsTheParentsRatioStands() {
        assertEquals(1.3, CredibilityShrinkage.shrink(0, Double.NaN, 1.3, 5), 0);
    }

    @Test
    void manyPairsKeepTheirOwnRatio() {
        assertEquals(0.5, CredibilityShrinkage.shrink(1_000_000, 0.5, 2.0, 5), 1e-5);
    }

    @Test
    void treatsRAndItsReciprocalAlike() {
        assertEquals(1 / CredibilityShrinkage.shrink(7, 0.7, 1.1, 5), CredibilityShrinkage.shrink(7, 1 / 0.7, 1 / 1.1, 5),
                1e-12);
    }

    @Test
    void refusesRatiosThatHaveNoLog() {
        assertThrows(IllegalArgumentException.class, () -> CredibilityShrinkage.shrink(3, 0, 1, 5));
        assertThrows(IllegalArgumentException.class, () -> CredibilityShrinkage.shrink(3, 1, -1, 5));
        assertThrows(IllegalArgumentException.class, () -> CredibilityShrinkage.shrink(3, 1, 1, 0));
    }
}
