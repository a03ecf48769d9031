package org.qchain.exact.longrun;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.Set;
import java.util.stream.IntStream;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;
import org.hipparchus.fraction.BigFraction;
import org.hipparchus.fraction.BigFractionField;
import org.hipparchus.linear.Array2DRowFieldMatrix;
import org.hipparchus.linear.FieldLUDecomposition;
import org.hipparchus.linear.FieldMatrix;
import org.junit.jupiter.api.Test;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.linear.SingularSystemException;

class ChainEngineTest {
    static final Arithmetic<Rational> Q = Arithmetic.RATIONAL;

    static Rational r(long p, long q) {
        return Rational.of(p, q);
    }

    static List<List<Rational>> m(Rational[][] e) {
        List<List<Rational>> out = new ArrayList<>();
        for (Rational[] row : e) {
            out.add(List.of(row));
        }
        return out;
    }

    static List<String> names(int n) {
        return IntStream.range(0, n).mapToObj(i -> "S" + i).toList();
    }

    /** A walk on 0..n with probability p up, 1 − p down, 0 and n absorbing. */
    static List<List<Rational>> walk(int n, Rational p) {
        Rational[][] e = new Rational[n + 1][n + 1];
        for (Rational[] row : e) {
            java.util.Arrays.fill(row, Rational.ZERO);
        }
        e[0][0] = Rational.ONE;
        e[n][n] = Rational.ONE;
        for (int i = 1; i < n; i++) {
            e[i][i + 1] = p;
            e[i][i - 1] = Rational.ONE.subtract(p);
        }
        return m(e);
    }

    // Grinstead and Snell, Introduction to Probability, ch. 11 (absorbing chains: the drunkard's walk on 0..4 with
    // p = 1/2): N = [[3/2,1,1/2],[1,2,1],[1/2,1,3/2]], t = (3,4,3), B = [[3/4,1/4],[1/2,1/2],[1/4,3/4]] (from memory)
    @Test
    void drunkardsWalk() {
        ChainEngine.Absorption<Rational> a = ChainEngine.absorb(Q, walk(4, r(1, 2)), names(5), Set.of());
        assertEquals(List.of(1, 2, 3), a.transientStates());
        assertEquals(List.of(0, 4), a.absorbingStates());
        assertEquals(m(new Rational[][] {{r(3, 2), r(1, 1), r(1, 2)}, {r(1, 1), r(2, 1), r(1, 1)},
            {r(1, 2), r(1, 1), r(3, 2)}}), a.fundamental());
        assertEquals(List.of(r(3, 1), r(4, 1), r(3, 1)), a.expectedSteps());
        assertEquals(m(new Rational[][] {{r(3, 4), r(1, 4)}, {r(1, 2), r(1, 2)}, {r(1, 4), r(3, 4)}}), a.probabilities());
        // variance from 2 (common practice, no source): from 2 the walk is absorbed after 2K steps, K geometric with
        // success 1/2, so Var T = 4 Var K = 4 (1/2)/(1/4) = 8; from 1 the walk stops at once or enters 2, which also
        // gives 8 (1 + T' with prob. 1/2 ... E T = 3, E T^2 = 1/2 + 1/2 E(1 + T_2)^2 = 17, Var = 8)
        assertEquals(List.of(r(8, 1), r(8, 1), r(8, 1)), a.variance());
        // first passage to {0, 4} from 2: P(T=1) = 0, P(T=2) = 1/2, P(T=3) = 0, P(T=4) = 1/4 (common practice, no source)
        List<List<Rational>> fp = ChainEngine.firstPassage(Q, walk(4, r(1, 2)), Set.of(0, 4), 4);
        assertEquals(List.of(Rational.ZERO, r(1, 2), Rational.ZERO, r(1, 4)), fp.get(2));
    }

    // Grinstead and Snell, ch. 11 (the three-state weather chain, states rain, nice, snow): stationary (2/5, 1/5, 2/5)
    // and mean first-passage times [[5/2, 4, 10/3], [8/3, 5, 8/3], [10/3, 4, 5/2]] (from memory)
    @Test
    void weatherChain() {
        List<List<Rational>> p = m(new Rational[][] {{r(1, 2), r(1, 4), r(1, 4)}, {r(1, 2), r(0, 1), r(1, 2)},
            {r(1, 4), r(1, 4), r(1, 2)}});
        ChainEngine.LongRun<Rational> lr = ChainEngine.longRun(Q, p, names(3), true);
        assertEquals(List.of(r(2, 5), r(1, 5), r(2, 5)), lr.classes().get(0).stationary());
        assertEquals(List.of(r(5, 2), r(5, 1), r(5, 2)), lr.classes().get(0).meanRecurrence());
        assertEquals(m(new Rational[][] {{r(5, 2), r(4, 1), r(10, 3)}, {r(8, 3), r(5, 1), r(8, 3)},
            {r(10, 3), r(4, 1), r(5, 2)}}), lr.passage().orElseThrow());
        assertFalse(lr.cesaro());
    }

