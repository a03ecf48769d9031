package org.qchain.symbolic.closed;

import edu.jas.arith.BigRational;
import edu.jas.poly.ExpVector;
import edu.jas.poly.GenPolynomial;
import edu.jas.ufd.Quotient;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.Progress;
import org.qchain.exact.QchainException;

/**
 * The spectral decomposition of a square matrix P over Q(parameters), from which P^n is written in closed form.
 *
 * <p>Method. The characteristic polynomial {@code chi(x) = det(xI - P)} comes from the traces of P, P^2, ..., P^s
 * by Newton's identities (exact over Q(parameters), no division by a polynomial). JAS factors it over Q(parameters)
 * into monic irreducible factors {@code f^m}. For each factor the Chinese remainder theorem gives a polynomial
 * {@code e_f} with {@code e_f = 1 mod f^m} and {@code e_f = 0 mod chi/f^m}; {@code E_f = e_f(P)} is the projector
 * onto the generalised eigenspace of the roots of f, and {@code P^n = sum_f P^n E_f}. Then:
 * <ul>
 *   <li>{@code f = x - lambda}: {@code P^n E_f = sum_k binomial(n, k) lambda^(n-k) (P - lambda I)^k E_f}, with
 *       k below the Jordan index (the smallest k with {@code (P - lambda I)^k E_f = 0}). For {@code lambda = 0} only
 *       the terms with {@code n = k} survive, so they vanish for n at least the index: that index is valid_from.</li>
 *   <li>f of degree e &ge; 2 and multiplicity 1: for each root r, {@code E_r = adj(rI - P) / chi'(r)}; reducing
 *       modulo f gives {@code P^n E_f = sum_{t<e} C_t p_(n+t)}, where {@code p_k} is the k-th power sum of the roots
 *       of f and the matrices {@code C_t} lie over Q(parameters).</li>
 *   <li>f of degree e &ge; 2 and multiplicity m &gt; 1, with or without a Jordan block: Newton's iteration
 *       {@code s <- s - f(s)/f'(s) mod f^m} from {@code s = x} gives the polynomial s with {@code f(s) = 0 mod f^m}
 *       and {@code s = x mod f} (the Jordan-Chevalley decomposition), so on the generalised eigenspace
 *       {@code S = s(P)} is the semisimple part of P, with minimal polynomial f, and {@code N = P - S} the nilpotent
 *       part; both are polynomials in P and commute. Then {@code P^n E_f = sum_k binomial(n, k) S^(n-k) N^k E_f},
 *       and S splits by roots as above: {@code E_r = E_f q_r(S) / f'(r)} with {@code q_r(y) = f(y)/(y - r)}, so
 *       {@code P^n E_f = sum_{k<J} binomial(n, k) sum_{t<e} C_(k,t) p_(n-k+t)} with J the Jordan index (the least
 *       J with {@code N^J E_f = 0}; 1 without a Jordan block) and {@code C_(k,t) = sum_i h_(i,t) S^i N^k E_f}. The
 *       terms with k &gt; n vanish (the binomial is 0).</li>
 * </ul>
 * For e = 2 with roots {@code u/2 +- (s/2) sqrt(D)}, each k gives
 * {@code binomial(n, k) (X_k (l1^(n-k) + l2^(n-k)) + Y_k (l1^(n-k) - l2^(n-k))/sqrt(D))}, real for real parameters
 * whatever the sign of D.
 */
final class Spectral {

    /** What kind of eigenvalues a factor has. */
    enum Kind { LINEAR, QUADRATIC, ROOTS }

    /** One irreducible factor of the characteristic polynomial with its part of P^n. */
    static final class Group {
        final GenPolynomial<Quotient<BigRational>> factor;
        final int degree;
        final int multiplicity;
        final Kind kind;
        final Quotient<BigRational>[][] projector;
        /** Coefficients of the monic factor, a_0 .. a_e. */
        final Quotient<BigRational>[] coeffs;
        /** LINEAR: the eigenvalue. */
        Quotient<BigRational> lambda;
        /** LINEAR: N_k = (P - lambda I)^k E, k below the Jordan index. */
        List<Quotient<BigRational>[][]> nilpotent = List.of();
        /** QUADRATIC: roots u/2 +- (scale/2) sqrt(delta), delta free of square factors. */
        Quotient<BigRational> u;
        Quotient<BigRational> scale;
        Quotient<BigRational> delta;
        /** QUADRATIC: X_k and Y_k, k below the Jordan index. */
        List<Quotient<BigRational>[][]> x = List.of();
        List<Quotient<BigRational>[][]> y = List.of();
        /**
         * ROOTS (and QUADRATIC): {@code c.get(k).get(t)} is C_(k,t) in
         * {@code P^n E = sum_k binomial(n, k) sum_t C_(k,t) p_(n-k+t)}, k below the Jordan index.
         */
        List<List<Quotient<BigRational>[][]>> c = List.of();
        /** Order of the roots as roots of unity, or 0 if they are not all roots of unity. */
        int unitOrder;
        /** ROOTS: printed name of the factor, f1, f2, ... */
        String name = "";

