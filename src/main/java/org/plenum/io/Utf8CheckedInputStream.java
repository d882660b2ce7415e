package org.plenum.io;

import java.io.FilterInputStream;
import java.io.IOException;
import java.io.InputStream;

/**
 * Passes bytes through while checking that they are well-formed UTF-8, and counts them. The first
 * malformed byte stops reading with a {@link MalformedUtf8Exception} that knows its line and the
 * column (in characters) where it stands, which a decoding {@code Reader} cannot tell.
 */
final class Utf8CheckedInputStream extends FilterInputStream {
    private long bytes;
    private int line = 1;
    private int column = 1;
    private int pending;
    private int lead;
    private int lowerBound = 0x80;
    private int upperBound = 0xBF;

    Utf8CheckedInputStream(InputStream in) {
        super(in);
    }

    /** Bytes passed through so far. */
    long bytesRead() {
        return bytes;
    }

    @Override
    public int read() throws IOException {
        byte[] one = new byte[1];
        return read(one, 0, 1) == -1 ? -1 : one[0] & 0xFF;
    }

    @Override
    public int read(byte[] b, int off, int len) throws IOException {
        int n = super.read(b, off, len);
        if (n == -1) {
            if (pending > 0) {
                throw new MalformedUtf8Exception(line, column, String.format("byte 0x%02X and then the end of the file", lead));
            }
            return -1;
        }
        for (int i = off; i < off + n; i++) {
            check(b[i] & 0xFF);
        }
        bytes += n;
        return n;
    }

    /**
     * Unicode 15 table 3-7: well-formed UTF-8 byte sequences, including the limits on second
     * bytes. {@code column} is the position of the character being read, so an error names the
     * lead byte of a broken sequence where it stands.
     */
    private void check(int b) throws MalformedUtf8Exception {
        if (pending > 0) {
            if (b < lowerBound || b > upperBound) {
                throw bad(lead);
            }
            lowerBound = 0x80;
            upperBound = 0xBF;
            if (--pending == 0) {
                column++;
            }
            return;
        }
        if (b < 0x80) {
            if (b == '\n') {
                line++;
                column = 1;
            } else {
                column++;
            }
            return;
        }
        lead = b;
        if (b >= 0xC2 && b <= 0xDF) {
            pending = 1;
        } else if (b >= 0xE0 && b <= 0xEF) {
            pending = 2;
            lowerBound = b == 0xE0 ? 0xA0 : 0x80;
            upperBound = b == 0xED ? 0x9F : 0xBF;
        } else if (b >= 0xF0 && b <= 0xF4) {
            pending = 3;
            lowerBound = b == 0xF0 ? 0x90 : 0x80;
            upperBound = b == 0xF4 ? 0x8F : 0xBF;
        } else {
            throw bad(b);
        }
    }

    private MalformedUtf8Exception bad(int b) {
        return new MalformedUtf8Exception(line, column, String.format("byte 0x%02X", b));
    }

    /** The input is not UTF-8 at {@code line}:{@code column}. */
    static final class MalformedUtf8Exception extends IOException {
        private static final long serialVersionUID = 1L;
        final int line;
        final int column;
        final String found;

        MalformedUtf8Exception(int line, int column, String found) {
            super("not UTF-8 at line " + line + ", column " + column + ": " + found);
            this.line = line;
            this.column = column;
            this.found = found;
        }
    }
}
