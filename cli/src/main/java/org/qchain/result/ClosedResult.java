package org.qchain.result;

import java.util.List;
import java.util.Optional;
import org.qchain.exact.Rational;
import org.qchain.exact.certified.CertifiedComplex;
import org.qchain.exact.certified.CertifiedReal;

/**
 * P^n (the whole matrix, one row or one entry) as formulas in a symbolic n and the free parameters, or their
 * generating functions or recurrences, with the validity range, the parameter conditions, the eigenvalues and the
 * long run ({@code closed}).
 *
 * <p>Symbolic quantities (the cells, the factors, the eigenvalues, the limits, the rate, the recurrences'
 * coefficients and initial values) are {@link Formula}s, which print themselves as plain text and LaTeX; values at
 * the parameter point are exact {@code Rational}s (the limits) or {@link CertifiedReal}s and
 * {@link CertifiedComplex}es (eigenvalues, roots, the rate), which the formatters round at {@link #digits()} with
 * every digit proven. Nothing here is rounded or laid out for one format.
 *
 * @param source      the model file name as the user gave it
 * @param form        which form is printed
 * @param nSymbol     the symbol of the step count, {@code n}
 * @param validFrom   the least n from which every printed formula holds
 * @param conditions  the conditions on the parameters under which the formulas hold, each {@code POLY != 0} with
 *                    POLY an irreducible polynomial, and whether it is shown to hold throughout the domains
 * @param states      all state names, in model order
 * @param parameters  the free parameters the formulas use
 * @param selection   which part of P^n is printed
 * @param rows        the row states of {@code cells}
 * @param cols        the column states of {@code cells}
 * @param cells       {@code cells.get(i).get(j)} for rows(i) to cols(j)
 * @param recurrences for form {@code recurrence}: the structured recurrence of each cell, same shape; else empty
 * @param eigenvalues the factors of the characteristic polynomial and their eigenvalues
 * @param longRun     period, limits and rate; empty for the series forms
 * @param roots       the named factors of degree 3 or more, with numeric roots when the point is known
 * @param point       the parameter values used for numeric values, if complete and not empty
 * @param digits      the significant digits the formatters print numeric values with
 * @param warnings    warnings
 * @param names       the symbols the formulas use for their own quantities (none is a parameter's name)
 * @param where       the names of repeated pieces (a quadratic factor's square root and eigenvalues), each defined
 *                    in terms of the parameters and the names before it; empty when nothing is named
 * @param namedCells  {@code cells} written with the names of {@code where}; empty when nothing is named
 * @param factored    whether coefficients and limits are printed with numerator and denominator factored over the
 *                    rationals ({@code closed --factor})
 * @param substituted the parameter values given with {@code --at} and substituted before the closed form was found
 *                    (the formulas are in the other parameters); empty when none
 * @param start       the starting probability of each named state when a start was given with {@code --start} or
 *                    a set of final states was asked for (one row, {@code rows} holding its text
 *                    {@code Healthy=3/5, Ill=2/5}, each cell the start's weighted sum of the rows of P^n); empty
 *                    otherwise
 * @param toStates    the final states of a set ({@code --to Up,Worn}: one column, {@code cols} holding its text
 *                    {@code {Up, Worn}}, each cell the sum of their entries) when {@code start} is given; empty
 *                    otherwise
 */
