package org.qchain.exact.certified;

import java.math.BigInteger;
import java.util.ArrayDeque;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import org.qchain.exact.Progress;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.SparseRationalMatrix;

/**
 * Certified decimals of the transition probabilities {@code P(t) = exp(Qt)} of a continuous-time chain with a
 * rational generator {@code Q} at a rational time {@code t}: every printed digit is proven.
 *
 * <p>Method: uniformization and scaling and squaring on fixed-point lower and upper bounds. With
 * {@code Λ = max_i |q_ii|} the uniformized matrix {@code U = I + Q/Λ} is stochastic and non-negative, and
 * {@code P(h) = Σ_k e^(-Λh) (Λh)^k / k! U^k} (Jensen's uniformization: W. K. Grassmann, "Transient solutions in
 * Markovian queueing systems", Computers and Operations Research 4, 1977; from memory). For a small step
 * {@code h = t / 2^s} with {@code y = Λh <= 2^-r} the series is cut after {@code K} terms; the tail, whose weight is
 * at most {@code y^(K+1)/(K+1)!} (since {@code Σ_{k>K} y^k/k! <= y^(K+1)/(K+1)! e^y}), is added to the upper bound of
 * every entry that can be reached at all. {@code e^(-y)} is enclosed by two consecutive partial sums of its
 * alternating series (terms decrease for {@code y < 1}). Every product of non-negative bounds is rounded down for
 * the lower and up for the upper matrix, so the bounds stay valid through the {@code s} squarings
 * {@code P(t) = P(h)^(2^s)}; upper bounds are capped at 1. An entry that cannot be reached is an exact zero, and the
 * row of a state with no way out is exactly the unit row.
 *
 * <p>The decimals are settled by {@link Ziv}'s strategy: the working precision doubles until both ends of each
 * enclosure round alike (no exact fall-back exists: such entries are transcendental in general).
 */
public final class CertifiedTransient {
    private final int n;
    private final Rational t;
    private final Rational lambda;
    private final SparseRationalMatrix uniformized;
    private final boolean[][] reach;
    private final boolean[] stays;

    private CertifiedTransient(int n, Rational t, Rational lambda, SparseRationalMatrix uniformized,
                               boolean[][] reach, boolean[] stays) {
        this.n = n;
        this.t = t;
        this.lambda = lambda;
        this.uniformized = uniformized;
        this.reach = reach;
        this.stays = stays;
    }

    /**
     * Prepares {@code P(t)} for a generator.
     *
     * @param q a generator: square, off-diagonal entries non-negative, rows summing to 0
     * @param t the time, {@code >= 0}
     * @return the plan, which encloses {@code P(t)} at any working precision
     * @throws IllegalArgumentException if {@code q} is not a generator or {@code t < 0}
     */
    public static CertifiedTransient of(RationalMatrix q, Rational t) {
        if (!q.isSquare()) {
            throw new IllegalArgumentException("generator is not square");
        }
        if (t.signum() < 0) {
            throw new IllegalArgumentException("negative time " + t);
        }
        int n = q.rows();
        Rational lambda = Rational.ZERO;
        for (int i = 0; i < n; i++) {
            Rational sum = Rational.ZERO;
            for (int j = 0; j < n; j++) {
                Rational v = q.get(i, j);
                if (i != j && v.signum() < 0) {
                    throw new IllegalArgumentException("negative rate at (" + i + ", " + j + ")");
                }
                sum = sum.add(v);
            }
            if (!sum.isZero()) {
                throw new IllegalArgumentException("row " + i + " of the generator sums to " + sum);
            }
            lambda = lambda.max(q.get(i, i).negate());
        }
        SparseRationalMatrix u = SparseRationalMatrix.of(uniformizedMatrix(q, lambda.isZero() ? Rational.ONE : lambda));
        boolean[] stays = new boolean[n];
        for (int i = 0; i < n; i++) {
            stays[i] = q.get(i, i).isZero();
        }
        return new CertifiedTransient(n, t, lambda, u, closure(u), stays);
    }

