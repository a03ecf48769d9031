package org.qchain.analysis;

import java.util.Optional;
import org.qchain.exact.SizeEstimate;
import org.qchain.exact.ctmc.RateSensitivity;

/**
 * The exact derivative of a figure of merit of a continuous chain with respect to a parameter, at the nominal or
 * given point, and optionally over a sweep of a parameter.
 *
 * @param figure    the figure
 * @param wrt       the parameter
 * @param from      the start, for the MTTF (default: the first state on the {@code up} line)
 * @param sweep     a sweep in the interval syntax ({@code mu in [1/24, 1/6] by 1/48}), if asked for
 * @param maxDigits the largest estimated number of digits of all the sweep's exact values
 */
public record RateSensQuery(RateSensitivity.Figure figure, String wrt, Optional<String> from, Optional<String> sweep,
                            long maxDigits) implements Query {
    /** At the point only. */
    public RateSensQuery(RateSensitivity.Figure figure, String wrt, Optional<String> from) {
        this(figure, wrt, from, Optional.empty(), SizeEstimate.DEFAULT_MAX_DIGITS);
    }
}
