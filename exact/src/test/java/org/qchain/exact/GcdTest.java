package org.qchain.exact;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.math.BigInteger;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Lehmer's gcd against {@code BigInteger.gcd} (the JDK's reference implementation): random pairs with and without a
 * large common factor, very different sizes, and the worst case of Euclid's algorithm, consecutive Fibonacci numbers
 * (all quotients 1; G. Lamé's theorem, D. E. Knuth, The Art of Computer Programming, vol. 2, 4.5.3).
 */
class GcdTest {
    private static void same(BigInteger a, BigInteger b) {
        BigInteger g = a.gcd(b);
        assertEquals(g, Gcd.of(a, b), () -> "gcd(" + a + ", " + b + ")");
        assertEquals(g, Gcd.of(b.negate(), a));
    }

    @Test
    void randomPairsWithAndWithoutCommonFactors() {
        Random rnd = new Random(20261203L);
        for (int trial = 0; trial < 400; trial++) {
            int bits = Gcd.LEHMER_BITS / 2 + rnd.nextInt(3000);
            BigInteger common = trial % 3 == 0 ? BigInteger.ONE : new BigInteger(1 + rnd.nextInt(bits / 2), rnd);
            BigInteger a = new BigInteger(bits, rnd).multiply(common);
            BigInteger b = new BigInteger(Math.max(1, bits - rnd.nextInt(200)), rnd).multiply(common);
            if (trial % 5 == 0) {
                // factors of two and of small primes on both sides, as the denominators of a Markov chain have
                a = a.shiftLeft(rnd.nextInt(64)).multiply(BigInteger.valueOf(3 * 5 * 7));
                b = b.shiftLeft(rnd.nextInt(64)).multiply(BigInteger.valueOf(5 * 7 * 11));
            }
            same(a, b);
        }
    }

    @Test
    void veryDifferentSizesEqualOperandsAndZero() {
        Random rnd = new Random(7L);
        BigInteger big = new BigInteger(5000, rnd);
        same(big, new BigInteger(600, rnd));
        same(big, new BigInteger(40, rnd));
        same(big, big);
        same(big, big.shiftLeft(1000));
        same(big, BigInteger.ONE);
        assertEquals(big, Gcd.of(big, BigInteger.ZERO));
        assertEquals(big, Gcd.of(BigInteger.ZERO, big.negate()));
        assertEquals(BigInteger.ZERO, Gcd.of(BigInteger.ZERO, BigInteger.ZERO));
    }

    @Test
    void consecutiveFibonacciNumbers() {
        BigInteger f0 = BigInteger.ZERO;
        BigInteger f1 = BigInteger.ONE;
        for (int k = 0; k < 5000; k++) {
            BigInteger t = f0.add(f1);
            f0 = f1;
            f1 = t;
            if (k % 499 == 0 && f1.bitLength() > Gcd.LEHMER_BITS) {
                same(f1, f0);
                // gcd(F_m, F_n) = F_gcd(m, n) (common practice, no source): a large common factor
                same(f1.multiply(f0), f0.multiply(f0.add(f1)));
            }
        }
        assertEquals(BigInteger.ONE, Gcd.of(f1, f0));
    }
}
