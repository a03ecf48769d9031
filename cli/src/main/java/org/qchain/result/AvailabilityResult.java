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
 */
public record AvailabilityResult(String source, List<String> up, List<String> states, Map<String, Rational> stationary,
                                 Rational availability, Rational unavailability, Map<String, Optional<Rational>> mttf,
                                 Optional<Rational> meanUpTime, Optional<Rational> meanDownTime,
                                 Rational failureFrequency, Rational hoursPerYear, Rational downHoursPerYear,
                                 String from, List<PointAvailability> point, int digits, List<String> warnings)
    implements Result {
    /** Copies the collections. */
    public AvailabilityResult {
        up = List.copyOf(up);
        states = List.copyOf(states);
        stationary = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(stationary));
        mttf = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(mttf));
        point = List.copyOf(point);
        warnings = List.copyOf(warnings);
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
