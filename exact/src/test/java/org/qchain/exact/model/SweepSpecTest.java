package org.qchain.exact.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.qchain.exact.model.ModelErrorsTest.expect;

import org.junit.jupiter.api.Test;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;

/**
 * Sweeps in the model file's interval syntax (docs/model-format.md). The point counts are arithmetic facts, common
 * practice, no source: the multiples of h in [a, b] number floor((b - a) / h) + 1.
 */
class SweepSpecTest {

    private static SweepSpec read(String text) {
        return ModelParser.parseSweep("--sweep", text);
    }

    private static Rational r(String s) {
        return Rational.parse(s);
    }

    @Test
    void byStepOverAClosedIntervalIncludesBothEnds() {
        SweepSpec s = read("p in [0, 1/10] by 1/100");
        assertEquals("p", s.parameter());
        assertEquals(11, s.count());
        assertEquals(r("0"), s.first());
        assertEquals(r("1/10"), s.last());
        assertEquals(r("3/100"), s.point(3));
        assertEquals("p in [0, 1/10] by 1/100", s.toString());
    }

    @Test
    void byStepLeavesOutOpenEnds() {
        SweepSpec s = read("p in (0, 1/10) by 0.01");
        assertEquals(9, s.count());
        assertEquals(r("1/100"), s.first());
        assertEquals(r("9/100"), s.last());
        // a step that does not divide the width stops below the upper end
        SweepSpec t = read("r in [0, 1] by 3/10");
        assertEquals(4, t.count());
        assertEquals(r("9/10"), t.last());
    }

    @Test
    void withPointsSpacesThemEqually() {
        SweepSpec s = read("p in [0, 1/10] with 11 points");
        assertEquals(11, s.count());
        assertEquals(r("1/100"), s.step());
        assertEquals(r("1/10"), s.last());
        SweepSpec open = read("p in (0, 1) with 9 points");
        assertEquals(r("1/10"), open.first());
        assertEquals(r("9/10"), open.last());
        SweepSpec half = read("p in (0, 1] with 4 points");
        assertEquals(r("1/4"), half.first());
        assertEquals(r("1"), half.last());
        assertEquals(1, read("p in [1/3, 1/3] with 1 point").count());
    }

    @Test
    void endsAndStepAreConstantsAsInAParamLine() {
        SweepSpec s = read("lam in [1/2, 2*0.75] by 1e-1");
        assertEquals(r("1/2"), s.first());
        assertEquals(11, s.count());
    }

    @Test
    void badSweepsAreLocatedInTheOptionText() {
        QchainException old = assertThrows(QchainException.class, () -> read("p=0:1/100:1/10"));
        assertEquals("invalid sweep 'p=0:1/100:1/10': write it as 'p in [0, 1/10] by 1/100'",
            old.getMessage());
        expect(ErrorKey.SYNTAX, 1, 3, () -> read("p on [0, 1] by 1/10"));
        expect(ErrorKey.SYNTAX, 1, 13, () -> read("p in [0, 1] step 1/10"));
        expect(ErrorKey.BAD_DOMAIN, 1, 6, () -> read("p in [1, 0] by 1/10"));
        expect(ErrorKey.SYNTAX, 1, 18, () -> read("p in [0, 1] with 2.5 points"));
        expect(ErrorKey.SYNTAX, 1, 16, () -> read("p in [0, 1] by 1e99999999999"));
        expect(ErrorKey.SWEEP, 1, 3, () -> read("p in [0, inf) by 1"));
        assertEquals(ErrorKey.SWEEP, assertThrows(QchainException.class, () -> read("p in [0, 1] by -1/10")).key());
        assertEquals(ErrorKey.SWEEP, assertThrows(QchainException.class, () -> read("p in [0, 1] with 1 point")).key());
        assertEquals(ErrorKey.SWEEP, assertThrows(QchainException.class, () -> read("p in (0, 1/10) by 1/10")).key());
    }

    @Test
    void aHugeCountIsCountedNotListed() {
        SweepSpec s = read("p in [0, 1] by 1e-10000");
        assertEquals(Long.MAX_VALUE, s.count());
        assertEquals(Long.MAX_VALUE, read("p in [0, 1] with 99999999999999999999999 points").count());
    }
}
