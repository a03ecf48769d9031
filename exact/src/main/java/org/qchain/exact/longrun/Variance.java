package org.qchain.exact.longrun;

import java.math.BigInteger;
import java.util.List;
import org.qchain.exact.Fractions;
import org.qchain.exact.Gcd;
import org.qchain.exact.Rational;
import org.qchain.exact.linear.CommonSolution;

/**
 * The variance of the time to absorption from the two exact solves over common denominators: t = T / d1 (the mean)
 * and y = Y / d2 = A^-1 t. Every term goes over one denominator L = lcm(d2, d1²) as an integer, their common factor
 * with L is found by a running gcd (which shrinks after the first entries), and the entries are put in lowest terms
 * together ({@link Fractions#over}), where adding the reduced fractions 2y, t and t∘t would take six gcds per entry.
 */
final class Variance {
    private Variance() {
    }

    /** {@code 2y − t − t∘t} (steps) or {@code 2y − t∘t} (continuous time), each entry in lowest terms. */
    static List<Rational> of(BigInteger[] t, BigInteger d1, CommonSolution y, boolean continuous) {
        int n = t.length;
        BigInteger d2 = y.denominator();
        BigInteger d1sq = d1.multiply(d1);
        BigInteger l = d2.divide(Gcd.of(d2, d1sq)).multiply(d1sq);
        BigInteger fy = l.divide(d2).shiftLeft(1);
        BigInteger ft = l.divide(d1);
        BigInteger fsq = l.divide(d1sq);
        BigInteger[] num = new BigInteger[n];
        BigInteger g = l;
        for (int i = 0; i < n; i++) {
            BigInteger v = y.numerator(i, 0).multiply(fy).subtract(t[i].multiply(t[i]).multiply(fsq));
            if (!continuous) {
                v = v.subtract(t[i].multiply(ft));
            }
            num[i] = v;
            if (!g.equals(BigInteger.ONE) && v.signum() != 0) {
                g = Gcd.of(g, v);
            }
        }
        if (!g.equals(BigInteger.ONE)) {
            for (int i = 0; i < n; i++) {
                num[i] = num[i].divide(g);
            }
        }
        return List.of(Fractions.over(num, l.divide(g)));
    }
}
