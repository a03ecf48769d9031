package org.qchain.exact;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Arrays;
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
 * <p>Thread-safe: the reduced denominators it has built are cached in a concurrent map, so the entries of one
 * result may be reduced on several threads.
 */
final class KnownDenominator {
    static final int TRIAL_LIMIT = 1 << 20;

    private final BigInteger base;
    private final long n;
    private final BigInteger[] primes;
    private final long[] caps;
    /** A composite cofactor of {@code d} with no factor below the trial limit, or {@code null}. */
    private final BigInteger composite;
    private final Map<List<Long>, BigInteger> reducedDenominators = new java.util.concurrent.ConcurrentHashMap<>();
    private volatile BigInteger full;
    /**
     * For each odd prime below 2^62 the window {@code p^c} ({@code c} the largest exponent with {@code p^c < 2^62},
     * at most the cap), else {@code null}; {@link #window} is their product, or zero if there is none.
     */
    private final BigInteger[] windowPowers;
    private final BigInteger window;

    private KnownDenominator(BigInteger base, long n, BigInteger[] primes, long[] caps, BigInteger composite) {
        this.base = base;
        this.n = n;
        this.primes = primes;
        this.caps = caps;
        this.composite = composite;
        this.windowPowers = new BigInteger[primes.length];
        BigInteger q = BigInteger.ONE;
        for (int i = 0; i < primes.length; i++) {
            BigInteger p = primes[i];
            if (p.equals(BigInteger.TWO) || p.bitLength() > 62 || caps[i] == 0) {
                continue;
            }
            int c = Math.max(1, (int) Math.min(caps[i], 62 / p.bitLength()));
            windowPowers[i] = p.pow(c);
            q = q.multiply(windowPowers[i]);
        }
        this.window = q.equals(BigInteger.ONE) ? BigInteger.ZERO : q;
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
        // One remainder by the window product Q gives every valuation below its window (x = r mod p^c); only a
        // prime whose window is exhausted (p^c divides x) needs the stepwise strip.
        BigInteger r = window.signum() == 0 || x.bitLength() < window.bitLength() ? x.abs() : x.abs().mod(window);
        BigInteger g = BigInteger.ONE;
        int twos = 0;
        boolean[] exhausted = new boolean[primes.length];
        for (int i = 0; i < primes.length; i++) {
            long v;
            if (primes[i].equals(BigInteger.TWO)) {
                v = Math.min(x.getLowestSetBit(), caps[i]);
                twos = (int) v;
            } else if (windowPowers[i] == null) {
                v = 0;
                exhausted[i] = true;
            } else {
                long w = r.mod(windowPowers[i]).longValue();
                if (w == 0) {
                    v = 0;
                    exhausted[i] = true;
                } else {
                    long pl = primes[i].longValue();
                    v = 0;
                    while (w % pl == 0) {
                        w /= pl;
                        v++;
                    }
                    if (v > 0) {
                        g = g.multiply(primes[i].pow((int) v));
                    }
                }
            }
            removed[i] = v;
            any |= v != 0;
        }
        if (twos > 0) {
            y = y.shiftRight(twos);
        }
        if (!g.equals(BigInteger.ONE)) {
            y = y.divide(g);
        }
        for (int i = 0; i < primes.length; i++) {
            if (exhausted[i]) {
                BigInteger[] holder = {y};
                long v = strip(holder, primes[i], caps[i]);
                y = holder[0];
                removed[i] = v;
                any |= v != 0;
            }
        }
        List<Long> key = Arrays.asList(removed);
        BigInteger den = any ? reducedDenominators.computeIfAbsent(key, k -> partialDenominator(removed)) : value();
        if (composite != null && !y.gcd(composite).equals(BigInteger.ONE)) {
            // y shares a factor with the composite part (all of whose factors are above the trial limit): an
            // ordinary gcd on what is left. The test before it costs one remainder by the small composite.
            BigInteger common = y.gcd(den);
            if (!common.equals(BigInteger.ONE)) {
                y = y.divide(common);
                den = den.divide(common);
            }
        }
        return Rational.ofReduced(y, den);
    }

    /**
     * {@code d^n / prod p^v}: one division by the removed part, which is small in the usual case (linear time),
     * instead of rebuilding {@code d^n} from prime powers for every pattern of removed factors.
     */
    private BigInteger partialDenominator(Long[] removed) {
        BigInteger g = BigInteger.ONE;
        for (int i = 0; i < primes.length; i++) {
            if (removed[i] > 0) {
                g = g.multiply(BigMath.pow(primes[i], Math.toIntExact(removed[i])));
            }
        }
        return value().divide(g);
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
