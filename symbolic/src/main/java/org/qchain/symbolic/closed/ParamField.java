package org.qchain.symbolic.closed;

import edu.jas.arith.BigRational;
import edu.jas.poly.ExpVector;
import edu.jas.poly.GenPolynomial;
import edu.jas.poly.GenPolynomialRing;
import edu.jas.ufd.FactorAbstract;
import edu.jas.ufd.FactorFactory;
import edu.jas.ufd.Quotient;
import edu.jas.ufd.QuotientRing;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import org.qchain.exact.Rational;

/**
 * The field Q(parameters) of one computation, made once: JAS polynomials over {@code BigRational} in the free
 * parameters, their quotient field, and the univariate ring over it in which characteristic polynomials live.
 * Evaluation at a point and conversion to printed formulas are here too, so JAS types stay inside this package.
 */
final class ParamField {
    final List<String> names;
    final GenPolynomialRing<BigRational> poly;
    final QuotientRing<BigRational> field;
    final GenPolynomialRing<Quotient<BigRational>> univariate;

    ParamField(List<String> names, String variable) {
        this.names = List.copyOf(names);
        this.poly = new GenPolynomialRing<>(BigRational.ZERO, names.toArray(new String[0]));
        this.field = names.isEmpty() ? new QuotientRing<>(poly) : new ModularGcdQuotientRing(poly);
        this.univariate = new GenPolynomialRing<>(field, new String[] {variable});
    }

    /**
     * The quotient field with JAS's modular gcd over Z in place of its default (subresultants over Q), which every
     * Quotient operation calls to reduce: measured about 20 times faster on the same pairs (LIBNOTES-DETAIL, JAS
     * gcd; the symbolic module's own polynomials use it too). A 5-state chain with two parameters went from minutes
     * in the projectors to seconds.
     */
    private static final class ModularGcdQuotientRing extends QuotientRing<BigRational> {
        private final transient GenPolynomialRing<edu.jas.arith.BigInteger> integers;

        ModularGcdQuotientRing(GenPolynomialRing<BigRational> ring) {
            super(ring);
            this.integers = new GenPolynomialRing<>(edu.jas.arith.BigInteger.ZERO, ring);
        }

        @Override
        protected GenPolynomial<BigRational> gcd(GenPolynomial<BigRational> a, GenPolynomial<BigRational> b) {
            if (a.isZERO()) {
                return b;
            }
            if (b.isZERO()) {
                return a;
            }
            if (a.isConstant() || b.isConstant()) {
                return ring.getONE();
            }
            edu.jas.ufd.GreatestCommonDivisorAbstract<edu.jas.arith.BigInteger> engine =
                new edu.jas.ufd.GreatestCommonDivisorModular<edu.jas.arith.ModLong>();
            GenPolynomial<edu.jas.arith.BigInteger> g = engine.gcd(
                edu.jas.poly.PolyUtil.integerFromRationalCoefficients(integers, a),
                edu.jas.poly.PolyUtil.integerFromRationalCoefficients(integers, b));
            return edu.jas.poly.PolyUtil.fromIntegerCoefficients(ring, g);
        }

        @Override
        public boolean equals(Object o) {
            return super.equals(o);
        }

        @Override
        public int hashCode() {
            return super.hashCode();
        }
    }

    Quotient<BigRational> zero() {
        return field.getZERO();
    }

    Quotient<BigRational> one() {
        return field.getONE();
    }

    Quotient<BigRational> of(Rational r) {
        return new Quotient<>(field, poly.getONE().multiply(big(r)));
    }

    Quotient<BigRational> of(long k) {
        return of(Rational.of(k));
    }

    static BigRational big(Rational r) {
        return BigRational.RNRED(r.numerator(), r.denominator());
    }

    static Rational rational(BigRational b) {
        return Rational.of(b.numerator(), b.denominator());
    }

    static <C extends edu.jas.structure.RingElem<C>> C power(C base, long e) {
        C r = null;
        C b = base;
        long k = e;
        if (k == 0) {
            @SuppressWarnings("unchecked")
            edu.jas.structure.RingFactory<C> fac = (edu.jas.structure.RingFactory<C>) base.factory();
            return fac.getONE();
        }
        while (k > 0) {
            if ((k & 1) == 1) {
                r = r == null ? b : r.multiply(b);
            }
            k >>= 1;
            if (k > 0) {
                b = b.multiply(b);
            }
        }
        return r;
    }

    /** Exponent of parameter {@code i} (in {@link #names} order) in a monomial; JAS counts from the end. */
    private int exp(ExpVector e, int i) {
        return (int) e.getVal(names.size() - 1 - i);
    }

