package org.qchain.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Random;
import org.hipparchus.fraction.BigFraction;
import org.hipparchus.fraction.BigFractionField;
import org.hipparchus.linear.Array2DRowFieldMatrix;
import org.hipparchus.linear.FieldLUDecomposition;
import org.hipparchus.linear.FieldMatrix;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.linear.LinearSolver;

/**
 * One-shot timings of the exact linear solver (issue 9) against Hipparchus {@code FieldLUDecomposition} over
 * {@code BigFraction} in the same run: absorption probabilities and mean steps of a 300-state banded chain
 * (bandwidth 5, integer weights 1..100, one absorbing state), and the stationary law of a 200-state dense chain
 * (weights 1..100). Fixed seeds. Usage: {@code java -cp bench/target/benchmarks.jar
 * org.qchain.bench.LinearSolveBench [repeats] [hipparchus: yes|no] [dir to write the two models into]}.
 */
public final class LinearSolveBench {
    private LinearSolveBench() {
    }

    static long[][] banded(int n, Random rnd) {
        long[][] w = new long[n][n];
        for (int i = 0; i < n - 1; i++) {
            for (int j = Math.max(0, i - 2); j <= Math.min(n - 1, i + 2); j++) {
                w[i][j] = 1 + rnd.nextInt(100);
            }
        }
        w[n - 1][n - 1] = 1;
        return w;
    }

    static long[][] dense(int n, Random rnd) {
        long[][] w = new long[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                w[i][j] = 1 + rnd.nextInt(100);
            }
        }
        return w;
    }

    static Rational[][] stochastic(long[][] w) {
        int n = w.length;
        Rational[][] p = new Rational[n][n];
        for (int i = 0; i < n; i++) {
            long s = 0;
            for (long x : w[i]) {
                s += x;
            }
            for (int j = 0; j < n; j++) {
                p[i][j] = Rational.of(w[i][j], s);
            }
        }
        return p;
    }

    /** (I − Q) and [1 | R] on the transient states 0..n−2 (state n−1 absorbing). */
    static RationalMatrix[] absorptionSystem(Rational[][] p) {
        int k = p.length - 1;
        Rational[][] a = new Rational[k][k];
        Rational[][] b = new Rational[k][2];
        for (int i = 0; i < k; i++) {
            for (int j = 0; j < k; j++) {
                a[i][j] = (i == j ? Rational.ONE : Rational.ZERO).subtract(p[i][j]);
            }
            b[i][0] = Rational.ONE;
            b[i][1] = p[i][k];
        }
        return new RationalMatrix[] {RationalMatrix.of(a), RationalMatrix.of(b)};
    }

    static RationalMatrix minusIdentity(Rational[][] p) {
        int n = p.length;
        Rational[][] a = new Rational[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                a[i][j] = i == j ? p[i][j].subtract(Rational.ONE) : p[i][j];
            }
        }
        return RationalMatrix.of(a);
    }

    static FieldMatrix<BigFraction> hip(RationalMatrix m) {
        BigFraction[][] e = new BigFraction[m.rows()][m.cols()];
        for (int i = 0; i < m.rows(); i++) {
            for (int j = 0; j < m.cols(); j++) {
                e[i][j] = new BigFraction(m.get(i, j).numerator(), m.get(i, j).denominator());
            }
        }
        return new Array2DRowFieldMatrix<>(BigFractionField.getInstance(), e, false);
    }

    static void write(Path file, String header, Rational[][] p) throws IOException {
        StringBuilder sb = new StringBuilder(header).append("chain discrete\nstates");
        for (int i = 0; i < p.length; i++) {
            sb.append(" S").append(i);
        }
        sb.append('\n');
        for (int i = 0; i < p.length; i++) {
            for (int j = 0; j < p.length; j++) {
                if (!p[i][j].isZero() && i != j) {
                    sb.append('S').append(i).append(" S").append(j).append(' ').append(p[i][j]).append('\n');
                }
            }
        }
        Files.writeString(file, sb.toString());
    }

    public static void main(String[] args) throws IOException {
        int repeats = args.length > 0 ? Integer.parseInt(args[0]) : 5;
        boolean baseline = args.length <= 1 || args[1].equals("yes");
        Rational[][] band = stochastic(banded(300, new Random(300)));
        Rational[][] full = stochastic(dense(200, new Random(200)));
        if (args.length > 2) {
            Path dir = Path.of(args[2]);
            write(dir.resolve("banded300.chain"), "# Benchmark chain (generated, seed 300): 300 states, bandwidth 5\n",
                band);
            write(dir.resolve("dense200.chain"), "# Benchmark chain (generated, seed 200): 200 states, dense\n", full);
        }
        RationalMatrix[] sys = absorptionSystem(band);
        RationalMatrix pMinusI = minusIdentity(full);
        // warm-up
        LinearSolver.solve(sys[0], sys[1]);
        LinearSolver.leftNullVector(pMinusI);
        long best1 = Long.MAX_VALUE;
        long best2 = Long.MAX_VALUE;
        RationalMatrix x = null;
        Rational[] pi = null;
        for (int r = 0; r < repeats; r++) {
            long t0 = System.nanoTime();
            x = LinearSolver.solve(sys[0], sys[1]);
            long t1 = System.nanoTime();
            pi = LinearSolver.leftNullVector(pMinusI);
            long t2 = System.nanoTime();
            best1 = Math.min(best1, t1 - t0);
            best2 = Math.min(best2, t2 - t1);
        }
        System.out.printf("qchain banded-300 absorption (t and B): best of %d: %.3f s; t(S0) has %d digits%n", repeats,
            best1 / 1e9, x.get(0, 0).numerator().toString().length() + x.get(0, 0).denominator().toString().length());
        System.out.printf("qchain dense-200 stationary law:        best of %d: %.3f s; pi(S0) has %d digits%n", repeats,
            best2 / 1e9, pi[0].numerator().toString().length() + pi[0].denominator().toString().length());
        if (baseline) {
            long t0 = System.nanoTime();
            FieldMatrix<BigFraction> hx = new FieldLUDecomposition<>(hip(sys[0])).getSolver().solve(hip(sys[1]));
            long t1 = System.nanoTime();
            boolean same = hx.getEntry(0, 0).equals(new BigFraction(x.get(0, 0).numerator(), x.get(0, 0).denominator()));
            System.out.printf("Hipparchus FieldLUDecomposition banded-300: %.3f s (same t(S0): %s)%n", (t1 - t0) / 1e9,
                same);
            Rational[][] at = new Rational[200][200];
            for (int i = 0; i < 200; i++) {
                for (int j = 0; j < 200; j++) {
                    at[j][i] = j == 199 ? Rational.ONE : pMinusI.get(i, j);
                }
            }
            Rational[][] e = new Rational[200][1];
            for (int i = 0; i < 200; i++) {
                e[i][0] = i == 199 ? Rational.ONE : Rational.ZERO;
            }
            long t2 = System.nanoTime();
            FieldMatrix<BigFraction> hp = new FieldLUDecomposition<>(hip(RationalMatrix.of(at))).getSolver()
                .solve(hip(RationalMatrix.of(e)));
            long t3 = System.nanoTime();
            boolean same2 = hp.getEntry(0, 0).equals(new BigFraction(pi[0].numerator(), pi[0].denominator()));
            System.out.printf("Hipparchus FieldLUDecomposition dense-200: %.3f s (same pi(S0): %s)%n", (t3 - t2) / 1e9,
                same2);
        }
    }
}
