package org.qchain.symbolic.closed;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.model.Model;
import org.qchain.exact.model.ModelParser;
import org.qchain.symbolic.ParamRing;
import org.qchain.symbolic.RatFunMatrix;

/**
 * The printed text itself, not only the internal form, is right: with n replaced by a number, the model parser reads
 * each formula back, and the value equals the exact P^n, as a rational function (against the symbolic module's
 * powers) and at a point (against exact products). Formulas with rational eigenvalues only: the model syntax has no
 * square roots. Common practice, no source: P^n is the repeated product.
 */
class PrintedFormulaTest {
    /** The formula with the number n in place of the symbol n. */
    static String atN(String formula, int n) {
        return atN(formula, "n", n);
    }

    /** The formula with the number n in place of the step symbol. */
    static String atN(String formula, String symbol, int n) {
        String q = Pattern.quote(symbol);
        Matcher b = Pattern.compile("binomial\\(" + q + ", (\\d+)\\)").matcher(formula);
        StringBuilder sb = new StringBuilder();
        while (b.find()) {
            b.appendReplacement(sb, Evaluator.binomial(n, Integer.parseInt(b.group(1))).toString());
        }
        b.appendTail(sb);
        Matcher s = Pattern.compile("\\^\\(" + q + " ([+-]) (\\d+)\\)").matcher(sb.toString());
        StringBuilder sb2 = new StringBuilder();
        while (s.find()) {
            int k = Integer.parseInt(s.group(2));
            s.appendReplacement(sb2, "^(" + (s.group(1).equals("+") ? n + k : n - k) + ")");
        }
        s.appendTail(sb2);
        return sb2.toString().replaceAll("\\^" + q + "\\b", "^" + n).replaceAll("\\b" + q + "\\b", "(" + n + ")");
    }

    private static void check(Model m, Map<String, Rational> at) {
        ClosedForm cf = ClosedForms.of(m);
        Chains.assertMatchesPowers(cf, m, List.of(at), 0);
        RatFunMatrix p = RatFunMatrix.fromModel(m);
        ParamRing ring = p.ring();
        List<RationalMatrix> exact = Chains.powers(Chains.matrix(m, at), 2 * m.size() + 2);
        for (int n = Math.max(cf.validFrom(), 1); n <= 2 * m.size() + 2; n++) {
            RatFunMatrix pn = p.power(n);
            for (int i = 0; i < m.size(); i++) {
                for (int j = 0; j < m.size(); j++) {
                    String text = atN(cf.formula(i, j), cf.nSymbol(), n);
                    var expr = ModelParser.parseExpression("formula", text);
                    assertEquals(pn.get(i, j), ring.fromExpr(expr), text);
                    assertEquals(exact.get(n).get(i, j), expr.evaluate(at::get), text);
                }
            }
        }
    }

    @Test
    void twoStateFormulaTextReadsBackToExactPowers() {
        // the standard two-state chain (Grinstead and Snell, Introduction to Probability, ch. 11, from memory)
        check(Chains.model(List.of("a", "b"), new String[][] {{"1-a", "a"}, {"b", "1-b"}}),
            Chains.at("a", "1/3", "b", "1/4"));
    }

    @Test
    void jordanFormulaTextReadsBackToExactPowers() {
        // parameters on the diagonal: eigenvalue 1 - p with a Jordan block of size 2, written (1 - p)^(n - 1)
        check(Chains.model(List.of("p", "q"), new String[][] {
            {"1-p", "p", "0", "0"}, {"0", "1-p", "p", "0"}, {"0", "0", "1-q", "q"}, {"0", "0", "0", "1"}}),
            Chains.at("p", "1/3", "q", "1/5"));
    }

    @Test
    void nilpotentPartTextReadsBackFromValidFrom() {
        // S1 -> S2 -> S3 with S3 a loop between S3 and S4: eigenvalue 0 twice, so valid_from = 2 (derived by hand)
        Model m = Chains.model(List.of("a"), new String[][] {
            {"0", "1", "0", "0"}, {"0", "0", "1", "0"}, {"0", "0", "1-a", "a"}, {"0", "0", "a", "1-a"}});
        assertEquals(2, ClosedForms.of(m).validFrom());
        check(m, Chains.at("a", "2/7"));
    }

    // --- symbols that would collide with parameter names (regression: issue 8) ---------------------------------

