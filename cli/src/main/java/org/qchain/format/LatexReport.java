package org.qchain.format;

import java.util.List;
import org.qchain.result.Formula;
import org.qchain.result.ReportResult;

/**
 * The LaTeX layout: a complete document ({@code \documentclass{article}} with amsmath, booktabs and tikz only) with
 * booktabs tables, formulas in math mode, the DOT text verbatim and the plots as TikZ pictures. Tables and formulas
 * wider than the text are scaled down to its width.
 */
final class LatexReport extends ReportWriter {
    /** Scales its argument down to the line width when it is wider (graphicx, loaded by tikz). */
    private static final String FIT = "\\resizebox{\\ifdim\\width>\\linewidth\\linewidth\\else\\width\\fi}{!}{";

    LatexReport(int digits) {
        super(digits);
    }

    /** Text mode: LaTeX's special characters escaped, the report's few symbols as math, {@code P^n} raised. */
    static String text(String s) {
        StringBuilder sb = new StringBuilder();
        int i = 0;
        while (i < s.length()) {
            char c = s.charAt(i);
            if (c == '-' && i + 1 < s.length() && s.charAt(i + 1) == '>') {
                sb.append("$\\to$");
                i += 2;
                continue;
            }
            if (c == '^') {
                int j = i + 1;
                if (j < s.length() && s.charAt(j) == '(' && s.indexOf(')', j) > 0) {
                    // P^(2m + 1): the parenthesised exponent, without its parentheses
                    int close = s.indexOf(')', j);
                    sb.append("\\textsuperscript{").append(Text.latex(s.substring(j + 1, close))).append('}');
                    i = close + 1;
                    continue;
                }
                while (j < s.length() && (Character.isLetterOrDigit(s.charAt(j)))) {
                    j++;
                }
                sb.append("\\textsuperscript{").append(Text.latex(s.substring(i + 1, j))).append('}');
                i = j;
                continue;
            }
            switch (c) {
                case '≈' -> sb.append("$\\approx$");
                case '≥' -> sb.append("$\\geq$");
                case '≤' -> sb.append("$\\leq$");
                case '≠' -> sb.append("$\\neq$");
                case 'π' -> sb.append("$\\pi$");
                case '−' -> sb.append("$-$");
                case '∞' -> sb.append("$\\infty$");
                case '<' -> sb.append("\\textless{}");
                case '>' -> sb.append("\\textgreater{}");
                case '|' -> sb.append("\\textbar{}");
                default -> sb.append(Text.latex(String.valueOf(c)));
            }
            i++;
        }
        return sb.toString();
    }

    @Override
    void begin(String title) {
        out.append("\\documentclass{article}\n\\usepackage{amsmath}\n\\usepackage{booktabs}\n\\usepackage{tikz}\n")
            .append("\\title{").append(text(title)).append("}\n\\date{}\n\\begin{document}\n\\maketitle\n\n");
    }

    @Override
    void end() {
        out.append("\\end{document}\n");
    }

    @Override
    void heading(int level, String s, String id) {
        out.append(level <= 2 ? "\\section*{" : "\\subsection*{").append(text(s)).append("}\n\n");
    }

    /** Formulas longer than this many characters of LaTeX are set so that lines may break inside them. */
    static final int LONG_FORMULA = 160;

    /**
     * Math that TeX may break across lines: {@code \left( \right)} groups (which never break) become plain
     * parentheses, so the binary operators inside them are break points of the paragraph.
     */
    static String breakable(String latex) {
        return latex.replace("\\left(", "(").replace("\\right)", ")").replace("\\left|", "|")
            .replace("\\right|", "|");
    }

    private String spans(List<Span> spans) {
        return spans(spans, false);
    }

    private String spans(List<Span> spans, boolean inTable) {
        StringBuilder sb = new StringBuilder();
        for (Span s : spans) {
            if (s instanceof Txt x) {
                sb.append(text(x.text()));
            } else if (s instanceof Math m) {
                String l = m.formula().latex();
                sb.append('$').append(inTable || l.length() <= LONG_FORMULA ? l : breakable(l)).append('$');
            } else if (s instanceof Code c) {
                sb.append("\\texttt{").append(Text.latex(c.text())).append('}');
            }
        }
        return sb.toString();
    }

    @Override
    void paragraph(List<Span> s) {
        out.append("\\noindent ").append(spans(s)).append("\n\n");
    }

    @Override
    void bullets(List<List<Span>> items) {
        out.append("\\begin{itemize}\n");
        for (List<Span> item : items) {
            out.append("\\item ").append(spans(item)).append('\n');
        }
        out.append("\\end{itemize}\n\n");
    }

    @Override
    void table(String caption, List<String> header, List<List<List<Span>>> rows) {
        out.append("\\begin{center}\n\\textbf{").append(text(caption)).append("}\\\\[4pt]\n").append(FIT)
            .append("\\begin{tabular}{").append("l".repeat(header.size())).append("}\n\\toprule\n");
        for (int k = 0; k < header.size(); k++) {
            out.append(k > 0 ? " & " : "").append(text(header.get(k)));
        }
        out.append(" \\\\\n\\midrule\n");
        for (List<List<Span>> row : rows) {
            for (int k = 0; k < row.size(); k++) {
                out.append(k > 0 ? " & " : "").append(spans(row.get(k), true));
            }
            out.append(" \\\\\n");
        }
        out.append("\\bottomrule\n\\end{tabular}}\n\\end{center}\n\n");
    }

    @Override
    void display(Formula f) {
        if (f.latex().length() > LONG_FORMULA) {
            // too long for one line at a readable size: a ragged paragraph whose lines break at the operators
            out.append("\\begin{flushleft}\n$").append(breakable(f.latex())).append("$\n\\end{flushleft}\n\n");
            return;
        }
        out.append("\\begin{center}\n").append(FIT).append("$\\displaystyle ").append(f.latex()).append("$}\n")
            .append("\\end{center}\n\n");
    }

    @Override
    void code(String language, String s) {
        out.append("\\begin{verbatim}\n").append(s).append(s.endsWith("\n") ? "" : "\n").append("\\end{verbatim}\n\n");
    }

    @Override
    void diagram(String title, ReportResult.DiagramSection d) {
        out.append("\\begin{center}\n").append(StateDiagram.tikz(d)).append("\\end{center}\n\n");
    }

    @Override
    void plot(ReportResult.Plot plot) {
        out.append("\\begin{center}\n").append(TikzPlot.tikz(plot)).append("\\end{center}\n\n");
    }
}
