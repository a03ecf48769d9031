package org.qchain.format;

import java.math.BigDecimal;
import org.qchain.result.ReportResult;

/**
 * A plot as a TikZ picture, from the same plot data and axes ({@link PlotAxes}) as {@link SvgPlot}: frame, ticks at
 * round values with labels, axis labels, one {@code plot coordinates} path per curve, each limit dashed, a legend.
 * Needs only the {@code tikz} package.
 */
final class TikzPlot {
    private static final double W = 12;
    private static final double H = 7;
    /** The colours of {@link SvgPlot#COLOURS}, as xcolor RGB (0-255). */
    private static final String[] COLOURS = {"0,114,178", "213,94,0", "0,158,115", "204,121,167", "230,159,0",
        "86,180,233", "0,0,0"};

    private TikzPlot() {
    }

    /** The picture, {@code \begin{tikzpicture}} to {@code \end{tikzpicture}}, ending with a line break. */
    static String tikz(ReportResult.Plot plot) {
        PlotAxes a = PlotAxes.of(plot);
        StringBuilder sb = new StringBuilder();
        sb.append("\\begin{tikzpicture}[x=1cm,y=1cm,font=\\small]\n");
        for (int k = 0; k < COLOURS.length; k++) {
            sb.append("\\definecolor{qc").append((char) ('a' + k)).append("}{RGB}{").append(COLOURS[k]).append("}\n");
        }
        for (BigDecimal t : a.xTicks()) {
            String x = PlotAxes.num(a.fx(t.doubleValue()) * W);
            sb.append("\\draw[black!15] (").append(x).append(",0) -- (").append(x).append(',').append(PlotAxes.num(H))
                .append(");\n\\node[below] at (").append(x).append(",0) {$").append(PlotAxes.label(t)).append("$};\n");
        }
        for (BigDecimal t : a.yTicks()) {
            String y = PlotAxes.num(a.fy(t.doubleValue()) * H);
            sb.append("\\draw[black!15] (0,").append(y).append(") -- (").append(PlotAxes.num(W)).append(',').append(y)
                .append(");\n\\node[left] at (0,").append(y).append(") {$").append(PlotAxes.label(t)).append("$};\n");
        }
        sb.append("\\draw (0,0) rectangle (").append(PlotAxes.num(W)).append(',').append(PlotAxes.num(H)).append(");\n");
        sb.append("\\node at (").append(PlotAxes.num(W / 2)).append(",-0.9) {").append(LatexReport.text(plot.xLabel()))
            .append("};\n");
        sb.append("\\node[rotate=90] at (-1.4,").append(PlotAxes.num(H / 2)).append(") {")
            .append(LatexReport.text(plot.yLabel())).append("};\n");
        sb.append("\\node[above] at (").append(PlotAxes.num(W / 2)).append(',').append(PlotAxes.num(H + 0.1))
            .append(") {").append(LatexReport.text(plot.title())).append("};\n");
        int row = 0;
        for (int k = 0; k < plot.series().size(); k++) {
            ReportResult.Series s = plot.series().get(k);
            String c = "qc" + (char) ('a' + k % COLOURS.length);
            if (s.limit().isPresent()) {
                String y = PlotAxes.num(a.fy(s.limit().get().doubleValue()) * H);
                sb.append("\\draw[").append(c).append(",dashed] (0,").append(y).append(") -- (")
                    .append(PlotAxes.num(W)).append(',').append(y).append(");\n");
            }
            sb.append("\\draw[").append(c).append(",thick] plot coordinates {");
            for (int i = 0; i < s.x().size(); i++) {
                sb.append(i % 8 == 0 ? "\n  " : " ").append('(')
                    .append(PlotAxes.num(a.fx(s.x().get(i).doubleValue()) * W)).append(',')
                    .append(PlotAxes.num(a.fy(s.y().get(i).doubleValue()) * H)).append(')');
            }
            sb.append("};\n");
        }
        // legend below the picture
        for (int k = 0; k < plot.series().size(); k++) {
            ReportResult.Series s = plot.series().get(k);
            String c = "qc" + (char) ('a' + k % COLOURS.length);
            String y = PlotAxes.num(-1.6 - 0.45 * row);
            sb.append("\\draw[").append(c).append(",thick] (0,").append(y).append(") -- (0.8,").append(y)
                .append(") node[right,black] {").append(LatexReport.text(s.label())).append("};\n");
            row++;
            if (s.limit().isPresent()) {
                y = PlotAxes.num(-1.6 - 0.45 * row);
                sb.append("\\draw[").append(c).append(",dashed] (0,").append(y).append(") -- (0.8,").append(y)
                    .append(") node[right,black] {limit ").append(SvgPlot.decimal(s.limit().get())).append("};\n");
                row++;
            }
        }
        sb.append("\\end{tikzpicture}\n");
        return sb.toString();
    }
}
