package org.qchain.result;

import java.util.List;
import java.util.Optional;
import org.qchain.exact.Rational;

/**
 * The exact derivative of a figure of merit of a continuous chain (availability, unavailability, MTTF, failure
 * frequency) with respect to one parameter, at a point.
 *
 * @param source     the model file name as the user gave it
 * @param figure     the figure's name as on the command line ({@code mttf}, {@code availability}, ...)
 * @param from       the start, for the MTTF
 * @param wrt        the parameter
 * @param point      the parameter values used
 * @param value      the figure
 * @param derivative d(figure)/d(wrt)
 * @param elasticity (wrt/figure) × derivative; empty when the figure is 0
 * @param warnings   warnings for the user
 */
public record RateSensResult(String source, String figure, Optional<String> from, String wrt, Point point,
                             Rational value, Rational derivative, Optional<Rational> elasticity, List<String> warnings)
    implements Result {
    /** Copies the list. */
    public RateSensResult {
        warnings = List.copyOf(warnings);
    }
}
