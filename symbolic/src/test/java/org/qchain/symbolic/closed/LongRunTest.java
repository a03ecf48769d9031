package org.qchain.symbolic.closed;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.model.Domain;
import org.qchain.exact.model.Model;

/** The long-run statement of a closed form: periods, special points of closed domains, the rate (issue 8). */
class LongRunTest {
    private static final Domain OPEN = Domain.probability();
    private static final Domain CLOSED = new Domain(Rational.ZERO, true, Optional.of(Rational.ONE), true);

    /** The standard two-state chain (Grinstead and Snell, Introduction to Probability, ch. 11, from memory). */
    private static final Model TWO = Chains.model(List.of("p", "r"), new String[][] {{"1-p", "p"}, {"r", "1-r"}});

    @Test
    void closedDomainsStateThePeriodicCorner() {
        ClosedForm cf = ClosedForms.of(TWO);
        LongRun lr = cf.longRun();
        assertEquals(1, lr.period());
        // the eigenvalue 1 - p - r is -1 at p = r = 1 (the chain then swaps its states every step); 1 - p - r = 1
        // means p + r = 0, already a condition of the formulas
        assertEquals(List.of("1 - p - r != -1"), lr.conditions());
        assertEquals(List.of(), cf.longRunNotProved(Map.of("p", OPEN, "r", OPEN)));
        assertEquals(List.of("1 - p - r != -1"), cf.longRunNotProved(Map.of("p", CLOSED, "r", CLOSED)));
        assertEquals(List.of(Chains.at("p", "0", "r", "0"), Chains.at("p", "1", "r", "1")),
            cf.specialCorners(Map.of("p", CLOSED, "r", CLOSED)));
        // and at p = r = 1 the exact powers do alternate: P^(2m) = I, P^(2m+1) = P != I (common practice, no source)
        List<RationalMatrix> pw = Chains.powers(Chains.matrix(TWO, Chains.at("p", "1", "r", "1")), 5);
        assertEquals(RationalMatrix.identity(2), pw.get(4));
        assertNotEquals(pw.get(4), pw.get(5));
    }

    @Test
    void onlyTheFormulasConditionsOnOpenDomains() {
        // a 3-state cycle with a pause: 3-cycles would need p = q = 1, outside (0, 1)
        ClosedForm cf = ClosedForms.of(Chains.model(List.of("p", "q"), new String[][] {
            {"1-p", "p", "0"}, {"0", "1-p", "p"}, {"q", "0", "1-q"}}));
        assertEquals(List.of(), cf.longRunNotProved(Map.of("p", OPEN, "q", OPEN)));
        assertTrue(cf.specialCorners(Map.of("p", CLOSED, "q", CLOSED)).contains(Chains.at("p", "1", "q", "1")));
        // at p = q = 1 the chain is the cyclic permutation: P^3 = I (common practice, no source)
        List<RationalMatrix> pw = Chains.powers(Chains.matrix(cf.states().size() == 3 ? Chains.model(List.of("p", "q"),
            new String[][] {{"1-p", "p", "0"}, {"0", "1-p", "p"}, {"q", "0", "1-q"}}) : null,
            Chains.at("p", "1", "q", "1")), 3);
        assertEquals(RationalMatrix.identity(3), pw.get(3));
    }

    @Test
    void periodThreeSaysPeriodicAndExactNotRateZeroOfTheWholeChain() {
        // the cyclic permutation of three states: eigenvalues 1 and the primitive cube roots of unity, all of
        // modulus 1; P^n repeats with period 3 from n = 0 (common practice, no source)
        Model m = Chains.model(List.of(), new String[][] {{"0", "1", "0"}, {"0", "0", "1"}, {"1", "0", "0"}});
        ClosedForm cf = ClosedForms.of(m);
        LongRun lr = cf.longRun();
        assertEquals(3, lr.period());
        assertTrue(lr.periodic());
        assertTrue(lr.exact());
        assertEquals(0, lr.exactFrom());
        assertEquals(List.of(), lr.conditions());
        List<RationalMatrix> pw = Chains.powers(Chains.matrix(m, Map.of()), 2);
        for (int r = 0; r < 3; r++) {
            for (int i = 0; i < 3; i++) {
                for (int j = 0; j < 3; j++) {
                    assertEquals(pw.get(r).get(i, j).toString(), lr.limits().get(r).get(i).get(j));
                }
            }
        }
    }

    @Test
    void periodTwoWithADampedPartIsNotExact() {
        // bipartite chain {A, B} <-> {C, D}: eigenvalues 1, -1 and two inside the unit circle (derived by hand:
        // P^2 restricted to {A, B} has eigenvalues 1 and 1/12)
        Model m = Chains.model(List.of(), new String[][] {
            {"0", "0", "1/2", "1/2"}, {"0", "0", "1/4", "3/4"}, {"1/3", "2/3", "0", "0"}, {"1", "0", "0", "0"}});
        LongRun lr = ClosedForms.of(m).longRun();
        assertEquals(2, lr.period());
        assertFalse(lr.exact());
        assertNotEquals("0", lr.rate());
    }
}
