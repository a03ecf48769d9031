package org.qchain.format;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.qchain.exact.Rational;
import org.qchain.exact.certified.CertifiedDecimal;
import org.qchain.result.AbsorbResult;
import org.qchain.result.AvailabilityResult;
import org.qchain.result.ClassesResult;
import org.qchain.result.ClosedResult;
import org.qchain.result.ExactValue;
import org.qchain.result.Formula;
import org.qchain.result.FormulaTree;
import org.qchain.result.LongRunResult;
import org.qchain.result.ReportResult;
import org.qchain.result.Result;
import org.qchain.result.StepResult;
import org.qchain.result.SymbolicStepResult;
import org.qchain.result.TransientResult;

/**
 * The one report layout: the sections, their wording and their tables, in order, written through a few primitives
 * (heading, paragraph, table, display formula, code block, diagram, plot) that each format implements.
 */
abstract class ReportWriter implements ReportLayout {
    /** Significant digits of the decimals. */
    final int digits;
    /** The document being written. */
    final StringBuilder out = new StringBuilder();
    /** Files beside the document (Markdown plots). */
    final Map<String, String> attachments = new LinkedHashMap<>();
    /** The document's base name. */
    String baseName = "report";

    ReportWriter(int digits) {
        this.digits = digits;
    }

    // --- pieces of text ---------------------------------------------------------------------------------------------

    /** A piece of a paragraph or a table cell. */
    sealed interface Span permits Txt, Math, Code {
    }

    /** Plain text. */
    record Txt(String text) implements Span {
    }

    /** A formula. */
    record Math(Formula formula) implements Span {
    }

    /** Literal text (a name, a model expression). */
    record Code(String text) implements Span {
    }

    static List<Span> t(String s) {
        return List.of(new Txt(s));
    }

    static List<Span> spans(Object... parts) {
        List<Span> out = new ArrayList<>();
        for (Object p : parts) {
            if (p instanceof Span s) {
                out.add(s);
            } else if (p instanceof Formula f) {
                out.add(new Math(f));
            } else {
                out.add(new Txt(String.valueOf(p)));
            }
        }
        return out;
    }

    /** A formula from plain text that may fail to read: the text as code then. */
    static Span formula(String plain) {
        try {
            FormulaTree tree = FormulaTree.parse(plain);
            return new Math(Formula.of(plain, tree.latex()));
        } catch (IllegalArgumentException e) {
            return new Code(plain);
        }
    }

    /** {@code P^n(i -> j)} as a formula that prints itself in all three forms. */
    record Entry(String power, String from, String to) implements Formula {
        @Override
        public String plain() {
            return "P^" + power + "(" + from + " -> " + to + ")";
        }

        @Override
        public String latex() {
            return "P^{" + (power.equals("∞") ? "\\infty" : power) + "}(\\text{" + Text.latex(from) + "} \\to \\text{" + Text.latex(to) + "})";
        }

        @Override
        public String mathml() {
            return "<math xmlns=\"http://www.w3.org/1998/Math/MathML\"><msup><mi>P</mi><mi>" + power
                + "</mi></msup><mo>(</mo><mtext>" + SvgPlot.xml(from) + "</mtext><mo>&#x2192;</mo><mtext>"
                + SvgPlot.xml(to) + "</mtext><mo>)</mo></math>";
        }
    }

    /** {@code P(i -> j)(t)} (or its Laplace transform {@code L(i -> j)(s)}) as a formula that prints itself. */
    record TimeEntry(String name, String time, String from, String to) implements Formula {
        @Override
        public String plain() {
            return name + "(" + from + " -> " + to + ")(" + time + ")";
        }

        @Override
        public String latex() {
            String n = name.equals("L") ? "\\hat{P}" : name;
            return n + "_{\\text{" + Text.latex(from) + "} \\to \\text{" + Text.latex(to) + "}}("
                + (time.equals("∞") ? "\\infty" : time) + ")";
        }

        @Override
        public String mathml() {
            String n = name.equals("L") ? "<mover><mi>P</mi><mo>^</mo></mover>" : "<mi>" + name + "</mi>";
            return "<math xmlns=\"http://www.w3.org/1998/Math/MathML\"><msub>" + n + "<mrow><mtext>" + SvgPlot.xml(from)
                + "</mtext><mo>&#x2192;</mo><mtext>" + SvgPlot.xml(to) + "</mtext></mrow></msub><mo>(</mo><mi>"
                + SvgPlot.xml(time) + "</mi><mo>)</mo></math>";
        }
    }

