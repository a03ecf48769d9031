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

/**
 * LaTeX for reports: tabulars with {@code \frac} entries and state names as text (special characters escaped),
 * formulas in {@code align*}, the caution as a comment. Needs no package beyond standard LaTeX and amsmath.
 */
final class LatexFormatter extends DocLayout {
    LatexFormatter(int digits) {
        super(digits);
    }

    /** {@code % parameters at w=1/10 (given with --at)}, or nothing without parameters. */
    private static String parameters(StepResult.Header h) {
        return h.point().map(p -> "% parameters at " + Text.comment(p.text()) + " (" + p.origin() + ")\n").orElse("");
    }

    private static String caution(StringBuilder sb) {
        return sb.append("% ").append(Caution.TEXT).append('\n').toString();
    }

    // --- step ----------------------------------------------------------------------------------------------------

    @Override
    public String stepMatrix(StepResult.Matrix m) {
        StepResult.Header h = m.header();
        StringBuilder sb = new StringBuilder();
        sb.append("% ").append(Text.power(h.n())).append(" for ").append(Text.comment(h.source())).append(" (")
            .append(h.kind()).append(" chain): row = state at the start, column = state after ")
            .append(Text.steps(h.n())).append('\n').append(parameters(h));
        grid(sb, m, true);
        sb.append("% decimals: ").append(Text.digits(digits)).append('\n');
        grid(sb, m, false);
        return caution(sb);
    }

    private void grid(StringBuilder sb, StepResult.Matrix m, boolean exact) {
        int n = m.states().size();
        sb.append("\\begin{tabular}{l|").append("r".repeat(n)).append("}\n");
        sb.append("$P^{").append(m.header().n()).append("}$");
        for (String s : m.states()) {
            sb.append(" & ").append(Text.latex(s));
        }
        sb.append(" \\\\ \\hline\n");
        for (int i = 0; i < n; i++) {
            sb.append(Text.latex(m.states().get(i)));
            for (Rational e : m.entries().get(i)) {
                sb.append(" & ").append(cell(e, exact));
            }
            sb.append(" \\\\\n");
        }
        sb.append("\\end{tabular}\n");
    }

    private String cell(Rational e, boolean exact) {
        return "$" + (exact ? Text.frac(e) : dec(e)) + "$";
    }

    @Override
    public String stepRow(StepResult.Row r) {
        StepResult.Header h = r.header();
        StringBuilder sb = new StringBuilder();
        sb.append("% row ").append(Text.comment(r.from())).append(" of ").append(Text.power(h.n())).append(" for ")
            .append(Text.comment(h.source())).append(" (").append(h.kind()).append(" chain); decimals: ")
            .append(Text.digits(digits)).append('\n').append(parameters(h));
        sb.append("\\begin{tabular}{l|rr}\n");
        sb.append("to & exact & decimal \\\\ \\hline\n");
        for (int j = 0; j < r.states().size(); j++) {
            Rational e = r.entries().get(j);
            sb.append(Text.latex(r.states().get(j))).append(" & ").append(cell(e, true)).append(" & ")
                .append(cell(e, false)).append(" \\\\\n");
        }
        sb.append("\\end{tabular}\n");
        return caution(sb);
    }

    @Override
    public String stepSingle(StepResult.Single s) {
        StepResult.Header h = s.header();
        StringBuilder sb = new StringBuilder();
        sb.append("% ").append(Text.comment(h.source())).append(" (").append(h.kind()).append(" chain); decimals: ")
            .append(Text.digits(digits)).append('\n').append(parameters(h));
        sb.append("$P^{").append(h.n()).append("}(\\text{").append(Text.latex(s.from())).append("}, \\text{")
            .append(Text.latex(s.to())).append("}) = ").append(Text.frac(s.value())).append(" \\approx ")
            .append(dec(s.value())).append("$\n");
        s.paths().ifPresent(paths -> {
            sb.append("\n\\begin{tabular}{rlrr}\n");
            sb.append("rank & path & probability & share \\\\ \\hline\n");
            for (int k = 0; k < paths.size(); k++) {
                StepResult.PathLine p = paths.get(k);
                sb.append(k + 1).append(" & ").append(Text.latex(Paths.compact(p.states())).replace(">", "$\\to$"))
                    .append(" & $").append(Text.frac(p.probability())).append("$ & $")
                    .append(Text.frac(p.share())).append("$ ($").append(Text.percent(p.share(), digits))
                    .append("\\,\\%$) \\\\\n");
            }
            sb.append("\\end{tabular}\n");
        });
        return caution(sb);
    }

