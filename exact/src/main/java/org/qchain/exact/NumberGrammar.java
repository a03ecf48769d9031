package org.qchain.exact;

/**
 * The one grammar of written numbers, shared by model files, CSV matrices and every option value read through
 * {@link Rational#parse}: an unsigned number is {@code DIGITS [. [DIGITS]]} or {@code . DIGITS}, optionally followed
 * by {@code e} or {@code E}, an optional sign and the exponent's digits ({@code 12}, {@code 0.25}, {@code .5},
 * {@code 1e-3}, {@code 2.5E2}); a constant is an optional sign, an unsigned number and optionally {@code /} and a
 * second unsigned number ({@code -3/4}, {@code 1e-3/7}), spaces allowed around the parts. Only ASCII digits count.
 * Values are exact: {@code 0.1} is {@code 1/10}.
 *
 * <p>Limits, checked on the text before any arithmetic: the written exponent is at most
 * {@link #MAX_DECIMAL_EXPONENT} in magnitude (so {@code 1e99999999999} is a clean error, not an overflow), and a
 * number has at most {@link InputLimits#maxNumberDigits()} digits (its cost grows with the square of its length).
 */
public final class NumberGrammar {
    /** Largest magnitude of a decimal exponent as written ({@code 1e-3}): larger ones would need huge powers of 10. */
    public static final int MAX_DECIMAL_EXPONENT = 10_000;

    /** How many characters of a long number a message quotes. */
    private static final int QUOTE = 24;

    private NumberGrammar() {
    }

    /**
     * The exact value of an unsigned number such as {@code 12}, {@code 0.25}, {@code .5} or {@code 1e-3}.
     *
     * @param text      the number as written, nothing around it
     * @param pos       where it starts, for the message (may be {@code null})
     * @param maxDigits the largest count of digits allowed
     * @return its value
     * @throws QchainException {@link ErrorKey#MALFORMED_NUMBER} if it is not such a number; {@link ErrorKey#SYNTAX}
     *                         if its exponent is beyond {@link #MAX_DECIMAL_EXPONENT};
     *                         {@link ErrorKey#NUMBER_TOO_LONG} if it has more than {@code maxDigits} digits
     */
    public static Rational unsigned(String text, SourcePos pos, int maxDigits) {
        int n = text.length();
        int i = 0;
        while (i < n && isDigit(text.charAt(i))) {
            i++;
        }
        int intEnd = i;
        int fracStart = i;
        if (i < n && text.charAt(i) == '.') {
            i++;
            fracStart = i;
            while (i < n && isDigit(text.charAt(i))) {
                i++;
            }
        }
        int fracEnd = i;
        int digits = intEnd + (fracEnd - fracStart);
        if (digits == 0) {
            throw malformed(text, pos);
        }
        long exponent = 0;
        if (i < n && (text.charAt(i) == 'e' || text.charAt(i) == 'E')) {
            i++;
            boolean negative = false;
            if (i < n && (text.charAt(i) == '+' || text.charAt(i) == '-')) {
                negative = text.charAt(i) == '-';
                i++;
            }
            int expStart = i;
            while (i < n && isDigit(text.charAt(i))) {
                // saturate: the size alone decides, never an overflow
                exponent = Math.min(exponent * 10 + (text.charAt(i) - '0'), 1L << 40);
                i++;
            }
            if (i == expStart) {
                throw malformed(text, pos);
            }
            if (exponent > MAX_DECIMAL_EXPONENT) {
                throw new QchainException(pos, ErrorKey.SYNTAX, "the number '" + quote(text)
                    + "' has an exponent beyond +-" + MAX_DECIMAL_EXPONENT + "; write it as a fraction or a power");
            }
            exponent = negative ? -exponent : exponent;
        }
        if (i != n) {
            throw malformed(text, pos);
        }
        if (digits > maxDigits) {
            throw new QchainException(pos, ErrorKey.NUMBER_TOO_LONG, quote(text), digits, maxDigits);
        }
        String mantissa = fracStart == intEnd ? text.substring(0, intEnd)
            : text.substring(0, intEnd) + text.substring(fracStart, fracEnd);
        java.math.BigInteger m = new java.math.BigInteger(mantissa);
        long scale = (fracEnd - fracStart) - exponent;
        if (scale <= 0) {
            return Rational.of(m.multiply(java.math.BigInteger.TEN.pow((int) -scale)));
        }
        return Rational.of(m, java.math.BigInteger.TEN.pow((int) scale));
    }

