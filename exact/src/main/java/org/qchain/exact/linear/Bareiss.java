package org.qchain.exact.linear;

import java.math.BigInteger;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;

/**
 * Fraction-free Gauss-Jordan elimination over the integers (E. H. Bareiss, "Sylvester's identity and multistep
 * integer-preserving Gaussian elimination", Math. Comp. 22, 1968). After step k every entry of the working matrix is
 * a (k+1)-rowed minor of the input, so the division by the previous pivot is exact and entries never grow past
 * Hadamard's bound. At the end every diagonal entry equals {@code ±det A} and the right-hand side columns hold
 * {@code det A · X}: one common denominator for the whole solution.
 */
final class Bareiss {
    private Bareiss() {
    }

    /** The result of a solve: {@code X = numerators / denominator} (denominator positive). */
    record Solution(BigInteger[][] numerators, BigInteger denominator) {
    }

    /**
     * Solves {@code A X = B} with integer {@code A} (n x n) and {@code B} (n x m); neither array is changed.
     *
     * @throws SingularSystemException if {@code A} is singular
     */
    static Solution solve(BigInteger[][] a, BigInteger[][] b, Thread caller) {
        return solve(a, b, caller, org.qchain.exact.Progress.NONE);
    }

    static Solution solve(BigInteger[][] a, BigInteger[][] b, Thread caller, org.qchain.exact.Progress progress) {
        int n = a.length;
        int m = b.length == 0 ? 0 : b[0].length;
        BigInteger[][] w = new BigInteger[n][n + m];
        for (int i = 0; i < n; i++) {
            System.arraycopy(a[i], 0, w[i], 0, n);
            System.arraycopy(b[i], 0, w[i], n, m);
        }
        BigInteger prev = BigInteger.ONE;
        for (int k = 0; k < n; k++) {
            checkInterrupt(caller);
            progress.update("eliminating", k, n);
            pivot(w, k, n);
            BigInteger pk = w[k][k];
            BigInteger[] rk = w[k];
            for (int i = 0; i < n; i++) {
                if (i == k) {
                    continue;
                }
                BigInteger[] ri = w[i];
                BigInteger f = ri[k];
                // columns before k hold only the (implicit) diagonal, which equals the current pivot; skip them
                for (int j = k + 1; j < n + m; j++) {
                    BigInteger t = pk.multiply(ri[j]);
                    if (f.signum() != 0 && rk[j].signum() != 0) {
                        t = t.subtract(f.multiply(rk[j]));
                    }
                    ri[j] = prev.equals(BigInteger.ONE) ? t : t.divide(prev);
                }
                ri[k] = BigInteger.ZERO;
            }
            prev = pk;
        }
        BigInteger d = n == 0 ? BigInteger.ONE : w[n - 1][n - 1];
        BigInteger[][] x = new BigInteger[n][m];
        boolean neg = d.signum() < 0;
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < m; j++) {
                x[i][j] = neg ? w[i][n + j].negate() : w[i][n + j];
            }
        }
        return new Solution(x, d.abs());
    }

    /** The determinant of an integer matrix by fraction-free forward elimination. */
    static BigInteger determinant(BigInteger[][] a, Thread caller) {
        int n = a.length;
        BigInteger[][] w = new BigInteger[n][];
        for (int i = 0; i < n; i++) {
            w[i] = a[i].clone();
        }
        BigInteger prev = BigInteger.ONE;
        int sign = 1;
        for (int k = 0; k < n; k++) {
            checkInterrupt(caller);
            int p = k;
            while (p < n && w[p][k].signum() == 0) {
                p++;
            }
            if (p == n) {
                return BigInteger.ZERO;
            }
            if (p != k) {
                BigInteger[] t = w[p];
                w[p] = w[k];
                w[k] = t;
                sign = -sign;
            }
            for (int i = k + 1; i < n; i++) {
                for (int j = k + 1; j < n; j++) {
                    w[i][j] = w[k][k].multiply(w[i][j]).subtract(w[i][k].multiply(w[k][j])).divide(prev);
                }
                w[i][k] = BigInteger.ZERO;
            }
            prev = w[k][k];
        }
        return sign < 0 ? prev.negate() : prev;
    }

    /** Brings a row with a non-zero entry in column k (the shortest such entry, to slow growth) to row k. */
    private static void pivot(BigInteger[][] w, int k, int n) {
        int best = -1;
        for (int i = k; i < n; i++) {
            if (w[i][k].signum() != 0 && (best < 0 || w[i][k].bitLength() < w[best][k].bitLength())) {
                best = i;
            }
        }
        if (best < 0) {
            throw new SingularSystemException(k, "unknown " + (k + 1) + " of " + n + " is not determined");
        }
        if (best != k) {
            BigInteger[] t = w[best];
            w[best] = w[k];
            w[k] = t;
        }
    }

    static void checkInterrupt(Thread caller) {
        if (caller.isInterrupted()) {
            throw new QchainException(ErrorKey.INTERRUPTED);
        }
    }
}
