package org.qchain.symbolic;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.qchain.exact.Rational;
import org.qchain.exact.model.Domain;

/**
 * Sign proofs through squares, for {@link BoxSign}: what Bernstein coefficients cannot see when a polynomial touches
 * 0 at a point that is never a corner of the halvings (a square whose zero lies on an open end of a domain, say).
 * Sound, not complete; exact rational arithmetic throughout.
 *
 * <ul>
 *   <li><b>Completed squares</b> (total degree 2): the quadratic part {@code x^T A x} is split by Lagrange's
 *       reduction into {@code sum d_i L_i^2} with every {@code d_i > 0} (if a pivot is negative, or a zero pivot
 *       has a nonzero row, A is not positive semidefinite and nothing is claimed). Then
 *       {@code p = sum d_i (L_i + c_i)^2 + R} with R affine; the shifts {@code c_i} of some of the squares are
 *       chosen so that R loses its terms in as many variables (each choice one small linear system, for at most
 *       {@link #MAX_VARIABLES} variables), and R is handed back to {@link BoxSign}: R > 0 on the domains proves p > 0, R >= 0 on their closure proves
 *       p >= 0. Example: {@code 1 - 10p + 10r + 25p^2 + 50pr + 25r^2 = (5p + 5r - 1)^2 + 20r}, positive for
 *       r > 0.</li>
 *   <li><b>A square in one variable</b>: where p has degree 2 in a variable x, {@code p = A x^2 + B x + C} with
 *       A, B, C polynomials in the others; {@code C > 0} (or {@code A > 0}) and {@code 4AC - B^2 > 0} on the
 *       others' domains make p positive for every real x; {@code A, C, 4AC - B^2 >= 0} make it at least 0. The
 *       coefficients are decided by completed squares and Bernstein coefficients only ({@link BoxSign#basic}),
 *       so the work stays bounded. Example: {@code (p - q^2 - 1/3)^2 + q}, whose discriminant in p is
 *       {@code -4q}.</li>
 *   <li><b>Products of squares</b>: p is factored over Q ({@link Poly#factor()}); a factor of even multiplicity
 *       is at least 0 and must only be shown nonzero (for {@code p > 0}) or nothing (for {@code p >= 0}); a factor
 *       of odd multiplicity must have one sign; the signs and the constant must multiply to +1.</li>
 * </ul>
 */
final class Squares {
    /** The most variables for which the choices of shifts are enumerated (at most 252 small systems). */
    static final int MAX_VARIABLES = 5;

    private Squares() {
    }

    // --- completed squares ---------------------------------------------------------------------------------------