        Group(GenPolynomial<Quotient<BigRational>> factor, int multiplicity, Kind kind,
              Quotient<BigRational>[][] projector, Quotient<BigRational>[] coeffs) {
            this.factor = factor;
            this.degree = (int) factor.degree(0);
            this.multiplicity = multiplicity;
            this.kind = kind;
            this.projector = projector;
            this.coeffs = coeffs;
        }

        boolean isZeroEigenvalue() {
            return kind == Kind.LINEAR && lambda.isZERO();
        }

        /** The Jordan index: the size of the largest Jordan block of each root (1: none). */
        int index() {
            return kind == Kind.LINEAR ? nilpotent.size() : c.size();
        }
    }

    /** The powers, characteristic polynomial and adjugate this decomposition starts from. */
    final Series series;
    final List<Group> groups;

    private Spectral(Series series, List<Group> groups) {
        this.series = series;
        this.groups = groups;
    }

    static Spectral of(Series sr, Progress progress) {
        List<Group> groups = decompose(sr.field, sr.matrix, sr.powers, sr.chi, sr.adjugate, sr.factors, sr.multiplicities,
            sr.numeric, progress);
        return new Spectral(sr, groups);
    }

    static Quotient<BigRational>[] coefficients(ParamField f, GenPolynomial<Quotient<BigRational>> p, int degree) {
        @SuppressWarnings("unchecked")
        Quotient<BigRational>[] a = (Quotient<BigRational>[]) new Quotient[degree + 1];
        java.util.Arrays.fill(a, f.zero());
        for (Map.Entry<ExpVector, Quotient<BigRational>> t : p.getMap().entrySet()) {
            a[(int) t.getKey().getVal(0)] = t.getValue();
        }
        return a;
    }

    /** {@code q(P)} for a polynomial of degree at most s, from the stored powers. */
    private static Quotient<BigRational>[][] evalAt(ParamField f, GenPolynomial<Quotient<BigRational>> q,
                                                    List<Quotient<BigRational>[][]> powers) {
        int s = powers.get(0).length;
        Quotient<BigRational>[][] r = Mat.zero(f, s);
        for (Map.Entry<ExpVector, Quotient<BigRational>> t : q.getMap().entrySet()) {
            r = Mat.addScaled(r, t.getValue(), powers.get((int) t.getKey().getVal(0)));
        }
        return r;
    }

