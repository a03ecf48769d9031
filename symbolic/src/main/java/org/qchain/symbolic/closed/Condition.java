package org.qchain.symbolic.closed;

import org.qchain.exact.Rational;

/**
 * A condition on the parameters under which a closed form (or its long run) holds: {@code left != right}, with
 * {@code left} a formula in the parameters (an irreducible polynomial over Q, or an eigenvalue) and {@code right} a
 * number ({@code 0}; {@code 1} or {@code -1} for an eigenvalue that must not become a root of unity).
 *
 * @param left            the left side, plain syntax
 * @param leftLatex       the same in LaTeX
 * @param right           the value the left side must differ from
 * @param holdsThroughout whether it is shown to hold for every parameter value inside the domains given to
 *                        {@link ClosedForm#conditions(java.util.Map)} or {@link ClosedForm#longRunConditions(java.util.Map)}
 *                        (false: not shown, which is not the same as shown to fail)
 */
public record Condition(String left, String leftLatex, Rational right, boolean holdsThroughout) {
    /**
     * The condition as one line of plain syntax, {@code 1 + 4*a != 0}.
     *
     * @return the text
     */
    public String text() {
        return left + " != " + right;
    }

    /** {@link #text()}. */
    @Override
    public String toString() {
        return text();
    }
}
