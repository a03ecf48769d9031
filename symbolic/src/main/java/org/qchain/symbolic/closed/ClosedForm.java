package org.qchain.symbolic.closed;

import edu.jas.arith.BigRational;
import edu.jas.poly.ExpVector;
import edu.jas.poly.GenPolynomial;
import edu.jas.ufd.Quotient;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;

/**
 * P^n of a discrete-time chain as formulas in a symbolic n and the chain's free parameters, with what goes with
 * them: the validity range in n, the parameter conditions, the eigenvalues, the generating function and the linear
 * recurrence of every entry, and the long-run behaviour. Immutable; made by {@link ClosedForms}.
 *
 * <p>Every formula is in the plain syntax ({@code ^} for powers, {@code sqrt(...)}, {@code binomial(n, k)},
 * {@code rootsum(k, f)} for the sum of r^k over the roots r of the named factor f) and, through the
 * {@code latex} methods, in LaTeX. The formulas hold for {@code n >= validFrom()} and for parameter values at which
 * every entry of {@link #conditions()} holds; {@link #evaluate(long, Map)} checks both.
 */
public final class ClosedForm {
    /** The symbol of the step count in every formula. */
    public static final String N_SYMBOL = "n";

    private final ParamField field;
    private final Spectral spectral;
    private final List<String> states;
    private final int size;
    private final Spectral.Group zero;
    private final int validFrom;
    private final int[][] validFromEntry;
    private final Fml[][] formulas;
    private final List<GenPolynomial<BigRational>> conditionPolys;
    private final List<String> conditions;
    private final List<Eigenvalue> eigenvalues;
    /** Reduced generating functions, made on first use (idempotent, so an unsynchronised race is harmless). */
    private final List<GenPolynomial<Quotient<BigRational>>>[][] gfCache;

    ClosedForm(ParamField field, Spectral spectral, List<String> states) {
        this.field = field;
        this.spectral = spectral;
        this.states = List.copyOf(states);
        this.size = spectral.size;
        Spectral.Group z = null;
        for (Spectral.Group g : spectral.groups) {
            if (g.isZeroEigenvalue()) {
                z = g;
            }
        }
        this.zero = z;
        this.validFrom = z == null ? 0 : z.nilpotent.size();
        this.validFromEntry = new int[size][size];
        this.formulas = new Fml[size][size];
        for (int i = 0; i < size; i++) {
            for (int j = 0; j < size; j++) {
                int v = 0;
                if (z != null) {
                    for (int k = 0; k < z.nilpotent.size(); k++) {
                        if (!z.nilpotent.get(k)[i][j].isZERO()) {
                            v = k + 1;
                        }
                    }
                }
                validFromEntry[i][j] = v;
                formulas[i][j] = buildFormula(i, j);
            }
        }
        this.conditionPolys = collectConditions();
        List<String> c = new ArrayList<>();
        for (GenPolynomial<BigRational> p : conditionPolys) {
            c.add(Fml.plain(field.formula(p)) + " != 0");
        }
        this.conditions = List.copyOf(c);
        this.eigenvalues = describeEigenvalues();
        @SuppressWarnings("unchecked")
        List<GenPolynomial<Quotient<BigRational>>>[][] cache = (List<GenPolynomial<Quotient<BigRational>>>[][]) new List[size][size];
        this.gfCache = cache;
    }

    // --- the formulas ------------------------------------------------------------------------------------------

    private static final Fml N = Fml.name(N_SYMBOL);

    private Fml buildFormula(int i, int j) {
        List<Fml> terms = new ArrayList<>();
        for (Spectral.Group g : spectral.groups) {
            if (g != zero) {
                terms.add(term(g, i, j));
            }
        }
        return Fml.sum(terms);
    }

