/**
 * Chains with symbolic parameters: transition probabilities as exact rational functions over Q in the model's
 * parameters, their n-step powers, derivatives, factored forms and text forms.
 *
 * <h2>Types</h2>
 * <ul>
 *   <li>{@link org.qchain.symbolic.ParamRing}: the ring Q[p1, ..., pk] of one model, made once from its parameter
 *       names ({@link org.qchain.symbolic.ParamRing#of(org.qchain.exact.model.Model)}); maps the model's expression
 *       trees exactly ({@link org.qchain.symbolic.ParamRing#fromExpr}). {@code withVariable("x")} extends it, e.g. for
 *       characteristic polynomials in x or generating functions in z over the parameters.</li>
 *   <li>{@link org.qchain.symbolic.Poly}: an immutable polynomial; arithmetic, degrees, exact division, gcd,
 *       factorisation over Q ({@link org.qchain.symbolic.Poly#factor()}, constant kept), derivative, evaluation and
 *       partial substitution at exact rationals.</li>
 *   <li>{@link org.qchain.symbolic.RatFun}: an immutable rational function in canonical form: numerator and
 *       denominator coprime; the denominator primitive with integer coefficients and a positive first term in
 *       printing order (lowest total degree first), all rational content in the numerator. Equal functions have equal
 *       parts, so {@code equals} is mathematical equality.</li>
 *   <li>{@link org.qchain.symbolic.RatFunMatrix}: an immutable matrix of them: from a model, products, powers (with a
 *       size estimate and limit checked first: {@link org.qchain.symbolic.SymbolicLimits}), single rows of powers,
 *       evaluation to the exact module's {@code RationalMatrix}, substitution, derivatives.</li>
 *   <li>{@link org.qchain.symbolic.Formulas}: plain one-line text (read back by the model parser), factored text,
 *       LaTeX and markdown; our own printers, deterministic and without Symja.</li>
 *   <li>{@code check}: row sums and [0, 1] ranges over the parameter domains; {@code sensitivity}: derivatives,
 *       elasticities and sweeps; {@code cas}: a text-only Symja session used as a reference and a baseline.</li>
 * </ul>
 * No JAS or Symja type appears in this API.
 *
 * <pre>{@code
 * Model m = ModelParser.parse("pump.chain", text);
 * RatFunMatrix p = RatFunMatrix.fromModel(m);
 * RatFunMatrix p10 = p.power(10);
 * String f = Formulas.plain(p10.get(0, 2));          // e.g. "10*p^2 - ..." in the model's syntax
 * RationalMatrix at = p10.evaluate(Map.of("p", Rational.of(1, 20), "r", Rational.of(1, 4)));
 * }</pre>
 *
 * <h2>Representation: measured</h2>
 * Arithmetic is done in JAS ({@code GenPolynomial<BigRational>}, shipped with Symja); Symja's evaluator is not used
 * for arithmetic at all. A power {@code P^n} is computed over one common denominator: {@code P = A/d}, {@code d} the
 * least common multiple of the entry denominators and {@code A} a polynomial matrix; {@code A^n} by {@code n - 1}
 * products with the sparse one-step matrix (for entries of degree g in v variables this costs about {@code n^(v+1)}
 * term operations against {@code n^(2v)} for repeated squaring, whose last products multiply dense high-degree
 * matrices; squaring is used when the entries are constants); then each entry of {@code A^n / d^n} is reduced by
 * dividing out the irreducible factors of {@code d} while they divide (a common factor of numerator and
 * {@code d^n} can only be one of them), so no general gcd runs. Exact division is our own loop on one sorted map:
 * JAS's {@code quotientRemainder} copies the remainder at every step, which made the reduction ten times slower.
 * Single rational-function operations ({@link org.qchain.symbolic.RatFun#add}, {@code multiply}) reduce with
 * JAS's modular gcd over Z ({@code GreatestCommonDivisorModular<ModLong>}), about 20 times faster than its default
 * gcd over Q (library notes).
 * <p>JMH, this machine (2 cores, shared), same run, full expanded and reduced {@code P^n}
 * ({@code bench/SymbolicPowerBench}, 2026-12-01, machine shared with other builds; command and error bars in
 * {@code docs/performance.md}):
 * <table>
 *   <caption>average time per operation</caption>
 *   <tr><th>case</th><th>this package</th><th>JAS {@code Quotient} matrix</th><th>Symja {@code MatrixPower}</th></tr>
 *   <tr><td>3 states, 2 parameters, polynomial entries, P^20</td><td>10 ms</td><td>9 ms</td><td>2.6 s</td></tr>
 *   <tr><td>6 states, 3 parameters, P^10</td><td>28 ms</td><td>-</td><td>6.2 s</td></tr>
 *   <tr><td>3 states, parameter denominators, P^8</td><td>34-108 ms</td><td>6.3 s</td><td>over 120 s (notes)</td></tr>
 * </table>
 * JAS {@code Quotient} entries normalise with a gcd on every operation; with polynomial entries that is cheap,
 * with parameter denominators it dominates. Symja's evaluator normalises every sum (library notes: a 6x6 product of
 * bivariate rational functions took about 15 s against 0.2 s in JAS).
 *
 * <h2>Symja</h2>
 * Only through {@link org.qchain.symbolic.cas.SymjaSession}, in tests and benchmarks. Our own LaTeX printer
 * replaced {@code TeXForm} (measured: 0.05 ms against 14 ms for a 211-term entry, and no second of Symja
 * start-up). Measured pitfall of Symja 3.0.0: {@code Together(1/(2+x) - (1+x)/(2+x)^2)} returns
 * {@code (2-x)/(4*(2+x))}, not {@code 1/(2+x)^2} (also {@code Factor}, {@code Simplify}); with the denominator
 * expanded it is right. Do not use Symja to check rational-function identities; the derivative test compares
 * Symja's {@code D} by exact evaluation at points instead.
 *
 * <h2>Domains, limits, threads</h2>
 * A {@code param} without a declared domain has the default domain (0, 1) in a discrete chain and (0, infinity) in a
 * continuous one ({@code Domain.defaultFor}). Powers are refused before any work when the estimate
 * ({@link org.qchain.symbolic.RatFunMatrix#estimatePower}: terms from degrees, digits from coefficient heights)
 * exceeds {@link org.qchain.symbolic.SymbolicLimits} (terms or digits);
 * powers written inside model expressions are refused past degree {@link org.qchain.symbolic.ParamRing#MAX_EXPR_DEGREE}.
 * Values are immutable and thread-safe; JAS's thread pool is switched off (it kept the JVM alive for a minute) and its
 * log4j output is routed to the simple logger before the first JAS class initialises.
 */
package org.qchain.symbolic;
