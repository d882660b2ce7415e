package org.plenum.demo;

import java.util.EnumMap;
import java.util.Map;

/** Short written reasons that match a decision's tag and direction. */
final class ReasonBook {

    private static final Map<EventTag, Map<Direction, String[]>> REASONS = new EnumMap<>(EventTag.class);

    static {
        put(EventTag.PROMOTION, Direction.UP, "Buyer confirmed the feature; adding promotional volume.",
                "Promotion agreed for this window; lifting for the uplift.");
        put(EventTag.PROMOTION, Direction.DOWN, "Customer cut the promotion back; trimming the uplift.",
                "Feature moved to a smaller slot, so less uplift.");
        put(EventTag.PROMOTION, Direction.KEEP, "Promotion is similar to last year's; statistical line is fine.");
        put(EventTag.PRICE_CHANGE, Direction.UP, "Price cut should pull volume forward; raising the forecast.");
        put(EventTag.PRICE_CHANGE, Direction.DOWN, "List price rises, so expect softer orders.");
        put(EventTag.PRICE_CHANGE, Direction.KEEP, "Price change is small; forecast stands.");
        put(EventTag.NEW_LISTING, Direction.UP, "New customer listing starts; adding pipeline fill.");
        put(EventTag.NEW_LISTING, Direction.DOWN, "New listing starts later than planned; trimming.");
        put(EventTag.NEW_LISTING, Direction.KEEP, "Listing volumes not confirmed yet; no change.");
        put(EventTag.DELISTING, Direction.UP, "Delisting postponed by a quarter; restoring volume.");
        put(EventTag.DELISTING, Direction.DOWN, "Customer delists the line; removing its share.");
        put(EventTag.DELISTING, Direction.ZERO, "Line leaves the range; forecast set to zero.");
        put(EventTag.DELISTING, Direction.KEEP, "Delisting only touches a small account; no change.");
        put(EventTag.HOLIDAY, Direction.UP, "Easter falls in this window; adding holiday volume.");
        put(EventTag.HOLIDAY, Direction.DOWN, "Easter is earlier this year; moving volume out.");
        put(EventTag.HOLIDAY, Direction.KEEP, "Holiday effect is already in the seasonal pattern.");
        put(EventTag.WEATHER, Direction.UP, "Warm spell expected, so garden demand comes early.");
        put(EventTag.WEATHER, Direction.DOWN, "Wet outlook for the season; holding the forecast back.");
        put(EventTag.WEATHER, Direction.KEEP, "Weather outlook looks average; no change.");
        put(EventTag.SUPPLY_LIMIT, Direction.UP, "Supply is back to normal; catching up on lost orders.");
        put(EventTag.SUPPLY_LIMIT, Direction.DOWN, "Supplier allocation cut; we can ship only part of demand.");
        put(EventTag.SUPPLY_LIMIT, Direction.ZERO, "No stock until the supplier restarts; set to zero.");
        put(EventTag.SUPPLY_LIMIT, Direction.KEEP, "Allocation still covers the forecast; no change.");
        put(EventTag.CUSTOMER_INFORMATION, Direction.UP, "Key account expects stronger sell-through.",
                "Customer plans more shelf space; raising the forecast.");
        put(EventTag.CUSTOMER_INFORMATION, Direction.DOWN, "Key account is running down its stock.",
                "Customer trims its order plan for the quarter.");
        put(EventTag.CUSTOMER_INFORMATION, Direction.ZERO, "Customer pauses all orders of this item.");
        put(EventTag.CUSTOMER_INFORMATION, Direction.KEEP, "Checked the customer's order plan; forecast stands.");
        put(EventTag.COMPETITOR, Direction.UP, "Competitor is out of stock; expect extra orders.");
        put(EventTag.COMPETITOR, Direction.DOWN, "Competitor launched a cheaper range; trimming.");
        put(EventTag.COMPETITOR, Direction.KEEP, "Competitor activity noted; no change for now.");
        put(EventTag.OTHER, Direction.UP, "Sales team feels the line is picking up.",
                "Last month looked low; lifting a little.", "Rounded up to full cases.");
        put(EventTag.OTHER, Direction.DOWN, "Last month looked high; taking a little off.",
                "Rounded down to full cases.");
        put(EventTag.OTHER, Direction.ZERO, "Item under quality review; no shipments planned.");
        put(EventTag.OTHER, Direction.KEEP, "Reviewed; no reason to change the statistical forecast.");
    }

    /** Tags a planner may give when setting a forecast to zero: the ones with a zero reason. */
    static final EventTag[] ZERO_TAGS = {EventTag.DELISTING, EventTag.SUPPLY_LIMIT, EventTag.CUSTOMER_INFORMATION, EventTag.OTHER};

    private ReasonBook() {
    }

    private static void put(EventTag tag, Direction direction, String... reasons) {
        REASONS.computeIfAbsent(tag, t -> new EnumMap<>(Direction.class)).put(direction, reasons);
    }

    /**
     * A reason for {@code tag} and {@code direction}.
     *
     * @throws IllegalArgumentException for a zero with a tag outside {@link #ZERO_TAGS}
     */
    static String reason(EventTag tag, Direction direction, Dice dice) {
        String[] choices = REASONS.get(tag).get(direction);
        if (choices == null) {
            throw new IllegalArgumentException("no reason for " + tag + " " + direction);
        }
        return dice.pick(choices);
    }
}
