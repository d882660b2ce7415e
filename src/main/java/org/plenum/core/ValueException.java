package org.plenum.core;

/**
 * A text that is not a valid value of its kind. The message is what was expected, in words a
 * user understands ("a non-negative quantity"), so that readers of files can report
 * {@code expected <message>, found <text>} at the exact place.
 */
public final class ValueException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    public ValueException(String expected) {
        super(expected);
    }

    /** What a valid value looks like. */
    public String expected() {
        return getMessage();
    }
}
