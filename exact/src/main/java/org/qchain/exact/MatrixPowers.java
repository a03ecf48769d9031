package org.qchain.exact;

import java.math.BigInteger;

/**
 * Exact powers of rational square matrices: the whole of {@code P^n}, one row of it, or one entry.
 *
 * <p>All three work on the common-denominator form {@code P = A / d} ({@code d} the least common multiple of the
 * denominators, {@code A} an integer matrix): {@code P^n = A^n / d^n}. Integers are multiplied without any gcd, and
 * each entry is reduced once at the end by the known prime factors of {@code d}. Zero entries are skipped, so sparse
 * chains cost in proportion to their transitions.
 * <ul>
 * <li>{@link #power} squares and multiplies (left to right over the bits of {@code n}, so every multiplication that
 * is not a squaring is by the small matrix {@code A}).</li>
 * <li>{@link #rowOfPower} and {@link #entryOfPower} take {@code n} vector–matrix products (path sums) when that is
 * cheaper than squaring, which it is unless {@code n} is large against the number of states; otherwise they square.
 * Both routes give the same exact numbers.</li>
 * <li>A two-state chain whose rows sum to 1 uses the closed form
 * {@code P^n = (1/(a+b)) [[b, a], [b, a]] + ((1-a-b)^n/(a+b)) [[a, -a], [-b, b]]}, which needs two integer powers
 * instead of a chain of 2x2 squarings.</li>
 * </ul>
 *
 * <p>Long loops check the calling thread's interrupt flag and then throw {@link QchainException} with
 * {@link ErrorKey#INTERRUPTED}. Large products split their rows over the common fork-join pool.
 */
public final class MatrixPowers {
    private MatrixPowers() {
    }

    /**
     * {@code P^n}.
     *
     * @param p a square matrix
     * @param n the exponent, {@code >= 0}; {@code P^0} is the identity
     * @return {@code P^n}, exact and reduced
     * @throws IllegalArgumentException if {@code p} is not square or {@code n < 0}
     * @throws QchainException          with {@link ErrorKey#INTERRUPTED} if the thread is interrupted
     * @throws ArithmeticException      if an integer would exceed {@link BigInteger}'s range
     */
    public static RationalMatrix power(RationalMatrix p, long n) {
        return power(p, n, Progress.NONE);
    }

    /**
     * {@code P^n}, reporting progress (phases {@code "squaring"} and {@code "reducing"}).
     *
     * @param p        a square matrix
     * @param n        the exponent, {@code >= 0}
     * @param progress receives coarse progress reports
     * @return {@code P^n}, exact and reduced
     * @throws IllegalArgumentException if {@code p} is not square or {@code n < 0}
     * @throws QchainException          with {@link ErrorKey#INTERRUPTED} if the thread is interrupted
     * @throws ArithmeticException      if an integer would exceed {@link BigInteger}'s range
     */
    public static RationalMatrix power(RationalMatrix p, long n, Progress progress) {
        CommonDenominatorForm.requireSquare(p);
        requireExponent(n);
        int s = p.rows();
        if (n == 0) {
            return RationalMatrix.identity(s);
        }
        if (n == 1) {
            return p;
        }
        CommonDenominatorForm f = CommonDenominatorForm.of(p);
        if (TwoState.applies(p)) {
            return RationalMatrix.wrap(TwoState.power(f, n));
        }
        IntMatrix an = integerPower(f.a, n, progress);
        KnownDenominator den = KnownDenominator.power(f.d, n);
        Rational[][] out = new Rational[s][s];
        Thread caller = Thread.currentThread();
        java.util.concurrent.atomic.AtomicInteger done = new java.util.concurrent.atomic.AtomicInteger();
        java.util.stream.IntStream rows = java.util.stream.IntStream.range(0, s);
        if (s >= 8 && Runtime.getRuntime().availableProcessors() > 1) {
            rows = rows.parallel();
        }
        rows.forEach(i -> {
            checkInterrupt(caller);
            Rational[] row = new Rational[s];
            for (int j = 0; j < s; j++) {
                row[j] = den.reduce(an.e[i][j]);
            }
            out[i] = row;
            int d = done.incrementAndGet();
            if (Thread.currentThread() == caller) {
                progress.update("reducing", d, s);
            }
        });
        return RationalMatrix.wrap(out);
    }

