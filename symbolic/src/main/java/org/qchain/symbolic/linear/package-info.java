/**
 * Linear systems over the rational functions of the model's parameters: {@code A X = B}, {@code X A = B}, the
 * normalised null vector (stationary laws as formulas) and the determinant, by fraction-free elimination over the
 * polynomial ring with one cancellation per entry at the end. {@link org.qchain.symbolic.linear.SymbolicSolver} is
 * the public API; it mirrors {@link org.qchain.exact.linear.LinearSolver}, and its results evaluated at rational
 * points equal that solver's (a test).
 */
package org.qchain.symbolic.linear;
