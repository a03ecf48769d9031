package org.qchain.symbolic.sensitivity;

import java.math.BigInteger;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.qchain.exact.Rational;
import org.qchain.symbolic.Poly;
import org.qchain.symbolic.RatFun;
import org.qchain.symbolic.RatFunMatrix;

/**
 * An a-priori upper bound of the digit figure that {@link EntrySensitivity#sweep(SweepRange, Map, long,
 * org.qchain.exact.Progress)} checks, from the one-step matrix alone (no power is computed), for the caller's size
 * guard.
 *
 * <p>Method. With every parameter but the swept one {@code v} (and, for the derivative, the parameter {@code w} it is
 * taken in) substituted, write {@code P = Ã / (κ c)} with {@code Ã} an integer polynomial matrix, {@code c} an integer
 * polynomial and {@code κ} an integer. The entry (or sum of entries) of {@code P^n} is {@code F / G} with
 * {@code F = (Ã^n)_i·} summed over the final states and {@code G = (κ c)^n}; its derivative in {@code w} is
 * {@code (F_w c - n F c_w) / (κ^n c^(n+1))}. Degrees: {@code deg F <= n deg Ã}, {@code deg G = n deg c}. Sizes in the
 * 1-norm (sum of absolute coefficients, submultiplicative): {@code |F|_1 <= R^n} with {@code R} the largest row sum of
 * the entries' 1-norms, {@code |G|_1 <= (κ |c|_1)^n}, {@code |F_w|_1 <= deg_w(F) |F|_1}. The sweep's engine figure uses
 * the canonical form of the univariate function: numerator and denominator are, up to a content that only lowers
 * them, factors in Z[v] of these F and G (Gauss's lemma), so Mignotte's factor bound, {@code |g|_inf <= 2^(deg g)
 * |f|_2 <= 2^(deg f) |f|_1} for g dividing f in Z[x] (von zur Gathen and Gerhard, Modern Computer Algebra, chapter 6,
 * Mignotte's bound, from memory), bounds their coefficients. Where {@code w} is not the swept parameter, its value
 * {@code a/b} is substituted after the derivative with both parts multiplied by {@code b^T}
 * ({@code T} their degree in {@code w}), which multiplies the 1-norms by at most {@code max(|a|, |b|)^T}. Every point's
 * figure is then the engine's formula ({@code UnivariateValues.digitsAt}) with these bounds in place of the real
 * degrees and coefficient sizes; the formula increases with each, so the total is never below the engine's.
 */
public final class SweepEstimate {
    private SweepEstimate() {
    }

    /**
     * The bound of the sweep's digits (value and derivative at every point).
     *
     * @param p     the one-step matrix, every parameter symbolic
     * @param n     the number of steps
     * @param from  the row
     * @param to    the final states whose entries are summed
     * @param wrt   the parameter of the derivative
     * @param range the sweep
     * @param base  the values of every parameter but the swept one
     * @return the bound, saturating at {@code Long.MAX_VALUE}
     */
    public static long digits(RatFunMatrix p, long n, int from, int[] to, String wrt, SweepRange range,
                              Map<String, Rational> base) {
        String v = range.parameter();
        Map<String, Rational> others = new LinkedHashMap<>(base);
        others.remove(v);
        boolean[] rows = rowsUsed(p, from, n);
        Part value = Part.of(p.substitute(others), rows, n, v, v, false, Rational.ONE);
        Part slope;
        if (wrt.equals(v) || p.ring().indexOf(wrt).isEmpty()) {
            slope = Part.of(p.substitute(others), rows, n, v, v, true, Rational.ONE);
        } else {
            Map<String, Rational> rest = new LinkedHashMap<>(others);
            Rational w0 = rest.remove(wrt);
            slope = Part.of(p.substitute(rest), rows, n, v, wrt, true, w0 == null ? Rational.ONE : w0);
        }
        long total = 0;
        int size = range.size();
        for (int k = 0; k < size; k++) {
            Rational x = range.point(k);
            long bits = Math.max(x.numerator().bitLength(), x.denominator().bitLength());
            total = sat(total, sat(value.digitsAt(bits), slope.digitsAt(bits)));
        }
        return total;
    }

    /**
     * The rows that row {@code from} of {@code P^n} is made of: the states reached from {@code from} in fewer than n
     * steps (a path's entries all lie in such rows), so the bound takes degrees and sizes from these rows only.
     */
    private static boolean[] rowsUsed(RatFunMatrix p, int from, long n) {
        int s = p.size();
        boolean[] seen = new boolean[s];
        seen[from] = true;
        java.util.List<Integer> frontier = new java.util.ArrayList<>(List.of(from));
        for (long step = 1; step < n && !frontier.isEmpty(); step++) {
            java.util.List<Integer> next = new java.util.ArrayList<>();
            for (int i : frontier) {
                for (int j = 0; j < s; j++) {
                    if (!seen[j] && !p.get(i, j).isZero()) {
                        seen[j] = true;
                        next.add(j);
                    }
                }
            }
            frontier = next;
        }
        return seen;
    }

    /**
     * Bounds for one univariate canonical function: degrees and coefficient bit lengths of numerator and denominator.
     * Doubles are base-2 logarithms, rounded up with a margin before they become bit counts.
     */
    private record Part(double degNum, double degDen, double log2Num, double log2Den) {

