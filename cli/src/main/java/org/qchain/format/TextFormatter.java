package org.qchain.format;

import java.util.ArrayList;
import java.util.List;
import org.qchain.exact.DecimalText;
import org.qchain.exact.Rational;
import org.qchain.exact.certified.CertifiedDecimal;
import org.qchain.exact.reference.EntryCheck;
import org.qchain.exact.reference.VerifyReport;
import org.qchain.result.AvailabilityResult;
import org.qchain.result.CertifiedStepResult;
import org.qchain.result.RateSensResult;
import org.qchain.result.TransientResult;
import org.qchain.result.CheckResult;
import org.qchain.result.DistributionResult;
import org.qchain.result.ClosedResult;
import org.qchain.result.SensResult;
import org.qchain.result.StepResult;
import org.qchain.result.SymbolicStepResult;
import org.qchain.result.VerifyResult;

/**
 * Human-readable layout: for numbers, an overview matrix of decimals, then every entry with its decimal beside the
 * exact fraction (exact last, so long fractions do not push other columns apart); for formulas, aligned tables; then
 * the caution.
 */
final class TextFormatter extends DocLayout {
    /** Lines of the decimal overview stay within this many characters where they can. */
    static final int WIDTH = 100;

    TextFormatter(int digits) {
        super(digits);
    }

    private static String end(StringBuilder sb) {
        return close(sb).toString();
    }

    /**
     * The line that says where the parameter values came from, {@code Parameters at w=1/10 (given with --at).}, or
     * nothing for a model without parameters: the same words in every command.
     */
    static String parameters(java.util.Optional<org.qchain.result.Point> point) {
        return point.map(p -> "Parameters at " + p.text() + " (" + p.origin() + ").\n").orElse("");
    }

    /** Appends the caution that ends every text layout. */
    private static StringBuilder close(StringBuilder sb) {
        return sb.append('\n').append(Caution.wrapped(WIDTH)).append('\n');
    }

    // --- step ----------------------------------------------------------------------------------------------------

    @Override
    public String stepMatrix(StepResult.Matrix m) {
        return whole(sink -> stepMatrix(m, sink));
    }

    @Override
    void stepMatrix(StepResult.Matrix m, Sink sink) {
        StepResult.Header h = m.header();
        StringBuilder sb = sink.sb;
        sb.append(Text.power(h.n())).append(" for ").append(h.source()).append(" (").append(h.kind())
            .append(" chain, ").append(m.states().size()).append(m.states().size() == 1 ? " state)" : " states)")
            .append('\n');
        sb.append("Row i, column j: probability of being in state j after ").append(Text.steps(h.n()))
            .append(", starting in state i.\n").append(parameters(h.point())).append('\n');
        sb.append("Decimals (").append(Text.digits(digits)).append("):\n");
        List<List<String>> decimals = new ArrayList<>();
        for (List<Rational> row : m.entries()) {
            decimals.add(row.stream().map(this::dec).toList());
        }
        overview(sb, m.states(), decimals);
        sb.append("Exact values:\n");
        TextTable list = new TextTable().addRow("from", "to", "decimal");
        for (int i = 0; i < m.states().size(); i++) {
            for (int j = 0; j < m.states().size(); j++) {
                list.addRow(m.states().get(i), m.states().get(j), decimals.get(i).get(j));
            }
        }
        try (AheadTexts exact = AheadTexts.exact(flat(m.entries()))) {
            list.render(sink, row -> row == 0 ? "exact" : exact.get(row - 1));
        }
        close(sb);
    }

    /** The square overview of a matrix of texts, split into column blocks that fit the width. */
    private static void overview(StringBuilder sb, List<String> states, List<List<String>> texts) {
        List<int[]> blocks = columnBlocks(states, texts);
        for (int[] block : blocks) {
            if (blocks.size() > 1) {
                sb.append("columns ").append(block[0] + 1).append(" to ").append(block[1]).append(" of ")
                    .append(states.size()).append(":\n");
            }
            TextTable overview = new TextTable();
            List<String> head = new ArrayList<>();
            head.add("from\\to");
            head.addAll(states.subList(block[0], block[1]));
            overview.addRow(head);
            for (int i = 0; i < states.size(); i++) {
                List<String> line = new ArrayList<>();
                line.add(states.get(i));
                line.addAll(texts.get(i).subList(block[0], block[1]));
                overview.addRow(line);
            }
            sb.append(overview.render()).append('\n');
        }
    }

    /**
     * Splits the overview's columns into blocks [start, end) whose lines stay within {@link #WIDTH} characters (at
     * least one column a block), so that a matrix of many states stays readable in a terminal.
     */
    private static List<int[]> columnBlocks(List<String> states, List<List<String>> decimals) {
        int n = states.size();
        int label = "from\\to".length();
        for (String s : states) {
            label = Math.max(label, s.length());
        }
        List<int[]> out = new ArrayList<>();
        int start = 0;
        int used = label;
        for (int j = 0; j < n; j++) {
            int w = states.get(j).length();
            for (List<String> row : decimals) {
                w = Math.max(w, row.get(j).length());
            }
            if (j > start && used + 2 + w > WIDTH) {
                out.add(new int[] {start, j});
                start = j;
                used = label;
            }
            used += 2 + w;
        }
        out.add(new int[] {start, n});
        return out;
    }