    /** A formula equal to a left side: {@code lhs = rhs}. */
    record Equation(Formula lhs, Formula rhs) implements Formula {
        @Override
        public String plain() {
            return lhs.plain() + " = " + rhs.plain();
        }

        @Override
        public String latex() {
            return lhs.latex() + " = " + rhs.latex();
        }

        @Override
        public String mathml() {
            String l = lhs.mathml();
            String r = rhs.mathml();
            return l.substring(0, l.length() - "</math>".length()) + "<mo>=</mo>"
                + r.substring(r.indexOf('>') + 1);
        }
    }

    /** An exact number as a formula. */
    static Math exact(Rational r) {
        return new Math(new ExactValue(r));
    }

    /** A decimal. */
    Txt decimal(Rational r) {
        return new Txt(Text.decimal(r, digits));
    }

    /** An exact value with its decimal beside it when it is not an integer. */
    List<Span> exactAndDecimal(Rational r) {
        if (r.isInteger()) {
            return List.of(exact(r));
        }
        return List.of(exact(r), new Txt(" ≈ " + Text.decimal(r, digits)));
    }

    /** A formula with its decimal beside it when it is an exact number that is not an integer. */
    List<Span> formulaCell(Formula f) {
        if (f instanceof ExactValue v) {
            return exactAndDecimal(v.value());
        }
        return List.of(new Math(f));
    }

    // --- primitives ---------------------------------------------------------------------------------------------

    abstract void begin(String title);

    abstract void end();

    abstract void heading(int level, String text, String id);

    abstract void paragraph(List<Span> spans);

    abstract void bullets(List<List<Span>> items);

    abstract void table(String caption, List<String> header, List<List<List<Span>>> rows);

    abstract void display(Formula f);

    abstract void code(String language, String text);

    /** The drawn state diagram (HTML draws it; the others give the DOT text only). */
    abstract void diagram(String title, ReportResult.DiagramSection d);

    abstract void plot(ReportResult.Plot plot);

    // --- the layout ---------------------------------------------------------------------------------------------

    @Override
    public final Files render(ReportResult r, String base) {
        out.setLength(0);
        attachments.clear();
        this.baseName = base;
        begin("Report: " + r.source());
        paragraph(t("Model " + r.source() + ": a " + r.kind() + "-time Markov chain with " + r.states().size()
            + " states. Exact values are fractions; decimals are correctly rounded to " + digits
            + " significant digits."));
        paragraph(t(Caution.TEXT));
        for (ReportResult.Section s : r.sections()) {
            if (s instanceof ReportResult.ModelSection m) {
                model(r, m);
            } else if (s instanceof ReportResult.DiagramSection d) {
                heading(2, "State diagram", "diagram");
                diagram("State diagram of " + r.source(), d);
                paragraph(t("Graphviz DOT (render with dot -Tsvg):"));
                code("dot", StateDiagram.dot(r.source(), d));
            } else if (s instanceof ReportResult.StepsSection st) {
                heading(2, r.continuous() ? "Transition probabilities P(t)" : "n-step transition probabilities",
                    "steps");
                for (Result x : st.results()) {
                    stepResult(x);
                }
            } else if (s instanceof ReportResult.ClosedSection c) {
                heading(2, r.continuous() ? "Closed form in t" : "Closed form in n", "closed");
                c.closed().ifPresent(this::closed);
            } else if (s instanceof ReportResult.LongRunSection l) {
                heading(2, r.continuous() ? "Long run and availability" : "Long run", "longrun");
                l.classes().ifPresent(this::classes);
                l.longRun().ifPresent(this::longRun);
                l.absorb().ifPresent(this::absorb);
                l.availability().ifPresent(this::availability);
            } else if (s instanceof ReportResult.SensitivitySection se) {
                heading(2, "Sensitivity", "sensitivity");
                sensitivity(r, se);
            } else if (s instanceof ReportResult.PlotsSection p) {
                heading(2, "Plots", "plots");
                for (ReportResult.Plot plot : p.plots()) {
                    plot(plot);
                }
            }
            if (!s.notes().isEmpty()) {
                for (String note : s.notes()) {
                    paragraph(t(note));
                }
            }
        }
        if (!r.warnings().isEmpty()) {
            heading(2, "Warnings", "warnings");
            bullets(r.warnings().stream().map(ReportWriter::t).toList());
        }
        end();
        return new Files(out.toString(), attachments);
    }

