package org.qchain.exact.certified;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import org.qchain.exact.Rational;

/**
 * Polynomials in one variable with rational coefficients, lowest degree first, for the certified real numbers:
 * exact signs at rational points, derivative, gcd and square-free part, and exact rational square-root bounds.
 */
final class Polys {
    private Polys() {
    }

    /** The coefficients without trailing (highest-degree) zeros; the zero polynomial is empty. */
    static List<Rational> trim(List<Rational> a) {
        int d = a.size();
        while (d > 0 && a.get(d - 1).isZero()) {
            d--;
        }
        return List.copyOf(a.subList(0, d));
    }

    /** Integer coefficients with the same roots and the same sign for a positive leading coefficient. */
    static BigInteger[] integral(List<Rational> a) {
        BigInteger l = BigInteger.ONE;
        for (Rational c : a) {
            BigInteger q = c.denominator();
            l = l.divide(l.gcd(q)).multiply(q);
        }
        BigInteger[] out = new BigInteger[a.size()];
        for (int k = 0; k < out.length; k++) {
            Rational c = a.get(k);
            out[k] = c.numerator().multiply(l.divide(c.denominator()));
        }
        return out;
    }

    /** The sign of {@code sum c[k] x^k} at {@code x = p/q} ({@code q > 0}), exactly. */
    static int sign(BigInteger[] c, Rational x) {
        BigInteger p = x.numerator();
        BigInteger q = x.denominator();
        // q^d * poly(p/q) = sum c[k] p^k q^(d-k), by Horner: s = s*p + c[k]*q^(d-k)
        int d = c.length - 1;
        BigInteger s = BigInteger.ZERO;
        BigInteger qk = BigInteger.ONE;
        BigInteger[] qPowers = new BigInteger[d + 1];
        for (int k = 0; k <= d; k++) {
            qPowers[k] = qk;
            qk = qk.multiply(q);
        }
        for (int k = d; k >= 0; k--) {
            s = s.multiply(p).add(c[k].multiply(qPowers[d - k]));
        }
        return s.signum();
    }

    /** The value at a rational point. */
    static Rational value(List<Rational> a, Rational x) {
        Rational s = Rational.ZERO;
        for (int k = a.size() - 1; k >= 0; k--) {
            s = s.multiply(x).add(a.get(k));
        }
        return s;
    }

    static List<Rational> derivative(List<Rational> a) {
        List<Rational> out = new ArrayList<>();
        for (int k = 1; k < a.size(); k++) {
            out.add(a.get(k).multiply(Rational.of(k)));
        }
        return trim(out);
    }

    /** The remainder of a by b (b not zero). */
    static List<Rational> remainder(List<Rational> a, List<Rational> b) {
        List<Rational> r = new ArrayList<>(trim(a));
        int db = b.size() - 1;
        Rational lead = b.get(db);
        while (r.size() - 1 >= db && !r.isEmpty()) {
            int dr = r.size() - 1;
            Rational f = r.get(dr).divide(lead);
            for (int k = 0; k <= db; k++) {
                r.set(dr - db + k, r.get(dr - db + k).subtract(f.multiply(b.get(k))));
            }
            r = new ArrayList<>(trim(r));
        }
        return trim(r);
    }

    /** The quotient of a by b when b divides a. */
    static List<Rational> quotient(List<Rational> a, List<Rational> b) {
        List<Rational> r = new ArrayList<>(trim(a));
        int db = b.size() - 1;
        int dq = r.size() - 1 - db;
        Rational[] q = new Rational[Math.max(0, dq + 1)];
        for (int i = dq; i >= 0; i--) {
            Rational f = r.get(i + db).divide(b.get(db));
            q[i] = f;
            for (int k = 0; k <= db; k++) {
                r.set(i + k, r.get(i + k).subtract(f.multiply(b.get(k))));
            }
        }
        return trim(List.of(q));
    }