    /**
     * The value of a polynomial at a point.
     *
     * @throws IllegalArgumentException if a parameter used has no value
     */
    BigRational evaluate(GenPolynomial<BigRational> p, Map<String, Rational> at) {
        BigRational[] v = new BigRational[names.size()];
        for (int i = 0; i < v.length; i++) {
            Rational r = at.get(names.get(i));
            v[i] = r == null ? null : big(r);
        }
        BigRational s = BigRational.ZERO;
        for (Map.Entry<ExpVector, BigRational> t : p.getMap().entrySet()) {
            BigRational m = t.getValue();
            for (int i = 0; i < v.length; i++) {
                int k = exp(t.getKey(), i);
                if (k > 0) {
                    if (v[i] == null) {
                        throw new IllegalArgumentException("no value for parameter " + names.get(i));
                    }
                    m = m.multiply(power(v[i], k));
                }
            }
            s = s.sum(m);
        }
        return s;
    }

    /** Whether the element does not depend on any parameter. */
    static boolean isConstant(Quotient<BigRational> q) {
        return q.num.isConstant() && q.den.isConstant();
    }

    /** The rational value of a constant element. */
    static BigRational constantValue(Quotient<BigRational> q) {
        return q.num.leadingBaseCoefficient().divide(q.den.leadingBaseCoefficient());
    }

    /** Irreducible factors over Q of a polynomial in the parameters, each primitive with integer coefficients. */
    synchronized List<GenPolynomial<BigRational>> irreducibleFactors(GenPolynomial<BigRational> p) {
        List<GenPolynomial<BigRational>> out = new ArrayList<>();
        if (p.isConstant()) {
            return out;
        }
        // the denominators of one closed form share their factors: divide out those found before, and factor only
        // what remains (the factorisation of large denominators was most of the time for 6 states)
        GenPolynomial<BigRational> rest = p;
        for (GenPolynomial<BigRational> k : knownFactors) {
            boolean divides = false;
            while (!rest.isConstant()) {
                GenPolynomial<BigRational>[] qr = rest.quotientRemainder(k);
                if (!qr[1].isZERO()) {
                    break;
                }
                rest = qr[0];
                divides = true;
            }
            if (divides) {
                out.add(k);
            }
        }
        if (!rest.isConstant()) {
            FactorAbstract<BigRational> f = FactorFactory.getImplementation(BigRational.ZERO);
            for (GenPolynomial<BigRational> g : f.factors(rest).keySet()) {
                if (!g.isConstant()) {
                    GenPolynomial<BigRational> i = integral(g);
                    out.add(i);
                    knownFactors.add(i);
                }
            }
        }
        return out;
    }

    /** Irreducible factors found so far (see {@link #irreducibleFactors}). */
    private final List<GenPolynomial<BigRational>> knownFactors = new ArrayList<>();

    // --- printing ----------------------------------------------------------------------------------------------

    /** {@code p} scaled to coprime integer coefficients with a positive first term in print order. */
    GenPolynomial<BigRational> integral(GenPolynomial<BigRational> p) {
        if (p.isZERO()) {
            return p;
        }
        BigInteger lcm = BigInteger.ONE;
        BigInteger gcd = BigInteger.ZERO;
        for (BigRational c : p.getMap().values()) {
            BigInteger d = c.denominator();
            lcm = lcm.divide(lcm.gcd(d)).multiply(d);
        }
        for (BigRational c : p.getMap().values()) {
            gcd = gcd.gcd(c.numerator().multiply(lcm).divide(c.denominator()));
        }
        BigRational scale = BigRational.RNRED(lcm, gcd);
        if (firstCoefficient(p).signum() < 0) {
            scale = scale.negate();
        }
        return p.multiply(scale);
    }

    private BigRational firstCoefficient(GenPolynomial<BigRational> p) {
        return monomials(p).get(0).getValue();
    }

    /** Monomials in print order: ascending total degree, then by exponents in parameter order, higher first. */
    private List<Map.Entry<ExpVector, BigRational>> monomials(GenPolynomial<BigRational> p) {
        List<Map.Entry<ExpVector, BigRational>> terms = new ArrayList<>(p.getMap().entrySet());
        Comparator<Map.Entry<ExpVector, BigRational>> byDegree = Comparator.comparingLong(t -> t.getKey().totalDeg());
        terms.sort(byDegree.thenComparing((x, y) -> {
            for (int i = 0; i < names.size(); i++) {
                int c = Integer.compare(exp(y.getKey(), i), exp(x.getKey(), i));
                if (c != 0) {
                    return c;
                }
            }
            return 0;
        }));
        return terms;
    }

    static Fml rational(BigInteger num, BigInteger den) {
        Fml n = Fml.integer(num.abs());
        Fml r = den.equals(BigInteger.ONE) ? n : Fml.div(n, Fml.integer(den));
        return num.signum() < 0 ? Fml.neg(r) : r;
    }

    /** A polynomial in the parameters as a formula. */
    Fml formula(GenPolynomial<BigRational> p) {
        if (p.isZERO()) {
            return Fml.ZERO;
        }
        List<Fml> terms = new ArrayList<>();
        for (Map.Entry<ExpVector, BigRational> t : monomials(p)) {
            List<Fml> factors = new ArrayList<>();
            BigRational c = t.getValue();
            factors.add(rational(c.numerator().abs(), c.denominator()));
            for (int i = 0; i < names.size(); i++) {
                int k = exp(t.getKey(), i);
                if (k > 0) {
                    factors.add(Fml.pow(Fml.name(names.get(i)), Fml.integer(k)));
                }
            }
            Fml m = Fml.prod(factors);
            terms.add(c.signum() < 0 ? Fml.neg(m) : m);
        }
        return Fml.sum(terms);
    }

