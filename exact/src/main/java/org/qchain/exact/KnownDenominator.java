package org.qchain.exact;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * A denominator {@code D = d^n} whose prime factors are known, used to reduce {@code x / D} without a gcd of two huge
 * numbers.
 *
 * <p>{@code gcd(x, D)} only involves the primes of {@code d}, so it is {@code prod p^min(v_p(x), n e_p)}. A valuation
 * costs one remainder by a small number when {@code p} does not divide {@code x} (the usual case), and a logarithmic
 * number of divisions when it does; {@link BigInteger#gcd} on numbers with millions of digits costs quadratic time.
 *
 * <p>{@code d} is factored by trial division up to {@value #TRIAL_LIMIT}; a leftover cofactor that passes a strong
 * probable-prime test is treated as a prime (error probability below {@code 2^-200}); a composite leftover (all of
 * its factors above the trial limit) falls back to {@link BigInteger#gcd} for its part.
 *
 * <p>Not thread-safe (it caches the reduced denominators it has built); use one instance per computation.
 */
final class KnownDenominator {
    static final int TRIAL_LIMIT = 1 << 20;

    private final BigInteger base;
    private final long n;
    private final BigInteger[] primes;
    private final long[] caps;
    /** A composite cofactor of {@code d} with no factor below the trial limit, or {@code null}. */
    private final BigInteger composite;
    private final Map<List<Long>, BigInteger> reducedDenominators = new HashMap<>();
    private BigInteger full;

    private KnownDenominator(BigInteger base, long n, BigInteger[] primes, long[] caps, BigInteger composite) {
        this.base = base;
        this.n = n;
        this.primes = primes;
        this.caps = caps;
        this.composite = composite;
    }

    /**
     * The denominator {@code d^n}.
     *
     * @param d a positive integer
     * @param n the exponent, {@code >= 0}
     */
    static KnownDenominator power(BigInteger d, long n) {
        return power(d, n, null);
    }

    /**
     * The denominator {@code d^n} when the caller has {@code d^n} already.
     *
     * @param d  a positive integer
     * @param n  the exponent, {@code >= 0}
     * @param dn {@code d^n}, or {@code null} to compute it when needed
     */
    static KnownDenominator power(BigInteger d, long n, BigInteger dn) {
        if (d.signum() <= 0 || n < 0) {
            throw new IllegalArgumentException("need d > 0 and n >= 0");
        }
        List<BigInteger> ps = new ArrayList<>();
        List<Long> es = new ArrayList<>();
        BigInteger rest = d;
        int twos = rest.getLowestSetBit();
        if (twos > 0) {
            ps.add(BigInteger.TWO);
            es.add((long) twos);
            rest = rest.shiftRight(twos);
        }
        BigInteger composite = null;
        for (long f = 3; f <= TRIAL_LIMIT && rest.bitLength() > 1; f += 2) {
            if (rest.bitLength() <= 62 && f * f > rest.longValue()) {
                break;
            }
            BigInteger bf = BigInteger.valueOf(f);
            BigInteger[] qr = rest.divideAndRemainder(bf);
            if (qr[1].signum() == 0) {
                long e = 0;
                do {
                    rest = qr[0];
                    e++;
                    qr = rest.divideAndRemainder(bf);
                } while (qr[1].signum() == 0);
                ps.add(bf);
                es.add(e);
            }
        }
        if (rest.bitLength() > 1) {
            boolean provablyPrime = rest.bitLength() <= 62 && (long) TRIAL_LIMIT * TRIAL_LIMIT > rest.longValue();
            if (provablyPrime || rest.isProbablePrime(100)) {
                ps.add(rest);
                es.add(1L);
            } else {
                composite = rest;
            }
        }
        long[] caps = new long[ps.size()];
        for (int i = 0; i < caps.length; i++) {
            caps[i] = Math.multiplyExact(es.get(i), n);
        }
        KnownDenominator k = new KnownDenominator(d, n, ps.toArray(new BigInteger[0]), caps, composite);
        k.full = dn;
        return k;
    }

    /** The full denominator {@code d^n}. */
    BigInteger value() {
        if (full == null) {
            full = base.equals(BigInteger.ONE) ? BigInteger.ONE : BigMath.pow(base, Math.toIntExact(n));
        }
        return full;
    }

    /**
     * {@code x / d^n} in lowest terms.
     *
     * @param x any integer
     * @return the reduced fraction
     */
    Rational reduce(BigInteger x) {
        if (x.signum() == 0) {
            return Rational.ZERO;
        }
        Long[] removed = new Long[primes.length];
        BigInteger y = x;
        boolean any = false;
        for (int i = 0; i < primes.length; i++) {
            BigInteger[] holder = {y};
            long v = strip(holder, primes[i], caps[i]);
            y = holder[0];
            removed[i] = v;
            any |= v != 0;
        }
        List<Long> key = Arrays.asList(removed);
        BigInteger den = any ? reducedDenominators.computeIfAbsent(key, k -> partialDenominator(removed)) : value();
        if (composite != null) {
            // all factors of the composite part are above the trial limit; an ordinary gcd on what is left
            BigInteger g = y.gcd(den);
            if (!g.equals(BigInteger.ONE)) {
                y = y.divide(g);
                den = den.divide(g);
            }
        }
        return Rational.ofReduced(y, den);
    }

    private BigInteger partialDenominator(Long[] removed) {
        BigInteger r = composite == null ? BigInteger.ONE : BigMath.pow(composite, Math.toIntExact(n));
        for (int i = 0; i < primes.length; i++) {
            long e = caps[i] - removed[i];
            if (e > 0) {
                r = r.multiply(BigMath.pow(primes[i], Math.toIntExact(e)));
            }
        }
        return r;
    }

    /**
     * Divides {@code holder[0]} by {@code p^v} with {@code v = min(v_p(holder[0]), cap)} and returns {@code v}.
     * One remainder when {@code p} does not divide; otherwise word-sized chunks of {@code p}, and for long runs of
     * divisibility a descent over {@code p^(m 2^k)} (logarithmically many big divisions).
     */
    static long strip(BigInteger[] holder, BigInteger p, long cap) {
        BigInteger x = holder[0];
        if (cap == 0 || x.signum() == 0) {
            return 0;
        }
        if (p.equals(BigInteger.TWO)) {
            long v = Math.min(x.getLowestSetBit(), cap);
            holder[0] = x.shiftRight((int) v);
            return v;
        }
        if (x.remainder(p).signum() != 0) {
            return 0;
        }
        long v = 0;
        // chunk = p^m, the largest power of p of at most 62 bits (at least p itself)
        int m = 1;
        BigInteger chunk = p;
        while (chunk.multiply(p).bitLength() <= 62) {
            chunk = chunk.multiply(p);
            m++;
        }
        int rounds = 0;
        while (cap - v >= m) {
            if (rounds++ == 8) {
                // long run: descend over chunk^(2^k), k large to small (each level halves what remains)
                long chunksLeft = (cap - v) / m;
                List<BigInteger> pw = new ArrayList<>();
                BigInteger q = chunk;
                long size = 1;
                while (size <= chunksLeft && q.bitLength() <= x.bitLength()) {
                    pw.add(q);
                    if (size > chunksLeft / 2) {
                        break;
                    }
                    q = q.multiply(q);
                    size *= 2;
                }
                for (int k = pw.size() - 1; k >= 0; k--) {
                    long s = 1L << k;
                    if (s <= chunksLeft) {
                        BigInteger[] qr = x.divideAndRemainder(pw.get(k));
                        if (qr[1].signum() == 0) {
                            x = qr[0];
                            v += s * m;
                            chunksLeft -= s;
                        }
                    }
                }
                break;
            }
            BigInteger[] qr = x.divideAndRemainder(chunk);
            if (qr[1].signum() != 0) {
                break;
            }
            x = qr[0];
            v += m;
        }
        while (v < cap) {
            BigInteger[] qr = x.divideAndRemainder(p);
            if (qr[1].signum() != 0) {
                break;
            }
            x = qr[0];
            v++;
        }
        holder[0] = x;
        return v;
    }
}
