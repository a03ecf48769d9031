package org.qchain.exact;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.IntStream;

/**
 * {@code A^n} of an integer matrix by multi-modular arithmetic: the power modulo many word-size primes, each a tight
 * loop on {@code long}s, then every entry rebuilt by the Chinese remainder theorem over a product tree (J. von zur
 * Gathen, J. Gerhard, <i>Modern Computer Algebra</i>, 3rd ed., ch. 5 (Chinese remaindering) and ch. 10 (fast
 * simultaneous reconstruction with subproduct trees), from memory).
 *
 * <p>How many primes: every entry of {@code A^n} is at most {@code r^n} in absolute value, {@code r} the largest
 * absolute row sum of {@code A} (|A^n| <= |A|^n entrywise, and the row sums of |A|^n are at most r^n), so primes
 * whose product exceeds {@code 2 r^n} determine each entry as the representative in {@code (-M/2, M/2]}.
 *
 * <p>Why: the work is {@code k} independent small powers ({@code k} about the result's bits / 30) plus one
 * reconstruction per entry, all of it simple loops that the JIT compiles within milliseconds and that split
 * evenly over the cores; the big-integer products of the direct engine need hundreds of milliseconds of warm-up
 * in a fresh process. Results are identical to {@link MatrixPowers}'s {@code BigInteger} engine (a test checks it).
 */
final class ModularPower {
    /** Primes below 2^30: a product of two is below 2^60, and seven such products plus a residue fit in a long. */
    static final int PRIME_BITS = 30;
    private static final int BLOCK = 7;

    /** Smallest matrix, density and result size (bits of the largest entry) for which this engine is used. */
    static final int MIN_STATES = 12;
    static final long MIN_BITS = 12_000;
    /** Residues kept at once (primes times entries), at most: about 100 MB of ints. */
    static final long MAX_RESIDUES = 25_000_000;
    /**
     * Tests switch the engine off to compare; benchmarks set the system property {@code qchain.exact.modular} to
     * {@code never} (read at every call).
     */
    static volatile boolean enabled = true;

    private ModularPower() {
    }

    /**
     * Whether {@code A^n} should go this way: measured whole-process on dense chains (see
     * {@code docs/performance.md}), the modular engine took about 40 % less CPU than the direct one on a 20-state
     * P^256 (results of 21,000 bits), about the same on a 50-state P^64 (8,800 bits), and 1.5–2 times less at
     * 80,000 bits; past {@link BigMath#matrixApintBits} the direct engine's transform multiplication takes over. Half the entries or more must be non-zero (the modular products are
     * dense).
     */
    static boolean applies(IntMatrix a, long n) {
        int s = a.n;
        if (!enabled || "never".equals(System.getProperty("qchain.exact.modular")) || s < MIN_STATES || 2 * a.nonZeroCount() < (long) s * s) {
            return false;
        }
        double bits = n * (double) MatrixPowers.growthBits(a);
        return bits >= MIN_BITS && bits < BigMath.matrixApintBits && bits / (PRIME_BITS - 1) * s * s <= MAX_RESIDUES;
    }

    /**
     * {@code A^n} for {@code n >= 1}.
     *
     * @param a      a square integer matrix
     * @param n      the exponent, {@code >= 1}
     * @param caller the thread whose interrupt flag stops the work
     * @return the power, entry for entry the integers of repeated multiplication
     */
    static IntMatrix power(IntMatrix a, long n, Thread caller) {
        return power(a, n, Progress.NONE, caller);
    }