    @Override
    public String stepRow(StepResult.Row r) {
        return whole(sink -> stepRow(r, sink));
    }

    @Override
    void stepRow(StepResult.Row r, Sink sink) {
        StepResult.Header h = r.header();
        StringBuilder sb = sink.sb;
        sb.append("Row ").append(r.from()).append(" of ").append(Text.power(h.n())).append(" for ").append(h.source())
            .append(" (").append(h.kind()).append(" chain)\n");
        sb.append("Probability of being in each state after ").append(Text.steps(h.n())).append(", starting in ")
            .append(r.from()).append("; decimals to ").append(Text.digits(digits)).append(".\n")
            .append(parameters(h.point())).append('\n');
        TextTable t = new TextTable().addRow("to", "decimal");
        for (int j = 0; j < r.states().size(); j++) {
            t.addRow(r.states().get(j), dec(r.entries().get(j)));
        }
        try (AheadTexts exact = AheadTexts.exact(r.entries())) {
            t.render(sink, row -> row == 0 ? "exact" : exact.get(row - 1));
        }
        close(sb);
    }

    @Override
    public String stepSingle(StepResult.Single s) {
        StepResult.Header h = s.header();
        StringBuilder sb = new StringBuilder();
        String name = Text.power(h.n()) + "(" + s.from() + " -> " + s.to() + ")";
        sb.append(name).append(" for ").append(h.source()).append(" (").append(h.kind()).append(" chain)\n");
        sb.append(parameters(h.point()));
        sb.append("Probability of being in ").append(s.to()).append(" after ").append(Text.steps(h.n()))
            .append(", starting in ").append(s.from()).append(":\n");
        // not a table: a long exact value must not push the decimal's note to the right
        sb.append("  exact    ").append(DecimalText.toString(s.value())).append('\n');
        sb.append("  decimal  ").append(dec(s.value())).append("  (").append(Text.digits(digits)).append(")\n");
        s.paths().ifPresent(paths -> appendPaths(sb, s, name, paths));
        return end(sb);
    }

    private void appendPaths(StringBuilder sb, StepResult.Single s, String name, List<StepResult.PathLine> paths) {
        long n = s.header().n();
        sb.append('\n');
        if (paths.isEmpty()) {
            sb.append("No path of ").append(Text.steps(n)).append(" leads from ").append(s.from()).append(" to ")
                .append(s.to()).append(".\n");
            return;
        }
        sb.append(paths.size() == 1 ? "The most probable path" : "The " + paths.size() + " most probable paths")
            .append(" of ").append(Text.steps(n)).append(" from ").append(s.from()).append(" to ").append(s.to())
            .append(", with their share of ").append(name).append(":\n");
        TextTable t = new TextTable().addRow("rank", "share", "probability", "path");
        boolean runs = false;
        for (int k = 0; k < paths.size(); k++) {
            StepResult.PathLine p = paths.get(k);
            t.addRow(String.valueOf(k + 1), Text.percent(p.share(), digits) + "%", dec(p.probability()),
                Paths.compact(p.states()));
            runs |= Paths.hasRun(p.states());
        }
        sb.append(t.render());
        if (runs) {
            sb.append("(\"A x3\" stands for 3 consecutive time points in state A.)\n");
        }
        sb.append("\nExact values of the paths:\n");
        TextTable e = new TextTable().addRow("rank", "share", "probability");
        for (int k = 0; k < paths.size(); k++) {
            StepResult.PathLine p = paths.get(k);
            e.addRow(String.valueOf(k + 1), p.share().toString(), p.probability().toString());
        }
        sb.append(e.render());
    }

    // --- certified step ----------------------------------------------------------------------------------------

    @Override
    public String certifiedStep(CertifiedStepResult r) {
        StepResult.Header h = r.header();
        StringBuilder sb = new StringBuilder();
        String proven = "Certified decimals to " + Text.digits(r.digits()) + ", every digit proven";
        if (r.from().isEmpty()) {
            sb.append(Text.power(h.n())).append(" for ").append(h.source()).append(" (").append(h.kind())
                .append(" chain, ").append(r.columns().size()).append(r.columns().size() == 1 ? " state)" : " states)")
                .append('\n');
            sb.append("Row i, column j: probability of being in state j after ").append(Text.steps(h.n()))
                .append(", starting in state i.\n").append(proven).append(".\n\n");
            List<List<String>> texts = new ArrayList<>();
            for (List<CertifiedDecimal> row : r.values()) {
                texts.add(row.stream().map(CertifiedDecimal::text).toList());
            }
            overview(sb, r.columns(), texts);
        } else if (r.to().isEmpty()) {
            sb.append("Row ").append(r.from().get()).append(" of ").append(Text.power(h.n())).append(" for ")
                .append(h.source()).append(" (").append(h.kind()).append(" chain)\n");
            sb.append("Probability of being in each state after ").append(Text.steps(h.n())).append(", starting in ")
                .append(r.from().get()).append(".\n").append(proven).append(".\n\n");
            TextTable t = new TextTable().addRow("to", "decimal", "certified", "enclosure width");
            for (int j = 0; j < r.columns().size(); j++) {
                CertifiedDecimal d = r.values().get(0).get(j);
                t.addRow(r.columns().get(j), d.text(), CertifiedStepResult.statusWord(d),
                    CertifiedStepResult.widthText(d.enclosure().width()));
            }
            sb.append(t.render()).append('\n');
        } else {
            CertifiedDecimal d = r.values().get(0).get(0);
            sb.append(Text.power(h.n())).append('(').append(r.from().get()).append(" -> ").append(r.to().get())
                .append(") for ").append(h.source()).append(" (").append(h.kind()).append(" chain)\n");
            sb.append("Probability of being in ").append(r.to().get()).append(" after ").append(Text.steps(h.n()))
                .append(", starting in ").append(r.from().get()).append(":\n");
            sb.append("  ").append(CertifiedStepResult.statusWord(d)).append("  ").append(d.text()).append("  (")
                .append(Text.digits(r.digits())).append(d.isProven() ? ", every digit proven)\n" : ")\n");
            sb.append("  enclosure width  ").append(CertifiedStepResult.widthText(d.enclosure().width()))
                .append('\n');
            sb.append("The exact value lies in an interval (enclosure) this wide, and every value in it rounds to"
                + " the digits shown.\n");
        }
        if (r.from().isEmpty() || r.to().isEmpty()) {
            sb.append("Largest enclosure width: ").append(CertifiedStepResult.widthText(r.maxWidth()))
                .append(". Each exact value lies in an interval (enclosure) of\nat most this width, and every value"
                    + " in it rounds to the digits shown.\n");
        }
        if (r.anyUnresolved()) {
            sb.append("Values marked 'not resolved' lie next to a rounding boundary and were too large to compute"
                + " exactly: they are shown as an interval [lower, upper] that contains the value.\n");
        }
        return end(sb);
    }

