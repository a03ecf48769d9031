/**
 * Exact linear systems: {@code A X = B}, {@code X A = B}, the normalised null vector of a matrix with zero row sums
 * (stationary laws), determinants and inverses, all over the rationals and all without a fraction inside the
 * elimination.
 *
 * <p>{@link org.qchain.exact.linear.LinearSolver} is the public API, with
 * {@link org.qchain.exact.linear.CommonSolution} for a solution kept over one common denominator (an integer matrix
 * and one denominator, reduced entry by entry only when asked: for callers that solve again with it or combine its
 * entries, as the variance of an absorption time does). Behind it, each equation is scaled to
 * integers; word-size systems are solved by p-adic lifting (Dixon 1982) on an LU decomposition modulo a prime that
 * keeps the band of a banded chain, others by fraction-free Gauss-Jordan elimination (Bareiss 1968) with one common
 * denominator. A singular system raises {@link org.qchain.exact.linear.SingularSystemException}, which names the
 * first unknown left undetermined so callers can name the state.
 *
 * <pre>{@code
 * RationalMatrix pMinusI = ...;                              // rows sum to 0
 * Rational[] pi = LinearSolver.leftNullVector(pMinusI);      // pi (P - I) = 0, sum pi = 1
 * }</pre>
 */
package org.qchain.exact.linear;