    /**
     * The uniformized chain {@code I + Q/rate}, a stochastic matrix.
     *
     * @param q    a generator
     * @param rate the uniformization rate, at least {@code max_i |q_ii|} and positive
     * @return the discrete chain's transition matrix
     * @throws IllegalArgumentException if the rate is below some {@code |q_ii|} or not positive
     */
    public static RationalMatrix uniformizedMatrix(RationalMatrix q, Rational rate) {
        int n = q.rows();
        if (rate.signum() <= 0) {
            throw new IllegalArgumentException("the uniformization rate must be positive");
        }
        Rational[][] a = new Rational[n][n];
        for (int i = 0; i < n; i++) {
            if (q.get(i, i).negate().compareTo(rate) > 0) {
                throw new IllegalArgumentException("rate " + rate + " is below the total rate " + q.get(i, i).negate());
            }
            for (int j = 0; j < n; j++) {
                Rational v = q.get(i, j).divide(rate);
                a[i][j] = i == j ? Rational.ONE.add(v) : v;
            }
        }
        return RationalMatrix.of(a);
    }

    /** The time. */
    public Rational time() {
        return t;
    }

    /** The uniformization rate {@code Λ = max_i |q_ii|} (0 for a chain without transitions). */
    public Rational rate() {
        return lambda;
    }

    /**
     * Rounds every entry of {@code P(t)} correctly to {@code digits} significant digits.
     *
     * @param digits  significant digits, at least 1
     * @param maxBits the largest working precision, at least 64
     * @return the decimals, by row
     * @throws org.qchain.exact.QchainException with {@code INTERRUPTED} if the thread is interrupted
     */
    public CertifiedDecimal[][] decimals(int digits, int maxBits) {
        return unflatten(rounded(bits -> flatten(enclose(bits, Progress.NONE)), smallestEntryBits(List.of(t)),
            digits, maxBits), n, 1)[0];
    }

    /**
     * Fixed point bounds the absolute error, but digits are significant: a probe at low precision finds the smallest
     * entry, and the first real attempt carries enough bits for it (Ziv's loop still decides).
     */
    private static CertifiedDecimal[] rounded(Ziv.Enclosing source, int smallest, int digits, int maxBits) {
        int start = Math.min(Math.max(startBits(digits), maxBits), startBits(digits) + smallest);
        return Ziv.round(source, digits, start, Math.max(start, maxBits), Optional::empty);
    }

    /** Flat decimals of {@code times} matrices of {@code n × n}, by time and row. */
    private static CertifiedDecimal[][][] unflatten(CertifiedDecimal[] flat, int n, int times) {
        CertifiedDecimal[][][] out = new CertifiedDecimal[times][n][];
        for (int k = 0; k < times; k++) {
            for (int i = 0; i < n; i++) {
                out[k][i] = Arrays.copyOfRange(flat, (k * n + i) * n, (k * n + i + 1) * n);
            }
        }
        return out;
    }

    /**
     * Rounds every entry of {@code P(t)} correctly to {@code digits} significant digits at several times, sharing
     * the work: with {@code g} the greatest common divisor of the times ({@code t_k = m_k g}, {@code m_k} integers),
     * {@code P(g)} is enclosed once, its squares {@code P(2^i g)} once, and each {@code P(m_k g)} is the product of
     * the squares on the bits of {@code m_k}, or the square of {@code P(m_k g / 2)} when that time is also asked for
     * (binary powering; the semigroup property {@code P(s+t) = P(s)P(t)},
     * common practice, no source). Products of non-negative bounds stay bounds, so the enclosures are as rigorous as
     * one time's. Where sharing would cost more products than computing each time alone (times with a tiny common
     * divisor), each time is computed alone.
     *
     * @param q        a generator
     * @param times    the times, each {@code >= 0}
     * @param digits   significant digits, at least 1
     * @param maxBits  the largest working precision, at least 64
     * @param progress receives one report per product
     * @return the decimals, by time (in the order given) and row
     * @throws IllegalArgumentException if {@code q} is not a generator or a time is negative
     * @throws org.qchain.exact.QchainException with {@code INTERRUPTED} if the thread is interrupted
     */
    public static CertifiedDecimal[][][] decimals(RationalMatrix q, List<Rational> times, int digits, int maxBits,
                                                  Progress progress) {
        Optional<SharedTimes> shared = SharedTimes.of(q, times);
        if (shared.isEmpty()) {
            CertifiedDecimal[][][] out = new CertifiedDecimal[times.size()][][];
            for (int k = 0; k < times.size(); k++) {
                out[k] = of(q, times.get(k)).decimals(digits, maxBits);
                progress.update("times", k + 1, times.size());
            }
            return out;
        }
        SharedTimes plan = shared.get();
        return unflatten(rounded(bits -> plan.enclose(bits, progress), plan.base.smallestEntryBits(times), digits,
            maxBits), q.rows(), times.size());
    }

