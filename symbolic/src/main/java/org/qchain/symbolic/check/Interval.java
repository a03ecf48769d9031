package org.qchain.symbolic.check;

import org.qchain.exact.Rational;

/** A closed interval of rationals {@code [lo, hi]}, with exact interval arithmetic for enclosures. */
record Interval(Rational lo, Rational hi) {
    static Interval point(Rational x) {
        return new Interval(x, x);
    }

    Interval add(Interval o) {
        return new Interval(lo.add(o.lo), hi.add(o.hi));
    }

    Interval multiply(Interval o) {
        Rational a = lo.multiply(o.lo);
        Rational b = lo.multiply(o.hi);
        Rational c = hi.multiply(o.lo);
        Rational d = hi.multiply(o.hi);
        return new Interval(a.min(b).min(c.min(d)), a.max(b).max(c.max(d)));
    }

    Interval scale(Rational k) {
        return k.signum() >= 0 ? new Interval(lo.multiply(k), hi.multiply(k)) : new Interval(hi.multiply(k), lo.multiply(k));
    }

    /** {@code x^e} for {@code x} in this interval: exact range (monotone pieces). */
    Interval pow(int e) {
        if (e == 0) {
            return point(Rational.ONE);
        }
        Rational a = lo.pow(e);
        Rational b = hi.pow(e);
        if (e % 2 == 1 || lo.signum() >= 0) {
            return new Interval(a.min(b), a.max(b));
        }
        if (hi.signum() <= 0) {
            return new Interval(b, a);
        }
        return new Interval(Rational.ZERO, a.max(b));
    }

    Rational mid() {
        return lo.add(hi).multiply(Rational.of(1, 2));
    }
}
