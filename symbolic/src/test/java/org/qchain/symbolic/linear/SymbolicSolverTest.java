package org.qchain.symbolic.linear;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import java.util.Map;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;
import org.junit.jupiter.api.Test;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.linear.LinearSolver;
import org.qchain.exact.linear.SingularSystemException;
import org.qchain.symbolic.ParamRing;
import org.qchain.symbolic.Poly;
import org.qchain.symbolic.RatFun;

/** The symbolic solver at random rational points equals the exact solver there. */
class SymbolicSolverTest {
    private static final ParamRing RING = ParamRing.of(List.of("a", "b"));

    static RatFun randomEntry(Random rnd) {
        if (rnd.nextDouble() < 0.3) {
            return RatFun.of(RING.zero());
        }
        Poly a = RING.variable("a");
        Poly b = RING.variable("b");
        Poly num = RING.constant(Rational.of(rnd.nextInt(7) - 3, 1 + rnd.nextInt(3)))
            .add(a.multiply(Rational.of(rnd.nextInt(5) - 2))).add(b.multiply(Rational.of(rnd.nextInt(3))));
        Poly den = rnd.nextBoolean() ? RING.one() : RING.one().add(a.multiply(Rational.of(1 + rnd.nextInt(2))));
        return RatFun.of(num, den);
    }

    static RatFun[][] random(Random rnd, int r, int c) {
        RatFun[][] e = new RatFun[r][c];
        for (int i = 0; i < r; i++) {
            for (int j = 0; j < c; j++) {
                e[i][j] = randomEntry(rnd);
            }
        }
        return e;
    }

    static RationalMatrix at(RatFun[][] e, Map<String, Rational> v) {
        Rational[][] out = new Rational[e.length][e[0].length];
        for (int i = 0; i < e.length; i++) {
            for (int j = 0; j < e[0].length; j++) {
                out[i][j] = e[i][j].evaluate(v);
            }
        }
        return RationalMatrix.of(out);
    }

    // common practice, no source: symbolic solution at a rational point = exact solution of the system at that point
    // (exact side checked against Hipparchus in LinearSolverTest)
    @Property(seed = "1202", tries = 25)
    void solveAtRandomPointsEqualsExact(@ForAll @LongRange(min = 0, max = 1_000_000) long seed,
            @ForAll @IntRange(min = 1, max = 5) int n) {
        Random rnd = new Random(seed);
        RatFun[][] a = random(rnd, n, n);
        RatFun[][] b = random(rnd, n, 2);
        RatFun det = SymbolicSolver.determinant(a);
        for (int t = 0; t < 3; t++) {
            Map<String, Rational> v = Map.of("a", Rational.of(rnd.nextInt(40) + 1, 41 + rnd.nextInt(20)),
                "b", Rational.of(rnd.nextInt(40), 37));
            assertEquals(LinearSolver.determinant(at(a, v)), det.evaluate(v));
        }
        if (det.isZero()) {
            assertThrows(SingularSystemException.class, () -> SymbolicSolver.solve(a, b));
            return;
        }
        RatFun[][] x = SymbolicSolver.solve(a, b);
        RatFun[][] xl = SymbolicSolver.solveLeft(a, transpose(b));
        for (int t = 0; t < 3; t++) {
            Map<String, Rational> v = Map.of("a", Rational.of(rnd.nextInt(40) + 1, 41 + rnd.nextInt(20)),
                "b", Rational.of(rnd.nextInt(40), 37));
            if (det.evaluate(v).isZero() || !defined(a, v)) {
                continue;
            }
            assertEquals(LinearSolver.solve(at(a, v), at(b, v)), at(x, v));
            assertEquals(LinearSolver.solveLeft(at(a, v), at(transpose(b), v)), at(xl, v));
        }
    }

    static boolean defined(RatFun[][] a, Map<String, Rational> v) {
        for (RatFun[] r : a) {
            for (RatFun x : r) {
                if (x.denominator().evaluate(v).isZero()) {
                    return false;
                }
            }
        }
        return true;
    }

    static RatFun[][] transpose(RatFun[][] b) {
        RatFun[][] t = new RatFun[b[0].length][b.length];
        for (int i = 0; i < b.length; i++) {
            for (int j = 0; j < b[0].length; j++) {
                t[j][i] = b[i][j];
            }
        }
        return t;
    }

    // standard result (two-state chain with failure probability a and repair probability b): stationary law
    // (b/(a+b), a/(a+b)); Grinstead and Snell, Introduction to Probability, ch. 11 (two-state chain), from memory
    @Test
    void twoStateStationaryLaw() {
        Poly a = RING.variable("a");
        Poly b = RING.variable("b");
        RatFun[][] pMinusI = {{RatFun.of(a.negate()), RatFun.of(a)}, {RatFun.of(b), RatFun.of(b.negate())}};
        RatFun[] pi = SymbolicSolver.leftNullVector(pMinusI);
        assertEquals(RatFun.of(b, a.add(b)), pi[0]);
        assertEquals(RatFun.of(a, a.add(b)), pi[1]);
    }

    // gambler's ruin with p symbolic (standard result; Grinstead and Snell, Introduction to Probability, ch. 12):
    // ruin probability from i is ((q/p)^i - (q/p)^N)/(1 - (q/p)^N); the symbolic engine at p = 1/3 .. 3/4 equals
    // the formula and the exact engine; expected duration at p = 1/2 is i(N - i)
    @Test
    void gamblersRuinSymbolic() {
        ParamRing ring = ParamRing.of(List.of("p"));
        RatFunArithmetic f = RatFunArithmetic.of(ring);
        int target = 4;
        RatFun p = RatFun.of(ring.variable("p"));
        RatFun q = f.subtract(f.one(), p);
        java.util.List<java.util.List<RatFun>> m = new java.util.ArrayList<>();
        for (int i = 0; i <= target; i++) {
            java.util.List<RatFun> row = new java.util.ArrayList<>(java.util.Collections.nCopies(target + 1, f.zero()));
            if (i == 0 || i == target) {
                row.set(i, f.one());
            } else {
                row.set(i + 1, p);
                row.set(i - 1, q);
            }
            m.add(row);
        }
        java.util.List<String> names = java.util.stream.IntStream.rangeClosed(0, target).mapToObj(i -> "S" + i).toList();
        org.qchain.exact.longrun.ChainEngine.Absorption<RatFun> a =
            org.qchain.exact.longrun.ChainEngine.absorb(f, m, names, java.util.Set.of());
        for (Rational pv : List.of(Rational.of(1, 3), Rational.of(3, 4), Rational.of(2, 5))) {
            Rational ratio = Rational.ONE.subtract(pv).divide(pv);
            Rational rn = ratio.pow(target);
            for (int i = 1; i < target; i++) {
                Rational expected = ratio.pow(i).subtract(rn).divide(Rational.ONE.subtract(rn));
                assertEquals(expected, a.probabilities().get(i - 1).get(0).evaluate(Map.of("p", pv)));
            }
        }
        Map<String, Rational> half = Map.of("p", Rational.of(1, 2));
        for (int i = 1; i < target; i++) {
            assertEquals(Rational.of((long) i * (target - i)), a.expectedSteps().get(i - 1).evaluate(half));
        }
    }
}
