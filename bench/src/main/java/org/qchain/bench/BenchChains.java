package org.qchain.bench;

import java.util.Random;
import org.hipparchus.fraction.BigFraction;
import org.hipparchus.fraction.BigFractionField;
import org.hipparchus.linear.Array2DRowFieldMatrix;
import org.hipparchus.linear.FieldMatrix;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;

/** The benchmark chains, generated from fixed seeds so every run measures the same numbers. */
public final class BenchChains {
    private BenchChains() {
    }

    /** Divisors of 240 that are at least 20: row denominators of the dense case with common denominator 240. */
    public static final int[] DIVISORS_OF_240 = {20, 24, 30, 40, 48, 60, 80, 120, 240};

    /** Row denominators of decimal probabilities with one to three decimals. */
    public static final int[] DECIMAL_DENOMINATORS = {10, 20, 50, 100, 1000};

    /**
     * A dense chain: every row picks a denominator from {@code dens} and splits it into {@code size} positive parts.
     */
    public static RationalMatrix dense(int size, long seed, int[] dens) {
        Random rnd = new Random(seed);
        Rational[][] e = new Rational[size][size];
        for (int i = 0; i < size; i++) {
            int q = dens[rnd.nextInt(dens.length)];
            int[] parts = split(rnd, q, size);
            for (int j = 0; j < size; j++) {
                e[i][j] = Rational.of(parts[j], q);
            }
        }
        return RationalMatrix.of(e);
    }

    /** The model text of a numeric chain (states S0, S1, ...; one line per non-zero off-diagonal entry). */
    public static String modelText(RationalMatrix p) {
        StringBuilder b = new StringBuilder("chain discrete\nstates");
        for (int i = 0; i < p.rows(); i++) {
            b.append(" S").append(i);
        }
        b.append('\n');
        for (int i = 0; i < p.rows(); i++) {
            for (int j = 0; j < p.rows(); j++) {
                if (i != j && p.get(i, j).signum() != 0) {
                    b.append('S').append(i).append(" S").append(j).append(' ').append(p.get(i, j)).append('\n');
                }
            }
        }
        return b.toString();
    }

    /** The dense numeric chains of the closed-form benchmarks: 12 and 20 states, row denominators 60, 120 or 240. */
    public static final int[] CLOSED_DENOMINATORS = {60, 120, 240};
    public static final long CLOSED_12_SEED = 12L;
    public static final long CLOSED_20_SEED = 20L;

    /** Row denominators drawn uniformly from {@code [lo, hi]}. */
    public static int[] range(int lo, int hi) {
        int[] r = new int[hi - lo + 1];
        for (int i = 0; i < r.length; i++) {
            r[i] = lo + i;
        }
        return r;
    }

    /**
     * A sparse chain: state {@code i} moves to {@code i+1} (a ring, so the chain is irreducible), stays, or jumps to
     * {@code perRow - 2} random states; row denominators from {@code dens}.
     */
    public static RationalMatrix sparse(int size, int perRow, long seed, int[] dens) {
        Random rnd = new Random(seed);
        Rational[][] e = new Rational[size][size];
        for (int i = 0; i < size; i++) {
            java.util.Arrays.fill(e[i], Rational.ZERO);
            int[] targets = new int[perRow];
            targets[0] = (i + 1) % size;
            targets[1] = i;
            for (int t = 2; t < perRow; t++) {
                targets[t] = rnd.nextInt(size);
            }
            int q = dens[rnd.nextInt(dens.length)];
            int[] parts = split(rnd, q, perRow);
            for (int t = 0; t < perRow; t++) {
                e[i][targets[t]] = e[i][targets[t]].add(Rational.of(parts[t], q));
            }
        }
        return RationalMatrix.of(e);
    }

    /** {@code q} as {@code k} positive parts (requires {@code q >= k}). */
    private static int[] split(Random rnd, int q, int k) {
        int[] parts = new int[k];
        java.util.Arrays.fill(parts, 1);
        for (int left = q - k; left > 0; left--) {
            parts[rnd.nextInt(k)]++;
        }
        return parts;
    }

    /** The same matrix as Hipparchus {@code BigFraction} entries (the baseline). */
    public static FieldMatrix<BigFraction> toHipparchus(RationalMatrix p) {
        BigFraction[][] e = new BigFraction[p.rows()][p.cols()];
        for (int i = 0; i < p.rows(); i++) {
            for (int j = 0; j < p.cols(); j++) {
                e[i][j] = new BigFraction(p.get(i, j).numerator(), p.get(i, j).denominator());
            }
        }
        return new Array2DRowFieldMatrix<>(BigFractionField.getInstance(), e);
    }
}
