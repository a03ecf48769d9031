package org.qchain.symbolic.closed;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Random;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.model.ChainKind;
import org.qchain.exact.model.Domain;
import org.qchain.exact.model.Model;
import org.qchain.exact.model.ModelParser;
import org.qchain.exact.model.ParamDecl;
import org.qchain.exact.model.Transition;
import org.qchain.symbolic.RatFunMatrix;

/** Test helpers: chains from matrices of expression text (read by the model parser), and the check every closed form must pass. */
final class Chains {
    private Chains() {
    }

    /** Entries of random chains with the parameters a and b, each below 1/2 for a, b in (0, 1). */
    static final String[] SYMBOLIC = {"0", "0", "a", "b", "a/2", "b/3", "1/4", "a*b", "1/5"};
    /** Entries of random chains without parameters. */
    static final String[] NUMERIC = {"0", "0", "1/2", "1/3", "1/4", "1/6", "2/7", "1/10"};

    /**
     * A random chain of s states: at most two off-diagonal entries a row from the pool, the diagonal the rest.
     */
    static Model random(Random rnd, int s, String[] pool, List<String> params) {
        String[][] rows = new String[s][s];
        for (int i = 0; i < s; i++) {
            List<String> off = new ArrayList<>();
            for (int j = 0; j < s; j++) {
                if (j != i) {
                    // at most two non-zero entries a row keep the sum below 1 for values in (0, 1/2)
                    String e = off.size() < 2 ? pool[rnd.nextInt(pool.length)] : "0";
                    rows[i][j] = e;
                    if (!e.equals("0")) {
                        off.add(e);
                    }
                }
            }
            rows[i][i] = off.isEmpty() ? "1" : "1 - (" + String.join(" + ", off) + ")";
        }
        return Chains.model(params, rows);
    }

    /** A discrete model whose entries are given as expression text (parameters: single names). */
    static Model model(List<String> params, String[][] rows) {
        List<String> states = new ArrayList<>();
        for (int i = 0; i < rows.length; i++) {
            states.add("S" + (i + 1));
        }
        List<ParamDecl> decls = new ArrayList<>();
        for (String p : params) {
            decls.add(new ParamDecl(p, Domain.probability(), Optional.empty(), null));
        }
        List<Transition> ts = new ArrayList<>();
        for (int i = 0; i < rows.length; i++) {
            for (int j = 0; j < rows.length; j++) {
                if (i == j || !rows[i][j].strip().equals("0")) {
                    ts.add(new Transition(i, j, ModelParser.parseExpression("test", rows[i][j]), null));
                }
            }
        }
        return Model.of("test", ChainKind.DISCRETE, decls, states, ts);
    }

    /** P with parameters substituted, as an exact matrix. */
    static RationalMatrix matrix(Model m, Map<String, Rational> at) {
        int s = m.size();
        Rational[][] r = new Rational[s][s];
        for (int i = 0; i < s; i++) {
            for (int j = 0; j < s; j++) {
                r[i][j] = m.entry(i, j).evaluate(at::get);
            }
        }
        return RationalMatrix.of(r);
    }

    /** Exact P^0 .. P^k by repeated multiplication (common practice, no source: the definition of P^n). */
    static List<RationalMatrix> powers(RationalMatrix p, int k) {
        List<RationalMatrix> out = new ArrayList<>();
        out.add(RationalMatrix.identity(p.rows()));
        for (int i = 1; i <= k; i++) {
            out.add(out.get(i - 1).multiply(p));
        }
        return out;
    }

    /**
     * The check every closed form in the tests passes: for n = 0 .. 2s (and up to {@code extra} more), the
     * formula part (n >= validFrom) with free parameters equals the repeated product of the symbolic matrix, as
     * rational functions; and at each point, {@link ClosedForm#evaluate} equals the exact power of the
     * substituted chain.
     */
    static void assertMatchesPowers(ClosedForm cf, Model m, List<Map<String, Rational>> points, int upTo) {
        int s = m.size();
        int last = Math.max(2 * s, upTo);
        // reference: the symbolic module's own P^n (repeated squaring over a common denominator), an independent path
        RatFunMatrix p = RatFunMatrix.fromModel(m);
        for (int n = 0; n <= last; n++) {
            assertEquals(p.power(n), cf.evaluate(n), "symbolic P^" + n);
        }
        for (int i = 0; i < s; i++) {
            for (int j = 0; j < s; j++) {
                assertBalancedLatex(cf.latex(i, j));
            }
        }
        for (Map<String, Rational> at : points) {
            List<RationalMatrix> exact = powers(matrix(m, at), last);
            for (int n = 0; n <= last; n++) {
                assertEquals(exact.get(n), cf.evaluate(n, at), "P^" + n + " at " + at);
                assertEquals(exact.get(n).get(0, s - 1), cf.evaluate(n, 0, s - 1, at), "entry of P^" + n + " at " + at);
            }
            // the chain with the values given first has a closed form of its own: it must agree as well
            ClosedForm substituted = ClosedForms.of(m, at);
            for (int n = 0; n <= last; n++) {
                assertEquals(exact.get(n), substituted.evaluate(n, Map.of()), "substituted P^" + n + " at " + at);
            }
        }
    }

    /** Braces balance and every \\left has its \\right (common practice, no source: TeX's grouping rules). */
    static void assertBalancedLatex(String tex) {
        int depth = 0;
        for (char c : tex.toCharArray()) {
            depth += c == '{' ? 1 : (c == '}' ? -1 : 0);
            org.junit.jupiter.api.Assertions.assertTrue(depth >= 0, tex);
        }
        assertEquals(0, depth, tex);
        assertEquals(tex.split("\\\\left", -1).length, tex.split("\\\\right", -1).length, tex);
    }

    static Map<String, Rational> at(Object... kv) {
        Map<String, Rational> m = new HashMap<>();
        for (int i = 0; i < kv.length; i += 2) {
            m.put((String) kv[i], Rational.parse((String) kv[i + 1]));
        }
        return m;
    }
}
