package org.qchain.exact;

import java.math.BigInteger;

/**
 * Greatest common divisors of large integers by Lehmer's method (D. E. Knuth, <i>The Art of Computer Programming</i>,
 * vol. 2, 3rd ed., 4.5.2, Algorithm L): the quotients of Euclid's algorithm are found from the leading 62 bits of the
 * two numbers in machine words, and one multi-precision step applies a whole run of them at once. Java 17's
 * {@code BigInteger.gcd} runs a binary gcd bit by bit once the operands have about the same length, which costs
 * quadratic time with a large constant: on the thousands-of-digit fractions of the exact linear solves Lehmer's
 * method is 2 to 3 times faster ({@code docs/performance.md}, issue 9). Small operands go to {@code BigInteger.gcd}.
 */
public final class Gcd {
    private Gcd() {
    }

    /** Below this many bits in the smaller operand {@code BigInteger.gcd} is as fast. */
    static final int LEHMER_BITS = 256;

    /** {@code gcd(|a|, |b|)}, with {@code gcd(0, 0) = 0}. */
    public static BigInteger of(BigInteger a, BigInteger b) {
        if (a.signum() < 0) {
            a = a.negate();
        }
        if (b.signum() < 0) {
            b = b.negate();
        }
        if (a.compareTo(b) < 0) {
            BigInteger t = a;
            a = b;
            b = t;
        }
        if (b.bitLength() < LEHMER_BITS) {
            return a.gcd(b);
        }
        return lehmer(a, b);
    }

    /** Algorithm L with {@code a >= b >= 0}. */
    static BigInteger lehmer(BigInteger a, BigInteger b) {
        while (b.signum() != 0) {
            int la = a.bitLength();
            int lb = b.bitLength();
            if (lb < LEHMER_BITS) {
                return a.gcd(b);
            }
            if (la - lb > 30) {
                // the leading bits of b are all zero at a's scale: one long division does more than Lehmer's run
                BigInteger r = a.mod(b);
                a = b;
                b = r;
                continue;
            }
            int shift = la - 62;
            long x = a.shiftRight(shift).longValue();
            long y = b.shiftRight(shift).longValue();
            // cofactors: the current pair is (A a + B b, C a + D b); each stays below 2^62 in absolute value, and
            // x + A, y + C etc. below 2^63, as x and y are below 2^62
            long ca = 1;
            long cb = 0;
            long cc = 0;
            long cd = 1;
            while (true) {
                long yc = y + cc;
                long yd = y + cd;
                if (yc == 0 || yd == 0) {
                    break;
                }
                long q = (x + ca) / yc;
                if (q != (x + cb) / yd) {
                    break;
                }
                long t = ca - q * cc;
                ca = cc;
                cc = t;
                t = cb - q * cd;
                cb = cd;
                cd = t;
                t = x - q * y;
                x = y;
                y = t;
            }
            if (cb == 0) {
                BigInteger r = a.mod(b);
                a = b;
                b = r;
            } else {
                BigInteger na = a.multiply(BigInteger.valueOf(ca)).add(b.multiply(BigInteger.valueOf(cb)));
                BigInteger nb = a.multiply(BigInteger.valueOf(cc)).add(b.multiply(BigInteger.valueOf(cd)));
                a = na;
                b = nb;
            }
        }
        return a;
    }
}
