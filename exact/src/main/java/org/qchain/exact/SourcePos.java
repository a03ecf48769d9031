package org.qchain.exact;

/**
 * A position in an input file: file name as the user gave it, 1-based line and column.
 *
 * @param file   the file name as given on the command line (or a label such as {@code <string>})
 * @param line   1-based line number
 * @param column 1-based column number
 */
public record SourcePos(String file, int line, int column) {
    /** Formats as {@code file:line:col}. */
    @Override
    public String toString() {
        return file + ":" + line + ":" + column;
    }
}
