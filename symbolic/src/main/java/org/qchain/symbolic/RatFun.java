package org.qchain.symbolic;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;

/**
 * An immutable rational function {@code numerator / denominator} over Q in the variables of a {@link ParamRing}.
 *
 * <p><b>Canonical form</b> (established in one place, {@link #of(Poly, Poly)}): numerator and denominator are coprime
 * over Q; the denominator is primitive with integer coefficients and its first term in printing order (lowest total
 * degree first) is positive; all rational content sits in the numerator. So a polynomial has denominator 1, {@code 0}
 * is {@code 0/1}, and equal functions have equal parts: {@link #equals(Object)} compares the pair.
 *
 * <p>{@link #toString()} is the plain one-line syntax of model files, for example {@code (1 - a)/(1 + a*b)} or
 * {@code 1/2*a/(a + b)}.
 */
public final class RatFun {
    private final Poly num;
    private final Poly den;

    private RatFun(Poly num, Poly den) {
        this.num = num;
        this.den = den;
    }

    /**
     * The polynomial {@code p} as a rational function.
     *
     * @param p the polynomial
     * @return {@code p/1}
     */
    public static RatFun of(Poly p) {
        return new RatFun(p, p.ring().one());
    }

    /**
     * The canonical form of {@code num / den}.
     *
     * @param num the numerator
     * @param den the denominator, not zero
     * @return the reduced function
     * @throws ArithmeticException if {@code den} is the zero polynomial
     */
    public static RatFun of(Poly num, Poly den) {
        if (den.isZero()) {
            throw new ArithmeticException("rational function with zero denominator");
        }
        if (num.isZero()) {
            return new RatFun(num, den.ring().one());
        }
        if (den.isConstant()) {
            Rational c = den.constantValue().orElseThrow();
            return new RatFun(c.isOne() ? num : num.multiply(c.reciprocal()), den.ring().one());
        }
        Poly g = num.gcd(den);
        Poly n = num;
        Poly d = den;
        if (!g.isOne()) {
            n = num.divideExact(g).orElseThrow(() -> new IllegalStateException("gcd does not divide"));
            d = den.divideExact(g).orElseThrow(() -> new IllegalStateException("gcd does not divide"));
        }
        return normalizedReduced(n, d);
    }

    /** Normalises the unit of a pair already known to be coprime. */
    static RatFun normalizedReduced(Poly n, Poly d) {
        Rational c = d.normalizingUnit();
        if (c.isOne()) {
            return new RatFun(n, d);
        }
        Rational inv = c.reciprocal();
        Poly dd = d.multiply(inv);
        return new RatFun(n.multiply(inv), dd.isOne() ? d.ring().one() : dd);
    }

    /** The ring of the numerator and denominator. */
    public ParamRing ring() {
        return num.ring();
    }

    /** The numerator of the canonical form. */
    public Poly numerator() {
        return num;
    }

    /** The denominator of the canonical form (1 for a polynomial). */
    public Poly denominator() {
        return den;
    }

    /** Whether the denominator is 1. */
    public boolean isPolynomial() {
        return den.isOne();
    }

    /** Whether this is 0. */
    public boolean isZero() {
        return num.isZero();
    }

    /** Whether this is 1. */
    public boolean isOne() {
        return num.isOne() && den.isOne();
    }

    /** The value if this is a constant. */
    public Optional<Rational> constantValue() {
        return den.isOne() ? num.constantValue() : Optional.empty();
    }

    /** {@code this + o}. */
    public RatFun add(RatFun o) {
        if (isZero()) {
            return o;
        }
        if (o.isZero()) {
            return this;
        }
        if (den.equals(o.den)) {
            return of(num.add(o.num), den);
        }
        if (den.isOne()) {
            return new RatFun(num.multiply(o.den).add(o.num), o.den); // still coprime: o.num, o.den coprime
        }
        if (o.den.isOne()) {
            return new RatFun(o.num.multiply(den).add(num), den);
        }
        // (n1 d2' + n2 d1') / (g d1' d2') with g = gcd(d1, d2); only a factor of g can cancel
        Poly g = den.gcd(o.den);
        Poly d1 = den.divideExact(g).orElseThrow();
        Poly d2 = o.den.divideExact(g).orElseThrow();
        Poly n = num.multiply(d2).add(o.num.multiply(d1));
        if (n.isZero()) {
            return RatFun.of(n);
        }
        if (g.isOne()) {
            return normalizedReduced(n, d1.multiply(o.den));
        }
        return of(n, d1.multiply(o.den));
    }

    /** {@code -this}. */
    public RatFun negate() {
        return new RatFun(num.negate(), den);
    }

    /** {@code this - o}. */
    public RatFun subtract(RatFun o) {
        return add(o.negate());
    }

    /** {@code this * o}. */
    public RatFun multiply(RatFun o) {
        if (isZero() || o.isZero()) {
            return of(ring().zero());
        }
        if (den.isOne() && o.den.isOne()) {
            return new RatFun(num.multiply(o.num), den);
        }
        // cross-cancel: gcd(n1, d2) and gcd(n2, d1); the parts are coprime afterwards
        Poly g1 = num.gcd(o.den);
        Poly g2 = o.num.gcd(den);
        Poly n1 = num.divideExact(g1).orElseThrow();
        Poly d2 = o.den.divideExact(g1).orElseThrow();
        Poly n2 = o.num.divideExact(g2).orElseThrow();
        Poly d1 = den.divideExact(g2).orElseThrow();
        return normalizedReduced(n1.multiply(n2), d1.multiply(d2));
    }

