package org.plenum.io;

import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.plenum.core.Period;
import org.plenum.store.Catalog;
import org.plenum.store.ImportSession;
import org.plenum.store.Rows.ActualRow;
import org.plenum.store.Rows.EventRow;
import org.plenum.store.Rows.ForecastRow;
import org.plenum.store.Rows.ItemRow;
import org.plenum.store.Step;

/** The row reader of each kind of file, checking every field against the workspace's catalog. */
final class Readers {
    private Readers() {}

    static RowReader<?> of(ImportKind kind, Catalog catalog, Header header) {
        return switch (kind) {
            case ITEMS -> new Items(header);
            case ACTUALS -> new Actuals(catalog);
            case FORECASTS -> new Forecasts(catalog);
            case EVENTS -> new Events(catalog);
        };
    }

    static int itemId(Record r, Catalog catalog) throws FieldException {
        String code = r.text("item");
        Integer id = catalog.items().get(code);
        if (id == null) {
            throw r.fail("item", "an item of the workspace (import it in the items file first)", code);
        }
        return id;
    }

    static FieldException duplicate(Record r, String column, String words, int firstLine) {
        return r.fail(column, "each " + words + " once per file", "it again (first on line " + firstLine + ")");
    }

    /** Item codes are printed in every report, so they must be printable and unambiguous. */
    static String itemCode(Record r) throws FieldException {
        String code = r.required("item", "an item code");
        if (!code.equals(code.strip()) || code.length() > 64 || code.chars().anyMatch(Character::isISOControl)) {
            throw r.fail("item", "an item code of at most 64 printable characters without surrounding spaces", code);
        }
        return code;
    }

    static final class Items implements RowReader<ItemRow> {
        private final Header header;
        private final Map<String, Integer> seen = new HashMap<>();

        Items(Header header) {
            this.header = header;
        }

        @Override
        public ItemRow read(Record r) throws FieldException {
            String code = itemCode(r);
            Integer first = seen.putIfAbsent(code, r.line());
            if (first != null) {
                throw duplicate(r, "item", "item", first);
            }
            Long unitValue = r.text("unit_value").isEmpty() ? null : r.quantity("unit_value");
            Map<String, String> attributes = new LinkedHashMap<>();
            for (int i = 0; i < header.attributes().size(); i++) {
                String value = r.text(header.attributeColumns().get(i)).strip();
                if (!value.isEmpty()) {
                    attributes.put(header.attributes().get(i), value);
                }
            }
            return new ItemRow(r.line(), code, r.text("description").strip(), blankToNull(r.text("group")),
                    blankToNull(r.text("region")), unitValue, attributes);
        }

        private static String blankToNull(String s) {
            return s.isBlank() ? null : s.strip();
        }

        @Override
        public List<Integer> write(ImportSession s, List<ItemRow> rows) {
            return s.insertItems(rows);
        }

        @Override
        public String keyColumn() {
            return "item";
        }

        @Override
        public String keyWords() {
            return "item";
        }
    }

    static final class Actuals implements RowReader<ActualRow> {
        private final Catalog catalog;
        private final KeyLines seen = new KeyLines();

        Actuals(Catalog catalog) {
            this.catalog = catalog;
        }

        @Override
        public ActualRow read(Record r) throws FieldException {
            int item = itemId(r, catalog);
            Period period = r.period("period");
            long quantity = r.quantity("quantity");
            int first = seen.putIfAbsent(((long) item << 32) | (period.index() & 0xFFFFFFFFL), r.line());
            if (first != 0) {
                throw duplicate(r, "item", "item and period", first);
            }
            return new ActualRow(r.line(), item, period.index(), quantity);
        }

        @Override
        public List<Integer> write(ImportSession s, List<ActualRow> rows) {
            return s.insertActuals(rows);
        }

        @Override
        public String keyColumn() {
            return "item";
        }

        @Override
        public String keyWords() {
            return "item and period";
        }
    }

