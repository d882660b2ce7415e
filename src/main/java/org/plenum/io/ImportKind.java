package org.plenum.io;

import java.util.List;

/** The files a workspace imports, with their required and optional columns (DESIGN §3). */
public enum ImportKind {
    ITEMS(List.of("item", "description"), List.of("group", "region", "unit_value"), true),
    ACTUALS(List.of("item", "period", "quantity"), List.of(), false),
    FORECASTS(List.of("item", "period", "cycle", "step", "quantity"), List.of(), false),
    EVENTS(List.of("item", "period", "tag"), List.of("note"), false);

    private final List<String> required;
    private final List<String> optional;
    private final boolean extraColumnsAreAttributes;

    ImportKind(List<String> required, List<String> optional, boolean extraColumnsAreAttributes) {
        this.required = required;
        this.optional = optional;
        this.extraColumnsAreAttributes = extraColumnsAreAttributes;
    }

    public List<String> required() {
        return required;
    }

    public List<String> optional() {
        return optional;
    }

    /** Items take any further column as a free attribute (customer, channel, ...). */
    boolean extraColumnsAreAttributes() {
        return extraColumnsAreAttributes;
    }

    /** The word a user types: {@code items}, {@code actuals}, ... */
    public String word() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
