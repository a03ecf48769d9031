package org.qchain.exact.certified;

import java.math.BigInteger;
import java.util.Optional;
import org.qchain.exact.MatrixPowers;
import org.qchain.exact.Progress;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.SizeEstimate;
import org.qchain.exact.SparseRationalMatrix;

/**
 * Certified decimals of {@code P^n} for a non-negative matrix {@code P} (a transition matrix): every printed digit
 * is proven, without computing the exact fraction, whose size grows linearly in {@code n}.
 *
 * <p>Method: fixed-point lower and upper bound matrices with directed rounding ({@code L <= P^n <= U} entrywise,
 * monotone because every entry is non-negative), by repeated squaring or, for one row when that is cheaper, by
 * {@code n} vector–matrix products; each value's decimal is settled by {@link Ziv}'s strategy, raising the working
 * precision until both ends of its enclosure round alike. A value that still straddles a rounding boundary at
 * {@link Settings#maxBits()} is computed exactly if its exact size estimate is within
 * {@link Settings#maxExactDigits()}, else reported as an interval.
 *
 * <p>Zero entries are exact: an entry's upper bound is zero only where the true entry is zero. Work is proportional to
 * the non-zero entries, so large sparse chains ({@link SparseRationalMatrix}) need no dense matrix for a row.
 */
public final class CertifiedPowers {
    /** The default largest working precision, in bits. */
    public static final int DEFAULT_MAX_BITS = 4096;
    /** The exact fall-back is considered only up to this many states (it needs the dense matrix). */
    static final int MAX_DENSE_FALLBACK_STATES = 2000;

    private CertifiedPowers() {
    }

    /**
     * What to compute.
     *
     * @param digits         significant digits, at least 1
     * @param maxBits        the largest working precision, in bits, at least 64
     * @param maxExactDigits the largest exact result (estimated total digits, as
     *                       {@link SizeEstimate#digitsOfRow(RationalMatrix, int, long)}) the fall-back may compute
     */
    public record Settings(int digits, int maxBits, long maxExactDigits) {
        /** Checks the ranges. */
        public Settings {
            if (digits < 1 || maxBits < 64 || maxExactDigits < 0) {
                throw new IllegalArgumentException("need digits >= 1, maxBits >= 64, maxExactDigits >= 0");
            }
        }

        /**
         * The defaults for a number of digits: {@link #DEFAULT_MAX_BITS} and {@link SizeEstimate#DEFAULT_MAX_DIGITS}.
         *
         * @param digits significant digits, at least 1
         * @return the settings
         */
        public static Settings of(int digits) {
            return new Settings(digits, DEFAULT_MAX_BITS, SizeEstimate.DEFAULT_MAX_DIGITS);
        }
    }

    /**
     * Row {@code from} of {@code P^n}, every entry correctly rounded.
     *
     * @param p        a non-negative square matrix
     * @param from     the row, 0-based
     * @param n        the exponent, {@code >= 0}
     * @param settings digits and limits
     * @param progress receives coarse progress reports
     * @return one decimal per column
     * @throws IllegalArgumentException  if {@code p} has a negative entry or {@code n < 0}
     * @throws IndexOutOfBoundsException if {@code from} is not a row
     * @throws org.qchain.exact.QchainException with {@code INTERRUPTED} if the thread is interrupted
     */
    public static CertifiedDecimal[] row(SparseRationalMatrix p, int from, long n, Settings settings,
                                         Progress progress) {
        check(p, n);
        java.util.Objects.checkIndex(from, p.size());
        if (n <= 1) {
            return exactRow(p, from, n, settings.digits());
        }
        Plan plan = Plan.of(p, from, n);
        return Ziv.round(bits -> plan.enclose(bits, progress), settings.digits(),
            startBits(p.size(), n, settings), settings.maxBits(),
            () -> exactFallback(p, n, settings).map(d -> MatrixPowers.rowOfPower(d, from, n)));
    }

    /**
     * Entry {@code (from, to)} of {@code P^n}, correctly rounded (computed through its row).
     *
     * @param p        a non-negative square matrix
     * @param from     the row, 0-based
     * @param to       the column, 0-based
     * @param n        the exponent, {@code >= 0}
     * @param settings digits and limits
     * @param progress receives coarse progress reports
     * @return the decimal
     * @throws IllegalArgumentException  if {@code p} has a negative entry or {@code n < 0}
     * @throws IndexOutOfBoundsException if {@code from} or {@code to} is out of range
     */
    public static CertifiedDecimal entry(SparseRationalMatrix p, int from, int to, long n, Settings settings,
                                         Progress progress) {
        check(p, n);
        java.util.Objects.checkIndex(to, p.size());
        java.util.Objects.checkIndex(from, p.size());
        if (n <= 1) {
            return exactRow(p, from, n, settings.digits())[to];
        }
        Plan plan = Plan.of(p, from, n);
        return Ziv.round(bits -> new Enclosure[] {plan.enclose(bits, progress)[to]}, settings.digits(),
            startBits(p.size(), n, settings), settings.maxBits(),
            () -> exactFallback(p, n, settings).map(d -> new Rational[] {MatrixPowers.entryOfPower(d, from, to, n)}))[0];
    }

