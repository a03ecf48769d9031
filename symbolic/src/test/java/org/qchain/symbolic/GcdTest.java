package org.qchain.symbolic;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.qchain.exact.model.ModelParser;

/** Greatest common divisors of the parameter ring's polynomials divide both operands. */
class GcdTest {
    private static final ParamRing RING = ParamRing.of(List.of("a", "b", "c"));

    private static Poly poly(String text) {
        return RING.fromExpr(ModelParser.parseExpression("<test>", text)).numerator();
    }

    @Test
    void gcdOfAPolynomialWithItselfIsItsNormalisedSelf() {
        // gcd(x, x) = x up to a unit (common practice, no source); this trivariate made JAS's modular gcd return a
        // polynomial that divides neither (the stationary law's denominator of a four-state chain)
        Poly x = poly("2*c + 6*a^2 + 10*a*b + 18*a*c + 3*b^2 + 24*b*c + 9*a^3 + 48*a^2*b + 18*a^2*c + 51*a*b^2"
            + " + 72*a*b*c + 9*b^3 + 54*b^2*c + 18*a^3*b + 63*a^2*b^2 + 45*a*b^3");
        Poly g = x.gcd(x);
        assertEquals(x, g);
        Poly y = x.multiply(poly("a + 2*c"));
        Poly h = y.gcd(x.multiply(poly("b - 1")));
        assertEquals(x, h);
        assertEquals(RatFun.of(poly("a + 2*c"), poly("b - 1")), RatFun.of(y, x.multiply(poly("b - 1"))));
    }
}
