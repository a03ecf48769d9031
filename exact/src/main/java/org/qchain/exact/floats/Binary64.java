package org.qchain.exact.floats;

import java.math.BigInteger;
import org.qchain.exact.Rational;

/**
 * IEEE 754-2019 binary64 ({@code double}) seen from exact arithmetic: the correctly rounded double of a rational,
 * the exact value of a double, and the distance between two doubles in units in the last place.
 *
 * <p>Rounding is {@code roundTiesToEven} (IEEE 754-2019, clause 4.3.1), the default attribute of the standard and
 * the rounding of Java's {@link Double#parseDouble}: the nearest double, and of two equally near the one with an even
 * significand. Results below the smallest normal number are subnormal (gradual underflow, clause 7.5); results whose
 * rounded magnitude reaches {@code 2^1024} are infinite (overflow, clause 7.4). Every decision is made exactly with
 * integer arithmetic, so rationals with numerators and denominators of any size are rounded correctly.
 *
 * <h2>Units in the last place</h2>
 * <p>{@link #ulpDistance(double, double)} counts the doubles between two doubles: {@code 0} for equal values (and for
 * {@code +0} against {@code -0}), {@code 1} for neighbours. A value {@code x} given for an exact truth {@code t} is
 * {@linkplain #isCorrectlyRounded(double, Rational) correctly rounded} when {@code x == round(t)}, that is when
 * {@code ulpDistance(x, round(t)) == 0}.
 */
public final class Binary64 {
    /** Bits of the significand, the hidden bit included. */
    static final int PRECISION = 53;
    /** The exponent of the smallest subnormal, {@code 2^-1074}. */
    static final int MIN_EXPONENT = -1074;
    /** Every finite double is below {@code 2^1024}. */
    static final int MAX_EXPONENT = 1024;

    private Binary64() {
    }

    /**
     * The double nearest to {@code r}, ties to even; {@code ±Infinity} past the largest double; {@code +0.0} for 0.
     *
     * @param r the exact value
     * @return its correctly rounded binary64
     */
    public static double round(Rational r) {
        return round(r.numerator(), r.denominator());
    }

    /**
     * The double nearest to {@code p/q}, ties to even. The fraction need not be in lowest terms, so callers can round
     * quotients without taking a gcd.
     *
     * @param p numerator
     * @param q denominator, not zero
     * @return the correctly rounded binary64 of {@code p/q}; {@code +0.0} when {@code p == 0}
     * @throws ArithmeticException if {@code q == 0}
     */
    public static double round(BigInteger p, BigInteger q) {
        if (q.signum() == 0) {
            throw new ArithmeticException("division by zero");
        }
        if (p.signum() == 0) {
            return 0.0;
        }
        boolean negative = p.signum() != q.signum();
        BigInteger a = p.abs();
        BigInteger b = q.abs();
        // e = floor(log2(a/b)): a/b lies in [2^(la-lb-1), 2^(la-lb+1)), one comparison decides which half
        int e = a.bitLength() - b.bitLength();
        if (compareScaled(a, b, e) < 0) {
            e--;
        }
        if (e >= MAX_EXPONENT) {
            return negative ? Double.NEGATIVE_INFINITY : Double.POSITIVE_INFINITY;
        }
        // the ulp of the result: 2^(e-52) for normal numbers, 2^-1074 for subnormal ones
        int ulpExp = Math.max(e - (PRECISION - 1), MIN_EXPONENT);
        // m = a / (b 2^ulpExp), an integer below 2^53, and the remainder decides the rounding
        BigInteger num = ulpExp <= 0 ? a.shiftLeft(-ulpExp) : a;
        BigInteger den = ulpExp <= 0 ? b : b.shiftLeft(ulpExp);
        BigInteger[] qr = num.divideAndRemainder(den);
        long m = qr[0].longValueExact();
        int c = qr[1].shiftLeft(1).compareTo(den);
        if (c > 0 || (c == 0 && (m & 1) == 1)) {
            m++;
        }
        // m <= 2^53 and ulpExp >= -1074, so m 2^ulpExp is a double unless it reaches 2^1024 (scalb gives infinity)
        double magnitude = Math.scalb((double) m, ulpExp);
        return negative ? -magnitude : magnitude;
    }

    /** Sign of {@code a - b 2^e}. */
    private static int compareScaled(BigInteger a, BigInteger b, int e) {
        return e >= 0 ? a.compareTo(b.shiftLeft(e)) : a.shiftLeft(-e).compareTo(b);
    }

    /**
     * The exact value of a finite double: {@code m 2^k} as a rational. Both zeros give 0.
     *
     * @param d a finite double
     * @return its exact value
     * @throws ArithmeticException if {@code d} is infinite or NaN
     */
    public static Rational exact(double d) {
        if (!Double.isFinite(d)) {
            throw new ArithmeticException("no exact value for " + d);
        }
        if (d == 0) {
            return Rational.ZERO;
        }
        long bits = Double.doubleToRawLongBits(d);
        int biased = (int) ((bits >>> 52) & 0x7ff);
        long frac = bits & 0xf_ffff_ffff_ffffL;
        long m = biased == 0 ? frac : frac | (1L << 52);
        int k = biased == 0 ? MIN_EXPONENT : biased - 1075;
        BigInteger mm = BigInteger.valueOf(d < 0 ? -m : m);
        return k >= 0 ? Rational.of(mm.shiftLeft(k)) : Rational.of(mm, BigInteger.ONE.shiftLeft(-k));
    }

    /**
     * The number of doubles from {@code a} to {@code b}: {@code |ord(a) - ord(b)|}, where {@code ord} numbers the
     * doubles in order with both zeros at 0. Saturates at {@link Long#MAX_VALUE}.
     *
     * @param a a double, not NaN
     * @param b a double, not NaN
     * @return the distance in units in the last place; 0 exactly when {@code a == b}
     * @throws ArithmeticException if either is NaN
     */
    public static long ulpDistance(double a, double b) {
        if (Double.isNaN(a) || Double.isNaN(b)) {
            throw new ArithmeticException("ulp distance to NaN");
        }
        long oa = ordinal(a);
        long ob = ordinal(b);
        long diff = oa - ob;
        // overflow only when the signs differ and both are huge
        if (((oa ^ ob) & (oa ^ diff)) < 0) {
            return Long.MAX_VALUE;
        }
        return diff == Long.MIN_VALUE ? Long.MAX_VALUE : Math.abs(diff);
    }

    /** The position of {@code d} among the doubles in increasing order, {@code ±0} at 0 (infinities included). */
    static long ordinal(double d) {
        long bits = Double.doubleToRawLongBits(d) & Long.MAX_VALUE;
        return d < 0 ? -bits : bits;
    }

    /**
     * Whether {@code x} is the correctly rounded double of {@code truth} ({@code 0 ulp}).
     *
     * @param x     the given double
     * @param truth the exact value
     * @return {@code x == round(truth)} (so {@code -0.0} counts as the double of 0)
     */
    public static boolean isCorrectlyRounded(double x, Rational truth) {
        return x == round(truth);
    }
}
