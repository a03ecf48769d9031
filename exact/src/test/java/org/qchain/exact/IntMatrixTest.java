package org.qchain.exact;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

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

    // common practice, no source: the limb-array squarings give the same A^n as BigInteger squarings, also when
    // the entries outgrow the limb path part-way
    @Property(seed = "32", tries = 30)
    void limbPathEqualsBigIntegerPath(@ForAll @LongRange(min = 0, max = 1_000_000) long seed,
            @ForAll @IntRange(min = 1, max = 9) int size, @ForAll @IntRange(min = 1, max = 300) int n) {
        IntMatrix a = CommonDenominatorForm.of(RandomChains.stochastic(new Random(seed), size, 1000, 0.4)).a;
        MatrixPowers.limbPath = false;
        IntMatrix plain;
        try {
            plain = MatrixPowers.integerPower(a, n, Progress.NONE);
        } finally {
            MatrixPowers.limbPath = true;
        }
        IntMatrix limbs = MatrixPowers.integerPower(a, n, Progress.NONE);
        for (int i = 0; i < size; i++) {
            assertArrayEquals(plain.e[i], limbs.e[i]);
        }
    }

    // common practice, no source: the schoolbook multiply-accumulate on limbs against BigInteger
    @Property(seed = "33", tries = 200)
    void limbMulAddMatchesBigInteger(@ForAll @LongRange(min = 0, max = Long.MAX_VALUE) long seed) {
        Random rnd = new Random(seed);
        BigInteger expected = BigInteger.ZERO;
        int[] acc = new int[2 * 40 + 1];
        for (int t = 0; t < 1 + rnd.nextInt(6); t++) {
            BigInteger x = rnd.nextInt(4) == 0 ? BigInteger.ONE.shiftLeft(1 + rnd.nextInt(1200)).subtract(BigInteger.ONE)
                    : new BigInteger(1 + rnd.nextInt(1270), rnd);
            BigInteger y = new BigInteger(1 + rnd.nextInt(1270), rnd);
            if (x.signum() == 0 || y.signum() == 0) {
                continue;
            }
            LimbMatrix.mulAdd(acc, trimmed(x), trimmed(y));
            expected = expected.add(x.multiply(y));
        }
        assertEquals(expected, Limbs.toBigInteger(acc));
    }

    private static int[] trimmed(BigInteger x) {
        int[] m = Limbs.of(x);
        return java.util.Arrays.copyOf(m, Limbs.length(m));
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
