package org.qchain.symbolic;

import java.math.BigInteger;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import org.qchain.exact.Rational;
import org.qchain.exact.model.Domain;

/**
 * Proves the sign of a polynomial with rational coefficients on a box of parameter domains, exactly, by Bernstein
 * coefficients with subdivision. Sound, not complete: {@code true} is a proof, {@code false} means "not shown".
 *
 * <p>On a box, a polynomial is the sum of its Bernstein coefficients times the Bernstein basis polynomials, which
 * are non-negative on the closed box and positive inside it (Farouki, "The Bernstein polynomial basis: a centennial
 * retrospective", Computer Aided Geometric Design 29 (2012), section 5; from memory). So: all coefficients at least 0
 * proves {@code p >= 0} on the closed box, and if one is positive besides, {@code p > 0} inside it. Where that fails,
 * the widest side is halved, to at most {@link #MAX_DEPTH} halvings and {@link #MAX_BOXES} boxes in all; strict
 * positivity inside a box then also needs the dividing slice, a box of one dimension less. A domain with no upper
 * end, {@code (lo, inf)}, is first mapped onto {@code [0, 1)} by {@code x = lo + y/(1 - y)} and the polynomial
 * multiplied by {@code (1 - y)^d} (d its degree in x), which keeps its sign. The closed ends of the domains are
 * faces of the box, each checked as a box of its own.
 *
 * <p>Before the subdivision, a polynomial of total degree 2 is tried as completed squares plus an affine remainder;
 * after it, a polynomial of degree 2 in one variable by its discriminant in the others, and a reducible polynomial by
 * the signs of its factors (products of squares): see {@link Squares}. These catch zeros that no halving ever puts on
 * a corner, such as {@code (5p + 5r - 1)^2 + 20r} at {@code p = 1/5} on the open end {@code r = 0}. First of all,
 * the polynomial is evaluated at a few interior points ({@link #refutedAtSamples}): a value that breaks the bound is
 * a counterexample, and no proof is tried.
 */
public final class BoxSign {
    /** The most halvings of one box (the stated depth of the subdivision). */
    public static final int MAX_DEPTH = 12;

    /** The most boxes examined for one question. */
    public static final int MAX_BOXES = 20_000;

    private final int k;
    private final int[] deg;
    private final int[] stride;
    private final Rational[] coef;
    private int boxes;

    private BoxSign(int[] deg, Rational[] coef) {
        this.k = deg.length;
        this.deg = deg;
        this.stride = strides(deg);
        this.coef = coef;
    }

    /**
     * Whether {@code p > 0} at every point of the domains (open ends excluded, closed ends included).
     *
     * @param terms   the polynomial: exponent vector (one entry per domain) to coefficient
     * @param domains the domain of each variable, in the order of the exponent vectors
     * @return true if proved
     */
    public static boolean positive(Map<List<Integer>, Rational> terms, List<Domain> domains) {
        return !refutedAtSamples(terms, domains, true) && (basic(terms, domains, true)
            || Squares.quadraticIn(terms, domains, true) || Squares.products(terms, domains, true));
    }

    /**
     * Completed squares, then Bernstein coefficients with subdivision: {@code p > 0} on the domains (strict) or
     * {@code p >= 0} on their closure. The one-variable discriminant argument of {@link Squares} uses only these
     * on its coefficients, so the work stays bounded.
     */
    static boolean basic(Map<List<Integer>, Rational> terms, List<Domain> domains, boolean strict) {
        return Squares.completed(terms, domains, strict)
            || (strict ? of(terms, domains).positiveOnDomains(domains) : bernsteinNonNegative(terms, domains));
    }

    /**
     * Whether {@code p != 0} at every point of the domains: {@code p > 0} or {@code p < 0} throughout.
     *
     * @see #positive(Map, List)
     */
    public static boolean nonZero(Map<List<Integer>, Rational> terms, List<Domain> domains) {
        return positive(terms, domains) || positive(negated(terms), domains);
    }

