package org.qchain.exact.model;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.qchain.exact.Rational;

/**
 * An immutable sparse polynomial with {@link Rational} coefficients in a fixed number of variables (the model's
 * declared parameters, in declaration order): a map from exponent vectors to non-zero coefficients. Just enough
 * arithmetic for {@link RowSums}' identity check (sum, product, power, exact division by one polynomial); no gcd,
 * no JAS, so that numeric runs can prove row sums without loading the symbolic module.
 */
final class SparsePoly {
    /**
     * The printing order of the symbolic module's plain text: ascending total degree, then descending exponents in
     * variable order ({@code a^2}, {@code a*b}, {@code b^2}). It is compatible with multiplication, so the first
     * term of a product is the product of the first terms.
     */
    static final Comparator<int[]> PRINT_ORDER = (x, y) -> {
        int dx = degree(x);
        int dy = degree(y);
        if (dx != dy) {
            return Integer.compare(dx, dy);
        }
        for (int i = 0; i < x.length; i++) {
            if (x[i] != y[i]) {
                return Integer.compare(y[i], x[i]);
            }
        }
        return 0;
    };

    /** An exponent vector as a map key. */
    private record Mono(int[] e) {
        @Override
        public boolean equals(Object o) {
            return o instanceof Mono m && Arrays.equals(e, m.e);
        }

        @Override
        public int hashCode() {
            return Arrays.hashCode(e);
        }
    }

    private final int vars;
    /**
     * Integer coefficients over the common denominator {@link #den}: the polynomial is {@code sum terms / den}, with
     * {@code den > 0} and no common factor of {@code den} and every coefficient (so equal polynomials have equal
     * fields). Products and sums then need integer arithmetic only, and one gcd pass per result.
     */
    private final Map<Mono, BigInteger> terms;
    private final BigInteger den;

    private SparsePoly(int vars, Map<Mono, BigInteger> terms, BigInteger den) {
        this.vars = vars;
        this.terms = terms;
        this.den = den;
    }

    /** Builds a polynomial from integer coefficients over a positive denominator, reduced. */
    private static SparsePoly reduced(int vars, Map<Mono, BigInteger> terms, BigInteger den) {
        if (terms.isEmpty()) {
            return new SparsePoly(vars, terms, BigInteger.ONE);
        }
        if (den.equals(BigInteger.ONE)) {
            return new SparsePoly(vars, terms, den);
        }
        BigInteger g = den;
        for (BigInteger c : terms.values()) {
            g = g.gcd(c);
            if (g.equals(BigInteger.ONE)) {
                return new SparsePoly(vars, terms, den);
            }
        }
        Map<Mono, BigInteger> t = new HashMap<>(terms.size() * 2);
        for (Map.Entry<Mono, BigInteger> x : terms.entrySet()) {
            t.put(x.getKey(), x.getValue().divide(g));
        }
        return new SparsePoly(vars, t, den.divide(g));
    }

    /** The shared constant 1 for small numbers of variables (immutable, so sharing is safe). */
    private static final SparsePoly[] ONES = new SparsePoly[16];

    static {
        for (int v = 0; v < ONES.length; v++) {
            Map<Mono, BigInteger> t = new HashMap<>();
            t.put(new Mono(new int[v]), BigInteger.ONE);
            ONES[v] = new SparsePoly(v, t, BigInteger.ONE);
        }
    }

    /** The constant {@code c} in {@code vars} variables. */
    static SparsePoly constant(int vars, Rational c) {
        if (c.isOne() && vars < ONES.length) {
            return ONES[vars];
        }
        Map<Mono, BigInteger> t = new HashMap<>();
        if (c.isZero()) {
            return new SparsePoly(vars, t, BigInteger.ONE);
        }
        t.put(new Mono(new int[vars]), c.numerator());
        return new SparsePoly(vars, t, c.denominator());
    }

    /** The variable of index {@code i}. */
    static SparsePoly variable(int vars, int i) {
        int[] e = new int[vars];
        e[i] = 1;
        Map<Mono, BigInteger> t = new HashMap<>();
        t.put(new Mono(e), BigInteger.ONE);
        return new SparsePoly(vars, t, BigInteger.ONE);
    }

