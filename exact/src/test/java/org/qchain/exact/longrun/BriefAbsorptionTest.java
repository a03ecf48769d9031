package org.qchain.exact.longrun;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.qchain.exact.QuickTries;
import org.qchain.exact.Rational;

/** Absorption without the fundamental matrix gives the same figures as with it. */
class BriefAbsorptionTest {
    static final Arithmetic<Rational> Q = Arithmetic.RATIONAL;

    /** A random chain on n states whose last state is absorbing and reachable from every state. */
    static List<List<Rational>> chain(Random rnd, int n) {
        List<List<Rational>> p = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            long[] w = new long[n];
            long total = 0;
            for (int j = 0; j < n; j++) {
                w[j] = i == n - 1 ? (j == i ? 1 : 0) : (j == i + 1 || rnd.nextInt(3) == 0 ? 1 + rnd.nextInt(20) : 0);
                total += w[j];
            }
            List<Rational> row = new ArrayList<>();
            for (long x : w) {
                row.add(Rational.of(x, total));
            }
            p.add(row);
        }
        return p;
    }

    /** The generator with the same graph: rates w_ij, diagonal minus the row's total. */
    static List<List<Rational>> generator(List<List<Rational>> p) {
        List<List<Rational>> q = new ArrayList<>();
        for (int i = 0; i < p.size(); i++) {
            List<Rational> row = new ArrayList<>();
            Rational total = Rational.ZERO;
            for (int j = 0; j < p.size(); j++) {
                Rational v = i == j ? Rational.ZERO : p.get(i).get(j).multiply(Rational.of(3 + i));
                row.add(v);
                total = total.add(v);
            }
            row.set(i, total.negate());
            q.add(row);
        }
        return q;
    }

    // common practice, no source: (I - Q) y = t gives y = N t, so the variance from y equals the one from N; the
    // accumulated reward N r equals the solve of (I - Q) y = r
    @Test
    void sameFiguresWithoutN() {
        Random rnd = new Random(31);
        for (int trial = 0; trial < 20; trial++) {
            int n = 2 + rnd.nextInt(14);
            List<List<Rational>> p = chain(rnd, n);
            List<String> names = new ArrayList<>();
            List<Rational> reward = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                names.add("S" + i);
                reward.add(Rational.of(rnd.nextInt(50), 1 + rnd.nextInt(3)));
            }
            for (boolean continuous : new boolean[] {false, true}) {
                List<List<Rational>> m = continuous ? generator(p) : p;
                ChainEngine.Absorption<Rational> full = continuous
                    ? ChainEngine.absorbContinuous(Q, m, names, Set.of()) : ChainEngine.absorb(Q, m, names, Set.of());
                ChainEngine.Absorption<Rational> brief = ChainEngine.absorbBrief(Q, m, names, Set.of(), continuous);
                assertTrue(brief.fundamental().isEmpty());
                assertEquals(full.transientStates(), brief.transientStates());
                assertEquals(full.expectedSteps(), brief.expectedSteps());
                assertEquals(full.variance(), brief.variance());
                assertEquals(full.probabilities(), brief.probabilities());
                assertEquals(ChainEngine.accumulatedReward(Q, full, reward),
                    ChainEngine.accumulatedReward(Q, m, brief, reward, names, continuous));
            }
        }
    }

    // common practice, no source: as above, on chains large enough for p-adic lifting (the variance then comes from
    // the two solves over common denominators), and the arithmetic's default (solves and sums of reduced fractions)
    // gives the same variance as the rational override
    @Test
    void sameVarianceOnLargerChainsAndFromTheDefaultMethod() {
        Random rnd = new Random(47);
        Arithmetic<Rational> plain = new Arithmetic<>() {
            public Rational zero() { return Q.zero(); }
            public Rational one() { return Q.one(); }
            public Rational of(Rational r) { return r; }
            public Rational add(Rational a, Rational b) { return a.add(b); }
            public Rational subtract(Rational a, Rational b) { return a.subtract(b); }
            public Rational multiply(Rational a, Rational b) { return a.multiply(b); }
            public Rational divide(Rational a, Rational b) { return a.divide(b); }
            public boolean isZero(Rational a) { return a.isZero(); }
            public List<List<Rational>> solve(List<List<Rational>> a, List<List<Rational>> b) { return Q.solve(a, b); }
            public List<Rational> leftNullVector(List<List<Rational>> a) { return Q.leftNullVector(a); }
        };
        // two chains in the default build, four with -Dqchain.tries=full (bench/long-check.sh)
        int trials = QuickTries.Hook.full() ? 4 : 2;
        for (int trial = 0; trial < trials; trial++) {
            int n = 20 + rnd.nextInt(30);
            List<List<Rational>> p = chain(rnd, n);
            List<String> names = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                names.add("S" + i);
            }
            for (boolean continuous : new boolean[] {false, true}) {
                List<List<Rational>> m = continuous ? generator(p) : p;
                ChainEngine.Absorption<Rational> full = continuous
                    ? ChainEngine.absorbContinuous(Q, m, names, Set.of()) : ChainEngine.absorb(Q, m, names, Set.of());
                ChainEngine.Absorption<Rational> brief = ChainEngine.absorbBrief(Q, m, names, Set.of(), continuous);
                ChainEngine.Absorption<Rational> byDefault = ChainEngine.absorbBrief(plain, m, names, Set.of(),
                    continuous);
                assertEquals(full.expectedSteps(), brief.expectedSteps());
                assertEquals(full.variance(), brief.variance());
                assertEquals(full.probabilities(), brief.probabilities());
                assertEquals(full.variance(), byDefault.variance());
                assertEquals(full.expectedSteps(), byDefault.expectedSteps());
            }
        }
    }
}
