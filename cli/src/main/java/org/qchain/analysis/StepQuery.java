package org.qchain.analysis;

import java.util.Optional;
import java.util.OptionalInt;
import org.qchain.exact.SizeEstimate;
import org.qchain.symbolic.SymbolicLimits;

/**
 * n-step transition probabilities: the whole matrix P^n, one row, or one entry with its most probable paths.
 *
 * @param n             the number of steps, at least 0
 * @param from          the starting state, for a row or an entry
 * @param to            the final state, for an entry (needs {@code from})
 * @param paths         how many most probable paths to list (needs {@code from} and {@code to}; numeric only)
 * @param maxDigits     refuse results estimated to have more digits in total (symbolic: in their coefficients)
 * @param maxPathDigits refuse a path search estimated to process more digits
 * @param symbolic      keep every parameter symbolic, even those with values
 * @param factor        symbolic results: factored formulas
 * @param maxTerms      symbolic results: refuse powers estimated to need more polynomial terms
 */
public record StepQuery(long n, Optional<String> from, Optional<String> to, OptionalInt paths, long maxDigits,
                        long maxPathDigits, boolean symbolic, boolean factor, long maxTerms) implements Query {
    /** Default limit on polynomial terms (the symbolic module's; a constant, so reading it loads no class). */
    public static final long DEFAULT_MAX_TERMS = SymbolicLimits.DEFAULT_MAX_TERMS;

    /**
     * Checks the shape.
     *
     * @throws IllegalArgumentException for a negative n, {@code to} without {@code from}, paths without an entry
     */
    public StepQuery {
        if (n < 0) {
            throw new IllegalArgumentException("n must be 0 or more: " + n);
        }
        if (to.isPresent() && from.isEmpty()) {
            throw new IllegalArgumentException("an entry needs its starting state");
        }
        if (paths.isPresent() && to.isEmpty()) {
            throw new IllegalArgumentException("paths need an entry (from and to)");
        }
    }

    /** The whole matrix P^n with the default limits. */
    public static StepQuery matrix(long n) {
        return new StepQuery(n, Optional.empty(), Optional.empty(), OptionalInt.empty(),
            SizeEstimate.DEFAULT_MAX_DIGITS, SizeEstimate.DEFAULT_MAX_PATH_DIGITS, false, false, DEFAULT_MAX_TERMS);
    }

    /** Row {@code from} of P^n with the default limits. */
    public static StepQuery row(long n, String from) {
        return matrix(n).with(Optional.of(from), Optional.empty(), OptionalInt.empty());
    }

    /** Entry (from, to) of P^n with the default limits. */
    public static StepQuery entry(long n, String from, String to) {
        return matrix(n).with(Optional.of(from), Optional.of(to), OptionalInt.empty());
    }

    /** This entry query with its {@code k} most probable paths. */
    public StepQuery withPaths(int k) {
        return with(from, to, OptionalInt.of(k));
    }

    /** This query with the parameters kept symbolic. */
    public StepQuery withSymbolic(boolean keepSymbolic) {
        return new StepQuery(n, from, to, paths, maxDigits, maxPathDigits, keepSymbolic, factor, maxTerms);
    }

    private StepQuery with(Optional<String> f, Optional<String> t, OptionalInt k) {
        return new StepQuery(n, f, t, k, maxDigits, maxPathDigits, symbolic, factor, maxTerms);
    }
}