    // --- symbolic step -----------------------------------------------------------------------------------------

    @Override
    public String certifiedStep(CertifiedStepResult r) {
        StepResult.Header h = r.header();
        StringBuilder sb = new StringBuilder();
        sb.append("% ").append(Text.power(h.n())).append(" for ").append(Text.comment(h.source())).append(" (")
            .append(h.kind()).append(" chain); certified decimals: ").append(Text.digits(r.digits()))
            .append(", every digit proven; largest enclosure width ")
            .append(CertifiedStepResult.widthText(r.maxWidth())).append('\n');
        sb.append("\\begin{tabular}{ll|rll}\n");
        sb.append("from & to & decimal & certified & enclosure width \\\\ \\hline\n");
        for (int i = 0; i < r.rows().size(); i++) {
            for (int j = 0; j < r.columns().size(); j++) {
                CertifiedDecimal d = r.values().get(i).get(j);
                sb.append(Text.latex(r.rows().get(i))).append(" & ").append(Text.latex(r.columns().get(j)))
                    .append(" & $").append(Text.latex(d.text())).append("$ & ")
                    .append(CertifiedStepResult.statusWord(d)).append(" & $")
                    .append(CertifiedStepResult.widthText(d.enclosure().width())).append("$ \\\\\n");
            }
        }
        sb.append("\\end{tabular}\n");
        return caution(sb);
    }

    @Override
    public String symbolicStep(SymbolicStepResult r) {
        StringBuilder sb = new StringBuilder();
        sb.append("% ").append(Symbolic.what(r)).append(" for ").append(Text.comment(r.source())).append(" (")
            .append(r.kind()).append(" chain): ").append(Symbolic.functionsOf(r)).append(", ")
            .append(Symbolic.formText(r.factored()));
        if (r.values().isPresent()) {
            sb.append("; values at ").append(r.point().orElseThrow().text()).append(", decimals: ")
                .append(Text.digits(digits));
        }
        sb.append("\n\\begin{align*}\n");
        List<String> lines = new ArrayList<>();
        Symbolic.forEachCell(r, (i, j) -> {
            StringBuilder l = new StringBuilder();
            l.append("P^{").append(r.n()).append("}(\\text{").append(Text.latex(r.rows().get(i)))
                .append("}, \\text{").append(Text.latex(r.columns().get(j))).append("}) &= ")
                .append(r.formulas().get(i).get(j).latex());
            if (r.values().isPresent()) {
                Rational e = r.values().get().get(i).get(j);
                l.append(" = ").append(Text.frac(e)).append(" \\approx ").append(dec(e));
            }
            lines.add(l.toString());
        });
        sb.append(String.join(" \\\\\n", lines)).append("\n\\end{align*}\n");
        return caution(sb);
    }

    // --- sens --------------------------------------------------------------------------------------------------

    @Override
    public String sens(SensResult s) {
        StringBuilder sb = new StringBuilder();
        String toTex = s.toStates().size() == 1 ? "\\text{" + Text.latex(s.to()) + "}"
            : "\\{" + String.join(", ", s.toStates().stream().map(t -> "\\text{" + Text.latex(t) + "}").toList())
                + "\\}";
        String p = "P^{" + s.n() + "}(\\text{" + Text.latex(s.from()) + "}, " + toTex + ")";
        String w = s.wrtLatex();
        sb.append("% sensitivity to ").append(String.join(", ", s.gradient().stream().map(SensResult.Partial::wrt)
            .toList())).append(" for ").append(Text.comment(s.source())).append(" (")
            .append(s.kind()).append(" chain)");
        s.at().ifPresent(a -> sb.append("; values at ").append(Text.comment(a.point().text())).append(" (")
            .append(a.point().origin()).append(')'));
        sb.append("\n\\begin{align*}\n");
        List<String> lines = new ArrayList<>();
        lines.add(p + " &= " + s.probability().latex());
        for (SensResult.Partial g : s.gradient()) {
            lines.add("\\frac{\\partial " + p + "}{\\partial " + g.wrtLatex() + "} &= " + g.derivative().latex());
        }
        if (s.at().isPresent()) {
            SensResult.AtPoint a = s.at().get();
            lines.add("\\text{at } " + Text.latex(a.point().text()) + ": \\quad P &= "
                + Text.frac(a.probability()) + " \\approx " + dec(a.probability()));
            for (SensResult.Partial g : s.gradient()) {
                String x = g.wrtLatex();
                Rational d = g.value().orElseThrow();
                lines.add("\\frac{\\partial P}{\\partial " + x + "} &= " + Text.frac(d) + " \\approx " + dec(d));
                g.elasticity().ifPresent(e -> lines.add("\\frac{" + x + "}{P}\\frac{\\partial P}{\\partial " + x
                    + "} &= " + Text.frac(e) + " \\approx " + dec(e)));
            }
        }
        sb.append(String.join(" \\\\\n", lines)).append("\n\\end{align*}\n");
        s.sweep().ifPresent(sw -> sweep(sb, sw, w, "P", "\\partial P/\\partial " + w, java.util.Optional.empty()));
        return caution(sb);
    }

