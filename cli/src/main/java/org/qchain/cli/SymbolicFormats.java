package org.qchain.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.qchain.cli.format.Caution;
import org.qchain.cli.format.Json;
import org.qchain.cli.format.OutputFormat;
import org.qchain.cli.result.Entry;
import org.qchain.exact.Rational;

/**
 * Lays out the symbolic results of {@code step} and {@code sens} in every output format. Never computes: formulas
 * arrive as text (plain and LaTeX), values as exact fractions with their decimals. The JSON shapes are documented in
 * docs/symbolic.md.
 */
final class SymbolicFormats {
    private static final String CSV_EOL = "\r\n";

    private SymbolicFormats() {
    }

    // ================================================================================================ step
    static String step(SymbolicResult r, OutputFormat f) {
        switch (f) {
            case JSON:
                return stepJson(r);
            case CSV:
                return stepCsv(r);
            case MARKDOWN:
                return stepMarkdown(r);
            case LATEX:
                return stepLatex(r);
            default:
                return stepText(r);
        }
    }

    private static String what(SymbolicResult r) {
        if (r.isSingle()) {
            return "P^" + r.n() + "(" + r.from().get() + " -> " + r.to().get() + ")";
        }
        return r.isMatrix() ? "P^" + r.n() : "Row " + r.from().get() + " of P^" + r.n();
    }

    private static String functionsOf(SymbolicResult r) {
        String of = r.parameters().isEmpty() ? "(no parameters)" : String.join(", ", r.parameters());
        return (r.isSingle() ? "an exact rational function of " : "exact rational functions of ") + of;
    }

    private static String formText(boolean factored) {
        return factored ? "factored over the rationals (irreducible factors and one constant)"
            : "in canonical form: numerator and denominator coprime, expanded";
    }

    private static String stepText(SymbolicResult r) {
        StringBuilder sb = new StringBuilder();
        sb.append(what(r)).append(" for ").append(r.source()).append(" (").append(r.kind()).append(" chain, ")
            .append(r.states().size()).append(" states) as ").append(functionsOf(r)).append('\n');
        sb.append("Each formula is ").append(formText(r.factored())).append(".\n\n");
        List<List<String>> table = new ArrayList<>();
        table.add(List.of("from", "to", "P^" + r.n()));
        forEachCell(r, (i, j) -> table.add(List.of(r.rows().get(i), r.columns().get(j),
            r.formulas().get(i).get(j).plain())));
        appendTable(sb, table);
        if (r.values().isPresent()) {
            sb.append("\nAt ").append(SymbolicResult.pointText(r.point().get()))
                .append(" (nominal values, overridden by --at):\n");
            List<List<String>> vt = new ArrayList<>();
            vt.add(List.of("from", "to", "decimal", "exact"));
            forEachCell(r, (i, j) -> {
                Entry e = r.values().get().get(i).get(j);
                vt.add(List.of(r.rows().get(i), r.columns().get(j), e.decimal(), e.exact().plain()));
            });
            appendTable(sb, vt);
            sb.append("Decimals: ").append(r.digits()).append(" significant digits, correctly rounded.\n");
        }
        return sb.append('\n').append(Caution.TEXT).append('\n').toString();
    }

    private static String stepJson(SymbolicResult r) {
        Json j = Json.object();
        String form = r.factored() ? "factored" : "expanded";
        if (r.isSingle()) {
            j.number("n", r.n()).string("from", r.from().get()).string("to", r.to().get())
                .strings("parameters", r.parameters()).string("form", form)
                .string("formula", r.formulas().get(0).get(0).plain());
            if (r.values().isPresent()) {
                Entry e = r.values().get().get(0).get(0);
                j.object("at", point(r.point().get())).string("value", e.exact().plain()).string("decimal", e.decimal());
            }
        } else if (r.isMatrix()) {
            j.string("kind", r.kind()).number("n", r.n()).strings("parameters", r.parameters())
                .strings("states", r.states()).string("form", form).stringRows("matrix", plainRows(r));
            if (r.values().isPresent()) {
                j.object("at", point(r.point().get())).stringRows("values", exactRows(r))
                    .stringRows("decimals", decimalRows(r));
            }
        } else {
            j.number("n", r.n()).string("from", r.from().get()).strings("parameters", r.parameters())
                .strings("states", r.states()).string("form", form).strings("row", plainRows(r).get(0));
            if (r.values().isPresent()) {
                j.object("at", point(r.point().get())).strings("values", exactRows(r).get(0))
                    .strings("decimals", decimalRows(r).get(0));
            }
        }
        if (!r.isMatrix()) {
            j.string("kind", r.kind());
        }
        return j.number("digits", r.digits()).string("model", r.source()).strings("warnings", r.warnings()).close()
            + "\n";
    }

