package org.qchain.exact.model;

import org.qchain.exact.Rational;

/**
 * The one way an expanded polynomial's terms are written, shared by the model module's row-sum messages and the
 * symbolic module's printer, so that both print the same text: {@code -} before a negative first term,
 * {@code " + "} or {@code " - "} between terms, a coefficient of magnitude 1 left out before a monomial.
 */
public final class TermText {
    private TermText() {
    }

    /**
     * Appends one term.
     *
     * @param sb    where to append
     * @param first whether this is the polynomial's first term
     * @param c     the term's coefficient, not zero
     * @param mono  the monomial's text, empty for a constant
     * @param coef  the text of {@code |c|}
     * @param times what stands between a coefficient and its monomial ({@code *}, or a space in LaTeX)
     */
    public static void append(StringBuilder sb, boolean first, Rational c, String mono, String coef, String times) {
        boolean neg = c.signum() < 0;
        if (first) {
            if (neg) {
                sb.append('-');
            }
        } else {
            sb.append(neg ? " - " : " + ");
        }
        if (mono.isEmpty()) {
            sb.append(coef);
        } else if (c.abs().isOne()) {
            sb.append(mono);
        } else {
            sb.append(coef).append(times).append(mono);
        }
    }
}
