package org.qchain.format;

import java.util.List;
import org.qchain.exact.Decimals;
import org.qchain.exact.Rational;

/**
 * Helpers every formatter shares: decimals from exact values, CSV fields, Markdown and LaTeX escaping, the one
 * Rational-to-{@code \frac} conversion, and the recurring phrases of headings.
 */
final class Text {
    /** RFC 4180's record separator. */
    static final String CSV_EOL = "\r\n";

    private Text() {
    }

    /** {@code r} correctly rounded to {@code digits} significant digits. */
    static String decimal(Rational r, int digits) {
        return Decimals.format(r, digits);
    }

    /** A share in [0, 1] as a percentage, correctly rounded, without the {@code %} sign. */
    static String percent(Rational share, int digits) {
        return Decimals.format(share.multiply(Rational.of(100)), digits);
    }

    /** {@code P^n}. */
    static String power(long n) {
        return "P^" + n;
    }

    /** {@code 1 step}, {@code 4 steps}. */
    static String steps(long n) {
        return n == 1 ? "1 step" : n + " steps";
    }

    /** {@code 12 significant digits, correctly rounded}. */
    static String digits(int digits) {
        return digits + " significant digits, correctly rounded";
    }

    // --- CSV ---------------------------------------------------------------------------------------------------

    /** One field, quoted only where RFC 4180 section 2 requires it. */
    static String csvField(String f) {
        if (f.indexOf(',') < 0 && f.indexOf('"') < 0 && f.indexOf('\n') < 0 && f.indexOf('\r') < 0) {
            return f;
        }
        return '"' + f.replace("\"", "\"\"") + '"';
    }

    /** Appends one CSV record with its CRLF. */
    static void csvRecord(StringBuilder sb, List<String> fields) {
        for (int i = 0; i < fields.size(); i++) {
            if (i > 0) {
                sb.append(',');
            }
            sb.append(csvField(fields.get(i)));
        }
        sb.append(CSV_EOL);
    }

    // --- Markdown ----------------------------------------------------------------------------------------------

    /** Escapes the characters that Markdown would read as markup or as a table's cell boundary. */
    static String markdown(String s) {
        StringBuilder sb = new StringBuilder();
        for (char c : s.toCharArray()) {
            if ("\\`*_[]<|~".indexOf(c) >= 0) {
                sb.append('\\');
            }
            sb.append(c);
        }
        return sb.toString();
    }

    /** Text inside a Markdown code span: backticks cannot be escaped there, so they are replaced. */
    static String code(String s) {
        return s.replace('`', '\'').replace("|", "\\|");
    }

    // --- LaTeX -------------------------------------------------------------------------------------------------

    /** Escapes LaTeX's special characters in text mode. */
    static String latex(String s) {
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

    /** Text for a LaTeX (or any line) comment: line breaks would end the comment. */
    static String comment(String s) {
        return s.replace('\n', ' ').replace('\r', ' ');
    }

    /** The one LaTeX form of an exact number: {@code k} or {@code -\frac{p}{q}}. */
    static String frac(Rational r) {
        if (r.isInteger()) {
            return r.toString();
        }
        return (r.signum() < 0 ? "-" : "") + "\\frac{" + r.numerator().abs() + "}{" + r.denominator() + "}";
    }
}
