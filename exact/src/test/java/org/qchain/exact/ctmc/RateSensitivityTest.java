package org.qchain.exact.ctmc;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import org.junit.jupiter.api.Test;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.model.Model;
import org.qchain.exact.model.ModelParser;

/** Exact derivatives of availability figures against differentiated textbook formulas and central differences. */
class RateSensitivityTest {
    private static final Model ONE_UNIT = ModelParser.parse("unit.chain",
        "chain continuous\nparam lam = 1/400\nparam mu = 1/6\nstates Up Down\nup Up\nUp Down lam\nDown Up mu\n");
    private static final Model TWO_UNITS = ModelParser.parse("pair.chain",
        "chain continuous\nparam lam = 1/300\nparam mu = 1/10\nstates Both One None\nup Both One\n"
            + "Both One 2*lam\nOne None lam\nOne Both mu\nNone One mu\n");

    @Test
    void oneUnitDerivativesAreTheDifferentiatedFormulas() {
        // A = mu/(lam+mu): dA/dmu = lam/(lam+mu)^2; MTTF = 1/lam: dMTTF/dlam = -1/lam^2 (derived by hand from the
        // two-state model's formulas, R. Billinton and R. N. Allan, "Reliability Evaluation of Engineering Systems",
        // ch. 9; from memory).
        Rational lam = Rational.of(1, 400);
        Rational mu = Rational.of(1, 6);
        Rational s = lam.add(mu);
        RateSensitivity.Derivative a = RateSensitivity.of(ONE_UNIT, Map.of(), "mu", RateSensitivity.Figure.AVAILABILITY, 0);
        assertEquals(mu.divide(s), a.value());
        assertEquals(lam.divide(s.multiply(s)), a.derivative());
        assertEquals(mu.divide(a.value()).multiply(a.derivative()), a.elasticity().orElseThrow());
        RateSensitivity.Derivative m = RateSensitivity.of(ONE_UNIT, Map.of(), "lam", RateSensitivity.Figure.MTTF, 0);
        assertEquals(lam.reciprocal(), m.value());
        assertEquals(lam.multiply(lam).reciprocal().negate(), m.derivative());
        assertEquals(Rational.of(-1), m.elasticity().orElseThrow());
        // MTTF does not depend on the repair rate of a single unit
        assertEquals(Rational.ZERO, RateSensitivity.of(ONE_UNIT, Map.of(), "mu", RateSensitivity.Figure.MTTF, 0).derivative());
    }

    @Test
    void twoUnitDerivativesAgreeWithCentralDifferencesOfExactValues() {
        // MTTF = (3 lam + mu)/(2 lam^2) (Billinton and Allan, ch. 9; from memory): dMTTF/dmu = 1/(2 lam^2) exactly,
        // and every derivative agrees with a central difference of exact values to O(h^2) (common practice, no source).
        Rational lam = Rational.of(1, 300);
        RateSensitivity.Derivative m = RateSensitivity.of(TWO_UNITS, Map.of(), "mu", RateSensitivity.Figure.MTTF, 0);
        assertEquals(Rational.of(2).multiply(lam).multiply(lam).reciprocal(), m.derivative());
        for (RateSensitivity.Figure f : RateSensitivity.Figure.values()) {
            for (String p : new String[] {"lam", "mu"}) {
                Rational x = p.equals("lam") ? lam : Rational.of(1, 10);
                Rational h = x.divide(Rational.of(10_000));
                Rational up = RateSensitivity.of(TWO_UNITS, Map.of(p, x.add(h)), p, f, 0).value();
                Rational down = RateSensitivity.of(TWO_UNITS, Map.of(p, x.subtract(h)), p, f, 0).value();
                Rational central = up.subtract(down).divide(h.multiply(Rational.of(2)));
                Rational d = RateSensitivity.of(TWO_UNITS, Map.of(), p, f, 0).derivative();
                Rational err = central.subtract(d).abs();
                assertTrue(err.compareTo(d.abs().multiply(Rational.of(1, 1_000_000))) <= 0, f + " by " + p);
            }
        }
    }

    @Test
    void unknownParameterAndMissingUpLineAreErrors() {
        assertEquals(ErrorKey.BAD_ARGUMENT, assertThrows(QchainException.class,
            () -> RateSensitivity.of(ONE_UNIT, Map.of(), "nu", RateSensitivity.Figure.MTTF, 0)).key());
        Model noUp = ModelParser.parse("m.chain", "chain continuous\nparam lam = 1\nstates A B\nA B lam\nB A 1\n");
        assertEquals(ErrorKey.NO_UP_STATES, assertThrows(QchainException.class,
            () -> RateSensitivity.of(noUp, Map.of(), "lam", RateSensitivity.Figure.AVAILABILITY, 0)).key());
        assertEquals(ErrorKey.BAD_ARGUMENT, assertThrows(QchainException.class,
            () -> RateSensitivity.of(ONE_UNIT, Map.of(), "lam", RateSensitivity.Figure.MTTF, 1)).key());
    }
}
