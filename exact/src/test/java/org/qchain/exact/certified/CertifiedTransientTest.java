package org.qchain.exact.certified;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.util.Random;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Test;
import org.qchain.exact.Decimals;
import org.qchain.exact.Progress;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;

/** Certified decimals of {@code P(t) = exp(Qt)} against closed forms, and the semigroup and row-sum identities. */
class CertifiedTransientTest {

    static RationalMatrix generator(Rational[][] rates) {
        int n = rates.length;
        Rational[][] q = new Rational[n][n];
        for (int i = 0; i < n; i++) {
            Rational out = Rational.ZERO;
            for (int j = 0; j < n; j++) {
                q[i][j] = i == j ? Rational.ZERO : rates[i][j];
                out = out.add(q[i][j]);
            }
            q[i][i] = out.negate();
        }
        return RationalMatrix.of(q);
    }

    static RationalMatrix oneUnit(Rational lam, Rational mu) {
        return generator(new Rational[][] {{Rational.ZERO, lam}, {mu, Rational.ZERO}});
    }

    /** A random generator with integer-over-small-denominator rates and about half the pairs connected. */
    static RationalMatrix randomGenerator(Random rnd, int n) {
        Rational[][] r = new Rational[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                r[i][j] = i != j && rnd.nextBoolean() ? Rational.of(1 + rnd.nextInt(9), 1 + rnd.nextInt(4)) : Rational.ZERO;
            }
        }
        return generator(r);
    }

    /** A value known to 60 digits through apfloat's exp (a reference library), as a rational. */
    static Rational exp(Rational x) {
        Apfloat a = new Apfloat(new BigDecimal(x.numerator()), 80).divide(new Apfloat(new BigDecimal(x.denominator()), 80));
        return Rational.of(new BigDecimal(ApfloatMath.exp(a).toString(true)));
    }

    @Test
    void oneRepairableUnitMatchesItsClosedForm() {
        // One repairable unit: P_UpUp(t) = mu/(lam+mu) + lam/(lam+mu) e^(-(lam+mu) t) (R. Billinton and R. N. Allan,
        // "Reliability Evaluation of Engineering Systems", ch. 9, the two-state model; from memory).
        Rational lam = Rational.of(1, 1000);
        Rational mu = Rational.of(1, 8);
        for (Rational t : new Rational[] {Rational.of(1, 3), Rational.of(10), Rational.of(1000), Rational.of(87660)}) {
            CertifiedDecimal[][] d = CertifiedTransient.of(oneUnit(lam, mu), t).decimals(20, 4096);
            Rational s = lam.add(mu);
            Rational e = exp(s.multiply(t).negate());
            Rational upUp = mu.divide(s).add(lam.divide(s).multiply(e));
            Rational downUp = mu.divide(s).subtract(mu.divide(s).multiply(e));
            assertEquals(Decimals.format(upUp, 20), d[0][0].text(), "t = " + t);
            assertEquals(Decimals.format(Rational.ONE.subtract(upUp), 20), d[0][1].text(), "t = " + t);
            assertEquals(Decimals.format(downUp, 20), d[1][0].text(), "t = " + t);
            assertTrue(d[0][0].enclosure().width().compareTo(Rational.of(1, 1_000_000_000)) < 0);
        }
    }

    @Test
    void severalTimesSharingOneBaseStepMatchTheClosedForm() {
        // The one repairable unit's closed form again (Billinton and Allan, ch. 9; from memory), at times whose
        // common divisor is 1/4 (t = 1/4, 3/2, 5, 10, 0): the shared route's decimals, time by time.
        Rational lam = Rational.of(1, 1000);
        Rational mu = Rational.of(1, 8);
        java.util.List<Rational> times = java.util.List.of(Rational.of(1, 4), Rational.of(3, 2), Rational.of(5),
            Rational.of(10), Rational.ZERO);
        CertifiedDecimal[][][] d = CertifiedTransient.decimals(oneUnit(lam, mu), times, 25, 4096, Progress.NONE);
        assertEquals(times.size(), d.length);
        Rational s = lam.add(mu);
        for (int k = 0; k < times.size(); k++) {
            Rational e = exp(s.multiply(times.get(k)).negate());
            Rational upUp = mu.divide(s).add(lam.divide(s).multiply(e));
            assertEquals(Decimals.format(upUp, 25), d[k][0][0].text(), "t = " + times.get(k));
            assertEquals(Decimals.format(Rational.ONE.subtract(upUp), 25), d[k][0][1].text(), "t = " + times.get(k));
        }
        assertEquals(CertifiedDecimal.Status.EXACT, d[4][0][0].status()); // t = 0: the identity
    }

    @Test
    void sharedTimesAgreeWithEachTimeAlone() {
        // Common practice, no source: both routes give correctly rounded decimals, so they must agree digit for digit.
        Random rnd = new Random(20261202L);
        for (int trial = 0; trial < 4; trial++) {
            RationalMatrix q = randomGenerator(rnd, 3 + rnd.nextInt(4));
            java.util.List<Rational> times = java.util.List.of(Rational.of(1, 3), Rational.of(2), Rational.of(7, 3));
            CertifiedDecimal[][][] d = CertifiedTransient.decimals(q, times, 18, 4096, Progress.NONE);
            for (int k = 0; k < times.size(); k++) {
                CertifiedDecimal[][] alone = CertifiedTransient.of(q, times.get(k)).decimals(18, 4096);
                for (int i = 0; i < alone.length; i++) {
                    for (int j = 0; j < alone.length; j++) {
                        assertEquals(alone[i][j].text(), d[k][i][j].text(), "trial " + trial + " t " + times.get(k));
                    }
                }
            }
        }
    }

    @Test
    void pureDeathChainMatchesThePoissonLaw() {
        // A pure death chain 0 <- 1 <- 2 at rate mu each: from 2, P(2 -> 2) = e^(-mu t), P(2 -> 1) = mu t e^(-mu t)
        // (the Poisson process's counts; S. M. Ross, "Introduction to Probability Models", ch. 5 and 6; from memory).
        Rational mu = Rational.of(3, 2);
        Rational t = Rational.of(7, 5);
        Rational z = Rational.ZERO;
        RationalMatrix q = generator(new Rational[][] {{z, z, z}, {mu, z, z}, {z, mu, z}});
        CertifiedDecimal[][] d = CertifiedTransient.of(q, t).decimals(15, 4096);
        Rational e = exp(mu.multiply(t).negate());
        assertEquals(Decimals.format(e, 15), d[2][2].text());
        assertEquals(Decimals.format(mu.multiply(t).multiply(e), 15), d[2][1].text());
        assertEquals(CertifiedDecimal.Status.EXACT, d[0][0].status()); // absorbing: exactly 1
        assertEquals(CertifiedDecimal.Status.EXACT, d[0][1].status());
        assertEquals(CertifiedDecimal.Status.EXACT, d[1][2].status()); // 1 cannot reach 2: an exact zero
    }

    @Test
    void rowsSumToOneWithinTheBounds() {
        // Rows of P(t) sum to 1 (common practice, no source: exp(Qt) 1 = 1 because Q 1 = 0).
        Random rnd = new Random(20261202L);
        for (int trial = 0; trial < 6; trial++) {
            int n = 2 + rnd.nextInt(6);
            RationalMatrix q = randomGenerator(rnd, n);
            Rational t = Rational.of(1 + rnd.nextInt(40), 1 + rnd.nextInt(7));
            Enclosure[][] e = CertifiedTransient.of(q, t).enclose(120, Progress.NONE);
            for (Enclosure[] row : e) {
                Rational lo = Rational.ZERO;
                Rational hi = Rational.ZERO;
                for (Enclosure x : row) {
                    lo = lo.add(x.lo());
                    hi = hi.add(x.hi());
                }
                assertTrue(lo.compareTo(Rational.ONE) <= 0 && Rational.ONE.compareTo(hi) <= 0, "trial " + trial);
                assertTrue(hi.subtract(lo).compareTo(Rational.of(1, 1L << 40)) < 0, "trial " + trial);
            }
        }
    }

    @Test
    void semigroupPropertyHoldsWithinTheBounds() {
        // P(s + t) = P(s) P(t) (Chapman-Kolmogorov; common practice, no source).
        Random rnd = new Random(77L);
        for (int trial = 0; trial < 5; trial++) {
            int n = 2 + rnd.nextInt(5);
            RationalMatrix q = randomGenerator(rnd, n);
            Rational s = Rational.of(1 + rnd.nextInt(9), 1 + rnd.nextInt(5));
            Rational t = Rational.of(1 + rnd.nextInt(9), 1 + rnd.nextInt(5));
            Enclosure[][] a = CertifiedTransient.of(q, s).enclose(100, Progress.NONE);
            Enclosure[][] b = CertifiedTransient.of(q, t).enclose(100, Progress.NONE);
            Enclosure[][] c = CertifiedTransient.of(q, s.add(t)).enclose(100, Progress.NONE);
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    Rational lo = Rational.ZERO;
                    Rational hi = Rational.ZERO;
                    for (int k = 0; k < n; k++) {
                        lo = lo.add(a[i][k].lo().multiply(b[k][j].lo()));
                        hi = hi.add(a[i][k].hi().multiply(b[k][j].hi()));
                    }
                    assertTrue(lo.compareTo(c[i][j].hi()) <= 0 && c[i][j].lo().compareTo(hi) <= 0,
                        "trial " + trial + " entry " + i + "," + j);
                }
            }
        }
    }

    @Test
    void timeZeroAndAChainWithoutRatesAreTheIdentityExactly() {
        RationalMatrix q = oneUnit(Rational.of(2), Rational.of(3));
        CertifiedDecimal[][] d = CertifiedTransient.of(q, Rational.ZERO).decimals(12, 4096);
        assertEquals("1", d[0][0].text().replaceAll("\\.0*$", ""));
        assertEquals(CertifiedDecimal.Status.EXACT, d[0][1].status());
        RationalMatrix none = oneUnit(Rational.ZERO, Rational.ZERO);
        assertEquals(CertifiedDecimal.Status.EXACT, CertifiedTransient.of(none, Rational.of(5)).decimals(12, 4096)[1][1].status());
    }

    @Test
    void uniformizedChainIsStochastic() {
        // I + Q / rate with rate >= max |q_ii| is a transition matrix (common practice, no source).
        RationalMatrix u = CertifiedTransient.uniformizedMatrix(oneUnit(Rational.of(1, 4), Rational.of(2)), Rational.of(4));
        assertEquals(Rational.of(15, 16), u.get(0, 0));
        assertEquals(Rational.of(1, 16), u.get(0, 1));
        assertEquals(Rational.of(1, 2), u.get(1, 0));
    }
}
