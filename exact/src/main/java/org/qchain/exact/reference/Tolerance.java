package org.qchain.exact.reference;

import java.util.Optional;
import java.util.OptionalLong;
import org.qchain.exact.Rational;

/**
 * When a given value is close enough to the exact one. A value passes when it meets any of the bounds given:
 * relative error {@code |x - t| <= rel |t|}, absolute error {@code |x - t| <= abs}, or at most {@code ulps} doubles
 * between the value's double and the correctly rounded double of the truth. The comparisons are exact.
 *
 * <p>A relative bound alone demands an exact 0 where the truth is 0; give an absolute bound or an ulp bound as well
 * for such entries.
 *
 * @param relative the relative bound, if given
 * @param absolute the absolute bound, if given
 * @param ulps     the bound in units in the last place, if given
 */
public record Tolerance(Optional<Rational> relative, Optional<Rational> absolute, OptionalLong ulps) {
    /** The relative bound used when none is given: {@code 1e-9}. */
    public static final Rational DEFAULT_RELATIVE = Rational.of(1, 1_000_000_000);

    /**
     * Checks the bounds.
     *
     * @throws IllegalArgumentException if a bound is negative or none is given
     */
    public Tolerance {
        if (relative.isEmpty() && absolute.isEmpty() && ulps.isEmpty()) {
            throw new IllegalArgumentException("no tolerance given");
        }
        if (relative.map(r -> r.signum() < 0).orElse(false) || absolute.map(r -> r.signum() < 0).orElse(false)
            || (ulps.isPresent() && ulps.getAsLong() < 0)) {
            throw new IllegalArgumentException("a tolerance must not be negative");
        }
    }

    /**
     * The bounds given, or the default relative bound {@link #DEFAULT_RELATIVE} when none is.
     *
     * @param relative relative bound
     * @param absolute absolute bound
     * @param ulps     bound in ulps
     * @return the tolerance
     * @throws IllegalArgumentException if a bound is negative
     */
    public static Tolerance orDefault(Optional<Rational> relative, Optional<Rational> absolute, OptionalLong ulps) {
        if (relative.isEmpty() && absolute.isEmpty() && ulps.isEmpty()) {
            return new Tolerance(Optional.of(DEFAULT_RELATIVE), Optional.empty(), OptionalLong.empty());
        }
        return new Tolerance(relative, absolute, ulps);
    }
}