    private void model(ReportResult r, ReportResult.ModelSection m) {
        heading(2, "The model", "model");
        paragraph(t("States (" + r.states().size() + "): " + String.join(", ", r.states()) + "."));
        if (!r.parameters().isEmpty()) {
            List<List<List<Span>>> rows = new ArrayList<>();
            for (ReportResult.Parameter p : r.parameters()) {
                rows.add(List.of(List.of(new Code(p.name())), t(p.domain()),
                    p.nominal().map(this::exactAndDecimal).orElse(t("none")),
                    p.value().map(this::exactAndDecimal).orElse(t("symbolic")),
                    t(p.used() ? "yes" : "no")));
            }
            table("Parameters", List.of("parameter", "domain", "nominal value", "value used", "used"), rows);
        } else {
            paragraph(t("The model has no parameters."));
        }
        String what = m.generator() ? "Generator Q (rates; rows: from, columns: to)"
            : "One-step matrix P (rows: from, columns: to)";
        table(what, header(r.states()), matrixRows(r.states(), m.matrix().stream()
            .map(row -> row.stream().map(f -> (List<Span>) List.<Span>of(new Math(f))).toList()).toList()));
        boolean symbolic = m.matrix().stream().flatMap(List::stream).anyMatch(f -> !(f instanceof ExactValue));
        if (m.values().isPresent() && symbolic) {
            table((m.generator() ? "Generator Q" : "One-step matrix P") + " at "
                + r.point().map(p -> p.text()).orElse("the point"), header(r.states()),
                matrixRows(r.states(), m.values().get().stream()
                    .map(row -> row.stream().map(this::exactAndDecimal).toList()).toList()));
        }
        heading(3, "Validation", "validation");
        bullets(m.validation().stream().map(ReportWriter::t).toList());
        if (!m.conditions().isEmpty()) {
            paragraph(t("It is a valid chain under these conditions on the parameters:"));
            bullets(m.conditions().stream().map(ReportWriter::t).toList());
        } else if (!r.parameters().isEmpty()) {
            paragraph(t("No further condition on the parameters is needed for a valid chain."));
        }
    }

    static List<String> header(List<String> states) {
        List<String> h = new ArrayList<>();
        h.add("from \\ to");
        h.addAll(states);
        return h;
    }

    static List<List<List<Span>>> matrixRows(List<String> rowNames, List<List<List<Span>>> cells) {
        List<List<List<Span>>> rows = new ArrayList<>();
        for (int i = 0; i < cells.size(); i++) {
            List<List<Span>> row = new ArrayList<>();
            row.add(List.of(new Txt(rowNames.get(i))));
            row.addAll(cells.get(i));
            rows.add(row);
        }
        return rows;
    }

    private void stepResult(Result x) {
        if (x instanceof StepResult.Matrix m) {
            heading(3, "P^" + m.header().n() + " (" + Text.steps(m.header().n()) + ")", "p" + m.header().n());
            table("P^" + m.header().n() + ", exact and decimal", header(m.states()), matrixRows(m.states(),
                m.entries().stream().map(row -> row.stream().map(this::exactAndDecimal).toList()).toList()));
        } else if (x instanceof StepResult.Row row) {
            long n = row.header().n();
            heading(3, "P^" + n + " from " + row.from() + " (" + Text.steps(n) + ")", "p" + n);
            List<List<List<Span>>> rows = new ArrayList<>();
            for (int j = 0; j < row.states().size(); j++) {
                rows.add(List.of(t(row.states().get(j)), List.of(exact(row.entries().get(j))),
                    List.of(decimal(row.entries().get(j)))));
            }
            table("P^" + n + "(" + row.from() + " -> j)", List.of("j", "exact", "decimal"), rows);
        } else if (x instanceof SymbolicStepResult s) {
            heading(3, "P^" + s.n() + " (" + Text.steps(s.n()) + ")", "p" + s.n());
            List<List<List<Span>>> cells = new ArrayList<>();
            for (int i = 0; i < s.rows().size(); i++) {
                List<List<Span>> row = new ArrayList<>();
                for (int j = 0; j < s.columns().size(); j++) {
                    List<Span> cell = new ArrayList<>();
                    cell.add(new Math(s.formulas().get(i).get(j)));
                    if (s.values().isPresent()) {
                        cell.add(new Txt(" = " + Text.decimal(s.values().get().get(i).get(j), digits)));
                    }
                    row.add(cell);
                }
                cells.add(row);
            }
            List<String> head = new ArrayList<>();
            head.add("from \\ to");
            head.addAll(s.columns());
            table("P^" + s.n() + " in " + String.join(", ", s.parameters())
                + s.point().map(p -> " (decimals at " + p.text() + ")").orElse(""), head, matrixRows(s.rows(), cells));
        } else if (x instanceof TransientResult tr) {
            for (TransientResult.AtTime at : tr.times()) {
                heading(3, "P(t) at t = " + at.t(), "t" + at.t().toString().replace('/', '-'));
                List<String> rowNames = tr.from().map(List::of).orElse(tr.states());
                List<List<List<Span>>> cells = new ArrayList<>();
                for (List<CertifiedDecimal> row : at.rows()) {
                    cells.add(row.stream().map(d -> t(d.text())).toList());
                }
                table("P(" + at.t() + "), certified decimals (every digit proven; widest enclosure "
                    + org.qchain.result.CertifiedStepResult.widthText(at.bound()) + ")", header(tr.states()),
                    matrixRows(rowNames, cells));
            }
        }
    }