    private Fml term(Spectral.Group g, int i, int j) {
        List<Fml> terms = new ArrayList<>();
        switch (g.kind) {
            case LINEAR:
                for (int k = 0; k < g.nilpotent.size(); k++) {
                    Quotient<BigRational> c = g.nilpotent.get(k)[i][j];
                    if (c.isZERO()) {
                        continue;
                    }
                    Fml binom = k == 0 ? Fml.ONE : (k == 1 ? N : Fml.call("binomial", N, Fml.integer(k)));
                    // a constant eigenvalue is never 0 here, so binomial(n, k) lambda^(n-k) N_k is written with
                    // lambda^n and the coefficient N_k / lambda^k; a parametric one keeps lambda^(n-k), which
                    // needs no condition lambda != 0
                    boolean constant = ParamField.isConstant(g.lambda);
                    Fml exponent = k == 0 || constant ? N : Fml.sum(N, Fml.neg(Fml.integer(k)));
                    Quotient<BigRational> coef = constant ? c.divide(ParamField.power(g.lambda, k == 0 ? 1 : k))
                        .multiply(k == 0 ? g.lambda : field.one()) : c;
                    Fml power = g.lambda.isONE() ? Fml.ONE : Fml.pow(field.formula(g.lambda), exponent);
                    terms.add(Fml.prod(List.of(field.formula(coef), binom, power)));
                }
                break;
            case QUADRATIC: {
                Quotient<BigRational> x = g.x[i][j];
                Quotient<BigRational> y = g.y[i][j];
                Fml sqrt = Fml.call("sqrt", field.formula(g.delta));
                List<Fml> roots = quadraticRoots(g);
                Fml l1n = Fml.pow(roots.get(0), N);
                Fml l2n = Fml.pow(roots.get(1), N);
                if (!x.isZERO()) {
                    terms.add(Fml.prod(field.formula(x), Fml.sum(l1n, l2n)));
                }
                if (!y.isZERO()) {
                    terms.add(Fml.prod(field.formula(y), Fml.div(Fml.sum(l1n, Fml.neg(l2n)), sqrt)));
                }
                break;
            }
            default:
                for (int t = 0; t < g.degree; t++) {
                    Quotient<BigRational> c = g.c.get(t)[i][j];
                    if (!c.isZERO()) {
                        Fml k = t == 0 ? N : Fml.sum(N, Fml.integer(t));
                        terms.add(Fml.prod(field.formula(c), Fml.call("rootsum", k, Fml.name(g.name))));
                    }
                }
        }
        return Fml.sum(terms);
    }

    // --- conditions --------------------------------------------------------------------------------------------

    private List<GenPolynomial<BigRational>> collectConditions() {
        Map<String, GenPolynomial<BigRational>> out = new TreeMap<>();
        Map<GenPolynomial<BigRational>, Boolean> seen = new LinkedHashMap<>();
        for (Spectral.Group g : spectral.groups) {
            if (g == zero) {
                continue;
            }
            List<Quotient<BigRational>> used = new ArrayList<>(List.of(g.coeffs));
            if (g.kind == Spectral.Kind.LINEAR) {
                for (Quotient<BigRational>[][] m : g.nilpotent) {
                    addAll(used, m);
                }
            } else if (g.kind == Spectral.Kind.QUADRATIC) {
                addAll(used, g.x);
                addAll(used, g.y);
                used.add(g.delta);
                // sqrt(D) stands in a denominator: D != 0
                for (GenPolynomial<BigRational> p : field.irreducibleFactors(g.delta.num)) {
                    out.put(key(p), p);
                }
            } else {
                for (Quotient<BigRational>[][] m : g.c) {
                    addAll(used, m);
                }
            }
            for (Quotient<BigRational> q : used) {
                if (!q.den.isConstant() && seen.put(q.den, Boolean.TRUE) == null) {
                    for (GenPolynomial<BigRational> p : field.irreducibleFactors(q.den)) {
                        out.put(key(p), p);
                    }
                }
            }
        }
        List<GenPolynomial<BigRational>> list = new ArrayList<>(out.values());
        list.sort(Comparator.comparingLong((GenPolynomial<BigRational> p) -> p.totalDegree()).thenComparing(this::key));
        return List.copyOf(list);
    }

    private String key(GenPolynomial<BigRational> p) {
        return Fml.plain(field.formula(p));
    }

    private static void addAll(List<Quotient<BigRational>> out, Quotient<BigRational>[][] m) {
        for (Quotient<BigRational>[] row : m) {
            for (Quotient<BigRational> q : row) {
                if (!q.isZERO()) {
                    out.add(q);
                }
            }
        }
    }

    // --- eigenvalues -------------------------------------------------------------------------------------------