    // --- symbolic step -----------------------------------------------------------------------------------------

    @Override
    public String symbolicStep(SymbolicStepResult r) {
        StringBuilder sb = new StringBuilder();
        sb.append(Symbolic.what(r)).append(" for ").append(r.source()).append(" (").append(r.kind())
            .append(" chain, ").append(r.states().size()).append(" states) as ").append(Symbolic.functionsOf(r))
            .append('\n');
        sb.append("Each formula is ").append(Symbolic.formText(r.factored())).append(".\n\n");
        TextTable table = new TextTable().addRow("from", "to", "P^" + r.n());
        Symbolic.forEachCell(r, (i, j) -> table.addRow(r.rows().get(i), r.columns().get(j),
            r.formulas().get(i).get(j).plain()));
        sb.append(table.render());
        if (r.values().isPresent()) {
            sb.append("\nAt ").append(r.point().orElseThrow().text())
                .append(" (").append(r.point().orElseThrow().origin()).append("):\n");
            TextTable vt = new TextTable().addRow("from", "to", "decimal", "exact");
            Symbolic.forEachCell(r, (i, j) -> {
                Rational e = r.values().get().get(i).get(j);
                vt.addRow(r.rows().get(i), r.columns().get(j), dec(e), e.toString());
            });
            sb.append(vt.render());
            sb.append("Decimals: ").append(Text.digits(digits)).append(".\n");
        }
        return sb.append('\n').append(Caution.TEXT).append('\n').toString();
    }

    // --- sens --------------------------------------------------------------------------------------------------

    @Override
    public String sens(SensResult s) {
        StringBuilder sb = new StringBuilder();
        sb.append("Sensitivity of ").append(Symbolic.entryName(s)).append(" to ")
            .append(String.join(", ", s.gradient().stream().map(SensResult.Partial::wrt).toList())).append(" for ")
            .append(s.source()).append(" (").append(s.kind()).append(" chain), parameters ")
            .append(String.join(", ", s.parameters())).append('\n');
        if (s.toStates().size() > 1) {
            sb.append("P is the probability of being in one of ").append(s.toText()).append(" after ")
                .append(Text.steps(s.n())).append(", starting in ").append(s.from()).append(".\n");
        }
        TextTable formulas = new TextTable().addRow("P", "= " + s.probability().plain());
        s.gradient().forEach(g -> formulas.addRow("dP/d" + g.wrt(), "= " + g.derivative().plain()));
        sb.append(formulas.render());
        if (s.isGradient() && s.at().isPresent()) {
            SensResult.AtPoint a = s.at().get();
            sb.append("\nAt ").append(a.point().text()).append(" (").append(a.point().origin()).append("):\n");
            sb.append(new TextTable().addRow("", "decimal", "exact")
                .addRow("P", dec(a.probability()), a.probability().toString()).render());
            sb.append("\nGradient, one row per parameter x:\n");
            TextTable t = new TextTable().addRow("x", "dP/dx", "elasticity", "dP/dx exact", "elasticity exact");
            for (SensResult.Partial g : s.gradient()) {
                Rational d = g.value().orElseThrow();
                t.addRow(g.wrt(), dec(d), g.elasticity().map(this::dec).orElse("undefined (P = 0)"), d.toString(),
                    g.elasticity().map(Rational::toString).orElse(""));
            }
            sb.append(t.render());
            sb.append("Elasticity: (x/P) dP/dx, the relative change of P per relative change of x.\n");
        } else if (s.at().isPresent()) {
            SensResult.AtPoint a = s.at().get();
            sb.append("\nAt ").append(a.point().text()).append(" (").append(a.point().origin()).append("):\n");
            TextTable t = new TextTable().addRow("", "decimal", "exact");
            t.addRow("P", dec(a.probability()), a.probability().toString());
            t.addRow("dP/d" + s.wrt(), dec(a.derivative()), a.derivative().toString());
            if (a.elasticity().isPresent()) {
                t.addRow("elasticity", dec(a.elasticity().get()), a.elasticity().get().toString());
            } else {
                t.addRow("elasticity", "undefined (P = 0)", "");
            }
            sb.append(t.render());
            sb.append("Elasticity: (").append(s.wrt()).append("/P) dP/d").append(s.wrt())
                .append(", the relative change of P per relative change of ").append(s.wrt()).append(".\n");
        }
        s.sweep().ifPresent(w -> sweep(sb, w, "P", "dP/d" + s.wrt(), java.util.Optional.empty()));
        if (s.at().isPresent() || s.sweep().isPresent()) {
            sb.append("Decimals: ").append(Text.digits(digits)).append(".\n");
        }
        return sb.append('\n').append(Caution.TEXT).append('\n').toString();
    }

