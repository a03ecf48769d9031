package org.qchain.symbolic.sensitivity;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.Progress;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.model.Model;
import org.qchain.symbolic.RatFunMatrix;
import org.qchain.symbolic.SymbolicLimits;
import org.qchain.symbolic.TestChains;

/**
 * The a-priori bound of a sweep's digits ({@link SweepEstimate}, from the one-step matrix) is never below the figure
 * the sweep checks from the computed formulas ({@link EntrySensitivity#sweep}), on random chains in two parameters
 * with a fixed seed: polynomial and rational entries, the derivative in the swept parameter or in the other one, one
 * final state or several; and never below the digits of the sweep's exact values. The sweep's figure is read from
 * its refusal at a limit of 0 digits (common practice, no source: the bound's argument is in SweepEstimate).
 */
class SweepEstimateTest {
    private static final String[] POOL = {"a", "b", "a/2", "a*b", "(1 - a)/3", "b/(1 + a)", "a^2/4", "1/5",
        "a/(2 + b)", "(a + b)/4", "b^2/3", "1/(3 + a)"};

    private static long sweepFigure(EntrySensitivity e, SweepRange r, Map<String, Rational> base) {
        try {
            e.sweep(r, base, 0, Progress.NONE);
            throw new AssertionError("a sweep of " + r.size() + " points has more than 0 digits");
        } catch (QchainException x) {
            assertEquals(ErrorKey.SWEEP_TOO_LARGE, x.key(), x::getMessage);
            return Long.parseLong(String.valueOf(x.args().get(0)));
        }
    }

    private static Model random(Random rnd, int s) {
        String[][] rows = new String[s][s];
        for (int i = 0; i < s; i++) {
            java.util.Arrays.fill(rows[i], "0");
            rows[i][i] = "*";
            for (int k = 0; k < 1 + rnd.nextInt(2); k++) {
                int j = rnd.nextInt(s);
                if (j != i) {
                    rows[i][j] = "(" + POOL[rnd.nextInt(POOL.length)] + ")/" + (s + 1);
                }
            }
        }
        return TestChains.discrete(List.of("a", "b"), rows);
    }

    @Test
    void theBoundIsNeverBelowTheSweepsFigureOnRandomChains() {
        Random rnd = new Random(20261203L);
        for (int trial = 0; trial < 80; trial++) {
            int s = 2 + rnd.nextInt(3);
            Model m = random(rnd, s);
            RatFunMatrix p = RatFunMatrix.fromModel(m);
            long n = 1 + rnd.nextInt(6);
            String v = rnd.nextBoolean() ? "a" : "b";
            String other = v.equals("a") ? "b" : "a";
            String wrt = rnd.nextInt(3) == 0 ? other : v;
            int from = rnd.nextInt(s);
            int[] to = rnd.nextBoolean() ? new int[] {rnd.nextInt(s)} : new int[] {0, s - 1};
            Map<String, Rational> base = Map.of(other, Rational.of(1 + rnd.nextInt(7), 8 + rnd.nextInt(9)));
            SweepRange r = SweepRange.parse(v + " in [0, 1/2] with " + (2 + rnd.nextInt(40)) + " points");
            EntrySensitivity e;
            if (to.length == 1) {
                e = Sensitivity.of(p, n, from, to[0], wrt, SymbolicLimits.DEFAULT, x -> { });
            } else {
                List<org.qchain.symbolic.RatFun> row = p.powerRow(from, n, SymbolicLimits.DEFAULT, x -> { });
                org.qchain.symbolic.RatFun sum = row.get(to[0]).add(row.get(to[1]));
                e = new EntrySensitivity(n, from, to[0], wrt, sum, sum.derivative(wrt));
            }
            long figure = sweepFigure(e, r, base);
            long bound = SweepEstimate.digits(p, n, from, to, wrt, r, base);
            String what = "n=" + n + " v=" + v + " wrt=" + wrt + " " + p + " E=" + e.probability() + " dE=" + e.derivative() + " base=" + base + " points=" + r.size();
            assertTrue(bound >= figure, () -> "bound " + bound + " < sweep's " + figure + ": " + what);
            // and the real size: the digits of every exact value of the sweep
            long real = 0;
            for (SweepRow row : e.sweep(r, base)) {
                for (Rational x : new Rational[] {row.probability(), row.derivative()}) {
                    real += x.numerator().abs().toString().length() + x.denominator().toString().length();
                }
            }
            long realDigits = real;
            assertTrue(bound >= realDigits, () -> "bound " + bound + " < " + realDigits + " real digits: " + what);
        }
    }
}
