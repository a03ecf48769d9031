package org.qchain.symbolic;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.qchain.exact.Rational;

/**
 * Every index-based operation against hand-computed results, variable by variable (JAS numbers exponent vectors from
 * the last variable: the library notes' pitfall). Source: common practice, no source (calculus by hand).
 */
class JasIndexTest {
    private final ParamRing ring = ParamRing.of(List.of("a", "b", "c"));
    private final Poly p = ring.fromExpr(TestChains.expr("a^3*b + 2*b^2*c + 5*c")).numerator();

    @Test
    void derivativeInEachVariable() {
        assertEquals("3*a^2*b", p.derivative("a").toString());
        assertEquals("4*b*c + a^3", p.derivative("b").toString());
        assertEquals("5 + 2*b^2", p.derivative("c").toString());
    }

    @Test
    void degreeInEachVariable() {
        assertEquals(3, p.degree("a"));
        assertEquals(2, p.degree("b"));
        assertEquals(1, p.degree("c"));
        assertEquals(4, p.totalDegree());
        assertEquals(List.of("a", "b", "c"), p.occurringVariables());
    }

    @Test
    void substituteEachVariable() {
        assertEquals("8*b + 5*c + 2*b^2*c", p.substitute(Map.of("a", Rational.of(2))).toString());
        assertEquals("23*c + 3*a^3", p.substitute(Map.of("b", Rational.of(3))).toString());
        assertEquals("25 + 10*b^2 + a^3*b", p.substitute(Map.of("c", Rational.of(5))).toString());
        assertEquals(Rational.of(2 * 2 * 2 * 3 + 2 * 9 * 5 + 25), p.evaluate(Map.of("a", Rational.of(2),
            "b", Rational.of(3), "c", Rational.of(5))));
    }

    @Test
    void termsComeInPrintingOrder() {
        assertEquals("5*c + 2*b^2*c + a^3*b", p.toString());
        Poly.Term first = p.terms().get(0);
        assertEquals(List.of(0, 0, 1), first.exponents());
        assertEquals(Rational.of(5), first.coefficient());
    }
}
