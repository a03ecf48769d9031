package org.qchain.exact.certified;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.util.Optional;
import java.util.stream.IntStream;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.Progress;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.SparseRationalMatrix;

/**
 * Rows of {@code P^n} for large {@code n} of a stochastic matrix that forgets its start: vector steps up to some
 * {@code T}, then a bound on everything that the remaining {@code n - T} steps can still change.
 *
 * <p>The coefficient of ergodicity {@code delta(Q) = 1/2 max_{i,i'} ||Q_i - Q_i'||_1} of a stochastic matrix satisfies
 * {@code ||v Q||_1 <= delta(Q) ||v||_1} for every row vector {@code v} whose entries sum to zero, and
 * {@code delta(Q) <= 1 - sum_j min_i Q_ij} (Doeblin's bound); see E. Seneta, <i>Non-negative Matrices and Markov
 * Chains</i>, 2nd ed., ch. 3 (coefficients of ergodicity), from memory. With {@code x_t = e_from P^t},
 * {@code D = x_T - x_{T-k}} (entries summing to zero) and {@code n - T} a multiple of {@code k}:
 * {@code x_n - x_T = sum_{j=1..J} D (P^k)^j}, so {@code ||x_n - x_T||_1 <= ||D||_1 d / (1 - d)} with {@code d} a
 * bound on {@code delta(P^k)}; and since {@code x_n - x_T} sums to zero, each of its entries is at most half that
 * norm in absolute value. The bound {@code d} comes from rigorous lower bounds of all rows of {@code P^k}, computed in
 * floating point with the round-off accounted for (N. J. Higham, <i>Accuracy and Stability of Numerical
 * Algorithms</i>, 2nd ed., ch. 2–3: {@code fl(x op y) = (x op y)(1 + e)}, {@code |e| <= u}, plus an underflow term
 * for products; from memory).
 */
final class Contraction {
    /** Unit round-off of double precision, 2^-53. */
    private static final double U = 0x1p-53;

    private Contraction() {
    }

    /** {@code delta(P^k) <= d}, {@code d < 1}. */
    record Bound(int k, double d) {
    }

    /** Whether every row of {@code p} sums to exactly 1. */
    static boolean isStochastic(SparseRationalMatrix p) {
        for (int i = 0; i < p.size(); i++) {
            Rational s = Rational.ZERO;
            for (Rational x : p.rowValues(i)) {
                s = s.add(x);
            }
            if (!s.isOne()) {
                return false;
            }
        }
        return true;
    }

