package org.qchain.exact.ctmc;

import java.math.BigInteger;
import java.util.ArrayDeque;
import java.util.Optional;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.Progress;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.certified.CertifiedDecimal;
import org.qchain.exact.certified.CertifiedTransient;
import org.qchain.exact.certified.Enclosure;
import org.qchain.exact.certified.Ziv;

/**
 * Certified decimals of one transition probability {@code P_ij(t) = (exp(Qt))_ij} of a continuous chain and of its
 * derivative with respect to a parameter θ of the rates, at a rational point and time: every printed digit proven.
 *
 * <p>Method: uniformization at a rate {@code Λ} fixed in θ (the largest exit rate at the point). With
 * {@code P = I + Q/Λ} (stochastic) and Poisson weights {@code w_k = e^(-Λt) (Λt)^k / k!},
 * {@code exp(Qt) = Σ_k w_k P^k} (Jensen's uniformization: W. K. Grassmann, "Transient solutions in Markovian
 * queueing systems", Computers and Operations Research 4, 1977; from memory). The weights do not depend on θ, so
 * {@code d/dθ exp(Qt) = Σ_k w_k d(P^k)} with {@code d(P^k) = d(P^(k-1)) P + P^(k-1) D} and {@code D = Q'/Λ}
 * ({@code Q'} the entrywise derivative of the generator, exact): for row {@code i}, {@code a_k = e_i P^k} and
 * {@code b_k = e_i d(P^k)} follow {@code a_k = a_(k-1) P}, {@code b_k = b_(k-1) P + a_(k-1) D} (the product rule;
 * common practice, no source). Bounds of the cut series: {@code a_k} is a probability vector, so
 * {@code ||b_k||_1 <= k ||D||_inf} (each term of the sum {@code Σ_(j<k) P^j D P^(k-1-j)} maps a probability row to
 * one of 1-norm at most {@code ||D||_inf}, and stochastic matrices keep the 1-norm), and with {@code k w_k = Λt
 * w_(k-1)} the derivative's tail after {@code K} terms is at most {@code ||D||_inf Λt Σ_(m>=K) w_m}; the value's tail
 * is {@code Σ_(k>K) w_k}; both sums are bounded by a geometric series once {@code K + 1 > Λt}:
 * {@code Σ_(m>=K) w_m <= w_K / (1 - Λt/(K+1))}. {@code e^(-Λt)} is enclosed by {@code 1/(S+T) <= e^(-x) <= 1/S} with
 * {@code S} a partial sum of {@code e^x} and {@code T} the same geometric bound of its tail, the weights exactly
 * from it and rounded outwards; the vectors are intervals in fixed point, every product rounded outwards. The
 * decimals are settled by {@link Ziv}'s loop, the precision doubling until the ends of each enclosure round alike.
 */
public final class TransientSensitivity {
    private TransientSensitivity() {
    }

    /**
     * The certified value, derivative and elasticity.
     *
     * @param value      {@code P_ij(t)}
     * @param derivative {@code dP_ij(t)/dθ}
     * @param elasticity {@code (θ/P) dP/dθ}; empty when {@code P_ij(t)} is exactly 0
     * @param rate       the uniformization rate {@code Λ}
     * @param terms      the terms of the series at the first precision
     */
    public record Result(CertifiedDecimal value, CertifiedDecimal derivative, Optional<CertifiedDecimal> elasticity,
                         Rational rate, int terms) {
    }

    /**
     * The estimated work at the first precision: {@code K} steps, each {@code 4 (2 nnz(P) + nnz(D))} multiplications
     * of numbers of about {@code bits} bits (interval products: four each), plus the weights.
     *
     * @param multiplications multiplications of fixed-point numbers
     * @param bits            their precision
     * @param terms           the terms of the series
     * @param states          the states
     * @param entries         stored entries of {@code P} and {@code D}
     * @param rateTime        {@code Λt}
     */
    public record Work(double multiplications, int bits, int terms, int states, long entries, double rateTime) {
    }

