package org.qchain.exact.certified;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import org.apfloat.Apcomplex;
import org.apfloat.ApcomplexMath;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.qchain.exact.Rational;

/**
 * Inclusion disks for the roots of a square-free polynomial (see {@link CertifiedRoots}): centres proposed in floating
 * point (Durand-Kerner in binary64, Newton's method in apfloat), radii and separation proven in rational arithmetic.
 */
final class RootDisks {
    private RootDisks() {
    }

    /** The largest working precision of the isolation, in decimal digits. */
    private static final int MAX_DIGITS = 4000;

    /**
     * A disk that holds exactly one root of the polynomial; {@code im = 0} exactly for a real root.
     *
     * @param re     the real part of the centre
     * @param im     the imaginary part of the centre
     * @param radius the radius (twice the inclusion radius, so the root is well inside)
     */
    record Disk(Rational re, Rational im, Rational radius) {
        boolean real() {
            return im.isZero();
        }

        /** A smaller disk inside this one, about {@code 2^-bits} wide, holding the same root. */
        Disk refine(List<Rational> p, int bits) {
            return refine(p, bits, this);
        }

        /** As {@link #refine(List, int)}, with Newton's method started from the centre of {@code from}. */
        Disk refine(List<Rational> p, int bits, Disk from) {
            long prec = (long) Math.ceil(bits * 0.30103) + 20;
            Apcomplex z = newton(p, new Apcomplex(apfloat(from.re, prec), apfloat(from.im, prec)), prec);
            Rational cr = rational(z.real());
            Rational ci = rational(z.imag());
            Rational r = inclusionRadius(p, cr, ci, bits + 8);
            if (r != null && r.compareTo(radius) < 0) {
                Rational dr = cr.subtract(re);
                Rational di = ci.subtract(im);
                Rational room = radius.subtract(r);
                if (dr.multiply(dr).add(di.multiply(di)).compareTo(room.multiply(room)) <= 0) {
                    return new Disk(cr, ci, r);
                }
            }
            return this;
        }

        Enclosure reEnclosure() {
            return Enclosure.of(re.subtract(radius), re.add(radius));
        }

        Enclosure imEnclosure() {
            return Enclosure.of(im.subtract(radius), im.add(radius));
        }
    }

    /**
     * An isolating disk with the narrowest refinement found so far (shared by the real and imaginary parts of its
     * root, so each precision is worked out once).
     */
    static final class Refined {
        private final List<Rational> p;
        private final Disk isolating;
        private Disk best;

        Refined(List<Rational> p, Disk isolating) {
            this.p = p;
            this.isolating = isolating;
            this.best = isolating;
        }

        Disk isolating() {
            return isolating;
        }

        /** A disk about the root, at most about {@code 2^-bits} in radius when the arithmetic allows. */
        synchronized Disk at(int bits) {
            Rational target = Rational.dyadic(BigInteger.ONE, bits);
            if (best.radius().compareTo(target) <= 0) {
                return best;
            }
            Disk d = isolating.refine(p, bits, best);
            if (d.radius().compareTo(best.radius()) < 0) {
                best = d;
            }
            return best;
        }
    }

    /**
     * One disk per root of {@code p} (square-free, monic, degree at least 1), pairwise disjoint.
     *
     * @throws IllegalStateException if the roots could not be separated at the largest precision
     */
    static List<Disk> isolate(List<Rational> p) {
        int d = p.size() - 1;
        if (d == 1) {
            Rational x = p.get(0).negate().divide(p.get(1));
            return List.of(new Disk(x, Rational.ZERO, Rational.ONE));
        }
        List<Apcomplex> z = durandKerner(p);
        for (long prec = 40; prec <= MAX_DIGITS; prec *= 2) {
            List<Apcomplex> refined = new ArrayList<>();
            Apfloat[] ca = coefficients(p, prec);
            for (Apcomplex s : z) {
                refined.add(newton(ca, s, prec));
            }
            z = refined;
            List<Disk> disks = certify(p, z, prec);
            if (disks != null) {
                return disks;
            }
        }
        throw new IllegalStateException("roots not separated at " + MAX_DIGITS + " digits");
    }