    // Ehrenfest urn with m balls (P. and T. Ehrenfest 1907; standard result): stationary law Binomial(m, 1/2),
    // period 2, so the limit is a Cesàro limit
    @Property(seed = "1907", tries = 8)
    void ehrenfestIsBinomial(@ForAll @IntRange(min = 1, max = 30) int balls) {
        Rational[][] e = new Rational[balls + 1][balls + 1];
        for (int k = 0; k <= balls; k++) {
            java.util.Arrays.fill(e[k], Rational.ZERO);
            if (k > 0) {
                e[k][k - 1] = r(k, balls);
            }
            if (k < balls) {
                e[k][k + 1] = r(balls - k, balls);
            }
        }
        ChainEngine.LongRun<Rational> lr = ChainEngine.longRun(Q, m(e), names(balls + 1), false);
        assertEquals(2, lr.classes().get(0).period());
        assertTrue(lr.cesaro());
        BigInteger two = BigInteger.TWO.pow(balls);
        BigInteger c = BigInteger.ONE;
        for (int k = 0; k <= balls; k++) {
            assertEquals(Rational.of(c, two), lr.classes().get(0).stationary().get(k));
            c = c.multiply(BigInteger.valueOf(balls - k)).divide(BigInteger.valueOf(k + 1));
        }
    }

