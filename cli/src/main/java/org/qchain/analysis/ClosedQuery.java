package org.qchain.analysis;

import java.util.List;
import java.util.Optional;
import org.qchain.result.ClosedResult;

/**
 * P^n in a symbolic n: the closed form, the generating functions or the recurrences, of the whole matrix, of what
 * a start (one state: its row; a distribution: start·P^n) gives, or of one probability: an entry, or the
 * probability of a set of states from the start ({@code sum_i s_i sum_(j in to) P^n(i, j)}). The given parameter
 * values are substituted first; all other parameters stay symbolic.
 *
 * @param form      which form
 * @param start     the start (one state, or a distribution; its option names it in messages), for a row or an entry
 * @param toStates  the final states, for one probability (their sum); empty for the whole row
 * @param maxTerms  refuse chains whose powers are estimated to need more polynomial terms
 * @param digits    significant digits of numeric values (rate, roots)
 * @param maxDigits refuse closed forms of parameter-free chains estimated to print more digits
 * @param factor    print coefficients and limits with numerator and denominator factored over the rationals
 */
public record ClosedQuery(ClosedResult.Form form, Optional<Start> start, List<String> toStates, long maxTerms,
                          int digits, long maxDigits, boolean factor) implements Query {
    /** The default of {@code maxDigits}, as for every command's {@code --max-digits}. */
    public static final long DEFAULT_MAX_DIGITS = org.qchain.exact.SizeEstimate.DEFAULT_MAX_DIGITS;

    /**
     * Copies the list and checks the shape.
     *
     * @throws IllegalArgumentException for final states without a start, or a final state named twice
     */
    public ClosedQuery {
        toStates = List.copyOf(toStates);
        if (!toStates.isEmpty() && start.isEmpty()) {
            throw new IllegalArgumentException("an entry needs its starting state");
        }
        if (toStates.stream().distinct().count() != toStates.size()) {
            throw new IllegalArgumentException("a state twice in the set: " + toStates);
        }
    }

    /**
     * One starting state and at most one final state.
     *
     * @param form      which form
     * @param from      the starting state, for a row or an entry
     * @param fromName  the option that named it ({@code --from} or {@code --start}), for messages
     * @param to        the final state, for an entry
     * @param maxTerms  the term limit
     * @param digits    significant digits of numeric values
     * @param maxDigits the digit limit
     * @param factor    factored coefficients
     */
    public ClosedQuery(ClosedResult.Form form, Optional<String> from, String fromName, Optional<String> to,
                       long maxTerms, int digits, long maxDigits, boolean factor) {
        this(form, from.map(s -> Start.state(s, fromName)), to.map(List::of).orElse(List.of()), maxTerms, digits,
            maxDigits, factor);
    }

    /** Expanded formulas. */
    public ClosedQuery(ClosedResult.Form form, Optional<String> from, String fromName, Optional<String> to,
                       long maxTerms, int digits, long maxDigits) {
        this(form, from, fromName, to, maxTerms, digits, maxDigits, false);
    }

    /** The same query with factored ({@code true}) or expanded coefficients. */
    public ClosedQuery factored(boolean on) {
        return new ClosedQuery(form, start, toStates, maxTerms, digits, maxDigits, on);
    }

    /** With the default digit limit. */
    public ClosedQuery(ClosedResult.Form form, Optional<String> from, String fromName, Optional<String> to,
                       long maxTerms, int digits) {
        this(form, from, fromName, to, maxTerms, digits, DEFAULT_MAX_DIGITS);
    }

    /** The one starting state, when the start is one state with certainty; empty otherwise. */
    public Optional<String> from() {
        return start.flatMap(Start::single);
    }

    /** The option that gave the start ({@code --from} without one). */
    public String fromName() {
        return start.map(Start::option).orElse("--from");
    }

    /** The one final state, when exactly one is given. */
    public Optional<String> to() {
        return toStates.size() == 1 ? Optional.of(toStates.get(0)) : Optional.empty();
    }

    /** Whether the query asks for more than rows and entries: a start distribution or a set of final states. */
    public boolean combines() {
        return start.map(s -> s.weights().size() > 1).orElse(false) || toStates.size() > 1;
    }

    /** The whole closed-form matrix with the default limit and 12 digits. */
    public static ClosedQuery matrix() {
        return new ClosedQuery(ClosedResult.Form.MATRIX, Optional.empty(), "--from", Optional.empty(),
            StepQuery.DEFAULT_MAX_TERMS, 12);
    }

    /** Entry (from, to) of the closed form with the default limit and 12 digits. */
    public static ClosedQuery entry(String from, String to) {
        return new ClosedQuery(ClosedResult.Form.MATRIX, Optional.of(from), "--from", Optional.of(to),
            StepQuery.DEFAULT_MAX_TERMS, 12);
    }
}
