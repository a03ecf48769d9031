package org.qchain.symbolic.closed;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.qchain.exact.MatrixPowers;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.model.Model;

/**
 * Repeated irreducible factors of degree 2 and 3 with a Jordan block: block upper-triangular chains
 * {@code [[A, cI, 0], [0, A, 0], [0, 0, 1]]} (the last state absorbing, so that the rows sum to 1). Derived by hand:
 * A and cI commute, so the upper right block of P^n is {@code c n A^(n-1)} (binomial theorem for commuting
 * matrices; common practice, no source), and with three copies of A chained by cI the corner block is
 * {@code c^2 binomial(n, 2) A^(n-2)}. Those entries are checked against the exact module's powers of A; every closed
 * form is also checked at n = 0 .. 2s against exact P^n ({@link Chains#assertMatchesPowers}).
 */
class JordanBlockTest {

    /** A 2x2 block with chi_A = x^2 - 3/4 x + 1/16, discriminant 5/16: irrational roots (3 +- sqrt(5))/8. */
    static final String[][] A2 = {{"1/2", "1/4"}, {"1/4", "1/4"}};
    /** A 3x3 block with chi_A = x^3 - 13/12 x^2 + 3/8 x - 1/16, irreducible over Q (no rational root). */
    private static final String[][] A3 = {{"1/2", "1/4", "0"}, {"0", "1/3", "1/3"}, {"1/4", "0", "1/4"}};
    private static final String C = "1/8";

    /**
     * {@code copies} copies of the block on the diagonal, {@code c I} on the first superdiagonal of blocks, and an
     * absorbing last state that takes what is left of each row (entries are expression text: the remainder is
     * written {@code 1 - (row)}).
     */
    static String[][] chained(String[][] a, int copies) {
        int b = a.length;
        int s = b * copies + 1;
        String[][] rows = new String[s][s];
        for (String[] r : rows) {
            java.util.Arrays.fill(r, "0");
        }
        for (int blk = 0; blk < copies; blk++) {
            for (int i = 0; i < b; i++) {
                List<String> used = new ArrayList<>();
                for (int j = 0; j < b; j++) {
                    rows[blk * b + i][blk * b + j] = a[i][j];
                    used.add(a[i][j]);
                }
                if (blk + 1 < copies) {
                    rows[blk * b + i][(blk + 1) * b + i] = C;
                    used.add(C);
                }
                rows[blk * b + i][s - 1] = "1 - (" + String.join(" + ", used) + ")";
            }
        }
        rows[s - 1][s - 1] = "1";
        return rows;
    }

    private static RationalMatrix block(String[][] a, Map<String, Rational> at) {
        Rational[][] r = new Rational[a.length][a.length];
        for (int i = 0; i < a.length; i++) {
            for (int j = 0; j < a.length; j++) {
                r[i][j] = org.qchain.exact.model.ModelParser.parseExpression("A", a[i][j]).evaluate(at::get);
            }
        }
        return RationalMatrix.of(r);
    }

    /** Entry (i, j) of c^k binomial(n, k) A^(n-k) (0 for n < k): the block k steps right of the diagonal. */
    private static Rational corner(RationalMatrix a, int k, int n, int i, int j) {
        if (n < k) {
            return Rational.ZERO;
        }
        Rational c = Rational.parse(C).pow(k).multiply(Rational.of(Evaluator.binomial(n, k).longValueExact()));
        return c.multiply(MatrixPowers.power(a, n - k).get(i, j));
    }

    @Test
    void repeatedIrrationalQuadraticWithAJordanBlock() {
        Model m = Chains.model(List.of(), chained(A2, 2));
        ClosedForm cf = ClosedForms.of(m);
        Eigenvalue pair = cf.eigenvalues().get(1);
        assertEquals("quadratic", pair.kind(), cf.eigenvalues().toString());
        assertEquals("x^2 - 3/4*x + 1/16", pair.factor());
        assertEquals(2, pair.multiplicity());
        assertEquals(2, pair.jordanIndex());
        assertEquals(List.of("3/8 + 1/8*sqrt(5)", "3/8 - 1/8*sqrt(5)"), pair.values());
        assertEquals(0, cf.validFrom());
        assertEquals(List.of(), cf.conditions());
        // the upper right block is 1/8 n A^(n-1): only Jordan terms, the (n - 1)-th powers of the pair
        String f02 = cf.formula(0, 2);
        assertTrue(f02.contains("n*((3/8 + 1/8*sqrt(5))^(n - 1) + (3/8 - 1/8*sqrt(5))^(n - 1))"), f02);
        assertFalse(f02.contains(")^n"), f02);
        RationalMatrix a = block(A2, Map.of());
        for (int n = 0; n <= 12; n++) {
            RationalMatrix pn = cf.evaluate(n, Map.of());
            for (int i = 0; i < 2; i++) {
                for (int j = 0; j < 2; j++) {
                    assertEquals(corner(a, 1, n, i, j), pn.get(i, 2 + j), "n=" + n);
                    assertEquals(corner(a, 0, n, i, j), pn.get(i, j), "n=" + n);
                }
            }
        }
        Chains.assertMatchesPowers(cf, m, List.of(Map.of()), 12);
    }

