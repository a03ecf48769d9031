package org.qchain.exact;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigInteger;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;
import org.junit.jupiter.api.Test;

/** The size estimate bounds the real size, is not wildly above it, and the limit check carries the estimate. */
class SizeEstimateTest {

    static long digits(BigInteger x) {
        return x.abs().toString().length();
    }

    static long actualDigits(Rational[] row) {
        long t = 0;
        for (Rational r : row) {
            t += digits(r.numerator()) + digits(r.denominator());
        }
        return t;
    }

    // common practice, no source: denominators of P^n divide d_i d^(n-1); entries of a stochastic P^n are <= 1
    @Property(seed = "123", tries = 40)
    void boundsTheActualSize(@ForAll @LongRange(min = 0, max = 1_000_000) long seed,
            @ForAll @IntRange(min = 1, max = 8) int size, @ForAll @IntRange(min = 0, max = 80) int n,
            @ForAll boolean signed) {
        Random rnd = new Random(seed);
        RationalMatrix p = signed ? RandomChains.signed(rnd, size, 9, 20) : RandomChains.stochastic(rnd, size, 240, 0.3);
        RationalMatrix pn = MatrixPowers.power(p, n);
        long total = 0;
        long maxRow = 0;
        for (int i = 0; i < size; i++) {
            long r = actualDigits(pn.row(i));
            total += r;
            maxRow = Math.max(maxRow, r);
            assertTrue(SizeEstimate.digitsOfRow(p, i, n) >= r, "row " + i);
        }
        assertTrue(SizeEstimate.digitsOfPower(p, n) >= total, "total " + total);
        assertTrue(SizeEstimate.digitsOfRow(p, n) >= maxRow);
    }

    // common practice, no source: on a dense chain with one common row denominator the bound is tight
    @Test
    void closeOnADenseChain() {
        Random rnd = new Random(2024);
        Rational[][] e = new Rational[10][10];
        for (int i = 0; i < 10; i++) {
            int left = 240;
            for (int j = 0; j < 9; j++) {
                int x = 1 + rnd.nextInt(Math.max(1, left / 4));
                e[i][j] = Rational.of(x, 240);
                left -= x;
            }
            e[i][9] = Rational.of(left, 240);
        }
        RationalMatrix p = RationalMatrix.of(e);
        RationalMatrix pn = MatrixPowers.power(p, 64);
        long total = 0;
        for (int i = 0; i < 10; i++) {
            total += actualDigits(pn.row(i));
        }
        long est = SizeEstimate.digitsOfPower(p, 64);
        assertTrue(est >= total && est <= total * 1.15, "estimate " + est + " actual " + total);
    }

    // common practice, no source: huge exponents saturate instead of overflowing
    @Test
    void saturatesForHugeExponents() {
        RationalMatrix p = RandomChains.stochastic(new Random(5), 20, 240, 0);
        assertEquals(Long.MAX_VALUE, SizeEstimate.digitsOfPower(p, Long.MAX_VALUE));
        assertEquals(40, SizeEstimate.digitsOfPower(RationalMatrix.identity(20), 0) / 20);
    }

    // common practice, no source: refusal carries the estimate, the limit and the option
    @Test
    void requireWithinThrowsWithTheEstimate() {
        SizeEstimate.requireWithin(100, 100, "--max-digits");
        QchainException e = assertThrows(QchainException.class,
                () -> SizeEstimate.requireWithin(4_300_000, 1_000_000, "--max-digits"));
        assertEquals(ErrorKey.RESULT_TOO_LARGE, e.key());
        assertTrue(e.getMessage().contains("4300000"), e.getMessage());
        assertTrue(e.getMessage().contains("--max-digits"), e.getMessage());
    }
}
