package org.plenum.io;

/** One field of a record is not what its column needs; carries the 0-based column. */
final class FieldException extends Exception {
    private static final long serialVersionUID = 1L;
    final int column;

    FieldException(int column, String message) {
        super(message, null, false, false);
        this.column = column;
    }
}
