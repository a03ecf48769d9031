package org.qchain.exact.linear;

import java.math.BigInteger;
import java.util.Optional;

/**
 * p-adic lifting (J. D. Dixon, "Exact solution of linear equations using p-adic expansions", Numer. Math. 40, 1982)
 * for {@code A X = B} with small integer entries in {@code A}: one LU decomposition of {@code A} modulo a word-size
 * prime p, then k cheap steps {@code x_i = A^-1 r_i mod p}, {@code r_(i+1) = (r_i - A x_i) / p} in machine words,
 * until p^k exceeds twice the product of Hadamard's bounds for the numerators and the denominator of Cramer's rule;
 * then rational reconstruction of each entry from {@code X mod p^k} (extended Euclid, stopped at the numerator bound;
 * P. S. Wang, "A p-adic algorithm for univariate partial fractions", SYMSAC 1981), sharing the denominator found so
 * far between entries.
 *
 * <p>The LU decomposition works on rows that remember the span of their non-zero entries, so a banded matrix keeps
 * its band (fill stays inside it without pivoting) and costs O(n w^2), a dense one O(n^3) word operations.
 */
final class Dixon {
    private Dixon() {
    }

    /** Primes just below 2^31: products of two residues fit a long. */
    private static final long[] PRIMES = {2147483647L, 2147483629L, 2147483587L};

    /**
     * Solves {@code A X = B}, or returns empty if {@code A} is singular modulo every prime tried (then it may be
     * singular over Q, and the caller falls back to {@link Bareiss}).
     *
     * @param a integer matrix with entries below 2^62 / (2^31 n) in absolute value; see {@link #fits}
     */
    static Optional<Bareiss.Solution> solve(long[][] a, BigInteger[][] b, Thread caller) {
        return solve(a, b, caller, org.qchain.exact.Progress.NONE);
    }

    static Optional<Bareiss.Solution> solve(long[][] a, BigInteger[][] b, Thread caller,
            org.qchain.exact.Progress progress) {
        return solve(a, b, caller, progress, BigInteger.ONE);
    }

    /**
     * As {@link #solve(long[][], BigInteger[][], Thread)}, with a likely multiple of the solution's denominator
     * ({@code 1} if none is known), tried first: the denominator of another solution with the same {@code A}.
     */
    static Optional<Bareiss.Solution> solve(long[][] a, BigInteger[][] b, Thread caller,
            org.qchain.exact.Progress progress, BigInteger hint) {
        for (long p : PRIMES) {
            Optional<ModLu> lu = ModLu.of(a, p, caller);
            if (lu.isPresent()) {
                return Optional.of(lift(a, b, lu.get(), caller, progress, hint));
            }
        }
        return Optional.empty();
    }

    /** Whether {@code A x} for residues x fits a long: max |a_ij| * p * (non-zeros per row) below 2^62. */
    static boolean fits(long maxAbs, int maxRowNonZeros) {
        double bound = (double) maxAbs * PRIMES[0] * Math.max(1, maxRowNonZeros);
        return bound < 0x1p62;
    }

