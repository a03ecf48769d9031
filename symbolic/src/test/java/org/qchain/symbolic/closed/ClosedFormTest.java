package org.qchain.symbolic.closed;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import edu.jas.arith.BigRational;
import edu.jas.ufd.Quotient;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.model.Model;

class ClosedFormTest {

    private static final Model TWO_STATE = Chains.model(List.of("a", "b"),
        new String[][] {{"1-a", "a"}, {"b", "1-b"}});

    @Test
    void twoStateChainHasTheStandardClosedForm() {
        ClosedForm cf = ClosedForms.of(TWO_STATE);
        // Grinstead and Snell, Introduction to Probability, ch. 11 (two-state chain, from memory):
        // P^n = 1/(a+b) [[b, a], [b, a]] + (1-a-b)^n/(a+b) [[a, -a], [-b, b]]
        assertEquals("b/(a + b) + a/(a + b)*(1 - a - b)^n", cf.formula(0, 0));
        assertEquals("a/(a + b) - a/(a + b)*(1 - a - b)^n", cf.formula(0, 1));
        assertEquals("b/(a + b) - b/(a + b)*(1 - a - b)^n", cf.formula(1, 0));
        assertEquals("a/(a + b) + b/(a + b)*(1 - a - b)^n", cf.formula(1, 1));
        assertEquals(List.of("a + b != 0"), cf.conditions());
        assertEquals(0, cf.validFrom());
        // the same formula built independently as rational functions, n = 0 .. 6
        ParamField f = cf.field();
        Quotient<BigRational> a = new Quotient<>(f.field, f.poly.univariate("a"));
        Quotient<BigRational> b = new Quotient<>(f.field, f.poly.univariate("b"));
        Quotient<BigRational> lambda = f.one().subtract(a).subtract(b);
        for (int n = 0; n <= 6; n++) {
            Quotient<BigRational> ln = ParamField.power(lambda, n == 0 ? 0 : n);
            if (n == 0) {
                ln = f.one();
            }
            Quotient<BigRational> p00 = b.sum(a.multiply(ln)).divide(a.sum(b));
            Quotient<BigRational> p01 = a.subtract(a.multiply(ln)).divide(a.sum(b));
            Quotient<BigRational>[][] got = cf.evaluateSymbolic(n);
            assertEquals(p00, got[0][0], "n=" + n);
            assertEquals(p01, got[0][1], "n=" + n);
        }
        Chains.assertMatchesPowers(cf, TWO_STATE,
            List.of(Chains.at("a", "1/3", "b", "1/4"), Chains.at("a", "9/10", "b", "7/10")), 10);
    }

    @Test
    void twoStateLongRunIsTheStationaryLawWithRateOneMinusAMinusB() {
        LongRun lr = ClosedForms.of(TWO_STATE).longRun();
        // Grinstead and Snell, ch. 11 (from memory): the limit has rows (b, a)/(a + b)
        assertTrue(lr.converges());
        assertEquals(List.of(List.of(List.of("b/(a + b)", "a/(a + b)"), List.of("b/(a + b)", "a/(a + b)"))), lr.limits());
        assertEquals("abs(1 - a - b)", lr.rate());
    }

    @Test
    void jordanBlockGivesBinomialTerms() {
        Model m = Chains.model(List.of(), new String[][] {{"1/2", "1/2", "0"}, {"0", "1/2", "1/2"}, {"0", "0", "1"}});
        ClosedForm cf = ClosedForms.of(m);
        // issue 4 of this project: P^n_11 = (1/2)^n, P^n_12 = n (1/2)^n; third column derived by hand:
        // the rows sum to 1, so P^n_13 = 1 - (1/2)^n - n (1/2)^n and P^n_23 = 1 - (1/2)^n; P^n_33 = 1
        assertEquals("(1/2)^n", cf.formula(0, 0));
        assertEquals("n*(1/2)^n", cf.formula(0, 1));
        assertEquals("1 - (1/2)^n - n*(1/2)^n", cf.formula(0, 2));
        assertEquals("1 - (1/2)^n", cf.formula(1, 2));
        assertEquals("1", cf.formula(2, 2));
        Eigenvalue half = cf.eigenvalues().get(1);
        assertEquals("1/2", half.values().get(0));
        assertEquals(2, half.multiplicity());
        assertEquals(2, half.jordanIndex());
        assertEquals("1/2", cf.longRun().rate());
        RationalMatrix at = null;
        for (int n = 0; n <= 12; n++) {
            Rational h = Rational.of(1, 2).pow(n);
            Rational nh = h.multiply(Rational.of(n));
            at = cf.evaluate(n, Map.of());
            assertEquals(h, at.get(0, 0));
            assertEquals(nh, at.get(0, 1));
            assertEquals(Rational.ONE.subtract(h).subtract(nh), at.get(0, 2));
            assertEquals(h, at.get(1, 1));
            assertEquals(Rational.ONE.subtract(h), at.get(1, 2));
            assertEquals(Rational.ONE, at.get(2, 2));
        }
        Chains.assertMatchesPowers(cf, m, List.of(Map.of()), 0);
    }

