package org.qchain.exact.certified;

import java.util.Optional;
import java.util.function.Supplier;
import org.qchain.exact.Rational;

/**
 * Correctly rounded decimals from enclosures, by Ziv's strategy: compute enclosures at a working precision; a value
 * whose two ends round to the same decimal is settled; for the others, double the precision and compute again.
 *
 * <p>An exact value that lies on a rounding boundary (a tie such as {@code 1/4} at one digit) is inside every
 * enclosure's interior or at its end, so its enclosures straddle the boundary at every precision. The loop therefore
 * stops at a largest precision; what is still open then is computed exactly if the caller can afford it, and is
 * otherwise reported as an interval ({@link CertifiedDecimal.Status#NOT_RESOLVED}), never as a guessed rounding.
 * (A. Ziv, "Fast evaluation of elementary mathematical functions with correctly rounded last bit", ACM Transactions
 * on Mathematical Software 17(3), 1991: the strategy of raising the precision until the rounding is decided.)
 */
public final class Ziv {
    private Ziv() {
    }

    /**
     * Enclosures of a fixed list of real numbers at a working precision. Higher precisions should give narrower
     * enclosures (each call must give intervals that contain the true values, whatever the precision).
     */
    @FunctionalInterface
    public interface Enclosing {
        /**
         * The enclosures at about {@code bits} bits of working precision.
         *
         * @param bits the working precision, at least 1
         * @return one enclosure per value, always the same number of values
         */
        Enclosure[] at(int bits);
    }

    /**
     * Rounds every value correctly to {@code digits} significant digits (half-even), raising the working precision
     * from {@code startBits}, doubling, up to {@code maxBits}.
     *
     * @param source    the enclosures
     * @param digits    significant digits, at least 1
     * @param startBits the first working precision, at least 1
     * @param maxBits   the largest working precision tried, at least {@code startBits}
     * @param exact     the exact values of all of them, or empty if computing them would be too large; called only
     *                  when some value is still open at {@code maxBits}
     * @return one decimal per value, in order
     * @throws IllegalArgumentException if an argument is out of range
     */
    public static CertifiedDecimal[] round(Enclosing source, int digits, int startBits, int maxBits,
                                           Supplier<Optional<Rational[]>> exact) {
        if (digits < 1 || startBits < 1 || maxBits < startBits) {
            throw new IllegalArgumentException("need digits >= 1 and 1 <= startBits <= maxBits");
        }
        CertifiedDecimal[] out = null;
        Enclosure[] last = null;
        int open = 0;
        int bits = startBits;
        while (true) {
            Enclosure[] e = source.at(bits);
            if (out == null) {
                out = new CertifiedDecimal[e.length];
            }
            open = 0;
            for (int i = 0; i < e.length; i++) {
                if (out[i] == null) {
                    Optional<CertifiedDecimal> d = CertifiedDecimal.ofEnclosure(e[i], digits, bits);
                    if (d.isPresent()) {
                        out[i] = d.get();
                    } else {
                        open++;
                    }
                }
            }
            last = e;
            if (open == 0 || bits >= maxBits) {
                break;
            }
            bits = (int) Math.min(maxBits, 2L * bits);
        }
        if (open > 0) {
            Optional<Rational[]> x = exact.get();
            for (int i = 0; i < out.length; i++) {
                if (out[i] == null) {
                    out[i] = x.isPresent() ? CertifiedDecimal.exact(x.get()[i], digits)
                        : CertifiedDecimal.unresolved(last[i], digits, bits);
                }
            }
        }
        return out;
    }
}
