package org.plenum.score;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Arrays;
import java.util.SplittableRandom;
import org.apache.commons.statistics.inference.AlternativeHypothesis;
import org.apache.commons.statistics.inference.ContinuityCorrection;
import org.apache.commons.statistics.inference.PValueMethod;
import org.apache.commons.statistics.inference.WilcoxonSignedRankTest;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Our primitive normal approximation against Apache Commons Statistics 1.1's own asymptotic
 * test (a general-purpose reference library) on random samples with many ties and no zeros,
 * where the two conventions agree.
 */
class WilcoxonNormalApproximationTest {

    @ParameterizedTest
    @CsvSource({"TWO_SIDED, true", "TWO_SIDED, false", "GREATER, true", "LESS, true", "LESS, false"})
    void matchesCommonsStatisticsOnTiedSamples(WilcoxonSignedRank.Alternative alternative, boolean correction) {
        SplittableRandom random = new SplittableRandom(42);
        for (int sample = 0; sample < 40; sample++) {
            int n = 60 + random.nextInt(400);
            long[] d = new long[n];
            for (int i = 0; i < n; i++) {
                long size = 1 + random.nextInt(25); // few distinct sizes: many ties
                d[i] = (random.nextInt(100) < 45 + sample % 10 ? -size : size) * 1_000_000L;
            }
            WilcoxonSignedRank.Result ours = WilcoxonSignedRank.twoSided().with(alternative)
                    .withContinuityCorrection(correction).test(d);
            double[] asDoubles = Arrays.stream(d).asDoubleStream().toArray();
            WilcoxonSignedRankTest.Result reference = WilcoxonSignedRankTest.withDefaults()
                    .with(PValueMethod.ASYMPTOTIC)
                    .with(correction ? ContinuityCorrection.ENABLED : ContinuityCorrection.DISABLED)
                    .with(switch (alternative) {
                        case TWO_SIDED -> AlternativeHypothesis.TWO_SIDED;
                        case GREATER -> AlternativeHypothesis.GREATER_THAN;
                        case LESS -> AlternativeHypothesis.LESS_THAN;
                    }).test(asDoubles);
            assertEquals(WilcoxonSignedRank.Method.NORMAL, ours.method());
            assertEquals(reference.getStatistic(), ours.statistic(), 1e-9);
            assertEquals(reference.getPValue(), ours.pValue().getAsDouble(), 1e-12, "sample " + sample);
        }
    }
}
