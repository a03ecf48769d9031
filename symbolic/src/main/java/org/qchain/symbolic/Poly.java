package org.qchain.symbolic;

import edu.jas.arith.BigInteger;
import edu.jas.arith.BigRational;
import edu.jas.arith.ModLong;
import edu.jas.poly.ExpVector;
import edu.jas.poly.GenPolynomial;
import edu.jas.poly.Monomial;
import edu.jas.poly.PolyUtil;
import edu.jas.ufd.FactorAbstract;
import edu.jas.ufd.FactorFactory;
import edu.jas.ufd.GreatestCommonDivisorAbstract;
import edu.jas.ufd.GreatestCommonDivisorModular;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.SortedMap;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;

/**
 * An immutable polynomial with rational coefficients in the variables of a {@link ParamRing}.
 *
 * <p>{@link #toString()} is the plain one-line syntax of model files ({@code 1 - 2*a + 3/4*a*b^2}), terms in
 * {@linkplain #terms() printing order}: ascending total degree, then descending exponents in variable order
 * ({@code a^2}, {@code a*b}, {@code b^2}). {@link #equals(Object)} is mathematical equality within one ring.
 */
public final class Poly {
    static {
        JasRuntime.init();
    }

    /**
     * One term {@code coefficient * x1^e1 * ... * xk^ek}.
     *
     * @param coefficient non-zero
     * @param exponents   one exponent per ring variable, in variable order
     */
    public record Term(Rational coefficient, List<Integer> exponents) {
        /** Copies the exponent list. */
        public Term {
            exponents = List.copyOf(exponents);
        }

        /** The total degree. */
        public int degree() {
            int d = 0;
            for (int e : exponents) {
                d += e;
            }
            return d;
        }
    }

    /**
     * The factorisation of a polynomial over Q: {@code unit * product(base^exponent)}, each base irreducible over Q,
     * primitive with integer coefficients, and with a positive first term in printing order.
     *
     * @param unit    the rational constant (never zero)
     * @param factors the non-constant irreducible factors with their multiplicities, in a fixed order
     */
    public record Factorization(Rational unit, List<Factor> factors) {
        /** Copies the list. */
        public Factorization {
            factors = List.copyOf(factors);
        }
    }

    /**
     * An irreducible factor and its multiplicity.
     *
     * @param base     irreducible over Q
     * @param exponent at least 1
     */
    public record Factor(Poly base, int exponent) {
    }

    static final Comparator<long[]> PRINT_ORDER = (x, y) -> {
        long dx = 0;
        long dy = 0;
        for (int i = 0; i < x.length; i++) {
            dx += x[i];
            dy += y[i];
        }
        if (dx != dy) {
            return Long.compare(dx, dy);
        }
        for (int i = 0; i < x.length; i++) {
            if (x[i] != y[i]) {
                return Long.compare(y[i], x[i]);
            }
        }
        return 0;
    };

    private final ParamRing ring;
    final GenPolynomial<BigRational> p;

    Poly(ParamRing ring, GenPolynomial<BigRational> p) {
        this.ring = ring;
        this.p = p;
    }

    /** The ring this polynomial belongs to. */
    public ParamRing ring() {
        return ring;
    }

    private Poly same(Poly o) {
        ring.check(o.ring);
        return o;
    }

    /** {@code this + o}. */
    public Poly add(Poly o) {
        return new Poly(ring, p.sum(same(o).p));
    }

    /** {@code this - o}. */
    public Poly subtract(Poly o) {
        return new Poly(ring, p.subtract(same(o).p));
    }

    /** {@code this * o}. */
    public Poly multiply(Poly o) {
        return new Poly(ring, p.multiply(same(o).p));
    }

    /** {@code c * this}. */
    public Poly multiply(Rational c) {
        return new Poly(ring, p.multiply(Convert.toJas(c)));
    }

    /** {@code -this}. */
    public Poly negate() {
        return new Poly(ring, p.negate());
    }

    /**
     * {@code this^e}.
     *
     * @param e at least 0
     * @return the power
     * @throws IllegalArgumentException if {@code e < 0}
     */
    public Poly pow(int e) {
        if (e < 0) {
            throw new IllegalArgumentException("negative exponent " + e + " of a polynomial");
        }
        GenPolynomial<BigRational> r = ring.jas.getONE();
        GenPolynomial<BigRational> b = p;
        int k = e;
        while (k > 0) {
            if ((k & 1) == 1) {
                r = r.multiply(b);
            }
            k >>= 1;
            if (k > 0) {
                b = b.multiply(b);
            }
        }
        return new Poly(ring, r);
    }

