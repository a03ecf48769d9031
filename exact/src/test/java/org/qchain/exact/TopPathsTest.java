package org.qchain.exact;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;
import org.junit.jupiter.api.Test;

/** The K most probable paths, against brute-force enumeration of all paths on small chains. */
class TopPathsTest {

    /** Every path of n steps from {@code from} to {@code to} with positive probability, best first, ties lexicographic. */
    static List<WeightedPath> bruteForce(RationalMatrix p, int from, int to, int n) {
        List<WeightedPath> all = new ArrayList<>();
        extend(p, new ArrayList<>(List.of(from)), Rational.ONE, n, to, all);
        Comparator<WeightedPath> lex = (x, y) -> {
            for (int i = 0; i < x.states().size(); i++) {
                int c = Integer.compare(x.states().get(i), y.states().get(i));
                if (c != 0) {
                    return c;
                }
            }
            return 0;
        };
        all.sort(Comparator.comparing(WeightedPath::probability).reversed().thenComparing(lex));
        return all;
    }

    private static void extend(RationalMatrix p, List<Integer> path, Rational prob, int left, int to,
            List<WeightedPath> out) {
        int last = path.get(path.size() - 1);
        if (left == 0) {
            if (last == to) {
                out.add(new WeightedPath(path, prob));
            }
            return;
        }
        for (int j = 0; j < p.cols(); j++) {
            Rational x = p.get(last, j);
            if (!x.isZero()) {
                path.add(j);
                extend(p, path, prob.multiply(x), left - 1, to, out);
                path.remove(path.size() - 1);
            }
        }
    }

    // common practice, no source: the best K of an exhaustive list, with the stated tie order (coarse
    // denominators make ties frequent)
    @Property(seed = "424242", tries = 60)
    void equalsBruteForce(@ForAll @LongRange(min = 0, max = 1_000_000) long seed,
            @ForAll @IntRange(min = 1, max = 4) int size, @ForAll @IntRange(min = 0, max = 7) int n,
            @ForAll @IntRange(min = 1, max = 12) int k) {
        assertBestOfBruteForce(new Random(seed), size, n, k, 0.3);
    }

    // common practice, no source: without the backward pruning (used for very long paths) the result is the same
    @Property(seed = "4343", tries = 30)
    void sameWithoutPruning(@ForAll @LongRange(min = 0, max = 1_000_000) long seed,
            @ForAll @IntRange(min = 1, max = 4) int size, @ForAll @IntRange(min = 1, max = 7) int n,
            @ForAll @IntRange(min = 1, max = 12) int k) {
        long saved = TopPaths.maxPruningBits;
        TopPaths.maxPruningBits = 0;
        try {
            assertBestOfBruteForce(new Random(seed), size, n, k, 0.5);
        } finally {
            TopPaths.maxPruningBits = saved;
        }
    }

    private static void assertBestOfBruteForce(Random rnd, int size, int n, int k, double sparsity) {
        RationalMatrix p = RandomChains.stochastic(rnd, size, 4, sparsity);
        int from = rnd.nextInt(size);
        int to = rnd.nextInt(size);
        List<WeightedPath> all = bruteForce(p, from, to, n);
        assertEquals(all.subList(0, Math.min(k, all.size())), TopPaths.mostProbable(p, from, to, n, k));
    }

