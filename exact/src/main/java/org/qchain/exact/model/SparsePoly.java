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
    private final Map<Mono, Rational> terms;

    private SparsePoly(int vars, Map<Mono, Rational> terms) {
        this.vars = vars;
        this.terms = terms;
    }

    /** The shared constant 1 for small numbers of variables (immutable, so sharing is safe). */
    private static final SparsePoly[] ONES = new SparsePoly[16];

    static {
        for (int v = 0; v < ONES.length; v++) {
            Map<Mono, Rational> t = new HashMap<>();
            t.put(new Mono(new int[v]), Rational.ONE);
            ONES[v] = new SparsePoly(v, t);
        }
    }

    /** The constant {@code c} in {@code vars} variables. */
    static SparsePoly constant(int vars, Rational c) {
        if (c.isOne() && vars < ONES.length) {
            return ONES[vars];
        }
        Map<Mono, Rational> t = new HashMap<>();
        if (!c.isZero()) {
            t.put(new Mono(new int[vars]), c);
        }
        return new SparsePoly(vars, t);
    }

    /** The variable of index {@code i}. */
    static SparsePoly variable(int vars, int i) {
        int[] e = new int[vars];
        e[i] = 1;
        Map<Mono, Rational> t = new HashMap<>();
        t.put(new Mono(e), Rational.ONE);
        return new SparsePoly(vars, t);
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

    boolean isZero() {
        return terms.isEmpty();
    }

    /** The value if this is a constant (the zero polynomial included). */
    Optional<Rational> constantValue() {
        if (terms.isEmpty()) {
            return Optional.of(Rational.ZERO);
        }
        if (terms.size() == 1) {
            Map.Entry<Mono, Rational> t = terms.entrySet().iterator().next();
            if (degree(t.getKey().e) == 0) {
                return Optional.of(t.getValue());
            }
        }
        return Optional.empty();
    }

    boolean isOne() {
        if (vars < ONES.length && this == ONES[vars]) {
            return true;
        }
        return constantValue().map(Rational::isOne).orElse(false);
    }

    SparsePoly add(SparsePoly o) {
        Map<Mono, Rational> t = new HashMap<>(terms);
        for (Map.Entry<Mono, Rational> x : o.terms.entrySet()) {
            t.merge(x.getKey(), x.getValue(), SparsePoly::sumOrNull);
        }
        return new SparsePoly(vars, t);
    }

    private static Rational sumOrNull(Rational a, Rational b) {
        Rational s = a.add(b);
        return s.isZero() ? null : s;
    }

    SparsePoly negate() {
        return scale(Rational.ONE.negate());
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
        Map<Mono, Rational> t = new HashMap<>(terms.size() * 2);
        for (Map.Entry<Mono, Rational> x : terms.entrySet()) {
            t.put(x.getKey(), x.getValue().multiply(c));
        }
        return new SparsePoly(vars, t);
    }

    SparsePoly multiply(SparsePoly o) {
        if (o.isOne()) {
            return this;
        }
        if (isOne()) {
            return o;
        }
        Optional<Rational> c = o.constantValue();
        if (c.isPresent()) {
            return scale(c.get());
        }
        c = constantValue();
        if (c.isPresent()) {
            return o.scale(c.get());
        }
        Map<Mono, Rational> t = new HashMap<>();
        for (Map.Entry<Mono, Rational> x : terms.entrySet()) {
            int[] ex = x.getKey().e;
            for (Map.Entry<Mono, Rational> y : o.terms.entrySet()) {
                int[] ey = y.getKey().e;
                int[] e = new int[vars];
                for (int i = 0; i < vars; i++) {
                    e[i] = ex[i] + ey[i];
                }
                t.merge(new Mono(e), x.getValue().multiply(y.getValue()), SparsePoly::sumOrNull);
            }
        }
        return new SparsePoly(vars, t);
    }

    /** The terms sorted in {@link #PRINT_ORDER}. */
    private List<Map.Entry<Mono, Rational>> sorted() {
        List<Map.Entry<Mono, Rational>> list = new ArrayList<>(terms.entrySet());
        list.sort((x, y) -> PRINT_ORDER.compare(x.getKey().e, y.getKey().e));
        return list;
    }

    /**
     * The unit that makes this polynomial primitive with a positive first term in {@link #PRINT_ORDER}: the gcd of
     * the coefficients' numerators over the lcm of their denominators, with the first term's sign (the symbolic
     * module normalises denominators the same way). 1 for the zero polynomial.
     */
    Rational normalizingUnit() {
        if (terms.isEmpty()) {
            return Rational.ONE;
        }
        BigInteger g = BigInteger.ZERO;
        BigInteger l = BigInteger.ONE;
        Map.Entry<Mono, Rational> first = null;
        for (Map.Entry<Mono, Rational> x : terms.entrySet()) {
            g = g.gcd(x.getValue().numerator());
            BigInteger d = x.getValue().denominator();
            l = l.divide(l.gcd(d)).multiply(d);
            if (first == null || PRINT_ORDER.compare(x.getKey().e, first.getKey().e) < 0) {
                first = x;
            }
        }
        Rational c = Rational.of(g, l);
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
        Map.Entry<Mono, Rational> lead = leading(d.terms);
        Map<Mono, Rational> r = new HashMap<>(terms);
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
            for (Map.Entry<Mono, Rational> y : d.terms.entrySet()) {
                int[] s = new int[vars];
                for (int i = 0; i < vars; i++) {
                    s[i] = e[i] + y.getKey().e[i];
                }
                r.merge(new Mono(s), y.getValue().multiply(c).negate(), SparsePoly::sumOrNull);
            }
        }
        return Optional.of(new SparsePoly(vars, q));
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
     * {@code 3/4*a*b^2}, {@code " - "} between terms with negative coefficients. It mirrors the symbolic module's
     * {@code PlainText} on purpose (this module cannot use it); {@code RowSumsAgainstJasTest} checks that both print
     * the same text.
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
            boolean neg = c.signum() < 0;
            if (first) {
                if (neg) {
                    sb.append('-');
                }
            } else {
                sb.append(neg ? " - " : " + ");
            }
            first = false;
            List<String> parts = new ArrayList<>();
            int[] e = t.getKey().e;
            for (int i = 0; i < vars; i++) {
                if (e[i] > 0) {
                    parts.add(e[i] == 1 ? names.get(i) : names.get(i) + "^" + e[i]);
                }
            }
            String mono = String.join("*", parts);
            Rational a = c.abs();
            if (mono.isEmpty()) {
                sb.append(a);
            } else if (a.isOne()) {
                sb.append(mono);
            } else {
                sb.append(a).append('*').append(mono);
            }
        }
        return sb.toString();
    }

    /** Whether this prints as one factor that needs no brackets after {@code /}: a single {@code x} or {@code x^k}. */
    boolean isVariablePower() {
        if (terms.size() != 1) {
            return false;
        }
        Map.Entry<Mono, Rational> t = terms.entrySet().iterator().next();
        if (!t.getValue().isOne()) {
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
        return o == this || o instanceof SparsePoly p && p.vars == vars && p.terms.equals(terms);
    }

    @Override
    public int hashCode() {
        return terms.hashCode();
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
