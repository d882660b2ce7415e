package org.plenum.demo;

/**
 * The product groups of the invented company, each with its own seasonal shape, product names,
 * price band and the planner who owns it in the review.
 */
enum ProductGroup {
    COOKWARE("Cookware", "amara", 18, 140,
            // Gifting season carries the year; summer is quiet.
            new double[] {0.85, 0.85, 0.9, 0.95, 0.9, 0.8, 0.8, 0.85, 0.95, 1.05, 1.45, 1.65},
            new String[] {"frying pan", "saucepan", "casserole", "stock pot", "wok", "griddle pan", "sauté pan"},
            new String[] {"cast iron", "enamelled", "stainless", "non-stick", "copper-base", "carbon steel"},
            new String[] {"replacement glass lid", "spare handle", "steamer insert"}),
    TABLEWARE("Tableware", "amara", 4, 60,
            new double[] {0.8, 0.85, 0.95, 1.05, 0.95, 0.9, 0.9, 0.9, 0.95, 1.0, 1.25, 1.5},
            new String[] {"dinner plate", "side plate", "pasta bowl", "mug", "serving platter", "tumbler", "jug"},
            new String[] {"stoneware", "porcelain", "glazed earthenware", "recycled glass", "bone china"},
            new String[] {"single saucer", "replacement lid", "odd-size bowl"}),
    KITCHEN_TOOLS("Kitchen tools", "priya", 3, 45,
            new double[] {0.95, 0.9, 0.95, 1.0, 0.95, 0.95, 0.95, 0.95, 1.1, 1.0, 1.05, 1.25},
            new String[] {"chef's knife", "peeler", "whisk", "grater", "spatula", "ladle", "tongs", "measuring jug"},
            new String[] {"beech", "stainless", "silicone", "olive wood", "bamboo"},
            new String[] {"spare blade", "replacement sharpener stone", "knife guard"}),
    STORAGE("Storage", "li", 3, 35,
            // New-year clear-outs and the start of the school year.
            new double[] {1.4, 1.05, 0.95, 0.95, 0.9, 0.85, 0.85, 1.0, 1.25, 0.95, 0.9, 0.95},
            new String[] {"food box", "storage jar", "bread bin", "spice rack", "lunch box", "pantry basket"},
            new String[] {"glass", "bamboo-lid", "stackable", "airtight", "enamel", "seagrass"},
            new String[] {"replacement seal", "spare clip lid"}),
    GARDEN_TOOLS("Garden tools", "jonas", 6, 90,
            new double[] {0.5, 0.6, 1.3, 1.65, 1.6, 1.3, 1.05, 0.9, 0.9, 0.85, 0.6, 0.75},
            new String[] {"spade", "hand trowel", "pruning shears", "rake", "hoe", "watering can", "hose reel"},
            new String[] {"ash-handle", "stainless", "carbon steel", "lightweight", "long-reach"},
            new String[] {"spare spring", "replacement hose connector", "blade sharpener"}),
    OUTDOOR_LIVING("Outdoor living", "jonas", 8, 160,
            new double[] {0.45, 0.55, 0.9, 1.4, 1.85, 1.75, 1.4, 1.05, 0.8, 0.65, 0.55, 0.65},
            new String[] {"planter", "bird feeder", "lantern", "bistro chair", "raised bed", "parasol base", "fire bowl"},
            new String[] {"terracotta", "galvanised", "weatherproof", "powder-coated", "hardwood", "woven"},
            new String[] {"replacement cushion cover", "spare lantern glass"});

    private final String label;
    private final String planner;
    private final double minPrice;
    private final double maxPrice;
    private final double[] season;
    private final String[] nouns;
    private final String[] finishes;
    private final String[] spares;

    ProductGroup(String label, String planner, double minPrice, double maxPrice, double[] season,
                 String[] nouns, String[] finishes, String[] spares) {
        this.label = label;
        this.planner = planner;
        this.minPrice = minPrice;
        this.maxPrice = maxPrice;
        this.season = normalised(season);
        this.nouns = nouns;
        this.finishes = finishes;
        this.spares = spares;
    }

    /** Scales the shape to average 1 so that the season moves demand around the year, not up. */
    private static double[] normalised(double[] shape) {
        double sum = 0;
        for (double v : shape) {
            sum += v;
        }
        double[] out = new double[shape.length];
        for (int i = 0; i < shape.length; i++) {
            out[i] = shape[i] * shape.length / sum;
        }
        return out;
    }

    String label() {
        return label;
    }

    /** The planner who owns this group in the review meeting. */
    String planner() {
        return planner;
    }

    /** Seasonal factor, averaging 1, for calendar month 1–12. */
    double seasonFactor(int calendarMonth) {
        return season[calendarMonth - 1];
    }

    boolean outdoor() {
        return this == GARDEN_TOOLS || this == OUTDOOR_LIVING;
    }

    /** A product name such as "Enamelled casserole 24 cm"; spare parts for slow movers. */
    String describe(Dice dice, boolean spare) {
        String noun = spare ? dice.pick(spares) + " for " + dice.pick(nouns) : dice.pick(nouns);
        String name = capitalised(dice.pick(finishes) + " " + noun);
        return dice.chance(0.5) ? name + ", " + dice.pick(SIZES) : name;
    }

    /** A unit value in the group's price band, to the cent. */
    double price(Dice dice) {
        double logLow = StrictMath.log(minPrice);
        double logHigh = StrictMath.log(maxPrice);
        return Math.round(StrictMath.exp(dice.uniform(logLow, logHigh)) * 100) / 100.0;
    }

    private static final String[] SIZES = {"small", "medium", "large", "set of 2", "set of 4", "family size"};

    private static String capitalised(String text) {
        return Character.toUpperCase(text.charAt(0)) + text.substring(1);
    }
}
