package org.qchain.exact.longrun;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.Set;
import java.util.stream.IntStream;
import org.hipparchus.fraction.BigFraction;
import org.hipparchus.fraction.BigFractionField;
import org.hipparchus.linear.Array2DRowFieldMatrix;
import org.hipparchus.linear.ArrayFieldVector;
import org.hipparchus.linear.FieldLUDecomposition;
import org.hipparchus.linear.FieldMatrix;
import org.hipparchus.linear.FieldVector;
import org.junit.jupiter.api.Test;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;

/** Long run and absorption of continuous-time chains from their generators. */
class ContinuousChainEngineTest {
    static final Arithmetic<Rational> Q = Arithmetic.RATIONAL;

    static Rational r(long p, long q) {
        return Rational.of(p, q);
    }

    static List<String> names(int n) {
        return IntStream.range(0, n).mapToObj(i -> "S" + i).toList();
    }

    /** A generator from its off-diagonal rates; the diagonal is minus the row's total. */
    static List<List<Rational>> generator(Rational[][] rates) {
        int n = rates.length;
        List<List<Rational>> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            List<Rational> row = new ArrayList<>();
            Rational total = Rational.ZERO;
            for (int j = 0; j < n; j++) {
                Rational v = i == j || rates[i][j] == null ? Rational.ZERO : rates[i][j];
                row.add(v);
                total = total.add(v);
            }
            row.set(i, total.negate());
            out.add(row);
        }
        return out;
    }

    /** Birth-death generator on 0..k with birth rates b(i) and death rates d(i). */
    static List<List<Rational>> birthDeath(int k, java.util.function.IntFunction<Rational> birth,
            java.util.function.IntFunction<Rational> death) {
        Rational[][] e = new Rational[k + 1][k + 1];
        for (int i = 0; i <= k; i++) {
            if (i < k) {
                e[i][i + 1] = birth.apply(i);
            }
            if (i > 0) {
                e[i][i - 1] = death.apply(i);
            }
        }
        return generator(e);
    }

    // M/M/1/K queue with arrival rate a and service rate s: the stationary law is proportional to rho^k, k = 0..K,
    // rho = a/s (L. Kleinrock, Queueing Systems, vol. 1, ch. 3, the finite-storage M/M/1 queue; standard result)
    @Test
    void finiteSingleServerQueue() {
        Rational a = r(2, 3);
        Rational s = r(5, 4);
        int k = 5;
        ChainEngine.LongRun<Rational> lr = ChainEngine.longRunContinuous(Q, birthDeath(k, i -> a, i -> s), names(k + 1),
            false);
        assertEquals(1, lr.classes().size());
        Rational rho = a.divide(s);
        Rational norm = Rational.ZERO;
        for (int i = 0; i <= k; i++) {
            norm = norm.add(rho.pow(i));
        }
        for (int i = 0; i <= k; i++) {
            assertEquals(rho.pow(i).divide(norm), lr.classes().get(0).stationary().get(i), "state " + i);
        }
        assertEquals(1, lr.classes().get(0).period());
    }

    // M/M/c/c loss system with offered load A = a/s: the blocking probability (all c servers busy) is Erlang's B
    // formula (A^c/c!) / sum_{k=0..c} A^k/k! (A. K. Erlang 1917; L. Kleinrock, Queueing Systems, vol. 1, ch. 3)
    @Test
    void erlangLoss() {
        Rational a = r(7, 2);
        Rational s = r(1, 1);
        int c = 4;
        ChainEngine.LongRun<Rational> lr = ChainEngine.longRunContinuous(Q,
            birthDeath(c, i -> a, i -> s.multiply(Rational.of(i))), names(c + 1), false);
        Rational load = a.divide(s);
        Rational sum = Rational.ZERO;
        Rational term = Rational.ONE;
        for (int k = 0; k <= c; k++) {
            if (k > 0) {
                term = term.multiply(load).divide(Rational.of(k));
            }
            sum = sum.add(term);
        }
        assertEquals(term.divide(sum), lr.classes().get(0).stationary().get(c));
    }

    // Two identical units in active parallel, failure rate l each, one repair crew with rate m: the mean time to
    // system failure from both up is (3l + m)/(2 l^2) (M. Rausand and A. Hoyland, System Reliability Theory, ch. 8,
    // Markov models; from memory), and with no repair (m = 0) the time is the sum of exponentials of rates 2l and l:
    // mean 3/(2l), variance 1/(2l)^2 + 1/l^2 (sum of independent exponentials; common practice, no source)
    @Test
    void parallelPairMeanTimeToFailure() {
        Rational l = r(1, 500);
        for (Rational m : List.of(r(1, 12), Rational.ZERO)) {
            Rational[][] e = new Rational[3][3];
            e[0][1] = l.multiply(Rational.of(2));
            e[1][2] = l;
            e[1][0] = m.isZero() ? null : m;
            ChainEngine.Absorption<Rational> a = ChainEngine.absorbContinuous(Q, generator(e), names(3), Set.of());
            assertEquals(List.of(0, 1), a.transientStates());
            assertEquals(List.of(2), a.absorbingStates());
            assertEquals(Rational.of(3).multiply(l).add(m).divide(Rational.of(2).multiply(l).multiply(l)),
                a.expectedSteps().get(0));
            assertEquals(Rational.ONE, a.probabilities().get(0).get(0));
            if (m.isZero()) {
                Rational two = Rational.of(2).multiply(l);
                assertEquals(Rational.ONE.divide(two.multiply(two)).add(Rational.ONE.divide(l.multiply(l))),
                    a.variance().get(0));
            }
        }
    }

    // One exponential stay of rate l before absorption: mean 1/l, variance 1/l^2 (the exponential distribution;
    // common practice, no source)
    @Test
    void exponentialStay() {
        Rational l = r(3, 7);
        Rational[][] e = new Rational[2][2];
        e[0][1] = l;
        ChainEngine.Absorption<Rational> a = ChainEngine.absorbContinuous(Q, generator(e), names(2), Set.of());
        assertEquals(List.of(l.reciprocal()), a.expectedSteps());
        assertEquals(List.of(l.multiply(l).reciprocal()), a.variance());
        assertEquals(List.of(List.of(l.reciprocal())), a.fundamental());
    }

    /** A random irreducible generator: a cycle of positive rates plus random extra rates. */
    static List<List<Rational>> randomGenerator(Random rnd, int n) {
        Rational[][] e = new Rational[n][n];
        for (int i = 0; i < n; i++) {
            e[i][(i + 1) % n] = r(1 + rnd.nextInt(9), 1 + rnd.nextInt(5));
            for (int j = 0; j < n; j++) {
                if (j != i && rnd.nextInt(3) == 0) {
                    e[i][j] = r(1 + rnd.nextInt(9), 1 + rnd.nextInt(5));
                }
            }
        }
        return generator(e);
    }

    static FieldMatrix<BigFraction> hip(List<List<Rational>> a) {
        FieldMatrix<BigFraction> m = new Array2DRowFieldMatrix<>(BigFractionField.getInstance(), a.size(),
            a.get(0).size());
        for (int i = 0; i < a.size(); i++) {
            for (int j = 0; j < a.get(0).size(); j++) {
                Rational x = a.get(i).get(j);
                m.setEntry(i, j, new BigFraction(x.numerator(), x.denominator()));
            }
        }
        return m;
    }

    static Rational rat(BigFraction f) {
        return Rational.of(f.getNumerator(), f.getDenominator());
    }

    // Invariants on random irreducible generators (fixed seed), with Hipparchus FieldLUDecomposition over BigFraction
    // as the reference solver (a reference library): pi Q = 0 exactly and sums to 1; the mean first-passage time to j
    // solves sum_k Q_ik m_kj = -1 for i != j (J. R. Norris, Markov Chains, ch. 3.3, expected hitting times); the mean
    // return time is 1/(pi_i q_i) (Norris, ch. 3.5); every row of the limit is pi.
    @Test
    void randomGeneratorsAgainstReferenceSolves() {
        Random rnd = new Random(20261203L);
        for (int trial = 0; trial < 12; trial++) {
            int n = 2 + rnd.nextInt(5);
            List<List<Rational>> q = randomGenerator(rnd, n);
            ChainEngine.LongRun<Rational> lr = ChainEngine.longRunContinuous(Q, q, names(n), true);
            List<Rational> pi = lr.classes().get(0).stationary();
            assertEquals(Rational.ONE, pi.stream().reduce(Rational.ZERO, Rational::add));
            for (int j = 0; j < n; j++) {
                Rational s = Rational.ZERO;
                for (int i = 0; i < n; i++) {
                    s = s.add(pi.get(i).multiply(q.get(i).get(j)));
                }
                assertTrue(s.isZero(), "pi Q = 0, column " + j);
            }
            for (List<Rational> row : lr.limit()) {
                assertEquals(pi, row);
            }
            List<List<Rational>> m = lr.passage().orElseThrow();
            for (int j = 0; j < n; j++) {
                // -Q restricted to the states other than j, right-hand side 1
                int jj = j;
                List<Integer> others = IntStream.range(0, n).filter(i -> i != jj).boxed().toList();
                List<List<Rational>> a = new ArrayList<>();
                for (int x : others) {
                    List<Rational> row = new ArrayList<>();
                    for (int y : others) {
                        row.add(q.get(x).get(y).negate());
                    }
                    a.add(row);
                }
                BigFraction[] ones = new BigFraction[others.size()];
                java.util.Arrays.fill(ones, BigFraction.ONE);
                FieldVector<BigFraction> sol = new FieldLUDecomposition<>(hip(a)).getSolver()
                    .solve(new ArrayFieldVector<>(ones));
                for (int k = 0; k < others.size(); k++) {
                    assertEquals(rat(sol.getEntry(k)), m.get(others.get(k)).get(j), "m(" + others.get(k) + ", " + j + ")");
                }
                Rational ret = pi.get(j).multiply(q.get(j).get(j).negate()).reciprocal();
                assertEquals(ret, m.get(j).get(j));
                assertEquals(ret, lr.classes().get(0).meanRecurrence().get(j));
            }
            // absorption with state 0 made absorbing: N = (-Q_TT)^-1 by Hipparchus, t = N 1, B sums to 1
            ChainEngine.Absorption<Rational> ab = ChainEngine.absorbContinuous(Q, q, names(n), Set.of(0));
            List<List<Rational>> qt = new ArrayList<>();
            for (int x = 1; x < n; x++) {
                List<Rational> row = new ArrayList<>();
                for (int y = 1; y < n; y++) {
                    row.add(q.get(x).get(y).negate());
                }
                qt.add(row);
            }
            FieldMatrix<BigFraction> inv = new FieldLUDecomposition<>(hip(qt)).getSolver().getInverse();
            for (int x = 0; x < n - 1; x++) {
                Rational t = Rational.ZERO;
                for (int y = 0; y < n - 1; y++) {
                    assertEquals(rat(inv.getEntry(x, y)), ab.fundamental().get(x).get(y));
                    t = t.add(rat(inv.getEntry(x, y)));
                }
                assertEquals(t, ab.expectedSteps().get(x));
                assertEquals(m.get(x + 1).get(0), t, "time to absorption in 0 = passage time to 0");
                assertEquals(Rational.ONE, ab.probabilities().get(x).get(0));
            }
        }
    }

    // A reducible chain: a transient state T leaves at rate 1 to A and at rate 3 to the closed class {B, C}; the
    // probability of ending in each class is the share of the rates (the jump chain's first step; common practice,
    // no source); an absorbing state has no mean return time; every period is 1
    @Test
    void reducibleChain() {
        Rational[][] e = new Rational[4][4];
        e[0][1] = r(1, 1);
        e[0][2] = r(3, 1);
        e[2][3] = r(2, 1);
        e[3][2] = r(5, 1);
        ChainEngine.LongRun<Rational> lr = ChainEngine.longRunContinuous(Q, generator(e), names(4), false);
        assertEquals(List.of(List.of(r(1, 4), r(3, 4))), lr.absorption());
        ChainEngine.ClassLaw<Rational> a = lr.classes().stream().filter(c -> c.states().equals(List.of(1)))
            .findFirst().orElseThrow();
        assertEquals(List.of(Rational.ONE), a.stationary());
        assertEquals(List.of(), a.meanRecurrence());
        ChainEngine.ClassLaw<Rational> bc = lr.classes().stream().filter(c -> c.states().equals(List.of(2, 3)))
            .findFirst().orElseThrow();
        assertEquals(List.of(r(5, 7), r(2, 7)), bc.stationary());
        assertTrue(lr.classes().stream().allMatch(c -> c.period() == 1));
        assertEquals(List.of(Rational.ZERO, r(1, 4), r(3, 4).multiply(r(5, 7)), r(3, 4).multiply(r(2, 7))),
            lr.limit().get(0));
        assertThrows(QchainException.class, () -> ChainEngine.longRunContinuous(Q, generator(e), names(4), true));
    }
}
