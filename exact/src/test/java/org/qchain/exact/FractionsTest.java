package org.qchain.exact;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.math.BigInteger;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Fractions over one denominator reduced together equal the fractions reduced one by one ({@code Rational.of}, one
 * gcd each; common practice, no source), with numerators that share none, some or all of the denominator's factors.
 */
class FractionsTest {
    private static void same(BigInteger[] p, BigInteger q) {
        Rational[] each = new Rational[p.length];
        for (int i = 0; i < p.length; i++) {
            each[i] = Rational.of(p[i], q);
        }
        assertArrayEquals(each, Fractions.over(p, q));
    }

    @Test
    void sameAsReducingEachEntry() {
        Random rnd = new Random(20261203L);
        for (int trial = 0; trial < 60; trial++) {
            int n = 1 + rnd.nextInt(40);
            // a denominator with small prime factors (2, 3, 5, 7 to some powers) and a large cofactor
            BigInteger small = BigInteger.valueOf(2).pow(rnd.nextInt(8)).multiply(BigInteger.valueOf(3).pow(rnd.nextInt(4)))
                .multiply(BigInteger.valueOf(5 * 7).pow(rnd.nextInt(3)));
            BigInteger big = new BigInteger(200 + rnd.nextInt(2000), rnd).add(BigInteger.ONE);
            BigInteger q = small.multiply(big);
            BigInteger[] p = new BigInteger[n];
            for (int i = 0; i < n; i++) {
                BigInteger x = new BigInteger(q.bitLength() + rnd.nextInt(50) - 25, rnd);
                switch (trial % 4) {
                    case 1 -> x = x.multiply(BigInteger.valueOf(new int[] {2, 3, 5, 7}[rnd.nextInt(4)]));
                    case 2 -> x = i % 5 == 0 ? x.multiply(big) : x;
                    case 3 -> x = rnd.nextInt(6) == 0 ? BigInteger.ZERO : x;
                    default -> { }
                }
                p[i] = rnd.nextBoolean() ? x.negate() : x;
            }
            same(p, q);
        }
        // every numerator a multiple of the denominator, and a denominator of 1
        BigInteger q = new BigInteger(900, rnd).add(BigInteger.TWO);
        same(new BigInteger[] {q, q.negate(), q.shiftLeft(3), q, BigInteger.ZERO}, q);
        same(new BigInteger[] {BigInteger.TEN, BigInteger.ONE.negate(), BigInteger.ZERO, BigInteger.TWO}, BigInteger.ONE);
    }

    @Test
    void aDenominatorThatIsNotPositiveIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> Fractions.over(new BigInteger[] {BigInteger.ONE},
            BigInteger.ZERO));
    }
}