    /** The monic gcd. */
    static List<Rational> gcd(List<Rational> a, List<Rational> b) {
        List<Rational> x = trim(a);
        List<Rational> y = trim(b);
        while (!y.isEmpty()) {
            List<Rational> r = remainder(x, y);
            x = y;
            y = r;
        }
        return monic(x);
    }

    static List<Rational> monic(List<Rational> a) {
        if (a.isEmpty()) {
            return a;
        }
        Rational l = a.get(a.size() - 1);
        List<Rational> out = new ArrayList<>();
        for (Rational c : a) {
            out.add(c.divide(l));
        }
        return List.copyOf(out);
    }

    /** The square-free part: the product of the distinct irreducible factors, monic. */
    static List<Rational> squareFree(List<Rational> a) {
        List<Rational> p = trim(a);
        if (p.size() <= 2) {
            return monic(p);
        }
        List<Rational> g = gcd(p, derivative(p));
        return g.size() <= 1 ? monic(p) : monic(quotient(p, g));
    }

    /** {@code p(-x)}. */
    static List<Rational> reflect(List<Rational> a) {
        List<Rational> out = new ArrayList<>();
        for (int k = 0; k < a.size(); k++) {
            out.add(k % 2 == 0 ? a.get(k) : a.get(k).negate());
        }
        return List.copyOf(out);
    }

    /** A rational at most {@code sqrt(q)} ({@code q >= 0}), within about {@code 2^-bits} of it. */
    static Rational sqrtDown(Rational q, int bits) {
        return sqrtBound(q, bits, false);
    }

    /** A rational at least {@code sqrt(q)} ({@code q >= 0}), within about {@code 2^-bits} of it. */
    static Rational sqrtUp(Rational q, int bits) {
        return sqrtBound(q, bits, true);
    }

    private static Rational sqrtBound(Rational q, int bits, boolean up) {
        if (q.signum() < 0) {
            throw new IllegalArgumentException("square root of a negative number " + q);
        }
        // sqrt(n/m) = sqrt(n m 4^k) / (m 2^k)
        BigInteger m = q.denominator();
        int k = Math.max(0, bits + 2);
        BigInteger s = q.numerator().multiply(m).shiftLeft(2 * k).sqrt();
        boolean exact = s.multiply(s).equals(q.numerator().multiply(m).shiftLeft(2 * k));
        if (up && !exact) {
            s = s.add(BigInteger.ONE);
        }
        return Rational.of(s, m.shiftLeft(k));
    }

    /**
     * The real and imaginary parts of {@code p(x + c i)} as polynomials in x ({@code imaginaryShift}) or of
     * {@code p(c + y i)} as polynomials in y ({@code !imaginaryShift}).
     */
    static List<List<Rational>> parts(List<Rational> p, Rational c, boolean imaginaryShift) {
        int d = p.size() - 1;
        Rational[] re = new Rational[d + 1];
        Rational[] im = new Rational[d + 1];
        java.util.Arrays.fill(re, Rational.ZERO);
        java.util.Arrays.fill(im, Rational.ZERO);
        for (int k = 0; k <= d; k++) {
            // (t + c i)^k = sum_j C(k, j) t^(k-j) (c i)^j, or (c + t i)^k = sum_j C(k, j) c^(k-j) (t i)^j
            BigInteger binom = BigInteger.ONE;
            for (int j = 0; j <= k; j++) {
                Rational coef = p.get(k).multiply(Rational.of(binom));
                int power;
                if (imaginaryShift) {
                    coef = coef.multiply(c.pow(j));
                    power = k - j;
                } else {
                    coef = coef.multiply(c.pow(k - j));
                    power = j;
                }
                // i^j: 1, i, -1, -i
                switch (j % 4) {
                    case 0 -> re[power] = re[power].add(coef);
                    case 1 -> im[power] = im[power].add(coef);
                    case 2 -> re[power] = re[power].subtract(coef);
                    default -> im[power] = im[power].subtract(coef);
                }
                binom = binom.multiply(BigInteger.valueOf(k - j)).divide(BigInteger.valueOf(j + 1));
            }
        }
        return List.of(trim(List.of(re)), trim(List.of(im)));
    }
}
