package org.qchain.symbolic;

/**
 * Limits on the size of symbolic results, checked before any work starts.
 *
 * @param maxTerms  the largest allowed estimated number of polynomial terms in a whole result matrix (numerators of
 *                  all entries together); at least 1
 * @param maxDigits the largest allowed estimated number of decimal digits in all coefficients of a result matrix
 *                  together; at least 1
 */
public record SymbolicLimits(long maxTerms, long maxDigits) {
    /** The default term limit: two million terms (a few hundred MB of heap for JAS terms). */
    public static final long DEFAULT_MAX_TERMS = 2_000_000L;

    /** The default digit limit, as the exact engine's: fifty million digits in total. */
    public static final long DEFAULT_MAX_DIGITS = 50_000_000L;

    /** The defaults. */
    public static final SymbolicLimits DEFAULT = new SymbolicLimits(DEFAULT_MAX_TERMS, DEFAULT_MAX_DIGITS);

    /** The CLI option that raises {@link #maxTerms}; named in the error message. */
    public static final String OPTION = "--max-terms";

    /** The CLI option that raises {@link #maxDigits}; named in the error message. */
    public static final String DIGITS_OPTION = "--max-digits";

    /**
     * Checks the bounds.
     *
     * @throws IllegalArgumentException if a limit is below 1
     */
    public SymbolicLimits {
        if (maxTerms < 1) {
            throw new IllegalArgumentException("maxTerms must be at least 1, not " + maxTerms);
        }
        if (maxDigits < 1) {
            throw new IllegalArgumentException("maxDigits must be at least 1, not " + maxDigits);
        }
    }

    /**
     * A term limit with the default digit limit.
     *
     * @param maxTerms the term limit, at least 1
     */
    public SymbolicLimits(long maxTerms) {
        this(maxTerms, DEFAULT_MAX_DIGITS);
    }
}