    private static List<Group> decompose(ParamField f, Quotient<BigRational>[][] p,
                                         List<Quotient<BigRational>[][]> powers, GenPolynomial<Quotient<BigRational>> chi,
                                         List<Quotient<BigRational>[][]> adj,
                                         List<GenPolynomial<Quotient<BigRational>>> fs, List<Integer> ms,
                                         RationalRoute numeric, Progress progress) {
        int s = p.length;
        List<Group> groups = new ArrayList<>();
        Quotient<BigRational>[][] total = Mat.zero(f, s);
        GenPolynomial<Quotient<BigRational>> chiDeriv = derivative(f, chi);
        for (int i = 0; i < fs.size(); i++) {
            Steps.report(progress, "projectors", i, fs.size());
            GenPolynomial<Quotient<BigRational>> g = fs.get(i);
            int m = ms.get(i);
            if (m == 1) {
                Group gr = simple(f, g, chiDeriv, adj, numeric);
                total = Mat.addScaled(total, f.one(), gr.projector);
                gr.unitOrder = unitOrder(f, g, s);
                groups.add(gr);
                continue;
            }
            GenPolynomial<Quotient<BigRational>> gm = ParamField.power(g, m);
            GenPolynomial<Quotient<BigRational>> idem = f.univariate.getONE();
            Quotient<BigRational>[][] e;
            if (fs.size() == 1) {
                e = Mat.identity(f, s);
            } else {
                GenPolynomial<Quotient<BigRational>> h = chi.divide(gm);
                idem = h.multiply(ModInverse.of(f, h, gm)).remainder(chi);
                e = evalAt(f, idem, powers);
            }
            total = Mat.addScaled(total, f.one(), e);
            int deg = (int) g.degree(0);
            Quotient<BigRational>[] a = coefficients(f, g, deg);
            Kind kind = deg == 1 ? Kind.LINEAR : (deg == 2 ? Kind.QUADRATIC : Kind.ROOTS);
            Group gr = new Group(g, m, kind, e, a);
            if (kind == Kind.LINEAR) {
                gr.lambda = a[0].negate();
                List<Quotient<BigRational>[][]> nil = new ArrayList<>();
                Quotient<BigRational>[][] shifted = Mat.addScaled(p, gr.lambda.negate(), Mat.identity(f, s));
                Quotient<BigRational>[][] nk = e;
                while (!Mat.isZero(nk)) {
                    if (nil.size() == m) {
                        throw new QchainException(ErrorKey.INTERNAL, "Jordan chain longer than the multiplicity");
                    }
                    nil.add(nk);
                    nk = Mat.multiply(f, shifted, nk);
                }
                gr.nilpotent = List.copyOf(nil);
            } else {
                repeated(f, gr, gm, idem, chi, powers);
            }
            gr.unitOrder = unitOrder(f, g, s);
            groups.add(gr);
        }
        if (!Mat.equal(total, Mat.identity(f, s))) {
            throw new QchainException(ErrorKey.INTERNAL, "spectral projectors do not sum to the identity");
        }
        groups.sort(ORDER);
        int k = 1;
        for (Group g : groups) {
            if (g.kind == Kind.ROOTS) {
                g.name = "f" + k++;
            }
        }
        return List.copyOf(groups);
    }

    /** Eigenvalue 1 first, then the other linear factors, then by degree; ties by printed factor. */
    private static final Comparator<Group> ORDER = Comparator
        .comparingInt((Group g) -> g.kind == Kind.LINEAR && g.lambda.isONE() ? 0 : 1)
        .thenComparingInt(g -> g.degree)
        .thenComparing(g -> g.factor.toString());

    /**
     * Fills C_(k,t) (and X_k, Y_k) for a repeated factor f of degree e at least 2, Jordan block or not. All the work
     * is on polynomials modulo f^m (then times the idempotent e_f modulo chi, evaluated at P from the stored powers):
     * s with {@code f(s) = 0 mod f^m}, {@code s = x mod f} by Newton's iteration (each step doubles the power of f
     * that divides f(s); f' is invertible modulo f^m because f is irreducible, so separable, and
     * {@code s = x mod f}); the nilpotent part {@code v = x - s}; and
     * {@code C_(k,t) = [sum_i h_(i,t) s^i v^k e_f mod chi](P)} with {@code h_(i,t)} the coefficients of
     * {@code b_i(x)/f'(x) mod f}, {@code b_i} the coefficient of y^i in {@code f(y)/(y - x)}.
     */
    private static void repeated(ParamField f, Group gr, GenPolynomial<Quotient<BigRational>> fm,
                                 GenPolynomial<Quotient<BigRational>> idem, GenPolynomial<Quotient<BigRational>> chi,
                                 List<Quotient<BigRational>[][]> powers) {
        int e = gr.degree;
        Quotient<BigRational>[] a = gr.coeffs;
        GenPolynomial<Quotient<BigRational>> fd = derivative(f, gr.factor);
        GenPolynomial<Quotient<BigRational>> xpoly = f.univariate.univariate(0);
        GenPolynomial<Quotient<BigRational>> sp = xpoly;
        for (int step = 0; step <= gr.multiplicity; step++) {
            GenPolynomial<Quotient<BigRational>> fs = compose(gr.factor, sp, fm);
            if (fs.isZERO()) {
                break;
            }
            if (step == gr.multiplicity) {
                throw new QchainException(ErrorKey.INTERNAL, "Newton's iteration for the semisimple part did not end");
            }
            sp = sp.subtract(fs.multiply(ModInverse.of(f, compose(fd, sp, fm), fm))).remainder(fm);
        }
        GenPolynomial<Quotient<BigRational>> v = xpoly.subtract(sp);
        // h_(i,t): b_i(x) / f'(x) mod f
        GenPolynomial<Quotient<BigRational>> w = ModInverse.of(f, fd, gr.factor);
        List<Quotient<BigRational>[]> h = new ArrayList<>();
        for (int i = 0; i < e; i++) {
            GenPolynomial<Quotient<BigRational>> b = f.univariate.getZERO();
            for (int j = i + 1; j <= e; j++) {
                b = b.sum(a[j], ExpVector.create(1, 0, j - i - 1));
            }
            h.add(coefficients(f, b.multiply(w).remainder(gr.factor), e - 1));
        }
        // s^i e_f mod f^m, i < e
        List<GenPolynomial<Quotient<BigRational>>> si = new ArrayList<>();
        si.add(f.univariate.getONE());
        for (int i = 1; i < e; i++) {
            si.add(si.get(i - 1).multiply(sp).remainder(fm));
        }
        List<List<Quotient<BigRational>[][]>> c = new ArrayList<>();
        GenPolynomial<Quotient<BigRational>> vk = f.univariate.getONE();
        for (int k = 0; ; k++) {
            List<Quotient<BigRational>[][]> ck = new ArrayList<>();
            boolean zero = true;
            for (int t = 0; t < e; t++) {
                GenPolynomial<Quotient<BigRational>> g = f.univariate.getZERO();
                for (int i = 0; i < e; i++) {
                    g = g.sum(si.get(i).multiply(h.get(i)[t]));
                }
                Quotient<BigRational>[][] m = evalAt(f, g.multiply(vk).remainder(fm).multiply(idem).remainder(chi), powers);
                zero &= Mat.isZero(m);
                ck.add(m);
            }
            if (zero) {
                break;
            }
            if (k == gr.multiplicity) {
                throw new QchainException(ErrorKey.INTERNAL, "Jordan chain longer than the multiplicity");
            }
            c.add(List.copyOf(ck));
            vk = vk.multiply(v).remainder(fm);
        }
        gr.c = List.copyOf(c);
        quadraticParts(f, gr);
    }

