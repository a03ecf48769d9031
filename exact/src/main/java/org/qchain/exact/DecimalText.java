package org.qchain.exact;

import java.math.BigInteger;
import java.nio.charset.StandardCharsets;
import java.util.concurrent.RecursiveAction;
import java.util.concurrent.atomic.AtomicReferenceArray;

/**
 * Decimal text of big integers and rationals, equal to {@link BigInteger#toString()} and {@link Rational#toString()}
 * but faster on numbers of thousands of digits and more, the size of exact powers of chains.
 *
 * <p>Method: divide and conquer over cached powers of ten {@code 10^(18 * 2^k)}: {@code x = q 10^e + r}, both
 * halves converted recursively, the low half padded with zeros to {@code e} digits. Java 17's own conversion does
 * the same split but divides by Knuth's or Burnikel–Ziegler's algorithm, whose cost at these sizes is close to
 * quadratic; here each split is a Barrett division by the cached power, with its cached fixed-point reciprocal
 * {@code floor(4^L / 10^e)} ({@code L} the bit length of {@code 10^e}): two multiplications, which
 * {@code BigInteger} does by Karatsuba or Toom–Cook (A. J. Menezes, P. C. van Oorschot, S. A. Vanstone,
 * <i>Handbook of Applied Cryptography</i>, CRC Press 1996, ch. 14, algorithm 14.42). The powers and reciprocals are
 * built once per process and shared by all numbers. The recursion goes down to pieces of {@value #BASE_DIGITS}
 * digits, split once more by {@code 10^18} into two {@code long}s: no long division of {@link BigInteger} (the
 * JDK's own conversion divides by {@code 10^18} again and again, and its division code is slow until the JIT has
 * compiled it, which in a fresh process costs more than the conversion; measured in docs/performance.md). Numbers
 * of fewer digits take the JDK's conversion. Large numbers convert their two halves in parallel on the common
 * fork-join pool, and {@link #toStrings} converts many numbers on all cores.
 */
public final class DecimalText {
    /** Pieces of at most this many digits are converted by {@link BigInteger#toString()}. */
    static final int BASE_DIGITS = 36;
    /** Numbers of at least this many bits split their two halves over the pool. */
    static final int PARALLEL_BITS = 400_000;

    private static final double LOG10_2 = Math.log10(2);
    /** Level {@code k}: {@code 10^(18 * 2^k)} with its Barrett reciprocal. */
    private static final AtomicReferenceArray<Power> POWERS = new AtomicReferenceArray<>(40);

    private DecimalText() {
    }

    /** {@code v = 10^e}, {@code mu = floor(2^(2 bits) / v)}. */
    private record Power(int e, BigInteger v, BigInteger mu, int bits) {
    }

    private static Power power(int level) {
        Power p = POWERS.get(level);
        if (p == null) {
            int e = 18 << level;
            BigInteger v = level == 0 ? BigInteger.TEN.pow(18) : power(level - 1).v.pow(2);
            int bits = v.bitLength();
            BigInteger mu = BigInteger.ONE.shiftLeft(2 * bits).divide(v);
            p = new Power(e, v, mu, bits);
            POWERS.compareAndSet(level, null, p);
            p = POWERS.get(level);
        }
        return p;
    }

    /**
     * The decimal text of {@code x}, equal to {@code x.toString()}.
     *
     * @param x any integer
     * @return its decimal digits, with a leading {@code -} if negative
     */
    public static String toString(BigInteger x) {
        if (x.bitLength() * LOG10_2 < BASE_DIGITS) {
            return x.toString();
        }
        StringBuilder sb = new StringBuilder();
        append(sb, x);
        return sb.toString();
    }

    /**
     * The text of {@code r}, equal to {@code r.toString()}: {@code p/q}, or {@code p} for an integer.
     *
     * @param r a rational
     * @return its text
     */
    public static String toString(Rational r) {
        StringBuilder sb = new StringBuilder();
        append(sb, r);
        return sb.toString();
    }

    /**
     * Appends the text of {@code r} ({@code p/q}, or {@code p} for an integer).
     *
     * @param sb where to append
     * @param r  a rational
     */
    public static void append(StringBuilder sb, Rational r) {
        append(sb, r.numerator());
        if (!r.isInteger()) {
            sb.append('/');
            append(sb, r.denominator());
        }
    }