    private static int degree(int[] e) {
        int d = 0;
        for (int x : e) {
            d += x;
        }
        return d;
    }

    /** The number of variables. */
    int variableCount() {
        return vars;
    }

    /** The number of terms. */
    int termCount() {
        return terms.size();
    }

    /** The total degree; 0 for the zero polynomial. */
    int totalDegree() {
        int d = 0;
        for (Mono m : terms.keySet()) {
            d = Math.max(d, degree(m.e));
        }
        return d;
    }

    /** The degree in each variable, by index. */
    int[] degrees() {
        int[] d = new int[vars];
        for (Mono m : terms.keySet()) {
            for (int i = 0; i < vars; i++) {
                d[i] = Math.max(d[i], m.e[i]);
            }
        }
        return d;
    }

    boolean isZero() {
        return terms.isEmpty();
    }

    /** The value if this is a constant (the zero polynomial included). */
    Optional<Rational> constantValue() {
        if (terms.isEmpty()) {
            return Optional.of(Rational.ZERO);
        }
        if (terms.size() == 1) {
            Map.Entry<Mono, BigInteger> t = terms.entrySet().iterator().next();
            if (degree(t.getKey().e) == 0) {
                return Optional.of(Rational.of(t.getValue(), den));
            }
        }
        return Optional.empty();
    }

    boolean isOne() {
        if (vars < ONES.length && this == ONES[vars]) {
            return true;
        }
        return den.equals(BigInteger.ONE) && isConstant() && terms.values().iterator().next().equals(BigInteger.ONE);
    }

    /** Whether this is a non-zero constant. */
    private boolean isConstant() {
        return terms.size() == 1 && degree(terms.keySet().iterator().next().e) == 0;
    }

    /** This times {@code a/b}, {@code b > 0}. */
    private SparsePoly scale(BigInteger a, BigInteger b) {
        if (a.signum() == 0) {
            return constant(vars, Rational.ZERO);
        }
        Map<Mono, BigInteger> t = new HashMap<>(terms.size() * 2);
        boolean one = a.equals(BigInteger.ONE);
        for (Map.Entry<Mono, BigInteger> x : terms.entrySet()) {
            t.put(x.getKey(), one ? x.getValue() : x.getValue().multiply(a));
        }
        return reduced(vars, t, den.multiply(b));
    }

    SparsePoly add(SparsePoly o) {
        if (o.terms.isEmpty()) {
            return this;
        }
        if (terms.isEmpty()) {
            return o;
        }
        BigInteger g = den.gcd(o.den);
        BigInteger mine = o.den.divide(g);
        BigInteger theirs = den.divide(g);
        Map<Mono, BigInteger> t = new HashMap<>((terms.size() + o.terms.size()) * 2);
        for (Map.Entry<Mono, BigInteger> x : terms.entrySet()) {
            t.put(x.getKey(), mine.equals(BigInteger.ONE) ? x.getValue() : x.getValue().multiply(mine));
        }
        for (Map.Entry<Mono, BigInteger> x : o.terms.entrySet()) {
            BigInteger v = theirs.equals(BigInteger.ONE) ? x.getValue() : x.getValue().multiply(theirs);
            t.merge(x.getKey(), v, SparsePoly::sumOrNull);
        }
        return reduced(vars, t, den.multiply(mine));
    }

    private static BigInteger sumOrNull(BigInteger a, BigInteger b) {
        BigInteger s = a.add(b);
        return s.signum() == 0 ? null : s;
    }

    SparsePoly negate() {
        Map<Mono, BigInteger> t = new HashMap<>(terms.size() * 2);
        for (Map.Entry<Mono, BigInteger> x : terms.entrySet()) {
            t.put(x.getKey(), x.getValue().negate());
        }
        return new SparsePoly(vars, t, den);
    }

    SparsePoly subtract(SparsePoly o) {
        return add(o.negate());
    }

