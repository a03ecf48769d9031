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
 *   <li>f of degree e &ge; 2 with {@code f(P) E_f = 0} (no Jordan block on its roots): for each root r,
 *       {@code E_r = E_f q_r(P) / f'(r)} with {@code q_r(y) = f(y)/(y - r)}; reducing modulo f gives
 *       {@code P^n E_f = sum_{t<e} C_t p_(n+t)}, where {@code p_k} is the k-th power sum of the roots of f and the
 *       matrices {@code C_t} lie over Q(parameters). For e = 2 with roots {@code (u +- sqrt(D))/2} this is
 *       {@code X (l1^n + l2^n) + Y (l1^n - l2^n)/sqrt(D)}, real for real parameters whatever the sign of D.</li>
 * </ul>
 * A factor of degree &ge; 2 with a Jordan block is not handled (the generating function and the recurrence still
 * are).
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
        Quotient<BigRational>[][] x;
        Quotient<BigRational>[][] y;
        /** ROOTS (and QUADRATIC): P^n E = sum_t C_t p_(n+t). */
        List<Quotient<BigRational>[][]> c = List.of();
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

        /** The Jordan index (LINEAR) or 1. */
        int index() {
            return kind == Kind.LINEAR ? nilpotent.size() : 1;
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
            progress);
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
                                         Progress progress) {
        int s = p.length;
        List<Group> groups = new ArrayList<>();
        Quotient<BigRational>[][] total = Mat.zero(f, s);
        GenPolynomial<Quotient<BigRational>> chiDeriv = derivative(f, chi);
        for (int i = 0; i < fs.size(); i++) {
            Steps.report(progress, "projectors", i, fs.size());
            GenPolynomial<Quotient<BigRational>> g = fs.get(i);
            int m = ms.get(i);
            if (m == 1) {
                Group gr = simple(f, g, chiDeriv, adj);
                total = Mat.addScaled(total, f.one(), gr.projector);
                gr.unitOrder = unitOrder(f, g, s);
                groups.add(gr);
                continue;
            }
            GenPolynomial<Quotient<BigRational>> gm = ParamField.power(g, m);
            Quotient<BigRational>[][] e;
            if (fs.size() == 1) {
                e = Mat.identity(f, s);
            } else {
                GenPolynomial<Quotient<BigRational>> h = chi.divide(gm);
                GenPolynomial<Quotient<BigRational>> idem = h.multiply(h.modInverse(gm)).remainder(chi);
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
                semisimple(f, gr, powers);
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

    /** Fills X, Y (QUADRATIC) and C_t for a factor of degree at least 2, or refuses a Jordan block. */
    private static void semisimple(ParamField f, Group gr, List<Quotient<BigRational>[][]> powers) {
        int e = gr.degree;
        Quotient<BigRational>[] a = gr.coeffs;
        Quotient<BigRational>[][] fp = Mat.zero(f, gr.projector.length);
        for (int j = 0; j <= e; j++) {
            fp = Mat.addScaled(fp, a[j], powers.get(j));
        }
        if (!Mat.isZero(Mat.multiply(f, fp, gr.projector))) {
            throw new QchainException(ErrorKey.CLOSED_FORM_UNSUPPORTED,
                "the repeated factor " + Fml.plain(f.formula(gr.factor, "x"))
                    + " of the characteristic polynomial has a Jordan block; use the generating function or the recurrence");
        }
        // f'(x) and its inverse modulo f
        GenPolynomial<Quotient<BigRational>> w = derivative(f, gr.factor).modInverse(gr.factor);
        List<Quotient<BigRational>[][]> c = new ArrayList<>();
        for (int t = 0; t < e; t++) {
            c.add(Mat.zero(f, gr.projector.length));
        }
        for (int j = 0; j < e; j++) {
            // b_j(x) = sum_{i>j} a_i x^(i-j-1), the coefficient of y^j in f(y)/(y - x)
            GenPolynomial<Quotient<BigRational>> b = f.univariate.getZERO();
            for (int i = j + 1; i <= e; i++) {
                b = b.sum(a[i], ExpVector.create(1, 0, i - j - 1));
            }
            Quotient<BigRational>[] h = coefficients(f, b.multiply(w).remainder(gr.factor), e - 1);
            Quotient<BigRational>[][] ep = Mat.multiply(f, gr.projector, powers.get(j));
            for (int t = 0; t < e; t++) {
                c.set(t, Mat.addScaled(c.get(t), h[t], ep));
            }
        }
        gr.c = List.copyOf(c);
        quadraticParts(f, gr);
    }

    /**
     * A factor of multiplicity 1: for each root r, {@code E_r = adj(rI - P) / chi'(r)}; reducing
     * {@code x^(s-1-k) / chi'(x)} modulo f gives {@code C_t = sum_k [x^(s-1-k) chi'(x)^-1 mod f]_t B_k} directly,
     * with no projector and no matrix product.
     */
    private static Group simple(ParamField f, GenPolynomial<Quotient<BigRational>> g,
                                GenPolynomial<Quotient<BigRational>> chiDeriv, List<Quotient<BigRational>[][]> adj) {
        int s = adj.size();
        int e = (int) g.degree(0);
        Quotient<BigRational>[] a = coefficients(f, g, e);
        GenPolynomial<Quotient<BigRational>> w = chiDeriv.remainder(g).modInverse(g);
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
        Kind kind = e == 1 ? Kind.LINEAR : (e == 2 ? Kind.QUADRATIC : Kind.ROOTS);
        Group probe = new Group(g, 1, kind, null, a);
        List<Quotient<BigRational>> ps = new Evaluator<>(f.field, q -> q).powerSums(probe, e - 1);
        Quotient<BigRational>[][] proj = Mat.zero(f, s);
        for (int t = 0; t < e; t++) {
            proj = Mat.addScaled(proj, ps.get(t), c.get(t));
        }
        Group gr = new Group(g, 1, kind, proj, a);
        if (kind == Kind.LINEAR) {
            gr.lambda = a[0].negate();
            gr.nilpotent = java.util.Collections.singletonList(proj);
        } else {
            gr.c = List.copyOf(c);
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

    private static void quadraticParts(ParamField f, Group gr) {
        Quotient<BigRational>[] a = gr.coeffs;
        List<Quotient<BigRational>[][]> c = gr.c;
        if (gr.kind == Kind.QUADRATIC) {
            Quotient<BigRational> two = f.of(2);
            gr.u = a[1].negate();
            Quotient<BigRational> delta = a[1].multiply(a[1]).subtract(a[0].multiply(f.of(4)));
            // delta = s^2 * core with the square factors pulled out, so the roots read u/2 +- (s/2) sqrt(core)
            Quotient<BigRational>[] split = Radicals.split(f, delta);
            gr.scale = split[0];
            gr.delta = split[1];
            gr.x = Mat.addScaled(c.get(0), gr.u.divide(two), c.get(1));
            // Y (l1^n - l2^n)/sqrt(delta) with Y = (delta/2) C_1, written over sqrt(core): Y / s
            gr.y = Mat.addScaled(Mat.zero(f, gr.projector.length), delta.divide(two).divide(gr.scale), c.get(1));
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
