package org.qchain.exact.floats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.qchain.exact.Rational;

/**
 * Correct rounding to binary64 (IEEE 754-2019, clause 4.3.1 roundTiesToEven, 7.4 overflow, 7.5 subnormals), checked
 * against the reference behaviour of the Java platform: {@code Double.parseDouble} is specified to round correctly
 * (Java SE 17 API, {@code Double.valueOf(String)}), as is IEEE division of doubles (JLS §15.17.2).
 */
class Binary64Test {

    private static Rational exactDecimal(BigDecimal d) {
        return Rational.of(d);
    }

    /** A random finite positive double from random bits. */
    private static double randomDouble(Random rnd) {
        while (true) {
            double d = Double.longBitsToDouble(rnd.nextLong() & Long.MAX_VALUE);
            if (Double.isFinite(d) && d != 0) {
                return d;
            }
        }
    }

    // reference library behaviour: Double.parseDouble rounds a decimal string correctly (Java SE 17 API docs)
    @Test
    void randomDecimalsRoundAsParseDouble() {
        Random rnd = new Random(20261202);
        for (int k = 0; k < 5_000; k++) {
            int digits = 1 + rnd.nextInt(30);
            StringBuilder sb = new StringBuilder(rnd.nextBoolean() ? "-" : "");
            sb.append(1 + rnd.nextInt(9));
            for (int i = 1; i < digits; i++) {
                sb.append(rnd.nextInt(10));
            }
            sb.append('e').append(rnd.nextInt(660) - 340);
            String s = sb.toString();
            assertEquals(Double.parseDouble(s), Binary64.round(Rational.parse(s)), s);
        }
    }

    // IEEE 754-2019 4.3.1 roundTiesToEven: exactly half-way between two doubles goes to the even significand; the
    // expected values come from Double.parseDouble and BigDecimal.doubleValue (reference library behaviour) on the
    // exact decimal expansion of the midpoint, and a nudge of 10^-1100 either way leaves the tie
    @Test
    void halfwayCasesGoToEvenAsTheJavaLibrariesDo() {
        Random rnd = new Random(11);
        BigDecimal nudge = BigDecimal.ONE.movePointLeft(1100);
        for (int k = 0; k < 800; k++) {
            double d = k < 100 ? Double.longBitsToDouble(rnd.nextInt(1 << 20)) : randomDouble(rnd);
            if (d == Double.MAX_VALUE) {
                continue;
            }
            double up = Math.nextUp(d);
            BigDecimal mid = new BigDecimal(d).add(new BigDecimal(up)).divide(BigDecimal.valueOf(2));
            double even = (Double.doubleToRawLongBits(d) & 1) == 0 ? d : up;
            assertEquals(even, Binary64.round(exactDecimal(mid)), mid.toString());
            assertEquals(Double.parseDouble(mid.toString()), Binary64.round(exactDecimal(mid)));
            assertEquals(mid.doubleValue(), Binary64.round(exactDecimal(mid)));
            assertEquals(up, Binary64.round(exactDecimal(mid.add(nudge))));
            assertEquals(d, Binary64.round(exactDecimal(mid.subtract(nudge))));
            assertEquals(-even, Binary64.round(exactDecimal(mid.negate())));
        }
    }

    // JLS §15.17.2: the quotient of two doubles is the correctly rounded IEEE 754 quotient
    @Test
    void smallFractionsRoundAsDoubleDivision() {
        Random rnd = new Random(5);
        for (int k = 0; k < 5_000; k++) {
            long p = rnd.nextLong() >> rnd.nextInt(63);
            long q = (rnd.nextLong() >>> rnd.nextInt(63)) | 1;
            p >>= 11;
            q >>= 11;
            if (q == 0 || p == 0) {
                continue; // 0/q is the exact zero, +0.0, where double division keeps the sign of a negative q
            }
            assertEquals((double) p / (double) q, Binary64.round(Rational.of(p, q)), p + "/" + q);
            assertEquals((double) p / (double) q, Binary64.round(BigInteger.valueOf(p * 3), BigInteger.valueOf(q * 3)));
        }
    }

