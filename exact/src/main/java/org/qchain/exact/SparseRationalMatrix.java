package org.qchain.exact;

import java.util.Arrays;

/**
 * An immutable square matrix of {@link Rational} entries that stores only its non-zero entries, row by row: the form
 * of a large chain whose states each have a few transitions. Memory is proportional to the number of non-zero
 * entries, never to the square of the number of states.
 *
 * <p>{@link org.qchain.exact.certified.CertifiedPowers} computes certified decimals of rows and entries of powers
 * directly on this form; {@link #toDense()} gives the dense {@link RationalMatrix} for the exact engines (the caller
 * checks that it fits).
 */
public final class SparseRationalMatrix {
    private final int size;
    /** For each row, the columns of its non-zero entries, strictly ascending. */
    private final int[][] cols;
    /** For each row, the non-zero values, in the order of {@link #cols}. */
    private final Rational[][] vals;

    private SparseRationalMatrix(int size, int[][] cols, Rational[][] vals) {
        this.size = size;
        this.cols = cols;
        this.vals = vals;
    }

    /**
     * A matrix from its rows' non-zero entries (copied). Zero values are dropped.
     *
     * @param size   the number of rows and columns, at least 1
     * @param cols   for each row, the columns of its entries, strictly ascending, each in {@code [0, size)}
     * @param values for each row, the values, one per column
     * @return the matrix
     * @throws IllegalArgumentException if the shapes do not fit, a column is out of range or repeated or not
     *                                  ascending, or a value is {@code null}
     */
    public static SparseRationalMatrix ofRows(int size, int[][] cols, Rational[][] values) {
        if (size < 1 || cols.length != size || values.length != size) {
            throw new IllegalArgumentException("need " + size + " rows of columns and values, size at least 1");
        }
        int[][] c = new int[size][];
        Rational[][] v = new Rational[size][];
        for (int i = 0; i < size; i++) {
            if (cols[i].length != values[i].length) {
                throw new IllegalArgumentException("row " + i + ": " + cols[i].length + " columns, " + values[i].length
                    + " values");
            }
            int k = 0;
            int[] ci = new int[cols[i].length];
            Rational[] vi = new Rational[cols[i].length];
            for (int t = 0; t < cols[i].length; t++) {
                int j = cols[i][t];
                if (j < 0 || j >= size || t > 0 && j <= cols[i][t - 1]) {
                    throw new IllegalArgumentException("row " + i + ": column " + j + " out of range or not ascending");
                }
                if (values[i][t] == null) {
                    throw new IllegalArgumentException("null entry in row " + i);
                }
                if (!values[i][t].isZero()) {
                    ci[k] = j;
                    vi[k++] = values[i][t];
                }
            }
            c[i] = Arrays.copyOf(ci, k);
            v[i] = Arrays.copyOf(vi, k);
        }
        return new SparseRationalMatrix(size, c, v);
    }

    /**
     * The non-zero entries of a dense square matrix.
     *
     * @param p a square matrix
     * @return the same matrix, sparse
     * @throws IllegalArgumentException if {@code p} is not square
     */
    public static SparseRationalMatrix of(RationalMatrix p) {
        if (!p.isSquare()) {
            throw new IllegalArgumentException("matrix is not square: " + p.rows() + "x" + p.cols());
        }
        int n = p.rows();
        int[][] c = new int[n][];
        Rational[][] v = new Rational[n][];
        for (int i = 0; i < n; i++) {
            int k = 0;
            for (int j = 0; j < n; j++) {
                k += p.get(i, j).isZero() ? 0 : 1;
            }
            c[i] = new int[k];
            v[i] = new Rational[k];
            k = 0;
            for (int j = 0; j < n; j++) {
                if (!p.get(i, j).isZero()) {
                    c[i][k] = j;
                    v[i][k++] = p.get(i, j);
                }
            }
        }
        return new SparseRationalMatrix(n, c, v);
    }

    /** The number of rows (and columns). */
    public int size() {
        return size;
    }

    /** The number of non-zero entries. */
    public long nonZeroCount() {
        long z = 0;
        for (int[] c : cols) {
            z += c.length;
        }
        return z;
    }

    /**
     * The entry in row {@code i}, column {@code j} (0-based).
     *
     * @throws IndexOutOfBoundsException if out of range
     */
    public Rational get(int i, int j) {
        java.util.Objects.checkIndex(j, size);
        int t = Arrays.binarySearch(cols[i], j);
        return t >= 0 ? vals[i][t] : Rational.ZERO;
    }

    /** The columns of the non-zero entries of row {@code i}, ascending (a copy). */
    public int[] rowColumns(int i) {
        return cols[i].clone();
    }

    /** The non-zero values of row {@code i}, in the order of {@link #rowColumns} (a copy). */
    public Rational[] rowValues(int i) {
        return vals[i].clone();
    }

    /** Whether no entry is negative. */
    public boolean isNonNegative() {
        for (Rational[] row : vals) {
            for (Rational x : row) {
                if (x.signum() < 0) {
                    return false;
                }
            }
        }
        return true;
    }

    /** The dense matrix: {@code size^2} entries, so the caller checks that it fits first. */
    public RationalMatrix toDense() {
        Rational[][] e = new Rational[size][size];
        for (int i = 0; i < size; i++) {
            Arrays.fill(e[i], Rational.ZERO);
            for (int t = 0; t < cols[i].length; t++) {
                e[i][cols[i][t]] = vals[i][t];
            }
        }
        return RationalMatrix.wrap(e);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof SparseRationalMatrix m && size == m.size && Arrays.deepEquals(cols, m.cols)
            && Arrays.deepEquals(vals, m.vals);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.deepHashCode(cols) + Arrays.deepHashCode(vals);
    }

    /** Rows as lists of {@code column: value}: {@code [{0: 1/2, 1: 1/2}, {0: 1}]}. */
    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder("[");
        for (int i = 0; i < size; i++) {
            sb.append(i == 0 ? "{" : ", {");
            for (int t = 0; t < cols[i].length; t++) {
                sb.append(t == 0 ? "" : ", ").append(cols[i][t]).append(": ").append(vals[i][t]);
            }
            sb.append('}');
        }
        return sb.append(']').toString();
    }
}