    /**
     * Doeblin's bound for {@code k} = 2, 4, 8, ... up to {@code maxK}, from lower bounds of all rows of {@code P^k};
     * the {@code k} with the best bound per step, if some {@code k} gives a bound below 1.
     *
     * @param maxK the largest {@code k} tried
     */
    static Optional<Bound> doeblin(SparseRationalMatrix p, int maxK, Thread caller) {
        int s = p.size();
        // the transposed lower bounds of P, for pull-form steps (each row of Q_t on its own thread)
        int[] count = new int[s];
        for (int i = 0; i < s; i++) {
            for (int j : p.rowColumns(i)) {
                count[j]++;
            }
        }
        int[][] colFrom = new int[s][];
        double[][] colVal = new double[s][];
        for (int j = 0; j < s; j++) {
            colFrom[j] = new int[count[j]];
            colVal[j] = new double[count[j]];
            count[j] = 0;
        }
        int maxTerms = 1;
        for (int i = 0; i < s; i++) {
            int[] c = p.rowColumns(i);
            Rational[] v = p.rowValues(i);
            for (int t = 0; t < c.length; t++) {
                int j = c[t];
                colFrom[j][count[j]] = i;
                colVal[j][count[j]++] = lowerDouble(v[t]);
            }
        }
        for (int j = 0; j < s; j++) {
            maxTerms = Math.max(maxTerms, colFrom[j].length);
        }
        // A sum of m products, each rounded, is at least (exact - m eta)(1 - gamma) with gamma >= m u / (1 - m u);
        // the factor and the subtraction are themselves rounded down (nextDown).
        final int m = maxTerms + 1;
        final double keep = Math.nextDown(1 - 1.01 * m * U);
        final double eta = m * Double.MIN_VALUE;
        double[][] q = new double[s][s];
        for (int i = 0; i < s; i++) {
            int[] c = p.rowColumns(i);
            Rational[] v = p.rowValues(i);
            for (int t = 0; t < c.length; t++) {
                q[i][c[t]] = lowerDouble(v[t]);
            }
        }
        Bound best = null;
        double bestRate = 0;
        for (int t = 2; t <= maxK; t++) {
            double[][] prev = q;
            double[][] next = new double[s][];
            IntStream rows = IntStream.range(0, s);
            if (s > 16 && Runtime.getRuntime().availableProcessors() > 1) {
                rows = rows.parallel();
            }
            rows.forEach(i -> {
                if (caller.isInterrupted()) {
                    throw new QchainException(ErrorKey.INTERRUPTED);
                }
                double[] x = prev[i];
                double[] out = new double[s];
                for (int j = 0; j < s; j++) {
                    int[] from = colFrom[j];
                    double[] val = colVal[j];
                    double sum = 0;
                    for (int r = 0; r < from.length; r++) {
                        sum += x[from[r]] * val[r];
                    }
                    if (sum > 0) {
                        out[j] = Math.max(0, Math.nextDown(Math.nextDown(sum - eta) * keep));
                    }
                }
                next[i] = out;
            });
            q = next;
            if (Integer.bitCount(t) == 1) {
                double c = columnMinimaLowerSum(q);
                if (c > 0) {
                    double d = Math.nextUp(1 - c);
                    double rate = -Math.log(d) / t;
                    if (d < 1 && rate > bestRate) {
                        best = new Bound(t, d);
                        bestRate = rate;
                    }
                    if (c >= 0.5) {
                        break;
                    }
                }
            }
        }
        return Optional.ofNullable(best);
    }

    /** A lower bound of {@code sum_j min_i q_ij}. */
    private static double columnMinimaLowerSum(double[][] q) {
        int s = q.length;
        double sum = 0;
        for (int j = 0; j < s; j++) {
            double min = Double.MAX_VALUE;
            for (int i = 0; i < s && min > 0; i++) {
                min = Math.min(min, q[i][j]);
            }
            sum += min;
        }
        // s additions of non-negative numbers: relative error at most about s u
        return Math.max(0, Math.nextDown(sum * Math.nextDown(1 - 1.01 * (s + 1) * U)));
    }

    /**
     * The columns where row {@code from} of {@code P^n} is not zero, if the sequence of supports of
     * {@code e_from P^t} repeats within {@code maxSteps} steps (it is a function of the previous support alone, so
     * once a support recurs the sequence is periodic from there); else empty.
     */
    static Optional<java.util.BitSet> support(SparseRationalMatrix p, int from, long n, int maxSteps) {
        java.util.Map<java.util.BitSet, Integer> seen = new java.util.HashMap<>();
        java.util.List<java.util.BitSet> order = new java.util.ArrayList<>();
        java.util.BitSet cur = new java.util.BitSet(p.size());
        cur.set(from);
        for (int t = 0; t <= maxSteps; t++) {
            if (t == n) {
                return Optional.of(cur);
            }
            Integer first = seen.putIfAbsent(cur, t);
            if (first != null) {
                int period = t - first;
                return Optional.of(order.get((int) (first + (n - first) % period)));
            }
            order.add(cur);
            java.util.BitSet next = new java.util.BitSet(p.size());
            for (int i = cur.nextSetBit(0); i >= 0; i = cur.nextSetBit(i + 1)) {
                for (int j : p.rowColumns(i)) {
                    next.set(j);
                }
            }
            cur = next;
        }
        return Optional.empty();
    }