    /**
     * Whether {@code p >= 0} at every point of the closure of the domains (so also on the domains).
     *
     * @see #positive(Map, List)
     */
    public static boolean nonNegative(Map<List<Integer>, Rational> terms, List<Domain> domains) {
        return !refutedAtSamples(terms, domains, false) && (basic(terms, domains, false)
            || Squares.quadraticIn(terms, domains, false) || Squares.products(terms, domains, false));
    }

    /**
     * Whether a polynomial of the parameter ring is non-zero at every point of the given parameters' domains (open
     * ends excluded, closed ends included), over the parameters it uses.
     *
     * @param c       the polynomial
     * @param domains the domain of each parameter by name; a parameter it uses without a domain means "not shown"
     * @return true if proved
     */
    public static boolean nonZero(Poly c, Map<String, Domain> domains) {
        List<String> vars = c.occurringVariables();
        if (vars.isEmpty()) {
            return !c.isZero();
        }
        if (!domains.keySet().containsAll(vars)) {
            return false;
        }
        return nonZero(terms(c, vars), vars.stream().map(domains::get).toList());
    }

    /**
     * Whether a polynomial of the parameter ring is positive at every point of the given parameters' domains.
     *
     * @param c       the polynomial
     * @param domains the domain of each parameter by name; a parameter it uses without a domain means "not shown"
     * @return true if proved
     */
    public static boolean positive(Poly c, Map<String, Domain> domains) {
        List<String> vars = c.occurringVariables();
        if (vars.isEmpty()) {
            return c.constantValue().orElseThrow().signum() > 0;
        }
        if (!domains.keySet().containsAll(vars)) {
            return false;
        }
        return positive(terms(c, vars), vars.stream().map(domains::get).toList());
    }

    /** The terms of {@code c} with exponent vectors over {@code vars} only (the parameters it uses). */
    private static Map<List<Integer>, Rational> terms(Poly c, List<String> vars) {
        Map<List<Integer>, Rational> terms = new java.util.HashMap<>();
        List<String> ringVars = c.ring().variables();
        for (Poly.Term t : c.terms()) {
            List<Integer> e = new java.util.ArrayList<>();
            for (String v : vars) {
                e.add(t.exponents().get(ringVars.indexOf(v)));
            }
            terms.merge(e, t.coefficient(), Rational::add);
        }
        return terms;
    }

    /** Sample values inside a domain: 1/7, 1/2 and 6/7 of the way across, or lo + 1/2, 1, 10 if unbounded. */
    private static final Rational[] FRACTIONS = {Rational.of(1, 7), Rational.of(1, 2), Rational.of(6, 7)};
    private static final Rational[] STEPS = {Rational.of(1, 2), Rational.ONE, Rational.of(10)};

    /**
     * A quick refutation before any proof: a value below 0 (or, for strict positivity, at most 0) at one of a few
     * interior points of the domains (3 per variable that occurs, at most 3^5 points) is a counterexample.
     */
    static boolean refutedAtSamples(Map<List<Integer>, Rational> terms, List<Domain> domains, boolean strict) {
        int k = domains.size();
        List<Integer> used = new java.util.ArrayList<>();
        for (int i = 0; i < k; i++) {
            for (Map.Entry<List<Integer>, Rational> t : terms.entrySet()) {
                if (t.getKey().get(i) > 0 && !t.getValue().isZero()) {
                    used.add(i);
                    break;
                }
            }
        }
        if (used.size() > 5) {
            return false;
        }
        Rational[][] values = new Rational[k][];
        for (int i : used) {
            Domain d = domains.get(i);
            values[i] = new Rational[3];
            for (int s = 0; s < 3; s++) {
                values[i][s] = d.upper().isPresent()
                    ? d.lower().add(d.upper().get().subtract(d.lower()).multiply(FRACTIONS[s]))
                    : d.lower().add(STEPS[s]);
            }
        }
        int points = 1;
        for (int u = 0; u < used.size(); u++) {
            points *= 3;
        }
        for (int pt = 0; pt < points; pt++) {
            Rational[] x = new Rational[k];
            int code = pt;
            for (int i : used) {
                x[i] = values[i][code % 3];
                code /= 3;
            }
            Rational v = Rational.ZERO;
            for (Map.Entry<List<Integer>, Rational> t : terms.entrySet()) {
                Rational m = t.getValue();
                for (int i : used) {
                    m = m.multiply(x[i].pow(t.getKey().get(i)));
                }
                v = v.add(m);
            }
            if (strict ? v.signum() <= 0 : v.signum() < 0) {
                return true;
            }
        }
        return false;
    }

