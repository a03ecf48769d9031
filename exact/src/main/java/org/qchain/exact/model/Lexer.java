package org.qchain.exact.model;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.SourcePos;

/**
 * Splits one line of expression text into tokens: numbers (read exactly), names, and the symbols
 * {@code + - * / ^ ( ) [ ] , =}. Columns are 1-based indexes into the line.
 */
final class Lexer {
    /** Largest decimal exponent accepted in a number such as {@code 1e-3}; larger ones would need huge powers of 10. */
    static final int MAX_DECIMAL_EXPONENT = 10_000;

    private static final Pattern NUMBER = Pattern.compile("(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?");
    private static final String SYMBOLS = "+-*/^()[],=";

    /** Token kinds. */
    enum Kind {
        NUMBER, NAME, SYMBOL, END
    }

    /**
     * A token.
     *
     * @param kind  the kind
     * @param text  the text as written (empty for END)
     * @param pos   where it starts
     * @param value the exact value of a NUMBER, else {@code null}
     */
    record Token(Kind kind, String text, SourcePos pos, Rational value) {
        boolean is(String symbol) {
            return kind == Kind.SYMBOL && text.equals(symbol);
        }

        boolean isIntegerLiteral() {
            return kind == Kind.NUMBER && text.chars().allMatch(c -> c >= '0' && c <= '9');
        }

        /** How the token reads in a message: {@code 'x'} or {@code the end of the line}. */
        String describe() {
            return kind == Kind.END ? "the end of the line" : "'" + text + "'";
        }
    }

    private Lexer() {
    }

    /**
     * Tokens of {@code line.substring(start, end)}, ending with one END token at column {@code end + 1}.
     *
     * @throws QchainException MALFORMED_NUMBER or SYNTAX at the offending character
     */
    static List<Token> tokens(String file, int lineNo, String line, int start, int end) {
        List<Token> out = new ArrayList<>();
        int i = start;
        while (i < end) {
            char c = line.charAt(i);
            if (Character.isWhitespace(c)) {
                i++;
                continue;
            }
            SourcePos pos = new SourcePos(file, lineNo, i + 1);
            if (isDigit(c) || (c == '.' && i + 1 < end && isDigit(line.charAt(i + 1)))) {
                int j = scanNumber(line, i, end);
                String text = line.substring(i, j);
                out.add(new Token(Kind.NUMBER, text, pos, number(text, pos)));
                i = j;
            } else if (isNameStart(c)) {
                int j = i + 1;
                while (j < end && isNamePart(line.charAt(j))) {
                    j++;
                }
                out.add(new Token(Kind.NAME, line.substring(i, j), pos, null));
                i = j;
            } else if (SYMBOLS.indexOf(c) >= 0) {
                out.add(new Token(Kind.SYMBOL, String.valueOf(c), pos, null));
                i++;
            } else {
                throw new QchainException(pos, ErrorKey.SYNTAX, "unexpected character " + describeChar(c));
            }
        }
        out.add(new Token(Kind.END, "", new SourcePos(file, lineNo, end + 1), null));
        return out;
    }

    /** The end of the number starting at {@code i}; a run glued to letters or further dots is taken whole. */
    private static int scanNumber(String s, int i, int end) {
        int j = i;
        while (j < end && isDigit(s.charAt(j))) {
            j++;
        }
        if (j < end && s.charAt(j) == '.') {
            j++;
            while (j < end && isDigit(s.charAt(j))) {
                j++;
            }
        }
        if (j < end && (s.charAt(j) == 'e' || s.charAt(j) == 'E')) {
            int k = j + 1;
            if (k < end && (s.charAt(k) == '+' || s.charAt(k) == '-')) {
                k++;
            }
            if (k < end && isDigit(s.charAt(k))) {
                j = k;
                while (j < end && isDigit(s.charAt(j))) {
                    j++;
                }
            }
        }
        // "3p", "1.2.3", "1e": report the whole glued run as one malformed number
        while (j < end && (isNamePart(s.charAt(j)) || s.charAt(j) == '.')) {
            j++;
        }
        return j;
    }

    /**
     * The exact value of an unsigned number {@code 12}, {@code 0.25}, {@code .5}, {@code 1e-3}.
     *
     * @throws QchainException MALFORMED_NUMBER if it is not one, SYNTAX if its exponent is beyond
     *                         {@link #MAX_DECIMAL_EXPONENT}
     */
    static Rational number(String text, SourcePos pos) {
        if (!NUMBER.matcher(text).matches()) {
            throw new QchainException(pos, ErrorKey.MALFORMED_NUMBER, text);
        }
        BigDecimal d = new BigDecimal(text);
        if (Math.abs((long) d.scale()) > MAX_DECIMAL_EXPONENT + (long) text.length()) {
            throw new QchainException(pos, ErrorKey.SYNTAX, "the number '" + text
                + "' has an exponent beyond +-" + MAX_DECIMAL_EXPONENT + "; write it as a fraction or a power");
        }
        return Rational.of(d);
    }

    private static final Pattern CONSTANT = Pattern.compile(
        "([+-]?)\\s*((?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][+-]?\\d+)?)(?:\\s*/\\s*((?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][+-]?\\d+)?))?");

    /** Whether {@code text} (stripped) is a constant as read by {@link #constant}. */
    static boolean isConstant(String text) {
        return CONSTANT.matcher(text.strip()).matches();
    }

    /**
     * A signed constant: a number or a quotient {@code p/q} of two numbers, e.g. {@code -3}, {@code 1/20},
     * {@code 0.25}, {@code 1e-3}; surrounding spaces are ignored. Used for CSV entries and {@code --at} values.
     *
     * @throws QchainException MALFORMED_NUMBER if the text is not such a constant, DIVISION_BY_ZERO for
     *                         {@code p/0}
     */
    static Rational constant(String text, SourcePos pos) {
        java.util.regex.Matcher m = CONSTANT.matcher(text.strip());
        if (!m.matches()) {
            throw new QchainException(pos, ErrorKey.MALFORMED_NUMBER, text.strip());
        }
        Rational v = number(m.group(2), pos);
        if (m.group(3) != null) {
            Rational d = number(m.group(3), pos);
            if (d.isZero()) {
                throw new QchainException(pos, ErrorKey.DIVISION_BY_ZERO, " in '" + text.strip() + "'");
            }
            v = v.divide(d);
        }
        return m.group(1).equals("-") ? v.negate() : v;
    }

    static boolean isDigit(char c) {
        return c >= '0' && c <= '9';
    }

    static boolean isNameStart(char c) {
        return Character.isLetter(c) || c == '_';
    }

    static boolean isNamePart(char c) {
        return Character.isLetterOrDigit(c) || c == '_';
    }

    /** {@code 'x'}, with the code point for characters outside ASCII (a pasted minus sign U+2212, say). */
    static String describeChar(char c) {
        String s = "'" + c + "'";
        if (c > 126 || c < 32) {
            s += String.format(" (U+%04X)", (int) c);
            if (c == '\u2212' || c == '\u2013' || c == '\u2014') {
                s += "; write '-' for minus";
            } else if (c == '\u00d7' || c == '\u22c5' || c == '\u00b7') {
                s += "; write '*' for a product";
            }
        } else if (c == '%') {
            s += "; percentages are not read: write 5/100 for 5%";
        }
        return s;
    }
}
