package org.qchain.exact;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;

import java.math.BigInteger;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;

/** Products of integer matrices: Winograd's identity against the plain row-by-column sums. */
class IntMatrixTest {

    // S. Winograd, A new algorithm for inner product, IEEE Trans. Computers C-17 (1968) (from memory); checked
    // against the definition of the matrix product on random dense big-integer matrices, odd and even sizes
    @Property(seed = "1968", tries = 30)
    void winogradEqualsPlainProduct(@ForAll @LongRange(min = 0, max = 1_000_000) long seed,
            @ForAll @IntRange(min = 4, max = 13) int n, @ForAll boolean signed) {
        Random rnd = new Random(seed);
        IntMatrix x = random(rnd, n, signed);
        IntMatrix y = random(rnd, n, signed);
        Thread t = Thread.currentThread();
        IntMatrix.winograd = false;
        IntMatrix plain;
        try {
            plain = x.multiply(y, t);
        } finally {
            IntMatrix.winograd = true;
        }
        IntMatrix fast = x.multiply(y, t);
        for (int i = 0; i < n; i++) {
            assertArrayEquals(plain.e[i], fast.e[i]);
        }
    }

    private static IntMatrix random(Random rnd, int n, boolean signed) {
        BigInteger[][] e = new BigInteger[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                BigInteger v = rnd.nextInt(8) == 0 ? BigInteger.ZERO
                        : new BigInteger(IntMatrix.WINOGRAD_MIN_BITS + rnd.nextInt(3000), rnd)
                                .setBit(IntMatrix.WINOGRAD_MIN_BITS + 1);
                e[i][j] = signed && rnd.nextBoolean() ? v.negate() : v;
            }
        }
        return IntMatrix.of(e);
    }
}
