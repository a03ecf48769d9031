package org.qchain.symbolic.closed;

import edu.jas.arith.BigRational;
import edu.jas.poly.GenPolynomial;
import edu.jas.ufd.Quotient;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.Progress;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.certified.CertifiedComplex;
import org.qchain.exact.certified.CertifiedReal;
import org.qchain.exact.model.Domain;
import org.qchain.symbolic.ParamRing;
import org.qchain.symbolic.RatFun;
import org.qchain.symbolic.RatFunMatrix;

/**
 * P(t) = exp(Qt) of a continuous-time chain as formulas in a symbolic time t and the chain's free parameters:
 * {@code P(t) = sum_k sum_j Z_kj t^j e^(lambda_k t)}, with the conditions under which the formulas hold, the
 * eigenvalues, the long-run limit (the eigenvalue-0 term), the rate of approach to it, and the Laplace transform
 * {@code (sI - Q)^-1} of every entry. Immutable; made by {@link ClosedForms#ofGenerator}.
 *
 * <p>Method. The same {@link Spectral} decomposition as the discrete closed forms, applied to the generator Q: per
 * irreducible factor f of {@code det(xI - Q)} with projector E, semisimple part S and nilpotent part N on its
 * generalised eigenspace, {@code exp(Qt) E = exp(St) exp(Nt) E = sum_j t^j/j! N^j exp(St) E}. A linear factor
 * (eigenvalue lambda) gives {@code e^(lambda t) sum_j t^j/j! N_j} with the discrete form's {@code N_j = (Q - lambda
 * I)^j E}; a quadratic pair {@code l1, l2 = u/2 +- (s/2) sqrt(D)} gives
 * {@code sum_j t^j/j! (X_j (e^(l1 t) + e^(l2 t)) + Y_j (e^(l1 t) - e^(l2 t))/sqrt(D))} with the discrete form's X_j,
 * Y_j (the identity {@code sum_r g(r)(C_0 + C_1 r) = X (g(l1) + g(l2)) + Y (g(l1) - g(l2))/sqrt(D)} holds for any g,
 * here {@code g(r) = e^(rt)} instead of {@code r^n}); a factor of degree 3 or more gives
 * {@code sum_j t^j/j! sum_m C_(j,m) rootsumexp(m, t, f)}. Where the discrete form reads {@code binomial(n, j)
 * lambda^(n-j)}, the continuous one reads {@code t^j/j! e^(lambda t)}: the n-th derivative at t = 0 of the continuous
 * term is the discrete term at n, so {@code d^n/dt^n P(t) at 0 = Q^n} checks the whole form exactly
 * ({@link #derivativeAtZero}). No discrete assumption applies: eigenvalue 0 (not 1) gives the limit, every other
 * eigenvalue of a generator has a negative real part, nothing is periodic, and the formulas hold for every t
 * &ge; 0 (no valid-from).
 *
 * <p>Entry point for other engines: {@link #entry(int, int, boolean)}, {@link #combination(List, List, boolean)}
 * (e.g. a point availability: a start row times the 0/1 vector of the up states) and their values at one time,
 * {@link #entryAt} and {@link #combinationAt}, all as {@link TimeFormula}s; the conditions, eigenvalues and long
 * run below hold for all of them.
 *
 * <pre>{@code
 * Model m = ModelParser.parse("unit.chain", "chain continuous\nparam lam\nparam mu\nstates Up Down\n"
 *     + "Up Down lam\nDown Up mu\n");
 * TransientForm tf = ClosedForms.ofGenerator(m, Map.of());
 * tf.entry(0, 0, false).plain();   // mu/(lam + mu) + lam/(lam + mu)*exp(-(lam + mu)*t)
 * tf.conditions();                 // [lam + mu != 0]
 * }</pre>
 */
public final class TransientForm {
    private final ParamField field;
    private final ParamRing ring;
    private final Spectral spectral;
    private final SeriesForm seriesForm;
    private final List<String> states;
    private final int size;
    /** The groups, eigenvalue 0 first. */
    private final List<Spectral.Group> groups;
    private final Spectral.Group zero;
    private final TimeSymbols symbols;
    private final Map<Spectral.Group, String[]> quadraticNames = new IdentityHashMap<>();
    private final List<Definition> definitions;
    private final List<GenPolynomial<BigRational>> conditionPolys;
    private final List<String> conditions;
    private final List<GenPolynomial<BigRational>> longRunPolys;
    private final List<Eigenvalue> eigenvalues;