    private void closed(ClosedResult c) {
        if (c.continuous()) {
            continuousClosed(c);
            return;
        }
        paragraph(t("Valid for n ≥ " + c.validFrom() + (c.parameters().isEmpty() ? "" : "; parameters (symbolic): "
            + String.join(", ", c.parameters())) + "."));
        if (!c.conditions().isEmpty()) {
            paragraph(t("Where:"));
            bullets(c.conditions().stream().map(cond -> List.<Span>of(new Math(cond))).toList());
        }
        if (!c.notProved().isEmpty()) {
            paragraph(t("Not shown to hold throughout the parameters' domains:"));
            bullets(c.notProved().stream().map(cond -> List.<Span>of(new Math(cond))).toList());
        }
        String n = c.names().step();
        for (int i = 0; i < c.rows().size(); i++) {
            for (int j = 0; j < c.cols().size(); j++) {
                display(new Equation(new Entry(n, c.rows().get(i), c.cols().get(j)), c.cells().get(i).get(j)));
            }
        }
        eigenvalueList(c, "Eigenvalues, by irreducible factor of det(xI − P):");
        c.longRun().ifPresent(l -> {
            if (l.periodic()) {
                paragraph(t("Period " + l.period() + ": P^n does not converge; each subsequence P^(" + l.period()
                    + "m + r) does."));
            }
            for (int r = 0; r < l.limits().size(); r++) {
                paragraph(t(l.periodic() ? "Limit of P^(" + l.period() + "m + " + r + "):" : "Limit as n grows:"));
                limits(c, l, r, (from, to) -> new Entry("∞", from, to));
            }
            rate(c, l, "Convergence rate (second-largest eigenvalue modulus): ");
        });
    }

    /** The limits of the r-th subsequence as a list, each entry named by {@code lhs}. */
    private void limits(ClosedResult c, ClosedResult.LongRun l, int r,
                        java.util.function.BiFunction<String, String, Formula> lhs) {
        List<List<Span>> items = new ArrayList<>();
        for (int i = 0; i < c.rows().size(); i++) {
            for (int j = 0; j < c.cols().size(); j++) {
                List<Span> item = new ArrayList<>();
                item.add(new Math(lhs.apply(c.rows().get(i), c.cols().get(j))));
                item.add(new Txt(" = "));
                item.add(formula(l.limits().get(r).get(i).get(j).plain()));
                if (!l.values().isEmpty()) {
                    item.add(new Txt(" ≈ " + Text.decimal(l.values().get(r).get(i).get(j), digits)));
                }
                items.add(item);
            }
        }
        bullets(items);
    }

    /** The rate paragraph: the label, the formula and its value at the point. */
    private void rate(ClosedResult c, ClosedResult.LongRun l, String label) {
        List<Span> rate = new ArrayList<>(t(label));
        rate.add(formula(l.rate().plain()));
        l.rateValue().ifPresent(v -> rate.add(new Txt(" = " + Closed.real(c, v))));
        paragraph(rate);
    }