    @Test
    void birthDeathChainHasARealRadicalPair() {
        // rows 1-a, a, 0 / b, 1-a-b, a / 0, b, 1-b: chi = (x - 1) (x^2 - (2 - 2a - 2b + ...) x + ...), the
        // quadratic irreducible over Q(a, b); common practice, no source; agreement checked against exact powers
        Model m = Chains.model(List.of("a", "b"),
            new String[][] {{"1-a", "a", "0"}, {"b", "1-a-b", "a"}, {"0", "b", "1-b"}});
        ClosedForm cf = ClosedForms.of(m);
        assertEquals("quadratic", cf.eigenvalues().get(1).kind());
        assertTrue(cf.formula(0, 0).contains("sqrt("), cf.formula(0, 0));
        Chains.assertMatchesPowers(cf, m, List.of(Chains.at("a", "1/3", "b", "1/5"), Chains.at("a", "1/7", "b", "2/3")), 8);
    }

    @Test
    void cyclicChainWithComplexPairStaysReal() {
        // rows 1-a, a, 0 / 0, 1-a, a / a, 0, 1-a: eigenvalues 1 - a + a w with w a cube root of unity,
        // so the quadratic factor has a negative discriminant -3a^2 (derived by hand)
        Model m = Chains.model(List.of("a"),
            new String[][] {{"1-a", "a", "0"}, {"0", "1-a", "a"}, {"a", "0", "1-a"}});
        ClosedForm cf = ClosedForms.of(m);
        Eigenvalue pair = cf.eigenvalues().get(1);
        assertEquals("quadratic", pair.kind());
        Chains.assertMatchesPowers(cf, m, List.of(Chains.at("a", "1/3"), Chains.at("a", "3/4")), 8);
    }

    @Test
    void periodTwoChainHasTwoSubsequenceLimits() {
        // a walk on three states that alternates between {S2} and {S1, S3}: period 2 (common practice, no source)
        Model m = Chains.model(List.of("a"), new String[][] {{"0", "1", "0"}, {"a", "0", "1-a"}, {"0", "1", "0"}});
        ClosedForm cf = ClosedForms.of(m);
        LongRun lr = cf.longRun();
        assertEquals(2, lr.period());
        assertFalse(lr.converges());
        // derived by hand: P^(2m) -> rows (a, 0, 1-a) / (0, 1, 0) / (a, 0, 1-a); P^(2m+1) -> the other pattern
        assertEquals(List.of(List.of("a", "0", "1 - a"), List.of("0", "1", "0"), List.of("a", "0", "1 - a")), lr.limits().get(0));
        assertEquals(List.of(List.of("0", "1", "0"), List.of("a", "0", "1 - a"), List.of("0", "1", "0")), lr.limits().get(1));
        Chains.assertMatchesPowers(cf, m, List.of(Chains.at("a", "1/3")), 0);
    }

