package org.plenum.score;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.OptionalDouble;
import java.util.stream.LongStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.plenum.score.Evidence.Label;
import org.plenum.score.WilcoxonSignedRank.Alternative;
import org.plenum.score.WilcoxonSignedRank.Method;

class EvidenceTest {

    /** A two-sided result whose statistic leans to the candidate ({@code lean > 0}), against it ({@code < 0}), or neither. */
    private static WilcoxonSignedRank.Result test(int n, double p, int lean) {
        double nullMean = n * (n + 1.0) / 4;
        return new WilcoxonSignedRank.Result(nullMean + lean * n / 2.0, n, 0, false, Method.NORMAL,
                Alternative.TWO_SIDED, true, OptionalDouble.of(p));
    }

    @ParameterizedTest(name = "n = {0}, p = {1}, ratio = {2}, lean {3} → {4}")
    @CsvSource({
        "29, 0.0001, 0.5, 1, TOO_FEW_TO_TELL",
        "30, 0.0001, 0.5, 1, BETTER",
        "30, 0.0001, 1.5, -1, WORSE",
        "30, 0.05, 0.5, 1, NO_CLEAR_DIFFERENCE",
        "30, 0.0499999, 0.5, 1, BETTER",
        "30, 0.0499999, 1.5, -1, WORSE",
        "30, 0.2, 0.5, 1, NO_CLEAR_DIFFERENCE",
        "30, 0.0001, 1.0, 1, NO_CLEAR_DIFFERENCE",
        "30, 0.0001, 0.5, -1, NO_CLEAR_DIFFERENCE",
        "30, 0.0001, 1.5, 1, NO_CLEAR_DIFFERENCE",
        "500, 0.0001, 0.9, 1, BETTER",
        "0, 1.0, 0.5, 0, TOO_FEW_TO_TELL"})
    void labelsOnlyWhatTheTestSupports(int n, double p, double ratio, int lean, Label expected) {
        Evidence evidence = Evidence.of(test(n, p, lean), OptionalDouble.of(ratio));
        assertEquals(expected, evidence.label());
        assertEquals(n, evidence.pairs());
        assertEquals(OptionalDouble.of(p), evidence.pValue());
    }

    @Test
    void saysNoClearDifferenceWithoutARatio() {
        assertEquals(Label.NO_CLEAR_DIFFERENCE, Evidence.of(test(40, 0.001, 1), OptionalDouble.empty()).label());
    }

    @Test
    void findsAClearImprovementEndToEnd() {
        // 40 pairs where the candidate's absolute error is smaller every time (invented, for the rule only).
        long[] d = LongStream.rangeClosed(1, 40).map(i -> i * 1_000).toArray();
        WilcoxonSignedRank.Result result = WilcoxonSignedRank.twoSided().test(d);
        assertEquals(Label.BETTER, Evidence.of(result, OptionalDouble.of(0.8)).label());
    }

    @Test
    void countsEveryPairUnchangedOnesIncluded() {
        // DESIGN §5: "fewer than 30 pairs: too few to tell" counts pairs. 35 pairs, 6 unchanged:
        // the test ranks the 29 that differ (all in the candidate's favour) and finds it better.
        long[] d = LongStream.rangeClosed(1, 35).map(i -> i <= 6 ? 0 : i * 1_000).toArray();
        Evidence evidence = Evidence.of(WilcoxonSignedRank.twoSided().test(d), OptionalDouble.of(0.5));
        assertEquals(Label.BETTER, evidence.label());
        assertEquals(35, evidence.pairs());
        long[] few = LongStream.rangeClosed(1, 29).map(i -> i <= 6 ? 0 : i * 1_000).toArray();
        assertEquals(Label.TOO_FEW_TO_TELL,
                Evidence.of(WilcoxonSignedRank.twoSided().test(few), OptionalDouble.of(0.5)).label());
    }

    @Test
    void refusesAOneSidedTest() {
        WilcoxonSignedRank.Result oneSided = WilcoxonSignedRank.twoSided().with(Alternative.GREATER).test(new long[] {1, 2});
        assertThrows(IllegalArgumentException.class, () -> Evidence.of(oneSided, OptionalDouble.of(0.5)));
    }

    @Test
    void cannotBeBuiltToClaimMoreThanItsNumbers() {
        assertThrows(IllegalArgumentException.class, () -> new Evidence(Label.BETTER, OptionalDouble.of(0.05), 30));
        assertThrows(IllegalArgumentException.class, () -> new Evidence(Label.WORSE, OptionalDouble.empty(), 30));
        assertThrows(IllegalArgumentException.class, () -> new Evidence(Label.BETTER, OptionalDouble.of(0.001), 29));
        assertThrows(IllegalArgumentException.class, () -> new Evidence(Label.TOO_FEW_TO_TELL, OptionalDouble.of(0.5), 30));
        assertThrows(IllegalArgumentException.class, () -> new Evidence(Label.NO_CLEAR_DIFFERENCE, OptionalDouble.of(0.5), 29));
    }

    @Test
    void speaksInPlainWords() {
        assertEquals("better", Label.BETTER.text());
        assertEquals("worse", Label.WORSE.text());
        assertEquals("no clear difference", Label.NO_CLEAR_DIFFERENCE.text());
        assertEquals("too few to tell", Label.TOO_FEW_TO_TELL.text());
    }
}
