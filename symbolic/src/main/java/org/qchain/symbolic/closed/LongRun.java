package org.qchain.symbolic.closed;

import java.util.List;

/**
 * The behaviour of P^n as n grows, read from the eigenvalues of modulus 1 (roots of unity, which for a stochastic
 * matrix come from the periods of its closed classes) and the largest modulus among the others.
 *
 * @param period       d, the least common multiple of the orders of the eigenvalues of modulus 1; 1 when the
 *                     limit of P^n exists
 * @param limits       d matrices in plain syntax: the limit of P^(dm + r) as m grows, for r = 0 .. d - 1; with d = 1
 *                     the single limit of P^n
 * @param rate         the second-largest eigenvalue modulus as a formula (plain syntax; {@code abs} is the modulus
 *                     of a complex number), {@code 0} if the other eigenvalues are all 0
 * @param rateLatex    the same in LaTeX
 */
public record LongRun(int period, List<List<List<String>>> limits, String rate, String rateLatex) {
    /** Copies the lists. */
    public LongRun {
        limits = limits.stream().map(m -> m.stream().map(List::copyOf).toList()).toList();
    }

    /** Whether P^n has a limit (period 1). */
    public boolean converges() {
        return period == 1;
    }
}