    @Test
    void periodThreeChainHasThreeSubsequenceLimits() {
        // a deterministic cycle S1 -> S2 -> S3 -> S1: P^(3m+r) = P^r (common practice, no source)
        Model m = Chains.model(List.of(), new String[][] {{"0", "1", "0"}, {"0", "0", "1"}, {"1", "0", "0"}});
        ClosedForm cf = ClosedForms.of(m);
        LongRun lr = cf.longRun();
        assertEquals(3, lr.period());
        assertEquals(List.of(List.of("1", "0", "0"), List.of("0", "1", "0"), List.of("0", "0", "1")), lr.limits().get(0));
        assertEquals(List.of(List.of("0", "1", "0"), List.of("0", "0", "1"), List.of("1", "0", "0")), lr.limits().get(1));
        assertEquals(List.of(List.of("0", "0", "1"), List.of("1", "0", "0"), List.of("0", "1", "0")), lr.limits().get(2));
        assertEquals("0", lr.rate());
        Chains.assertMatchesPowers(cf, m, List.of(Map.of()), 0);
    }

    @Test
    void zeroEigenvalueSetsValidFrom() {
        // S1 -> S2 -> S3 (absorbing): P^n = [[0,0,1],[0,0,1],[0,0,1]] for n >= 2 (derived by hand)
        Model m = Chains.model(List.of(), new String[][] {{"0", "1", "0"}, {"0", "0", "1"}, {"0", "0", "1"}});
        ClosedForm cf = ClosedForms.of(m);
        assertEquals(2, cf.validFrom());
        assertEquals(2, cf.validFrom(0, 1));
        assertEquals(0, cf.validFrom(2, 2));
        assertEquals("1", cf.formula(0, 2));
        assertEquals("0", cf.formula(0, 1));
        Chains.assertMatchesPowers(cf, m, List.of(Map.of()), 0);
    }

    @Test
    void irreducibleCubicGivesARootSum() {
        // a 4-state cycle with holding: chi = (x - 1)(x^3 - x^2/12 + 7x/24 + 1/4), the cubic irreducible over Q
        // (no rational root by the rational root test, derived by hand); agreement with exact powers is the test
        Model m = Chains.model(List.of(), new String[][] {
            {"1/2", "1/2", "0", "0"}, {"0", "1/3", "2/3", "0"}, {"0", "0", "1/4", "3/4"}, {"1", "0", "0", "0"}});
        ClosedForm cf = ClosedForms.of(m);
        assertEquals("roots", cf.eigenvalues().get(1).kind(), cf.eigenvalues().toString());
        assertTrue(cf.formula(0, 0).contains("rootsum(n, f1)"), cf.formula(0, 0));
        Chains.assertMatchesPowers(cf, m, List.of(Map.of()), 10);
    }

    @Test
    void zeroEigenvalueNextToAComplexPair() {
        // a 4-cycle with holding probability 1/2: chi = x (x - 1)(x^2 - x + 1/2) (derived by hand:
        // eigenvalues (1 + w)/2 for w^4 = 1, i.e. 1, (1 +- i)/2 and 0)
        Model m = Chains.model(List.of(), new String[][] {
            {"1/2", "1/2", "0", "0"}, {"0", "1/2", "1/2", "0"}, {"0", "0", "1/2", "1/2"}, {"1/2", "0", "0", "1/2"}});
        ClosedForm cf = ClosedForms.of(m);
        assertEquals(1, cf.validFrom());
        assertTrue(cf.longRun().converges());
        assertEquals("1/2*sqrt(2)", cf.longRun().rate());
        assertEquals(List.of("1/2 + 1/2*sqrt(-1)", "1/2 - 1/2*sqrt(-1)"), cf.eigenvalues().get(2).values());
        Chains.assertMatchesPowers(cf, m, List.of(Map.of()), 10);
    }

    @Test
    void evaluatingWhereAConditionFailsIsRefused() {
        ClosedForm cf = ClosedForms.of(TWO_STATE);
        QchainException e = assertThrows(QchainException.class,
            () -> cf.evaluate(3, Chains.at("a", "1/2", "b", "-1/2")));
        assertEquals(ErrorKey.CLOSED_FORM_CONDITION, e.key());
    }