    private List<Eigenvalue> describeEigenvalues() {
        List<Eigenvalue> out = new ArrayList<>();
        for (Spectral.Group g : spectral.groups) {
            Fml f = field.formula(g.factor, "x");
            List<String> values = new ArrayList<>();
            String kind;
            if (g.kind == Spectral.Kind.LINEAR) {
                kind = "rational";
                values.add(Fml.plain(field.formula(g.lambda)));
            } else if (g.kind == Spectral.Kind.QUADRATIC) {
                kind = "quadratic";
                for (Fml r : quadraticRoots(g)) {
                    values.add(Fml.plain(r));
                }
            } else {
                kind = "roots";
                values.add("roots of " + g.name);
            }
            out.add(new Eigenvalue(Fml.plain(f), Fml.latex(f), g.degree, g.multiplicity, g.index(), kind, values,
                g.name, g.unitOrder));
        }
        return List.copyOf(out);
    }

    /** u/2 + (s/2) sqrt(D) and u/2 - (s/2) sqrt(D). */
    private List<Fml> quadraticRoots(Spectral.Group g) {
        Fml sqrt = Fml.call("sqrt", field.formula(g.delta));
        Quotient<BigRational> half = field.of(2).inverse();
        Fml mid = field.formula(g.u.multiply(half));
        Fml w = Fml.prod(field.formula(g.scale.multiply(half)), sqrt);
        return List.of(Fml.sum(mid, w), Fml.sum(mid, Fml.neg(w)));
    }

    // --- public API --------------------------------------------------------------------------------------------

    /** The symbol of the step count, {@code n}. */
    public String nSymbol() {
        return N_SYMBOL;
    }

    /** The state names; their order fixes rows and columns. */
    public List<String> states() {
        return states;
    }

    /** The free parameters the formulas use, in declaration order. */
    public List<String> parameters() {
        return field.names;
    }

    /**
     * The least n from which every formula of the matrix holds: 0 unless 0 is an eigenvalue with a nilpotent part,
     * whose terms vanish exactly from this n on.
     */
    public int validFrom() {
        return validFrom;
    }

    /**
     * The least n from which the formula of entry (i, j) holds.
     *
     * @throws IndexOutOfBoundsException if i or j is out of range
     */
    public int validFrom(int i, int j) {
        return validFromEntry[i][j];
    }

    /**
     * The conditions on the parameters under which the formulas hold, each {@code "POLY != 0"} with POLY an
     * irreducible polynomial over Q (a denominator of a coefficient, or the discriminant under a square root).
     */
    public List<String> conditions() {
        return conditions;
    }

    /** The factors of the characteristic polynomial and their eigenvalues: eigenvalue 1 first. */
    public List<Eigenvalue> eigenvalues() {
        return eigenvalues;
    }

    /**
     * The formula of P^n entry (i, j), plain syntax, valid for {@code n >= validFrom(i, j)}.
     *
     * @throws IndexOutOfBoundsException if i or j is out of range
     */
    public String formula(int i, int j) {
        return Fml.plain(formulas[i][j]);
    }

    /** The formula of entry (i, j) in LaTeX. */
    public String latex(int i, int j) {
        return Fml.latex(formulas[i][j]);
    }

    /** All formulas, row by row, plain syntax. */
    public List<List<String>> matrix() {
        List<List<String>> out = new ArrayList<>();
        for (int i = 0; i < size; i++) {
            List<String> row = new ArrayList<>();
            for (int j = 0; j < size; j++) {
                row.add(formula(i, j));
            }
            out.add(List.copyOf(row));
        }
        return List.copyOf(out);
    }

    /**
     * P^n for one small n below {@link #validFrom()}, exactly, as formulas in the parameters.
     *
     * @param n 0 .. validFrom() - 1 (any n up to the number of states is accepted)
     * @return the matrix, plain syntax
     * @throws IllegalArgumentException if n is negative or larger than the number of states
     */
    public List<List<String>> initial(int n) {
        if (n < 0 || n > size) {
            throw new IllegalArgumentException("n = " + n + " outside 0.." + size);
        }
        return plainMatrix(spectral.powers.get(n));
    }

    private List<List<String>> plainMatrix(Quotient<BigRational>[][] m) {
        List<List<String>> out = new ArrayList<>();
        for (Quotient<BigRational>[] row : m) {
            List<String> r = new ArrayList<>();
            for (Quotient<BigRational> q : row) {
                r.add(Fml.plain(field.formula(q)));
            }
            out.add(List.copyOf(r));
        }
        return List.copyOf(out);
    }

