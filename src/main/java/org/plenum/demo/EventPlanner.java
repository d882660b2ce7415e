package org.plenum.demo;

import java.time.YearMonth;

/**
 * Draws the events of one item over the whole simulated span, including the months after the
 * last actual that the upcoming cycle forecasts. Sizes are multiplicative effects on demand.
 */
final class EventPlanner {

    /** Months in which Easter falls, 2023–2027: a holiday the monthly season cannot learn. */
    private static final int[] EASTER = {
        DemoMonths.index(YearMonth.of(2023, 4)), DemoMonths.index(YearMonth.of(2024, 3)),
        DemoMonths.index(YearMonth.of(2025, 4)), DemoMonths.index(YearMonth.of(2026, 4)),
        DemoMonths.index(YearMonth.of(2027, 3)),
    };

    /** Regional weather spells that hit outdoor goods; region {@code null} means everywhere. */
    private record Spell(YearMonth month, String region, double scale, String note) {
    }

    private static final Spell[] SPELLS = {
        new Spell(YearMonth.of(2023, 6), "South", 1.3, "Hot, dry June in the south"),
        new Spell(YearMonth.of(2024, 4), null, 0.7, "Cold, wet April everywhere"),
        new Spell(YearMonth.of(2024, 5), "North", 0.75, "Late frost and heavy rain in the north"),
        new Spell(YearMonth.of(2025, 3), "Central", 1.25, "Early warm spell"),
        new Spell(YearMonth.of(2025, 7), "South", 1.35, "Heatwave in the south"),
        new Spell(YearMonth.of(2026, 5), null, 0.8, "Rainy May"),
        new Spell(YearMonth.of(2026, 8), "Central", 1.2, "Dry, sunny late summer"),
    };

    private static final Integer[] DISCOUNTS = {10, 15, 20, 25, 30};

    private EventPlanner() {
    }

    /** Events of a regularly selling item. */
    static EventBook regular(Item item, Dice dice) {
        EventBook book = new EventBook(item.id());
        if (dice.chance(0.55)) {
            promotions(item, dice, book);
        }
        levelChanges(item, dice, book);
        holidays(item, dice, book);
        weather(item, book);
        supply(dice, book);
        oneOffs(dice, book);
        return book;
    }

    /** Events of a slow, intermittent item: no promotions or seasons, only the odd one-off. */
    static EventBook intermittent(Item item, Dice dice) {
        EventBook book = new EventBook(item.id());
        if (dice.chance(0.07)) {
            book.from(dice.between(12, DemoMonths.SIMULATED - 1), EventTag.DELISTING, delistNote(item), dice.uniform(0.45, 0.7));
        }
        oneOffs(dice, book);
        return book;
    }

    private static void promotions(Item item, Dice dice, EventBook book) {
        for (int t = 1; t < DemoMonths.SIMULATED; t++) {
            if (book.has(t - 1, EventTag.PROMOTION) || !dice.chance(0.07)) {
                continue;
            }
            int discount = dice.pick(DISCOUNTS);
            book.once(t, EventTag.PROMOTION, promotionNote(item.channel(), discount, dice),
                    1 + discount / 100.0 * dice.uniform(2.0, 3.5));
            // Customers who stocked up during the promotion buy less the month after.
            book.untagged(t + 1, 0.9);
        }
    }

    private static String promotionNote(String channel, int discount, Dice dice) {
        return switch (channel) {
            case "online" -> dice.chance(0.5) ? "Web shop flash sale, " + discount + "% off"
                    : "Marketplace banner week, " + discount + "% off";
            case "wholesale" -> "Trade deal: " + discount + "% off orders over 50 cases";
            default -> dice.chance(0.5) ? "In-store feature, " + discount + "% off"
                    : "End-aisle display with " + discount + "% off";
        };
    }