    @Test
    void jordanBlockOfSizeThreeOnAQuadraticGivesBinomialTwo() {
        Model m = Chains.model(List.of(), chained(A2, 3));
        ClosedForm cf = ClosedForms.of(m);
        Eigenvalue pair = cf.eigenvalues().get(1);
        assertEquals(3, pair.multiplicity());
        assertEquals(3, pair.jordanIndex());
        assertTrue(cf.formula(0, 4).contains("binomial(n, 2)*((3/8 + 1/8*sqrt(5))^(n - 2) + "), cf.formula(0, 4));
        RationalMatrix a = block(A2, Map.of());
        for (int n = 0; n <= 14; n++) {
            RationalMatrix pn = cf.evaluate(n, Map.of());
            assertEquals(corner(a, 2, n, 0, 0), pn.get(0, 4), "n=" + n);
            assertEquals(corner(a, 2, n, 1, 0), pn.get(1, 4), "n=" + n);
            assertEquals(corner(a, 1, n, 0, 1), pn.get(2, 5), "n=" + n);
        }
        Chains.assertMatchesPowers(cf, m, List.of(Map.of()), 0);
    }

    @Test
    void printedRadicalTextReadsBackThroughSymja() {
        // the printed text itself, with n replaced by a number, simplified by Symja (a general-purpose CAS on Maven
        // Central, not our engine) to a rational number, equals exact P^n: the real combination of the conjugate
        // terms, the shifted exponents and the binomial factors are printed as they are evaluated
        Model m = Chains.model(List.of(), chained(A2, 3));
        ClosedForm cf = ClosedForms.of(m);
        RationalMatrix p = Chains.matrix(m, Map.of());
        org.qchain.symbolic.cas.SymjaSession cas = org.qchain.symbolic.cas.SymjaSession.open();
        int[][] entries = {{0, 0}, {0, 3}, {0, 4}, {1, 5}, {0, 6}};
        for (int n = 0; n <= 7; n++) {
            RationalMatrix pn = MatrixPowers.power(p, n);
            for (int[] e : entries) {
                String text = PrintedFormulaTest.atN(cf.formula(e[0], e[1]), n);
                String value = cas.eval("Together(Expand(" + text + "))");
                assertEquals(pn.get(e[0], e[1]), Rational.parse(value), "n=" + n + ": " + text);
            }
        }
    }

    @Test
    void repeatedQuadraticWithAFreeParameter() {
        // A = [[1/2, a], [1/4, 1/4]]: chi_A = x^2 - 3/4 x + 1/8 - a/4, discriminant a + 1/16, not a square in Q(a)
        String[][] a2 = {{"1/2", "a"}, {"1/4", "1/4"}};
        Model m = Chains.model(List.of("a"), chained(a2, 2));
        ClosedForm cf = ClosedForms.of(m);
        Eigenvalue pair = cf.eigenvalues().get(1);
        assertEquals("quadratic", pair.kind());
        assertEquals(2, pair.jordanIndex());
        // sqrt(D) stands in a denominator: D != 0, with D = 1 + 16a after the square factor 1/16 is pulled out
        assertTrue(cf.conditions().contains("1 + 16*a != 0"), cf.conditions().toString());
        assertTrue(cf.formula(0, 3).contains("^(n - 1)"), cf.formula(0, 3));
        for (Map<String, Rational> at : List.of(Chains.at("a", "1/8"), Chains.at("a", "1/5"))) {
            RationalMatrix a = block(a2, at);
            for (int n = 0; n <= 10; n++) {
                assertEquals(corner(a, 1, n, 0, 1), cf.evaluate(n, 0, 3, at), "n=" + n + " at " + at);
            }
        }
        Chains.assertMatchesPowers(cf, m, List.of(Chains.at("a", "1/8"), Chains.at("a", "1/5")), 10);
    }

