package org.qchain.exact;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.math.BigInteger;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;
import org.apfloat.ApfloatContext;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.parallel.Isolated;

/** The apfloat paths (forced on small numbers) give the same integers as the BigInteger paths. */
// runs alone: it switches BigMath's global mode, which every other class's arithmetic reads
@Isolated
class ApintPathTest {

    @AfterEach
    void restoreThresholds() {
        BigMath.setMode("auto");
    }

    // reference library: Java SE BigInteger.pow against apfloat ApintMath.pow in radix 16
    @Property(seed = "16", tries = 40)
    void powMatchesBigInteger(@ForAll @IntRange(min = -50, max = 50) int base, @ForAll @IntRange(min = 0, max = 3000) int e) {
        BigMath.setMode("always");
        try {
            assertEquals(BigInteger.valueOf(base).pow(e), BigMath.pow(BigInteger.valueOf(base), e));
        } finally {
            BigMath.setMode("auto");
        }
    }

    // common practice, no source: the matrix power with its late squarings in apfloat equals the BigInteger one
    @Property(seed = "17", tries = 15)
    void matrixPowerMatchesBigInteger(@ForAll @LongRange(min = 0, max = 1_000_000) long seed,
            @ForAll @IntRange(min = 1, max = 5) int size, @ForAll @IntRange(min = 1, max = 70) int n,
            @ForAll boolean signed) {
        Random rnd = new Random(seed);
        RationalMatrix p = signed ? RandomChains.signed(rnd, size, 7, 30) : RandomChains.stochastic(rnd, size, 90, 0.3);
        BigMath.setMode("never");
        RationalMatrix plain = MatrixPowers.power(p, n);
        BigMath.setMode("always");
        RationalMatrix viaApint = MatrixPowers.power(p, n);
        BigMath.setMode("auto");
        assertEquals(plain, viaApint);
    }

    // common practice, no source: apfloat work leaves no thread context behind
    @Test
    void contextIsRestored() {
        assertNull(ApfloatContext.getThreadContext());
        BigMath.setMode("always");
        BigMath.pow(BigInteger.valueOf(7), 500);
        assertNull(ApfloatContext.getThreadContext());
    }
}
