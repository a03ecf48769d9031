package org.qchain.exact.linear;

import java.math.BigInteger;
import java.util.Optional;
import org.qchain.exact.Progress;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;

/**
 * Exact solutions of linear systems with rational coefficients, without fractions inside the elimination.
 *
 * <p>Each equation (row) is first multiplied by the least common multiple of its denominators, which leaves the
 * solution unchanged and gives an integer system. Systems with word-size entries (every Markov chain with modest
 * denominators) go to p-adic lifting ({@link Dixon}): one LU decomposition modulo a prime that keeps a band, then
 * word-size lifting steps and one rational reconstruction per entry. Others go to fraction-free Gauss-Jordan
 * elimination ({@link Bareiss}), whose result is one integer matrix over one common denominator, reduced entry by
 * entry once at the end. Both are exact; neither ever reduces a fraction during elimination.
 *
 * <p>Example: {@code LinearSolver.solve(a, b)} for {@code A X = B}; {@code LinearSolver.leftNullVector(p − I)} for
 * the stationary law of an irreducible chain.
 */
public final class LinearSolver {
    private LinearSolver() {
    }

    /**
     * The solution X of {@code A X = B}.
     *
     * @param a square n x n matrix
     * @param b n x m right-hand sides, one per column
     * @return the n x m matrix X
     * @throws IllegalArgumentException if the shapes do not fit
     * @throws SingularSystemException  if {@code A} is singular ({@link SingularSystemException#index()} is the
     *                                  first unknown left undetermined)
     * @throws org.qchain.exact.QchainException with key INTERRUPTED if the calling thread is interrupted
     */
    public static RationalMatrix solve(RationalMatrix a, RationalMatrix b) {
        return solve(a, b, Progress.NONE);
    }

    /**
     * The solution X of {@code A X = B}, reporting progress ({@code "eliminating"}: pivots done; {@code "lifting"}:
     * p-adic lifting steps done over all right-hand sides).
     *
     * @see #solve(RationalMatrix, RationalMatrix)
     */
    public static RationalMatrix solve(RationalMatrix a, RationalMatrix b, Progress progress) {
        return solveCommon(a, b, progress).reduced();
    }