    static final class Forecasts implements RowReader<ForecastRow> {
        private static final int PERIOD_BITS = 18;
        private final Catalog catalog;
        private final KeyLines seen = new KeyLines();
        private final Map<String, Step> steps = new HashMap<>();
        private final String imported;

        Forecasts(Catalog catalog) {
            this.catalog = catalog;
            catalog.steps().stream().filter(s -> !s.name().equals(catalog.ledgerStep())).forEach(s -> steps.put(s.name(), s));
            imported = String.join(", ", steps.keySet().stream().sorted().toList());
        }

        @Override
        public ForecastRow read(Record r) throws FieldException {
            int item = itemId(r, catalog);
            Period period = r.period("period");
            Period cycle = r.period("cycle");
            Step step = step(r);
            long quantity = r.quantity("quantity");
            if (period.compareTo(cycle) < 0) {
                throw r.fail("period", "a period at or after the cycle " + cycle + " (lag 0 or more)",
                        period.toString());
            }
            int first = seen.putIfAbsent(key(item, step, cycle, period), r.line());
            if (first != 0) {
                throw duplicate(r, "item", "item, period, cycle and step", first);
            }
            return new ForecastRow(r.line(), item, step.id(), cycle.index(), period.index(), quantity);
        }

        private Step step(Record r) throws FieldException {
            String name = r.text("step");
            Step step = steps.get(name);
            if (step != null) {
                return step;
            }
            String ledger = name.equals(catalog.ledgerStep())
                    ? " (" + name + " comes from the decision ledger, not from files)" : "";
            throw r.fail("step", "one of the imported steps " + imported + ledger, name);
        }

        /**
         * Item, step, cycle and period packed into 64 bits: 22, 6, 18 and 18. Periods of the years
         * 1900–2999 (all that parsing accepts) fit once shifted: weeks from 1900 have indexes down
         * to about −3,650, months up to 2999 about 36,000.
         */
        private static long key(int item, Step step, Period cycle, Period period) {
            if (item >= 1 << 22 || step.id() >= 1 << 6) {
                throw new IllegalStateException("forecast key out of the packed range: item " + item);
            }
            return ((long) item << 42) | ((long) step.id() << 36) | ((long) packed(cycle) << PERIOD_BITS)
                    | packed(period);
        }

        private static int packed(Period p) {
            int shifted = p.index() + (1 << 12);
            if (shifted < 0 || shifted >= 1 << PERIOD_BITS) {
                throw new IllegalStateException("period out of the packed range: " + p);
            }
            return shifted;
        }

        @Override
        public List<Integer> write(ImportSession s, List<ForecastRow> rows) {
            return s.insertForecasts(rows);
        }

        @Override
        public String keyColumn() {
            return "item";
        }

        @Override
        public String keyWords() {
            return "item, period, cycle and step";
        }
    }

    static final class Events implements RowReader<EventRow> {
        private final Catalog catalog;
        private final Map<String, Integer> seen = new HashMap<>();

        Events(Catalog catalog) {
            this.catalog = catalog;
        }

        @Override
        public EventRow read(Record r) throws FieldException {
            int item = itemId(r, catalog);
            Period period = r.period("period");
            String tag = r.text("tag").strip();
            if (!catalog.tags().contains(tag)) {
                throw r.fail("tag", "one of the workspace's tags " + String.join(", ", catalog.tags())
                        + " (add one with: plenum tags add NAME)", tag);
            }
            Integer first = seen.putIfAbsent(item + "|" + period.index() + "|" + tag, r.line());
            if (first != null) {
                throw duplicate(r, "item", "item, period and tag", first);
            }
            return new EventRow(r.line(), item, period.index(), tag, r.text("note").strip());
        }

        @Override
        public List<Integer> write(ImportSession s, List<EventRow> rows) {
            return s.insertEvents(rows);
        }

        @Override
        public String keyColumn() {
            return "item";
        }

        @Override
        public String keyWords() {
            return "item, period and tag";
        }
    }
}
