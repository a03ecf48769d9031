package org.qchain.exact;

import java.math.BigInteger;
import java.util.stream.IntStream;
import org.apfloat.Apint;

/**
 * A square integer matrix with apfloat {@link Apint} entries (radix 16), for the late squarings of a matrix power
 * whose entries have grown past {@link BigMath#matrixApintBits}: the numbers stay in apfloat from the conversion
 * in to the conversion out, so the transform multiplication pays for the two conversions. Zero entries are
 * {@code null} and skipped.
 */
final class ApintMatrix {
    private final int n;
    private final Apint[][] e;
    private final int[][] nz;

    private ApintMatrix(Apint[][] e) {
        this.n = e.length;
        this.e = e;
        this.nz = new int[n][];
        for (int i = 0; i < n; i++) {
            int c = 0;
            for (Apint x : e[i]) {
                c += x == null ? 0 : 1;
            }
            nz[i] = new int[c];
            c = 0;
            for (int j = 0; j < n; j++) {
                if (e[i][j] != null) {
                    nz[i][c++] = j;
                }
            }
        }
    }

    /** Converts (rows in parallel; each conversion is linear in the size). */
    static ApintMatrix of(IntMatrix m, Thread caller) {
        Apint[][] e = new Apint[m.n][m.n];
        rows(m.n, caller, i -> {
            for (int j : m.nz[i]) {
                e[i][j] = BigMath.toApint(m.e[i][j]);
            }
        });
        return new ApintMatrix(e);
    }

    /** Converts back. */
    IntMatrix toIntMatrix(Thread caller) {
        BigInteger[][] out = new BigInteger[n][n];
        rows(n, caller, i -> {
            for (int j = 0; j < n; j++) {
                out[i][j] = e[i][j] == null ? BigInteger.ZERO : e[i][j].toBigInteger();
            }
        });
        return IntMatrix.of(out);
    }

    /** {@code this * o}. */
    ApintMatrix multiply(ApintMatrix o, Thread caller) {
        Apint[][] out = new Apint[n][];
        rows(n, caller, i -> {
            Apint[] acc = new Apint[n];
            for (int k : nz[i]) {
                Apint x = e[i][k];
                for (int j : o.nz[k]) {
                    Apint t = x.multiply(o.e[k][j]);
                    acc[j] = acc[j] == null ? t : acc[j].add(t);
                }
            }
            for (int j = 0; j < n; j++) {
                if (acc[j] != null && acc[j].signum() == 0) {
                    acc[j] = null;
                }
            }
            out[i] = acc;
        });
        return new ApintMatrix(out);
    }

    /** Runs {@code body} for every row, in parallel when there are several, each in apfloat's own context. */
    private static void rows(int n, Thread caller, java.util.function.IntConsumer body) {
        IntStream r = IntStream.range(0, n);
        if (n > 1 && Runtime.getRuntime().availableProcessors() > 1) {
            r = r.parallel();
        }
        r.forEach(i -> {
            MatrixPowers.checkInterrupt(caller);
            BigMath.inContext(() -> {
                body.accept(i);
                return null;
            });
        });
    }
}
