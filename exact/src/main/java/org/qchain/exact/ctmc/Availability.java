package org.qchain.exact.ctmc;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.linear.LinearSolver;
import org.qchain.exact.longrun.Arithmetic;
import org.qchain.exact.linear.SingularSystemException;

/**
 * Exact steady-state and first-failure figures of a repairable system modelled as a continuous-time chain: a
 * rational generator {@code Q} and the set of operating ("up") states; every other state is down.
 *
 * <ul>
 *   <li>stationary law: {@code πQ = 0}, {@code Σπ = 1} (unique when the chain has one closed class);
 *   <li>steady-state availability {@code A = Σ_{i up} π_i}, unavailability {@code 1 - A}, and {@code (1 - A) H}
 *       hours down per year of {@code H} hours;
 *   <li>failure frequency {@code ω = Σ_{i up, j down} π_i q_ij} (the long-run rate of up-to-down transitions);
 *       mean up time {@code A/ω} and mean down time {@code (1-A)/ω} per cycle;
 *   <li>mean time to failure from each up state: the expected time to first reach a down state, from
 *       {@code -Q_UU m = 1} (down states made absorbing).
 * </ul>
 * Sources: R. Billinton and R. N. Allan, "Reliability Evaluation of Engineering Systems", ch. 9 (frequency and
 * duration, mean times; from memory). Written once over an {@link Arithmetic}: exact rationals (the linear systems
 * through {@link LinearSolver}), or rational functions of the parameters (the symbolic module's fraction-free solver),
 * which gives the same figures as formulas.
 */
public final class Availability {
    /** The default hours per year: 365.25 days of 24 hours. */
    public static final Rational HOURS_PER_YEAR = Rational.of(8766);

    private Availability() {
    }

    /**
     * The figures, in the arithmetic they were computed in (exact rationals, or rational functions of the
     * parameters, valid for generic parameter values).
     *
     * @param <T>                   the element type
     * @param up                    the up states (indexes, ascending)
     * @param stationary            the stationary law, one value per state
     * @param availability          steady-state availability
     * @param unavailability        {@code 1 - availability}
     * @param failureFrequency      {@code ω}, failures per unit of time in the long run
     * @param meanUpTime            {@code A/ω}, empty when {@code ω = 0}
     * @param meanDownTime          {@code (1-A)/ω}, empty when {@code ω = 0}
     * @param mttf                  mean time to failure from each state: empty for an up state that can never
     *                              fail (infinite), zero for a down state
     * @param hoursPerYear          the hours per year used
     * @param downHoursPerYear      {@code (1 - A) × hoursPerYear}
     */
    public record Figures<T>(List<Integer> up, List<T> stationary, T availability, T unavailability,
                             T failureFrequency, Optional<T> meanUpTime, Optional<T> meanDownTime,
                             List<Optional<T>> mttf, T hoursPerYear, T downHoursPerYear) {
        /** Copies the lists. */
        public Figures {
            up = List.copyOf(up);
            stationary = List.copyOf(stationary);
            mttf = List.copyOf(mttf);
        }
    }

    /**
     * Every figure of a repairable system, exactly.
     *
     * @param q            a generator
     * @param up           the up states (indexes)
     * @param hoursPerYear hours per year for the down time, positive
     * @return the figures
     * @throws QchainException DEGENERATE_AVAILABILITY if the stationary law is not unique (more than one closed
     *                         class, the states named) or no state is up
     */
    public static Figures<Rational> of(RationalMatrix q, List<Integer> up, Rational hoursPerYear) {
        return of(Arithmetic.RATIONAL, rows(q), up, hoursPerYear);
    }