    /**
     * A rational function with numerator and denominator factored over the rationals: one rational constant times
     * irreducible integer polynomials with their multiplicities, {@code 3*w*(39 + 50*w)/(2*(14 + 53*w))}.
     */
    Fml factoredFormula(Quotient<BigRational> q) {
        if (q.isZERO() || (q.num.isConstant() && q.den.isConstant())) {
            return formula(q);
        }
        FactorAbstract<BigRational> fac = FactorFactory.getImplementation(BigRational.ZERO);
        List<Fml> top = new ArrayList<>();
        List<Fml> bottom = new ArrayList<>();
        BigRational c = factorInto(fac, q.num, top).divide(factorInto(fac, q.den, bottom));
        BigInteger u = c.numerator().abs();
        BigInteger v = c.denominator();
        if (!u.equals(BigInteger.ONE) || top.isEmpty()) {
            top.add(0, Fml.integer(u));
        }
        if (!v.equals(BigInteger.ONE)) {
            bottom.add(0, Fml.integer(v));
        }
        Fml t = Fml.prod(top);
        Fml r = bottom.isEmpty() ? t : Fml.div(t, Fml.prod(bottom));
        return c.signum() < 0 ? Fml.neg(r) : r;
    }

    /** Adds the irreducible factors of {@code p} (integral, with their powers) to {@code out}; returns the constant. */
    private BigRational factorInto(FactorAbstract<BigRational> fac, GenPolynomial<BigRational> p, List<Fml> out) {
        if (p.isConstant()) {
            return p.leadingBaseCoefficient();
        }
        BigRational c = p.leadingBaseCoefficient();
        List<Map.Entry<GenPolynomial<BigRational>, Long>> fs = new ArrayList<>(fac.factors(p).entrySet());
        // monomials first, then by degree and text: 3*w*(39 + 50*w)
        fs.sort(java.util.Comparator.comparingInt((Map.Entry<GenPolynomial<BigRational>, Long> e) -> e.getKey()
            .length()).thenComparingLong(e -> e.getKey().totalDegree())
            .thenComparing(e -> Fml.plain(formula(integral(e.getKey())))));
        for (Map.Entry<GenPolynomial<BigRational>, Long> e : fs) {
            if (e.getKey().isConstant()) {
                continue;
            }
            GenPolynomial<BigRational> g = integral(e.getKey());
            long k = e.getValue();
            c = c.divide(power(g, k).leadingBaseCoefficient());
            Fml f = formula(g);
            out.add(k == 1 ? f : Fml.pow(f, Fml.integer(k)));
        }
        return c;
    }

    /** A rational function as {@code num/den} with coprime integer coefficients and a positive denominator. */
    Fml formula(Quotient<BigRational> q) {
        if (q.isZERO()) {
            return Fml.ZERO;
        }
        GenPolynomial<BigRational> den = integral(q.den);
        BigRational scale = q.den.isZERO() ? BigRational.ONE : den.leadingBaseCoefficient().divide(q.den.leadingBaseCoefficient());
        GenPolynomial<BigRational> num = q.num.multiply(scale);
        if (den.isConstant()) {
            return formula(num.divide(den.leadingBaseCoefficient()));
        }
        // integer numerator: move the numerator's content denominator into the denominator
        GenPolynomial<BigRational> numInt = integral(num);
        BigRational ratio = num.leadingBaseCoefficient().divide(numInt.leadingBaseCoefficient());
        // num = ratio * numInt; den stays integral; ratio = r/s gives (r * numInt) / (s * den)
        // integer factors stay outside the brackets: 3*(a + b)/(2*(a^2 + b^2))
        Fml t = Fml.prod(Fml.integer(ratio.numerator()), formula(numInt));
        Fml bottom = Fml.prod(Fml.integer(ratio.denominator()), formula(den));
        boolean negative = false;
        if (t instanceof Fml.Neg g) {
            negative = true;
            t = g.operand();
        }
        Fml r = Fml.div(t, bottom);
        return negative ? Fml.neg(r) : r;
    }

    /** A univariate polynomial over the field, highest power first, e.g. {@code x^2 - (2 - a - b)*x + 1 - a - b}. */
    Fml formula(GenPolynomial<Quotient<BigRational>> p, String variable) {
        List<Fml> terms = new ArrayList<>();
        for (Map.Entry<ExpVector, Quotient<BigRational>> t : p.getMap().entrySet()) {
            long k = t.getKey().getVal(0);
            Fml c = formula(t.getValue());
            Fml power = k == 0 ? Fml.ONE : Fml.pow(Fml.name(variable), Fml.integer(k));
            if (k == 0) {
                terms.add(c);
            } else if (c instanceof Fml.Sum) {
                terms.add(Fml.prod(c, power));
            } else {
                terms.add(Fml.prod(c, power));
            }
        }
        return Fml.sum(terms);
    }
}