    /** A continuous chain's P(t) in t: conditions, entries, Laplace transforms, eigenvalues of Q, limit and rate. */
    private void continuousClosed(ClosedResult c) {
        String t = c.timeSymbol();
        paragraph(t("P(" + t + ") = exp(Q" + t + ") in closed form, valid for " + t + " ≥ 0" + (c.parameters().isEmpty()
            ? "" : "; parameters (symbolic): " + String.join(", ", c.parameters())) + "."));
        if (!c.conditions().isEmpty()) {
            paragraph(t("Where:"));
            bullets(c.conditions().stream().map(cond -> List.<Span>of(new Math(cond))).toList());
        }
        if (!c.notProved().isEmpty()) {
            paragraph(t("Not shown to hold throughout the parameters' domains:"));
            bullets(c.notProved().stream().map(cond -> List.<Span>of(new Math(cond))).toList());
        }
        for (int i = 0; i < c.rows().size(); i++) {
            for (int j = 0; j < c.cols().size(); j++) {
                display(new Equation(new TimeEntry("P", t, c.rows().get(i), c.cols().get(j)), c.cells().get(i).get(j)));
            }
        }
        paragraph(t("Laplace transforms, the entries of (" + c.transformSymbol() + "I − Q)^−1:"));
        for (int i = 0; i < c.rows().size(); i++) {
            for (int j = 0; j < c.cols().size(); j++) {
                display(new Equation(new TimeEntry("L", c.transformSymbol(), c.rows().get(i), c.cols().get(j)),
                    c.transforms().get(i).get(j)));
            }
        }
        eigenvalueList(c, "Eigenvalues, by irreducible factor of det(xI − Q):");
        c.longRun().ifPresent(l -> {
            paragraph(t("Limit as " + t + " grows (the eigenvalue-0 term):"));
            limits(c, l, 0, (from, to) -> new TimeEntry("P", "∞", from, to));
            rate(c, l, "Rate (largest real part of the eigenvalues other than 0): ");
        });
    }

    /** The factors of the characteristic polynomial and their eigenvalues, as a list under a heading. */
    private void eigenvalueList(ClosedResult c, String heading) {
        if (c.eigenvalues().isEmpty()) {
        return;
        }
        paragraph(t(heading));
        List<List<Span>> items = new ArrayList<>();
        for (ClosedResult.Eigen e : c.eigenvalues()) {
            List<Span> item = new ArrayList<>();
            item.add(new Math(e.factor()));
            item.add(new Txt(e.multiplicity() > 1 ? " (multiplicity " + e.multiplicity() + "): " : ": "));
            for (int k = 0; k < e.values().size(); k++) {
                item.add(k > 0 ? new Txt(", ") : new Txt(""));
                item.add(formula(e.values().get(k).plain()));
            }
            String decimals = Closed.eigenDecimals(c, e);
            if (!decimals.isEmpty()) {
                item.add(new Txt(" ≈ " + decimals));
            }
            items.add(item);
        }
        bullets(items);
    }

    private void classes(ClassesResult c) {
        List<List<List<Span>>> rows = new ArrayList<>();
        for (ClassesResult.ChainClass k : c.classes()) {
            // a continuous chain has no period
            rows.add(c.continuous() ? List.of(t(String.join(", ", k.states())), t(k.closed() ? "closed" : "transient"))
                : List.of(t(String.join(", ", k.states())), t(k.closed() ? "closed" : "transient"),
                t(k.period() == 0 ? "none (no return)" : Integer.toString(k.period()))));
        }
        table("Communicating classes", c.continuous() ? List.of("states", "kind") : List.of("states", "kind", "period"),
            rows);
        paragraph(t("Absorbing states: " + (c.absorbing().isEmpty() ? "none" : String.join(", ", c.absorbing()))
            + "."));
    }

    private void longRun(LongRunResult l) {
        for (LongRunResult.ClassLaw k : l.classes()) {
            if (!k.closed()) {
                continue;
            }
            List<List<List<Span>>> rows = new ArrayList<>();
            for (int i = 0; i < k.states().size(); i++) {
                rows.add(List.of(t(k.states().get(i)), formulaCell(k.stationary().get(i)),
                    i < k.meanRecurrence().size() ? formulaCell(k.meanRecurrence().get(i)) : t("never left")));
            }
            table("Stationary law of the closed class {" + String.join(", ", k.states()) + "}",
                List.of("state", "π", l.continuous() ? "mean return time 1/(π q)" : "mean recurrence time 1/π"),
                rows);
        }
        if (!l.absorption().isEmpty()) {
            List<String> head = new ArrayList<>();
            head.add("from");
            List<LongRunResult.ClassLaw> closed = l.classes().stream().filter(LongRunResult.ClassLaw::closed).toList();
            for (LongRunResult.Absorption a : l.absorption().subList(0, 1)) {
                for (int k : a.classes()) {
                    head.add("ends in {" + String.join(", ", l.classes().get(k).states()) + "}");
                }
            }
            List<List<List<Span>>> rows = new ArrayList<>();
            for (LongRunResult.Absorption a : l.absorption()) {
                List<List<Span>> row = new ArrayList<>();
                row.add(t(a.state()));
                a.probabilities().forEach(p -> row.add(formulaCell(p)));
                rows.add(row);
            }
            table("Probability of ending in each closed class (" + closed.size() + ")", head, rows);
        }
        table(l.continuous() ? "Limit of P(t) as t grows" : l.cesaro()
            ? "Limit of the averages of P^n (a closed class is periodic)" : "Limit of P^n as n grows",
            header(l.states()), matrixRows(l.states(), l.limit().stream()
                .map(row -> row.stream().map(this::formulaCell).toList()).toList()));
    }

