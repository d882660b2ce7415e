package org.plenum.tui;

import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.input.KeyType;

/** Reading the keys of UX.md off Lanterna's key strokes. */
final class Keys {
    private Keys() {}

    /** A plain typed character (no Ctrl or Alt), or 0. */
    static char typed(KeyStroke key) {
        return key.getKeyType() == KeyType.Character && !key.isCtrlDown() && !key.isAltDown() ? key.getCharacter() : 0;
    }

    static boolean is(KeyStroke key, char c) {
        return typed(key) == c;
    }

    /**
     * ↑, or {@code k} where {@code k} means nothing else: UX.md gives {@code k} both "move up" and
     * "keep", so on the agenda and item views, where an item can be kept, {@code k} keeps.
     */
    static boolean up(KeyStroke key, boolean kMovesUp) {
        return key.getKeyType() == KeyType.ArrowUp || (kMovesUp && is(key, 'k'));
    }

    static boolean down(KeyStroke key) {
        return key.getKeyType() == KeyType.ArrowDown || is(key, 'j');
    }

    static boolean type(KeyStroke key, KeyType type) {
        return key.getKeyType() == type;
    }

    static boolean ctrl(KeyStroke key, char c) {
        return key.getKeyType() == KeyType.Character && key.isCtrlDown() && Character.toLowerCase(key.getCharacter()) == c;
    }

    /**
     * A new selection after a movement key among {@code count} rows with {@code page} visible;
     * {@code -1} when the key is not a movement key.
     */
    static int move(KeyStroke key, int selected, int count, int page, boolean kMovesUp) {
        if (count == 0) {
            return -1;
        }
        int next;
        if (up(key, kMovesUp)) {
            next = selected - 1;
        } else if (down(key)) {
            next = selected + 1;
        } else if (type(key, KeyType.PageUp)) {
            next = selected - Math.max(1, page);
        } else if (type(key, KeyType.PageDown)) {
            next = selected + Math.max(1, page);
        } else if (type(key, KeyType.Home)) {
            next = 0;
        } else if (type(key, KeyType.End)) {
            next = count - 1;
        } else {
            return -1;
        }
        return Math.max(0, Math.min(count - 1, next));
    }
}
