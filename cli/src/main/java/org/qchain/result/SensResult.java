package org.qchain.result;

import java.util.List;
import java.util.Optional;
import org.qchain.exact.Rational;

/**
 * The sensitivity of one n-step probability P = P^n(from, to) to a parameter: P and dP/dp as formulas, their exact
 * values and the elasticity at a point, and a sweep table.
 *
 * @param source      the model file name
 * @param kind        the chain kind word
 * @param n           steps
 * @param from        start state
 * @param to          end state
 * @param wrt         the parameter of the derivative
 * @param wrtLatex    its LaTeX name, as formulas print it
 * @param parameters  the parameters the formulas are in
 * @param probability P^n(from, to) as a formula
 * @param derivative  its derivative
 * @param at          values at the point, if every parameter has a value
 * @param sweep       the sweep table, if asked for
 * @param warnings    warnings
 * @param toStates    the final states (several: P is the probability of being in one of them); {@code to} joins them
 *                    with commas
 * @param gradient    one derivative per parameter asked for, the first being {@code wrt}'s
 */
public record SensResult(String source, String kind, long n, String from, String to, String wrt, String wrtLatex,
                         List<String> parameters, Formula probability, Formula derivative, Optional<AtPoint> at,
                         Optional<Sweep> sweep, List<String> warnings, List<String> toStates,
                         List<Partial> gradient) implements Result {
    /** Copies the lists. */
    public SensResult {
        parameters = List.copyOf(parameters);
        warnings = List.copyOf(warnings);
        toStates = List.copyOf(toStates);
        gradient = List.copyOf(gradient);
    }

    /**
     * The sensitivity to one parameter of the probability of one final state.
     *
     * @param source      the model file name
     * @param kind        the chain kind word
     * @param n           steps
     * @param from        start state
     * @param to          end state
     * @param wrt         the parameter of the derivative
     * @param wrtLatex    its LaTeX name
     * @param parameters  the parameters the formulas are in
     * @param probability P^n(from, to) as a formula
     * @param derivative  its derivative
     * @param at          values at the point
     * @param sweep       the sweep table
     * @param warnings    warnings
     */
    public SensResult(String source, String kind, long n, String from, String to, String wrt, String wrtLatex,
                      List<String> parameters, Formula probability, Formula derivative, Optional<AtPoint> at,
                      Optional<Sweep> sweep, List<String> warnings) {
        this(source, kind, n, from, to, wrt, wrtLatex, parameters, probability, derivative, at, sweep, warnings,
            List.of(to), List.of(new Partial(wrt, wrtLatex, derivative, at.map(AtPoint::derivative),
                at.flatMap(AtPoint::elasticity))));
    }

    /** Whether derivatives with respect to several parameters were asked for (a gradient). */
    public boolean isGradient() {
        return gradient.size() > 1;
    }

    /** {@code Down}, or {@code {Up, Worn}} for several final states. */
    public String toText() {
        return toStates.size() == 1 ? toStates.get(0) : "{" + String.join(", ", toStates) + "}";
    }

    /**
     * The derivative with respect to one parameter of a gradient.
     *
     * @param wrt          the parameter
     * @param wrtLatex     its LaTeX name
     * @param derivative   dP/d(wrt) as a formula
     * @param value        its exact value at the point, if there is one
     * @param elasticity   (wrt/P) dP/d(wrt) at the point; empty without a point or where P = 0
     */
    public record Partial(String wrt, String wrtLatex, Formula derivative, Optional<Rational> value,
                          Optional<Rational> elasticity) {
    }

    /**
     * Values at a point.
     *
     * @param point       the parameter values
     * @param probability P there
     * @param derivative  dP/dp there
     * @param elasticity  (p/P) dP/dp there; empty where P = 0
     */
    public record AtPoint(Point point, Rational probability, Rational derivative, Optional<Rational> elasticity) {
    }

    /**
     * One line of a sweep.
     *
     * @param value       the swept parameter's value
     * @param probability P there
     * @param derivative  dP/dp there
     */
    public record SweepLine(Rational value, Rational probability, Rational derivative) {
    }

    /**
     * A sweep table.
     *
     * @param parameter the swept parameter
     * @param start     first value
     * @param step      increment
     * @param end       last value allowed
     * @param others    the values of the other parameters
     * @param lines     one line per point
     */
    public record Sweep(String parameter, Rational start, Rational step, Rational end, Point others,
                        List<SweepLine> lines) {
        /** Copies the list. */
        public Sweep {
            lines = List.copyOf(lines);
        }

        /** {@code p in [0, 1/10] by 1/100}, as the option is written. */
        public String range() {
            return parameter + " in [" + start + ", " + end + "] by " + step;
        }
    }
}
