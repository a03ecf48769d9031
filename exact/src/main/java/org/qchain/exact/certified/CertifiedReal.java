package org.qchain.exact.certified;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.IntFunction;
import org.qchain.exact.Decimals;
import org.qchain.exact.Rational;

/**
 * A real number known exactly and shown to any number of correctly rounded digits on demand: an exact rational, a
 * real algebraic number (the one root of a square-free rational polynomial inside an isolating interval, refined by
 * exact bisection), or a value given by enclosures that narrow as the working precision rises. Immutable as a value;
 * the isolating interval of an algebraic number narrows inside as digits are asked for (thread-safe).
 *
 * <p>{@link #decimal(int)} proves every digit it prints: an exact or algebraic number is always rounded correctly
 * (a value on a rounding boundary is found exactly: the polynomial vanishes there); a value given only by
 * enclosures is rounded by Ziv's strategy ({@link Ziv}) and, if it still sits on a boundary at the largest
 * precision, printed as an interval ({@link CertifiedDecimal.Status#NOT_RESOLVED}), never as a guess.
 */
public final class CertifiedReal {
    /** The largest working precision of a value given by enclosures, in bits, at any number of digits. */
    private static final int MIN_MAX_BITS = 4096;

    private final Rational exact;
    private final BigInteger[] poly;
    private final List<Rational> coefficients;
    private final IntFunction<Enclosure> enclosing;
    private final java.util.function.Predicate<Rational> equalsTest;
    private Rational lo;
    private Rational hi;

    private CertifiedReal(Rational exact, List<Rational> coefficients, Rational lo, Rational hi,
                          IntFunction<Enclosure> enclosing) {
        this(exact, coefficients, lo, hi, enclosing, x -> false);
    }

    private CertifiedReal(Rational exact, List<Rational> coefficients, Rational lo, Rational hi,
                          IntFunction<Enclosure> enclosing, java.util.function.Predicate<Rational> equalsTest) {
        this.equalsTest = equalsTest;
        this.exact = exact;
        this.coefficients = coefficients;
        this.poly = coefficients == null ? null : Polys.integral(coefficients);
        this.lo = lo;
        this.hi = hi;
        this.enclosing = enclosing;
    }

    /**
     * An exactly known value.
     *
     * @param x the value
     * @return the number
     */
    public static CertifiedReal exact(Rational x) {
        return new CertifiedReal(x, null, x, x, null);
    }

    /**
     * The root of {@code sum a[k] x^k} inside {@code [lo, hi]}, where the polynomial must have exactly one root (the
     * caller proves it, by root isolation) and, unless {@code lo = hi}, opposite signs at the two ends or a root at
     * one end.
     *
     * @param coefficients a[0] .. a[d], lowest degree first, not all zero
     * @param lo           the lower end of the isolating interval
     * @param hi           the upper end
     * @return the number
     * @throws IllegalArgumentException if the signs at the ends do not bracket a root
     */
    public static CertifiedReal root(List<Rational> coefficients, Rational lo, Rational hi) {
        List<Rational> a = Polys.trim(coefficients);
        if (a.isEmpty() || lo.compareTo(hi) > 0) {
            throw new IllegalArgumentException("no polynomial or an empty interval");
        }
        BigInteger[] p = Polys.integral(a);
        int sl = Polys.sign(p, lo);
        int sh = Polys.sign(p, hi);
        if (sl == 0) {
            return exact(lo);
        }
        if (sh == 0) {
            return exact(hi);
        }
        if (sl == sh) {
            throw new IllegalArgumentException("the polynomial has the same sign at " + lo + " and " + hi);
        }
        if (a.size() == 2) {
            return exact(a.get(0).negate().divide(a.get(1)));
        }
        return new CertifiedReal(null, a, lo, hi, null);
    }

    /**
     * {@code sqrt(a)}, exact when {@code a} is the square of a rational.
     *
     * @param a a value at least 0
     * @return the number
     * @throws IllegalArgumentException if {@code a < 0}
     */
    public static CertifiedReal sqrt(Rational a) {
        return quadratic(Rational.ZERO, Rational.ONE, a);
    }