    /**
     * p > 0 on the domains (strict) or p >= 0 on their closure, by completed squares with an affine remainder.
     *
     * @param terms   exponent vector to coefficient, as in {@link BoxSign}
     * @param domains one per variable
     * @param strict  whether p > 0 is asked
     * @return true if proved
     */
    static boolean completed(Map<List<Integer>, Rational> terms, List<Domain> domains, boolean strict) {
        int k = domains.size();
        if (k > MAX_VARIABLES || totalDegree(terms) != 2) {
            return false;
        }
        Rational[][] a = new Rational[k][k];
        Rational[] lin = new Rational[k];
        Rational c0 = Rational.ZERO;
        for (int i = 0; i < k; i++) {
            lin[i] = Rational.ZERO;
            for (int j = 0; j < k; j++) {
                a[i][j] = Rational.ZERO;
            }
        }
        Rational half = Rational.of(1, 2);
        for (Map.Entry<List<Integer>, Rational> t : terms.entrySet()) {
            List<Integer> e = t.getKey();
            Rational c = t.getValue();
            List<Integer> at = new ArrayList<>();
            for (int i = 0; i < k; i++) {
                for (int m = 0; m < e.get(i); m++) {
                    at.add(i);
                }
            }
            if (at.isEmpty()) {
                c0 = c0.add(c);
            } else if (at.size() == 1) {
                lin[at.get(0)] = lin[at.get(0)].add(c);
            } else if (at.get(0).equals(at.get(1))) {
                a[at.get(0)][at.get(0)] = a[at.get(0)][at.get(0)].add(c);
            } else {
                a[at.get(0)][at.get(1)] = a[at.get(0)][at.get(1)].add(c.multiply(half));
                a[at.get(1)][at.get(0)] = a[at.get(1)][at.get(0)].add(c.multiply(half));
            }
        }
        // Lagrange's reduction: Q = sum d_i L_i^2, L_i = x_piv + sum_j (a_piv,j / a_piv,piv) x_j
        List<Rational> d = new ArrayList<>();
        List<Rational[]> forms = new ArrayList<>();
        Rational[][] q = a;
        while (true) {
            int piv = -1;
            for (int i = 0; i < k; i++) {
                int s = q[i][i].signum();
                if (s < 0) {
                    return false;
                }
                if (s > 0 && piv < 0) {
                    piv = i;
                }
            }
            if (piv < 0) {
                for (Rational[] row : q) {
                    for (Rational x : row) {
                        if (!x.isZero()) {
                            return false; // a zero diagonal with a nonzero entry in its row: indefinite
                        }
                    }
                }
                break;
            }
            Rational dp = q[piv][piv];
            Rational[] l = new Rational[k];
            for (int j = 0; j < k; j++) {
                l[j] = q[piv][j].divide(dp);
            }
            Rational[][] next = new Rational[k][k];
            for (int i = 0; i < k; i++) {
                for (int j = 0; j < k; j++) {
                    next[i][j] = q[i][j].subtract(dp.multiply(l[i]).multiply(l[j]));
                }
            }
            d.add(dp);
            forms.add(l);
            q = next;
        }
        int rank = d.size();
        if (rank == 0) {
            return false;
        }
        // choices: a set T of the squares to shift and a set S of as many variables whose terms in R the shifts
        // remove (one small linear system each); the other squares stay unshifted. T empty: no shift at all.
        List<Rational[]> shifts = new ArrayList<>();
        for (int tm = 0; tm < (1 << rank); tm++) {
            int size = Integer.bitCount(tm);
            for (int mask = 0; mask < (1 << k); mask++) {
                if (Integer.bitCount(mask) != size || (size == 0 && mask != 0)) {
                    continue;
                }
                // equations for j in S: lin_j - sum_(i in T) 2 d_i c_i l_i[j] = 0
                Rational[][] sys = new Rational[size][size + 1];
                int row = 0;
                for (int j = 0; j < k; j++) {
                    if ((mask >> j & 1) == 0) {
                        continue;
                    }
                    int col = 0;
                    for (int i = 0; i < rank; i++) {
                        if ((tm >> i & 1) != 0) {
                            sys[row][col++] = Rational.of(2).multiply(d.get(i)).multiply(forms.get(i)[j]);
                        }
                    }
                    sys[row][size] = lin[j];
                    row++;
                }
                Rational[] sol = solve(sys, size);
                if (sol == null) {
                    continue;
                }
                Rational[] c = new Rational[rank];
                int col = 0;
                for (int i = 0; i < rank; i++) {
                    c[i] = (tm >> i & 1) != 0 ? sol[col++] : Rational.ZERO;
                }
                shifts.add(c);
            }
        }
        for (Rational[] c : shifts) {
            // R = p - sum d_i (L_i + c_i)^2: linear part lin - sum 2 d_i c_i L_i, constant c0 - sum d_i c_i^2
            Rational[] rl = lin.clone();
            Rational rc = c0;
            for (int i = 0; i < rank; i++) {
                Rational w = Rational.of(2).multiply(d.get(i)).multiply(c[i]);
                for (int j = 0; j < k; j++) {
                    rl[j] = rl[j].subtract(w.multiply(forms.get(i)[j]));
                }
                rc = rc.subtract(d.get(i).multiply(c[i]).multiply(c[i]));
            }
            Map<List<Integer>, Rational> r = new HashMap<>();
            if (!rc.isZero()) {
                r.put(exponent(k, -1), rc);
            }
            for (int j = 0; j < k; j++) {
                if (!rl[j].isZero()) {
                    r.put(exponent(k, j), rl[j]);
                }
            }
            if (strict ? BoxSign.positive(r, domains) : BoxSign.nonNegative(r, domains)) {
                return true;
            }
        }
        return false;
    }

    private static List<Integer> exponent(int k, int at) {
        List<Integer> e = new ArrayList<>();
        for (int i = 0; i < k; i++) {
            e.add(i == at ? 1 : 0);
        }
        return e;
    }

    private static int totalDegree(Map<List<Integer>, Rational> terms) {
        int deg = 0;
        for (Map.Entry<List<Integer>, Rational> t : terms.entrySet()) {
            if (!t.getValue().isZero()) {
                deg = Math.max(deg, t.getKey().stream().mapToInt(Integer::intValue).sum());
            }
        }
        return deg;
    }

    /** The unique solution of an n x n system (augmented matrix), or null if it is singular. */
    private static Rational[] solve(Rational[][] m, int n) {
        for (int col = 0; col < n; col++) {
            int p = col;
            while (p < n && m[p][col].isZero()) {
                p++;
            }
            if (p == n) {
                return null;
            }
            Rational[] tmp = m[p];
            m[p] = m[col];
            m[col] = tmp;
            for (int r = 0; r < n; r++) {
                if (r == col || m[r][col].isZero()) {
                    continue;
                }
                Rational f = m[r][col].divide(m[col][col]);
                for (int c = col; c <= n; c++) {
                    m[r][c] = m[r][c].subtract(f.multiply(m[col][c]));
                }
            }
        }
        Rational[] x = new Rational[n];
        for (int i = 0; i < n; i++) {
            x[i] = m[i][n].divide(m[i][i]);
        }
        return x;
    }

    // --- a square in one variable --------------------------------------------------------------------------------