    /**
     * The solution X of {@code A X = B} over one common denominator, not reduced entry by entry: for callers that
     * compute further with X (see {@link CommonSolution}).
     *
     * @see #solve(RationalMatrix, RationalMatrix, Progress)
     */
    public static CommonSolution solveCommon(RationalMatrix a, RationalMatrix b, Progress progress) {
        requireSquare(a);
        if (b.rows() != a.rows()) {
            throw new IllegalArgumentException("right-hand side has " + b.rows() + " rows, the matrix " + a.rows());
        }
        int n = a.rows();
        int m = b.cols();
        BigInteger[] rowLcm = new BigInteger[n];
        BigInteger[][] ai = integerRows(a, rowLcm);
        BigInteger[][] bi = new BigInteger[n][m];
        // each row of A times the lcm of its denominators (A stays word-size where it was), the right-hand sides
        // times the same row factor and then by one common denominator D of them all: (L A)(D X) = D L B, so a
        // right-hand side with large denominators (an earlier solution) does not blow up A
        Rational[][] lb = new Rational[n][m];
        BigInteger d = BigInteger.ONE;
        for (int i = 0; i < n; i++) {
            Rational rl = Rational.of(rowLcm[i]);
            for (int j = 0; j < m; j++) {
                lb[i][j] = b.get(i, j).multiply(rl);
                d = lcm(d, lb[i][j].denominator());
            }
        }
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < m; j++) {
                bi[i][j] = scaled(lb[i][j], d);
            }
        }
        Bareiss.Solution s = solveInteger(ai, bi, progress);
        return new CommonSolution(s.numerators(), s.denominator().multiply(d));
    }

    /**
     * The solution x of {@code A x = v / d} for an integer vector v and a positive integer d, over one common
     * denominator: a solution over a common denominator ({@link CommonSolution#column}) as the right-hand side of
     * a second solve, without reducing its entries or taking the lcm of their denominators first.
     *
     * @param a square n x n matrix
     * @param v n integers
     * @param d positive
     * @return the n x 1 solution
     * @throws IllegalArgumentException if the shapes do not fit or d is not positive
     * @throws SingularSystemException  if {@code A} is singular
     */
    public static CommonSolution solveCommon(RationalMatrix a, BigInteger[] v, BigInteger d, Progress progress) {
        requireSquare(a);
        if (v.length != a.rows()) {
            throw new IllegalArgumentException("right-hand side has " + v.length + " rows, the matrix " + a.rows());
        }
        if (d.signum() <= 0) {
            throw new IllegalArgumentException("the denominator must be positive, not " + d);
        }
        int n = a.rows();
        BigInteger[] rowLcm = new BigInteger[n];
        BigInteger[][] ai = integerRows(a, rowLcm);
        // (L A)(d x) = L v; d, the denominator of a solution with the same A, is likely a multiple of this one's
        BigInteger[][] bi = new BigInteger[n][1];
        for (int i = 0; i < n; i++) {
            bi[i][0] = v[i].multiply(rowLcm[i]);
        }
        Bareiss.Solution s = solveInteger(ai, bi, progress, d);
        return new CommonSolution(s.numerators(), s.denominator().multiply(d));
    }

    /** Each row of {@code a} times the lcm of its denominators (stored in {@code rowLcm}), as integers. */
    private static BigInteger[][] integerRows(RationalMatrix a, BigInteger[] rowLcm) {
        int n = a.rows();
        BigInteger[][] ai = new BigInteger[n][n];
        for (int i = 0; i < n; i++) {
            BigInteger l = BigInteger.ONE;
            for (int j = 0; j < n; j++) {
                l = lcm(l, a.get(i, j).denominator());
            }
            rowLcm[i] = l;
            for (int j = 0; j < n; j++) {
                ai[i][j] = scaled(a.get(i, j), l);
            }
        }
        return ai;
    }

    /**
     * The solution X of {@code X A = B}.
     *
     * @param a square n x n matrix
     * @param b k x n right-hand sides, one per row
     * @return the k x n matrix X
     * @throws IllegalArgumentException if the shapes do not fit
     * @throws SingularSystemException  if {@code A} is singular (the index is a row of {@code A})
     */
    public static RationalMatrix solveLeft(RationalMatrix a, RationalMatrix b) {
        return solveLeft(a, b, Progress.NONE);
    }

    /** {@link #solveLeft(RationalMatrix, RationalMatrix)}, reporting progress as {@link #solve} does. */
    public static RationalMatrix solveLeft(RationalMatrix a, RationalMatrix b, Progress progress) {
        requireSquare(a);
        if (b.cols() != a.rows()) {
            throw new IllegalArgumentException("right-hand side has " + b.cols() + " columns, the matrix " + a.rows());
        }
        int n = a.rows();
        int k = b.rows();
        // X A = B with A = L^-1 A' (L = diag of row multipliers): Y A' = B with X = Y L; solve A'^T Y^T = B^T
        BigInteger[] mult = new BigInteger[n];
        BigInteger[][] ai = integerRows(a, mult);
        Rational[][] at = new Rational[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                at[j][i] = Rational.of(ai[i][j]);
            }
        }
        Rational[][] bt = new Rational[n][k];
        for (int i = 0; i < n; i++) {
            for (int r = 0; r < k; r++) {
                bt[i][r] = b.get(r, i);
            }
        }
        RationalMatrix yt = solve(RationalMatrix.of(at), RationalMatrix.of(bt), progress);
        Rational[][] x = new Rational[k][n];
        for (int r = 0; r < k; r++) {
            for (int i = 0; i < n; i++) {
                x[r][i] = yt.get(i, r).multiply(Rational.of(mult[i]));
            }
        }
        return RationalMatrix.of(x);
    }

    /**
     * The row vector x with {@code x A = 0} and {@code x·1 = 1}, for a square matrix whose rows sum to zero (such
     * as {@code P − I} for a transition matrix P, or a generator matrix): the stationary law when the chain is
     * irreducible. Solved as {@code x A' = e_n}, where A' is A with its last column replaced by ones (the last
     * column of A is minus the sum of the others, so its equation is implied).
     *
     * @param a square matrix with zero row sums
     * @return x, of length n
     * @throws IllegalArgumentException if a row does not sum to zero
     * @throws SingularSystemException  if the solution is not unique (the null space has dimension above 1)
     */
    public static Rational[] leftNullVector(RationalMatrix a) {
        return leftNullVector(a, Progress.NONE);
    }

    /** {@link #leftNullVector(RationalMatrix)}, reporting progress as {@link #solve} does. */
    public static Rational[] leftNullVector(RationalMatrix a, Progress progress) {
        requireSquare(a);
        int n = a.rows();
        Rational[][] e = a.toArray();
        for (int i = 0; i < n; i++) {
            Rational s = Rational.ZERO;
            for (Rational x : e[i]) {
                s = s.add(x);
            }
            if (!s.isZero()) {
                throw new IllegalArgumentException("row " + i + " sums to " + s + ", not 0");
            }
            e[i][n - 1] = Rational.ONE;
        }
        Rational[][] rhs = new Rational[1][n];
        java.util.Arrays.fill(rhs[0], Rational.ZERO);
        rhs[0][n - 1] = Rational.ONE;
        try {
            return solveLeft(RationalMatrix.of(e), RationalMatrix.of(rhs), progress).row(0);
        } catch (SingularSystemException ex) {
            throw new SingularSystemException(ex.index(),
                "the null space has dimension above 1 (more than one closed class)");
        }
    }

    /**
     * The determinant.
     *
     * @throws IllegalArgumentException if {@code a} is not square
     */
    public static Rational determinant(RationalMatrix a) {
        requireSquare(a);
        int n = a.rows();
        BigInteger[] rowLcm = new BigInteger[n];
        BigInteger[][] ai = integerRows(a, rowLcm);
        BigInteger scale = BigInteger.ONE;
        for (BigInteger l : rowLcm) {
            scale = scale.multiply(l);
        }
        return Rational.of(Bareiss.determinant(ai, Thread.currentThread()), scale);
    }

    /**
     * The inverse.
     *
     * @throws SingularSystemException if {@code a} is singular
     */
    public static RationalMatrix inverse(RationalMatrix a) {
        requireSquare(a);
        return solve(a, RationalMatrix.identity(a.rows()));
    }

    /** Integer {@code A X = B}: p-adic lifting when the entries are word-size, Bareiss otherwise. */
    static Bareiss.Solution solveInteger(BigInteger[][] a, BigInteger[][] b) {
        return solveInteger(a, b, Progress.NONE);
    }

    static Bareiss.Solution solveInteger(BigInteger[][] a, BigInteger[][] b, Progress progress) {
        return solveInteger(a, b, progress, BigInteger.ONE);
    }

    /** As above, with a likely multiple of the solution's denominator for p-adic lifting to try first. */
    static Bareiss.Solution solveInteger(BigInteger[][] a, BigInteger[][] b, Progress progress, BigInteger hint) {
        Thread caller = Thread.currentThread();
        int n = a.length;
        if (b[0].length == 0) {
            return new Bareiss.Solution(b, BigInteger.ONE);
        }
        Optional<long[][]> small = asLongs(a);
        if (small.isPresent() && n >= DIXON_MIN_SIZE) {
            Optional<Bareiss.Solution> s = Dixon.solve(small.get(), b, caller, progress, hint);
            if (s.isPresent()) {
                return s.get();
            }
        }
        return Bareiss.solve(a, b, caller, progress);
    }

    /** Below this size fraction-free elimination is as fast and simpler. */
    static int DIXON_MIN_SIZE = 12;

    private static Optional<long[][]> asLongs(BigInteger[][] a) {
        int n = a.length;
        long[][] out = new long[n][n];
        long max = 0;
        int maxNz = 0;
        for (int i = 0; i < n; i++) {
            int nz = 0;
            for (int j = 0; j < n; j++) {
                if (a[i][j].bitLength() > 62) {
                    return Optional.empty();
                }
                long v = a[i][j].longValue();
                out[i][j] = v;
                if (v != 0) {
                    nz++;
                    max = Math.max(max, Math.abs(v));
                }
            }
            maxNz = Math.max(maxNz, nz);
        }
        return Dixon.fits(max, maxNz) ? Optional.of(out) : Optional.empty();
    }

    private static BigInteger scaled(Rational x, BigInteger l) {
        return x.isZero() ? BigInteger.ZERO : x.numerator().multiply(l.divide(x.denominator()));
    }

    private static BigInteger lcm(BigInteger x, BigInteger y) {
        if (y.equals(BigInteger.ONE) || x.equals(y)) {
            return x;
        }
        if (x.equals(BigInteger.ONE)) {
            return y;
        }
        return x.divide(x.gcd(y)).multiply(y);
    }

    private static void requireSquare(RationalMatrix a) {
        if (!a.isSquare()) {
            throw new IllegalArgumentException("matrix is not square: " + a.rows() + "x" + a.cols());
        }
    }
}
