package org.qchain.result;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.qchain.exact.Rational;

/**
 * Figures of merit of a repairable system as formulas in the parameters (a continuous chain with an {@code up} line
 * and parameters kept symbolic): the same figures as {@link AvailabilityResult}, each a rational function, with the
 * conditions under which the formulas hold.
 *
 * @param source           the model file name as the user gave it
 * @param parameters       the parameters the formulas are in
 * @param up               the operating states, in state order
 * @param states           every state name
 * @param stationary       the stationary law, by state
 * @param availability     steady-state availability
 * @param unavailability   steady-state unavailability
 * @param hoursPerYear     the hours per year used for {@code downHoursPerYear}
 * @param downHoursPerYear steady-state unavailability times hours per year
 * @param failureFrequency failures per unit of time in the long run
 * @param meanUpTime       mean up time per cycle; empty when the system never fails
 * @param meanDownTime     mean down time per cycle; empty when the system never fails
 * @param mttf             mean time to failure by up state; empty = infinite (the state can never fail)
 * @param conditions       what the formulas assume: each polynomial that must not vanish ({@code POLY != 0}: a
 *                         factor of a denominator, or of a rate whose being positive the chain's structure takes for
 *                         granted), and whether that was proved throughout the parameters' domains (otherwise the
 *                         formulas hold only where it does)
 * @param substituted      values given with {@code --at} that were substituted before solving (by name)
 * @param atPoint          the exact figures at the parameter point, when every parameter has a value (equal to the
 *                         formulas evaluated there)
 * @param warnings         warnings for the user (the model's located range conditions)
 */
public record SymbolicAvailabilityResult(String source, List<String> parameters, List<String> up, List<String> states,
                                         Map<String, Formula> stationary, Formula availability,
                                         Formula unavailability, Rational hoursPerYear, Formula downHoursPerYear,
                                         Formula failureFrequency, Optional<Formula> meanUpTime,
                                         Optional<Formula> meanDownTime, Map<String, Optional<Formula>> mttf,
                                         List<Condition> conditions, Map<String, Rational> substituted,
                                         Optional<AvailabilityResult> atPoint, List<String> warnings)
    implements Result {
    /** Copies the collections, keeping their order. */
    public SymbolicAvailabilityResult {
        parameters = List.copyOf(parameters);
        up = List.copyOf(up);
        states = List.copyOf(states);
        stationary = Collections.unmodifiableMap(new LinkedHashMap<>(stationary));
        mttf = Collections.unmodifiableMap(new LinkedHashMap<>(mttf));
        conditions = List.copyOf(conditions);
        substituted = Collections.unmodifiableMap(new LinkedHashMap<>(substituted));
        warnings = List.copyOf(warnings);
    }

    /** The substituted values as {@code a=1/2, b=3}, or the empty string. */
    public String substitutedText() {
        StringBuilder sb = new StringBuilder();
        for (Map.Entry<String, Rational> e : substituted.entrySet()) {
            sb.append(sb.length() == 0 ? "" : ", ").append(e.getKey()).append('=').append(e.getValue());
        }
        return sb.toString();
    }

    /** The conditions not proved throughout the domains. */
    public List<Condition> notProved() {
        return Condition.notProved(conditions);
    }
}
