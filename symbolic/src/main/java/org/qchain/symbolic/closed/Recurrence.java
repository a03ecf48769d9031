package org.qchain.symbolic.closed;

import java.util.List;

/**
 * The shortest linear recurrence with constant coefficients (constant in n; rational functions of the parameters)
 * that one entry {@code u(n) = P^n_ij} satisfies, read from the reduced generating function's denominator:
 * {@code u(n) = r_1 u(n-1) + ... + r_d u(n-d)} for {@code n >= validFrom}, with {@code u(0) ... u(validFrom - 1)}
 * given.
 *
 * @param order        d, the number of previous terms used (0 when the entry is eventually 0)
 * @param coefficients r_1 .. r_d, plain syntax
 * @param validFrom    the first n for which the recurrence holds
 * @param initial      u(0) .. u(validFrom - 1), plain syntax
 * @param plain        the recurrence and its initial values in plain syntax
 * @param latex        the same in LaTeX
 * @param coefficientsLatex r_1 .. r_d in LaTeX
 * @param initialLatex      u(0) .. u(validFrom - 1) in LaTeX
 */
public record Recurrence(int order, List<String> coefficients, int validFrom, List<String> initial, String plain,
                         String latex, List<String> coefficientsLatex, List<String> initialLatex) {
    /** Copies the lists. */
    public Recurrence {
        coefficients = List.copyOf(coefficients);
        initial = List.copyOf(initial);
        coefficientsLatex = List.copyOf(coefficientsLatex);
        initialLatex = List.copyOf(initialLatex);
    }
}
