package org.plenum.score;

import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

/**
 * The words of a decision's reason that say something: lower-cased, letters and digits only,
 * three letters or more, common English function words left out. Each counts once per reason.
 */
public final class ReasonWords {
    private static final Set<String> FUNCTION_WORDS = Set.of("the", "and", "for", "but", "not", "with", "from",
            "this", "that", "are", "was", "were", "has", "have", "had", "our", "its", "all", "any", "per", "than",
            "then", "into", "onto", "over", "out", "too", "very", "will", "would", "can", "could", "should", "may",
            "there", "their", "they", "them", "been", "being", "also", "just", "more", "less", "only", "some");

    private ReasonWords() {}

    public static List<String> of(String reason) {
        Set<String> words = new LinkedHashSet<>();
        if (reason != null) {
            for (String w : reason.toLowerCase(Locale.ROOT).split("[^\\p{L}\\p{N}]+")) {
                if (w.length() >= 3 && !FUNCTION_WORDS.contains(w)) {
                    words.add(w);
                }
            }
        }
        return words.isEmpty() ? List.of("(no words)") : List.copyOf(words);
    }
}