    /** Disks about the approximations, or null if they are not yet proven to isolate the roots. */
    private static List<Disk> certify(List<Rational> p, List<Apcomplex> z, long prec) {
        int bits = (int) (prec * 3.3);
        Apfloat tiny = ApfloatMath.pow(new Apfloat(10, prec), -(prec / 2));
        List<Rational[]> centres = new ArrayList<>();
        int up = 0;
        int down = 0;
        for (Apcomplex s : z) {
            if (ApcomplexMath.abs(s.imag()).compareTo(tiny) < 0) {
                centres.add(new Rational[] {rational(s.real()), Rational.ZERO});
            } else if (s.imag().signum() > 0) {
                Rational re = rational(s.real());
                Rational im = rational(s.imag());
                centres.add(new Rational[] {re, im});
                centres.add(new Rational[] {re, im.negate()});
                up++;
            } else {
                down++;
            }
        }
        if (up != down) {
            return null;
        }
        List<Disk> out = new ArrayList<>();
        for (Rational[] c : centres) {
            Rational r = inclusionRadius(p, c[0], c[1], bits);
            if (r == null) {
                return null;
            }
            Rational radius = r.multiply(Rational.of(2));
            if (!c[1].isZero() && radius.compareTo(c[1].abs()) >= 0) {
                return null; // the disk meets the real axis: not yet known to hold a non-real root
            }
            out.add(new Disk(c[0], c[1], radius));
        }
        for (int i = 0; i < out.size(); i++) {
            for (int j = i + 1; j < out.size(); j++) {
                Disk a = out.get(i);
                Disk b = out.get(j);
                Rational dr = a.re.subtract(b.re);
                Rational di = a.im.subtract(b.im);
                Rational sum = a.radius.add(b.radius);
                if (dr.multiply(dr).add(di.multiply(di)).compareTo(sum.multiply(sum)) <= 0) {
                    return null;
                }
            }
        }
        return List.copyOf(out);
    }

    /**
     * An upper bound of {@code d |p(z) / p'(z)|} at {@code z = re + im i}, or null if {@code p'(z) = 0}: the disk of
     * this radius about z holds a root of p. Evaluated in integers over the common denominator of re and im.
     */
    static Rational inclusionRadius(List<Rational> p, Rational re, Rational im, int bits) {
        int d = p.size() - 1;
        BigInteger[] c = Polys.integral(p);
        BigInteger den = re.denominator().divide(re.denominator().gcd(im.denominator())).multiply(im.denominator());
        BigInteger a = re.numerator().multiply(den.divide(re.denominator()));
        BigInteger b = im.numerator().multiply(den.divide(im.denominator()));
        BigInteger[] dPow = new BigInteger[d + 1];
        dPow[0] = BigInteger.ONE;
        for (int k = 1; k <= d; k++) {
            dPow[k] = dPow[k - 1].multiply(den);
        }
        // den^d p(z) and den^(d-1) p'(z), by Horner on (a + b i) with the powers of den
        BigInteger pr = c[d];
        BigInteger pi = BigInteger.ZERO;
        for (int k = d - 1; k >= 0; k--) {
            BigInteger nr = pr.multiply(a).subtract(pi.multiply(b)).add(c[k].multiply(dPow[d - k]));
            BigInteger ni = pr.multiply(b).add(pi.multiply(a));
            pr = nr;
            pi = ni;
        }
        BigInteger qr = c[d].multiply(BigInteger.valueOf(d));
        BigInteger qi = BigInteger.ZERO;
        for (int k = d - 1; k >= 1; k--) {
            BigInteger nr = qr.multiply(a).subtract(qi.multiply(b)).add(c[k].multiply(BigInteger.valueOf(k))
                .multiply(dPow[d - k]));
            BigInteger ni = qr.multiply(b).add(qi.multiply(a));
            qr = nr;
            qi = ni;
        }
        BigInteger q2 = qr.multiply(qr).add(qi.multiply(qi));
        if (q2.signum() == 0) {
            return null;
        }
        // |p / p'|^2 = |den^d p|^2 / (|den^(d-1) p'|^2 den^2)
        BigInteger num = pr.multiply(pr).add(pi.multiply(pi)).multiply(BigInteger.valueOf((long) d * d));
        return Polys.sqrtUp(Rational.of(num, q2.multiply(den).multiply(den)), bits);
    }