    /**
     * {@code A^n} for {@code n >= 1}, reporting progress (phase {@code "modular powers"}, one step per prime, from
     * the calling thread's share of them).
     */
    static IntMatrix power(IntMatrix a, long n, Progress progress, Thread caller) {
        int s = a.n;
        BigInteger r = MatrixPowers.maxAbsRowSum(a);
        if (r.signum() == 0) {
            return a;
        }
        // M > 2 r^n, so the symmetric residue is the entry
        long needBits = (long) MatrixPowers.pow(r, n).bitLength() + 2;
        int[] primes = primes((int) ((needBits + PRIME_BITS - 2) / (PRIME_BITS - 1)) + 1);
        int k = primes.length;
        // entries of A as 30-bit limbs (absolute value) with their sign, reduced per prime by Horner's rule
        int[][][] limbs = new int[s][s][];
        boolean[][] negative = new boolean[s][s];
        for (int i = 0; i < s; i++) {
            for (int j : a.nz[i]) {
                limbs[i][j] = limbs30(a.e[i][j].abs());
                negative[i][j] = a.e[i][j].signum() < 0;
            }
        }
        int[][] residues = new int[k][];
        IntStream ps = IntStream.range(0, k);
        if (Runtime.getRuntime().availableProcessors() > 1 && k > 1) {
            ps = ps.parallel();
        }
        java.util.concurrent.atomic.AtomicInteger done = new java.util.concurrent.atomic.AtomicInteger();
        ps.forEach(t -> {
            MatrixPowers.checkInterrupt(caller);
            residues[t] = powerModP(limbs, negative, s, n, primes[t]);
            int d = done.incrementAndGet();
            if (Thread.currentThread() == caller) {
                progress.update("modular powers", d, k);
            }
        });
        Reconstruction crt = new Reconstruction(primes);
        BigInteger[][] out = new BigInteger[s][s];
        IntStream cells = IntStream.range(0, s * s);
        if (Runtime.getRuntime().availableProcessors() > 1 && s > 1) {
            cells = cells.parallel();
        }
        cells.forEach(c -> {
            if (c % s == 0) {
                MatrixPowers.checkInterrupt(caller);
            }
            long[] rs = new long[k];
            for (int t = 0; t < k; t++) {
                rs[t] = residues[t][c];
            }
            out[c / s][c % s] = crt.symmetric(rs);
        });
        return IntMatrix.of(out);
    }

    /** {@code x >= 0} as little-endian 30-bit limbs. */
    static int[] limbs30(BigInteger x) {
        int len = Math.max(1, (x.bitLength() + PRIME_BITS - 1) / PRIME_BITS);
        int[] l = new int[len];
        for (int i = 0; i < len; i++) {
            l[i] = x.shiftRight(i * PRIME_BITS).intValue() & ((1 << PRIME_BITS) - 1);
        }
        return l;
    }

    /** {@code A^n mod p}, flattened row by row, entries in {@code [0, p)}. */
    static int[] powerModP(int[][][] limbs, boolean[][] negative, int s, long n, int p) {
        long base = (1L << PRIME_BITS) % p;
        long[] a = new long[s * s];
        for (int i = 0; i < s; i++) {
            for (int j = 0; j < s; j++) {
                int[] l = limbs[i][j];
                if (l == null) {
                    continue;
                }
                long v = 0;
                for (int t = l.length - 1; t >= 0; t--) {
                    v = (v * base + l[t]) % p;
                }
                a[i * s + j] = negative[i][j] && v != 0 ? p - v : v;
            }
        }
        long[] r = a;
        int top = 63 - Long.numberOfLeadingZeros(n);
        for (int bit = top - 1; bit >= 0; bit--) {
            r = multiply(r, r, s, p);
            if ((n >>> bit & 1) != 0) {
                r = multiply(r, a, s, p);
            }
        }
        int[] out = new int[s * s];
        for (int c = 0; c < out.length; c++) {
            out[c] = (int) r[c];
        }
        return out;
    }

    /** {@code x y mod p}, entries in {@code [0, p)}. */
    private static long[] multiply(long[] x, long[] y, int s, long p) {
        long[] out = new long[s * s];
        long[] col = new long[s];
        double inverse = 1.0 / p;
        for (int j = 0; j < s; j++) {
            for (int k = 0; k < s; k++) {
                col[k] = y[k * s + j];
            }
            for (int i = 0; i < s; i++) {
                int row = i * s;
                long acc = 0;
                int k = 0;
                // each product is below 2^60; seven of them plus acc < 2^30 stay below 2^63
                while (k < s) {
                    int end = Math.min(s, k + BLOCK);
                    for (; k < end; k++) {
                        acc += x[row + k] * col[k];
                    }
                    acc = reduce(acc, p, inverse);
                }
                out[row + j] = acc;
            }
        }
        return out;
    }

    /**
     * {@code a mod p} for {@code 0 <= a < 2^63} and a prime {@code p < 2^30}, without a division instruction (a
     * 64-bit division costs tens of cycles, and the products need one per seven terms): the quotient from the
     * floating-point reciprocal is within one of the true one (its relative error is about 2^-52 and the quotient is
     * below 2^33), so one correction either way gives the remainder.
     */
    static long reduce(long a, long p, double inverse) {
        long r = a - (long) (a * inverse) * p;
        if (r < 0) {
            r += p;
        } else if (r >= p) {
            r -= p;
        }
        return r;
    }