    // IEEE 754-2019 clause 7.5 (subnormals) with ties to even: 2^-1075 is half of the smallest subnormal
    @Test
    void subnormalsAndUnderflow() {
        Rational min = Rational.of(BigInteger.ONE, BigInteger.TWO.pow(1074));
        assertEquals(Double.MIN_VALUE, Binary64.round(min));
        assertEquals(0.0, Binary64.round(min.divide(Rational.of(2))), "a tie goes to the even zero");
        assertEquals(Double.MIN_VALUE, Binary64.round(min.multiply(Rational.of(3, 4))));
        assertEquals(2 * Double.MIN_VALUE, Binary64.round(min.multiply(Rational.of(3, 2))), "tie to even 2");
        assertEquals(0.0, Binary64.round(min.multiply(Rational.of(1, 3))));
        assertEquals(Double.doubleToRawLongBits(-0.0),
            Double.doubleToRawLongBits(Binary64.round(min.multiply(Rational.of(-1, 3)))), "a negative underflow is -0");
        Rational minNormal = Binary64.exact(Double.MIN_NORMAL);
        assertEquals(Double.MIN_NORMAL, Binary64.round(minNormal));
        assertEquals(Math.nextDown(Double.MIN_NORMAL), Binary64.round(minNormal.subtract(min)));
        Rational tiny = Rational.of(BigInteger.ONE, BigInteger.TEN.pow(5000));
        assertEquals(0.0, Binary64.round(tiny));
    }

    // IEEE 754-2019 clause 7.4: overflow gives infinity once the rounded value would reach 2^1024
    @Test
    void overflowToInfinity() {
        Rational max = Binary64.exact(Double.MAX_VALUE);
        Rational halfUlp = Rational.of(BigInteger.TWO.pow(970));
        assertEquals(Double.MAX_VALUE, Binary64.round(max));
        assertEquals(Double.MAX_VALUE, Binary64.round(max.add(halfUlp).subtract(Rational.ONE)));
        assertEquals(Double.POSITIVE_INFINITY, Binary64.round(max.add(halfUlp)));
        assertEquals(Double.NEGATIVE_INFINITY, Binary64.round(max.add(halfUlp).negate()));
        assertEquals(Double.POSITIVE_INFINITY, Binary64.round(Rational.of(BigInteger.TEN.pow(400))));
        assertEquals(Double.parseDouble("1.7976931348623158e308"), Binary64.round(Rational.parse("1.7976931348623158e308")));
    }

    // IEEE 754-2019 clause 3.4: every finite double is m 2^e exactly; reading it back gives the same double
    @Test
    void exactValueRoundTrips() {
        Random rnd = new Random(3);
        for (int k = 0; k < 4_000; k++) {
            double d = randomDouble(rnd) * (rnd.nextBoolean() ? 1 : -1);
            Rational x = Binary64.exact(d);
            assertEquals(new BigDecimal(d).compareTo(new BigDecimal(x.numerator()).divide(new BigDecimal(x.denominator()))),
                0);
            assertEquals(d, Binary64.round(x));
        }
        assertEquals(Rational.of(1, 2), Binary64.exact(0.5));
        assertEquals(Rational.ZERO, Binary64.exact(-0.0));
        assertThrows(ArithmeticException.class, () -> Binary64.exact(Double.NaN));
    }

    // IEEE 754-2019: neighbouring doubles are one ulp apart; +0 and -0 are equal
    @Test
    void ulpDistances() {
        assertEquals(1, Binary64.ulpDistance(0.1, Math.nextUp(0.1)));
        assertEquals(1, Binary64.ulpDistance(1.0, Math.nextDown(1.0)));
        assertEquals(0, Binary64.ulpDistance(0.0, -0.0));
        assertEquals(2, Binary64.ulpDistance(Double.MIN_VALUE, -Double.MIN_VALUE));
        assertEquals(1, Binary64.ulpDistance(Double.MAX_VALUE, Double.POSITIVE_INFINITY));
        assertEquals(4503599627370496L, Binary64.ulpDistance(1.0, 2.0));
        assertEquals(Long.MAX_VALUE, Binary64.ulpDistance(Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY));
        assertTrue(Binary64.isCorrectlyRounded(0.1, Rational.of(1, 10)));
        assertFalse(Binary64.isCorrectlyRounded(Math.nextUp(0.1), Rational.of(1, 10)));
        assertThrows(ArithmeticException.class, () -> Binary64.ulpDistance(Double.NaN, 1));
    }
}
