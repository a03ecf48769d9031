/**
 * Certified decimals: correctly rounded digits of quantities whose exact fractions are too large to write, proven by
 * interval enclosures instead of computed exactly.
 *
 * <h2>Types</h2>
 * <ul>
 * <li>{@link org.qchain.exact.certified.Enclosure}: an interval {@code [lo, hi]} of rationals known to contain a
 * value.</li>
 * <li>{@link org.qchain.exact.certified.Ziv}: turns enclosures at rising working precision into correctly rounded
 * decimals; the one entry point for other engines (a transient law {@code P(t)}, say) that can enclose their values
 * at a given precision.</li>
 * <li>{@link org.qchain.exact.certified.CertifiedDecimal}: the decimal text, the enclosure that proved it, and
 * whether it is certified, exact, or (honestly) only an interval.</li>
 * <li>{@link org.qchain.exact.certified.CertifiedPowers}: rows, entries and all of {@code P^n} for a non-negative
 * matrix, dense ({@link org.qchain.exact.RationalMatrix}) or sparse
 * ({@link org.qchain.exact.SparseRationalMatrix}).</li>
 * <li>{@link org.qchain.exact.certified.CertifiedReal}, {@link org.qchain.exact.certified.CertifiedComplex}: numbers
 * that give proven digits on demand: exact rationals, real algebraic numbers (a square-free polynomial and an
 * isolating interval, refined by exact bisection, so a value on a rounding boundary is found exactly), or values
 * given by enclosures that narrow with the precision; {@link org.qchain.exact.certified.CertifiedRoots} isolates
 * every root of a rational polynomial (inclusion disks proven in rational arithmetic). The closed forms' eigenvalues,
 * roots and convergence rate at a point are such numbers.</li>
 * </ul>
 *
 * <h2>Method</h2>
 * <p>Transition matrices have no negative entries, so products are monotone: with {@code L <= P <= U} entrywise,
 * {@code L L <= P P <= U U}. The engine keeps fixed-point integer bound matrices ({@code X / 2^w}), rounds the lower
 * one down and the upper one up after every product, and so brackets {@code P^n} rigorously with plain integer
 * arithmetic; the bracket's width grows like {@code n s 2^-w} ({@code s} states). Ziv's strategy then settles each
 * value: if both ends of its bracket round to the same decimal, that decimal is proven; otherwise the precision
 * {@code w} doubles. A value exactly on a rounding boundary (a tie) never settles, so the loop stops at a largest
 * precision and falls back to the exact fraction when its estimated size is affordable, or reports the interval.
 *
 * <h2>Example</h2>
 * <pre>{@code
 * SparseRationalMatrix p = SparseRationalMatrix.of(RationalMatrix.of(new Rational[][] {
 *     {Rational.parse("0.9"), Rational.parse("0.1")},
 *     {Rational.parse("1/2"), Rational.parse("1/2")}}));
 * CertifiedDecimal[] row = CertifiedPowers.row(p, 0, 1_000_000, CertifiedPowers.Settings.of(12), Progress.NONE);
 * row[1].text();                        // "0.166666666667", every digit proven
 * row[1].enclosure().width();           // an upper bound on the error, as an exact rational
 * }</pre>
 */
package org.qchain.exact.certified;
