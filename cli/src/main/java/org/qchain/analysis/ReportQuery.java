package org.qchain.analysis;

import java.util.EnumSet;
import java.util.List;
import java.util.Optional;
import java.util.OptionalLong;
import java.util.Set;
import org.qchain.exact.Rational;

/**
 * What a report holds: its sections and the questions each one asks. {@link Report#run} turns it into a list of
 * queries run through {@link Analysis#run}.
 *
 * @param sections   the sections to include
 * @param steps      the n of the n-step results (discrete chains), each at least 0, at least one
 * @param times      the times of P(t) (continuous chains), none negative, at least one
 * @param from       the start state of rows, the closed form and the plots (default: the first state)
 * @param to         the target states of the plotted entries (default: every state, for chains of up to
 *                   {@link #MAX_DEFAULT_CURVES} states; else the last state)
 * @param plotSteps  the last n of the P^n plot (discrete)
 * @param plotTime   the last t of the A(t) or P(t) plot (continuous); empty: chosen from the rates
 * @param sensTo     the target of the figure P^n(from, sensTo) whose sensitivity is reported (default: the last
 *                   state)
 * @param sensSteps  the n of that figure (default: the largest of {@code steps})
 * @param sweep      the sweep, in the interval syntax ({@code p in [0, 1/10] with 11 points}); empty: the first
 *                   parameter from its domain's lower end to twice its value, 11 points
 * @param digits     significant digits of the decimals
 * @param maxTerms   the symbolic term limit of the queries that take one
 * @param maxDigits  the digit limit of the queries that take one
 * @param closedMaxStates the closed form is derived for chains of at most this many states; larger chains get a
 *                   note instead (the closed form of a dense 20-state chain takes about half a minute)
 */
public record ReportQuery(Set<ReportSection> sections, List<Long> steps, List<Rational> times, Optional<String> from,
                          List<String> to, long plotSteps, Optional<Rational> plotTime, Optional<String> sensTo,
                          OptionalLong sensSteps, Optional<String> sweep, int digits, long maxTerms, long maxDigits,
                          int closedMaxStates) {
    /** Curves of a P^n plot when no target is chosen: every state up to this many states. */
    public static final int MAX_DEFAULT_CURVES = 6;
    /** The default last n of the P^n plot. */
    public static final long DEFAULT_PLOT_STEPS = 30;
    /** Points of a continuous plot. */
    public static final int CONTINUOUS_POINTS = 41;
    /** The default of {@code closedMaxStates}: a dense 12-state chain's closed form takes a few seconds. */
    public static final int DEFAULT_CLOSED_MAX_STATES = 12;
    /** The default n of the n-step results. */
    public static final List<Long> DEFAULT_STEPS = List.of(1L, 5L, 10L);
    /** The default times of P(t). */
    public static final List<Rational> DEFAULT_TIMES = List.of(Rational.ONE, Rational.of(10), Rational.of(100));

    /**
     * Checks the ranges.
     *
     * @throws IllegalArgumentException for no section, no n or time, a negative n or time, digits below 1
     */
    public ReportQuery {
        sections = sections.isEmpty() ? Set.of() : Set.copyOf(EnumSet.copyOf(sections));
        steps = List.copyOf(steps);
        times = List.copyOf(times);
        to = List.copyOf(to);
        if (steps.isEmpty() || steps.stream().anyMatch(n -> n < 0) || times.isEmpty()
            || times.stream().anyMatch(t -> t.signum() < 0) || digits < 1 || plotSteps < 1) {
            throw new IllegalArgumentException("need n >= 0, times >= 0, digits >= 1, plot steps >= 1");
        }
    }

    /** Every section with the defaults, 12 digits. */
    public static ReportQuery defaults() {
        return new ReportQuery(EnumSet.allOf(ReportSection.class), DEFAULT_STEPS, DEFAULT_TIMES, Optional.empty(),
            List.of(), DEFAULT_PLOT_STEPS, Optional.empty(), Optional.empty(), OptionalLong.empty(), Optional.empty(),
            12, StepQuery.DEFAULT_MAX_TERMS, org.qchain.exact.SizeEstimate.DEFAULT_MAX_DIGITS,
            DEFAULT_CLOSED_MAX_STATES);
    }

    /** This query with only the given sections. */
    public ReportQuery withSections(Set<ReportSection> s) {
        return new ReportQuery(s, steps, times, from, to, plotSteps, plotTime, sensTo, sensSteps, sweep, digits,
            maxTerms, maxDigits, closedMaxStates);
    }

    /** Whether the section is included. */
    public boolean has(ReportSection s) {
        return sections.contains(s);
    }
}
