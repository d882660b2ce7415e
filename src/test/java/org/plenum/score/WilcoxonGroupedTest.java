package org.plenum.score;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Arrays;
import java.util.SplittableRandom;
import org.apache.commons.statistics.inference.WilcoxonSignedRankTest;
import org.junit.jupiter.api.Test;

/**
 * Testing every group of a sample from one ranking must give, group by group, what testing each
 * group's differences alone gives — and, for large tied groups, what Apache Commons Statistics 1.1
 * (a general-purpose reference library) gives on the same group's values.
 */
class WilcoxonGroupedTest {

    @Test
    void eachGroupIsTestedAsIfAlone() {
        SplittableRandom random = new SplittableRandom(7);
        for (int sample = 0; sample < 30; sample++) {
            int n = 1 + random.nextInt(3000);
            int groups = 1 + random.nextInt(12);
            long[] d = new long[n];
            int[] group = new int[n];
            for (int i = 0; i < n; i++) {
                // few distinct sizes and some zeros: ties within and across groups
                d[i] = (random.nextInt(9) - 4) * (sample % 2 == 0 ? 1_000_000L : 1 + random.nextInt(500));
                group[i] = random.nextInt(groups + 1) - 1; // −1: in no group
            }
            WilcoxonSignedRank test = WilcoxonSignedRank.twoSided();
            WilcoxonSignedRank.Result[] grouped = test.test(test.rank(d), group, groups);
            for (int g = 0; g < groups; g++) {
                int wanted = g;
                long[] alone = java.util.stream.IntStream.range(0, n).filter(i -> group[i] == wanted)
                        .mapToLong(i -> d[i]).toArray();
                assertEquals(test.test(alone), grouped[g], "sample " + sample + ", group " + g);
            }
        }
    }

    @Test
    void largeTiedGroupsMatchCommonsStatistics() {
        SplittableRandom random = new SplittableRandom(11);
        int n = 5000;
        long[] d = new long[n];
        int[] group = new int[n];
        for (int i = 0; i < n; i++) {
            long size = 1 + random.nextInt(30);
            d[i] = (random.nextInt(100) < 40 + 10 * (i % 3) ? -size : size) * 1_000_000L;
            group[i] = i % 3;
        }
        WilcoxonSignedRank test = WilcoxonSignedRank.twoSided();
        WilcoxonSignedRank.Result[] grouped = test.test(test.rank(d), group, 3);
        for (int g = 0; g < 3; g++) {
            int wanted = g;
            double[] values = java.util.stream.IntStream.range(0, n).filter(i -> group[i] == wanted)
                    .mapToDouble(i -> d[i]).toArray();
            WilcoxonSignedRankTest.Result reference = WilcoxonSignedRankTest.withDefaults()
                    .with(org.apache.commons.statistics.inference.PValueMethod.ASYMPTOTIC).test(values);
            assertEquals(reference.getStatistic(), grouped[g].statistic(), 1e-9);
            assertEquals(reference.getPValue(), grouped[g].pValue().getAsDouble(), 1e-12);
        }
    }

    /**
     * Ranks depend only on the order of sizes, so scaling every difference by one positive factor
     * gives the same test. A factor that pushes the largest size past what the packed sort can
     * hold makes the ranking take its other path: both must agree.
     */
    @Test
    void hugeDifferencesRankAsSmallOnesDo() {
        SplittableRandom random = new SplittableRandom(13);
        int n = 4000;
        long[] d = new long[n];
        int[] group = new int[n];
        for (int i = 0; i < n; i++) {
            d[i] = (random.nextInt(41) - 20) * 1_000_000L;
            group[i] = i % 4;
        }
        long factor = (1L << 60) / 20_000_000L;
        long[] huge = Arrays.stream(d).map(x -> x * factor).toArray();
        WilcoxonSignedRank test = WilcoxonSignedRank.twoSided();
        assertEquals(Arrays.asList(test.test(test.rank(d), group, 4)),
                Arrays.asList(test.test(test.rank(huge), group, 4)));
        assertEquals(test.test(d), test.test(huge));
    }

    @Test
    void labelsMustCoverTheSample() {
        WilcoxonSignedRank test = WilcoxonSignedRank.twoSided();
        assertThrows(IllegalArgumentException.class, () -> test.test(test.rank(new long[] {1, 2}), new int[1], 1));
        assertEquals(0, test.test(test.rank(new long[0]), new int[0], 0).length);
        assertEquals(Arrays.asList(test.test(new long[] {3, -1, 2})),
                Arrays.asList(test.test(test.rank(new long[] {3, -1, 2}), new int[3], 1)));
    }
}
