package org.plenum.io;

import java.io.BufferedReader;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Where a quoting error stands. Commons CSV reports only the line, so on this (rare) path the
 * record is read again as text and scanned by the RFC 4180 rules to find the field at fault.
 */
final class QuotingProblem {
    private static final Pattern LINE = Pattern.compile("(?:at line: |startline )(\\d+)");

    private QuotingProblem() {}

    /** The 1-based line named in a Commons CSV parse error, or 0 when it names none. */
    static int line(String message) {
        Matcher m = LINE.matcher(message == null ? "" : message);
        return m.find() ? Integer.parseInt(m.group(1)) : 0;
    }

    static boolean unterminated(String message) {
        return message != null && message.contains("EOF reached before encapsulated token finished");
    }

    /** The 1-based field of the record starting on {@code line} whose quoting is broken; 1 if none is found. */
    static int field(Path file, int line) {
        try (BufferedReader r = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            for (int i = 1; i < line; i++) {
                if (r.readLine() == null) {
                    return 1;
                }
            }
            return scan(r);
        } catch (IOException | RuntimeException e) {
            return 1;
        }
    }

    private static int scan(BufferedReader r) throws IOException {
        int field = 1;
        int quotedField = 0;
        boolean inQuotes = false;
        boolean afterClosingQuote = false;
        boolean atFieldStart = true;
        for (int c = r.read(); c != -1; c = r.read()) {
            if (inQuotes) {
                if (c == '"') {
                    r.mark(1);
                    if (r.read() != '"') {
                        r.reset();
                        inQuotes = false;
                        afterClosingQuote = true;
                    }
                }
            } else if (c == ',') {
                field++;
                atFieldStart = true;
                afterClosingQuote = false;
            } else if (c == '\n' || c == '\r') {
                return field;
            } else if (afterClosingQuote) {
                return field;
            } else if (c == '"' && atFieldStart) {
                inQuotes = true;
                quotedField = field;
                atFieldStart = false;
            } else {
                atFieldStart = false;
            }
        }
        return inQuotes ? quotedField : field;
    }
}