    /**
     * All of {@code P^n}, every entry correctly rounded.
     *
     * @param p        a non-negative square matrix
     * @param n        the exponent, {@code >= 0}
     * @param settings digits and limits
     * @param progress receives coarse progress reports
     * @return the decimals, row by row
     * @throws IllegalArgumentException if {@code p} has a negative entry or {@code n < 0}
     */
    public static CertifiedDecimal[][] power(SparseRationalMatrix p, long n, Settings settings, Progress progress) {
        check(p, n);
        int s = p.size();
        CertifiedDecimal[] flat;
        if (n <= 1) {
            flat = new CertifiedDecimal[s * s];
            for (int i = 0; i < s; i++) {
                System.arraycopy(exactRow(p, i, n, settings.digits()), 0, flat, i * s, s);
            }
        } else {
            flat = Ziv.round(bits -> flatten(powerBounds(p, n, bits, progress)), settings.digits(),
                startBits(s, n, settings), settings.maxBits(),
                () -> exactFallbackPower(p, n, settings).map(CertifiedPowers::flatten));
        }
        CertifiedDecimal[][] out = new CertifiedDecimal[s][s];
        for (int i = 0; i < s; i++) {
            System.arraycopy(flat, i * s, out[i], 0, s);
        }
        return out;
    }

    /**
     * Enclosures of row {@code from} of {@code P^n} at {@code bits} bits of fixed-point precision (the raw bounds
     * behind {@link #row}).
     *
     * @param p        a non-negative square matrix
     * @param from     the row, 0-based
     * @param n        the exponent, {@code >= 0}
     * @param bits     the fixed-point precision, at least 1
     * @param progress receives coarse progress reports
     * @return one enclosure per column, each containing the exact entry
     * @throws IllegalArgumentException if {@code p} has a negative entry or {@code n < 0}
     */
    public static Enclosure[] rowEnclosure(SparseRationalMatrix p, int from, long n, int bits, Progress progress) {
        check(p, n);
        java.util.Objects.checkIndex(from, p.size());
        if (n == 0) {
            return exactEnclosures(exactRow(p, from, 0, 1));
        }
        return Plan.of(p, from, n).enclose(bits, progress);
    }

    /**
     * How a row is enclosed, decided once for all precisions: for a large {@code n} on a stochastic matrix whose
     * powers contract ({@link Contraction}), vector steps until the rest cannot matter; otherwise vector steps or
     * squaring, whichever costs less.
     */
    private record Plan(SparseRationalMatrix p, int from, long n, Optional<Contraction.Bound> bound,
                        Optional<java.util.BitSet> support) {
        /** Contraction is tried when {@code n} is this many times the number of states or more. */
        static final int CONTRACTION_MIN_STEPS_PER_STATE = 32;
        /** ... and the states are at most this many (its bound needs all rows of {@code P^k}, dense). */
        static final int CONTRACTION_MAX_STATES = 4000;
        /** The work of the bound's floating-point steps, in multiply-adds, at most. */
        static final double CONTRACTION_WORK = 4e8;

        static Plan of(SparseRationalMatrix p, int from, long n) {
            int s = p.size();
            if (n >= (long) CONTRACTION_MIN_STEPS_PER_STATE * s && s <= CONTRACTION_MAX_STATES
                    && Contraction.isStochastic(p)) {
                Optional<java.util.BitSet> support = Contraction.support(p, from, n, 8 * s + 64);
                if (support.isPresent()) {
                    int maxK = (int) Math.max(2, Math.min(256, CONTRACTION_WORK / ((double) s * p.nonZeroCount())));
                    Optional<Contraction.Bound> bound = Contraction.doeblin(p, maxK, Thread.currentThread());
                    if (bound.isPresent()) {
                        return new Plan(p, from, n, bound, support);
                    }
                }
            }
            return new Plan(p, from, n, Optional.empty(), Optional.empty());
        }

        Enclosure[] enclose(int bits, Progress progress) {
            if (n <= 1) {
                return exactEnclosures(exactRow(p, from, n, 1));
            }
            FixedPointBounds b = FixedPointBounds.of(p, bits);
            Thread caller = Thread.currentThread();
            if (bound.isPresent()) {
                return Contraction.row(b, bound.get(), support.get(), from, n, progress, caller);
            }
            return CertifiedPowers.direct(b, from, n, progress, caller);
        }
    }