    TransientForm(Series series, List<String> states, Progress progress) {
        this.field = series.field;
        this.ring = series.ring;
        this.symbols = TimeSymbols.avoiding(series.field.names);
        this.spectral = Spectral.of(series, progress);
        this.states = List.copyOf(states);
        this.size = series.size;
        Spectral.Group z = null;
        List<Spectral.Group> gs = new ArrayList<>();
        for (Spectral.Group g : spectral.groups) {
            if (g.isZeroEigenvalue()) {
                z = g;
                gs.add(0, g);
            } else {
                gs.add(g);
            }
        }
        this.zero = z;
        this.groups = List.copyOf(gs);
        this.definitions = SpectralParts.nameGroups(field, groups, symbols.others(), quadraticNames);
        this.seriesForm = new SeriesForm(series, states);
        this.conditionPolys = SpectralParts.conditionPolys(field, groups, null);
        List<String> c = new ArrayList<>();
        for (GenPolynomial<BigRational> p : conditionPolys) {
            c.add(SpectralParts.key(field, p) + " != 0");
        }
        this.conditions = List.copyOf(c);
        this.longRunPolys = computeLongRunPolys();
        this.eigenvalues = SpectralParts.describe(field, groups, symbols.others().variable(), quadraticNames);
    }

    // --- the formulas ------------------------------------------------------------------------------------------

    /** How the time enters: the symbol t, or one rational value substituted. */
    private record Time(Fml symbol, Rational value) {
        boolean symbolic() {
            return value == null;
        }
    }

    private Time symbolicTime() {
        return new Time(Fml.name(symbols.time()), null);
    }

    private Time timeValue(Rational t) {
        if (t.signum() < 0) {
            throw new IllegalArgumentException("t must not be negative: " + t);
        }
        return new Time(null, t);
    }

    private Fml coefficient(Quotient<BigRational> q, boolean factored) {
        return factored ? field.factoredFormula(q) : field.formula(q);
    }

    /** The whole formula of one linear combination of entries, given how a matrix is read down to one value. */
    private Fml formula(Function<Quotient<BigRational>[][], Quotient<BigRational>> pick, Time time, boolean named,
                        boolean factored) {
        List<Fml> terms = new ArrayList<>();
        for (Spectral.Group g : groups) {
            terms.add(term(g, pick, time, named, factored));
        }
        return Fml.sum(terms);
    }

    /** {@code c t^j / j!}: with a time value, the number folded into the coefficient. */
    private Fml scaled(Quotient<BigRational> c, int j, Time time, boolean factored) {
        Quotient<BigRational> q = c.divide(field.of(Rational.of(factorial(j), BigInteger.ONE)));
        if (!time.symbolic()) {
            return coefficient(q.multiply(field.of(time.value().pow(j))), factored);
        }
        Fml tj = j == 0 ? Fml.ONE : Fml.pow(time.symbol(), Fml.integer(j));
        return Fml.prod(coefficient(q, factored), tj);
    }

    /** {@code exp(lambda*t)} for a coefficient lambda; 1 for lambda = 0. */
    private Fml exp(Quotient<BigRational> lambda, Time time) {
        if (lambda.isZERO()) {
            return Fml.ONE;
        }
        if (!time.symbolic()) {
            return time.value().signum() == 0 ? Fml.ONE
                : Fml.call("exp", field.formula(lambda.multiply(field.of(time.value()))));
        }
        return Fml.call("exp", Fml.prod(field.formula(lambda), time.symbol()));
    }

    /** {@code exp(l*t)} for an eigenvalue written as a formula. */
    private Fml exp(Fml l, Time time) {
        if (!time.symbolic()) {
            return time.value().signum() == 0 ? Fml.ONE
                : Fml.call("exp", Fml.prod(ParamField.rational(time.value().numerator(), time.value().denominator()), l));
        }
        return Fml.call("exp", Fml.prod(l, time.symbol()));
    }