    /**
     * P^n evaluated exactly at a parameter point, from the closed form (for n below {@link #validFrom()} from the
     * initial terms).
     *
     * @param n  the step count, at least 0
     * @param at a value for every parameter in {@link #parameters()}
     * @return the exact matrix
     * @throws IllegalArgumentException if n is negative
     * @throws QchainException          with {@link ErrorKey#BAD_ARGUMENT} if a parameter has no value, or
     *                                  {@link ErrorKey#CLOSED_FORM_CONDITION} if a condition fails at the point
     */
    public RationalMatrix evaluate(long n, Map<String, Rational> at) {
        if (n < 0) {
            throw new IllegalArgumentException("n must not be negative: " + n);
        }
        for (String p : field.names) {
            if (!at.containsKey(p)) {
                throw new QchainException(ErrorKey.BAD_ARGUMENT, "parameter values", at.keySet(), "no value for " + p);
            }
        }
        for (GenPolynomial<BigRational> c : conditionPolys) {
            if (field.evaluate(c, at).isZERO()) {
                throw new QchainException(ErrorKey.CLOSED_FORM_CONDITION, Fml.plain(field.formula(c)) + " != 0", at);
            }
        }
        Rational[][] out = new Rational[size][size];
        if (n < validFrom) {
            for (int i = 0; i < size; i++) {
                for (int j = 0; j < size; j++) {
                    out[i][j] = ParamField.rational(substitute(spectral.powers.get((int) n)[i][j], at));
                }
            }
            return RationalMatrix.of(out);
        }
        Evaluator<BigRational> ev = new Evaluator<>(BigRational.ZERO, q -> substitute(q, at));
        for (int i = 0; i < size; i++) {
            for (int j = 0; j < size; j++) {
                BigRational s = BigRational.ZERO;
                for (Spectral.Group g : spectral.groups) {
                    if (g != zero) {
                        s = s.sum(ev.entry(g, n, i, j));
                    }
                }
                out[i][j] = ParamField.rational(s);
            }
        }
        return RationalMatrix.of(out);
    }

    private BigRational substitute(Quotient<BigRational> q, Map<String, Rational> at) {
        BigRational d = field.evaluate(q.den, at);
        if (d.isZERO()) {
            throw new QchainException(ErrorKey.CLOSED_FORM_CONDITION, Fml.plain(field.formula(q.den)) + " != 0", at);
        }
        return field.evaluate(q.num, at).divide(d);
    }

    /** The formula part of P^n with the parameters kept symbolic (for n >= validFrom), exactly. */
    Quotient<BigRational>[][] evaluateSymbolic(long n) {
        Evaluator<Quotient<BigRational>> ev = new Evaluator<>(field.field, q -> q);
        Quotient<BigRational>[][] out = Mat.create(size);
        for (int i = 0; i < size; i++) {
            for (int j = 0; j < size; j++) {
                Quotient<BigRational> s = field.zero();
                for (Spectral.Group g : spectral.groups) {
                    if (g != zero) {
                        s = s.sum(ev.entry(g, n, i, j));
                    }
                }
                out[i][j] = s;
            }
        }
        return out;
    }

    ParamField field() {
        return field;
    }

    Spectral spectral() {
        return spectral;
    }

    // --- generating function and recurrence ---------------------------------------------------------------------

    /** Numerator and denominator in z of entry (i, j) of (I - zP)^-1, reduced, denominator(0) = 1. */
    List<GenPolynomial<Quotient<BigRational>>> gfParts(int i, int j) {
        // adj(I - zP) = sum_k B_k z^k with B_k = sum_{m<=k} c_m P^(k-m); det(I - zP) = sum_k c_k z^k
        List<GenPolynomial<Quotient<BigRational>>> cached = gfCache[i][j];
        if (cached != null) {
            return cached;
        }
        GenPolynomial<Quotient<BigRational>> num = field.univariate.getZERO();
        GenPolynomial<Quotient<BigRational>> den = field.univariate.getZERO();
        List<Quotient<BigRational>> c = spectral.charCoeffs;
        for (int k = 0; k <= size; k++) {
            den = den.sum(c.get(k), ExpVector.create(1, 0, k));
            if (k < size) {
                num = num.sum(spectral.adjugate.get(k)[i][j], ExpVector.create(1, 0, k));
            }
        }
        List<GenPolynomial<Quotient<BigRational>>> out;
        if (num.isZERO()) {
            out = List.of(num, field.univariate.getONE());
        } else {
            // det(I - zP) = prod over factors f^m of chi of rev(f)^m, rev(f)(z) = z^deg f * f(1/z): divide out
            // every common factor by trial division (no gcd over Q(parameters), whose coefficients swell)
            for (Spectral.Group g : spectral.groups) {
                GenPolynomial<Quotient<BigRational>> r = reversed(g.factor);
                if (r.degree(0) == 0) {
                    continue;
                }
                for (int k = 0; k < g.multiplicity; k++) {
                    GenPolynomial<Quotient<BigRational>>[] qn = num.quotientRemainder(r);
                    if (!qn[1].isZERO()) {
                        break;
                    }
                    num = qn[0];
                    den = den.divide(r);
                }
            }
            Quotient<BigRational> d0 = den.trailingBaseCoefficient();
            out = List.of(num.divide(d0), den.divide(d0));
        }
        gfCache[i][j] = out;
        return out;
    }

