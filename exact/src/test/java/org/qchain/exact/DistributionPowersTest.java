package org.qchain.exact;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;
import org.junit.jupiter.api.Test;

/** Distributions after n steps, alone and in series, against plain products of the matrix (fixed seeds). */
class DistributionPowersTest {

    /** start · P^n by the definition: n plain vector–matrix products in rationals. */
    private static Rational[] naive(RationalMatrix p, Rational[] start, long n) {
        Rational[] v = start.clone();
        for (long t = 0; t < n; t++) {
            Rational[] w = new Rational[v.length];
            for (int j = 0; j < v.length; j++) {
                Rational sum = Rational.ZERO;
                for (int i = 0; i < v.length; i++) {
                    sum = sum.add(v[i].multiply(p.get(i, j)));
                }
                w[j] = sum;
            }
            v = w;
        }
        return v;
    }

    private static Rational[] randomDistribution(Random rnd, int size) {
        Rational[] d = new Rational[size];
        Rational rest = Rational.ONE;
        for (int i = 0; i < size - 1; i++) {
            d[i] = rest.multiply(Rational.of(rnd.nextInt(8), 7 + rnd.nextInt(5)));
            rest = rest.subtract(d[i]);
        }
        d[size - 1] = rest;
        return d;
    }

    // common practice, no source: the distribution after n steps is start * P^n, the product taken n times
    @Property(seed = "20261203", tries = 40)
    void seriesEqualsRepeatedProducts(@ForAll @LongRange(min = 0, max = 1_000_000) long seed,
            @ForAll @IntRange(min = 1, max = 7) int size, @ForAll @IntRange(min = 0, max = 6) int first,
            @ForAll @IntRange(min = 1, max = 9) int gap) {
        Random rnd = new Random(seed);
        RationalMatrix p = RandomChains.stochastic(rnd, size, 40, 0.4);
        Rational[] start = randomDistribution(rnd, size);
        long[] ns = {first, first + gap, first + 2L * gap + 1};
        List<Rational[]> got = DistributionPowers.series(p, start, ns, Progress.NONE);
        for (int k = 0; k < ns.length; k++) {
            assertArrayEquals(naive(p, start, ns[k]), got.get(k), "n = " + ns[k]);
        }
    }

    // common practice, no source: a point start e_i gives row i of P^n (against the exact engine's power)
    @Property(seed = "31", tries = 25)
    void pointStartGivesTheRowOfThePower(@ForAll @LongRange(min = 0, max = 1_000_000) long seed,
            @ForAll @IntRange(min = 2, max = 6) int size, @ForAll @IntRange(min = 50, max = 400) int n) {
        Random rnd = new Random(seed);
        RationalMatrix p = RandomChains.stochastic(rnd, size, 30, 0.3);
        int from = rnd.nextInt(size);
        Rational[] start = new Rational[size];
        java.util.Arrays.fill(start, Rational.ZERO);
        start[from] = Rational.ONE;
        // a long gap goes through repeated squaring, a short one through vector steps
        List<Rational[]> got = DistributionPowers.series(p, start, new long[] {1, n, n + 1}, Progress.NONE);
        assertArrayEquals(p.row(from), got.get(0));
        assertArrayEquals(MatrixPowers.power(p, n).row(from), got.get(1));
        assertArrayEquals(MatrixPowers.power(p, n + 1).row(from), got.get(2));
    }

    // common practice, no source: probabilities are conserved, every distribution sums to exactly 1
    @Test
    void distributionsSumToOne() {
        Random rnd = new Random(5);
        RationalMatrix p = RandomChains.stochastic(rnd, 5, 90, 0.2);
        Rational[] start = randomDistribution(rnd, 5);
        for (Rational[] v : DistributionPowers.series(p, start, new long[] {0, 3, 64, 65, 200}, Progress.NONE)) {
            Rational sum = Rational.ZERO;
            for (Rational x : v) {
                sum = sum.add(x);
            }
            assertEquals(Rational.ONE, sum);
        }
    }

    @Test
    void refusesStepCountsOutOfOrder() {
        RationalMatrix p = RationalMatrix.identity(2);
        Rational[] start = {Rational.ONE, Rational.ZERO};
        assertThrows(IllegalArgumentException.class,
            () -> DistributionPowers.series(p, start, new long[] {3, 3}, Progress.NONE));
        assertThrows(IllegalArgumentException.class,
            () -> DistributionPowers.series(p, start, new long[] {}, Progress.NONE));
        assertThrows(IllegalArgumentException.class,
            () -> DistributionPowers.series(p, new Rational[] {Rational.ONE}, new long[] {1}, Progress.NONE));
    }
}
