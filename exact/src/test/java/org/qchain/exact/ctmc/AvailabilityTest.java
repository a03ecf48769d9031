package org.qchain.exact.ctmc;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;

/** Exact figures of merit of repairable systems and queues against their textbook formulas. */
class AvailabilityTest {
    private static final Rational Z = Rational.ZERO;

    /** A generator from its off-diagonal rates (the diagonal of {@code rates} is ignored). */
    static RationalMatrix generator(Rational[][] rates) {
        int n = rates.length;
        Rational[][] q = new Rational[n][n];
        for (int i = 0; i < n; i++) {
            Rational out = Z;
            for (int j = 0; j < n; j++) {
                q[i][j] = i == j ? Z : rates[i][j];
                out = out.add(q[i][j]);
            }
            q[i][i] = out.negate();
        }
        return RationalMatrix.of(q);
    }

    static RationalMatrix twoUnitsOneCrew(Rational lam, Rational mu) {
        return generator(new Rational[][] {
            {Z, lam.multiply(Rational.of(2)), Z},
            {mu, Z, lam},
            {Z, mu, Z}});
    }

    @Test
    void oneRepairableUnit() {
        // One unit with failure rate lam and repair rate mu: A = mu/(lam+mu), MTTF = 1/lam, mean down time 1/mu,
        // failure frequency lam mu/(lam+mu) (R. Billinton and R. N. Allan, "Reliability Evaluation of Engineering
        // Systems", ch. 9, the two-state model; from memory).
        Random rnd = new Random(10L);
        for (int trial = 0; trial < 5; trial++) {
            Rational lam = Rational.of(1 + rnd.nextInt(20), 1000 + rnd.nextInt(9000));
            Rational mu = Rational.of(1 + rnd.nextInt(20), 1 + rnd.nextInt(48));
            RationalMatrix q = generator(new Rational[][] {{Z, lam}, {mu, Z}});
            Availability.Figures<Rational> f = Availability.of(q, List.of(0), Availability.HOURS_PER_YEAR);
            Rational s = lam.add(mu);
            assertEquals(mu.divide(s), f.availability());
            assertEquals(Optional.of(lam.reciprocal()), f.mttf().get(0));
            assertEquals(lam.multiply(mu).divide(s), f.failureFrequency());
            assertEquals(Optional.of(lam.reciprocal()), f.meanUpTime());
            assertEquals(Optional.of(mu.reciprocal()), f.meanDownTime());
            assertEquals(lam.divide(s).multiply(Rational.of(8766)), f.downHoursPerYear());
        }
    }

    @Test
    void twoIdenticalUnitsInActiveParallelWithOneRepairCrew() {
        // MTTF from both up = (3 lam + mu)/(2 lam^2); steady-state unavailability 2 lam^2/(mu^2 + 2 lam mu + 2 lam^2)
        // (Billinton and Allan, ch. 9, two-component parallel system with one repair crew; from memory).
        Random rnd = new Random(11L);
        for (int trial = 0; trial < 5; trial++) {
            Rational lam = Rational.of(1 + rnd.nextInt(9), 100 + rnd.nextInt(900));
            Rational mu = Rational.of(1 + rnd.nextInt(9), 1 + rnd.nextInt(24));
            Availability.Figures<Rational> f = Availability.of(twoUnitsOneCrew(lam, mu), List.of(0, 1), Rational.of(8760));
            Rational lam2 = lam.multiply(lam);
            Rational mttf = Rational.of(3).multiply(lam).add(mu).divide(Rational.of(2).multiply(lam2));
            assertEquals(Optional.of(mttf), f.mttf().get(0));
            Rational den = mu.multiply(mu).add(Rational.of(2).multiply(lam).multiply(mu)).add(Rational.of(2).multiply(lam2));
            assertEquals(Rational.of(2).multiply(lam2).divide(den), f.unavailability());
            assertEquals(Optional.of(Z), f.mttf().get(2));
            // frequency and duration: A = omega x mean up time (common practice, no source)
            assertEquals(f.availability(), f.failureFrequency().multiply(f.meanUpTime().orElseThrow()));
        }
    }