    private Fml term(Spectral.Group g, Function<Quotient<BigRational>[][], Quotient<BigRational>> pick, Time time,
                     boolean named, boolean factored) {
        List<Fml> terms = new ArrayList<>();
        switch (g.kind) {
            case LINEAR:
                for (int j = 0; j < g.nilpotent.size(); j++) {
                    Quotient<BigRational> c = pick.apply(g.nilpotent.get(j));
                    if (!c.isZERO()) {
                        terms.add(Fml.prod(scaled(c, j, time, factored), exp(g.lambda, time)));
                    }
                }
                break;
            case QUADRATIC: {
                String[] nm = quadraticNames.get(g);
                Fml sqrt = named ? Fml.name(nm[0]) : Fml.call("sqrt", field.formula(g.delta));
                List<Fml> roots = named ? List.of(eigenAtom(nm[1]), eigenAtom(nm[2]))
                    : SpectralParts.quadraticRoots(field, g);
                Fml e1 = exp(roots.get(0), time);
                Fml e2 = exp(roots.get(1), time);
                for (int j = 0; j < g.x.size(); j++) {
                    Quotient<BigRational> x = pick.apply(g.x.get(j));
                    Quotient<BigRational> y = pick.apply(g.y.get(j));
                    if (!x.isZERO()) {
                        terms.add(Fml.prod(scaled(x, j, time, factored), Fml.sum(e1, e2)));
                    }
                    if (!y.isZERO()) {
                        terms.add(Fml.prod(scaled(y, j, time, factored), Fml.div(Fml.sum(e1, Fml.neg(e2)), sqrt)));
                    }
                }
                break;
            }
            default:
                for (int j = 0; j < g.c.size(); j++) {
                    for (int m = 0; m < g.degree; m++) {
                        Quotient<BigRational> c = pick.apply(g.c.get(j).get(m));
                        if (!c.isZERO()) {
                            Fml at = time.symbolic() ? time.symbol()
                                : ParamField.rational(time.value().numerator(), time.value().denominator());
                            terms.add(Fml.prod(scaled(c, j, time, factored),
                                Fml.call("rootsumexp", Fml.integer(m), at, Fml.name(g.name))));
                        }
                    }
                }
        }
        return Fml.sum(terms);
    }

    private Fml eigenAtom(String name) {
        String prefix = symbols.others().eigenPrefix();
        return new Fml.Atom(name, "\\lambda_{" + name.substring(prefix.length()) + "}");
    }

    private static BigInteger factorial(int j) {
        BigInteger r = BigInteger.ONE;
        for (int k = 2; k <= j; k++) {
            r = r.multiply(BigInteger.valueOf(k));
        }
        return r;
    }

    private Function<Quotient<BigRational>[][], Quotient<BigRational>> entryPick(int i, int j) {
        java.util.Objects.checkIndex(i, size);
        java.util.Objects.checkIndex(j, size);
        return m -> m[i][j];
    }

    private Function<Quotient<BigRational>[][], Quotient<BigRational>> combinationPick(List<Rational> start,
                                                                                       List<Rational> weights) {
        if (start.size() != size || weights.size() != size) {
            throw new IllegalArgumentException("a start and a weight vector of " + size + " entries are needed, not "
                + start.size() + " and " + weights.size());
        }
        List<Quotient<BigRational>> a = new ArrayList<>();
        List<Quotient<BigRational>> w = new ArrayList<>();
        for (int k = 0; k < size; k++) {
            a.add(field.of(start.get(k)));
            w.add(field.of(weights.get(k)));
        }
        return m -> {
            Quotient<BigRational> s = field.zero();
            for (int i = 0; i < size; i++) {
                if (a.get(i).isZERO()) {
                    continue;
                }
                for (int j = 0; j < size; j++) {
                    if (!w.get(j).isZERO() && !m[i][j].isZERO()) {
                        s = s.sum(a.get(i).multiply(m[i][j]).multiply(w.get(j)));
                    }
                }
            }
            return s;
        };
    }

    private TimeFormula timeFormula(Function<Quotient<BigRational>[][], Quotient<BigRational>> pick, Time time,
                                    boolean factored) {
        Fml plain = formula(pick, time, false, factored);
        Fml named = definitions.isEmpty() ? plain : formula(pick, time, true, factored);
        Fml limit = zero == null || zero.nilpotent.size() != 1 ? Fml.name("undefined")
            : coefficient(pick.apply(zero.nilpotent.get(0)), factored);
        return new TimeFormula(Fml.plain(plain), Fml.latex(plain), Fml.plain(named), Fml.latex(named),
            Fml.plain(limit), Fml.latex(limit));
    }

