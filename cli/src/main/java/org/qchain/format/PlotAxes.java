package org.qchain.format;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import org.qchain.result.ReportResult;

/**
 * The scale of one plot, shared by the SVG and the TikZ drawings so that both show the same picture: the data range
 * widened to round tick values (steps of 1, 2 or 5 times a power of ten), tick labels without spurious digits, and
 * the mapping of data to the unit square.
 *
 * @param xMin   left end of the x axis
 * @param xMax   right end
 * @param yMin   bottom of the y axis
 * @param yMax   top
 * @param xTicks tick values on x, in order
 * @param yTicks tick values on y, in order
 */
record PlotAxes(double xMin, double xMax, double yMin, double yMax, List<BigDecimal> xTicks, List<BigDecimal> yTicks) {

    /** The axes of a plot: every point and every limit line inside, ticks at round values. */
    static PlotAxes of(ReportResult.Plot plot) {
        double x0 = Double.POSITIVE_INFINITY;
        double x1 = Double.NEGATIVE_INFINITY;
        double y0 = Double.POSITIVE_INFINITY;
        double y1 = Double.NEGATIVE_INFINITY;
        for (ReportResult.Series s : plot.series()) {
            for (int k = 0; k < s.x().size(); k++) {
                double x = s.x().get(k).doubleValue();
                double y = s.y().get(k).doubleValue();
                x0 = Math.min(x0, x);
                x1 = Math.max(x1, x);
                y0 = Math.min(y0, y);
                y1 = Math.max(y1, y);
            }
            if (s.limit().isPresent()) {
                double l = s.limit().get().doubleValue();
                y0 = Math.min(y0, l);
                y1 = Math.max(y1, l);
            }
        }
        if (!(x0 <= x1)) {
            x0 = 0;
            x1 = 1;
        }
        if (!(y0 <= y1)) {
            y0 = 0;
            y1 = 1;
        }
        // probabilities read best from 0; other figures keep their own range
        if (y0 >= 0 && y1 <= 1 && y0 < 0.5 * y1) {
            y0 = 0;
        }
        List<BigDecimal> xt = ticks(x0, x1);
        List<BigDecimal> yt = ticks(y0, y1);
        return new PlotAxes(xt.get(0).doubleValue(), xt.get(xt.size() - 1).doubleValue(), yt.get(0).doubleValue(),
            yt.get(yt.size() - 1).doubleValue(), xt, yt);
    }

    /** Round tick values covering [lo, hi]: 4 to 10 of them, a step of 1, 2 or 5 times a power of ten. */
    static List<BigDecimal> ticks(double lo, double hi) {
        if (hi - lo < 1e-12 * Math.max(1, Math.abs(hi))) {
            double pad = lo == 0 ? 1 : Math.abs(lo) * 0.1;
            lo -= pad;
            hi += pad;
        }
        double raw = (hi - lo) / 5;
        int exp = (int) Math.floor(Math.log10(raw));
        double base = raw / Math.pow(10, exp);
        int mult = base <= 1 ? 1 : base <= 2 ? 2 : base <= 5 ? 5 : 10;
        BigDecimal step = BigDecimal.valueOf(mult).scaleByPowerOfTen(exp);
        BigDecimal first = BigDecimal.valueOf(Math.floor(lo / step.doubleValue() + 1e-9)).multiply(step);
        List<BigDecimal> out = new ArrayList<>();
        BigDecimal t = first;
        out.add(t);
        while (t.doubleValue() < hi - 1e-9 * step.doubleValue()) {
            t = t.add(step);
            out.add(t);
        }
        return out;
    }

    /** The tick's label: plain decimal, no trailing zeros. */
    static String label(BigDecimal t) {
        BigDecimal s = t.stripTrailingZeros();
        return s.signum() == 0 ? "0" : s.toPlainString();
    }

    /** x mapped to [0, 1]. */
    double fx(double x) {
        return xMax == xMin ? 0 : (x - xMin) / (xMax - xMin);
    }

    /** y mapped to [0, 1] (0 at the bottom). */
    double fy(double y) {
        return yMax == yMin ? 0 : (y - yMin) / (yMax - yMin);
    }

    /** A coordinate rounded to two decimals, as drawings print them. */
    static String num(double v) {
        double r = Math.round(v * 100) / 100.0;
        if (r == Math.rint(r)) {
            return Long.toString((long) r);
        }
        return BigDecimal.valueOf(r).stripTrailingZeros().toPlainString();
    }
}
