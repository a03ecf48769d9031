package org.qchain.exact.certified;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Test;
import org.qchain.exact.Decimals;
import org.qchain.exact.QuickTries;
import org.qchain.exact.Rational;

/**
 * Certified real and complex numbers against an independent high-precision evaluation: apfloat's square root
 * (M. Tommila, apfloat 1.14.0, {@code ApfloatMath.sqrt}) at 300 digits. Roots are planted through products of
 * quadratic factors whose roots are known in closed form ({@code x^2 - a}: +-sqrt(a); {@code x^2 - 2cx + c^2 + e}:
 * {@code c +- i sqrt(e)}), so the reference never uses our root finder.
 */
class CertifiedRealTest {
    private static final long REF_DIGITS = 300;

    private static Apfloat ref(Rational r) {
        return new Apfloat(r.numerator(), REF_DIGITS).divide(new Apfloat(r.denominator(), REF_DIGITS));
    }

    private static final Apfloat SLACK = ApfloatMath.pow(new Apfloat(10, REF_DIGITS), -290);

    /** An enclosure's ends at the reference precision, converted once for every value it is compared with. */
    private record Bounds(Apfloat lo, Apfloat hi) {
        static Bounds of(Enclosure e) {
            return new Bounds(ref(e.lo()), ref(e.hi()));
        }

        /** Whether the enclosure contains the reference value (good to about 10^-290). */
        boolean contain(Apfloat v) {
            return lo.compareTo(v.add(SLACK)) <= 0 && v.subtract(SLACK).compareTo(hi) <= 0;
        }
    }

    private static boolean contains(Enclosure e, Apfloat v) {
        return Bounds.of(e).contain(v);
    }

    private static Rational width(Enclosure e) {
        return e.width();
    }

    @Property(seed = "20261203", tries = 200)
    void squareRootEnclosuresContainTheValue(@ForAll @IntRange(min = 1, max = 10_000) int p,
                                             @ForAll @IntRange(min = 1, max = 997) int q,
                                             @ForAll @IntRange(min = 1, max = 600) int bits) {
        Rational a = Rational.of(p, q);
        CertifiedReal s = CertifiedReal.sqrt(a);
        Enclosure e = s.enclosure(bits);
        assertTrue(contains(e, ApfloatMath.sqrt(ref(a))), () -> "sqrt(" + a + ") not in " + e);
        assertTrue(width(e).compareTo(Rational.dyadic(java.math.BigInteger.ONE, bits)) <= 0, "as narrow as asked");
    }

    /** The reference roots of a product of planted quadratic factors, and the polynomial. */
    private record Planted(List<Rational> poly, List<Apfloat[]> roots) {
    }

    private static List<Rational> times(List<Rational> a, List<Rational> b) {
        Rational[] out = new Rational[a.size() + b.size() - 1];
        java.util.Arrays.fill(out, Rational.ZERO);
        for (int i = 0; i < a.size(); i++) {
            for (int j = 0; j < b.size(); j++) {
                out[i + j] = out[i + j].add(a.get(i).multiply(b.get(j)));
            }
        }
        return List.of(out);
    }

    private static Planted plant(java.util.Random rnd) {
        List<Rational> poly = List.of(Rational.ONE);
        List<Apfloat[]> roots = new ArrayList<>();
        List<Rational> used = new ArrayList<>();
        int factors = 1 + rnd.nextInt(3);
        for (int f = 0; f < factors; f++) {
            if (rnd.nextBoolean()) {
                Rational a;
                do {
                    a = Rational.of(2 + rnd.nextInt(200), 1 + rnd.nextInt(50));
                } while (used.contains(a) || CertifiedReal.sqrt(a).exactValue().isPresent());
                used.add(a);
                poly = times(poly, List.of(a.negate(), Rational.ZERO, Rational.ONE));
                Apfloat s = ApfloatMath.sqrt(ref(a));
                roots.add(new Apfloat[] {s, Apfloat.ZERO});
                roots.add(new Apfloat[] {s.negate(), Apfloat.ZERO});
            } else {
                Rational c = Rational.of(rnd.nextInt(41) - 20, 1 + rnd.nextInt(30));
                Rational e = Rational.of(1 + rnd.nextInt(300), 1 + rnd.nextInt(40));
                Rational key = c.add(Rational.of(1000)).multiply(e);
                if (used.contains(key)) {
                    continue;
                }
                used.add(key);
                poly = times(poly, List.of(c.multiply(c).add(e), c.multiply(Rational.of(-2)), Rational.ONE));
                Apfloat s = ApfloatMath.sqrt(ref(e));
                roots.add(new Apfloat[] {ref(c), s});
                roots.add(new Apfloat[] {ref(c), s.negate()});
            }
        }
        return new Planted(poly, roots);
    }

