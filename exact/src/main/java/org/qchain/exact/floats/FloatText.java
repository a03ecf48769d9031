package org.qchain.exact.floats;

import java.math.BigInteger;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.qchain.exact.Rational;

/**
 * Text forms of binary64 values: the shortest decimal that reads back as the same double, and hexadecimal floats.
 *
 * <h2>Shortest round-trip decimal</h2>
 * <p>{@link #shortest(double)} gives the decimal with the fewest significant digits that any correctly rounding
 * reader ({@code Double.parseDouble}, C's {@code strtod}, Python's {@code float}) turns back into the same double;
 * of two such decimals with that many digits, the one nearer the double's exact value, and of two equally near, the
 * even one. This is the rule of ECMA-262 (ECMAScript), {@code Number::toString}, and its layout is ECMAScript's too:
 * {@code 0.1}, {@code 100}, {@code 1e+21}, {@code 1.5e-7}, {@code 5e-324}. Java 17's {@link Double#toString(double)}
 * does not always give the shortest ({@code 2.82879384806159E17} prints with 18 digits), so the digits are found
 * here exactly: the double's rounding interval (half-way to each neighbour, the ends included when the significand
 * is even, since ties go to even) is compared in integers with the two points of a decimal grid around the value,
 * and a binary search over the grid's spacing finds the coarsest grid with a point inside.
 *
 * <h2>Hexadecimal floats</h2>
 * <p>The syntax of the Java Language Specification, §3.10.2: {@code 0x1.8p-3} is {@code 1.5 × 2^-3}. A binary
 * exponent is required; the significand may have any number of hexadecimal digits, and {@link #parseHex} reads it
 * exactly (not rounded to a double). {@link #hex(double)} prints the form of {@link Double#toHexString(double)}.
 */
public final class FloatText {
    private static final Pattern HEX = Pattern.compile(
        "([+-]?)0[xX]([0-9a-fA-F]*)(?:\\.([0-9a-fA-F]*))?[pP]([+-]?[0-9]+)");
    /** Binary exponents past this are refused: a double needs at most 1074, and more only makes huge integers. */
    static final int MAX_HEX_EXPONENT = 100_000;
    private static final BigInteger[] TEN_POWERS = new BigInteger[400];

    static {
        TEN_POWERS[0] = BigInteger.ONE;
        for (int i = 1; i < TEN_POWERS.length; i++) {
            TEN_POWERS[i] = TEN_POWERS[i - 1].multiply(BigInteger.TEN);
        }
    }

    private FloatText() {
    }

    /**
     * The shortest round-trip decimal of {@code d}, laid out as ECMAScript's {@code Number::toString} does;
     * {@code NaN}, {@code Infinity} and {@code -Infinity} for the non-finite values, and {@code 0} or {@code -0}.
     *
     * @param d the double
     * @return its shortest decimal, for example {@code 0.1} for the double nearest to 1/10
     */
    public static String shortest(double d) {
        if (Double.isNaN(d)) {
            return "NaN";
        }
        if (Double.isInfinite(d)) {
            return d > 0 ? "Infinity" : "-Infinity";
        }
        if (d == 0) {
            return (Double.doubleToRawLongBits(d) < 0) ? "-0" : "0";
        }
        Digits g = shortestDigits(Math.abs(d));
        return (d < 0 ? "-" : "") + layout(g.digits(), g.exponent());
    }

    /** {@code digits × 10^exponent}, the digit string without trailing zeros. */
    record Digits(String digits, int exponent) {
    }

