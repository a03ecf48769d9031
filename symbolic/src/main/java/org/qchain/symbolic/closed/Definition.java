package org.qchain.symbolic.closed;

/**
 * A name that the closed forms' entries use for a repeated piece, with its value: a quadratic factor's square root
 * {@code s = sqrt(D)} and its eigenvalues {@code l1 = u/2 + (w/2)*s}, {@code l2 = u/2 - (w/2)*s}.
 *
 * @param name  the name, in plain syntax (ASCII, never a parameter's name)
 * @param plain its value in plain syntax, in terms of the names defined before it
 * @param latex the same in LaTeX (names as {@code s}, {@code \lambda_{1}})
 * @param eigenvalue whether the name stands for an eigenvalue (printed λ1, λ2, ... where the output allows)
 */
public record Definition(String name, String plain, String latex, boolean eigenvalue) {
}
