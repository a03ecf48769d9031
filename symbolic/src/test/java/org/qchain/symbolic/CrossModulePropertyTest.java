package org.qchain.symbolic;

import static org.junit.jupiter.api.Assertions.assertEquals;

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
 * Symbolic powers evaluated at rational points equal the exact module's powers of the substituted chain
 * ({@code Chains.transitionMatrix} at the point, then {@code MatrixPowers.power}).
 * Source: common practice, no source (evaluation is a ring homomorphism Q(params) -> Q wherever the denominators
 * do not vanish, so it commutes with matrix products).
 */
class CrossModulePropertyTest {
    private static final long SEED = 20261201L;
    private static final String[] NAMES = {"p", "q", "r"};

    /** A random entry: a small polynomial or rational function of the parameters with values in (0, 1/s). */
    private static String randomEntry(Random rnd, List<String> params, int states) {
        String v = params.get(rnd.nextInt(params.size()));
        String w = params.get(rnd.nextInt(params.size()));
        int k = 1 + rnd.nextInt(3);
        int den = states * (2 + rnd.nextInt(3));
        switch (rnd.nextInt(5)) {
            case 0:
                return k + "/" + (den * 2);
            case 1:
                return v + "/" + den;
            case 2:
                return v + "*" + w + "/" + den;
            case 3:
                return v + "/(" + den + " + " + w + ")";
            default:
                return "(1 - " + v + ")^2/" + den;
        }
    }

    private static Model randomChain(Random rnd) {
        int s = 2 + rnd.nextInt(3);
        int k = 1 + rnd.nextInt(3);
        List<String> params = List.of(NAMES).subList(0, k);
        String[][] rows = new String[s][s];
        for (int i = 0; i < s; i++) {
            for (int j = 0; j < s; j++) {
                rows[i][j] = i == j ? "*" : (rnd.nextInt(3) == 0 ? "0" : randomEntry(rnd, params, s));
            }
        }
        return TestChains.discrete(params, rows);
    }

    private static Map<String, Rational> randomPoint(Random rnd, Model m) {
        Map<String, Rational> pt = new LinkedHashMap<>();
        for (var d : m.params()) {
            int q = 2 + rnd.nextInt(40);
            pt.put(d.name(), Rational.of(1 + rnd.nextInt(q - 1), q));
        }
        return pt;
    }

    @Test
    void symbolicPowerAtAPointEqualsExactPowerOfTheSubstitutedChain() {
        Random rnd = new Random(SEED);
        int checked = 0;
        for (int trial = 0; trial < 25; trial++) {
            Model m = randomChain(rnd);
            RatFunMatrix p = RatFunMatrix.fromModel(m);
            for (int n : new int[] {0, 1, 2, 3, 5, 7}) {
                RatFunMatrix pn = p.power(n);
                for (int t = 0; t < 2; t++) {
                    Map<String, Rational> pt = randomPoint(rnd, m);
                    RationalMatrix exact = TestChains.exactPower(TestChains.exactMatrix(m, pt), n);
                    assertEquals(exact, pn.evaluate(pt), "trial " + trial + " n=" + n + " at " + pt + " of " + p);
                    checked++;
                }
            }
        }
        assertEquals(25 * 6 * 2, checked);
    }

    @Test
    void powerRowEqualsTheRowOfTheFullPower() {
        // common practice, no source: e_i P^n computed by vector-matrix products is row i of P^n
        Random rnd = new Random(SEED + 1);
        for (int trial = 0; trial < 10; trial++) {
            Model m = randomChain(rnd);
            RatFunMatrix p = RatFunMatrix.fromModel(m);
            int n = 1 + rnd.nextInt(6);
            RatFunMatrix pn = p.power(n);
            for (int i = 0; i < p.size(); i++) {
                List<RatFun> row = p.powerRow(i, n, SymbolicLimits.DEFAULT, x -> { });
                List<RatFun> expected = new ArrayList<>();
                for (int j = 0; j < p.size(); j++) {
                    expected.add(pn.get(i, j));
                }
                assertEquals(expected, row);
            }
        }
    }

    @Test
    void rowsOfSymbolicPowersSumToOneIdentically() {
        // common practice, no source: a stochastic matrix's powers are stochastic (as a polynomial identity here)
        Random rnd = new Random(SEED + 2);
        for (int trial = 0; trial < 10; trial++) {
            RatFunMatrix p = RatFunMatrix.fromModel(randomChain(rnd));
            RatFunMatrix pn = p.power(1 + rnd.nextInt(6));
            for (int i = 0; i < p.size(); i++) {
                assertEquals(RatFun.of(p.ring().one()), pn.rowSum(i));
            }
        }
    }
}