    private static boolean bernsteinNonNegative(Map<List<Integer>, Rational> terms, List<Domain> domains) {
        BoxSign b = of(terms, domains);
        Rational[] lo = new Rational[b.k];
        Rational[] hi = new Rational[b.k];
        for (int i = 0; i < b.k; i++) {
            lo[i] = b.deg[i] == 0 ? Rational.ZERO : lowerEnd(domains.get(i));
            hi[i] = b.deg[i] == 0 ? Rational.ZERO : upperEnd(domains.get(i));
        }
        return b.nonNegativeClosed(b.coef, lo, hi, 0);
    }

    private static Map<List<Integer>, Rational> negated(Map<List<Integer>, Rational> terms) {
        Map<List<Integer>, Rational> out = new java.util.HashMap<>();
        terms.forEach((e, c) -> out.put(e, c.negate()));
        return out;
    }

    /** Dense coefficients, with every unbounded variable mapped onto [0, 1). */
    private static BoxSign of(Map<List<Integer>, Rational> terms, List<Domain> domains) {
        int k = domains.size();
        int[] deg = new int[k];
        for (List<Integer> e : terms.keySet()) {
            if (e.size() != k) {
                throw new IllegalArgumentException("exponent vector " + e + " for " + k + " domains");
            }
            for (int i = 0; i < k; i++) {
                deg[i] = Math.max(deg[i], e.get(i));
            }
        }
        int[] stride = strides(deg);
        Rational[] c = new Rational[stride[k]];
        Arrays.fill(c, Rational.ZERO);
        terms.forEach((e, v) -> {
            int idx = 0;
            for (int i = 0; i < k; i++) {
                idx += e.get(i) * stride[i];
            }
            c[idx] = c[idx].add(v);
        });
        BoxSign b = new BoxSign(deg, c);
        for (int i = 0; i < k; i++) {
            Domain d = domains.get(i);
            if (deg[i] > 0 && d.upper().isEmpty()) {
                b.axis(c, i, a -> unbounded(a, d.lower()));
            }
        }
        return b;
    }

    private static int[] strides(int[] deg) {
        int[] s = new int[deg.length + 1];
        s[0] = 1;
        for (int i = 0; i < deg.length; i++) {
            s[i + 1] = Math.multiplyExact(s[i], deg[i] + 1);
        }
        return s;
    }

    /** The box's lower end in the working coordinates. */
    private static Rational lowerEnd(Domain d) {
        return d.upper().isEmpty() ? Rational.ZERO : d.lower();
    }

    private static Rational upperEnd(Domain d) {
        return d.upper().orElse(Rational.ONE);
    }

    // --- strict positivity on the domains ------------------------------------------------------------------------

    private boolean positiveOnDomains(List<Domain> domains) {
        // every face: each variable either inside its open interval (0) or at its closed lower (1) or upper (2) end
        int[][] options = new int[k][];
        for (int i = 0; i < k; i++) {
            Domain d = domains.get(i);
            java.util.List<Integer> o = new java.util.ArrayList<>(List.of(0));
            if (deg[i] > 0 && d.lowerClosed()) {
                o.add(1);
            }
            if (deg[i] > 0 && d.upper().isPresent() && d.upperClosed()) {
                o.add(2);
            }
            options[i] = o.stream().mapToInt(Integer::intValue).toArray();
        }
        int[] at = new int[k];
        int[] choice = new int[k];
        while (true) {
            for (int i = 0; i < k; i++) {
                choice[i] = options[i][at[i]];
            }
            if (!positiveOnFace(domains, choice)) {
                return false;
            }
            int i = 0;
            while (i < k && ++at[i] == options[i].length) {
                at[i] = 0;
                i++;
            }
            if (i == k) {
                return true;
            }
        }
    }

