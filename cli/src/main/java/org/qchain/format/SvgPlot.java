package org.qchain.format;

import java.math.BigDecimal;
import org.qchain.exact.Rational;
import org.qchain.result.ReportResult;

/**
 * A plot drawn as standalone SVG 1.1 markup (W3C): a frame with ticks at round values and their labels, axis labels,
 * a title, one polyline per curve (one point per data value), each limit as a dashed line in its curve's colour, and
 * a legend. Our own drawing; no script, no external resource.
 */
final class SvgPlot {
    static final int WIDTH = 640;
    static final int HEIGHT = 400;
    private static final int LEFT = 70;
    private static final int RIGHT = 20;
    private static final int TOP = 40;
    private static final int BOTTOM = 55;
    /** Curve colours (colour-blind safe order), cycled. */
    static final String[] COLOURS = {"#0072b2", "#d55e00", "#009e73", "#cc79a7", "#e69f00", "#56b4e9", "#000000"};

    private SvgPlot() {
    }

    /** The plot as an {@code <svg>} element. */
    static String svg(ReportResult.Plot plot) {
        PlotAxes a = PlotAxes.of(plot);
        int rows = 0;
        for (ReportResult.Series s : plot.series()) {
            rows += s.limit().isPresent() ? 2 : 1;
        }
        // the legend sits below the axis label, two entries a line
        int legendLines = (rows + 1) / 2;
        int height = HEIGHT + legendLines * 18 + 8;
        double w = WIDTH - LEFT - RIGHT;
        double h = HEIGHT - TOP - BOTTOM;
        StringBuilder sb = new StringBuilder();
        sb.append("<svg xmlns=\"http://www.w3.org/2000/svg\" class=\"plot\" id=\"plot-").append(xml(plot.id()))
            .append("\" width=\"").append(WIDTH).append("\" height=\"").append(height).append("\" viewBox=\"0 0 ")
            .append(WIDTH).append(' ').append(height).append("\" role=\"img\" aria-label=\"").append(xml(plot.title()))
            .append("\" font-family=\"sans-serif\" font-size=\"12\">\n");
        sb.append("<title>").append(xml(plot.title())).append("</title>\n");
        sb.append("<rect x=\"0\" y=\"0\" width=\"").append(WIDTH).append("\" height=\"").append(height)
            .append("\" fill=\"#ffffff\"/>\n");
        sb.append("<text x=\"").append(WIDTH / 2).append("\" y=\"22\" text-anchor=\"middle\" font-size=\"14\">")
            .append(xml(plot.title())).append("</text>\n");
        // ticks and grid
        for (BigDecimal t : a.xTicks()) {
            double x = LEFT + a.fx(t.doubleValue()) * w;
            sb.append("<line class=\"grid\" x1=\"").append(PlotAxes.num(x)).append("\" y1=\"").append(TOP)
                .append("\" x2=\"").append(PlotAxes.num(x)).append("\" y2=\"").append(TOP + (int) h)
                .append("\" stroke=\"#e0e0e0\"/>\n");
            sb.append("<text x=\"").append(PlotAxes.num(x)).append("\" y=\"").append(TOP + (int) h + 18)
                .append("\" text-anchor=\"middle\">").append(PlotAxes.label(t)).append("</text>\n");
        }
        for (BigDecimal t : a.yTicks()) {
            double y = TOP + (1 - a.fy(t.doubleValue())) * h;
            sb.append("<line class=\"grid\" x1=\"").append(LEFT).append("\" y1=\"").append(PlotAxes.num(y))
                .append("\" x2=\"").append(LEFT + (int) w).append("\" y2=\"").append(PlotAxes.num(y))
                .append("\" stroke=\"#e0e0e0\"/>\n");
            sb.append("<text x=\"").append(LEFT - 6).append("\" y=\"").append(PlotAxes.num(y + 4))
                .append("\" text-anchor=\"end\">").append(PlotAxes.label(t)).append("</text>\n");
        }
        sb.append("<rect x=\"").append(LEFT).append("\" y=\"").append(TOP).append("\" width=\"").append((int) w)
            .append("\" height=\"").append((int) h).append("\" fill=\"none\" stroke=\"#000000\"/>\n");
        sb.append("<text x=\"").append(LEFT + (int) w / 2).append("\" y=\"").append(HEIGHT - 12)
            .append("\" text-anchor=\"middle\">").append(xml(plot.xLabel())).append("</text>\n");
        sb.append("<text transform=\"translate(16,").append(TOP + (int) h / 2).append(") rotate(-90)\""
            + " text-anchor=\"middle\">").append(xml(plot.yLabel())).append("</text>\n");
        for (int k = 0; k < plot.series().size(); k++) {
            ReportResult.Series s = plot.series().get(k);
            String c = COLOURS[k % COLOURS.length];
            if (s.limit().isPresent()) {
                double y = TOP + (1 - a.fy(s.limit().get().doubleValue())) * h;
                sb.append("<line class=\"limit\" x1=\"").append(LEFT).append("\" y1=\"").append(PlotAxes.num(y))
                    .append("\" x2=\"").append(LEFT + (int) w).append("\" y2=\"").append(PlotAxes.num(y))
                    .append("\" stroke=\"").append(c).append("\" stroke-dasharray=\"6 4\"/>\n");
            }
            sb.append("<polyline class=\"curve\" fill=\"none\" stroke=\"").append(c)
                .append("\" stroke-width=\"2\" points=\"");
            for (int i = 0; i < s.x().size(); i++) {
                sb.append(i > 0 ? " " : "").append(PlotAxes.num(LEFT + a.fx(s.x().get(i).doubleValue()) * w))
                    .append(',').append(PlotAxes.num(TOP + (1 - a.fy(s.y().get(i).doubleValue())) * h));
            }
            sb.append("\"/>\n");
        }
        // legend below the frame: a solid line per curve, a dashed one per limit
        sb.append("<g class=\"legend\">\n");
        int item = 0;
        for (int k = 0; k < plot.series().size(); k++) {
            ReportResult.Series s = plot.series().get(k);
            String c = COLOURS[k % COLOURS.length];
            item = legendItem(sb, item, c, false, xml(s.label()));
            if (s.limit().isPresent()) {
                item = legendItem(sb, item, c, true, "limit " + decimal(s.limit().get()));
            }
        }
        sb.append("</g>\n</svg>");
        return sb.toString();
    }

    private static int legendItem(StringBuilder sb, int item, String colour, boolean dashed, String text) {
        int x = LEFT + (item % 2) * 280;
        int y = HEIGHT + 8 + (item / 2) * 18;
        sb.append("<line x1=\"").append(x).append("\" y1=\"").append(y - 4).append("\" x2=\"").append(x + 24)
            .append("\" y2=\"").append(y - 4).append("\" stroke=\"").append(colour).append("\" stroke-width=\"2\"")
            .append(dashed ? " stroke-dasharray=\"6 4\"" : "").append("/><text x=\"").append(x + 30).append("\" y=\"")
            .append(y).append("\">").append(text).append("</text>\n");
        return item + 1;
    }

    static String decimal(Rational r) {
        return Text.decimal(r, 6);
    }

    /** Escapes XML text and attribute values. */
    static String xml(String s) {
        StringBuilder sb = new StringBuilder();
        for (char c : s.toCharArray()) {
            switch (c) {
                case '&' -> sb.append("&amp;");
                case '<' -> sb.append("&lt;");
                case '>' -> sb.append("&gt;");
                case '"' -> sb.append("&quot;");
                default -> sb.append(c);
            }
        }
        return sb.toString();
    }
}
