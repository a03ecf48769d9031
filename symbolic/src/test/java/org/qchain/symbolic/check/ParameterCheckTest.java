package org.qchain.symbolic.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.model.Domain;
import org.qchain.exact.model.Model;
import org.qchain.exact.model.ParamDecl;
import org.qchain.symbolic.TestChains;

/**
 * Row sums as identities and the range of entries over parameter boxes. Source: common practice, no source (a
 * multilinear polynomial attains its extremes over a box at the corners; interval arithmetic encloses ranges).
 */
class ParameterCheckTest {
    private static Model pump(Rational p, Rational r) {
        List<ParamDecl> ps = List.of(TestChains.param("p", Domain.probability(), p),
            TestChains.param("r", Domain.probability(), r));
        // Up Worn Down: Worn goes to Down with p and back to Up with r; Worn->Worn is the remainder 1 - p - r
        return TestChains.discrete(ps, new String[][] {{"*", "p", "0"}, {"r", "*", "p"}, {"1/2", "0", "*"}}, true);
    }

    @Test
    void remainderThatCanGoNegativeIsAWarningWhenTheNominalValuesSatisfyTheCondition() {
        CheckReport rep = ParameterCheck.check(pump(Rational.of(1, 20), Rational.of(1, 4)));
        assertEquals(List.of(), rep.errors());
        assertEquals(1, rep.warnings().size());
        Finding f = rep.warnings().get(0);
        assertEquals(ErrorKey.SYMBOLIC_RANGE, f.key());
        assertEquals("S1->S1 is 1 - p - r: needs p + r <= 1; fails near p=1, r=1 (a corner of the domain);"
            + " holds at p=1/20, r=1/4 (nominal values)", f.message());
        assertEquals("p + r <= 1", f.condition());
        assertTrue(f.decided());
        assertEquals(Optional.of(Map.of("p", Rational.ONE, "r", Rational.ONE)), f.witness());
    }

    @Test
    void nominalValuesThatBreakTheConditionAreAnError() {
        CheckReport rep = ParameterCheck.check(pump(Rational.of(1, 2), Rational.of(3, 4)));
        assertEquals(1, rep.errors().size());
        assertTrue(rep.errors().get(0).message().endsWith("the values p=1/2, r=3/4 (nominal values) break it"
            + " (S1->S1 = -1/4)"), rep.errors().get(0).message());
        QchainException e = assertThrows(QchainException.class, rep::throwIfErrors);
        assertEquals(ErrorKey.SYMBOLIC_RANGE, e.key());
    }

    // regression (issue 8): values given with --at were called "the nominal values"; the message names the origin
    @Test
    void theMessageNamesWhereTheValuesCameFrom() {
        Model m = pump(Rational.of(1, 20), Rational.of(1, 4));
        var at = ParameterCheck.check(m, org.qchain.symbolic.RatFunMatrix.fromModel(m),
            Map.of("p", Rational.of(1, 10), "r", Rational.of(1, 5)), java.util.Set.of("p", "r"));
        assertTrue(at.warnings().get(0).message().endsWith("; holds at p=1/10, r=1/5 (given with --at)"),
            at.warnings().get(0).message());
        var mixed = ParameterCheck.check(m, org.qchain.symbolic.RatFunMatrix.fromModel(m),
            Map.of("p", Rational.of(1, 20), "r", Rational.of(1, 5)), java.util.Set.of("r"));
        assertTrue(mixed.warnings().get(0).message().endsWith("; holds at p=1/20, r=1/5 (r given with --at, p"
            + " nominal)"), mixed.warnings().get(0).message());
        var broken = ParameterCheck.check(m, org.qchain.symbolic.RatFunMatrix.fromModel(m),
            Map.of("p", Rational.of(1, 20), "r", Rational.ONE), java.util.Set.of("r"));
        assertTrue(broken.errors().get(0).message().endsWith("the values p=1/20, r=1 (r given with --at, p nominal)"
            + " break it (S1->S1 = -1/20)"), broken.errors().get(0).message());
    }

    @Test
    void freeParametersGiveAWarningWithTheCondition() {
        Model m = TestChains.discrete(List.of("p", "r"), new String[][] {{"*", "p", "0"}, {"r", "*", "p"}, {"1/2", "0", "*"}});
        CheckReport rep = ParameterCheck.check(m);
        assertEquals(1, rep.warnings().size());
        assertTrue(rep.warnings().get(0).message().endsWith("; results hold only where it does"));
    }

    @Test
    void entriesThatStayInsideTheBoxGiveNoFinding() {
        // 4 p (1 - p) <= 1 on [0, 1] with equality at 1/2, and >= 0 with equality at the ends: proven by monotonicity
        Model m = TestChains.discrete(List.of("p", "q"), new String[][] {{"*", "4*p*(1 - p)"}, {"q/(1 + q)", "*"}});
        CheckReport rep = ParameterCheck.check(m);
        assertEquals(List.of(), rep.findings(), () -> rep.findings().toString());
    }

