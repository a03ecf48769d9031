package org.qchain.symbolic.closed;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import edu.jas.arith.BigRational;
import edu.jas.poly.GenPolynomial;
import edu.jas.ufd.Quotient;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.model.Model;

/**
 * Generating functions and recurrences against exact powers. The identity used is the definition
 * sum_n P^n z^n = (I - zP)^-1 (common practice, no source); the reference is repeated multiplication.
 */
class GeneratingFunctionTest {

    /** A 6-state chain: a line of machines with a repair loop (invented for the test; the check is exact powers). */
    private static final Model SIX = Chains.model(List.of(), new String[][] {
        {"1/2", "1/2", "0", "0", "0", "0"},
        {"1/4", "1/4", "1/2", "0", "0", "0"},
        {"0", "1/3", "1/3", "1/3", "0", "0"},
        {"0", "0", "1/5", "2/5", "2/5", "0"},
        {"0", "0", "0", "1/6", "1/2", "1/3"},
        {"1/7", "0", "0", "0", "2/7", "4/7"}});

    private static final Model SIX_PARAM = Chains.model(List.of("p"), new String[][] {
        {"1-p", "p", "0", "0", "0", "0"},
        {"0", "1-p", "p", "0", "0", "0"},
        {"0", "0", "1/2", "1/2", "0", "0"},
        {"0", "0", "0", "1-p", "p", "0"},
        {"0", "0", "0", "0", "1/2", "1/2"},
        {"1/3", "0", "0", "0", "0", "2/3"}});

    /** Power series coefficients of num/den up to z^k (den(0) = 1). */
    private static List<Quotient<BigRational>> series(ParamField f, List<GenPolynomial<Quotient<BigRational>>> parts, int k) {
        Quotient<BigRational>[] num = Spectral.coefficients(f, parts.get(0), Math.max(k, (int) parts.get(0).degree(0)));
        Quotient<BigRational>[] den = Spectral.coefficients(f, parts.get(1), Math.max(k, (int) parts.get(1).degree(0)));
        List<Quotient<BigRational>> a = new ArrayList<>();
        for (int n = 0; n <= k; n++) {
            Quotient<BigRational> s = num[n];
            for (int j = 1; j <= n; j++) {
                s = s.subtract(den[j].multiply(a.get(n - j)));
            }
            a.add(s.divide(den[0]));
        }
        return a;
    }

    private static void check(Model m, int extra) {
        SeriesForm cf = ClosedForms.series(m, Map.of());
        ParamField f = cf.raw().field;
        int s = m.size();
        int last = 2 * s + extra;
        List<Quotient<BigRational>[][]> pn = new ArrayList<>();
        pn.add(Mat.identity(f, s));
        for (int n = 1; n <= last; n++) {
            pn.add(Mat.multiply(f, pn.get(n - 1), cf.raw().matrix));
        }
        for (int i = 0; i < s; i++) {
            for (int j = 0; j < s; j++) {
                List<Quotient<BigRational>> a = series(f, cf.gfParts(i, j), last);
                List<Quotient<BigRational>> r = cf.recurrenceCoefficients(i, j);
                int start = cf.recurrenceStart(i, j);
                List<Quotient<BigRational>> u = new ArrayList<>();
                for (int n = 0; n <= last; n++) {
                    Quotient<BigRational> v;
                    if (n < start) {
                        v = pn.get(n)[i][j];
                    } else {
                        v = f.zero();
                        for (int k = 1; k <= r.size(); k++) {
                            v = v.sum(r.get(k - 1).multiply(u.get(n - k)));
                        }
                    }
                    u.add(v);
                    assertEquals(pn.get(n)[i][j], a.get(n), "gf series at n=" + n + " entry " + i + "," + j);
                    assertEquals(pn.get(n)[i][j], v, "recurrence at n=" + n + " entry " + i + "," + j);
                }
                assertTrue(r.size() <= s);
            }
        }
    }

    @Test
    void generatingFunctionAndRecurrenceReproduceExactPowersOfASixStateChain() {
        check(SIX, 6);
    }

    @Test
    void generatingFunctionAndRecurrenceReproduceExactPowersWithAParameter() {
        check(SIX_PARAM, 2);
    }

    /** Two stages with parameters, then absorption: eigenvalues 1 - p (twice, one Jordan block), 1/2 (twice), 1 - q, 1. */
    private static final Model SIX_STAGES = Chains.model(List.of("p", "q"), new String[][] {
        {"1-p", "p", "0", "0", "0", "0"},
        {"0", "1-p", "p/2", "p/2", "0", "0"},
        {"0", "0", "1/2", "1/2", "0", "0"},
        {"0", "0", "0", "1-q", "q", "0"},
        {"0", "0", "0", "0", "1/2", "1/2"},
        {"0", "0", "0", "0", "0", "1"}});

    @Test
    void sixStateClosedFormsMatchExactPowers() {
        Chains.assertMatchesPowers(ClosedForms.of(SIX), SIX, List.of(Map.of()), 14);
        ClosedForm stages = ClosedForms.of(SIX_STAGES);
        Chains.assertMatchesPowers(stages, SIX_STAGES, List.of(Chains.at("p", "1/3", "q", "1/5")), 0);
        check(SIX_STAGES, 0);
        // the closed form's recurrence entries agree with the series form's
        assertEquals(stages.recurrence(0, 5), ClosedForms.series(SIX_STAGES, Map.of()).recurrence(0, 5));
    }

    @Test
    void twoStateGeneratingFunctionIsPrinted() {
        Model m = Chains.model(List.of("a", "b"), new String[][] {{"1-a", "a"}, {"b", "1-b"}});
        ClosedForm cf = ClosedForms.of(m);
        // [(I - zP)^-1]_11 = (1 - (1 - b) z) / det(I - zP), det = 1 - (2 - a - b) z + (1 - a - b) z^2 (derived by hand)
        GeneratingFunction g = cf.generatingFunction(0, 0);
        assertEquals("1 - (1 - b)*z", g.numerator());
        assertEquals("1 - (2 - a - b)*z + (1 - a - b)*z^2", g.denominator());
        Recurrence r = cf.recurrence(0, 1);
        assertEquals(List.of("2 - a - b", "-1 + a + b"), r.coefficients());
        assertEquals(List.of("0", "a"), r.initial());
        // exact check of the recurrence at a point against exact powers
        Map<String, Rational> at = Chains.at("a", "1/3", "b", "1/5");
        List<RationalMatrix> exact = Chains.powers(Chains.matrix(m, at), 10);
        for (int n = 2; n <= 10; n++) {
            Rational lhs = exact.get(n).get(0, 1);
            Rational rhs = Rational.parse("2").subtract(at.get("a")).subtract(at.get("b")).multiply(exact.get(n - 1).get(0, 1))
                .add(Rational.parse("-1").add(at.get("a")).add(at.get("b")).multiply(exact.get(n - 2).get(0, 1)));
            assertEquals(lhs, rhs);
        }
    }
}
