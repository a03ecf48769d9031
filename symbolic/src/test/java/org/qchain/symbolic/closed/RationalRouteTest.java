package org.qchain.symbolic.closed;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.function.Supplier;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.parallel.Isolated;
import org.qchain.exact.MatrixPowers;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.model.Model;

/**
 * The integer route for parameter-free chains ({@link RationalRoute}) against the general route over Q(parameters)
 * ({@code Quotient} arithmetic, forced with {@link RationalRoute#GENERAL_ROUTE_PROPERTY}): every printed entry of
 * every form (matrix, LaTeX, generating function, recurrence), the eigenvalues, conditions, valid_from and the long
 * run are identical, on random chains with fixed seeds: dense ones (an irreducible factor of high degree), sparse
 * ones with absorbing states (eigenvalue 1 repeated, Jordan blocks of eigenvalue 0), and cyclic ones (roots of
 * unity). Both also equal the exact module's P^n by repeated squaring at several n (common practice, no source: P^n is
 * defined by repeated multiplication).
 */
// runs alone: it sets a system property that every closed form of the other classes reads
@Isolated
class RationalRouteTest {

    /** A dense chain: row i splits a denominator q_i into s positive parts. */
    private static Model dense(Random rnd, int s) {
        String[][] rows = new String[s][s];
        for (int i = 0; i < s; i++) {
            int q = 2 * s + rnd.nextInt(40);
            int[] parts = new int[s];
            java.util.Arrays.fill(parts, 1);
            for (int k = s; k < q; k++) {
                parts[rnd.nextInt(s)]++;
            }
            for (int j = 0; j < s; j++) {
                rows[i][j] = parts[j] + "/" + q;
            }
        }
        return Chains.model(List.of(), rows);
    }

    /**
     * A sparse chain: a few entries a row from a small pool, some rows absorbing, some with a zero diagonal; gives
     * repeated eigenvalues 1 and 0 (Jordan blocks) and rational eigenvalues.
     */
    private static Model sparse(Random rnd, int s) {
        String[] pool = {"1/2", "1/3", "1/4", "1/6", "2/5"};
        String[][] rows = new String[s][s];
        for (int i = 0; i < s; i++) {
            java.util.Arrays.fill(rows[i], "0");
            if (rnd.nextInt(4) == 0) {
                rows[i][i] = "1";
                continue;
            }
            String p = pool[rnd.nextInt(pool.length)];
            int a = rnd.nextInt(s);
            int b = rnd.nextInt(s);
            if (a == b) {
                rows[i][a] = "1";
            } else {
                rows[i][a] = p;
                rows[i][b] = "1 - " + p;
            }
        }
        return Chains.model(List.of(), rows);
    }

    /** A cycle S1 -> S2 -> ... -> Ss -> S1 with a leak to S1 from one state: roots of unity and other roots. */
    private static Model cyclic(Random rnd, int s) {
        String[][] rows = new String[s][s];
        for (String[] r : rows) {
            java.util.Arrays.fill(r, "0");
        }
        int leak = rnd.nextInt(s - 1) + 1;
        for (int i = 0; i < s; i++) {
            int next = (i + 1) % s;
            if (i == leak && next != 0) {
                rows[i][next] = "2/3";
                rows[i][0] = "1/3";
            } else {
                rows[i][next] = "1";
            }
        }
        return Chains.model(List.of(), rows);
    }

    /** Everything a closed form prints, in every form, as text. */
    private static List<Object> printed(ClosedForm cf) {
        List<Object> out = new ArrayList<>();
        out.add(cf.matrix());
        out.add(cf.validFrom());
        out.add(cf.conditions());
        out.add(cf.eigenvalues());
        out.add(cf.longRun());
        out.add(cf.series().characteristicPolynomial());
        out.add(cf.initial(Math.max(cf.validFrom(), 1)));
        int s = cf.states().size();
        for (int i = 0; i < s; i++) {
            for (int j = 0; j < s; j++) {
                out.add(cf.latex(i, j));
                out.add(cf.validFrom(i, j));
                out.add(cf.generatingFunction(i, j));
                out.add(cf.recurrence(i, j));
            }
        }
        for (RootPolynomial rp : cf.rootPolynomials(Map.of())) {
            out.add(rp.name() + " = " + rp.polynomial());
            for (org.qchain.exact.certified.CertifiedComplex z : rp.roots()) {
                out.add(z.re().decimal(15).text() + " " + z.im().decimal(15).text());
            }
        }
        out.add(cf.rateAt(Map.of()).decimal(15).text());
        return out;
    }