    private static String stepCsv(SymbolicResult r) {
        StringBuilder sb = new StringBuilder();
        boolean values = r.values().isPresent();
        csv(sb, values ? List.of("n", "from", "to", "value", "decimal", "formula") : List.of("n", "from", "to", "formula"));
        forEachCell(r, (i, j) -> {
            List<String> rec = new ArrayList<>(List.of(String.valueOf(r.n()), r.rows().get(i), r.columns().get(j)));
            if (values) {
                Entry e = r.values().get().get(i).get(j);
                rec.add(e.exact().plain());
                rec.add(e.decimal());
            }
            rec.add(r.formulas().get(i).get(j).plain());
            csv(sb, rec);
        });
        return sb.toString();
    }

    private static String stepMarkdown(SymbolicResult r) {
        StringBuilder sb = new StringBuilder();
        sb.append("**").append(what(r)).append("** for `").append(r.source()).append("` (").append(r.kind())
            .append(" chain) as ").append(functionsOf(r)).append(", ").append(formText(r.factored()))
            .append(".\n\n");
        boolean values = r.values().isPresent();
        if (values) {
            sb.append("Values at ").append(SymbolicResult.pointText(r.point().get()))
                .append(" (nominal values, overridden by --at); decimals: ").append(r.digits())
                .append(" significant digits, correctly rounded.\n\n");
        }
        sb.append(values ? "| from | to | formula | exact | decimal |\n| --- | --- | --- | --- | --- |\n"
            : "| from | to | formula |\n| --- | --- | --- |\n");
        forEachCell(r, (i, j) -> {
            sb.append("| ").append(md(r.rows().get(i))).append(" | ").append(md(r.columns().get(j))).append(" | `")
                .append(r.formulas().get(i).get(j).plain()).append("` |");
            if (values) {
                Entry e = r.values().get().get(i).get(j);
                sb.append(' ').append(e.exact().plain()).append(" | ").append(e.decimal()).append(" |");
            }
            sb.append('\n');
        });
        return sb.append("\n*").append(Caution.TEXT).append("*\n").toString();
    }

    private static String stepLatex(SymbolicResult r) {
        StringBuilder sb = new StringBuilder();
        sb.append("% ").append(what(r)).append(" for ").append(r.source()).append(" (").append(r.kind())
            .append(" chain): ").append(functionsOf(r)).append(", ").append(formText(r.factored()));
        if (r.values().isPresent()) {
            sb.append("; values at ").append(SymbolicResult.pointText(r.point().get())).append(", decimals: ")
                .append(r.digits()).append(" significant digits, correctly rounded");
        }
        sb.append("\n\\begin{align*}\n");
        List<String> lines = new ArrayList<>();
        forEachCell(r, (i, j) -> {
            StringBuilder l = new StringBuilder();
            l.append("P^{").append(r.n()).append("}(\\text{").append(tex(r.rows().get(i))).append("}, \\text{")
                .append(tex(r.columns().get(j))).append("}) &= ").append(r.formulas().get(i).get(j).latex());
            if (r.values().isPresent()) {
                Entry e = r.values().get().get(i).get(j);
                l.append(" = ").append(e.exact().latex()).append(" \\approx ").append(e.decimal());
            }
            lines.add(l.toString());
        });
        sb.append(String.join(" \\\\\n", lines)).append("\n\\end{align*}\n");
        return sb.append("% ").append(Caution.TEXT).append('\n').toString();
    }

    // ================================================================================================ sens
    static String sens(SensRun.SensResult s, OutputFormat f) {
        switch (f) {
            case JSON:
                return sensJson(s);
            case CSV:
                return sensCsv(s);
            case MARKDOWN:
                return sensMarkdown(s);
            case LATEX:
                return sensLatex(s);
            default:
                return sensText(s);
        }
    }

    private static String entryName(SensRun.SensResult s) {
        return "P^" + s.n() + "(" + s.from() + " -> " + s.to() + ")";
    }

