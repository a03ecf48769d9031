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
        double words = Math.max(1, maxBits() / 64.0) * Math.max(1, o.maxBits() / 64.0);
        double work = (double) nonZeroCount() * o.nonZeroCount() / n * words;
        if (work >= PARALLEL_WORK && n > 1 && Runtime.getRuntime().availableProcessors() > 1) {
            IntStream.range(0, n).parallel().forEach(i -> out[i] = rowTimes(e[i], nz[i], o, caller));
        } else {
            for (int i = 0; i < n; i++) {
                out[i] = rowTimes(e[i], nz[i], o, caller);
            }
        }
        return new IntMatrix(out);
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
