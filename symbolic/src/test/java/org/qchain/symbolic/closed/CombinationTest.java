package org.qchain.symbolic.closed;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import edu.jas.arith.BigRational;
import edu.jas.poly.GenPolynomial;
import edu.jas.ufd.Quotient;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.model.Model;

/**
 * Closed forms of combinations of entries, {@code sum_i s_i sum_(j in To) P^n(i, j)}: a start distribution s and a
 * set of final states To. Checked against exact repeated products P^n (common practice, no source: P^n is defined
 * by repeated multiplication, and the probability of a set is the sum of its states' probabilities), and on
 * textbook facts of two-state chains (common practice, no source).
 */
class CombinationTest {
    private static final String[] SYMBOLIC = {"0", "0", "a", "b", "a/2", "b/3", "1/4", "a*b", "1/5"};
    private static final String[] NUMERIC = {"0", "0", "1/2", "1/3", "1/4", "1/6", "2/7", "1/10"};

    private static Model randomChain(Random rnd, int s, String[] pool, List<String> params) {
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

    /** A random start distribution over at least one state, exact, summing to 1. */
    private static Map<Integer, Rational> randomStart(Random rnd, int s) {
        Map<Integer, Rational> w = new LinkedHashMap<>();
        Rational left = Rational.ONE;
        for (int i = 0; i < s; i++) {
            if (i == s - 1) {
                w.put(i, left);
            } else if (rnd.nextBoolean()) {
                Rational v = left.multiply(Rational.of(rnd.nextInt(4), 4));
                w.put(i, v);
                left = left.subtract(v);
            }
        }
        return w;
    }

    private static List<Integer> randomSet(Random rnd, int s) {
        List<Integer> to = new ArrayList<>();
        for (int j = 0; j < s; j++) {
            if (rnd.nextBoolean()) {
                to.add(j);
            }
        }
        if (to.isEmpty()) {
            to.add(rnd.nextInt(s));
        }
        return to;
    }

    private static Rational exact(RationalMatrix pn, Map<Integer, Rational> start, List<Integer> to) {
        Rational total = Rational.ZERO;
        for (Map.Entry<Integer, Rational> e : start.entrySet()) {
            for (int j : to) {
                total = total.add(e.getValue().multiply(pn.get(e.getKey(), j)));
            }
        }
        return total;
    }

    /**
     * The closed form, the long-run limit and the recurrence of the combination, each at n = 0 .. 20, against
     * s·P^n·1_To from exact products.
     */
    private static void assertCombinationMatches(ClosedForm cf, Model m, Map<String, Rational> at,
                                                 Map<Integer, Rational> start, List<Integer> to) {
        Combination c = Combination.of(start, to);
        List<RationalMatrix> exact = Chains.powers(Chains.matrix(m, at), 20);
        List<Rational> want = new ArrayList<>();
        for (int n = 0; n <= 20; n++) {
            want.add(exact(exact.get(n), start, to));
            assertEquals(want.get(n), cf.evaluate(n, c, at), () -> "closed form of " + c + " at " + at);
        }
        // the generating function's series, term by term: u_n = num_n - sum_(k>=1) den_k u_(n-k)
        List<GenPolynomial<Quotient<BigRational>>> parts = cf.series().gfParts(c);
        ParamField f = cf.field();
        List<Rational> series = new ArrayList<>();
        for (int n = 0; n <= 20; n++) {
            Rational u = coefficient(f, parts.get(0), n, at);
            for (int k = 1; k <= n; k++) {
                u = u.subtract(coefficient(f, parts.get(1), k, at).multiply(series.get(n - k)));
            }
            series.add(u);
        }
        assertEquals(want, series, () -> "generating function of " + c);
        // the limit: a converging chain's long-run value is approached by s·P^n·1_To (checked at n = 2^12)
        List<Rational> lim = cf.longRunAt(c, at);
        if (lim.size() == 1 && cf.longRun().converges() && cf.longRun().conditions().isEmpty()) {
            Rational far = exact(org.qchain.exact.MatrixPowers.power(Chains.matrix(m, at), 4096), start, to);
            assertTrue(far.subtract(lim.get(0)).abs().compareTo(Rational.of(1, 1000)) < 0,
                () -> "limit " + lim + " of " + c + " against " + far);
        }
    }

    private static Rational coefficient(ParamField f, GenPolynomial<Quotient<BigRational>> p, int k,
                                        Map<String, Rational> at) {
        Quotient<BigRational> q = p.coefficient(edu.jas.poly.ExpVector.create(1, 0, k));
        BigRational v = f.evaluate(q.num, at).divide(f.evaluate(q.den, at));
        return ParamField.rational(v);
    }

    @Test
    void randomNumericChainsAgreeWithExactPowers() {
        Random rnd = new Random(20261203L);
        for (int t = 0; t < 12; t++) {
            int s = 2 + rnd.nextInt(3);
            Model m = randomChain(rnd, s, NUMERIC, List.of());
            ClosedForm cf = ClosedForms.of(m);
            for (int k = 0; k < 3; k++) {
                assertCombinationMatches(cf, m, Map.of(), randomStart(rnd, s), randomSet(rnd, s));
            }
        }
    }

    @Test
    void randomSymbolicChainsAgreeWithExactPowersAtRandomPoints() {
        Random rnd = new Random(31415L);
        for (int t = 0; t < 6; t++) {
            int s = 2 + rnd.nextInt(2);
            Model m = randomChain(rnd, s, SYMBOLIC, List.of("a", "b"));
            ClosedForm cf = ClosedForms.of(m);
            for (int k = 0; k < 3; k++) {
                Map<String, Rational> at = Map.of("a", Rational.of(1 + rnd.nextInt(5), 13),
                    "b", Rational.of(1 + rnd.nextInt(5), 17));
                assertCombinationMatches(cf, m, at, randomStart(rnd, s), randomSet(rnd, s));
            }
        }
    }

    @Test
    void aQuadraticAndAJordanChainAgreeToo() {
        // irreducible quadratic over Q(p, r) (square roots), and a parameter-free chain with a Jordan block
        Model q = Chains.model(List.of("p", "r"), new String[][] {
            {"1 - p", "p", "0"}, {"r", "1 - p - r", "p"}, {"1/2", "0", "1/2"}});
        ClosedForm cq = ClosedForms.of(q);
        Map<String, Rational> at = Map.of("p", Rational.of(1, 20), "r", Rational.of(1, 4));
        assertCombinationMatches(cq, q, at, Map.of(0, Rational.of(1, 2), 1, Rational.of(1, 2)), List.of(1, 2));
        Model j = Chains.model(List.of(), new String[][] {
            {"1/2", "1/2", "0"}, {"0", "1/2", "1/2"}, {"0", "0", "1"}});
        ClosedForm cj = ClosedForms.of(j);
        assertCombinationMatches(cj, j, Map.of(), Map.of(0, Rational.of(1, 3), 1, Rational.of(2, 3)), List.of(0, 1));
    }

    @Test
    void theWholeStateSpaceHasProbabilityOne() {
        // two-state chain: P^n(i, {0, 1}) = 1 for every n (rows of a stochastic matrix sum to 1; common practice,
        // no source); the terms of eigenvalue 1 - a - b cancel, and with them the condition a + b != 0
        Model m = Chains.model(List.of("a", "b"), new String[][] {{"1 - a", "a"}, {"b", "1 - b"}});
        ClosedForm cf = ClosedForms.of(m);
        Combination all = Combination.of(Map.of(0, Rational.ONE), List.of(0, 1));
        assertEquals("1", cf.plain(all, false, false));
        assertEquals("1", cf.latex(all, false, false));
        assertEquals(List.of(), cf.conditions(all));
        assertEquals(0, cf.validFrom(all));
        assertEquals(List.of("a + b != 0"), cf.conditions(Combination.entry(0, 0)));
        assertEquals("1", cf.limits(all, false).get(0).get(0));
        assertEquals("1/(1 - z)", cf.series().generatingFunction(all).plain());
        assertEquals("u(n) = u(n - 1) for n >= 1; u(0) = 1", cf.series().recurrence(all).plain());
        // the formula holds where a + b = 0 too (a = b = 0: the identity chain)
        assertEquals(Rational.ONE, cf.evaluate(7, all, Map.of("a", Rational.ZERO, "b", Rational.ZERO)));
    }

    @Test
    void startingFromTheStationaryLawGivesAConstant() {
        // two-state chain with a = 1/3, b = 1/4: stationary law (b, a)/(a + b) = (3/7, 4/7) (Grinstead and Snell,
        // Introduction to Probability, ch. 11, from memory); started there, the chain stays in it
        Model m = Chains.model(List.of(), new String[][] {{"2/3", "1/3"}, {"1/4", "3/4"}});
        ClosedForm cf = ClosedForms.of(m);
        Map<Integer, Rational> pi = Map.of(0, Rational.of(3, 7), 1, Rational.of(4, 7));
        assertEquals("3/7", cf.plain(Combination.of(pi, List.of(0)), false, false));
        assertEquals("4/7", cf.plain(Combination.of(pi, List.of(1)), false, false));
        assertEquals("u(n) = u(n - 1) for n >= 1; u(0) = 3/7",
            cf.series().recurrence(Combination.of(pi, List.of(0))).plain());
        // a symmetric chain with a free parameter: the uniform law is stationary for every a (doubly stochastic)
        Model sym = Chains.model(List.of("a"), new String[][] {{"1 - a", "a"}, {"a", "1 - a"}});
        ClosedForm cs = ClosedForms.of(sym);
        Combination half = Combination.of(Map.of(0, Rational.of(1, 2), 1, Rational.of(1, 2)), List.of(1));
        assertEquals("1/2", cs.plain(half, false, false));
        assertEquals(List.of(), cs.conditions(half));
        // a start off the stationary law keeps the eigenvalue 1 - 2a term, with the combined coefficient
        Combination off = Combination.of(Map.of(0, Rational.of(3, 4), 1, Rational.of(1, 4)), List.of(0));
        assertEquals("1/2 + 1/4*(1 - 2*a)^n", cs.plain(off, false, false));
    }

    @Test
    void anEntryIsTheCombinationOfOneRowAndOneColumn() {
        Model m = Chains.model(List.of("a", "b"), new String[][] {{"1 - a", "a"}, {"b", "1 - b"}});
        ClosedForm cf = ClosedForms.of(m);
        Combination e = Combination.of(Map.of(1, Rational.ONE), List.of(0));
        assertTrue(e.isEntry());
        assertEquals(cf.formula(1, 0), cf.plain(e, false, false));
        assertEquals(cf.conditions(), cf.conditions(Combination.entry(1, 0)));
        assertThrows(IndexOutOfBoundsException.class, () -> cf.plain(Combination.entry(0, 2), false, false));
        assertThrows(IllegalArgumentException.class, () -> Combination.of(Map.of(0, Rational.ONE), List.of(1, 1)));
        assertThrows(IllegalArgumentException.class, () -> Combination.of(Map.of(0, Rational.ZERO), List.of(1)));
    }
}
