package org.plenum.io;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.apache.commons.io.input.BOMInputStream;
import org.plenum.core.BadInputException;
import org.plenum.core.Frequency;
import org.plenum.core.Period;
import org.plenum.core.Quantity;

/**
 * Reads decisions made before a workspace existed (the demo's simulated past meetings), with the
 * same strictness as every import: any bad row refuses the whole file.
 *
 * <p>Columns: {@code item, cycle, period, action (adjust|keep), quantity (blank for keep), reason,
 * tag, author, minutes, recorded_at (ISO-8601 instant)}.
 */
public final class PastDecisionsCsv {
    private static final Header.Columns COLUMNS = new Header.Columns(List.of("item", "cycle", "period", "action",
            "quantity", "reason", "tag", "author", "minutes", "recorded_at"), List.of(), false);

    private PastDecisionsCsv() {}

    /** One past decision as read; quantity is null for a keep. */
    public record PastDecision(int line, String item, Period cycle, Period period, Quantity quantity, String reason,
            String tag, String author, Quantity minutes, Instant recordedAt) {}

    public static List<PastDecision> read(Path file, Frequency frequency, Set<String> items, Set<String> tags) {
        ImportErrors errors = new ImportErrors(file.toString());
        List<PastDecision> out = new ArrayList<>();
        try (Utf8CheckedInputStream in = new Utf8CheckedInputStream(BOMInputStream.builder().setPath(file).get());
                CSVParser parser = CSVParser.builder().setReader(new java.io.InputStreamReader(in,
                        java.nio.charset.StandardCharsets.UTF_8)).setFormat(CSVFormat.RFC4180).get()) {
            Iterator<CSVRecord> records = parser.iterator();
            if (!records.hasNext()) {
                throw new BadInputException(file + ":1:1: expected a header row, found an empty file");
            }
            Header header = Header.check(records.next().toList(), COLUMNS, errors);
            errors.throwIfAny();
            Record r = new Record(header, new Record.Periods(frequency));
            Map<String, Integer> seen = new HashMap<>();
            int previousEnd = (int) parser.getCurrentLineNumber();
            while (records.hasNext()) {
                CSVRecord csv = records.next();
                int line = previousEnd + 1;
                previousEnd = (int) parser.getCurrentLineNumber();
                if (csv.size() != header.width()) {
                    errors.add(line, 1, "expected " + header.width() + " fields as in the header, found " + csv.size());
                    continue;
                }
                r.reset(csv, line);
                try {
                    PastDecision d = decision(r, items, tags);
                    Integer first = seen.putIfAbsent(d.item() + "|" + d.cycle() + "|" + d.period(), line);
                    if (first != null) {
                        throw Readers.duplicate(r, "item", "item, cycle and period", first);
                    }
                    out.add(d);
                } catch (FieldException e) {
                    errors.add(line, e.column + 1, e.getMessage());
                }
            }
        } catch (IOException | java.io.UncheckedIOException e) {
            throw new BadInputException(file + ": cannot read: " + e.getMessage());
        }
        errors.throwIfAny();
        return out;
    }

    private static PastDecision decision(Record r, Set<String> items, Set<String> tags) throws FieldException {
        String item = r.text("item");
        if (!items.contains(item)) {
            throw r.fail("item", "an item of the workspace", item);
        }
        Period cycle = r.period("cycle");
        Period period = r.period("period");
        String action = r.text("action");
        if (!action.equals("adjust") && !action.equals("keep")) {
            throw r.fail("action", "adjust or keep", action);
        }
        Quantity quantity = action.equals("keep") ? null : new Quantity(r.quantity("quantity"));
        String tag = r.text("tag");
        if (!tags.contains(tag)) {
            throw r.fail("tag", "one of the workspace's tags", tag);
        }
        Quantity minutes = r.text("minutes").isEmpty() ? null : new Quantity(r.quantity("minutes"));
        return new PastDecision(r.line(), item, cycle, period, quantity, r.required("reason", "a reason"), tag,
                r.required("author", "an author"), minutes, instant(r));
    }

    private static Instant instant(Record r) throws FieldException {
        String text = r.text("recorded_at");
        try {
            return Instant.parse(text);
        } catch (DateTimeParseException e) {
            throw r.fail("recorded_at", "an ISO-8601 instant like 2026-06-03T09:41:00Z", text);
        }
    }
}