    // common practice, no source: the paths are disjoint events inside "at state to after n steps", so their
    // probabilities sum to at most the n-step entry, and to exactly it when K covers all paths
    @Property(seed = "8", tries = 30)
    void probabilitiesSumToAtMostTheEntry(@ForAll @LongRange(min = 0, max = 1_000_000) long seed,
            @ForAll @IntRange(min = 1, max = 5) int size, @ForAll @IntRange(min = 1, max = 6) int n,
            @ForAll @IntRange(min = 1, max = 20) int k) {
        Random rnd = new Random(seed);
        RationalMatrix p = RandomChains.stochastic(rnd, size, 30, 0.4);
        int from = rnd.nextInt(size);
        int to = rnd.nextInt(size);
        List<WeightedPath> top = TopPaths.mostProbable(p, from, to, n, k);
        Rational sum = top.stream().map(WeightedPath::probability).reduce(Rational.ZERO, Rational::add);
        Rational entry = MatrixPowers.entryOfPower(p, from, to, n);
        assertTrue(sum.compareTo(entry) <= 0);
        List<WeightedPath> all = TopPaths.mostProbable(p, from, to, n, Integer.MAX_VALUE);
        assertEquals(entry, all.stream().map(WeightedPath::probability).reduce(Rational.ZERO, Rational::add));
        for (WeightedPath w : top) {
            assertEquals(n + 1, w.states().size());
            assertEquals(from, w.states().get(0));
            assertEquals(to, w.states().get(n));
        }
    }

    // common practice, no source: K larger than the number of paths returns them all
    @Test
    void moreRequestedThanExist() {
        Rational h = Rational.of(1, 2);
        RationalMatrix p = RationalMatrix.of(new Rational[][] {{h, h}, {Rational.ONE, Rational.ZERO}});
        // paths of 3 steps from 0 to 0: 0000, 0010, 0100 (1/8, 1/4, 1/4); 0-1-1 is impossible
        List<WeightedPath> all = TopPaths.mostProbable(p, 0, 0, 3, 100);
        assertEquals(List.of(
                new WeightedPath(List.of(0, 0, 1, 0), Rational.of(1, 4)),
                new WeightedPath(List.of(0, 1, 0, 0), Rational.of(1, 4)),
                new WeightedPath(List.of(0, 0, 0, 0), Rational.of(1, 8))), all);
        assertEquals(List.of(new WeightedPath(List.of(1), Rational.ONE)), TopPaths.mostProbable(p, 1, 1, 0, 3));
        assertEquals(List.of(), TopPaths.mostProbable(p, 1, 0, 0, 3));
        RationalMatrix absorbing = RationalMatrix.of(new Rational[][] {{Rational.ONE, Rational.ZERO}, {h, h}});
        assertEquals(List.of(), TopPaths.mostProbable(absorbing, 0, 1, 5, 3));
    }

    // common practice, no source: long paths on a larger chain stay cheap and consistent with the row sums
    @Test
    void longPathsOnALargerChain() {
        RationalMatrix p = RandomChains.stochastic(new Random(77), 30, 50, 0.85);
        List<WeightedPath> top = TopPaths.mostProbable(p, 0, 5, 200, 5);
        Rational entry = MatrixPowers.entryOfPower(p, 0, 5, 200);
        Rational sum = top.stream().map(WeightedPath::probability).reduce(Rational.ZERO, Rational::add);
        assertTrue(sum.compareTo(entry) <= 0);
        for (int i = 1; i < top.size(); i++) {
            assertTrue(top.get(i - 1).probability().compareTo(top.get(i).probability()) >= 0);
        }
    }

    // common practice, no source: preconditions
    @Test
    void rejectsBadArguments() {
        RationalMatrix signed = RationalMatrix.of(new Rational[][] {{Rational.of(-1), Rational.of(2)},
            {Rational.ONE, Rational.ZERO}});
        RationalMatrix p = RandomChains.stochastic(new Random(1), 3, 5, 0);
        assertThrows(IllegalArgumentException.class, () -> TopPaths.mostProbable(signed, 0, 0, 2, 1));
        assertThrows(IllegalArgumentException.class, () -> TopPaths.mostProbable(p, 0, 0, 2, 0));
        assertThrows(IllegalArgumentException.class, () -> TopPaths.mostProbable(p, 0, 0, -1, 1));
        assertThrows(IndexOutOfBoundsException.class, () -> TopPaths.mostProbable(p, 0, 3, 2, 1));
    }
}
