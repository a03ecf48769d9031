/**
 * Exact arithmetic for Markov chains: rationals, matrices, and the algorithms on them.
 *
 * <h2>Types</h2>
 * <ul>
 * <li>{@link org.qchain.exact.Rational} and {@link org.qchain.exact.RationalMatrix}: immutable values, always in
 * lowest terms; gcds of large numbers by Lehmer's method ({@link org.qchain.exact.Gcd}), and many fractions over one
 * denominator reduced together ({@link org.qchain.exact.Fractions}).</li>
 * <li>{@link org.qchain.exact.MatrixPowers}: {@code P^n}, one row of it, one entry of it.</li>
 * <li>{@link org.qchain.exact.DistributionPowers}: a distribution after n steps, {@code start · P^n}, for one n or a
 * series of n that continues each from the one before.</li>
 * <li>{@link org.qchain.exact.TopPaths}: the {@code K} most probable paths of length {@code n} between two states,
 * as {@link org.qchain.exact.WeightedPath}s.</li>
 * <li>{@link org.qchain.exact.SizeEstimate}: how many digits a result will have, before computing it, and the
 * refusal past a limit ({@link org.qchain.exact.ErrorKey#RESULT_TOO_LARGE}).</li>
 * <li>{@link org.qchain.exact.Decimals}: correctly rounded decimal display (ties to even).</li>
 * <li>{@link org.qchain.exact.Progress}: coarse progress reports from long computations; engines never print.</li>
 * <li>{@link org.qchain.exact.QchainException} with an {@link org.qchain.exact.ErrorKey}: the one error type.</li>
 * </ul>
 *
 * <h2>Design of the engine</h2>
 * <p>Fractions are slow because every operation takes a gcd. The engine therefore writes {@code P = A / d}, with
 * {@code d} the least common multiple of all denominators and {@code A} an integer matrix, computes with integers
 * only, and reduces once at the end: {@code P^n = A^n / d^n}. The reduction does not take a gcd of two huge numbers
 * either: {@code gcd(x, d^n)} involves only the primes of {@code d}, which are found once by trial division, so one
 * remainder by a product of small prime powers gives every entry's common factor (package-private
 * {@code KnownDenominator}). Zero entries are skipped everywhere, so sparse chains cost in proportion to their
 * transitions.
 * <ul>
 * <li>The whole power: repeated squaring, left to right over the bits of {@code n} (the extra multiplications are
 * by the small matrix {@code A}). Large products split their rows over the common fork-join pool. When the entries
 * pass a measured size (hundreds of thousands of bits) the remaining squarings run on apfloat's transform
 * multiplication, converted in and out once.</li>
 * <li>A row or an entry: {@code n} vector–matrix products {@code v <- v A} (path sums), each a fused
 * multiply-add of big numbers by small ones on 32-bit limbs, columns split over threads; or squaring when {@code n}
 * is large against the number of states (a cost model picks). Both give the same integers.</li>
 * <li>Two states with rows summing to 1: the closed form
 * {@code P^n = (1/(a+b)) [[b, a], [b, a]] + ((1-a-b)^n/(a+b)) [[a, -a], [-b, b]]}, two integer powers.</li>
 * <li>Most probable paths: K-best dynamic programming over the layers, weights as integers over {@code d^t}.</li>
 * </ul>
 * <p>Long loops check the calling thread's interrupt flag and throw {@code QchainException(ErrorKey.INTERRUPTED)}.
 * Figures and the commands that reproduce them are in {@code docs/performance.md}.
 *
 * <h2>Example</h2>
 * <pre>{@code
 * RationalMatrix p = RationalMatrix.of(new Rational[][] {
 *     {Rational.parse("0.9"), Rational.parse("0.1")},
 *     {Rational.parse("1/2"), Rational.parse("1/2")}});
 * SizeEstimate.requireWithin(SizeEstimate.digitsOfPower(p, 64), SizeEstimate.DEFAULT_MAX_DIGITS, "--max-digits");
 * RationalMatrix p64 = MatrixPowers.power(p, 64);               // exact, in lowest terms
 * Rational up = MatrixPowers.entryOfPower(p, 0, 0, 64);          // the same entry by path sums
 * String shown = Decimals.format(up, 12);                        // "0.833333333333"
 * List<WeightedPath> top = TopPaths.mostProbable(p, 0, 1, 5, 3); // three most probable 5-step paths 0 -> 1
 * }</pre>
 *
 * <p>This module depends on apfloat only; it never imports the {@code symbolic} or {@code cli} modules (a test
 * checks this).
 */
package org.qchain.exact;
