package org.qchain.symbolic;

/**
 * An upper estimate of the size of {@code P^n} for a matrix of rational functions, computed from the one-step matrix
 * before any multiplication (see {@link RatFunMatrix#estimatePower(long)}). The decision on it
 * ({@link #requireWithin}) belongs to the caller's size guard, which runs before any engine (the CLI's analysis
 * layer); the engines only assert that it ran.
 *
 * @param n             the power
 * @param degree        bound on the total degree of each numerator of {@code A^n} where {@code P = A/d}
 * @param termsPerEntry bound on the number of terms of one such numerator
 * @param totalTerms    {@code termsPerEntry} times the number of entries (saturating at {@code Long.MAX_VALUE})
 * @param digits        estimate of the decimal digits of all coefficients together: {@code totalTerms} times
 *                      {@code n * log10(s * T * H * c)} for {@code s} states, at most {@code T} terms per entry of
 *                      {@code A}, {@code A = A'/c} with {@code A'} integral and {@code H} its largest coefficient
 *                      (each coefficient of {@code A'^n} is a sum of at most {@code (sT)^n} products of {@code n}
 *                      coefficients), saturating
 */
public record PowerEstimate(long n, long degree, long termsPerEntry, long totalTerms, long digits) {

    /**
     * The estimate of one row of the power: the whole power's totals divided by the number of rows.
     *
     * @param rows the number of rows of the matrix, at least 1
     * @return the estimate of one row
     */
    public PowerEstimate row(int rows) {
        return new PowerEstimate(n, degree, termsPerEntry,
            totalTerms == Long.MAX_VALUE ? Long.MAX_VALUE : totalTerms / rows,
            digits == Long.MAX_VALUE ? Long.MAX_VALUE : digits / rows);
    }

    /** Whether the estimate is within both limits. */
    public boolean isWithin(SymbolicLimits limits) {
        return totalTerms <= limits.maxTerms() && digits <= limits.maxDigits();
    }

    /**
     * The size decision, for the caller's guard before any engine runs: refuses a power past a limit, with the
     * estimate and the option that raises the limit in the message.
     *
     * @param limits the limits
     * @throws org.qchain.exact.QchainException {@link org.qchain.exact.ErrorKey#SYMBOLIC_TOO_LARGE} past the term
     *                                          limit, {@link org.qchain.exact.ErrorKey#SYMBOLIC_DIGITS_TOO_LARGE}
     *                                          past the digit limit
     */
    public void requireWithin(SymbolicLimits limits) {
        requireTermsWithin(limits);
        if (digits > limits.maxDigits()) {
            throw new org.qchain.exact.QchainException(org.qchain.exact.ErrorKey.SYMBOLIC_DIGITS_TOO_LARGE, n, digits,
                limits.maxDigits(), SymbolicLimits.DIGITS_OPTION);
        }
    }

    /**
     * As {@link #requireWithin} for the term limit only (the closed forms' guard on the powers they multiply out).
     *
     * @param limits the limits
     * @throws org.qchain.exact.QchainException {@link org.qchain.exact.ErrorKey#SYMBOLIC_TOO_LARGE} past the term
     *                                          limit
     */
    public void requireTermsWithin(SymbolicLimits limits) {
        if (totalTerms > limits.maxTerms()) {
            throw new org.qchain.exact.QchainException(org.qchain.exact.ErrorKey.SYMBOLIC_TOO_LARGE, n, totalTerms,
                degree, limits.maxTerms(), SymbolicLimits.OPTION);
        }
    }

    /**
     * The engines' assertion that the caller's guard ran: a power past a limit here is a programming error (the
     * guard refuses it first with {@link #requireWithin}), not a user-facing refusal.
     *
     * @param ok   whether the estimate is within the limits
     * @param what the work, for the message
     * @throws IllegalStateException if not
     */
    static void assertGuarded(boolean ok, String what) {
        if (!ok) {
            throw new IllegalStateException(what + " is past the size limit: the size guard (PowerEstimate"
                + ".requireWithin) must refuse it before the engine runs");
        }
    }
}
