package org.qchain.cli.format;

import java.util.ArrayList;
import java.util.List;
import org.qchain.cli.result.ClosedResult;

/**
 * Lays out {@code qchain closed} results as text, JSON, Markdown or LaTeX. Formulas arrive ready in plain syntax
 * and LaTeX; this class only arranges them.
 */
public final class ClosedFormatter {
    private ClosedFormatter() {
    }

    /**
     * The full text for stdout or an output file, ending with a line break.
     *
     * @param r      the result
     * @param format text, json, markdown or latex
     * @return the text
     * @throws IllegalArgumentException for csv, which has no layout for formulas
     */
    public static String format(ClosedResult r, OutputFormat format) {
        switch (format) {
            case TEXT:
                return text(r);
            case JSON:
                return json(r);
            case MARKDOWN:
                return markdown(r);
            case LATEX:
                return latex(r);
            default:
                throw new IllegalArgumentException("no closed-form layout for " + format.word());
        }
    }

    private static boolean series(ClosedResult r) {
        return !r.form().equals("matrix");
    }

    /** What a cell is: {@code P^n(A -> B)}, {@code G(A -> B)} or {@code u(n) = P^n(A -> B)}. */
    private static String label(ClosedResult r, String from, String to) {
        String arrow = from + " -> " + to;
        switch (r.form()) {
            case "gf":
                return "G(" + arrow + "; z)";
            case "recurrence":
                return "P^n(" + arrow + ")";
            default:
                return "P^n(" + arrow + ")";
        }
    }

    private static String what(ClosedResult r) {
        switch (r.form()) {
            case "gf":
                return "generating functions G(z) = sum over n of P^n z^n";
            case "recurrence":
                return "linear recurrences in n, u(n) = P^n(from -> to)";
            default:
                return "closed form in n";
        }
    }

    // --- text --------------------------------------------------------------------------------------------------

    static String text(ClosedResult r) {
        StringBuilder sb = new StringBuilder();
        sb.append("P^n for ").append(r.source()).append(" (discrete chain): ").append(what(r)).append('\n');
        if (!series(r)) {
            sb.append("Valid for n >= ").append(r.validFrom());
            if (!r.conditions().isEmpty()) {
                sb.append(" where ").append(String.join(", ", r.conditions()));
            }
            sb.append('.');
            sb.append(domainNote(r));
            if (r.validFrom() > 0) {
                sb.append(" For smaller n (eigenvalue 0), qchain step gives P^n exactly.");
            }
            sb.append('\n');
        }
        if (!r.parameters().isEmpty()) {
            sb.append("Parameters (symbolic): ").append(String.join(", ", r.parameters())).append('\n');
        }
        sb.append('\n');
        List<String> labels = new ArrayList<>();
        List<String> values = new ArrayList<>();
        for (int i = 0; i < r.rows().size(); i++) {
            for (int j = 0; j < r.cols().size(); j++) {
                labels.add(label(r, r.rows().get(i), r.cols().get(j)));
                values.add(r.cells().get(i).get(j));
            }
        }
        aligned(sb, labels, r.form().equals("recurrence") ? ": " : " = ", values, "");
        if (!r.eigenvalues().isEmpty()) {
            sb.append("\nEigenvalues, by irreducible factor of det(xI - P):\n");
            List<String> facts = new ArrayList<>();
            List<String> vals = new ArrayList<>();
            for (ClosedResult.Eigen e : r.eigenvalues()) {
                facts.add(e.factor() + ":");
                String extra = e.multiplicity() > 1 ? " (multiplicity " + e.multiplicity() : "";
                extra += e.jordanIndex() > 1 ? ", Jordan block of size " + e.jordanIndex() : "";
                vals.add(String.join(", ", e.values()) + (extra.isEmpty() ? "" : extra + ")"));
            }
            aligned(sb, facts, " ", vals, "  ");
        }
        for (ClosedResult.Roots rt : r.roots()) {
            sb.append("  ").append(rt.name()).append(" = ").append(rt.polynomial());
            if (!rt.roots().isEmpty()) {
                sb.append("; roots ").append(String.join(", ", rt.roots()));
            }
            sb.append('\n');
        }
        r.longRun().ifPresent(lr -> longRunText(sb, r, lr));
        return sb.append('\n').append(Caution.wrapped(100)).append('\n').toString();
    }

