package org.plenum.core;

import java.util.List;

/** The event tags every workspace starts with; a workspace may add its own. */
public final class EventTags {
    /** Kept in step with the rows the first schema migration inserts. */
    public static final List<String> STARTING = List.of("promotion", "price change", "new listing", "delisting",
            "holiday", "weather", "supply limit", "customer information", "competitor", "other");

    private EventTags() {}

    /** A tag is lower-case words of letters, digits and hyphens, single spaces between, at most 40 characters. */
    public static boolean isWellFormed(String tag) {
        return tag.length() <= 40 && tag.matches("[a-z0-9][a-z0-9-]*( [a-z0-9-]+)*");
    }
}
