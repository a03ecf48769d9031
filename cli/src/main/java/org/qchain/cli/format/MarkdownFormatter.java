package org.qchain.cli.format;

import java.util.ArrayList;
import java.util.List;
import org.qchain.cli.result.Entry;
import org.qchain.cli.result.StepResult;

/** Markdown (pipe tables) for pasting into reports: exact values and decimals in separate tables, then the caution. */
final class MarkdownFormatter implements Formatter {

    @Override
    public String matrix(StepResult.Matrix m) {
        StepResult.Header h = m.header();
        StringBuilder sb = new StringBuilder();
        sb.append("**").append(TextFormatter.power(h)).append("** for `").append(code(h.source())).append("` (")
            .append(h.kind()).append(" chain): row = state at the start, column = state after ")
            .append(TextFormatter.steps(h.n())).append(".\n\n");
        sb.append("Exact:\n\n");
        grid(sb, m, true);
        sb.append("\nDecimal (").append(TextFormatter.digits(h)).append("):\n\n");
        grid(sb, m, false);
        return caution(sb);
    }

    private static void grid(StringBuilder sb, StepResult.Matrix m, boolean exact) {
        List<String> head = new ArrayList<>();
        head.add("from \\ to");
        for (String s : m.states()) {
            head.add(escape(s));
        }
        line(sb, head);
        line(sb, separator(head.size()));
        for (int i = 0; i < m.states().size(); i++) {
            List<String> cells = new ArrayList<>();
            cells.add("**" + escape(m.states().get(i)) + "**");
            for (Entry e : m.entries().get(i)) {
                cells.add(exact ? escape(e.exact().plain()) : e.decimal());
            }
            line(sb, cells);
        }
    }

    @Override
    public String row(StepResult.Row r) {
        StepResult.Header h = r.header();
        StringBuilder sb = new StringBuilder();
        sb.append("Row **").append(escape(r.from())).append("** of **").append(TextFormatter.power(h))
            .append("** for `").append(code(h.source())).append("` (").append(h.kind())
            .append(" chain): probability of each state after ").append(TextFormatter.steps(h.n()))
            .append(".\n\n");
        line(sb, List.of("to", "exact", "decimal"));
        line(sb, separator(3));
        for (int j = 0; j < r.states().size(); j++) {
            Entry e = r.entries().get(j);
            line(sb, List.of(escape(r.states().get(j)), escape(e.exact().plain()), e.decimal()));
        }
        sb.append("\nDecimals: ").append(TextFormatter.digits(h)).append(".\n");
        return caution(sb);
    }

    @Override
    public String single(StepResult.Single s) {
        StepResult.Header h = s.header();
        StringBuilder sb = new StringBuilder();
        line(sb, List.of("model", "n", "from", "to", "exact", "decimal"));
        line(sb, separator(6));
        line(sb, List.of("`" + code(h.source()) + "`", String.valueOf(h.n()), escape(s.from()), escape(s.to()),
            escape(s.value().exact().plain()), s.value().decimal()));
        s.paths().ifPresent(paths -> {
            sb.append("\nMost probable paths of ").append(TextFormatter.steps(h.n())).append(" from ")
                .append(escape(s.from())).append(" to ").append(escape(s.to())).append(":\n\n");
            line(sb, List.of("rank", "path", "probability", "decimal", "share", "percent"));
            line(sb, separator(6));
            for (int k = 0; k < paths.size(); k++) {
                StepResult.PathLine p = paths.get(k);
                line(sb, List.of(String.valueOf(k + 1), escape(String.join(" \u2192 ", p.states())),
                    escape(p.probability().exact().plain()), p.probability().decimal(),
                    escape(p.share().exact().plain()), p.share().decimal() + " %"));
            }
        });
        sb.append("\nDecimals: ").append(TextFormatter.digits(h)).append(".\n");
        return caution(sb);
    }

    private static String caution(StringBuilder sb) {
        return sb.append("\n*").append(Caution.TEXT).append("*\n").toString();
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

    /** Escapes the characters that Markdown would read as markup or as a table's cell boundary. */
    static String escape(String s) {
        StringBuilder sb = new StringBuilder();
        for (char c : s.toCharArray()) {
            if ("\\`*_[]<|~".indexOf(c) >= 0) {
                sb.append('\\');
            }
            sb.append(c);
        }
        return sb.toString();
    }

    /** Text inside a code span: backticks cannot be escaped there, so they are replaced. */
    private static String code(String s) {
        return s.replace('`', '\'').replace("|", "\\|");
    }
}