    /**
     * Estimates the work before any is done.
     *
     * @param q      the generator at the point
     * @param dq     its derivative
     * @param t      the time
     * @param digits significant digits
     * @return the estimate
     */
    public static Work estimate(RationalMatrix q, RationalMatrix dq, Rational t, int digits) {
        int bits = startBits(digits);
        Rational lambda = rate(q);
        double x = lambda.multiply(t).doubleValue();
        int terms = x == 0 ? 0 : termsFor(x, bits + 8);
        long nnz = 0;
        for (int i = 0; i < q.rows(); i++) {
            for (int j = 0; j < q.cols(); j++) {
                nnz += (q.get(i, j).isZero() && !(i == j) ? 0 : 1) + (dq.get(i, j).isZero() ? 0 : 1);
            }
        }
        double work = 4.0 * terms * (nnz + q.rows() * 2.0) + 4.0 * terms;
        return new Work(work, bits, terms, q.rows(), nnz, x);
    }

    /**
     * Certified {@code P_ij(t)}, its derivative and its elasticity.
     *
     * @param q       the generator at the point
     * @param dq      its entrywise derivative with respect to θ
     * @param theta   the value of θ at the point (for the elasticity)
     * @param t       the time, {@code >= 0}
     * @param from    the row {@code i}
     * @param to      the column {@code j}
     * @param digits  significant digits, at least 1
     * @param maxBits  the largest working precision
     * @param progress told about the terms of the series (phase {@code terms})
     * @return the decimals
     * @throws QchainException with {@code INTERRUPTED} if the thread is interrupted
     */
    public static Result of(RationalMatrix q, RationalMatrix dq, Rational theta, Rational t, int from, int to,
                            int digits, int maxBits, Progress progress) {
        Rational lambda = rate(q);
        boolean reachable = reaches(q, from, to);
        boolean stays = q.get(from, from).isZero();
        // no rate that the chain can use from 'from' depends on θ: P(t)(from, .) does not either
        boolean constant = reachableNorm(q, dq, lambda, from).isZero();
        int start = startBits(digits);
        int max = Math.max(start, maxBits);
        Ziv.Enclosing src = bits -> {
            Enclosure[] vd = enclose(q, dq, lambda, t, from, to, bits, progress);
            if (!reachable) {
                // the entry is exactly 0 at the point; its derivative need not be
                return new Enclosure[] {Enclosure.exact(Rational.ZERO), vd[1]};
            }
            if (stays) {
                // no way out of 'from' at the point: its row is the unit row exactly, as in CertifiedTransient
                vd[0] = Enclosure.exact(from == to ? Rational.ONE : Rational.ZERO);
            }
            if (constant) {
                return new Enclosure[] {vd[0], Enclosure.exact(Rational.ZERO), Enclosure.exact(Rational.ZERO)};
            }
            return new Enclosure[] {vd[0], vd[1], ratio(theta, vd[1], vd[0], bits)};
        };
        CertifiedDecimal[] d = Ziv.round(src, digits, start, max, Optional::empty);
        double x = lambda.multiply(t).doubleValue();
        return new Result(d[0], d[1], d.length > 2 ? Optional.of(d[2]) : Optional.empty(), lambda,
            x == 0 ? 0 : termsFor(x, start + 8));
    }

    /**
     * As {@link #of(RationalMatrix, RationalMatrix, Rational, Rational, int, int, int, int, Progress)} for a model:
     * the generator and its derivative at the point.
     *
     * @param model  a continuous model
     * @param values the point (nominal values fill in)
     * @param param  θ
     * @param t      the time
     * @param from   the row
     * @param to     the column
     * @param digits significant digits
     * @param maxBits  the largest working precision
     * @param progress told about the terms
     * @return the decimals
     * @throws QchainException BAD_ARGUMENT for an unknown parameter; as the rates' evaluation
     */
    public static Result of(org.qchain.exact.model.Model model, java.util.Map<String, Rational> values, String param,
                            Rational t, int from, int to, int digits, int maxBits, Progress progress) {
        RationalMatrix[] qd = generatorAndDerivative(model, values, param);
        Rational theta = org.qchain.exact.model.Chains.effectiveValues(model, values).getOrDefault(param, Rational.ZERO);
        return of(qd[0], qd[1], theta, t, from, to, digits, maxBits, progress);
    }