    /**
     * A sweep table: the parameter, the value's and the derivative's decimals; where an elasticity is given (a
     * figure of merit), its decimal and then the three exact values.
     */
    private void sweep(StringBuilder sb, SensResult.Sweep sw, String p, String value, String derivative,
                       java.util.Optional<java.util.function.Function<SensResult.SweepLine, java.util.Optional<Rational>>> elasticity) {
        sb.append("\\begin{tabular}{r|rr").append(elasticity.isPresent() ? "r|rrr" : "").append("}\n$").append(p)
            .append("$ & $").append(value).append("$ & $").append(derivative).append('$')
            .append(elasticity.isPresent() ? " & elasticity & exact & exact & exact" : "").append(" \\\\ \\hline\n");
        for (SensResult.SweepLine l : sw.lines()) {
            sb.append('$').append(Text.frac(l.value())).append("$ & $").append(dec(l.probability()))
                .append("$ & $").append(dec(l.derivative())).append('$');
            elasticity.ifPresent(f -> {
                java.util.Optional<Rational> e = f.apply(l);
                sb.append(" & ").append(e.map(x -> "$" + dec(x) + "$").orElse("undefined"))
                    .append(" & $").append(Text.frac(l.probability())).append("$ & $").append(Text.frac(l.derivative()))
                    .append("$ & ").append(e.map(x -> "$" + Text.frac(x) + "$").orElse("undefined"));
            });
            sb.append(" \\\\\n");
        }
        sb.append("\\end{tabular}\n");
    }

    // --- closed ------------------------------------------------------------------------------------------------

    /**
     * The limits as an {@code align*}: {@code \\lim_{n \\to \\infty} P^{n}_{A,B} = ...}, with
     * {@code \\approx} and the decimal at the point when it is known and adds something.
     */
    private static String limits(ClosedResult r, ClosedResult.LongRun lr) {
        List<List<List<String>>> dec = Closed.limitDecimals(r, lr);
        List<String> lines = new ArrayList<>();
        String n = r.names().step();
        String m = r.names().period();
        for (int k = 0; k < lr.limits().size(); k++) {
            for (int i = 0; i < r.rows().size(); i++) {
                for (int j = 0; j < r.cols().size(); j++) {
                    String idx = "\\text{" + Text.latex(r.rows().get(i)) + "},\\text{" + Text.latex(r.cols().get(j))
                        + "}";
                    String lhs = lr.periodic()
                        ? "\\lim_{" + m + " \\to \\infty} P^{" + lr.period() + m + " + " + k + "}_{" + idx + "}"
                        : r.continuous() ? "\\lim_{" + n + " \\to \\infty} P_{" + idx + "}(" + n + ")"
                        : "\\lim_{" + n + " \\to \\infty} P^{" + n + "}_{" + idx + "}";
                    ClosedResult.LongRun l = lr;
                    String exact = l.limits().get(k).get(i).get(j).latex();
                    String d = dec.isEmpty() ? "" : dec.get(k).get(i).get(j);
                    boolean shows = !d.isEmpty() && !d.equals(l.limits().get(k).get(i).get(j).plain());
                    lines.add(lhs + " &= " + exact + (shows ? " \\approx " + d : ""));
                }
            }
        }
        return "\\begin{align*}\n" + String.join(" \\\\\n", lines) + "\n\\end{align*}\n";
    }

    /** The longest run of a formula on one line of an {@code align*} before it is broken. */
    static final int LINE = 100;