        static Part of(RatFunMatrix m, boolean[] rows, long n, String v, String w, boolean derivative, Rational w0) {
            int s = m.size();
            // the common denominator c (lcm over Q), then integer polynomials: P = Ã / (κ c)
            Poly c = m.ring().one();
            for (int i = 0; i < s; i++) {
                for (int j = 0; j < s && rows[i]; j++) {
                    Poly e = m.get(i, j).denominator();
                    if (!e.isOne() && !e.equals(c)) {
                        c = c.multiply(e.divideExact(c.gcd(e)).orElseThrow());
                    }
                }
            }
            c = c.multiply(Rational.of(denominatorLcm(List.of(c))));
            BigInteger kappa = BigInteger.ONE;
            Poly[][] a = new Poly[s][s];
            for (int i = 0; i < s; i++) {
                for (int j = 0; j < s && rows[i]; j++) {
                    RatFun f = m.get(i, j);
                    a[i][j] = f.numerator().multiply(c.divideExact(f.denominator()).orElseThrow());
                    BigInteger l = denominatorLcm(List.of(a[i][j]));
                    kappa = kappa.divide(kappa.gcd(l)).multiply(l);
                }
            }
            boolean hasV = m.ring().indexOf(v).isPresent();
            boolean hasW = m.ring().indexOf(w).isPresent();
            long alphaV = 0;
            long alphaW = 0;
            BigInteger rowMax = BigInteger.ONE;
            Rational k = Rational.of(kappa);
            for (int i = 0; i < s; i++) {
                BigInteger row = BigInteger.ZERO;
                for (int j = 0; j < s && rows[i]; j++) {
                    Poly e = a[i][j].multiply(k);
                    alphaV = Math.max(alphaV, hasV ? e.degree(v) : 0);
                    alphaW = Math.max(alphaW, hasW ? e.degree(w) : 0);
                    row = row.add(oneNorm(e));
                }
                rowMax = rowMax.max(row);
            }
            double log2R = log2(rowMax);
            long gammaV = hasV ? c.degree(v) : 0;
            long gammaW = hasW ? c.degree(w) : 0;
            double log2C = log2(oneNorm(c));
            double log2K = log2(kappa);
            double dn = (double) n;
            if (!derivative) {
                double degF = dn * alphaV;
                double degG = dn * gammaV;
                return new Part(degF, degG, degF + dn * log2R, degG + dn * (log2K + log2C));
            }
            // F2 = F_w c - n F c_w, G2 = κ^n c^(n+1); degrees in v; in w for the substitution's b^T
            double degF = dn * alphaV + gammaV;
            double degG = (dn + 1) * gammaV;
            double log2F2 = Math.log(Math.max(1, dn * (alphaW + gammaW))) / Math.log(2) + dn * log2R + log2C;
            double log2G2 = dn * log2K + (dn + 1) * log2C;
            double t = w.equals(v) ? 0 : Math.max(dn * alphaW + gammaW, (dn + 1) * gammaW);
            double b0 = t == 0 ? 0 : Math.max(log2(w0.numerator().abs()), log2(w0.denominator()));
            return new Part(degF, degG, degF + log2F2 + t * b0, degG + log2G2 + t * b0);
        }

        /** The engine's per-point formula with the bounds in place of the real sizes. */
        long digitsAt(long bits) {
            double bn = Math.floor(log2Num * (1 + 1e-12) + 1e-6) + 1;
            double bd = Math.floor(log2Den * (1 + 1e-12) + 1e-6) + 1;
            double all = bn + bd + (degNum + degDen) * bits;
            if (all >= 9.0e18 / 30103) {
                return Long.MAX_VALUE;
            }
            return (long) all * 30103 / 100000 + 2;
        }
    }

    private static BigInteger denominatorLcm(List<Poly> ps) {
        BigInteger l = BigInteger.ONE;
        for (Poly p : ps) {
            for (Poly.Term t : p.terms()) {
                BigInteger d = t.coefficient().denominator();
                l = l.divide(l.gcd(d)).multiply(d);
            }
        }
        return l;
    }

    /** The sum of the absolute coefficients of an integer polynomial. */
    private static BigInteger oneNorm(Poly p) {
        BigInteger sum = BigInteger.ZERO;
        for (Poly.Term t : p.terms()) {
            if (!t.coefficient().denominator().equals(BigInteger.ONE)) {
                throw new IllegalStateException("not an integer polynomial: " + p);
            }
            sum = sum.add(t.coefficient().numerator().abs());
        }
        return sum;
    }

    /** log2 of x, slightly rounded up (0 for 0 and 1); x at least 0. */
    static double log2(BigInteger x) {
        if (x.signum() == 0) {
            return 0;
        }
        int bits = x.bitLength();
        double l = bits < 1000 ? Math.log(x.doubleValue()) / Math.log(2)
            : Math.log(x.shiftRight(bits - 64).doubleValue()) / Math.log(2) + (bits - 64);
        return Math.max(0, l + 1e-9);
    }

    private static long sat(long a, long b) {
        long r = a + b;
        return ((a ^ r) & (b ^ r)) < 0 ? Long.MAX_VALUE : r;
    }
}
