package org.qchain.exact;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.math.BigInteger;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;

/** The limb kernel against BigInteger arithmetic (reference library: Java SE java.math.BigInteger). */
class LimbsTest {

    // source: reference library Java SE BigInteger: the expected sum of products by BigInteger.multiply and add;
    // the limb round trip against the BigInteger it came from
    @Property(seed = "64", tries = 300)
    void mulAddMatchesBigInteger(@ForAll @LongRange(min = 0, max = Long.MAX_VALUE) long seed,
            @ForAll @IntRange(min = 1, max = 9) int terms) {
        Random rnd = new Random(seed);
        BigInteger expected = BigInteger.ZERO;
        int[] acc = new int[40];
        for (int t = 0; t < terms; t++) {
            BigInteger v = rnd.nextInt(5) == 0 ? BigInteger.ONE.shiftLeft(1 + rnd.nextInt(900)).subtract(BigInteger.ONE)
                    : new BigInteger(rnd.nextInt(1000), rnd);
            long a = rnd.nextInt(4) == 0 ? 0xFFFF_FFFFL : rnd.nextLong() & 0xFFFF_FFFFL;
            int[] limbs = Limbs.of(v);
            assertEquals(v, Limbs.toBigInteger(limbs));
            Limbs.mulAdd(acc, limbs, Limbs.length(limbs), a);
            expected = expected.add(v.multiply(BigInteger.valueOf(a)));
        }
        assertEquals(expected, Limbs.toBigInteger(acc));
    }
}
