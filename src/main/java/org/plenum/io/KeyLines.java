package org.plenum.io;

import java.util.Arrays;

/**
 * The keys already read from a file, packed into longs, with the line each first appeared on.
 * Open addressing over primitive arrays: a million forecast keys take 24 MB instead of the
 * ~100 MB a {@code HashMap<Long, Integer>} would.
 */
final class KeyLines {
    private static final long EMPTY = Long.MIN_VALUE;
    private long[] keys;
    private int[] lines;
    private int size;

    KeyLines() {
        keys = new long[1 << 12];
        lines = new int[keys.length];
        Arrays.fill(keys, EMPTY);
    }

    /** Records {@code key} at {@code line}; returns the earlier line when the key was there, else 0. */
    int putIfAbsent(long key, int line) {
        if (2 * (size + 1) > keys.length) {
            grow();
        }
        int slot = slot(key, keys.length);
        while (keys[slot] != EMPTY) {
            if (keys[slot] == key) {
                return lines[slot];
            }
            slot = (slot + 1) & (keys.length - 1);
        }
        keys[slot] = key;
        lines[slot] = line;
        size++;
        return 0;
    }

    private static int slot(long key, int capacity) {
        long h = key * 0x9E3779B97F4A7C15L;
        return (int) (h >>> 32) & (capacity - 1);
    }

    private void grow() {
        long[] oldKeys = keys;
        int[] oldLines = lines;
        keys = new long[oldKeys.length * 2];
        lines = new int[keys.length];
        Arrays.fill(keys, EMPTY);
        for (int i = 0; i < oldKeys.length; i++) {
            if (oldKeys[i] != EMPTY) {
                int slot = slot(oldKeys[i], keys.length);
                while (keys[slot] != EMPTY) {
                    slot = (slot + 1) & (keys.length - 1);
                }
                keys[slot] = oldKeys[i];
                lines[slot] = oldLines[i];
            }
        }
    }
}
