/**
 * Closed forms of P^n in a symbolic n: the n-step transition probabilities of a discrete-time chain as formulas in
 * n and the chain's free parameters, valid for every n from a stated {@code validFrom} on, under stated parameter
 * conditions.
 *
 * <h2>Method</h2>
 * <ol>
 *   <li>{@link org.qchain.symbolic.closed.SeriesForm} (every chain): the powers P^0 .. P^s, the characteristic
 *       polynomial {@code chi(x) = det(xI - P)} from the traces of the powers (Newton's identities: exact, with no
 *       division by a polynomial), and the adjugate {@code adj(xI - P) = sum_k B_k x^(s-1-k)} with
 *       {@code B_k = sum_{m<=k} c_m P^(k-m)} (Faddeev-LeVerrier). Then {@code (I - zP)^-1 = adj(I - zP)/det(I - zP)}
 *       with {@code adj(I - zP) = sum_k B_k z^k} and {@code det(I - zP) = sum_k c_k z^k}: each entry's generating
 *       function, reduced by trial division with the known factors of the denominator (no gcd over
 *       Q(parameters), whose coefficients swell), and the linear recurrence its reduced denominator gives, with
 *       the initial values it needs.</li>
 *   <li>JAS factors {@code chi} over Q(parameters) into monic irreducible factors f of multiplicity m (JAS
 *       reports the rational constant as a factor of its own; the product is checked against chi).</li>
 *   <li>A factor of multiplicity 1: for each root r, the projector is {@code adj(rI - P)/chi'(r)}; reduced modulo
 *       f this is {@code sum_t C_t r^t} with matrices C_t over Q(parameters), so the factor contributes
 *       {@code sum_t C_t p_(n+t)} with {@code p_k} the k-th power sum of its roots. A factor of multiplicity
 *       m &gt; 1: the Chinese remainder theorem gives the projector {@code E = e(P)}; for {@code f = x - lambda}
 *       the terms {@code binomial(n, k) lambda^(n-k) (P - lambda I)^k E} up to the Jordan index; for a factor of
 *       degree at least 2, Newton's iteration {@code s <- s - f(s)/f'(s) mod f^m} from {@code s = x} gives the
 *       semisimple part {@code S = s(P)} and the nilpotent part {@code N = P - S} on the generalised eigenspace
 *       (Jordan-Chevalley), so {@code P^n E = sum_k binomial(n, k) S^(n-k) N^k E} with k below the Jordan index, and
 *       S splits by roots in the power-sum form above with {@code E_r = E q_r(S)/f'(r)},
 *       {@code q_r(y) = f(y)/(y - r)}: the factor contributes {@code sum_k binomial(n, k) sum_t C_(k,t) p_(n-k+t)}
 *       (without a Jordan block only k = 0).</li>
 *   <li>Printing: a linear factor gives {@code lambda^n}; a quadratic one, roots {@code u/2 +- (s/2) sqrt(D)} with
 *       square factors pulled out of D, gives {@code X*(l1^n + l2^n) + Y*(l1^n - l2^n)/sqrt(D)}, which is
 *       unchanged when sqrt(D) changes sign and so real for real parameters even where D &lt; 0, and with a Jordan
 *       block also {@code binomial(n, k)*(X_k*(l1^(n - k) + l2^(n - k)) + Y_k*(l1^(n - k) - l2^(n - k))/sqrt(D))}; a
 *       factor of degree 3 or more is named ({@code f1}, ...) and appears as {@code rootsum(n + t, f1)}, with a
 *       Jordan block also as {@code binomial(n, k)*rootsum(n - k + t, f1)}, its roots given numerically by
 *       {@link org.qchain.symbolic.closed.ClosedForm#rootPolynomials}. A term with the factor
 *       {@code binomial(n, k)} is 0 for n &lt; k.</li>
 *   <li>Eigenvalue 0 contributes only for n below its Jordan index: that index is {@code validFrom}. The
 *       conditions are the irreducible factors of every denominator in the formulas, and the radicand under a
 *       square root in a denominator, each as {@code "POLY != 0"}.</li>
 *   <li>Long run: eigenvalues that are roots of unity (parameter-free factors dividing {@code x^k - 1}) give the
 *       period d and the limits of the d subsequences; the others give the convergence rate, the largest modulus
 *       among them, as a formula and numerically at a point.</li>
 * </ol>
 * A chain with no free parameter takes {@link org.qchain.symbolic.closed.RationalRoute} for the steps that cost the
 * most: powers, characteristic polynomial and adjugate of the integer matrix {@code A = dP} over the common
 * denominator d, factorisation over Q, and the parts of each simple factor from integer combinations of the adjugate
 * coefficients with {@code chi'^-1} modulo the factor (fraction-free elimination), reduced once per entry. It hands
 * back the same values as constants of Q(parameters), so every later step and every printed form is shared with the
 * general route; the tests check both routes against each other and against exact powers. Its estimate of the
 * printed digits of the parts, made after factoring, is refused past the digit limit; a caller's size guard refuses
 * first on {@link org.qchain.symbolic.closed.ClosedForms#digitBound}, an upper bound of that figure from P's entries
 * alone, before any work.
 *
 * <p>Every result is checked in the tests against exact P^n (the symbolic module's powers with parameters free, the
 * exact module's products with them substituted), and {@code evaluate} uses exact arithmetic throughout: square-root
 * pairs in {@code x + y sqrt(D)} form over Q(parameters) or Q, root sums by Newton's identities.
 *
 * <h2>Example</h2>
 * <pre>{@code
 * Model m = ModelParser.parse("pump.chain", "chain discrete\nparam a\nparam b\nstates Up Down\nUp Down a\nDown Up b\n");
 * ClosedForm cf = ClosedForms.of(m, Map.of());
 * cf.formula(0, 0);     // b/(a + b) + a/(a + b)*(1 - a - b)^n
 * cf.conditions();      // [a + b != 0]
 * cf.longRun().rate();  // abs(1 - a - b)
 * }</pre>
 *
 * <p>The formulas' own symbols (step count, polynomial and series variables, sequence and factor names) come from
 * {@link org.qchain.symbolic.closed.Symbols}: never a parameter's name, so a printed formula reads back to the right
 * value whatever the parameters are called. {@link org.qchain.symbolic.closed.ClosedForm#longRun()} states its
 * conditions (no eigenvalue generically inside the unit circle becomes a root of unity: cyclotomic resultants), and
 * {@link org.qchain.symbolic.closed.ClosedForm#specialCorners} the corners of the domains where a condition fails.
 *
 * <h2>Continuous chains</h2>
 * {@link org.qchain.symbolic.closed.ClosedForms#ofGenerator} applies the same decomposition to a generator Q and
 * gives {@link org.qchain.symbolic.closed.TransientForm}: P(t) = exp(Qt) as {@code sum_k sum_j Z_kj t^j e^(lambda_k t)}
 * (where the discrete form has {@code binomial(n, j) lambda^(n-j)} it has {@code t^j/j! e^(lambda t)}), the limit
 * from eigenvalue 0, the largest real part among the other eigenvalues as the rate, the conditions (denominators and
 * discriminants: eigenvalue collisions), and the Laplace transform {@code (sI - Q)^-1} of each entry; its symbols
 * ({@link org.qchain.symbolic.closed.TimeSymbols}: {@code t}, {@code s}, ...) avoid the parameters' names. Entries
 * and linear combinations of entries (a point availability) come as
 * {@link org.qchain.symbolic.closed.TimeFormula}s, in t or at a given t. {@code SpectralParts} holds what both
 * forms read alike from a decomposition.
 *
 * <p>JAS types stay inside this package; the public API speaks {@code String} formulas, {@code Rational},
 * {@code RationalMatrix} and the symbolic module's {@code RatFunMatrix}.
 */
package org.qchain.symbolic.closed;