    /** Whether the conditions are known to hold inside the parameters' domains; empty without conditions. */
    private static String domainNote(ClosedResult r) {
        if (r.conditions().isEmpty()) {
            return "";
        }
        if (r.notProved().isEmpty()) {
            return (r.conditions().size() == 1 ? " It" : " They") + " always hold"
                + (r.conditions().size() == 1 ? "s" : "") + " inside the parameters' domains.";
        }
        return " Not shown to hold throughout the parameters' domains: " + String.join(", ", r.notProved()) + ".";
    }

    private static void longRunText(StringBuilder sb, ClosedResult r, ClosedResult.LongRun lr) {
        sb.append('\n');
        if (lr.period() == 1) {
            sb.append("Long run: P^n converges as n grows; the limit:\n");
        } else {
            sb.append("Long run: periodic with period ").append(lr.period())
                .append("; the limits of P^(").append(lr.period()).append("m + r) as m grows:\n");
        }
        for (int k = 0; k < lr.limits().size(); k++) {
            List<String> labels = new ArrayList<>();
            List<String> values = new ArrayList<>();
            for (int i = 0; i < r.rows().size(); i++) {
                for (int j = 0; j < r.cols().size(); j++) {
                    labels.add((lr.period() > 1 ? "r = " + k + ": " : "") + r.rows().get(i) + " -> " + r.cols().get(j));
                    values.add(lr.limits().get(k).get(i).get(j));
                }
            }
            aligned(sb, labels, "  ", values, "  ");
        }
        sb.append("Convergence rate (second-largest eigenvalue modulus): ").append(lr.rate()).append('\n');
        lr.rateValue().ifPresent(v -> sb.append("  = ").append(v)
            .append(r.point().map(p -> " at " + p).orElse("")).append(" (").append(r.digits())
            .append(" significant digits)\n"));
    }

    private static void aligned(StringBuilder sb, List<String> left, String sep, List<String> right, String indent) {
        int w = 0;
        for (String l : left) {
            w = Math.max(w, l.length());
        }
        for (int i = 0; i < left.size(); i++) {
            sb.append(indent).append(left.get(i)).append(" ".repeat(w - left.get(i).length())).append(sep)
                .append(right.get(i)).append('\n');
        }
    }

    // --- JSON --------------------------------------------------------------------------------------------------

