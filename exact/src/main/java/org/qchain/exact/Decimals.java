package org.qchain.exact;

import java.math.BigInteger;
import java.math.RoundingMode;

/**
 * Decimal display of exact rationals, correctly rounded to a number of significant digits.
 *
 * <p>Rules:
 * <ul>
 * <li>Rounding is to nearest, ties to even (IEEE 754 {@code roundTiesToEven}; {@link java.math.RoundingMode#HALF_EVEN}),
 * decided exactly with integer arithmetic: the fraction is never converted to {@code double}, so numerators and
 * denominators of millions of digits are fine.</li>
 * <li>Exactly {@code D} significant digits are shown, trailing zeros included, because they are significant:
 * {@code 1/4} at 12 digits is {@code 0.250000000000}.</li>
 * <li>Exact zero is {@code 0}; an integer with at most {@code D} digits is shown exactly as an integer
 * ({@code 1}, not {@code 1.00000000000}).</li>
 * <li>Plain notation when the decimal exponent {@code e} (the value is {@code m.mmm × 10^e} with {@code 1 <= m < 10}
 * after rounding) satisfies {@code -6 <= e < D}, as {@link java.math.BigDecimal#toString()} does at the low end:
 * {@code 0.00000123456789012}; otherwise e-notation with one digit before the point and an exponent without a plus
 * sign: {@code 1.23456789012e-45}, {@code 6.02214076000e23}.</li>
 * </ul>
 */
public final class Decimals {
    private Decimals() {
    }

    /**
     * {@code r} rounded to {@code significantDigits} significant digits, by the rules in the class description.
     *
     * @param r                 the value
     * @param significantDigits at least 1
     * @return the decimal text
     * @throws IllegalArgumentException if {@code significantDigits < 1}
     */
    public static String format(Rational r, int significantDigits) {
        return format(r, significantDigits, RoundingMode.HALF_EVEN);
    }

    /**
     * {@code r} rounded to {@code significantDigits} significant digits in the given direction, laid out by the rules
     * in the class description. {@link RoundingMode#FLOOR} and {@link RoundingMode#CEILING} give decimal lower and
     * upper bounds, as interval endpoints need.
     *
     * @param r                 the value
     * @param significantDigits at least 1
     * @param mode              {@link RoundingMode#HALF_EVEN}, {@link RoundingMode#FLOOR}, {@link RoundingMode#CEILING},
     *                          {@link RoundingMode#DOWN} or {@link RoundingMode#UP}
     * @return the decimal text
     * @throws IllegalArgumentException if {@code significantDigits < 1} or the mode is not one of these
     */
    public static String format(Rational r, int significantDigits, RoundingMode mode) {
        if (significantDigits < 1) {
            throw new IllegalArgumentException("significant digits must be at least 1: " + significantDigits);
        }
        if (r.isZero()) {
            return "0";
        }
        int digits = significantDigits;
        BigInteger p = r.numerator().abs();
        BigInteger q = r.denominator();
        String sign = r.signum() < 0 ? "-" : "";
        if (r.isInteger() && p.bitLength() <= 4L * digits && digitCount(p) <= digits) {
            return sign + p;
        }
        Rounded x = round(p, q, digits, magnitudeMode(mode, r.signum() < 0));
        String m = x.mantissa.toString();
        long e = x.exponent;
        StringBuilder sb = new StringBuilder(sign);
        if (e >= -6 && e < digits) {
            if (e < 0) {
                sb.append("0.");
                for (long i = -1; i > e; i--) {
                    sb.append('0');
                }
                sb.append(m);
            } else {
                int intDigits = (int) e + 1;
                sb.append(m, 0, intDigits);
                if (intDigits < m.length()) {
                    sb.append('.').append(m, intDigits, m.length());
                }
            }
        } else {
            sb.append(m.charAt(0));
            if (m.length() > 1) {
                sb.append('.').append(m, 1, m.length());
            }
            sb.append('e').append(e);
        }
        return sb.toString();
    }

    /** A rounded value {@code mantissa × 10^(exponent - digits + 1)} with {@code 10^(digits-1) <= mantissa < 10^digits}. */
    record Rounded(BigInteger mantissa, long exponent) {
        // equals and hashCode written out: a record's generated ones link method handles at their first call, which
        // spins about twenty classes in every process that prints a decimal
        @Override
        public boolean equals(Object o) {
            return o instanceof Rounded r && r.exponent == exponent && r.mantissa.equals(mantissa);
        }