    private void absorb(AbsorbResult a) {
        List<List<List<Span>>> rows = new ArrayList<>();
        for (int i = 0; i < a.transients().size(); i++) {
            rows.add(List.of(t(a.transients().get(i)), formulaCell(a.expectedSteps().get(i)),
                formulaCell(a.variance().get(i))));
        }
        table((a.continuous() ? "Time" : "Steps") + " until absorption into {" + String.join(", ", a.absorbing())
            + "}", List.of("from", a.continuous() ? "expected time" : "expected steps", "variance"), rows);
        List<String> head = new ArrayList<>();
        head.add("from \\ absorbed in");
        head.addAll(a.absorbing());
        table("Absorption probabilities", head, matrixRows(a.transients(), a.probabilities().stream()
            .map(row -> row.stream().map(this::formulaCell).toList()).toList()));
    }

    private void availability(AvailabilityResult a) {
        List<List<List<Span>>> rows = new ArrayList<>();
        rows.add(List.of(t("steady-state availability"), exactAndDecimal(a.availability())));
        rows.add(List.of(t("steady-state unavailability"), exactAndDecimal(a.unavailability())));
        for (Map.Entry<String, Optional<Rational>> e : a.mttf().entrySet()) {
            rows.add(List.of(t("MTTF from " + e.getKey()), e.getValue().map(this::exactAndDecimal)
                .orElse(t("infinite"))));
        }
        a.meanUpTime().ifPresent(v -> rows.add(List.of(t("mean up time"), exactAndDecimal(v))));
        a.meanDownTime().ifPresent(v -> rows.add(List.of(t("mean down time"), exactAndDecimal(v))));
        rows.add(List.of(t("failure frequency"), exactAndDecimal(a.failureFrequency())));
        rows.add(List.of(t("down time per year (" + a.hoursPerYear() + " h)"), exactAndDecimal(a.downHoursPerYear())));
        table("Figures of merit (operating states: " + String.join(", ", a.up()) + ")", List.of("figure", "value"),
            rows);
        List<List<List<Span>>> law = new ArrayList<>();
        for (Map.Entry<String, Rational> e : a.stationary().entrySet()) {
            law.add(List.of(t(e.getKey()), exactAndDecimal(e.getValue())));
        }
        table("Stationary law", List.of("state", "π"), law);
    }

    private void sensitivity(ReportResult r, ReportResult.SensitivitySection s) {
        if (!s.lines().isEmpty()) {
            paragraph(t("Derivatives and elasticities at " + r.point().map(p -> p.text() + " (" + p.origin() + ")")
                .orElse("the point") + ". The elasticity (p/F) dF/dp is the relative change of the figure F per"
                + " relative change of the parameter p."));
            List<List<List<Span>>> rows = new ArrayList<>();
            for (ReportResult.SensLine l : s.lines()) {
                rows.add(List.of(t(l.figure()), List.of(new Code(l.parameter())), exactAndDecimal(l.value()),
                    exactAndDecimal(l.derivative()), l.elasticity().map(this::exactAndDecimal).orElse(t("undefined"))));
            }
            table("Sensitivity", List.of("figure F", "parameter p", "F", "dF/dp", "elasticity"), rows);
        }
        s.sweep().ifPresent(sw -> {
            List<List<List<Span>>> rows = new ArrayList<>();
            for (ReportResult.SweepRow row : sw.rows()) {
                rows.add(List.of(List.of(exact(row.value())), List.of(exact(row.figure())), List.of(decimal(row.figure())),
                    row.derivative().map(d -> List.<Span>of(decimal(d))).orElse(t(""))));
            }
            table("Sweep " + sw.range() + " (the other parameters at the point)",
                List.of(sw.parameter(), sw.figure(), "decimal", "d/d" + sw.parameter()), rows);
        });
    }
}
