package org.qchain.exact.model;

import java.util.ArrayList;
import java.util.List;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.InputLimits;
import org.qchain.exact.NumberGrammar;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.SourcePos;

/**
 * Splits one line of expression text into tokens: numbers (read exactly, in the grammar of {@link NumberGrammar}),
 * names, and the symbols {@code + - * / ^ ( ) [ ] , =}. Columns count characters (code points), 1-based.
 */
final class Lexer {
    /** Largest decimal exponent accepted in a number such as {@code 1e-3}; larger ones would need huge powers of 10. */
    static final int MAX_DECIMAL_EXPONENT = NumberGrammar.MAX_DECIMAL_EXPONENT;

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
     * @param index the index in the line of its first char (the line's length for END)
     */
    record Token(Kind kind, String text, SourcePos pos, Rational value, int index) {
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
     * Tokens of {@code line.substring(start, end)}, ending with one END token just after {@code end}, with the
     * default digit limit.
     */
    static List<Token> tokens(String file, int lineNo, String line, int start, int end) {
        return tokens(file, lineNo, line, Columns.of(line), start, end, InputLimits.DEFAULT_MAX_NUMBER_DIGITS);
    }

    /**
     * Tokens of {@code line.substring(start, end)}, ending with one END token just after {@code end}.
     *
     * @param cols      the columns of {@code line}
     * @param maxDigits the digit limit of one number
     * @throws QchainException MALFORMED_NUMBER, NUMBER_TOO_LONG or SYNTAX at the offending character
     */
    static List<Token> tokens(String file, int lineNo, String line, Columns cols, int start, int end, int maxDigits) {
        List<Token> out = new ArrayList<>();
        int i = start;
        while (i < end) {
            char c = line.charAt(i);
            if (Character.isWhitespace(c)) {
                i++;
                continue;
            }
            SourcePos pos = new SourcePos(file, lineNo, cols.column(i));
            if (isDigit(c) || (c == '.' && i + 1 < end && isDigit(line.charAt(i + 1)))) {
                int j = scanNumber(line, i, end);
                String text = line.substring(i, j);
                out.add(new Token(Kind.NUMBER, text, pos, NumberGrammar.unsigned(text, pos, maxDigits), i));
                i = j;
            } else if (isNameStart(c)) {
                int j = i + 1;
                while (j < end && isNamePart(line.charAt(j))) {
                    j++;
                }
                out.add(new Token(Kind.NAME, line.substring(i, j), pos, null, i));
                i = j;
            } else if (SYMBOLS.indexOf(c) >= 0) {
                out.add(new Token(Kind.SYMBOL, String.valueOf(c), pos, null, i));
                i++;
            } else {
                throw new QchainException(pos, ErrorKey.SYNTAX, "unexpected character " + describeChar(line.codePointAt(i)));
            }
        }
        out.add(new Token(Kind.END, "", new SourcePos(file, lineNo, cols.column(end)),
            null, end));
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
     * A signed constant: a number or a quotient {@code p/q} of two numbers, e.g. {@code -3}, {@code 1/20},
     * {@code 0.25}, {@code 1e-3}; surrounding spaces are ignored. Used for CSV entries and {@code --at} values.
     *
     * @throws QchainException as {@link NumberGrammar#constant}
     */
    static Rational constant(String text, SourcePos pos, int maxDigits) {
        return NumberGrammar.constant(text, pos, maxDigits);
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

    /**
     * {@code 'x'}, with the code point for characters outside ASCII (a pasted minus sign U+2212, say); a control
     * character or an unusual space is named by its code point only, since printing it would hide it.
     */
    static String describeChar(int c) {
        if (Character.isISOControl(c) || (Character.isSpaceChar(c) && c != ' ') || Character.getType(c) == Character.FORMAT) {
            String what = c == 0 ? "a NUL byte" : c == 0x00a0 || c == 0x202f || c == 0x2007 ? "a no-break space; write a plain space"
                : Character.isSpaceChar(c) ? "a space character other than ' '; write a plain space"
                : Character.isISOControl(c) ? "a control character" : "an invisible formatting character";
            return String.format("U+%04X (%s)", c, what);
        }
        String s = "'" + new String(Character.toChars(c)) + "'";
        if (c > 126) {
            s += String.format(" (U+%04X)", c);
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