public record ClosedResult(String source, Form form, String nSymbol, int validFrom, List<Condition> conditions,
                           List<String> states, List<String> parameters, Selection selection,
                           List<String> rows, List<String> cols, List<List<Formula>> cells,
                           List<List<Recurrence>> recurrences, List<Eigen> eigenvalues, Optional<LongRun> longRun,
                           List<Roots> roots, Optional<Point> point, int digits, List<String> warnings,
                           Names names, List<Where> where, List<List<Formula>> namedCells, boolean factored,
                           java.util.Map<String, org.qchain.exact.Rational> substituted,
                           java.util.Map<String, org.qchain.exact.Rational> start, List<String> toStates)
    implements Result {

    /** Copies the lists. */
    public ClosedResult {
        conditions = List.copyOf(conditions);
        states = List.copyOf(states);
        parameters = List.copyOf(parameters);
        rows = List.copyOf(rows);
        cols = List.copyOf(cols);
        cells = cells.stream().map(List::copyOf).toList();
        recurrences = recurrences.stream().map(List::copyOf).toList();
        eigenvalues = List.copyOf(eigenvalues);
        roots = List.copyOf(roots);
        warnings = List.copyOf(warnings);
        where = List.copyOf(where);
        namedCells = namedCells.stream().map(List::copyOf).toList();
        substituted = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(substituted));
        start = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(start));
        toStates = List.copyOf(toStates);
    }

    /** As the canonical constructor without a start or a set of final states. */
    public ClosedResult(String source, Form form, String nSymbol, int validFrom, List<Condition> conditions,
                        List<String> states, List<String> parameters, Selection selection,
                        List<String> rows, List<String> cols, List<List<Formula>> cells,
                        List<List<Recurrence>> recurrences, List<Eigen> eigenvalues, Optional<LongRun> longRun,
                        List<Roots> roots, Optional<Point> point, int digits, List<String> warnings,
                        Names names, List<Where> where, List<List<Formula>> namedCells, boolean factored,
                        java.util.Map<String, org.qchain.exact.Rational> substituted) {
        this(source, form, nSymbol, validFrom, conditions, states, parameters, selection, rows, cols, cells,
            recurrences, eigenvalues, longRun, roots, point, digits, warnings, names, where, namedCells, factored,
            substituted, java.util.Map.of(), List.of());
    }

    /** The same result with the start and the set of final states it was asked for (see {@link #start()}). */
    public ClosedResult withStart(java.util.Map<String, org.qchain.exact.Rational> startWeights, List<String> to) {
        return new ClosedResult(source, form, nSymbol, validFrom, conditions, states, parameters, selection,
            rows, cols, cells, recurrences, eigenvalues, longRun, roots, point, digits, warnings, names, where,
            namedCells, factored, substituted, startWeights, to);
    }

    /** Whether the start is a distribution over more than one state. */
    public boolean startsFromDistribution() {
        return !start.isEmpty() && start.values().stream().noneMatch(org.qchain.exact.Rational::isOne);
    }

    /** As the canonical constructor with nothing substituted. */
    public ClosedResult(String source, Form form, String nSymbol, int validFrom, List<Condition> conditions,
                        List<String> states, List<String> parameters, Selection selection,
                        List<String> rows, List<String> cols, List<List<Formula>> cells,
                        List<List<Recurrence>> recurrences, List<Eigen> eigenvalues, Optional<LongRun> longRun,
                        List<Roots> roots, Optional<Point> point, int digits, List<String> warnings,
                        Names names, List<Where> where, List<List<Formula>> namedCells, boolean factored) {
        this(source, form, nSymbol, validFrom, conditions, states, parameters, selection, rows, cols, cells,
            recurrences, eigenvalues, longRun, roots, point, digits, warnings, names, where, namedCells, factored,
            java.util.Map.of());
    }

    /** The conditions not shown to hold for every value inside the parameters' domains, in order. */
    public List<Condition> notProved() {
        return Condition.notProved(conditions);
    }

    /** The substituted values as {@code p=1/10, r=1/4}; empty when none. */
    public String substitutedText() {
        StringBuilder sb = new StringBuilder();
        for (java.util.Map.Entry<String, org.qchain.exact.Rational> e : substituted.entrySet()) {
            sb.append(sb.length() == 0 ? "" : ", ").append(e.getKey()).append('=').append(e.getValue());
        }
        return sb.toString();
    }

    /** As the canonical constructor with nothing named. */
    public ClosedResult(String source, Form form, String nSymbol, int validFrom, List<Condition> conditions,
                        List<String> states, List<String> parameters, Selection selection,
                        List<String> rows, List<String> cols, List<List<Formula>> cells,
                        List<List<Recurrence>> recurrences, List<Eigen> eigenvalues, Optional<LongRun> longRun,
                        List<Roots> roots, Optional<Point> point, int digits, List<String> warnings, Names names) {
        this(source, form, nSymbol, validFrom, conditions, states, parameters, selection, rows, cols, cells,
            recurrences, eigenvalues, longRun, roots, point, digits, warnings, names, List.of(), List.of(), false);
    }

    /** The cells to print: written with the names of {@link #where()} when there are any. */
    public List<List<Formula>> shownCells() {
        return where.isEmpty() ? cells : namedCells;
    }

    /**
     * A name for a repeated piece of the formulas.
     *
     * @param name       the name in plain syntax (ASCII: {@code l1}, {@code s}), as JSON and the plain formulas
     *                   write it, and as the model file's expressions read it
     * @param symbol     the name as text and Markdown print it ({@code λ1} for an eigenvalue, else {@code name})
     * @param latexName  the name in LaTeX ({@code \lambda_{1}}, {@code s})
     * @param eigenvalue whether it stands for an eigenvalue
     * @param value      its value, in terms of the parameters and the names before it
     */
    public record Where(String name, String symbol, String latexName, boolean eigenvalue, Formula value) {
    }

    /**
     * The symbols of the formulas, chosen so that none is the name of a parameter.
     *
     * @param step     the step count ({@code n} unless a parameter has that name)
     * @param period   the index of the subsequences P^(dm + r) of a periodic chain ({@code m})
     * @param variable the variable of the characteristic polynomial ({@code x})
     * @param series   the variable of the generating functions ({@code z})
     * @param sequence the sequence name of recurrences ({@code u})
     */
    public record Names(String step, String period, String variable, String series, String sequence) {
        /** The usual symbols. */
        public static final Names DEFAULT = new Names("n", "m", "x", "z", "u");

        /** Whether every symbol is the usual one. */
        public boolean usual() {
            return equals(DEFAULT);
        }
    }

    /** As the canonical constructor with the usual symbols ({@link Names#DEFAULT}). */
    public ClosedResult(String source, Form form, String nSymbol, int validFrom, List<Condition> conditions,
                        List<String> states, List<String> parameters, Selection selection,
                        List<String> rows, List<String> cols, List<List<Formula>> cells,
                        List<List<Recurrence>> recurrences, List<Eigen> eigenvalues, Optional<LongRun> longRun,
                        List<Roots> roots, Optional<Point> point, int digits, List<String> warnings) {
        this(source, form, nSymbol, validFrom, conditions, states, parameters, selection, rows, cols, cells,
            recurrences, eigenvalues, longRun, roots, point, digits, warnings, Names.DEFAULT);
    }

    /** Whether a series form (generating function or recurrence) is printed. */
    public boolean isSeries() {
        return form != Form.MATRIX;
    }

    /** The forms of P^n. */
    public enum Form {
        /** The closed form in n. */
        MATRIX("matrix"),
        /** The generating function in z. */
        GF("gf"),
        /** The linear recurrence in n. */
        RECURRENCE("recurrence");

        private final String word;

        Form(String word) {
            this.word = word;
        }

        /** The word of {@code --form} and of the JSON field {@code form}. */
        public String word() {
            return word;
        }
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
     * @param coefficients c_1 .. c_d
     * @param validFrom    the first n for which it holds
     * @param initial      u(0) .. u(validFrom - 1)
     */
    public record Recurrence(List<Formula> coefficients, int validFrom, List<Formula> initial) {
        /** Copies the lists. */
        public Recurrence {
            coefficients = List.copyOf(coefficients);
            initial = List.copyOf(initial);
        }
    }

    /**
     * A factor of {@code det(xI - P)} and its eigenvalues.
     *
     * @param factor       the monic irreducible factor in x
     * @param multiplicity its multiplicity
     * @param jordanIndex  the size of the largest Jordan block of each eigenvalue of the factor (1: none)
     * @param kind         {@code rational}, {@code quadratic} or {@code roots}
     * @param values       the eigenvalues as formulas ({@code roots of f1} for a named factor)
     * @param atPoint      the eigenvalues at the point, every one of the factor; empty without a point
     * @param names        the names of {@code values} in {@link ClosedResult#where()} (ASCII, as {@code l1}); empty
     *                     when they are not named
     */
    public record Eigen(Formula factor, int multiplicity, int jordanIndex, String kind, List<Formula> values,
                        List<CertifiedComplex> atPoint, List<String> names) {
        /** Copies the lists. */
        public Eigen {
            values = List.copyOf(values);
            atPoint = List.copyOf(atPoint);
            names = List.copyOf(names);
        }

        /** Without values at a point or names. */
        public Eigen(Formula factor, int multiplicity, int jordanIndex, String kind, List<Formula> values) {
            this(factor, multiplicity, jordanIndex, kind, values, List.of(), List.of());
        }
    }

    /**
     * The long run, restricted to the printed cells.
     *
     * @param period     d; 1 when P^n converges
     * @param limits     d grids shaped like {@code cells}: the limit of P^(dm + r) for r = 0 .. d - 1
     * @param rate       the largest modulus of the eigenvalues that are neither roots of unity nor 0, as a formula:
     *                   with d = 1 the second-largest eigenvalue modulus; with d &gt; 1 the rate of each subsequence
     *                   P^(dm + r) (the second-largest modulus of P itself is then 1)
     * @param rateValue  its value at the point, when the point is known
     * @param conditions the conditions on the parameters under which this long run holds (no eigenvalue becomes a
     *                   root of unity), each with whether it is shown to hold throughout the parameters' domains
     * @param special    corners of the parameters' box where a condition (of the formulas or the long run) fails
     * @param exact      whether no other eigenvalue than roots of unity and 0 exists: P^n (or each subsequence) equals
     *                   its limit from n = {@code exactFrom} on
     * @param exactFrom  see {@code exact}
     * @param values     the limits at the point, exactly, shaped like {@code limits}; empty without a point
     */
    public record LongRun(int period, List<List<List<Formula>>> limits, Formula rate, Optional<CertifiedReal> rateValue,
                          List<Condition> conditions, List<Point> special, boolean exact,
                          int exactFrom, List<List<List<Rational>>> values) {
        /** Copies the lists. */
        public LongRun {
            limits = limits.stream().map(m -> m.stream().map(List::copyOf).toList()).toList();
            values = values.stream().map(m -> m.stream().map(List::copyOf).toList()).toList();
            conditions = List.copyOf(conditions);
            special = List.copyOf(special);
        }

        /** Those of {@link #conditions()} not shown to hold throughout the parameters' domains, in order. */
        public List<Condition> notProved() {
            return Condition.notProved(conditions);
        }

        /** Without conditions, special points or values (a rate of {@code 0} means exact from n = 0). */
        public LongRun(int period, List<List<List<Formula>>> limits, Formula rate, Optional<CertifiedReal> rateValue) {
            this(period, limits, rate, rateValue, List.of(), List.of(), rate.plain().equals("0"), 0,
                List.of());
        }

        /** Whether P^n is periodic for generic parameter values. */
        public boolean periodic() {
            return period > 1;
        }
    }

    /**
     * A named factor of degree 3 or more.
     *
     * @param name       its name in formulas
     * @param polynomial the factor in x
     * @param roots      its roots at the point, each once, empty if the point is not known
     */
    public record Roots(String name, Formula polynomial, List<CertifiedComplex> roots) {
        /** Copies the list. */
        public Roots {
            roots = List.copyOf(roots);
        }
    }
}
