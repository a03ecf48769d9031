package org.qchain.analysis;

import java.util.List;
import org.qchain.exact.Rational;

/**
 * The derivative of a transition probability {@code P(t)(from -> to)} of a continuous chain with respect to a
 * parameter, as certified decimals at the given times.
 *
 * @param times   the times, each {@code >= 0}
 * @param from    the start state
 * @param to      the end state
 * @param wrt     the parameter
 * @param digits  significant digits
 * @param maxBits the largest working precision
 * @param maxWork the largest estimated number of multiplications
 */
public record TransientSensQuery(List<Rational> times, String from, String to, String wrt, int digits, int maxBits,
                                 long maxWork) implements Query {
    /** Copies the list. */
    public TransientSensQuery {
        times = List.copyOf(times);
    }
}
