package org.qchain.symbolic.sensitivity;

import java.math.BigInteger;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.symbolic.Poly;
import org.qchain.symbolic.RatFun;

/**
 * A rational function of one variable evaluated at many exact points fast: the coefficients brought to integers
 * once, and each value {@code N(a/b) / D(a/b)} as {@code (sum C_k a^k b^(d-k)) b^(e-d) ... }, integer Horner steps
 * with a single reduction at the end, where the general evaluation reduces a fraction at every addition (measured:
 * the reductions were most of a 10,001-point sweep's time).
 */
final class UnivariateValues {
    private final String variable;
    private final BigInteger[] num;
    private final BigInteger[] den;
    /** The factor the integer coefficients carry: N / D = (numInt / denInt) * scale. */
    private final Rational scale;

    private UnivariateValues(String variable, BigInteger[] num, BigInteger[] den, Rational scale) {
        this.variable = variable;
        this.num = num;
        this.den = den;
        this.scale = scale;
    }

    /** For f with every variable but {@code variable} substituted. */
    static UnivariateValues of(RatFun f, String variable) {
        Rational[] n = coefficients(f.numerator(), variable);
        Rational[] d = coefficients(f.denominator(), variable);
        BigInteger ln = lcmOfDenominators(n);
        BigInteger ld = lcmOfDenominators(d);
        return new UnivariateValues(variable, integers(n, ln), integers(d, ld), Rational.of(ld, ln));
    }

    private static Rational[] coefficients(Poly p, String variable) {
        int idx = p.ring().variables().indexOf(variable);
        int deg = idx < 0 ? 0 : Math.max(0, p.degree(variable));
        Rational[] c = new Rational[deg + 1];
        java.util.Arrays.fill(c, Rational.ZERO);
        for (Poly.Term t : p.terms()) {
            for (int i = 0; i < t.exponents().size(); i++) {
                if (i != idx && t.exponents().get(i) != 0) {
                    throw new QchainException(ErrorKey.FREE_PARAMETERS, p.ring().variables().get(i));
                }
            }
            int k = idx < 0 ? 0 : t.exponents().get(idx);
            c[k] = c[k].add(t.coefficient());
        }
        return c;
    }

    private static BigInteger lcmOfDenominators(Rational[] c) {
        BigInteger l = BigInteger.ONE;
        for (Rational r : c) {
            BigInteger d = r.denominator();
            l = l.divide(l.gcd(d)).multiply(d);
        }
        return l;
    }

    private static BigInteger[] integers(Rational[] c, BigInteger l) {
        BigInteger[] out = new BigInteger[c.length];
        for (int i = 0; i < c.length; i++) {
            out[i] = c[i].numerator().multiply(l.divide(c[i].denominator()));
        }
        return out;
    }

    /** sum C_k a^k b^(d-k), d = C.length - 1. */
    private static BigInteger homogeneous(BigInteger[] c, BigInteger a, BigInteger b) {
        BigInteger s = BigInteger.ZERO;
        BigInteger bp = BigInteger.ONE;
        // Horner in a with powers of b: s = (((C_d) a + C_(d-1) b) a + C_(d-2) b^2) ...
        for (int k = c.length - 1; k >= 0; k--) {
            s = s.multiply(a).add(c[k].multiply(bp));
            bp = bp.multiply(b);
        }
        return s;
    }

    /**
     * The value at x, or empty if the denominator vanishes there (the caller reports it with the general
     * evaluation's message).
     */
    java.util.Optional<Rational> at(Rational x) {
        BigInteger a = x.numerator();
        BigInteger b = x.denominator();
        BigInteger nv = homogeneous(num, a, b);
        BigInteger dv = homogeneous(den, a, b);
        if (dv.signum() == 0) {
            return java.util.Optional.empty();
        }
        // N(x) = nv / b^dn, D(x) = dv / b^dd
        int shift = (den.length - 1) - (num.length - 1);
        BigInteger top = nv.multiply(scale.numerator());
        BigInteger bottom = dv.multiply(scale.denominator());
        if (shift > 0) {
            top = top.multiply(b.pow(shift));
        } else if (shift < 0) {
            bottom = bottom.multiply(b.pow(-shift));
        }
        return java.util.Optional.of(Rational.of(top, bottom));
    }

    /** About how many decimal digits the exact value at x has (numerator and denominator together). */
    long digitsAt(Rational x) {
        long bits = Math.max(x.numerator().bitLength(), x.denominator().bitLength());
        return (bitsOf(num) + bitsOf(den) + (long) (num.length + den.length - 2) * bits) * 30103 / 100000 + 2;
    }

    private static long bitsOf(BigInteger[] c) {
        long m = 0;
        for (BigInteger v : c) {
            m = Math.max(m, v.bitLength());
        }
        return m;
    }
}
