package org.qchain.exact;

import java.math.BigDecimal;
import java.math.BigInteger;

/**
 * An exact rational number {@code p/q} with {@code q > 0} and {@code gcd(p, q) = 1}; zero is {@code 0/1}.
 *
 * <p>Immutable. Normalisation happens in exactly one place (the private constructor path {@link #of(BigInteger,
 * BigInteger)}), so {@link #equals(Object)} and {@link #hashCode()} compare the canonical pair.
 * {@link #toString()} is always {@code p/q}, or {@code p} when {@code q = 1}.
 */
public final class Rational implements Comparable<Rational> {
    /** 0. */
    public static final Rational ZERO = new Rational(BigInteger.ZERO, BigInteger.ONE);
    /** 1. */
    public static final Rational ONE = new Rational(BigInteger.ONE, BigInteger.ONE);

    private final BigInteger num;
    private final BigInteger den;

    private Rational(BigInteger num, BigInteger den) {
        this.num = num;
        this.den = den;
    }

    /**
     * The integer {@code k}.
     *
     * @param k the value
     * @return {@code k/1}
     */
    public static Rational of(long k) {
        if (k == 0) {
            return ZERO;
        }
        if (k == 1) {
            return ONE;
        }
        return new Rational(BigInteger.valueOf(k), BigInteger.ONE);
    }

    /**
     * The integer {@code k}.
     *
     * @param k the value
     * @return {@code k/1}
     */
    public static Rational of(BigInteger k) {
        return new Rational(k, BigInteger.ONE);
    }

    /**
     * The reduced fraction {@code p/q}.
     *
     * @param p numerator
     * @param q denominator
     * @return the reduced fraction
     * @throws ArithmeticException if {@code q == 0}
     */
    public static Rational of(long p, long q) {
        return of(BigInteger.valueOf(p), BigInteger.valueOf(q));
    }

    /**
     * The reduced fraction {@code p/q}.
     *
     * @param p numerator
     * @param q denominator
     * @return the reduced fraction
     * @throws ArithmeticException if {@code q == 0}
     */
    public static Rational of(BigInteger p, BigInteger q) {
        int s = q.signum();
        if (s == 0) {
            throw new ArithmeticException("division by zero");
        }
        if (p.signum() == 0) {
            return ZERO;
        }
        if (s < 0) {
            p = p.negate();
            q = q.negate();
        }
        if (q.equals(BigInteger.ONE)) {
            return new Rational(p, q);
        }
        BigInteger g = Gcd.of(p, q);
        if (!g.equals(BigInteger.ONE)) {
            p = p.divide(g);
            q = q.divide(g);
        }
        return new Rational(p, q);
    }

    /**
     * The dyadic fraction {@code p / 2^w}, reduced by shifting out common factors of two (no gcd: the fixed-point
     * bounds of the certified engines produce millions of these).
     *
     * @param p the numerator
     * @param w the power of two of the denominator, {@code >= 0}
     * @return the value
     * @throws IllegalArgumentException if {@code w < 0}
     */
    public static Rational dyadic(BigInteger p, int w) {
        if (w < 0) {
            throw new IllegalArgumentException("negative power of two " + w);
        }
        if (p.signum() == 0) {
            return ZERO;
        }
        int shift = Math.min(p.getLowestSetBit(), w);
        return ofReduced(p.shiftRight(shift), BigInteger.ONE.shiftLeft(w - shift));
    }

    /**
     * A fraction the caller has already reduced: {@code q > 0} and {@code gcd(p, q) = 1}. Skips the gcd, which costs
     * quadratic time on numbers with millions of digits; for this package's engines only, which reduce by known
     * prime factors of the denominator instead.
     */
    static Rational ofReduced(BigInteger p, BigInteger q) {
        if (p.signum() == 0) {
            return ZERO;
        }
        if (q.equals(BigInteger.ONE) && p.equals(BigInteger.ONE)) {
            return ONE;
        }
        return new Rational(p, q);
    }

