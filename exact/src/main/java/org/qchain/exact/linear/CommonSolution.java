package org.qchain.exact.linear;

import java.math.BigInteger;
import org.qchain.exact.Fractions;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;

/**
 * The solution of {@code A X = B} as the exact solvers produce it: an integer matrix over one common denominator,
 * {@code X = numerators / denominator}, not yet reduced entry by entry. Reducing costs one gcd of
 * determinant-sized numbers per entry; a caller that feeds a solution into further exact work (a second solve,
 * sums and products of its entries) can stay over the common denominator and reduce once at the end.
 * Immutable.
 */
public final class CommonSolution {
    private final BigInteger[][] numerators;
    private final BigInteger denominator;

    CommonSolution(BigInteger[][] numerators, BigInteger denominator) {
        if (denominator.signum() <= 0) {
            throw new IllegalArgumentException("the common denominator must be positive, not " + denominator);
        }
        this.numerators = numerators;
        this.denominator = denominator;
    }

    /** The number of unknowns. */
    public int rows() {
        return numerators.length;
    }

    /** The number of right-hand sides. */
    public int cols() {
        return numerators.length == 0 ? 0 : numerators[0].length;
    }

    /** The common denominator, positive. */
    public BigInteger denominator() {
        return denominator;
    }

    /** The integer numerator of entry (i, j): {@code X_ij = numerator(i, j) / denominator()}. */
    public BigInteger numerator(int i, int j) {
        return numerators[i][j];
    }

    /** The numerators of column j (a copy). */
    public BigInteger[] column(int j) {
        BigInteger[] c = new BigInteger[numerators.length];
        for (int i = 0; i < c.length; i++) {
            c[i] = numerators[i][j];
        }
        return c;
    }

    /** Entry (i, j) in lowest terms. */
    public Rational get(int i, int j) {
        return Rational.of(numerators[i][j], denominator);
    }

    /** The solution with every entry in lowest terms ({@link Fractions#over}, column by column). */
    public RationalMatrix reduced() {
        int n = rows();
        int m = cols();
        Rational[][] x = new Rational[n][m];
        for (int j = 0; j < m; j++) {
            Rational[] c = Fractions.over(column(j), denominator);
            for (int i = 0; i < n; i++) {
                x[i][j] = c[i];
            }
        }
        return RationalMatrix.of(x);
    }
}
