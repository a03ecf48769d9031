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
    private static final Pattern BINOMIAL = Pattern.compile("binomial\\(n, (\\d+)\\)");
    private static final Pattern SHIFTED = Pattern.compile("\\^\\(n ([+-]) (\\d+)\\)");

    /** The formula with the number n in place of the symbol n. */
    static String atN(String formula, int n) {
        Matcher b = BINOMIAL.matcher(formula);
        StringBuilder sb = new StringBuilder();
        while (b.find()) {
            b.appendReplacement(sb, Evaluator.binomial(n, Integer.parseInt(b.group(1))).toString());
        }
        b.appendTail(sb);
        Matcher s = SHIFTED.matcher(sb.toString());
        StringBuilder sb2 = new StringBuilder();
        while (s.find()) {
            int k = Integer.parseInt(s.group(2));
            s.appendReplacement(sb2, "^(" + (s.group(1).equals("+") ? n + k : n - k) + ")");
        }
        s.appendTail(sb2);
        return sb2.toString().replace("^n", "^" + n).replaceAll("\\bn\\b", "(" + n + ")");
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
                    String text = atN(cf.formula(i, j), n);
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
}
