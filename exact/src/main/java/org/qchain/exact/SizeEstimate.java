package org.qchain.exact;

import java.math.BigInteger;

/**
 * Estimates, before computing, how many decimal digits a matrix power will have, so front ends can refuse results
 * that would not fit in memory or time.
 *
 * <p>A result's size is the sum over its entries of the decimal digits of the numerator's absolute value and of
 * the denominator (an integer entry counts its denominator 1 as one digit). The estimates are upper bounds: with
 * {@code d} the least common denominator of {@code P} and {@code d_i} that of row {@code i}, every entry of row
 * {@code i} of {@code P^n} has a denominator dividing {@code d_i d^(n-1)}; its numerator is at most the denominator
 * when {@code P} is non-negative with row sums at most 1, and otherwise at most the denominator times
 * {@code r^n}, {@code r} the largest absolute row sum. They are close for chains whose rows have different
 * denominators, and the common case ({@code P^n} has few zeros and few common factors) reaches them within a few
 * percent. They cost one pass over the entries of {@code P}, whatever {@code n} is.
 */
public final class SizeEstimate {
    /** The default limit on the estimated digits of a result: 50 million, a few hundred megabytes in memory. */
    public static final long DEFAULT_MAX_DIGITS = 50_000_000L;

    private static final double LOG10_2 = Math.log10(2);

    private SizeEstimate() {
    }

    /**
     * Estimated total decimal digits of all entries (numerators and denominators) of {@code P^n}.
     *
     * @param p a square matrix
     * @param n the exponent, {@code >= 0}
     * @return the estimate, at least the true size; {@link Long#MAX_VALUE} if it does not fit in a {@code long}
     * @throws IllegalArgumentException if {@code p} is not square or {@code n < 0}
     */
    public static long digitsOfPower(RationalMatrix p, long n) {
        Shape sh = Shape.of(p, n);
        double total = 0;
        for (int i = 0; i < sh.size; i++) {
            total += sh.rowDigits(i);
        }
        return saturate(total);
    }

    /**
     * Estimated total decimal digits of the largest row of {@code P^n}; also the working size of one entry, which is
     * computed through its whole row.
     *
     * @param p a square matrix
     * @param n the exponent, {@code >= 0}
     * @return the estimate, at least the true size of every row; {@link Long#MAX_VALUE} if it does not fit
     * @throws IllegalArgumentException if {@code p} is not square or {@code n < 0}
     */
    public static long digitsOfRow(RationalMatrix p, long n) {
        Shape sh = Shape.of(p, n);
        double max = 0;
        for (int i = 0; i < sh.size; i++) {
            max = Math.max(max, sh.rowDigits(i));
        }
        return saturate(max);
    }

    /**
     * Estimated total decimal digits of row {@code from} of {@code P^n}.
     *
     * @param p    a square matrix
     * @param from the row, 0-based
     * @param n    the exponent, {@code >= 0}
     * @return the estimate, at least the true size; {@link Long#MAX_VALUE} if it does not fit
     * @throws IllegalArgumentException  if {@code p} is not square or {@code n < 0}
     * @throws IndexOutOfBoundsException if {@code from} is not a row
     */
    public static long digitsOfRow(RationalMatrix p, int from, long n) {
        Shape sh = Shape.of(p, n);
        java.util.Objects.checkIndex(from, sh.size);
        return saturate(sh.rowDigits(from));
    }

    /** The default limit on {@link #digitsOfPathSearch}: about 15 s of work on one core of a 2026 server. */
    public static final long DEFAULT_MAX_PATH_DIGITS = 50_000_000_000L;

