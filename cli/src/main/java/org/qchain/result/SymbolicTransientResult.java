package org.qchain.result;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.qchain.exact.Rational;

/**
 * {@code P(t) = exp(Qt)} of a continuous chain with symbolic parameters ({@code step -t} on a model with a parameter
 * without a value, or with {@code --symbolic}): the closed form in t and the parameters, the same at each asked time
 * t (formulas in the parameters), and, when every parameter has a value, the certified decimals there.
 *
 * @param source      the model file name as the user gave it
 * @param states      state names, the order of rows and columns
 * @param from        the starting state if only its row is given
 * @param timeSymbol  the symbol of the time ({@code t} unless a parameter has that name)
 * @param parameters  the free parameters the formulas use
 * @param conditions  the conditions under which the formulas hold, each {@code "POLY != 0"}
 * @param notProved   those not shown to hold throughout the parameters' domains
 * @param rows        the row states shown
 * @param cells       the closed form of each shown entry in t
 * @param where       the names of repeated pieces (a quadratic factor's square root and eigenvalues)
 * @param namedCells  {@code cells} with the names of {@code where}; empty when nothing is named
 * @param times       the closed form at each asked time
 * @param values      the certified decimals at the point, when every parameter has a value
 * @param point       that point and where its values come from
 * @param substituted the values given with {@code --at} and substituted before solving; empty when none
 * @param factored    whether coefficients are factored over the rationals
 * @param digits      significant digits of the decimals
 * @param warnings    warnings for the user
 */
public record SymbolicTransientResult(String source, List<String> states, Optional<String> from, String timeSymbol,
                                      List<String> parameters, List<String> conditions, List<String> notProved,
                                      List<String> rows, List<List<Formula>> cells, List<ClosedResult.Where> where,
                                      List<List<Formula>> namedCells, List<AtTime> times,
                                      Optional<TransientResult> values, Optional<Point> point,
                                      Map<String, Rational> substituted, boolean factored, int digits,
                                      List<String> warnings) implements Result {
    /** Copies the lists. */
    public SymbolicTransientResult {
        states = List.copyOf(states);
        parameters = List.copyOf(parameters);
        conditions = List.copyOf(conditions);
        notProved = List.copyOf(notProved);
        rows = List.copyOf(rows);
        cells = cells.stream().map(List::copyOf).toList();
        where = List.copyOf(where);
        namedCells = namedCells.stream().map(List::copyOf).toList();
        times = List.copyOf(times);
        substituted = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(substituted));
        warnings = List.copyOf(warnings);
    }

    /** The cells to print: with the names of {@link #where()} when there are any. */
    public List<List<Formula>> shownCells() {
        return where.isEmpty() ? cells : namedCells;
    }

    /**
     * The closed form at one time.
     *
     * @param t     the time
     * @param cells each shown entry at t, a formula in the parameters (with the names of {@code where} when there
     *              are any)
     * @param plainCells the same with every name written out
     */
    public record AtTime(Rational t, List<List<Formula>> cells, List<List<Formula>> plainCells) {
        /** Copies the lists. */
        public AtTime {
            cells = cells.stream().map(List::copyOf).toList();
            plainCells = plainCells.stream().map(List::copyOf).toList();
        }
    }
}