    /** A sweep table: the parameter, decimals, then exact values; an elasticity column where one is given. */
    private void sweep(StringBuilder sb, SensResult.Sweep w, String value, String derivative,
                       java.util.Optional<java.util.function.Function<SensResult.SweepLine, java.util.Optional<Rational>>> elasticity) {
        sb.append("\nSweep ").append(w.range()).append(w.others().isEmpty() ? ""
            : " (" + w.others().text() + ")").append(":\n");
        TextTable t = new TextTable();
        List<String> head = sweepHead(w.parameter(), value, derivative, elasticity.isPresent());
        t.addRow(head);
        for (SensResult.SweepLine l : w.lines()) {
            List<String> row = sweepCells(l, elasticity);
            t.addRow(row);
        }
        sb.append(t.render());
    }

    // --- closed ------------------------------------------------------------------------------------------------

    @Override
    public String closed(ClosedResult r) {
        StringBuilder sb = new StringBuilder();
        sb.append(Closed.pn(r)).append(" for ").append(r.source()).append(" (").append(Closed.chain(r)).append("): ").append(Closed.what(r))
            .append('\n');
        if (!r.isSeries()) {
            sb.append("Valid for ").append(r.names().step()).append(" >= ").append(r.validFrom());
            if (!r.conditions().isEmpty()) {
                sb.append(" where ").append(Closed.conditions(r.conditions()));
            }
            sb.append('.');
            sb.append(Closed.domainNote(r));
            if (r.validFrom() > 0) {
                sb.append(" For smaller ").append(r.names().step()).append(" (eigenvalue 0), qchain step gives ")
                    .append(Closed.pn(r)).append(" exactly.");
            }
            sb.append('\n');
        }
        if (!r.parameters().isEmpty()) {
            sb.append("Parameters (symbolic): ").append(String.join(", ", r.parameters())).append('\n');
        }
        if (!r.substituted().isEmpty()) {
            sb.append("Substituted before solving (given with --at): ").append(r.substitutedText()).append('\n');
        }
        if (!Closed.symbolsNote(r).isEmpty()) {
            sb.append(Closed.symbolsNote(r)).append('\n');
        }
        if (!Closed.factoredNote(r).isEmpty()) {
            sb.append(Closed.factoredNote(r)).append('\n');
        }
        if (!Closed.combinationNote(r).isEmpty()) {
            sb.append(Closed.combinationNote(r)).append('\n');
        }
        sb.append('\n');
        List<String> labels = new ArrayList<>();
        List<String> values = new ArrayList<>();
        for (int i = 0; i < r.rows().size(); i++) {
            for (int j = 0; j < r.cols().size(); j++) {
                labels.add(Closed.label(r, r.rows().get(i), r.cols().get(j)));
                values.add(Closed.shown(r, r.shownCells().get(i).get(j).plain()));
            }
        }
        aligned(sb, labels, r.form() == ClosedResult.Form.RECURRENCE ? ": " : " = ", values, "");
        if (!r.where().isEmpty()) {
            sb.append(Closed.whereLine(r)).append('\n');
        }
        if (r.continuous()) {
            sb.append('\n').append(Closed.transformHeading(r)).append(":\n");
            List<String> tl = new ArrayList<>();
            List<String> tv = new ArrayList<>();
            for (int i = 0; i < r.rows().size(); i++) {
                for (int j = 0; j < r.cols().size(); j++) {
                    tl.add(Closed.transformLabel(r, r.rows().get(i), r.cols().get(j)));
                    tv.add(r.transforms().get(i).get(j).plain());
                }
            }
            aligned(sb, tl, " = ", tv, "  ");
        }
        if (!r.eigenvalues().isEmpty()) {
            sb.append("\nEigenvalues, by irreducible factor of ").append(Closed.det(r)).append(":\n");
            List<String> facts = new ArrayList<>();
            List<String> vals = new ArrayList<>();
            boolean decimals = false;
            for (ClosedResult.Eigen e : r.eigenvalues()) {
                facts.add(e.factor().plain() + ":");
                String extra = e.multiplicity() > 1 ? " (multiplicity " + e.multiplicity() : "";
                extra += e.jordanIndex() > 1 ? ", Jordan block of size " + e.jordanIndex() : "";
                String dec = Closed.eigenDecimals(r, e);
                decimals |= !dec.isEmpty();
                vals.add(Closed.eigenValues(r, e) + (extra.isEmpty() ? "" : extra + ")")
                    + (dec.isEmpty() ? "" : "  ≈ " + dec));
            }
            aligned(sb, facts, " ", vals, "  ", EIGEN_PAD);
            if (decimals) {
                sb.append("  (≈: decimals").append(Closed.pointNote(r)).append(", ").append(r.digits())
                    .append(" significant digits)\n");
            }
            if (r.factored()) {
                sb.append("  ").append(Closed.det(r)).append(" = ")
                    .append(Closed.characteristicPolynomial(r)).append('\n');
            }
        }
        for (ClosedResult.Roots rt : r.roots()) {
            sb.append("  ").append(rt.name()).append(" = ").append(rt.polynomial().plain());
            if (!rt.roots().isEmpty()) {
                sb.append("; roots ").append(String.join(", ", Closed.decimals(rt.roots(), r.digits())));
            }
            sb.append('\n');
        }
        r.longRun().ifPresent(lr -> longRun(sb, r, lr));
        return end(sb);
    }