    /**
     * Estimated work of {@link TopPaths#mostProbable}: the decimal digits of all the prefix weights it forms. Layer
     * {@code t} extends at most {@code k} prefixes along each of the {@code z} non-zero entries of {@code P}, and
     * each weight is an integer over {@code d^t} of at most {@code t log10 d + 1} digits, so the work is at most
     * {@code k z sum_t (t log10 d + 1) = k z (n (n + 1) / 2 log10 d + n)}, with {@code log10 d} bounded from above by
     * {@code bitLength(d) log10 2}. Quadratic in {@code n}: the reason a
     * path search is refused long before its result (k paths) is large.
     *
     * @param p a square matrix
     * @param n the path length, {@code >= 0}
     * @param k the number of paths asked for, {@code >= 1}
     * @return the estimate; {@link Long#MAX_VALUE} if it does not fit in a {@code long}
     * @throws IllegalArgumentException if {@code p} is not square, {@code n < 0} or {@code k < 1}
     */
    public static long digitsOfPathSearch(RationalMatrix p, long n, int k) {
        if (k < 1) {
            throw new IllegalArgumentException("k must be at least 1: " + k);
        }
        Shape sh = Shape.of(p, n);
        long nonZero = 0;
        for (int i = 0; i < sh.size; i++) {
            for (int j = 0; j < sh.size; j++) {
                if (!p.get(i, j).isZero()) {
                    nonZero++;
                }
            }
        }
        double nn = n;
        return saturate((double) k * nonZero * (nn * (nn + 1) / 2 * Math.max(sh.log10D, 1e-9) + nn));
    }

    /**
     * Refuses a computation whose estimated size is over the limit.
     *
     * @param estimatedDigits the estimate, for example from {@link #digitsOfPower}
     * @param limit           the largest allowed size in digits
     * @param option          how the user raises the limit, for example {@code --max-digits}; it goes into the message
     * @throws QchainException with {@link ErrorKey#RESULT_TOO_LARGE} and arguments (estimate, limit, option) if
     *                         {@code estimatedDigits > limit}
     */
    public static void requireWithin(long estimatedDigits, long limit, String option) {
        if (estimatedDigits > limit) {
            throw new QchainException(ErrorKey.RESULT_TOO_LARGE, estimatedDigits, limit, option);
        }
    }

    private static long saturate(double x) {
        return x >= 9.2e18 ? Long.MAX_VALUE : (long) Math.ceil(x);
    }

    /** Upper bound on the decimal digits of a positive integer of the given bit length. */
    static double digitsOfBits(double bits) {
        return Math.floor(bits * LOG10_2) + 1;
    }

    /** What the estimates need from {@code P}: denominators and whether entries stay at most 1. */
    private static final class Shape {
        final int size;
        final long n;
        final double log10D;
        final double[] log10RowD;
        /** log10 of the largest absolute row sum when it exceeds 1 (numerators can outgrow denominators), else 0. */
        final double log10Growth;

        private Shape(int size, long n, double log10D, double[] log10RowD, double log10Growth) {
            this.size = size;
            this.n = n;
            this.log10D = log10D;
            this.log10RowD = log10RowD;
            this.log10Growth = log10Growth;
        }

        static Shape of(RationalMatrix p, long n) {
            CommonDenominatorForm.requireSquare(p);
            if (n < 0) {
                throw new IllegalArgumentException("exponent must not be negative: " + n);
            }
            int s = p.rows();
            BigInteger d = BigInteger.ONE;
            double[] rowD = new double[s];
            double maxRowSum = 0;
            for (int i = 0; i < s; i++) {
                BigInteger r = BigInteger.ONE;
                Rational sum = Rational.ZERO;
                for (int j = 0; j < s; j++) {
                    Rational x = p.get(i, j);
                    r = CommonDenominatorForm.lcm(r, x.denominator());
                    sum = sum.add(x.abs());
                }
                d = CommonDenominatorForm.lcm(d, r);
                rowD[i] = r.bitLength() * LOG10_2;
                maxRowSum = Math.max(maxRowSum, sum.doubleValue());
            }
            double growth = maxRowSum > 1 ? Math.log10(maxRowSum) : 0;
            return new Shape(s, n, d.bitLength() * LOG10_2, rowD, growth);
        }

        /** Upper bound on the digits of row {@code i} of {@code P^n}. */
        double rowDigits(int i) {
            if (n == 0) {
                return 2.0 * size;
            }
            double den = Math.floor(log10RowD[i] + (n - 1) * log10D) + 1;
            double num = Math.floor(log10RowD[i] + (n - 1) * log10D + n * log10Growth) + 1;
            return size * (den + num);
        }
    }
}
