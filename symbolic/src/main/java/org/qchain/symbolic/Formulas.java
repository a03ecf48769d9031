package org.qchain.symbolic;

import java.util.List;

/**
 * Text forms of rational functions and matrices of them, computed without Symja (our own printers: deterministic,
 * no start-up cost; see the package documentation for the measurement against Symja's {@code TeXForm}).
 *
 * <ul>
 *   <li><b>plain</b>: the one-line syntax of model files ({@code + - * / ^}, parentheses, {@code p/q}), which the
 *       model parser reads back to an equal function; {@code ^} for powers.</li>
 *   <li><b>LaTeX</b>: {@code \frac{..}{..}}, {@code a^{2}}, {@code \left( .. \right)}, for reports.</li>
 *   <li><b>markdown</b>: a table of a matrix with formulas in code spans.</li>
 * </ul>
 * The expanded forms print terms by ascending total degree; the factored forms print a rational constant and
 * irreducible factors over Q ({@link RatFun#factor()}).
 */
public final class Formulas {
    private Formulas() {
    }

    /** The expanded canonical form in plain syntax, e.g. {@code (1 - a)/(1 + a*b)}. */
    public static String plain(RatFun f) {
        return PlainText.ratFun(f);
    }

    /** A polynomial in plain syntax, e.g. {@code 1 - 2*a + a^2}. */
    public static String plain(Poly p) {
        return PlainText.poly(p);
    }

    /** A factored form in plain syntax, e.g. {@code 3*(1 - a)^2/(4*(1 + b))}. */
    public static String plain(RatFun.Factored f) {
        return PlainText.factored(f);
    }

    /** The expanded canonical form in LaTeX, e.g. {@code \frac{1 - a}{1 + a b}}. */
    public static String latex(RatFun f) {
        return PlainText.latexRatFun(f);
    }

    /** A polynomial in LaTeX. */
    public static String latex(Poly p) {
        return PlainText.latexPoly(p);
    }

    /** A factored form in LaTeX. */
    public static String latex(RatFun.Factored f) {
        return PlainText.latexFactored(f);
    }

    /** A parameter name as the LaTeX printers write it ({@code p1} as {@code p_{1}}, {@code mu} as {@code \mathit{mu}}). */
    public static String latexName(String name) {
        return PlainText.latexName(name);
    }

    /**
     * The formula of an entry in the requested style.
     *
     * @param f        the function
     * @param factored whether to factor it
     * @param latex    LaTeX instead of plain
     * @return the text
     */
    public static String of(RatFun f, boolean factored, boolean latex) {
        if (factored) {
            RatFun.Factored x = f.factor();
            return latex ? latex(x) : plain(x);
        }
        return latex ? latex(f) : plain(f);
    }

    /**
     * A LaTeX {@code pmatrix} of the entries.
     *
     * @param m        the matrix
     * @param factored whether to factor the entries
     * @return the LaTeX text, one row per line
     */
    public static String latexMatrix(RatFunMatrix m, boolean factored) {
        StringBuilder sb = new StringBuilder("\\begin{pmatrix}\n");
        for (int i = 0; i < m.size(); i++) {
            for (int j = 0; j < m.size(); j++) {
                sb.append(j == 0 ? "" : " & ").append(of(m.get(i, j), factored, true));
            }
            sb.append(i + 1 < m.size() ? " \\\\\n" : "\n");
        }
        return sb.append("\\end{pmatrix}").toString();
    }

    /**
     * A markdown table: a header row with the target states, one row per source state, formulas in code spans.
     *
     * @param states   the state names (rows and columns)
     * @param m        the matrix
     * @param factored whether to factor the entries
     * @return the table, lines ending in {@code \n}
     * @throws IllegalArgumentException if the number of names differs from the size
     */
    public static String markdownTable(List<String> states, RatFunMatrix m, boolean factored) {
        if (states.size() != m.size()) {
            throw new IllegalArgumentException(states.size() + " names for a " + m.size() + "-state matrix");
        }
        StringBuilder sb = new StringBuilder("| from \\ to |");
        for (String s : states) {
            sb.append(' ').append(escape(s)).append(" |");
        }
        sb.append("\n|---|");
        for (int j = 0; j < states.size(); j++) {
            sb.append("---|");
        }
        sb.append('\n');
        for (int i = 0; i < m.size(); i++) {
            sb.append("| ").append(escape(states.get(i))).append(" |");
            for (int j = 0; j < m.size(); j++) {
                sb.append(" `").append(of(m.get(i, j), factored, false)).append("` |");
            }
            sb.append('\n');
        }
        return sb.toString();
    }

    private static String escape(String s) {
        return s.replace("|", "\\|");
    }
}
