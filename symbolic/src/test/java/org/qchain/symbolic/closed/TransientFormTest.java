package org.qchain.symbolic.closed;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.model.Model;
import org.qchain.exact.model.ModelParser;
import org.qchain.symbolic.RatFunMatrix;

/** The closed form of P(t) = exp(Qt) of continuous chains. */
class TransientFormTest {

    private static final Model ONE_UNIT = ModelParser.parse("unit.chain", "chain continuous\nparam lam\nparam mu\n"
        + "states Up Down\nUp Down lam\nDown Up mu\n");

    private static final Model TWO_UNITS = ModelParser.parse("pair.chain", "chain continuous\nparam lam\nparam mu\n"
        + "states Both One None\nBoth One 2*lam\nOne None lam\nOne Both mu\nNone One mu\n");

    @Test
    void oneRepairableUnitHasTheStandardPointAvailability() {
        TransientForm tf = ClosedForms.ofGenerator(ONE_UNIT, Map.of());
        // Rausand and Hoyland, System Reliability Theory, ch. on Markov models (one repairable unit; from memory):
        // P_UpUp(t) = mu/(lam + mu) + lam/(lam + mu) exp(-(lam + mu) t)
        TimeFormula up = tf.entry(0, 0, false);
        assertEquals("mu/(lam + mu) + lam/(lam + mu)*exp(-(lam + mu)*t)", up.plain());
        assertEquals("mu/(lam + mu)", up.limitPlain());
        assertEquals("lam/(lam + mu) - lam/(lam + mu)*exp(-(lam + mu)*t)", tf.entry(0, 1, false).plain());
        assertEquals(List.of("lam + mu != 0"), tf.conditions());
        assertEquals("-lam - mu", tf.rate(false));
        // the same as a combination: the start row Up times the up vector (1, 0) is the point availability
        assertEquals(up.plain(), tf.combination(List.of(Rational.ONE, Rational.ZERO),
            List.of(Rational.ONE, Rational.ZERO), false).plain());
        assertEquals("mu/(lam + mu) + lam/(lam + mu)*exp(-2*lam - 2*mu)", tf.entryAt(0, 0, Rational.of(2), false).plain());
        // Laplace transform of P_UpUp: (s + mu)/(s (s + lam + mu)) (derived by hand from (sI - Q)^-1)
        assertEquals("(s + mu)/(s^2 + (lam + mu)*s)", tf.laplaceTransform(0, 0).plain());
    }

    @Test
    void twoUnitsInParallelHaveTheStandardLimitAndEigenvalues() {
        TransientForm tf = ClosedForms.ofGenerator(TWO_UNITS, Map.of());
        // two identical units in active parallel, one repair crew (standard reliability texts, e.g. Rausand and
        // Hoyland, ch. on Markov models; from memory): steady-state unavailability 2 lam^2/(mu^2 + 2 lam mu + 2 lam^2)
        assertEquals("2*lam^2/(2*lam^2 + 2*lam*mu + mu^2)", tf.entry(0, 2, false).limitPlain());
        assertEquals("2*lam^2/(2*lam^2 + 2*lam*mu + mu^2)", tf.entry(2, 2, false).limitPlain());
        // det(xI - Q) = x (x^2 + (3 lam + 2 mu) x + 2 lam^2 + 2 lam mu + mu^2) (derived by hand)
        assertEquals("x^3 + (3*lam + 2*mu)*x^2 + (2*lam^2 + 2*lam*mu + mu^2)*x", tf.characteristicPolynomial());
        assertEquals("quadratic", tf.eigenvalues().get(1).kind());
        assertEquals(List.of("-3/2*lam - mu + 1/2*sqrt(lam^2 + 4*lam*mu)", "-3/2*lam - mu - 1/2*sqrt(lam^2 + 4*lam*mu)"),
            tf.eigenvalues().get(1).values());
        // the eigenvalues collide where the discriminant lam (lam + 4 mu) vanishes
        assertTrue(tf.conditions().containsAll(List.of("lam != 0", "lam + 4*mu != 0")), tf.conditions().toString());
        assertDerivativesArePowers(tf, TWO_UNITS, 6);
    }

    @Test
    void rowsSumToOneIdentically() {
        // common practice, no source: P(t) is stochastic for every t, so each row times the ones vector is 1
        for (Model m : List.of(ONE_UNIT, TWO_UNITS, randomGenerator(new Random(7), 4, false))) {
            TransientForm tf = ClosedForms.ofGenerator(m, Map.of());
            List<Rational> ones = Collections.nCopies(m.size(), Rational.ONE);
            for (int i = 0; i < m.size(); i++) {
                List<Rational> e = new ArrayList<>(Collections.nCopies(m.size(), Rational.ZERO));
                e.set(i, Rational.ONE);
                TimeFormula f = tf.combination(e, ones, false);
                assertEquals("1", f.plain(), m.source() + " row " + i);
                assertEquals("1", f.limitPlain());
            }
        }
    }

