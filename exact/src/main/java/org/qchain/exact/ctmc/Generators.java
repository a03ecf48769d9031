package org.qchain.exact.ctmc;

import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.certified.CertifiedTransient;

/** Discrete chains made from a generator: the embedded jump chain and the uniformized chain. */
public final class Generators {
    private Generators() {
    }

    /**
     * The embedded jump chain: from state {@code i} the next state is {@code j} with probability
     * {@code q_ij / q_i}, {@code q_i = -q_ii}; a state without rates out is absorbing (common practice, no source;
     * S. M. Ross, "Introduction to Probability Models", ch. 6, from memory).
     *
     * @param q a generator
     * @return the jump chain's transition matrix
     */
    public static RationalMatrix jumpChain(RationalMatrix q) {
        int n = q.rows();
        Rational[][] a = new Rational[n][n];
        for (int i = 0; i < n; i++) {
            Rational out = q.get(i, i).negate();
            for (int j = 0; j < n; j++) {
                if (out.isZero()) {
                    a[i][j] = i == j ? Rational.ONE : Rational.ZERO;
                } else {
                    a[i][j] = i == j ? Rational.ZERO : q.get(i, j).divide(out);
                }
            }
        }
        return RationalMatrix.of(a);
    }

    /**
     * The largest total rate out of a state, {@code max_i |q_ii|}: the smallest uniformization rate.
     *
     * @param q a generator
     * @return the rate (0 for a chain without rates)
     */
    public static Rational maxRate(RationalMatrix q) {
        Rational m = Rational.ZERO;
        for (int i = 0; i < q.rows(); i++) {
            m = m.max(q.get(i, i).negate());
        }
        return m;
    }

    /**
     * The uniformized chain {@code I + Q/rate}.
     *
     * @param q    a generator
     * @param rate the rate, at least {@link #maxRate}; {@code 0} or less picks {@link #maxRate} (1 if that is 0)
     * @return the transition matrix
     * @throws QchainException BAD_ARGUMENT naming {@code --rate} if the rate is below the largest total rate
     */
    public static RationalMatrix uniformized(RationalMatrix q, Rational rate) {
        Rational max = maxRate(q);
        Rational r = rate.signum() > 0 ? rate : (max.isZero() ? Rational.ONE : max);
        if (r.compareTo(max) < 0) {
            throw new QchainException(ErrorKey.BAD_ARGUMENT, "--rate", rate,
                "the uniformization rate must be at least the largest total rate out of a state, " + max);
        }
        return CertifiedTransient.uniformizedMatrix(q, r);
    }
}
