package org.qchain.symbolic.closed;

import edu.jas.arith.BigRational;
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
import org.qchain.exact.Progress;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.certified.CertifiedComplex;
import org.qchain.exact.certified.CertifiedReal;
import org.qchain.exact.certified.CertifiedRoots;
import org.qchain.exact.model.Domain;
import org.qchain.symbolic.ParamRing;
import org.qchain.symbolic.RatFun;
import org.qchain.symbolic.RatFunMatrix;

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
    /** The usual symbol of the step count; {@link #symbols()} has the one a closed form uses. */
    public static final String N_SYMBOL = "n";

    private final ParamField field;
    private final ParamRing ring;
    private final Spectral spectral;
    private final SeriesForm seriesForm;
    private final List<String> states;
    private final int size;
    private final Spectral.Group zero;
    private final int validFrom;
    private final int[][] validFromEntry;
    private final Fml[][] formulas;
    /** The same with each quadratic pair and its square root by name. */
    private final Fml[][] namedFormulas;
    private final java.util.Map<Spectral.Group, String[]> quadraticNames = new java.util.IdentityHashMap<>();
    private final List<Definition> definitions;
    private final List<GenPolynomial<BigRational>> conditionPolys;
    private final List<String> conditions;
    private final List<Eigenvalue> eigenvalues;
    private final Symbols symbols;
    /** The step count as a formula. */
    private final Fml n;

    ClosedForm(Series series, List<String> states, Progress progress) {
        this.field = series.field;
        this.ring = series.ring;
        this.symbols = Symbols.avoiding(series.field.names);
        this.n = Fml.name(symbols.step());
        this.spectral = Spectral.of(series, progress);
        int named = 1;
        int quadratics = 0;
        for (Spectral.Group g : spectral.groups) {
            if (g.kind == Spectral.Kind.ROOTS) {
                g.name = symbols.factor(named++);
            }
            if (g.kind == Spectral.Kind.QUADRATIC) {
                quadratics++;
            }
        }
        int q = 0;
        List<Definition> defs = new ArrayList<>();
        for (Spectral.Group g : spectral.groups) {
            if (g.kind == Spectral.Kind.QUADRATIC) {
                q++;
                String s = quadratics == 1 ? symbols.root() : symbols.root() + q;
                String l1 = symbols.eigenvalue(2 * q - 1);
                String l2 = symbols.eigenvalue(2 * q);
                quadraticNames.put(g, new String[] {s, l1, l2});
                Fml sqrt = Fml.call("sqrt", field.formula(g.delta));
                defs.add(new Definition(s, Fml.plain(sqrt), Fml.latex(sqrt), false));
                List<Fml> roots = quadraticRoots(g, Fml.name(s));
                defs.add(new Definition(l1, Fml.plain(roots.get(0)), Fml.latex(roots.get(0)), true));
                defs.add(new Definition(l2, Fml.plain(roots.get(1)), Fml.latex(roots.get(1)), true));
            }
        }
        this.definitions = List.copyOf(defs);
        this.seriesForm = new SeriesForm(series, states);
        this.states = List.copyOf(states);
        this.size = spectral.series.size;
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
        this.namedFormulas = new Fml[size][size];
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
                Steps.report(progress, "formulas", (long) i * size + j, (long) size * size);
                formulas[i][j] = buildFormula(i, j, false);
                namedFormulas[i][j] = definitions.isEmpty() ? formulas[i][j] : buildFormula(i, j, true);
            }
        }
        this.conditionPolys = collectConditions();
        List<String> c = new ArrayList<>();
        for (GenPolynomial<BigRational> p : conditionPolys) {
            c.add(Fml.plain(field.formula(p)) + " != 0");
        }
        this.conditions = List.copyOf(c);
        this.eigenvalues = describeEigenvalues();
    }

    // --- the formulas ------------------------------------------------------------------------------------------

    private Fml buildFormula(int i, int j, boolean named) {
        return buildFormula(i, j, named, false);
    }

    private Fml buildFormula(int i, int j, boolean named, boolean factored) {
        List<Fml> terms = new ArrayList<>();
        for (Spectral.Group g : spectral.groups) {
            if (g != zero) {
                terms.add(term(g, i, j, named, factored));
            }
        }
        return Fml.sum(terms);
    }

    /** A coefficient, expanded or with numerator and denominator factored over the rationals. */
    private Fml coefficient(Quotient<BigRational> q, boolean factored) {
        return factored ? field.factoredFormula(q) : field.formula(q);
    }

    private final Map<String, Fml> printedCache = new java.util.concurrent.ConcurrentHashMap<>();

    private Fml printed(int i, int j, boolean named, boolean factored) {
        if (!factored) {
            return named ? namedFormulas[i][j] : formulas[i][j];
        }
        return printedCache.computeIfAbsent(i + "," + j + "," + named,
            key -> buildFormula(i, j, named && !definitions.isEmpty(), true));
    }

    /**
     * The formula of entry (i, j) in plain syntax: with the names of {@link #definitions()} ({@code named}) or
     * expanded, and with each coefficient's numerator and denominator factored over the rationals
     * ({@code factored}) or multiplied out.
     *
     * @throws IndexOutOfBoundsException if i or j is out of range
     */
    public String plain(int i, int j, boolean named, boolean factored) {
        return Fml.plain(printed(i, j, named, factored));
    }

    /** {@link #plain(int, int, boolean, boolean)} in LaTeX. */
    public String latex(int i, int j, boolean named, boolean factored) {
        return Fml.latex(printed(i, j, named, factored));
    }

    /** A name as an atom: an eigenvalue name prints as lambda with an index in LaTeX. */
    private Fml nameAtom(String name) {
        String prefix = symbols.eigenPrefix();
        if (name.startsWith(prefix) && name.length() > prefix.length()
            && name.substring(prefix.length()).chars().allMatch(Character::isDigit)) {
            return new Fml.Atom(name, "\\lambda_{" + name.substring(prefix.length()) + "}");
        }
        return Fml.name(name);
    }

    private Fml term(Spectral.Group g, int i, int j, boolean named, boolean factored) {
        List<Fml> terms = new ArrayList<>();
        switch (g.kind) {
            case LINEAR:
                for (int k = 0; k < g.nilpotent.size(); k++) {
                    Quotient<BigRational> c = g.nilpotent.get(k)[i][j];
                    if (c.isZERO()) {
                        continue;
                    }
                    Fml binom = binomial(k);
                    // a constant eigenvalue is never 0 here, so binomial(n, k) lambda^(n-k) N_k is written with
                    // lambda^n and the coefficient N_k / lambda^k; a parametric one keeps lambda^(n-k), which
                    // needs no condition lambda != 0
                    boolean constant = ParamField.isConstant(g.lambda);
                    Fml exponent = constant ? n : shifted(-k);
                    Quotient<BigRational> coef = constant && k > 0 ? c.divide(ParamField.power(g.lambda, k)) : c;
                    Fml power = g.lambda.isONE() ? Fml.ONE : Fml.pow(field.formula(g.lambda), exponent);
                    terms.add(Fml.prod(List.of(coefficient(coef, factored), binom, power)));
                }
                break;
            case QUADRATIC: {
                String[] nm = quadraticNames.get(g);
                Fml sqrt = named ? Fml.name(nm[0]) : Fml.call("sqrt", field.formula(g.delta));
                List<Fml> roots = named ? List.of(nameAtom(nm[1]), nameAtom(nm[2])) : quadraticRoots(g);
                for (int k = 0; k < g.x.size(); k++) {
                    Quotient<BigRational> x = g.x.get(k)[i][j];
                    Quotient<BigRational> y = g.y.get(k)[i][j];
                    Fml exponent = shifted(-k);
                    Fml l1n = Fml.pow(roots.get(0), exponent);
                    Fml l2n = Fml.pow(roots.get(1), exponent);
                    if (!x.isZERO()) {
                        terms.add(Fml.prod(List.of(coefficient(x, factored), binomial(k), Fml.sum(l1n, l2n))));
                    }
                    if (!y.isZERO()) {
                        terms.add(Fml.prod(List.of(coefficient(y, factored), binomial(k),
                            Fml.div(Fml.sum(l1n, Fml.neg(l2n)), sqrt))));
                    }
                }
                break;
            }
            default:
                for (int k = 0; k < g.c.size(); k++) {
                    for (int t = 0; t < g.degree; t++) {
                        Quotient<BigRational> c = g.c.get(k).get(t)[i][j];
                        if (!c.isZERO()) {
                            terms.add(Fml.prod(List.of(coefficient(c, factored), binomial(k),
                                Fml.call("rootsum", shifted(t - k), Fml.name(g.name)))));
                        }
                    }
                }
        }
        return Fml.sum(terms);
    }

    /** {@code binomial(n, k)}, written 1 for k = 0 and n for k = 1. */
    private Fml binomial(int k) {
        return k == 0 ? Fml.ONE : (k == 1 ? n : Fml.call("binomial", n, Fml.integer(k)));
    }

    /** {@code n + d}. */
    private Fml shifted(int d) {
        return d == 0 ? n : Fml.sum(n, Fml.integer(d));
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
                for (int k = 0; k < g.x.size(); k++) {
                    addAll(used, g.x.get(k));
                    addAll(used, g.y.get(k));
                }
                used.add(g.delta);
                // sqrt(D) stands in a denominator: D != 0
                for (GenPolynomial<BigRational> p : field.irreducibleFactors(g.delta.num)) {
                    out.put(key(p), p);
                }
            } else {
                for (List<Quotient<BigRational>[][]> ck : g.c) {
                    for (Quotient<BigRational>[][] m : ck) {
                        addAll(used, m);
                    }
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
            // a linear factor reads x - (lambda), the way its eigenvalue is printed
            Fml f = g.kind == Spectral.Kind.LINEAR && !g.lambda.isZERO()
                ? Fml.sum(Fml.name(symbols.variable()), Fml.neg(field.formula(g.lambda)))
                : field.formula(g.factor, symbols.variable());
            List<String> values = new ArrayList<>();
            List<String> valuesLatex = new ArrayList<>();
            String kind;
            if (g.kind == Spectral.Kind.LINEAR) {
                kind = "rational";
                values.add(Fml.plain(field.formula(g.lambda)));
                valuesLatex.add(Fml.latex(field.formula(g.lambda)));
            } else if (g.kind == Spectral.Kind.QUADRATIC) {
                kind = "quadratic";
                for (Fml r : quadraticRoots(g)) {
                    values.add(Fml.plain(r));
                    valuesLatex.add(Fml.latex(r));
                }
            } else {
                kind = "roots";
                values.add("roots of " + g.name);
                valuesLatex.add("\\text{roots of } " + Fml.latex(Fml.name(g.name)));
            }
            String[] nm = quadraticNames.get(g);
            out.add(new Eigenvalue(Fml.plain(f), Fml.latex(f), g.degree, g.multiplicity, g.index(), kind, values,
                g.name, g.unitOrder, valuesLatex, nm == null ? List.of() : List.of(nm[1], nm[2])));
        }
        return List.copyOf(out);
    }

    /** u/2 + (s/2) sqrt(D) and u/2 - (s/2) sqrt(D). */
    private List<Fml> quadraticRoots(Spectral.Group g) {
        return quadraticRoots(g, Fml.call("sqrt", field.formula(g.delta)));
    }

    /** u/2 + (s/2) r and u/2 - (s/2) r, with r the square root or its name. */
    private List<Fml> quadraticRoots(Spectral.Group g, Fml sqrt) {
        Quotient<BigRational> half = field.of(2).inverse();
        Fml mid = field.formula(g.u.multiply(half));
        Fml w = Fml.prod(field.formula(g.scale.multiply(half)), sqrt);
        return List.of(Fml.sum(mid, w), Fml.sum(mid, Fml.neg(w)));
    }

    // --- public API --------------------------------------------------------------------------------------------

    /** The symbol of the step count: {@code n} unless a parameter has that name (see {@link #symbols()}). */
    public String nSymbol() {
        return symbols.step();
    }

    /** The names the formulas use for their own quantities, none of them a parameter's name. */
    public Symbols symbols() {
        return symbols;
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

    /**
     * The conditions of {@link #conditions()} that could not be shown to hold for every parameter value inside the
     * given domains (an empty list means: inside the domains, the formulas always hold). The check is sound, not
     * complete: one parameter is decided exactly (Sturm sequences); for several, a condition is listed unless a
     * sign argument or interval arithmetic proves it.
     *
     * @param domains the domain of each parameter (a parameter without one counts as unproved)
     * @return the conditions not shown to hold, in the order of {@link #conditions()}
     */
    public List<String> conditionsNotProved(Map<String, Domain> domains) {
        List<String> out = new ArrayList<>();
        for (int k = 0; k < conditionPolys.size(); k++) {
            if (!DomainCheck.holdsThroughout(field, conditionPolys.get(k), domains)) {
                out.add(conditions.get(k));
            }
        }
        return List.copyOf(out);
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

    /**
     * The formula of entry (i, j) in terms of the names of {@link #definitions()} (each quadratic pair of
     * eigenvalues and its square root by name), plain syntax; the same as {@link #formula(int, int)} when there is
     * nothing to name.
     */
    public String namedFormula(int i, int j) {
        return Fml.plain(namedFormulas[i][j]);
    }

    /** {@link #namedFormula(int, int)} in LaTeX. */
    public String namedLatex(int i, int j) {
        return Fml.latex(namedFormulas[i][j]);
    }

    /**
     * The names {@link #namedFormula(int, int)} uses, each defined in terms of the parameters and the names before
     * it: per quadratic factor, its square root and then its two eigenvalues. Empty without a quadratic factor.
     */
    public List<Definition> definitions() {
        return definitions;
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
        return plainMatrix(spectral.series.powers.get(n));
    }

    private List<List<String>> latexMatrix(Quotient<BigRational>[][] m) {
        return printedMatrix(m, Fml::latex, false);
    }

    private List<List<String>> plainMatrix(Quotient<BigRational>[][] m) {
        return printedMatrix(m, Fml::plain, false);
    }

    private List<List<String>> printedMatrix(Quotient<BigRational>[][] m, java.util.function.Function<Fml, String> print,
                                             boolean factored) {
        List<List<String>> out = new ArrayList<>();
        for (Quotient<BigRational>[] row : m) {
            List<String> r = new ArrayList<>();
            for (Quotient<BigRational> q : row) {
                r.add(print.apply(coefficient(q, factored)));
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
        checkPoint(at);
        Rational[][] out = new Rational[size][size];
        if (n < validFrom) {
            for (int i = 0; i < size; i++) {
                for (int j = 0; j < size; j++) {
                    out[i][j] = ParamField.rational(substitute(spectral.series.powers.get((int) n)[i][j], at));
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

    /**
     * One entry of P^n evaluated exactly at a parameter point, from the closed form (for n below
     * {@link #validFrom(int, int)} from the initial terms). The cost grows with n: the powers of the eigenvalues are
     * exact rationals.
     *
     * @param n  the step count, at least 0
     * @param i  the row (from)
     * @param j  the column (to)
     * @param at a value for every parameter in {@link #parameters()}
     * @return the exact value
     * @throws IllegalArgumentException  if n is negative
     * @throws IndexOutOfBoundsException if i or j is out of range
     * @throws QchainException           as {@link #evaluate(long, Map)}
     */
    public Rational evaluate(long n, int i, int j, Map<String, Rational> at) {
        if (n < 0) {
            throw new IllegalArgumentException("n must not be negative: " + n);
        }
        checkPoint(at);
        if (n < validFrom) {
            return ParamField.rational(substitute(spectral.series.powers.get((int) n)[i][j], at));
        }
        Evaluator<BigRational> ev = new Evaluator<>(BigRational.ZERO, q -> substitute(q, at));
        BigRational s = BigRational.ZERO;
        for (Spectral.Group g : spectral.groups) {
            if (g != zero) {
                s = s.sum(ev.entry(g, n, i, j));
            }
        }
        return ParamField.rational(s);
    }

    private void checkPoint(Map<String, Rational> at) {
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
    }

    private BigRational substitute(Quotient<BigRational> q, Map<String, Rational> at) {
        BigRational d = field.evaluate(q.den, at);
        if (d.isZERO()) {
            throw new QchainException(ErrorKey.CLOSED_FORM_CONDITION, Fml.plain(field.formula(q.den)) + " != 0", at);
        }
        return field.evaluate(q.num, at).divide(d);
    }

    /**
     * P^n from the closed form with the parameters kept symbolic, as exact rational functions in the ring of the
     * input matrix (for n below {@link #validFrom()} from the initial terms).
     *
     * @param n the step count, at least 0
     * @return the matrix
     * @throws IllegalArgumentException if n is negative
     */
    public RatFunMatrix evaluate(long n) {
        if (n < 0) {
            throw new IllegalArgumentException("n must not be negative: " + n);
        }
        Quotient<BigRational>[][] q = n < validFrom ? spectral.series.powers.get((int) n) : evaluateSymbolic(n);
        RatFun[][] out = new RatFun[size][size];
        for (int i = 0; i < size; i++) {
            for (int j = 0; j < size; j++) {
                out[i][j] = Bridge.toRatFun(field, ring, q[i][j]);
            }
        }
        return RatFunMatrix.of(ring, out);
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

    /** The generating functions and recurrences of the entries (they need no eigenvalues). */
    public SeriesForm series() {
        return seriesForm;
    }

    /**
     * The generating function of entry (i, j); the same as {@code series().generatingFunction(i, j)}.
     *
     * @throws IndexOutOfBoundsException if i or j is out of range
     */
    public GeneratingFunction generatingFunction(int i, int j) {
        return seriesForm.generatingFunction(i, j);
    }

    /**
     * The linear recurrence of entry (i, j); the same as {@code series().recurrence(i, j)}.
     *
     * @throws IndexOutOfBoundsException if i or j is out of range
     */
    public Recurrence recurrence(int i, int j) {
        return seriesForm.recurrence(i, j);
    }

    // --- long run ----------------------------------------------------------------------------------------------

    /**
     * The long-run behaviour: period, limits of the subsequences, the convergence rate, and the conditions on the
     * parameters under which this behaviour holds. The period and limits are those of generic parameter values: at
     * a special point where an eigenvalue that is generically inside the unit circle becomes a root of unity (for
     * example 1 - p - r = -1 at p = r = 1), the chain is periodic there, or its limit differs; {@link
     * LongRun#conditions()} excludes these points and {@link #longRunNotProved(Map)} tells whether any lies inside
     * the domains.
     */
    public LongRun longRun() {
        return longRun(false);
    }

    /**
     * As {@link #longRun()}, with the limits' numerators and denominators factored over the rationals when
     * {@code factored}.
     */
    public LongRun longRun(boolean factored) {
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
        List<List<List<String>>> limitsLatex = new ArrayList<>();
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
            limits.add(factored ? printedMatrix(m, f -> Fml.plain(f), true) : plainMatrix(m));
            limitsLatex.add(factored ? printedMatrix(m, f -> Fml.latex(f), true) : latexMatrix(m));
        }
        Fml rate = moduli.isEmpty() ? Fml.ZERO : (moduli.size() == 1 ? moduli.get(0) : new Fml.Call("max", List.copyOf(moduli)));
        List<String> conds = new ArrayList<>();
        for (LongRunCondition c : longRunConditions()) {
            conds.add(c.text);
        }
        return new LongRun(d, limits, Fml.plain(rate), Fml.latex(rate), conds, moduli.isEmpty(), validFrom, limitsLatex);
    }

    /**
     * The limits of {@link #longRun()} at a parameter point, exactly: the limit of P^(dm + r) for r = 0 .. d - 1.
     *
     * @param at a value for every parameter in {@link #parameters()}
     * @return d exact matrices
     * @throws QchainException as {@link #evaluate(long, Map)}
     */
    public List<RationalMatrix> longRunAt(Map<String, Rational> at) {
        checkPoint(at);
        int d = longRun().period();
        Evaluator<BigRational> ev = new Evaluator<>(BigRational.ZERO, q -> substitute(q, at));
        List<RationalMatrix> out = new ArrayList<>();
        for (int r = 0; r < d; r++) {
            Rational[][] m = new Rational[size][size];
            for (int i = 0; i < size; i++) {
                for (int j = 0; j < size; j++) {
                    BigRational s = BigRational.ZERO;
                    for (Spectral.Group g : spectral.groups) {
                        if (g.unitOrder > 0) {
                            s = s.sum(ev.entry(g, r, i, j));
                        }
                    }
                    m[i][j] = ParamField.rational(s);
                }
            }
            out.add(RationalMatrix.of(m));
        }
        return List.copyOf(out);
    }

    /**
     * The eigenvalues of each factor of {@link #eigenvalues()} at a point, as certified numbers (every digit
     * proven on demand; complex ones with both parts): a rational eigenvalue exactly, a quadratic pair as
     * {@code u/2 + (s/2) sqrt(D)} then {@code u/2 - (s/2) sqrt(D)} (exact algebraic numbers), the roots of a named
     * factor as {@link CertifiedRoots} isolates them.
     *
     * @param at a value for every parameter
     * @return per factor, its eigenvalues
     * @throws QchainException with {@link ErrorKey#BAD_ARGUMENT} if a parameter has no value
     */
    public List<List<CertifiedComplex>> eigenvaluesAt(Map<String, Rational> at) {
        List<List<CertifiedComplex>> out = new ArrayList<>();
        for (Spectral.Group g : spectral.groups) {
            out.add(valuesAt(g, at));
        }
        return List.copyOf(out);
    }

    /** The values of each factor at the points asked for so far (the eigenvalues, roots and rate share them). */
    private final Map<Spectral.Group, Map<Map<String, Rational>, List<CertifiedComplex>>> valuesCache =
        new java.util.IdentityHashMap<>();

    private List<CertifiedComplex> valuesAt(Spectral.Group g, Map<String, Rational> at) {
        synchronized (valuesCache) {
            Map<Map<String, Rational>, List<CertifiedComplex>> byPoint = valuesCache.computeIfAbsent(g,
                k -> new java.util.HashMap<>());
            Map<String, Rational> key = Map.copyOf(at);
            List<CertifiedComplex> v = byPoint.get(key);
            if (v == null) {
                v = computeValuesAt(g, at);
                byPoint.put(key, v);
            }
            return v;
        }
    }

    private List<CertifiedComplex> computeValuesAt(Spectral.Group g, Map<String, Rational> at) {
        List<CertifiedComplex> v = new ArrayList<>();
        if (g.kind == Spectral.Kind.QUADRATIC) {
            substituted(g, at);
            Quotient<BigRational> half = field.of(2).inverse();
            Rational mid = ParamField.rational(substitute(g.u.multiply(half), at));
            Rational w = ParamField.rational(substitute(g.scale.multiply(half), at));
            Rational dv = ParamField.rational(substitute(g.delta, at));
            for (int sign : new int[] {1, -1}) {
                Rational ws = sign > 0 ? w : w.negate();
                v.add(dv.signum() >= 0 ? CertifiedComplex.real(CertifiedReal.quadratic(mid, ws, dv))
                    : new CertifiedComplex(CertifiedReal.exact(mid),
                        CertifiedReal.quadratic(Rational.ZERO, ws, dv.negate())));
            }
        } else if (g.kind == Spectral.Kind.LINEAR) {
            substituted(g, at);
            v.add(CertifiedComplex.real(CertifiedReal.exact(ParamField.rational(substitute(g.lambda, at)))));
        } else {
            v.addAll(CertifiedRoots.of(coefficientsAt(g, at)));
        }
        return List.copyOf(v);
    }

    private List<Rational> coefficientsAt(Spectral.Group g, Map<String, Rational> at) {
        List<Rational> c = new ArrayList<>();
        for (BigRational b : substituted(g, at)) {
            c.add(ParamField.rational(b));
        }
        return c;
    }

    /** A condition of the long run: {@code poly != 0} (poly empty: not decidable here, never proved). */
    private record LongRunCondition(String text, java.util.Optional<GenPolynomial<BigRational>> poly) {
    }

    private List<LongRunCondition> longRunConditionCache;

    /**
     * No eigenvalue outside the roots of unity of the generic chain becomes a root of unity: for a rational
     * eigenvalue l, l != 1 and l != -1 (a real number is no other root of unity); for a factor f of degree 2 or
     * more, the resultant of f and the k-th cyclotomic polynomial is not 0 for k = 1 .. s (at a parameter point
     * where P is stochastic, an eigenvalue of modulus 1 is a k-th root of unity with k at most s: Perron-Frobenius,
     * see Seneta, Non-negative Matrices and Markov Chains, ch. 1; from memory).
     */
    private synchronized List<LongRunCondition> longRunConditions() {
        if (longRunConditionCache != null) {
            return longRunConditionCache;
        }
        List<LongRunCondition> out = new ArrayList<>();
        // a factor the formulas' conditions already exclude is not stated twice
        java.util.Set<String> seen = new java.util.HashSet<>();
        for (GenPolynomial<BigRational> c : conditionPolys) {
            seen.add(key(c));
        }
        for (Spectral.Group g : spectral.groups) {
            if (g.unitOrder > 0 || g == zero || allConstant(g.coeffs)) {
                continue;
            }
            if (g.kind == Spectral.Kind.LINEAR) {
                for (int v : new int[] {1, -1}) {
                    Quotient<BigRational> diff = g.lambda.subtract(field.of(v));
                    if (ParamField.isConstant(diff)) {
                        continue;
                    }
                    List<GenPolynomial<BigRational>> fs = field.irreducibleFactors(diff.num);
                    if (fs.size() == 1) {
                        if (seen.add(key(fs.get(0)))) {
                            out.add(new LongRunCondition(Fml.plain(field.formula(g.lambda)) + " != " + v,
                                java.util.Optional.of(fs.get(0))));
                        }
                    } else {
                        addFactors(out, seen, fs);
                    }
                }
                continue;
            }
            for (int k = 1; k <= size; k++) {
                Quotient<BigRational> res = Cyclotomic.resultant(field, g.factor, k);
                if (!ParamField.isConstant(res)) {
                    addFactors(out, seen, field.irreducibleFactors(res.num));
                }
                // a nonzero constant: never a k-th root of unity (0 is impossible for a non-unit factor)
            }
        }
        longRunConditionCache = List.copyOf(out);
        return longRunConditionCache;
    }

    private void addFactors(List<LongRunCondition> out, java.util.Set<String> seen, List<GenPolynomial<BigRational>> fs) {
        for (GenPolynomial<BigRational> p : fs) {
            if (seen.add(key(p))) {
                out.add(new LongRunCondition(key(p) + " != 0", java.util.Optional.of(p)));
            }
        }
    }

    private static boolean allConstant(Quotient<BigRational>[] a) {
        for (Quotient<BigRational> q : a) {
            if (!ParamField.isConstant(q)) {
                return false;
            }
        }
        return true;
    }

    /**
     * The conditions of {@link LongRun#conditions()} not shown to hold throughout the domains (as for
     * {@link #conditionsNotProved(Map)}).
     *
     * @param domains the domain of each parameter
     * @return the conditions not shown to hold, in order
     */
    public List<String> longRunNotProved(Map<String, Domain> domains) {
        List<String> out = new ArrayList<>();
        for (LongRunCondition c : longRunConditions()) {
            if (c.poly.isEmpty() || !DomainCheck.holdsThroughout(field, c.poly.get(), domains)) {
                out.add(c.text);
            }
        }
        return List.copyOf(out);
    }

    /**
     * The corners of the parameters' box (every parameter at a closed end of its domain) at which a condition of
     * the formulas or of the long run fails: the special points to state beside the results.
     *
     * @param domains the domain of each parameter (a parameter without a closed bounded end gives no corners)
     * @return each point as a map from parameter to value, in parameter order
     */
    public List<Map<String, Rational>> specialCorners(Map<String, Domain> domains) {
        List<List<Rational>> ends = new ArrayList<>();
        for (String p : field.names) {
            Domain d = domains.get(p);
            List<Rational> e = new ArrayList<>();
            if (d != null && d.lowerClosed()) {
                e.add(d.lower());
            }
            if (d != null && d.upper().isPresent() && d.upperClosed()) {
                e.add(d.upper().get());
            }
            if (e.isEmpty()) {
                return List.of();
            }
            ends.add(e);
        }
        List<GenPolynomial<BigRational>> polys = new ArrayList<>(conditionPolys);
        for (LongRunCondition c : longRunConditions()) {
            c.poly.ifPresent(polys::add);
        }
        List<Map<String, Rational>> out = new ArrayList<>();
        int[] at = new int[ends.size()];
        while (!ends.isEmpty()) {
            Map<String, Rational> pt = new LinkedHashMap<>();
            for (int i = 0; i < at.length; i++) {
                pt.put(field.names.get(i), ends.get(i).get(at[i]));
            }
            for (GenPolynomial<BigRational> c : polys) {
                if (field.evaluate(c, pt).isZERO()) {
                    out.add(java.util.Collections.unmodifiableMap(pt));
                    break;
                }
            }
            int i = 0;
            while (i < at.length && ++at[i] == ends.get(i).size()) {
                at[i] = 0;
                i++;
            }
            if (i == at.length) {
                break;
            }
        }
        return List.copyOf(out);
    }

    private Fml modulus(Spectral.Group g) {
        if (g.kind == Spectral.Kind.LINEAR) {
            if (ParamField.isConstant(g.lambda)) {
                BigRational v = ParamField.constantValue(g.lambda);
                return field.formula(new Quotient<>(field.field, field.poly.getONE().multiply(v.abs())));
            }
            return Fml.call("abs", field.formula(g.lambda));
        }
        if (g.kind == Spectral.Kind.QUADRATIC) {
            if (ParamField.isConstant(g.delta) && ParamField.constantValue(g.delta).signum() < 0) {
                // a complex pair for every parameter value: both roots have modulus sqrt(l1 l2) = sqrt(a_0)
                Quotient<BigRational>[] root = Radicals.split(field, g.coeffs[0]);
                boolean square = root[1].isONE();
                return square ? field.formula(root[0]) : Fml.prod(field.formula(root[0]), Fml.call("sqrt", field.formula(root[1])));
            }
            List<Fml> r = quadraticRoots(g);
            return Fml.call("max", Fml.call("abs", r.get(0)), Fml.call("abs", r.get(1)));
        }
        return Fml.call("maxabsroot", Fml.name(g.name));
    }

    /**
     * The factors of degree 3 or more that formulas name, with their roots at a point as certified numbers.
     *
     * @param at a value for every parameter in {@link #parameters()} (empty if there are none)
     * @return the named factors in name order
     * @throws QchainException with {@link ErrorKey#BAD_ARGUMENT} if a parameter has no value
     */
    public List<RootPolynomial> rootPolynomials(Map<String, Rational> at) {
        List<RootPolynomial> out = new ArrayList<>();
        for (Spectral.Group g : spectral.groups) {
            if (g.kind == Spectral.Kind.ROOTS) {
                Fml f = field.formula(g.factor, symbols.variable());
                out.add(new RootPolynomial(g.name, Fml.plain(f), Fml.latex(f), valuesAt(g, at)));
            }
        }
        return List.copyOf(out);
    }

    /**
     * The second-largest eigenvalue modulus at a point (the largest modulus among eigenvalues that are not roots of
     * unity and not 0), as a certified number: P^n approaches its limit (or its periodic pattern) like this number
     * to the power n. A real eigenvalue's modulus and that of a complex quadratic pair ({@code sqrt} of the
     * constant term) are exact algebraic numbers; that of a complex root of a named factor comes from the
     * enclosures of its parts.
     *
     * @param at a value for every parameter in {@link #parameters()}
     * @return the modulus, exactly 0 if there is no such eigenvalue
     * @throws QchainException with {@link ErrorKey#BAD_ARGUMENT} if a parameter has no value
     */
    public CertifiedReal rateAt(Map<String, Rational> at) {
        List<CertifiedReal> moduli = new ArrayList<>();
        for (Spectral.Group g : spectral.groups) {
            if (g.unitOrder > 0 || g == zero) {
                continue;
            }
            if (g.kind == Spectral.Kind.QUADRATIC && ParamField.rational(substitute(g.delta, at)).signum() < 0) {
                // a complex pair: both have modulus sqrt(l1 l2), the constant term
                moduli.add(CertifiedReal.sqrt(ParamField.rational(substitute(g.coeffs[0], at))));
                continue;
            }
            for (CertifiedComplex z : valuesAt(g, at)) {
                // a conjugate pair has one modulus: take the member with positive imaginary part only
                if (z.isReal()) {
                    moduli.add(z.re().abs());
                } else if (z.im().signum() > 0) {
                    moduli.add(modulus(z));
                }
            }
        }
        return moduli.isEmpty() ? CertifiedReal.exact(Rational.ZERO) : CertifiedReal.max(moduli);
    }

    /**
     * |z| from enclosures of its parts, in fixed point: the ends of the parts' enclosures are rounded outward to
     * multiples of 2^-s, squared and summed as integers, and the integer square roots rounded outward give the
     * ends of |z| at the same scale. No rational arithmetic (each product and sum of the parts' rational ends
     * cost a gcd of their growing denominators: most of the convergence rate's time).
     */
    private static CertifiedReal modulus(CertifiedComplex z) {
        return CertifiedReal.enclosed(bits -> {
            org.qchain.exact.certified.Enclosure re = z.re().abs().enclosure(bits + 4);
            org.qchain.exact.certified.Enclosure im = z.im().abs().enclosure(bits + 4);
            int s = bits + 6;
            BigInteger lo = square(scaled(re.lo(), s, false)).add(square(scaled(im.lo(), s, false)));
            BigInteger hi = square(scaled(re.hi(), s, true)).add(square(scaled(im.hi(), s, true)));
            BigInteger rootLo = lo.sqrt();
            BigInteger rootHi = hi.sqrt();
            if (!rootHi.multiply(rootHi).equals(hi)) {
                rootHi = rootHi.add(BigInteger.ONE);
            }
            return org.qchain.exact.certified.Enclosure.of(Rational.dyadic(rootLo, s), Rational.dyadic(rootHi, s));
        });
    }

    /** {@code floor(q 2^s)} ({@code up} false) or {@code ceil(q 2^s)}; a lower end below 0 counts as 0. */
    private static BigInteger scaled(Rational q, int s, boolean up) {
        if (q.signum() <= 0) {
            return BigInteger.ZERO;
        }
        BigInteger[] qr = q.numerator().shiftLeft(s).divideAndRemainder(q.denominator());
        return up && qr[1].signum() != 0 ? qr[0].add(BigInteger.ONE) : qr[0];
    }

    private static BigInteger square(BigInteger x) {
        return x.multiply(x);
    }

    private BigRational[] substituted(Spectral.Group g, Map<String, Rational> at) {
        for (String p : field.names) {
            if (!at.containsKey(p)) {
                throw new QchainException(ErrorKey.BAD_ARGUMENT, "parameter values", at.keySet(), "no value for " + p);
            }
        }
        BigRational[] a = new BigRational[g.coeffs.length];
        for (int k = 0; k < a.length; k++) {
            a[k] = substitute(g.coeffs[k], at);
        }
        return a;
    }

    private static org.apfloat.Apfloat apfloat(BigRational r, long prec) {
        return new org.apfloat.Apfloat(r.numerator(), prec).divide(new org.apfloat.Apfloat(r.denominator(), prec));
    }

    private static int lcm(int a, int b) {
        return a / BigInteger.valueOf(a).gcd(BigInteger.valueOf(b)).intValue() * b;
    }
}
