package org.qchain.exact.longrun;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.linear.SingularSystemException;

/**
 * Long-run and absorption quantities of a discrete-time chain, written once for any {@link Arithmetic} (exact
 * rationals, or rational functions of the parameters). Every linear system goes through the arithmetic's exact
 * fraction-free solver; no inverse is formed where a solve does.
 *
 * <p>Sources of the formulas: J. G. Kemeny and J. L. Snell, <i>Finite Markov Chains</i> (1960), ch. III–IV
 * (fundamental matrix N = (I − Q)^−1, t = N·1, variance (2N − I)t − t∘t, B = N R; Z = (I − P + W)^−1 and
 * m_ij = (z_jj − z_ij)/π_j); C. M. Grinstead and J. L. Snell, <i>Introduction to Probability</i>, ch. 11.
 */
public final class ChainEngine {
    private ChainEngine() {
    }

    /**
     * One class with its stationary law.
     *
     * @param states         state indices, ascending
     * @param closed         whether the class is closed
     * @param period         the period (0: no return possible)
     * @param stationary     for a closed class, the stationary law on its states (same order); empty otherwise
     * @param meanRecurrence for a closed class, 1/π_i on its states; empty otherwise
     */
    public record ClassLaw<T>(List<Integer> states, boolean closed, int period, List<T> stationary,
                              List<T> meanRecurrence) {
        /** Copies the lists. */
        public ClassLaw {
            states = List.copyOf(states);
            stationary = List.copyOf(stationary);
            meanRecurrence = List.copyOf(meanRecurrence);
        }
    }

    /**
     * The long run of a chain.
     *
     * @param structure  classes and periods
     * @param classes    each class with its law, in the structure's order
     * @param absorption for each transient state (structure order), the probability of ending in each closed class
     *                   (in the order of {@link Structure#closedClasses()})
     * @param limit      the limit of P^n, or of its Cesàro averages if a closed class is periodic (n x n)
     * @param cesaro     whether some closed class has period above 1 (so {@code limit} is a Cesàro limit)
     * @param passage    for an irreducible chain on request: mean first-passage times m_ij (m_ii the mean recurrence)
     */
    public record LongRun<T>(Structure structure, List<ClassLaw<T>> classes, List<List<T>> absorption,
                             List<List<T>> limit, boolean cesaro, Optional<List<List<T>>> passage) {
        /** Copies the lists. */
        public LongRun {
            classes = List.copyOf(classes);
            absorption = absorption.stream().map(List::copyOf).toList();
            limit = limit.stream().map(List::copyOf).toList();
        }
    }

    /**
     * Absorption quantities.
     *
     * @param transientStates the non-absorbing states (ascending)
     * @param absorbingStates the absorbing states, given and made (ascending)
     * @param fundamental     N = (I − Q)^−1: expected visits to transient j from transient i
     * @param expectedSteps   t = N·1
     * @param variance        (2N − I)t − t∘t
     * @param probabilities   B = N R: probability of absorption in each absorbing state
     */
    public record Absorption<T>(List<Integer> transientStates, List<Integer> absorbingStates,
                                List<List<T>> fundamental, List<T> expectedSteps, List<T> variance,
                                List<List<T>> probabilities) {
        /** Copies the lists. */
        public Absorption {
            transientStates = List.copyOf(transientStates);
            absorbingStates = List.copyOf(absorbingStates);
            fundamental = fundamental.stream().map(List::copyOf).toList();
            expectedSteps = List.copyOf(expectedSteps);
            variance = List.copyOf(variance);
            probabilities = probabilities.stream().map(List::copyOf).toList();
        }
    }

