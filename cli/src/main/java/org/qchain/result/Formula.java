package org.qchain.result;

/**
 * An exact formula (or an exact number) that prints itself: plain text in the model file's expression syntax, which
 * our parsers read back, and LaTeX math mode. Implementations are immutable.
 */
public interface Formula {

    /** Plain syntax: {@code p/q}, {@code k}, or a formula such as {@code 1 - p^2} ({@code ^} for powers). */
    String plain();

    /** LaTeX math-mode text, without surrounding {@code $}. */
    String latex();

    /**
     * A MathML {@code <math>} element (presentation markup), printed from {@link #plain()} by {@link FormulaTree};
     * text that is not in the plain syntax is shown as {@code <mtext>}.
     */
    default String mathml() {
        try {
            return FormulaTree.parse(plain()).mathml();
        } catch (IllegalArgumentException e) {
            return "<math xmlns=\"http://www.w3.org/1998/Math/MathML\"><mtext>"
                + plain().replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;") + "</mtext></math>";
        }
    }

    /**
     * A formula given by its two printed forms.
     *
     * @param plain the plain form
     * @param latex the LaTeX form
     * @return the formula
     */
    static Formula of(String plain, String latex) {
        return new Printed(plain, latex);
    }

    /**
     * A formula whose two forms are already printed (by the engine that derived it).
     *
     * @param plain the plain form
     * @param latex the LaTeX form
     */
    record Printed(String plain, String latex) implements Formula {
    }
}
