package org.qchain.symbolic.closed;

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
    @Test
    void symbolicChainsAgreeWithPowers() {
        Random rnd = new Random(20261201L);
        for (int t = 0; t < 10; t++) {
            int s = 2 + rnd.nextInt(2);
            Model m = Chains.random(rnd, s, Chains.SYMBOLIC, List.of("a", "b"));
            Map<String, Rational> at = Map.of("a", Rational.of(1 + rnd.nextInt(5), 13), "b", Rational.of(1 + rnd.nextInt(5), 17));
            Chains.assertMatchesPowers(ClosedForms.of(m), m, List.of(at), 0);
        }
    }

    @Test
    void numericChainsAgreeWithPowers() {
        Random rnd = new Random(42L);
        for (int t = 0; t < 10; t++) {
            int s = 3 + rnd.nextInt(3);
            Model m = Chains.random(rnd, s, Chains.NUMERIC, List.of());
            Chains.assertMatchesPowers(ClosedForms.of(m), m, List.of(Map.of()), 0);
        }
    }
}
