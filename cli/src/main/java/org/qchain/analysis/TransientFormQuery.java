package org.qchain.analysis;

import java.util.List;
import java.util.Optional;
import org.qchain.exact.Rational;
import org.qchain.exact.certified.CertifiedPowers;

/**
 * {@code P(t) = exp(Qt)} of a continuous chain with its parameters symbolic: the closed form in t, the same at each
 * given time as formulas in the parameters, and certified decimals at the point when every parameter has a value.
 *
 * @param times     the times, each {@code >= 0}, at least one
 * @param from      the starting state, for one row
 * @param digits    significant digits of the decimals
 * @param factor    print coefficients with numerator and denominator factored over the rationals
 * @param maxTerms  refuse chains whose powers Q^1 .. Q^s are estimated to need more polynomial terms
 * @param maxDigits refuse closed forms of parameter-free chains estimated to print more digits
 * @param maxWork   the work limit of the certified decimals at the point
 */
public record TransientFormQuery(List<Rational> times, Optional<String> from, int digits, boolean factor,
                                 long maxTerms, long maxDigits, long maxWork) implements Query {
    /**
     * Checks the ranges.
     *
     * @throws IllegalArgumentException for no time, a negative time or digits below 1
     */
    public TransientFormQuery {
        times = List.copyOf(times);
        if (times.isEmpty() || times.stream().anyMatch(t -> t.signum() < 0)) {
            throw new IllegalArgumentException("need at least one time, none negative");
        }
        if (digits < 1) {
            throw new IllegalArgumentException("digits must be at least 1");
        }
    }

    /** The whole matrix at the given times, 12 digits, the default limits. */
    public static TransientFormQuery matrix(List<Rational> times) {
        return new TransientFormQuery(times, Optional.empty(), 12, false, StepQuery.DEFAULT_MAX_TERMS,
            ClosedQuery.DEFAULT_MAX_DIGITS, CertifiedPowers.DEFAULT_MAX_WORK);
    }

    /** The closed-form part of this query, for the size guard shared with {@code closed}. */
    ClosedQuery closed() {
        return new ClosedQuery(org.qchain.result.ClosedResult.Form.MATRIX, from, "--from", Optional.empty(), maxTerms,
            digits, maxDigits, factor);
    }
}