    @Test
    void randomGeneratorsMatchTheirDerivativesAtZero() {
        // common practice, no source: d^m/dt^m exp(Qt) at t = 0 is Q^m (m = 0: P(0) = I; m = 1: Q); an exponential
        // polynomial solving chi(d/dt) F = 0 is fixed by its first s derivatives at 0, so this checks the form exactly
        Random rnd = new Random(20261203L);
        for (int k = 0; k < 12; k++) {
            int s = 2 + rnd.nextInt(3);
            Model m = randomGenerator(rnd, s, k % 3 == 0);
            TransientForm tf = ClosedForms.ofGenerator(m, Map.of());
            assertDerivativesArePowers(tf, m, s + 1);
        }
    }

    @Test
    void numericGeneratorsMatchExactPowersAtZero() {
        Random rnd = new Random(42);
        for (int k = 0; k < 8; k++) {
            Model m = randomGenerator(rnd, 3 + rnd.nextInt(3), false);
            TransientForm tf = ClosedForms.ofGenerator(m, Map.of());
            RationalMatrix q = RatFunMatrix.fromModel(m).evaluate(Map.of());
            RationalMatrix power = RationalMatrix.identity(m.size());
            for (int d = 0; d <= m.size() + 1; d++) {
                assertEquals(power, tf.derivativeAtZero(d).evaluate(Map.of()), m.source() + " order " + d);
                power = power.multiply(q);
            }
            assertEquals(List.of(), tf.conditions());
        }
    }

    @Test
    void symbolsNeverCollideWithParameters() {
        Model m = ModelParser.parse("ts.chain", "chain continuous\nparam t\nparam s\nstates A B\nA B t\nB A s\n");
        TransientForm tf = ClosedForms.ofGenerator(m, Map.of());
        assertEquals("tau", tf.symbols().time());
        assertEquals("p", tf.symbols().transform());
        assertEquals("s/(t + s) + t/(t + s)*exp(-(t + s)*tau)", tf.entry(0, 0, false).plain());
        assertEquals("(p + s)/(p^2 + (t + s)*p)", tf.laplaceTransform(0, 0).plain());
        // a quadratic factor's square root is not called s beside the transform's s
        TransientForm two = ClosedForms.ofGenerator(TWO_UNITS, Map.of());
        assertEquals("s", two.symbols().transform());
        assertTrue(!two.definitions().get(0).name().equals("s"));
    }

    @Test
    void discreteModelsAreRefused() {
        Model d = ModelParser.parse("d.chain", "chain discrete\nstates A B\nA B 1/2\nB A 1/3\n");
        QchainException e = assertThrows(QchainException.class, () -> ClosedForms.ofGenerator(d, Map.of()));
        assertEquals(ErrorKey.WRONG_KIND, e.key());
        assertThrows(QchainException.class, () -> ClosedForms.of(ONE_UNIT));
    }

    @Test
    void substitutedValuesLeaveTheOtherParameterSymbolic() {
        TransientForm tf = ClosedForms.ofGenerator(ONE_UNIT, Map.of("mu", Rational.of(1, 12)));
        assertEquals(List.of("lam"), tf.parameters());
        assertEquals("1/(1 + 12*lam) + 12*lam/(1 + 12*lam)*exp(-(1/12 + lam)*t)", tf.entry(0, 0, false).plain());
        assertEquals(RationalMatrix.of(new Rational[][] {{Rational.of(25, 26), Rational.of(1, 26)},
            {Rational.of(25, 26), Rational.of(1, 26)}}), tf.limitAt(Map.of("lam", Rational.of(1, 300))));
    }

    /** Q^0 .. Q^k against the closed form's derivatives at 0 (common practice, no source). */
    private static void assertDerivativesArePowers(TransientForm tf, Model m, int k) {
        RatFunMatrix q = RatFunMatrix.fromModel(m);
        RatFunMatrix power = RatFunMatrix.identity(q.ring(), m.size());
        for (int d = 0; d <= k; d++) {
            assertEquals(power, tf.derivativeAtZero(d), m.source() + " order " + d);
            power = power.multiply(q);
        }
    }

    /** A random continuous chain: at most two rates a row from a pool (with parameters when asked). */
    static Model randomGenerator(Random rnd, int s, boolean symbolic) {
        String[] pool = symbolic ? new String[] {"0", "a", "b", "2*a", "1/2", "a + b", "1"}
            : new String[] {"0", "1", "2", "1/2", "3/4", "5/3", "3"};
        StringBuilder sb = new StringBuilder("chain continuous\n");
        if (symbolic) {
            sb.append("param a\nparam b\n");
        }
        sb.append("states");
        for (int i = 0; i < s; i++) {
            sb.append(" S").append(i + 1);
        }
        sb.append('\n');
        for (int i = 0; i < s; i++) {
            int listed = 0;
            for (int j = 0; j < s; j++) {
                String r = pool[rnd.nextInt(pool.length)];
                if (j != i && listed < 2 && !r.equals("0")) {
                    sb.append('S').append(i + 1).append(" S").append(j + 1).append(' ').append(r).append('\n');
                    listed++;
                }
            }
        }
        return ModelParser.parse("random-" + s + ".chain", sb.toString());
    }
}
