package org.plenum.cli;

import java.util.Locale;
import java.util.OptionalDouble;

/** A minimal JSON writer for the score contract: objects, arrays, strings and numbers in order. */
final class Json {
    private final StringBuilder out = new StringBuilder();
    private boolean needComma;

    Json open() {
        comma();
        out.append('{');
        needComma = false;
        return this;
    }

    Json close() {
        out.append('}');
        needComma = true;
        return this;
    }

    Json openArray(String key) {
        key(key);
        out.append('[');
        needComma = false;
        return this;
    }

    Json closeArray() {
        out.append(']');
        needComma = true;
        return this;
    }

    Json openObject(String key) {
        key(key);
        out.append('{');
        needComma = false;
        return this;
    }

    /** A string, or null when {@code value} is null. */
    Json field(String key, String value) {
        key(key);
        if (value == null) {
            out.append("null");
        } else {
            string(value);
        }
        needComma = true;
        return this;
    }

    Json field(String key, long value) {
        key(key);
        out.append(value);
        needComma = true;
        return this;
    }

    /** A number, or null when there is none (JSON has no NaN). */
    Json field(String key, OptionalDouble value) {
        key(key);
        out.append(value.isPresent() && Double.isFinite(value.getAsDouble()) ? number(value.getAsDouble()) : "null");
        needComma = true;
        return this;
    }

    /** A true/false value, or null when there is none. */
    Json field(String key, Boolean value) {
        key(key);
        out.append(value == null ? "null" : value.toString());
        needComma = true;
        return this;
    }

    /** A string element of the array being written. */
    Json value(String value) {
        comma();
        string(value);
        needComma = true;
        return this;
    }

    /** A number element of the array being written. */
    Json value(long value) {
        comma();
        out.append(value);
        needComma = true;
        return this;
    }

    private static String number(double v) {
        return String.format(Locale.ROOT, "%.10g", v).replaceFirst("0+(e|$)", "$1").replaceFirst("\\.(e|$)", "$1");
    }

    private void key(String key) {
        comma();
        string(key);
        out.append(':');
    }

    private void comma() {
        if (needComma) {
            out.append(',');
        }
    }

    private void string(String s) {
        out.append('"');
        for (char c : s.toCharArray()) {
            switch (c) {
                case '"' -> out.append("\\\"");
                case '\\' -> out.append("\\\\");
                case '\n' -> out.append("\\n");
                case '\r' -> out.append("\\r");
                case '\t' -> out.append("\\t");
                default -> out.append(c < 0x20 ? String.format("\\u%04x", (int) c) : String.valueOf(c));
            }
        }
        out.append('"');
    }

    @Override
    public String toString() {
        return out.toString();
    }
}
