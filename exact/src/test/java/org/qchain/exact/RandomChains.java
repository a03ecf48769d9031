package org.qchain.exact;

import java.util.Random;

/** Random test matrices from a fixed seed (test data only; never used as reference values). */
final class RandomChains {
    private RandomChains() {
    }

    /**
     * A random stochastic matrix: row {@code i} has its own denominator in {@code [1, maxDen]} split into
     * {@code size} non-negative parts; with {@code sparsity} in [0, 1) most of the parts go to a few columns.
     */
    static RationalMatrix stochastic(Random rnd, int size, int maxDen, double sparsity) {
        Rational[][] e = new Rational[size][size];
        for (int i = 0; i < size; i++) {
            int q = 1 + rnd.nextInt(maxDen);
            int[] parts = new int[size];
            boolean[] allowed = new boolean[size];
            int allowedCount = 0;
            for (int j = 0; j < size; j++) {
                allowed[j] = rnd.nextDouble() >= sparsity;
                allowedCount += allowed[j] ? 1 : 0;
            }
            if (allowedCount == 0) {
                allowed[rnd.nextInt(size)] = true;
            }
            int left = q;
            while (left > 0) {
                int j = rnd.nextInt(size);
                if (allowed[j]) {
                    parts[j]++;
                    left--;
                }
            }
            for (int j = 0; j < size; j++) {
                e[i][j] = Rational.of(parts[j], q);
            }
        }
        return RationalMatrix.of(e);
    }

    /** A random square matrix with signed entries {@code a/b}, {@code |a| <= maxNum}, {@code 1 <= b <= maxDen}. */
    static RationalMatrix signed(Random rnd, int size, int maxNum, int maxDen) {
        Rational[][] e = new Rational[size][size];
        for (int i = 0; i < size; i++) {
            for (int j = 0; j < size; j++) {
                e[i][j] = rnd.nextInt(3) == 0 ? Rational.ZERO
                        : Rational.of(rnd.nextInt(2 * maxNum + 1) - maxNum, 1 + rnd.nextInt(maxDen));
            }
        }
        return RationalMatrix.of(e);
    }

    /** The product of {@code n} copies of {@code p} by plain multiplication (a slow independent reference). */
    static RationalMatrix naivePower(RationalMatrix p, int n) {
        RationalMatrix r = RationalMatrix.identity(p.rows());
        for (int i = 0; i < n; i++) {
            r = r.multiply(p);
        }
        return r;
    }
}
