package org.qchain.exact.model;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.math.BigDecimal;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;

/**
 * Property (fixed seeds): a random stochastic matrix written out as a model file (with random layout, comments,
 * line endings, decimals or fractions, listed or implied diagonals) and as a CSV file reads back to exactly that
 * matrix. Common practice, no source: the rows of a stochastic matrix sum to 1.
 */
class RandomModelsTest {

    @Test
    void randomChainsReadBackExactlyFromBothFormats() {
        Random rnd = new Random(424242L);
        for (int k = 0; k < 300; k++) {
            int n = 1 + rnd.nextInt(6);
            Rational[][] p = randomStochastic(rnd, n);
            RationalMatrix expected = RationalMatrix.of(p);
            String nl = rnd.nextBoolean() ? "\n" : "\r\n";
            assertEquals(expected, Chains.transitionMatrix(ModelParser.parse("r.chain", modelText(rnd, p, nl))));
            assertEquals(expected, Chains.transitionMatrix(ModelParser.parseCsv("r.csv", csvText(rnd, p, nl))));
        }
    }

    static Rational[][] randomStochastic(Random rnd, int n) {
        int[] dens = {2, 3, 4, 5, 8, 10, 20, 25, 100, 240};
        Rational[][] p = new Rational[n][n];
        for (int i = 0; i < n; i++) {
            Rational left = Rational.ONE;
            for (int j = 0; j < n; j++) {
                if (j == n - 1) {
                    p[i][j] = left;
                } else if (rnd.nextInt(3) == 0) {
                    p[i][j] = Rational.ZERO;
                } else {
                    int d = dens[rnd.nextInt(dens.length)];
                    Rational v = Rational.of(rnd.nextInt(d + 1), d).min(left);
                    p[i][j] = v;
                    left = left.subtract(v);
                }
            }
        }
        return p;
    }

    /** The value as a decimal if it has a finite one and the coin says so, else as p/q. */
    static String write(Random rnd, Rational v) {
        if (rnd.nextBoolean()) {
            try {
                BigDecimal d = new BigDecimal(v.numerator()).divide(new BigDecimal(v.denominator()));
                return d.toPlainString();
            } catch (ArithmeticException notFinite) {
                // fall through to the fraction
            }
        }
        return v.toString();
    }

    static String modelText(Random rnd, Rational[][] p, String nl) {
        int n = p.length;
        StringBuilder sb = new StringBuilder();
        if (rnd.nextBoolean()) {
            sb.append("# random chain").append(nl).append("chain discrete").append(nl);
        }
        sb.append(nl).append("states");
        for (int i = 0; i < n; i++) {
            sb.append(rnd.nextBoolean() ? " " : "\t ").append("X").append(i);
        }
        sb.append(nl);
        for (int i = 0; i < n; i++) {
            boolean listDiagonal = rnd.nextBoolean();
            for (int j = 0; j < n; j++) {
                boolean list = i == j ? listDiagonal : !p[i][j].isZero() || rnd.nextInt(4) == 0;
                if (list) {
                    sb.append(rnd.nextBoolean() ? "" : "  ").append("X").append(i).append(' ').append("X").append(j)
                        .append("   ").append(write(rnd, p[i][j]));
                    if (rnd.nextInt(3) == 0) {
                        sb.append("  # note");
                    }
                    sb.append(nl);
                }
            }
        }
        return sb.toString();
    }

    static String csvText(Random rnd, Rational[][] p, String nl) {
        int n = p.length;
        StringBuilder sb = new StringBuilder();
        boolean header = rnd.nextBoolean();
        if (header) {
            for (int j = 0; j < n; j++) {
                sb.append(j == 0 ? "" : ",").append(rnd.nextBoolean() ? "\"X" + j + "\"" : "X" + j);
            }
            sb.append(nl);
        }
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                sb.append(j == 0 ? "" : ",").append(rnd.nextInt(4) == 0 ? " " : "").append(write(rnd, p[i][j]));
            }
            if (i < n - 1 || rnd.nextBoolean()) {
                sb.append(nl);
            }
        }
        return sb.toString();
    }
}
