package org.qchain.analysis;

import java.util.Optional;
import org.qchain.exact.ctmc.RateSensitivity;

/**
 * The exact derivative of a figure of merit of a continuous chain with respect to a parameter, at the nominal or
 * given point.
 *
 * @param figure the figure
 * @param wrt    the parameter
 * @param from   the start, for the MTTF (default: the first state on the {@code up} line)
 */
public record RateSensQuery(RateSensitivity.Figure figure, String wrt, Optional<String> from) implements Query {
}
