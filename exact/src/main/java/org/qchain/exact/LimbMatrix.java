package org.qchain.exact;

import java.util.Arrays;
import java.util.stream.IntStream;

/**
 * A square matrix of non-negative integers as 32-bit limb arrays ({@link Limbs}), for the early squarings of a
 * matrix power while the entries are short: a fused schoolbook multiply-accumulate {@code acc += x * y} with no
 * allocation per term, where {@link java.math.BigInteger} pays a multiply, an add and two allocations. Beyond
 * {@link #MAX_LIMBS} limbs {@code BigInteger}'s Karatsuba multiplication wins and the power moves on to
 * {@link IntMatrix}. Zero entries are {@code null} and skipped.
 */
final class LimbMatrix {
    /** Entries of at most this many limbs (1536 bits) are multiplied here. */
    static final int MAX_LIMBS = 48;

    private static final long MASK = 0xFFFF_FFFFL;

    private final int n;
    private final int[][][] e;
    private final int[][] nz;
    private final int maxLimbs;

    private LimbMatrix(int[][][] e) {
        this.n = e.length;
        this.e = e;
        this.nz = new int[n][];
        int max = 0;
        for (int i = 0; i < n; i++) {
            int c = 0;
            for (int[] x : e[i]) {
                if (x != null) {
                    c++;
                    max = Math.max(max, x.length);
                }
            }
            nz[i] = new int[c];
            c = 0;
            for (int j = 0; j < n; j++) {
                if (e[i][j] != null) {
                    nz[i][c++] = j;
                }
            }
        }
        this.maxLimbs = max;
    }

    /** Converts a matrix with non-negative entries. */
    static LimbMatrix of(IntMatrix m) {
        int[][][] e = new int[m.n][m.n][];
        for (int i = 0; i < m.n; i++) {
            for (int j : m.nz[i]) {
                e[i][j] = trim(Limbs.of(m.e[i][j]));
            }
        }
        return new LimbMatrix(e);
    }

    /** Converts back. */
    IntMatrix toIntMatrix() {
        java.math.BigInteger[][] out = new java.math.BigInteger[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                out[i][j] = e[i][j] == null ? java.math.BigInteger.ZERO : Limbs.toBigInteger(e[i][j]);
            }
        }
        return IntMatrix.of(out);
    }

    /** The longest entry, in limbs. */
    int maxLimbs() {
        return maxLimbs;
    }

    /** {@code this * o}; rows split over the pool when the product is large. */
    LimbMatrix multiply(LimbMatrix o, Thread caller) {
        int[][][] out = new int[n][][];
        int accLen = maxLimbs + o.maxLimbs + 1;
        long work = 0;
        for (int i = 0; i < n; i++) {
            for (int k : nz[i]) {
                work += o.nz[k].length;
            }
        }
        work *= (long) maxLimbs * o.maxLimbs;
        IntStream rows = IntStream.range(0, n);
        if (work >= IntMatrix.PARALLEL_WORK && n > 1 && Runtime.getRuntime().availableProcessors() > 1) {
            rows = rows.parallel();
        }
        rows.forEach(i -> {
            MatrixPowers.checkInterrupt(caller);
            int[][] acc = new int[n][];
            for (int k : nz[i]) {
                int[] x = e[i][k];
                int[][] ok = o.e[k];
                for (int j : o.nz[k]) {
                    if (acc[j] == null) {
                        acc[j] = new int[accLen];
                    }
                    mulAdd(acc[j], x, ok[j]);
                }
            }
            for (int j = 0; j < n; j++) {
                if (acc[j] != null) {
                    acc[j] = trim(acc[j]);
                }
            }
            out[i] = acc;
        });
        return new LimbMatrix(out);
    }

    /**
     * {@code acc += x * y}, schoolbook. Each inner step is at most {@code (2^32-1)^2 + 2 (2^32-1) = 2^64 - 1}, so
     * the unsigned 64-bit arithmetic is exact; {@code acc} has one limb more than any product, room for the carries
     * of fewer than 2^32 terms.
     */
    static void mulAdd(int[] acc, int[] x, int[] y) {
        int ly = y.length;
        for (int i = 0; i < x.length; i++) {
            long xi = x[i] & MASK;
            if (xi == 0) {
                continue;
            }
            long carry = 0;
            int k = i;
            for (int j = 0; j < ly; j++, k++) {
                long t = xi * (y[j] & MASK) + (acc[k] & MASK) + carry;
                acc[k] = (int) t;
                carry = t >>> 32;
            }
            while (carry != 0) {
                long t = (acc[k] & MASK) + carry;
                acc[k++] = (int) t;
                carry = t >>> 32;
            }
        }
    }

    /** The limbs without zero limbs at the top; {@code null} for zero. */
    private static int[] trim(int[] m) {
        int len = Limbs.length(m);
        return len == 0 ? null : len == m.length ? m : Arrays.copyOf(m, len);
    }
}