    /**
     * A long formula broken over lines of the surrounding {@code align*}: before a top-level {@code +} or {@code -}
     * (outside every brace group and {@code \\left ... \\right} pair, so each line is valid TeX) once the line is
     * longer than {@link #LINE} characters; the continuation lines start {@code &\\quad}.
     */
    static String broken(String tex) {
        StringBuilder out = new StringBuilder();
        int depth = 0;
        int lineStart = 0;
        for (int i = 0; i < tex.length(); i++) {
            char c = tex.charAt(i);
            if (c == '{') {
                depth++;
            } else if (c == '}') {
                depth--;
            } else if (tex.startsWith("\\left", i)) {
                depth++;
            } else if (tex.startsWith("\\right", i)) {
                depth--;
            }
            boolean op = depth == 0 && i > 0 && (c == '+' || c == '-') && tex.charAt(i - 1) == ' '
                && i + 1 < tex.length() && tex.charAt(i + 1) == ' ';
            if (op && out.length() - lineStart > LINE) {
                // drop the space before the operator, break, and continue the line with the operator
                out.setLength(out.length() - 1);
                out.append(" \\\\\n&\\quad ");
                lineStart = out.length();
            }
            out.append(c);
        }
        return out.toString();
    }

    @Override
    public String closed(ClosedResult r) {
        StringBuilder sb = new StringBuilder();
        sb.append("% ").append(Closed.pn(r)).append(" for ").append(Text.comment(r.source())).append(" (").append(Closed.chain(r)).append("): ").append(Closed.what(r))
            .append('\n');
        if (!r.isSeries()) {
            sb.append("% valid for ").append(r.names().step()).append(" >= ").append(r.validFrom());
            if (!r.conditions().isEmpty()) {
                sb.append(" where ").append(Closed.conditions(r.conditions())).append('.');
            }
            sb.append(Closed.domainNote(r)).append('\n');
        }
        if (!Closed.symbolsNote(r).isEmpty()) {
            sb.append("% ").append(Closed.symbolsNote(r)).append('\n');
        }
        if (!r.substituted().isEmpty()) {
            sb.append("% substituted before solving (given with --at): ").append(Text.comment(r.substitutedText()))
                .append('\n');
        }
        if (!Closed.combinationNote(r).isEmpty()) {
            sb.append("% ").append(Text.comment(Closed.combinationNote(r))).append('\n');
        }
        if (!Closed.factoredNote(r).isEmpty()) {
            sb.append("% ").append(Closed.factoredNote(r)).append(' ').append(Closed.det(r))
                .append(" = ").append(Closed.characteristicPolynomial(r)).append('\n');
        }
        sb.append("\\begin{align*}\n");
        List<String> lines = new ArrayList<>();
        for (int i = 0; i < r.rows().size(); i++) {
            for (int j = 0; j < r.cols().size(); j++) {
                String idx = "\\text{" + Text.latex(r.rows().get(i)) + "},\\text{" + Text.latex(r.cols().get(j)) + "}";
                String lhs = r.continuous() ? "P_{" + idx + "}(" + r.timeSymbol() + ")"
                    : r.form() == ClosedResult.Form.GF ? "G_{" + idx + "}(" + r.names().series() + ")"
                    : "P^{" + r.names().step() + "}_{" + idx + "}";
                String rhs = r.form() == ClosedResult.Form.RECURRENCE ? r.shownCells().get(i).get(j).latex()
                    : broken(r.shownCells().get(i).get(j).latex());
                lines.add(r.form() == ClosedResult.Form.RECURRENCE ? "&" + lhs + ":\\; " + rhs : lhs + " &= " + rhs);
            }
        }
        for (int k = 0; k < r.where().size(); k++) {
            ClosedResult.Where w = r.where().get(k);
            lines.add((k == 0 ? "&\\text{where } " : "&\\phantom{\\text{where }} ") + w.latexName() + " = "
                + w.value().latex());
        }
        sb.append(String.join(" \\\\\n", lines)).append("\n\\end{align*}\n");
        if (r.continuous()) {
            sb.append("% ").append(Text.comment(Closed.transformHeading(r))).append("\n\\begin{align*}\n");
            List<String> tl = new ArrayList<>();
            for (int i = 0; i < r.rows().size(); i++) {
                for (int j = 0; j < r.cols().size(); j++) {
                    tl.add("\\hat{P}_{\\text{" + Text.latex(r.rows().get(i)) + "},\\text{" + Text.latex(r.cols().get(j))
                        + "}}(" + r.transformSymbol() + ") &= " + broken(r.transforms().get(i).get(j).latex()));
                }
            }
            sb.append(String.join(" \\\\\n", tl)).append("\n\\end{align*}\n");
        }
        for (ClosedResult.Eigen e : r.eigenvalues()) {
            sb.append("% eigenvalue ").append(String.join(", ", Closed.plain(e.values()))).append(" from ").append(e.factor().plain());
            if (e.multiplicity() > 1) {
                sb.append(", multiplicity ").append(e.multiplicity());
            }
            String dec = Closed.eigenDecimals(r, e);
            if (!dec.isEmpty()) {
                sb.append("; approx. ").append(dec).append(Closed.pointNote(r));
            }
            sb.append('\n');
        }
        for (ClosedResult.Roots rt : r.roots()) {
            sb.append("% ").append(rt.name()).append(" = ").append(rt.polynomial().plain());
            if (!rt.roots().isEmpty()) {
                sb.append("; roots ").append(String.join(", ", Closed.decimals(rt.roots(), r.digits())));
            }
            sb.append('\n');
        }
        r.longRun().ifPresent(lr -> {
            sb.append("% long run: ").append(Text.comment(Closed.longRunHeading(r, lr))).append('\n');
            sb.append(limits(r, lr));
            String note = Closed.longRunNote(lr);
            if (!note.isEmpty()) {
                sb.append("% ").append(Text.comment(note)).append('\n');
            }
            sb.append("% ").append(Text.comment(Closed.rateLine(r, lr)))
                .append(lr.exact() ? "" : lr.rateValue().map(v -> " = " + Closed.real(r, v)).orElse("")).append('\n');
        });
        return caution(sb);
    }