    /**
     * Parses a constant in the model file's number grammar ({@link NumberGrammar}): {@code p}, {@code -p/q}, or an
     * exact decimal such as {@code 0.25}, {@code -1.5e-3} or {@code .5}, with the default limits
     * ({@link InputLimits#DEFAULT}). Decimals are read exactly ({@code 0.1} is {@code 1/10}); surrounding spaces are
     * allowed.
     *
     * @param text the text
     * @return the value
     * @throws QchainException {@link ErrorKey#MALFORMED_NUMBER} if the text is not such a number,
     *                         {@link ErrorKey#DIVISION_BY_ZERO} if the denominator is zero, {@link ErrorKey#SYNTAX}
     *                         for an exponent beyond {@link NumberGrammar#MAX_DECIMAL_EXPONENT},
     *                         {@link ErrorKey#NUMBER_TOO_LONG} past the digit limit
     */
    public static Rational parse(String text) {
        return parse(text, InputLimits.DEFAULT);
    }

    /**
     * As {@link #parse(String)}, with the given limits.
     *
     * @param text   the text
     * @param limits the digit limit of each number
     * @return the value
     * @throws QchainException as {@link #parse(String)}
     */
    public static Rational parse(String text, InputLimits limits) {
        return NumberGrammar.constant(text, null, limits.maxNumberDigits());
    }

    /**
     * The exact value of a {@link BigDecimal}.
     *
     * @param d the decimal
     * @return its exact value
     */
    public static Rational of(BigDecimal d) {
        BigInteger unscaled = d.unscaledValue();
        int scale = d.scale();
        if (scale <= 0) {
            return of(unscaled.multiply(BigInteger.TEN.pow(-scale)));
        }
        return of(unscaled, BigInteger.TEN.pow(scale));
    }

    /** The numerator (sign of the number). */
    public BigInteger numerator() {
        return num;
    }

    /** The denominator, always positive. */
    public BigInteger denominator() {
        return den;
    }

    /** Whether the denominator is 1. */
    public boolean isInteger() {
        return den.equals(BigInteger.ONE);
    }

    /** -1, 0 or 1. */
    public int signum() {
        return num.signum();
    }

    /** Whether this is 0. */
    public boolean isZero() {
        return num.signum() == 0;
    }

    /** Whether this is 1. */
    public boolean isOne() {
        return num.equals(BigInteger.ONE) && den.equals(BigInteger.ONE);
    }

    /** {@code this + o}. */
    public Rational add(Rational o) {
        if (isZero()) {
            return o;
        }
        if (o.isZero()) {
            return this;
        }
        if (den.equals(o.den)) {
            if (num.equals(o.num)) {
                // 2 p/q in lowest terms without a gcd: gcd(2p, q) = gcd(2, q) as gcd(p, q) = 1
                return den.testBit(0) ? new Rational(num.shiftLeft(1), den) : new Rational(num, den.shiftRight(1));
            }
            return of(num.add(o.num), den);
        }
        // Henrici's sum (D. E. Knuth, The Art of Computer Programming, vol. 2, 4.5.1): with g = gcd(q1, q2),
        // t = p1 (q2/g) + p2 (q1/g) and h = gcd(t, g), the sum is (t/h) / ((q1/g)(q2/h)) in lowest terms; the gcds
        // are of the factors, not of the double-length cross products
        BigInteger g = Gcd.of(den, o.den);
        if (g.equals(BigInteger.ONE)) {
            BigInteger t = num.multiply(o.den).add(o.num.multiply(den));
            return t.signum() == 0 ? ZERO : new Rational(t, den.multiply(o.den));
        }
        BigInteger d1 = den.divide(g);
        BigInteger t = num.multiply(o.den.divide(g)).add(o.num.multiply(d1));
        if (t.signum() == 0) {
            return ZERO;
        }
        BigInteger h = Gcd.of(t, g);
        return h.equals(BigInteger.ONE) ? new Rational(t, d1.multiply(o.den))
            : new Rational(t.divide(h), d1.multiply(o.den.divide(h)));
    }

