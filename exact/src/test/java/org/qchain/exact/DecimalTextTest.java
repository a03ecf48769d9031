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
}