    private static Bareiss.Solution lift(long[][] a, BigInteger[][] b, ModLu lu, Thread caller,
            org.qchain.exact.Progress progress, BigInteger hint) {
        int n = a.length;
        int m = b[0].length;
        long p = lu.p;
        // Hadamard bounds (log2): denominator det A, numerators det of A with one column replaced by b
        double logDet = 0;
        double[] logNum = new double[m];
        for (int i = 0; i < n; i++) {
            double s = 0;
            for (long x : a[i]) {
                s += (double) x * x;
            }
            double ls = Math.log(Math.max(s, 1)) / Math.log(2);
            logDet += 0.5 * ls;
            for (int c = 0; c < m; c++) {
                // log2(s + b^2) <= max(log2 s, 2 log2 |b|) + 1
                logNum[c] += 0.5 * (Math.max(ls, 2.0 * b[i][c].bitLength()) + 1);
            }
        }
        // Hadamard's bound by columns as well: |det| <= prod_k |col_k|, and with column j replaced by b,
        // |b| prod_{k != j} |col_k| <= |b| prod_k |col_k| (a non-zero integer column has norm >= 1). A right-hand
        // side of many digits then counts once, not once per row as in the bound by rows.
        double logCols = 0;
        for (int j = 0; j < n; j++) {
            double s = 0;
            for (int i = 0; i < n; i++) {
                s += (double) a[i][j] * a[i][j];
            }
            logCols += 0.5 * Math.log(Math.max(s, 1)) / Math.log(2);
        }
        logDet = Math.min(logDet, logCols);
        for (int c = 0; c < m; c++) {
            int maxBits = 0;
            for (int i = 0; i < n; i++) {
                maxBits = Math.max(maxBits, b[i][c].bitLength());
            }
            // log2 |b| <= maxBits + log2(n) / 2
            double byCols = logCols + maxBits + 0.5 * Math.log(Math.max(n, 1)) / Math.log(2) + 1;
            logNum[c] = Math.min(logNum[c], byCols);
        }
        double maxNum = 0;
        for (double v : logNum) {
            maxNum = Math.max(maxNum, v);
        }
        int numBits = (int) Math.ceil(maxNum) + 2;
        int denBits = (int) Math.ceil(logDet) + 2;
        int steps = (int) Math.ceil((numBits + denBits + 2) / (Math.log(p) / Math.log(2)));
        int[][] nzCols = new int[n][];
        for (int i = 0; i < n; i++) {
            int c = 0;
            for (long x : a[i]) {
                if (x != 0) {
                    c++;
                }
            }
            nzCols[i] = new int[c];
            c = 0;
            for (int j = 0; j < n; j++) {
                if (a[i][j] != 0) {
                    nzCols[i][c++] = j;
                }
            }
        }
        BigInteger bp = BigInteger.valueOf(p);
        BigInteger[][] num = new BigInteger[n][m];
        long[][][] allDigits = new long[m][][];
        BigInteger pk = bp.pow(steps);
        BigInteger numBound = BigInteger.ONE.shiftLeft(numBits);
        BigInteger denBound = BigInteger.ONE.shiftLeft(denBits);
        for (int c = 0; c < m; c++) {
            BigInteger[] r = new BigInteger[n];
            for (int i = 0; i < n; i++) {
                r[i] = b[i][c];
            }
            long[][] digits = new long[steps][];
            long[] rm = new long[n];
            for (int s = 0; s < steps; s++) {
                Bareiss.checkInterrupt(caller);
                if ((s & 15) == 0) {
                    progress.update("lifting", (long) c * steps + s, (long) m * steps);
                }
                for (int i = 0; i < n; i++) {
                    rm[i] = r[i].bitLength() < 63 ? Math.floorMod(r[i].longValue(), p) : r[i].mod(bp).longValue();
                }
                long[] x = lu.solve(rm);
                digits[s] = x;
                for (int i = 0; i < n; i++) {
                    long ax = 0;
                    for (int j : nzCols[i]) {
                        ax += a[i][j] * x[j];
                    }
                    if (r[i].bitLength() < 62) {
                        // |r| stays below n * max|a| after the first steps, so this is the usual case
                        long diff = r[i].longValue() - ax;
                        r[i] = BigInteger.valueOf(diff / p);
                    } else {
                        r[i] = r[i].subtract(BigInteger.valueOf(ax)).divide(bp);
                    }
                }
            }
            allDigits[c] = digits;
        }
        progress.update("lifting", (long) m * steps, (long) m * steps);
        Optional<Bareiss.Solution> quick = overKnownDenominator(a, nzCols, b, allDigits, bp, pk, numBits,
            numBound, denBound, hint);
        if (quick.isPresent()) {
            return quick.get();
        }
        for (int c = 0; c < m; c++) {
            for (int i = 0; i < n; i++) {
                num[i][c] = combine(allDigits[c], i, 0, steps, bp);
            }
        }
        return reconstruct(num, pk, numBound, denBound);
    }

