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
 */
public record AvailabilityQuery(Optional<String> from, List<Rational> times, Rational hoursPerYear, int digits,
                                int maxBits, long maxWork, boolean symbolic, int maxStates) implements Query {
    /**
     * Checks the ranges.
     *
     * @throws IllegalArgumentException for a negative time, hours per year not positive, digits below 1
     */
    public AvailabilityQuery {
        times = List.copyOf(times);
        if (times.stream().anyMatch(t -> t.signum() < 0) || hoursPerYear.signum() <= 0 || digits < 1
            || maxStates < 1) {
            throw new IllegalArgumentException("need times >= 0, hours per year > 0, digits >= 1, max states >= 1");
        }
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

    /** The steady-state figures only, with 8766 hours per year and 12 digits. */
    public static AvailabilityQuery steadyState() {
        return new AvailabilityQuery(Optional.empty(), List.of(), Availability.HOURS_PER_YEAR, 12,
            CertifiedPowers.DEFAULT_MAX_BITS);
    }
}
