package org.qchain.result;

import java.util.List;
import java.util.Optional;
import org.qchain.exact.Rational;

/**
 * The exact derivative of a figure of merit of a continuous chain (availability, unavailability, MTTF, failure
 * frequency) with respect to one parameter, at a point, and optionally over a sweep of a parameter.
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
 * @param sweep      the figure and its derivative over exact values of a parameter (the lines' {@code probability}
 *                   is the figure), if asked for
 */
public record RateSensResult(String source, String figure, Optional<String> from, String wrt, Point point,
                             Rational value, Rational derivative, Optional<Rational> elasticity, List<String> warnings,
                             Optional<SensResult.Sweep> sweep)
    implements Result {
    /** Copies the list. */
    public RateSensResult {
        warnings = List.copyOf(warnings);
    }

    /** Without a sweep. */
    public RateSensResult(String source, String figure, Optional<String> from, String wrt, Point point,
                          Rational value, Rational derivative, Optional<Rational> elasticity, List<String> warnings) {
        this(source, figure, from, wrt, point, value, derivative, elasticity, warnings, Optional.empty());
    }

    /**
     * The elasticity on one line of the sweep: {@code (wrt / figure) × derivative}, with {@code wrt} the swept value
     * when the sweep is over {@code wrt} and the point's value otherwise; empty when the figure is 0.
     *
     * @param line a line of the sweep
     * @return the elasticity there
     */
    public Optional<Rational> elasticity(SensResult.SweepLine line) {
        Rational theta = sweep.filter(s -> s.parameter().equals(wrt)).map(s -> line.value())
            .orElseGet(() -> point.values().getOrDefault(wrt, Rational.ZERO));
        return line.probability().isZero() ? Optional.empty()
            : Optional.of(theta.divide(line.probability()).multiply(line.derivative()));
    }
}
