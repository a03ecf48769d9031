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
        this.definitions = SpectralParts.nameGroups(field, spectral.groups, symbols, quadraticNames);
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
        return buildFormula(cell(i, j), named, false);
    }

    /**
     * The formula of a combination of entries: each group's coefficient matrices are combined first
     * ({@link Combination#apply}), so a term whose combined coefficient is 0 vanishes.
     */
    private Fml buildFormula(Cell cell, boolean named, boolean factored) {
        List<Fml> terms = new ArrayList<>();
        for (Spectral.Group g : spectral.groups) {
            if (g != zero) {
                terms.add(term(g, cell, named, factored));
            }
        }
        return Fml.sum(terms);
    }

    /** Which value of a coefficient matrix a formula takes: one entry, or a combination of entries. */
    @FunctionalInterface
    interface Cell extends java.util.function.Function<Quotient<BigRational>[][], Quotient<BigRational>> {
    }

    private static Cell cell(int i, int j) {
        return m -> m[i][j];
    }

    private Cell cell(Combination c) {
        c.check(size);
        return m -> c.apply(field, m);
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
            key -> buildFormula(cell(i, j), named && !definitions.isEmpty(), true));
    }

    private Fml printed(Combination c, boolean named, boolean factored) {
        if (c.isEntry()) {
            return printed(c.row(), c.col(), named, factored);
        }
        return printedCache.computeIfAbsent(c.key() + "," + named + "," + factored,
            key -> buildFormula(cell(c), named && !definitions.isEmpty(), factored));
    }

    /**
     * The formula of a combination of entries ({@code sum_i s_i sum_(j in To) P^n(i, j)}), plain syntax, as
     * {@link #plain(int, int, boolean, boolean)}: built from the combined coefficients, so it is as simple as the
     * combined quantity. Valid for {@code n >= validFrom(c)} under {@link #conditions(Combination)}.
     *
     * @throws IndexOutOfBoundsException if the combination names a state out of range
     */
    public String plain(Combination c, boolean named, boolean factored) {
        return Fml.plain(printed(c, named, factored));
    }

    /** {@link #plain(Combination, boolean, boolean)} in LaTeX. */
    public String latex(Combination c, boolean named, boolean factored) {
        return Fml.latex(printed(c, named, factored));
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

    private Fml term(Spectral.Group g, Cell cell, boolean named, boolean factored) {
        List<Fml> terms = new ArrayList<>();
        switch (g.kind) {
            case LINEAR:
                for (int k = 0; k < g.nilpotent.size(); k++) {
                    Quotient<BigRational> c = cell.apply(g.nilpotent.get(k));
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
                    Quotient<BigRational> x = cell.apply(g.x.get(k));
                    Quotient<BigRational> y = cell.apply(g.y.get(k));
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
                        Quotient<BigRational> c = cell.apply(g.c.get(k).get(t));
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
        return SpectralParts.conditionPolys(field, spectral.groups, zero);
    }

    /**
     * The irreducible factors of every denominator in the formulas of a combination's cell, and of the
     * radicand under a square root in a denominator. For a combination only the groups with a nonzero combined
     * coefficient count, and a quadratic's radicand only with a nonzero coefficient of its {@code /sqrt(D)} term:
     * for fixed n, P^n and the formula agree on a dense set of parameter values and both are continuous wherever
     * the formula's parts are defined, so they agree there too (common practice, no source).
     */
    private List<GenPolynomial<BigRational>> collectConditions(Cell cell) {
        Map<String, GenPolynomial<BigRational>> out = new TreeMap<>();
        Map<GenPolynomial<BigRational>, Boolean> seen = new LinkedHashMap<>();
        for (Spectral.Group g : spectral.groups) {
            if (g == zero) {
                continue;
            }
            List<Quotient<BigRational>> used = new ArrayList<>(combined(g, cell, false));
            List<Quotient<BigRational>> ys = combined(g, cell, true);
            boolean overRoot = !ys.isEmpty();
            used.addAll(ys);
            if (used.isEmpty()) {
                continue; // the group does not occur in this formula
            }
            used.addAll(List.of(g.coeffs));
            if (g.kind == Spectral.Kind.QUADRATIC) {
                used.add(g.delta);
                // sqrt(D) stands in a denominator: D != 0
                if (overRoot) {
                    for (GenPolynomial<BigRational> p : field.irreducibleFactors(g.delta.num)) {
                        out.put(SpectralParts.key(field, p), p);
                    }
                }
            }
            for (Quotient<BigRational> q : used) {
                if (!q.den.isConstant() && seen.put(q.den, Boolean.TRUE) == null) {
                    for (GenPolynomial<BigRational> p : field.irreducibleFactors(q.den)) {
                        out.put(SpectralParts.key(field, p), p);
                    }
                }
            }
        }
        List<GenPolynomial<BigRational>> list = new ArrayList<>(out.values());
        list.sort(Comparator.comparingLong((GenPolynomial<BigRational> p) -> p.totalDegree()).thenComparing(p -> SpectralParts.key(field, p)));
        return List.copyOf(list);
    }

    /**
     * The nonzero combined coefficients of a group in a cell: with {@code overRoot} only those of a quadratic's
     * {@code (l1^m - l2^m)/sqrt(D)} terms, else all others.
     */
    private static List<Quotient<BigRational>> combined(Spectral.Group g, Cell cell, boolean overRoot) {
        List<Quotient<BigRational>> out = new ArrayList<>();
        List<Quotient<BigRational>[][]> ms = new ArrayList<>();
        if (overRoot) {
            if (g.kind == Spectral.Kind.QUADRATIC) {
                ms.addAll(g.y);
            }
        } else if (g.kind == Spectral.Kind.LINEAR) {
            ms.addAll(g.nilpotent);
        } else if (g.kind == Spectral.Kind.QUADRATIC) {
            ms.addAll(g.x);
        } else {
            for (List<Quotient<BigRational>[][]> ck : g.c) {
                ms.addAll(ck);
            }
        }
        for (Quotient<BigRational>[][] m : ms) {
            Quotient<BigRational> q = cell.apply(m);
            if (!q.isZERO()) {
                out.add(q);
            }
        }
        return out;
    }

    /** Whether the group contributes to the cell (some combined coefficient is not 0). */
    private static boolean occurs(Spectral.Group g, Cell cell) {
        return !combined(g, cell, false).isEmpty() || !combined(g, cell, true).isEmpty();
    }

    private String key(GenPolynomial<BigRational> p) {
        return SpectralParts.key(field, p);
    }

    // --- eigenvalues -------------------------------------------------------------------------------------------

    private List<Eigenvalue> describeEigenvalues() {
        return SpectralParts.describe(field, spectral.groups, symbols.variable(), quadraticNames);
    }

    /** u/2 + (s/2) sqrt(D) and u/2 - (s/2) sqrt(D). */
    private List<Fml> quadraticRoots(Spectral.Group g) {
        return SpectralParts.quadraticRoots(field, g);
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
     * The least n from which the formula of a combination holds: past the Jordan index of eigenvalue 0 in the
     * combined coefficients (0 when they cancel).
     *
     * @throws IndexOutOfBoundsException if the combination names a state out of range
     */
    public int validFrom(Combination c) {
        Cell cell = cell(c);
        int v = 0;
        if (zero != null) {
            for (int k = 0; k < zero.nilpotent.size(); k++) {
                if (!cell.apply(zero.nilpotent.get(k)).isZERO()) {
                    v = k + 1;
                }
            }
        }
        return v;
    }

    private final Map<String, List<GenPolynomial<BigRational>>> conditionCache =
        new java.util.concurrent.ConcurrentHashMap<>();

    private List<GenPolynomial<BigRational>> conditionPolys(Combination c) {
        return conditionCache.computeIfAbsent(c.key(), k -> collectConditions(cell(c)));
    }

    /**
     * The conditions under which the formula of a combination holds, as {@link #conditions()}: those of the
     * denominators and square roots that remain in its own formula (a subset of {@link #conditions()}).
     *
     * @throws IndexOutOfBoundsException if the combination names a state out of range
     */
    public List<String> conditions(Combination c) {
        List<String> out = new ArrayList<>();
        for (GenPolynomial<BigRational> p : conditionPolys(c)) {
            out.add(Fml.plain(field.formula(p)) + " != 0");
        }
        return List.copyOf(out);
    }

    /**
     * The conditions of {@link #conditions(Combination)} not shown to hold throughout the domains, as
     * {@link #conditionsNotProved(Map)}.
     */
    public List<String> conditionsNotProved(Combination c, Map<String, Domain> domains) {
        List<String> out = new ArrayList<>();
        for (GenPolynomial<BigRational> p : conditionPolys(c)) {
            if (!DomainCheck.holdsThroughout(field, p, domains)) {
                out.add(Fml.plain(field.formula(p)) + " != 0");
            }
        }
        return List.copyOf(out);
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
        for (Condition c : conditions(domains)) {
            if (!c.holdsThroughout()) {
                out.add(c.text());
            }
        }
        return List.copyOf(out);
    }

    /**
     * The conditions of {@link #conditions()} as values, each {@code POLY != 0} with its LaTeX and whether it is
     * shown to hold for every parameter value inside the given domains (the check of
     * {@link #conditionsNotProved(Map)}).
     *
     * @param domains the domain of each parameter (a parameter without one counts as unproved)
     * @return the conditions, in the order of {@link #conditions()}
     */
    public List<Condition> conditions(Map<String, Domain> domains) {
        List<Condition> out = new ArrayList<>();
        for (GenPolynomial<BigRational> p : conditionPolys) {
            Fml f = field.formula(p);
            out.add(new Condition(Fml.plain(f), Fml.latex(f), Rational.ZERO,
                DomainCheck.holdsThroughout(field, p, domains)));
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

    /**
     * A combination of entries of P^n evaluated exactly at a parameter point, from its own closed form (for n
     * below {@link #validFrom(Combination)} from the initial terms).
     *
     * @param n  the step count, at least 0
     * @param c  the combination
     * @param at a value for every parameter in {@link #parameters()}
     * @return the exact value
     * @throws IllegalArgumentException  if n is negative
     * @throws IndexOutOfBoundsException if the combination names a state out of range
     * @throws QchainException           with {@link ErrorKey#BAD_ARGUMENT} if a parameter has no value, or
     *                                   {@link ErrorKey#CLOSED_FORM_CONDITION} if a condition of
     *                                   {@link #conditions(Combination)} fails at the point
     */
    public Rational evaluate(long n, Combination c, Map<String, Rational> at) {
        if (n < 0) {
            throw new IllegalArgumentException("n must not be negative: " + n);
        }
        Cell cell = cell(c);
        checkPoint(at, conditionPolys(c));
        if (n < validFrom(c)) {
            return ParamField.rational(substitute(cell.apply(spectral.series.powers.get((int) n)), at));
        }
        Evaluator<BigRational> ev = new Evaluator<>(BigRational.ZERO, q -> substitute(q, at));
        BigRational s = BigRational.ZERO;
        for (Spectral.Group g : spectral.groups) {
            if (g != zero && occurs(g, cell)) {
                s = s.sum(ev.entry(g, n, cell));
            }
        }
        return ParamField.rational(s);
    }

    /**
     * The long-run limits of a combination, as {@link #longRun(boolean)} gives them for the entries: the limit of
     * its value at n = dm + r as m grows, r = 0 .. d - 1, each the combination of the limit matrices' entries,
     * combined before printing.
     *
     * @param c        the combination
     * @param factored numerators and denominators factored over the rationals
     * @return d formulas, each as plain text then LaTeX
     * @throws IndexOutOfBoundsException if the combination names a state out of range
     */
    public List<List<String>> limits(Combination c, boolean factored) {
        Cell cell = cell(c);
        int d = period();
        Evaluator<Quotient<BigRational>> ev = new Evaluator<>(field.field, q -> q);
        List<List<String>> out = new ArrayList<>();
        for (int r = 0; r < d; r++) {
            Quotient<BigRational> s = field.zero();
            for (Spectral.Group g : spectral.groups) {
                if (g.unitOrder > 0) {
                    s = s.sum(ev.entry(g, r, cell));
                }
            }
            Fml f = coefficient(s, factored);
            out.add(List.of(Fml.plain(f), Fml.latex(f)));
        }
        return List.copyOf(out);
    }

    /**
     * The limits of {@link #limits(Combination, boolean)} at a parameter point, exactly.
     *
     * @param c  the combination
     * @param at a value for every parameter in {@link #parameters()}
     * @return d exact values
     * @throws QchainException as {@link #evaluate(long, Combination, Map)}
     */
    public List<Rational> longRunAt(Combination c, Map<String, Rational> at) {
        Cell cell = cell(c);
        checkPoint(at, conditionPolys(c));
        int d = period();
        Evaluator<BigRational> ev = new Evaluator<>(BigRational.ZERO, q -> substitute(q, at));
        List<Rational> out = new ArrayList<>();
        for (int r = 0; r < d; r++) {
            BigRational s = BigRational.ZERO;
            for (Spectral.Group g : spectral.groups) {
                if (g.unitOrder > 0) {
                    s = s.sum(ev.entry(g, r, cell));
                }
            }
            out.add(ParamField.rational(s));
        }
        return List.copyOf(out);
    }

    /**
     * Whether the formula of a combination has no term of an eigenvalue other than the roots of unity (and 0): its
     * value is then exactly its long-run limit (or periodic) from {@link #validFrom(Combination)} on, even where the
     * chain itself still converges (a start at the stationary law, the whole state space).
     *
     * @throws IndexOutOfBoundsException if the combination names a state out of range
     */
    public boolean settled(Combination c) {
        Cell cell = cell(c);
        for (Spectral.Group g : spectral.groups) {
            if (g.unitOrder == 0 && g != zero && occurs(g, cell)) {
                return false;
            }
        }
        return true;
    }

    /** The period d of the long run: the lcm of the orders of the eigenvalues that are roots of unity. */
    private int period() {
        int d = 1;
        for (Spectral.Group g : spectral.groups) {
            if (g.unitOrder > 0) {
                d = lcm(d, g.unitOrder);
            }
        }
        return d;
    }

    private void checkPoint(Map<String, Rational> at) {
        SpectralParts.checkPoint(field, conditionPolys, at);
    }

    private void checkPoint(Map<String, Rational> at, List<GenPolynomial<BigRational>> polys) {
        SpectralParts.checkPoint(field, polys, at);
    }

    private BigRational substitute(Quotient<BigRational> q, Map<String, Rational> at) {
        return SpectralParts.substitute(field, q, at);
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
        for (LongRunCondition c : longRunConditionList()) {
            conds.add(c.text());
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
        return SpectralParts.valuesAt(field, g, at);
    }

    /**
     * A condition of the long run: {@code left != right}, which fails exactly where {@code poly} vanishes (poly
     * empty: not decidable here, never proved).
     */
    private record LongRunCondition(String left, String leftLatex, Rational right,
                                    java.util.Optional<GenPolynomial<BigRational>> poly) {
        String text() {
            return left + " != " + right;
        }
    }

    private List<LongRunCondition> longRunConditionCache;

    /**
     * No eigenvalue outside the roots of unity of the generic chain becomes a root of unity: for a rational
     * eigenvalue l, l != 1 and l != -1 (a real number is no other root of unity); for a factor f of degree 2 or
     * more, the resultant of f and the k-th cyclotomic polynomial is not 0 for k = 1 .. s (at a parameter point
     * where P is stochastic, an eigenvalue of modulus 1 is a k-th root of unity with k at most s: Perron-Frobenius,
     * see Seneta, Non-negative Matrices and Markov Chains, ch. 1; from memory).
     */
    private synchronized List<LongRunCondition> longRunConditionList() {
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
                            Fml lambda = field.formula(g.lambda);
                            out.add(new LongRunCondition(Fml.plain(lambda), Fml.latex(lambda), Rational.of(v),
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
                Fml f = field.formula(p);
                out.add(new LongRunCondition(Fml.plain(f), Fml.latex(f), Rational.ZERO, java.util.Optional.of(p)));
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
        for (Condition c : longRunConditions(domains)) {
            if (!c.holdsThroughout()) {
                out.add(c.text());
            }
        }
        return List.copyOf(out);
    }

    /**
     * The conditions of {@link LongRun#conditions()} as values, each with its LaTeX and whether it is shown to hold
     * throughout the given domains (the check of {@link #longRunNotProved(Map)}).
     *
     * @param domains the domain of each parameter
     * @return the conditions, in the order of {@link LongRun#conditions()}
     */
    public List<Condition> longRunConditions(Map<String, Domain> domains) {
        List<Condition> out = new ArrayList<>();
        for (LongRunCondition c : longRunConditionList()) {
            out.add(new Condition(c.left(), c.leftLatex(), c.right(),
                c.poly().isPresent() && DomainCheck.holdsThroughout(field, c.poly().get(), domains)));
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
        List<GenPolynomial<BigRational>> polys = new ArrayList<>(conditionPolys);
        for (LongRunCondition c : longRunConditionList()) {
            c.poly.ifPresent(polys::add);
        }
        return SpectralParts.corners(field, polys, domains);
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
        return SpectralParts.substituted(field, g, at);
    }

    private static org.apfloat.Apfloat apfloat(BigRational r, long prec) {
        return new org.apfloat.Apfloat(r.numerator(), prec).divide(new org.apfloat.Apfloat(r.denominator(), prec));
    }

    private static int lcm(int a, int b) {
        return a / BigInteger.valueOf(a).gcd(BigInteger.valueOf(b)).intValue() * b;
    }
}