    @Test
    void parameterNamedNMovesTheStepSymbolAndTheTextStillReadsBack() {
        // the standard two-state chain (Grinstead and Snell, Introduction to Probability, ch. 11, from memory), with
        // its failure probability called n: the step count must be written with another symbol
        Model m = Chains.model(List.of("n", "r"), new String[][] {{"1-n", "n"}, {"r", "1-r"}});
        ClosedForm cf = ClosedForms.of(m);
        assertEquals("k", cf.nSymbol());
        assertEquals("n/(n + r) - n/(n + r)*(1 - n - r)^k", cf.formula(0, 1));
        check(m, Chains.at("n", "1/3", "r", "1/4"));
    }

    @Test
    void parametersNamedNAndKBothKeepTheirMeaning() {
        // a Jordan block (eigenvalue 1 - n twice): binomial(step, 1) and (1 - n)^(step - 1) must use a third symbol
        Model m = Chains.model(List.of("n", "k"), new String[][] {
            {"1-n", "n", "0", "0"}, {"0", "1-n", "n", "0"}, {"0", "0", "1-k", "k"}, {"0", "0", "0", "1"}});
        ClosedForm cf = ClosedForms.of(m);
        assertEquals("t", cf.nSymbol());
        check(m, Chains.at("n", "1/3", "k", "1/5"));
    }

    @Test
    void parametersNamedXAndZMoveTheVariablesOfFactorsAndGeneratingFunctions() {
        // two-state chain as above with parameters x and z; det(yI - P) = (y - P11)(y - P22) - P12 P21 for a 2x2
        // matrix (common practice, no source), and (I - tP) G(t) = I defines the generating function G
        Model m = Chains.model(List.of("x", "z"), new String[][] {{"1-x", "x"}, {"z", "1-z"}});
        Map<String, Rational> at = Chains.at("x", "1/3", "z", "1/4");
        ClosedForm cf = ClosedForms.of(m);
        Symbols sy = cf.symbols();
        assertEquals("n", sy.step());
        assertEquals("y", sy.variable());
        assertEquals("w", sy.series());
        RationalMatrix p = Chains.matrix(m, at);
        Rational y = Rational.parse("7/5");
        Rational det = y.subtract(p.get(0, 0)).multiply(y.subtract(p.get(1, 1))).subtract(p.get(0, 1).multiply(p.get(1, 0)));
        Rational product = Rational.ONE;
        for (Eigenvalue e : cf.eigenvalues()) {
            Map<String, Rational> point = new java.util.HashMap<>(at);
            point.put(sy.variable(), y);
            product = product.multiply(ModelParser.parseExpression("factor", e.factor()).evaluate(point::get));
            // each printed eigenvalue is a root of its printed factor
            point.put(sy.variable(), ModelParser.parseExpression("eigenvalue", e.values().get(0)).evaluate(at::get));
            assertEquals(Rational.ZERO, ModelParser.parseExpression("factor", e.factor()).evaluate(point::get), e.factor());
        }
        assertEquals(det, product);
        SeriesForm sf = cf.series();
        assertEquals(sy, sf.symbols());
        Rational t = Rational.parse("2/3");
        Map<String, Rational> point = new java.util.HashMap<>(at);
        point.put(sy.series(), t);
        for (int j = 0; j < 2; j++) {
            for (int i = 0; i < 2; i++) {
                Rational sum = Rational.ZERO;
                for (int k = 0; k < 2; k++) {
                    Rational g = ModelParser.parseExpression("gf", sf.generatingFunction(k, j).plain()).evaluate(point::get);
                    Rational a = (i == k ? Rational.ONE : Rational.ZERO).subtract(t.multiply(p.get(i, k)));
                    sum = sum.add(a.multiply(g));
                }
                assertEquals(i == j ? Rational.ONE : Rational.ZERO, sum, "(I - tP) G at " + i + ", " + j);
            }
        }
        check(m, at);
    }

    @Test
    void symbolsAvoidEveryParameterAndEachOther() {
        // common practice, no source: a formula's own symbols must be distinct from every name in it
        Symbols s = Symbols.avoiding(List.of("n", "k", "t", "x", "y", "z", "w", "u", "f1", "s", "m"));
        java.util.Set<String> seen = new java.util.HashSet<>(List.of("n", "k", "t", "x", "y", "z", "w", "u", "f1", "s", "m"));
        for (String sym : s.all()) {
            org.junit.jupiter.api.Assertions.assertTrue(seen.add(sym), sym + " in " + s);
        }
        assertEquals(Symbols.DEFAULT, Symbols.avoiding(List.of("a", "b")));
        assertEquals("n", Symbols.DEFAULT.step());
    }
}