    /**
     * The work estimate for a model.
     *
     * @param model  a continuous model
     * @param values the point
     * @param param  θ
     * @param t      the time
     * @param digits significant digits
     * @return the estimate
     */
    public static Work estimate(org.qchain.exact.model.Model model, java.util.Map<String, Rational> values,
                                String param, Rational t, int digits) {
        RationalMatrix[] qd = generatorAndDerivative(model, values, param);
        return estimate(qd[0], qd[1], t, digits);
    }

    private static RationalMatrix[] generatorAndDerivative(org.qchain.exact.model.Model model,
                                                           java.util.Map<String, Rational> values, String param) {
        if (model.param(param).isEmpty()) {
            throw new QchainException(ErrorKey.BAD_ARGUMENT, "--wrt", param, "the model declares no such parameter");
        }
        java.util.Map<String, Rational> env = org.qchain.exact.model.Chains.effectiveValues(model, values);
        return new RationalMatrix[] {org.qchain.exact.model.Chains.transitionMatrix(model, values),
            RateSensitivity.derivative(model, env, param)};
    }

    /** The first working precision for {@code digits}. */
    static int startBits(int digits) {
        return CertifiedTransient.startBits(digits) + 16;
    }

    /** {@code θ d / p} for {@code p > 0}; a wide interval if {@code p}'s enclosure reaches 0. */
    private static Enclosure ratio(Rational theta, Enclosure d, Enclosure p, int bits) {
        if (p.lo().signum() <= 0) {
            Rational big = Rational.of(BigInteger.ONE.shiftLeft(bits));
            return Enclosure.of(big.negate(), big);
        }
        Rational lo = d.lo().divide(p.lo()).min(d.lo().divide(p.hi()));
        Rational hi = d.hi().divide(p.lo()).max(d.hi().divide(p.hi()));
        lo = theta.multiply(lo);
        hi = theta.multiply(hi);
        return Enclosure.of(lo.min(hi), lo.max(hi));
    }

    private static Rational rate(RationalMatrix q) {
        Rational lambda = Rational.ZERO;
        for (int i = 0; i < q.rows(); i++) {
            lambda = lambda.max(q.get(i, i).negate());
        }
        return lambda.isZero() ? Rational.ONE : lambda;
    }

    private static boolean reaches(RationalMatrix q, int from, int to) {
        return reachable(q, from)[to];
    }

    /** The states reachable from {@code from} (itself included) in the rate graph at the point. */
    private static boolean[] reachable(RationalMatrix q, int from) {
        boolean[] seen = new boolean[q.rows()];
        ArrayDeque<Integer> queue = new ArrayDeque<>();
        seen[from] = true;
        queue.add(from);
        while (!queue.isEmpty()) {
            int k = queue.poll();
            for (int j = 0; j < q.cols(); j++) {
                if (j != k && !seen[j] && q.get(k, j).signum() > 0) {
                    seen[j] = true;
                    queue.add(j);
                }
            }
        }
        return seen;
    }

    /**
     * {@code max_i ||D_i||_1} over the rows {@code i} reachable from {@code from}, {@code D = Q'/Λ}: the rows that
     * {@code a_k} can weight, so the bound {@code ||b_k||_1 <= k ||D||} holds with it.
     */
    private static Rational reachableNorm(RationalMatrix q, RationalMatrix dq, Rational lambda, int from) {
        boolean[] r = reachable(q, from);
        Rational norm = Rational.ZERO;
        for (int i = 0; i < q.rows(); i++) {
            if (r[i]) {
                Rational sum = Rational.ZERO;
                for (int j = 0; j < q.cols(); j++) {
                    sum = sum.add(dq.get(i, j).abs());
                }
                norm = norm.max(sum.divide(lambda));
            }
        }
        return norm;
    }

