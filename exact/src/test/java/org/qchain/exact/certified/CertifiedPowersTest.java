package org.qchain.exact.certified;

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
import org.qchain.exact.Decimals;
import org.qchain.exact.MatrixPowers;
import org.qchain.exact.Progress;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.SparseRationalMatrix;

/**
 * Certified decimals of matrix powers against the exact engine's values rounded by {@link Decimals} (itself checked
 * against Java SE's BigDecimal in DecimalsTest): the reference is the exact fraction, correctly rounded.
 */
class CertifiedPowersTest {

    /** A random stochastic matrix; with {@code sparse} most entries are zero. */
    static RationalMatrix randomChain(Random rnd, int size, boolean sparse) {
        Rational[][] e = new Rational[size][size];
        for (int i = 0; i < size; i++) {
            int q = 1 + rnd.nextInt(sparse ? 12 : 60);
            int[] parts = new int[size];
            int slots = sparse ? 1 + rnd.nextInt(Math.min(3, size)) : size;
            int[] cols = new int[slots];
            for (int t = 0; t < slots; t++) {
                cols[t] = rnd.nextInt(size);
            }
            for (int left = q; left > 0; left--) {
                parts[cols[rnd.nextInt(slots)]]++;
            }
            for (int j = 0; j < size; j++) {
                e[i][j] = Rational.of(parts[j], q);
            }
        }
        return RationalMatrix.of(e);
    }

    /** Every row has the same probabilities {@code q}: then {@code P^n = P} for every {@code n >= 1}. */
    static RationalMatrix rankOne(Rational... q) {
        Rational[][] e = new Rational[q.length][];
        for (int i = 0; i < q.length; i++) {
            e[i] = q.clone();
        }
        return RationalMatrix.of(e);
    }

    // reference: the exact row (MatrixPowers) rounded half-even by Decimals; common practice, no source
    @Property(tries = 60, seed = "20261202")
    void certifiedRowsEqualTheRoundedExactRows(@ForAll @IntRange(min = 0, max = 1_000_000) int seed,
                                                @ForAll @IntRange(min = 1, max = 7) int size,
                                                @ForAll @IntRange(min = 2, max = 60) int n,
                                                @ForAll @IntRange(min = 1, max = 18) int digits) {
        Random rnd = new Random(seed);
        RationalMatrix p = randomChain(rnd, size, rnd.nextBoolean());
        int from = rnd.nextInt(size);
        Rational[] exact = MatrixPowers.rowOfPower(p, from, n);
        CertifiedDecimal[] c = CertifiedPowers.row(SparseRationalMatrix.of(p), from, n,
            CertifiedPowers.Settings.of(digits), Progress.NONE);
        for (int j = 0; j < size; j++) {
            assertEquals(Decimals.format(exact[j], digits), c[j].text(), "entry " + j + " of " + p);
            assertTrue(c[j].isProven());
            assertTrue(c[j].enclosure().contains(exact[j]));
        }
    }

    // reference: the exact power (MatrixPowers) rounded by Decimals; common practice, no source
    @Property(tries = 25, seed = "7")
    void certifiedPowersEqualTheRoundedExactPowers(@ForAll @IntRange(min = 0, max = 1_000_000) int seed,
                                                   @ForAll @IntRange(min = 1, max = 6) int size,
                                                   @ForAll @IntRange(min = 0, max = 100) int n) {
        Random rnd = new Random(seed);
        RationalMatrix p = randomChain(rnd, size, rnd.nextBoolean());
        RationalMatrix exact = MatrixPowers.power(p, n);
        CertifiedDecimal[][] c = CertifiedPowers.power(SparseRationalMatrix.of(p), n,
            CertifiedPowers.Settings.of(12), Progress.NONE);
        for (int i = 0; i < size; i++) {
            for (int j = 0; j < size; j++) {
                assertEquals(Decimals.format(exact.get(i, j), 12), c[i][j].text());
            }
        }
    }

    // invariant: an enclosure at any precision contains the exact value (common practice, no source)
    @Property(tries = 60, seed = "99")
    void enclosuresContainTheExactValue(@ForAll @IntRange(min = 0, max = 1_000_000) int seed,
                                        @ForAll @IntRange(min = 1, max = 200) int bits,
                                        @ForAll @LongRange(min = 0, max = 300) long n) {
        Random rnd = new Random(seed);
        int size = 1 + rnd.nextInt(8);
        RationalMatrix p = randomChain(rnd, size, rnd.nextBoolean());
        int from = rnd.nextInt(size);
        Rational[] exact = MatrixPowers.rowOfPower(p, from, n);
        Enclosure[] e = CertifiedPowers.rowEnclosure(SparseRationalMatrix.of(p), from, n, bits, Progress.NONE);
        for (int j = 0; j < size; j++) {
            assertTrue(e[j].contains(exact[j]), "bits " + bits + ", entry " + j + ": " + e[j] + " vs " + exact[j]);
            if (exact[j].isZero()) {
                assertTrue(e[j].isExact(), "zeros are exact");
            }
        }
    }

    /** A value within {@code 10^-k} of the rounding boundary {@code 0.x5} at one digit, on either side. */
    private static Rational nearMidpoint(int tenths, int k, int side) {
        Rational mid = Rational.of(2 * tenths + 1, 20);
        return mid.add(Rational.of(BigInteger.valueOf(side), BigInteger.TEN.pow(k)));
    }