    private static <T> T generalRoute(Supplier<T> work) {
        System.setProperty(RationalRoute.GENERAL_ROUTE_PROPERTY, "true");
        try {
            return work.get();
        } finally {
            System.clearProperty(RationalRoute.GENERAL_ROUTE_PROPERTY);
        }
    }

    private static void assertSameAsGeneralRoute(Model m, String what) {
        ClosedForm fast = ClosedForms.of(m);
        ClosedForm general = generalRoute(() -> ClosedForms.of(m));
        assertEquals(printed(general), printed(fast), what);
        assertEquals(generalRoute(() -> ClosedForms.series(m, Map.of()).characteristicPolynomial()),
            ClosedForms.series(m, Map.of()).characteristicPolynomial(), what + ": series form");
        RationalMatrix p = Chains.matrix(m, Map.of());
        for (long n : new long[] {0, 1, 2, 7, m.size() + 3L, 40}) {
            RationalMatrix exact = MatrixPowers.power(p, n);
            assertEquals(exact, fast.evaluate(n, Map.of()), what + ": P^" + n);
            assertEquals(exact, general.evaluate(n, Map.of()), what + ": general route, P^" + n);
        }
    }

    /** {@code count} chains of 3 .. 2 + spread states from the generator agree; returns them. */
    private static List<Model> assertAllAgree(long seed, int count, int spread,
                                              java.util.function.BiFunction<Random, Integer, Model> chain, String what) {
        Random rnd = new Random(seed);
        List<Model> out = new ArrayList<>();
        for (int t = 0; t < count; t++) {
            int s = 3 + rnd.nextInt(spread);
            Model m = chain.apply(rnd, s);
            assertSameAsGeneralRoute(m, what + " " + t + " (" + s + " states)");
            out.add(m);
        }
        return out;
    }

    @Test
    void denseChainsAgreeWithTheGeneralRouteAndWithPowers() {
        assertAllAgree(20261202L, 6, 4, RationalRouteTest::dense, "dense chain");
    }

    @Test
    void sparseChainsWithRepeatedEigenvaluesAgree() {
        List<Model> ms = assertAllAgree(7L, 12, 5, RationalRouteTest::sparse, "sparse chain");
        assertTrue(ms.stream().anyMatch(m -> ClosedForms.of(m).validFrom() > 0),
            "the seed gives at least one chain with a Jordan block of eigenvalue 0");
    }

    @Test
    void cyclicChainsAgree() {
        assertAllAgree(11L, 5, 4, RationalRouteTest::cyclic, "cyclic chain");
    }

    @Test
    void aClosedFormPastTheDigitLimitIsRefusedWithTheEstimate() {
        Model m = dense(new Random(3L), 8);
        org.qchain.exact.QchainException e = org.junit.jupiter.api.Assertions.assertThrows(
            org.qchain.exact.QchainException.class,
            () -> ClosedForms.of(m, Map.of(), new org.qchain.symbolic.SymbolicLimits(1_000_000, 1000)));
        assertEquals(org.qchain.exact.ErrorKey.RESULT_TOO_LARGE, e.key());
        assertTrue(e.getMessage().contains("more than the limit 1000; raise it with --max-digits"), e::getMessage);
        // the estimate bounds what is printed: the digits of every coefficient of the formulas
        long printed = ClosedForms.of(m).matrix().stream().flatMap(List::stream)
            .mapToLong(f -> f.chars().filter(Character::isDigit).count()).sum();
        long estimate = Long.parseLong(e.getMessage().replaceAll(".*about (\\d+) digits.*", "$1"));
        assertTrue(estimate >= printed / 2 && estimate <= 4 * printed, estimate + " estimated, " + printed + " printed");
    }

    @Test
    void aDenseEightStateChainAgrees() {
        // an irreducible factor of degree 7 (generic for a dense random chain): the case the route is for
        Model m = dense(new Random(3L), 8);
        assertSameAsGeneralRoute(m, "dense 8-state chain");
        assertTrue(ClosedForms.of(m).eigenvalues().stream().anyMatch(e -> e.degree() >= 5),
            "the seed gives a factor of high degree");
    }
}
