package org.qchain.exact.certified;

import java.math.BigInteger;
import java.util.ArrayDeque;
import java.util.Arrays;
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
        // Fixed point bounds the absolute error, but digits are significant: a probe at low precision finds the
        // smallest entry, and the first real attempt carries enough bits for it (Ziv's loop still decides)
        int start = Math.min(Math.max(startBits(digits), maxBits), startBits(digits) + smallestEntryBits());
        CertifiedDecimal[] flat = Ziv.round(bits -> flatten(enclose(bits, Progress.NONE)), digits,
            start, Math.max(start, maxBits), Optional::empty);
        CertifiedDecimal[][] out = new CertifiedDecimal[n][];
        for (int i = 0; i < n; i++) {
            out[i] = Arrays.copyOfRange(flat, i * n, (i + 1) * n);
        }
        return out;
    }

    /**
     * {@code -log2} of the smallest positive entry, from probes at low precision (64 bits, doubled while some
     * positive entry still has a zero lower bound, up to {@link #MAX_PROBE_BITS}); 0 if every entry is 1/2 or more.
     */
    private int smallestEntryBits() {
        for (int bits = PROBE_BITS; ; bits *= 2) {
            int most = 0;
            boolean unseen = false;
            for (Enclosure[] row : enclose(bits, Progress.NONE)) {
                for (Enclosure e : row) {
                    Rational lo = e.lo();
                    if (lo.signum() > 0) {
                        most = Math.max(most, (int) (lo.denominator().bitLength() - lo.numerator().bitLength()));
                    } else if (e.hi().signum() > 0) {
                        unseen = true;
                    }
                }
            }
            if (!unseen || bits >= MAX_PROBE_BITS) {
                return unseen ? Math.max(most, bits) : most;
            }
        }
    }

    /** The first working precision of the probes for the entries' sizes. */
    private static final int PROBE_BITS = 64;
    /** The probes stop here. */
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
        int w = bits + step.s + 32 - Integer.numberOfLeadingZeros(n) + 4;
        Thread caller = Thread.currentThread();
        FixedPointBounds p = smallStep(step, w, caller);
        for (int k = 0; k < step.s; k++) {
            p = p.multiply(p, caller);
            capAtOne(p);
            progress.update("squaring", k + 1, step.s);
        }
        for (int i = 0; i < n; i++) {
            if (stays[i]) {
                Arrays.fill(out[i], Enclosure.exact(Rational.ZERO));
                out[i][i] = Enclosure.exact(Rational.ONE);
            } else {
                out[i] = p.enclosures(i);
            }
        }
        return out;
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