    @Test
    void namedCubicHasItsRootsNumerically() {
        Model m = Chains.model(List.of(), new String[][] {
            {"1/2", "1/2", "0", "0"}, {"0", "1/3", "2/3", "0"}, {"0", "0", "1/4", "3/4"}, {"1", "0", "0", "0"}});
        ClosedForm cf = ClosedForms.of(m);
        List<RootPolynomial> rp = cf.rootPolynomials(Map.of());
        assertEquals(1, rp.size());
        assertEquals("x^3 - 1/12*x^2 + 7/24*x + 1/4", rp.get(0).polynomial());
        assertEquals(3, rp.get(0).roots().size());
        // the roots sum to 1/12 and multiply to -1/4 (Vieta, common practice): check through the real root r and
        // the modulus of the pair, |w|^2 = (-1/4)/r ... here only numerically, to 15 digits
        java.math.BigDecimal r = new java.math.BigDecimal(rp.get(0).roots().get(0).re().decimal(20).text());
        java.math.BigDecimal f = r.pow(3).subtract(r.pow(2).divide(java.math.BigDecimal.valueOf(12), java.math.MathContext.DECIMAL128))
            .add(r.multiply(java.math.BigDecimal.valueOf(7)).divide(java.math.BigDecimal.valueOf(24), java.math.MathContext.DECIMAL128))
            .add(new java.math.BigDecimal("0.25"));
        assertTrue(f.abs().compareTo(new java.math.BigDecimal("1e-15")) < 0, f.toString());
        // rate: the largest modulus of the cubic's roots; cross-checked against Hipparchus' Laguerre solver (a
        // general-purpose reference library shipped with Symja)
        double best = 0;
        for (org.hipparchus.complex.Complex z : new org.hipparchus.analysis.solvers.LaguerreSolver()
                .solveAllComplex(new double[] {0.25, 7.0 / 24, -1.0 / 12, 1}, 0)) {
            best = Math.max(best, z.norm());
        }
        assertEquals(best, Double.parseDouble(cf.rateAt(Map.of()).decimal(15).text()), 1e-12);
    }

    @Test
    void twoIdenticalClassesGiveARepeatedQuadraticWithoutJordanBlock() {
        // two closed copies of the cyclic chain above: chi = ((x - 1) q(x))^2, q the quadratic (derived by hand);
        // the eigenvalue 1 is double (two closed classes), q is double but diagonalisable
        String[][] rows = new String[6][6];
        String[][] c = {{"1-a", "a", "0"}, {"0", "1-a", "a"}, {"a", "0", "1-a"}};
        for (int i = 0; i < 6; i++) {
            for (int j = 0; j < 6; j++) {
                rows[i][j] = (i / 3 == j / 3) ? c[i % 3][j % 3] : "0";
            }
        }
        Model m = Chains.model(List.of("a"), rows);
        ClosedForm cf = ClosedForms.of(m);
        assertEquals(2, cf.eigenvalues().get(0).multiplicity());
        assertEquals(2, cf.eigenvalues().get(1).multiplicity());
        assertEquals("quadratic", cf.eigenvalues().get(1).kind());
        // the limit: uniform on the starting class (derived by hand: each block is doubly stochastic)
        assertEquals(List.of("1/3", "1/3", "1/3", "0", "0", "0"), cf.longRun().limits().get(0).get(0));
        Chains.assertMatchesPowers(cf, m, List.of(Chains.at("a", "1/4")), 0);
    }

    @Test
    void continuousChainsAndUnknownValuesAreRefused() {
        Model ctmc = org.qchain.exact.model.ModelParser.parse("t.chain", "chain continuous\nstates A B\nA B 2\nB A 3\n");
        assertEquals(ErrorKey.WRONG_KIND, assertThrows(QchainException.class, () -> ClosedForms.of(ctmc)).key());
        assertEquals(ErrorKey.UNKNOWN_PARAMETER,
            assertThrows(QchainException.class, () -> ClosedForms.of(TWO_STATE, Chains.at("c", "1/2"))).key());
    }

    @Test
    void sizeGuardRefusesBeforeWork() {
        // the decision is the caller's guard's (the analysis layer runs it before any engine); the engine asserts
        org.qchain.symbolic.SymbolicLimits tiny = new org.qchain.symbolic.SymbolicLimits(3);
        QchainException e = assertThrows(QchainException.class,
            () -> ClosedForms.estimate(TWO_STATE, Map.of()).requireTermsWithin(tiny));
        assertEquals(ErrorKey.SYMBOLIC_TOO_LARGE, e.key());
        assertThrows(IllegalStateException.class, () -> ClosedForms.of(TWO_STATE, Map.of(), tiny));
    }

