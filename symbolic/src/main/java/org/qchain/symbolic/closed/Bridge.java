package org.qchain.symbolic.closed;

import edu.jas.arith.BigRational;
import edu.jas.poly.ExpVector;
import edu.jas.poly.GenPolynomial;
import edu.jas.ufd.Quotient;
import java.util.List;
import java.util.Map;
import org.qchain.exact.Rational;
import org.qchain.symbolic.ParamRing;
import org.qchain.symbolic.Poly;
import org.qchain.symbolic.RatFun;

/**
 * Conversions between the symbolic module's public value types ({@link RatFun} in a {@link ParamRing}) and this
 * package's working field (JAS quotients over the parameters that occur), term by term, by variable name.
 */
final class Bridge {
    private Bridge() {
    }

    static Quotient<BigRational> toField(ParamField f, RatFun r) {
        return new Quotient<>(f.field, toPoly(f, r.numerator()), toPoly(f, r.denominator()));
    }

    private static GenPolynomial<BigRational> toPoly(ParamField f, Poly p) {
        List<String> vars = p.ring().variables();
        GenPolynomial<BigRational> out = f.poly.getZERO();
        int n = f.names.size();
        for (Poly.Term t : p.terms()) {
            long[] e = new long[n];
            for (int k = 0; k < vars.size(); k++) {
                int exp = t.exponents().get(k);
                if (exp == 0) {
                    continue;
                }
                int i = f.names.indexOf(vars.get(k));
                if (i < 0) {
                    throw new IllegalArgumentException("variable " + vars.get(k) + " is not in the field");
                }
                e[n - 1 - i] = exp; // JAS counts variables from the end
            }
            out = out.sum(ParamField.big(t.coefficient()), ExpVector.create(e));
        }
        return out;
    }

    static RatFun toRatFun(ParamField f, ParamRing ring, Quotient<BigRational> q) {
        return RatFun.of(toPoly(f, ring, q.num), toPoly(f, ring, q.den));
    }

    private static Poly toPoly(ParamField f, ParamRing ring, GenPolynomial<BigRational> p) {
        Poly out = ring.zero();
        int n = f.names.size();
        for (Map.Entry<ExpVector, BigRational> t : p.getMap().entrySet()) {
            Poly m = ring.constant(ParamField.rational(t.getValue()));
            for (int i = 0; i < n; i++) {
                long k = t.getKey().getVal(n - 1 - i);
                if (k > 0) {
                    m = m.multiply(ring.variable(f.names.get(i)).pow((int) k));
                }
            }
            out = out.add(m);
        }
        return out;
    }

    static Rational rational(BigRational b) {
        return ParamField.rational(b);
    }
}
