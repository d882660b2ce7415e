package org.plenum.tui;

import com.googlecode.lanterna.TerminalTextUtils;
import com.googlecode.lanterna.TextCharacter;

/**
 * The screen's characters, each made once per role. Lanterna checks every character of every
 * string it is given (a grapheme break iterator each), which for a full screen was most of a
 * frame's time and megabytes of garbage per key; a made character is simply placed. Only for the
 * UI thread.
 */
final class Glyphs {
    private final Look look;
    /** By role, then by the high and low byte of the character: made on first use. */
    private final TextCharacter[][][] made = new TextCharacter[Look.Role.values().length][256][];

    Glyphs(Look look) {
        this.look = look;
    }

    Look look() {
        return look;
    }

    /**
     * Whether every character of {@code text} takes one column on its own, so it can be placed
     * from a made glyph: no control characters, surrogate halves, combining marks or wide
     * (CJK) characters, which Lanterna's own string drawing handles.
     */
    static boolean plain(String text) {
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c < ' ' || c == 0x7f || (c >= 0x300 && !simpleAbove(c))) {
                return false;
            }
        }
        return true;
    }

    private static boolean simpleAbove(char c) {
        int type = Character.getType(c);
        return !Character.isSurrogate(c) && type != Character.NON_SPACING_MARK && type != Character.ENCLOSING_MARK
                && type != Character.COMBINING_SPACING_MARK && type != Character.FORMAT && type != Character.CONTROL
                && !TerminalTextUtils.isCharDoubleWidth(c);
    }

    /** {@code c} drawn in {@code role}; {@code c} must be {@link #plain}. */
    TextCharacter of(Look.Role role, char c) {
        TextCharacter[][] pages = made[role.ordinal()];
        TextCharacter[] page = pages[c >> 8];
        if (page == null) {
            page = new TextCharacter[256];
            pages[c >> 8] = page;
        }
        TextCharacter glyph = page[c & 0xff];
        if (glyph == null) {
            glyph = new TextCharacter(c, look.foreground(role), look.background(role), look.modifiers(role));
            page[c & 0xff] = glyph;
        }
        return glyph;
    }
}
