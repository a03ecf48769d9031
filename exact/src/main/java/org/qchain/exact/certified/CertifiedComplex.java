package org.qchain.exact.certified;

/**
 * A complex number whose real and imaginary parts are {@link CertifiedReal}s: an eigenvalue or a root at a point,
 * shown to any number of proven digits.
 *
 * @param re the real part
 * @param im the imaginary part (exactly 0 for a real number)
 */
public record CertifiedComplex(CertifiedReal re, CertifiedReal im) {

    /**
     * A real number.
     *
     * @param x the value
     * @return {@code x + 0 i}
     */
    public static CertifiedComplex real(CertifiedReal x) {
        return new CertifiedComplex(x, CertifiedReal.exact(org.qchain.exact.Rational.ZERO));
    }

    /** Whether the imaginary part is exactly 0. */
    public boolean isReal() {
        return im.isZero();
    }
}
