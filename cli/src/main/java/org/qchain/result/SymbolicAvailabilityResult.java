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
 * @param inTime           the point availability A(t) and the reliability R(t) as formulas in t and the parameters;
 *                         empty when they were not computed (a chain of more states than the query allows, or a
 *                         closed form past the size limits: a warning then says so)
 * @param substitutedOrigin where the substituted values came from, as {@code Point#origin} words them
 *                         ({@code given with --at}, {@code nominal values}, or a mix)
 */
public record SymbolicAvailabilityResult(String source, List<String> parameters, List<String> up, List<String> states,
                                         Map<String, Formula> stationary, Formula availability,
                                         Formula unavailability, Rational hoursPerYear, Formula downHoursPerYear,
                                         Formula failureFrequency, Optional<Formula> meanUpTime,
                                         Optional<Formula> meanDownTime, Map<String, Optional<Formula>> mttf,
                                         List<Condition> conditions, Map<String, Rational> substituted,
                                         Optional<AvailabilityResult> atPoint, List<String> warnings,
                                         Optional<InTime> inTime, String substitutedOrigin)
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

    /**
     * The result without the formulas in t, its substituted values given with {@code --at} (the form before A(t) and
     * R(t) were added).
     *
     * @param source           as in the record
     * @param parameters       as in the record
     * @param up               as in the record
     * @param states           as in the record
     * @param stationary       as in the record
     * @param availability     as in the record
     * @param unavailability   as in the record
     * @param hoursPerYear     as in the record
     * @param downHoursPerYear as in the record
     * @param failureFrequency as in the record
     * @param meanUpTime       as in the record
     * @param meanDownTime     as in the record
     * @param mttf             as in the record
     * @param conditions       as in the record
     * @param substituted      as in the record
     * @param atPoint          as in the record
     * @param warnings         as in the record
     */
    public SymbolicAvailabilityResult(String source, List<String> parameters, List<String> up, List<String> states,
                                      Map<String, Formula> stationary, Formula availability,
                                      Formula unavailability, Rational hoursPerYear, Formula downHoursPerYear,
                                      Formula failureFrequency, Optional<Formula> meanUpTime,
                                      Optional<Formula> meanDownTime, Map<String, Optional<Formula>> mttf,
                                      List<Condition> conditions, Map<String, Rational> substituted,
                                      Optional<AvailabilityResult> atPoint, List<String> warnings) {
        this(source, parameters, up, states, stationary, availability, unavailability, hoursPerYear,
            downHoursPerYear, failureFrequency, meanUpTime, meanDownTime, mttf, conditions, substituted, atPoint,
            warnings, Optional.empty(), "given with --at");
    }

    /**
     * A(t) and R(t) from one start state as closed forms in t: sums of terms {@code c t^j exp(lambda t)} over the
     * eigenvalues of the generator (for A(t)) and of the generator with the down states made absorbing (for R(t)),
     * valid for every t &ge; 0 where the conditions of the result hold.
     *
     * @param from              the start state (the first up state unless {@code --from} names another)
     * @param time              the name of the time variable in the formulas ({@code t}, or another name when a
     *                          parameter is called t)
     * @param pointAvailability A(t), the probability of being in an up state at time t
     * @param reliability       R(t), the probability of having stayed in the up states throughout [0, t]
     * @param availabilityWhere the factors named in A(t) ({@code f1 = ...}, for eigenvalues written as the roots of an
     *                          irreducible factor of degree 3 or more), by name
     * @param reliabilityWhere  the same for R(t) (its own names)
     */
    public record InTime(String from, String time, Formula pointAvailability, Formula reliability,
                         Map<String, Formula> availabilityWhere, Map<String, Formula> reliabilityWhere) {
        /** Copies the maps, keeping their order. */
        public InTime {
            availabilityWhere = Collections.unmodifiableMap(new LinkedHashMap<>(availabilityWhere));
            reliabilityWhere = Collections.unmodifiableMap(new LinkedHashMap<>(reliabilityWhere));
        }
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
