package org.qchain.symbolic;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.qchain.exact.model.Model;

/**
 * The two-state chain [[1 - a, a], [b, 1 - b]] against the standard closed form
 * P^n = (1/(a+b)) [[b, a], [b, a]] + ((1 - a - b)^n/(a+b)) [[a, -a], [-b, b]].
 * Source: Grinstead and Snell, Introduction to Probability, ch. 11 (from memory).
 */
class PublishedFormulaTest {
    private final Model model = TestChains.discrete(List.of("a", "b"), new String[][] {{"*", "a"}, {"b", "*"}});
    private final RatFunMatrix p = RatFunMatrix.fromModel(model);
    private final ParamRing ring = p.ring();

    private RatFun f(String text) {
        return ring.fromExpr(TestChains.expr(text));
    }

    private RatFunMatrix closedForm(int n) {
        RatFun s = f("a + b");
        RatFun l = f("1 - a - b").pow(n);
        RatFun a = f("a");
        RatFun b = f("b");
        RatFun[][] e = {
            {b.add(l.multiply(a)).divide(s), a.subtract(l.multiply(a)).divide(s)},
            {b.subtract(l.multiply(b)).divide(s), a.add(l.multiply(b)).divide(s)}};
        return RatFunMatrix.of(ring, e);
    }

    @Test
    void squareMatchesTheExpandedClosedForm() {
        RatFunMatrix p2 = p.power(2);
        assertEquals(closedForm(2), p2);
        // the expansion by hand: (1 - a)^2 + a*b, a*(1 - a) + a*(1 - b), ... (derived by hand from the closed form)
        assertEquals("1 - 2*a + a^2 + a*b", p2.get(0, 0).toString());
        assertEquals("2*a - a^2 - a*b", p2.get(0, 1).toString());
        assertEquals("2*b - a*b - b^2", p2.get(1, 0).toString());
        assertEquals("1 - 2*b + a*b + b^2", p2.get(1, 1).toString());
    }

    @Test
    void powersUpToTenMatchTheClosedForm() {
        for (int n = 0; n <= 10; n++) {
            RatFunMatrix pn = p.power(n);
            assertEquals(closedForm(n), pn, "n=" + n);
            // the closed form's quotient by a + b is a polynomial: entries of P^n are polynomials of degree n
            assertEquals(true, pn.get(0, 1).isPolynomial());
            assertEquals(n == 0 ? -1 : n, pn.get(0, 1).numerator().totalDegree());
        }
    }

    @Test
    void chapmanKolmogorovHoldsAsAPolynomialIdentity() {
        // Chapman-Kolmogorov equations P^(n+m) = P^n P^m; Grinstead and Snell, ch. 11 (from memory)
        for (int n = 0; n <= 4; n++) {
            for (int m = 0; m <= 4; m++) {
                assertEquals(p.power(n + m), p.power(n).multiply(p.power(m)), "n=" + n + " m=" + m);
            }
        }
    }

    @Test
    void chapmanKolmogorovWithRationalFunctionEntries() {
        // Chapman-Kolmogorov (as above) on a 3-state chain whose entries have parameter denominators
        Model m = TestChains.discrete(List.of("a", "b"), new String[][] {
            {"*", "a/(1 + a)", "0"},
            {"b/(2 + b)", "*", "a*b/(2 + b)"},
            {"0", "1/(1 + a + b)", "*"}});
        RatFunMatrix q = RatFunMatrix.fromModel(m);
        for (int[] nm : new int[][] {{1, 1}, {2, 3}, {4, 1}, {3, 3}}) {
            assertEquals(q.power(nm[0] + nm[1]), q.power(nm[0]).multiply(q.power(nm[1])),
                "n=" + nm[0] + " m=" + nm[1]);
        }
    }
}
