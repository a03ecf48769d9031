/**
 * Typed results: one sealed hierarchy ({@link org.qchain.result.Result}) of immutable records saying which quantity
 * was computed, for which states, with exact values ({@link org.qchain.exact.Rational}), formulas that print
 * themselves ({@link org.qchain.result.Formula}: plain text and LaTeX), conditions on the parameters
 * ({@link org.qchain.result.Condition}: a formula, a relation, a number and a proved domain fact), the parameters
 * they are in and the warnings.
 *
 * <p>Results hold no rounded decimals and no text laid out for one format: the formatters of
 * {@code org.qchain.format} round exact values at the digits asked for. This package imports neither picocli nor
 * the symbolic module, so numeric runs load no symbolic class through it.
 */
package org.qchain.result;