    /** This times a constant. */
    SparsePoly scale(Rational c) {
        if (c.isZero()) {
            return constant(vars, Rational.ZERO);
        }
        if (c.isOne()) {
            return this;
        }
        return scale(c.numerator(), c.denominator());
    }

    SparsePoly multiply(SparsePoly o) {
        if (o.isOne()) {
            return this;
        }
        if (isOne()) {
            return o;
        }
        if (o.terms.isEmpty() || terms.isEmpty()) {
            return constant(vars, Rational.ZERO);
        }
        if (o.isConstant()) {
            return scale(o.terms.values().iterator().next(), o.den);
        }
        if (isConstant()) {
            return o.scale(terms.values().iterator().next(), den);
        }
        Map<Mono, BigInteger> t = new HashMap<>();
        for (Map.Entry<Mono, BigInteger> x : terms.entrySet()) {
            int[] ex = x.getKey().e;
            BigInteger cx = x.getValue();
            for (Map.Entry<Mono, BigInteger> y : o.terms.entrySet()) {
                int[] ey = y.getKey().e;
                int[] e = new int[vars];
                for (int i = 0; i < vars; i++) {
                    e[i] = ex[i] + ey[i];
                }
                t.merge(new Mono(e), cx.multiply(y.getValue()), SparsePoly::sumOrNull);
            }
        }
        return reduced(vars, t, den.multiply(o.den));
    }

    /** The terms with their rational coefficients, sorted in {@link #PRINT_ORDER}. */
    private List<Map.Entry<Mono, Rational>> sorted() {
        List<Map.Entry<Mono, Rational>> list = new ArrayList<>(terms.size());
        for (Map.Entry<Mono, BigInteger> x : terms.entrySet()) {
            list.add(Map.entry(x.getKey(), Rational.of(x.getValue(), den)));
        }
        list.sort((x, y) -> PRINT_ORDER.compare(x.getKey().e, y.getKey().e));
        return list;
    }

    /**
     * The unit that makes this polynomial primitive with a positive first term in {@link #PRINT_ORDER}: the gcd of
     * the coefficients' numerators over the lcm of their denominators, with the first term's sign (the symbolic
     * module normalises denominators the same way). With the coefficients over one reduced denominator it is their
     * content over that denominator. 1 for the zero polynomial.
     */
    Rational normalizingUnit() {
        if (terms.isEmpty()) {
            return Rational.ONE;
        }
        BigInteger g = BigInteger.ZERO;
        Map.Entry<Mono, BigInteger> first = null;
        for (Map.Entry<Mono, BigInteger> x : terms.entrySet()) {
            g = g.gcd(x.getValue());
            if (first == null || PRINT_ORDER.compare(x.getKey().e, first.getKey().e) < 0) {
                first = x;
            }
        }
        Rational c = Rational.of(g, den);
        return first.getValue().signum() < 0 ? c.negate() : c;
    }

    /**
     * This divided by {@code d}, if {@code d} divides it exactly. Division by one polynomial under a monomial order
     * (the reverse of {@link #PRINT_ORDER}: highest degree first) leaves remainder 0 exactly when {@code d} divides,
     * since one polynomial is a Gröbner basis of the ideal it generates (Cox, Little, O'Shea, Ideals, Varieties, and
     * Algorithms, chapter 2, sections 3 and 5).
     *
     * @param d a non-zero polynomial
     * @return the quotient, or empty if there is a remainder
     */
    Optional<SparsePoly> divideExact(SparsePoly d) {
        Map<Mono, Rational> dt = d.rationalTerms();
        Map.Entry<Mono, Rational> lead = leading(dt);
        Map<Mono, Rational> r = rationalTerms();
        Map<Mono, Rational> q = new HashMap<>();
        while (!r.isEmpty()) {
            Map.Entry<Mono, Rational> lt = leading(r);
            int[] e = new int[vars];
            for (int i = 0; i < vars; i++) {
                e[i] = lt.getKey().e[i] - lead.getKey().e[i];
                if (e[i] < 0) {
                    return Optional.empty();
                }
            }
            Rational c = lt.getValue().divide(lead.getValue());
            q.put(new Mono(e), c);
            for (Map.Entry<Mono, Rational> y : dt.entrySet()) {
                int[] s = new int[vars];
                for (int i = 0; i < vars; i++) {
                    s[i] = e[i] + y.getKey().e[i];
                }
                r.merge(new Mono(s), y.getValue().multiply(c).negate(), (a, b) -> {
                    Rational x = a.add(b);
                    return x.isZero() ? null : x;
                });
            }
        }
        SparsePoly out = constant(vars, Rational.ZERO);
        for (Map.Entry<Mono, Rational> x : q.entrySet()) {
            Map<Mono, BigInteger> t = new HashMap<>();
            t.put(x.getKey(), x.getValue().numerator());
            out = out.add(new SparsePoly(vars, t, x.getValue().denominator()));
        }
        return Optional.of(out);
    }

