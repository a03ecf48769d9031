package org.qchain.symbolic.linear;

import java.util.Arrays;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.linear.SingularSystemException;
import org.qchain.symbolic.ParamRing;
import org.qchain.symbolic.Poly;
import org.qchain.symbolic.RatFun;

/**
 * Exact linear systems whose coefficients are rational functions of the model's parameters.
 *
 * <p>Each equation is multiplied by the least common multiple of its denominators, which gives a system over the
 * polynomial ring Q[parameters]. Fraction-free Gauss-Jordan elimination (Bareiss 1968: every working entry is a minor
 * of the input, so the division by the previous pivot is exact polynomial division) leaves {@code det · X} over the
 * single common denominator {@code det}; common factors are cancelled once per entry at the end
 * ({@link RatFun#of(Poly, Poly)}), never inside the elimination. The answer is the generic one: valid wherever the
 * returned denominators do not vanish.
 */
public final class SymbolicSolver {
    private SymbolicSolver() {
    }

    /**
     * The solution X of {@code A X = B}.
     *
     * @param a n x n coefficients
     * @param b n x m right-hand sides
     * @return n x m solution, each entry reduced
     * @throws SingularSystemException if {@code A} is singular for all parameter values
     * @throws IllegalArgumentException if the shapes do not fit
     */
    public static RatFun[][] solve(RatFun[][] a, RatFun[][] b) {
        int n = a.length;
        requireSquare(a);
        if (b.length != n) {
            throw new IllegalArgumentException("right-hand side has " + b.length + " rows, the matrix " + n);
        }
        int m = b[0].length;
        ParamRing ring = a[0][0].ring();
        Poly[][] w = new Poly[n][n + m];
        for (int i = 0; i < n; i++) {
            Poly l = ring.one();
            for (RatFun x : a[i]) {
                l = lcm(l, x.denominator());
            }
            for (RatFun x : b[i]) {
                l = lcm(l, x.denominator());
            }
            for (int j = 0; j < n; j++) {
                w[i][j] = scaled(a[i][j], l);
            }
            for (int j = 0; j < m; j++) {
                w[i][n + j] = scaled(b[i][j], l);
            }
        }
        Poly prev = ring.one();
        Thread caller = Thread.currentThread();
        for (int k = 0; k < n; k++) {
            if (caller.isInterrupted()) {
                throw new QchainException(ErrorKey.INTERRUPTED);
            }
            int best = -1;
            for (int i = k; i < n; i++) {
                if (!w[i][k].isZero() && (best < 0 || w[i][k].termCount() < w[best][k].termCount())) {
                    best = i;
                }
            }
            if (best < 0) {
                throw new SingularSystemException(k, "unknown " + (k + 1) + " of " + n
                    + " is not determined for any parameter values");
            }
            Poly[] t = w[best];
            w[best] = w[k];
            w[k] = t;
            Poly pk = w[k][k];
            Poly[] rk = w[k];
            for (int i = 0; i < n; i++) {
                if (i == k) {
                    continue;
                }
                Poly[] ri = w[i];
                Poly f = ri[k];
                for (int j = k + 1; j < n + m; j++) {
                    Poly v = pk.multiply(ri[j]);
                    if (!f.isZero() && !rk[j].isZero()) {
                        v = v.subtract(f.multiply(rk[j]));
                    }
                    ri[j] = prev.isOne() || v.isZero() ? v : exact(v, prev);
                }
                ri[k] = ring.zero();
            }
            prev = pk;
        }
        RatFun[][] x = new RatFun[n][m];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < m; j++) {
                x[i][j] = RatFun.of(w[i][n + j], prev);
            }
        }
        return x;
    }

    /**
     * The solution X of {@code X A = B}.
     *
     * @param a n x n coefficients
     * @param b k x n right-hand sides
     * @return k x n solution
     * @throws SingularSystemException if {@code A} is singular for all parameter values
     */
    public static RatFun[][] solveLeft(RatFun[][] a, RatFun[][] b) {
        int n = a.length;
        requireSquare(a);
        int k = b.length;
        RatFun[][] at = new RatFun[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                at[j][i] = a[i][j];
            }
        }
        RatFun[][] bt = new RatFun[n][k];
        for (int r = 0; r < k; r++) {
            if (b[r].length != n) {
                throw new IllegalArgumentException("right-hand side row has " + b[r].length + " entries, need " + n);
            }
            for (int i = 0; i < n; i++) {
                bt[i][r] = b[r][i];
            }
        }
        RatFun[][] yt = solve(at, bt);
        RatFun[][] x = new RatFun[k][n];
        for (int r = 0; r < k; r++) {
            for (int i = 0; i < n; i++) {
                x[r][i] = yt[i][r];
            }
        }
        return x;
    }

    /**
     * The row vector x with {@code x A = 0} and {@code x·1 = 1} for a matrix whose rows sum to zero identically
     * ({@code P − I}, a generator): the last column is replaced by ones, as in the exact solver.
     *
     * @throws IllegalArgumentException if a row does not sum to zero identically
     * @throws SingularSystemException  if the solution is not unique for generic parameter values
     */
    public static RatFun[] leftNullVector(RatFun[][] a) {
        int n = a.length;
        requireSquare(a);
        ParamRing ring = a[0][0].ring();
        RatFun zero = RatFun.of(ring.zero());
        RatFun one = RatFun.of(ring.one());
        RatFun[][] e = new RatFun[n][];
        for (int i = 0; i < n; i++) {
            RatFun s = zero;
            for (RatFun x : a[i]) {
                s = s.add(x);
            }
            if (!s.isZero()) {
                throw new IllegalArgumentException("row " + i + " sums to " + s + ", not 0");
            }
            e[i] = a[i].clone();
            e[i][n - 1] = one;
        }
        RatFun[][] rhs = new RatFun[1][n];
        Arrays.fill(rhs[0], zero);
        rhs[0][n - 1] = one;
        try {
            return solveLeft(e, rhs)[0];
        } catch (SingularSystemException ex) {
            throw new SingularSystemException(ex.index(),
                "the null space has dimension above 1 (more than one closed class)");
        }
    }

    /** The determinant (fraction-free forward elimination over the polynomial ring, rows scaled to polynomials). */
    public static RatFun determinant(RatFun[][] a) {
        int n = a.length;
        requireSquare(a);
        ParamRing ring = a[0][0].ring();
        Poly[][] w = new Poly[n][n];
        Poly scale = ring.one();
        for (int i = 0; i < n; i++) {
            Poly l = ring.one();
            for (RatFun x : a[i]) {
                l = lcm(l, x.denominator());
            }
            scale = scale.multiply(l);
            for (int j = 0; j < n; j++) {
                w[i][j] = scaled(a[i][j], l);
            }
        }
        Poly prev = ring.one();
        boolean negate = false;
        for (int k = 0; k < n; k++) {
            int p = k;
            while (p < n && w[p][k].isZero()) {
                p++;
            }
            if (p == n) {
                return RatFun.of(ring.zero());
            }
            if (p != k) {
                Poly[] t = w[p];
                w[p] = w[k];
                w[k] = t;
                negate = !negate;
            }
            for (int i = k + 1; i < n; i++) {
                for (int j = k + 1; j < n; j++) {
                    Poly v = w[k][k].multiply(w[i][j]).subtract(w[i][k].multiply(w[k][j]));
                    w[i][j] = prev.isOne() || v.isZero() ? v : exact(v, prev);
                }
                w[i][k] = ring.zero();
            }
            prev = w[k][k];
        }
        return RatFun.of(negate ? prev.negate() : prev, scale);
    }

    private static Poly exact(Poly v, Poly d) {
        return v.divideExact(d).orElseThrow(() -> new QchainException(ErrorKey.INTERNAL,
            "fraction-free elimination: a minor is not divisible by the previous pivot"));
    }

    private static Poly scaled(RatFun x, Poly l) {
        if (x.isZero()) {
            return l.ring().zero();
        }
        return x.numerator().multiply(exact(l, x.denominator()));
    }

    private static Poly lcm(Poly l, Poly d) {
        if (d.isOne() || d.equals(l)) {
            return l;
        }
        if (l.isOne()) {
            return d;
        }
        Poly g = l.gcd(d);
        return g.isOne() ? l.multiply(d) : l.multiply(exact(d, g));
    }

    private static void requireSquare(RatFun[][] a) {
        if (a.length == 0) {
            throw new IllegalArgumentException("empty matrix");
        }
        for (RatFun[] r : a) {
            if (r.length != a.length) {
                throw new IllegalArgumentException("matrix is not square");
            }
        }
    }
}