    @Test
    void progressIsReportedAndAnInterruptStopsTheWork() {
        List<String> phases = new java.util.ArrayList<>();
        ClosedForms.of(TWO_STATE, Map.of(), org.qchain.symbolic.SymbolicLimits.DEFAULT,
            (phase, done, total) -> {
                if (!phases.contains(phase)) {
                    phases.add(phase);
                }
            });
        assertEquals(List.of("powers", "factoring", "projectors", "formulas"), phases);
        Thread.currentThread().interrupt();
        try {
            QchainException e = assertThrows(QchainException.class, () -> ClosedForms.of(TWO_STATE, Map.of(),
                org.qchain.symbolic.SymbolicLimits.DEFAULT, org.qchain.exact.Progress.NONE));
            assertEquals(ErrorKey.INTERRUPTED, e.key());
        } finally {
            Thread.interrupted();
        }
    }

    @Test
    void aDiscriminantThatIsASquarePlusAPositiveTermIsProved() {
        // regression (issue 8): a press chain (Good -> Worn p, Worn -> Good r, Worn -> Failed 1/5); the radicand of
        // its quadratic pair, 1 - 10p + 10r + 25p^2 + 50pr + 25r^2 = (5p + 5r - 1)^2 + 20r (expanded by hand: common
        // practice, no source), is positive for r > 0, so its condition holds on (0, 1)^2; on [0, 1]^2 it fails at
        // p = 1/5, r = 0 and stays reported
        Model m = Chains.model(List.of("p", "r"), new String[][] {
            {"1 - p", "p", "0"}, {"r", "4/5 - r", "1/5"}, {"0", "0", "1"}});
        ClosedForm cf = ClosedForms.of(m);
        String disc = "1 - 10*p + 10*r + 25*p^2 + 50*p*r + 25*r^2 != 0";
        assertTrue(cf.conditions().contains(disc), cf.conditions().toString());
        org.qchain.exact.model.Domain unit = org.qchain.exact.model.Domain.probability();
        assertFalse(cf.conditionsNotProved(Map.of("p", unit, "r", unit)).contains(disc));
        org.qchain.exact.model.Domain closed = new org.qchain.exact.model.Domain(Rational.ZERO, true,
            java.util.Optional.of(Rational.ONE), true);
        assertTrue(cf.conditionsNotProved(Map.of("p", closed, "r", closed)).contains(disc));
    }