    /** The {@code count} largest primes below {@code 2^30}, by a sieve of the window below it. */
    static int[] primes(int count) {
        List<Integer> found = new ArrayList<>();
        long hi = 1L << PRIME_BITS;
        int window = 1 << 16;
        while (found.size() < count) {
            long lo = hi - window;
            boolean[] composite = new boolean[window];
            for (long f = 2; f * f < hi; f++) {
                long start = Math.max(f * f, (lo + f - 1) / f * f);
                for (long m = start; m < hi; m += f) {
                    composite[(int) (m - lo)] = true;
                }
            }
            for (long v = hi - 1; v >= lo && found.size() < count; v--) {
                if (!composite[(int) (v - lo)]) {
                    found.add((int) v);
                }
            }
            hi = lo;
        }
        return found.stream().mapToInt(Integer::intValue).toArray();
    }

    /**
     * Chinese remaindering for fixed moduli: {@code x = sum_i c_i M/m_i (mod M)} with
     * {@code c_i = r_i (M/m_i)^-1 mod m_i}, the sum formed up a product tree, where a node's value is
     * {@code value(left) M(right) + value(right) M(left)}.
     */
    static final class Reconstruction {
        private final long[] m;
        private final long[] weights;
        /** Product tree: level 0 the moduli, each level the products of pairs of the one below. */
        private final List<BigInteger[]> tree = new ArrayList<>();
        private final BigInteger product;
        private final BigInteger half;

        Reconstruction(int[] moduli) {
            int k = moduli.length;
            m = new long[k];
            for (int i = 0; i < k; i++) {
                m[i] = moduli[i];
            }
            BigInteger[] level = new BigInteger[k];
            for (int i = 0; i < k; i++) {
                level[i] = BigInteger.valueOf(m[i]);
            }
            tree.add(level);
            while (level.length > 1) {
                BigInteger[] up = new BigInteger[(level.length + 1) / 2];
                for (int i = 0; i < up.length; i++) {
                    up[i] = 2 * i + 1 < level.length ? level[2 * i].multiply(level[2 * i + 1]) : level[2 * i];
                }
                tree.add(up);
                level = up;
            }
            product = level[0];
            half = product.shiftRight(1);
            weights = new long[k];
            for (int i = 0; i < k; i++) {
                long c = 1;
                for (int j = 0; j < k; j++) {
                    if (j != i) {
                        c = c * (m[j] % m[i]) % m[i];
                    }
                }
                weights[i] = BigInteger.valueOf(c).modInverse(BigInteger.valueOf(m[i])).longValue();
            }
        }

        /**
         * {@code x mod M} for {@code 0 <= x < k M} (a node's value is below its number of moduli times its product):
         * the quotient, below {@code k}, from the leading 50 bits, then at most a few subtractions; a remainder by
         * long division would cost as much as the reconstruction itself in a fresh process.
         */
        private BigInteger belowProduct(BigInteger x) {
            int shift = product.bitLength() - 50;
            if (shift <= 0) {
                return x.mod(product);
            }
            long top = x.shiftRight(shift).longValue();
            long q = top / (product.shiftRight(shift).longValue() + 1);
            if (q > 0) {
                x = x.subtract(product.multiply(BigInteger.valueOf(q)));
            }
            while (x.compareTo(product) >= 0) {
                x = x.subtract(product);
            }
            return x;
        }

        /** The integer in {@code (-M/2, M/2]} with residues {@code r_i mod m_i}. */
        BigInteger symmetric(long[] r) {
            int k = m.length;
            BigInteger[] v = new BigInteger[k];
            for (int i = 0; i < k; i++) {
                v[i] = BigInteger.valueOf(r[i] * weights[i] % m[i]);
            }
            for (int l = 0; l + 1 < tree.size(); l++) {
                BigInteger[] mods = tree.get(l);
                BigInteger[] up = new BigInteger[(v.length + 1) / 2];
                for (int i = 0; i < up.length; i++) {
                    if (2 * i + 1 < v.length) {
                        up[i] = v[2 * i].multiply(mods[2 * i + 1]).add(v[2 * i + 1].multiply(mods[2 * i]));
                    } else {
                        up[i] = v[2 * i];
                    }
                }
                v = up;
            }
            BigInteger x = belowProduct(v[0]);
            return x.compareTo(half) > 0 ? x.subtract(product) : x;
        }
    }
}
