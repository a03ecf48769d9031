package org.qchain.format;

import java.util.List;
import org.qchain.result.Formula;
import org.qchain.result.ReportResult;

/**
 * The HTML layout: one self-contained HTML5 file (inline style, MathML formulas, inline SVG diagram and plots, no
 * script and no external resource), so that it renders offline in any current browser.
 */
final class HtmlReport extends ReportWriter {
    private static final String STYLE = """
        body { font-family: sans-serif; max-width: 72em; margin: 2em auto; padding: 0 1em; color: #222; }
        table { border-collapse: collapse; margin: 0.5em 0 1.5em; }
        caption { font-weight: bold; text-align: left; padding: 0.3em 0; }
        th, td { border: 1px solid #bbb; padding: 0.25em 0.6em; text-align: left; vertical-align: top; }
        th { background: #f0f4f8; }
        .caution { border-left: 4px solid #d55e00; padding: 0.4em 0.8em; background: #fff6ef; }
        .display { overflow-x: auto; margin: 0.6em 0; }
        figure { margin: 1em 0; }
        pre { background: #f6f6f6; padding: 0.6em; overflow-x: auto; }
        """;

    HtmlReport(int digits) {
        super(digits);
    }

    static String esc(String s) {
        return SvgPlot.xml(s);
    }

    @Override
    void begin(String title) {
        out.append("<!DOCTYPE html>\n<html xmlns=\"http://www.w3.org/1999/xhtml\" lang=\"en\">\n<head>\n<meta charset=\"utf-8\"/>\n")
            .append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\"/>\n<title>")
            .append(esc(title)).append("</title>\n<style>\n").append(STYLE).append("</style>\n</head>\n<body>\n<main>\n")
            .append("<h1>").append(esc(title)).append("</h1>\n");
    }

    @Override
    void end() {
        out.append("</main>\n</body>\n</html>\n");
    }

    @Override
    void heading(int level, String text, String id) {
        out.append("<h").append(level).append(" id=\"").append(esc(id)).append("\">").append(esc(text)).append("</h")
            .append(level).append(">\n");
    }

    private void spans(List<Span> spans) {
        for (Span s : spans) {
            if (s instanceof Txt x) {
                out.append(esc(x.text()));
            } else if (s instanceof Math m) {
                out.append(m.formula().mathml());
            } else if (s instanceof Code c) {
                out.append("<code>").append(esc(c.text())).append("</code>");
            }
        }
    }

    @Override
    void paragraph(List<Span> s) {
        boolean caution = s.size() == 1 && s.get(0) instanceof Txt x && x.text().equals(Caution.TEXT);
        out.append(caution ? "<p class=\"caution\">" : "<p>");
        spans(s);
        out.append("</p>\n");
    }

    @Override
    void bullets(List<List<Span>> items) {
        out.append("<ul>\n");
        for (List<Span> item : items) {
            out.append("<li>");
            spans(item);
            out.append("</li>\n");
        }
        out.append("</ul>\n");
    }

    @Override
    void table(String caption, List<String> header, List<List<List<Span>>> rows) {
        out.append("<table>\n<caption>").append(esc(caption)).append("</caption>\n<thead><tr>");
        for (String h : header) {
            out.append("<th>").append(esc(h)).append("</th>");
        }
        out.append("</tr></thead>\n<tbody>\n");
        for (List<List<Span>> row : rows) {
            out.append("<tr>");
            for (int k = 0; k < row.size(); k++) {
                out.append(k == 0 ? "<th>" : "<td>");
                spans(row.get(k));
                out.append(k == 0 ? "</th>" : "</td>");
            }
            out.append("</tr>\n");
        }
        out.append("</tbody>\n</table>\n");
    }

    @Override
    void display(Formula f) {
        String m = f.mathml();
        out.append("<div class=\"display\">").append(m.replaceFirst("^<math ", "<math display=\"block\" "))
            .append("</div>\n");
    }

    @Override
    void code(String language, String text) {
        out.append("<pre><code class=\"language-").append(esc(language)).append("\">").append(esc(text))
            .append("</code></pre>\n");
    }

    @Override
    void diagram(String title, ReportResult.DiagramSection d) {
        out.append("<figure class=\"diagram\">\n").append(StateDiagram.svg(title, d)).append("\n<figcaption>")
            .append(esc(title)).append(StateDiagram.labelled(d) ? " (edge labels: the one-step probabilities or rates)"
                : " (" + d.edges().size() + " transitions, drawn without labels; the DOT text below has them)")
            .append("</figcaption>\n</figure>\n");
    }

    @Override
    void plot(ReportResult.Plot plot) {
        out.append("<figure class=\"plot\">\n").append(SvgPlot.svg(plot)).append("\n<figcaption>")
            .append(esc(plot.title())).append("</figcaption>\n</figure>\n");
    }
}
