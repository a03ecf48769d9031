package org.qchain.exact;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.math.BigInteger;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;
import org.junit.jupiter.api.Test;

/** Reduction by the known primes of the denominator equals reduction by gcd. */
class KnownDenominatorTest {

    // common practice, no source: gcd(x, d^n) only involves the primes of d; compared with BigInteger.gcd
    @Property(seed = "31", tries = 200)
    void sameAsGcd(@ForAll @LongRange(min = 0, max = 1_000_000) long seed, @ForAll @IntRange(min = 0, max = 60) int n) {
        Random rnd = new Random(seed);
        BigInteger d = BigInteger.valueOf(1 + rnd.nextInt(5000));
        if (rnd.nextInt(5) == 0) {
            d = d.multiply(BigInteger.valueOf(1_000_003)); // a prime above the trial-division limit
        }
        KnownDenominator kd = KnownDenominator.power(d, n);
        BigInteger dn = d.pow(n);
        BigInteger x = new BigInteger(1 + rnd.nextInt(400), rnd);
        // build in large powers of the primes of d so the chunked and descending paths run
        x = x.multiply(d.pow(rnd.nextInt(n + 3))).multiply(BigInteger.valueOf(rnd.nextInt(7) + 1));
        if (rnd.nextBoolean()) {
            x = x.negate();
        }
        assertEquals(Rational.of(x, dn), kd.reduce(x));
    }

    // common practice, no source: a composite cofactor with both factors above the trial limit (gcd fallback)
    @Test
    void compositeCofactor() {
        BigInteger big = BigInteger.valueOf(1_000_003).multiply(BigInteger.valueOf(1_000_033));
        BigInteger d = big.multiply(BigInteger.valueOf(12));
        KnownDenominator kd = KnownDenominator.power(d, 5);
        BigInteger x = BigInteger.valueOf(1_000_003).pow(3).multiply(BigInteger.valueOf(18));
        assertEquals(Rational.of(x, d.pow(5)), kd.reduce(x));
    }

    // common practice, no source: valuations far past the word-sized chunks
    @Test
    void longRunsOfDivisibility() {
        BigInteger five = BigInteger.valueOf(5);
        KnownDenominator kd = KnownDenominator.power(BigInteger.valueOf(10), 3000);
        for (int v : new int[] {0, 1, 26, 27, 28, 500, 2999, 3000, 3001, 4000}) {
            BigInteger x = five.pow(v).multiply(BigInteger.valueOf(7));
            assertEquals(Rational.of(x, BigInteger.TEN.pow(3000)), kd.reduce(x), "v=" + v);
        }
    }
}
