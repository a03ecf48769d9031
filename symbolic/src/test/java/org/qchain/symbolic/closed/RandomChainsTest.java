package org.qchain.symbolic.closed;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.qchain.exact.Rational;
import org.qchain.exact.model.Model;

/**
 * Random chains with a fixed seed: the closed form evaluated at n = 0 .. 2s equals P^n, with the parameters free
 * (against the symbolic module's P^n) and substituted (against exact repeated products). Common practice, no
 * source: P^n is defined by repeated multiplication.
 */
class RandomChainsTest {
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

    @Test
    void symbolicChainsAgreeWithPowers() {
        Random rnd = new Random(20261201L);
        for (int t = 0; t < 10; t++) {
            int s = 2 + rnd.nextInt(2);
            Model m = randomChain(rnd, s, SYMBOLIC, List.of("a", "b"));
            Map<String, Rational> at = Map.of("a", Rational.of(1 + rnd.nextInt(5), 13), "b", Rational.of(1 + rnd.nextInt(5), 17));
            Chains.assertMatchesPowers(ClosedForms.of(m), m, List.of(at), 0);
        }
    }

    @Test
    void numericChainsAgreeWithPowers() {
        Random rnd = new Random(42L);
        for (int t = 0; t < 10; t++) {
            int s = 3 + rnd.nextInt(3);
            Model m = randomChain(rnd, s, NUMERIC, List.of());
            Chains.assertMatchesPowers(ClosedForms.of(m), m, List.of(Map.of()), 0);
        }
    }
}
