package org.qchain.symbolic.closed;

import edu.jas.arith.BigRational;
import java.util.ArrayList;
import java.util.List;
import org.apfloat.Apcomplex;
import org.apfloat.ApcomplexMath;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.qchain.exact.Decimals;
import org.qchain.exact.Rational;

/**
 * All complex roots of a polynomial with rational coefficients and simple roots (an irreducible factor over Q),
 * numerically: Durand-Kerner in double precision for starting values, then Newton's method in apfloat at the
 * requested precision plus guard digits. Used only for display; the exact work never uses these numbers.
 */
final class NumericRoots {
    private NumericRoots() {
    }

    /**
     * The roots of {@code sum a[k] x^k} (monic, degree at least 1, simple roots).
     *
     * @param a      coefficients, a[deg] = 1
     * @param digits significant digits wanted
     * @return the roots, real ones first by value, then complex ones by real part
     */
    static List<Apcomplex> roots(BigRational[] a, int digits) {
        int d = a.length - 1;
        double[] re = new double[d];
        double[] im = new double[d];
        double[] c = new double[d + 1];
        for (int k = 0; k <= d; k++) {
            c[k] = a[k].doubleValue();
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
                // p(z_k) / prod_{j != k} (z_k - z_j)
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
        long prec = digits + 15L;
        List<Apcomplex> out = new ArrayList<>();
        Apfloat[] ca = new Apfloat[d + 1];
        for (int k = 0; k <= d; k++) {
            ca[k] = new Apfloat(a[k].numerator(), prec).divide(new Apfloat(a[k].denominator(), prec));
        }
        for (int k = 0; k < d; k++) {
            Apcomplex z = new Apcomplex(new Apfloat(re[k], prec), new Apfloat(im[k], prec));
            for (int it = 0; it < 60; it++) {
                Apcomplex p = ca[d];
                Apcomplex dp = Apcomplex.ZERO;
                for (int m = d - 1; m >= 0; m--) {
                    dp = dp.multiply(z).add(p);
                    p = p.multiply(z).add(ca[m]);
                }
                if (dp.real().signum() == 0 && dp.imag().signum() == 0) {
                    break;
                }
                Apcomplex step = p.divide(dp);
                z = z.subtract(step);
                Apfloat size = ApcomplexMath.abs(step);
                if (size.signum() == 0 || size.compareTo(ApfloatMath.pow(new Apfloat(10, prec), -(prec - 5))) < 0) {
                    break;
                }
            }
            out.add(z);
        }
        Apfloat tiny = ApfloatMath.pow(new Apfloat(10, prec), -(digits + 5));
        List<Apcomplex> real = new ArrayList<>();
        List<Apcomplex> complex = new ArrayList<>();
        for (Apcomplex z : out) {
            if (ApcomplexMath.abs(z.imag()).compareTo(tiny) < 0) {
                real.add(new Apcomplex(z.real()));
            } else {
                complex.add(z);
            }
        }
        real.sort((x, y) -> x.real().compareTo(y.real()));
        complex.sort((x, y) -> {
            int r = x.real().compareTo(y.real());
            return r != 0 ? r : y.imag().compareTo(x.imag());
        });
        real.addAll(complex);
        return real;
    }

    /**
     * A number to {@code digits} significant digits, correctly rounded from the (more precise) apfloat value, in
     * the exact module's decimal style.
     */
    static String format(Apfloat x, int digits) {
        if (x.signum() == 0) {
            return "0";
        }
        return Decimals.format(Rational.of(new java.math.BigDecimal(x.toString(true))), digits);
    }

    /** {@code re}, or {@code re + im*i} / {@code re - im*i}. */
    static String format(Apcomplex z, int digits) {
        if (z.imag().signum() == 0) {
            return format(z.real(), digits);
        }
        String re = format(z.real(), digits);
        String im = format(ApcomplexMath.abs(z.imag()), digits);
        return re + (z.imag().signum() < 0 ? " - " : " + ") + im + "*i";
    }
}