    /** The smallest {@code K > x} whose tail estimate {@code e^-x x^K/K! (K+1)/(K+1-x) (1 + x)} is below 2^-bits. */
    static int termsFor(double x, int bits) {
        double logw = -x / Math.log(2);
        double l2x = Math.log(x) / Math.log(2);
        int k = 0;
        while (true) {
            if (k > 0) {
                logw += l2x - Math.log(k) / Math.log(2);
            }
            if (k > x + 1) {
                double geo = Math.log((k + 1.0) / (k + 1.0 - x)) / Math.log(2);
                if (logw + geo + Math.log(1 + x) / Math.log(2) + 4 <= -bits) {
                    return k;
                }
            }
            k++;
        }
    }

    /**
     * Enclosures of {@code P_ij(t)} and of its derivative at about {@code bits} bits.
     *
     * @return {value, derivative}
     */
    static Enclosure[] enclose(RationalMatrix q, RationalMatrix dq, Rational lambda, Rational t, int from, int to,
                               int bits, Progress progress) {
        int n = q.rows();
        Rational xr = lambda.multiply(t);
        if (xr.isZero()) {
            return new Enclosure[] {Enclosure.exact(from == to ? Rational.ONE : Rational.ZERO),
                Enclosure.exact(Rational.ZERO)};
        }
        double x = xr.doubleValue();
        int terms = termsFor(x, bits + 8);
        int w = bits + 16 + 2 * (32 - Integer.numberOfLeadingZeros(terms + 1)) + (32 - Integer.numberOfLeadingZeros(n));
        BigInteger scale = BigInteger.ONE.shiftLeft(w);
        // P = I + Q/Λ and D = Q'/Λ, as fixed-point intervals, by rows (sparse)
        Rational[][] p = CertifiedTransient.uniformizedMatrix(q, lambda).toArray();
        int[][] pc = new int[n][];
        BigInteger[][] pl = new BigInteger[n][];
        BigInteger[][] ph = new BigInteger[n][];
        int[][] dc = new int[n][];
        BigInteger[][] dl = new BigInteger[n][];
        BigInteger[][] dh = new BigInteger[n][];
        Rational dNorm = reachableNorm(q, dq, lambda, from);
        for (int i = 0; i < n; i++) {
            Rational[] drow = new Rational[n];
            for (int j = 0; j < n; j++) {
                drow[j] = dq.get(i, j).divide(lambda);
            }
            sparse(p[i], w, i, pc, pl, ph);
            sparse(drow, w, i, dc, dl, dh);
        }
        // e^-x between 1/(S+T) and 1/S: S = Σ_(m<=M) x^m/m!, T bounds the rest (M + 2 > x)
        BigInteger a = xr.numerator();
        BigInteger b = xr.denominator();
        BigInteger sNum = BigInteger.ONE; // S = sNum / sDen, the current term termNum / sDen
        BigInteger sDen = BigInteger.ONE;
        BigInteger termNum = BigInteger.ONE;
        int m = 0;
        BigInteger tNum;
        BigInteger tDen;
        while (true) {
            m++;
            // next term: term * x / m over the common denominator sDen * b * m
            BigInteger f = b.multiply(BigInteger.valueOf(m));
            termNum = termNum.multiply(a);
            sNum = sNum.multiply(f).add(termNum);
            sDen = sDen.multiply(f);
            if (m + 2 > x + 1) {
                // T = term * x/(m+1) / (1 - x/(m+2)) = term * a (m+2) / ((m+1) ((m+2) b - a))
                BigInteger den = BigInteger.valueOf(m + 1L).multiply(BigInteger.valueOf(m + 2L).multiply(b).subtract(a));
                if (den.signum() > 0) {
                    tNum = termNum.multiply(a).multiply(BigInteger.valueOf(m + 2L));
                    tDen = sDen.multiply(den);
                    // T / S <= 2^-(w + 8): tNum * sDen * 2^(w+8) <= tDen * sNum
                    if (tNum.multiply(sDen).shiftLeft(w + 8).compareTo(tDen.multiply(sNum)) <= 0) {
                        break;
                    }
                }
            }
        }
        // weights w_k = e^-x x^k / k!: lower from 1/(S+T), upper from 1/S; r_k = x^k/k! = rNum/rDen
        // 1/S = sDen/sNum; 1/(S+T) = sDen tDen / (sNum tDen + tNum sDen)
        // rounded outwards to about w + 64 significant bits, so that each weight is a small product
        BigInteger[] eLo = significant(sDen.multiply(tDen), sNum.multiply(tDen).add(tNum.multiply(sDen)), w + 64,
            false);
        BigInteger[] eHi = significant(sDen, sNum, w + 64, true);
        BigInteger rNum = BigInteger.ONE;
        BigInteger rDen = BigInteger.ONE;
        BigInteger[] aLo = new BigInteger[n];
        BigInteger[] aHi = new BigInteger[n];
        BigInteger[] bLo = new BigInteger[n];
        BigInteger[] bHi = new BigInteger[n];
        java.util.Arrays.fill(aLo, BigInteger.ZERO);
        java.util.Arrays.fill(aHi, BigInteger.ZERO);
        java.util.Arrays.fill(bLo, BigInteger.ZERO);
        java.util.Arrays.fill(bHi, BigInteger.ZERO);
        aLo[from] = scale;
        aHi[from] = scale;
        BigInteger vLo = BigInteger.ZERO;
        BigInteger vHi = BigInteger.ZERO;
        BigInteger gLo = BigInteger.ZERO;
        BigInteger gHi = BigInteger.ZERO;
        BigInteger wHi = BigInteger.ZERO;
        Thread caller = Thread.currentThread();
        for (int k = 0; k <= terms; k++) {
            if (caller.isInterrupted()) {
                throw new QchainException(ErrorKey.INTERRUPTED);
            }
            if (k % 64 == 0) {
                progress.update("terms", k, terms);
            }
            if (k > 0) {
                rNum = rNum.multiply(a);
                rDen = rDen.multiply(b).multiply(BigInteger.valueOf(k));
                BigInteger[] nLo = zeros(n);
                BigInteger[] nHi = zeros(n);
                BigInteger[] mLo = zeros(n);
                BigInteger[] mHi = zeros(n);
                for (int i = 0; i < n; i++) {
                    if (aHi[i].signum() != 0 || aLo[i].signum() != 0) {
                        for (int c = 0; c < pc[i].length; c++) {
                            mulAdd(aLo[i], aHi[i], pl[i][c], ph[i][c], w, nLo, nHi, pc[i][c]);
                        }
                        for (int c = 0; c < dc[i].length; c++) {
                            mulAdd(aLo[i], aHi[i], dl[i][c], dh[i][c], w, mLo, mHi, dc[i][c]);
                        }
                    }
                    if (bHi[i].signum() != 0 || bLo[i].signum() != 0) {
                        for (int c = 0; c < pc[i].length; c++) {
                            mulAdd(bLo[i], bHi[i], pl[i][c], ph[i][c], w, mLo, mHi, pc[i][c]);
                        }
                    }
                }
                for (int j = 0; j < n; j++) {
                    nLo[j] = nLo[j].max(BigInteger.ZERO);
                    nHi[j] = nHi[j].min(scale);
                }
                aLo = nLo;
                aHi = nHi;
                bLo = mLo;
                bHi = mHi;
            }
            // weight bounds in fixed point
            BigInteger wLo = rNum.multiply(eLo[0]).shiftLeft(w).divide(rDen.multiply(eLo[1]));
            BigInteger[] qr = rNum.multiply(eHi[0]).shiftLeft(w).divideAndRemainder(rDen.multiply(eHi[1]));
            wHi = qr[1].signum() == 0 ? qr[0] : qr[0].add(BigInteger.ONE);
            vLo = vLo.add(floorMul(wLo, aLo[to], w));
            vHi = vHi.add(ceilMul(wHi, aHi[to], w));
            BigInteger[] g = mul(wLo, wHi, bLo[to], bHi[to], w);
            gLo = gLo.add(g[0]);
            gHi = gHi.add(g[1]);
        }
        // tails: value Σ_(k>K) w_k <= w_K x/(K+1) / (1 - x/(K+2)); derivative ||D|| x Σ_(m>=K) w_m
        //        <= ||D|| x w_K / (1 - x/(K+1))
        Rational wK = Rational.of(wHi, scale);
        Rational vTail = wK.multiply(xr).divide(Rational.of(terms + 1))
            .divide(Rational.ONE.subtract(xr.divide(Rational.of(terms + 2))));
        Rational dTail = dNorm.multiply(xr).multiply(wK).divide(Rational.ONE.subtract(xr.divide(Rational.of(terms + 1))));
        Rational v0 = Rational.of(vLo, scale).max(Rational.ZERO);
        Rational v1 = Rational.of(vHi, scale).add(vTail).min(Rational.ONE);
        Rational d0 = Rational.of(gLo, scale).subtract(dTail);
        Rational d1 = Rational.of(gHi, scale).add(dTail);
        return new Enclosure[] {Enclosure.of(v0, v1.max(v0)), Enclosure.of(d0, d1)};
    }