    /**
     * {@code mid + w sqrt(d)}, exact when {@code w = 0} or {@code d} is the square of a rational.
     *
     * @param mid the rational part
     * @param w   the factor of the square root
     * @param d   the radicand, at least 0
     * @return the number
     * @throws IllegalArgumentException if {@code d < 0}
     */
    public static CertifiedReal quadratic(Rational mid, Rational w, Rational d) {
        if (d.signum() < 0) {
            throw new IllegalArgumentException("square root of a negative number " + d);
        }
        Optional<Rational> s = rationalSqrt(d);
        if (w.isZero() || s.isPresent()) {
            return exact(mid.add(w.multiply(s.orElse(Rational.ZERO))));
        }
        // (x - mid)^2 - w^2 d, with the root on the side of mid that the sign of w says; sqrt(d) <= d + 1
        Rational c = w.multiply(w).multiply(d);
        List<Rational> poly = List.of(mid.multiply(mid).subtract(c), mid.multiply(Rational.of(-2)), Rational.ONE);
        Rational reach = w.abs().multiply(d.add(Rational.ONE));
        return w.signum() > 0 ? new CertifiedReal(null, poly, mid, mid.add(reach), null)
            : new CertifiedReal(null, poly, mid.subtract(reach), mid, null);
    }

    /**
     * A value known through enclosures: {@code enclosing.apply(bits)} must contain the value at every precision and
     * should narrow as {@code bits} rises (about {@code 2^-bits} wide).
     *
     * @param enclosing the enclosures by working precision in bits
     * @return the number
     */
    public static CertifiedReal enclosed(IntFunction<Enclosure> enclosing) {
        return enclosed(enclosing, x -> false);
    }

    /**
     * As {@link #enclosed(IntFunction)}, with a test that decides exactly whether the value equals a rational
     * inside an enclosure: a value on a rounding boundary, or one that its digits show in full, is then printed
     * exactly.
     *
     * @param enclosing the enclosures by working precision in bits
     * @param equals    whether the value is exactly the given rational (asked only for rationals inside an enclosure)
     * @return the number
     */
    public static CertifiedReal enclosed(IntFunction<Enclosure> enclosing, java.util.function.Predicate<Rational> equals) {
        return new CertifiedReal(null, null, null, null, enclosing, equals);
    }

    /** The exact value, if this number is known to be rational. */
    public Optional<Rational> exactValue() {
        return Optional.ofNullable(exact);
    }

    /** Whether this number is exactly 0 (known to be). */
    public boolean isZero() {
        return exact != null && exact.isZero();
    }

    /**
     * An interval with rational (dyadic, for algebraic numbers) ends that contains the value, about {@code 2^-bits}
     * wide or narrower (a value given by enclosures is as narrow as its source makes it).
     *
     * @param bits the precision, at least 1
     * @return the enclosure
     */
    public Enclosure enclosure(int bits) {
        if (exact != null) {
            return Enclosure.exact(exact);
        }
        if (enclosing != null) {
            return enclosing.apply(bits);
        }
        synchronized (this) {
            Rational target = Rational.dyadic(BigInteger.ONE, bits);
            while (lo.compareTo(hi) < 0 && hi.subtract(lo).compareTo(target) > 0) {
                bisect(mid(lo, hi));
            }
            return Enclosure.of(lo, hi);
        }
    }

    /** Splits the isolating interval at {@code x} (inside it); at a root, the interval becomes the point. */
    private void bisect(Rational x) {
        int sx = Polys.sign(poly, x);
        if (sx == 0) {
            lo = x;
            hi = x;
        } else if (sx == Polys.sign(poly, lo)) {
            lo = x;
        } else {
            hi = x;
        }
    }