    /** Whether this is 0. */
    public boolean isZero() {
        return p.isZERO();
    }

    /** Whether this is 1. */
    public boolean isOne() {
        return p.isONE();
    }

    /** Whether this is a constant (including 0). */
    public boolean isConstant() {
        return p.isConstant() || p.isZERO();
    }

    /** The value if this is a constant. */
    public Optional<Rational> constantValue() {
        if (p.isZERO()) {
            return Optional.of(Rational.ZERO);
        }
        return p.isConstant() ? Optional.of(Convert.fromJas(p.leadingBaseCoefficient())) : Optional.empty();
    }

    /** The number of non-zero terms. */
    public int termCount() {
        return p.length();
    }

    /** The total degree; 0 for constants, -1 for the zero polynomial. */
    public int totalDegree() {
        return p.isZERO() ? -1 : (int) p.totalDegree();
    }

    /**
     * The degree in one variable.
     *
     * @param var a variable of the ring
     * @return the largest exponent of {@code var}; 0 if it does not occur or this is 0
     */
    public int degree(String var) {
        int j = jasIndex(ring.requireIndex(var));
        long d = 0;
        for (Monomial<BigRational> m : p) {
            d = Math.max(d, m.e.getVal(j));
        }
        return (int) d;
    }

    /** The variables that occur, in ring order. */
    public List<String> occurringVariables() {
        boolean[] seen = new boolean[ring.size()];
        for (Monomial<BigRational> m : p) {
            for (int i = 0; i < seen.length; i++) {
                if (m.e.getVal(jasIndex(i)) != 0) {
                    seen[i] = true;
                }
            }
        }
        List<String> out = new ArrayList<>();
        for (int i = 0; i < seen.length; i++) {
            if (seen[i]) {
                out.add(ring.variables().get(i));
            }
        }
        return out;
    }

    // JAS stores exponent vectors with the LAST variable at index 0 (measured; see the library notes).
    int jasIndex(int varIndex) {
        return ring.size() - 1 - varIndex;
    }

    long[] exponents(ExpVector e) {
        long[] out = new long[ring.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = e.getVal(jasIndex(i));
        }
        return out;
    }

    ExpVector toExpVector(long[] exps) {
        long[] v = new long[exps.length];
        for (int i = 0; i < exps.length; i++) {
            v[jasIndex(i)] = exps[i];
        }
        return ExpVector.create(v);
    }

    /** The terms in printing order (ascending total degree, then descending exponents in variable order). */
    public List<Term> terms() {
        List<Map.Entry<long[], BigRational>> list = new ArrayList<>();
        for (Monomial<BigRational> m : p) {
            list.add(Map.entry(exponents(m.e), m.c));
        }
        list.sort((x, y) -> PRINT_ORDER.compare(x.getKey(), y.getKey()));
        List<Term> out = new ArrayList<>(list.size());
        for (Map.Entry<long[], BigRational> t : list) {
            List<Integer> ex = new ArrayList<>(t.getKey().length);
            for (long v : t.getKey()) {
                ex.add((int) v);
            }
            out.add(new Term(Convert.fromJas(t.getValue()), ex));
        }
        return out;
    }

    /** The coefficient of the first term in printing order; 0 for the zero polynomial. */
    Rational firstCoefficient() {
        BigRational best = null;
        long[] bestE = null;
        for (Monomial<BigRational> m : p) {
            long[] e = exponents(m.e);
            if (bestE == null || PRINT_ORDER.compare(e, bestE) < 0) {
                bestE = e;
                best = m.c;
            }
        }
        return best == null ? Rational.ZERO : Convert.fromJas(best);
    }

    /**
     * The value at a point: every variable that occurs must have a value.
     *
     * @param values values by variable name (extra names are ignored)
     * @return the exact value
     * @throws QchainException with {@link ErrorKey#FREE_PARAMETERS} if a variable that occurs has no value
     */
    public Rational evaluate(Map<String, Rational> values) {
        Poly s = substitute(values);
        Optional<Rational> c = s.constantValue();
        if (c.isEmpty()) {
            throw new QchainException(ErrorKey.FREE_PARAMETERS, String.join(", ", s.occurringVariables()));
        }
        return c.get();
    }