    private static void levelChanges(Item item, Dice dice, EventBook book) {
        if (dice.chance(0.25)) {
            int pct = dice.between(4, 12);
            boolean rise = dice.chance(0.65);
            double scale = 1 + (rise ? -1 : 1) * pct / 100.0 * dice.uniform(1.0, 1.8);
            book.from(dice.between(6, DemoMonths.SIMULATED - 1), EventTag.PRICE_CHANGE,
                    (rise ? "List price up " : "List price cut ") + pct + "%", scale);
        }
        if (dice.chance(0.15)) {
            book.from(dice.between(6, DemoMonths.SIMULATED - 1), EventTag.NEW_LISTING, listingNote(item), dice.uniform(1.15, 1.45));
        }
        if (dice.chance(0.07)) {
            book.from(dice.between(12, DemoMonths.SIMULATED - 1), EventTag.DELISTING, delistNote(item), dice.uniform(0.45, 0.7));
        }
    }

    private static String listingNote(Item item) {
        return switch (item.channel()) {
            case "online" -> "Now also sold on a second marketplace";
            case "wholesale" -> "Added to a wholesale partner's catalogue";
            default -> "Listed by a new regional chain";
        };
    }

    private static String delistNote(Item item) {
        return switch (item.channel()) {
            case "online" -> "Marketplace listing withdrawn";
            case "wholesale" -> "Wholesale partner removes it from the range";
            default -> "A retail customer drops the line";
        };
    }

    private static void holidays(Item item, Dice dice, EventBook book) {
        ProductGroup group = item.group();
        double share = group == ProductGroup.TABLEWARE ? 0.6 : group == ProductGroup.COOKWARE ? 0.3 : group.outdoor() ? 0.4 : 0;
        if (!dice.chance(share)) {
            return;
        }
        String note = group.outdoor() ? "Easter weekend opens the garden season" : "Easter falls in this month";
        for (int month : EASTER) {
            book.once(month, EventTag.HOLIDAY, note, dice.uniform(1.12, 1.3));
        }
    }

    private static void weather(Item item, EventBook book) {
        if (!item.group().outdoor()) {
            return;
        }
        for (Spell spell : SPELLS) {
            if (spell.region() == null || spell.region().equals(item.region())) {
                book.once(DemoMonths.index(spell.month()), EventTag.WEATHER, spell.note(), spell.scale());
            }
        }
    }

    private static void supply(Dice dice, EventBook book) {
        if (!dice.chance(0.10)) {
            return;
        }
        int start = dice.between(1, DemoMonths.SIMULATED - 1);
        int pct = 5 * dice.between(10, 16);
        for (int t = start; t < start + dice.between(1, 2); t++) {
            book.once(t, EventTag.SUPPLY_LIMIT, "Supplier allocation cut to " + pct + "% of orders", pct / 100.0);
        }
    }

    private static void oneOffs(Dice dice, EventBook book) {
        for (int t = 0; t < DemoMonths.SIMULATED; t++) {
            if (dice.chance(0.012)) {
                double scale = dice.uniform(0.75, 1.35);
                book.once(t, EventTag.CUSTOMER_INFORMATION, scale >= 1 ? dice.pick(CUSTOMER_UP) : dice.pick(CUSTOMER_DOWN), scale);
            }
            if (dice.chance(0.008)) {
                book.once(t, EventTag.COMPETITOR, dice.pick(COMPETITOR_NOTES), dice.uniform(0.75, 0.92));
            }
            if (dice.chance(0.005)) {
                double scale = dice.uniform(0.85, 1.2);
                book.once(t, EventTag.OTHER, scale >= 1 ? "Samples ordered for a catalogue shoot"
                        : "Warehouse stock count pauses shipments", scale);
            }
        }
    }

    private static final String[] CUSTOMER_UP = {
        "Key account expects stronger sell-through", "Customer refits stores with more shelf space"};
    private static final String[] CUSTOMER_DOWN = {
        "Key account is running down its stock", "Customer trims its order plan"};
    private static final String[] COMPETITOR_NOTES = {
        "Competitor launches a cheaper range", "Competitor price cut in the region"};
}
