package org.plenum.demo;

import java.io.IOException;
import java.io.Writer;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.List;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

/**
 * Writes the demo tables: UTF-8, comma separated, a header row, LF line ends, RFC 4180 quoting
 * only where a field needs it. Quantities are written as whole numbers.
 */
final class DemoCsv {

    private static final DateTimeFormatter STAMP = DateTimeFormatter.ofPattern("uuuu-MM-dd'T'HH:mm:ss'Z'").withZone(ZoneOffset.UTC);

    private DemoCsv() {
    }

    /** Opens {@code dir/name} for writing with the given header. */
    private static CSVPrinter open(Path dir, String name, String... header) throws IOException {
        Writer writer = Files.newBufferedWriter(dir.resolve(name), StandardCharsets.UTF_8);
        CSVFormat format = CSVFormat.RFC4180.builder().setRecordSeparator("\n").setHeader(header).get();
        return new CSVPrinter(writer, format);
    }

    static void items(Path dir, List<ItemPlan> plans) throws IOException {
        try (CSVPrinter out = open(dir, "items.csv", "item", "description", "group", "region", "unit_value", "channel")) {
            for (ItemPlan plan : plans) {
                Item i = plan.item();
                String value = i.unitValue() == null ? "" : i.unitValue().toPlainString();
                out.printRecord(i.id(), i.description(), i.group().label(), i.region(), value, i.channel());
            }
        }
    }

    static void actuals(Path dir, List<ItemPlan> plans) throws IOException {
        try (CSVPrinter out = open(dir, "actuals.csv", "item", "period", "quantity")) {
            for (ItemPlan plan : plans) {
                for (int t = 0; t < DemoMonths.ACTUALS; t++) {
                    out.printRecord(plan.item().id(), DemoMonths.label(t), plan.demand()[t]);
                }
            }
        }
    }

    /** Per item and cycle: the stat rows, then (for past cycles) the final rows. */
    static void forecasts(Path dir, List<ItemPlan> plans) throws IOException {
        try (CSVPrinter out = open(dir, "forecasts.csv", "item", "period", "cycle", "step", "quantity")) {
            for (ItemPlan plan : plans) {
                for (int c = DemoMonths.FIRST_CYCLE; c <= DemoMonths.UPCOMING_CYCLE; c++) {
                    step(out, plan.item().id(), c, "stat", plan.stat(c));
                    if (c < DemoMonths.UPCOMING_CYCLE) {
                        step(out, plan.item().id(), c, "final", plan.finals(c));
                    }
                }
            }
        }
    }

    private static void step(CSVPrinter out, String item, int cycle, String step, long[] lags) throws IOException {
        for (int lag = 0; lag < lags.length; lag++) {
            out.printRecord(item, DemoMonths.label(cycle + lag), DemoMonths.label(cycle), step, lags[lag]);
        }
    }

    static void events(Path dir, List<ItemPlan> plans) throws IOException {
        try (CSVPrinter out = open(dir, "events.csv", "item", "period", "tag", "note")) {
            for (ItemPlan plan : plans) {
                for (DemoEvent e : plan.events()) {
                    out.printRecord(e.item(), DemoMonths.label(e.period()), e.tag().label(), e.note());
                }
            }
        }
    }

    static void decisions(Path dir, List<Decision> decisions) throws IOException {
        try (CSVPrinter out = open(dir, "decisions.csv", "item", "cycle", "period", "action", "quantity",
                "reason", "tag", "author", "minutes", "recorded_at")) {
            for (Decision d : decisions) {
                out.printRecord(d.item(), DemoMonths.label(d.cycle()), DemoMonths.label(d.period()),
                        d.adjust() ? "adjust" : "keep", d.adjust() ? Long.toString(d.quantity()) : "",
                        d.reason(), d.tag().label(), d.author(), oneDecimal(d.minutes()), STAMP.format(d.recordedAt()));
            }
        }
    }

    /** {@code 2.5}, {@code 3}: at most one decimal, no exponent. */
    private static String oneDecimal(double value) {
        return BigDecimal.valueOf(value).setScale(1, RoundingMode.HALF_UP).stripTrailingZeros().toPlainString();
    }
}