    /** The widest label that is still padded to align the column after it. */
    private static final int MAX_PAD = 40;

    private static void longRun(StringBuilder sb, ClosedResult r, ClosedResult.LongRun lr) {
        sb.append('\n').append("Long run: ").append(Closed.longRunHeading(r, lr)).append(":\n");
        List<List<List<String>>> dec = Closed.limitDecimals(r, lr);
        boolean shown = false;
        for (int k = 0; k < lr.limits().size(); k++) {
            List<String> labels = new ArrayList<>();
            List<String> values = new ArrayList<>();
            List<String> approx = new ArrayList<>();
            for (int i = 0; i < r.rows().size(); i++) {
                for (int j = 0; j < r.cols().size(); j++) {
                    labels.add((lr.periodic() ? Closed.subsequence(r, lr, k) + ": " : "") + r.rows().get(i) + " -> "
                        + r.cols().get(j));
                    String exact = lr.limits().get(k).get(i).get(j).plain();
                    values.add(exact);
                    String d = dec.isEmpty() ? "" : dec.get(k).get(i).get(j);
                    approx.add(d.isEmpty() || d.equals(exact) ? "" : "  ≈ " + d);
                    shown |= !approx.get(approx.size() - 1).isEmpty();
                }
            }
            if (approx.stream().allMatch(String::isEmpty)) {
                aligned(sb, labels, "  ", values, "  ");
            } else {
                List<String> padded = new ArrayList<>();
                int w = 0;
                for (String v : values) {
                    w = Math.max(w, v.length());
                }
                for (int t = 0; t < values.size(); t++) {
                    String v = values.get(t);
                    padded.add(approx.get(t).isEmpty() ? v : v + " ".repeat(w - v.length()) + approx.get(t));
                }
                aligned(sb, labels, "  ", padded, "  ");
            }
        }
        if (shown) {
            sb.append("  (≈: decimals").append(Closed.pointNote(r)).append(", ").append(r.digits())
                .append(" significant digits)\n");
        }
        String note = Closed.longRunNote(lr);
        if (!note.isEmpty()) {
            sb.append(note).append('\n');
        }
        sb.append(Closed.rateLine(r, lr)).append('\n');
        if (!lr.exact()) {
            lr.rateValue().ifPresent(v -> sb.append("  = ").append(Closed.real(r, v))
                .append(r.point().map(p -> " at " + p.text()).orElse("")).append(" (").append(r.digits())
                .append(" significant digits)\n"));
        }
    }

    /**
     * The widest factor that is still padded to align the eigenvalues after it: a long factor (a quadratic with
     * parameters) would otherwise push the short ones' eigenvalues far to the right.
     */
    private static final int EIGEN_PAD = 24;

    /** Labels padded to one width, unless one is longer than {@link #MAX_PAD}: then a single separator each. */
    private static void aligned(StringBuilder sb, List<String> left, String sep, List<String> right, String indent) {
        aligned(sb, left, sep, right, indent, MAX_PAD);
    }

    /** Labels padded to one width, unless one is longer than {@code maxPad}: then a single separator each. */
    private static void aligned(StringBuilder sb, List<String> left, String sep, List<String> right, String indent,
                                int maxPad) {
        int w = 0;
        for (String l : left) {
            w = Math.max(w, l.length());
        }
        if (w > maxPad) {
            w = 0;
        }
        for (int i = 0; i < left.size(); i++) {
            sb.append(indent).append(left.get(i)).append(" ".repeat(Math.max(0, w - left.get(i).length()))).append(sep)
                .append(right.get(i)).append('\n');
        }
    }

    // --- check -------------------------------------------------------------------------------------------------

    @Override
    String numericCheck(CheckResult.Numeric n) {
        int size = n.matrix().states().size();
        return stepMatrix(n.matrix()) + "OK: " + size + (size == 1 ? " state" : " states") + ", "
            + n.matrix().header().kind() + ", rows sum to 1\n";
    }