    /**
     * The solution over D, the lcm of the hint and of the denominators of the first row's entries (found by rational
     * reconstruction of those entries alone). If D is a common denominator of every entry and divides det A, each
     * numerator D x_i is an integer of at most the Cramer bound N in absolute value, so it is the symmetric residue
     * of D u_i modulo any p^k' > 2N: only the first k' p-adic digits of u_i (about half of them) are combined, and
     * no other entry is reconstructed. Checked exactly at the end, {@code A (D x) = D b} over the integers (cheap:
     * A has small entries); empty if the check fails, and the caller reconstructs every entry.
     */
    private static Optional<Bareiss.Solution> overKnownDenominator(long[][] a, int[][] nzCols, BigInteger[][] b,
            long[][][] digits, BigInteger bp, BigInteger pk, int numBits, BigInteger numBound, BigInteger denBound,
            BigInteger hint) {
        int n = a.length;
        int m = b[0].length;
        int steps = digits[0].length;
        BigInteger den = hint;
        for (int c = 0; c < m; c++) {
            BigInteger d = wang(combine(digits[c], 0, 0, steps, bp), pk, numBound)[1];
            den = den.divide(den.gcd(d)).multiply(d);
        }
        int k = (int) Math.ceil((numBits + 2) / (Math.log(bp.longValue()) / Math.log(2))) + 1;
        if (k >= steps) {
            return Optional.empty();
        }
        // a cheap early refusal: D must give the middle and the last row's entries by the test of reconstruct
        BigInteger halfPk = pk.shiftRight(1);
        for (int i : new int[] {n / 2, n - 1}) {
            for (int c = 0; c < m; c++) {
                BigInteger v = symmetric(combine(digits[c], i, 0, steps, bp).multiply(den).mod(pk), pk, halfPk);
                if (v.abs().multiply(denBound).add(numBound.multiply(den)).compareTo(pk) >= 0) {
                    return Optional.empty();
                }
            }
        }
        BigInteger mod = power(bp, k);
        BigInteger half = mod.shiftRight(1);
        BigInteger[][] out = new BigInteger[n][m];
        for (int c = 0; c < m; c++) {
            for (int i = 0; i < n; i++) {
                out[i][c] = symmetric(combine(digits[c], i, 0, k, bp).multiply(den).mod(mod), mod, half);
            }
            for (int i = 0; i < n; i++) {
                BigInteger s = BigInteger.ZERO;
                for (int j : nzCols[i]) {
                    s = s.add(out[j][c].multiply(BigInteger.valueOf(a[i][j])));
                }
                if (!s.equals(b[i][c].multiply(den))) {
                    return Optional.empty();
                }
            }
        }
        return Optional.of(new Bareiss.Solution(out, den));
    }

    /** {@code sum_s digits[s][i] p^(s - lo)} for s in [lo, hi), split in halves so the products stay balanced. */
    /** Powers of the lifting primes up to p^4096 (at most a few MB), shared by all entries: the splits repeat the same few exponents. */
    private static final java.util.concurrent.ConcurrentHashMap<Long, BigInteger> POWERS =
        new java.util.concurrent.ConcurrentHashMap<>();

    private static BigInteger power(BigInteger p, int e) {
        if (p.bitLength() > 31 || e > 4096) {
            return p.pow(e);
        }
        return POWERS.computeIfAbsent(p.longValue() << 21 | e, k -> p.pow(e));
    }

    private static BigInteger combine(long[][] digits, int i, int lo, int hi, BigInteger p) {
        if (hi - lo <= 16) {
            BigInteger s = BigInteger.ZERO;
            for (int k = hi - 1; k >= lo; k--) {
                s = s.multiply(p).add(BigInteger.valueOf(digits[k][i]));
            }
            return s;
        }
        int mid = (lo + hi) >>> 1;
        return combine(digits, i, mid, hi, p).multiply(power(p, mid - lo)).add(combine(digits, i, lo, mid, p));
    }

    /**
     * Rational reconstruction of every entry, with the denominator found so far tried first: if {@code D u mod M}
     * (symmetric) is small, {@code u = v / D} exactly (the bound {@code M > 2 N D} makes the small residue unique).
     */
    private static Bareiss.Solution reconstruct(BigInteger[][] u, BigInteger mod, BigInteger numBound,
            BigInteger denBound) {
        int n = u.length;
        int m = u[0].length;
        BigInteger den = BigInteger.ONE;
        BigInteger half = mod.shiftRight(1);
        BigInteger[][] out = new BigInteger[n][m];
        // first pass: find the common denominator; an entry's numerator over the denominator known so far is kept,
        // so only the entries before the last change of the denominator are computed again
        int redo = 0;
        for (int i = 0; i < n; i++) {
            for (int c = 0; c < m; c++) {
                BigInteger v = symmetric(u[i][c].multiply(den).mod(mod), mod, half);
                if (v.abs().multiply(denBound).add(numBound.multiply(den)).compareTo(mod) >= 0) {
                    BigInteger[] nd = wang(u[i][c], mod, numBound);
                    BigInteger d = nd[1];
                    den = den.divide(den.gcd(d)).multiply(d);
                    v = symmetric(u[i][c].multiply(den).mod(mod), mod, half);
                    redo = i * m + c;
                }
                out[i][c] = v;
            }
        }
        for (int k = 0; k < redo; k++) {
            int i = k / m;
            int c = k % m;
            out[i][c] = symmetric(u[i][c].multiply(den).mod(mod), mod, half);
        }
        return new Bareiss.Solution(out, den);
    }

    private static BigInteger symmetric(BigInteger v, BigInteger mod, BigInteger half) {
        return v.compareTo(half) > 0 ? v.subtract(mod) : v;
    }

