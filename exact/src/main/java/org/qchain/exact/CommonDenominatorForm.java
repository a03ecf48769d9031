package org.qchain.exact;

import java.math.BigInteger;

/**
 * A rational square matrix written as {@code P = A / d}: {@code d} the least common multiple of all denominators,
 * {@code A} an integer matrix. Also keeps each row's own least common denominator (for size estimates).
 */
final class CommonDenominatorForm {
    final int size;
    final BigInteger d;
    final BigInteger[] rowDenominators;
    final IntMatrix a;

    private CommonDenominatorForm(int size, BigInteger d, BigInteger[] rowDenominators, IntMatrix a) {
        this.size = size;
        this.d = d;
        this.rowDenominators = rowDenominators;
        this.a = a;
    }

    /**
     * The form of {@code p}.
     *
     * @throws IllegalArgumentException if {@code p} is not square
     */
    static CommonDenominatorForm of(RationalMatrix p) {
        requireSquare(p);
        int n = p.rows();
        BigInteger[] rowDen = new BigInteger[n];
        BigInteger d = BigInteger.ONE;
        for (int i = 0; i < n; i++) {
            BigInteger r = BigInteger.ONE;
            for (int j = 0; j < n; j++) {
                r = lcm(r, p.get(i, j).denominator());
            }
            rowDen[i] = r;
            d = lcm(d, r);
        }
        BigInteger[][] a = new BigInteger[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                Rational x = p.get(i, j);
                a[i][j] = x.isZero() ? BigInteger.ZERO : x.numerator().multiply(d.divide(x.denominator()));
            }
        }
        return new CommonDenominatorForm(n, d, rowDen, IntMatrix.of(a));
    }

    static void requireSquare(RationalMatrix p) {
        if (!p.isSquare()) {
            throw new IllegalArgumentException("matrix is not square: " + p.rows() + "x" + p.cols());
        }
    }

    static BigInteger lcm(BigInteger x, BigInteger y) {
        if (x.equals(BigInteger.ONE)) {
            return y;
        }
        if (y.equals(BigInteger.ONE) || x.equals(y)) {
            return x;
        }
        return x.divide(x.gcd(y)).multiply(y);
    }
}