    /**
     * Substitutes exact values for some variables; the others stay symbolic.
     *
     * @param values values by variable name; names that are not variables of the ring are ignored
     * @return the polynomial in the remaining variables (same ring)
     */
    public Poly substitute(Map<String, Rational> values) {
        int k = ring.size();
        Rational[] val = new Rational[k];
        boolean any = false;
        for (int i = 0; i < k; i++) {
            val[i] = values.get(ring.variables().get(i));
            any |= val[i] != null;
        }
        if (!any || p.isZERO()) {
            return this;
        }
        // cache of powers per variable: pw[i].get(e) = val[i]^e
        List<List<Rational>> pw = new ArrayList<>();
        for (int i = 0; i < k; i++) {
            List<Rational> l = new ArrayList<>();
            l.add(Rational.ONE);
            pw.add(l);
        }
        Map<ExpVector, Rational> acc = new HashMap<>();
        for (Monomial<BigRational> m : p) {
            long[] e = exponents(m.e);
            Rational c = Convert.fromJas(m.c);
            for (int i = 0; i < k; i++) {
                if (val[i] != null && e[i] > 0) {
                    List<Rational> l = pw.get(i);
                    while (l.size() <= e[i]) {
                        l.add(l.get(l.size() - 1).multiply(val[i]));
                    }
                    c = c.multiply(l.get((int) e[i]));
                    e[i] = 0;
                }
            }
            if (!c.isZero()) {
                acc.merge(toExpVector(e), c, Rational::add);
            }
        }
        GenPolynomial<BigRational> r = new GenPolynomial<>(ring.jas);
        for (Map.Entry<ExpVector, Rational> t : acc.entrySet()) {
            if (!t.getValue().isZero()) {
                r.doPutToMap(t.getKey(), Convert.toJas(t.getValue()));
            }
        }
        return new Poly(ring, r);
    }

    /**
     * The partial derivative.
     *
     * @param var a variable of the ring
     * @return {@code d this / d var}
     * @throws QchainException with {@link ErrorKey#UNKNOWN_PARAMETER} if {@code var} is not a variable of the ring
     */
    public Poly derivative(String var) {
        int i = ring.requireIndex(var);
        GenPolynomial<BigRational> r = new GenPolynomial<>(ring.jas);
        for (Monomial<BigRational> m : p) {
            long[] e = exponents(m.e);
            if (e[i] > 0) {
                BigRational c = m.c.multiply(new BigRational(e[i]));
                e[i]--;
                r.doPutToMap(toExpVector(e), c);
            }
        }
        return new Poly(ring, r);
    }

    /**
     * Exact division.
     *
     * @param d a non-zero divisor
     * @return {@code this / d} if {@code d} divides this exactly
     */
    public Optional<Poly> divideExact(Poly d) {
        same(d);
        if (d.p.isZERO()) {
            throw new ArithmeticException("division by the zero polynomial");
        }
        if (d.p.isConstant()) {
            return Optional.of(new Poly(ring, p.divide(d.p.leadingBaseCoefficient())));
        }
        // For a single divisor the division remainder is zero exactly when d divides this ({d} is a Groebner basis),
        // and as soon as the leading term of the running remainder is not a multiple of lt(d) that term would stay
        // in the remainder: stop early. Our own loop on one mutable sorted map: JAS's quotientRemainder copies the
        // whole remainder at every step (quadratic; measured 10x slower on P^8 numerators of 300 terms).
        java.util.TreeMap<ExpVector, BigRational> r = new java.util.TreeMap<>(ring.jas.tord.getDescendComparator());
        r.putAll(p.getMap());
        ExpVector ld = d.p.leadingExpVector();
        BigRational lc = d.p.leadingBaseCoefficient();
        List<Map.Entry<ExpVector, BigRational>> dTerms = new ArrayList<>(d.p.getMap().entrySet());
        GenPolynomial<BigRational> q = new GenPolynomial<>(ring.jas);
        while (!r.isEmpty()) {
            Map.Entry<ExpVector, BigRational> lt = r.firstEntry();
            if (!lt.getKey().multipleOf(ld)) {
                return Optional.empty();
            }
            ExpVector e = lt.getKey().subtract(ld);
            BigRational c = lt.getValue().divide(lc);
            q.doPutToMap(e, c);
            for (Map.Entry<ExpVector, BigRational> t : dTerms) {
                ExpVector k = t.getKey().sum(e);
                BigRational v = t.getValue().multiply(c);
                BigRational old = r.get(k);
                BigRational nv = old == null ? v.negate() : old.subtract(v);
                if (nv.isZERO()) {
                    r.remove(k);
                } else {
                    r.put(k, nv);
                }
            }
        }
        return Optional.of(new Poly(ring, q));
    }