    @Test
    void birthDeathQueueWithFiniteRoomHasGeometricStationaryLaw() {
        // M/M/1/K: pi_k proportional to rho^k, k = 0..K (L. Kleinrock, "Queueing Systems", vol. 1, ch. 3; from memory).
        Rational lam = Rational.of(2, 3);
        Rational mu = Rational.of(5, 4);
        int k = 6;
        Rational[][] r = new Rational[k + 1][k + 1];
        for (Rational[] row : r) {
            java.util.Arrays.fill(row, Z);
        }
        for (int i = 0; i < k; i++) {
            r[i][i + 1] = lam;
            r[i + 1][i] = mu;
        }
        Rational[] pi = Availability.stationary(generator(r));
        Rational rho = lam.divide(mu);
        Rational norm = Z;
        for (int i = 0; i <= k; i++) {
            norm = norm.add(rho.pow(i));
        }
        for (int i = 0; i <= k; i++) {
            assertEquals(rho.pow(i).divide(norm), pi[i], "state " + i);
        }
    }

    @Test
    void lossSystemBlockingIsErlangB() {
        // M/M/c/c: the probability that all c servers are busy is Erlang's B formula (a^c/c!) / sum_k a^k/k!,
        // a = lam/mu (Kleinrock, "Queueing Systems", vol. 1, ch. 3; from memory).
        Rational lam = Rational.of(7, 2);
        Rational mu = Rational.of(3, 4);
        int c = 5;
        Rational[][] r = new Rational[c + 1][c + 1];
        for (Rational[] row : r) {
            java.util.Arrays.fill(row, Z);
        }
        for (int i = 0; i < c; i++) {
            r[i][i + 1] = lam;
            r[i + 1][i] = mu.multiply(Rational.of(i + 1));
        }
        Rational a = lam.divide(mu);
        Rational term = Rational.ONE;
        Rational sum = Rational.ONE;
        for (int i = 1; i <= c; i++) {
            term = term.multiply(a).divide(Rational.of(i));
            sum = sum.add(term);
        }
        assertEquals(term.divide(sum), Availability.stationary(generator(r))[c]);
    }

    @Test
    void upStatesThatCanNeverFailHaveNoFiniteMttf() {
        // From A the chain may go to B, which never fails; from C it fails for sure (common practice, no source).
        Rational one = Rational.ONE;
        RationalMatrix q = generator(new Rational[][] {{Z, one, one, Z}, {Z, Z, Z, Z}, {Z, Z, Z, one}, {Z, Z, Z, Z}});
        List<Optional<Rational>> m = Availability.mttf(q, List.of(0, 1, 2));
        assertTrue(m.get(0).isEmpty());
        assertTrue(m.get(1).isEmpty());
        assertEquals(Optional.of(one), m.get(2));
    }

    @Test
    void twoClosedClassesAreRefused() {
        Rational one = Rational.ONE;
        RationalMatrix q = generator(new Rational[][] {{Z, Z}, {Z, Z}});
        QchainException e = assertThrows(QchainException.class, () -> Availability.of(q, List.of(0), one));
        assertEquals(ErrorKey.DEGENERATE_AVAILABILITY, e.key());
    }

    @Test
    void jumpChainAndUniformizedChainAreStochastic() {
        // Embedded jump chain q_ij / q_i; uniformized I + Q/R (S. M. Ross, "Introduction to Probability Models",
        // ch. 6; from memory).
        RationalMatrix q = twoUnitsOneCrew(Rational.of(1, 100), Rational.of(1, 10));
        RationalMatrix j = Generators.jumpChain(q);
        assertEquals(Rational.ONE, j.get(0, 1));
        assertEquals(Rational.of(10, 11), j.get(1, 0));
        assertEquals(Rational.ONE, j.get(2, 1));
        RationalMatrix u = Generators.uniformized(q, Rational.ZERO);
        assertEquals(Rational.of(10, 11), u.get(1, 0));
        assertEquals(Rational.of(9, 11), u.get(0, 0));
        assertEquals(ErrorKey.BAD_ARGUMENT,
            assertThrows(QchainException.class, () -> Generators.uniformized(q, Rational.of(1, 100))).key());
        // the uniformized chain has the generator's stationary law (common practice, no source)
        Rational[] pi = Availability.stationary(q);
        for (int c = 0; c < 3; c++) {
            Rational s = Z;
            for (int r = 0; r < 3; r++) {
                s = s.add(pi[r].multiply(u.get(r, c)));
            }
            assertEquals(pi[c], s);
        }
    }
}
