package org.plenum.tui;

import java.util.ArrayList;
import java.util.List;

/**
 * A column chart in text: one column per period, bars in eighths of a row, history drawn solid
 * and forecasts lighter, with the value decided in the meeting marked in its column, and a scale
 * on the left. Pure: values in, lines out.
 */
final class HistoryChart {
    private HistoryChart() {}

    /**
     * One period's column.
     *
     * @param value the bar's height (an actual, or the forecast for a target period); NaN for none
     * @param forecast whether the bar is a forecast rather than an actual
     * @param marker a value to mark in the column (the meeting's decision), NaN for none
     */
    record Bar(double value, boolean forecast, double marker) {}

    /** {@code height} lines, the scale's labels in the first {@code labelWidth} columns of each. */
    static List<String> lines(List<Bar> bars, int height, int labelWidth, Look look) {
        double max = 0;
        for (Bar b : bars) {
            max = Math.max(max, Double.isNaN(b.value()) ? 0 : b.value());
            max = Math.max(max, Double.isNaN(b.marker()) ? 0 : b.marker());
        }
        double top = max <= 0 ? 1 : max;
        List<String> out = new ArrayList<>();
        for (int line = 0; line < height; line++) {
            int fromBottom = height - 1 - line;
            String label = line == 0 ? Text.amount(top) : line == height - 1 ? "0" : "";
            StringBuilder row = new StringBuilder(Text.right(label, labelWidth - 1, look)).append(line == height - 1
                    ? (look.unicode() ? '┴' : '+') : (look.unicode() ? '│' : '|'));
            for (Bar b : bars) {
                row.append(cell(b, fromBottom, height, top, look));
            }
            out.add(row.toString());
        }
        return out;
    }

    private static char cell(Bar b, int fromBottom, int height, double top, Look look) {
        if (!Double.isNaN(b.marker())) {
            int markerRow = (int) Math.min(height - 1, Math.floor(b.marker() / top * height));
            if (markerRow == fromBottom) {
                return look.unicode() ? '◆' : 'o';
            }
        }
        if (Double.isNaN(b.value())) {
            return ' ';
        }
        double eighths = b.value() / top * height * 8;
        double filled = eighths - fromBottom * 8.0;
        if (filled >= 8) {
            return b.forecast() ? (look.unicode() ? '▒' : '+') : look.fullBlock();
        }
        if (filled <= 0) {
            return ' ';
        }
        if (b.forecast()) {
            return look.unicode() ? '░' : '.';
        }
        return look.sparks().charAt(Math.max(0, Math.min(7, (int) Math.ceil(filled) - 1)));
    }
}