    /**
     * The estimated work of {@link #decimals(RationalMatrix, List, int, int, Progress)} at its first working
     * precision: multiplications of fixed-point numbers, counting {@code K} sparse products of the series
     * ({@code n × nonzeros} each) and every squaring or product of bound matrices as dense ({@code 2 n^3}: lower and
     * upper bounds; fill-in makes them dense soon). The probe of the smallest entry and the Ziv rounds after the
     * first are not counted; the first round is usually the only one.
     *
     * @param q      a generator
     * @param times  the times, each {@code >= 0}
     * @param digits significant digits, at least 1
     * @return the estimate, with the figures it is made of
     */
    public static WorkEstimate estimate(RationalMatrix q, List<Rational> times, int digits) {
        int bits = startBits(digits);
        Optional<SharedTimes> shared = SharedTimes.of(q, times);
        double work = 0;
        CertifiedTransient any = of(q, Rational.ZERO);
        double n = any.n;
        double nnz = any.uniformized.nonZeroCount();
        double most = 0;
        for (Rational t : times) {
            most = Math.max(most, any.lambda.multiply(t).doubleValue());
        }
        if (shared.isPresent()) {
            SharedTimes plan = shared.get();
            long products = plan.squarings;
            for (BigInteger m : plan.multiples) {
                products += Math.max(0, m.bitCount() - 1);
            }
            work = plan.base.stepWork(bits) + 2 * n * n * n * products;
        } else {
            for (Rational t : times) {
                work += of(q, t).stepWork(bits);
            }
        }
        return new WorkEstimate(work, bits, any.n, (long) nnz, times.size(), most);
    }

    /**
     * An estimate of the work of {@code P(t)}.
     *
     * @param multiplications fixed-point multiplications
     * @param bits            their working precision
     * @param states          the states
     * @param rates           stored entries of the uniformized matrix
     * @param times           the times
     * @param largestRateTime the largest {@code Λt}
     */
    public record WorkEstimate(double multiplications, int bits, int states, long rates, int times,
                               double largestRateTime) {
        /**
         * A number of this estimate in two significant digits, as the refusals print it ({@code 6.8e2}).
         *
         * @param x a figure of the estimate
         * @return its text
         */
        public static String roughly(double x) {
            return CertifiedPowers.roughly(x);
        }
    }

    /** The series and squarings of this time at {@code bits} bits: multiplications. */
    private double stepWork(int bits) {
        Rational x = lambda.multiply(t);
        if (x.isZero()) {
            return 0;
        }
        Step step = Step.choose(x, bits, n, uniformized.nonZeroCount());
        double dn = n;
        return 2 * (step.terms * dn * uniformized.nonZeroCount() + step.s * dn * dn * dn);
    }

    /** Several times as multiples of one base step (see the static {@code decimals} for several times). */
    private record SharedTimes(CertifiedTransient base, BigInteger[] multiples, int squarings) {
        /** The most bits a multiple may have before sharing is not tried. */
        private static final int MAX_MULTIPLE_BITS = 64;

