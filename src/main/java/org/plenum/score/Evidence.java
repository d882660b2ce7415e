package org.plenum.score;

import java.util.Objects;
import java.util.OptionalDouble;

/**
 * What the data allow one to say about a step against its benchmark, in words a meeting can read:
 * "better", "worse", "no clear difference" or "too few to tell".
 *
 * <p>The rule (DESIGN §5): with fewer than {@value #MIN_PAIRS} pairs, "too few to tell";
 * otherwise "better" when the two-sided Wilcoxon signed-rank p-value is below {@value #SIGNIFICANCE}
 * and the geometric-mean ratio (AvgRelMAE or GMRAE) is below 1, "worse" when p is below
 * {@value #SIGNIFICANCE} and the ratio is above 1, else "no clear difference". The 5% level is common
 * practice, not a law; {@code p = 0.05} exactly is not below it. As a further guard of ours, a finding
 * also needs the test to lean the same way as the ratio ({@code W+} above its null mean for "better",
 * below for "worse"), since a significant test in one direction never supports a claim in the other.
 *
 * <p>The compact constructor refuses any record that claims more than its numbers support.
 *
 * @param label the finding
 * @param pValue the two-sided p-value it rests on; empty when no test could be run
 * @param pairs the number of pairs compared, zero differences included (DESIGN §5 counts pairs)
 */
public record Evidence(Label label, OptionalDouble pValue, int pairs) {
    /** Fewer tested pairs than this are "too few to tell". */
    public static final int MIN_PAIRS = 30;
    /** A finding needs a two-sided p-value below this (common practice). */
    public static final double SIGNIFICANCE = 0.05;

    /** The finding, with the words a screen shows. */
    public enum Label {
        BETTER("better"),
        WORSE("worse"),
        NO_CLEAR_DIFFERENCE("no clear difference"),
        TOO_FEW_TO_TELL("too few to tell");

        private final String text;

        Label(String text) {
            this.text = text;
        }

        public String text() {
            return text;
        }
    }

    public Evidence {
        Objects.requireNonNull(label);
        Objects.requireNonNull(pValue);
        boolean enoughPairs = pairs >= MIN_PAIRS;
        if ((label == Label.TOO_FEW_TO_TELL) == enoughPairs) {
            throw new IllegalArgumentException(label.text() + " does not fit " + pairs + " pairs");
        }
        boolean finding = label == Label.BETTER || label == Label.WORSE;
        if (finding && !(pValue.isPresent() && pValue.getAsDouble() < SIGNIFICANCE)) {
            throw new IllegalArgumentException(label.text() + " needs p < " + SIGNIFICANCE + ", had " + pValue);
        }
    }

    /**
     * Reads a two-sided test of {@code d = |e_benchmark| − |e_candidate|} and the candidate/benchmark
     * geometric-mean ratio.
     *
     * @param twoSided the test result; its differences must be benchmark minus candidate absolute errors
     * @param geometricMeanRatio candidate over benchmark; empty when it could not be computed
     * @throws IllegalArgumentException when the test was not two-sided
     */
    public static Evidence of(WilcoxonSignedRank.Result twoSided, OptionalDouble geometricMeanRatio) {
        if (twoSided.alternative() != WilcoxonSignedRank.Alternative.TWO_SIDED) {
            throw new IllegalArgumentException("evidence is read from a two-sided test, not " + twoSided.alternative());
        }
        return new Evidence(label(twoSided, geometricMeanRatio), twoSided.pValue(), pairs(twoSided));
    }

    private static int pairs(WilcoxonSignedRank.Result test) {
        return test.n() + test.zerosDropped();
    }

    private static Label label(WilcoxonSignedRank.Result test, OptionalDouble ratio) {
        if (pairs(test) < MIN_PAIRS) {
            return Label.TOO_FEW_TO_TELL;
        }
        boolean significant = test.pValue().isPresent() && test.pValue().getAsDouble() < SIGNIFICANCE;
        if (!significant || ratio.isEmpty()) {
            return Label.NO_CLEAR_DIFFERENCE;
        }
        int testLean = Double.compare(test.statistic(), test.nullMean()); // > 0: the candidate's errors were smaller
        if (ratio.getAsDouble() < 1 && testLean > 0) {
            return Label.BETTER;
        }
        return ratio.getAsDouble() > 1 && testLean < 0 ? Label.WORSE : Label.NO_CLEAR_DIFFERENCE;
    }
}