    /** {n, d} with n ≡ d u (mod M), |n| <= bound, d > 0: extended Euclid on (M, u) stopped at the bound. */
    private static BigInteger[] wang(BigInteger u, BigInteger mod, BigInteger bound) {
        BigInteger r0 = mod;
        BigInteger r1 = u.mod(mod);
        BigInteger t0 = BigInteger.ZERO;
        BigInteger t1 = BigInteger.ONE;
        while (r1.compareTo(bound) > 0) {
            BigInteger[] qr = r0.divideAndRemainder(r1);
            r0 = r1;
            r1 = qr[1];
            BigInteger t = t0.subtract(qr[0].multiply(t1));
            t0 = t1;
            t1 = t;
        }
        if (t1.signum() == 0) {
            throw new ArithmeticException("rational reconstruction failed");
        }
        return t1.signum() < 0 ? new BigInteger[] {r1.negate(), t1.negate()} : new BigInteger[] {r1, t1};
    }

    /** LU decomposition modulo p with row permutation; rows remember their non-zero span. */
    static final class ModLu {
        final long p;
        final int n;
        final long[][] lu;
        final int[] perm;
        final int[] lo;
        final int[] hi;
        final long[] invDiag;

        private ModLu(long p, long[][] lu, int[] perm, int[] lo, int[] hi, long[] invDiag) {
            this.p = p;
            this.n = lu.length;
            this.lu = lu;
            this.perm = perm;
            this.lo = lo;
            this.hi = hi;
            this.invDiag = invDiag;
        }

        static Optional<ModLu> of(long[][] a, long p, Thread caller) {
            int n = a.length;
            long[][] w = new long[n][];
            int[] perm = new int[n];
            int[] lo = new int[n];
            int[] hi = new int[n];
            for (int i = 0; i < n; i++) {
                w[i] = new long[n];
                perm[i] = i;
                lo[i] = n;
                hi[i] = -1;
                for (int j = 0; j < n; j++) {
                    long v = Math.floorMod(a[i][j], p);
                    w[i][j] = v;
                    if (v != 0) {
                        lo[i] = Math.min(lo[i], j);
                        hi[i] = j;
                    }
                }
            }
            long[] inv = new long[n];
            for (int k = 0; k < n; k++) {
                if ((k & 31) == 0) {
                    Bareiss.checkInterrupt(caller);
                }
                int piv = -1;
                for (int i = k; i < n; i++) {
                    if (lo[i] <= k && w[i][k] != 0) {
                        piv = i;
                        break;
                    }
                }
                if (piv < 0) {
                    return Optional.empty();
                }
                if (piv != k) {
                    swap(w, piv, k);
                    swap(perm, piv, k);
                    swap(lo, piv, k);
                    swap(hi, piv, k);
                }
                long ik = modInverse(w[k][k], p);
                inv[k] = ik;
                long[] rk = w[k];
                int hk = hi[k];
                for (int i = k + 1; i < n; i++) {
                    long[] ri = w[i];
                    if (lo[i] > k || ri[k] == 0) {
                        continue;
                    }
                    long f = ri[k] * ik % p;
                    ri[k] = f;
                    for (int j = k + 1; j <= hk; j++) {
                        if (rk[j] != 0) {
                            ri[j] = Math.floorMod(ri[j] - f * rk[j] % p, p);
                        }
                    }
                    hi[i] = Math.max(hi[i], hk);
                }
            }
            return Optional.of(new ModLu(p, w, perm, lo, hi, inv));
        }

        /** {@code A^-1 b mod p}. */
        long[] solve(long[] b) {
            long[] y = new long[n];
            for (int i = 0; i < n; i++) {
                long s = b[perm[i]];
                long[] ri = lu[i];
                for (int j = lo[i]; j < i; j++) {
                    if (ri[j] != 0) {
                        s = (s - ri[j] * y[j] % p) % p;
                    }
                }
                y[i] = s < 0 ? s + p : s;
            }
            long[] x = new long[n];
            for (int i = n - 1; i >= 0; i--) {
                long s = y[i];
                long[] ri = lu[i];
                for (int j = i + 1; j <= hi[i]; j++) {
                    if (ri[j] != 0) {
                        s = (s - ri[j] * x[j] % p) % p;
                    }
                }
                if (s < 0) {
                    s += p;
                }
                x[i] = s * invDiag[i] % p;
            }
            return x;
        }

        private static long modInverse(long a, long p) {
            return BigInteger.valueOf(a).modInverse(BigInteger.valueOf(p)).longValue();
        }

        private static void swap(long[][] w, int i, int j) {
            long[] t = w[i];
            w[i] = w[j];
            w[j] = t;
        }

        private static void swap(int[] w, int i, int j) {
            int t = w[i];
            w[i] = w[j];
            w[j] = t;
        }
    }
}
