package org.qchain.exact;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.math.BigInteger;
import java.util.Random;
import org.hipparchus.fraction.BigFraction;
import org.junit.jupiter.api.Test;

/** Sums and products of rationals in lowest terms, against Hipparchus's {@code BigFraction}. */
class RationalSumTest {
    static BigInteger big(Random rnd, int bits) {
        return new BigInteger(1 + rnd.nextInt(bits), rnd);
    }

    static Rational rational(Random rnd, BigInteger shared) {
        BigInteger p = big(rnd, 200);
        if (rnd.nextBoolean()) {
            p = p.negate();
        }
        // denominators that share a factor with each other half of the time, as the entries of one solve do
        BigInteger q = big(rnd, 120).add(BigInteger.ONE).multiply(rnd.nextBoolean() ? shared : BigInteger.ONE);
        return Rational.of(p, q);
    }

    // reference library: Hipparchus 3.0 org.hipparchus.fraction.BigFraction (add, multiply, reduced); the sum in
    // lowest terms by Henrici's method is the same fraction (D. E. Knuth, The Art of Computer Programming, vol. 2,
    // 4.5.1)
    @Test
    void sumsDifferencesAndProductsAreReducedAndRight() {
        Random rnd = new Random(20261203L);
        for (int trial = 0; trial < 2000; trial++) {
            BigInteger shared = big(rnd, 90).add(BigInteger.TWO);
            Rational a = rational(rnd, shared);
            Rational b = rnd.nextInt(10) == 0 ? a.negate() : rational(rnd, shared);
            BigFraction fa = new BigFraction(a.numerator(), a.denominator());
            BigFraction fb = new BigFraction(b.numerator(), b.denominator());
            check(fa.add(fb), a.add(b));
            check(fa.subtract(fb), a.subtract(b));
            check(fa.multiply(fb), a.multiply(b));
            check(fa.multiply(fa), a.multiply(a));
            // doubling (an even and an odd denominator both occur), also through an equal but distinct object
            check(fa.add(fa), a.add(a));
            check(fa.add(fa), a.add(Rational.of(a.numerator(), a.denominator())));
        }
    }

    private static void check(BigFraction expected, Rational actual) {
        assertEquals(expected.getNumerator(), actual.numerator());
        assertEquals(expected.getDenominator(), actual.denominator());
        // lowest terms, with a positive denominator (zero as 0/1)
        assertEquals(BigInteger.ONE, actual.numerator().signum() == 0 ? actual.denominator()
            : actual.numerator().gcd(actual.denominator()));
        assertEquals(1, actual.denominator().signum());
    }
}