    /** {@code p(s) mod m}, by Horner's rule. */
    private static GenPolynomial<Quotient<BigRational>> compose(GenPolynomial<Quotient<BigRational>> p,
                                                               GenPolynomial<Quotient<BigRational>> s,
                                                               GenPolynomial<Quotient<BigRational>> m) {
        int d = (int) p.degree(0);
        GenPolynomial<Quotient<BigRational>> r = p.ring.getZERO();
        for (int k = d; k >= 0; k--) {
            r = r.multiply(s).sum(p.coefficient(ExpVector.create(1, 0, k)), p.ring.evzero).remainder(m);
        }
        return r;
    }

    /**
     * A factor of multiplicity 1: for each root r, {@code E_r = adj(rI - P) / chi'(r)}; reducing
     * {@code x^(s-1-k) / chi'(x)} modulo f gives {@code C_t = sum_k [x^(s-1-k) chi'(x)^-1 mod f]_t B_k} directly,
     * with no projector and no matrix product.
     */
    private static Group simple(ParamField f, GenPolynomial<Quotient<BigRational>> g,
                                GenPolynomial<Quotient<BigRational>> chiDeriv, List<Quotient<BigRational>[][]> adj,
                                RationalRoute numeric) {
        int s = adj.size();
        int e = (int) g.degree(0);
        Quotient<BigRational>[] a = coefficients(f, g, e);
        Kind kind = e == 1 ? Kind.LINEAR : (e == 2 ? Kind.QUADRATIC : Kind.ROOTS);
        if (numeric != null) {
            // no free parameter: the same parts in integer arithmetic
            List<Quotient<BigRational>> ps = new Evaluator<>(f.field, q -> q).powerSums(new Group(g, 1, kind, null, a), e - 1);
            RationalRoute.Parts parts = numeric.simple(g, chiDeriv, ps);
            return simpleGroup(f, g, kind, a, parts.c(), parts.projector());
        }
        GenPolynomial<Quotient<BigRational>> w = ModInverse.of(f, chiDeriv, g);
        List<Quotient<BigRational>[][]> c = new ArrayList<>();
        for (int t = 0; t < e; t++) {
            c.add(Mat.zero(f, s));
        }
        GenPolynomial<Quotient<BigRational>> xk = w; // x^0 * w, then times x each step
        for (int k = s - 1; k >= 0; k--) {
            Quotient<BigRational>[] h = coefficients(f, xk, e - 1);
            for (int t = 0; t < e; t++) {
                c.set(t, Mat.addScaled(c.get(t), h[t], adj.get(k)));
            }
            xk = xk.multiply(f.univariate.univariate(0)).remainder(g);
        }
        // E_f = sum_t C_t p_t with p_t the power sums of the roots of f
        Group probe = new Group(g, 1, kind, null, a);
        List<Quotient<BigRational>> ps = new Evaluator<>(f.field, q -> q).powerSums(probe, e - 1);
        Quotient<BigRational>[][] proj = Mat.zero(f, s);
        for (int t = 0; t < e; t++) {
            proj = Mat.addScaled(proj, ps.get(t), c.get(t));
        }
        return simpleGroup(f, g, kind, a, c, proj);
    }