    /**
     * The greatest common divisor, normalised like a denominator (primitive integer coefficients, first term positive);
     * {@code gcd(0, 0) = 0}.
     *
     * @param o another polynomial of the ring
     * @return the gcd
     */
    public Poly gcd(Poly o) {
        same(o);
        if (p.isZERO()) {
            return o.normalizedAssociate();
        }
        if (o.p.isZERO()) {
            return normalizedAssociate();
        }
        if (p.isConstant() || o.p.isConstant()) {
            return ring.one();
        }
        // modular gcd over Z (measured about 20x faster than JAS's default gcd over Q; see package-info)
        GenPolynomial<BigInteger> a = PolyUtil.integerFromRationalCoefficients(ring.jasZ, p);
        GenPolynomial<BigInteger> b = PolyUtil.integerFromRationalCoefficients(ring.jasZ, o.p);
        GreatestCommonDivisorAbstract<BigInteger> engine = new GreatestCommonDivisorModular<ModLong>();
        Poly g = new Poly(ring, PolyUtil.fromIntegerCoefficients(ring.jas, engine.gcd(a, b))).normalizedAssociate();
        if (divideExact(g).isPresent() && o.divideExact(g).isPresent()) {
            return g;
        }
        // JAS's modular gcd (jas 2.7.200) returned a non-divisor for some trivariate inputs, even for gcd(x, x)
        // (coefficients near 2^27: a failed reconstruction); a gcd is only used once it divides both, and the
        // subresultant algorithm over Z, slower but without reconstruction, stands in
        GenPolynomial<BigInteger> s = new edu.jas.ufd.GreatestCommonDivisorSubres<BigInteger>().gcd(a, b);
        return new Poly(ring, PolyUtil.fromIntegerCoefficients(ring.jas, s)).normalizedAssociate();
    }

    /**
     * The rational {@code c} with {@code this / c} primitive with integer coefficients and a positive first term in
     * printing order; 1 for the zero polynomial.
     */
    Rational normalizingUnit() {
        if (p.isZERO()) {
            return Rational.ONE;
        }
        java.math.BigInteger numGcd = java.math.BigInteger.ZERO;
        java.math.BigInteger denLcm = java.math.BigInteger.ONE;
        for (Monomial<BigRational> m : p) {
            numGcd = numGcd.gcd(m.c.num);
            java.math.BigInteger d = m.c.den;
            denLcm = denLcm.divide(denLcm.gcd(d)).multiply(d);
        }
        Rational c = Rational.of(numGcd, denLcm);
        return firstCoefficient().signum() < 0 ? c.negate() : c;
    }

    /** This divided by its {@link #normalizingUnit()}. */
    Poly normalizedAssociate() {
        Rational c = normalizingUnit();
        return c.isOne() ? this : multiply(c.reciprocal());
    }

    /**
     * The factorisation over Q (JAS multivariate factorisation). The constant that JAS drops is recovered exactly.
     *
     * @return the factorisation
     * @throws ArithmeticException if this is the zero polynomial
     */
    public Factorization factor() {
        if (p.isZERO()) {
            throw new ArithmeticException("factorisation of the zero polynomial");
        }
        if (p.isConstant()) {
            return new Factorization(Convert.fromJas(p.leadingBaseCoefficient()), List.of());
        }
        FactorAbstract<BigRational> engine = FactorFactory.getImplementation(BigRational.ZERO);
        SortedMap<GenPolynomial<BigRational>, Long> fs = engine.factors(p);
        List<Factor> out = new ArrayList<>();
        Poly product = ring.one();
        for (Map.Entry<GenPolynomial<BigRational>, Long> f : fs.entrySet()) {
            Poly base = new Poly(ring, f.getKey());
            if (base.isConstant()) {
                continue;
            }
            base = base.normalizedAssociate();
            int e = Math.toIntExact(f.getValue());
            out.add(new Factor(base, e));
            product = product.multiply(base.pow(e));
        }
        // factors() drops the rational constant (measured): recover it as this / product, which must be constant
        Poly unit = divideExact(product).orElseThrow(() -> new IllegalStateException("factorisation does not divide"));
        Rational u = unit.constantValue().orElseThrow(() -> new IllegalStateException("factorisation incomplete"));
        // monomial factors first, then by degree, then by text: a*(1 - b)^2*(a + b)
        out.sort(Comparator.comparingInt((Factor f) -> f.base().termCount() == 1 ? 0 : 1)
            .thenComparingInt((Factor f) -> f.base().totalDegree())
            .thenComparing((Factor f) -> f.base().toString()));
        return new Factorization(u, Collections.unmodifiableList(out));
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Poly q && q.ring.equals(ring) && q.p.equals(p);
    }

    @Override
    public int hashCode() {
        return p.hashCode();
    }

    /** Plain one-line syntax, e.g. {@code 1 - 2*a + a^2}. */
    @Override
    public String toString() {
        return PlainText.poly(this);
    }
}