    private GenPolynomial<Quotient<BigRational>> reversed(GenPolynomial<Quotient<BigRational>> f) {
        long e = f.degree(0);
        GenPolynomial<Quotient<BigRational>> r = field.univariate.getZERO();
        for (Map.Entry<ExpVector, Quotient<BigRational>> t : f.getMap().entrySet()) {
            r = r.sum(t.getValue(), ExpVector.create(1, 0, e - t.getKey().getVal(0)));
        }
        return r;
    }

    /**
     * The generating function of entry (i, j).
     *
     * @throws IndexOutOfBoundsException if i or j is out of range
     */
    public GeneratingFunction generatingFunction(int i, int j) {
        List<GenPolynomial<Quotient<BigRational>>> parts = gfParts(i, j);
        // clear the parameters' denominators: multiply both by the lcm of all coefficient denominators
        GenPolynomial<BigRational> l = field.poly.getONE();
        for (GenPolynomial<Quotient<BigRational>> p : parts) {
            for (Quotient<BigRational> q : p.getMap().values()) {
                l = lcm(l, q.den);
            }
        }
        Fml num = zPolynomial(parts.get(0), l);
        Fml den = zPolynomial(parts.get(1), l);
        Fml whole = Fml.isOne(den) ? num : Fml.div(num, den);
        return new GeneratingFunction("z", Fml.plain(num), Fml.plain(den), Fml.plain(whole), Fml.latex(whole));
    }

    private GenPolynomial<BigRational> lcm(GenPolynomial<BigRational> a, GenPolynomial<BigRational> b) {
        if (b.isConstant()) {
            return a;
        }
        GenPolynomial<BigRational> g = a.gcd(b);
        return a.multiply(b).divide(g);
    }

    /** sum_k coeff_k z^k with each coefficient times l (a polynomial then), ascending in z. */
    private Fml zPolynomial(GenPolynomial<Quotient<BigRational>> p, GenPolynomial<BigRational> l) {
        List<Fml> terms = new ArrayList<>();
        Quotient<BigRational> lq = new Quotient<>(field.field, l);
        TreeMap<Long, Quotient<BigRational>> byPower = new TreeMap<>();
        for (Map.Entry<ExpVector, Quotient<BigRational>> t : p.getMap().entrySet()) {
            byPower.put(t.getKey().getVal(0), t.getValue().multiply(lq));
        }
        for (Map.Entry<Long, Quotient<BigRational>> t : byPower.entrySet()) {
            Fml c = field.formula(t.getValue());
            long k = t.getKey();
            Fml zk = k == 0 ? Fml.ONE : Fml.pow(Fml.name("z"), Fml.integer(k));
            terms.add(Fml.prod(c, zk));
        }
        return Fml.sum(terms);
    }

    /** r_1 .. r_d and the first n from which u(n) = sum r_k u(n - k) holds, for entry (i, j). */
    List<Quotient<BigRational>> recurrenceCoefficients(int i, int j) {
        List<GenPolynomial<Quotient<BigRational>>> parts = gfParts(i, j);
        GenPolynomial<Quotient<BigRational>> den = parts.get(1);
        int d = (int) den.degree(0);
        Quotient<BigRational>[] a = Spectral.coefficients(field, den, d);
        List<Quotient<BigRational>> r = new ArrayList<>();
        for (int k = 1; k <= d; k++) {
            r.add(a[k].negate());
        }
        return r;
    }

