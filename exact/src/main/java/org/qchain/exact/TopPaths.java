package org.qchain.exact;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;

/**
 * The most probable paths of a given length between two states, without enumerating all paths.
 *
 * <p>K-best dynamic programming over the {@code n} layers: for every layer {@code t} and state {@code j} it keeps
 * the (at most) {@code K} best prefixes of {@code t} steps from the start to {@code j}. The best {@code K} paths
 * into {@code (t+1, j)} all extend one of the kept prefixes of a predecessor (a prefix that is not among the best
 * {@code K} of its state has {@code K} better ones, and each of them extended by the same step is better), so
 * nothing is lost. States from which the target cannot be reached in the remaining steps are dropped first (when
 * {@code (n + 1) × states} is at most 2^26; beyond that only at the last layer). Work is about
 * {@code n × transitions × K} multiplications and comparisons. Weights are kept as integers over the common denominator
 * {@code d^t}, so comparing two prefixes of one layer needs no fractions.
 *
 * <p>Order: higher probability first; equal probabilities in ascending lexicographic order of their state
 * sequences (state indices as in the matrix).
 */
public final class TopPaths {
    private TopPaths() {
    }

    /**
     * The {@code k} most probable paths of exactly {@code n} steps from {@code from} to {@code to}.
     *
     * @param p    a square matrix with non-negative entries (one-step probabilities)
     * @param from the first state, 0-based
     * @param to   the last state, 0-based
     * @param n    the number of steps, {@code >= 0}
     * @param k    how many paths, {@code >= 1}
     * @return at most {@code k} paths with positive probability, best first; fewer if there are fewer such paths,
     *         empty if there is none
     * @throws IllegalArgumentException  if {@code p} is not square or has a negative entry, or {@code n < 0}, or
     *                                   {@code k < 1}
     * @throws IndexOutOfBoundsException if {@code from} or {@code to} is out of range
     * @throws QchainException           with {@link ErrorKey#INTERRUPTED} if the thread is interrupted
     */
    public static List<WeightedPath> mostProbable(RationalMatrix p, int from, int to, int n, int k) {
        return mostProbable(p, from, to, n, k, Progress.NONE);
    }

    /**
     * As {@link #mostProbable(RationalMatrix, int, int, int, int)}, reporting one progress step (phase
     * {@code "paths"}) per layer.
     *
     * @param p        a square matrix with non-negative entries
     * @param from     the first state, 0-based
     * @param to       the last state, 0-based
     * @param n        the number of steps, {@code >= 0}
     * @param k        how many paths, {@code >= 1}
     * @param progress receives coarse progress reports
     * @return at most {@code k} paths, best first
     * @throws IllegalArgumentException  if {@code p} is not square or has a negative entry, or {@code n < 0}, or
     *                                   {@code k < 1}
     * @throws IndexOutOfBoundsException if {@code from} or {@code to} is out of range
     * @throws QchainException           with {@link ErrorKey#INTERRUPTED} if the thread is interrupted
     */
    public static List<WeightedPath> mostProbable(RationalMatrix p, int from, int to, int n, int k,
            Progress progress) {
        CommonDenominatorForm.requireSquare(p);
        int s = p.rows();
        Objects.checkIndex(from, s);
        Objects.checkIndex(to, s);
        if (n < 0) {
            throw new IllegalArgumentException("number of steps must not be negative: " + n);
        }
        if (k < 1) {
            throw new IllegalArgumentException("number of paths must be at least 1: " + k);
        }
        for (int i = 0; i < s; i++) {
            for (int j = 0; j < s; j++) {
                if (p.get(i, j).signum() < 0) {
                    throw new IllegalArgumentException("negative entry at (" + i + ", " + j + "): " + p.get(i, j));
                }
            }
        }
        if (n == 0) {
            return from == to ? List.of(new WeightedPath(List.of(from), Rational.ONE)) : List.of();
        }
        CommonDenominatorForm f = CommonDenominatorForm.of(p);
        IntMatrix a = f.a;
        BitSet[] alive = (long) (n + 1) * s <= maxPruningBits ? backwardReach(a, to, n) : null;
        if (alive != null && !alive[0].get(from)) {
            return List.of();
        }
        Thread caller = Thread.currentThread();
        @SuppressWarnings("unchecked")
        List<Prefix>[] cur = new List[s];
        cur[from] = List.of(new Prefix(new Node(from, null), BigInteger.ONE));
        for (int t = 1; t <= n; t++) {
            MatrixPowers.checkInterrupt(caller);
            @SuppressWarnings("unchecked")
            List<Prefix>[] next = new List[s];
            BitSet ok = alive == null ? null : alive[t];
            for (int i = 0; i < s; i++) {
                if (cur[i] == null) {
                    continue;
                }
                for (int j : a.nz[i]) {
                    if (ok != null ? !ok.get(j) : t == n && j != to) {
                        continue;
                    }
                    if (next[j] == null) {
                        next[j] = new ArrayList<>();
                    }
                    BigInteger aij = a.e[i][j];
                    for (Prefix x : cur[i]) {
                        next[j].add(new Prefix(new Node(j, x.node), x.weight.multiply(aij)));
                    }
                }
            }
            for (int j = 0; j < s; j++) {
                if (next[j] != null && next[j].size() > 1) {
                    next[j].sort(BEST_FIRST);
                    if (next[j].size() > k) {
                        next[j] = new ArrayList<>(next[j].subList(0, k));
                    }
                }
            }
            cur = next;
            progress.update("paths", t, n);
        }
        KnownDenominator den = KnownDenominator.power(f.d, n);
        List<WeightedPath> out = new ArrayList<>();
        for (Prefix x : cur[to] == null ? List.<Prefix>of() : cur[to]) {
            out.add(new WeightedPath(x.node.states(n), den.reduce(x.weight)));
        }
        return out;
    }

