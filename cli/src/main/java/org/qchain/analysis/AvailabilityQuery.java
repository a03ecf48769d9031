package org.qchain.analysis;

import java.util.List;
import java.util.Optional;
import org.qchain.exact.Rational;
import org.qchain.exact.certified.CertifiedPowers;
import org.qchain.exact.ctmc.Availability;

/**
 * Figures of merit of a repairable system: steady-state availability, MTTF, mean up and down times, failure
 * frequency, down hours per year, and point availability at given times.
 *
 * @param from         the start of the point availabilities (default: the first operating state listed)
 * @param times        times for the point availability A(t), none negative (may be empty)
 * @param hoursPerYear hours per year for the down time, positive
 * @param digits       significant digits of the certified decimals
 * @param maxBits      the largest working precision for them, in bits
 * @param maxWork      refuse point availabilities whose estimated work (multiplications of fixed-point numbers, as
 *                     for {@code step -t}) passes this
 * @param symbolic     keep every parameter symbolic even where values are known (the figures as formulas, with
 *                     their values at the point); a model with a parameter without a value is symbolic anyway
 * @param maxStates    refuse symbolic solves of more states than this
 * @param maxTimeStates on the symbolic route, give A(t) and R(t) as formulas in t for chains of at most this many
 *                     states (0: never); their closed forms need the eigenvalues of the generator, whose cost grows
 *                     fast with the number of states
 */
public record AvailabilityQuery(Optional<String> from, List<Rational> times, Rational hoursPerYear, int digits,
                                int maxBits, long maxWork, boolean symbolic, int maxStates, int maxTimeStates)
    implements Query {
    /**
     * The default of {@code maxTimeStates}: a 6-state chain with two rate parameters takes about 2 s, 7 states about
     * 10 s, 8 states about 40 s (docs/performance.md, "Formulas in t of avail").
     */
    public static final int DEFAULT_MAX_TIME_STATES = 6;

    /**
     * Checks the ranges.
     *
     * @throws IllegalArgumentException for a negative time, hours per year not positive, digits below 1
     */
    public AvailabilityQuery {
        times = List.copyOf(times);
        if (times.stream().anyMatch(t -> t.signum() < 0) || hoursPerYear.signum() <= 0 || digits < 1
            || maxStates < 1 || maxTimeStates < 0) {
            throw new IllegalArgumentException("need times >= 0, hours per year > 0, digits >= 1, max states >= 1,"
                + " max time states >= 0");
        }
    }

    /** With the default limit on the states of the formulas in t. */
    public AvailabilityQuery(Optional<String> from, List<Rational> times, Rational hoursPerYear, int digits,
                             int maxBits, long maxWork, boolean symbolic, int maxStates) {
        this(from, times, hoursPerYear, digits, maxBits, maxWork, symbolic, maxStates, DEFAULT_MAX_TIME_STATES);
    }

    /** Numeric where every parameter has a value, with the default limit on the states of a symbolic solve. */
    public AvailabilityQuery(Optional<String> from, List<Rational> times, Rational hoursPerYear, int digits,
                             int maxBits, long maxWork) {
        this(from, times, hoursPerYear, digits, maxBits, maxWork, false, LongRunQuery.DEFAULT_MAX_STATES);
    }

    /** With the default work limit. */
    public AvailabilityQuery(Optional<String> from, List<Rational> times, Rational hoursPerYear, int digits,
                             int maxBits) {
        this(from, times, hoursPerYear, digits, maxBits, CertifiedPowers.DEFAULT_MAX_WORK);
    }

    /**
     * The steady-state figures only, with 8766 hours per year and 12 digits: no point availabilities and, on the
     * symbolic route, no formulas in t ({@code maxTimeStates} 0).
     */
    public static AvailabilityQuery steadyState() {
        return new AvailabilityQuery(Optional.empty(), List.of(), Availability.HOURS_PER_YEAR, 12,
            CertifiedPowers.DEFAULT_MAX_BITS, CertifiedPowers.DEFAULT_MAX_WORK, false,
            LongRunQuery.DEFAULT_MAX_STATES, 0);
    }
}
