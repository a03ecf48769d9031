package org.qchain.exact.certified;

import java.math.RoundingMode;
import org.qchain.exact.Decimals;
import org.qchain.exact.Rational;

/**
 * A real number shown to a number of significant digits, with what is proven about it: every printed digit
 * ({@link Status#CERTIFIED} or {@link Status#EXACT}), or only an interval ({@link Status#NOT_RESOLVED}).
 *
 * @param text      the correctly rounded decimal (half-even, the rules of {@link Decimals}) when the status is
 *                  {@code CERTIFIED} or {@code EXACT}; for {@code NOT_RESOLVED} the interval
 *                  {@code [a, b]} with {@code a} rounded down and {@code b} rounded up to the same number of digits,
 *                  so it still contains the value
 * @param enclosure the interval that proved the digits (a point for {@code EXACT})
 * @param status    what the text means
 * @param bits      the working precision, in bits, of the enclosure that settled it (0 for {@code EXACT})
 */
public record CertifiedDecimal(String text, Enclosure enclosure, Status status, int bits) {

    /** What a {@link CertifiedDecimal}'s text means. */
    public enum Status {
        /** The enclosure proves every printed digit: any value inside it rounds to the text. */
        CERTIFIED,
        /** The value was computed exactly (an exact zero, or the fall-back to exact arithmetic). */
        EXACT,
        /**
         * The enclosure still straddles a rounding boundary at the largest working precision allowed, and the exact
         * value was too large to compute: the text is an interval, not a rounded value.
         */
        NOT_RESOLVED
    }

    /**
     * An exactly known value, rounded.
     *
     * @param x      the value
     * @param digits significant digits
     * @return the decimal
     */
    public static CertifiedDecimal exact(Rational x, int digits) {
        return new CertifiedDecimal(Decimals.format(x, digits), Enclosure.exact(x), Status.EXACT, 0);
    }

    /**
     * The decimal of an enclosure whose ends round alike, if they do.
     *
     * @param e      the enclosure
     * @param digits significant digits
     * @param bits   the working precision that produced it
     * @return the certified decimal, or empty if the two ends round differently
     */
    public static java.util.Optional<CertifiedDecimal> ofEnclosure(Enclosure e, int digits, int bits) {
        if (e.isExact()) {
            return java.util.Optional.of(exact(e.lo(), digits));
        }
        // Rounding to nearest at a fixed number of significant digits is monotone, so when both ends round to the
        // same text every value between them does too.
        String lo = Decimals.format(e.lo(), digits);
        if (!lo.equals(Decimals.format(e.hi(), digits))) {
            return java.util.Optional.empty();
        }
        return java.util.Optional.of(new CertifiedDecimal(lo, e, Status.CERTIFIED, bits));
    }

    /**
     * An honest answer for an enclosure that did not settle: the interval, its ends rounded outwards.
     *
     * @param e      the enclosure
     * @param digits significant digits of each end
     * @param bits   the working precision that produced it
     * @return the decimal with status {@code NOT_RESOLVED}
     */
    public static CertifiedDecimal unresolved(Enclosure e, int digits, int bits) {
        String text = "[" + Decimals.format(e.lo(), digits, RoundingMode.FLOOR) + ", "
            + Decimals.format(e.hi(), digits, RoundingMode.CEILING) + "]";
        return new CertifiedDecimal(text, e, Status.NOT_RESOLVED, bits);
    }

    /** Whether every printed digit is proven (status {@code CERTIFIED} or {@code EXACT}). */
    public boolean isProven() {
        return status != Status.NOT_RESOLVED;
    }
}