    private static BigInteger[] zeros(int n) {
        BigInteger[] z = new BigInteger[n];
        java.util.Arrays.fill(z, BigInteger.ZERO);
        return z;
    }

    /** The nonzero entries of a row as fixed-point intervals (the diagonal kept when nonzero). */
    private static void sparse(Rational[] row, int w, int i, int[][] cols, BigInteger[][] lo, BigInteger[][] hi) {
        int count = 0;
        for (Rational r : row) {
            count += r.isZero() ? 0 : 1;
        }
        cols[i] = new int[count];
        lo[i] = new BigInteger[count];
        hi[i] = new BigInteger[count];
        int c = 0;
        for (int j = 0; j < row.length; j++) {
            if (!row[j].isZero()) {
                BigInteger[] qr = row[j].numerator().shiftLeft(w).divideAndRemainder(row[j].denominator());
                BigInteger fl = qr[1].signum() < 0 ? qr[0].subtract(BigInteger.ONE) : qr[0];
                cols[i][c] = j;
                lo[i][c] = fl;
                hi[i][c] = qr[1].signum() == 0 ? fl : fl.add(BigInteger.ONE);
                c++;
            }
        }
    }

    /** {@code [lo, hi] += [aLo, aHi] × [bLo, bHi]} at entry {@code j}, rounded outwards. */
    private static void mulAdd(BigInteger aLo, BigInteger aHi, BigInteger bLo, BigInteger bHi, int w,
                               BigInteger[] lo, BigInteger[] hi, int j) {
        BigInteger[] p = mul(aLo, aHi, bLo, bHi, w);
        lo[j] = lo[j].add(p[0]);
        hi[j] = hi[j].add(p[1]);
    }

