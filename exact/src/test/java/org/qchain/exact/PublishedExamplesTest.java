package org.qchain.exact;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Worked examples and closed forms from the literature. */
class PublishedExamplesTest {

    private static Rational r(String s) {
        return Rational.parse(s);
    }

    private static RationalMatrix m(String[][] e) {
        Rational[][] x = new Rational[e.length][e[0].length];
        for (int i = 0; i < e.length; i++) {
            for (int j = 0; j < e[i].length; j++) {
                x[i][j] = r(e[i][j]);
            }
        }
        return RationalMatrix.of(x);
    }

    /** The three-state weather chain (rain, nice, snow) of Grinstead and Snell, ch. 11, Example 11.1. */
    private static final RationalMatrix WEATHER = m(new String[][] {
        {"1/2", "1/4", "1/4"}, {"1/2", "0", "1/2"}, {"1/4", "1/4", "1/2"}});

    // Grinstead and Snell, Introduction to Probability, ch. 11 (Markov chains), Example 11.1, the two-step matrix
    // P^2 printed to three decimals as .438 .188 .375 / .375 .250 .375 / .375 .188 .438 (from memory); the exact
    // entries are 7/16, 3/16, 3/8 / 3/8, 1/4, 3/8 / 3/8, 3/16, 7/16
    @Test
    void weatherChainTwoSteps() {
        RationalMatrix p2 = m(new String[][] {
            {"7/16", "3/16", "3/8"}, {"3/8", "1/4", "3/8"}, {"3/8", "3/16", "7/16"}});
        assertEquals(p2, MatrixPowers.power(WEATHER, 2));
        String[][] printed = {{"0.438", "0.188", "0.375"}, {"0.375", "0.250", "0.375"}, {"0.375", "0.188", "0.438"}};
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                // the book's three-decimal display of 7/16 = 0.4375 reads .438 (half rounded up; half-even gives the
                // same here since 0.4375 -> 0.438 has an even last digit)
                assertEquals(printed[i][j], Decimals.format(MatrixPowers.power(WEATHER, 2).get(i, j), 3));
            }
        }
    }

    // Grinstead and Snell, Introduction to Probability, ch. 11, Example 11.1 continued: the table of powers shows
    // that by P^6 every row is .4 .2 .4 to three decimals (from memory)
    @Test
    void weatherChainSixSteps() {
        RationalMatrix p6 = MatrixPowers.power(WEATHER, 6);
        String[] expected = {"0.400", "0.200", "0.400"};
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                assertEquals(expected[j], Decimals.format(p6.get(i, j), 3), "(" + i + "," + j + ")");
            }
        }
    }

    // Grinstead and Snell, Introduction to Probability, ch. 11.3 (ergodic chains): the fixed vector of the weather
    // chain is w = (2/5, 1/5, 2/5) and the rows of P^n tend to w (from memory). The other eigenvalues are 1/4 and -1/4
    // (trace 1, determinant -1/16: common practice, no source), so |P^n - W| <= (1/4)^n entrywise
    @Test
    void weatherChainTendsToFixedVector() {
        Rational[] w = {r("2/5"), r("1/5"), r("2/5")};
        RationalMatrix wRow = RationalMatrix.of(new Rational[][] {w});
        assertEquals(wRow, wRow.multiply(WEATHER));
        for (int n : new int[] {10, 50, 200}) {
            RationalMatrix pn = MatrixPowers.power(WEATHER, n);
            Rational bound = r("1/4").pow(n);
            for (int i = 0; i < 3; i++) {
                for (int j = 0; j < 3; j++) {
                    assertTrue(pn.get(i, j).subtract(w[j]).abs().compareTo(bound) <= 0, "n=" + n);
                }
            }
        }
    }

    // J. R. Norris, Markov Chains, ch. 1.1 (the general two-state chain), also Grinstead and Snell ch. 11 exercises:
    // P^n = (1/(a+b)) [[b, a], [b, a]] + ((1-a-b)^n/(a+b)) [[a, -a], [-b, b]] for a + b > 0 (from memory)
    @Test
    void twoStateClosedForm() {
        String[][] ab = {{"1/10", "1/5"}, {"3/4", "2/3"}, {"1", "1"}, {"1/1000", "999/1000"}, {"2/7", "0"},
            {"0.05", "0.35"}};
        for (String[] x : ab) {
            Rational a = r(x[0]);
            Rational b = r(x[1]);
            RationalMatrix p = RationalMatrix.of(new Rational[][] {
                {Rational.ONE.subtract(a), a}, {b, Rational.ONE.subtract(b)}});
            Rational s = a.add(b);
            for (int n : new int[] {0, 1, 2, 3, 7, 64, 257, 1000}) {
                Rational t = Rational.ONE.subtract(s).pow(n).divide(s);
                Rational[][] e = {
                    {b.divide(s).add(t.multiply(a)), a.divide(s).subtract(t.multiply(a))},
                    {b.divide(s).subtract(t.multiply(b)), a.divide(s).add(t.multiply(b))}};
                RationalMatrix expected = RationalMatrix.of(e);
                assertEquals(expected, MatrixPowers.power(p, n), "a=" + a + " b=" + b + " n=" + n);
                assertEquals(expected.get(1, 0), MatrixPowers.entryOfPower(p, 1, 0, n));
            }
        }
    }
}
