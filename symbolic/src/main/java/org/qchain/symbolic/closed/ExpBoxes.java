package org.qchain.symbolic.closed;

import java.math.BigInteger;
import org.qchain.exact.Rational;
import org.qchain.exact.certified.CertifiedComplex;
import org.qchain.exact.certified.Enclosure;

/**
 * Rigorous complex interval arithmetic in fixed point, for evaluating the closed form of P(t) at a rational time:
 * every number is a rectangle {@code [reLo, reHi] x [imLo, imHi]} of integers at the scale {@code 2^-p}, and every
 * operation rounds its ends outwards, so the true value always lies inside (Moore, Kearfott and Cloud, Introduction to
 * Interval Analysis, ch. 2 and 3, from memory). {@code exp(z)} is enclosed by scaling and squaring:
 * {@code w = z/2^k} with {@code |w| <= 1/2}, the Taylor series of {@code e^w} cut after N terms with the rest bounded
 * by {@code 2 |w|^(N+1)/(N+1)!} (a geometric tail with ratio at most 1/2), then k complex squarings. No
 * range reduction by pi is needed, so the imaginary parts of complex eigenvalues are handled like the real ones.
 */
final class ExpBoxes {
    /** Fractional bits of every number. */
    final int p;

    ExpBoxes(int p) {
        this.p = p;
    }

    /** A complex rectangle at the context's scale. */
    record Box(BigInteger reLo, BigInteger reHi, BigInteger imLo, BigInteger imHi) {
    }

    Box zero() {
        return new Box(BigInteger.ZERO, BigInteger.ZERO, BigInteger.ZERO, BigInteger.ZERO);
    }

    Box one() {
        BigInteger one = BigInteger.ONE.shiftLeft(p);
        return new Box(one, one, BigInteger.ZERO, BigInteger.ZERO);
    }

    /** A rational as a (real) box. */
    Box of(Rational r) {
        return new Box(floor(r), ceil(r), BigInteger.ZERO, BigInteger.ZERO);
    }

    /** A certified complex number as a box, from enclosures of its parts at the context's precision. */
    Box of(CertifiedComplex z) {
        Enclosure re = z.re().enclosure(p);
        Enclosure im = z.im().enclosure(p);
        return new Box(floor(re.lo()), ceil(re.hi()), floor(im.lo()), ceil(im.hi()));
    }

    private BigInteger floor(Rational r) {
        BigInteger[] qr = r.numerator().shiftLeft(p).divideAndRemainder(r.denominator());
        return qr[1].signum() < 0 ? qr[0].subtract(BigInteger.ONE) : qr[0];
    }

    private BigInteger ceil(Rational r) {
        return floor(r.negate()).negate();
    }

    Box add(Box a, Box b) {
        return new Box(a.reLo.add(b.reLo), a.reHi.add(b.reHi), a.imLo.add(b.imLo), a.imHi.add(b.imHi));
    }

    /** The box times a rational, ends rounded outwards. */
    Box scale(Box a, Rational c) {
        BigInteger n = c.numerator();
        BigInteger d = c.denominator();
        BigInteger[] re = ordered(a.reLo.multiply(n), a.reHi.multiply(n));
        BigInteger[] im = ordered(a.imLo.multiply(n), a.imHi.multiply(n));
        return new Box(floorDiv(re[0], d), ceilDiv(re[1], d), floorDiv(im[0], d), ceilDiv(im[1], d));
    }

    private static BigInteger[] ordered(BigInteger x, BigInteger y) {
        return x.compareTo(y) <= 0 ? new BigInteger[] {x, y} : new BigInteger[] {y, x};
    }

    private static BigInteger floorDiv(BigInteger x, BigInteger d) {
        BigInteger[] qr = x.divideAndRemainder(d);
        return qr[1].signum() < 0 ? qr[0].subtract(BigInteger.ONE) : qr[0];
    }

    private static BigInteger ceilDiv(BigInteger x, BigInteger d) {
        return floorDiv(x.negate(), d).negate();
    }

    /** Interval product {@code [a, b] * [c, d]} at scale 2^-2p, as its lower and upper end. */
    private static BigInteger[] product(BigInteger a, BigInteger b, BigInteger c, BigInteger d) {
        BigInteger ac = a.multiply(c);
        BigInteger ad = a.multiply(d);
        BigInteger bc = b.multiply(c);
        BigInteger bd = b.multiply(d);
        return new BigInteger[] {ac.min(ad).min(bc.min(bd)), ac.max(ad).max(bc.max(bd))};
    }

    /** The complex product, ends rounded outwards. */
    Box multiply(Box x, Box y) {
        BigInteger[] rr = product(x.reLo, x.reHi, y.reLo, y.reHi);
        BigInteger[] ii = product(x.imLo, x.imHi, y.imLo, y.imHi);
        BigInteger[] ri = product(x.reLo, x.reHi, y.imLo, y.imHi);
        BigInteger[] ir = product(x.imLo, x.imHi, y.reLo, y.reHi);
        // floor of a right shift is shiftRight; the ceiling is minus the floor of minus
        BigInteger reLo = rr[0].subtract(ii[1]).shiftRight(p);
        BigInteger reHi = rr[1].subtract(ii[0]).negate().shiftRight(p).negate();
        BigInteger imLo = ri[0].add(ir[0]).shiftRight(p);
        BigInteger imHi = ri[1].add(ir[1]).negate().shiftRight(p).negate();
        return new Box(reLo, reHi, imLo, imHi);
    }

    /** An upper bound of the modulus at scale 2^-p: |re| max plus |im| max. */
    private static BigInteger modulusBound(Box z) {
        return z.reLo.abs().max(z.reHi.abs()).add(z.imLo.abs().max(z.imHi.abs()));
    }

    /** {@code e^z}, by scaling and squaring with a bounded Taylor remainder. */
    Box exp(Box z) {
        BigInteger half = BigInteger.ONE.shiftLeft(p - 1);
        int k = 0;
        BigInteger m = modulusBound(z);
        while (m.compareTo(half.shiftLeft(k)) > 0) {
            k++;
        }
        // w = z / 2^k, ends rounded outwards (a floor shift of the lower ends, a ceiling shift of the upper ones)
        Box w = new Box(z.reLo.shiftRight(k), z.reHi.negate().shiftRight(k).negate(), z.imLo.shiftRight(k),
            z.imHi.negate().shiftRight(k).negate());
        Box sum = one();
        Box term = one();
        // N terms with 2^-N / N! below 2^-(p+2): the rest, at most 2 |w|^(N+1)/(N+1)!, is below 2^-p
        double log2Fact = 0;
        int n = 1;
        for (; ; n++) {
            term = scale(multiply(term, w), Rational.of(1, n));
            sum = add(sum, term);
            log2Fact += Math.log(n + 1) / Math.log(2);
            if (n + 1 + log2Fact > p + 3) {
                break;
            }
        }
        BigInteger r = BigInteger.ONE;
        sum = new Box(sum.reLo.subtract(r), sum.reHi.add(r), sum.imLo.subtract(r), sum.imHi.add(r));
        for (int s = 0; s < k; s++) {
            sum = multiply(sum, sum);
        }
        return sum;
    }

    /** The real part of a box as an enclosure. */
    Enclosure real(Box b) {
        return Enclosure.of(Rational.dyadic(b.reLo, p), Rational.dyadic(b.reHi, p));
    }
}