    /**
     * Appends the decimal text of {@code x}.
     *
     * @param sb where to append
     * @param x  any integer
     */
    public static void append(StringBuilder sb, BigInteger x) {
        if (x.bitLength() * LOG10_2 < BASE_DIGITS) {
            sb.append(x);
            return;
        }
        if (x.signum() < 0) {
            sb.append('-');
            x = x.negate();
        }
        // an upper bound on the digits; the leading zeros it may give are skipped
        int width = (int) (x.bitLength() * LOG10_2) + 2;
        byte[] buf = new byte[width];
        Convert task = new Convert(x, buf, 0, width);
        if (x.bitLength() >= PARALLEL_BITS) {
            java.util.concurrent.ForkJoinPool.commonPool().invoke(task);
        } else {
            task.compute();
        }
        int start = 0;
        while (start < width - 1 && buf[start] == '0') {
            start++;
        }
        sb.append(new String(buf, start, width - start, StandardCharsets.ISO_8859_1));
    }

    /**
     * The texts of many rationals, converted on all cores (the order of the result is the order of the input).
     *
     * @param values the rationals
     * @return their texts
     */
    public static String[] toStrings(Rational[] values) {
        String[] out = new String[values.length];
        java.util.stream.IntStream.range(0, values.length).parallel().forEach(i -> out[i] = toString(values[i]));
        return out;
    }

    /** Numbers of fewer bits are converted on their own by {@link SharedFactor}. */
    static final int SHARED_MIN_BITS = 2_000;
    /** Bits of the multipliers {@code a}, {@code b} that {@link #smallRatio} looks for, at most. */
    static final int RATIO_BITS = 128;
    /**
     * Leading bits of the larger number that {@link #smallRatio} reads. With {@code a, b < 2^128} and the smaller
     * number's leading 896 bits or more, the leading bits' ratio is within {@code 2^-766} of {@code a/b}, so the
     * partial quotient after {@code a/b} is above {@code 2^509}, while every partial quotient up to it is at most
     * {@code b} (or {@code a/b}) and so below {@code 2^128}.
     */
    private static final int RATIO_PRECISION = 8 * RATIO_BITS;
    private static final int LIMB = 1_000_000_000;

    /**
     * Decimal texts of positive integers that are mostly small multiples of one large common divisor, as the
     * reduced denominators of a matrix power are (divisors of {@code d^n} whose quotients {@code d^n / q} have tens
     * of bits, while {@code q} has thousands of digits). The common divisor {@code G} is found once, from a sample,
     * and converted once; every number {@code G m} is then written by multiplying {@code G}'s decimal digits by the
     * small {@code m}, in linear time, instead of a divide-and-conquer conversion of its own. No gcd of big numbers
     * is needed: the ratio of two such numbers is a fraction {@code a/b} with small terms, read off the continued
     * fraction of their leading bits and then checked exactly ({@code x b = y a}). A number that is not a small
     * multiple of {@code G}, or that has fewer than {@value #SHARED_MIN_BITS} bits, is converted on its own. The
     * texts equal {@link BigInteger#toString()}. Thread-safe once built.
     */
    public static final class SharedFactor {
        /** Numbers of the sample tried at most. */
        public static final int MAX_SAMPLE = 64;
        /** Consecutive numbers that are not small multiples, after which the search stops. */
        static final int MAX_MISSES = 8;

        private final BigInteger g;
        private final int[] digits;

        private SharedFactor(BigInteger g) {
            this.g = g;
            this.digits = g == null ? null : limbs(DecimalText.toString(g));
        }

        /**
         * The largest common divisor of the sample's large members that leaves small multipliers, found from the
         * first {@value #MAX_SAMPLE} of them (a member whose ratio to it is not small is passed over; after
         * {@value #MAX_MISSES} such members in a row the search stops).
         *
         * @param sample positive integers, typically the denominators to be written
         * @return the shared factor, possibly none (then every number is converted on its own)
         */
        public static SharedFactor of(java.util.Collection<BigInteger> sample) {
            BigInteger g = null;
            int tried = 0;
            int misses = 0;
            for (BigInteger x : sample) {
                if (x.signum() <= 0 || x.bitLength() < SHARED_MIN_BITS || x.equals(g)) {
                    continue;
                }
                if (tried++ == MAX_SAMPLE || misses == MAX_MISSES) {
                    break;
                }
                if (g == null) {
                    g = x;
                    continue;
                }
                BigInteger[] ab = smallRatio(g, x);
                if (ab == null) {
                    misses++;
                    continue;
                }
                misses = 0;
                // g b = x a with gcd(a, b) = 1, so a divides g: the common divisor of g and x is g / a = x / b
                if (!ab[0].equals(BigInteger.ONE)) {
                    g = g.divide(ab[0]);
                }
            }
            return new SharedFactor(g);
        }

