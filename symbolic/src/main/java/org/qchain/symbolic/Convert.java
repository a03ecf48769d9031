package org.qchain.symbolic;

import edu.jas.arith.BigRational;
import org.qchain.exact.Rational;

/** Conversions between our {@link Rational} and JAS's {@code BigRational}; both are kept reduced. */
final class Convert {
    private Convert() {
    }

    static BigRational toJas(Rational r) {
        return BigRational.RNRED(r.numerator(), r.denominator());
    }

    static Rational fromJas(BigRational r) {
        return Rational.of(r.num, r.den);
    }
}
