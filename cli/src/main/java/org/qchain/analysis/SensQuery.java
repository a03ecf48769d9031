package org.qchain.analysis;

import java.util.Optional;
import org.qchain.exact.SizeEstimate;

/**
 * The sensitivity of one n-step probability P^n(from, to) to a parameter: P and dP/dp as formulas, their values and
 * the elasticity at the point, and optionally a sweep table.
 *
 * @param n         the number of steps
 * @param from      the starting state
 * @param to        the state after n steps
 * @param wrt       the parameter of the derivative
 * @param sweep     a sweep in the interval syntax, {@code p in [0, 1/10] by 1/100}, if wanted
 * @param factor    factored formulas
 * @param maxTerms  refuse powers estimated to need more polynomial terms
 * @param maxDigits refuse powers estimated to need more digits in their coefficients
 */
public record SensQuery(long n, String from, String to, String wrt, Optional<String> sweep, boolean factor,
                        long maxTerms, long maxDigits) implements Query {

    /** The sensitivity of P^n(from, to) to {@code wrt} with the default limits and no sweep. */
    public static SensQuery of(long n, String from, String to, String wrt) {
        return new SensQuery(n, from, to, wrt, Optional.empty(), false, StepQuery.DEFAULT_MAX_TERMS,
            SizeEstimate.DEFAULT_MAX_DIGITS);
    }
}
