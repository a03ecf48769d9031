package org.qchain.symbolic.closed;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.qchain.exact.model.Model;

/**
 * A finite queue with two parameters (arrival a, service s per slot), regression for issue 8: the closed form ran
 * past 600 s (JAS factoring over the quotient field, extended gcds with a gcd per coefficient operation); it now
 * takes a few seconds (figures in docs/performance.md). Checked as every closed form: against the repeated product
 * of the symbolic matrix and exact powers at a point (common practice, no source: the definition of P^n).
 */
class QueueChainTest {
    /** Discrete-time birth-death queue with capacity size - 1 (an arrival and a departure may happen in one slot). */
    static Model queue(int size) {
        String[][] rows = new String[size][size];
        for (String[] r : rows) {
            java.util.Arrays.fill(r, "0");
        }
        rows[0][0] = "1-a";
        rows[0][1] = "a";
        for (int i = 1; i < size - 1; i++) {
            rows[i][i - 1] = "s*(1-a)";
            rows[i][i] = "(1-a)*(1-s)+a*s";
            rows[i][i + 1] = "a*(1-s)";
        }
        rows[size - 1][size - 2] = "s";
        rows[size - 1][size - 1] = "1-s";
        return Chains.model(List.of("a", "s"), rows);
    }

    @Test
    void fourStateQueueWithTwoParametersMatchesPowers() {
        Model m = queue(4);
        ClosedForm cf = ClosedForms.of(m);
        assertEquals(List.of("a", "s"), cf.parameters());
        Chains.assertMatchesPowers(cf, m, List.of(Chains.at("a", "1/3", "s", "1/2")), 0);
    }
}