    // constructed near-halfway cases: the exact value and its half-even rounding are known by construction
    // (derived by hand: rank-one chains, P^n = P)
    @Test
    void valuesNextToARoundingBoundaryAreRoundedCorrectly() {
        for (int k : new int[] {5, 20, 60, 150}) {
            for (int side : new int[] {-1, 1}) {
                Rational x = nearMidpoint(2, k, side);          // 0.25 +- 10^-k
                RationalMatrix p = rankOne(x, Rational.ONE.subtract(x));
                CertifiedDecimal[] c = CertifiedPowers.row(SparseRationalMatrix.of(p), 0, 1000,
                    CertifiedPowers.Settings.of(1), Progress.NONE);
                assertEquals(side < 0 ? "0.2" : "0.3", c[0].text(), "0.25 " + (side < 0 ? "-" : "+") + " 1e-" + k);
                assertEquals(side < 0 ? "0.8" : "0.7", c[1].text());
                assertEquals(CertifiedDecimal.Status.CERTIFIED, c[0].status());
            }
        }
    }

    // derived by hand: 1/4 at one digit is the tie 0.25, rounded half-even to 0.2; 5/12 = 0.41.. to 0.4, 1/3 to 0.3
    @Test
    void anExactTieFallsBackToExactArithmetic() {
        RationalMatrix p = rankOne(Rational.of(1, 4), Rational.of(5, 12), Rational.of(1, 3));
        CertifiedDecimal[] c = CertifiedPowers.row(SparseRationalMatrix.of(p), 1, 50,
            CertifiedPowers.Settings.of(1), Progress.NONE);
        assertEquals("0.2", c[0].text());
        assertEquals("0.4", c[1].text());
        assertEquals("0.3", c[2].text());
        assertEquals(CertifiedDecimal.Status.EXACT, c[0].status());
        assertEquals(CertifiedDecimal.Status.CERTIFIED, c[1].status());
    }

    // derived by hand: a dyadic chain is computed without rounding, so the enclosure is a point and the tie is exact
    @Test
    void aDyadicTieIsExactWithoutTheFallBack() {
        RationalMatrix p = rankOne(Rational.of(1, 4), Rational.of(3, 4));
        CertifiedDecimal c = CertifiedPowers.entry(SparseRationalMatrix.of(p), 0, 0, 50,
            new CertifiedPowers.Settings(1, 256, 0), Progress.NONE);
        assertEquals("0.2", c.text());
        assertTrue(c.enclosure().isExact());
    }

    // derived by hand: without the exact fall-back the tie is reported as an interval that contains 1/4 (the other
    // entries are not dyadic, so the fixed-point sums round and the enclosure of 1/4 is not a point)
    @Test
    void anExactTieWithoutTheFallBackIsReportedAsAnInterval() {
        RationalMatrix p = rankOne(Rational.of(1, 4), Rational.of(5, 12), Rational.of(1, 3));
        CertifiedDecimal c = CertifiedPowers.entry(SparseRationalMatrix.of(p), 1, 0, 50,
            new CertifiedPowers.Settings(1, 256, 0), Progress.NONE);
        assertEquals(CertifiedDecimal.Status.NOT_RESOLVED, c.status());
        assertEquals("[0.2, 0.3]", c.text());
        assertTrue(c.enclosure().contains(Rational.of(1, 4)));
    }

    // reference: the exact row by path sums (MatrixPowers); a sparse chain of 400 states whose dense square would
    // be wasteful: a ring with a self-loop, invented for the test
    @Test
    void aLargeSparseRingAgreesWithTheExactRow() {
        int s = 400;
        int[][] cols = new int[s][];
        Rational[][] vals = new Rational[s][];
        for (int i = 0; i < s; i++) {
            int next = (i + 1) % s;
            cols[i] = i < next ? new int[] {i, next} : new int[] {next, i};
            vals[i] = i < next ? new Rational[] {Rational.of(1, 3), Rational.of(2, 3)}
                : new Rational[] {Rational.of(2, 3), Rational.of(1, 3)};
        }
        SparseRationalMatrix p = SparseRationalMatrix.ofRows(s, cols, vals);
        Rational[] exact = MatrixPowers.rowOfPower(p.toDense(), 0, 250);
        CertifiedDecimal[] c = CertifiedPowers.row(p, 0, 250, CertifiedPowers.Settings.of(15), Progress.NONE);
        for (int j = 0; j < s; j++) {
            assertEquals(Decimals.format(exact[j], 15), c[j].text(), "column " + j);
        }
    }

    // common practice, no source: the monotone bounds need non-negative entries
    @Test
    void negativeEntriesAreRefused() {
        RationalMatrix q = RationalMatrix.of(new Rational[][] {
            {Rational.of(-1, 2), Rational.of(1, 2)}, {Rational.of(1, 3), Rational.of(-1, 3)}});
        assertThrows(IllegalArgumentException.class,
            () -> CertifiedPowers.row(SparseRationalMatrix.of(q), 0, 5, CertifiedPowers.Settings.of(6), Progress.NONE));
    }
}
