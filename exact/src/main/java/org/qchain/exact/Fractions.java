package org.qchain.exact;

import java.math.BigInteger;

/**
 * Many fractions over one common denominator, as exact solvers produce them, put in lowest terms.
 *
 * <p>Reducing each {@code p_i / q} costs one gcd of {@code q}-sized numbers. Here one test serves all entries
 * first: a prime that divides {@code q} and some {@code p_i} divides the product of the {@code p_i} modulo
 * {@code q}, so with {@code g = gcd(prod p_i mod q, q)} an entry is already in lowest terms exactly when
 * {@code gcd(p_i, g) = 1}. The product costs one modular multiplication per entry, a few times cheaper than a gcd
 * at these sizes, and {@code g} is 1 or small in the usual case (the solutions of Markov chain systems), so each
 * entry then needs no gcd of its own or one with a small number (common practice, no source).
 */
public final class Fractions {
    private Fractions() {
    }

    /** Below this many entries, or bits of the denominator, each fraction is reduced on its own. */
    static final int MIN_ENTRIES = 4;

    /**
     * The fractions {@code p[i] / q}, each in lowest terms.
     *
     * @param p the numerators
     * @param q the common denominator, positive
     * @return the reduced fractions, in the order of {@code p}
     * @throws IllegalArgumentException if {@code q <= 0}
     */
    public static Rational[] over(BigInteger[] p, BigInteger q) {
        if (q.signum() <= 0) {
            throw new IllegalArgumentException("the common denominator must be positive, not " + q);
        }
        int n = p.length;
        Rational[] out = new Rational[n];
        if (n < MIN_ENTRIES || q.bitLength() < Gcd.LEHMER_BITS) {
            for (int i = 0; i < n; i++) {
                out[i] = Rational.of(p[i], q);
            }
            return out;
        }
        BigInteger prod = BigInteger.ONE;
        for (BigInteger x : p) {
            if (x.signum() != 0) {
                prod = prod.multiply(x.mod(q)).mod(q);
            }
        }
        BigInteger g = Gcd.of(prod, q);
        for (int i = 0; i < n; i++) {
            if (p[i].signum() == 0) {
                out[i] = Rational.ZERO;
            } else if (g.equals(BigInteger.ONE) || Gcd.of(p[i], g).equals(BigInteger.ONE)) {
                out[i] = Rational.ofReduced(p[i], q);
            } else {
                out[i] = Rational.of(p[i], q);
            }
        }
        return out;
    }
}
