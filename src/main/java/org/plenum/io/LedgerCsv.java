package org.plenum.io;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.plenum.core.Decision;
import org.plenum.core.Quantity;

/**
 * Writes the decision ledger as RFC 4180 CSV, one row per decision with every field.
 *
 * <p>Text typed by people (reasons, authors, item codes) may start with a character that a
 * spreadsheet runs as a formula; such cells get a leading apostrophe, the usual guard against
 * CSV injection (OWASP, "CSV Injection"). Numbers are written as plain numbers.
 */
public final class LedgerCsv {
    /** The columns, in order: a contract other tools read. */
    public static final List<String> COLUMNS = List.of("decision", "batch", "recorded_at", "cycle", "item", "period",
            "step", "action", "prior", "quantity", "change", "reason", "tag", "author", "minutes", "supersedes",
            "superseded_by", "meeting");
    private static final CSVFormat FORMAT = CSVFormat.RFC4180.builder().setRecordSeparator("\r\n").get();

    private LedgerCsv() {}

    public static void write(List<Decision> decisions, Writer out) {
        try {
            CSVPrinter printer = new CSVPrinter(out, FORMAT);
            printer.printRecord(COLUMNS);
            for (Decision d : decisions) {
                printer.printRecord(row(d));
            }
            printer.flush();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static List<String> row(Decision d) {
        return List.of(Long.toString(d.id()), Long.toString(d.batch()), d.recordedAt().toString(),
                d.cycle().toString(), text(d.item()), d.period().toString(), text(d.step()),
                d.kept() ? "keep" : "adjust", d.prior().toString(), d.quantity().toString(),
                Quantity.format(d.changeMicros()), text(d.reason()), text(d.tag()), text(d.author()),
                d.minutes() == null ? "" : d.minutes().toString(), number(d.supersedes()), number(d.supersededBy()),
                number(d.meeting()));
    }

    private static String number(Long value) {
        return value == null ? "" : value.toString();
    }

    /** A text cell that a spreadsheet would take for a formula, made inert. */
    public static String text(String value) {
        if (!value.isEmpty() && "=+-@\t\r".indexOf(value.charAt(0)) >= 0) {
            return "'" + value;
        }
        return value;
    }
}