    private static Group simpleGroup(ParamField f, GenPolynomial<Quotient<BigRational>> g, Kind kind,
                                     Quotient<BigRational>[] a, List<Quotient<BigRational>[][]> c,
                                     Quotient<BigRational>[][] proj) {
        Group gr = new Group(g, 1, kind, proj, a);
        if (kind == Kind.LINEAR) {
            gr.lambda = a[0].negate();
            gr.nilpotent = java.util.Collections.singletonList(proj);
        } else {
            gr.c = List.of(List.copyOf(c));
            quadraticParts(f, gr);
        }
        return gr;
    }

    /** The derivative of a univariate polynomial over Q. */
    static GenPolynomial<BigRational> derivativeOf(GenPolynomial<BigRational> p) {
        GenPolynomial<BigRational> d = p.ring.getZERO();
        for (Map.Entry<ExpVector, BigRational> t : p.getMap().entrySet()) {
            long k = t.getKey().getVal(0);
            if (k > 0) {
                d = d.sum(t.getValue().multiply(new BigRational(k)), ExpVector.create(1, 0, k - 1));
            }
        }
        return d;
    }

    static GenPolynomial<Quotient<BigRational>> derivative(ParamField f, GenPolynomial<Quotient<BigRational>> p) {
        GenPolynomial<Quotient<BigRational>> d = f.univariate.getZERO();
        for (Map.Entry<ExpVector, Quotient<BigRational>> t : p.getMap().entrySet()) {
            long k = t.getKey().getVal(0);
            if (k > 0) {
                d = d.sum(t.getValue().multiply(f.of(k)), ExpVector.create(1, 0, k - 1));
            }
        }
        return d;
    }

    /**
     * X_k and Y_k of a quadratic factor from C_(k,0), C_(k,1): with roots {@code l = u/2 +- (s/2) sqrt(core)},
     * {@code sum_l l^j (C_0 + C_1 l) = (C_0 + (u/2) C_1)(l1^j + l2^j) + (s core/2) C_1 (l1^j - l2^j)/sqrt(core)}.
     */
    private static void quadraticParts(ParamField f, Group gr) {
        Quotient<BigRational>[] a = gr.coeffs;
        if (gr.kind == Kind.QUADRATIC) {
            Quotient<BigRational> two = f.of(2);
            gr.u = a[1].negate();
            Quotient<BigRational> delta = a[1].multiply(a[1]).subtract(a[0].multiply(f.of(4)));
            // delta = s^2 * core with the square factors pulled out, so the roots read u/2 +- (s/2) sqrt(core)
            Quotient<BigRational>[] split = Radicals.split(f, delta);
            gr.scale = split[0];
            gr.delta = split[1];
            List<Quotient<BigRational>[][]> xs = new ArrayList<>();
            List<Quotient<BigRational>[][]> ys = new ArrayList<>();
            for (List<Quotient<BigRational>[][]> c : gr.c) {
                xs.add(Mat.addScaled(c.get(0), gr.u.divide(two), c.get(1)));
                // Y (l1^n - l2^n)/sqrt(delta) with Y = (delta/2) C_1, written over sqrt(core): Y / s
                ys.add(Mat.addScaled(Mat.zero(f, gr.projector.length), delta.divide(two).divide(gr.scale), c.get(1)));
            }
            gr.x = List.copyOf(xs);
            gr.y = List.copyOf(ys);
        }
    }

    /** k if the parameter-free factor divides x^k - 1 for some k at most s (its roots are k-th roots of unity). */
    private static int unitOrder(ParamField f, GenPolynomial<Quotient<BigRational>> g, int s) {
        for (Quotient<BigRational> c : g.getMap().values()) {
            if (!ParamField.isConstant(c)) {
                return 0;
            }
        }
        for (int k = 1; k <= s; k++) {
            GenPolynomial<Quotient<BigRational>> xk = f.univariate.getONE().multiply(f.one(), ExpVector.create(1, 0, k))
                .subtract(f.univariate.getONE());
            if (xk.remainder(g).isZERO()) {
                return k;
            }
        }
        return 0;
    }
}
