package org.qchain.exact.certified;

import org.qchain.exact.Rational;

/**
 * A closed interval {@code [lo, hi]} of rationals, {@code lo <= hi}, known to contain a real number: the outcome of
 * a computation with directed rounding. Immutable.
 */
public final class Enclosure {
    private final Rational lo;
    private final Rational hi;

    private Enclosure(Rational lo, Rational hi) {
        this.lo = lo;
        this.hi = hi;
    }

    /**
     * The interval {@code [lo, hi]}.
     *
     * @param lo the lower end
     * @param hi the upper end
     * @return the interval
     * @throws IllegalArgumentException if {@code lo > hi}
     */
    public static Enclosure of(Rational lo, Rational hi) {
        if (lo.compareTo(hi) > 0) {
            throw new IllegalArgumentException("empty interval [" + lo + ", " + hi + "]");
        }
        return new Enclosure(lo, hi);
    }

    /**
     * The point interval {@code [x, x]}: an exactly known value.
     *
     * @param x the value
     * @return the interval
     */
    public static Enclosure exact(Rational x) {
        return new Enclosure(x, x);
    }

    /** The lower end. */
    public Rational lo() {
        return lo;
    }

    /** The upper end. */
    public Rational hi() {
        return hi;
    }

    /** {@code hi - lo}. */
    public Rational width() {
        return hi.subtract(lo);
    }

    /** Whether {@code lo = hi}. */
    public boolean isExact() {
        return lo.equals(hi);
    }

    /**
     * Whether {@code lo <= x <= hi}.
     *
     * @param x a value
     * @return whether the interval contains it
     */
    public boolean contains(Rational x) {
        return lo.compareTo(x) <= 0 && x.compareTo(hi) <= 0;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Enclosure e && lo.equals(e.lo) && hi.equals(e.hi);
    }

    @Override
    public int hashCode() {
        return 31 * lo.hashCode() + hi.hashCode();
    }

    /** {@code [lo, hi]} with exact ends. */
    @Override
    public String toString() {
        return "[" + lo + ", " + hi + "]";
    }
}