    static String json(ClosedResult r) {
        Json j = Json.object()
            .string("n_symbol", r.nSymbol())
            .number("valid_from", r.validFrom())
            .strings("conditions", r.conditions())
            .strings("states", r.states());
        List<String> notProved = r.notProved();
        switch (r.selection()) {
            case ENTRY:
                j.string("from", r.rows().get(0)).string("to", r.cols().get(0)).string("formula", r.cells().get(0).get(0));
                break;
            case ROW:
                j.string("start", r.rows().get(0)).strings("row", r.cells().get(0));
                break;
            default:
                j.stringRows("matrix", r.cells());
        }
        j.string("form", r.form()).strings("parameters", r.parameters());
        if (!series(r)) {
            j.strings("conditions_not_proved", notProved);
        }
        if (r.form().equals("gf")) {
            j.string("variable", "z");
        }
        if (r.form().equals("recurrence")) {
            List<Object[]> cells = new ArrayList<>();
            for (int i = 0; i < r.rows().size(); i++) {
                for (int k = 0; k < r.cols().size(); k++) {
                    cells.add(new Object[] {r.rows().get(i), r.cols().get(k), r.recurrences().get(i).get(k)});
                }
            }
            j.objects("recurrences", cells, c -> {
                ClosedResult.Recurrence rec = (ClosedResult.Recurrence) c[2];
                return Json.object().string("from", (String) c[0]).string("to", (String) c[1])
                    .strings("coefficients", rec.coefficients()).number("valid_from", rec.validFrom())
                    .strings("initial", rec.initial());
            });
        }
        if (!series(r)) {
            j.objects("eigenvalues", r.eigenvalues(), e -> Json.object().string("factor", e.factor())
                .number("multiplicity", e.multiplicity()).number("jordan_index", e.jordanIndex())
                .string("kind", e.kind()).strings("values", e.values()));
            j.objects("root_polynomials", r.roots(), rt -> Json.object().string("name", rt.name())
                .string("polynomial", rt.polynomial()).strings("roots", rt.roots()));
            r.longRun().ifPresent(lr -> {
                List<Integer> rs = new ArrayList<>();
                for (int k = 0; k < lr.limits().size(); k++) {
                    rs.add(k);
                }
                Json l = Json.object().number("period", lr.period())
                    .objects("limits", rs, k -> limitJson(r, k, lr.limits().get(k)))
                    .string("rate", lr.rate());
                lr.rateValue().ifPresent(v -> l.string("rate_value", v));
                j.object("long_run", l);
            });
            r.point().ifPresent(p -> j.string("at", p));
        }
        j.string("kind", "discrete").string("model", r.source()).number("digits", r.digits())
            .strings("warnings", r.warnings());
        return j.close() + "\n";
    }

    private static Json limitJson(ClosedResult r, int k, List<List<String>> grid) {
        Json l = Json.object().number("r", k);
        switch (r.selection()) {
            case ENTRY:
                return l.string("formula", grid.get(0).get(0));
            case ROW:
                return l.strings("row", grid.get(0));
            default:
                return l.stringRows("matrix", grid);
        }
    }

    // --- Markdown ----------------------------------------------------------------------------------------------

    static String markdown(ClosedResult r) {
        StringBuilder sb = new StringBuilder();
        sb.append("**P^n** for `").append(code(r.source())).append("` (discrete chain): ").append(what(r));
        if (!series(r)) {
            sb.append("; valid for n ≥ ").append(r.validFrom());
            if (!r.conditions().isEmpty()) {
                List<String> c = new ArrayList<>();
                for (String s : r.conditions()) {
                    c.add("`" + code(s) + "`");
                }
                sb.append(" where ").append(String.join(", ", c));
            }
        }
        sb.append('.').append(domainNote(r)).append("\n\n");
        sb.append("| from | to | ").append(r.form().equals("gf") ? "G(z)" : (r.form().equals("recurrence") ? "recurrence" : "P^n"))
            .append(" |\n| --- | --- | --- |\n");
        for (int i = 0; i < r.rows().size(); i++) {
            for (int j = 0; j < r.cols().size(); j++) {
                sb.append("| ").append(MarkdownFormatter.escape(r.rows().get(i))).append(" | ")
                    .append(MarkdownFormatter.escape(r.cols().get(j))).append(" | `")
                    .append(code(r.cells().get(i).get(j))).append("` |\n");
            }
        }
        if (!r.eigenvalues().isEmpty()) {
            sb.append("\nEigenvalues:\n\n");
            for (ClosedResult.Eigen e : r.eigenvalues()) {
                sb.append("- `").append(code(String.join(", ", e.values()))).append("` from `").append(code(e.factor()))
                    .append('`');
                if (e.multiplicity() > 1) {
                    sb.append(", multiplicity ").append(e.multiplicity());
                }
                if (e.jordanIndex() > 1) {
                    sb.append(", Jordan block of size ").append(e.jordanIndex());
                }
                sb.append('\n');
            }
            for (ClosedResult.Roots rt : r.roots()) {
                sb.append("- `").append(rt.name()).append(" = ").append(code(rt.polynomial())).append('`');
                if (!rt.roots().isEmpty()) {
                    sb.append(": roots ").append(String.join(", ", rt.roots()));
                }
                sb.append('\n');
            }
        }
        r.longRun().ifPresent(lr -> {
            sb.append("\nLong run: ").append(lr.period() == 1 ? "P^n converges as n grows; its limit:"
                : "periodic with period " + lr.period() + "; the limits of P^(" + lr.period() + "m + r)");
            sb.append(lr.period() == 1 ? "\n\n| " : ":\n\n| ").append(lr.period() > 1 ? "r | " : "").append("from | to | limit |\n| ")
                .append(lr.period() > 1 ? "--- | " : "").append("--- | --- | --- |\n");
            for (int k = 0; k < lr.limits().size(); k++) {
                for (int i = 0; i < r.rows().size(); i++) {
                    for (int j = 0; j < r.cols().size(); j++) {
                        sb.append("| ").append(lr.period() > 1 ? k + " | " : "")
                            .append(MarkdownFormatter.escape(r.rows().get(i))).append(" | ")
                            .append(MarkdownFormatter.escape(r.cols().get(j))).append(" | `")
                            .append(code(lr.limits().get(k).get(i).get(j))).append("` |\n");
                    }
                }
            }
            sb.append("\nConvergence rate (second-largest eigenvalue modulus): `").append(code(lr.rate())).append('`');
            lr.rateValue().ifPresent(v -> sb.append(" = ").append(v).append(r.point().map(p -> " at " + p).orElse("")));
            sb.append(".\n");
        });
        return sb.append("\n*").append(Caution.TEXT).append("*\n").toString();
    }

