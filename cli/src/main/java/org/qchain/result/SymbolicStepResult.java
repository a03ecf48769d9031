package org.qchain.result;

import java.util.List;
import java.util.Optional;
import org.qchain.exact.Rational;

/**
 * P^n (or a row, or an entry) as exact rational functions of the model's parameters, with the exact values at the
 * parameter point when every parameter the formulas use has one.
 *
 * @param source     the model file name as given
 * @param kind       the chain kind word
 * @param n          the number of steps
 * @param parameters the parameters the formulas are in, in declaration order
 * @param states     all state names
 * @param factored   whether the formulas are factored (else expanded canonical forms)
 * @param from       the row, for a row or a single entry
 * @param to         the column, for a single entry
 * @param rows       the row state names (all states, or the one {@code from})
 * @param columns    the column state names (all states, or the one {@code to})
 * @param formulas   {@code formulas.get(i).get(j)}: entry (rows[i], columns[j])
 * @param point      the parameter values of {@code values}, if every parameter the formulas use has one
 * @param values     the exact values at {@code point}, same shape as {@code formulas}
 * @param warnings   warnings for the user
 */
public record SymbolicStepResult(String source, String kind, long n, List<String> parameters, List<String> states,
                                 boolean factored, Optional<String> from, Optional<String> to, List<String> rows,
                                 List<String> columns, List<List<Formula>> formulas, Optional<Point> point,
                                 Optional<List<List<Rational>>> values, List<String> warnings) implements Result {
    /** Copies the lists. */
    public SymbolicStepResult {
        parameters = List.copyOf(parameters);
        states = List.copyOf(states);
        rows = List.copyOf(rows);
        columns = List.copyOf(columns);
        formulas = formulas.stream().map(List::copyOf).toList();
        values = values.map(v -> v.stream().map(List::copyOf).toList());
        warnings = List.copyOf(warnings);
    }

    /** The shape: the whole matrix. */
    public boolean isMatrix() {
        return from.isEmpty();
    }

    /** The shape: one entry. */
    public boolean isSingle() {
        return to.isPresent();
    }
}
