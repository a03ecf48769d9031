package org.qchain.symbolic.closed;

/**
 * One closed form in the time t (an entry of P(t) = exp(Qt), or a linear combination of entries such as a point
 * availability), or the same evaluated at one time (a formula in the parameters only), with its long-run limit.
 * Every formula is in the plain syntax ({@code exp(...)}, {@code sqrt(...)}, {@code rootsumexp(j, t, f1)} for the sum
 * of {@code r^j*exp(r*t)} over the roots r of the named factor f1) and in LaTeX.
 *
 * @param plain       the formula with every eigenvalue written out
 * @param latex       the same in LaTeX
 * @param namedPlain  the formula with each quadratic pair of eigenvalues and its square root by name
 *                    ({@link TransientForm#definitions()}); the same as {@code plain} when nothing is named
 * @param namedLatex  the same in LaTeX
 * @param limitPlain  the limit as t grows (the eigenvalue-0 term), a formula in the parameters
 * @param limitLatex  the same in LaTeX
 */
public record TimeFormula(String plain, String latex, String namedPlain, String namedLatex, String limitPlain,
                          String limitLatex) {
}