    @Test
    void nonLinearEntryThatLeavesTheRangeIsFoundWithAnInteriorWitness() {
        // 2 p (1 - p) + p: at p = 3/4 it is 3/8 + 3/4 = 9/8 > 1 (by hand)
        Model m = TestChains.discrete(List.of("p"), new String[][] {{"*", "2*p*(1 - p) + p"}, {"1/2", "*"}});
        CheckReport rep = ParameterCheck.check(m);
        assertEquals(2, rep.warnings().size(), () -> rep.findings().toString()); // S0->S1 > 1 and S0->S0 < 0
        Finding f = rep.warnings().get(0);
        assertTrue(f.decided());
        Rational at = f.witness().orElseThrow().get("p");
        Rational value = Rational.of(3).multiply(at).subtract(Rational.of(2).multiply(at).multiply(at));
        assertTrue(value.compareTo(Rational.ONE) > 0, "witness " + at + " gives " + value);
    }

    @Test
    void unboundedDomainIsProvedNowWhereItHolds() {
        // k/(1 + k) and 1/(1 + k) lie in [0, 1] for every k > 0 (common practice, no source); this was once
        // "could not decide" (unbounded domain), Bernstein coefficients after x = y/(1 - y) prove it (issue 8)
        Domain positive = Domain.positive();
        List<ParamDecl> ps = List.of(TestChains.param("k", positive, Rational.of(1, 10)));
        Model m = TestChains.discrete(ps, new String[][] {{"*", "k/(1 + k)"}, {"1/2", "*"}}, true);
        CheckReport rep = ParameterCheck.check(m);
        assertEquals(List.of(), rep.findings());
    }

    @Test
    void unboundedDomainThatFailsStaysAFinding() {
        // 2k/(1 + k) exceeds 1 for k > 1: refuted at a sample point, so never "holds"
        List<ParamDecl> ps = List.of(TestChains.param("k", Domain.positive(), Rational.of(1, 10)));
        Model m = TestChains.discrete(ps, new String[][] {{"*", "2*k/(1 + k)"}, {"1/2", "*"}}, true);
        CheckReport rep = ParameterCheck.check(m);
        assertTrue(!rep.findings().isEmpty(), rep.findings().toString());
    }

    @Test
    void aRowThatDoesNotSumToOneIdenticallyIsAnError() {
        // all entries listed, the diagonal too: (1 - p) + p/2 + 0 is not 1
        Model m = TestChains.discrete(List.of("p"), new String[][] {{"1 - p", "p/2"}, {"1/2", "1/2"}});
        CheckReport rep = ParameterCheck.check(m);
        assertEquals(1, rep.errors().size());
        assertEquals(ErrorKey.SYMBOLIC_ROW_SUM, rep.errors().get(0).key());
        assertEquals("row S0 sums to 1 - 1/2*p, not identically 1", rep.errors().get(0).message());
    }

    @Test
    void pointsAreCheckedAgainstTheDomains() {
        Model m = pump(Rational.of(1, 20), Rational.of(1, 4));
        assertEquals(Map.of("p", Rational.of(1, 10), "r", Rational.of(1, 4)),
            ParamPoints.resolve(m, Map.of("p", Rational.of(1, 10))));
        QchainException out = assertThrows(QchainException.class,
            () -> ParamPoints.resolve(m, Map.of("p", Rational.of(3, 2))));
        assertEquals(ErrorKey.VALUE_OUTSIDE_DOMAIN, out.key());
        assertEquals("value 3/2 of parameter 'p' is outside its domain (0, 1)", out.getMessage());
        QchainException unknown = assertThrows(QchainException.class,
            () -> ParamPoints.resolve(m, Map.of("z", Rational.of(1, 2))));
        assertEquals(ErrorKey.BAD_ARGUMENT, unknown.key());
    }

    @Test
    void boundsThatHoldOnUnboundedAndOpenBoxesAreProved() {
        // regression (issue 8): these held but were "not shown"; decided by hand (common practice, no source: a sum
        // of non-negative terms; 1 - x + x^2 = (x - 1/2)^2 + 3/4)
        org.qchain.symbolic.ParamRing ring = org.qchain.symbolic.ParamRing.of(List.of("p", "q"));
        Domain unit = new Domain(Rational.ZERO, true, Optional.of(Rational.ONE), true);
        Map<String, Domain> doms = Map.of("p", unit, "q", Domain.positive());
        assertEquals(Verdict.Kind.HOLDS, RangeProver.nonNegative(ring.fromExpr(
            org.qchain.exact.model.ModelParser.parseExpression("t", "p/10 + 11*q/10")), doms).kind());
        assertEquals(Verdict.Kind.HOLDS, RangeProver.nonNegative(ring.fromExpr(
            org.qchain.exact.model.ModelParser.parseExpression("t", "(1 - q + q^2)/(1 + p*q)")), doms).kind());
        // and one that fails stays refuted: 1 - 2q < 0 for q > 1/2
        assertTrue(RangeProver.nonNegative(ring.fromExpr(
            org.qchain.exact.model.ModelParser.parseExpression("t", "1 - 2*q")), doms).kind() != Verdict.Kind.HOLDS);
    }
}