    /**
     * Entry (i, j) of P(t) as a formula in t and the parameters, valid for every t &ge; 0 where the
     * {@link #conditions()} hold.
     *
     * @param i        the row (from)
     * @param j        the column (to)
     * @param factored whether each coefficient's numerator and denominator are factored over the rationals
     * @return the formula with its limit
     * @throws IndexOutOfBoundsException if i or j is out of range
     */
    public TimeFormula entry(int i, int j, boolean factored) {
        return timeFormula(entryPick(i, j), symbolicTime(), factored);
    }

    /**
     * Entry (i, j) of P(t) at one time, as a formula in the parameters (exp of multiples of the eigenvalues).
     *
     * @param t a time, at least 0
     * @throws IllegalArgumentException  if t is negative
     * @throws IndexOutOfBoundsException if i or j is out of range
     */
    public TimeFormula entryAt(int i, int j, Rational t, boolean factored) {
        return timeFormula(entryPick(i, j), timeValue(t), factored);
    }

    /**
     * The linear combination {@code sum_ij start_i P_ij(t) weights_j} as a formula in t and the parameters: with
     * {@code start} the unit vector of a state and {@code weights} the 0/1 vector of the up states, the point
     * availability A(t) from that state; with a start distribution, the probability of a set of states at t.
     *
     * @param start   one value per state (a row vector)
     * @param weights one value per state (a column vector)
     * @param factored whether each coefficient is factored over the rationals
     * @return the formula with its limit
     * @throws IllegalArgumentException if a vector's length differs from the number of states
     */
    public TimeFormula combination(List<Rational> start, List<Rational> weights, boolean factored) {
        return timeFormula(combinationPick(start, weights), symbolicTime(), factored);
    }

    /**
     * {@link #combination(List, List, boolean)} at one time, as a formula in the parameters.
     *
     * @throws IllegalArgumentException if t is negative or a vector's length differs from the number of states
     */
    public TimeFormula combinationAt(List<Rational> start, List<Rational> weights, Rational t, boolean factored) {
        return timeFormula(combinationPick(start, weights), timeValue(t), factored);
    }

    // --- what goes with the formulas ---------------------------------------------------------------------------

