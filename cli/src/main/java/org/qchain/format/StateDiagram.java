package org.qchain.format;

import java.util.List;
import org.qchain.result.ReportResult;

/**
 * The state diagram: Graphviz DOT text (the open DOT language), and an SVG drawing of our own with the states on a
 * circle, each transition a curved arrow labelled with its probability or rate, self-loops as small loops outside
 * their state.
 */
final class StateDiagram {
    static final int SIZE = 520;
    private static final double NODE_R = 26;

    private StateDiagram() {
    }

    /** The diagram as a DOT {@code digraph}, ending with a line break. */
    static String dot(String name, ReportResult.DiagramSection d) {
        StringBuilder sb = new StringBuilder();
        sb.append("digraph ").append(quote(name)).append(" {\n");
        sb.append("  rankdir=LR;\n  node [shape=circle];\n");
        for (String s : d.states()) {
            sb.append("  ").append(quote(s)).append(";\n");
        }
        for (ReportResult.Edge e : d.edges()) {
            sb.append("  ").append(quote(d.states().get(e.from()))).append(" -> ").append(quote(d.states().get(e.to())))
                .append(" [label=").append(quote(e.label().plain())).append("];\n");
        }
        sb.append("}\n");
        return sb.toString();
    }

    /** A DOT quoted string (ID): {@code "} and {@code \} escaped. */
    static String quote(String s) {
        return '"' + s.replace("\\", "\\\\").replace("\"", "\\\"").replace("\n", "\\n") + '"';
    }

    /** The centre of state {@code i} of {@code n} on the circle. */
    static double[] position(int i, int n) {
        double c = SIZE / 2.0;
        double r = n == 1 ? 0 : SIZE / 2.0 - 90;
        double a = -Math.PI / 2 + 2 * Math.PI * i / n;
        return new double[] {c + r * Math.cos(a), c + r * Math.sin(a)};
    }

    /** Past this many edges the drawing leaves the labels out (they would cover each other); the DOT text has them. */
    static final int MAX_LABELLED_EDGES = 60;

    /** Whether the drawing of these edges carries their labels. */
    static boolean labelled(ReportResult.DiagramSection d) {
        return d.edges().size() <= MAX_LABELLED_EDGES;
    }

    /** The diagram as an {@code <svg>} element. */
    static String svg(String title, ReportResult.DiagramSection d) {
        int n = d.states().size();
        boolean labels = labelled(d);
        StringBuilder sb = new StringBuilder();
        sb.append("<svg xmlns=\"http://www.w3.org/2000/svg\" class=\"diagram\" width=\"").append(SIZE)
            .append("\" height=\"").append(SIZE).append("\" viewBox=\"0 0 ").append(SIZE).append(' ').append(SIZE)
            .append("\" role=\"img\" aria-label=\"").append(SvgPlot.xml(title))
            .append("\" font-family=\"sans-serif\" font-size=\"12\">\n");
        sb.append("<title>").append(SvgPlot.xml(title)).append("</title>\n");
        sb.append("<defs><marker id=\"arrow\" viewBox=\"0 0 10 10\" refX=\"10\" refY=\"5\" markerWidth=\"8\""
            + " markerHeight=\"8\" orient=\"auto-start-reverse\"><path d=\"M 0 0 L 10 5 L 0 10 z\""
            + " fill=\"#333333\"/></marker></defs>\n");
        sb.append("<rect x=\"0\" y=\"0\" width=\"").append(SIZE).append("\" height=\"").append(SIZE)
            .append("\" fill=\"#ffffff\"/>\n");
        double c = SIZE / 2.0;
        for (ReportResult.Edge e : d.edges()) {
            double[] p = position(e.from(), n);
            String label = SvgPlot.xml(e.label().plain());
            if (e.from() == e.to()) {
                // a loop on the side away from the centre
                double ux = p[0] - c;
                double uy = p[1] - c;
                double len = Math.hypot(ux, uy);
                if (len < 1e-9) {
                    ux = 0;
                    uy = -1;
                } else {
                    ux /= len;
                    uy /= len;
                }
                double vx = -uy;
                double vy = ux;
                double sx = p[0] + NODE_R * (ux * 0.7 + vx * 0.7);
                double sy = p[1] + NODE_R * (uy * 0.7 + vy * 0.7);
                double tx = p[0] + NODE_R * (ux * 0.7 - vx * 0.7);
                double ty = p[1] + NODE_R * (uy * 0.7 - vy * 0.7);
                double c1x = p[0] + ux * 75 + vx * 40;
                double c1y = p[1] + uy * 75 + vy * 40;
                double c2x = p[0] + ux * 75 - vx * 40;
                double c2y = p[1] + uy * 75 - vy * 40;
                sb.append("<path class=\"edge loop\" d=\"M ").append(f(sx)).append(' ').append(f(sy)).append(" C ")
                    .append(f(c1x)).append(' ').append(f(c1y)).append(", ").append(f(c2x)).append(' ').append(f(c2y))
                    .append(", ").append(f(tx)).append(' ').append(f(ty))
                    .append("\" fill=\"none\" stroke=\"#333333\" marker-end=\"url(#arrow)\"/>\n");
                if (labels) {
                    sb.append(text(p[0] + ux * 68, p[1] + uy * 68 + 4, label));
                }
                continue;
            }
            double[] q = position(e.to(), n);
            double dx = q[0] - p[0];
            double dy = q[1] - p[1];
            double len = Math.hypot(dx, dy);
            double ux = dx / len;
            double uy = dy / len;
            // bend to the left of the direction of travel, so that i -> j and j -> i do not overlap
            double nx = uy;
            double ny = -ux;
            double bend = Math.min(40, 0.18 * len);
            double sx = p[0] + ux * NODE_R * 0.9 + nx * NODE_R * 0.4;
            double sy = p[1] + uy * NODE_R * 0.9 + ny * NODE_R * 0.4;
            double tx = q[0] - ux * NODE_R * 0.9 + nx * NODE_R * 0.4;
            double ty = q[1] - uy * NODE_R * 0.9 + ny * NODE_R * 0.4;
            double mx = (p[0] + q[0]) / 2 + nx * bend * 2;
            double my = (p[1] + q[1]) / 2 + ny * bend * 2;
            sb.append("<path class=\"edge\" d=\"M ").append(f(sx)).append(' ').append(f(sy)).append(" Q ")
                .append(f(mx)).append(' ').append(f(my)).append(", ").append(f(tx)).append(' ').append(f(ty))
                .append("\" fill=\"none\" stroke=\"#333333\" marker-end=\"url(#arrow)\"/>\n");
            // the quadratic curve's midpoint lies halfway between the chord's midpoint and the control point
            double lx = ((sx + tx) / 2 + mx) / 2 + nx * 8;
            double ly = ((sy + ty) / 2 + my) / 2 + ny * 8 + 4;
            if (labels) {
                sb.append(text(lx, ly, label));
            }
        }
        for (int i = 0; i < n; i++) {
            double[] p = position(i, n);
            sb.append("<g class=\"state\"><circle cx=\"").append(f(p[0])).append("\" cy=\"").append(f(p[1]))
                .append("\" r=\"").append(f(NODE_R)).append("\" fill=\"#eef4fb\" stroke=\"#0072b2\""
                    + " stroke-width=\"2\"/>")
                .append("<text x=\"").append(f(p[0])).append("\" y=\"").append(f(p[1] + 4))
                .append("\" text-anchor=\"middle\" font-weight=\"bold\">").append(SvgPlot.xml(d.states().get(i)))
                .append("</text></g>\n");
        }
        sb.append("</svg>");
        return sb.toString();
    }

