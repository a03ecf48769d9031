package org.qchain.analysis;

import java.util.List;
import java.util.Optional;
import org.qchain.exact.SizeEstimate;

/**
 * The sensitivity of one n-step probability P^n(from, to) to a parameter: P and dP/dp as formulas, their values and
 * the elasticity at the point, and optionally a sweep table. With several final states ({@code toStates}), P is the
 * probability of being in one of them (the sum of their entries); with several parameters ({@code gradient}), one
 * derivative and elasticity per parameter.
 *
 * @param n         the number of steps
 * @param from      the starting state
 * @param to        the state after n steps
 * @param wrt       the parameter of the derivative
 * @param sweep     a sweep in the interval syntax, {@code p in [0, 1/10] by 1/100}, if wanted
 * @param factor    factored formulas
 * @param maxTerms  refuse powers estimated to need more polynomial terms
 * @param maxDigits refuse powers estimated to need more digits in their coefficients
 * @param toStates  the final states, {@code to} being their names joined by commas
 * @param gradient  the parameters of the derivatives, {@code wrt} being the first
 */
public record SensQuery(long n, String from, String to, String wrt, Optional<String> sweep, boolean factor,
                        long maxTerms, long maxDigits, List<String> toStates, List<String> gradient)
    implements Query {

    /**
     * Copies the lists and checks them.
     *
     * @throws IllegalArgumentException for an empty set of states or of parameters, or a name given twice
     */
    public SensQuery {
        toStates = List.copyOf(toStates);
        gradient = List.copyOf(gradient);
        if (toStates.isEmpty() || gradient.isEmpty()) {
            throw new IllegalArgumentException("need at least one state and one parameter");
        }
        if (toStates.stream().distinct().count() != toStates.size()
            || gradient.stream().distinct().count() != gradient.size()) {
            throw new IllegalArgumentException("a state or parameter given twice");
        }
    }

    /**
     * The sensitivity of P^n(from, to) to one parameter.
     *
     * @param n         the number of steps
     * @param from      the starting state
     * @param to        the state after n steps
     * @param wrt       the parameter of the derivative
     * @param sweep     a sweep, if wanted
     * @param factor    factored formulas
     * @param maxTerms  the term limit
     * @param maxDigits the digit limit
     */
    public SensQuery(long n, String from, String to, String wrt, Optional<String> sweep, boolean factor,
                     long maxTerms, long maxDigits) {
        this(n, from, to, wrt, sweep, factor, maxTerms, maxDigits, List.of(to), List.of(wrt));
    }

    /**
     * The sensitivities of the probability of being in one of {@code toStates} after n steps to each parameter of
     * {@code gradient} (the gradient), with the default limits and no sweep.
     *
     * @param n        the number of steps
     * @param from     the starting state
     * @param toStates the states whose total probability is differentiated, at least one
     * @param gradient the parameters, at least one
     * @return the query
     */
    public static SensQuery gradient(long n, String from, List<String> toStates, List<String> gradient) {
        return new SensQuery(n, from, String.join(",", toStates), gradient.get(0), Optional.empty(), false,
            StepQuery.DEFAULT_MAX_TERMS, SizeEstimate.DEFAULT_MAX_DIGITS, toStates, gradient);
    }

    /** The sensitivity of P^n(from, to) to {@code wrt} with the default limits and no sweep. */
    public static SensQuery of(long n, String from, String to, String wrt) {
        return new SensQuery(n, from, to, wrt, Optional.empty(), false, StepQuery.DEFAULT_MAX_TERMS,
            SizeEstimate.DEFAULT_MAX_DIGITS);
    }
}
