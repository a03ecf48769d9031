package org.qchain.result;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.qchain.exact.Rational;
import org.qchain.exact.certified.CertifiedDecimal;

/**
 * Figures of merit of a repairable system (a continuous chain with operating states): exact steady-state figures
 * and certified point availabilities.
 *
 * @param source             the model file name as the user gave it
 * @param up                 the operating states, in state order
 * @param states             every state name
 * @param stationary         the stationary law, by state
 * @param availability       steady-state availability
 * @param unavailability     steady-state unavailability
 * @param mttf               mean time to failure by up state; empty = infinite (the state can never fail)
 * @param meanUpTime         mean up time per cycle; empty when the system never fails
 * @param meanDownTime       mean down time per cycle; empty when the system never fails
 * @param failureFrequency   failures per unit of time in the long run
 * @param hoursPerYear       the hours per year used for {@code downHoursPerYear}
 * @param downHoursPerYear   steady-state unavailability times hours per year
 * @param from               the start of the point availabilities
 * @param point              point availability A(t) from {@code from} at each time asked for
 * @param digits             significant digits of the decimals
 * @param warnings           warnings for the user
 * @param at the parameter values used and where they came from (nominal or {@code --at}); absent for a model
 *           without parameters and on the symbolic route
 * @param reliability        reliability R(t) from {@code from} at each time asked for: the probability of having
 *                           stayed in the up states throughout [0, t] (the down states made absorbing); empty when no
 *                           time was asked for
 */
public record AvailabilityResult(String source, List<String> up, List<String> states, Map<String, Rational> stationary,
                                 Rational availability, Rational unavailability, Map<String, Optional<Rational>> mttf,
                                 Optional<Rational> meanUpTime, Optional<Rational> meanDownTime,
                                 Rational failureFrequency, Rational hoursPerYear, Rational downHoursPerYear,
                                 String from, List<PointAvailability> point, int digits, List<String> warnings, Optional<Point> at,
                                 List<PointAvailability> reliability)
    implements Result {
    /** Copies the collections. */
    public AvailabilityResult {
        up = List.copyOf(up);
        states = List.copyOf(states);
        stationary = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(stationary));
        mttf = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(mttf));
        point = List.copyOf(point);
        warnings = List.copyOf(warnings);
        reliability = List.copyOf(reliability);
    }

    /**
     * The result without reliabilities at given times (the form before R(t) was added).
     *
     * @param source as in the record
     * @param up as in the record
     * @param states as in the record
     * @param stationary as in the record
     * @param availability as in the record
     * @param unavailability as in the record
     * @param mttf as in the record
     * @param meanUpTime as in the record
     * @param meanDownTime as in the record
     * @param failureFrequency as in the record
     * @param hoursPerYear as in the record
     * @param downHoursPerYear as in the record
     * @param from as in the record
     * @param point as in the record
     * @param digits as in the record
     * @param warnings as in the record
     * @param at as in the record
     */
    public AvailabilityResult(String source, List<String> up, List<String> states, Map<String, Rational> stationary,
        Rational availability, Rational unavailability, Map<String, Optional<Rational>> mttf,
        Optional<Rational> meanUpTime, Optional<Rational> meanDownTime, Rational failureFrequency,
        Rational hoursPerYear, Rational downHoursPerYear, String from, List<PointAvailability> point, int digits,
        List<String> warnings, Optional<Point> at) {
        this(source, up, states, stationary, availability, unavailability, mttf, meanUpTime, meanDownTime,
            failureFrequency, hoursPerYear, downHoursPerYear, from, point, digits, warnings, at, List.of());
    }

    /**
     * The result without parameter values (a model without parameters, or one kept symbolic).
     *
     * @param source as in the record
     * @param up as in the record
     * @param states as in the record
     * @param stationary as in the record
     * @param availability as in the record
     * @param unavailability as in the record
     * @param mttf as in the record
     * @param meanUpTime as in the record
     * @param meanDownTime as in the record
     * @param failureFrequency as in the record
     * @param hoursPerYear as in the record
     * @param downHoursPerYear as in the record
     * @param from as in the record
     * @param point as in the record
     * @param digits as in the record
     * @param warnings as in the record
     */
    public AvailabilityResult(String source, List<String> up, List<String> states, Map<String, Rational> stationary,
        Rational availability, Rational unavailability, Map<String, Optional<Rational>> mttf,
        Optional<Rational> meanUpTime, Optional<Rational> meanDownTime, Rational failureFrequency,
        Rational hoursPerYear, Rational downHoursPerYear, String from, List<PointAvailability> point, int digits,
        List<String> warnings) {
        this(source, up, states, stationary, availability, unavailability, mttf, meanUpTime, meanDownTime, failureFrequency, hoursPerYear, downHoursPerYear, from, point, digits, warnings, Optional.empty());
    }

    /**
     * A(t) = probability of being in an up state at time t.
     *
     * @param t     the time
     * @param value the certified decimal
     */
    public record PointAvailability(Rational t, CertifiedDecimal value) {
    }
}
