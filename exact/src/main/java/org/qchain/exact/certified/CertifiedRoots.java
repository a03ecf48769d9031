package org.qchain.exact.certified;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.qchain.exact.Rational;

/**
 * All complex roots of a polynomial with rational coefficients, each a {@link CertifiedComplex} that gives proven
 * digits on demand: real roots as algebraic numbers (isolating intervals refined by exact bisection), the parts of
 * the others through disks that are proven to hold exactly one root each.
 *
 * <p>Isolation: approximations z_1 .. z_d of the roots of the square-free part (Durand-Kerner, then Newton's method
 * in apfloat), each with the radius {@code r_k = d |p(z_k) / p'(z_k)|}: the disk of that radius about z_k holds a
 * root, because {@code p'/p = sum 1/(z - x_j)} (P. Henrici, Applied and Computational Complex Analysis, vol. 1,
 * ch. 6, the inclusion disk; from memory). When the d disks of twice these radii are pairwise disjoint, each holds
 * exactly one root, since there are d roots. A disk centred on the real axis then holds a real root (a non-real
 * root's conjugate would be in it too), and a disk that misses the real axis a non-real one. Rational arithmetic
 * proves each step; the floating-point work only proposes centres.
 */
public final class CertifiedRoots {
    private CertifiedRoots() {
    }

    /**
     * The roots of {@code sum a[k] x^k}, each once (repeated roots are given once: the roots of the square-free
     * part): real roots first, by value, then the others by real part and, for conjugates, the one with positive
     * imaginary part first.
     *
     * @param coefficients a[0] .. a[d], lowest degree first, degree at least 1
     * @return the roots
     * @throws IllegalArgumentException if the polynomial is constant
     */
    public static List<CertifiedComplex> of(List<Rational> coefficients) {
        List<Rational> p = Polys.squareFree(coefficients);
        if (p.size() < 2) {
            throw new IllegalArgumentException("a constant polynomial has no roots");
        }
        List<RootDisks.Disk> disks = RootDisks.isolate(p);
        List<CertifiedComplex> real = new ArrayList<>();
        List<RootDisks.Disk> complex = new ArrayList<>();
        for (RootDisks.Disk d : disks) {
            if (d.real()) {
                real.add(CertifiedComplex.real(CertifiedReal.root(p, d.re().subtract(d.radius()),
                    d.re().add(d.radius()))));
            } else {
                complex.add(d);
            }
        }
        sortReal(real);
        complex.sort(Comparator.comparing(RootDisks.Disk::re).thenComparing(RootDisks.Disk::im,
            Comparator.reverseOrder()));
        List<CertifiedComplex> out = new ArrayList<>(real);
        for (RootDisks.Disk d : complex) {
            RootDisks.Refined root = new RootDisks.Refined(p, d);
            out.add(new CertifiedComplex(
                CertifiedReal.enclosed(bits -> root.at(bits).reEnclosure(), x -> partIs(p, d, x, false)),
                CertifiedReal.enclosed(bits -> root.at(bits).imEnclosure(), x -> partIs(p, d, x, true))));
        }
        return List.copyOf(out);
    }

    /** Distinct real roots in increasing order (their isolating intervals are disjoint, so any enclosure orders). */
    private static void sortReal(List<CertifiedComplex> real) {
        real.sort((x, y) -> {
            for (int bits = 8; ; bits *= 2) {
                Enclosure a = x.re().enclosure(bits);
                Enclosure b = y.re().enclosure(bits);
                if (a.hi().compareTo(b.lo()) < 0) {
                    return -1;
                }
                if (b.hi().compareTo(a.lo()) < 0) {
                    return 1;
                }
                if (a.equals(b) && a.isExact()) {
                    return 0;
                }
            }
        });
    }

    /**
     * Whether the root in the disk has imaginary part ({@code imaginary}) or real part exactly {@code c}: the real
     * and imaginary parts of p along the line through c have a common real root at a point of the disk. A common
     * root is simple (p is square-free), so it shows as a sign change of their gcd over the disk's chord.
     */
    private static boolean partIs(List<Rational> p, RootDisks.Disk disk, Rational c, boolean imaginary) {
        List<List<Rational>> parts = Polys.parts(p, c, imaginary);
        List<Rational> g = Polys.gcd(parts.get(0), parts.get(1));
        if (g.size() < 2) {
            return false;
        }
        // a small disk about the same root, whose bounding box lies inside the isolating disk
        RootDisks.Disk small = disk.refine(p, 64 + 4 * p.size());
        Rational dr = small.re().subtract(disk.re());
        Rational di = small.im().subtract(disk.im());
        Rational room = disk.radius().subtract(small.radius().multiply(Rational.of(2)));
        if (room.signum() <= 0 || dr.multiply(dr).add(di.multiply(di)).compareTo(room.multiply(room)) > 0) {
            return false;
        }
        Rational centre = imaginary ? small.re() : small.im();
        Rational off = imaginary ? small.im() : small.re();
        if (c.subtract(off).abs().compareTo(small.radius()) > 0) {
            return false;
        }
        BigInteger[] gi = Polys.integral(g);
        int a = Polys.sign(gi, centre.subtract(small.radius()));
        int b = Polys.sign(gi, centre.add(small.radius()));
        return a == 0 || b == 0 || a != b;
    }
}