    /** A dyadic point near the middle of {@code [a, b]} (a < b), of few bits. */
    private static Rational mid(Rational a, Rational b) {
        Rational w = b.subtract(a);
        // the power of two at most a quarter of the width: a + k 2^-e with k chosen to land inside the middle half
        int e = w.denominator().bitLength() - w.numerator().bitLength() + 3;
        Rational m = a.add(b).divide(Rational.of(2));
        BigInteger scaled = e >= 0 ? m.numerator().shiftLeft(e).divide(m.denominator())
            : m.numerator().divide(m.denominator().shiftLeft(-e));
        Rational x = e >= 0 ? Rational.dyadic(scaled, e) : Rational.of(scaled.shiftLeft(-e));
        return x.compareTo(a) > 0 && x.compareTo(b) < 0 ? x : m;
    }

    /**
     * The value to {@code digits} significant digits, correctly rounded (half-even, the rules of {@link Decimals}),
     * with the enclosure that proves it.
     *
     * @param digits significant digits, at least 1
     * @return the decimal
     * @throws IllegalArgumentException if {@code digits < 1}
     */
    public CertifiedDecimal decimal(int digits) {
        if (digits < 1) {
            throw new IllegalArgumentException("significant digits must be at least 1: " + digits);
        }
        if (exact != null) {
            return CertifiedDecimal.exact(exact, digits);
        }
        int start = (int) Math.min(Integer.MAX_VALUE / 4, 4L * digits + 16);
        if (enclosing != null) {
            int max = Math.max(MIN_MAX_BITS, 16 * start);
            Enclosure[] last = new Enclosure[1];
            CertifiedDecimal d = Ziv.round(bits -> new Enclosure[] {last[0] = enclosing.apply(bits)}, digits, start,
                max, () -> boundary(last[0], digits).filter(equalsTest).map(x -> new Rational[] {x}))[0];
            if (d.status() == CertifiedDecimal.Status.CERTIFIED) {
                Rational shown = Rational.parse(d.text());
                if (d.enclosure().contains(shown) && equalsTest.test(shown)) {
                    return CertifiedDecimal.exact(shown, digits);
                }
            }
            return d;
        }
        synchronized (this) {
            enclosure(start);
            while (true) {
                if (lo.equals(hi)) {
                    return CertifiedDecimal.exact(lo, digits);
                }
                String a = Decimals.format(lo, digits);
                String b = Decimals.format(hi, digits);
                if (a.equals(b)) {
                    // a rational root that the digits show in full is the exact value (an integer prints as one)
                    Rational shown = Rational.parse(a);
                    if (shown.compareTo(lo) >= 0 && shown.compareTo(hi) <= 0 && Polys.sign(poly, shown) == 0) {
                        return CertifiedDecimal.exact(shown, digits);
                    }
                    return new CertifiedDecimal(a, Enclosure.of(lo, hi), CertifiedDecimal.Status.CERTIFIED, bitsOf());
                }
                // the rounding boundary between the two texts, when they are neighbours: split there, so that a root
                // on the boundary is found exactly and one beside it is decided at once
                Rational boundary = Rational.parse(a).add(Rational.parse(b)).divide(Rational.of(2));
                if (boundary.compareTo(lo) > 0 && boundary.compareTo(hi) < 0) {
                    bisect(boundary);
                }
                if (lo.compareTo(hi) < 0) {
                    bisect(mid(lo, hi));
                }
            }
        }
    }

    /** The rounding boundary between the texts of the two ends, if it lies inside. */
    private static Optional<Rational> boundary(Enclosure e, int digits) {
        Rational b = Rational.parse(Decimals.format(e.lo(), digits)).add(Rational.parse(Decimals.format(e.hi(),
            digits))).divide(Rational.of(2));
        return e.contains(b) ? Optional.of(b) : Optional.empty();
    }

    private int bitsOf() {
        Rational w = hi.subtract(lo);
        return Math.max(1, w.denominator().bitLength() - w.numerator().bitLength());
    }