    int recurrenceStart(int i, int j) {
        List<GenPolynomial<Quotient<BigRational>>> parts = gfParts(i, j);
        long dn = parts.get(0).isZERO() ? -1 : parts.get(0).degree(0);
        return (int) Math.max(parts.get(1).degree(0), dn + 1);
    }

    /**
     * The linear recurrence of entry (i, j) with its initial values.
     *
     * @throws IndexOutOfBoundsException if i or j is out of range
     */
    public Recurrence recurrence(int i, int j) {
        List<Quotient<BigRational>> r = recurrenceCoefficients(i, j);
        int start = recurrenceStart(i, j);
        List<String> coeffs = new ArrayList<>();
        List<Fml> rhs = new ArrayList<>();
        for (int k = 0; k < r.size(); k++) {
            Fml c = field.formula(r.get(k));
            coeffs.add(Fml.plain(c));
            Fml arg = Fml.sum(N, Fml.neg(Fml.integer(k + 1)));
            rhs.add(Fml.prod(c, Fml.call("u", arg)));
        }
        List<String> init = new ArrayList<>();
        List<String> initLatex = new ArrayList<>();
        for (int k = 0; k < start; k++) {
            Fml v = field.formula(spectral.powers.get(k)[i][j]);
            init.add(Fml.plain(v));
            initLatex.add("u(" + k + ") = " + Fml.latex(v));
        }
        Fml right = Fml.sum(rhs);
        StringBuilder plain = new StringBuilder("u(n) = " + Fml.plain(right) + " for n >= " + start);
        for (int k = 0; k < init.size(); k++) {
            plain.append("; u(").append(k).append(") = ").append(init.get(k));
        }
        String latex = "u(n) = " + Fml.latex(right) + " \\quad (n \\ge " + start + ")"
            + (initLatex.isEmpty() ? "" : ",\\; " + String.join(",\\; ", initLatex));
        return new Recurrence(r.size(), coeffs, start, init, plain.toString(), latex);
    }

    // --- long run ----------------------------------------------------------------------------------------------

    /**
     * The long-run behaviour: period, limits of the subsequences, and the convergence rate. It assumes parameter
     * values inside their domains, where the zero pattern of P (and so every period) is that of generic values.
     */
    public LongRun longRun() {
        int d = 1;
        List<Spectral.Group> unit = new ArrayList<>();
        List<Fml> moduli = new ArrayList<>();
        for (Spectral.Group g : spectral.groups) {
            if (g.unitOrder > 0) {
                unit.add(g);
                d = lcm(d, g.unitOrder);
            } else if (g != zero) {
                moduli.add(modulus(g));
            }
        }
        Evaluator<Quotient<BigRational>> ev = new Evaluator<>(field.field, q -> q);
        List<List<List<String>>> limits = new ArrayList<>();
        for (int r = 0; r < d; r++) {
            Quotient<BigRational>[][] m = Mat.zero(field, size);
            for (int i = 0; i < size; i++) {
                for (int j = 0; j < size; j++) {
                    Quotient<BigRational> s = field.zero();
                    for (Spectral.Group g : unit) {
                        s = s.sum(ev.entry(g, r, i, j));
                    }
                    m[i][j] = s;
                }
            }
            limits.add(plainMatrix(m));
        }
        Fml rate = moduli.isEmpty() ? Fml.ZERO : (moduli.size() == 1 ? moduli.get(0) : new Fml.Call("max", List.copyOf(moduli)));
        return new LongRun(d, limits, Fml.plain(rate), Fml.latex(rate));
    }

    private Fml modulus(Spectral.Group g) {
        if (g.kind == Spectral.Kind.LINEAR) {
            return Fml.call("abs", field.formula(g.lambda));
        }
        if (g.kind == Spectral.Kind.QUADRATIC) {
            if (ParamField.isConstant(g.delta) && ParamField.constantValue(g.delta).signum() < 0) {
                // a complex pair for every parameter value: both roots have modulus sqrt(l1 l2) = sqrt(a_0)
                return Fml.call("sqrt", field.formula(g.coeffs[0]));
            }
            List<Fml> r = quadraticRoots(g);
            return Fml.call("max", Fml.call("abs", r.get(0)), Fml.call("abs", r.get(1)));
        }
        return Fml.call("maxabsroot", Fml.name(g.name));
    }

    private static int lcm(int a, int b) {
        return a / BigInteger.valueOf(a).gcd(BigInteger.valueOf(b)).intValue() * b;
    }
}
