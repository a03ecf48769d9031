package org.qchain.result;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.qchain.exact.Rational;

/**
 * Where a chain with numeric values is after n steps from a start ({@code step --start}, a {@code --to} set, a list
 * or range of n): the distribution {@code start · P^n}, and the total probability of a set of states, for one n or a
 * series of n.
 *
 * @param source   the model file name as the user gave it
 * @param kind     the chain kind word ({@code discrete})
 * @param start    the starting probability of each named state (the others start with 0)
 * @param from     the one starting state, when the chain starts in one state with certainty
 * @param states   state names, the order of each distribution
 * @param to       the states whose total probability is asked for; empty for the whole distribution
 * @param series   whether the step counts were asked as a list or range (one table over n)
 * @param lines    one line per step count, in increasing n
 * @param point    the parameter values used and where they came from; absent for a model without parameters
 * @param warnings warnings for the user
 */
public record DistributionResult(String source, String kind, Map<String, Rational> start, Optional<String> from,
                                 List<String> states, List<String> to, boolean series, List<Line> lines,
                                 Optional<Point> point, List<String> warnings) implements Result {
    /** Copies the collections, keeping the start's order. */
    public DistributionResult {
        start = Collections.unmodifiableMap(new LinkedHashMap<>(start));
        states = List.copyOf(states);
        to = List.copyOf(to);
        lines = List.copyOf(lines);
        warnings = List.copyOf(warnings);
    }

    /**
     * The distribution after n steps.
     *
     * @param n            the number of steps
     * @param distribution {@code distribution.get(j)}: the probability of being in state j after n steps
     * @param total        the sum over the {@code to} states; present exactly when they are given
     */
    public record Line(long n, List<Rational> distribution, Optional<Rational> total) {
        /** Copies the list. */
        public Line {
            distribution = List.copyOf(distribution);
        }
    }

    /** {@code Healthy}, or {@code Healthy=3/5, Ill=2/5}: the start as one text. */
    public String startText() {
        if (from.isPresent()) {
            return from.get();
        }
        StringBuilder sb = new StringBuilder();
        start.forEach((k, v) -> sb.append(sb.length() == 0 ? "" : ", ").append(k).append('=').append(v));
        return sb.toString();
    }

    /** {@code Down}, or {@code {Up, Worn}}: the set of {@code to} states as one text (empty without one). */
    public String toText() {
        return to.size() == 1 ? to.get(0) : "{" + String.join(", ", to) + "}";
    }
}