    private static String sensText(SensRun.SensResult s) {
        StringBuilder sb = new StringBuilder();
        sb.append("Sensitivity of ").append(entryName(s)).append(" to ").append(s.wrt()).append(" for ")
            .append(s.source()).append(" (").append(s.kind()).append(" chain), parameters ")
            .append(String.join(", ", s.parameters())).append('\n');
        List<List<String>> f = new ArrayList<>();
        f.add(List.of("P", "= " + s.probability().plain()));
        f.add(List.of("dP/d" + s.wrt(), "= " + s.derivative().plain()));
        appendTable(sb, f);
        if (s.at().isPresent()) {
            SensRun.AtPoint a = s.at().get();
            sb.append("\nAt ").append(SymbolicResult.pointText(a.point())).append(" (nominal values, overridden by --at):\n");
            List<List<String>> t = new ArrayList<>();
            t.add(List.of("", "decimal", "exact"));
            t.add(List.of("P", a.probability().decimal(), a.probability().exact().plain()));
            t.add(List.of("dP/d" + s.wrt(), a.derivative().decimal(), a.derivative().exact().plain()));
            t.add(a.elasticity().map(e -> List.of("elasticity", e.decimal(), e.exact().plain()))
                .orElse(List.of("elasticity", "undefined (P = 0)", "")));
            appendTable(sb, t);
            sb.append("Elasticity: (").append(s.wrt()).append("/P) dP/d").append(s.wrt())
                .append(", the relative change of P per relative change of ").append(s.wrt()).append(".\n");
        }
        if (s.sweep().isPresent()) {
            SensRun.Sweep w = s.sweep().get();
            sb.append("\nSweep ").append(w.range()).append(w.others().isEmpty() ? ""
                : " (" + SymbolicResult.pointText(w.others()) + ")").append(":\n");
            List<List<String>> t = new ArrayList<>();
            t.add(List.of(w.parameter(), "P", "dP/d" + s.wrt(), "P exact", "dP/d" + s.wrt() + " exact"));
            for (SensRun.SweepLine l : w.lines()) {
                t.add(List.of(l.value().toString(), l.probability().decimal(), l.derivative().decimal(),
                    l.probability().exact().plain(), l.derivative().exact().plain()));
            }
            appendTable(sb, t);
        }
        if (s.at().isPresent() || s.sweep().isPresent()) {
            sb.append("Decimals: ").append(s.digits()).append(" significant digits, correctly rounded.\n");
        }
        return sb.append('\n').append(Caution.TEXT).append('\n').toString();
    }

    private static String sensJson(SensRun.SensResult s) {
        Json j = Json.object().number("n", s.n()).string("from", s.from()).string("to", s.to()).string("wrt", s.wrt())
            .strings("parameters", s.parameters()).string("formula", s.probability().plain())
            .string("derivative", s.derivative().plain());
        if (s.at().isPresent()) {
            SensRun.AtPoint a = s.at().get();
            j.object("at", point(a.point())).string("value", a.probability().exact().plain())
                .string("decimal", a.probability().decimal())
                .string("derivative_value", a.derivative().exact().plain())
                .string("derivative_decimal", a.derivative().decimal());
            if (a.elasticity().isPresent()) {
                j.string("elasticity", a.elasticity().get().exact().plain())
                    .string("elasticity_decimal", a.elasticity().get().decimal());
            }
        }
        if (s.sweep().isPresent()) {
            SensRun.Sweep w = s.sweep().get();
            Json sw = Json.object().string("parameter", w.parameter()).string("start", w.start().toString())
                .string("step", w.step().toString()).string("end", w.end().toString()).object("others", point(w.others()))
                .objects("rows", w.lines(), l -> Json.object().string(w.parameter(), l.value().toString())
                    .string("value", l.probability().exact().plain()).string("decimal", l.probability().decimal())
                    .string("derivative", l.derivative().exact().plain())
                    .string("derivative_decimal", l.derivative().decimal()));
            j.object("sweep", sw);
        }
        return j.string("kind", s.kind()).number("digits", s.digits()).string("model", s.source())
            .strings("warnings", s.warnings()).close() + "\n";
    }

