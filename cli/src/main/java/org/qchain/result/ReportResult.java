package org.qchain.result;

import java.util.List;
import java.util.Optional;
import org.qchain.exact.Rational;

/**
 * A report: the results of a list of queries run through the analysis on one model, in the order of its sections,
 * ready for a report layout (HTML, Markdown, LaTeX). It holds the queries' own typed results, exact values and
 * formulas; plot data are exact points (or the certified decimals' values) that the layouts scale and draw.
 *
 * @param source     the model file name as the user gave it
 * @param kind       the chain kind word ({@code discrete} or {@code continuous})
 * @param states     the state names, in model order
 * @param parameters the declared parameters
 * @param point      the parameter values used for numbers, when every used parameter has one
 * @param sections   the sections, in order
 * @param digits     significant digits of the decimals
 * @param warnings   warnings for the user (also printed on stderr by the command line)
 */
public record ReportResult(String source, String kind, List<String> states, List<Parameter> parameters,
                           Optional<Point> point, List<Section> sections, int digits, List<String> warnings) {
    /** Copies the lists. */
    public ReportResult {
        states = List.copyOf(states);
        parameters = List.copyOf(parameters);
        sections = List.copyOf(sections);
        warnings = List.copyOf(warnings);
    }

    /** Whether the chain is a continuous-time one (a generator rather than a one-step matrix). */
    public boolean continuous() {
        return kind.equals("continuous");
    }

    /**
     * A declared parameter.
     *
     * @param name    its name
     * @param domain  its domain as the model writes it, such as {@code (0, 1)}
     * @param nominal its nominal value, if the model gives one
     * @param value   the value used (nominal, or given), if any
     * @param used    whether a transition uses it
     */
    public record Parameter(String name, String domain, Optional<Rational> nominal, Optional<Rational> value,
                            boolean used) {
    }

    /** One section of a report. */
    public sealed interface Section permits ModelSection, DiagramSection, StepsSection, ClosedSection,
        LongRunSection, SensitivitySection, PlotsSection {
        /** Lines saying why a part of the section is not there (a refused size, a missing analysis). */
        List<String> notes();
    }

    /**
     * The model: its one-step matrix (or generator) as formulas and, at the point, as exact numbers; what was
     * checked; the conditions on the parameters under which it is a valid chain.
     *
     * @param generator  whether the matrix is a generator (rates) rather than one-step probabilities
     * @param matrix     the entries as formulas (the model's expressions)
     * @param values     the entries at the point, if every used parameter has a value
     * @param validation what was checked, one sentence each
     * @param conditions the conditions on the parameters under which it is a valid chain (empty: none needed)
     * @param notes      see {@link Section#notes()}
     */
    public record ModelSection(boolean generator, List<List<Formula>> matrix, Optional<List<List<Rational>>> values,
                               List<String> validation, List<String> conditions, List<String> notes)
        implements Section {
        /** Copies the lists. */
        public ModelSection {
            matrix = matrix.stream().map(List::copyOf).toList();
            values = values.map(v -> v.stream().map(List::copyOf).toList());
            validation = List.copyOf(validation);
            conditions = List.copyOf(conditions);
            notes = List.copyOf(notes);
        }
    }

    /**
     * The state diagram: one edge per non-zero transition (self-loops included; for a generator, the off-diagonal
     * rates).
     *
     * @param states the states, in model order
     * @param edges  the edges
     * @param notes  see {@link Section#notes()}
     */
    public record DiagramSection(List<String> states, List<Edge> edges, List<String> notes) implements Section {
        /** Copies the lists. */
        public DiagramSection {
            states = List.copyOf(states);
            edges = List.copyOf(edges);
            notes = List.copyOf(notes);
        }
    }

    /**
     * One edge of the state diagram.
     *
     * @param from  index of the source state
     * @param to    index of the target state
     * @param label the probability or rate as a formula
     */
    public record Edge(int from, int to, Formula label) {
    }

    /**
     * n-step results: one step query's result per n (discrete), or the transition probabilities at the times
     * (continuous).
     *
     * @param results the results in the order asked for ({@link StepResult}, {@link SymbolicStepResult} or
     *                {@link TransientResult})
     * @param notes   see {@link Section#notes()}
     */
    public record StepsSection(List<Result> results, List<String> notes) implements Section {
        /** Copies the lists. */
        public StepsSection {
            results = List.copyOf(results);
            notes = List.copyOf(notes);
        }
    }

    /**
     * The closed form in n, where one was derived.
     *
     * @param closed the closed-form result
     * @param notes  see {@link Section#notes()}; says why there is none when {@code closed} is empty
     */
    public record ClosedSection(Optional<ClosedResult> closed, List<String> notes) implements Section {
        /** Copies the list. */
        public ClosedSection {
            notes = List.copyOf(notes);
        }
    }

    /**
     * Long-run figures: classes, the long run and absorption (discrete), availability (continuous), each when it
     * applies.
     *
     * @param classes      the communicating classes
     * @param longRun      stationary laws and the limit of P^n
     * @param absorb       absorption figures, when the chain has absorbing states
     * @param availability figures of merit of a repairable continuous chain
     * @param notes        see {@link Section#notes()}
     */
    public record LongRunSection(Optional<ClassesResult> classes, Optional<LongRunResult> longRun,
                                 Optional<AbsorbResult> absorb, Optional<AvailabilityResult> availability,
                                 List<String> notes) implements Section {
        /** Copies the list. */
        public LongRunSection {
            notes = List.copyOf(notes);
        }
    }

    /**
     * The sensitivity of chosen figures to every parameter at the point, and a sweep of one parameter.
     *
     * @param lines one line per figure and parameter
     * @param sweep the sweep, if one was run
     * @param notes see {@link Section#notes()}
     */
    public record SensitivitySection(List<SensLine> lines, Optional<SweepTable> sweep, List<String> notes)
        implements Section {
        /** Copies the lists. */
        public SensitivitySection {
            lines = List.copyOf(lines);
            notes = List.copyOf(notes);
        }
    }

    /**
     * The sensitivity of one figure to one parameter at the point.
     *
     * @param figure     the figure, such as {@code P^10(Up -> Down)} or {@code availability}
     * @param parameter  the parameter
     * @param value      the figure's exact value at the point
     * @param derivative the exact derivative at the point
     * @param elasticity (p / figure) times the derivative; empty where the figure is 0
     */
    public record SensLine(String figure, String parameter, Rational value, Rational derivative,
                           Optional<Rational> elasticity) {
    }

    /**
     * A figure over values of one parameter, the others at the point.
     *
     * @param figure    the figure
     * @param parameter the swept parameter
     * @param range     the range as written, such as {@code p in [0, 1/10] with 11 points}
     * @param rows      one row per value
     */
    public record SweepTable(String figure, String parameter, String range, List<SweepRow> rows) {
        /** Copies the list. */
        public SweepTable {
            rows = List.copyOf(rows);
        }
    }

    /**
     * One row of a sweep.
     *
     * @param value      the parameter's value
     * @param figure     the figure there
     * @param derivative the derivative there, if computed
     */
    public record SweepRow(Rational value, Rational figure, Optional<Rational> derivative) {
    }

    /**
     * Plots.
     *
     * @param plots the plots
     * @param notes see {@link Section#notes()}
     */
    public record PlotsSection(List<Plot> plots, List<String> notes) implements Section {
        /** Copies the lists. */
        public PlotsSection {
            plots = List.copyOf(plots);
            notes = List.copyOf(notes);
        }
    }

    /**
     * One plot: curves over a common x axis.
     *
     * @param id     a short identifier, unique in the report (for file anchors)
     * @param title  the title
     * @param xLabel the x axis label
     * @param yLabel the y axis label
     * @param series the curves
     */
    public record Plot(String id, String title, String xLabel, String yLabel, List<Series> series) {
        /** Copies the list. */
        public Plot {
            series = List.copyOf(series);
        }
    }

    /**
     * One curve, with its limit drawn as a dashed line if it has one.
     *
     * @param label  the legend text
     * @param x      the x values
     * @param y      the y values, same length
     * @param limit  the limit as x grows, if known
     */
    public record Series(String label, List<Rational> x, List<Rational> y, Optional<Rational> limit) {
        /** Copies the lists; checks the lengths. */
        public Series {
            x = List.copyOf(x);
            y = List.copyOf(y);
            if (x.size() != y.size()) {
                throw new IllegalArgumentException("x and y differ in length");
            }
        }
    }
}