    // --- check -------------------------------------------------------------------------------------------------

    @Override
    String generatorCheck(CheckResult.Generator g) {
        StringBuilder sb = new StringBuilder("% ").append(Text.comment(Continuous.generatorTitle(g)));
        g.at().ifPresent(p -> sb.append("; parameters at ").append(Text.comment(p.text())).append(" (")
            .append(p.origin()).append(")"));
        sb.append('\n').append("% ").append(Text.comment(Continuous.GENERATOR_NOTE)).append('\n');
        sb.append("\\[\nQ = \\begin{pmatrix}\n");
        List<String> lines = new ArrayList<>();
        for (List<Formula> row : g.entries()) {
            lines.add(String.join(" & ", row.stream().map(Formula::latex).toList()));
        }
        sb.append(String.join(" \\\\\n", lines)).append("\n\\end{pmatrix}\n\\]\n");
        sb.append("% rows and columns: ").append(Text.comment(String.join(", ", g.states()))).append('\n');
        sb.append("\\begin{tabular}{lll}\n state & total rate out $q_i$ & mean holding time $1/q_i$ \\\\ \\hline\n");
        for (int i = 0; i < g.states().size(); i++) {
            sb.append(Text.latex(g.states().get(i))).append(" & $").append(g.exitRates().get(i).latex()).append("$ & $")
                .append(g.holding().get(i).map(Formula::latex).orElse("\\infty")).append("$ \\\\\n");
        }
        sb.append("\\end{tabular}\n");
        Continuous.upDown(g).ifPresent(u -> sb.append("% ").append(Text.comment(u)).append('\n'));
        for (String w : g.warnings()) {
            sb.append("% condition: ").append(Text.comment(w)).append('\n');
        }
        sb.append("% ").append(Text.comment(Continuous.generatorVerdict(g))).append('\n');
        return caution(sb);
    }

    @Override
    String symbolicCheck(CheckResult.Symbolic s) {
        StringBuilder sb = new StringBuilder();
        sb.append("% one-step matrix of ").append(Text.comment(s.source())).append(" (").append(s.kind())
            .append(" chain)\n\\begin{align*}\n");
        List<String> lines = new ArrayList<>();
        for (int i = 0; i < s.states().size(); i++) {
            for (int j = 0; j < s.states().size(); j++) {
                lines.add("P(\\text{" + Text.latex(s.states().get(i)) + "}, \\text{" + Text.latex(s.states().get(j))
                    + "}) &= " + s.entries().get(i).get(j).latex());
            }
        }
        sb.append(String.join(" \\\\\n", lines)).append("\n\\end{align*}\n");
        for (String w : s.warnings()) {
            sb.append("% condition: ").append(Text.comment(w)).append('\n');
        }
        return caution(sb);
    }