    /**
     * Every figure of a repairable system, in any arithmetic: the one algorithm behind the exact figures and the
     * formulas in the parameters (where a rate is a non-zero function, it is taken as positive: the figures then
     * hold for the parameter values at which no rate and no denominator of theirs vanishes).
     *
     * @param <T>          the element type
     * @param f            the arithmetic, with its exact solver
     * @param q            a generator, by rows (rows sum to 0)
     * @param up           the up states (indexes)
     * @param hoursPerYear hours per year for the down time, positive
     * @return the figures
     * @throws QchainException DEGENERATE_AVAILABILITY if the stationary law is not unique (more than one closed
     *                         class) or no state is up
     */
    public static <T> Figures<T> of(Arithmetic<T> f, List<List<T>> q, List<Integer> up, T hoursPerYear) {
        int n = q.size();
        boolean[] isUp = upMask(n, up);
        List<T> pi = stationary(f, q);
        T a = f.zero();
        T omega = f.zero();
        for (int i = 0; i < n; i++) {
            if (isUp[i]) {
                a = f.add(a, pi.get(i));
                for (int j = 0; j < n; j++) {
                    if (!isUp[j] && !f.isZero(q.get(i).get(j))) {
                        omega = f.add(omega, f.multiply(pi.get(i), q.get(i).get(j)));
                    }
                }
            }
        }
        T u = f.subtract(f.one(), a);
        Optional<T> meanUp = f.isZero(omega) ? Optional.empty() : Optional.of(f.divide(a, omega));
        Optional<T> meanDown = f.isZero(omega) ? Optional.empty() : Optional.of(f.divide(u, omega));
        List<Integer> ups = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            if (isUp[i]) {
                ups.add(i);
            }
        }
        return new Figures<>(ups, pi, a, u, omega, meanUp, meanDown, mttf(f, q, up), hoursPerYear,
            f.multiply(u, hoursPerYear));
    }

    /**
     * The stationary law {@code πQ = 0}, {@code Σπ = 1}.
     *
     * @param q a generator
     * @return π
     * @throws QchainException DEGENERATE_AVAILABILITY if the law is not unique
     */
    public static Rational[] stationary(RationalMatrix q) {
        return stationary(Arithmetic.RATIONAL, rows(q)).toArray(new Rational[0]);
    }

    private static <T> List<T> stationary(Arithmetic<T> f, List<List<T>> q) {
        try {
            return f.leftNullVector(q);
        } catch (SingularSystemException e) {
            throw new QchainException(ErrorKey.DEGENERATE_AVAILABILITY,
                "the chain has more than one closed class, so its long-run law depends on the start; steady-state"
                    + " figures need a chain in which every state can reach every recurrent one");
        }
    }

    /**
     * The mean time to failure from every state: the expected time until the chain first enters a down state.
     *
     * @param q  a generator
     * @param up the up states
     * @return per state: zero for a down state, empty (infinite) for an up state from which no down state can be
     *         reached
     * @throws QchainException DEGENERATE_AVAILABILITY if no state is up
     */
    public static List<Optional<Rational>> mttf(RationalMatrix q, List<Integer> up) {
        return mttf(Arithmetic.RATIONAL, rows(q), up);
    }

    /**
     * As {@link #mttf(RationalMatrix, List)}, in any arithmetic (a non-zero rate counts as positive).
     *
     * @param <T> the element type
     * @param f   the arithmetic
     * @param q   a generator, by rows
     * @param up  the up states
     * @return per state, as {@link #mttf(RationalMatrix, List)}
     * @throws QchainException DEGENERATE_AVAILABILITY if no state is up
     */
    public static <T> List<Optional<T>> mttf(Arithmetic<T> f, List<List<T>> q, List<Integer> up) {
        int n = q.size();
        boolean[] isUp = upMask(n, up);
        boolean[][] rate = new boolean[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                rate[i][j] = i != j && !f.isZero(q.get(i).get(j));
            }
        }
        boolean[] fails = canReachDown(rate, isUp);
        // an up state that may wander into an up state which can never fail has an infinite mean time to failure
        boolean[] never = new boolean[n];
        for (int i = 0; i < n; i++) {
            never[i] = isUp[i] && !fails[i];
        }
        boolean[] infinite = backward(rate, never, isUp);
        int[] idx = new int[n];
        int m = 0;
        for (int i = 0; i < n; i++) {
            idx[i] = isUp[i] && !infinite[i] ? m++ : -1;
        }
        List<Optional<T>> out = new ArrayList<>();
        List<T> x = List.of();
        if (m > 0) {
            // -Q restricted to the up states that fail for sure: non-singular (each leaks to a down state), and they
            // never enter an up state outside the set
            List<List<T>> a = new ArrayList<>();
            List<List<T>> b = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                if (idx[i] >= 0) {
                    List<T> row = new ArrayList<>();
                    for (int j = 0; j < n; j++) {
                        if (idx[j] >= 0) {
                            row.add(f.negate(q.get(i).get(j)));
                        }
                    }
                    a.add(row);
                    b.add(List.of(f.one()));
                }
            }
            x = f.solve(a, b).stream().map(r -> r.get(0)).toList();
        }
        for (int i = 0; i < n; i++) {
            if (!isUp[i]) {
                out.add(Optional.of(f.zero()));
            } else {
                out.add(idx[i] >= 0 ? Optional.of(x.get(idx[i])) : Optional.empty());
            }
        }
        return out;
    }

    private static List<List<Rational>> rows(RationalMatrix q) {
        List<List<Rational>> out = new ArrayList<>(q.rows());
        for (int i = 0; i < q.rows(); i++) {
            out.add(Arrays.asList(q.row(i)));
        }
        return out;
    }

    private static boolean[] upMask(int n, List<Integer> up) {
        boolean[] isUp = new boolean[n];
        for (int i : up) {
            isUp[i] = true;
        }
        if (up.isEmpty()) {
            throw new QchainException(ErrorKey.DEGENERATE_AVAILABILITY, "no state is up: the 'up' line lists none");
        }
        return isUp;
    }

    /** Whether each state can reach a down state (a down state trivially can), by a backward search. */
    private static boolean[] canReachDown(boolean[][] rate, boolean[] isUp) {
        boolean[] down = new boolean[rate.length];
        boolean[] all = new boolean[rate.length];
        for (int i = 0; i < down.length; i++) {
            down[i] = !isUp[i];
            all[i] = true;
        }
        return backward(rate, down, all);
    }

    /** The states that reach a target through states in {@code via} (targets included), by a backward search. */
    private static boolean[] backward(boolean[][] rate, boolean[] target, boolean[] via) {
        int n = rate.length;
        boolean[] r = new boolean[n];
        ArrayDeque<Integer> queue = new ArrayDeque<>();
        for (int i = 0; i < n; i++) {
            if (target[i]) {
                r[i] = true;
                queue.add(i);
            }
        }
        while (!queue.isEmpty()) {
            int j = queue.poll();
            for (int i = 0; i < n; i++) {
                if (!r[i] && via[i] && rate[i][j]) {
                    r[i] = true;
                    queue.add(i);
                }
            }
        }
        return r;
    }
}