    private boolean positiveOnFace(List<Domain> domains, int[] choice) {
        Rational[] c = coef.clone();
        Rational[] lo = new Rational[k];
        Rational[] hi = new Rational[k];
        for (int i = 0; i < k; i++) {
            if (deg[i] == 0) {
                lo[i] = Rational.ZERO;
                hi[i] = Rational.ZERO;
                continue;
            }
            Domain d = domains.get(i);
            if (choice[i] == 0) {
                lo[i] = lowerEnd(d);
                hi[i] = upperEnd(d);
            } else {
                Rational v = choice[i] == 1 ? lowerEnd(d) : upperEnd(d);
                fix(c, i, v);
                lo[i] = Rational.ZERO;
                hi[i] = Rational.ZERO;
            }
        }
        return positiveOpen(c, lo, hi, 0);
    }

    /** p > 0 inside the box (its sides with lo == hi are fixed coordinates, already substituted). */
    private boolean positiveOpen(Rational[] c, Rational[] lo, Rational[] hi, int depth) {
        if (++boxes > MAX_BOXES) {
            return false;
        }
        Rational[] b = bernstein(c, lo, hi);
        boolean allNonNeg = true;
        boolean anyPos = false;
        for (Rational r : b) {
            allNonNeg &= r.signum() >= 0;
            anyPos |= r.signum() > 0;
        }
        if (allNonNeg) {
            return anyPos;
        }
        int w = widest(lo, hi);
        if (depth >= MAX_DEPTH || w < 0) {
            return false;
        }
        Rational[][] halves = halves(lo, hi, w);
        if (!positiveOpen(c, lo, halves[0], depth + 1) || !positiveOpen(c, halves[1], hi, depth + 1)) {
            return false;
        }
        Rational m = halves[1][w];
        Rational[] slice = c.clone();
        fix(slice, w, m);
        Rational[] ls = lo.clone();
        Rational[] hs = hi.clone();
        ls[w] = Rational.ZERO;
        hs[w] = Rational.ZERO;
        return positiveOpen(slice, ls, hs, depth + 1);
    }

    /** p >= 0 on the closed box. */
    private boolean nonNegativeClosed(Rational[] c, Rational[] lo, Rational[] hi, int depth) {
        if (++boxes > MAX_BOXES) {
            return false;
        }
        boolean ok = true;
        for (Rational r : bernstein(c, lo, hi)) {
            ok &= r.signum() >= 0;
        }
        if (ok) {
            return true;
        }
        int w = widest(lo, hi);
        if (depth >= MAX_DEPTH || w < 0) {
            return false;
        }
        Rational[][] halves = halves(lo, hi, w);
        return nonNegativeClosed(c, lo, halves[0], depth + 1) && nonNegativeClosed(c, halves[1], hi, depth + 1);
    }

    /** The upper ends of the lower half and the lower ends of the upper half, side w halved. */
    private static Rational[][] halves(Rational[] lo, Rational[] hi, int w) {
        Rational m = lo[w].add(hi[w]).multiply(Rational.of(1, 2));
        Rational[] h1 = hi.clone();
        h1[w] = m;
        Rational[] l2 = lo.clone();
        l2[w] = m;
        return new Rational[][] {h1, l2};
    }

    private int widest(Rational[] lo, Rational[] hi) {
        int w = -1;
        Rational best = Rational.ZERO;
        for (int i = 0; i < k; i++) {
            Rational len = hi[i].subtract(lo[i]);
            if (len.compareTo(best) > 0) {
                best = len;
                w = i;
            }
        }
        return w;
    }

    // --- coefficient transforms, one axis at a time ---------------------------------------------------------------

