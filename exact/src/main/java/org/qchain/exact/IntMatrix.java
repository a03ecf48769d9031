package org.qchain.exact;

import java.math.BigInteger;
import java.util.Arrays;
import java.util.stream.IntStream;

/**
 * A square integer matrix that knows where its non-zero entries are, so products skip zeros (sparse chains stay
 * cheap while their powers fill in). Entries are never {@code null}; the arrays are never changed after
 * construction.
 */
final class IntMatrix {
    /**
     * Products whose estimated work (word multiplications) is below this run on the calling thread; above it rows are
     * split over the common fork-join pool.
     */
    static final double PARALLEL_WORK = 2e6;

    final int n;
    final BigInteger[][] e;
    /** For each row, the columns of its non-zero entries, ascending. */
    final int[][] nz;

    private IntMatrix(BigInteger[][] e) {
        this.n = e.length;
        this.e = e;
        this.nz = new int[n][];
        for (int i = 0; i < n; i++) {
            nz[i] = nonZeros(e[i]);
        }
    }

    static IntMatrix of(BigInteger[][] e) {
        return new IntMatrix(e);
    }

    static IntMatrix identity(int n) {
        BigInteger[][] e = new BigInteger[n][n];
        for (int i = 0; i < n; i++) {
            Arrays.fill(e[i], BigInteger.ZERO);
            e[i][i] = BigInteger.ONE;
        }
        return new IntMatrix(e);
    }

    static int[] nonZeros(BigInteger[] row) {
        int c = 0;
        for (BigInteger x : row) {
            if (x.signum() != 0) {
                c++;
            }
        }
        int[] idx = new int[c];
        c = 0;
        for (int j = 0; j < row.length; j++) {
            if (row[j].signum() != 0) {
                idx[c++] = j;
            }
        }
        return idx;
    }

    /** Largest bit length of any entry. */
    int maxBits() {
        int b = 0;
        for (BigInteger[] row : e) {
            for (BigInteger x : row) {
                b = Math.max(b, x.bitLength());
            }
        }
        return b;
    }

    /** Number of non-zero entries. */
    long nonZeroCount() {
        long c = 0;
        for (int[] r : nz) {
            c += r.length;
        }
        return c;
    }

    /**
     * {@code this * o}. Checks the interrupt flag of {@code caller} once per row (also from pool threads).
     *
     * @throws QchainException with {@link ErrorKey#INTERRUPTED} if {@code caller} is interrupted
     */
    IntMatrix multiply(IntMatrix o, Thread caller) {
        BigInteger[][] out = new BigInteger[n][];
        int bits = maxBits();
        int oBits = o.maxBits();
        double words = Math.max(1, bits / 64.0) * Math.max(1, oBits / 64.0);
        long nnz = nonZeroCount();
        long oNnz = o.nonZeroCount();
        double work = (double) nnz * oNnz / n * words;
        IntStream rows = IntStream.range(0, n);
        if (work >= PARALLEL_WORK && n > 1 && Runtime.getRuntime().availableProcessors() > 1) {
            rows = rows.parallel();
        }
        if (winograd && n >= 4 && Math.min(bits, oBits) >= WINOGRAD_MIN_BITS
                && 2 * nnz >= (long) n * n && 2 * oNnz >= (long) n * n) {
            BigInteger[] xi = new BigInteger[n];
            BigInteger[] eta = new BigInteger[n];
            for (int i = 0; i < n; i++) {
                BigInteger x = BigInteger.ZERO;
                BigInteger y = BigInteger.ZERO;
                for (int k = 0; k + 1 < n; k += 2) {
                    x = x.add(e[i][k].multiply(e[i][k + 1]));
                    y = y.add(o.e[k][i].multiply(o.e[k + 1][i]));
                }
                xi[i] = x;
                eta[i] = y;
            }
            rows.forEach(i -> out[i] = winogradRow(i, o, xi, eta, caller));
        } else {
            rows.forEach(i -> out[i] = rowTimes(e[i], nz[i], o, caller));
        }
        return new IntMatrix(out);
    }

    /**
     * Dense products of big entries use Winograd's inner-product identity (S. Winograd, "A new algorithm for inner
     * product", IEEE Trans. Computers C-17, 1968):
     * {@code sum_k a_ik b_kj = sum_m (a_i,2m + b_2m+1,j)(a_i,2m+1 + b_2m,j) - xi_i - eta_j} with
     * {@code xi_i = sum_m a_i,2m a_i,2m+1}, {@code eta_j = sum_m b_2m,j b_2m+1,j}: half the multiplications for a
     * few more additions, which pays when multiplications of big numbers dominate. Operands below this size use the
     * plain sum.
     */
    static final int WINOGRAD_MIN_BITS = 1024;
    /** Tests switch the identity off to compare both products. */
    static volatile boolean winograd = true;

    private BigInteger[] winogradRow(int i, IntMatrix o, BigInteger[] xi, BigInteger[] eta, Thread caller) {
        if (caller.isInterrupted()) {
            throw new QchainException(ErrorKey.INTERRUPTED);
        }
        BigInteger[] a = e[i];
        BigInteger[] out = new BigInteger[n];
        for (int j = 0; j < n; j++) {
            BigInteger s = xi[i].add(eta[j]).negate();
            for (int k = 0; k + 1 < n; k += 2) {
                s = s.add(a[k].add(o.e[k + 1][j]).multiply(a[k + 1].add(o.e[k][j])));
            }
            if ((n & 1) != 0) {
                s = s.add(a[n - 1].multiply(o.e[n - 1][j]));
            }
            out[j] = s;
        }
        return out;
    }

    /** The row vector {@code v * m}, where {@code idx} lists the non-zero positions of {@code v}. */
    static BigInteger[] rowTimes(BigInteger[] v, int[] idx, IntMatrix m, Thread caller) {
        if (caller.isInterrupted()) {
            throw new QchainException(ErrorKey.INTERRUPTED);
        }
        BigInteger[] acc = new BigInteger[m.n];
        for (int k : idx) {
            BigInteger x = v[k];
            BigInteger[] mk = m.e[k];
            for (int j : m.nz[k]) {
                BigInteger t = x.multiply(mk[j]);
                acc[j] = acc[j] == null ? t : acc[j].add(t);
            }
        }
        for (int j = 0; j < acc.length; j++) {
            if (acc[j] == null) {
                acc[j] = BigInteger.ZERO;
            }
        }
        return acc;
    }
}
