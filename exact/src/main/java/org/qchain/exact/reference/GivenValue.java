package org.qchain.exact.reference;

import java.util.Locale;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.floats.Binary64;
import org.qchain.exact.floats.FloatText;

/**
 * One number as another tool wrote it, read exactly: a decimal ({@code 0.25}, {@code -1.5e-3}, {@code 1/3}) in the
 * grammar of {@link Rational#parse(String)}, a hexadecimal float ({@code 0x1.8p-3}, JLS §3.10.2, read by
 * {@link FloatText#parseHex(String)}), or a non-finite value ({@code inf}, {@code -Infinity}, {@code nan}, and JSON's
 * {@code null}, which is what JavaScript writes for NaN). Non-finite values are read so they can be reported, and
 * always fail a check.
 */
public sealed interface GivenValue {
    /** The text as written in the file. */
    String text();

    /**
     * The binary64 the text stands for: the correctly rounded double of the exact value (what any correctly rounding
     * reader of the file would hold), or the infinity or NaN.
     */
    double asDouble();

    /** Whether the value is a finite number. */
    default boolean isFinite() {
        return this instanceof Finite;
    }

    /**
     * A finite value.
     *
     * @param text     the text as written
     * @param value    its exact value
     * @param asDouble its correctly rounded double
     */
    record Finite(String text, Rational value, double asDouble) implements GivenValue {
    }

    /**
     * {@code inf}, {@code -inf}, {@code nan} or {@code null}.
     *
     * @param text     the text as written
     * @param asDouble the infinity, or NaN
     */
    record NonFinite(String text, double asDouble) implements GivenValue {
    }

    /**
     * Reads one value.
     *
     * @param text the text (stripped of surrounding spaces)
     * @return the value
     * @throws NumberFormatException if the text is none of the accepted forms; the message says what it is not
     */
    static GivenValue parse(String text) {
        String t = text.strip();
        String lower = t.toLowerCase(Locale.ROOT);
        String unsigned = lower.startsWith("+") || lower.startsWith("-") ? lower.substring(1) : lower;
        switch (unsigned) {
            case "inf", "infinity" -> {
                return new NonFinite(t, lower.startsWith("-") ? Double.NEGATIVE_INFINITY : Double.POSITIVE_INFINITY);
            }
            case "nan", "null" -> {
                if (!lower.equals(unsigned) && unsigned.equals("null")) {
                    break;
                }
                return new NonFinite(t, Double.NaN);
            }
            default -> {
            }
        }
        if (t.indexOf('x') >= 0 || t.indexOf('X') >= 0) {
            Rational v = FloatText.parseHex(t);
            return new Finite(t, v, Binary64.round(v));
        }
        Rational v;
        try {
            v = Rational.parse(t);
        } catch (ArithmeticException | QchainException e) {
            // a plain "malformed number" needs no detail; the reader's message already says what is expected
            throw new NumberFormatException(e instanceof QchainException q && q.key() == ErrorKey.MALFORMED_NUMBER
                ? q.detail() : "'" + t + "': " + e.getMessage());
        }
        // a decimal in the grammar just checked is one Double.parseDouble reads, and it rounds correctly (Java SE
        // API, Double.valueOf(String)): the same double as Binary64.round(v), found faster
        double d = t.indexOf('/') >= 0 ? Binary64.round(v) : Double.parseDouble(t);
        return new Finite(t, v, d);
    }
}