        /** The shared factor found, or null (for tests). */
        BigInteger factor() {
            return g;
        }

        /**
         * The decimal text of {@code x}, equal to {@code x.toString()}.
         *
         * @param x any integer
         * @return its text
         */
        public String toString(BigInteger x) {
            if (g != null && x.signum() > 0 && x.bitLength() >= SHARED_MIN_BITS) {
                BigInteger[] ab = x.equals(g) ? new BigInteger[] {BigInteger.ONE, BigInteger.ONE} : smallRatio(x, g);
                if (ab != null && ab[1].equals(BigInteger.ONE)) {
                    return text(multiply(digits, limbs(ab[0].toString())));
                }
            }
            return DecimalText.toString(x);
        }
    }

    /**
     * {@code {a, b}} with {@code x / y = a / b}, {@code gcd(a, b) = 1} and both below {@code 2^RATIO_BITS}, or null
     * if there is none. The continued fraction of the leading bits of {@code x / y} has a huge partial quotient
     * right after {@code a / b} when the ratio is that small fraction (the error of the leading bits is far
     * below {@code 1 / b^2}); that convergent is then checked exactly.
     */
    static BigInteger[] smallRatio(BigInteger x, BigInteger y) {
        if (Math.abs(x.bitLength() - y.bitLength()) > RATIO_BITS) {
            return null;
        }
        int shift = Math.max(0, Math.max(x.bitLength(), y.bitLength()) - RATIO_PRECISION);
        BigInteger u = x.shiftRight(shift);
        BigInteger v = y.shiftRight(shift);
        // convergents p/q of u/v
        BigInteger p0 = BigInteger.ONE;
        BigInteger q0 = BigInteger.ZERO;
        BigInteger p1 = BigInteger.ZERO;
        BigInteger q1 = BigInteger.ONE;
        while (v.signum() != 0) {
            BigInteger[] qr = u.divideAndRemainder(v);
            BigInteger t = qr[0];
            if (t.bitLength() > RATIO_BITS + 16 || qr[1].signum() == 0) {
                // a huge partial quotient: the convergent before it; the end of the expansion: its last convergent
                BigInteger[] ab = qr[1].signum() == 0 && t.bitLength() <= RATIO_BITS + 16
                    ? new BigInteger[] {t.multiply(p0).add(p1), t.multiply(q0).add(q1)}
                    : new BigInteger[] {p0, q0};
                if (ab[0].bitLength() > RATIO_BITS || ab[1].bitLength() > RATIO_BITS || ab[1].signum() == 0) {
                    return null;
                }
                return x.multiply(ab[1]).equals(y.multiply(ab[0])) ? ab : null;
            }
            BigInteger p2 = t.multiply(p0).add(p1);
            BigInteger q2 = t.multiply(q0).add(q1);
            p1 = p0;
            q1 = q0;
            p0 = p2;
            q0 = q2;
            if (p0.bitLength() > RATIO_BITS || q0.bitLength() > RATIO_BITS) {
                return null;
            }
            u = v;
            v = qr[1];
        }
        return null;
    }

    /** The digits of a decimal text as base-10^9 limbs, least significant first. */
    private static int[] limbs(String digits) {
        int n = (digits.length() + 8) / 9;
        int[] out = new int[n];
        int end = digits.length();
        for (int i = 0; i < n; i++) {
            int start = Math.max(0, end - 9);
            int v = 0;
            for (int k = start; k < end; k++) {
                v = v * 10 + (digits.charAt(k) - '0');
            }
            out[i] = v;
            end = start;
        }
        return out;
    }

