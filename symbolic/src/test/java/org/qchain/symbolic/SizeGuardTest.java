package org.qchain.symbolic;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.model.Model;

/**
 * The size estimate bounds the real result; large powers are refused by the estimate's decision before any work, and
 * the engine asserts that the decision ran.
 */
class SizeGuardTest {
    private final Model birthDeath = TestChains.discrete(List.of("a", "b"), new String[][] {
        {"*", "a", "0"}, {"b", "*", "a"}, {"0", "b", "*"}});
    private final RatFunMatrix p = RatFunMatrix.fromModel(birthDeath);

    @Test
    void estimateIsAnUpperBoundOfTheTermCount() {
        // common practice, no source: a polynomial of total degree D in k variables has at most C(D + k, k) terms
        for (int n : new int[] {1, 2, 5, 10, 20}) {
            RatFunMatrix pn = p.power(n);
            long terms = 0;
            for (int i = 0; i < 3; i++) {
                for (int j = 0; j < 3; j++) {
                    terms += pn.get(i, j).numerator().termCount();
                }
            }
            PowerEstimate e = p.estimatePower(n);
            assertTrue(terms <= e.totalTerms(), n + ": " + terms + " > " + e);
            assertEquals(n, e.degree());
        }
        assertEquals(9L * 231, p.estimatePower(20).totalTerms()); // C(22, 2) = 231 per entry
    }

    @Test
    void digitEstimateBoundsTheCoefficientDigits() {
        // each coefficient of A^n is a sum of at most (sT)^n products of n coefficients (common practice, no source)
        for (int n : new int[] {1, 5, 20, 40}) {
            RatFunMatrix pn = p.power(n);
            long digits = 0;
            for (int i = 0; i < 3; i++) {
                for (int j = 0; j < 3; j++) {
                    for (Poly.Term t : pn.get(i, j).numerator().terms()) {
                        digits += t.coefficient().numerator().abs().toString().length()
                            + t.coefficient().denominator().toString().length();
                    }
                }
            }
            PowerEstimate e = p.estimatePower(n);
            assertTrue(digits <= e.digits(), n + ": " + digits + " digits > " + e);
        }
        SymbolicLimits few = new SymbolicLimits(1_000_000, 1000);
        QchainException e = assertThrows(QchainException.class, () -> p.estimatePower(40).requireWithin(few));
        assertEquals(ErrorKey.SYMBOLIC_DIGITS_TOO_LARGE, e.key());
        // the engine itself only asserts that the guard ran
        assertThrows(IllegalStateException.class, () -> p.power(40, few, x -> { }));
        assertTrue(e.getMessage().endsWith("more than the limit 1000; raise it with --max-digits"), e.getMessage());
    }

    @Test
    void powersPastTheLimitAreRefusedWithTheEstimate() {
        QchainException e = assertThrows(QchainException.class,
            () -> p.estimatePower(20).requireWithin(new SymbolicLimits(1000)));
        assertEquals(ErrorKey.SYMBOLIC_TOO_LARGE, e.key());
        assertThrows(IllegalStateException.class, () -> p.power(20, new SymbolicLimits(1000), x -> { }));
        assertThrows(IllegalStateException.class, () -> p.powerRow(0, 60, new SymbolicLimits(1000), x -> { }));
        assertEquals("the symbolic P^20 would have up to about 2079 polynomial terms in total (entries of degree up to 20),"
            + " more than the limit 1000; raise it with --max-terms", e.getMessage());
        assertThrows(QchainException.class, () -> p.power(100_000_000L));
        assertEquals(ErrorKey.BAD_ARGUMENT, assertThrows(QchainException.class, () -> p.power(-1)).key());
    }
}