    private static Rational rational(Apfloat x) {
        return x.signum() == 0 ? Rational.ZERO : Rational.of(new BigDecimal(x.toString(true)));
    }

    private static Apfloat apfloat(Rational r, long prec) {
        Apfloat n = new Apfloat(r.numerator(), prec);
        return r.isInteger() ? n : n.divide(new Apfloat(r.denominator(), prec));
    }

    /** Newton's method from {@code z} at {@code prec} decimal digits. */
    static Apcomplex newton(List<Rational> a, Apcomplex start, long prec) {
        return newton(coefficients(a, prec), start, prec);
    }

    /** The coefficients at {@code prec} decimal digits. */
    static Apfloat[] coefficients(List<Rational> a, long prec) {
        Apfloat[] ca = new Apfloat[a.size()];
        for (int k = 0; k < ca.length; k++) {
            ca[k] = apfloat(a.get(k), prec);
        }
        return ca;
    }

    /** Newton's method from {@code z} at {@code prec} decimal digits, with the coefficients at that precision. */
    static Apcomplex newton(Apfloat[] ca, Apcomplex start, long prec) {
        int d = ca.length - 1;
        Apcomplex z = new Apcomplex(start.real().precision(prec), start.imag().precision(prec));
        Apfloat eps = ApfloatMath.pow(new Apfloat(10, prec), -(prec - 5));
        for (int it = 0; it < 200; it++) {
            Apcomplex v = ca[d];
            Apcomplex dv = Apcomplex.ZERO;
            for (int m = d - 1; m >= 0; m--) {
                dv = dv.multiply(z).add(v);
                v = v.multiply(z).add(ca[m]);
            }
            if (dv.real().signum() == 0 && dv.imag().signum() == 0) {
                break;
            }
            Apcomplex step = v.divide(dv);
            z = z.subtract(step);
            Apfloat size = ApcomplexMath.abs(step);
            if (size.signum() == 0 || size.compareTo(eps.multiply(new Apfloat(1, prec).add(ApcomplexMath.abs(z))))
                < 0) {
                break;
            }
        }
        return z;
    }

    /** Starting values for every root at once, in binary64 (Durand-Kerner). */
    private static List<Apcomplex> durandKerner(List<Rational> a) {
        int d = a.size() - 1;
        double[] re = new double[d];
        double[] im = new double[d];
        double[] c = new double[d + 1];
        for (int k = 0; k <= d; k++) {
            c[k] = a.get(k).doubleValue();
        }
        double radius = 1;
        for (int k = 0; k < d; k++) {
            radius = Math.max(radius, 1 + Math.abs(c[k]));
        }
        for (int k = 0; k < d; k++) {
            double ang = 2 * Math.PI * k / d + 0.4;
            re[k] = 0.5 * radius * Math.cos(ang);
            im[k] = 0.5 * radius * Math.sin(ang);
        }
        for (int it = 0; it < 2000; it++) {
            double change = 0;
            for (int k = 0; k < d; k++) {
                double pr = 1;
                double pi = 0;
                for (int m = d - 1; m >= 0; m--) {
                    double nr = pr * re[k] - pi * im[k] + c[m];
                    double ni = pr * im[k] + pi * re[k];
                    pr = nr;
                    pi = ni;
                }
                double qr = 1;
                double qi = 0;
                for (int j = 0; j < d; j++) {
                    if (j != k) {
                        double dr = re[k] - re[j];
                        double di = im[k] - im[j];
                        double nr = qr * dr - qi * di;
                        double ni = qr * di + qi * dr;
                        qr = nr;
                        qi = ni;
                    }
                }
                double den = qr * qr + qi * qi;
                if (den == 0) {
                    den = 1e-300;
                }
                double sr = (pr * qr + pi * qi) / den;
                double si = (pi * qr - pr * qi) / den;
                re[k] -= sr;
                im[k] -= si;
                change = Math.max(change, Math.hypot(sr, si));
            }
            if (change < 1e-15) {
                break;
            }
        }
        List<Apcomplex> out = new ArrayList<>();
        for (int k = 0; k < d; k++) {
            out.add(new Apcomplex(new Apfloat(re[k], 40), new Apfloat(im[k], 40)));
        }
        return out;
    }
}
