package org.qchain.symbolic.closed;

import java.util.List;

/**
 * The behaviour of P^n as n grows, read from the eigenvalues of modulus 1 (roots of unity, which for a stochastic
 * matrix come from the periods of its closed classes) and the largest modulus among the others.
 *
 * @param period     d, the least common multiple of the orders of the eigenvalues of modulus 1; 1 when the limit
 *                   of P^n exists
 * @param limits     d matrices in plain syntax: the limit of P^(dm + r) as m grows, for r = 0 .. d - 1; with d = 1
 *                   the single limit of P^n
 * @param rate       the largest modulus among the eigenvalues that are neither roots of unity nor 0, as a formula
 *                   (plain syntax; {@code abs} is the modulus of a complex number): P^n (with d = 1) or each
 *                   subsequence P^(dm + r) (with d &gt; 1) approaches its limit like rate^n; {@code 0} if there is no
 *                   such eigenvalue (then {@code exact} is true). With d &gt; 1 this is not the second-largest
 *                   eigenvalue modulus of P, which is 1.
 * @param rateLatex  the same in LaTeX
 * @param conditions the conditions on the parameters under which this behaviour holds (no eigenvalue that is
 *                   generically inside the unit circle becomes a root of unity), plain syntax; empty when it holds
 *                   for every parameter value
 * @param exact      whether no eigenvalue other than the roots of unity and 0 exists: then P^n (or each
 *                   subsequence) equals its limit from n = {@code exactFrom} on
 * @param exactFrom  the first n from which P^n is exactly periodic (or constant) when {@code exact}; the closed
 *                   form's valid-from otherwise
 * @param limitsLatex the limits in LaTeX, shaped like {@code limits}
 */
public record LongRun(int period, List<List<List<String>>> limits, String rate, String rateLatex,
                      List<String> conditions, boolean exact, int exactFrom, List<List<List<String>>> limitsLatex) {
    /** Copies the lists. */
    public LongRun {
        limits = limits.stream().map(m -> m.stream().map(List::copyOf).toList()).toList();
        limitsLatex = limitsLatex.stream().map(m -> m.stream().map(List::copyOf).toList()).toList();
        conditions = List.copyOf(conditions);
    }

    /** Whether P^n has a limit (period 1) for generic parameter values. */
    public boolean converges() {
        return period == 1;
    }

    /** Whether the chain is periodic for generic parameter values (period above 1). */
    public boolean periodic() {
        return period > 1;
    }
}