    /**
     * The exact value of a constant: an optional sign, an unsigned number, optionally {@code /} and a second one
     * ({@code -3}, {@code 1/20}, {@code 0.25}, {@code 1e-3}); spaces around the parts are ignored.
     *
     * @param text      the text
     * @param pos       where it starts, for the message (may be {@code null})
     * @param maxDigits the largest count of digits of each number
     * @return its value
     * @throws QchainException as {@link #unsigned}, with {@link ErrorKey#MALFORMED_NUMBER} quoting the whole text,
     *                         and {@link ErrorKey#DIVISION_BY_ZERO} for {@code p/0}
     */
    public static Rational constant(String text, SourcePos pos, int maxDigits) {
        String t = text.strip();
        boolean minus = false;
        int s = 0;
        if (!t.isEmpty() && (t.charAt(0) == '+' || t.charAt(0) == '-')) {
            minus = t.charAt(0) == '-';
            s = 1;
            while (s < t.length() && Character.isWhitespace(t.charAt(s))) {
                s++;
            }
        }
        int slash = t.indexOf('/', s);
        String p = slash < 0 ? t.substring(s) : t.substring(s, slash).strip();
        Rational v = part(p, t, pos, maxDigits);
        if (slash >= 0) {
            Rational d = part(t.substring(slash + 1).strip(), t, pos, maxDigits);
            if (d.isZero()) {
                throw new QchainException(pos, ErrorKey.DIVISION_BY_ZERO, " in '" + quote(t) + "'");
            }
            v = v.divide(d);
        }
        return minus ? v.negate() : v;
    }

    /** One side of a constant: a malformed side is reported with the whole constant. */
    private static Rational part(String p, String whole, SourcePos pos, int maxDigits) {
        if (!isUnsigned(p)) {
            throw malformed(whole, pos);
        }
        return unsigned(p, pos, maxDigits);
    }

    /**
     * Whether {@code text} (stripped) is a constant of this grammar, whatever its size.
     *
     * @param text the text
     * @return whether {@link #constant} would read it (its limits aside; {@code p/0} counts as a constant)
     */
    public static boolean isConstant(String text) {
        String t = text.strip();
        int s = !t.isEmpty() && (t.charAt(0) == '+' || t.charAt(0) == '-') ? 1 : 0;
        int slash = t.indexOf('/', s);
        if (slash < 0) {
            return isUnsigned(t.substring(s).strip());
        }
        return isUnsigned(t.substring(s, slash).strip()) && isUnsigned(t.substring(slash + 1).strip());
    }

    /** Whether the text is exactly an unsigned number of this grammar. */
    static boolean isUnsigned(String t) {
        int n = t.length();
        int i = 0;
        while (i < n && isDigit(t.charAt(i))) {
            i++;
        }
        int digits = i;
        if (i < n && t.charAt(i) == '.') {
            i++;
            int f = i;
            while (i < n && isDigit(t.charAt(i))) {
                i++;
            }
            digits += i - f;
        }
        if (digits == 0) {
            return false;
        }
        if (i < n && (t.charAt(i) == 'e' || t.charAt(i) == 'E')) {
            i++;
            if (i < n && (t.charAt(i) == '+' || t.charAt(i) == '-')) {
                i++;
            }
            int e = i;
            while (i < n && isDigit(t.charAt(i))) {
                i++;
            }
            if (i == e) {
                return false;
            }
        }
        return i == n;
    }

    /**
     * A whole number as written in an option: an optional sign, ASCII digits, and optionally {@code _} between digits
     * ({@code 1_000_000}); any other character, a non-ASCII digit included ({@code ٣}), makes it no whole number.
     *
     * @param text the text (surrounding spaces are ignored)
     * @return its value, of any size (the caller compares it with its range), or empty if it is not one
     */
    public static java.util.Optional<java.math.BigInteger> whole(String text) {
        String t = text.strip();
        int s = !t.isEmpty() && (t.charAt(0) == '+' || t.charAt(0) == '-') ? 1 : 0;
        StringBuilder digits = new StringBuilder(t.length());
        for (int i = s; i < t.length(); i++) {
            char c = t.charAt(i);
            if (isDigit(c)) {
                digits.append(c);
            } else if (!(c == '_' && i > s && i + 1 < t.length() && isDigit(t.charAt(i - 1))
                && isDigit(t.charAt(i + 1)))) {
                return java.util.Optional.empty();
            }
        }
        if (digits.length() == 0 || digits.length() > InputLimits.DEFAULT_MAX_NUMBER_DIGITS) {
            return java.util.Optional.empty();
        }
        java.math.BigInteger v = new java.math.BigInteger(digits.toString());
        return java.util.Optional.of(t.charAt(0) == '-' ? v.negate() : v);
    }

    /** An ASCII digit. */
    public static boolean isDigit(char c) {
        return c >= '0' && c <= '9';
    }

    private static QchainException malformed(String text, SourcePos pos) {
        return new QchainException(pos, ErrorKey.MALFORMED_NUMBER, quote(text.strip()));
    }

    /** The text, or its start and length when it is long. */
    static String quote(String text) {
        return text.length() <= 2 * QUOTE ? text
            : text.substring(0, QUOTE) + "... (" + text.length() + " characters)";
    }
}
