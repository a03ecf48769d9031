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

    // derived by hand: P = [[9/10, 1/10], [1/2, 1/2]] has d = 10 and 4 non-zero entries; log10 d is bounded by
    // bitLength(10) log10 2 = 4 * 0.30103 = 1.20412; k = 1, n = 3 gives 1 * 4 * (3 * 4 / 2 * 1.20412 + 3) = 40.9, so 41
    @Test
    void pathSearchWorkFollowsItsBound() {
        RationalMatrix p = RationalMatrix.of(new Rational[][] {
            {Rational.of(9, 10), Rational.of(1, 10)}, {Rational.of(1, 2), Rational.of(1, 2)}});
        assertEquals(41, SizeEstimate.digitsOfPathSearch(p, 3, 1));
        // quadratic in n, linear in k
        long a = SizeEstimate.digitsOfPathSearch(p, 1000, 1);
        assertTrue(SizeEstimate.digitsOfPathSearch(p, 2000, 1) > 3.9 * a);
        assertEquals(5 * a, SizeEstimate.digitsOfPathSearch(p, 1000, 5), 5.0);
        assertThrows(IllegalArgumentException.class, () -> SizeEstimate.digitsOfPathSearch(p, 3, 0));
    }

    // common practice, no source: the estimate bounds the digits of the weights a plain k-best search really forms
    @Property(seed = "99", tries = 20)
    void pathSearchEstimateBoundsTheRealWork(@ForAll @LongRange(min = 0, max = 1_000_000) long seed,
            @ForAll @IntRange(min = 1, max = 5) int size, @ForAll @IntRange(min = 1, max = 25) int n,
            @ForAll @IntRange(min = 1, max = 4) int k) {
        RationalMatrix p = RandomChains.stochastic(new Random(seed), size, 60, 0.3);
        BigInteger d = BigInteger.ONE;
        for (int i = 0; i < size; i++) {
            for (int j = 0; j < size; j++) {
                BigInteger q = p.get(i, j).denominator();
                d = d.divide(d.gcd(q)).multiply(q);
            }
        }
        // every weight of layer t is an integer over d^t: keep the k largest per state, count digits formed
        java.util.List<java.util.List<BigInteger>> cur = new java.util.ArrayList<>();
        for (int i = 0; i < size; i++) {
            cur.add(new java.util.ArrayList<>());
        }
        cur.get(0).add(BigInteger.ONE);
        long work = 0;
        for (int t = 1; t <= n; t++) {
            java.util.List<java.util.List<BigInteger>> next = new java.util.ArrayList<>();
            for (int j = 0; j < size; j++) {
                next.add(new java.util.ArrayList<>());
            }
            for (int i = 0; i < size; i++) {
                for (int j = 0; j < size; j++) {
                    Rational x = p.get(i, j);
                    if (x.isZero()) {
                        continue;
                    }
                    BigInteger a = x.numerator().multiply(d.divide(x.denominator()));
                    for (BigInteger w : cur.get(i)) {
                        BigInteger v = w.multiply(a);
                        work += digits(v);
                        next.get(j).add(v);
                    }
                }
            }
            for (java.util.List<BigInteger> l : next) {
                l.sort(java.util.Comparator.reverseOrder());
                while (l.size() > k) {
                    l.remove(l.size() - 1);
                }
            }
            cur = next;
        }
        assertTrue(SizeEstimate.digitsOfPathSearch(p, n, k) >= work, "estimate below the real work " + work);
    }
}
