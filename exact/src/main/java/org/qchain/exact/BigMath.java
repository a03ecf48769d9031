package org.qchain.exact;

import java.math.BigInteger;
import java.util.function.Supplier;
import org.apfloat.ApfloatContext;
import org.apfloat.Apint;
import org.apfloat.ApintMath;
import org.apfloat.spi.FilenameGenerator;

/**
 * Big-integer kernels that choose between {@link BigInteger} and apfloat's {@link Apint} by operand size.
 *
 * <p>Java 17's {@code BigInteger.multiply} is Karatsuba / Toom-Cook 3; apfloat multiplies by number-theoretic
 * transforms, which win on large operands, but converting between the two costs about as much as a multiplication
 * (cheapest in radix 16). So apfloat is used only where the numbers then stay in apfloat through many operations:
 * an integer power of a small base ({@link #pow}: one conversion, out), and the late squarings of a matrix power
 * ({@link ApintMatrix}: one conversion in, one out, per entry). The thresholds come from {@code MultiplyBench} and
 * {@code ExactEngineBench} (see {@code docs/performance.md}); the system property {@code qchain.exact.apint} set to
 * {@code never} or {@code always} overrides them, for those benchmarks.
 *
 * <p>apfloat work runs in a thread context of our own (memory threshold a quarter of the heap, disk storage in the
 * temporary directory, cleaned at exit), so it does not depend on global settings that other libraries may have
 * changed.
 */
final class BigMath {
    /**
     * Result size in bits (about a million decimal digits) from which {@code ApintMath.pow} plus one conversion
     * beats {@code BigInteger.pow}.
     */
    static final long DEFAULT_POW_APINT_BITS = 3_300_000;
    /**
     * Operand size in bits (about a million decimal digits) from which a matrix power continues its squarings in
     * apfloat: there {@code Apint.multiply} takes about half the time of {@code BigInteger.multiply}, and the two
     * conversions per entry cost less than the saving on the {@code s} multiplications per entry of one squaring.
     */
    static final long DEFAULT_MATRIX_APINT_BITS = 3_300_000;

    /** The thresholds in force (tests set them to exercise both paths on small numbers). */
    static volatile long powApintBits;
    static volatile long matrixApintBits;

    static {
        setMode(System.getProperty("qchain.exact.apint", "auto"));
    }

    /** {@code never}, {@code always} or {@code auto} (the measured thresholds). */
    static void setMode(String mode) {
        switch (mode) {
            case "never":
                powApintBits = Long.MAX_VALUE;
                matrixApintBits = Long.MAX_VALUE;
                break;
            case "always":
                powApintBits = 0;
                matrixApintBits = 0;
                break;
            default:
                powApintBits = DEFAULT_POW_APINT_BITS;
                matrixApintBits = DEFAULT_MATRIX_APINT_BITS;
        }
    }

    private BigMath() {
    }

    /** {@code b^e}, {@code e >= 0}. */
    static BigInteger pow(BigInteger b, int e) {
        if (e < 2 || b.bitLength() <= 1 || (long) b.bitLength() * e < powApintBits) {
            return b.pow(e);
        }
        return inContext(() -> ApintMath.pow(toApint(b), e).toBigInteger());
    }

    /** {@code x} in radix 16, the cheap conversion. */
    static Apint toApint(BigInteger x) {
        return new Apint(x, 16);
    }

    /** Runs apfloat work in this package's own thread context, restoring whatever the thread had. */
    static <T> T inContext(Supplier<T> work) {
        ApfloatContext previous = ApfloatContext.getThreadContext();
        ApfloatContext.setThreadContext(Own.CONTEXT);
        try {
            return work.get();
        } finally {
            if (previous == null || previous == ApfloatContext.getGlobalContext()) {
                ApfloatContext.removeThreadContext();
            } else {
                ApfloatContext.setThreadContext(previous);
            }
        }
    }

    /** The context, built once. */
    private static final class Own {
        static final ApfloatContext CONTEXT = build();

        private static ApfloatContext build() {
            ApfloatContext c = (ApfloatContext) ApfloatContext.getGlobalContext().clone();
            long heap = Runtime.getRuntime().maxMemory();
            c.setNumberOfProcessors(Math.max(1, Runtime.getRuntime().availableProcessors()));
            c.setMaxMemoryBlockSize(Math.max(64L << 20, heap / 4));
            c.setMemoryThreshold(Math.max(16L << 20, Math.min(heap / 4, 1L << 30)));
            c.setSharedMemoryTreshold(Math.max(8L << 20, Math.min(heap / 16, 256L << 20)));
            c.setBlockSize(4 << 20);
            c.setCleanupAtExit(true);
            c.setFilenameGenerator(new FilenameGenerator(System.getProperty("java.io.tmpdir"), "0", ".ap"));
            return c;
        }
    }
}