    /** A double not above {@code x >= 0}. */
    static double lowerDouble(Rational x) {
        double d = x.doubleValue();
        // doubleValue may round up; two steps down cover its error of at most about one unit in the last place
        double lo = Math.nextDown(Math.nextDown(d));
        return lo > 0 ? lo : 0;
    }

    /**
     * Enclosures of row {@code from} of {@code P^n}: vector steps on the fixed-point bounds {@code b} until the
     * remaining steps can change no entry by more than {@code 2^(16 - w)}, or until step {@code n}.
     */
    static Enclosure[] row(FixedPointBounds b, Bound bound, java.util.BitSet support, int from, long n,
                           Progress progress, Thread caller) {
        int s = b.n;
        int w = b.w;
        int k = bound.k();
        Rational factor = Rational.of(new BigDecimal(bound.d())).divide(
            Rational.ONE.subtract(Rational.of(new BigDecimal(bound.d()))).multiply(Rational.of(2)));
        BigInteger target = BigInteger.ONE.shiftLeft(16);
        int[] idx = b.cols[from];
        BigInteger[] lo = b.lo[from];
        BigInteger[] hi = b.hi[from];
        BigInteger[] snapLo = null;
        BigInteger[] snapHi = null;
        long stride = Math.max(1, Math.min(n, 1_000_000) / 1000);
        for (long t = 1; t < n; t++) {
            if ((n - t) % k == 0) {
                BigInteger[] dl = dense(s, idx, lo);
                BigInteger[] dh = dense(s, idx, hi);
                if (snapLo != null) {
                    BigInteger norm = BigInteger.ZERO;
                    for (int j = 0; j < s; j++) {
                        norm = norm.add(dh[j].subtract(snapLo[j]).max(snapHi[j].subtract(dl[j])).max(BigInteger.ZERO));
                    }
                    // radius in fixed point, rounded up: ceil(norm * factor)
                    Rational r = Rational.of(norm).multiply(factor);
                    BigInteger radius = ceil(r);
                    if (radius.compareTo(target) <= 0) {
                        progress.update("certified path sums", n, n);
                        return widened(w, dl, dh, radius, support);
                    }
                }
                snapLo = dl;
                snapHi = dh;
            }
            FixedPointBounds.Row r = FixedPointBounds.rowTimes(idx, lo, hi, b, caller);
            idx = r.cols();
            lo = r.lo();
            hi = r.hi();
            if ((t + 1) % stride == 0) {
                progress.update("certified path sums", Math.min(t + 1, n), n);
            }
        }
        return FixedPointBounds.enclosures(s, w, idx, lo, hi);
    }

    private static BigInteger[] dense(int s, int[] idx, BigInteger[] v) {
        BigInteger[] d = new BigInteger[s];
        java.util.Arrays.fill(d, BigInteger.ZERO);
        for (int t = 0; t < idx.length; t++) {
            d[idx[t]] = v[t];
        }
        return d;
    }

    private static BigInteger ceil(Rational r) {
        BigInteger[] qr = r.numerator().divideAndRemainder(r.denominator());
        return qr[1].signum() > 0 ? qr[0].add(BigInteger.ONE) : qr[0];
    }

    /**
     * {@code [max(0, lo - radius), min(1, hi + radius)]} for every column in the support (the true value is a
     * probability), the exact zero elsewhere.
     */
    private static Enclosure[] widened(int w, BigInteger[] lo, BigInteger[] hi, BigInteger radius,
                                       java.util.BitSet support) {
        BigInteger scale = BigInteger.ONE.shiftLeft(w);
        Enclosure[] out = new Enclosure[lo.length];
        for (int j = 0; j < lo.length; j++) {
            if (!support.get(j)) {
                out[j] = Enclosure.exact(Rational.ZERO);
                continue;
            }
            BigInteger l = lo[j].subtract(radius).max(BigInteger.ZERO);
            BigInteger h = hi[j].add(radius).min(scale);
            out[j] = Enclosure.of(Rational.of(l, scale), Rational.of(h, scale));
        }
        return out;
    }
}