    @Test
    void conditionsAreCheckedAgainstTheDomains() {
        org.qchain.exact.model.Domain unit = org.qchain.exact.model.Domain.probability();
        // a + b > 0 on (0, 1)^2: proved by the sign argument
        assertEquals(List.of(), ClosedForms.of(TWO_STATE).conditionsNotProved(Map.of("a", unit, "b", unit)));
        // a domain that contains a + b = 0 (a in (-1, 1)) is not proved
        org.qchain.exact.model.Domain wide = new org.qchain.exact.model.Domain(Rational.of(-1), false,
            java.util.Optional.of(Rational.ONE), false);
        assertEquals(List.of("a + b != 0"), ClosedForms.of(TWO_STATE).conditionsNotProved(Map.of("a", wide, "b", unit)));
        // one parameter, decided exactly by Sturm sequences: 121 - 1400 w + 2500 w^2 has its two roots
        // (14 +- sqrt(75))/50, about 0.107 and 0.453, inside (0, 1) (derived by hand), 14 + 53 w has none
        Model m = Chains.model(List.of("w"), new String[][] {
            {"1 - w", "w", "0"}, {"3/10", "1 - 3/10 - 3/50", "3/50"}, {"1/2", "0", "1/2"}});
        ClosedForm cf = ClosedForms.of(m);
        List<String> open = cf.conditionsNotProved(Map.of("w", unit));
        for (String c : open) {
            assertTrue(cf.conditions().contains(c));
        }
        // every condition that involves w only linearly with positive coefficients is proved
        for (String c : cf.conditions()) {
            if (c.matches("[0-9]+ \\+ [0-9]+\\*w != 0")) {
                assertFalse(open.contains(c), c);
            }
        }
        // a quadratic condition with two roots in (0, 1) is reported; on (1/2, 1) it is proved
        String quad = "1 - 4*w + 3*w^2 != 0"; // (1 - w)(1 - 3w): roots 1/3 and 1
        assertFalse(DomainCheck.holdsThroughout(cf.field(), cf.field().poly.parse("1 - 4*w + 3*w^2"), Map.of("w", unit)),
            quad);
        org.qchain.exact.model.Domain upper = new org.qchain.exact.model.Domain(Rational.of(1, 2), false,
            java.util.Optional.of(Rational.ONE), false);
        assertTrue(DomainCheck.holdsThroughout(cf.field(), cf.field().poly.parse("1 - 4*w + 3*w^2"), Map.of("w", upper)),
            quad + " on (1/2, 1): the root 1 is the open end");
        org.qchain.exact.model.Domain closedUpper = new org.qchain.exact.model.Domain(Rational.of(1, 2), false,
            java.util.Optional.of(Rational.ONE), true);
        assertFalse(DomainCheck.holdsThroughout(cf.field(), cf.field().poly.parse("1 - 4*w + 3*w^2"), Map.of("w", closedUpper)),
            quad + " on (1/2, 1]: fails at 1");
        org.qchain.exact.model.Domain between = new org.qchain.exact.model.Domain(Rational.of(1, 3), false,
            java.util.Optional.of(Rational.ONE), false);
        assertTrue(DomainCheck.holdsThroughout(cf.field(), cf.field().poly.parse("1 - 4*w + 3*w^2"), Map.of("w", between)),
            quad + " on (1/3, 1): both roots are open ends");
        org.qchain.exact.model.Domain closedLower = new org.qchain.exact.model.Domain(Rational.of(1, 3), true,
            java.util.Optional.of(Rational.ONE), false);
        assertFalse(DomainCheck.holdsThroughout(cf.field(), cf.field().poly.parse("1 - 4*w + 3*w^2"), Map.of("w", closedLower)),
            quad + " on [1/3, 1): fails at 1/3");
        assertFalse(DomainCheck.holdsThroughout(cf.field(), cf.field().poly.parse("1 - 4*w + 3*w^2"),
            Map.of("w", org.qchain.exact.model.Domain.positive())), quad + " on (0, inf)");
    }

    @Test
    void theCommandLineTestChainsMatchPowers() {
        // the chains of the CLI's golden tests that no other test here covers (common practice, no source: the check
        // is against exact powers); model text as in cli/src/test/resources/models
        Model stages = org.qchain.exact.model.ModelParser.parse("closed-stages.chain", String.join("\n",
            "chain discrete", "param a in (0, 1) = 1/40", "states Working Diagnosing Fixing",
            "Working Diagnosing a", "Diagnosing Fixing 1/2", "Fixing Working 1/2", ""));
        Chains.assertMatchesPowers(ClosedForms.of(stages), stages, List.of(Chains.at("a", "1/40")), 0);
        Model plant = org.qchain.exact.model.ModelParser.parse("plant.chain", String.join("\n",
            "chain discrete", "param w in (0, 1) = 1/20", "states Up Worn Down",
            "Up Worn w", "Worn Down 3/100", "Worn Up 1/4", "Down Up 1/2", ""));
        Chains.assertMatchesPowers(ClosedForms.of(plant), plant, List.of(Chains.at("w", "1/20"), Chains.at("w", "3/4")), 0);
        Model rounds = org.qchain.exact.model.ModelParser.parse("closed-rounds.chain", String.join("\n",
            "chain discrete", "states Draft1 Revise1 Draft2 Revise2 Archived",
            "Draft1 Revise1 1/4", "Draft1 Draft2 1/8", "Draft1 Archived 1/8",
            "Revise1 Draft1 1/4", "Revise1 Revise2 1/8", "Revise1 Archived 3/8",
            "Draft2 Revise2 1/4", "Draft2 Archived 1/4", "Revise2 Draft2 1/4", "Revise2 Archived 1/2", ""));
        // the same matrix as JordanBlockTest's double quadratic with a Jordan block
        assertEquals(Chains.matrix(Chains.model(List.of(), JordanBlockTest.chained(JordanBlockTest.A2, 2)), Map.of()),
            Chains.matrix(rounds, Map.of()));
        Chains.assertMatchesPowers(ClosedForms.of(rounds), rounds, List.of(Map.of()), 0);
    }
}
