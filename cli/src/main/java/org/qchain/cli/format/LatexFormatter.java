package org.qchain.cli.format;

import org.qchain.cli.result.Entry;
import org.qchain.cli.result.StepResult;

/**
 * LaTeX for reports: tabulars with {@code \frac} entries and state names as text (special characters escaped), the
 * decimals in a second tabular, the caution as a comment. Needs no package beyond standard LaTeX.
 */
final class LatexFormatter implements Formatter {

    @Override
    public String matrix(StepResult.Matrix m) {
        StepResult.Header h = m.header();
        StringBuilder sb = new StringBuilder();
        sb.append("% ").append(TextFormatter.power(h)).append(" for ").append(comment(h.source())).append(" (")
            .append(h.kind()).append(" chain): row = state at the start, column = state after ")
            .append(TextFormatter.steps(h.n())).append('\n');
        grid(sb, m, true);
        sb.append("% decimals: ").append(TextFormatter.digits(h)).append('\n');
        grid(sb, m, false);
        return caution(sb);
    }

    private static void grid(StringBuilder sb, StepResult.Matrix m, boolean exact) {
        int n = m.states().size();
        sb.append("\\begin{tabular}{l|").append("r".repeat(n)).append("}\n");
        sb.append("$P^{").append(m.header().n()).append("}$");
        for (String s : m.states()) {
            sb.append(" & ").append(escape(s));
        }
        sb.append(" \\\\ \\hline\n");
        for (int i = 0; i < n; i++) {
            sb.append(escape(m.states().get(i)));
            for (Entry e : m.entries().get(i)) {
                sb.append(" & ").append(cell(e, exact));
            }
            sb.append(" \\\\\n");
        }
        sb.append("\\end{tabular}\n");
    }

    @Override
    public String row(StepResult.Row r) {
        StepResult.Header h = r.header();
        StringBuilder sb = new StringBuilder();
        sb.append("% row ").append(comment(r.from())).append(" of ").append(TextFormatter.power(h)).append(" for ")
            .append(comment(h.source())).append(" (").append(h.kind()).append(" chain); decimals: ")
            .append(TextFormatter.digits(h)).append('\n');
        sb.append("\\begin{tabular}{l|rr}\n");
        sb.append("to & exact & decimal \\\\ \\hline\n");
        for (int j = 0; j < r.states().size(); j++) {
            Entry e = r.entries().get(j);
            sb.append(escape(r.states().get(j))).append(" & ").append(cell(e, true)).append(" & ")
                .append(cell(e, false)).append(" \\\\\n");
        }
        sb.append("\\end{tabular}\n");
        return caution(sb);
    }

    @Override
    public String single(StepResult.Single s) {
        StepResult.Header h = s.header();
        StringBuilder sb = new StringBuilder();
        sb.append("% ").append(comment(h.source())).append(" (").append(h.kind()).append(" chain); decimals: ")
            .append(TextFormatter.digits(h)).append('\n');
        sb.append("$P^{").append(h.n()).append("}(\\text{").append(escape(s.from())).append("}, \\text{")
            .append(escape(s.to())).append("}) = ").append(s.value().exact().latex()).append(" \\approx ")
            .append(s.value().decimal()).append("$\n");
        s.paths().ifPresent(paths -> {
            sb.append("\n\\begin{tabular}{rlrr}\n");
            sb.append("rank & path & probability & share \\\\ \\hline\n");
            for (int k = 0; k < paths.size(); k++) {
                StepResult.PathLine p = paths.get(k);
                sb.append(k + 1).append(" & ").append(escape(Paths.compact(p.states())).replace(">", "$\\to$"))
                    .append(" & $").append(p.probability().exact().latex()).append("$ & $")
                    .append(p.share().exact().latex()).append("$ ($").append(p.share().decimal())
                    .append("\\,\\%$) \\\\\n");
            }
            sb.append("\\end{tabular}\n");
        });
        return caution(sb);
    }

    private static String cell(Entry e, boolean exact) {
        return "$" + (exact ? e.exact().latex() : e.decimal()) + "$";
    }

    private static String caution(StringBuilder sb) {
        return sb.append("% ").append(Caution.TEXT).append('\n').toString();
    }

    /** Text for a LaTeX comment: line breaks would end the comment. */
    private static String comment(String s) {
        return s.replace('\n', ' ').replace('\r', ' ');
    }

    /** Escapes LaTeX's special characters in text mode. */
    static String escape(String s) {
        StringBuilder sb = new StringBuilder();
        for (char c : s.toCharArray()) {
            switch (c) {
                case '\\':
                    sb.append("\\textbackslash{}");
                    break;
                case '~':
                    sb.append("\\textasciitilde{}");
                    break;
                case '^':
                    sb.append("\\textasciicircum{}");
                    break;
                case '&': case '%': case '$': case '#': case '_': case '{': case '}':
                    sb.append('\\').append(c);
                    break;
                default:
                    sb.append(c);
            }
        }
        return sb.toString();
    }
}
