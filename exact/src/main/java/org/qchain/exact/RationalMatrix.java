package org.qchain.exact;

import java.util.Arrays;

/**
 * An immutable dense matrix of {@link Rational} entries.
 *
 * <p>Algorithms (powers, path sums, solves) live in companion classes such as {@link MatrixPowers}; this type only
 * stores, compares and does elementary arithmetic.
 */
public final class RationalMatrix {
    private final Rational[][] a;

    private RationalMatrix(Rational[][] a) {
        this.a = a;
    }

    /**
     * A matrix with the given entries (copied).
     *
     * @param entries rows of equal, non-zero length; no {@code null} entries
     * @return the matrix
     * @throws IllegalArgumentException if the rows are ragged, empty or contain {@code null}
     */
    public static RationalMatrix of(Rational[][] entries) {
        if (entries.length == 0 || entries[0].length == 0) {
            throw new IllegalArgumentException("empty matrix");
        }
        int c = entries[0].length;
        Rational[][] copy = new Rational[entries.length][];
        for (int i = 0; i < entries.length; i++) {
            if (entries[i].length != c) {
                throw new IllegalArgumentException("ragged matrix: row " + i + " has " + entries[i].length + " entries");
            }
            for (Rational r : entries[i]) {
                if (r == null) {
                    throw new IllegalArgumentException("null entry in row " + i);
                }
            }
            copy[i] = entries[i].clone();
        }
        return new RationalMatrix(copy);
    }

    /** Wraps without copying; for this package's algorithms, which never touch the array afterwards. */
    static RationalMatrix wrap(Rational[][] entries) {
        return new RationalMatrix(entries);
    }

    /**
     * The {@code n x n} identity.
     *
     * @param n the size, at least 1
     * @return the identity matrix
     */
    public static RationalMatrix identity(int n) {
        Rational[][] e = new Rational[n][n];
        for (int i = 0; i < n; i++) {
            Arrays.fill(e[i], Rational.ZERO);
            e[i][i] = Rational.ONE;
        }
        return new RationalMatrix(e);
    }

    /** Number of rows. */
    public int rows() {
        return a.length;
    }

    /** Number of columns. */
    public int cols() {
        return a[0].length;
    }

    /**
     * The entry in row {@code i}, column {@code j} (0-based).
     *
     * @throws IndexOutOfBoundsException if out of range
     */
    public Rational get(int i, int j) {
        return a[i][j];
    }

    /** A copy of row {@code i}. */
    public Rational[] row(int i) {
        return a[i].clone();
    }

    /** A copy of all entries. */
    public Rational[][] toArray() {
        Rational[][] c = new Rational[a.length][];
        for (int i = 0; i < a.length; i++) {
            c[i] = a[i].clone();
        }
        return c;
    }

    /**
     * The plain product {@code this * o} (schoolbook, reducing every entry); for powers use {@link MatrixPowers}.
     *
     * @throws IllegalArgumentException if the shapes do not fit
     */
    public RationalMatrix multiply(RationalMatrix o) {
        if (cols() != o.rows()) {
            throw new IllegalArgumentException("shapes do not fit: " + rows() + "x" + cols() + " * " + o.rows() + "x" + o.cols());
        }
        int n = rows();
        int m = o.cols();
        int k = cols();
        Rational[][] r = new Rational[n][m];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < m; j++) {
                Rational s = Rational.ZERO;
                for (int t = 0; t < k; t++) {
                    if (!a[i][t].isZero() && !o.a[t][j].isZero()) {
                        s = s.add(a[i][t].multiply(o.a[t][j]));
                    }
                }
                r[i][j] = s;
            }
        }
        return new RationalMatrix(r);
    }

    /** Whether the matrix is square. */
    public boolean isSquare() {
        return rows() == cols();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof RationalMatrix m && Arrays.deepEquals(a, m.a);
    }

    @Override
    public int hashCode() {
        return Arrays.deepHashCode(a);
    }

    /** Rows in brackets, entries as {@code p/q}: {@code [[1/2, 1/2], [1, 0]]}. */
    @Override
    public String toString() {
        return Arrays.deepToString(a);
    }
}
