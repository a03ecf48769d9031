package org.qchain.exact;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigInteger;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import org.junit.jupiter.api.Test;

/** Multi-modular powers equal the BigInteger engine's (the reference: plain repeated squaring on BigInteger). */
class ModularPowerTest {

    private static void assertSame(IntMatrix expected, IntMatrix actual) {
        for (int i = 0; i < expected.n; i++) {
            assertArrayEquals(expected.e[i], actual.e[i], "row " + i);
        }
    }

    // reference: MatrixPowers' BigInteger engine with the limb path (itself checked against Hipparchus)
    @Property(tries = 40, seed = "5150")
    void stochasticChainsAgree(@ForAll @IntRange(min = 0, max = 1_000_000) int seed,
                               @ForAll @IntRange(min = 2, max = 90) int n) {
        Random rnd = new Random(seed);
        RationalMatrix p = RandomChains.stochastic(rnd, 1 + rnd.nextInt(9), 300, rnd.nextDouble() * 0.8);
        IntMatrix a = CommonDenominatorForm.of(p).a;
        assertSame(MatrixPowers.integerPower(a, n, Progress.NONE), ModularPower.power(a, n, Thread.currentThread()));
    }

    // reference: as above, on matrices with negative entries (the symmetric residue)
    @Property(tries = 40, seed = "8086")
    void signedMatricesAgree(@ForAll @IntRange(min = 0, max = 1_000_000) int seed,
                             @ForAll @IntRange(min = 1, max = 40) int n) {
        Random rnd = new Random(seed);
        RationalMatrix p = RandomChains.signed(rnd, 1 + rnd.nextInt(7), 1000, 30);
        IntMatrix a = CommonDenominatorForm.of(p).a;
        assertSame(MatrixPowers.integerPower(a, n, Progress.NONE), ModularPower.power(a, n, Thread.currentThread()));
    }

    // reference: the BigInteger engine with the modular route switched off; chains large enough to take the route
    // (three chains: each takes the same route, and each costs about a second of the direct reference)
    @Property(tries = 3, seed = "1999")
    @QuickTries(1)
    void theRoutedEngineEqualsTheDirectOne(@ForAll @IntRange(min = 0, max = 1_000_000) int seed) {
        Random rnd = new Random(seed);
        int size = ModularPower.MIN_STATES + rnd.nextInt(6);
        RationalMatrix p = RandomChains.stochastic(rnd, size, 240, 0.1);
        int n = 400 + rnd.nextInt(100);
        assertTrue(ModularPower.applies(CommonDenominatorForm.of(p).a, n), "the case takes the modular route");
        RationalMatrix routed = MatrixPowers.power(p, n);
        Rational[] row = MatrixPowers.rowOfPower(p, 1, n);
        ModularPower.enabled = false;
        try {
            assertEquals(MatrixPowers.power(p, n), routed);
            assertArrayEquals(MatrixPowers.rowOfPower(p, 1, n), row);
        } finally {
            ModularPower.enabled = true;
        }
    }

    // reference: BigInteger.isProbablePrime (Java SE) on the sieve's output
    @Test
    void thePrimesArePrimeDistinctAndBelowTheLimit() {
        int[] ps = ModularPower.primes(3000);
        assertEquals(3000, ps.length);
        for (int i = 0; i < ps.length; i++) {
            assertTrue(BigInteger.valueOf(ps[i]).isProbablePrime(50), ps[i] + " is prime");
            assertTrue(ps[i] < (1 << ModularPower.PRIME_BITS));
            assertTrue(i == 0 || ps[i] < ps[i - 1]);
        }
    }

    // derived by hand: a zero matrix stays zero, a single entry is its power
    @Test
    void smallCases() {
        IntMatrix z = IntMatrix.of(new BigInteger[][] {{BigInteger.ZERO}});
        assertSame(z, ModularPower.power(z, 5, Thread.currentThread()));
        IntMatrix m = IntMatrix.of(new BigInteger[][] {{BigInteger.valueOf(-3)}});
        assertEquals(BigInteger.valueOf(-3).pow(41), ModularPower.power(m, 41, Thread.currentThread()).e[0][0]);
    }

    // reference: Java's remainder operator on the same values (random values below 2^63, and the extremes: 0,
    // multiples of p and their neighbours, the largest sums the products can reach)
    @Test
    void theDivisionFreeReductionIsTheRemainder() {
        Random rnd = new Random(2026);
        int[] ps = ModularPower.primes(40);
        for (int p : ps) {
            double inv = 1.0 / p;
            long[] edges = {0, 1, p - 1L, p, p + 1L, (long) p * p, (long) p * p - 1, Long.MAX_VALUE,
                Long.MAX_VALUE - 1, 7L * ((1L << 60) - 1) + (1L << 30), Long.MAX_VALUE / p * p,
                Long.MAX_VALUE / p * p - 1};
            for (long a : edges) {
                assertEquals(a % p, ModularPower.reduce(a, p, inv), a + " mod " + p);
            }
            for (int t = 0; t < 20_000; t++) {
                long a = rnd.nextLong() >>> 1;
                assertEquals(a % p, ModularPower.reduce(a, p, inv), a + " mod " + p);
            }
        }
    }
}
