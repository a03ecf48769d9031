package org.qchain.cli;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.qchain.cli.result.Entry;
import org.qchain.exact.Rational;

/**
 * What the symbolic path of {@code qchain step} computed, ready for {@link SymbolicFormats}: formulas already in
 * plain and LaTeX text, values at the point already exact and decimal.
 *
 * @param source     the model file name as given
 * @param kind       the chain kind word
 * @param n          the number of steps
 * @param digits     significant digits of the decimals
 * @param parameters the parameters the formulas are in, in declaration order
 * @param states     all state names
 * @param factored   whether the formulas are factored (else expanded canonical forms)
 * @param from       the row, for a row or a single entry
 * @param to         the column, for a single entry
 * @param columns    the column state names of each row (all states, or the one {@code to})
 * @param rows       the row state names (all states, or the one {@code from})
 * @param formulas   {@code formulas.get(i).get(j)}: entry (rows[i], columns[j])
 * @param point      the parameter values used for {@link #values}, if every parameter the formulas use has one
 * @param values     the exact values at {@code point}, same shape as {@code formulas}
 * @param warnings   warnings for the user (also printed on stderr)
 */
record SymbolicResult(String source, String kind, long n, int digits, List<String> parameters, List<String> states,
                      boolean factored, Optional<String> from, Optional<String> to, List<String> rows,
                      List<String> columns, List<List<Formula>> formulas, Optional<Map<String, Rational>> point,
                      Optional<List<List<Entry>>> values, List<String> warnings) {

    /**
     * One formula in the two text forms.
     *
     * @param plain the plain one-line syntax of model files ({@code ^} for powers)
     * @param latex the LaTeX form
     */
    record Formula(String plain, String latex) {
    }

    /** The shape: the whole matrix, one row, or one entry. */
    boolean isMatrix() {
        return from.isEmpty();
    }

    /** One entry. */
    boolean isSingle() {
        return to.isPresent();
    }

    /** {@code p=1/20, r=1/4}. */
    static String pointText(Map<String, Rational> point) {
        StringBuilder sb = new StringBuilder();
        for (Map.Entry<String, Rational> e : point.entrySet()) {
            sb.append(sb.length() == 0 ? "" : ", ").append(e.getKey()).append('=').append(e.getValue());
        }
        return sb.toString();
    }
}
