package org.qchain.exact.model;

import java.util.Optional;
import org.qchain.exact.Rational;

/**
 * An interval of allowed parameter values, with open or closed ends; an absent upper end is {@code +infinity}.
 *
 * @param lower       the lower end
 * @param lowerClosed whether the lower end belongs to the interval
 * @param upper       the upper end; empty for {@code +infinity}
 * @param upperClosed whether the upper end belongs to the interval (false when infinite)
 */
public record Domain(Rational lower, boolean lowerClosed, Optional<Rational> upper, boolean upperClosed) {

    /** The default domain of a parameter in a discrete chain: the open interval (0, 1). */
    public static Domain probability() {
        return new Domain(Rational.ZERO, false, Optional.of(Rational.ONE), false);
    }

    /** The default domain of a parameter in a continuous chain: (0, infinity). */
    public static Domain positive() {
        return new Domain(Rational.ZERO, false, Optional.empty(), false);
    }

    /** The default domain for a chain of this kind. */
    public static Domain defaultFor(ChainKind kind) {
        return kind == ChainKind.DISCRETE ? probability() : positive();
    }

    /** Whether {@code x} lies in the interval. */
    public boolean contains(Rational x) {
        int lo = x.compareTo(lower);
        if (lo < 0 || (lo == 0 && !lowerClosed)) {
            return false;
        }
        if (upper.isEmpty()) {
            return true;
        }
        int hi = x.compareTo(upper.get());
        return hi < 0 || (hi == 0 && upperClosed);
    }

    /** Interval notation as in model files: {@code (0, 1)}, {@code [0, 1/2]}, {@code (0, inf)}. */
    @Override
    public String toString() {
        return (lowerClosed ? "[" : "(") + lower + ", " + upper.map(Rational::toString).orElse("inf")
            + (upperClosed ? "]" : ")");
    }
}