    /** {@code alive[t]}: the states from which {@code to} can be reached in exactly {@code n - t} steps. */
    private static BitSet[] backwardReach(IntMatrix a, int to, int n) {
        BitSet[] alive = new BitSet[n + 1];
        alive[n] = new BitSet();
        alive[n].set(to);
        for (int t = n - 1; t >= 0; t--) {
            BitSet b = new BitSet();
            BitSet later = alive[t + 1];
            for (int i = 0; i < a.n; i++) {
                for (int j : a.nz[i]) {
                    if (later.get(j)) {
                        b.set(i);
                        break;
                    }
                }
            }
            alive[t] = b;
        }
        return alive;
    }

    /**
     * A path as a persistent list from its last state back to the first; prefixes share their beginnings. Weights
     * are not kept here but only for the current layer ({@link Prefix}), so old layers hold no big numbers.
     */
    private static final class Node {
        final int state;
        final Node parent;

        Node(int state, Node parent) {
            this.state = state;
            this.parent = parent;
        }

        List<Integer> states(int steps) {
            Integer[] st = new Integer[steps + 1];
            Node x = this;
            for (int i = steps; i >= 0; i--) {
                st[i] = x.state;
                x = x.parent;
            }
            return List.of(st);
        }
    }

    /**
     * Compares two prefixes of the same length in lexicographic order of their states. Prefixes share their
     * beginnings, so walk back from the end until the two chains meet; the last difference seen is the first one.
     */
    private static int lexicographic(Node x, Node y) {
        int c = 0;
        while (x != y) {
            if (x.state != y.state) {
                c = Integer.compare(x.state, y.state);
            }
            x = x.parent;
            y = y.parent;
        }
        return c;
    }

    /** A kept prefix of the current layer and its weight (an integer over {@code d^t}). */
    private record Prefix(Node node, BigInteger weight) {
    }

    private static final Comparator<Prefix> BEST_FIRST = (x, y) -> {
        int c = y.weight.compareTo(x.weight);
        return c != 0 ? c : lexicographic(x.node, y.node);
    };

    /** Above this many bits ({@code (n + 1) × states}) the backward pruning sets are not built (tests lower it). */
    static volatile long maxPruningBits = 1L << 26;
}