        static Optional<SharedTimes> of(RationalMatrix q, List<Rational> times) {
            if (times.size() < 2) {
                return Optional.empty();
            }
            BigInteger num = BigInteger.ZERO;
            BigInteger den = BigInteger.ONE;
            for (Rational t : times) {
                if (t.signum() < 0) {
                    throw new IllegalArgumentException("negative time " + t);
                }
                if (t.signum() > 0) {
                    // gcd(a/b, c/d) = gcd(a, c) / lcm(b, d) for fractions in lowest terms
                    num = num.gcd(t.numerator());
                    den = den.divide(den.gcd(t.denominator())).multiply(t.denominator());
                }
            }
            if (num.signum() == 0) {
                return Optional.empty();
            }
            Rational g = Rational.of(num, den);
            CertifiedTransient base = CertifiedTransient.of(q, g);
            if (base.lambda.isZero()) {
                return Optional.empty();
            }
            BigInteger[] m = new BigInteger[times.size()];
            int top = 0;
            long products = 0;
            double alone = 0;
            for (int k = 0; k < m.length; k++) {
                Rational r = times.get(k).divide(g);
                m[k] = r.numerator();
                top = Math.max(top, m[k].bitLength());
                products += Math.max(0, m[k].bitCount() - 1);
                double x = base.lambda.multiply(times.get(k)).doubleValue();
                alone += Math.max(0, Math.ceil(Math.log(Math.max(x, 1e-300)) / Math.log(2)) + 4);
            }
            int squarings = Math.max(0, top - 1);
            double baseCost = Math.max(0, Math.ceil(Math.log(base.lambda.multiply(g).doubleValue()) / Math.log(2)) + 4);
            if (top > MAX_MULTIPLE_BITS || baseCost + squarings + products > alone) {
                return Optional.empty();
            }
            return Optional.of(new SharedTimes(base, m, squarings));
        }

        /** Enclosures of every entry at every time, flat by time and row. */
        Enclosure[] enclose(int bits, Progress progress) {
            int n = base.n;
            int extra = squarings + 2 + 32 - Integer.numberOfLeadingZeros(multiples.length);
            Thread caller = Thread.currentThread();
            FixedPointBounds[] powers = new FixedPointBounds[squarings + 1];
            powers[0] = base.bounds(bits, extra, caller);
            int done = 0;
            int total = squarings + multiples.length;
            for (int i = 1; i <= squarings; i++) {
                powers[i] = powers[i - 1].multiply(powers[i - 1], caller);
                capAtOne(powers[i]);
                progress.update("products", ++done, total);
            }
            Enclosure[] out = new Enclosure[multiples.length * n * n];
            // P(m g) already at hand: the squares, and each time's result (so P(2m g) is one squaring of P(m g))
            java.util.Map<BigInteger, FixedPointBounds> known = new java.util.HashMap<>();
            for (int i = 0; i <= squarings; i++) {
                known.put(BigInteger.ONE.shiftLeft(i), powers[i]);
            }
            Integer[] order = new Integer[multiples.length];
            for (int k = 0; k < order.length; k++) {
                order[k] = k;
            }
            Arrays.sort(order, (a, b) -> multiples[a].compareTo(multiples[b]));
            for (int k : order) {
                BigInteger m = multiples[k];
                FixedPointBounds p = known.get(m);
                FixedPointBounds half = m.testBit(0) ? null : known.get(m.shiftRight(1));
                if (p == null && half != null) {
                    p = half.multiply(half, caller);
                    capAtOne(p);
                } else if (p == null) {
                    for (int i = 0; i < m.bitLength(); i++) {
                        if (m.testBit(i)) {
                            if (p == null) {
                                p = powers[i];
                            } else {
                                p = p.multiply(powers[i], caller);
                                capAtOne(p);
                            }
                        }
                    }
                }
                if (p != null) {
                    known.put(m, p);
                }
                for (int i = 0; i < n; i++) {
                    Enclosure[] row = p == null || base.stays[i] ? unitRow(n, i) : p.enclosures(i);
                    System.arraycopy(row, 0, out, (k * n + i) * n, n);
                }
                progress.update("products", ++done, total);
            }
            return out;
        }
    }

    private static Enclosure[] unitRow(int n, int i) {
        Enclosure[] row = new Enclosure[n];
        Arrays.fill(row, Enclosure.exact(Rational.ZERO));
        row[i] = Enclosure.exact(Rational.ONE);
        return row;
    }

