package org.plenum.demo;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;

/** Builds the invented company's item list. */
final class Catalogue {

    static final String[] REGIONS = {"North", "Central", "South"};
    static final int SIZE = 300;
    private static final String[] CHANNELS = {"retail", "retail", "retail", "retail", "retail",
        "wholesale", "wholesale", "wholesale", "online", "online"};
    private static final double INTERMITTENT_SHARE = 0.10;
    private static final double MISSING_VALUE_SHARE = 0.04;

    private Catalogue() {
    }

    /** {@value #SIZE} items, ids {@code KG-0001} … in order, groups drawn with equal weight. */
    static List<Item> items(long seed) {
        Dice dice = Dice.of(seed, 0, 0);
        ProductGroup[] groups = ProductGroup.values();
        List<Item> items = new ArrayList<>(SIZE);
        for (int i = 1; i <= SIZE; i++) {
            ProductGroup group = dice.pick(groups);
            boolean intermittent = dice.chance(INTERMITTENT_SHARE);
            String description = group.describe(dice, intermittent);
            BigDecimal value = dice.chance(MISSING_VALUE_SHARE) ? null : BigDecimal.valueOf(group.price(dice)).setScale(2);
            items.add(new Item(String.format("KG-%04d", i), description, group, dice.pick(REGIONS),
                    value, dice.pick(CHANNELS), intermittent));
        }
        return items;
    }
}