    /**
     * p > 0 on the domains (strict) or p >= 0 on their closure, by the discriminant of p in one variable of
     * degree 2.
     *
     * @see #completed(Map, List, boolean)
     */
    static boolean quadraticIn(Map<List<Integer>, Rational> terms, List<Domain> domains, boolean strict) {
        int k = domains.size();
        for (int j = 0; j < k; j++) {
            int deg = 0;
            for (Map.Entry<List<Integer>, Rational> t : terms.entrySet()) {
                if (!t.getValue().isZero()) {
                    deg = Math.max(deg, t.getKey().get(j));
                }
            }
            if (deg != 2 || totalDegree(terms) <= 2) {
                continue; // total degree 2 is the completed squares' case
            }
            List<Map<List<Integer>, Rational>> abc = List.of(new HashMap<>(), new HashMap<>(), new HashMap<>());
            for (Map.Entry<List<Integer>, Rational> t : terms.entrySet()) {
                List<Integer> e = new ArrayList<>(t.getKey());
                int power = e.get(j);
                e.set(j, 0);
                abc.get(2 - power).merge(List.copyOf(e), t.getValue(), Rational::add);
            }
            Map<List<Integer>, Rational> a = abc.get(0);
            Map<List<Integer>, Rational> b = abc.get(1);
            Map<List<Integer>, Rational> c = abc.get(2);
            Map<List<Integer>, Rational> disc = times(Rational.of(4), a, c);
            times(Rational.of(-1), b, b).forEach((e, v) -> disc.merge(e, v, Rational::add));
            boolean ok = strict
                ? (BoxSign.basic(c, domains, true) || BoxSign.basic(a, domains, true))
                    && BoxSign.basic(disc, domains, true)
                : BoxSign.basic(a, domains, false) && BoxSign.basic(c, domains, false)
                    && BoxSign.basic(disc, domains, false);
            if (ok) {
                return true;
            }
        }
        return false;
    }

    /** w * x * y for polynomials as exponent maps. */
    private static Map<List<Integer>, Rational> times(Rational w, Map<List<Integer>, Rational> x,
                                                      Map<List<Integer>, Rational> y) {
        Map<List<Integer>, Rational> out = new HashMap<>();
        for (Map.Entry<List<Integer>, Rational> s : x.entrySet()) {
            for (Map.Entry<List<Integer>, Rational> t : y.entrySet()) {
                List<Integer> e = new ArrayList<>();
                for (int i = 0; i < s.getKey().size(); i++) {
                    e.add(s.getKey().get(i) + t.getKey().get(i));
                }
                out.merge(e, w.multiply(s.getValue()).multiply(t.getValue()), Rational::add);
            }
        }
        return out;
    }

    // --- products of squares -------------------------------------------------------------------------------------

    /**
     * p > 0 on the domains (strict) or p >= 0 on their closure, from the signs of its factors over Q.
     *
     * @see #completed(Map, List, boolean)
     */
    static boolean products(Map<List<Integer>, Rational> terms, List<Domain> domains, boolean strict) {
        if (totalDegree(terms) <= 1) {
            return false; // constants and affine polynomials are irreducible: no factorisation needed
        }
        int k = domains.size();
        List<String> names = new ArrayList<>();
        for (int i = 0; i < k; i++) {
            names.add("v" + i);
        }
        ParamRing ring = ParamRing.of(names);
        Poly p = ring.zero();
        for (Map.Entry<List<Integer>, Rational> t : terms.entrySet()) {
            Poly m = ring.constant(t.getValue());
            for (int i = 0; i < k; i++) {
                m = m.multiply(ring.variable(names.get(i)).pow(t.getKey().get(i)));
            }
            p = p.add(m);
        }
        if (p.isZero() || p.isConstant()) {
            return false; // constants are BoxSign's own case
        }
        Poly.Factorization f = p.factor();
        if (f.factors().size() == 1 && f.factors().get(0).exponent() == 1) {
            return false; // irreducible: nothing to split
        }
        int sign = f.unit().signum();
        for (Poly.Factor factor : f.factors()) {
            Map<List<Integer>, Rational> base = termsOf(factor.base(), k);
            if (factor.exponent() % 2 == 0) {
                if (strict && !BoxSign.nonZero(base, domains)) {
                    return false;
                }
                continue;
            }
            if (strict ? BoxSign.positive(base, domains) : BoxSign.nonNegative(base, domains)) {
                continue;
            }
            Map<List<Integer>, Rational> neg = new HashMap<>();
            base.forEach((e, c) -> neg.put(e, c.negate()));
            if (strict ? BoxSign.positive(neg, domains) : BoxSign.nonNegative(neg, domains)) {
                sign = -sign;
                continue;
            }
            return false;
        }
        return sign > 0;
    }

    private static Map<List<Integer>, Rational> termsOf(Poly p, int k) {
        Map<List<Integer>, Rational> out = new HashMap<>();
        for (Poly.Term t : p.terms()) {
            out.merge(t.exponents(), t.coefficient(), Rational::add);
        }
        return out;
    }
}
