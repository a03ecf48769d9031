package org.qchain.exact;

/**
 * Limits on input that is read before any computation: the digits of one written number and the entries of the
 * dense matrix a model would need. Every reader of numbers (model files, CSV matrices, {@link Rational#parse}) and
 * every dense-matrix builder checks them before it does the work, so a huge input is refused at once with the
 * estimate in the message instead of running for minutes. Immutable; callers raise a limit with the
 * {@code with...} methods.
 *
 * <p>Why these defaults: reading a number of d digits costs a base conversion and a gcd, both quadratic in d with
 * {@link java.math.BigInteger}; measured on a 2-core machine, 10,000 digits take about 0.1 s, 100,000 digits about
 * 3 s and 300,000 digits about 30 s. A dense matrix of 2^24 entries (4,096 states) holds 64 MB of references
 * before any entry is stored.
 *
 * @param maxNumberDigits the largest count of digits in one written number (a numerator, a denominator or a
 *                        decimal's digits); at least 1
 * @param maxDenseEntries the largest count of entries (states squared) of a dense matrix built from a model; at
 *                        least 1
 */
public record InputLimits(int maxNumberDigits, long maxDenseEntries) {
    /** Default count of digits of one written number. */
    public static final int DEFAULT_MAX_NUMBER_DIGITS = 10_000;

    /** Default count of entries of a dense matrix: 4,096 states. */
    public static final long DEFAULT_MAX_DENSE_ENTRIES = 1L << 24;

    /** The default limits. */
    public static final InputLimits DEFAULT = new InputLimits(DEFAULT_MAX_NUMBER_DIGITS, DEFAULT_MAX_DENSE_ENTRIES);

    /**
     * Checks the limits.
     *
     * @throws IllegalArgumentException if a limit is below 1
     */
    public InputLimits {
        if (maxNumberDigits < 1 || maxDenseEntries < 1) {
            throw new IllegalArgumentException("input limits must be at least 1");
        }
    }

    /** These limits with another digit limit for one number. */
    public InputLimits withMaxNumberDigits(int digits) {
        return new InputLimits(digits, maxDenseEntries);
    }

    /** These limits with another limit on dense entries. */
    public InputLimits withMaxDenseEntries(long entries) {
        return new InputLimits(maxNumberDigits, entries);
    }

    /**
     * Refuses a dense {@code states x states} matrix past {@link #maxDenseEntries}, before it is allocated.
     *
     * @param states the number of states
     * @throws QchainException {@link ErrorKey#DENSE_TOO_LARGE} with the entries and a lower bound of the memory
     */
    public void requireDense(int states) {
        long entries = (long) states * states;
        if (entries > maxDenseEntries) {
            // 4 bytes per reference (compressed) is a lower bound: the entries' own objects come on top
            throw new QchainException(ErrorKey.DENSE_TOO_LARGE, states, entries, bytes(entries * 4), maxDenseEntries,
                maxDenseStates());
        }
    }

    /** The most states whose dense matrix fits the limit: the integer square root of {@link #maxDenseEntries}. */
    public long maxDenseStates() {
        return java.math.BigInteger.valueOf(maxDenseEntries).sqrt().longValue();
    }

    /** A byte count in the largest unit that keeps it at least 1: {@code 40.0 GB}. */
    static String bytes(long b) {
        String[] units = {"bytes", "KB", "MB", "GB", "TB", "PB"};
        double v = b;
        int u = 0;
        while (v >= 1000 && u < units.length - 1) {
            v /= 1000;
            u++;
        }
        return u == 0 ? b + " bytes" : String.format(java.util.Locale.ROOT, "%.1f %s", v, units[u]);
    }
}
