package org.qchain.format;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;
import org.qchain.exact.Rational;
import org.qchain.exact.floats.FloatText;
import org.qchain.exact.reference.EntryCheck;
import org.qchain.exact.reference.Target;
import org.qchain.exact.reference.Tolerance;
import org.qchain.exact.reference.VerifyReport;
import org.qchain.result.VerifyResult;

/**
 * What every format says about a {@code verify} result, in words and table cells, so the formats differ only in
 * layout: the quantity checked, the tolerance, each listed entry's cells, the summary sentence.
 */
final class Checks {
    /** Significant digits of the errors shown (they are rounded for display only). */
    static final int ERROR_DIGITS = 3;

    private Checks() {
    }

    /** {@code P^10}, {@code row Up of P^10}, {@code P^10(Up -> Down)}, or the quantity's word. */
    static String quantity(VerifyResult r) {
        String power = r.n().isPresent() ? Text.power(r.n().getAsLong())
            : r.t().map(t -> "P(" + t + ")").orElse("");
        return switch (r.what()) {
            case "matrix" -> power;
            case "row" -> "row " + r.from().orElse("") + " of " + power;
            case "entry" -> power + "(" + r.from().orElse("") + " -> " + r.to().orElse("") + ")";
            default -> r.what();
        };
    }

    /** An exact bound in its shortest decimal form when it has one ({@code 1e-9}), else {@code p/q}. */
    static String bound(Rational r) {
        try {
            BigDecimal d = new BigDecimal(r.numerator()).divide(new BigDecimal(r.denominator()));
            String s = d.stripTrailingZeros().toString().replace("E+", "e").replace("E", "e");
            return s;
        } catch (ArithmeticException nonTerminating) {
            return r.toString();
        }
    }

    /** {@code relative error at most 1e-9, or absolute error at most 1e-12, or at most 2 ulps}. */
    static String tolerance(Tolerance t) {
        List<String> parts = new ArrayList<>();
        t.relative().ifPresent(r -> parts.add("relative error at most " + bound(r)));
        t.absolute().ifPresent(a -> parts.add("absolute error at most " + bound(a)));
        if (t.ulps().isPresent()) {
            parts.add("at most " + ulps(t.ulps().getAsLong()));
        }
        return String.join(", or ", parts);
    }

    private static String ulps(long k) {
        return k + (k == 1 ? " ulp" : " ulps");
    }

    /** An error, rounded to {@value #ERROR_DIGITS} significant digits; {@code inf}, {@code -inf} or {@code nan}. */
    static String error(double e) {
        if (Double.isNaN(e)) {
            return "nan";
        }
        if (Double.isInfinite(e)) {
            return e > 0 ? "inf" : "-inf";
        }
        if (e == 0) {
            return "0";
        }
        // always e-notation, so errors of different sizes line up by their exponents: 1.00e-6, 3.00e-18
        BigDecimal d = new BigDecimal(e).round(new MathContext(ERROR_DIGITS, RoundingMode.HALF_EVEN));
        if (d.precision() < ERROR_DIGITS) {
            d = d.setScale(d.scale() + ERROR_DIGITS - d.precision());
        }
        String m = d.unscaledValue().abs().toString();
        int exp = m.length() - 1 - d.scale();
        String mant = m.length() == 1 ? m : m.charAt(0) + "." + m.substring(1);
        return (e < 0 ? "-" : "") + mant + "e" + exp;
    }

    /** An error as the shortest decimal of its double (exact for scripts); {@code inf}, {@code nan}. */
    static String errorExact(double e) {
        return Double.isNaN(e) ? "nan" : Double.isInfinite(e) ? (e > 0 ? "inf" : "-inf") : FloatText.shortest(e);
    }

    /** The ulps cell: the count, or {@code -} for a non-finite value. */
    static String ulpsCell(EntryCheck c) {
        return c.ulps().isPresent() ? String.valueOf(c.ulps().getAsLong()) : "-";
    }

    /** {@code ok}, {@code over} or {@code not finite}. */
    static String status(EntryCheck c) {
        return c.pass() ? "ok" : c.isFinite() ? "over" : "not finite";
    }

    /** {@code line:column} in the checked file. */
    static String place(EntryCheck c) {
        return c.pos().line() + ":" + c.pos().column();
    }

    /** The row state of an entry of a matrix target. */
    static String rowState(Target t, EntryCheck c) {
        return t.rows().get(c.row());
    }

    /** The column state (or the vector's state) of an entry. */
    static String colState(Target t, EntryCheck c) {
        return t.cols().get(c.col());
    }

    /** The one-line verdict: {@code all 9 values within the tolerance} or {@code 1 of 9 values over the tolerance}. */
    static String verdict(VerifyReport r) {
        if (r.passed()) {
            return (r.checked() == 1 ? "the value is" : "all " + r.checked() + " values are") + " within the tolerance";
        }
        return r.overTolerance() + " of " + r.checked() + (r.checked() == 1 ? " value" : " values")
            + (r.overTolerance() == 1 ? " is" : " are") + " over the tolerance";
    }

    /** The summary sentence of a report. */
    static String summary(VerifyReport r) {
        StringBuilder sb = new StringBuilder();
        sb.append(r.checked()).append(r.checked() == 1 ? " value" : " values").append(" checked");
        if (r.checked() < r.expected()) {
            sb.append(" (of ").append(r.expected()).append(")");
        }
        sb.append(", ").append(r.overTolerance()).append(" over the tolerance");
        if (r.nonFinite() > 0) {
            sb.append(" (").append(r.nonFinite()).append(" not finite)");
        }
        sb.append("; worst relative error ").append(error(r.worstRelativeError()));
        if (r.worstUlps().isPresent()) {
            sb.append(", worst ").append(ulps(r.worstUlps().getAsLong()));
        }
        sb.append("; ");
        if (r.allCorrectlyRounded()) {
            sb.append("every value is the correctly rounded double of the exact one (0 ulp)");
        } else {
            sb.append(r.correctlyRounded()).append(" of ").append(r.checked())
                .append(" are the correctly rounded double of the exact one (0 ulp)");
        }
        return sb.toString();
    }
}