    /** The product of two numbers in base-10^9 limbs. */
    private static int[] multiply(int[] x, int[] m) {
        int[] out = new int[x.length + m.length];
        for (int j = 0; j < m.length; j++) {
            long mj = m[j];
            if (mj == 0) {
                continue;
            }
            long carry = 0;
            for (int i = 0; i < x.length; i++) {
                long cur = out[i + j] + x[i] * mj + carry;
                carry = cur / LIMB;
                out[i + j] = (int) (cur - carry * LIMB);
            }
            for (int k = j + x.length; carry != 0; k++) {
                long cur = out[k] + carry;
                carry = cur / LIMB;
                out[k] = (int) (cur - carry * LIMB);
            }
        }
        return out;
    }

    /** The decimal text of base-10^9 limbs (without leading zeros; "0" for zero). */
    private static String text(int[] limbs) {
        int top = limbs.length - 1;
        while (top > 0 && limbs[top] == 0) {
            top--;
        }
        byte[] buf = new byte[9 * (top + 1)];
        for (int i = 0; i <= top; i++) {
            digits(limbs[i], buf, buf.length - 9 * (i + 1), 9);
        }
        int start = 0;
        while (start < buf.length - 1 && buf[start] == '0') {
            start++;
        }
        return new String(buf, start, buf.length - start, StandardCharsets.ISO_8859_1);
    }

    /** Writes exactly {@code width} digits of {@code 0 <= x < 10^width} into {@code buf[pos, pos + width)}. */
    private static final class Convert extends RecursiveAction {
        private static final long serialVersionUID = 1L;
        private final transient BigInteger x;
        private final byte[] buf;
        private final int pos;
        private final int width;

        Convert(BigInteger x, byte[] buf, int pos, int width) {
            this.x = x;
            this.buf = buf;
            this.pos = pos;
            this.width = width;
        }

        @Override
        protected void compute() {
            if (width <= BASE_DIGITS) {
                base(x, buf, pos, width);
                return;
            }
            // the largest level whose e = 18 * 2^k is below the width, so both halves have at most e digits
            int level = 31 - Integer.numberOfLeadingZeros((width - 1) / 18);
            Power p = power(level);
            BigInteger[] qr = divide(x, p);
            Convert high = new Convert(qr[0], buf, pos, width - p.e);
            Convert low = new Convert(qr[1], buf, pos + width - p.e, p.e);
            if (x.bitLength() >= PARALLEL_BITS && getPool() != null) {
                invokeAll(high, low);
            } else {
                high.compute();
                low.compute();
            }
        }
    }

    /**
     * {@code (x / v, x mod v)} for {@code 0 <= x < v^2} by Barrett's reduction: with {@code k} the bit length of
     * {@code v}, {@code q = floor(floor(x / 2^(k-1)) mu / 2^(k+1))} is at most 2 below the true quotient.
     */
    static BigInteger[] divide(BigInteger x, Power p) {
        if (x.bitLength() <= p.bits) {
            return x.compareTo(p.v) < 0 ? new BigInteger[] {BigInteger.ZERO, x} : x.divideAndRemainder(p.v);
        }
        BigInteger q = x.shiftRight(p.bits - 1).multiply(p.mu).shiftRight(p.bits + 1);
        BigInteger r = x.subtract(q.multiply(p.v));
        while (r.compareTo(p.v) >= 0) {
            r = r.subtract(p.v);
            q = q.add(BigInteger.ONE);
        }
        return new BigInteger[] {q, r};
    }

    /**
     * Writes {@code 0 <= x < 10^width}, {@code width <= 36}: one more Barrett split by {@code 10^18} and the two
     * halves as {@code long}s, so that no piece goes through {@link BigInteger}'s own conversion (a long division
     * per 18 digits, slow until the JIT has compiled it).
     */
    private static void base(BigInteger x, byte[] buf, int pos, int width) {
        if (x.bitLength() < 63) {
            digits(x.longValue(), buf, pos, width);
            return;
        }
        BigInteger[] qr = divide(x, power(0));
        digits(qr[0].longValue(), buf, pos, width - 18);
        digits(qr[1].longValue(), buf, pos + width - 18, 18);
    }

    /** Writes exactly {@code width} digits of {@code 0 <= v < 10^width} (leading zeros included). */
    private static void digits(long v, byte[] buf, int pos, int width) {
        for (int i = pos + width - 1; i >= pos; i--) {
            buf[i] = (byte) ('0' + v % 10);
            v /= 10;
        }
    }
}
