package org.qchain.exact.reference;

import java.util.Comparator;
import java.util.OptionalLong;
import org.qchain.exact.Rational;
import org.qchain.exact.SourcePos;

/**
 * The check of one given value against the exact one. The errors are computed exactly and rounded to a double only
 * for display; whether the value passes was decided exactly.
 *
 * @param row           the target row index
 * @param col           the target column index
 * @param label         the entry's name ({@code Up -> Down}, {@code Up}, {@code availability})
 * @param pos           where the value is in the file
 * @param given         the value as written
 * @param truth         the exact value
 * @param givenDouble   the double the given text stands for (correctly rounded), or its infinity or NaN
 * @param truthDouble   the correctly rounded double of the truth
 * @param error         {@code given - truth}, rounded; infinite or NaN for a non-finite given value
 * @param relativeError {@code (given - truth) / |truth|}, rounded; infinite when the truth is 0 and the value not
 * @param ulps          doubles between {@code givenDouble} and {@code truthDouble}; empty for a non-finite value
 * @param pass          whether the value meets the tolerance
 */
public record EntryCheck(int row, int col, String label, SourcePos pos, String given, Rational truth,
                         double givenDouble, double truthDouble, double error, double relativeError,
                         OptionalLong ulps, boolean pass) {
    /**
     * Worst first: failures before passes, non-finite values first, then by relative error, ulps and absolute
     * error (larger first), then by position in the target.
     */
    public static final Comparator<EntryCheck> WORST_FIRST = Comparator
        .comparing((EntryCheck c) -> c.pass())
        .thenComparing(c -> c.isFinite())
        .thenComparing(c -> badness(c.relativeError()), Comparator.reverseOrder())
        .thenComparing(c -> c.ulps().orElse(Long.MAX_VALUE), Comparator.reverseOrder())
        .thenComparing(c -> badness(c.error()), Comparator.reverseOrder())
        .thenComparingInt(EntryCheck::row)
        .thenComparingInt(EntryCheck::col);

    private static double badness(double e) {
        return Double.isNaN(e) ? Double.POSITIVE_INFINITY : Math.abs(e);
    }

    /** Whether the given value is a finite number. */
    public boolean isFinite() {
        return ulps.isPresent();
    }

    /** Whether the given value's double is the correctly rounded double of the truth (0 ulp). */
    public boolean isCorrectlyRounded() {
        return ulps.isPresent() && ulps.getAsLong() == 0;
    }
}
