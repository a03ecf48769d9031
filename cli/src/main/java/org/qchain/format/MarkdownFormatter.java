package org.qchain.format;

import java.util.ArrayList;
import java.util.List;
import org.qchain.exact.Rational;
import org.qchain.exact.certified.CertifiedDecimal;
import org.qchain.exact.reference.EntryCheck;
import org.qchain.exact.reference.VerifyReport;
import org.qchain.result.AvailabilityResult;
import org.qchain.result.CertifiedStepResult;
import org.qchain.result.RateSensResult;
import org.qchain.result.TransientResult;
import org.qchain.result.CheckResult;
import org.qchain.result.Formula;
import org.qchain.result.DistributionResult;
import org.qchain.result.ClosedResult;
import org.qchain.result.SensResult;
import org.qchain.result.StepResult;
import org.qchain.result.SymbolicStepResult;
import org.qchain.result.VerifyResult;

/** Markdown (pipe tables) for pasting into reports: exact values and decimals in tables, then the caution. */
final class MarkdownFormatter extends DocLayout {
    MarkdownFormatter(int digits) {
        super(digits);
    }

    private static String caution(StringBuilder sb) {
        return sb.append("\n*").append(Caution.TEXT).append("*\n").toString();
    }

    /** {@code Parameters at w=1/10 (given with --at).} and a blank line, or nothing without parameters. */
    private static String parameters(StepResult.Header h) {
        return h.point().map(p -> "Parameters at " + Text.markdown(p.text()) + " (" + p.origin() + ").\n\n")
            .orElse("");
    }

