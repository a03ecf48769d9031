package org.qchain.symbolic.closed;

import edu.jas.arith.BigRational;
import edu.jas.poly.GenPolynomial;
import edu.jas.ufd.FactorAbstract;
import edu.jas.ufd.FactorFactory;
import edu.jas.ufd.Quotient;
import java.math.BigInteger;
import java.util.Map;

/** Square roots of elements of Q(parameters): pulling square factors out from under the root. */
final class Radicals {
    private Radicals() {
    }

    /**
     * Writes {@code d = s^2 * core} with {@code core} a polynomial with no repeated irreducible factor and an
     * integer content free of small square factors: {@code sqrt(d) = s * sqrt(core)}.
     *
     * @return {@code {s, core}}
     */
    static Quotient<BigRational>[] split(ParamField f, Quotient<BigRational> d) {
        // d = num/den = (num * den) / den^2
        GenPolynomial<BigRational> all = d.num.multiply(d.den);
        FactorAbstract<BigRational> fac = FactorFactory.getImplementation(BigRational.ZERO);
        GenPolynomial<BigRational> out = f.poly.getONE();
        GenPolynomial<BigRational> in = f.poly.getONE();
        GenPolynomial<BigRational> product = f.poly.getONE();
        for (Map.Entry<GenPolynomial<BigRational>, Long> e : fac.factors(all).entrySet()) {
            GenPolynomial<BigRational> g = f.integral(e.getKey());
            if (g.isConstant()) {
                continue;
            }
            long k = e.getValue();
            product = product.multiply(ParamField.power(g, k));
            out = out.multiply(k / 2 == 0 ? f.poly.getONE() : ParamField.power(g, k / 2));
            if (k % 2 == 1) {
                in = in.multiply(g);
            }
        }
        // the rational constant JAS leaves out of the factors
        BigRational c = all.leadingBaseCoefficient().divide(product.leadingBaseCoefficient());
        BigInteger m = c.numerator().multiply(c.denominator());
        BigInteger t = BigInteger.ONE;
        BigInteger k = m.abs();
        for (long p = 2; p <= 1000; p++) {
            BigInteger pp = BigInteger.valueOf(p * p);
            if (pp.compareTo(k) > 0) {
                break;
            }
            while (k.mod(pp).signum() == 0) {
                k = k.divide(pp);
                t = t.multiply(BigInteger.valueOf(p));
            }
        }
        BigInteger r = k.sqrt();
        if (r.multiply(r).equals(k)) {
            t = t.multiply(r);
            k = BigInteger.ONE;
        }
        k = m.signum() < 0 ? k.negate() : k;
        // sqrt(c) = sqrt(m) / den(c) = t sqrt(k) / den(c)
        Quotient<BigRational> s = new Quotient<>(f.field, out.multiply(BigRational.RNRED(t, c.denominator())), d.den);
        Quotient<BigRational> core = new Quotient<>(f.field, in.multiply(new BigRational(k)));
        @SuppressWarnings("unchecked")
        Quotient<BigRational>[] res = (Quotient<BigRational>[]) new Quotient[] {s, core};
        return res;
    }
}