    // --- verify --------------------------------------------------------------------------------------------------

    @Override
    public String verify(VerifyResult r) {
        VerifyReport rep = r.report();
        StringBuilder sb = new StringBuilder();
        sb.append("% ").append(Text.comment(Checks.quantity(r))).append(" of ").append(Text.comment(r.source()))
            .append(" checked against ").append(Text.comment(r.against())).append("; decimals: ")
            .append(Text.digits(digits)).append('\n');
        sb.append("% tolerance: ").append(Text.comment(Checks.tolerance(rep.tolerance()))).append('\n');
        sb.append("\\begin{tabular}{l|lrrrrl}\n");
        sb.append("entry & given & exact & error & relative error & ulps & status \\\\ \\hline\n");
        for (EntryCheck c : rep.worst()) {
            sb.append(Text.latex(c.label()).replace(" -> ", " $\\to$ ")).append(" & \\texttt{")
                .append(Text.latex(c.given())).append("} & ")
                .append(dec(c.truth())).append(" & ").append(Checks.error(c.error())).append(" & ")
                .append(Checks.error(c.relativeError())).append(" & ").append(Checks.ulpsCell(c)).append(" & ")
                .append(Checks.status(c)).append(" \\\\\n");
        }
        sb.append("\\end{tabular}\n\n");
        sb.append(Text.latex(Checks.summary(rep))).append(".\n");
        return caution(sb);
    }

    // --- continuous chains ---------------------------------------------------------------------------------------

    @Override
    public String transientProbabilities(TransientResult r) {
        StringBuilder sb = new StringBuilder();
        sb.append("% P(t) for ").append(Text.comment(r.source())).append(" (continuous chain), certified decimals: ")
            .append(Text.digits(digits)).append('\n');
        for (TransientResult.AtTime at : r.times()) {
            List<List<String>> g = Continuous.grid(r, at);
            sb.append("% t = ").append(at.t()).append("; ").append(Continuous.boundSentence(at)).append('\n');
            sb.append("\\begin{tabular}{l|").append("r".repeat(r.states().size())).append("}\n");
            sb.append("$P(").append(at.t()).append(")$");
            g.get(0).subList(1, g.get(0).size()).forEach(s -> sb.append(" & ").append(Text.latex(s)));
            sb.append(" \\\\ \\hline\n");
            for (List<String> row : g.subList(1, g.size())) {
                sb.append(Text.latex(row.get(0)));
                row.subList(1, row.size()).forEach(c -> sb.append(" & $").append(c).append('$'));
                sb.append(" \\\\\n");
            }
            sb.append("\\end{tabular}\n");
        }
        return caution(sb);
    }

    @Override
    public String symbolicTransient(org.qchain.result.SymbolicTransientResult r) {
        StringBuilder sb = new StringBuilder();
        sb.append("% ").append(Text.comment(Continuous.symbolicTitle(r))).append("\n% ")
            .append(Text.comment(Continuous.symbolicValidity(r))).append("\n\\begin{align*}\n");
        List<String> lines = new ArrayList<>();
        for (int i = 0; i < r.rows().size(); i++) {
            for (int j = 0; j < r.states().size(); j++) {
                lines.add("P_{\\text{" + Text.latex(r.rows().get(i)) + "},\\text{" + Text.latex(r.states().get(j)) + "}}("
                    + r.timeSymbol() + ") &= " + broken(r.shownCells().get(i).get(j).latex()));
            }
        }
        for (int k = 0; k < r.where().size(); k++) {
            org.qchain.result.ClosedResult.Where w = r.where().get(k);
            lines.add((k == 0 ? "&\\text{where } " : "&\\phantom{\\text{where }} ") + w.latexName() + " = "
                + w.value().latex());
        }
        for (int k = 0; k < r.times().size(); k++) {
            org.qchain.result.SymbolicTransientResult.AtTime at = r.times().get(k);
            List<List<org.qchain.exact.certified.CertifiedDecimal>> dec = Continuous.symbolicDecimals(r, k);
            for (int i = 0; i < r.rows().size(); i++) {
                for (int j = 0; j < r.states().size(); j++) {
                    lines.add("P_{\\text{" + Text.latex(r.rows().get(i)) + "},\\text{" + Text.latex(r.states().get(j))
                        + "}}(" + at.t() + ") &= " + broken(at.cells().get(i).get(j).latex())
                        + (dec.isEmpty() ? "" : " \\approx " + dec.get(i).get(j).text()));
                }
            }
        }
        sb.append(String.join(" \\\\\n", lines)).append("\n\\end{align*}\n");
        for (int k = 0; k < r.times().size(); k++) {
            String note = Continuous.symbolicDecimalNote(r, k);
            if (!note.isEmpty()) {
                sb.append("% t = ").append(r.times().get(k).t()).append(": ").append(Text.comment(note)).append('\n');
            }
        }
        return caution(sb);
    }

