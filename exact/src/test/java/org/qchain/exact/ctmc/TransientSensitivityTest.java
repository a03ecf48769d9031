package org.qchain.exact.ctmc;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Test;
import org.qchain.exact.Decimals;
import org.qchain.exact.Progress;
import org.qchain.exact.Rational;
import org.qchain.exact.certified.CertifiedDecimal;
import org.qchain.exact.model.Model;
import org.qchain.exact.model.ModelParser;

/** Certified derivatives of P(t) entries against the differentiated closed form and central differences. */
class TransientSensitivityTest {
    private static final long PREC = 80;
    private static final Model ONE_UNIT = ModelParser.parse("unit.chain",
        "chain continuous\nparam lam in (0, inf) = 1/4\nparam mu in (0, inf) = 3/2\nstates Up Down\nup Up\n"
            + "Up Down lam\nDown Up mu\n");
    private static final Model TWO_UNITS = ModelParser.parse("pair.chain",
        "chain continuous\nparam lam in (0, inf) = 1/3\nparam mu in (0, inf) = 2\nstates Both One None\n"
            + "up Both One\nBoth One 2*lam\nOne None lam\nOne Both mu\nNone One mu\n");

    private static Apfloat ap(Rational r) {
        return new Apfloat(r.numerator(), PREC).divide(new Apfloat(r.denominator(), PREC));
    }

    private static Rational rational(Apfloat a) {
        return Rational.parse(a.toString(true));
    }

    /**
     * P_up,up(t) = mu/s + (lam/s) e^(-st), s = lam + mu (R. Billinton and R. N. Allan, "Reliability Evaluation of
     * Engineering Systems", ch. 9, the two-state model; from memory), differentiated by hand:
     * d/dlam = (mu/s^2)(e^(-st) - 1) - (lam t/s) e^(-st); d/dmu = (lam/s^2)(1 - e^(-st)) - (lam t/s) e^(-st).
     * Evaluated with apfloat at 80 digits.
     */
    private static Apfloat[] closedForm(Rational lam, Rational mu, Rational t) {
        Apfloat l = ap(lam);
        Apfloat m = ap(mu);
        Apfloat s = l.add(m);
        Apfloat e = ApfloatMath.exp(s.multiply(ap(t)).negate());
        Apfloat s2 = s.multiply(s);
        Apfloat p = m.divide(s).add(l.divide(s).multiply(e));
        Apfloat ltse = l.multiply(ap(t)).divide(s).multiply(e);
        Apfloat dl = m.divide(s2).multiply(e.subtract(new Apfloat(1, PREC))).subtract(ltse);
        Apfloat dm = l.divide(s2).multiply(new Apfloat(1, PREC).subtract(e)).subtract(ltse);
        return new Apfloat[] {p, dl, dm};
    }

    @Test
    void oneUnitDerivativesMatchTheDifferentiatedClosedFormAtSeveralTimes() {
        Rational lam = Rational.of(1, 4);
        Rational mu = Rational.of(3, 2);
        for (String tt : new String[] {"1/10", "1", "7/2", "20", "200"}) {
            Rational t = Rational.parse(tt);
            Apfloat[] ref = closedForm(lam, mu, t);
            for (int digits : new int[] {12, 30}) {
                for (String p : new String[] {"lam", "mu"}) {
                    TransientSensitivity.Result r = TransientSensitivity.of(ONE_UNIT, Map.of(), p, t, 0, 0, digits,
                        8192, Progress.NONE);
                    Rational dRef = rational(p.equals("lam") ? ref[1] : ref[2]);
                    Rational vRef = rational(ref[0]);
                    assertTrue(r.value().isProven() && r.derivative().isProven(), tt + " " + p);
                    assertEquals(Decimals.format(vRef, digits), r.value().text(), "P at t = " + tt);
                    assertEquals(Decimals.format(dRef, digits), r.derivative().text(), "dP/d" + p + " at t = " + tt);
                    // the enclosures hold the reference (to its 80 digits)
                    Rational slack = Rational.of(java.math.BigInteger.ONE, java.math.BigInteger.TEN.pow(70));
                    assertTrue(r.derivative().enclosure().lo().subtract(slack).compareTo(dRef) <= 0
                        && dRef.compareTo(r.derivative().enclosure().hi().add(slack)) <= 0, tt + " " + p);
                    Rational theta = p.equals("lam") ? lam : mu;
                    CertifiedDecimal el = r.elasticity().orElseThrow();
                    assertEquals(Decimals.format(theta.multiply(dRef).divide(vRef), digits), el.text(),
                        "elasticity by " + p + " at t = " + tt);
                }
            }
        }
    }