    /**
     * The sign of the value, decided exactly for exact and algebraic numbers.
     *
     * @return -1, 0 or 1
     * @throws ArithmeticException if a value given by enclosures is not separated from 0 at the largest precision
     */
    public int signum() {
        if (exact != null) {
            return exact.signum();
        }
        if (enclosing != null) {
            for (int bits = 64; bits <= MIN_MAX_BITS; bits *= 2) {
                Enclosure e = enclosing.apply(bits);
                if (e.lo().signum() > 0) {
                    return 1;
                }
                if (e.hi().signum() < 0) {
                    return -1;
                }
                if (e.isExact()) {
                    return 0;
                }
            }
            throw new ArithmeticException("the sign of a value given by enclosures is not decided");
        }
        synchronized (this) {
            while (true) {
                if (lo.equals(hi)) {
                    return lo.signum();
                }
                // an end of the isolating interval is never the root unless the interval is a point
                if (lo.signum() >= 0) {
                    return 1;
                }
                if (hi.signum() <= 0) {
                    return -1;
                }
                bisect(Rational.ZERO);
            }
        }
    }

    /** {@code -x}. */
    public CertifiedReal negate() {
        if (exact != null) {
            return exact(exact.negate());
        }
        if (enclosing != null) {
            return enclosed(bits -> {
                Enclosure e = enclosing.apply(bits);
                return Enclosure.of(e.hi().negate(), e.lo().negate());
            }, x -> equalsTest.test(x.negate()));
        }
        synchronized (this) {
            return new CertifiedReal(null, Polys.reflect(coefficients), hi.negate(), lo.negate(), null);
        }
    }

    /** {@code |x|}. */
    public CertifiedReal abs() {
        if (enclosing != null) {
            return enclosed(bits -> {
                Enclosure e = enclosing.apply(bits);
                if (e.lo().signum() >= 0) {
                    return e;
                }
                if (e.hi().signum() <= 0) {
                    return Enclosure.of(e.hi().negate(), e.lo().negate());
                }
                return Enclosure.of(Rational.ZERO, e.hi().max(e.lo().negate()));
            }, x -> equalsTest.test(x) || equalsTest.test(x.negate()));
        }
        return signum() < 0 ? negate() : this;
    }

    /**
     * The largest of the values: one of them when it is shown to be the largest (exactly, or by enclosures that
     * separate), otherwise a value given by the enclosures of the maximum.
     *
     * @param values at least one value
     * @return the maximum
     * @throws IllegalArgumentException if the list is empty
     */
    public static CertifiedReal max(List<CertifiedReal> values) {
        if (values.isEmpty()) {
            throw new IllegalArgumentException("no values");
        }
        List<CertifiedReal> open = new ArrayList<>(values);
        for (int bits = 32; bits <= 1024 && open.size() > 1; bits *= 2) {
            Rational best = null;
            for (CertifiedReal v : open) {
                Rational l = v.enclosure(bits).lo();
                best = best == null || l.compareTo(best) > 0 ? l : best;
            }
            List<CertifiedReal> keep = new ArrayList<>();
            for (CertifiedReal v : open) {
                if (v.enclosure(bits).hi().compareTo(best) >= 0) {
                    keep.add(v);
                }
            }
            open = keep;
            Rational first = open.get(0).exact;
            // equal exact values need no further split
            if (first != null && open.stream().allMatch(v -> first.equals(v.exact))) {
                return open.get(0);
            }
        }
        if (open.size() == 1) {
            return open.get(0);
        }
        List<CertifiedReal> tied = List.copyOf(open);
        return enclosed(bits -> {
            Rational l = null;
            Rational h = null;
            for (CertifiedReal v : tied) {
                Enclosure e = v.enclosure(bits);
                l = l == null || e.lo().compareTo(l) > 0 ? e.lo() : l;
                h = h == null || e.hi().compareTo(h) > 0 ? e.hi() : h;
            }
            return Enclosure.of(l, h);
        });
    }

    private static Optional<Rational> rationalSqrt(Rational d) {
        BigInteger p = d.numerator().sqrt();
        BigInteger q = d.denominator().sqrt();
        return p.multiply(p).equals(d.numerator()) && q.multiply(q).equals(d.denominator())
            ? Optional.of(Rational.of(p, q)) : Optional.empty();
    }

    /** The enclosure at 64 bits, for debugging. */
    @Override
    public String toString() {
        return exact != null ? exact.toString() : enclosure(64).toString();
    }
}