    @Test
    void repeatedCubicWithAJordanBlockGivesShiftedRootSums() {
        Model m = Chains.model(List.of(), chained(A3, 2));
        ClosedForm cf = ClosedForms.of(m);
        Eigenvalue cubic = cf.eigenvalues().get(1);
        assertEquals("roots", cubic.kind(), cf.eigenvalues().toString());
        assertEquals("x^3 - 13/12*x^2 + 3/8*x - 1/16", cubic.factor());
        assertEquals(2, cubic.multiplicity());
        assertEquals(2, cubic.jordanIndex());
        String f03 = cf.formula(0, 3);
        assertTrue(f03.contains("*n*rootsum(n - 1, f1)"), f03);
        assertFalse(f03.contains("rootsum(n, f1)") && !f03.contains("n*rootsum(n, f1)"), f03);
        RationalMatrix a = block(A3, Map.of());
        for (int n = 0; n <= 14; n++) {
            RationalMatrix pn = cf.evaluate(n, Map.of());
            for (int i = 0; i < 3; i++) {
                for (int j = 0; j < 3; j++) {
                    assertEquals(corner(a, 1, n, i, j), pn.get(i, 3 + j), "n=" + n);
                }
            }
        }
        assertEquals(1, cf.rootPolynomials(Map.of()).size());
        Chains.assertMatchesPowers(cf, m, List.of(Map.of()), 14);
    }

    @Test
    void rotationBlocksWithAJordanBlock() {
        // [[B, I], [0, B]] with B = [[0, -1], [1, 0]] (not stochastic): chi = (x^2 + 1)^2, one Jordan block; derived by
        // hand: P^n = [[B^n, n B^(n-1)], [0, B^n]], so P^n_13 = n cos((n - 1) pi/2) and P^n_11 = cos(n pi/2)
        String[][] rows = {{"0", "-1", "1", "0"}, {"1", "0", "0", "1"}, {"0", "0", "0", "-1"}, {"0", "0", "1", "0"}};
        Model m = Chains.model(List.of(), rows);
        ClosedForm cf = ClosedForms.of(m);
        assertEquals("x^2 + 1", cf.eigenvalues().get(0).factor());
        assertEquals(2, cf.eigenvalues().get(0).jordanIndex());
        int[] cos = {1, 0, -1, 0};
        for (int n = 0; n <= 12; n++) {
            RationalMatrix pn = cf.evaluate(n, Map.of());
            assertEquals(Rational.of(cos[n % 4]), pn.get(0, 0), "n=" + n);
            assertEquals(n == 0 ? Rational.ZERO : Rational.of((long) n * cos[(n - 1) % 4]), pn.get(0, 2), "n=" + n);
        }
        Chains.assertMatchesPowers(cf, m, List.of(Map.of()), 12);
        // the series forms are unchanged: [(I - zB)^-1]_11 = 1/(1 + z^2) for the rotation block (derived by hand)
        SeriesForm sf = ClosedForms.series(m, Map.of());
        assertEquals("x^4 + 2*x^2 + 1", sf.characteristicPolynomial());
        assertEquals("1/(1 + z^2)", sf.generatingFunction(0, 0).plain());
    }

    @Test
    void randomBlockTriangularChainsAgreeWithPowers() {
        // fixed seed; A from small fractions, the coupling C = 1/8 (common practice, no source: P^n by definition)
        Random rnd = new Random(20261202L);
        String[] pool = {"1/2", "1/3", "1/4", "1/5", "1/6", "2/7", "1/10"};
        int checked = 0;
        for (int t = 0; t < 6; t++) {
            String[][] a = new String[2][2];
            for (String[] r : a) {
                r[0] = pool[rnd.nextInt(pool.length)];
                r[1] = pool[1 + rnd.nextInt(pool.length - 1)];
            }
            Model m = Chains.model(List.of(), chained(a, 2));
            ClosedForm cf = ClosedForms.of(m);
            Chains.assertMatchesPowers(cf, m, List.of(Map.of()), 0);
            checked += cf.eigenvalues().stream().anyMatch(e -> e.kind().equals("quadratic") && e.jordanIndex() == 2) ? 1 : 0;
        }
        assertTrue(checked >= 3, "most random blocks have an irreducible quadratic: " + checked);
    }
}
