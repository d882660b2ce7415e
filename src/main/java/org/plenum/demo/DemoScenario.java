package org.plenum.demo;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.IntStream;

/**
 * Generates the demo data set: an invented mid-size maker of kitchen and garden goods,
 * Kettlegorse Homewares, with 300 items, 48 months of actuals, stat and final forecasts of 24
 * cycles, tagged events and a decision ledger of the last six reviews (see demo-data/README.md).
 *
 * <p>Everything is drawn from {@link #SEED} with a fixed generator and {@link StrictMath}, and
 * written in a fixed order, so two runs write byte-identical files.
 */
public final class DemoScenario {

    /** The seed of the shipped demo data. */
    public static final long SEED = 20_261_203L;

    private static final int DEMAND = 1;
    private static final int REVIEW = 2;

    private DemoScenario() {
    }

    /**
     * Writes {@code items.csv}, {@code actuals.csv}, {@code forecasts.csv}, {@code events.csv} and
     * {@code decisions.csv} into {@code dir}, creating it if needed and replacing those files.
     */
    public static void writeTo(Path dir) throws IOException {
        Files.createDirectories(dir);
        List<ItemPlan> plans = plans(SEED);
        DemoCsv.items(dir, plans);
        DemoCsv.actuals(dir, plans);
        DemoCsv.forecasts(dir, plans);
        DemoCsv.events(dir, plans);
        DemoCsv.decisions(dir, MeetingLedger.decisions(plans));
    }

    /**
     * Simulates every item of the catalogue, in catalogue order. Items share nothing and each has
     * its own random streams, so simulating them in parallel gives the same result as in turn.
     */
    static List<ItemPlan> plans(long seed) {
        List<Item> items = Catalogue.items(seed);
        return IntStream.range(0, items.size()).parallel().mapToObj(i -> plan(items.get(i), i, seed)).toList();
    }

    private static ItemPlan plan(Item item, int number, long seed) {
        Dice demandDice = Dice.of(seed, DEMAND, number);
        EventBook book = item.intermittent() ? EventPlanner.intermittent(item, demandDice) : EventPlanner.regular(item, demandDice);
        long[] demand = DemandSimulator.demand(item, book, demandDice);
        long[][] stat = StatForecaster.forecasts(item, demand);
        List<DemoEvent> events = book.events();
        Review[] reviews = ReviewSimulator.reviews(item, demand, events, stat, Dice.of(seed, REVIEW, number));
        return new ItemPlan(item, demand, events, stat, reviews);
    }

    /** Writes the demo files into the directory given as the only argument, default {@code demo-data}. */
    public static void main(String[] args) throws IOException {
        Path dir = Path.of(args.length > 0 ? args[0] : "demo-data");
        writeTo(dir);
        System.out.println("Demo data written to " + dir.toAbsolutePath());
    }
}
