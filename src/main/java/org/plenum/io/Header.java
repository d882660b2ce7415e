package org.plenum.io;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

/**
 * The checked header row of an input file: where each column stands. Names match without regard
 * to case or surrounding spaces, since spreadsheets capitalise; anything else wrong is an error.
 */
final class Header {
    /** Names the breakdowns of the scorecard use for other things, so an attribute may not take them. */
    static final Set<String> RESERVED = Set.of("item", "description", "group", "region", "unit_value", "author",
            "tag", "reason", "direction", "size", "size_class", "cycle", "period", "step", "lag", "quantity");

    private final Map<String, Integer> index = new HashMap<>();
    private final List<String> attributes = new ArrayList<>();
    private final List<Integer> attributeColumns = new ArrayList<>();
    private final int width;

    private Header(int width) {
        this.width = width;
    }

    /** Checks {@code names} for {@code kind}, adding every problem to {@code errors}. */
    static Header check(List<String> names, ImportKind kind, ImportErrors errors) {
        return check(names, new Columns(kind.required(), kind.optional(), kind.extraColumnsAreAttributes()), errors);
    }

    /** The columns a file must have, may have, and whether others are free attributes. */
    record Columns(List<String> required, List<String> optional, boolean extraColumnsAreAttributes) {}

    static Header check(List<String> names, Columns kind, ImportErrors errors) {
        Header h = new Header(names.size());
        if (names.size() == 1 && (names.get(0).contains(";") || names.get(0).contains("\t"))) {
            String sep = names.get(0).contains(";") ? "\";\"" : "a tab";
            errors.add(1, 1, "expected comma-separated columns, found " + sep + " between the column names");
            return h;
        }
        for (int i = 0; i < names.size(); i++) {
            h.add(names.get(i).strip().toLowerCase(Locale.ROOT), i, kind, errors);
        }
        List<String> missing = kind.required().stream().filter(r -> !h.index.containsKey(r)).toList();
        if (!missing.isEmpty()) {
            errors.add(1, 1, "expected the columns " + String.join(", ", kind.required()) + ", missing "
                    + String.join(", ", missing));
        }
        return h;
    }

    private void add(String name, int i, Columns kind, ImportErrors errors) {
        int column = i + 1;
        if (name.isEmpty()) {
            errors.add(1, column, "expected a column name, found an empty one");
        } else if (index.containsKey(name) || attributes.contains(name)) {
            errors.add(1, column, "expected each column once, found \"" + name + "\" again");
        } else if (kind.required().contains(name) || kind.optional().contains(name)) {
            index.put(name, i);
        } else if (!kind.extraColumnsAreAttributes()) {
            errors.add(1, column, "expected only the columns " + known(kind) + ", found \"" + name + "\"");
        } else if (!name.matches("[a-z][a-z0-9_]{0,39}") || RESERVED.contains(name)) {
            errors.add(1, column, "expected an attribute name of lower-case letters, digits and _ that is not one of "
                    + String.join(", ", new java.util.TreeSet<>(RESERVED)) + ", found \"" + name + "\"");
        } else {
            attributes.add(name);
            attributeColumns.add(i);
        }
    }

    private static String known(Columns kind) {
        List<String> all = new ArrayList<>(kind.required());
        all.addAll(kind.optional());
        return String.join(", ", all);
    }

    /** Number of columns in the header. */
    int width() {
        return width;
    }

    /** 0-based position of a known column, or -1 when the file does not have it. */
    int position(String name) {
        return index.getOrDefault(name, -1);
    }

    List<String> attributes() {
        return attributes;
    }

    List<Integer> attributeColumns() {
        return attributeColumns;
    }
}