    /**
     * The diagram as a TikZ picture with the same circular layout as {@link #svg}: states as circles, each transition
     * a bent arrow labelled with its formula in math mode, self-loops outside their state; past
     * {@link #MAX_LABELLED_EDGES} edges without labels.
     */
    static String tikz(ReportResult.DiagramSection d) {
        int n = d.states().size();
        boolean labels = labelled(d);
        double scale = 11.0 / SIZE;
        StringBuilder sb = new StringBuilder("\\begin{tikzpicture}[>=stealth,font=\\small,"
            + "state/.style={circle,draw,thick,minimum size=1.1cm,inner sep=1pt}]\n");
        for (int i = 0; i < n; i++) {
            double[] p = position(i, n);
            sb.append("\\node[state] (s").append(i).append(") at (").append(f((p[0] - SIZE / 2.0) * scale))
                .append(',').append(f((SIZE / 2.0 - p[1]) * scale)).append(") {")
                .append(LatexReport.text(d.states().get(i))).append("};\n");
        }
        for (ReportResult.Edge e : d.edges()) {
            String label = labels ? " node[midway,fill=white,inner sep=1pt,font=\\scriptsize] {$" + e.label().latex()
                + "$}" : "";
            if (e.from() == e.to()) {
                double[] p = position(e.from(), n);
                long angle = n == 1 ? 90 : Math.round(Math.toDegrees(Math.atan2(SIZE / 2.0 - p[1], p[0] - SIZE / 2.0)));
                sb.append("\\draw[->] (s").append(e.from()).append(") to[out=").append(angle + 25).append(",in=")
                    .append(angle - 25).append(",looseness=6]").append(label).append(" (s").append(e.to())
                    .append(");\n");
            } else {
                sb.append("\\draw[->] (s").append(e.from()).append(") to[bend left=15]").append(label).append(" (s")
                    .append(e.to()).append(");\n");
            }
        }
        return sb.append("\\end{tikzpicture}\n").toString();
    }

    private static String text(double x, double y, String label) {
        return "<text class=\"edge-label\" x=\"" + f(x) + "\" y=\"" + f(y) + "\" text-anchor=\"middle\""
            + " paint-order=\"stroke\" stroke=\"#ffffff\" stroke-width=\"3\" fill=\"#222222\">" + label + "</text>\n";
    }

    private static String f(double v) {
        return PlotAxes.num(v);
    }

    /** The number of edges that are self-loops. */
    static long loops(List<ReportResult.Edge> edges) {
        return edges.stream().filter(e -> e.from() == e.to()).count();
    }
}
