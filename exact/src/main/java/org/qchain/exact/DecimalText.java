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