    /**
     * Row {@code from} of {@code P^n}: the probabilities of being in each state after {@code n} steps when starting
     * in state {@code from}.
     *
     * @param p    a square matrix
     * @param from the row, 0-based
     * @param n    the exponent, {@code >= 0}
     * @return a new array holding row {@code from} of {@code P^n}, exact and reduced
     * @throws IllegalArgumentException  if {@code p} is not square or {@code n < 0}
     * @throws IndexOutOfBoundsException if {@code from} is not a row
     * @throws QchainException           with {@link ErrorKey#INTERRUPTED} if the thread is interrupted
     */
    public static Rational[] rowOfPower(RationalMatrix p, int from, long n) {
        return rowOfPower(p, from, n, Progress.NONE);
    }

    /**
     * Row {@code from} of {@code P^n}, reporting progress (phase {@code "path sums"}, or {@code "squaring"} when
     * squaring is cheaper, then {@code "reducing"}).
     *
     * @param p        a square matrix
     * @param from     the row, 0-based
     * @param n        the exponent, {@code >= 0}
     * @param progress receives coarse progress reports
     * @return a new array holding row {@code from} of {@code P^n}, exact and reduced
     * @throws IllegalArgumentException  if {@code p} is not square or {@code n < 0}
     * @throws IndexOutOfBoundsException if {@code from} is not a row
     * @throws QchainException           with {@link ErrorKey#INTERRUPTED} if the thread is interrupted
     */
    public static Rational[] rowOfPower(RationalMatrix p, int from, long n, Progress progress) {
        UnreducedRow r = unreducedRow(p, from, n, progress);
        if (r.reduced != null) {
            return r.reduced;
        }
        Rational[] out = new Rational[r.x.length];
        for (int j = 0; j < out.length; j++) {
            out[j] = r.den.reduce(r.x[j]);
        }
        return out;
    }

    /**
     * Entry {@code (from, to)} of {@code P^n}: the probability of being in state {@code to} after {@code n} steps
     * from state {@code from}. Equal to {@code power(p, n).get(from, to)}, computed by path sums over one row.
     *
     * @param p    a square matrix
     * @param from the row, 0-based
     * @param to   the column, 0-based
     * @param n    the exponent, {@code >= 0}
     * @return the entry, exact and reduced
     * @throws IllegalArgumentException  if {@code p} is not square or {@code n < 0}
     * @throws IndexOutOfBoundsException if {@code from} or {@code to} is out of range
     * @throws QchainException           with {@link ErrorKey#INTERRUPTED} if the thread is interrupted
     */
    public static Rational entryOfPower(RationalMatrix p, int from, int to, long n) {
        return entryOfPower(p, from, to, n, Progress.NONE);
    }

    /**
     * Entry {@code (from, to)} of {@code P^n}, reporting progress as {@link #rowOfPower(RationalMatrix, int, long,
     * Progress)} does.
     *
     * @param p        a square matrix
     * @param from     the row, 0-based
     * @param to       the column, 0-based
     * @param n        the exponent, {@code >= 0}
     * @param progress receives coarse progress reports
     * @return the entry, exact and reduced
     * @throws IllegalArgumentException  if {@code p} is not square or {@code n < 0}
     * @throws IndexOutOfBoundsException if {@code from} or {@code to} is out of range
     * @throws QchainException           with {@link ErrorKey#INTERRUPTED} if the thread is interrupted
     */
    public static Rational entryOfPower(RationalMatrix p, int from, int to, long n, Progress progress) {
        CommonDenominatorForm.requireSquare(p);
        java.util.Objects.checkIndex(to, p.cols());
        UnreducedRow r = unreducedRow(p, from, n, progress);
        return r.reduced != null ? r.reduced[to] : r.den.reduce(r.x[to]);
    }

    // ------------------------------------------------------------------------------------------------------------

    /** A row as integers over a known denominator, or already reduced (small cases). */
    private static final class UnreducedRow {
        BigInteger[] x;
        KnownDenominator den;
        Rational[] reduced;
    }

    private static UnreducedRow unreducedRow(RationalMatrix p, int from, long n, Progress progress) {
        CommonDenominatorForm.requireSquare(p);
        requireExponent(n);
        int s = p.rows();
        java.util.Objects.checkIndex(from, s);
        UnreducedRow r = new UnreducedRow();
        if (n == 0) {
            r.reduced = RationalMatrix.identity(s).row(from);
            return r;
        }
        if (n == 1) {
            r.reduced = p.row(from);
            return r;
        }
        CommonDenominatorForm f = CommonDenominatorForm.of(p);
        if (TwoState.applies(p)) {
            r.reduced = TwoState.power(f, n)[from];
            return r;
        }
        r.den = KnownDenominator.power(f.d, n);
        if (preferVectorSteps(f, n)) {
            r.x = vectorSteps(f.a, from, n, progress);
        } else {
            r.x = integerPower(f.a, n, progress).e[from];
        }
        return r;
    }

