package org.qchain.exact;

import java.math.BigInteger;
import java.util.stream.IntStream;

/**
 * Non-negative big integers as little-endian arrays of unsigned 32-bit limbs, with a fused multiply-add by a
 * one-limb factor: {@code acc += v * a}. This is the inner step of path sums (a vector of big numbers times a
 * matrix of small ones); done on {@link BigInteger} it costs a multiply and an add, two passes and two allocations
 * per transition, here one pass and none.
 *
 * <p>An array may carry zero limbs at the top; a value is zero when all its limbs are.
 */
final class Limbs {
    private static final long MASK = 0xFFFF_FFFFL;

    /** Vector steps whose estimated work (limb operations) is at least this split their columns over the pool. */
    static final long PARALLEL_LIMB_OPS = 200_000;

    private Limbs() {
    }

    /** The limbs of {@code x >= 0}. */
    static int[] of(BigInteger x) {
        byte[] be = x.toByteArray();
        int n = (be.length + 3) / 4;
        int[] m = new int[n];
        for (int i = 0; i < be.length; i++) {
            int fromLow = be.length - 1 - i;
            m[fromLow >>> 2] |= (be[i] & 0xFF) << ((fromLow & 3) << 3);
        }
        return m;
    }

    /** The value of the limbs. */
    static BigInteger toBigInteger(int[] m) {
        int top = length(m);
        if (top == 0) {
            return BigInteger.ZERO;
        }
        byte[] be = new byte[top * 4];
        for (int i = 0; i < top; i++) {
            int limb = m[i];
            int at = be.length - 1 - 4 * i;
            be[at] = (byte) limb;
            be[at - 1] = (byte) (limb >>> 8);
            be[at - 2] = (byte) (limb >>> 16);
            be[at - 3] = (byte) (limb >>> 24);
        }
        return new BigInteger(1, be);
    }

    /** Number of limbs up to the highest non-zero one (0 for zero). */
    static int length(int[] m) {
        int n = m.length;
        while (n > 0 && m[n - 1] == 0) {
            n--;
        }
        return n;
    }

    /**
     * {@code acc += v * a} for {@code 0 <= a < 2^32}; {@code acc} must be long enough for the result (one limb more
     * than {@code v} per factor, plus room for carries of the sum).
     */
    static void mulAdd(int[] acc, int[] v, int vLen, long a) {
        long carry = 0;
        int i = 0;
        for (; i < vLen; i++) {
            // (2^32-1)^2 + 2 (2^32-1) = 2^64 - 1: the sum fits in 64 unsigned bits, so the wrap-around is exact
            long t = (v[i] & MASK) * a + (acc[i] & MASK) + carry;
            acc[i] = (int) t;
            carry = t >>> 32;
        }
        while (carry != 0) {
            long t = (acc[i] & MASK) + carry;
            acc[i] = (int) t;
            carry = t >>> 32;
            i++;
        }
    }

    /** Whether every entry of {@code m} lies in {@code [0, 2^32)}, so the limb kernels apply. */
    static boolean smallNonNegative(IntMatrix m) {
        for (int i = 0; i < m.n; i++) {
            for (int j : m.nz[i]) {
                BigInteger x = m.e[i][j];
                if (x.signum() < 0 || x.bitLength() > 32) {
                    return false;
                }
            }
        }
        return true;
    }

    /**
     * {@code e_from A^n} by {@code n - 1} vector–matrix steps on limbs, {@code A} with entries in {@code [0, 2^32)}.
     * Pull form (each new entry sums over its column's transitions), so columns split over threads without locks.
     */
    static BigInteger[] vectorSteps(IntMatrix a, int from, long n, Progress progress, Thread caller) {
        int s = a.n;
        int[][] colK = new int[s][];
        long[][] colA = new long[s][];
        int[] count = new int[s];
        for (int i = 0; i < s; i++) {
            for (int j : a.nz[i]) {
                count[j]++;
            }
        }
        for (int j = 0; j < s; j++) {
            colK[j] = new int[count[j]];
            colA[j] = new long[count[j]];
            count[j] = 0;
        }
        for (int i = 0; i < s; i++) {
            for (int j : a.nz[i]) {
                colK[j][count[j]] = i;
                colA[j][count[j]++] = a.e[i][j].longValue();
            }
        }
        long nnz = a.nonZeroCount();
        int[][] v = new int[s][];
        for (int j = 0; j < s; j++) {
            v[j] = of(a.e[from][j]);
        }
        int[] vLen = new int[s];
        boolean parallel = Runtime.getRuntime().availableProcessors() > 1 && s > 1;
        long stride = Math.max(1, n / 1000);
        for (long t = 1; t < n; t++) {
            MatrixPowers.checkInterrupt(caller);
            int maxLen = 0;
            for (int j = 0; j < s; j++) {
                vLen[j] = length(v[j]);
                maxLen = Math.max(maxLen, vLen[j]);
            }
            int accLen = maxLen + 2;
            int[][] cur = v;
            int[][] next = new int[s][];
            IntStream cols = IntStream.range(0, s);
            if (parallel && nnz * (long) maxLen >= PARALLEL_LIMB_OPS) {
                cols = cols.parallel();
            }
            cols.forEach(j -> {
                int[] acc = new int[accLen];
                int[] ks = colK[j];
                long[] as = colA[j];
                for (int q = 0; q < ks.length; q++) {
                    int k = ks[q];
                    if (vLen[k] != 0) {
                        mulAdd(acc, cur[k], vLen[k], as[q]);
                    }
                }
                next[j] = acc;
            });
            v = next;
            if ((t + 1) % stride == 0) {
                progress.update("path sums", t + 1, n);
            }
        }
        progress.update("path sums", n, n);
        BigInteger[] out = new BigInteger[s];
        for (int j = 0; j < s; j++) {
            out[j] = toBigInteger(v[j]);
        }
        return out;
    }
}