    /** {@code this - o}. */
    public Rational subtract(Rational o) {
        return add(o.negate());
    }

    /** {@code this * o}. */
    public Rational multiply(Rational o) {
        if (isZero() || o.isZero()) {
            return ZERO;
        }
        if (isOne()) {
            return o;
        }
        if (o.isOne()) {
            return this;
        }
        if (o == this || (num.equals(o.num) && den.equals(o.den))) {
            // a square of a reduced fraction is reduced
            return new Rational(num.multiply(num), den.multiply(den));
        }
        // cross-reduce first so the products stay small: gcd(p1, q2) and gcd(p2, q1)
        BigInteger g1 = Gcd.of(num, o.den);
        BigInteger g2 = Gcd.of(o.num, den);
        BigInteger p = num.divide(g1).multiply(o.num.divide(g2));
        BigInteger q = den.divide(g2).multiply(o.den.divide(g1));
        return new Rational(p, q);
    }

    /**
     * {@code this / o}.
     *
     * @throws ArithmeticException if {@code o} is zero
     */
    public Rational divide(Rational o) {
        return multiply(o.reciprocal());
    }

    /** {@code -this}. */
    public Rational negate() {
        return isZero() ? this : new Rational(num.negate(), den);
    }

    /** {@code |this|}. */
    public Rational abs() {
        return num.signum() < 0 ? negate() : this;
    }

    /**
     * {@code 1 / this}.
     *
     * @throws ArithmeticException if this is zero
     */
    public Rational reciprocal() {
        if (isZero()) {
            throw new ArithmeticException("division by zero");
        }
        return num.signum() < 0 ? new Rational(den.negate(), num.negate()) : new Rational(den, num);
    }

    /**
     * {@code this^e} for any integer {@code e}.
     *
     * @throws ArithmeticException if this is zero and {@code e < 0}
     */
    public Rational pow(int e) {
        if (e < 0) {
            return reciprocal().pow(-e);
        }
        if (e == 0) {
            return ONE;
        }
        return new Rational(num.pow(e), den.pow(e));
    }

    /** The smaller of the two. */
    public Rational min(Rational o) {
        return compareTo(o) <= 0 ? this : o;
    }

    /** The larger of the two. */
    public Rational max(Rational o) {
        return compareTo(o) >= 0 ? this : o;
    }

    @Override
    public int compareTo(Rational o) {
        if (den.equals(o.den)) {
            return num.compareTo(o.num);
        }
        return num.multiply(o.den).compareTo(o.num.multiply(den));
    }

    /**
     * A nearby {@code double}; not exact. Safe for huge numerators and denominators (no overflow to NaN).
     */
    public double doubleValue() {
        int shift = Math.max(num.bitLength(), den.bitLength()) - 60;
        if (shift <= 0) {
            return num.doubleValue() / den.doubleValue();
        }
        // scale both into double range keeping 60 significant bits of each
        int nb = num.bitLength() - 60;
        int db = den.bitLength() - 60;
        double n = nb > 0 ? num.shiftRight(nb).doubleValue() : num.doubleValue();
        double d = db > 0 ? den.shiftRight(db).doubleValue() : den.doubleValue();
        return Math.scalb(n / d, Math.max(nb, 0) - Math.max(db, 0));
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Rational r && num.equals(r.num) && den.equals(r.den);
    }

    @Override
    public int hashCode() {
        return 31 * num.hashCode() + den.hashCode();
    }

    /** {@code p/q}, or {@code p} for an integer. */
    @Override
    public String toString() {
        return isInteger() ? num.toString() : num + "/" + den;
    }
}