    private Rational[] bernstein(Rational[] c, Rational[] lo, Rational[] hi) {
        Rational[] b = c.clone();
        for (int i = 0; i < k; i++) {
            if (deg[i] == 0 || lo[i].equals(hi[i])) {
                continue;
            }
            Rational l = lo[i];
            Rational s = hi[i].subtract(lo[i]);
            int n = deg[i];
            axis(b, i, a -> toBernstein(affine(a, l, s), n));
        }
        return b;
    }

    /** Substitutes x_i = v: the coefficients end up at exponent 0 of axis i, the rest 0. */
    private void fix(Rational[] c, int i, Rational v) {
        axis(c, i, a -> {
            Rational s = Rational.ZERO;
            for (int j = a.length - 1; j >= 0; j--) {
                s = s.multiply(v).add(a[j]);
            }
            Rational[] out = new Rational[a.length];
            Arrays.fill(out, Rational.ZERO);
            out[0] = s;
            return out;
        });
    }

    /** Applies f to every line of coefficients along axis i, in place. */
    private void axis(Rational[] c, int i, java.util.function.UnaryOperator<Rational[]> f) {
        int n = deg[i] + 1;
        int st = stride[i];
        Rational[] line = new Rational[n];
        for (int base = 0; base < c.length; base++) {
            if ((base / st) % n != 0) {
                continue;
            }
            for (int j = 0; j < n; j++) {
                line[j] = c[base + j * st];
            }
            Rational[] out = f.apply(line);
            for (int j = 0; j < n; j++) {
                c[base + j * st] = out[j];
            }
        }
    }

    /** The coefficients of a(l + s t) in t. */
    private static Rational[] affine(Rational[] a, Rational l, Rational s) {
        int n = a.length;
        Rational[] out = new Rational[n];
        Arrays.fill(out, Rational.ZERO);
        for (int j = 0; j < n; j++) {
            if (a[j].isZero()) {
                continue;
            }
            // (l + s t)^j = sum_m C(j, m) l^(j-m) s^m t^m
            for (int m = 0; m <= j; m++) {
                out[m] = out[m].add(a[j].multiply(Rational.of(binomial(j, m))).multiply(l.pow(j - m)).multiply(s.pow(m)));
            }
        }
        return out;
    }

    /** Power coefficients on [0, 1] to Bernstein coefficients of degree n: b_m = sum_(j<=m) C(m,j)/C(n,j) a_j. */
    private static Rational[] toBernstein(Rational[] a, int n) {
        Rational[] b = new Rational[n + 1];
        for (int m = 0; m <= n; m++) {
            Rational s = Rational.ZERO;
            for (int j = 0; j <= m; j++) {
                if (!a[j].isZero()) {
                    s = s.add(a[j].multiply(Rational.of(binomial(m, j))).divide(Rational.of(binomial(n, j))));
                }
            }
            b[m] = s;
        }
        return b;
    }

    /** a(lo + y/(1 - y)) (1 - y)^d with d = a.length - 1, as coefficients in y. */
    private static Rational[] unbounded(Rational[] a, Rational lo) {
        int d = a.length - 1;
        Rational[] w = affine(a, lo, Rational.ONE);
        Rational[] out = new Rational[d + 1];
        Arrays.fill(out, Rational.ZERO);
        // w_j y^j (1 - y)^(d - j)
        for (int j = 0; j <= d; j++) {
            if (w[j].isZero()) {
                continue;
            }
            for (int t = 0; t <= d - j; t++) {
                Rational term = w[j].multiply(Rational.of(binomial(d - j, t)));
                out[j + t] = out[j + t].add(t % 2 == 0 ? term : term.negate());
            }
        }
        return out;
    }

    private static BigInteger binomial(int n, int k) {
        BigInteger r = BigInteger.ONE;
        for (int i = 1; i <= k; i++) {
            r = r.multiply(BigInteger.valueOf(n - k + i)).divide(BigInteger.valueOf(i));
        }
        return r;
    }
}