    private static Enclosure[] direct(FixedPointBounds b, int from, long n, Progress progress, Thread caller) {
        int bits = b.w;
        if (preferVectorSteps(b, n)) {
            int[] idx = b.cols[from];
            BigInteger[] lo = b.lo[from];
            BigInteger[] hi = b.hi[from];
            long stride = Math.max(1, n / 1000);
            for (long t = 1; t < n; t++) {
                FixedPointBounds.Row r = FixedPointBounds.rowTimes(idx, lo, hi, b, caller);
                idx = r.cols();
                lo = r.lo();
                hi = r.hi();
                if ((t + 1) % stride == 0) {
                    progress.update("certified path sums", t + 1, n);
                }
            }
            return FixedPointBounds.enclosures(b.n, bits, idx, lo, hi);
        }
        return powerOf(b, n, progress, caller).enclosures(from);
    }

    private static Enclosure[][] powerBounds(SparseRationalMatrix p, long n, int bits, Progress progress) {
        FixedPointBounds b = powerOf(FixedPointBounds.of(p, bits), n, progress, Thread.currentThread());
        Enclosure[][] out = new Enclosure[b.n][];
        for (int i = 0; i < b.n; i++) {
            out[i] = b.enclosures(i);
        }
        return out;
    }

    /** Left to right over the bits of {@code n >= 1}, as the exact engine does. */
    private static FixedPointBounds powerOf(FixedPointBounds a, long n, Progress progress, Thread caller) {
        int top = 63 - Long.numberOfLeadingZeros(n);
        long total = top + Long.bitCount(n) - 1L;
        long done = 0;
        FixedPointBounds r = a;
        for (int bit = top - 1; bit >= 0; bit--) {
            r = r.multiply(r, caller);
            progress.update("certified squaring", ++done, total);
            if ((n >>> bit & 1) != 0) {
                r = r.multiply(a, caller);
                progress.update("certified squaring", ++done, total);
            }
        }
        return r;
    }

    /**
     * Whether {@code n} vector steps cost less than squaring: vector steps touch each stored entry once per step;
     * squaring does about {@code log2 n} products that fill in towards {@code s^3} multiplications each.
     */
    static boolean preferVectorSteps(FixedPointBounds b, long n) {
        double s = b.n;
        double vector = (double) n * b.nonZeroCount();
        double squaring = (64 - Long.numberOfLeadingZeros(n)) * s * s * s;
        return vector <= squaring;
    }

    /**
     * A first precision that usually settles every digit at once: the digits asked for, the bits that rounding can
     * lose over {@code n} steps of {@code s}-term sums (about {@code log2(n s)}), and a margin for entries well
     * below 1.
     */
    static int startBits(int size, long n, Settings settings) {
        int digitsBits = (int) Math.ceil(settings.digits() * 3.3219280948873626);
        int lossBits = (64 - Long.numberOfLeadingZeros(n)) + (32 - Integer.numberOfLeadingZeros(size));
        return Math.min(settings.maxBits(), Math.max(64, digitsBits + lossBits + 48));
    }

    private static void check(SparseRationalMatrix p, long n) {
        if (n < 0) {
            throw new IllegalArgumentException("exponent must not be negative: " + n);
        }
        if (!p.isNonNegative()) {
            throw new IllegalArgumentException("certified powers need a matrix without negative entries");
        }
    }

    private static CertifiedDecimal[] exactRow(SparseRationalMatrix p, int from, long n, int digits) {
        CertifiedDecimal[] out = new CertifiedDecimal[p.size()];
        for (int j = 0; j < out.length; j++) {
            Rational x = n == 0 ? (j == from ? Rational.ONE : Rational.ZERO) : p.get(from, j);
            out[j] = CertifiedDecimal.exact(x, digits);
        }
        return out;
    }

    private static Enclosure[] exactEnclosures(CertifiedDecimal[] d) {
        Enclosure[] e = new Enclosure[d.length];
        for (int i = 0; i < d.length; i++) {
            e[i] = d[i].enclosure();
        }
        return e;
    }

    private static Optional<RationalMatrix> exactFallback(SparseRationalMatrix p, long n, Settings settings) {
        if (p.size() > MAX_DENSE_FALLBACK_STATES) {
            return Optional.empty();
        }
        RationalMatrix d = p.toDense();
        return SizeEstimate.digitsOfRow(d, n) <= settings.maxExactDigits() ? Optional.of(d) : Optional.empty();
    }

    private static Optional<Rational[][]> exactFallbackPower(SparseRationalMatrix p, long n, Settings settings) {
        if (p.size() > MAX_DENSE_FALLBACK_STATES) {
            return Optional.empty();
        }
        RationalMatrix d = p.toDense();
        return SizeEstimate.digitsOfPower(d, n) <= settings.maxExactDigits()
            ? Optional.of(MatrixPowers.power(d, n).toArray()) : Optional.empty();
    }

    private static <T> T[] flatten(T[][] rows) {
        int s = rows.length;
        T[] flat = java.util.Arrays.copyOf(rows[0], s * rows[0].length);
        for (int i = 1; i < s; i++) {
            System.arraycopy(rows[i], 0, flat, i * rows[0].length, rows[i].length);
        }
        return flat;
    }
}