    /**
     * {@code -log2} of the smallest entry of {@code P(t)} that can be positive, over the times, from the same
     * uniformization in binary64 (every term is non-negative, so there is no cancellation and tiny entries come out
     * with a good relative error). Only a starting precision: Ziv's loop decides the digits; an entry that
     * underflows counts as {@link #MAX_PROBE_BITS}.
     */
    private int smallestEntryBits(List<Rational> times) {
        int[][] uc = new int[n][];
        double[][] uv = new double[n][];
        for (int i = 0; i < n; i++) {
            uc[i] = uniformized.rowColumns(i);
            Rational[] v = uniformized.rowValues(i);
            uv[i] = new double[v.length];
            for (int k = 0; k < v.length; k++) {
                uv[i][k] = v[k].doubleValue();
            }
        }
        int most = 0;
        for (Rational time : times) {
            double x = lambda.multiply(time).doubleValue();
            if (x == 0) {
                continue;
            }
            int sq = Math.max(0, (int) Math.ceil(Math.log(x / 0.5) / Math.log(2)));
            double y = Math.scalb(x, -sq);
            double[][] p = new double[n][n];
            double[][] term = new double[n][n];
            for (int i = 0; i < n; i++) {
                term[i][i] = 1;
            }
            double weight = Math.exp(-y);
            for (int k = 0; k <= 40; k++) {
                if (k > 0) {
                    term = timesSparse(term, uc, uv);
                    weight *= y / k;
                }
                for (int i = 0; i < n; i++) {
                    for (int j = 0; j < n; j++) {
                        p[i][j] += weight * term[i][j];
                    }
                }
            }
            for (int k = 0; k < sq; k++) {
                p = times(p, p);
            }
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    if (reach[i][j] && !stays[i]) {
                        int b = p[i][j] > 0 ? Math.max(0, -Math.getExponent(p[i][j])) : MAX_PROBE_BITS;
                        most = Math.max(most, Math.min(b, MAX_PROBE_BITS));
                    }
                }
            }
        }
        return most;
    }

    /** {@code a b} for a sparse {@code b} (columns and values by row), in binary64. */
    private static double[][] timesSparse(double[][] a, int[][] bc, double[][] bv) {
        int n = a.length;
        double[][] c = new double[n][n];
        for (int i = 0; i < n; i++) {
            checkInterrupt();
            for (int k = 0; k < n; k++) {
                double x = a[i][k];
                if (x != 0) {
                    for (int q = 0; q < bc[k].length; q++) {
                        c[i][bc[k][q]] += x * bv[k][q];
                    }
                }
            }
        }
        return c;
    }

    /** {@code a b}, dense, in binary64. */
    private static double[][] times(double[][] a, double[][] b) {
        int n = a.length;
        double[][] c = new double[n][n];
        for (int i = 0; i < n; i++) {
            checkInterrupt();
            double[] ci = c[i];
            for (int k = 0; k < n; k++) {
                double x = a[i][k];
                if (x != 0) {
                    double[] bk = b[k];
                    for (int j = 0; j < n; j++) {
                        ci[j] += x * bk[j];
                    }
                }
            }
        }
        return c;
    }

    private static void checkInterrupt() {
        if (Thread.currentThread().isInterrupted()) {
            throw new org.qchain.exact.QchainException(org.qchain.exact.ErrorKey.INTERRUPTED);
        }
    }

    /** The probe's answer for an entry too small for binary64. */
    private static final int MAX_PROBE_BITS = 1024;

    /** A first working precision for {@code digits} decimal digits, with guard bits. */
    public static int startBits(int digits) {
        return (int) Math.ceil(digits * 3.33) + 24;
    }

    /** The widest enclosure among decimals (the bound on every printed value's error before rounding). */
    public static Rational widest(CertifiedDecimal[][] d) {
        Rational w = Rational.ZERO;
        for (CertifiedDecimal[] row : d) {
            for (CertifiedDecimal x : row) {
                w = w.max(x.enclosure().width());
            }
        }
        return w;
    }

    static Enclosure[] flatten(Enclosure[][] e) {
        Enclosure[] out = new Enclosure[e.length * e.length];
        for (int i = 0; i < e.length; i++) {
            System.arraycopy(e[i], 0, out, i * e.length, e.length);
        }
        return out;
    }

    /**
     * Enclosures of every entry of {@code P(t)} at a working precision of about {@code bits} bits.
     *
     * @param bits     the precision, at least 1
     * @param progress receives one report per squaring
     * @return the enclosures, by row
     */
    public Enclosure[][] enclose(int bits, Progress progress) {
        Enclosure[][] out = new Enclosure[n][n];
        Rational x = lambda.multiply(t);
        if (x.isZero()) {
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    out[i][j] = Enclosure.exact(i == j ? Rational.ONE : Rational.ZERO);
                }
            }
            return out;
        }
        Step step = Step.choose(x, bits, n, uniformized.nonZeroCount());
        FixedPointBounds p = bounds(step, bits, 0, Thread.currentThread(), progress);
        for (int i = 0; i < n; i++) {
            out[i] = stays[i] ? unitRow(n, i) : p.enclosures(i);
        }
        return out;
    }

    /** The bounds of {@code P(t)} (rows of states without a way out not yet made exact), {@code extra} guard bits. */
    private FixedPointBounds bounds(int bits, int extra, Thread caller) {
        Step step = Step.choose(lambda.multiply(t), bits + extra, n, uniformized.nonZeroCount());
        return bounds(step, bits, extra, caller, Progress.NONE);
    }

    private FixedPointBounds bounds(Step step, int bits, int extra, Thread caller, Progress progress) {
        int w = bits + extra + step.s + 32 - Integer.numberOfLeadingZeros(n) + 4;
        FixedPointBounds p = smallStep(step, w, caller);
        for (int k = 0; k < step.s; k++) {
            p = p.multiply(p, caller);
            capAtOne(p);
            progress.update("squaring", k + 1, step.s);
        }
        return p;
    }

    /** The scaling: {@code s} squarings of a step {@code y = x / 2^s}, the series cut after {@code K} terms. */
    private record Step(int s, int terms, Rational y) {
        /** Chooses the split that needs the fewest entry multiplications (a rough cost model). */
        static Step choose(Rational x, int bits, int n, long nnz) {
            double lx = Math.log(x.doubleValue()) / Math.log(2);
            Step best = null;
            double bestCost = Double.MAX_VALUE;
            for (int r = 1; r <= 16; r++) {
                int s = (int) Math.max(0, Math.ceil(lx + r));
                Rational y = x.divide(Rational.of(BigInteger.ONE.shiftLeft(s)));
                int k = terms(y.doubleValue(), bits + s + 8);
                double cost = (double) k * n * nnz + (double) s * n * n * n;
                if (cost < bestCost) {
                    bestCost = cost;
                    best = new Step(s, k, y);
                }
            }
            return best;
        }

        /** The smallest K with {@code y^(K+1)/(K+1)! <= 2^-bits}, by logarithms (the bound itself is exact). */
        static int terms(double y, int bits) {
            double log2 = 0;
            double ly = Math.log(y) / Math.log(2);
            int k = 0;
            while (true) {
                log2 += ly - Math.log(k + 1) / Math.log(2);
                if (log2 <= -bits) {
                    return k;
                }
                k++;
            }
        }
    }

    /** Bounds of {@code P(h) = e^(-y) Σ_{k<=K} y^k/k! U^k + tail}, in fixed point with {@code w} fraction bits. */
    private FixedPointBounds smallStep(Step step, int w, Thread caller) {
        Rational y = step.y;
        int big = step.terms;
        // e^(-y) between two consecutive partial sums of the alternating series
        Rational term = Rational.ONE;
        Rational sum = Rational.ONE;
        Rational prev = sum;
        int m = 0;
        Rational tol = Rational.of(BigInteger.ONE, BigInteger.ONE.shiftLeft(w + 2));
        while (m < 2 || term.abs().compareTo(tol) > 0) {
            m++;
            term = term.multiply(y).divide(Rational.of(-m));
            prev = sum;
            sum = sum.add(term);
        }
        Rational eLo = prev.min(sum);
        Rational eHi = prev.max(sum);
        BigInteger scale = BigInteger.ONE.shiftLeft(w);
        // identity bounds, then T <- T U, accumulating c_k T
        int[][] tc = new int[n][];
        BigInteger[][] tl = new BigInteger[n][];
        BigInteger[][] th = new BigInteger[n][];
        BigInteger[][] accLo = new BigInteger[n][n];
        BigInteger[][] accHi = new BigInteger[n][n];
        for (int i = 0; i < n; i++) {
            tc[i] = new int[] {i};
            tl[i] = new BigInteger[] {scale};
            th[i] = new BigInteger[] {scale};
            Arrays.fill(accLo[i], BigInteger.ZERO);
            Arrays.fill(accHi[i], BigInteger.ZERO);
        }
        FixedPointBounds tk = FixedPointBounds.ofRows(n, w, tc, tl, th);
        FixedPointBounds u = FixedPointBounds.of(uniformized, w);
        Rational weight = Rational.ONE; // y^k / k!
        for (int k = 0; k <= big; k++) {
            if (k > 0) {
                tk = tk.multiply(u, caller);
                weight = weight.multiply(y).divide(Rational.of(k));
            }
            BigInteger cLo = floor(eLo.multiply(weight), w);
            BigInteger cHi = ceil(eHi.multiply(weight), w);
            for (int i = 0; i < n; i++) {
                int[] c = tk.cols[i];
                for (int q = 0; q < c.length; q++) {
                    int j = c[q];
                    accLo[i][j] = accLo[i][j].add(cLo.multiply(tk.lo[i][q]).shiftRight(w));
                    BigInteger h = cHi.multiply(tk.hi[i][q]);
                    accHi[i][j] = accHi[i][j].add(h.add(scale).subtract(BigInteger.ONE).shiftRight(w));
                }
            }
        }
        BigInteger tail = ceil(weight.multiply(y).divide(Rational.of(big + 1)), w);
        int[][] cols = new int[n][];
        BigInteger[][] lo = new BigInteger[n][];
        BigInteger[][] hi = new BigInteger[n][];
        for (int i = 0; i < n; i++) {
            int count = 0;
            for (int j = 0; j < n; j++) {
                count += reach[i][j] ? 1 : 0;
            }
            cols[i] = new int[count];
            lo[i] = new BigInteger[count];
            hi[i] = new BigInteger[count];
            int k = 0;
            for (int j = 0; j < n; j++) {
                if (reach[i][j]) {
                    cols[i][k] = j;
                    lo[i][k] = accLo[i][j];
                    hi[i][k] = accHi[i][j].add(tail).min(scale);
                    k++;
                }
            }
        }
        return FixedPointBounds.ofRows(n, w, cols, lo, hi);
    }

    private static void capAtOne(FixedPointBounds p) {
        BigInteger scale = BigInteger.ONE.shiftLeft(p.w);
        for (BigInteger[] row : p.hi) {
            for (int k = 0; k < row.length; k++) {
                if (row[k].compareTo(scale) > 0) {
                    row[k] = scale;
                }
            }
        }
    }

    private static BigInteger floor(Rational r, int w) {
        return r.numerator().shiftLeft(w).divide(r.denominator());
    }

    private static BigInteger ceil(Rational r, int w) {
        BigInteger[] qr = r.numerator().shiftLeft(w).divideAndRemainder(r.denominator());
        return qr[1].signum() == 0 ? qr[0] : qr[0].add(BigInteger.ONE);
    }

    /** Which states each state can reach (itself included), by a search per row. */
    private static boolean[][] closure(SparseRationalMatrix u) {
        int n = u.size();
        boolean[][] r = new boolean[n][n];
        ArrayDeque<Integer> queue = new ArrayDeque<>();
        for (int i = 0; i < n; i++) {
            r[i][i] = true;
            queue.add(i);
            while (!queue.isEmpty()) {
                int k = queue.poll();
                for (int j : u.rowColumns(k)) {
                    if (!r[i][j]) {
                        r[i][j] = true;
                        queue.add(j);
                    }
                }
            }
        }
        return r;
    }
}