    /** The interval product, ends rounded down and up to {@code w} fraction bits. */
    private static BigInteger[] mul(BigInteger aLo, BigInteger aHi, BigInteger bLo, BigInteger bHi, int w) {
        BigInteger p1 = aLo.multiply(bLo);
        BigInteger p2 = aLo.multiply(bHi);
        BigInteger p3 = aHi.multiply(bLo);
        BigInteger p4 = aHi.multiply(bHi);
        BigInteger min = p1.min(p2).min(p3.min(p4));
        BigInteger max = p1.max(p2).max(p3.max(p4));
        // shiftRight rounds towards minus infinity, as floor needs; the ceiling is -floor(-x)
        return new BigInteger[] {min.shiftRight(w), max.negate().shiftRight(w).negate()};
    }

    private static BigInteger floorMul(BigInteger a, BigInteger b, int w) {
        return a.multiply(b).shiftRight(w);
    }

    private static BigInteger ceilMul(BigInteger a, BigInteger b, int w) {
        return a.multiply(b).negate().shiftRight(w).negate();
    }

    /**
     * {@code num/den > 0} rounded down (or up) to a fraction {@code m / 2^e} with about {@code bits} significant bits.
     *
     * @return {m, 2^e}
     */
    private static BigInteger[] significant(BigInteger num, BigInteger den, int bits, boolean up) {
        int e = Math.max(0, bits + den.bitLength() - num.bitLength());
        BigInteger[] qr = num.shiftLeft(e).divideAndRemainder(den);
        BigInteger m = up && qr[1].signum() != 0 ? qr[0].add(BigInteger.ONE) : qr[0];
        return new BigInteger[] {m, BigInteger.ONE.shiftLeft(e)};
    }
}
