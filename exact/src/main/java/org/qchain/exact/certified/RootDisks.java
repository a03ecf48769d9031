package org.qchain.exact.certified;

import java.math.BigDecimal;
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
            long prec = (long) Math.ceil(bits * 0.30103) + 20;
            Apcomplex z = newton(p, new Apcomplex(apfloat(re, prec), apfloat(im, prec)), prec);
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
            for (Apcomplex s : z) {
                refined.add(newton(p, s, prec));
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
     * this radius about z holds a root of p.
     */
    static Rational inclusionRadius(List<Rational> p, Rational re, Rational im, int bits) {
        int d = p.size() - 1;
        // Horner for p and p' together, in complex rational arithmetic
        Rational pr = p.get(d);
        Rational pi = Rational.ZERO;
        Rational dr = Rational.ZERO;
        Rational di = Rational.ZERO;
        for (int k = d - 1; k >= 0; k--) {
            // p' <- p' z + p
            Rational ndr = dr.multiply(re).subtract(di.multiply(im)).add(pr);
            Rational ndi = dr.multiply(im).add(di.multiply(re)).add(pi);
            dr = ndr;
            di = ndi;
            // p <- p z + a_k
            Rational npr = pr.multiply(re).subtract(pi.multiply(im)).add(p.get(k));
            Rational npi = pr.multiply(im).add(pi.multiply(re));
            pr = npr;
            pi = npi;
        }
        Rational den = dr.multiply(dr).add(di.multiply(di));
        if (den.isZero()) {
            return null;
        }
        Rational sq = pr.multiply(pr).add(pi.multiply(pi)).divide(den).multiply(Rational.of((long) d * d));
        return Polys.sqrtUp(sq, bits);
    }

    private static Rational rational(Apfloat x) {
        return x.signum() == 0 ? Rational.ZERO : Rational.of(new BigDecimal(x.toString(true)));
    }

    private static Apfloat apfloat(Rational r, long prec) {
        return new Apfloat(r.numerator(), prec).divide(new Apfloat(r.denominator(), prec));
    }

    /** Newton's method from {@code z} at {@code prec} decimal digits. */
    static Apcomplex newton(List<Rational> a, Apcomplex start, long prec) {
        int d = a.size() - 1;
        Apfloat[] ca = new Apfloat[d + 1];
        for (int k = 0; k <= d; k++) {
            ca[k] = apfloat(a.get(k), prec);
        }
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
