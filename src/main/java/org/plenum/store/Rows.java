package org.plenum.store;

import java.util.Map;

/**
 * Checked rows on their way into the workspace, each with the file line it came from so that a
 * conflict found by the database can still be reported at its place. Periods and cycles are
 * {@code Period.index} values; quantities are millionths of a unit.
 */
public final class Rows {
    private Rows() {}

    public record ItemRow(int line, String item, String description, String group, String region, Long unitValue,
            Map<String, String> attributes) {}

    public record ActualRow(int line, int itemId, int period, long quantity) {}

    public record ForecastRow(int line, int itemId, int stepId, int cycle, int period, long quantity) {}

    public record EventRow(int line, int itemId, int period, String tag, String note) {}
}