    private static String code(String s) {
        return s.replace('`', '\'').replace("|", "\\|");
    }

    // --- LaTeX -------------------------------------------------------------------------------------------------

    static String latex(ClosedResult r) {
        StringBuilder sb = new StringBuilder();
        sb.append("% P^n for ").append(comment(r.source())).append(" (discrete chain): ").append(what(r)).append('\n');
        if (!series(r)) {
            sb.append("% valid for n >= ").append(r.validFrom());
            if (!r.conditions().isEmpty()) {
                sb.append(" where ").append(String.join(", ", r.conditions())).append('.');
            }
            sb.append(domainNote(r)).append('\n');
        }
        sb.append("\\begin{align*}\n");
        List<String> lines = new ArrayList<>();
        for (int i = 0; i < r.rows().size(); i++) {
            for (int j = 0; j < r.cols().size(); j++) {
                String idx = "\\text{" + LatexFormatter.escape(r.rows().get(i)) + "},\\text{"
                    + LatexFormatter.escape(r.cols().get(j)) + "}";
                String lhs = r.form().equals("gf") ? "G_{" + idx + "}(z)" : "P^{n}_{" + idx + "}";
                String rhs = r.latex().get(i).get(j);
                lines.add(r.form().equals("recurrence") ? "&" + lhs + ":\\; " + rhs : lhs + " &= " + rhs);
            }
        }
        sb.append(String.join(" \\\\\n", lines)).append("\n\\end{align*}\n");
        for (ClosedResult.Eigen e : r.eigenvalues()) {
            sb.append("% eigenvalue ").append(String.join(", ", e.values())).append(" from ").append(e.factor());
            if (e.multiplicity() > 1) {
                sb.append(", multiplicity ").append(e.multiplicity());
            }
            sb.append('\n');
        }
        r.longRun().ifPresent(lr -> sb.append("% long run: period ").append(lr.period()).append("; rate ")
            .append(lr.rate()).append(lr.rateValue().map(v -> " = " + v).orElse("")).append('\n'));
        return sb.append("% ").append(Caution.TEXT).append('\n').toString();
    }

    private static String comment(String s) {
        return s.replace('\n', ' ').replace('\r', ' ');
    }
}
