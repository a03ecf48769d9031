package org.qchain.symbolic;

/**
 * Limits on the size of symbolic results, checked before any work starts.
 *
 * @param maxTerms the largest allowed estimated number of polynomial terms in a whole result matrix (numerators of
 *                 all entries together); at least 1
 */
public record SymbolicLimits(long maxTerms) {
    /** The default: two million terms (a few hundred MB of heap for JAS terms with moderate coefficients). */
    public static final SymbolicLimits DEFAULT = new SymbolicLimits(2_000_000L);

    /** The CLI option that raises {@link #maxTerms}; named in the error message. */
    public static final String OPTION = "--max-terms";

    /**
     * Checks the bound.
     *
     * @throws IllegalArgumentException if {@code maxTerms < 1}
     */
    public SymbolicLimits {
        if (maxTerms < 1) {
            throw new IllegalArgumentException("maxTerms must be at least 1, not " + maxTerms);
        }
    }
}
