package org.qchain.format;

import java.util.List;
import org.qchain.result.Formula;
import org.qchain.result.ReportResult;

/**
 * The Markdown layout: GitHub-flavoured Markdown tables (GFM spec, "Tables" extension), CommonMark for the rest,
 * formulas as LaTeX between {@code $...$}. The state diagram and the plots are SVG files beside the document,
 * linked as images; the DOT text is a fenced code block.
 */
final class MarkdownReport extends ReportWriter {
    MarkdownReport(int digits) {
        super(digits);
    }

    @Override
    void begin(String title) {
        out.append("# ").append(Text.markdown(title)).append("\n\n");
    }

    @Override
    void end() {
        // nothing to close
    }

    @Override
    void heading(int level, String text, String id) {
        out.append("#".repeat(level)).append(' ').append(Text.markdown(text)).append("\n\n");
    }

    /** Math for {@code $...$}: a {@code |} would end a table cell, so it is written {@code \vert}. */
    static String math(Formula f) {
        return "$" + f.latex().replace("\\left|", "\\left\\vert ").replace("\\right|", "\\right\\vert ")
            .replace("|", "\\vert ") + "$";
    }

    private String spans(List<Span> spans) {
        StringBuilder sb = new StringBuilder();
        for (Span s : spans) {
            if (s instanceof Txt x) {
                sb.append(Text.markdown(x.text()));
            } else if (s instanceof Math m) {
                sb.append(math(m.formula()));
            } else if (s instanceof Code c) {
                sb.append('`').append(Text.code(c.text())).append('`');
            }
        }
        return sb.toString();
    }

    @Override
    void paragraph(List<Span> s) {
        out.append(spans(s)).append("\n\n");
    }

    @Override
    void bullets(List<List<Span>> items) {
        for (List<Span> item : items) {
            out.append("- ").append(spans(item)).append('\n');
        }
        out.append('\n');
    }

    @Override
    void table(String caption, List<String> header, List<List<List<Span>>> rows) {
        out.append("**").append(Text.markdown(caption)).append("**\n\n|");
        for (String h : header) {
            out.append(' ').append(Text.markdown(h)).append(" |");
        }
        out.append("\n|");
        for (int k = 0; k < header.size(); k++) {
            out.append(" --- |");
        }
        out.append('\n');
        for (List<List<Span>> row : rows) {
            out.append('|');
            for (List<Span> cell : row) {
                out.append(' ').append(spans(cell)).append(" |");
            }
            out.append('\n');
        }
        out.append('\n');
    }

    @Override
    void display(Formula f) {
        out.append(math(f)).append("\n\n");
    }

    @Override
    void code(String language, String text) {
        out.append("```").append(language).append('\n').append(text).append(text.endsWith("\n") ? "" : "\n")
            .append("```\n\n");
    }

    @Override
    void diagram(String title, ReportResult.DiagramSection d) {
        String name = baseName + "-diagram.svg";
        attachments.put(name, StateDiagram.svg(title, d) + "\n");
        out.append("![").append(Text.markdown(title)).append("](").append(name).append(")\n\n");
    }

    @Override
    void plot(ReportResult.Plot plot) {
        String name = baseName + "-plot-" + plot.id() + ".svg";
        attachments.put(name, SvgPlot.svg(plot) + "\n");
        out.append("![").append(Text.markdown(plot.title())).append("](").append(name).append(")\n\n");
    }
}
