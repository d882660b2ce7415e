package org.plenum.io;

import org.apache.commons.csv.CSVRecord;
import org.plenum.core.Frequency;
import org.plenum.core.Period;
import org.plenum.core.Quantity;
import org.plenum.core.ValueException;

/**
 * One data record of an input file, read field by field through its header. Every reader throws
 * {@link FieldException} naming the column, what was expected and what was found.
 */
final class Record {
    private final Header header;
    private final Periods periods;
    private CSVRecord csv;
    private int line;

    Record(Header header, Periods periods) {
        this.header = header;
        this.periods = periods;
    }

    void reset(CSVRecord csv, int line) {
        this.csv = csv;
        this.line = line;
    }

    int line() {
        return line;
    }

    /** The field's text, or "" when the file has no such optional column. */
    String text(String column) {
        int i = header.position(column);
        return i < 0 ? "" : csv.get(i);
    }

    String text(int position) {
        return csv.get(position);
    }

    /** A field that must not be blank. */
    String required(String column, String what) throws FieldException {
        String value = text(column);
        if (value.isBlank()) {
            throw new FieldException(header.position(column), "expected " + what + ", found an empty field");
        }
        return value;
    }

    long quantity(String column) throws FieldException {
        String value = text(column);
        try {
            return Quantity.parseMicros(value);
        } catch (ValueException e) {
            throw fail(column, e.expected(), value);
        }
    }

    Period period(String column) throws FieldException {
        String value = text(column);
        Period known = periods.seen.get(value);
        if (known != null) {
            return known;
        }
        try {
            return periods.check(value, Period.parse(value));
        } catch (ValueException e) {
            throw fail(column, e.expected(), value);
        }
    }

    FieldException fail(String column, String expected, String found) {
        return new FieldException(header.position(column), "expected " + expected + ", found " + quote(found));
    }

    static String quote(String found) {
        if (found.isEmpty()) {
            return "an empty field";
        }
        String shown = found.length() > 60 ? found.substring(0, 57) + "..." : found;
        return "\"" + shown + "\"";
    }

    /**
     * The workspace's one frequency: taken from the workspace, or from the first period of the
     * first file that brings periods.
     */
    static final class Periods {
        private Frequency frequency;
        private final boolean fixed;
        /** A file names few distinct periods many times over; each is parsed and checked once. */
        private final java.util.Map<String, Period> seen = new java.util.HashMap<>();

        Periods(Frequency frequency) {
            this.frequency = frequency;
            this.fixed = frequency != null;
        }

        Period check(String text, Period p) {
            if (frequency == null) {
                frequency = p.frequency();
            } else if (p.frequency() != frequency) {
                throw new ValueException("a " + frequency.word() + " period " + frequency.pattern() + " as "
                        + (fixed ? "everywhere in this workspace" : "earlier in this file"));
            }
            seen.put(text, p);
            return p;
        }

        /** The frequency this file set, when the workspace had none before. */
        Frequency newFrequency() {
            return fixed ? null : frequency;
        }
    }
}
