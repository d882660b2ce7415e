package org.plenum.io;

/** One problem in an input file, at a 1-based line and column (the field's position in its record). */
record ImportError(String file, int line, int column, String message) implements Comparable<ImportError> {

    @Override
    public String toString() {
        return file + ":" + line + ":" + column + ": " + message;
    }

    @Override
    public int compareTo(ImportError o) {
        return line != o.line ? Integer.compare(line, o.line) : Integer.compare(column, o.column);
    }
}
