package org.qchain.symbolic.closed;

import java.math.BigInteger;
import org.qchain.exact.Rational;
import org.qchain.symbolic.RatFunMatrix;

/**
 * An a-priori upper bound of the digit figure that {@link RationalRoute#factors} checks for a parameter-free chain,
 * from P's entries alone: no power, characteristic polynomial or factor is computed.
 *
 * <p>Why it is never below the engine's figure. Let {@code d} be the common denominator of P, {@code A = dP} and
 * {@code N} the largest absolute row sum of A (so every eigenvalue of A has modulus at most N, and every entry of
 * {@code A^j} at most {@code N^j}). The engine sums, over the simple irreducible factors g of chi (degree e),
 * {@code ceil(0.30103 (2 bits(L) + maxNum + maxB)) e s^2}; each part is bounded here:
 * <ul>
 * <li>{@code maxB}: {@code B_k(A) = sum_m a_m A^(k-m)} with {@code |a_m| <= C(s, m) N^m} (elementary symmetric
 * functions of the eigenvalues), so every entry is at most {@code 2^s N^(s-1)}.</li>
 * <li>{@code bits(L)}: with {@code chi_A(y) = det(yI - A)} (monic, integer) and {@code g_A(y) = d^e g(y/d)} its monic
 * integer factor (Gauss's lemma), the engine's {@code q_k = h_(k,t) / d^k} equals {@code d^t w_(k,t)} where
 * {@code w_k = y^(s-1-k) chi_A'(y)^-1 mod g_A}. Inverting modulo the monic integer g_A divides only by
 * {@code R = Res(g_A, chi_A') = prod chi_A'(mu)} over the roots mu of g_A, so L divides R, and
 * {@code |R| <= (2N)^(e(s-1))} (each root difference is at most 2N).</li>
 * <li>{@code maxNum <= 1 + log2 max |q_k|}: by interpolation at the roots of g_A, {@code |w_(k,t)| <= e C(e-1, t)
 * N^(e-1-t) N^(s-1) max 1/|g_A'(mu) chi_A'(mu)|}, and {@code g_A'(mu) chi_A'(mu)} is a nonzero algebraic integer whose
 * norm (the product over the conjugates) is a nonzero integer, each conjugate at most {@code (2N)^(e+s-2)}, so its
 * inverse is at most {@code (2N)^((e-1)(e+s-2))}.</li>
 * </ul>
 * The per-factor figure so bounded, {@code f(e)}, is e times a quantity that grows with e, so
 * {@code f(a) + f(b) <= f(a + b)}: the sum over factors whose degrees add up to at most s is at most {@code f(s)},
 * and at most {@code f(1) + f(s - 1)} when every row sums to 1 (then {@code x - 1} divides chi). Sources: Horn and
 * Johnson, Matrix Analysis, ch. 5 (spectral radius at most any induced norm); von zur Gathen and Gerhard, Modern
 * Computer Algebra, ch. 6 (resultants, norms), both from memory.
 */
final class DigitBound {
    private DigitBound() {
    }

    /** The bound for the rational matrix P (every entry constant). */
    static long of(RatFunMatrix p) {
        int s = p.size();
        Rational[][] v = new Rational[s][s];
        BigInteger d = BigInteger.ONE;
        for (int i = 0; i < s; i++) {
            for (int j = 0; j < s; j++) {
                v[i][j] = p.get(i, j).constantValue().orElseThrow();
                BigInteger q = v[i][j].denominator();
                d = d.divide(d.gcd(q)).multiply(q);
            }
        }
        BigInteger norm = BigInteger.ONE;
        boolean stochastic = true;
        for (int i = 0; i < s; i++) {
            BigInteger row = BigInteger.ZERO;
            Rational sum = Rational.ZERO;
            for (int j = 0; j < s; j++) {
                row = row.add(v[i][j].numerator().abs().multiply(d.divide(v[i][j].denominator())));
                sum = sum.add(v[i][j]);
            }
            norm = norm.max(row);
            stochastic &= sum.isOne();
        }
        double log2N = log2(norm);
        double log2M = Math.max(log2N, log2(d));
        return stochastic && s > 1 ? sat(perFactor(1, s, log2N, log2M), perFactor(s - 1, s, log2N, log2M))
            : perFactor(s, s, log2N, log2M);
    }

    /** f(e): the engine's figure for one simple factor of degree e, each of its parts bounded. */
    static long perFactor(int e, int s, double log2N, double log2M) {
        double log2TwoN = log2N + 1;
        double rBits = bits((double) e * (s - 1) * log2TwoN);
        double maxNum = Math.floor(up(1 + Math.log(e) / Math.log(2) + (e - 1) + (e - 1) * log2M + (s - 1) * log2N
            + (double) (e - 1) * (e + s - 2) * log2TwoN));
        double maxB = bits((s - 1) * log2N + s);
        double perEntry = 2 * rBits + Math.max(0, maxNum) + maxB;
        double digits = Math.ceil(perEntry * 0.30103) * e * s * (double) s;
        return digits >= 9.0e18 ? Long.MAX_VALUE : (long) digits;
    }

    /** An upper bound of the bit length of an integer of absolute value at most 2^x. */
    private static double bits(double x) {
        return Math.floor(up(x)) + 1;
    }

    private static double up(double x) {
        return x * (1 + 1e-12) + 1e-6;
    }

    private static double log2(BigInteger x) {
        int bits = x.bitLength();
        double l = bits < 1000 ? Math.log(x.doubleValue()) / Math.log(2)
            : Math.log(x.shiftRight(bits - 64).doubleValue()) / Math.log(2) + (bits - 64);
        return Math.max(0, l);
    }

    private static long sat(long a, long b) {
        long r = a + b;
        return ((a ^ r) & (b ^ r)) < 0 ? Long.MAX_VALUE : r;
    }
}