    /** {@code this * c}. */
    public RatFun multiply(Rational c) {
        return c.isZero() ? of(ring().zero()) : new RatFun(num.multiply(c), den);
    }

    /**
     * {@code this / o}.
     *
     * @throws ArithmeticException if {@code o} is zero
     */
    public RatFun divide(RatFun o) {
        return multiply(o.reciprocal());
    }

    /**
     * {@code 1 / this}.
     *
     * @throws ArithmeticException if this is zero
     */
    public RatFun reciprocal() {
        if (isZero()) {
            throw new ArithmeticException("reciprocal of the zero function");
        }
        return normalizedReduced(den, num);
    }

    /**
     * {@code this^e} for any integer {@code e}.
     *
     * @throws ArithmeticException if this is zero and {@code e < 0}
     */
    public RatFun pow(int e) {
        if (e < 0) {
            return reciprocal().pow(-e);
        }
        // coprime parts stay coprime under powers
        return new RatFun(num.pow(e), den.isOne() ? den : den.pow(e));
    }

    /**
     * The partial derivative {@code (n' d - n d') / d^2}, reduced.
     *
     * @param var a variable of the ring
     * @return the derivative
     * @throws QchainException with {@link ErrorKey#UNKNOWN_PARAMETER} if {@code var} is not a variable of the ring
     */
    public RatFun derivative(String var) {
        if (den.isOne()) {
            return of(num.derivative(var));
        }
        Poly dn = num.derivative(var);
        Poly dd = den.derivative(var);
        if (dd.isZero()) {
            return of(dn, den);
        }
        return of(dn.multiply(den).subtract(num.multiply(dd)), den.multiply(den));
    }

    /**
     * The value at a point.
     *
     * @param values a value for every variable that occurs (extra names are ignored)
     * @return the exact value
     * @throws QchainException {@link ErrorKey#FREE_PARAMETERS} if an occurring variable has no value,
     *                         {@link ErrorKey#DIVISION_BY_ZERO} if the denominator vanishes there
     */
    public Rational evaluate(Map<String, Rational> values) {
        Rational d = den.evaluate(values);
        if (d.isZero()) {
            throw new QchainException(ErrorKey.DIVISION_BY_ZERO,
                ": the denominator " + den + " is 0 at " + pointText(values));
        }
        return num.evaluate(values).divide(d);
    }

    static String pointText(Map<String, Rational> values) {
        List<String> parts = new ArrayList<>();
        for (Map.Entry<String, Rational> e : values.entrySet()) {
            parts.add(e.getKey() + "=" + e.getValue());
        }
        return String.join(",", parts);
    }

    /**
     * Substitutes exact values for some variables; the result stays in the same ring.
     *
     * @param values values by variable name (names that are not variables of the ring are ignored)
     * @return the function of the remaining variables
     * @throws QchainException with {@link ErrorKey#DIVISION_BY_ZERO} if the denominator becomes identically 0
     */
    public RatFun substitute(Map<String, Rational> values) {
        Poly d = den.substitute(values);
        if (d.isZero()) {
            throw new QchainException(ErrorKey.DIVISION_BY_ZERO,
                ": the denominator " + den + " is 0 at " + pointText(values));
        }
        return of(num.substitute(values), d);
    }

    /** The variables that occur, in ring order. */
    public List<String> occurringVariables() {
        List<String> out = new ArrayList<>();
        List<String> a = num.occurringVariables();
        List<String> b = den.occurringVariables();
        for (String v : ring().variables()) {
            if (a.contains(v) || b.contains(v)) {
                out.add(v);
            }
        }
        return out;
    }

    /**
     * The factored form: the numerator's and the denominator's irreducible factors over Q and one rational constant.
     *
     * @return the factored form
     */
    public Factored factor() {
        if (isZero()) {
            return new Factored(Rational.ZERO, List.of(), List.of());
        }
        Poly.Factorization n = num.factor();
        Poly.Factorization d = den.factor();
        return new Factored(n.unit().divide(d.unit()), n.factors(), d.factors());
    }

    /**
     * A rational function as a constant times products of irreducible factors:
     * {@code constant * product(numerator) / product(denominator)}.
     *
     * @param constant    the rational constant (0 only for the zero function, then both lists are empty)
     * @param numerator   factors of the numerator, each primitive with a positive first term
     * @param denominator factors of the denominator, likewise
     */
    public record Factored(Rational constant, List<Poly.Factor> numerator, List<Poly.Factor> denominator) {
        /** Copies the lists. */
        public Factored {
            numerator = List.copyOf(numerator);
            denominator = List.copyOf(denominator);
        }

        /** The plain one-line syntax, e.g. {@code 1/4*(1 - a)^2*(a + b)/(1 + a)^3}. */
        @Override
        public String toString() {
            return PlainText.factored(this);
        }
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof RatFun r && r.num.equals(num) && r.den.equals(den);
    }

    @Override
    public int hashCode() {
        return 31 * num.hashCode() + den.hashCode();
    }

    /** Plain one-line syntax that the model parser reads back. */
    @Override
    public String toString() {
        return PlainText.ratFun(this);
    }
}
