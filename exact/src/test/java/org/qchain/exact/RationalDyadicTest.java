package org.qchain.exact;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.math.BigInteger;
import java.util.Random;
import org.junit.jupiter.api.Test;

/** {@link Rational#dyadic}: the same value as the general factory, which reduces by the gcd. */
class RationalDyadicTest {
    @Test
    void agreesWithTheGcdReducedFraction() {
        // Common practice, no source: p / 2^w in lowest terms has the odd part of p over the remaining power of two.
        Random rnd = new Random(20261202L);
        for (int k = 0; k < 2000; k++) {
            BigInteger p = new BigInteger(1 + rnd.nextInt(300), rnd).shiftLeft(rnd.nextInt(40));
            if (rnd.nextBoolean()) {
                p = p.negate();
            }
            int w = rnd.nextInt(320);
            Rational expected = Rational.of(p, BigInteger.ONE.shiftLeft(w));
            Rational got = Rational.dyadic(p, w);
            assertEquals(expected, got, p + " / 2^" + w);
            assertEquals(expected.numerator(), got.numerator());
            assertEquals(expected.denominator(), got.denominator());
        }
        assertEquals(Rational.ONE, Rational.dyadic(BigInteger.ONE.shiftLeft(7), 7));
        assertEquals(Rational.ZERO, Rational.dyadic(BigInteger.ZERO, 9));
        assertThrows(IllegalArgumentException.class, () -> Rational.dyadic(BigInteger.ONE, -1));
    }
}