    @Override
    String generatorCheck(CheckResult.Generator g) {
        StringBuilder sb = new StringBuilder(Continuous.generatorTitle(g)).append('\n');
        sb.append(Continuous.GENERATOR_NOTE).append('\n').append(parameters(g.at())).append('\n');
        List<List<String>> plain = new ArrayList<>();
        for (List<org.qchain.result.Formula> row : g.entries()) {
            plain.add(row.stream().map(org.qchain.result.Formula::plain).toList());
        }
        if (g.symbolic()) {
            overview(sb, g.states(), plain);
        } else {
            sb.append("Decimals (").append(Text.digits(digits)).append("):\n");
            List<List<String>> decimals = new ArrayList<>();
            for (List<org.qchain.result.Formula> row : g.entries()) {
                decimals.add(row.stream().map(f -> Continuous.decimalOf(f, digits)).toList());
            }
            overview(sb, g.states(), decimals);
            sb.append("Exact values:\n");
            overview(sb, g.states(), plain);
        }
        TextTable t = g.symbolic() ? new TextTable().addRow("state", "total rate out q_i", "mean holding time 1/q_i")
            : new TextTable().addRow("state", "total rate out q_i", "decimal", "mean holding time 1/q_i", "decimal");
        for (List<String> r : Continuous.stateRows(g, digits)) {
            t.addRow(g.symbolic() ? List.of(r.get(0), r.get(1), r.get(3)) : r);
        }
        sb.append(t.render());
        Continuous.upDown(g).ifPresent(u -> sb.append('\n').append(u).append('\n'));
        if (!g.warnings().isEmpty()) {
            sb.append('\n').append(Continuous.RATE_CONDITIONS).append('\n');
            g.warnings().forEach(w -> sb.append("  ").append(w).append('\n'));
        }
        close(sb);
        return sb.append(Continuous.generatorVerdict(g)).append('\n').toString();
    }

    @Override
    String symbolicCheck(CheckResult.Symbolic s) {
        StringBuilder sb = new StringBuilder();
        int size = s.states().size();
        sb.append("One-step matrix of ").append(s.source()).append(" (").append(s.kind()).append(" chain, ")
            .append(size).append(" states) as exact rational functions of ")
            .append(s.parameters().isEmpty() ? "(no parameters)" : String.join(", ", s.parameters()))
            .append(":\n");
        List<String> labels = new ArrayList<>();
        List<String> values = new ArrayList<>();
        for (int i = 0; i < size; i++) {
            for (int j = 0; j < size; j++) {
                labels.add(s.states().get(i) + " -> " + s.states().get(j));
                values.add(s.entries().get(i).get(j).plain());
            }
        }
        aligned(sb, labels, "  ", values, "  ");
        if (!s.warnings().isEmpty()) {
            sb.append("\nConditions (each entry must lie in [0, 1] for the results to be probabilities):\n");
            for (String w : s.warnings()) {
                sb.append("  ").append(w).append('\n');
            }
        }
        sb.append('\n').append(Caution.TEXT).append("\n\n");
        sb.append("OK: ").append(size).append(size == 1 ? " state" : " states").append(", ").append(s.kind())
            .append(", rows sum to 1 identically; ")
            .append(s.warnings().isEmpty() ? "entries in [0, 1] on the whole parameter domain"
                : s.warnings().size() + (s.warnings().size() == 1 ? " condition" : " conditions")
                    + " on the parameters (above)")
            .append('\n');
        return sb.toString();
    }

    // --- verify --------------------------------------------------------------------------------------------------

    @Override
    public String verify(VerifyResult r) {
        VerifyReport rep = r.report();
        StringBuilder sb = new StringBuilder();
        sb.append(Checks.quantity(r)).append(" of ").append(r.source()).append(" checked against ").append(r.against())
            .append(" (").append(rep.form().description()).append(")\n");
        sb.append("Tolerance: ").append(Checks.tolerance(rep.tolerance())).append('\n');
        sb.append("Result: ").append(rep.passed() ? "PASS, " : "FAIL, ").append(Checks.verdict(rep)).append("\n\n");
        if (!rep.worst().isEmpty()) {
            sb.append(rep.worst().size() == rep.checked() ? "Every value, worst first:\n"
                : "The " + rep.worst().size() + " worst values:\n");
            TextTable t = new TextTable().addRow("entry", "given", "exact (" + digits + " digits)", "error",
                "relative error", "ulps", "at", "status");
            for (EntryCheck c : rep.worst()) {
                t.addRow(c.label(), c.given(), dec(c.truth()), Checks.error(c.error()), Checks.error(c.relativeError()),
                    Checks.ulpsCell(c), Checks.place(c), Checks.status(c));
            }
            sb.append(t.render()).append('\n');
        }
        sb.append(Checks.summary(rep)).append(".\n");
        return end(sb);
    }

    // --- continuous chains ---------------------------------------------------------------------------------------

    @Override
    public String transientProbabilities(TransientResult r) {
        StringBuilder sb = new StringBuilder();
        sb.append("P(t) for ").append(r.source()).append(" (continuous chain, ").append(r.states().size())
            .append(r.states().size() == 1 ? " state)" : " states), certified decimals (").append(Text.digits(digits))
            .append(")\n");
        sb.append("Row i, column j: probability of being in state j at time t, starting in state i.\n");
        for (TransientResult.AtTime at : r.times()) {
            sb.append("\nt = ").append(at.t()).append(":\n");
            TextTable table = new TextTable();
            Continuous.grid(r, at).forEach(table::addRow);
            sb.append(table.render());
            sb.append(Continuous.boundSentence(at)).append(".\n");
        }
        return end(sb);
    }