    /**
     * {@code e_from A^n} by {@code n} vector–matrix products: path sums, one step at a time. Each step multiplies the
     * growing vector entries by the small entries of {@code A}, so it costs linear time per transition.
     */
    static BigInteger[] vectorSteps(IntMatrix a, int from, long n, Progress progress) {
        Thread caller = Thread.currentThread();
        if (Limbs.smallNonNegative(a)) {
            return Limbs.vectorSteps(a, from, n, progress, caller);
        }
        return vectorStepsBig(a, from, n, progress, caller);
    }

    /** {@link #vectorSteps} on {@link BigInteger}s, for matrices with negative or large entries. */
    static BigInteger[] vectorStepsBig(IntMatrix a, int from, long n, Progress progress, Thread caller) {
        BigInteger[] v = a.e[from];
        int[] idx = a.nz[from];
        long stride = Math.max(1, n / 1000);
        for (long t = 1; t < n; t++) {
            v = IntMatrix.rowTimes(v, idx, a, caller);
            idx = IntMatrix.nonZeros(v);
            if ((t + 1) % stride == 0) {
                progress.update("path sums", t + 1, n);
            }
        }
        progress.update("path sums", n, n);
        return v;
    }

    /**
     * {@code A^n}, {@code n >= 1}, left to right over the bits of {@code n}. Short non-negative entries are
     * multiplied on limb arrays ({@link LimbMatrix}); past {@link LimbMatrix#MAX_LIMBS} limbs on {@link BigInteger}
     * ({@link IntMatrix}); past {@link BigMath#matrixApintBits} bits the remaining squarings run on apfloat (one
     * conversion in, one out). Large dense powers go the multi-modular way instead ({@link ModularPower#applies}).
     */
    static IntMatrix integerPower(IntMatrix a, long n, Progress progress) {
        Thread caller = Thread.currentThread();
        if (n > 1 && ModularPower.applies(a, n)) {
            return ModularPower.power(a, n, progress, caller);
        }
        int top = 63 - Long.numberOfLeadingZeros(n);
        long total = top + Long.bitCount(n) - 1L;
        long done = 0;
        // three representations as the entries grow: limb arrays (short, non-negative), BigInteger, apfloat
        LimbMatrix small = null;
        LimbMatrix smallA = null;
        if (limbPath && Limbs.smallNonNegative(a)) {
            small = LimbMatrix.of(a);
            smallA = small;
        }
        IntMatrix r = a;
        ApintMatrix big = null;
        ApintMatrix bigA = null;
        for (int bit = top - 1; bit >= 0; bit--) {
            boolean multiply = (n >>> bit & 1) != 0;
            if (small != null && small.maxLimbs() > LimbMatrix.MAX_LIMBS) {
                r = small.toIntMatrix();
                small = null;
            }
            if (small == null && big == null && r.maxBits() >= BigMath.matrixApintBits) {
                big = ApintMatrix.of(r, caller);
                bigA = ApintMatrix.of(a, caller);
            }
            if (small != null) {
                small = small.multiply(small, caller);
                progress.update("squaring", ++done, total);
                if (multiply) {
                    small = small.multiply(smallA, caller);
                    progress.update("squaring", ++done, total);
                }
            } else if (big != null) {
                big = big.multiply(big, caller);
                progress.update("squaring", ++done, total);
                if (multiply) {
                    big = big.multiply(bigA, caller);
                    progress.update("squaring", ++done, total);
                }
            } else {
                r = r.multiply(r, caller);
                progress.update("squaring", ++done, total);
                if (multiply) {
                    r = r.multiply(a, caller);
                    progress.update("squaring", ++done, total);
                }
            }
        }
        if (small != null) {
            return small.toIntMatrix();
        }
        return big == null ? r : big.toIntMatrix(caller);
    }

    /** Tests switch the limb path off to compare it with the BigInteger path. */
    static volatile boolean limbPath = true;