    private Map<Mono, Rational> rationalTerms() {
        Map<Mono, Rational> t = new HashMap<>(terms.size() * 2);
        for (Map.Entry<Mono, BigInteger> x : terms.entrySet()) {
            t.put(x.getKey(), Rational.of(x.getValue(), den));
        }
        return t;
    }

    /** The last term in {@link #PRINT_ORDER} (highest degree). */
    private static Map.Entry<Mono, Rational> leading(Map<Mono, Rational> t) {
        Map.Entry<Mono, Rational> best = null;
        for (Map.Entry<Mono, Rational> x : t.entrySet()) {
            if (best == null || PRINT_ORDER.compare(x.getKey().e, best.getKey().e) > 0) {
                best = x;
            }
        }
        return best;
    }

    /**
     * The plain one-line text, as the symbolic module prints an expanded polynomial: terms in {@link #PRINT_ORDER},
     * {@code 3/4*a*b^2}, {@code " - "} between terms with negative coefficients. Each term is written by
     * {@link TermText}, as the symbolic module's {@code PlainText} writes its terms; {@code RowSumsAgainstJasTest}
     * checks that both print the same text.
     *
     * @param names the variables' names, in index order
     * @return the text; {@code 0} for the zero polynomial
     */
    String plain(List<String> names) {
        if (terms.isEmpty()) {
            return "0";
        }
        StringBuilder sb = new StringBuilder();
        boolean first = true;
        for (Map.Entry<Mono, Rational> t : sorted()) {
            Rational c = t.getValue();
            List<String> parts = new ArrayList<>();
            int[] e = t.getKey().e;
            for (int i = 0; i < vars; i++) {
                if (e[i] > 0) {
                    parts.add(e[i] == 1 ? names.get(i) : names.get(i) + "^" + e[i]);
                }
            }
            TermText.append(sb, first, c, String.join("*", parts), c.abs().toString(), "*");
            first = false;
        }
        return sb.toString();
    }

    /** Whether this prints as one factor that needs no brackets after {@code /}: a single {@code x} or {@code x^k}. */
    boolean isVariablePower() {
        if (terms.size() != 1) {
            return false;
        }
        Map.Entry<Mono, BigInteger> t = terms.entrySet().iterator().next();
        if (!t.getValue().equals(BigInteger.ONE) || !den.equals(BigInteger.ONE)) {
            return false;
        }
        int nonZero = 0;
        for (int x : t.getKey().e) {
            if (x != 0) {
                nonZero++;
            }
        }
        return nonZero == 1;
    }

    @Override
    public boolean equals(Object o) {
        return o == this || o instanceof SparsePoly p && p.vars == vars && p.den.equals(den) && p.terms.equals(terms);
    }

    @Override
    public int hashCode() {
        return terms.hashCode() * 31 + den.hashCode();
    }

    @Override
    public String toString() {
        List<String> names = new ArrayList<>(Collections.nCopies(vars, ""));
        for (int i = 0; i < vars; i++) {
            names.set(i, "x" + i);
        }
        return plain(names);
    }
}