    /** The symbols of the formulas (time, transform variable, ...), none a parameter's name. */
    public TimeSymbols symbols() {
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
     * The conditions under which the formulas hold, each {@code "POLY != 0"} with POLY an irreducible polynomial over
     * Q: a denominator of a coefficient (where it vanishes, two eigenvalues collide and the form changes: a Jordan
     * block or a merged pair appears), or the discriminant under a square root.
     */
    public List<String> conditions() {
        return conditions;
    }

    /** The conditions of {@link #conditions()} not shown to hold throughout the domains (see the discrete form). */
    public List<String> conditionsNotProved(Map<String, Domain> domains) {
        return SpectralParts.notProved(field, conditionPolys, domains);
    }

    /**
     * The names {@link TimeFormula#namedPlain()} uses: per quadratic factor its square root and its two eigenvalues,
     * each defined in terms of the parameters and the names before it. Empty without a quadratic factor.
     */
    public List<Definition> definitions() {
        return definitions;
    }

    /** The factors of {@code det(xI - Q)} and their eigenvalues: eigenvalue 0 first. */
    public List<Eigenvalue> eigenvalues() {
        return eigenvalues;
    }

    /** The eigenvalues of each factor of {@link #eigenvalues()} at a point, as certified numbers. */
    public List<List<CertifiedComplex>> eigenvaluesAt(Map<String, Rational> at) {
        List<List<CertifiedComplex>> out = new ArrayList<>();
        for (Spectral.Group g : groups) {
            out.add(SpectralParts.valuesAt(field, g, at));
        }
        return List.copyOf(out);
    }

    /** The factors of degree 3 or more that formulas name, with their roots at a point. */
    public List<RootPolynomial> rootPolynomials(Map<String, Rational> at) {
        List<RootPolynomial> out = new ArrayList<>();
        for (Spectral.Group g : groups) {
            if (g.kind == Spectral.Kind.ROOTS) {
                Fml f = field.formula(g.factor, symbols.others().variable());
                out.add(new RootPolynomial(g.name, Fml.plain(f), Fml.latex(f),
                    at == null ? List.of() : SpectralParts.valuesAt(field, g, at)));
            }
        }
        return List.copyOf(out);
    }

    // --- the long run ------------------------------------------------------------------------------------------

    /** Whether the limit exists as a matrix (eigenvalue 0 without a Jordan block, as for every generator). */
    public boolean hasLimit() {
        return zero != null && zero.nilpotent.size() == 1;
    }

    /** The limit of P(t) as t grows (the eigenvalue-0 term) in plain syntax (LaTeX when {@code latex}). */
    public List<List<String>> limit(boolean factored, boolean latex) {
        List<List<String>> out = new ArrayList<>();
        for (int i = 0; i < size; i++) {
            List<String> row = new ArrayList<>();
            for (int j = 0; j < size; j++) {
                Fml f = hasLimit() ? coefficient(zero.nilpotent.get(0)[i][j], factored) : Fml.name("undefined");
                row.add(latex ? Fml.latex(f) : Fml.plain(f));
            }
            out.add(List.copyOf(row));
        }
        return List.copyOf(out);
    }

    /**
     * The limit at a point, exactly.
     *
     * @throws QchainException with {@link ErrorKey#BAD_ARGUMENT} if a parameter has no value or there is no limit,
     *                         {@link ErrorKey#CLOSED_FORM_CONDITION} if a condition fails at the point
     */
    public RationalMatrix limitAt(Map<String, Rational> at) {
        checkPoint(at);
        if (!hasLimit()) {
            throw new QchainException(ErrorKey.BAD_ARGUMENT, "limit", "t to infinity", "P(t) grows without a limit");
        }
        Rational[][] m = new Rational[size][size];
        for (int i = 0; i < size; i++) {
            for (int j = 0; j < size; j++) {
                m[i][j] = ParamField.rational(SpectralParts.substitute(field, zero.nilpotent.get(0)[i][j], at));
            }
        }
        return RationalMatrix.of(m);
    }

    /** Whether no eigenvalue other than 0 exists: then P(t) equals its limit for every t &ge; 0. */
    public boolean constant() {
        return groups.size() == (zero == null ? 0 : 1);
    }

    /**
     * The largest real part among the eigenvalues other than 0, as a formula: P(t) approaches its limit like
     * {@code t^k e^(rate t)} (its modulus is the decay rate). {@code 0} when there is no other eigenvalue. Plain
     * syntax ({@code re(...)} the real part, {@code maxre(f1)} the largest real part of the roots of f1) or LaTeX.
     */
    public String rate(boolean latex) {
        List<Fml> parts = new ArrayList<>();
        for (Spectral.Group g : groups) {
            if (g == zero) {
                continue;
            }
            if (g.kind == Spectral.Kind.LINEAR) {
                parts.add(field.formula(g.lambda));
            } else if (g.kind == Spectral.Kind.QUADRATIC) {
                Fml mid = field.formula(g.u.multiply(field.of(2).inverse()));
                if (ParamField.isConstant(g.delta) && ParamField.constantValue(g.delta).signum() < 0) {
                    parts.add(mid); // a complex pair for every parameter value: real part u/2
                } else {
                    List<Fml> r = SpectralParts.quadraticRoots(field, g);
                    parts.add(Fml.call("max", Fml.call("re", r.get(0)), Fml.call("re", r.get(1))));
                }
            } else {
                parts.add(Fml.call("maxre", Fml.name(g.name)));
            }
        }
        Fml r = parts.isEmpty() ? Fml.ZERO : (parts.size() == 1 ? parts.get(0) : new Fml.Call("max", List.copyOf(parts)));
        return latex ? Fml.latex(r) : Fml.plain(r);
    }

    /**
     * {@link #rate(boolean)} at a point as a certified number (exactly 0 when there is no other eigenvalue).
     *
     * @throws QchainException with {@link ErrorKey#BAD_ARGUMENT} if a parameter has no value
     */
    public CertifiedReal rateAt(Map<String, Rational> at) {
        List<CertifiedReal> re = new ArrayList<>();
        for (Spectral.Group g : groups) {
            if (g == zero) {
                continue;
            }
            for (CertifiedComplex z : SpectralParts.valuesAt(field, g, at)) {
                re.add(z.re());
            }
        }
        return re.isEmpty() ? CertifiedReal.exact(Rational.ZERO) : CertifiedReal.max(re);
    }

    /**
     * The conditions under which the long run holds as stated: no eigenvalue other than 0 of generic parameter
     * values becomes 0 (then the limit would change: more closed classes), i.e. the constant term of each other
     * factor does not vanish; those already among {@link #conditions()} are not repeated.
     */
    public List<String> longRunConditions() {
        List<String> out = new ArrayList<>();
        for (GenPolynomial<BigRational> p : longRunPolys) {
            out.add(SpectralParts.key(field, p) + " != 0");
        }
        return List.copyOf(out);
    }

    /** The conditions of the long run not shown to hold throughout the domains. */
    public List<String> longRunNotProved(Map<String, Domain> domains) {
        return SpectralParts.notProved(field, longRunPolys, domains);
    }

    private List<GenPolynomial<BigRational>> computeLongRunPolys() {
        java.util.Set<String> seen = new java.util.HashSet<>();
        for (GenPolynomial<BigRational> c : conditionPolys) {
            seen.add(SpectralParts.key(field, c));
        }
        List<GenPolynomial<BigRational>> out = new ArrayList<>();
        for (Spectral.Group g : groups) {
            if (g == zero || ParamField.isConstant(g.coeffs[0])) {
                continue;
            }
            for (GenPolynomial<BigRational> p : field.irreducibleFactors(g.coeffs[0].num)) {
                if (seen.add(SpectralParts.key(field, p))) {
                    out.add(p);
                }
            }
        }
        return List.copyOf(out);
    }

    /**
     * The corners of the parameters' box where a condition of the formulas or of the long run fails.
     *
     * @param domains the domain of each parameter
     * @return each point as a map from parameter to value, in parameter order
     */
    public List<Map<String, Rational>> specialCorners(Map<String, Domain> domains) {
        List<GenPolynomial<BigRational>> polys = new ArrayList<>(conditionPolys);
        polys.addAll(longRunPolys);
        return SpectralParts.corners(field, polys, domains);
    }

    // --- exact checks and transforms ---------------------------------------------------------------------------

    /**
     * The m-th derivative of P(t) at t = 0 from the closed form, with the parameters symbolic: it equals Q^m (so
     * m = 0 gives I and m = 1 gives Q). For a term {@code c t^j/j! e^(lambda t)} the m-th derivative at 0 is
     * {@code c binomial(m, j) lambda^(m-j)}, which is the discrete closed form's term at n = m: the discrete
     * {@link Evaluator} computes it exactly (square-root pairs in {@code x + y sqrt(D)} form, root sums by Newton's
     * identities).
     *
     * @param m the order, at least 0
     * @return the matrix in the ring of the input
     * @throws IllegalArgumentException if m is negative
     */
    public RatFunMatrix derivativeAtZero(int m) {
        if (m < 0) {
            throw new IllegalArgumentException("the order must not be negative: " + m);
        }
        Evaluator<Quotient<BigRational>> ev = new Evaluator<>(field.field, q -> q);
        RatFun[][] out = new RatFun[size][size];
        for (int i = 0; i < size; i++) {
            for (int j = 0; j < size; j++) {
                Quotient<BigRational> s = field.zero();
                for (Spectral.Group g : groups) {
                    s = s.sum(ev.entry(g, m, i, j));
                }
                out[i][j] = Bridge.toRatFun(field, ring, s);
            }
        }
        return RatFunMatrix.of(ring, out);
    }

    /**
     * Entry (i, j) of the Laplace transform {@code (sI - Q)^-1} of P(t), a rational function in s (the symbol
     * {@link TimeSymbols#transform()}) and the parameters, reduced; it exists for every chain.
     *
     * @throws IndexOutOfBoundsException if i or j is out of range
     */
    public GeneratingFunction laplaceTransform(int i, int j) {
        return seriesForm.laplaceTransform(i, j, symbols.transform());
    }

    /** The characteristic polynomial {@code det(xI - Q)} in plain syntax. */
    public String characteristicPolynomial() {
        return Fml.plain(field.formula(spectral.series.chi, symbols.others().variable()));
    }

    /**
     * Checks that every parameter has a value and no condition fails there.
     *
     * @throws QchainException with {@link ErrorKey#BAD_ARGUMENT} if a parameter has no value, or
     *                         {@link ErrorKey#CLOSED_FORM_CONDITION} if a condition fails at the point
     */
    public void checkPoint(Map<String, Rational> at) {
        SpectralParts.checkPoint(field, conditionPolys, at);
    }
}
