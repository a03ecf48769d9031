package org.qchain.exact.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;

/**
 * The JAS-free identity check of row sums. The identities are school algebra (common practice, no source); the
 * symbolic module's {@code RowSumsAgainstJasTest} checks the same decisions and texts against JAS on random
 * expressions.
 */
class RowSumsTest {
    private static final List<String> AB = List.of("a", "b");

    private static Expr expr(String text) {
        Model m = ModelParser.parse("e.chain", "chain discrete\nparam a\nparam b\nstates X Y\nX Y " + text + "\n");
        return m.transitions().get(0).expr();
    }

    private static Model model(String rows) {
        return ModelParser.parse("m.chain", "chain discrete\nparam a in (0, 1) = 1/2\nparam b in (0, 1) = 1/4\n"
            + "states A B\n" + rows);
    }

    @Test
    void polynomialIdentitiesHold() {
        assertTrue(RowSums.isIdenticallyOne(expr("(1 - a)^2 + 2*a - a^2"), AB));
        assertTrue(RowSums.isIdenticallyOne(expr("(a + b)^3 - a^3 - 3*a^2*b - 3*a*b^2 - b^3 + 1"), AB));
        assertFalse(RowSums.isIdenticallyOne(expr("(1 - a)^2 + 2*a"), AB));
    }

    @Test
    void quotientsAreComparedByCrossProducts() {
        assertTrue(RowSums.isIdenticallyOne(expr("a/(a + b) + b/(b + a)"), AB));
        assertTrue(RowSums.isIdenticallyOne(expr("(a^2 - a)/(a - 1) + 1 - a"), AB));
        assertTrue(RowSums.isIdenticallyOne(expr("1/(1/a) - a + 1"), AB));
        assertTrue(RowSums.isIdenticallyOne(expr("(1 + a)^-2*(1 + a)^2"), AB));
        assertFalse(RowSums.isIdenticallyOne(expr("a/(1 + a) + 1/(1 + b)"), AB));
    }

    @Test
    void theSumIsPrintedInLowestTermsOverItsDivisors() {
        assertEquals("1/2 + a", RowSums.plain(expr("a/(1 + a) + 1/(1 + a) + a - 1/2"), AB));
        assertEquals("(1/2 + 3/2*a)/(1 + a)", RowSums.plain(expr("a/(1 + a) + 1/2"), AB));
        assertEquals("-1/2*a + b^2", RowSums.plain(expr("b^2 - a/2"), AB));
        assertEquals("1/a^2", RowSums.plain(expr("a^-2"), AB));
        assertEquals("(1/2 - 1/2*a)/a", RowSums.plain(expr("1/(2*a) - 1/2"), AB));
        assertEquals("0", RowSums.plain(expr("a/(1 + b) - a/(b + 1)"), AB));
    }

    @Test
    void aRowThatSumsToOneOnlyAtTheNominalPointIsRefusedAtItsLastTransition() {
        Model m = model("A A a\nA B 1/2\nB A 1\n");
        QchainException e = assertThrows(QchainException.class, () -> RowSums.requireIdenticallyOne(m, false));
        assertEquals(ErrorKey.SYMBOLIC_ROW_SUM, e.key());
        assertEquals("m.chain:6:1: row A sums to 1/2 + a, not identically 1", e.getMessage());
    }

    @Test
    void rowsWithTheRemainderOrIdentitiesPass() {
        RowSums.requireIdenticallyOne(model("A B a\nB A b\nB B 1 - b\n"), true);
        RowSums.requireIdenticallyOne(model("A A a*b/(a*b + 1)\nA B 1/(1 + a*b)\nB A 1\n"), true);
    }

    @Test
    void constantRowsAreCheckedOnlyWhenAsked() {
        Model m = model("A B a\nB A 1/2\nB B 1/4\n");
        RowSums.requireIdenticallyOne(m, false);
        QchainException e = assertThrows(QchainException.class, () -> RowSums.requireIdenticallyOne(m, true));
        assertEquals("m.chain:7:1: row B sums to 3/4, not identically 1", e.getMessage());
    }

    @Test
    void aPowerInOneVariableIsEstimatedByThatVariableAlone() {
        // (1 - a)^400 has 401 terms; counted as if b also occurred it would be C(402, 2) = 80601 (and refused
        // in a ring of three variables)
        List<String> abc = List.of("a", "b", "c");
        assertTrue(RowSums.isIdenticallyOne(expr("(1 - a)^400 - (1 - a)^200*(1 - a)^200 + 1"), abc));
    }

    @Test
    void aLongSumIsShortenedInTheMessage() {
        Model m = model("A A (1 + a)^100\nA B 1/2\nB A 1\n");
        QchainException e = assertThrows(QchainException.class, () -> RowSums.requireIdenticallyOne(m, true));
        // (1 + a)^100 + 1/2 has 101 terms; binomial coefficients C(100, k) (common practice, no source)
        assertTrue(e.getMessage().startsWith("m.chain:6:1: row A sums to 3/2 + 100*a + 4950*a^2 + 161700*a^3"),
            e.getMessage());
        assertTrue(e.getMessage().endsWith(" ... (101 terms, " + RowSums.plain(
            expr("(1 + a)^100 + 1/2"), AB).length() + " characters), not identically 1"), e.getMessage());
        assertTrue(e.getMessage().length() < 200, e.getMessage());
    }

    @Test
    void aDivisionByAnIdenticallyZeroExpressionIsLocated() {
        Model m = model("A A a/(a - a)\nA B 1/2\nB A 1\n");
        QchainException e = assertThrows(QchainException.class, () -> RowSums.requireIdenticallyOne(m, true));
        assertEquals(ErrorKey.DIVISION_BY_ZERO, e.key());
        assertTrue(e.getMessage().startsWith("m.chain:5:6: "), e.getMessage());
    }

    @Test
    void aPowerOfTooHighADegreeIsRefusedAtThePower() {
        Model m = model("A A (1 - a)^20000\nA B 1/2\nB A 1\n");
        QchainException e = assertThrows(QchainException.class, () -> RowSums.requireIdenticallyOne(m, true));
        assertEquals(ErrorKey.SYMBOLIC_POWER_TOO_LARGE, e.key());
    }

    @Test
    void aHugeExpansionIsRefusedWithItsEstimateBeforeItRuns() {
        // (1 + a + b)^3000 has 4.5 million terms: refused from the estimate before its first product
        Model m = model("A A (1 + a + b)^3000\nA B 1/2\nB A 1\n");
        QchainException e = assertThrows(QchainException.class, () -> RowSums.requireIdenticallyOne(m, true));
        assertEquals(ErrorKey.ROW_SUM_CHECK_TOO_LARGE, e.key());
        assertTrue(e.getMessage().startsWith("m.chain:6:1: checking that row A sums to 1 identically"),
            e.getMessage());
    }
}
