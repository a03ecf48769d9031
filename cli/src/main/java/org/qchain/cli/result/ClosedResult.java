package org.qchain.cli.result;

import java.util.List;
import java.util.Optional;

/**
 * What {@code qchain closed} computed, ready for a formatter: P^n (the whole matrix, one row or one entry) as
 * formulas in a symbolic n and the free parameters, or their generating functions or recurrences, with the validity
 * range, the parameter conditions, the eigenvalues and the long run.
 *
 * @param source      the model file name as the user gave it
 * @param form        {@code matrix} (closed form in n), {@code gf} (generating function in z) or
 *                    {@code recurrence}
 * @param nSymbol     the symbol of the step count, {@code n}
 * @param validFrom   the least n from which every printed formula holds
 * @param conditions  parameter conditions, each {@code "POLY != 0"}
 * @param notProved   the conditions not shown to hold for every value inside the parameters' domains
 * @param states      all state names, in model order
 * @param parameters  the free parameters the formulas use
 * @param selection   which part of P^n is printed
 * @param rows        the row states of {@code cells} (all states, or the one starting state)
 * @param cols        the column states of {@code cells}
 * @param cells       formulas in plain syntax, {@code cells.get(i).get(j)} for rows(i) to cols(j)
 * @param latex       the same formulas in LaTeX
 * @param recurrences for form {@code recurrence}: the structured recurrence of each cell, same shape; else empty
 * @param eigenvalues the factors of the characteristic polynomial and their eigenvalues
 * @param longRun     period, limits and rate; empty for the series forms ({@code gf}, {@code recurrence})
 * @param roots       the named factors of degree 3 or more, with numeric roots when the point is known
 * @param point       the parameter values used for numeric values (from --at and nominal values), if complete
 * @param digits      significant digits of numeric values
 * @param warnings    warnings (also printed on stderr)
 */
public record ClosedResult(String source, String form, String nSymbol, int validFrom, List<String> conditions,
                           List<String> notProved, List<String> states, List<String> parameters, Selection selection, List<String> rows,
                           List<String> cols, List<List<String>> cells, List<List<String>> latex,
                           List<List<Recurrence>> recurrences, List<Eigen> eigenvalues, Optional<LongRun> longRun,
                           List<Roots> roots, Optional<String> point, int digits, List<String> warnings) {

    /** Copies the lists. */
    public ClosedResult {
        conditions = List.copyOf(conditions);
        notProved = List.copyOf(notProved);
        states = List.copyOf(states);
        parameters = List.copyOf(parameters);
        rows = List.copyOf(rows);
        cols = List.copyOf(cols);
        cells = cells.stream().map(List::copyOf).toList();
        latex = latex.stream().map(List::copyOf).toList();
        recurrences = recurrences.stream().map(List::copyOf).toList();
        eigenvalues = List.copyOf(eigenvalues);
        roots = List.copyOf(roots);
        warnings = List.copyOf(warnings);
    }

    /** Which part of P^n is printed. */
    public enum Selection {
        /** The whole matrix. */
        MATRIX,
        /** One row: the start state's distribution after n steps. */
        ROW,
        /** One entry. */
        ENTRY
    }

    /**
     * One recurrence {@code u(n) = sum_k c_k u(n - k)} for {@code n >= validFrom}.
     *
     * @param coefficients c_1 .. c_d, plain syntax
     * @param validFrom    the first n for which it holds
     * @param initial      u(0) .. u(validFrom - 1)
     */
    public record Recurrence(List<String> coefficients, int validFrom, List<String> initial) {
        /** Copies the lists. */
        public Recurrence {
            coefficients = List.copyOf(coefficients);
            initial = List.copyOf(initial);
        }
    }

    /**
     * A factor of {@code det(xI - P)} and its eigenvalues.
     *
     * @param factor       the monic irreducible factor, plain syntax
     * @param multiplicity its multiplicity
     * @param jordanIndex  the size of the largest Jordan block of each eigenvalue of the factor (1: none)
     * @param kind         {@code rational}, {@code quadratic} or {@code roots}
     * @param values       the eigenvalues as formulas
     */
    public record Eigen(String factor, int multiplicity, int jordanIndex, String kind, List<String> values) {
        /** Copies the list. */
        public Eigen {
            values = List.copyOf(values);
        }
    }

    /**
     * The long run, restricted to the printed cells.
     *
     * @param period    d; 1 when P^n converges
     * @param limits    d grids shaped like {@code cells}: the limit of P^(dm + r) for r = 0 .. d - 1
     * @param rate      the second-largest eigenvalue modulus as a formula
     * @param rateValue its value at the point, to the requested digits, when the point is known
     */
    public record LongRun(int period, List<List<List<String>>> limits, String rate, Optional<String> rateValue) {
        /** Copies the lists. */
        public LongRun {
            limits = limits.stream().map(m -> m.stream().map(List::copyOf).toList()).toList();
        }
    }

    /**
     * A named factor of degree 3 or more.
     *
     * @param name       its name in formulas
     * @param polynomial the factor, plain syntax
     * @param roots      numeric roots at the point, empty if the point is not known
     */
    public record Roots(String name, String polynomial, List<String> roots) {
        /** Copies the list. */
        public Roots {
            roots = List.copyOf(roots);
        }
    }
}
