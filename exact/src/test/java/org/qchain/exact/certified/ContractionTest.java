package org.qchain.exact.certified;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.BitSet;
import java.util.Optional;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import org.junit.jupiter.api.Test;
import org.qchain.exact.Decimals;
import org.qchain.exact.MatrixPowers;
import org.qchain.exact.Progress;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.SparseRationalMatrix;

/**
 * The contraction route for large {@code n}, against exact rows of the exact engine rounded by {@link Decimals}
 * (reference: the exact fraction; common practice, no source).
 */
class ContractionTest {

    // reference: exact rows (MatrixPowers) rounded half-even; chains from fixed seeds, n from 32 s up, so the
    // contraction route is taken whenever the chain mixes
    @Property(tries = 40, seed = "424242")
    void rowsForLargeNEqualTheRoundedExactRows(@ForAll @IntRange(min = 0, max = 1_000_000) int seed,
                                                @ForAll @IntRange(min = 2, max = 6) int size,
                                                @ForAll @IntRange(min = 1, max = 16) int digits) {
        Random rnd = new Random(seed);
        RationalMatrix p = CertifiedPowersTest.randomChain(rnd, size, rnd.nextBoolean());
        int n = 32 * size + rnd.nextInt(400);
        int from = rnd.nextInt(size);
        Rational[] exact = MatrixPowers.rowOfPower(p, from, n);
        CertifiedDecimal[] c = CertifiedPowers.row(SparseRationalMatrix.of(p), from, n,
            CertifiedPowers.Settings.of(digits), Progress.NONE);
        for (int j = 0; j < size; j++) {
            assertEquals(Decimals.format(exact[j], digits), c[j].text(), "entry " + j + " of " + p + "^" + n);
            assertTrue(c[j].enclosure().contains(exact[j]));
        }
    }

    // invariant: the contraction enclosure contains the exact value at every precision
    @Property(tries = 30, seed = "31337")
    void contractionEnclosuresContainTheExactRow(@ForAll @IntRange(min = 0, max = 1_000_000) int seed,
                                                 @ForAll @IntRange(min = 40, max = 200) int bits) {
        Random rnd = new Random(seed);
        int size = 2 + rnd.nextInt(5);
        RationalMatrix p = CertifiedPowersTest.randomChain(rnd, size, false);
        SparseRationalMatrix sp = SparseRationalMatrix.of(p);
        int n = 200 + rnd.nextInt(300);
        Optional<Contraction.Bound> bound = Contraction.doeblin(sp, 64, Thread.currentThread());
        assertTrue(bound.isPresent(), "a chain with all entries positive contracts");
        BitSet support = Contraction.support(sp, 0, n, 100).orElseThrow();
        Enclosure[] e = Contraction.row(FixedPointBounds.of(sp, bits), bound.get(), support, 0, n, Progress.NONE,
            Thread.currentThread());
        Rational[] exact = MatrixPowers.rowOfPower(p, 0, n);
        for (int j = 0; j < size; j++) {
            assertTrue(e[j].contains(exact[j]), e[j] + " vs " + exact[j]);
        }
    }

    // derived by hand: a ring 0 -> 1 -> 2 -> 0 is periodic; no power has a positive column, so there is no bound
    @Test
    void aPeriodicChainHasNoContractionBound() {
        RationalMatrix ring = RationalMatrix.of(new Rational[][] {
            {Rational.ZERO, Rational.ONE, Rational.ZERO},
            {Rational.ZERO, Rational.ZERO, Rational.ONE},
            {Rational.ONE, Rational.ZERO, Rational.ZERO}});
        assertFalse(Contraction.doeblin(SparseRationalMatrix.of(ring), 64, Thread.currentThread()).isPresent());
        CertifiedDecimal[] c = CertifiedPowers.row(SparseRationalMatrix.of(ring), 0, 1000,
            CertifiedPowers.Settings.of(12), Progress.NONE);
        // 1000 = 1 (mod 3): from state 0 the chain is in state 1
        assertEquals("0", c[0].text());
        assertEquals("1", c[1].text());
        assertEquals("0", c[2].text());
    }

    // derived by hand: states 1 and 2 alternate and leak to the absorbing state 0 with probability 1/2 each step;
    // from state 1, after an even number n of steps the chain is in 0 or in 1, never in 2: the exact zero is proven
    @Test
    void zerosOfAPeriodicTransientPartAreExact() {
        Rational h = Rational.of(1, 2);
        RationalMatrix p = RationalMatrix.of(new Rational[][] {
            {Rational.ONE, Rational.ZERO, Rational.ZERO},
            {h, Rational.ZERO, h},
            {h, h, Rational.ZERO}});
        SparseRationalMatrix sp = SparseRationalMatrix.of(p);
        assertTrue(Contraction.doeblin(sp, 64, Thread.currentThread()).isPresent());
        CertifiedDecimal[] c = CertifiedPowers.row(sp, 1, 2000, CertifiedPowers.Settings.of(12), Progress.NONE);
        assertEquals("1.00000000000", c[0].text());
        assertEquals(CertifiedDecimal.Status.EXACT, c[2].status());
        assertEquals("0", c[2].text());
        Rational[] exact = MatrixPowers.rowOfPower(p, 1, 2000);
        for (int j = 0; j < 3; j++) {
            assertEquals(Decimals.format(exact[j], 12), c[j].text());
        }
    }
}
