package org.plenum.demo;

/** The fixed vocabulary of event and decision tags, written in CSV files by {@link #label()}. */
enum EventTag {
    PROMOTION("promotion"),
    PRICE_CHANGE("price change"),
    NEW_LISTING("new listing"),
    DELISTING("delisting"),
    HOLIDAY("holiday"),
    WEATHER("weather"),
    SUPPLY_LIMIT("supply limit"),
    CUSTOMER_INFORMATION("customer information"),
    COMPETITOR("competitor"),
    OTHER("other");

    private final String label;

    EventTag(String label) {
        this.label = label;
    }

    String label() {
        return label;
    }

    /**
     * Whether planners hear of such an event before the month it affects. Weather, competitors
     * and one-off oddities only show up in the actuals, so the simulated review cannot act on them.
     */
    boolean knownAhead() {
        return this != WEATHER && this != COMPETITOR && this != OTHER;
    }
}