    private static String sensCsv(SensRun.SensResult s) {
        StringBuilder sb = new StringBuilder();
        if (s.sweep().isPresent()) {
            SensRun.Sweep w = s.sweep().get();
            csv(sb, List.of(w.parameter(), "value", "decimal", "derivative", "derivative_decimal"));
            for (SensRun.SweepLine l : w.lines()) {
                csv(sb, List.of(l.value().toString(), l.probability().exact().plain(), l.probability().decimal(),
                    l.derivative().exact().plain(), l.derivative().decimal()));
            }
            return sb.toString();
        }
        csv(sb, List.of("quantity", "formula", "value", "decimal"));
        SensRun.AtPoint a = s.at().orElse(null);
        csv(sb, List.of("P", s.probability().plain(), a == null ? "" : a.probability().exact().plain(),
            a == null ? "" : a.probability().decimal()));
        csv(sb, List.of("dP/d" + s.wrt(), s.derivative().plain(), a == null ? "" : a.derivative().exact().plain(),
            a == null ? "" : a.derivative().decimal()));
        if (a != null && a.elasticity().isPresent()) {
            csv(sb, List.of("elasticity", "", a.elasticity().get().exact().plain(), a.elasticity().get().decimal()));
        }
        return sb.toString();
    }

    private static String sensMarkdown(SensRun.SensResult s) {
        StringBuilder sb = new StringBuilder();
        sb.append("Sensitivity of **").append(entryName(s)).append("** to `").append(s.wrt()).append("` for `")
            .append(s.source()).append("` (").append(s.kind()).append(" chain).\n\n");
        sb.append("| quantity | formula |\n| --- | --- |\n");
        sb.append("| P | `").append(s.probability().plain()).append("` |\n");
        sb.append("| dP/d").append(s.wrt()).append(" | `").append(s.derivative().plain()).append("` |\n");
        if (s.at().isPresent()) {
            SensRun.AtPoint a = s.at().get();
            sb.append("\nAt ").append(SymbolicResult.pointText(a.point())).append(":\n\n");
            sb.append("| quantity | exact | decimal |\n| --- | --- | --- |\n");
            sb.append("| P | ").append(a.probability().exact().plain()).append(" | ").append(a.probability().decimal())
                .append(" |\n");
            sb.append("| dP/d").append(s.wrt()).append(" | ").append(a.derivative().exact().plain()).append(" | ")
                .append(a.derivative().decimal()).append(" |\n");
            a.elasticity().ifPresent(e -> sb.append("| elasticity | ").append(e.exact().plain()).append(" | ")
                .append(e.decimal()).append(" |\n"));
        }
        if (s.sweep().isPresent()) {
            SensRun.Sweep w = s.sweep().get();
            sb.append("\nSweep ").append(w.range()).append(":\n\n| ").append(w.parameter()).append(" | P | dP/d")
                .append(s.wrt()).append(" | P exact | dP/d").append(s.wrt()).append(" exact |\n| --- | --- | --- | --- | --- |\n");
            for (SensRun.SweepLine l : w.lines()) {
                sb.append("| ").append(l.value()).append(" | ").append(l.probability().decimal()).append(" | ")
                    .append(l.derivative().decimal()).append(" | ").append(l.probability().exact().plain())
                    .append(" | ").append(l.derivative().exact().plain()).append(" |\n");
            }
        }
        if (s.at().isPresent() || s.sweep().isPresent()) {
            sb.append("\nDecimals: ").append(s.digits()).append(" significant digits, correctly rounded.\n");
        }
        return sb.append("\n*").append(Caution.TEXT).append("*\n").toString();
    }

