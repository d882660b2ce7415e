package org.plenum.tui;

import com.googlecode.lanterna.TerminalSize;
import com.googlecode.lanterna.graphics.TextGraphics;

/**
 * Draws text into a rectangle of the screen, clipped to it: views never write outside their
 * area, and text longer than its place ends in the look's ellipsis.
 */
final class Painter {
    /**
     * Moves lines of the terminal up ({@code distance} > 0) or down, as a hint: Lanterna moves
     * its copy of what the terminal shows alike, so only the lines that came into view are sent.
     */
    interface Scroller {
        void scroll(int firstRow, int lastRow, int distance);
    }

    private final TextGraphics graphics;
    private final Glyphs glyphs;
    private final Scroller scroller;
    private final Look look;
    private final int left;
    private final int top;
    private final int columns;
    private final int rows;

    Painter(TextGraphics graphics, Glyphs glyphs, Scroller scroller, int left, int top, int columns, int rows) {
        this.graphics = graphics;
        this.glyphs = glyphs;
        this.scroller = scroller;
        this.look = glyphs.look();
        this.left = left;
        this.top = top;
        this.columns = Math.max(0, columns);
        this.rows = Math.max(0, rows);
    }

    static Painter whole(TextGraphics graphics, Glyphs glyphs, Scroller scroller, TerminalSize size) {
        return new Painter(graphics, glyphs, scroller, 0, 0, size.getColumns(), size.getRows());
    }

    int columns() {
        return columns;
    }

    int rows() {
        return rows;
    }

    Look look() {
        return look;
    }

    /** The rows {@code from} to {@code from + count − 1} of this area, as an area of their own. */
    Painter band(int from, int count) {
        int start = Math.min(rows, Math.max(0, from));
        return new Painter(graphics, glyphs, scroller, left, top + start, columns, Math.min(count, rows - start));
    }

    /** A sub-area starting at column {@code from}, {@code width} wide. */
    Painter column(int from, int width) {
        int start = Math.min(columns, Math.max(0, from));
        return new Painter(graphics, glyphs, scroller, left + start, top, Math.min(width, columns - start), rows);
    }

    /** Writes {@code text} at (column, row), cut at the area's edge. */
    void text(int column, int row, String text, Look.Role role) {
        if (row < 0 || row >= rows || column >= columns || text.isEmpty()) {
            return;
        }
        String shown = Text.fit(text, columns - column, look);
        if (Glyphs.plain(shown)) {
            for (int i = 0; i < shown.length(); i++) {
                graphics.setCharacter(left + column + i, top + row, glyphs.of(role, shown.charAt(i)));
            }
            return;
        }
        graphics.setForegroundColor(look.foreground(role));
        graphics.setBackgroundColor(look.background(role));
        com.googlecode.lanterna.SGR[] modifiers = look.modifiers(role);
        if (modifiers.length == 0) {
            graphics.putString(left + column, top + row, shown);
        } else {
            graphics.putString(left + column, top + row, shown, modifiers[0],
                    java.util.Arrays.copyOfRange(modifiers, 1, modifiers.length));
        }
    }

    void text(int column, int row, String text) {
        text(column, row, text, Look.Role.PLAIN);
    }

    /** A whole row in one role, padded to the area's width (for bars and the selected row). */
    void line(int row, String text, Look.Role role) {
        text(0, row, Text.pad(text, columns, look), role);
    }

    /**
     * Hints that rows {@code from..to} of this area show what they showed, moved up by
     * {@code distance} rows (down when negative); only for an area as wide as the screen. What is
     * drawn afterwards is what counts: a wrong hint costs bytes, never a wrong screen.
     */
    void scrolled(int from, int to, int distance) {
        if (left == 0 && from >= 0 && to < rows && from < to && distance != 0 && Math.abs(distance) <= to - from) {
            scroller.scroll(top + from, top + to, distance);
        }
    }

    void clear() {
        graphics.setForegroundColor(look.foreground(Look.Role.PLAIN));
        graphics.setBackgroundColor(look.background(Look.Role.PLAIN));
        graphics.fillRectangle(new com.googlecode.lanterna.TerminalPosition(left, top), new TerminalSize(columns, rows),
                ' ');
    }
}
