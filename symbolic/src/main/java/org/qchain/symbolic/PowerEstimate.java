package org.qchain.symbolic;

/**
 * An upper estimate of the size of {@code P^n} for a matrix of rational functions, computed from the one-step matrix
 * before any multiplication (see {@link RatFunMatrix#estimatePower(long)}).
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
}
