package org.qchain.analysis;

import java.util.Optional;
import org.qchain.result.ClosedResult;

/**
 * P^n in a symbolic n: the closed form, the generating functions or the recurrences, of the whole matrix, one row or
 * one entry. The given parameter values are substituted first; all other parameters stay symbolic.
 *
 * @param form      which form
 * @param from      the starting state, for a row or an entry
 * @param fromName  the option that named it ({@code --from} or {@code --start}), for messages
 * @param to        the final state, for an entry
 * @param maxTerms  refuse chains whose powers are estimated to need more polynomial terms
 * @param digits    significant digits of numeric values (rate, roots)
 * @param maxDigits refuse closed forms of parameter-free chains estimated to print more digits
 * @param factor    print coefficients and limits with numerator and denominator factored over the rationals
 */
public record ClosedQuery(ClosedResult.Form form, Optional<String> from, String fromName, Optional<String> to,
                          long maxTerms, int digits, long maxDigits, boolean factor) implements Query {
    /** The default of {@code maxDigits}, as for every command's {@code --max-digits}. */
    public static final long DEFAULT_MAX_DIGITS = org.qchain.exact.SizeEstimate.DEFAULT_MAX_DIGITS;

    /** Expanded formulas. */
    public ClosedQuery(ClosedResult.Form form, Optional<String> from, String fromName, Optional<String> to,
                       long maxTerms, int digits, long maxDigits) {
        this(form, from, fromName, to, maxTerms, digits, maxDigits, false);
    }

    /** The same query with factored ({@code true}) or expanded coefficients. */
    public ClosedQuery factored(boolean on) {
        return new ClosedQuery(form, from, fromName, to, maxTerms, digits, maxDigits, on);
    }

    /** With the default digit limit. */
    public ClosedQuery(ClosedResult.Form form, Optional<String> from, String fromName, Optional<String> to,
                       long maxTerms, int digits) {
        this(form, from, fromName, to, maxTerms, digits, DEFAULT_MAX_DIGITS);
    }

    /**
     * Checks the shape.
     *
     * @throws IllegalArgumentException for {@code to} without {@code from}
     */
    public ClosedQuery {
        if (to.isPresent() && from.isEmpty()) {
            throw new IllegalArgumentException("an entry needs its starting state");
        }
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
