package org.qchain.symbolic;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.qchain.exact.Rational;
import org.qchain.exact.model.Domain;

/**
 * Sign proofs on boxes. Each case is decided by hand (common practice, no source: completing the square, the
 * values at a root); the random property checks soundness: whatever is proved holds at sample points.
 */
class BoxSignTest {
    private static final Domain OPEN = Domain.probability();
    private static final Domain CLOSED = new Domain(Rational.ZERO, true, Optional.of(Rational.ONE), true);
    private static final Domain RATE = Domain.positive();

    /** Terms from pairs (coefficient, exponents...). */
    private static Map<List<Integer>, Rational> poly(Object... t) {
        Map<List<Integer>, Rational> m = new HashMap<>();
        int k = 0;
        while (k < t.length) {
            Rational c = Rational.parse((String) t[k]);
            int[] e = (int[]) t[k + 1];
            m.merge(java.util.Arrays.stream(e).boxed().toList(), c, Rational::add);
            k += 2;
        }
        return m;
    }

    private static int[] e(int... x) {
        return x;
    }

    @Test
    void sumOfPositiveTermsIsPositiveInsideButNotAtAClosedCorner() {
        Map<List<Integer>, Rational> sum = poly("1", e(1, 0), "1", e(0, 1));
        assertTrue(BoxSign.positive(sum, List.of(OPEN, OPEN)));
        assertFalse(BoxSign.positive(sum, List.of(CLOSED, CLOSED))); // 0 at p = q = 0
        assertTrue(BoxSign.positive(sum, List.of(CLOSED, OPEN)));
    }

    @Test
    void mixedSignsProvedBySubdivision() {
        // (p - 1/2)^2 + (q - 1/3)^2 + 1/1000 > 0; without the 1/1000 it is 0 at (1/2, 1/3)
        Map<List<Integer>, Rational> pos = poly("1", e(2, 0), "-1", e(1, 0), "1/4", e(0, 0), "1", e(0, 2),
            "-2/3", e(0, 1), "1/9", e(0, 0), "1/1000", e(0, 0));
        assertTrue(BoxSign.positive(pos, List.of(CLOSED, CLOSED)));
        Map<List<Integer>, Rational> zero = poly("1", e(2, 0), "-1", e(1, 0), "1/4", e(0, 0), "1", e(0, 2),
            "-2/3", e(0, 1), "1/9", e(0, 0));
        assertFalse(BoxSign.nonZero(zero, List.of(OPEN, OPEN)));
        // (p - 1/2)^2 + (q - 1/4)^2 >= 0 with its zero on a corner of the halvings: proved; a zero at (1/2, 1/3) is
        // never a corner, so that bound is not shown (the method is sound, not complete)
        assertTrue(BoxSign.nonNegative(poly("1", e(2, 0), "-1", e(1, 0), "1/4", e(0, 0), "1", e(0, 2),
            "-1/2", e(0, 1), "1/16", e(0, 0)), List.of(CLOSED, CLOSED)));
        // 4 p (1 - p) >= 0 on [0, 1], a bound attained at both ends
        assertTrue(BoxSign.nonNegative(poly("4", e(1), "-4", e(2)), List.of(CLOSED)));
        assertFalse(BoxSign.positive(poly("4", e(1), "-4", e(2)), List.of(CLOSED)));
        assertTrue(BoxSign.positive(poly("4", e(1), "-4", e(2)), List.of(OPEN)));
    }

    @Test
    void unboundedDomains() {
        // 1 - x + x^2 = (x - 1/2)^2 + 3/4 > 0 for x > 0; x^2 - 2 has the root sqrt(2) > 0
        assertTrue(BoxSign.positive(poly("1", e(0), "-1", e(1), "1", e(2)), List.of(RATE)));
        assertFalse(BoxSign.nonZero(poly("-2", e(0), "1", e(2)), List.of(RATE)));
        // p/10 + 11 q/10 >= 0 for p in [0, 1], q > 0
        assertTrue(BoxSign.nonNegative(poly("1/10", e(1, 0), "11/10", e(0, 1)), List.of(CLOSED, RATE)));
    }

    @Test
    void whateverIsProvedHoldsAtSamplePoints() {
        Random rnd = new Random(8);
        List<Domain> doms = List.of(OPEN, CLOSED);
        for (int trial = 0; trial < 200; trial++) {
            Map<List<Integer>, Rational> p = new HashMap<>();
            for (int t = 0; t < 4; t++) {
                p.merge(List.of(rnd.nextInt(3), rnd.nextInt(3)), Rational.of(rnd.nextInt(9) - 3, 1 + rnd.nextInt(4)),
                    Rational::add);
            }
            boolean positive = BoxSign.positive(p, doms);
            boolean nonNeg = BoxSign.nonNegative(p, doms);
            for (int s = 0; s < 30; s++) {
                Rational x = Rational.of(1 + rnd.nextInt(99), 100);
                Rational y = Rational.of(rnd.nextInt(101), 100);
                Rational v = Rational.ZERO;
                for (Map.Entry<List<Integer>, Rational> t : p.entrySet()) {
                    v = v.add(t.getValue().multiply(x.pow(t.getKey().get(0))).multiply(y.pow(t.getKey().get(1))));
                }
                if (positive) {
                    assertTrue(v.signum() > 0, p + " at " + x + ", " + y);
                }
                if (nonNeg) {
                    assertTrue(v.signum() >= 0, p + " at " + x + ", " + y);
                }
            }
        }
    }
}