    /** The shortest decimal digits of a positive finite double. */
    static Digits shortestDigits(double d) {
        long bits = Double.doubleToRawLongBits(d);
        int biased = (int) (bits >>> 52);
        long frac = bits & 0xf_ffff_ffff_ffffL;
        long m = biased == 0 ? frac : frac | (1L << 52);
        int k = biased == 0 ? Binary64.MIN_EXPONENT : biased - 1075;
        // all quantities as integers over 2^sh; sh leaves room for the quarter-ulp gap below a power of two
        int sh = Math.max(0, 2 - k);
        BigInteger v = BigInteger.valueOf(m).shiftLeft(k + sh);
        BigInteger gapHigh = BigInteger.ONE.shiftLeft(k - 1 + sh);
        boolean powerOfTwoBoundary = frac == 0 && biased > 1;
        BigInteger gapLow = powerOfTwoBoundary ? BigInteger.ONE.shiftLeft(k - 2 + sh) : gapHigh;
        Interval iv = new Interval(v, v.subtract(gapLow), v.add(gapHigh), sh, (m & 1) == 0);
        // hit(j): the grid 10^j has a point inside the interval; true for all j at or below some j*, false above
        int e10 = (int) Math.floor(Math.log10(d));
        int hi = e10 + 2;      // a grid this coarse has no point inside (its points are 0 or at least 10 d)
        int lo = e10 - 17;     // 17 significant digits always suffice for binary64
        while (hi - lo > 1) {
            int mid = Math.floorDiv(hi + lo, 2);
            if (iv.candidate(mid) != null) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        BigInteger t = iv.candidate(lo);
        String s = t.toString();
        int exp = lo;
        int end = s.length();
        while (end > 1 && s.charAt(end - 1) == '0') {
            end--;
        }
        exp += s.length() - end;
        return new Digits(s.substring(0, end), exp);
    }

    /** The rounding interval of a double as integers over {@code 2^sh}. */
    private record Interval(BigInteger v, BigInteger low, BigInteger high, int sh, boolean closed) {
        /**
         * The multiplier {@code t} of the point {@code t 10^j} of the grid {@code 10^j} inside the interval that is
         * nearest to {@code v} (ties to even {@code t}), or {@code null} if the grid has no point inside.
         */
        BigInteger candidate(int j) {
            BigInteger vs;
            BigInteger lows;
            BigInteger highs;
            BigInteger unit;
            if (j >= 0) {
                vs = v;
                lows = low;
                highs = high;
                unit = tenPow(j).shiftLeft(sh);
            } else {
                BigInteger f = tenPow(-j);
                vs = v.multiply(f);
                lows = low.multiply(f);
                highs = high.multiply(f);
                unit = BigInteger.ONE.shiftLeft(sh);
            }
            BigInteger[] qr = vs.divideAndRemainder(unit);
            BigInteger t = qr[0];
            if (qr[1].signum() == 0) {
                return t;
            }
            BigInteger below = t.multiply(unit);
            BigInteger above = below.add(unit);
            boolean belowIn = t.signum() > 0 && inside(below, lows, highs);
            boolean aboveIn = inside(above, lows, highs);
            if (belowIn && aboveIn) {
                int c = qr[1].shiftLeft(1).compareTo(unit);
                if (c < 0 || (c == 0 && !t.testBit(0))) {
                    return t;
                }
                return t.add(BigInteger.ONE);
            }
            if (belowIn) {
                return t;
            }
            if (aboveIn) {
                return t.add(BigInteger.ONE);
            }
            return null;
        }

        private boolean inside(BigInteger x, BigInteger lows, BigInteger highs) {
            int a = x.compareTo(lows);
            int b = x.compareTo(highs);
            return closed ? a >= 0 && b <= 0 : a > 0 && b < 0;
        }
    }

    private static BigInteger tenPow(int e) {
        return e < TEN_POWERS.length ? TEN_POWERS[e] : BigInteger.TEN.pow(e);
    }

    /** ECMA-262 {@code Number::toString} layout of {@code digits × 10^exponent} (digits without trailing zeros). */
    private static String layout(String digits, int exponent) {
        int k = digits.length();
        int n = exponent + k; // the value is 0.digits × 10^n
        StringBuilder sb = new StringBuilder();
        if (k <= n && n <= 21) {
            sb.append(digits);
            sb.append("0".repeat(n - k));
        } else if (0 < n && n <= 21) {
            sb.append(digits, 0, n).append('.').append(digits, n, k);
        } else if (-6 < n && n <= 0) {
            sb.append("0.").append("0".repeat(-n)).append(digits);
        } else {
            sb.append(digits.charAt(0));
            if (k > 1) {
                sb.append('.').append(digits, 1, k);
            }
            int e = n - 1;
            sb.append('e').append(e >= 0 ? '+' : '-').append(Math.abs(e));
        }
        return sb.toString();
    }

    /**
     * The hexadecimal float of {@code d} as {@link Double#toHexString(double)} writes it: {@code 0x1.8p-3},
     * {@code -0x1.0p0}, {@code 0x0.0000000000001p-1022} (subnormal), {@code 0x0.0p0}; {@code NaN}, {@code Infinity}.
     *
     * @param d the double
     * @return its hexadecimal form, exact
     */
    public static String hex(double d) {
        return Double.toHexString(d);
    }

    /**
     * Whether {@code text} (stripped) has the form of a hexadecimal float (JLS §3.10.2, without a type suffix).
     *
     * @param text the text
     * @return whether {@link #parseHex} reads it
     */
    public static boolean isHex(String text) {
        return HEX.matcher(text.strip()).matches() && hasDigit(text);
    }

    private static boolean hasDigit(String text) {
        Matcher mt = HEX.matcher(text.strip());
        return mt.matches() && (mt.group(2).length() + (mt.group(3) == null ? 0 : mt.group(3).length())) > 0;
    }

    /**
     * The exact value of a hexadecimal float such as {@code 0x1.8p-3} or {@code -0X.Cp2}; every digit is kept, so a
     * significand longer than a double's is not rounded.
     *
     * @param text the text, surrounding spaces allowed
     * @return its exact value
     * @throws NumberFormatException if the text is not a hexadecimal float, or its binary exponent is beyond
     *                               {@value #MAX_HEX_EXPONENT} in magnitude
     */
    public static Rational parseHex(String text) {
        Matcher mt = HEX.matcher(text.strip());
        if (!mt.matches() || !hasDigit(text)) {
            throw new NumberFormatException("not a hexadecimal float '" + text.strip()
                + "' (expected the form 0x1.8p-3)");
        }
        String whole = mt.group(2);
        String fraction = mt.group(3) == null ? "" : mt.group(3);
        String exponentText = mt.group(4);
        String expDigits = exponentText.replaceFirst("^[+-]", "").replaceFirst("^0+(?=.)", "");
        if (expDigits.length() > 7 || Math.abs(Long.parseLong(exponentText)) > MAX_HEX_EXPONENT) {
            throw new NumberFormatException("the binary exponent of '" + text.strip() + "' is beyond +-"
                + MAX_HEX_EXPONENT);
        }
        long exponent = Long.parseLong(exponentText) - 4L * fraction.length();
        BigInteger significand = new BigInteger(whole + fraction, 16);
        if (mt.group(1).equals("-")) {
            significand = significand.negate();
        }
        return exponent >= 0 ? Rational.of(significand.shiftLeft((int) exponent))
            : Rational.of(significand, BigInteger.ONE.shiftLeft((int) -exponent));
    }
}