    @Test
    void derivativesAgreeWithCentralDifferencesOfCertifiedValues() {
        // (P(θ+h) - P(θ-h)) / 2h matches dP/dθ to O(h^2) (common practice, no source); the values are certified
        // enclosures, so the difference is taken between their ends.
        Rational t = Rational.of(3, 2);
        for (String p : new String[] {"lam", "mu"}) {
            Rational x = p.equals("lam") ? Rational.of(1, 3) : Rational.of(2);
            Rational h = x.divide(Rational.of(100_000));
            for (int to = 0; to < 3; to++) {
                TransientSensitivity.Result r = TransientSensitivity.of(TWO_UNITS, Map.of(), p, t, 0, to, 20, 8192,
                    Progress.NONE);
                Rational up = TransientSensitivity.of(TWO_UNITS, Map.of(p, x.add(h)), p, t, 0, to, 25, 8192,
                    Progress.NONE).value().enclosure().lo();
                Rational down = TransientSensitivity.of(TWO_UNITS, Map.of(p, x.subtract(h)), p, t, 0, to, 25, 8192,
                    Progress.NONE).value().enclosure().lo();
                Rational central = up.subtract(down).divide(h.multiply(Rational.of(2)));
                Rational d = r.derivative().enclosure().lo();
                assertTrue(central.subtract(d).abs().compareTo(d.abs().multiply(Rational.of(1, 1_000_000))) <= 0,
                    p + " to " + to + ": " + central.doubleValue() + " vs " + d.doubleValue());
            }
        }
    }

    @Test
    void theDerivativeOfARowSumsToZero() {
        // Rows of P(t) sum to 1 for every θ, so their derivatives sum to 0 (common practice, no source).
        Rational t = Rational.of(5, 4);
        Rational lo = Rational.ZERO;
        Rational hi = Rational.ZERO;
        for (int to = 0; to < 3; to++) {
            CertifiedDecimal d = TransientSensitivity.of(TWO_UNITS, Map.of(), "mu", t, 1, to, 15, 8192, Progress.NONE)
                .derivative();
            lo = lo.add(d.enclosure().lo());
            hi = hi.add(d.enclosure().hi());
        }
        assertTrue(lo.signum() <= 0 && hi.signum() >= 0, lo + " " + hi);
        assertTrue(hi.subtract(lo).compareTo(Rational.of(1, 1_000_000_000)) < 0);
    }

    @Test
    void atTimeZeroEverythingIsExact() {
        TransientSensitivity.Result r = TransientSensitivity.of(ONE_UNIT, Map.of(), "mu", Rational.ZERO, 0, 0, 12, 8192,
            Progress.NONE);
        assertEquals("1", r.value().text());
        assertEquals("0", r.derivative().text());
        assertEquals(CertifiedDecimal.Status.EXACT, r.derivative().status());
    }

    @Test
    void fromAStateThatCannotUseTheParametersRatesTheDerivativeIsExactlyZero() {
        // A non-repairable pair: None absorbs, so P(t)(None, .) is the unit row for every lam (common practice, no
        // source); the derivative is exact, not an interval straddling 0.
        Model m = ModelParser.parse("pair.chain", "chain continuous\nparam lam in (0, inf) = 1/3\n"
            + "states Both One None\nup Both One\nBoth One 2*lam\nOne None lam\n");
        TransientSensitivity.Result r = TransientSensitivity.of(m, Map.of(), "lam", Rational.of(2), 2, 2, 12, 8192,
            Progress.NONE);
        assertEquals("1", r.value().text());
        assertEquals(CertifiedDecimal.Status.EXACT, r.derivative().status());
        assertEquals("0", r.derivative().text());
        // from Both: R(t) = P(Both -> None) = (1 - e^(-lam t))^2, dR/dlam = 2 (1 - e^(-lam t)) t e^(-lam t) (two
        // independent units in parallel without repair; common practice, no source)
        Rational t = Rational.of(2);
        TransientSensitivity.Result b = TransientSensitivity.of(m, Map.of(), "lam", t, 0, 2, 20, 8192, Progress.NONE);
        Apfloat e = ApfloatMath.exp(ap(Rational.of(-2, 3)));
        Apfloat one = new Apfloat(1, PREC);
        Apfloat d = new Apfloat(2, PREC).multiply(one.subtract(e)).multiply(ap(t)).multiply(e);
        assertEquals(Decimals.format(rational(d), 20), b.derivative().text());
    }

    @Test
    void anInterruptedThreadStopsTheSeries() {
        Thread.currentThread().interrupt();
        try {
            org.qchain.exact.QchainException ex = org.junit.jupiter.api.Assertions.assertThrows(
                org.qchain.exact.QchainException.class, () -> TransientSensitivity.of(TWO_UNITS, Map.of(), "mu",
                    Rational.of(10), 0, 0, 12, 8192, Progress.NONE));
            assertEquals(org.qchain.exact.ErrorKey.INTERRUPTED, ex.key());
        } finally {
            Thread.interrupted();
        }
    }

    @Test
    void theWorkEstimateGrowsWithTheRateTimesTime() {
        TransientSensitivity.Work a = TransientSensitivity.estimate(ONE_UNIT, Map.of(), "mu", Rational.ONE, 12);
        TransientSensitivity.Work b = TransientSensitivity.estimate(ONE_UNIT, Map.of(), "mu", Rational.of(100), 12);
        assertTrue(b.terms() > a.terms() && b.multiplications() > a.multiplications());
        assertFalse(a.terms() <= 0);
    }
}
