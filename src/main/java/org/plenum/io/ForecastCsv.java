package org.plenum.io;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.plenum.core.Period;
import org.plenum.core.Quantity;

/**
 * Writes forecasts in the layout {@code plenum import forecasts} reads, so that a meeting's
 * outcome can be handed to the next step as it is. Cells are written as they are (no formula
 * guard): the file is input for programs, and a guard would change item codes on the way back.
 */
public final class ForecastCsv {
    /** The import's columns, in order. */
    public static final List<String> COLUMNS = List.of("item", "period", "cycle", "step", "quantity");
    private static final CSVFormat FORMAT = CSVFormat.RFC4180.builder().setRecordSeparator("\n").get();

    private ForecastCsv() {}

    public record Row(String item, Period period, Period cycle, String step, Quantity quantity) {}

    public static void write(Path file, List<Row> rows) {
        try (Writer out = Files.newBufferedWriter(file, StandardCharsets.UTF_8);
                CSVPrinter printer = new CSVPrinter(out, FORMAT)) {
            printer.printRecord(COLUMNS);
            for (Row r : rows) {
                printer.printRecord(r.item(), r.period(), r.cycle(), r.step(), r.quantity());
            }
        } catch (IOException e) {
            throw new UncheckedIOException("writing " + file, e);
        }
    }
}