    @Override
    public String symbolicTransient(org.qchain.result.SymbolicTransientResult r) {
        StringBuilder sb = new StringBuilder();
        sb.append(Continuous.symbolicTitle(r)).append('\n').append(Continuous.symbolicValidity(r)).append('\n');
        if (!r.substituted().isEmpty()) {
            List<String> v = new ArrayList<>();
            r.substituted().forEach((k, x) -> v.add(k + "=" + x));
            sb.append("Substituted before solving (given with --at): ").append(String.join(", ", v)).append('\n');
        }
        if (r.factored()) {
            sb.append("Coefficients: numerator and denominator factored over the rationals.\n");
        }
        sb.append('\n');
        List<String> labels = new ArrayList<>();
        List<String> values = new ArrayList<>();
        for (int i = 0; i < r.rows().size(); i++) {
            for (int j = 0; j < r.states().size(); j++) {
                labels.add(Continuous.symbolicLabel(r.timeSymbol(), r.rows().get(i), r.states().get(j)));
                values.add(Continuous.symbolicShown(r, r.shownCells().get(i).get(j).plain(), true));
            }
        }
        aligned(sb, labels, " = ", values, "");
        if (!r.where().isEmpty()) {
            sb.append(Continuous.symbolicWhere(r, true)).append('\n');
        }
        for (int k = 0; k < r.times().size(); k++) {
            org.qchain.result.SymbolicTransientResult.AtTime at = r.times().get(k);
            sb.append('\n').append(r.timeSymbol()).append(" = ").append(at.t()).append(":\n");
            List<List<org.qchain.exact.certified.CertifiedDecimal>> dec = Continuous.symbolicDecimals(r, k);
            List<String> l = new ArrayList<>();
            List<String> v = new ArrayList<>();
            for (int i = 0; i < r.rows().size(); i++) {
                for (int j = 0; j < r.states().size(); j++) {
                    l.add(Continuous.symbolicLabel(at.t().toString(), r.rows().get(i), r.states().get(j)));
                    v.add(Continuous.symbolicShown(r, at.cells().get(i).get(j).plain(), true)
                        + (dec.isEmpty() ? "" : "  ≈ " + dec.get(i).get(j).text()));
                }
            }
            aligned(sb, l, " = ", v, "  ");
            String note = Continuous.symbolicDecimalNote(r, k);
            if (!note.isEmpty()) {
                sb.append("  (").append(note).append(")\n");
            }
        }
        return end(sb);
    }

    @Override
    public String availability(AvailabilityResult r) {
        StringBuilder sb = new StringBuilder();
        sb.append("Availability of ").append(r.source()).append(" (continuous chain; up: ")
            .append(String.join(", ", r.up())).append("; every other state is down)\n").append(parameters(r.at()))
            .append('\n');
        figures(sb, r);
        sb.append('\n').append(Continuous.UNITS).append('\n');
        return end(sb);
    }

    /** The exact figures' table and the point availabilities of a numeric result. */
    private void figures(StringBuilder sb, AvailabilityResult r) {
        TextTable table = new TextTable().addRow("figure", "decimal", "exact");
        for (List<String> f : Continuous.figures(r, digits)) {
            table.addRow(f.get(0), f.get(2), f.get(1));
        }
        sb.append(table.render());
        if (!r.point().isEmpty()) {
            sb.append("\n").append(Continuous.pointsHeading(r)).append(" (certified decimals, ").append(Text.digits(digits)).append("):\n");
            TextTable pts = new TextTable().addRow("figure", "decimal", "enclosure width");
            Continuous.points(r).forEach(pts::addRow);
            sb.append(pts.render());
        }
    }

    @Override
    public String symbolicAvailability(org.qchain.result.SymbolicAvailabilityResult r) {
        StringBuilder sb = new StringBuilder(Continuous.symbolicTitle(r)).append('\n');
        if (!r.substituted().isEmpty()) {
            sb.append("Substituted before solving (").append(r.substitutedOrigin()).append("): ")
                .append(r.substitutedText()).append('\n');
        }
        sb.append('\n');
        TextTable table = new TextTable().addRow("figure", "formula");
        Continuous.formulas(r).forEach(f -> table.addRow(f.name(), f.plain()));
        sb.append(table.render());
        if (!r.conditions().isEmpty()) {
            sb.append('\n').append(Continuous.CONDITIONS).append('\n');
            TextTable c = new TextTable("  ");
            r.conditions().forEach(x -> c.addRow(x.plain(), Continuous.proof(x)));
            sb.append(c.render());
        }
        r.atPoint().ifPresent(a -> {
            sb.append('\n').append("Values at ").append(a.at().map(p -> p.text() + " (" + p.origin() + ")")
                .orElse("the point")).append(", exactly (the formulas evaluated there):\n");
            figures(sb, a);
        });
        sb.append('\n').append(Continuous.UNITS).append('\n');
        return end(sb);
    }