    @Override
    public String availability(AvailabilityResult r) {
        StringBuilder sb = new StringBuilder();
        sb.append("% Availability of ").append(Text.comment(r.source())).append("; up: ")
            .append(Text.comment(String.join(", ", r.up())))
            .append(r.at().map(p -> "; parameters at " + Text.comment(p.text()) + " (" + p.origin() + ")").orElse(""))
            .append('\n');
        sb.append("\\begin{tabular}{lll}\n figure & exact & decimal \\\\ \\hline\n");
        for (List<String> f : Continuous.figures(r, digits)) {
            sb.append(Text.latex(f.get(0))).append(" & ").append(Text.latex(f.get(1))).append(" & ")
                .append(Text.latex(f.get(2))).append(" \\\\\n");
        }
        for (List<String> p : Continuous.points(r)) {
            sb.append(Text.latex(p.get(0))).append(" & & ").append(Text.latex(p.get(1))).append(" \\\\\n");
        }
        sb.append("\\end{tabular}\n");
        return caution(sb);
    }

    @Override
    public String symbolicAvailability(org.qchain.result.SymbolicAvailabilityResult r) {
        StringBuilder sb = new StringBuilder();
        sb.append("% Availability of ").append(Text.comment(r.source())).append("; up: ")
            .append(Text.comment(String.join(", ", r.up()))).append("; formulas in ")
            .append(Text.comment(r.parameters().isEmpty() ? "no parameter" : String.join(", ", r.parameters())))
            .append('\n');
        if (!r.substituted().isEmpty()) {
            sb.append("% substituted before solving (").append(r.substitutedOrigin()).append("): ")
                .append(Text.comment(r.substitutedText())).append('\n');
        }
        sb.append("\\begin{tabular}{ll}\n figure & formula \\\\ \\hline\n");
        for (Continuous.FormulaRow f : Continuous.formulas(r)) {
            sb.append(Text.latex(f.name())).append(" & $").append(f.latex()).append("$ \\\\\n");
        }
        sb.append("\\end{tabular}\n");
        if (!r.conditions().isEmpty()) {
            sb.append("% ").append(Text.comment(Continuous.CONDITIONS)).append('\n');
            sb.append("\\begin{itemize}\n");
            r.conditions().forEach(c -> sb.append("\\item $").append(c.latex()).append("$: ")
                .append(Text.latex(Continuous.proof(c))).append('\n'));
            sb.append("\\end{itemize}\n");
        }
        r.atPoint().ifPresent(a -> {
            sb.append("% values at ").append(Text.comment(a.at().map(p -> p.text() + " (" + p.origin() + ")")
                .orElse("the point"))).append(", exactly\n");
            sb.append("\\begin{tabular}{lll}\n figure & exact & decimal \\\\ \\hline\n");
            for (List<String> f : Continuous.figures(a, digits)) {
                sb.append(Text.latex(f.get(0))).append(" & ").append(Text.latex(f.get(1))).append(" & ")
                    .append(Text.latex(f.get(2))).append(" \\\\\n");
            }
            for (List<String> pt : Continuous.points(a)) {
                sb.append(Text.latex(pt.get(0))).append(" & & ").append(Text.latex(pt.get(1))).append(" \\\\\n");
            }
            sb.append("\\end{tabular}\n");
        });
        return caution(sb);
    }

