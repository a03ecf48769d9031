/**
 * Exact arithmetic for Markov chains: {@link org.qchain.exact.Rational}, {@link org.qchain.exact.RationalMatrix} and
 * the algorithms on them (powers, path sums, size estimates, decimal display).
 *
 * <p>This module depends on apfloat only; it must never import the {@code symbolic} or {@code cli} modules.
 */
package org.qchain.exact;
