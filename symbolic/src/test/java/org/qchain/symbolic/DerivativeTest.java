package org.qchain.symbolic;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.qchain.exact.Rational;
import org.qchain.exact.model.Model;
import org.qchain.symbolic.cas.SymjaSession;

/** Exact derivatives of n-step probabilities against two independent references. */
class DerivativeTest {
    private final Model model = TestChains.discrete(List.of("p", "r"), new String[][] {
        {"*", "p", "0"},
        {"r/2", "*", "p*r"},
        {"1/(2 + p)", "0", "*"}});
    private final RatFunMatrix one = RatFunMatrix.fromModel(model);

    /** Exact enclosure of |N| and |D| of a univariate rational function in {@code x} over [lo, hi] with lo > 0. */
    private static Rational maxAbsOver(RatFun g, String x, Rational lo, Rational hi) {
        Rational nMax = Rational.ZERO;
        for (Poly.Term t : g.numerator().terms()) {
            int e = t.exponents().get(g.ring().indexOf(x).orElseThrow());
            nMax = nMax.add(t.coefficient().abs().multiply(hi.pow(e)));
        }
        // |D| >= |D(lo)| - sum over non-constant terms of |c| (hi^e - lo^e): a lower bound for the denominator
        Rational dLo = g.denominator().evaluate(Map.of(x, lo)).abs();
        Rational slack = Rational.ZERO;
        for (Poly.Term t : g.denominator().terms()) {
            int e = t.exponents().get(g.ring().indexOf(x).orElseThrow());
            slack = slack.add(t.coefficient().abs().multiply(hi.pow(e).subtract(lo.pow(e))));
        }
        Rational dMin = dLo.subtract(slack);
        assertTrue(dMin.signum() > 0, "denominator bounded away from 0");
        return nMax.divide(dMin);
    }

    @Test
    void exactDerivativeMatchesTheSymmetricDifferenceQuotientWithinTheTaylorBound() {
        // Taylor's theorem: (f(x+h) - f(x-h))/(2h) - f'(x) = h^2/12 (f'''(s) + f'''(t)) for some s, t in
        // [x-h, x+h], so the error is at most h^2/6 * max |f'''| there. Source: common practice, no source
        // (central difference error term, standard numerical analysis).
        Rational h = Rational.of(1, 1_000_000_000_000L);
        Rational x = Rational.of(3, 10);
        Rational r = Rational.of(1, 4);
        for (int n : new int[] {1, 2, 4, 6}) {
            RatFunMatrix pn = one.power(n);
            for (int i = 0; i < 3; i++) {
                for (int j = 0; j < 3; j++) {
                    RatFun f = pn.get(i, j).substitute(Map.of("r", r));
                    RatFun d1 = f.derivative("p");
                    RatFun d3 = d1.derivative("p").derivative("p");
                    Rational exact = d1.evaluate(Map.of("p", x));
                    Rational quotient = f.evaluate(Map.of("p", x.add(h))).subtract(f.evaluate(Map.of("p", x.subtract(h))))
                        .divide(h.multiply(Rational.of(2)));
                    Rational bound = h.multiply(h).divide(Rational.of(6))
                        .multiply(maxAbsOver(d3, "p", x.subtract(h), x.add(h)));
                    Rational err = quotient.subtract(exact).abs();
                    assertTrue(err.compareTo(bound) <= 0, "n=" + n + " (" + i + "," + j + "): error " + err
                        + " above bound " + bound);
                    assertTrue(bound.compareTo(Rational.of(1, 1_000_000_000_000_000L)) < 0, "bound is tight");
                }
            }
        }
    }

    @Test
    void exactDerivativeAgreesWithSymjaD() {
        // Symja's D as a general-purpose reference (matheclipse-core 3.0.0), compared by exact evaluation at
        // rational points: Symja's Together is not trusted here, because in 3.0.0 it returns a wrong form for
        // 1/(2+x) - (1+x)/(2+x)^2 (gives (2-x)/(4*(2+x)) instead of 1/(2+x)^2; measured, see package-info).
        SymjaSession cas = SymjaSession.open();
        Rational[][] points = {{Rational.of(1, 3), Rational.of(1, 4)}, {Rational.of(2, 7), Rational.of(5, 9)},
            {Rational.of(1, 11), Rational.of(3, 5)}};
        for (int n : new int[] {1, 3}) {
            RatFunMatrix pn = one.power(n);
            for (int i = 0; i < 3; i++) {
                for (int j = 0; j < 3; j++) {
                    RatFun f = pn.get(i, j);
                    for (String v : List.of("p", "r")) {
                        RatFun ours = f.derivative(v);
                        for (Rational[] pt : points) {
                            String input = "ReplaceAll(D(" + f + ", " + v + "), {p -> " + pt[0] + ", r -> " + pt[1] + "})";
                            Rational symja = Rational.parse(cas.eval(input));
                            assertEquals(ours.evaluate(Map.of("p", pt[0], "r", pt[1])), symja, input);
                        }
                    }
                }
            }
        }
        assertEquals("", cas.takeMessages());
    }

    @Test
    void derivativeOfAFactoredFormIsTheProductRule() {
        // common practice, no source: d/dp [p^2 (1 - p)] = 2p - 3p^2
        ParamRing ring = ParamRing.of(List.of("p"));
        RatFun f = ring.fromExpr(TestChains.expr("p^2*(1 - p)"));
        assertEquals("2*p - 3*p^2", f.derivative("p").toString());
        // quotient rule: d/dp [p/(1 + p)] = 1/(1 + p)^2
        RatFun g = ring.fromExpr(TestChains.expr("p/(1 + p)"));
        assertEquals("1/(1 + 2*p + p^2)", g.derivative("p").toString());
        Map<String, Rational> at = new LinkedHashMap<>();
        at.put("p", Rational.of(1, 3));
        assertEquals(Rational.of(9, 16), g.derivative("p").evaluate(at));
    }
}
