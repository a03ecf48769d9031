package org.qchain.exact;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.math.BigInteger;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;
import org.junit.jupiter.api.Test;

/** The fast decimal conversion equals Java SE's BigInteger.toString (the reference) digit for digit. */
class DecimalTextTest {

    // reference library: Java SE BigInteger.toString on random integers of up to about 60,000 digits
    @Property(tries = 200, seed = "60221")
    void equalsBigIntegerToString(@ForAll @LongRange(min = 0, max = Long.MAX_VALUE) long seed,
                                  @ForAll @IntRange(min = 1, max = 200_000) int bits) {
        Random rnd = new Random(seed);
        BigInteger x = new BigInteger(1 + rnd.nextInt(bits), rnd);
        if (rnd.nextBoolean()) {
            x = x.negate();
        }
        assertEquals(x.toString(), DecimalText.toString(x));
    }

    // reference library: BigInteger.toString; numbers made of long runs of zeros and nines around powers of ten,
    // where the padding of the low halves matters
    @Test
    void powersOfTenAndTheirNeighbours() {
        for (int e : new int[] {17, 18, 19, 35, 36, 37, 54, 72, 287, 288, 289, 576, 1151, 1152, 4608, 9217, 40000}) {
            BigInteger p = BigInteger.TEN.pow(e);
            for (BigInteger x : new BigInteger[] {p, p.subtract(BigInteger.ONE), p.add(BigInteger.ONE),
                p.multiply(BigInteger.valueOf(7)).add(BigInteger.valueOf(42))}) {
                assertEquals(x.toString(), DecimalText.toString(x), "10^" + e + " neighbour");
            }
        }
    }

    // reference: Rational.toString
    @Test
    void rationalsAndBatches() {
        Random rnd = new Random(3);
        Rational[] rs = new Rational[50];
        for (int i = 0; i < rs.length; i++) {
            rs[i] = Rational.of(new BigInteger(1 + rnd.nextInt(40_000), rnd), new BigInteger(1 + rnd.nextInt(40_000), rnd)
                .add(BigInteger.ONE));
        }
        rs[0] = Rational.of(-5);
        String[] expected = new String[rs.length];
        for (int i = 0; i < rs.length; i++) {
            expected[i] = rs[i].toString();
            assertEquals(expected[i], DecimalText.toString(rs[i]));
        }
        assertArrayEquals(expected, DecimalText.toStrings(rs));
        // a number large enough to split its halves over the pool
        BigInteger big = new BigInteger(DecimalText.PARALLEL_BITS + 12_345, rnd);
        assertEquals(big.toString(), DecimalText.toString(big));
    }

    // reference library: BigInteger.toString. Numbers G m with one large G and small multipliers m (the shape of a
    // power's reduced denominators), mixed with unrelated numbers and small ones: every text equals toString, and
    // the factor found divides every multiple when their ratios are within reach (it is G times the gcd of the
    // multipliers).
    @Property(tries = 40, seed = "31337")
    void sharedFactorTextsEqualToString(@ForAll @LongRange(min = 0, max = Long.MAX_VALUE) long seed,
                                        @ForAll @IntRange(min = 2_000, max = 12_000) int bits,
                                        @ForAll @IntRange(min = 1, max = 130) int multiplierBits) {
        Random rnd = new Random(seed);
        BigInteger g = new BigInteger(bits, rnd).setBit(bits - 1);
        java.util.List<BigInteger> xs = new java.util.ArrayList<>();
        java.util.List<BigInteger> multiples = new java.util.ArrayList<>();
        for (int i = 0; i < 30; i++) {
            BigInteger m = new BigInteger(1 + rnd.nextInt(multiplierBits), rnd).add(BigInteger.ONE);
            multiples.add(g.multiply(m));
            xs.add(g.multiply(m));
            if (rnd.nextInt(6) == 0) {
                xs.add(new BigInteger(bits, rnd).add(BigInteger.ONE));
            }
            if (rnd.nextInt(6) == 0) {
                xs.add(BigInteger.valueOf(1 + rnd.nextInt(1000)));
            }
        }
        DecimalText.SharedFactor shared = DecimalText.SharedFactor.of(xs);
        for (BigInteger x : xs) {
            assertEquals(x.toString(), shared.toString(x));
        }
        BigInteger f = shared.factor();
        assertEquals(true, f != null && f.bitLength() >= g.bitLength(), "a factor at least G");
        if (multiplierBits <= DecimalText.RATIO_BITS - 8) {
            // every ratio of two multiples is within reach: the factor is the gcd of them all
            for (BigInteger x : multiples) {
                assertEquals(BigInteger.ZERO, x.mod(f), "the factor divides every multiple");
            }
        }
        // a number outside the sample: a multiple of G is written from G's digits too, and still equals toString
        BigInteger late = g.multiply(BigInteger.valueOf(999_983));
        assertEquals(late.toString(), shared.toString(late));
    }

    // the reduced denominators of d^n / x (common practice, no source): divisors of d^n with small quotients, for
    // d with many small primes; reference BigInteger.toString
    @Test
    void sharedFactorOfPowerDenominators() {
        BigInteger d = new BigInteger("4200522783747726189914160");
        BigInteger dn = d.pow(256);
        Random rnd = new Random(5);
        java.util.List<BigInteger> dens = new java.util.ArrayList<>();
        int[] small = {2, 3, 5, 7, 11, 13, 17, 41, 43, 53, 67, 89, 103, 113, 139, 163};
        for (int i = 0; i < 100; i++) {
            BigInteger q = BigInteger.ONE;
            for (int k = rnd.nextInt(4); k > 0; k--) {
                q = q.multiply(BigInteger.valueOf(small[rnd.nextInt(small.length)]).pow(1 + rnd.nextInt(12)));
            }
            dens.add(dn.divide(q.gcd(dn)));
        }
        DecimalText.SharedFactor shared = DecimalText.SharedFactor.of(dens);
        for (BigInteger q : dens) {
            assertEquals(q.toString(), shared.toString(q));
        }
        assertEquals(true, shared.factor().bitLength() > dn.bitLength() - 1000, "a factor near d^n");
        assertEquals(null, DecimalText.SharedFactor.of(java.util.List.of()).factor(), "empty sample: no factor");
    }
}
