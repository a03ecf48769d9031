package org.qchain.symbolic.closed;

/**
 * The generating function {@code sum_n P^n_ij z^n = [(I - zP)^-1]_ij} of one entry, reduced to lowest terms, with
 * the denominator's constant term positive and coprime integer-coefficient polynomials when the parameters are
 * cleared.
 *
 * @param variable    the variable, {@code z}
 * @param numerator   the numerator, a polynomial in z and the parameters, plain syntax
 * @param denominator the denominator, plain syntax
 * @param plain       {@code (numerator)/(denominator)} in plain syntax
 * @param latex       the same in LaTeX
 */
public record GeneratingFunction(String variable, String numerator, String denominator, String plain, String latex) {
}