    /** Which entries are not zero. */
    public static <T> boolean[][] graph(Arithmetic<T> f, List<List<T>> p) {
        int n = p.size();
        boolean[][] e = new boolean[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                e[i][j] = !f.isZero(p.get(i).get(j));
            }
        }
        return e;
    }

    /**
     * Stationary laws per closed class, absorption into closed classes, the (Cesàro) limit of P^n and, on request,
     * mean first-passage times.
     *
     * @param f       the arithmetic
     * @param p       the transition matrix
     * @param names   state names, for messages
     * @param passage whether to compute mean first-passage times (needs an irreducible chain)
     * @throws QchainException with {@link ErrorKey#NOT_APPLICABLE} if passage times are asked of a reducible chain
     */
    public static <T> LongRun<T> longRun(Arithmetic<T> f, List<List<T>> p, List<String> names, boolean passage) {
        return longRun(f, p, names, passage, false);
    }

    /**
     * The long run of a continuous-time chain from its generator Q: stationary laws from π Q_C = 0 on each closed
     * class, the probability of ending in each closed class from (−Q_TT) H = R, the limit of P(t) as t grows, the
     * mean recurrence time 1/(π_i q_i) (q_i = −Q_ii, the time from one entry into i to the next; none for a state
     * that is never left) and, on request, mean first-passage times (via the uniformized chain
     * P = I + Q/Λ: m_ij = m'_ij / Λ for i ≠ j, m_ii the mean recurrence time). A continuous chain is never periodic:
     * every period is 1.
     *
     * <p>Sources: J. R. Norris, <i>Markov Chains</i> (1997), ch. 3.5–3.6 (invariant distributions πQ = 0, mean
     * return times 1/(π_i q_i), hitting probabilities and expected hitting times of the jump chain and the
     * generator); uniformization: S. M. Ross, <i>Introduction to Probability Models</i>, ch. 6.
     *
     * @param f       the arithmetic
     * @param q       the generator (rows sum to 0)
     * @param names   state names, for messages
     * @param passage whether to compute mean first-passage times (needs an irreducible chain of two or more states)
     * @return the long run, times in the model's time unit
     */
    public static <T> LongRun<T> longRunContinuous(Arithmetic<T> f, List<List<T>> q, List<String> names,
            boolean passage) {
        if (passage && q.size() < 2) {
            throw new QchainException(ErrorKey.NOT_APPLICABLE, "--passage",
                "mean first-passage times need at least two states");
        }
        return longRun(f, q, names, passage, true);
    }

    private static <T> LongRun<T> longRun(Arithmetic<T> f, List<List<T>> p, List<String> names, boolean passage,
            boolean continuous) {
        int n = p.size();
        Structure s = Structure.of(continuous ? generatorGraph(f, p) : graph(f, p));
        if (passage && !s.irreducible()) {
            throw new QchainException(ErrorKey.NOT_APPLICABLE, "--passage",
                "mean first-passage times between all states need an irreducible chain; this one has "
                    + s.classes().size() + " classes (use qchain absorb --absorbing STATE for the time to reach one)");
        }
        List<ClassLaw<T>> laws = new ArrayList<>();
        List<List<T>> limit = zeros(f, n, n);
        boolean cesaro = false;
        List<Integer> closedIdx = s.closedClasses();
        List<List<T>> pis = new ArrayList<>();
        for (int c = 0; c < s.classes().size(); c++) {
            List<Integer> cls = s.classes().get(c);
            if (!s.closed().get(c)) {
                laws.add(new ClassLaw<>(cls, false, s.periods().get(c), List.of(), List.of()));
                continue;
            }
            List<T> pi = continuous ? stationaryOfGenerator(f, p, cls) : stationary(f, p, cls);
            pis.add(pi);
            List<T> rec = continuous ? meanReturnTimes(f, p, cls, pi) : pi.stream().map(x -> f.divide(f.one(), x)).toList();
            laws.add(new ClassLaw<>(cls, true, s.periods().get(c), pi, rec));
            cesaro |= s.periods().get(c) > 1;
            for (int i : cls) {
                for (int k = 0; k < cls.size(); k++) {
                    limit.get(i).set(cls.get(k), pi.get(k));
                }
            }
        }
        List<Integer> tr = s.transients();
        List<List<T>> h = List.of();
        if (!tr.isEmpty()) {
            // (I − Q) H = R with R(i, c) = P(i, class c): the probability of ending in closed class c
            List<List<T>> r = zeros(f, tr.size(), closedIdx.size());
            for (int a = 0; a < tr.size(); a++) {
                for (int c = 0; c < closedIdx.size(); c++) {
                    T sum = f.zero();
                    for (int j : s.classes().get(closedIdx.get(c))) {
                        sum = f.add(sum, p.get(tr.get(a)).get(j));
                    }
                    r.get(a).set(c, sum);
                }
            }
            h = solveTransient(f, p, tr, r, names, continuous);
            for (int a = 0; a < tr.size(); a++) {
                for (int c = 0; c < closedIdx.size(); c++) {
                    List<Integer> cls = s.classes().get(closedIdx.get(c));
                    for (int k = 0; k < cls.size(); k++) {
                        T v = f.multiply(h.get(a).get(c), pis.get(c).get(k));
                        limit.get(tr.get(a)).set(cls.get(k), v);
                    }
                }
            }
        }
        Optional<List<List<T>>> m = Optional.empty();
        if (passage) {
            m = Optional.of(continuous ? passageTimesContinuous(f, p, pis.get(0)) : passageTimes(f, p, pis.get(0)));
        }
        return new LongRun<>(s, laws, h, limit, cesaro, m);
    }

    /** The stationary law of the closed class {@code cls}: π (P_C − I) = 0, π·1 = 1. */
    static <T> List<T> stationary(Arithmetic<T> f, List<List<T>> p, List<Integer> cls) {
        int k = cls.size();
        List<List<T>> a = zeros(f, k, k);
        for (int x = 0; x < k; x++) {
            for (int y = 0; y < k; y++) {
                T v = p.get(cls.get(x)).get(cls.get(y));
                a.get(x).set(y, x == y ? f.subtract(v, f.one()) : v);
            }
        }
        return f.leftNullVector(a);
    }

    /** The stationary law of the closed class {@code cls} of a continuous chain: π Q_C = 0, π·1 = 1. */
    static <T> List<T> stationaryOfGenerator(Arithmetic<T> f, List<List<T>> q, List<Integer> cls) {
        int k = cls.size();
        List<List<T>> a = zeros(f, k, k);
        for (int x = 0; x < k; x++) {
            for (int y = 0; y < k; y++) {
                a.get(x).set(y, q.get(cls.get(x)).get(cls.get(y)));
            }
        }
        return f.leftNullVector(a);
    }

    /**
     * Mean return times 1/(π_i q_i) on a closed class of a continuous chain; empty for a state that is never left
     * (an absorbing state, the only case where q_i is zero in a closed class).
     */
    static <T> List<T> meanReturnTimes(Arithmetic<T> f, List<List<T>> q, List<Integer> cls, List<T> pi) {
        List<T> out = new ArrayList<>();
        for (int k = 0; k < cls.size(); k++) {
            T exit = f.negate(q.get(cls.get(k)).get(cls.get(k)));
            if (f.isZero(exit)) {
                return List.of();
            }
            out.add(f.divide(f.one(), f.multiply(pi.get(k), exit)));
        }
        return out;
    }

    /**
     * Mean first-passage times of an irreducible continuous chain: those of its uniformized chain P = I + Q/Λ with
     * Λ = 1 + Σ q_i (any Λ at least the largest exit rate gives the same times), divided by Λ, since each step of
     * the uniformized chain lasts 1/Λ on average (Wald's identity); the diagonal holds the mean return times.
     */
    static <T> List<List<T>> passageTimesContinuous(Arithmetic<T> f, List<List<T>> q, List<T> pi) {
        int n = q.size();
        T rate = f.one();
        for (int i = 0; i < n; i++) {
            rate = f.subtract(rate, q.get(i).get(i));
        }
        List<List<T>> p = zeros(f, n, n);
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                T v = f.divide(q.get(i).get(j), rate);
                p.get(i).set(j, i == j ? f.add(f.one(), v) : v);
            }
        }
        List<List<T>> m = passageTimes(f, p, pi);
        List<T> ret = meanReturnTimes(f, q, java.util.stream.IntStream.range(0, n).boxed().toList(), pi);
        List<List<T>> out = zeros(f, n, n);
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                out.get(i).set(j, i == j ? ret.get(i) : f.divide(m.get(i).get(j), rate));
            }
        }
        return out;
    }

    /** m_ij = (z_jj − z_ij)/π_j, m_ii = 1/π_i, with Z = (I − P + W)^−1 (Kemeny and Snell, ch. IV). */
    static <T> List<List<T>> passageTimes(Arithmetic<T> f, List<List<T>> p, List<T> pi) {
        int n = p.size();
        List<List<T>> a = zeros(f, n, n);
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                T v = f.add(f.subtract(i == j ? f.one() : f.zero(), p.get(i).get(j)), pi.get(j));
                a.get(i).set(j, v);
            }
        }
        List<List<T>> z = f.solve(a, identity(f, n));
        List<List<T>> m = zeros(f, n, n);
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                m.get(i).set(j, i == j ? f.divide(f.one(), pi.get(j))
                    : f.divide(f.subtract(z.get(j).get(j), z.get(i).get(j)), pi.get(j)));
            }
        }
        return m;
    }

    /**
     * N, t, variance and B for the chain with {@code extra} made absorbing.
     *
     * @param f     the arithmetic
     * @param p     the transition matrix
     * @param names state names, for messages
     * @param extra states to make absorbing (their rows become e_i)
     * @throws QchainException with {@link ErrorKey#NOT_APPLICABLE} if there is no absorbing state, or
     *                         {@link ErrorKey#SINGULAR_SYSTEM} naming the states that can never be absorbed
     */
    public static <T> Absorption<T> absorb(Arithmetic<T> f, List<List<T>> p, List<String> names, Set<Integer> extra) {
        return absorb(f, p, names, extra, false, true);
    }

    /**
     * Absorption without the fundamental matrix (its list is then empty): t, the variance and B from two solves with
     * one and 1 + (absorbing states) right-hand sides instead of one with n more, for large chains.
     *
     * @param continuous whether {@code p} is a generator
     * @see #absorb(Arithmetic, List, List, Set)
     * @see #absorbContinuous(Arithmetic, List, List, Set)
     */
    public static <T> Absorption<T> absorbBrief(Arithmetic<T> f, List<List<T>> p, List<String> names,
            Set<Integer> extra, boolean continuous) {
        return absorb(f, p, names, extra, continuous, false);
    }

    /**
     * Absorption of a continuous chain from its generator Q, in the model's time unit: N = (−Q_TT)^−1 (expected time
     * spent in transient j from transient i), t = N·1 (expected time to absorption), its variance 2Nt − t∘t
     * (E[T²] = 2Nt), and B = N R with R the rates into the absorbing states (J. R. Norris, <i>Markov Chains</i>,
     * ch. 3.3; the second moment: common practice for phase-type distributions, no source).
     *
     * @param f     the arithmetic
     * @param q     the generator
     * @param names state names, for messages
     * @param extra states to make absorbing (their rows become zero)
     * @return N, t, variance and B
     */
    public static <T> Absorption<T> absorbContinuous(Arithmetic<T> f, List<List<T>> q, List<String> names,
            Set<Integer> extra) {
        return absorb(f, q, names, extra, true, true);
    }

    private static <T> Absorption<T> absorb(Arithmetic<T> f, List<List<T>> p, List<String> names, Set<Integer> extra,
            boolean continuous, boolean withN) {
        int n = p.size();
        List<List<T>> q = continuous ? withZeroRows(f, p, extra) : withAbsorbing(f, p, extra);
        boolean[][] g = graph(f, q);
        TreeSet<Integer> abs = new TreeSet<>(extra);
        for (int i = 0; i < n; i++) {
            boolean leaves = false;
            for (int j = 0; j < n; j++) {
                leaves |= j != i && g[i][j];
            }
            if (!leaves) {
                abs.add(i);
            }
        }
        if (abs.isEmpty()) {
            throw new QchainException(ErrorKey.NOT_APPLICABLE, "absorb",
                "the chain has no absorbing state; name the states to reach with --absorbing A,B");
        }
        List<Integer> tr = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            if (!abs.contains(i)) {
                tr.add(i);
            }
        }
        List<Integer> absList = List.copyOf(abs);
        if (tr.isEmpty()) {
            return new Absorption<>(tr, absList, List.of(), List.of(), List.of(), List.of());
        }
        requireReach(g, tr, abs, names);
        int k = tr.size();
        // one solve for N (right-hand sides I, unless left out), t (right-hand side 1) and B (right-hand side R)
        int w = withN ? k : 0;
        List<List<T>> rhs = zeros(f, k, w + 1 + absList.size());
        for (int a = 0; a < k; a++) {
            if (withN) {
                rhs.get(a).set(a, f.one());
            }
            rhs.get(a).set(w, f.one());
            for (int b = 0; b < absList.size(); b++) {
                rhs.get(a).set(w + 1 + b, q.get(tr.get(a)).get(absList.get(b)));
            }
        }
        List<List<T>> x;
        List<T> variance = new ArrayList<>();
        if (withN) {
            x = solveTransient(f, q, tr, rhs, names, continuous);
        } else {
            // without N: N t from one more solve (I − Q) y = t, done with the variance by the arithmetic
            Arithmetic.Moments<T> mo = solveTransient(f, q, tr, names, continuous,
                a -> f.solveWithVariance(a, rhs, w, continuous));
            x = mo.solution();
            variance = mo.variance();
        }
        List<List<T>> nMat = new ArrayList<>();
        List<T> t = new ArrayList<>();
        List<List<T>> b = new ArrayList<>();
        for (List<T> row : x) {
            if (withN) {
                nMat.add(row.subList(0, k));
            }
            t.add(row.get(w));
            b.add(row.subList(w + 1, row.size()));
        }
        if (withN) {
            for (int a = 0; a < k; a++) {
                // N t from N; then ((2N − I) t)_a − t_a^2, or (2N t)_a − t_a^2 in continuous time
                T s = f.zero();
                for (int c = 0; c < k; c++) {
                    s = f.add(s, f.multiply(nMat.get(a).get(c), t.get(c)));
                }
                s = f.add(s, s);
                if (!continuous) {
                    s = f.subtract(s, t.get(a));
                }
                variance.add(f.subtract(s, f.multiply(t.get(a), t.get(a))));
            }
        }
        return new Absorption<>(tr, absList, nMat, t, variance, b);
    }

    /**
     * Expected reward accumulated until absorption, {@code N r} on the transient states (a reward is earned for each
     * step spent in a state, counting the start).
     */
    public static <T> List<T> accumulatedReward(Arithmetic<T> f, List<List<T>> p, Absorption<T> a, List<T> reward,
            List<String> names, boolean continuous) {
        if (!a.fundamental().isEmpty() || a.transientStates().isEmpty()) {
            return accumulatedReward(f, a, reward);
        }
        List<List<T>> r = zeros(f, a.transientStates().size(), 1);
        for (int i = 0; i < r.size(); i++) {
            r.get(i).set(0, reward.get(a.transientStates().get(i)));
        }
        List<List<T>> q = continuous ? withZeroRows(f, p, new TreeSet<>(a.absorbingStates()))
            : withAbsorbing(f, p, new TreeSet<>(a.absorbingStates()));
        return solveTransient(f, q, a.transientStates(), r, names, continuous).stream().map(row -> row.get(0)).toList();
    }

    /** {@code N r}, from the fundamental matrix (which must be present). */
    public static <T> List<T> accumulatedReward(Arithmetic<T> f, Absorption<T> a, List<T> reward) {
        List<T> out = new ArrayList<>();
        for (List<T> row : a.fundamental()) {
            T s = f.zero();
            for (int c = 0; c < row.size(); c++) {
                s = f.add(s, f.multiply(row.get(c), reward.get(a.transientStates().get(c))));
            }
            out.add(s);
        }
        return out;
    }

    /** Long-run average reward per step from each start state: {@code L r} with L the (Cesàro) limit of P^n. */
    public static <T> List<T> longRunAverageReward(Arithmetic<T> f, LongRun<T> lr, List<T> reward) {
        return lr.limit().stream().map(row -> dot(f, row, reward)).toList();
    }

    /**
     * Expected discounted reward {@code sum_k v^k r(X_k)} from each state (payments at the start of each step):
     * {@code (I − vP)^−1 r}, solved exactly.
     *
     * @param v the discount factor, with 0 < v < 1
     */
    public static <T> List<T> discountedReward(Arithmetic<T> f, List<List<T>> p, List<T> reward, T v) {
        int n = p.size();
        List<List<T>> a = zeros(f, n, n);
        List<List<T>> r = zeros(f, n, 1);
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                a.get(i).set(j, f.subtract(i == j ? f.one() : f.zero(), f.multiply(v, p.get(i).get(j))));
            }
            r.get(i).set(0, reward.get(i));
        }
        return f.solve(a, r).stream().map(row -> row.get(0)).toList();
    }

    /**
     * The first-passage time T = min{k >= 1 : X_k in target}: for each start state, P(T = k) for k = 1..steps.
     * P(T <= k) is their running sum ("reached within k steps").
     */
    public static <T> List<List<T>> firstPassage(Arithmetic<T> f, List<List<T>> p, Set<Integer> target, int steps) {
        int n = p.size();
        List<T> prev = new ArrayList<>(Collections.nCopies(n, f.zero()));
        List<List<T>> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            out.add(new ArrayList<>());
        }
        for (int k = 1; k <= steps; k++) {
            // u_k(i) = sum_{j in S} P_ij + sum_{j not in S} P_ij u_{k-1}(j)
            List<T> cur = new ArrayList<>(n);
            for (int i = 0; i < n; i++) {
                T s = f.zero();
                List<T> row = p.get(i);
                for (int j = 0; j < n; j++) {
                    T pij = row.get(j);
                    if (f.isZero(pij)) {
                        continue;
                    }
                    s = f.add(s, target.contains(j) ? pij : f.multiply(pij, prev.get(j)));
                }
                cur.add(s);
                out.get(i).add(f.subtract(s, prev.get(i)));
            }
            prev = cur;
        }
        return out;
    }

    /** Solves (I − Q) X = R on the transient states, naming the states if the system is singular. */
    private static <T> List<List<T>> solveTransient(Arithmetic<T> f, List<List<T>> p, List<Integer> tr,
            List<List<T>> r, List<String> names, boolean continuous) {
        return solveTransient(f, p, tr, names, continuous, a -> f.solve(a, r));
    }

    /** Runs {@code solve} on (I − Q) (or −Q) on the transient states, naming the states if it is singular. */
    private static <T, R> R solveTransient(Arithmetic<T> f, List<List<T>> p, List<Integer> tr, List<String> names,
            boolean continuous, java.util.function.Function<List<List<T>>, R> solve) {
        int k = tr.size();
        List<List<T>> a = zeros(f, k, k);
        for (int x = 0; x < k; x++) {
            for (int y = 0; y < k; y++) {
                T v = p.get(tr.get(x)).get(tr.get(y));
                a.get(x).set(y, continuous ? f.negate(v) : x == y ? f.subtract(f.one(), v) : f.negate(v));
            }
        }
        try {
            return solve.apply(a);
        } catch (SingularSystemException e) {
            throw new SingularSystemException(e.index(), (continuous ? "−Q" : "I − Q") + " on the transient states "
                + tr.stream().map(names::get).collect(Collectors.joining(", ")) + " has no inverse");
        }
    }

    /** Every transient state must reach an absorbing one; otherwise I − Q is singular. */
    private static void requireReach(boolean[][] g, List<Integer> tr, Set<Integer> abs, List<String> names) {
        int n = g.length;
        boolean[] reach = new boolean[n];
        for (int a : abs) {
            reach[a] = true;
        }
        boolean changed = true;
        while (changed) {
            changed = false;
            for (int i = 0; i < n; i++) {
                if (reach[i]) {
                    continue;
                }
                for (int j = 0; j < n; j++) {
                    if (g[i][j] && reach[j]) {
                        reach[i] = true;
                        changed = true;
                        break;
                    }
                }
            }
        }
        List<String> stuck = tr.stream().filter(i -> !reach[i]).map(names::get).toList();
        if (!stuck.isEmpty()) {
            throw new SingularSystemException(tr.indexOf(names.indexOf(stuck.get(0))),
                "state" + (stuck.size() > 1 ? "s " : " ") + String.join(", ", stuck)
                    + " can never reach an absorbing state, so I − Q has no inverse; make a state of"
                    + " their class absorbing with --absorbing, or use qchain longrun");
        }
    }

    /**
     * The graph of a generator: its non-zero off-diagonal rates, and a loop at every state (a continuous chain
     * stays in each state for a while, so no class is periodic).
     */
    public static <T> boolean[][] generatorGraph(Arithmetic<T> f, List<List<T>> q) {
        boolean[][] g = graph(f, q);
        for (int i = 0; i < g.length; i++) {
            g[i][i] = true;
        }
        return g;
    }

    /** A generator with the rows of {@code extra} replaced by zero rows (those states are never left). */
    public static <T> List<List<T>> withZeroRows(Arithmetic<T> f, List<List<T>> q, Set<Integer> extra) {
        List<List<T>> out = new ArrayList<>();
        for (int i = 0; i < q.size(); i++) {
            out.add(extra.contains(i) ? new ArrayList<>(Collections.nCopies(q.size(), f.zero())) : q.get(i));
        }
        return out;
    }

    /** P with the rows of {@code extra} replaced by unit rows. */
    public static <T> List<List<T>> withAbsorbing(Arithmetic<T> f, List<List<T>> p, Set<Integer> extra) {
        int n = p.size();
        List<List<T>> q = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            if (extra.contains(i)) {
                List<T> row = new ArrayList<>(Collections.nCopies(n, f.zero()));
                row.set(i, f.one());
                q.add(row);
            } else {
                q.add(p.get(i));
            }
        }
        return q;
    }

    static <T> T dot(Arithmetic<T> f, List<T> a, List<T> b) {
        T s = f.zero();
        for (int i = 0; i < a.size(); i++) {
            if (!f.isZero(a.get(i)) && !f.isZero(b.get(i))) {
                s = f.add(s, f.multiply(a.get(i), b.get(i)));
            }
        }
        return s;
    }

    static <T> List<List<T>> zeros(Arithmetic<T> f, int r, int c) {
        List<List<T>> out = new ArrayList<>(r);
        for (int i = 0; i < r; i++) {
            out.add(new ArrayList<>(Collections.nCopies(c, f.zero())));
        }
        return out;
    }

    static <T> List<List<T>> identity(Arithmetic<T> f, int n) {
        List<List<T>> out = zeros(f, n, n);
        for (int i = 0; i < n; i++) {
            out.get(i).set(i, f.one());
        }
        return out;
    }
}
