package org.qchain.symbolic.sensitivity;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.model.Domain;
import org.qchain.exact.model.Model;
import org.qchain.symbolic.RatFunMatrix;
import org.qchain.symbolic.SymbolicLimits;
import org.qchain.symbolic.TestChains;

/** Sensitivities of the two-state chain, whose P^2_01 = 2a - a^2 - ab is known in closed form. */
class SensitivityTest {
    // two-state chain; P^2_01 = a(1 - a) + (1 - b)a = 2a - a^2 - ab: Grinstead and Snell, Introduction to
    // Probability, ch. 11 (from memory), expanded by hand
    private final Model model = TestChains.discrete(List.of(TestChains.param("a", Domain.probability(), Rational.of(1, 10)),
        TestChains.param("b", Domain.probability(), Rational.of(1, 5))), new String[][] {{"*", "a"}, {"b", "*"}}, true);
    private final RatFunMatrix p = RatFunMatrix.fromModel(model);

    private EntrySensitivity sens() {
        return Sensitivity.of(p, 2, 0, 1, "a", SymbolicLimits.DEFAULT, x -> { });
    }

    @Test
    void derivativeFormulaValueAndElasticity() {
        EntrySensitivity s = sens();
        assertEquals("2*a - a^2 - a*b", s.probability().toString());
        assertEquals("2 - 2*a - b", s.derivative().toString());
        PointSensitivity at = s.at(model.nominalValues());
        // by hand at a = 1/10, b = 1/5: P = 1/5 - 1/100 - 1/50 = 17/100; dP/da = 2 - 1/5 - 1/5 = 8/5;
        // elasticity = (1/10)/(17/100) * 8/5 = 16/17
        assertEquals(Rational.of(17, 100), at.probability());
        assertEquals(Rational.of(8, 5), at.derivative());
        assertEquals(Optional.of(Rational.of(16, 17)), at.elasticity());
    }

    @Test
    void elasticityIsAbsentWhereTheProbabilityIsZero() {
        assertEquals(Optional.empty(), sens().at(Map.of("a", Rational.ZERO, "b", Rational.of(1, 2))).elasticity());
    }

    @Test
    void sweepGivesOneExactRowPerPoint() {
        SweepRange r = SweepRange.parse("a in [0, 1/10] by 1/100");
        assertEquals(11, r.size());
        Sensitivity.checkSweep(model, r);
        List<SweepRow> rows = sens().sweep(r, model.nominalValues());
        assertEquals(11, rows.size());
        assertEquals(new SweepRow(Rational.ZERO, Rational.ZERO, Rational.of(9, 5)), rows.get(0));
        assertEquals(new SweepRow(Rational.of(1, 10), Rational.of(17, 100), Rational.of(8, 5)), rows.get(10));
    }

    @Test
    void badSweepsAreClearErrors() {
        for (String bad : List.of("a in [0, 1/10] by 0", "a in [0, 1/10] by -1/100", "a in [0, 1] by 1/1000000",
            "a in [0, 1] with 10002 points", "a=0:1/100:1/10", "a in [0, inf) by 1")) {
            QchainException e = assertThrows(QchainException.class, () -> SweepRange.parse(bad), bad);
            assertEquals(ErrorKey.SWEEP, e.key(), bad);
        }
        for (String bad : List.of("a0:1:2", "a in [0, x] by 1", "a in [0, 1]", "a in [0, 1] by")) {
            QchainException e = assertThrows(QchainException.class, () -> SweepRange.parse(bad), bad);
            assertEquals(ErrorKey.SYNTAX, e.key(), bad);
        }
        assertEquals("invalid sweep 'a in [0, 1/10] by 0': the step 0 must be positive",
            assertThrows(QchainException.class, () -> SweepRange.parse("a in [0, 1/10] by 0")).getMessage());
        QchainException out = assertThrows(QchainException.class,
            () -> Sensitivity.checkSweep(model, SweepRange.parse("a in [0, 3/2] by 1/2")));
        assertEquals(ErrorKey.VALUE_OUTSIDE_DOMAIN, out.key());
        QchainException unknown = assertThrows(QchainException.class,
            () -> Sensitivity.checkSweep(model, SweepRange.parse("z in [0, 1] by 1/2")));
        assertEquals(ErrorKey.UNKNOWN_PARAMETER, unknown.key());
    }

    @Test
    void unknownParameterOfTheDerivativeIsAnError() {
        QchainException e = assertThrows(QchainException.class,
            () -> Sensitivity.of(p, 2, 0, 1, "z", SymbolicLimits.DEFAULT, x -> { }));
        assertEquals(ErrorKey.UNKNOWN_PARAMETER, e.key());
    }

    @Test
    void fastSweepEqualsThePointwiseEvaluation() {
        // regression (issue 8): the sweep evaluates through integer Horner steps; it must give the general
        // evaluation's values exactly, here for P^7 of the same chain with a rational function (b = 1/(1 + a))
        Model m = TestChains.discrete(List.of(TestChains.param("a", Domain.probability(), Rational.of(1, 10)),
            TestChains.param("b", Domain.probability(), Rational.of(1, 5))),
            new String[][] {{"*", "a/(1 + b)"}, {"b", "*"}}, true);
        EntrySensitivity s = Sensitivity.of(RatFunMatrix.fromModel(m), 7, 0, 1, "a", SymbolicLimits.DEFAULT, x -> { });
        Map<String, Rational> base = Map.of("b", Rational.of(2, 7));
        SweepRange range = SweepRange.parse("a in [1/13, 9/10] by 1/17");
        List<SweepRow> rows = s.sweep(range, base);
        assertEquals(range.size(), rows.size());
        for (SweepRow r : rows) {
            Map<String, Rational> pt = Map.of("a", r.value(), "b", Rational.of(2, 7));
            assertEquals(s.probability().evaluate(pt), r.probability());
            assertEquals(s.derivative().evaluate(pt), r.derivative());
        }
    }

    @Test
    void sweepPastTheDigitLimitIsRefusedBeforeWork() {
        SweepRange range = SweepRange.parse("a in [0, 1] by 1/10000");
        QchainException e = assertThrows(QchainException.class,
            () -> sens().sweep(range, Map.of("b", Rational.of(1, 5)), 1000, org.qchain.exact.Progress.NONE));
        assertEquals(ErrorKey.SWEEP_TOO_LARGE, e.key());
        assertEquals("10001", String.valueOf(e.args().get(1)));
    }
}
