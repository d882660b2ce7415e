package org.plenum.core;

/** How often a workspace counts its periods. One workspace holds one frequency. */
public enum Frequency {
    MONTHLY("monthly", "YYYY-MM, like 2026-03", 12),
    WEEKLY("weekly", "ISO week YYYY-Www, like 2026-W09", 52);

    private final String word;
    private final String pattern;
    private final int seasonLength;

    Frequency(String word, String pattern, int seasonLength) {
        this.word = word;
        this.pattern = pattern;
        this.seasonLength = seasonLength;
    }

    /** The lower-case word used in messages and stored in the workspace. */
    public String word() {
        return word;
    }

    /** How a period of this frequency is written, with an example, for error messages. */
    public String pattern() {
        return pattern;
    }

    /** Periods in a seasonal cycle: 12 months, or 52 weeks (the usual m for weekly data). */
    public int seasonLength() {
        return seasonLength;
    }

    /** The frequency stored under {@link #word()}. */
    public static Frequency ofWord(String word) {
        for (Frequency f : values()) {
            if (f.word.equals(word)) {
                return f;
            }
        }
        throw new IllegalArgumentException("unknown frequency: " + word);
    }
}