    @Property(seed = "41", tries = 60)
    void rootEnclosuresContainThePlantedRoots(@ForAll @IntRange(min = 0, max = 1_000_000) int seed,
                                              @ForAll @IntRange(min = 8, max = 400) int bits) {
        Planted pl = plant(new java.util.Random(seed));
        List<CertifiedComplex> got = CertifiedRoots.of(pl.poly());
        assertEquals(pl.roots().size(), got.size(), "one value per root");
        List<Bounds[]> boxes = new ArrayList<>();
        for (CertifiedComplex z : got) {
            boxes.add(new Bounds[] {Bounds.of(z.re().enclosure(bits)), Bounds.of(z.im().enclosure(bits))});
        }
        for (Apfloat[] r : pl.roots()) {
            boolean found = false;
            for (Bounds[] box : boxes) {
                if (box[0].contain(r[0]) && box[1].contain(r[1])) {
                    found = true;
                }
            }
            assertTrue(found, () -> "root " + r[0] + " + " + r[1] + "i enclosed in " + pl.poly());
        }
        for (CertifiedComplex z : got) {
            assertEquals(r0(z), z.isReal() ? 0 : 1, "real roots have an exact zero imaginary part");
        }
    }

    private static int r0(CertifiedComplex z) {
        return z.im().signum() == 0 ? 0 : 1;
    }

    /**
     * The proven digits are those of the earlier display (apfloat at the requested digits plus 15, rounded once), on
     * values that are not near a rounding boundary.
     */
    @Property(seed = "7", tries = 80)
    @QuickTries(25)
    void decimalsRoundAsTheEarlierDisplay(@ForAll @IntRange(min = 0, max = 1_000_000) int seed,
                                          @ForAll @IntRange(min = 1, max = 40) int digits) {
        Planted pl = plant(new java.util.Random(seed));
        for (CertifiedComplex z : CertifiedRoots.of(pl.poly())) {
            Apfloat[] planted = null;
            Bounds re = Bounds.of(z.re().enclosure(600));
            Bounds im = Bounds.of(z.im().enclosure(600));
            for (Apfloat[] r : pl.roots()) {
                if (re.contain(r[0]) && im.contain(r[1])) {
                    planted = r;
                }
            }
            assertTrue(planted != null, "a planted root");
            for (int k = 0; k < 2; k++) {
                CertifiedReal part = k == 0 ? z.re() : z.im();
                Apfloat v = planted[k];
                String earlier = v.signum() == 0 ? "0" : Decimals.format(Rational.of(new BigDecimal(
                    v.precision(digits + 15L).toString(true))), digits);
                CertifiedDecimal d = part.decimal(digits);
                assertTrue(d.isProven(), "settled");
                if (Rational.parse(earlier).isInteger()) {
                    // an exact integer part prints as an integer, as exact values do
                    assertEquals(Rational.parse(earlier), Rational.parse(d.text()));
                } else {
                    assertEquals(earlier, d.text());
                }
            }
        }
    }

    /** A root exactly on a rounding boundary is found exactly (1/4 at one digit is 0.2, ties to even). */
    @Test
    void rootOnARoundingBoundaryIsExact() {
        // (x - 1/4)(x^2 - 2)
        List<Rational> p = times(List.of(Rational.of(-1, 4), Rational.ONE),
            List.of(Rational.of(-2), Rational.ZERO, Rational.ONE));
        List<CertifiedComplex> r = CertifiedRoots.of(p);
        assertEquals(3, r.size());
        CertifiedDecimal d = r.get(1).re().decimal(1);
        assertEquals("0.2", d.text());
        assertEquals(CertifiedDecimal.Status.EXACT, d.status());
        assertEquals("-1.41421", r.get(0).re().decimal(6).text()); // sqrt(2) = 1.414213..., common practice, no source
        assertEquals("0.2", CertifiedReal.sqrt(Rational.of(1, 16)).decimal(1).text());
        assertEquals("0.25", CertifiedReal.quadratic(Rational.of(1, 8), Rational.of(1, 8), Rational.ONE).decimal(3)
            .text().substring(0, 4));
    }

    @Test
    void zeroRootAndSignsAreExact() {
        // x (x^2 - 3): roots -sqrt(3), 0, sqrt(3)
        List<CertifiedComplex> r = CertifiedRoots.of(List.of(Rational.ZERO, Rational.of(-3), Rational.ZERO,
            Rational.ONE));
        assertEquals("0", r.get(1).re().decimal(5).text());
        assertEquals(-1, r.get(0).re().signum());
        assertEquals("1.73205", r.get(0).re().abs().decimal(6).text()); // sqrt(3) = 1.7320508..., from memory
        assertEquals("1.73205", CertifiedReal.max(List.of(r.get(0).re().abs(), r.get(2).re())).decimal(6).text());
    }

    @Test
    void repeatedRootsAreGivenOnce() {
        // (x^2 + 1)^2 (x - 1/3)
        List<Rational> q = List.of(Rational.ONE, Rational.ZERO, Rational.ONE);
        List<CertifiedComplex> r = CertifiedRoots.of(times(times(q, q), List.of(Rational.of(-1, 3), Rational.ONE)));
        assertEquals(3, r.size());
        assertEquals("0.333", r.get(0).re().decimal(3).text());
        assertEquals("1", r.get(1).im().decimal(3).text());
        assertEquals("-1", r.get(2).im().decimal(3).text());
    }
}