    private static String sensLatex(SensRun.SensResult s) {
        StringBuilder sb = new StringBuilder();
        String p = "P^{" + s.n() + "}(\\text{" + tex(s.from()) + "}, \\text{" + tex(s.to()) + "})";
        String w = PlainLatexName.of(s.wrt());
        sb.append("% sensitivity to ").append(s.wrt()).append(" for ").append(s.source()).append(" (").append(s.kind())
            .append(" chain)\n\\begin{align*}\n");
        List<String> lines = new ArrayList<>();
        lines.add(p + " &= " + s.probability().latex());
        lines.add("\\frac{\\partial " + p + "}{\\partial " + w + "} &= " + s.derivative().latex());
        if (s.at().isPresent()) {
            SensRun.AtPoint a = s.at().get();
            lines.add("\\text{at } " + tex(SymbolicResult.pointText(a.point())) + ": \\quad P &= "
                + a.probability().exact().latex() + " \\approx " + a.probability().decimal());
            lines.add("\\frac{\\partial P}{\\partial " + w + "} &= " + a.derivative().exact().latex() + " \\approx "
                + a.derivative().decimal());
            a.elasticity().ifPresent(e -> lines.add("\\frac{" + w + "}{P}\\frac{\\partial P}{\\partial " + w + "} &= "
                + e.exact().latex() + " \\approx " + e.decimal()));
        }
        sb.append(String.join(" \\\\\n", lines)).append("\n\\end{align*}\n");
        if (s.sweep().isPresent()) {
            SensRun.Sweep sw = s.sweep().get();
            sb.append("\\begin{tabular}{r|rr}\n$").append(w).append("$ & $P$ & $\\partial P/\\partial ").append(w)
                .append("$ \\\\ \\hline\n");
            for (SensRun.SweepLine l : sw.lines()) {
                sb.append('$').append(latexRational(l.value())).append("$ & $").append(l.probability().decimal())
                    .append("$ & $").append(l.derivative().decimal()).append("$ \\\\\n");
            }
            sb.append("\\end{tabular}\n");
        }
        return sb.append("% ").append(Caution.TEXT).append('\n').toString();
    }

    // ================================================================================================ helpers
    private interface Cell {
        void at(int i, int j);
    }

    private static void forEachCell(SymbolicResult r, Cell c) {
        for (int i = 0; i < r.rows().size(); i++) {
            for (int j = 0; j < r.columns().size(); j++) {
                c.at(i, j);
            }
        }
    }

    private static List<List<String>> plainRows(SymbolicResult r) {
        return r.formulas().stream().map(row -> row.stream().map(SymbolicResult.Formula::plain).toList()).toList();
    }

    private static List<List<String>> exactRows(SymbolicResult r) {
        return r.values().orElseThrow().stream().map(row -> row.stream().map(e -> e.exact().plain()).toList()).toList();
    }

    private static List<List<String>> decimalRows(SymbolicResult r) {
        return r.values().orElseThrow().stream().map(row -> row.stream().map(Entry::decimal).toList()).toList();
    }

    private static Json point(Map<String, Rational> pt) {
        Json j = Json.object();
        for (Map.Entry<String, Rational> e : pt.entrySet()) {
            j.string(e.getKey(), e.getValue().toString());
        }
        return j;
    }

    private static void appendTable(StringBuilder sb, List<List<String>> rows) {
        int cols = rows.get(0).size();
        int[] w = new int[cols];
        for (List<String> r : rows) {
            for (int c = 0; c < cols; c++) {
                w[c] = Math.max(w[c], r.get(c).codePointCount(0, r.get(c).length()));
            }
        }
        for (List<String> r : rows) {
            StringBuilder line = new StringBuilder();
            for (int c = 0; c < cols; c++) {
                String cell = r.get(c);
                line.append(cell);
                if (c + 1 < cols) {
                    line.append(" ".repeat(w[c] - cell.codePointCount(0, cell.length()) + 2));
                }
            }
            sb.append(line.toString().stripTrailing()).append('\n');
        }
    }

    private static void csv(StringBuilder sb, List<String> fields) {
        for (int i = 0; i < fields.size(); i++) {
            String f = fields.get(i);
            if (i > 0) {
                sb.append(',');
            }
            if (f.contains(",") || f.contains("\"") || f.contains("\n") || f.contains("\r")) {
                sb.append('"').append(f.replace("\"", "\"\"")).append('"');
            } else {
                sb.append(f);
            }
        }
        sb.append(CSV_EOL);
    }

    private static String md(String s) {
        return s.replace("|", "\\|");
    }

    private static String tex(String s) {
        return s.replace("\\", "\\textbackslash{}").replace("_", "\\_").replace("&", "\\&").replace("%", "\\%")
            .replace("#", "\\#").replace("$", "\\$").replace("{", "\\{").replace("}", "\\}");
    }

    private static String latexRational(Rational r) {
        return r.isInteger() ? r.toString() : (r.signum() < 0 ? "-" : "") + "\\frac{" + r.numerator().abs() + "}{"
            + r.denominator() + "}";
    }

    /** The LaTeX form of a parameter name, as the symbolic module prints it inside formulas. */
    static final class PlainLatexName {
        private PlainLatexName() {
        }

        static String of(String name) {
            return org.qchain.symbolic.Formulas.latexName(name);
        }
    }
}