        @Override
        public int hashCode() {
            return 31 * mantissa.hashCode() + Long.hashCode(exponent);
        }
    }

    /** The rounding of the magnitude that gives {@code mode} on a value of the given sign. */
    private static RoundingMode magnitudeMode(RoundingMode mode, boolean negative) {
        switch (mode) {
            case HALF_EVEN:
            case DOWN:
            case UP:
                return mode;
            case FLOOR:
                return negative ? RoundingMode.UP : RoundingMode.DOWN;
            case CEILING:
                return negative ? RoundingMode.DOWN : RoundingMode.UP;
            default:
                throw new IllegalArgumentException("unsupported rounding mode: " + mode);
        }
    }

    /**
     * {@code p/q} ({@code p, q > 0}) rounded half-even to {@code digits} significant digits.
     */
    static Rounded round(BigInteger p, BigInteger q, int digits) {
        return round(p, q, digits, RoundingMode.HALF_EVEN);
    }

    /**
     * {@code p/q} ({@code p, q > 0}) rounded to {@code digits} significant digits: half-even, toward zero
     * ({@link RoundingMode#DOWN}) or away from zero ({@link RoundingMode#UP}).
     */
    static Rounded round(BigInteger p, BigInteger q, int digits, RoundingMode mode) {
        // long operands: round the two ends of an enclosure from their leading bits; when both ends round alike,
        // so does p/q between them (rounding is monotone); otherwise (next to a rounding boundary) the exact way
        int cut = Math.min(p.bitLength(), q.bitLength()) - (KEPT_BITS + 4 * digits);
        if (cut > 0) {
            BigInteger p0 = p.shiftRight(cut);
            BigInteger q0 = q.shiftRight(cut);
            // p0 2^cut <= p < (p0 + 1) 2^cut, and the same for q, so p0 / (q0 + 1) < p/q < (p0 + 1) / q0
            Rounded lo = exactRound(p0, q0.add(BigInteger.ONE), digits, mode);
            Rounded hi = exactRound(p0.add(BigInteger.ONE), q0, digits, mode);
            if (lo.equals(hi)) {
                return lo;
            }
        }
        return exactRound(p, q, digits, mode);
    }

    /** Bits kept of long operands of {@link #round}, beyond four per requested digit. */
    static final int KEPT_BITS = 128;

    private static Rounded exactRound(BigInteger p, BigInteger q, int digits, RoundingMode mode) {
        BigInteger low = BigInteger.TEN.pow(digits - 1);
        BigInteger high = low.multiply(BigInteger.TEN);
        // first guess of floor(log10(p/q)) from bit lengths; off by at most one or two, corrected below
        long e = (long) Math.floor((p.bitLength() - q.bitLength()) * Math.log10(2));
        while (true) {
            long shift = digits - 1 - e;
            BigInteger num = p;
            BigInteger den = q;
            if (shift >= 0) {
                num = p.multiply(tenPow(shift));
            } else {
                den = q.multiply(tenPow(-shift));
            }
            BigInteger[] qr = num.divideAndRemainder(den);
            BigInteger m = qr[0];
            if (m.compareTo(low) < 0) {
                e--;
                continue;
            }
            if (m.compareTo(high) >= 0) {
                e++;
                continue;
            }
            boolean up;
            if (mode == RoundingMode.DOWN) {
                up = false;
            } else if (mode == RoundingMode.UP) {
                up = qr[1].signum() != 0;
            } else {
                int c = qr[1].shiftLeft(1).compareTo(den);
                up = c > 0 || c == 0 && m.testBit(0);
            }
            if (up) {
                m = m.add(BigInteger.ONE);
                if (m.equals(high)) {
                    m = low;
                    e++;
                }
            }
            return new Rounded(m, e);
        }
    }

    private static BigInteger tenPow(long k) {
        return BigInteger.TEN.pow(Math.toIntExact(k));
    }

    /** Number of decimal digits of {@code x > 0}. */
    static int digitCount(BigInteger x) {
        int guess = (int) (x.bitLength() * Math.log10(2)) + 1;
        // guess is the true count or one more
        return x.compareTo(BigInteger.TEN.pow(guess - 1)) >= 0 ? guess : guess - 1;
    }
}