    // random walk on a connected undirected graph (standard result): pi_i = deg(i) / (2|E|); Kemeny's constant
    // sum_j m_ij pi_j is the same for every i (J. G. Kemeny and J. L. Snell, Finite Markov Chains, ch. IV)
    @Property(seed = "2718", tries = 15)
    void graphWalkAndKemeny(@ForAll @LongRange(min = 0, max = 100000) long seed,
            @ForAll @IntRange(min = 2, max = 12) int n) {
        Random rnd = new Random(seed);
        boolean[][] adj = new boolean[n][n];
        for (int i = 1; i < n; i++) {
            int j = rnd.nextInt(i);
            adj[i][j] = adj[j][i] = true;
        }
        for (int k = 0; k < n; k++) {
            int i = rnd.nextInt(n);
            int j = rnd.nextInt(n);
            if (i != j) {
                adj[i][j] = adj[j][i] = true;
            }
        }
        int edges = 0;
        int[] deg = new int[n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                if (adj[i][j]) {
                    deg[i]++;
                    edges++;
                }
            }
        }
        edges /= 2;
        Rational[][] e = new Rational[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                e[i][j] = adj[i][j] ? r(1, deg[i]) : Rational.ZERO;
            }
        }
        ChainEngine.LongRun<Rational> lr = ChainEngine.longRun(Q, m(e), names(n), true);
        List<Rational> pi = lr.classes().get(0).stationary();
        for (int i = 0; i < n; i++) {
            assertEquals(r(deg[i], 2L * edges), pi.get(i));
        }
        List<List<Rational>> mm = lr.passage().orElseThrow();
        Rational k0 = ChainEngine.dot(Q, mm.get(0), pi);
        for (int i = 1; i < n; i++) {
            assertEquals(k0, ChainEngine.dot(Q, mm.get(i), pi), "Kemeny's constant from state " + i);
        }
    }

    // gambler's ruin (standard result; Grinstead and Snell, ch. 11 and 12): ruin probability
    // ((q/p)^i - (q/p)^N)/(1 - (q/p)^N) for p != 1/2, 1 - i/N and expected duration i(N - i) for p = 1/2
    @Property(seed = "1654", tries = 20)
    void gamblersRuin(@ForAll @IntRange(min = 2, max = 25) int target, @ForAll @IntRange(min = 1, max = 19) int pNum) {
        Rational p = r(pNum, 20);
        ChainEngine.Absorption<Rational> a = ChainEngine.absorb(Q, walk(target, p), names(target + 1), Set.of());
        Rational ratio = Rational.ONE.subtract(p).divide(p);
        for (int i = 1; i < target; i++) {
            Rational ruin = a.probabilities().get(i - 1).get(0);
            if (pNum == 10) {
                assertEquals(Rational.ONE.subtract(r(i, target)), ruin);
                assertEquals(Rational.of((long) i * (target - i)), a.expectedSteps().get(i - 1));
            } else {
                Rational rn = ratio.pow(target);
                assertEquals(ratio.pow(i).subtract(rn).divide(Rational.ONE.subtract(rn)), ruin);
            }
        }
    }

    // invariants (common practice, no source): pi P = pi; rows of B sum to 1; N (I - Q) = I, N checked against
    // Hipparchus 3.0 FieldLUDecomposition's inverse of I - Q (a reference library); limit rows sum to 1
    @Property(seed = "99", tries = 25)
    void invariantsOnRandomReducibleChains(@ForAll @LongRange(min = 0, max = 100000) long seed,
            @ForAll @IntRange(min = 2, max = 14) int n) {
        Random rnd = new Random(seed);
        Rational[][] e = new Rational[n][n];
        for (int i = 0; i < n; i++) {
            long[] w = new long[n];
            long s = 0;
            for (int j = 0; j < n; j++) {
                w[j] = rnd.nextDouble() < 0.3 ? 1 + rnd.nextInt(9) : 0;
                s += w[j];
            }
            if (s == 0 || i == n - 1) {
                w = new long[n];
                w[i] = 1;
                s = 1;
            }
            for (int j = 0; j < n; j++) {
                e[i][j] = r(w[j], s);
            }
        }
        List<List<Rational>> p = m(e);
        ChainEngine.LongRun<Rational> lr = ChainEngine.longRun(Q, p, names(n), false);
        for (ChainEngine.ClassLaw<Rational> c : lr.classes()) {
            if (!c.closed()) {
                continue;
            }
            for (int y = 0; y < c.states().size(); y++) {
                Rational s = Rational.ZERO;
                for (int x = 0; x < c.states().size(); x++) {
                    s = s.add(c.stationary().get(x).multiply(e[c.states().get(x)][c.states().get(y)]));
                }
                assertEquals(c.stationary().get(y), s);
            }
        }
        for (List<Rational> row : lr.limit()) {
            assertEquals(Rational.ONE, row.stream().reduce(Rational.ZERO, Rational::add));
        }
        ChainEngine.Absorption<Rational> a;
        try {
            a = ChainEngine.absorb(Q, p, names(n), Set.of());
        } catch (SingularSystemException ex) {
            return; // a closed class without an absorbing state: a named error, tested below
        }
        for (List<Rational> row : a.probabilities()) {
            assertEquals(Rational.ONE, row.stream().reduce(Rational.ZERO, Rational::add));
        }
        int k = a.transientStates().size();
        if (k == 0) {
            return;
        }
        BigFraction[][] iq = new BigFraction[k][k];
        for (int x = 0; x < k; x++) {
            for (int y = 0; y < k; y++) {
                Rational v = (x == y ? Rational.ONE : Rational.ZERO).subtract(e[a.transientStates().get(x)][a.transientStates().get(y)]);
                iq[x][y] = new BigFraction(v.numerator(), v.denominator());
            }
        }
        FieldMatrix<BigFraction> ref = new FieldLUDecomposition<>(
            new Array2DRowFieldMatrix<>(BigFractionField.getInstance(), iq, false)).getSolver().getInverse();
        for (int x = 0; x < k; x++) {
            for (int y = 0; y < k; y++) {
                BigFraction z = ref.getEntry(x, y);
                assertEquals(Rational.of(z.getNumerator(), z.getDenominator()), a.fundamental().get(x).get(y));
            }
        }
    }

    // common practice, no source: a transient state that can never be absorbed is a named error; passage times
    // of a reducible chain are refused; a finite chain always has a closed class, so longrun always has a law
    @Test
    void errorsNameTheStates() {
        List<List<Rational>> p = m(new Rational[][] {{r(1, 2), r(1, 2), r(0, 1)}, {r(1, 2), r(1, 2), r(0, 1)},
            {r(0, 1), r(0, 1), r(1, 1)}});
        SingularSystemException ex = assertThrows(SingularSystemException.class,
            () -> ChainEngine.absorb(Q, p, List.of("Up", "Worn", "Down"), Set.of()));
        assertTrue(ex.getMessage().contains("states Up, Worn can never reach an absorbing state"), ex.getMessage());
        QchainException e2 = assertThrows(QchainException.class, () -> ChainEngine.longRun(Q, p, names(3), true));
        assertEquals(ErrorKey.NOT_APPLICABLE, e2.key());
        assertFalse(ChainEngine.longRun(Q, p, names(3), false).structure().closedClasses().isEmpty());
        // made absorbing on request: time to first reach Worn from Up is geometric with mean 2
        ChainEngine.Absorption<Rational> a = ChainEngine.absorb(Q, p, List.of("Up", "Worn", "Down"), Set.of(1));
        assertEquals(List.of(r(2, 1)), a.expectedSteps());
    }

    // common practice, no source: a reward of 1 per step in a state that never leaves has present value 1/(1 - v);
    // accumulated reward with reward 1 everywhere equals the expected steps t
    @Test
    void rewards() {
        List<List<Rational>> p = walk(4, r(1, 2));
        List<Rational> one = List.of(Rational.ONE, Rational.ONE, Rational.ONE, Rational.ONE, Rational.ONE);
        List<Rational> disc = ChainEngine.discountedReward(Q, p, one, r(100, 105));
        assertEquals(r(105, 5), disc.get(0));
        ChainEngine.Absorption<Rational> a = ChainEngine.absorb(Q, p, names(5), Set.of());
        assertEquals(a.expectedSteps(), ChainEngine.accumulatedReward(Q, a, one));
        ChainEngine.LongRun<Rational> lr = ChainEngine.longRun(Q, p, names(5), false);
        List<Rational> r0 = List.of(Rational.ONE, Rational.ZERO, Rational.ZERO, Rational.ZERO, Rational.ZERO);
        assertEquals(List.of(r(1, 1), r(3, 4), r(1, 2), r(1, 4), r(0, 1)), ChainEngine.longRunAverageReward(Q, lr, r0));
    }
}