    @Override
    public String rateSens(RateSensResult r) {
        StringBuilder sb = new StringBuilder();
        sb.append("% Sensitivity of ").append(Text.comment(Continuous.figureName(r))).append(" to ")
            .append(Text.comment(r.wrt())).append(" in ").append(Text.comment(r.source())).append('\n');
        sb.append("\\begin{tabular}{lll}\n quantity & exact & decimal \\\\ \\hline\n");
        for (List<String> x : Continuous.sensRows(r, digits)) {
            sb.append(Text.latex(x.get(0))).append(" & $").append(Text.frac(Rational.parse(x.get(1).equals("undefined")
                ? "0" : x.get(1)))).append("$ & ").append(Text.latex(x.get(2))).append(" \\\\\n");
        }
        sb.append("\\end{tabular}\n");
        r.sweep().ifPresent(sw -> {
            String f = "\\text{" + Text.latex(r.figure()) + "}";
            String x = Text.latex(r.wrt());
            sb.append("% sweep ").append(Text.comment(sw.range())).append('\n');
            sweep(sb, sw, "\\text{" + Text.latex(sw.parameter()) + "}", f, "\\partial " + f + "/\\partial \\text{" + x
                + "}", java.util.Optional.of(r::elasticity));
        });
        return caution(sb);
    }

    @Override
    public String transientSens(org.qchain.result.TransientSensResult r) {
        StringBuilder sb = new StringBuilder("% ").append(Text.comment(Continuous.transientSensTitle(r))).append('\n');
        sb.append("\\begin{tabular}{rlrr}\n $t$ & quantity & decimal & enclosure width \\\\ \\hline\n");
        for (List<String> x : Continuous.transientSensRows(r)) {
            sb.append('$').append(Text.frac(Rational.parse(x.get(0)))).append("$ & ").append(Text.latex(x.get(1)))
                .append(" & ").append(Text.latex(x.get(2))).append(" & ").append(Text.latex(x.get(3)))
                .append(" \\\\\n");
        }
        sb.append("\\end{tabular}\n");
        return caution(sb);
    }

    // --- classes, longrun, absorb --------------------------------------------------------------------------------

    @Override
    String render(Sections.Doc d) {
        StringBuilder sb = new StringBuilder("% ").append(Text.comment(d.heading())).append('\n');
        for (String n : d.notes()) {
            sb.append("% ").append(Text.comment(n)).append('\n');
        }
        for (Sections.Table t : d.tables()) {
            sb.append("\\paragraph{").append(Text.latex(t.title())).append("}\n\\begin{tabular}{")
                .append("l".repeat(t.header().size())).append("}\n");
            sb.append(String.join(" & ", t.header().stream().map(Text::latex).toList())).append(" \\\\\n\\hline\n");
            for (List<org.qchain.result.Formula> row : t.rows()) {
                sb.append(String.join(" & ", row.stream().map(f -> f.plain().isEmpty() ? "" : "$" + f.latex() + "$")
                    .toList())).append(" \\\\\n");
            }
            sb.append("\\end{tabular}\n");
        }
        return caution(sb);
    }

    // --- distributions after n steps -----------------------------------------------------------------------------

    @Override
    public String distribution(DistributionResult r) {
        StringBuilder sb = new StringBuilder();
        String at = Distributions.point(r);
        sb.append("% ").append(Text.comment(Distributions.what(r, Distributions.steps(r))))
            .append(" for ").append(Text.comment(r.source())).append(" (")
            .append(r.kind()).append(" chain), ").append(Text.comment(Distributions.start(r)))
            .append(at.isEmpty() ? "" : "; parameters " + Text.comment(at)).append("; decimals: ")
            .append(Text.digits(digits)).append('\n');
        List<String> cols = Distributions.columns(r);
        if (!r.series()) {
            sb.append("\\begin{tabular}{l|rr}\n");
            sb.append("to & exact & decimal \\\\ \\hline\n");
            List<Rational> cells = Distributions.cells(r, r.lines().get(0));
            for (int j = 0; j < cols.size(); j++) {
                Rational e = cells.get(j);
                sb.append(Text.latex(cols.get(j))).append(" & ").append(cell(e, true)).append(" & ")
                    .append(cell(e, false)).append(" \\\\\n");
            }
            sb.append("\\end{tabular}\n");
            return caution(sb);
        }
        for (boolean exact : new boolean[] {true, false}) {
            if (!exact) {
                sb.append("% decimals: ").append(Text.digits(digits)).append('\n');
            }
            sb.append("\\begin{tabular}{r|").append("r".repeat(cols.size())).append("}\n$n$");
            cols.forEach(c -> sb.append(" & ").append(Text.latex(c)));
            sb.append(" \\\\ \\hline\n");
            for (DistributionResult.Line l : r.lines()) {
                sb.append(l.n());
                Distributions.cells(r, l).forEach(e -> sb.append(" & ").append(cell(e, exact)));
                sb.append(" \\\\\n");
            }
            sb.append("\\end{tabular}\n");
        }
        return caution(sb);
    }
}
