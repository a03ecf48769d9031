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
 * duration, mean times; from memory); the linear systems go through {@link LinearSolver}.
 */
public final class Availability {
    /** The default hours per year: 365.25 days of 24 hours. */
    public static final Rational HOURS_PER_YEAR = Rational.of(8766);

    private Availability() {
    }

    /**
     * The figures.
     *
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
    public record Figures(List<Integer> up, List<Rational> stationary, Rational availability, Rational unavailability,
                          Rational failureFrequency, Optional<Rational> meanUpTime, Optional<Rational> meanDownTime,
                          List<Optional<Rational>> mttf, Rational hoursPerYear, Rational downHoursPerYear) {
        /** Copies the lists. */
        public Figures {
            up = List.copyOf(up);
            stationary = List.copyOf(stationary);
            mttf = List.copyOf(mttf);
        }
    }

    /**
     * Every figure of a repairable system.
     *
     * @param q            a generator
     * @param up           the up states (indexes)
     * @param hoursPerYear hours per year for the down time, positive
     * @return the figures
     * @throws QchainException DEGENERATE_AVAILABILITY if the stationary law is not unique (more than one closed
     *                         class, the states named) or no state is up
     */
    public static Figures of(RationalMatrix q, List<Integer> up, Rational hoursPerYear) {
        int n = q.rows();
        boolean[] isUp = upMask(n, up);
        Rational[] pi = stationary(q);
        Rational a = Rational.ZERO;
        Rational omega = Rational.ZERO;
        for (int i = 0; i < n; i++) {
            if (isUp[i]) {
                a = a.add(pi[i]);
                for (int j = 0; j < n; j++) {
                    if (!isUp[j]) {
                        omega = omega.add(pi[i].multiply(q.get(i, j)));
                    }
                }
            }
        }
        Rational u = Rational.ONE.subtract(a);
        Optional<Rational> meanUp = omega.isZero() ? Optional.empty() : Optional.of(a.divide(omega));
        Optional<Rational> meanDown = omega.isZero() ? Optional.empty() : Optional.of(u.divide(omega));
        List<Integer> ups = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            if (isUp[i]) {
                ups.add(i);
            }
        }
        return new Figures(ups, Arrays.asList(pi), a, u, omega, meanUp, meanDown, mttf(q, up),
            hoursPerYear, u.multiply(hoursPerYear));
    }

    /**
     * The stationary law {@code πQ = 0}, {@code Σπ = 1}.
     *
     * @param q a generator
     * @return π
     * @throws QchainException DEGENERATE_AVAILABILITY if the law is not unique
     */
    public static Rational[] stationary(RationalMatrix q) {
        try {
            return LinearSolver.leftNullVector(q);
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
        int n = q.rows();
        boolean[] isUp = upMask(n, up);
        boolean[] fails = canReachDown(q, isUp);
        // an up state that may wander into an up state which can never fail has an infinite mean time to failure
        boolean[] never = new boolean[n];
        for (int i = 0; i < n; i++) {
            never[i] = isUp[i] && !fails[i];
        }
        boolean[] infinite = backward(q, never, isUp);
        int[] idx = new int[n];
        int m = 0;
        for (int i = 0; i < n; i++) {
            idx[i] = isUp[i] && !infinite[i] ? m++ : -1;
        }
        List<Optional<Rational>> out = new ArrayList<>();
        Rational[] x = new Rational[0];
        if (m > 0) {
            // -Q restricted to the up states that fail for sure: non-singular (each leaks to a down state), and they
            // never enter an up state outside the set
            Rational[][] a = new Rational[m][m];
            Rational[][] b = new Rational[m][1];
            for (int i = 0; i < n; i++) {
                if (idx[i] >= 0) {
                    for (int j = 0; j < n; j++) {
                        if (idx[j] >= 0) {
                            a[idx[i]][idx[j]] = q.get(i, j).negate();
                        }
                    }
                    b[idx[i]][0] = Rational.ONE;
                }
            }
            RationalMatrix s = LinearSolver.solve(RationalMatrix.of(a), RationalMatrix.of(b));
            x = new Rational[m];
            for (int k = 0; k < m; k++) {
                x[k] = s.get(k, 0);
            }
        }
        for (int i = 0; i < n; i++) {
            if (!isUp[i]) {
                out.add(Optional.of(Rational.ZERO));
            } else {
                out.add(idx[i] >= 0 ? Optional.of(x[idx[i]]) : Optional.empty());
            }
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
    private static boolean[] canReachDown(RationalMatrix q, boolean[] isUp) {
        boolean[] down = new boolean[q.rows()];
        boolean[] all = new boolean[q.rows()];
        for (int i = 0; i < down.length; i++) {
            down[i] = !isUp[i];
            all[i] = true;
        }
        return backward(q, down, all);
    }

    /** The states that reach a target through states in {@code via} (targets included), by a backward search. */
    private static boolean[] backward(RationalMatrix q, boolean[] target, boolean[] via) {
        int n = q.rows();
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
                if (!r[i] && via[i] && i != j && q.get(i, j).signum() > 0) {
                    r[i] = true;
                    queue.add(i);
                }
            }
        }
        return r;
    }
}
