package org.qchain.exact.reference;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalInt;

/**
 * What a reference file must hold: a matrix (rows and columns named by states), a vector (one value per named
 * state) or one number. Immutable.
 *
 * <p>The descriptions ("the model has 6 states", "the chain has 2 absorbing states") go into messages about a wrong
 * shape, so they say what was expected in the user's terms.
 */
public final class Target {
    /** The three shapes. */
    public enum Shape {
        /** A table of {@code rows × cols} values: {@code P^n}, absorption probabilities. */
        MATRIX,
        /** One value per label: a row of {@code P^n}, a stationary law, expected steps. */
        VECTOR,
        /** One number: an entry, an availability, a mean time. */
        SCALAR
    }

    private final Shape shape;
    private final List<String> rows;
    private final List<String> cols;
    private final String rowsAre;
    private final String colsAre;
    private final Map<String, Integer> rowIndex = new HashMap<>();
    private final Map<String, Integer> colIndex = new HashMap<>();

    private Target(Shape shape, List<String> rows, List<String> cols, String rowsAre, String colsAre) {
        this.shape = shape;
        this.rows = List.copyOf(rows);
        this.cols = List.copyOf(cols);
        this.rowsAre = rowsAre;
        this.colsAre = colsAre;
        for (int i = 0; i < this.rows.size(); i++) {
            rowIndex.putIfAbsent(this.rows.get(i), i);
        }
        for (int j = 0; j < this.cols.size(); j++) {
            colIndex.putIfAbsent(this.cols.get(j), j);
        }
    }

    /**
     * A matrix.
     *
     * @param rows    the row labels, in order
     * @param cols    the column labels, in order
     * @param rowsAre what the rows are, for messages, e.g. {@code "the model has 6 states"}
     * @param colsAre what the columns are, e.g. {@code "the model has 6 states"}
     * @return the target
     * @throws IllegalArgumentException if there are no rows or no columns
     */
    public static Target matrix(List<String> rows, List<String> cols, String rowsAre, String colsAre) {
        if (rows.isEmpty() || cols.isEmpty()) {
            throw new IllegalArgumentException("a matrix target needs rows and columns");
        }
        return new Target(Shape.MATRIX, rows, cols, rowsAre, colsAre);
    }

    /**
     * A vector: one value per label.
     *
     * @param labels    the labels, in order
     * @param labelsAre what they are, e.g. {@code "the model has 6 states"}
     * @return the target
     * @throws IllegalArgumentException if there are no labels
     */
    public static Target vector(List<String> labels, String labelsAre) {
        if (labels.isEmpty()) {
            throw new IllegalArgumentException("a vector target needs labels");
        }
        return new Target(Shape.VECTOR, List.of(""), labels, "", labelsAre);
    }

    /**
     * One number.
     *
     * @param name what it is, e.g. {@code "Up -> Down"} or {@code "availability"}
     * @return the target
     */
    public static Target scalar(String name) {
        return new Target(Shape.SCALAR, List.of(""), List.of(name), "", "expected one number");
    }

    /** The shape. */
    public Shape shape() {
        return shape;
    }

    /** The row labels (one empty label for a vector or a number). */
    public List<String> rows() {
        return rows;
    }

    /** The column labels (the labels of a vector; the name of a number). */
    public List<String> cols() {
        return cols;
    }

    /** What the rows are, for messages. */
    public String rowsAre() {
        return rowsAre;
    }

    /** What the columns (or a vector's labels) are, for messages. */
    public String colsAre() {
        return colsAre;
    }

    /** The number of values a complete file holds. */
    public long size() {
        return (long) rows.size() * cols.size();
    }

    /** The index of a row label. */
    public OptionalInt rowIndex(String label) {
        Integer i = rowIndex.get(label);
        return i == null ? OptionalInt.empty() : OptionalInt.of(i);
    }

    /** The index of a column label. */
    public OptionalInt colIndex(String label) {
        Integer j = colIndex.get(label);
        return j == null ? OptionalInt.empty() : OptionalInt.of(j);
    }

    /**
     * The name of one entry: {@code A -> B} in a matrix, the label in a vector, the name of a number.
     *
     * @param row the row index
     * @param col the column index
     * @return its name
     */
    public String label(int row, int col) {
        return shape == Shape.MATRIX ? rows.get(row) + " -> " + cols.get(col) : cols.get(col);
    }
}
