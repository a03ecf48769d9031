package org.qchain.symbolic.closed;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.Progress;
import org.qchain.exact.QchainException;
import org.qchain.exact.model.Model;
import org.qchain.symbolic.SymbolicLimits;

/**
 * The a-priori digit bound of closed forms ({@link ClosedForms#digitBound}) is never below the figure the engine
 * checks after factoring ({@code RationalRoute.factors}), on random chains with a fixed seed: dense ones (one factor of
 * high degree), sparse ones (repeated and rational eigenvalues) and chains whose rows do not sum to 1 (the bound for
 * a general rational matrix), and never below the digits the closed form really prints. The engine's figure is read
 * from its refusal at a limit of one digit (common practice, no source: the bound's argument is in DigitBound).
 */
class DigitBoundTest {

    /** The engine's own figure: its refusal's estimate at a limit of 1 digit (0 if it has nothing to count). */
    private static long engineFigure(Model m) {
        try {
            ClosedForms.of(m, Map.of(), new SymbolicLimits(SymbolicLimits.DEFAULT_MAX_TERMS, 1), Progress.NONE);
            return 0;
        } catch (QchainException e) {
            assertEquals(ErrorKey.RESULT_TOO_LARGE, e.key(), e::getMessage);
            return Long.parseLong(String.valueOf(e.args().get(0)));
        }
    }

    private static Model random(Random rnd, int s, boolean stochastic) {
        String[][] rows = new String[s][s];
        for (int i = 0; i < s; i++) {
            java.util.Arrays.fill(rows[i], "0");
            int q = 2 + rnd.nextInt(30);
            int left = q;
            int nonzero = 1 + rnd.nextInt(s);
            for (int k = 0; k < nonzero && left > 0; k++) {
                int j = rnd.nextInt(s);
                int part = k == nonzero - 1 ? left : 1 + rnd.nextInt(left);
                left -= part;
                rows[i][j] = rows[i][j].equals("0") ? part + "/" + q : "(" + rows[i][j] + ") + " + part + "/" + q;
            }
            if (left > 0) {
                rows[i][rnd.nextInt(s)] += " + " + left + "/" + q;
            }
            if (!stochastic && rnd.nextBoolean()) {
                int j = rnd.nextInt(s);
                rows[i][j] = "(" + rows[i][j] + ") * " + (1 + rnd.nextInt(5)) + "/" + (1 + rnd.nextInt(5));
            }
        }
        return Chains.model(List.of(), rows);
    }

    @Test
    void theBoundIsNeverBelowTheEnginesFigureOnRandomChains() {
        Random rnd = new Random(20261203L);
        int checked = 0;
        for (int trial = 0; trial < 80; trial++) {
            int s = 2 + rnd.nextInt(5);
            Model m = random(rnd, s, trial % 4 != 3);
            long bound = ClosedForms.digitBound(m, Map.of()).orElseThrow();
            long figure = engineFigure(m);
            assertTrue(bound >= figure, () -> "bound " + bound + " < engine's " + figure + " for " + m);
            // and the real size: the digits the closed form prints
            long printed = ClosedForms.of(m, Map.of()).matrix().toString().chars().filter(Character::isDigit).count();
            assertTrue(bound >= printed, () -> "bound " + bound + " < " + printed + " digits printed for " + m);
            checked += figure > 0 ? 1 : 0;
        }
        assertTrue(checked > 40, "too few chains with a figure: " + checked);
    }

    @Test
    void theBoundOfTheCubicTestChainAndItsLateFigure() {
        // chi = (x - 1)(x^3 - x^2/12 + 7x/24 + 1/4): the engine counts 1040 digits after factoring (ClosedCommandTest)
        Model m = Chains.model(List.of(), new String[][] {
            {"1/2", "1/2", "0", "0"}, {"0", "1/3", "2/3", "0"}, {"0", "0", "1/4", "3/4"}, {"1", "0", "0", "0"}});
        assertEquals(1040, engineFigure(m));
        assertEquals(2720, ClosedForms.digitBound(m, Map.of()).orElseThrow());
    }

    @Test
    void aChainWithAFreeParameterHasNoDigitBound() {
        Model m = Chains.model(List.of("a"), new String[][] {{"1 - a", "a"}, {"1/2", "1/2"}});
        assertTrue(ClosedForms.digitBound(m, Map.of()).isEmpty());
        assertTrue(ClosedForms.digitBound(m, Map.of("a", org.qchain.exact.Rational.of(1, 3))).isPresent());
        assertThrows(QchainException.class, () -> ClosedForms.digitBound(m, Map.of("b",
            org.qchain.exact.Rational.ONE)));
    }
}