    @Override
    public String rateSens(RateSensResult r) {
        StringBuilder sb = new StringBuilder();
        sb.append("Sensitivity of ").append(Continuous.figureName(r)).append(" to ").append(r.wrt()).append(" in ")
            .append(r.source()).append(" at ").append(r.point().text()).append(" (exact)\n\n");
        TextTable table = new TextTable().addRow("quantity", "decimal", "exact");
        Continuous.sensRows(r, digits).forEach(x -> table.addRow(x.get(0), x.get(2), x.get(1)));
        sb.append(table.render());
        r.sweep().ifPresent(w -> {
            String f = Continuous.figureName(r);
            sweep(sb, w, f, "d(" + f + ")/d" + r.wrt(), java.util.Optional.of(r::elasticity));
            sb.append("Elasticity: (").append(r.wrt()).append("/figure) d/d").append(r.wrt()).append(".\n");
        });
        return end(sb);
    }

    @Override
    public String transientSens(org.qchain.result.TransientSensResult r) {
        StringBuilder sb = new StringBuilder(Continuous.transientSensTitle(r)).append("\n\n");
        TextTable table = new TextTable().addRow("t", "quantity", "decimal", "enclosure width");
        Continuous.transientSensRows(r).forEach(x -> table.addRow(x.subList(0, 4)));
        sb.append(table.render());
        sb.append("Every digit shown is proven: the value lies in an interval of the width shown, all of whose points"
            + " round to it.\nElasticity: (").append(r.wrt()).append("/P) dP/d").append(r.wrt()).append(".\n");
        r.warnings().forEach(w -> sb.append("Warning: ").append(w).append('\n'));
        return end(sb);
    }

    // --- classes, longrun, absorb --------------------------------------------------------------------------------

    @Override
    String render(Sections.Doc d) {
        StringBuilder sb = new StringBuilder(d.heading()).append('\n');
        for (String n : d.notes()) {
            sb.append(n).append('\n');
        }
        for (Sections.Table t : d.tables()) {
            sb.append('\n').append(t.title()).append('\n');
            TextTable tt = new TextTable("  ");
            tt.addRow(t.header());
            List<String> texts = plainTexts(t.rows().stream().flatMap(List::stream).toList());
            int k = 0;
            for (java.util.List<org.qchain.result.Formula> row : t.rows()) {
                List<String> cells = new ArrayList<>(row.size());
                for (org.qchain.result.Formula f : row) {
                    cells.add(cell(f, texts.get(k++)));
                }
                tt.addRow(cells);
            }
            sb.append(tt.render());
        }
        return sb.append('\n').append(Caution.TEXT).append('\n').toString();
    }

    /** A table cell: the plain text of {@code f}, with the decimal after a fraction. */
    private String cell(org.qchain.result.Formula f, String plain) {
        return Sections.exact(f).filter(r -> !r.isInteger()).map(r -> plain + " (" + dec(r) + ")").orElse(plain);
    }

    // --- distributions after n steps -----------------------------------------------------------------------------

    @Override
    public String distribution(DistributionResult r) {
        StringBuilder sb = new StringBuilder();
        String steps = Distributions.steps(r);
        String what = Distributions.what(r, steps);
        sb.append(Distributions.title(r)).append(" for ").append(r.source()).append(" (").append(r.kind())
            .append(" chain)\n");
        sb.append(Character.toUpperCase(what.charAt(0))).append(what.substring(1)).append(", ")
            .append(Distributions.start(r)).append(".\n");
        sb.append(parameters(r.point()));
        List<String> cols = Distributions.columns(r);
        if (!r.series()) {
            DistributionResult.Line line = r.lines().get(0);
            if (r.to().isEmpty()) {
                sb.append("Decimals: ").append(Text.digits(digits)).append(".\n\n");
                TextTable t = new TextTable().addRow("to", "decimal", "exact");
                for (int j = 0; j < cols.size(); j++) {
                    Rational e = line.distribution().get(j);
                    t.addRow(cols.get(j), dec(e), DecimalText.toString(e));
                }
                sb.append(t.render());
            } else {
                Rational v = line.total().orElseThrow();
                sb.append("  exact    ").append(DecimalText.toString(v)).append('\n');
                sb.append("  decimal  ").append(dec(v)).append("  (").append(Text.digits(digits)).append(")\n");
            }
            return end(sb);
        }
        if (r.to().isEmpty()) {
            sb.append("\nDecimals (").append(Text.digits(digits)).append("):\n");
            TextTable overview = new TextTable();
            List<String> head = new ArrayList<>();
            head.add("n");
            head.addAll(cols);
            overview.addRow(head);
            for (DistributionResult.Line line : r.lines()) {
                List<String> row = new ArrayList<>();
                row.add(String.valueOf(line.n()));
                line.distribution().forEach(e -> row.add(dec(e)));
                overview.addRow(row);
            }
            sb.append(overview.render()).append("\nExact values:\n");
            TextTable list = new TextTable().addRow("n", "to", "decimal", "exact");
            for (DistributionResult.Line line : r.lines()) {
                for (int j = 0; j < cols.size(); j++) {
                    Rational e = line.distribution().get(j);
                    list.addRow(String.valueOf(line.n()), cols.get(j), dec(e), DecimalText.toString(e));
                }
            }
            sb.append(list.render());
        } else {
            sb.append("Decimals: ").append(Text.digits(digits)).append(".\n\n");
            TextTable t = new TextTable().addRow("n", "decimal", "exact");
            for (DistributionResult.Line line : r.lines()) {
                Rational v = line.total().orElseThrow();
                t.addRow(String.valueOf(line.n()), dec(v), DecimalText.toString(v));
            }
            sb.append(t.render());
        }
        return end(sb);
    }
}