    /**
     * Whether {@code n} vector steps are cheaper than squaring: a cost model in word multiplications. Step {@code t}
     * touches every transition once with numbers of about {@code t g} bits ({@code g} the bits one step adds);
     * squaring does about {@code log2 n} dense products whose last one has operands of {@code n g / 2} bits
     * (Karatsuba/Toom cost, exponent about 1.5).
     */
    static boolean preferVectorSteps(CommonDenominatorForm f, long n) {
        double g = Math.max(1, growthBits(f.a));
        double nnz = f.a.nonZeroCount();
        double s = f.size;
        double nn = n;
        double vector = nnz * (nn + nn * nn * g / 128.0);
        double w = Math.max(1, nn * g / 128.0);
        double mul = w < 40 ? w * w : Math.pow(w, 1.5);
        // sizes double at each squaring, so the last product dominates: about 1.5 times its cost in all
        double squaring = s * s * s * (1.5 * mul + Math.max(1, 64 - Long.numberOfLeadingZeros(n)));
        return vector <= squaring;
    }

    /** Bits one multiplication by {@code A} can add: the bit length of the largest absolute row sum. */
    static int growthBits(IntMatrix a) {
        return maxAbsRowSum(a).bitLength();
    }

    /** The largest absolute row sum of {@code A}: every entry of {@code A^n} is at most its {@code n}-th power. */
    static BigInteger maxAbsRowSum(IntMatrix a) {
        BigInteger max = BigInteger.ZERO;
        for (int i = 0; i < a.n; i++) {
            BigInteger sum = BigInteger.ZERO;
            for (int j : a.nz[i]) {
                sum = sum.add(a.e[i][j].abs());
            }
            max = max.max(sum);
        }
        return max;
    }

    static void checkInterrupt(Thread caller) {
        if (caller.isInterrupted()) {
            throw new QchainException(ErrorKey.INTERRUPTED);
        }
    }

    private static void requireExponent(long n) {
        if (n < 0) {
            throw new IllegalArgumentException("exponent must not be negative: " + n);
        }
    }

    /** Closed form of a two-state matrix with both rows summing to 1. */
    static final class TwoState {
        private TwoState() {
        }

        static boolean applies(RationalMatrix p) {
            return p.rows() == 2 && p.get(0, 0).add(p.get(0, 1)).isOne() && p.get(1, 0).add(p.get(1, 1)).isOne();
        }

        /**
         * With {@code a = P[0][1] = alpha/d}, {@code b = P[1][0] = beta/d}, {@code s = alpha + beta} and
         * {@code mu = d - s} (so {@code 1 - a - b = mu/d}):
         * {@code P^n = [[beta d^n + alpha mu^n, alpha (d^n - mu^n)], [beta (d^n - mu^n), alpha d^n + beta mu^n]] /
         * (s d^n)}. Since {@code mu = d (mod s)}, {@code s} divides every numerator exactly.
         * If {@code s = 0} then {@code (P - I)^2 = 0} and {@code P^n = I + n (P - I)}.
         */
        static Rational[][] power(CommonDenominatorForm f, long n) {
            BigInteger d = f.d;
            BigInteger alpha = f.a.e[0][1];
            BigInteger beta = f.a.e[1][0];
            BigInteger s = alpha.add(beta);
            if (s.signum() == 0) {
                Rational nn = Rational.of(n);
                Rational a = Rational.of(alpha, d).multiply(nn);
                return new Rational[][] {{Rational.ONE.subtract(a), a}, {a.negate(), Rational.ONE.add(a)}};
            }
            BigInteger mu = d.subtract(s);
            BigInteger dn = pow(d, n);
            BigInteger mun = pow(mu, n);
            BigInteger diff = dn.subtract(mun).divide(s);
            BigInteger[] x = {
                beta.multiply(dn).add(alpha.multiply(mun)).divide(s), alpha.multiply(diff),
                beta.multiply(diff), alpha.multiply(dn).add(beta.multiply(mun)).divide(s)};
            KnownDenominator den = KnownDenominator.power(d, n, dn);
            return new Rational[][] {{den.reduce(x[0]), den.reduce(x[1])}, {den.reduce(x[2]), den.reduce(x[3])}};
        }
    }

    /** {@code b^n} for a long exponent; exponents past the int range only for {@code b} in {-1, 0, 1}. */
    static BigInteger pow(BigInteger b, long n) {
        if (b.signum() == 0) {
            return n == 0 ? BigInteger.ONE : BigInteger.ZERO;
        }
        if (b.abs().equals(BigInteger.ONE)) {
            return b.signum() < 0 && (n & 1) != 0 ? b : BigInteger.ONE;
        }
        return BigMath.pow(b, Math.toIntExact(n));
    }
}