    private static List<String> separator(int n) {
        List<String> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            out.add("---");
        }
        return out;
    }

    private static void line(StringBuilder sb, List<String> cells) {
        sb.append("| ").append(String.join(" | ", cells)).append(" |\n");
    }

    // --- step ----------------------------------------------------------------------------------------------------

    @Override
    public String stepMatrix(StepResult.Matrix m) {
        StepResult.Header h = m.header();
        StringBuilder sb = new StringBuilder();
        sb.append("**").append(Text.power(h.n())).append("** for `").append(Text.code(h.source())).append("` (")
            .append(h.kind()).append(" chain): row = state at the start, column = state after ")
            .append(Text.steps(h.n())).append(".\n\n").append(parameters(h));
        sb.append("Exact:\n\n");
        grid(sb, m, true);
        sb.append("\nDecimal (").append(Text.digits(digits)).append("):\n\n");
        grid(sb, m, false);
        return caution(sb);
    }

    private void grid(StringBuilder sb, StepResult.Matrix m, boolean exact) {
        List<String> head = new ArrayList<>();
        head.add("from \\ to");
        for (String s : m.states()) {
            head.add(Text.markdown(s));
        }
        line(sb, head);
        line(sb, separator(head.size()));
        for (int i = 0; i < m.states().size(); i++) {
            List<String> cells = new ArrayList<>();
            cells.add("**" + Text.markdown(m.states().get(i)) + "**");
            for (Rational e : m.entries().get(i)) {
                cells.add(exact ? Text.markdown(e.toString()) : dec(e));
            }
            line(sb, cells);
        }
    }

    @Override
    public String stepRow(StepResult.Row r) {
        StepResult.Header h = r.header();
        StringBuilder sb = new StringBuilder();
        sb.append("Row **").append(Text.markdown(r.from())).append("** of **").append(Text.power(h.n()))
            .append("** for `").append(Text.code(h.source())).append("` (").append(h.kind())
            .append(" chain): probability of each state after ").append(Text.steps(h.n()))
            .append(".\n\n").append(parameters(h));
        line(sb, List.of("to", "exact", "decimal"));
        line(sb, separator(3));
        for (int j = 0; j < r.states().size(); j++) {
            Rational e = r.entries().get(j);
            line(sb, List.of(Text.markdown(r.states().get(j)), Text.markdown(e.toString()), dec(e)));
        }
        sb.append("\nDecimals: ").append(Text.digits(digits)).append(".\n");
        return caution(sb);
    }

    @Override
    public String stepSingle(StepResult.Single s) {
        StepResult.Header h = s.header();
        StringBuilder sb = new StringBuilder(parameters(h));
        line(sb, List.of("model", "n", "from", "to", "exact", "decimal"));
        line(sb, separator(6));
        line(sb, List.of("`" + Text.code(h.source()) + "`", String.valueOf(h.n()), Text.markdown(s.from()),
            Text.markdown(s.to()), Text.markdown(s.value().toString()), dec(s.value())));
        s.paths().ifPresent(paths -> {
            sb.append("\nMost probable paths of ").append(Text.steps(h.n())).append(" from ")
                .append(Text.markdown(s.from())).append(" to ").append(Text.markdown(s.to())).append(":\n\n");
            line(sb, List.of("rank", "path", "probability", "decimal", "share", "percent"));
            line(sb, separator(6));
            for (int k = 0; k < paths.size(); k++) {
                StepResult.PathLine p = paths.get(k);
                line(sb, List.of(String.valueOf(k + 1), Text.markdown(String.join(" \u2192 ", p.states())),
                    Text.markdown(p.probability().toString()), dec(p.probability()),
                    Text.markdown(p.share().toString()), Text.percent(p.share(), digits) + " %"));
            }
        });
        sb.append("\nDecimals: ").append(Text.digits(digits)).append(".\n");
        return caution(sb);
    }

    // --- symbolic step -----------------------------------------------------------------------------------------

    @Override
    public String certifiedStep(CertifiedStepResult r) {
        StepResult.Header h = r.header();
        StringBuilder sb = new StringBuilder();
        sb.append("**").append(Text.power(h.n())).append("** for `").append(Text.code(h.source())).append("` (")
            .append(h.kind()).append(" chain): certified decimals, every digit proven by an enclosure of the exact"
                + " value.\n\n");
        line(sb, List.of("from", "to", "decimal", "certified", "enclosure width"));
        line(sb, separator(5));
        for (int i = 0; i < r.rows().size(); i++) {
            for (int j = 0; j < r.columns().size(); j++) {
                CertifiedDecimal d = r.values().get(i).get(j);
                line(sb, List.of(Text.markdown(r.rows().get(i)), Text.markdown(r.columns().get(j)),
                    Text.markdown(d.text()), CertifiedStepResult.statusWord(d),
                    CertifiedStepResult.widthText(d.enclosure().width())));
            }
        }
        sb.append("\nDecimals: ").append(Text.digits(r.digits())).append("; largest enclosure width ")
            .append(CertifiedStepResult.widthText(r.maxWidth())).append(".\n");
        return caution(sb);
    }

    @Override
    public String symbolicStep(SymbolicStepResult r) {
        StringBuilder sb = new StringBuilder();
        sb.append("**").append(Symbolic.what(r)).append("** for `").append(Text.code(r.source())).append("` (")
            .append(r.kind()).append(" chain) as ").append(Symbolic.functionsOf(r)).append(", ")
            .append(Symbolic.formText(r.factored())).append(".\n\n");
        boolean values = r.values().isPresent();
        if (values) {
            sb.append("Values at ").append(r.point().orElseThrow().text())
                .append(" (").append(r.point().orElseThrow().origin()).append("); decimals: ").append(Text.digits(digits))
                .append(".\n\n");
        }
        sb.append(values ? "| from | to | formula | exact | decimal |\n| --- | --- | --- | --- | --- |\n"
            : "| from | to | formula |\n| --- | --- | --- |\n");
        Symbolic.forEachCell(r, (i, j) -> {
            sb.append("| ").append(Text.markdown(r.rows().get(i))).append(" | ")
                .append(Text.markdown(r.columns().get(j))).append(" | `")
                .append(Text.code(r.formulas().get(i).get(j).plain())).append("` |");
            if (values) {
                Rational e = r.values().get().get(i).get(j);
                sb.append(' ').append(e).append(" | ").append(dec(e)).append(" |");
            }
            sb.append('\n');
        });
        return caution(sb);
    }

    // --- sens --------------------------------------------------------------------------------------------------

    @Override
    public String sens(SensResult s) {
        StringBuilder sb = new StringBuilder();
        sb.append("Sensitivity of **").append(Text.markdown(Symbolic.entryName(s))).append("** to ")
            .append(String.join(", ", s.gradient().stream().map(g -> "`" + Text.code(g.wrt()) + "`").toList()))
            .append(" for `").append(Text.code(s.source())).append("` (").append(s.kind()).append(" chain).\n\n");
        sb.append("| quantity | formula |\n| --- | --- |\n");
        sb.append("| P | `").append(Text.code(s.probability().plain())).append("` |\n");
        for (SensResult.Partial g : s.gradient()) {
            sb.append("| dP/d").append(g.wrt()).append(" | `").append(Text.code(g.derivative().plain()))
                .append("` |\n");
        }
        if (s.at().isPresent()) {
            SensResult.AtPoint a = s.at().get();
            sb.append("\nAt ").append(a.point().text()).append(" (").append(a.point().origin()).append("):\n\n");
            sb.append("| quantity | exact | decimal |\n| --- | --- | --- |\n");
            sb.append("| P | ").append(a.probability()).append(" | ").append(dec(a.probability())).append(" |\n");
            if (s.isGradient()) {
                sb.append("\nGradient, one row per parameter x; elasticity (x/P) dP/dx:\n\n");
                sb.append("| x | dP/dx exact | dP/dx | elasticity exact | elasticity |\n"
                    + "| --- | --- | --- | --- | --- |\n");
                for (SensResult.Partial g : s.gradient()) {
                    Rational d = g.value().orElseThrow();
                    sb.append("| ").append(g.wrt()).append(" | ").append(d).append(" | ").append(dec(d)).append(" | ")
                        .append(g.elasticity().map(Rational::toString).orElse("")).append(" | ")
                        .append(g.elasticity().map(this::dec).orElse("undefined (P = 0)")).append(" |\n");
                }
            } else {
                sb.append("| dP/d").append(s.wrt()).append(" | ").append(a.derivative()).append(" | ")
                    .append(dec(a.derivative())).append(" |\n");
                a.elasticity().ifPresent(e -> sb.append("| elasticity | ").append(e).append(" | ").append(dec(e))
                    .append(" |\n"));
            }
        }
        s.sweep().ifPresent(w -> sweep(sb, w, "P", "dP/d" + s.wrt(), java.util.Optional.empty()));
        if (s.at().isPresent() || s.sweep().isPresent()) {
            sb.append("\nDecimals: ").append(Text.digits(digits)).append(".\n");
        }
        return caution(sb);
    }

    /** A sweep table: the parameter, decimals, then exact values; an elasticity column where one is given. */
    private void sweep(StringBuilder sb, SensResult.Sweep w, String value, String derivative,
                       java.util.Optional<java.util.function.Function<SensResult.SweepLine, java.util.Optional<Rational>>> elasticity) {
        List<String> head = sweepHead(w.parameter(), value, derivative, elasticity.isPresent());
        sb.append("\nSweep ").append(w.range()).append(":\n\n| ").append(String.join(" | ", head)).append(" |\n|")
            .append(" --- |".repeat(head.size())).append('\n');
        for (SensResult.SweepLine l : w.lines()) {
            List<String> row = sweepCells(l, elasticity);
            sb.append("| ").append(String.join(" | ", row)).append(" |\n");
        }
    }

    // --- closed ------------------------------------------------------------------------------------------------

    @Override
    public String closed(ClosedResult r) {
        StringBuilder sb = new StringBuilder();
        sb.append("**").append(Closed.pn(r)).append("** for `").append(Text.code(r.source()))
            .append("` (").append(Closed.chain(r)).append("): ").append(Closed.what(r));
        if (!r.isSeries()) {
            sb.append("; valid for ").append(r.names().step()).append(" ≥ ").append(r.validFrom());
            if (!r.conditions().isEmpty()) {
                List<String> c = new ArrayList<>();
                for (org.qchain.result.Condition s : r.conditions()) {
                    c.add("`" + Text.code(s.plain()) + "`");
                }
                sb.append(" where ").append(String.join(", ", c));
            }
        }
        sb.append('.').append(Closed.domainNote(r));
        if (!Closed.symbolsNote(r).isEmpty()) {
            sb.append(' ').append(Closed.symbolsNote(r));
        }
        if (!Closed.factoredNote(r).isEmpty()) {
            sb.append(' ').append(Closed.factoredNote(r));
        }
        if (!Closed.combinationNote(r).isEmpty()) {
            sb.append(' ').append(Text.markdown(Closed.combinationNote(r)));
        }
        if (!r.substituted().isEmpty()) {
            sb.append(" Substituted before solving (given with --at): `").append(Text.code(r.substitutedText()))
                .append("`.");
        }
        sb.append("\n\n");
        sb.append("| from | to | ").append(r.form() == ClosedResult.Form.GF ? "G(" + r.names().series() + ")"
                : (r.form() == ClosedResult.Form.RECURRENCE ? "recurrence" : Closed.pn(r)))
            .append(" |\n| --- | --- | --- |\n");
        for (int i = 0; i < r.rows().size(); i++) {
            for (int j = 0; j < r.cols().size(); j++) {
                sb.append("| ").append(Text.markdown(r.rows().get(i))).append(" | ")
                    .append(Text.markdown(r.cols().get(j))).append(" | `")
                    .append(Text.code(Closed.shown(r, r.shownCells().get(i).get(j).plain()))).append("` |\n");
            }
        }
        if (!r.where().isEmpty()) {
            sb.append("\n`").append(Text.code(Closed.whereLine(r))).append("`\n");
        }
        if (r.continuous()) {
            sb.append('\n').append(Text.markdown(Closed.transformHeading(r))).append(":\n\n| from | to | L(")
                .append(Text.markdown(r.transformSymbol())).append(") |\n| --- | --- | --- |\n");
            for (int i = 0; i < r.rows().size(); i++) {
                for (int j = 0; j < r.cols().size(); j++) {
                    sb.append("| ").append(Text.markdown(r.rows().get(i))).append(" | ")
                        .append(Text.markdown(r.cols().get(j))).append(" | `")
                        .append(Text.code(r.transforms().get(i).get(j).plain())).append("` |\n");
                }
            }
        }
        if (!r.eigenvalues().isEmpty()) {
            sb.append("\nEigenvalues:\n\n");
            for (ClosedResult.Eigen e : r.eigenvalues()) {
                sb.append("- `").append(Text.code(Closed.eigenValues(r, e))).append("` from `")
                    .append(Text.code(e.factor().plain())).append('`');
                if (e.multiplicity() > 1) {
                    sb.append(", multiplicity ").append(e.multiplicity());
                }
                if (e.jordanIndex() > 1) {
                    sb.append(", Jordan block of size ").append(e.jordanIndex());
                }
                String dec = Closed.eigenDecimals(r, e);
                if (!dec.isEmpty()) {
                    sb.append(" ≈ ").append(dec).append(Text.markdown(Closed.pointNote(r)));
                }
                sb.append('\n');
            }
            for (ClosedResult.Roots rt : r.roots()) {
                sb.append("- `").append(rt.name()).append(" = ").append(Text.code(rt.polynomial().plain())).append('`');
                if (!rt.roots().isEmpty()) {
                    sb.append(": roots ").append(String.join(", ", Closed.decimals(rt.roots(), r.digits())));
                }
                sb.append('\n');
            }
        }
        r.longRun().ifPresent(lr -> {
            boolean periodic = lr.periodic();
            List<List<List<String>>> dec = Closed.limitDecimals(r, lr);
            boolean decimals = !dec.isEmpty();
            sb.append("\nLong run: ").append(Text.markdown(Closed.longRunHeading(r, lr))).append(":\n\n| ")
                .append(periodic ? r.names().step() + " | " : "")
                .append("from | to | limit |").append(decimals ? " decimal |" : "").append("\n| ")
                .append(periodic ? "--- | " : "").append("--- | --- | --- |").append(decimals ? " ---: |" : "")
                .append('\n');
            for (int k = 0; k < lr.limits().size(); k++) {
                for (int i = 0; i < r.rows().size(); i++) {
                    for (int j = 0; j < r.cols().size(); j++) {
                        sb.append("| ").append(periodic ? Text.markdown(Closed.subsequenceIndex(r, lr, k)) + " | " : "")
                            .append(Text.markdown(r.rows().get(i))).append(" | ")
                            .append(Text.markdown(r.cols().get(j))).append(" | `")
                            .append(Text.code(lr.limits().get(k).get(i).get(j).plain())).append("` |")
                            .append(decimals ? " " + dec.get(k).get(i).get(j) + " |" : "").append('\n');
                    }
                }
            }
            if (decimals) {
                sb.append("\nDecimals").append(Text.markdown(Closed.pointNote(r))).append(", ").append(r.digits())
                    .append(" significant digits.\n");
            }
            String note = Closed.longRunNote(lr);
            if (!note.isEmpty()) {
                sb.append('\n').append(Text.markdown(note)).append('\n');
            }
            sb.append('\n').append(Text.markdown(Closed.rateLine(r, lr)));
            if (!lr.exact()) {
                lr.rateValue().ifPresent(v -> sb.append(" = ").append(Closed.real(r, v))
                    .append(r.point().map(p -> " at " + p.text()).orElse("")));
            }
            sb.append(".\n");
        });
        return caution(sb);
    }

    // --- check -------------------------------------------------------------------------------------------------

    @Override
    String generatorCheck(CheckResult.Generator g) {
        StringBuilder sb = new StringBuilder("**").append(Text.markdown(Continuous.generatorTitle(g))).append("**");
        g.at().ifPresent(p -> sb.append("; parameters at ").append(Text.markdown(p.text())).append(" (")
            .append(p.origin()).append(")"));
        sb.append("\n\n").append(Text.markdown(Continuous.GENERATOR_NOTE)).append("\n\n");
        List<String> head = new ArrayList<>(List.of("from\\to"));
        g.states().forEach(s -> head.add(Text.markdown(s)));
        line(sb, head);
        line(sb, separator(head.size()));
        for (int i = 0; i < g.states().size(); i++) {
            List<String> row = new ArrayList<>(List.of(Text.markdown(g.states().get(i))));
            for (Formula f : g.entries().get(i)) {
                String d = Continuous.decimalOf(f, digits);
                row.add("`" + Text.code(f.plain()) + "`" + (g.symbolic() || d.equals(f.plain()) ? "" : " (" + d + ")"));
            }
            line(sb, row);
        }
        sb.append('\n');
        line(sb, List.of("state", "total rate out q_i", "mean holding time 1/q_i"));
        line(sb, separator(3));
        for (List<String> r : Continuous.stateRows(g, digits)) {
            line(sb, List.of(Text.markdown(r.get(0)), cell(r.get(1), r.get(2)), cell(r.get(3), r.get(4))));
        }
        Continuous.upDown(g).ifPresent(u -> sb.append('\n').append(Text.markdown(u)).append('\n'));
        if (!g.warnings().isEmpty()) {
            sb.append('\n').append(Text.markdown(Continuous.RATE_CONDITIONS)).append("\n\n");
            g.warnings().forEach(w -> sb.append("- ").append(Text.markdown(w)).append('\n'));
        }
        sb.append('\n').append(Text.markdown(Continuous.generatorVerdict(g))).append('\n');
        return caution(sb);
    }

    /** An exact value or formula in code, with its decimal beside it when that differs. */
    private static String cell(String exact, String decimal) {
        return "`" + Text.code(exact) + "`" + (decimal.isEmpty() || decimal.equals(exact) ? "" : " (" + decimal + ")");
    }

    @Override
    String symbolicCheck(CheckResult.Symbolic s) {
        StringBuilder sb = new StringBuilder();
        sb.append("One-step matrix of `").append(Text.code(s.source())).append("` (").append(s.kind())
            .append(" chain) as exact rational functions of ")
            .append(s.parameters().isEmpty() ? "(no parameters)" : String.join(", ", s.parameters()))
            .append(".\n\n| from | to | entry |\n| --- | --- | --- |\n");
        for (int i = 0; i < s.states().size(); i++) {
            for (int j = 0; j < s.states().size(); j++) {
                sb.append("| ").append(Text.markdown(s.states().get(i))).append(" | ")
                    .append(Text.markdown(s.states().get(j))).append(" | `")
                    .append(Text.code(s.entries().get(i).get(j).plain())).append("` |\n");
            }
        }
        if (!s.warnings().isEmpty()) {
            sb.append("\nConditions:\n\n");
            for (String w : s.warnings()) {
                sb.append("- ").append(Text.markdown(w)).append('\n');
            }
        }
        return caution(sb);
    }

    // --- verify --------------------------------------------------------------------------------------------------

    @Override
    public String verify(VerifyResult r) {
        VerifyReport rep = r.report();
        StringBuilder sb = new StringBuilder();
        sb.append("**").append(Text.markdown(Checks.quantity(r))).append("** of `").append(Text.code(r.source()))
            .append("` checked against `").append(Text.code(r.against())).append("` (")
            .append(rep.form().description()).append("): **").append(rep.passed() ? "pass" : "fail").append("**, ")
            .append(Checks.verdict(rep)).append(". Tolerance: ").append(Checks.tolerance(rep.tolerance()))
            .append(".\n\n");
        if (!rep.worst().isEmpty()) {
            line(sb, List.of("entry", "given", "exact (" + digits + " digits)", "error", "relative error", "ulps",
                "at", "status"));
            line(sb, separator(8));
            for (EntryCheck c : rep.worst()) {
                line(sb, List.of(Text.markdown(c.label()), "`" + Text.code(c.given()) + "`", dec(c.truth()),
                    Checks.error(c.error()), Checks.error(c.relativeError()), Checks.ulpsCell(c), Checks.place(c),
                    Checks.status(c)));
            }
            sb.append('\n');
        }
        sb.append(Checks.summary(rep)).append(".\n");
        return caution(sb);
    }

    // --- continuous chains ---------------------------------------------------------------------------------------

    @Override
    public String transientProbabilities(TransientResult r) {
        StringBuilder sb = new StringBuilder();
        sb.append("**P(t)** for `").append(Text.code(r.source())).append("` (continuous chain): row = state at the")
            .append(" start, column = state at time t; certified decimals (").append(Text.digits(digits)).append(").\n");
        for (TransientResult.AtTime at : r.times()) {
            sb.append("\nt = ").append(at.t()).append(":\n\n");
            List<List<String>> g = Continuous.grid(r, at);
            line(sb, g.get(0).stream().map(Text::markdown).toList());
            line(sb, separator(g.get(0).size()));
            g.subList(1, g.size()).forEach(row -> line(sb, row.stream().map(Text::markdown).toList()));
            sb.append("\n").append(Continuous.boundSentence(at)).append(".\n");
        }
        return caution(sb);
    }

    @Override
    public String symbolicTransient(org.qchain.result.SymbolicTransientResult r) {
        StringBuilder sb = new StringBuilder();
        sb.append(Text.markdown(Continuous.symbolicTitle(r))).append(". ").append(Text.markdown(Continuous.symbolicValidity(r)))
            .append("\n\n| from | to | P(").append(Text.markdown(r.timeSymbol())).append(") |\n| --- | --- | --- |\n");
        for (int i = 0; i < r.rows().size(); i++) {
            for (int j = 0; j < r.states().size(); j++) {
                sb.append("| ").append(Text.markdown(r.rows().get(i))).append(" | ").append(Text.markdown(r.states().get(j)))
                    .append(" | `").append(Text.code(Continuous.symbolicShown(r, r.shownCells().get(i).get(j).plain(), true)))
                    .append("` |\n");
            }
        }
        if (!r.where().isEmpty()) {
            sb.append("\n`").append(Text.code(Continuous.symbolicWhere(r, true))).append("`\n");
        }
        for (int k = 0; k < r.times().size(); k++) {
            org.qchain.result.SymbolicTransientResult.AtTime at = r.times().get(k);
            List<List<org.qchain.exact.certified.CertifiedDecimal>> dec = Continuous.symbolicDecimals(r, k);
            sb.append("\n").append(Text.markdown(r.timeSymbol())).append(" = ").append(at.t()).append(":\n\n| from | to | P("
                + at.t() + ") |").append(dec.isEmpty() ? "" : " decimal |").append("\n| --- | --- | --- |")
                .append(dec.isEmpty() ? "" : " ---: |").append('\n');
            for (int i = 0; i < r.rows().size(); i++) {
                for (int j = 0; j < r.states().size(); j++) {
                    sb.append("| ").append(Text.markdown(r.rows().get(i))).append(" | ")
                        .append(Text.markdown(r.states().get(j))).append(" | `")
                        .append(Text.code(Continuous.symbolicShown(r, at.cells().get(i).get(j).plain(), true))).append("` |")
                        .append(dec.isEmpty() ? "" : " " + dec.get(i).get(j).text() + " |").append('\n');
                }
            }
            String note = Continuous.symbolicDecimalNote(r, k);
            if (!note.isEmpty()) {
                sb.append('\n').append(Text.markdown(note)).append(".\n");
            }
        }
        return caution(sb);
    }

    @Override
    public String availability(AvailabilityResult r) {
        StringBuilder sb = new StringBuilder();
        sb.append("**Availability** of `").append(Text.code(r.source())).append("` (up: ")
            .append(Text.markdown(String.join(", ", r.up()))).append(")")
            .append(r.at().map(p -> "; parameters at " + Text.markdown(p.text()) + " (" + p.origin() + ")").orElse(""))
            .append("\n\n");
        line(sb, List.of("figure", "exact", "decimal"));
        line(sb, separator(3));
        Continuous.figures(r, digits).forEach(f -> line(sb, f.stream().map(Text::markdown).toList()));
        Continuous.points(r).forEach(p -> line(sb, List.of(Text.markdown(p.get(0)), "", p.get(1))));
        return caution(sb);
    }

    @Override
    public String symbolicAvailability(org.qchain.result.SymbolicAvailabilityResult r) {
        StringBuilder sb = new StringBuilder();
        sb.append("**Availability** of `").append(Text.code(r.source())).append("` (up: ")
            .append(Text.markdown(String.join(", ", r.up()))).append("; formulas in ")
            .append(Text.markdown(r.parameters().isEmpty() ? "no parameter" : String.join(", ", r.parameters())))
            .append(")");
        if (!r.substituted().isEmpty()) {
            sb.append(" Substituted before solving (").append(Text.markdown(r.substitutedOrigin())).append("): `")
                .append(Text.code(r.substitutedText())).append("`.");
        }
        sb.append("\n\n");
        line(sb, List.of("figure", "formula"));
        line(sb, separator(2));
        Continuous.formulas(r).forEach(f -> line(sb, List.of(Text.markdown(f.name()),
            f.formula().isPresent() ? "`" + Text.code(f.plain()) + "`" : Text.markdown(f.plain()))));
        if (!r.conditions().isEmpty()) {
            sb.append('\n').append(Text.markdown(Continuous.CONDITIONS)).append("\n\n");
            r.conditions().forEach(c -> sb.append("- `").append(Text.code(c.plain())).append("`: ")
                .append(Text.markdown(Continuous.proof(c))).append('\n'));
        }
        r.atPoint().ifPresent(a -> {
            sb.append("\nValues at ").append(Text.markdown(a.at().map(p -> p.text() + " (" + p.origin() + ")")
                .orElse("the point"))).append(", exactly:\n\n");
            line(sb, List.of("figure", "exact", "decimal"));
            line(sb, separator(3));
            Continuous.figures(a, digits).forEach(f -> line(sb, f.stream().map(Text::markdown).toList()));
            Continuous.points(a).forEach(p -> line(sb, List.of(Text.markdown(p.get(0)), "", p.get(1))));
        });
        return caution(sb);
    }

    @Override
    public String rateSens(RateSensResult r) {
        StringBuilder sb = new StringBuilder();
        sb.append("**Sensitivity** of ").append(Text.markdown(Continuous.figureName(r))).append(" to `")
            .append(Text.code(r.wrt())).append("` in `").append(Text.code(r.source())).append("` at ")
            .append(Text.markdown(r.point().text())).append("\n\n");
        line(sb, List.of("quantity", "exact", "decimal"));
        line(sb, separator(3));
        Continuous.sensRows(r, digits).forEach(x -> line(sb, x.stream().map(Text::markdown).toList()));
        r.sweep().ifPresent(w -> {
            String f = Text.markdown(Continuous.figureName(r));
            sweep(sb, w, f, "d(" + f + ")/d" + r.wrt(), java.util.Optional.of(r::elasticity));
        });
        return caution(sb);
    }

    @Override
    public String transientSens(org.qchain.result.TransientSensResult r) {
        StringBuilder sb = new StringBuilder("**").append(Text.markdown(Continuous.transientSensTitle(r)))
            .append("**\n\n");
        line(sb, List.of("t", "quantity", "decimal", "enclosure width"));
        line(sb, separator(4));
        Continuous.transientSensRows(r).forEach(x -> line(sb, x.subList(0, 4).stream().map(Text::markdown).toList()));
        sb.append("\nEvery digit shown is proven.\n");
        r.warnings().forEach(w -> sb.append("\nWarning: ").append(Text.markdown(w)).append('\n'));
        return caution(sb);
    }

    // --- classes, longrun, absorb --------------------------------------------------------------------------------

    @Override
    String render(Sections.Doc d) {
        StringBuilder sb = new StringBuilder("**").append(Text.markdown(d.heading())).append("**\n");
        for (String n : d.notes()) {
            sb.append("\n- ").append(Text.markdown(n));
        }
        if (!d.notes().isEmpty()) {
            sb.append('\n');
        }
        for (Sections.Table t : d.tables()) {
            sb.append("\n*").append(Text.markdown(t.title())).append("*\n\n| ");
            sb.append(String.join(" | ", t.header().stream().map(Text::markdown).toList())).append(" |\n| ");
            sb.append(String.join(" | ", separator(t.header().size()))).append(" |\n");
            for (List<org.qchain.result.Formula> row : t.rows()) {
                sb.append("| ").append(String.join(" | ", row.stream().map(this::cell).toList())).append(" |\n");
            }
        }
        return caution(sb);
    }

    private String cell(org.qchain.result.Formula f) {
        if (f instanceof org.qchain.result.Formula.Printed p && p.latex().startsWith("\\text{")) {
            return Text.markdown(f.plain());
        }
        return f.plain().isEmpty() ? "" : "`" + Text.code(f.plain()) + "`";
    }

    // --- distributions after n steps -----------------------------------------------------------------------------

    @Override
    public String distribution(DistributionResult r) {
        StringBuilder sb = new StringBuilder();
        String what = Distributions.what(r, Distributions.steps(r));
        sb.append(Character.toUpperCase(what.charAt(0))).append(Text.markdown(what.substring(1)))
            .append(" for `").append(Text.code(r.source())).append("` (")
            .append(r.kind()).append(" chain), ").append(Text.markdown(Distributions.start(r)));
        String at = Distributions.point(r);
        sb.append(at.isEmpty() ? "" : "; parameters " + Text.markdown(at)).append(".\n\n");
        List<String> cols = Distributions.columns(r);
        if (!r.series()) {
            line(sb, List.of("to", "exact", "decimal"));
            line(sb, separator(3));
            List<Rational> cells = Distributions.cells(r, r.lines().get(0));
            for (int j = 0; j < cols.size(); j++) {
                Rational e = cells.get(j);
                line(sb, List.of(Text.markdown(cols.get(j)), Text.markdown(e.toString()), dec(e)));
            }
        } else {
            for (boolean exact : new boolean[] {true, false}) {
                sb.append(exact ? "Exact:\n\n" : "\nDecimal:\n\n");
                List<String> head = new ArrayList<>();
                head.add("n");
                cols.forEach(c -> head.add(Text.markdown(c)));
                line(sb, head);
                line(sb, separator(head.size()));
                for (DistributionResult.Line l : r.lines()) {
                    List<String> row = new ArrayList<>();
                    row.add(String.valueOf(l.n()));
                    Distributions.cells(r, l).forEach(e -> row.add(exact ? Text.markdown(e.toString()) : dec(e)));
                    line(sb, row);
                }
            }
        }
        sb.append("\nDecimals: ").append(Text.digits(digits)).append(".\n");
        return caution(sb);
    }
}
