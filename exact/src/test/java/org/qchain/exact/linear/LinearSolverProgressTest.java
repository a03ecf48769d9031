package org.qchain.exact.linear;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.qchain.exact.Progress;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;

/** Long solves report progress, in order, without changing the answer. */
class LinearSolverProgressTest {
    record Report(String phase, long done, long total) {
    }

    static RationalMatrix random(Random rnd, int rows, int cols, int bound) {
        Rational[][] e = new Rational[rows][cols];
        for (int i = 0; i < rows; i++) {
            for (int j = 0; j < cols; j++) {
                e[i][j] = Rational.of(rnd.nextInt(2 * bound + 1) - bound, 1 + rnd.nextInt(7));
            }
            if (i < cols) {
                e[i][i] = e[i][i].add(Rational.of(10L * bound * cols)); // diagonally dominant: not singular
            }
        }
        return RationalMatrix.of(e);
    }

    // common practice, no source: A X = B checked by multiplying back; the reports of each phase never go backwards
    // and stay within their totals
    @Test
    void reportsInOrderAndKeepsTheAnswer() {
        Random rnd = new Random(9);
        for (int n : new int[] {5, 60}) {
            RationalMatrix a = random(rnd, n, n, 50);
            RationalMatrix b = random(rnd, n, 3, 50);
            List<Report> seen = new ArrayList<>();
            Progress p = (phase, done, total) -> seen.add(new Report(phase, done, total));
            RationalMatrix x = LinearSolver.solve(a, b, p);
            assertEquals(b, a.multiply(x));
            assertEquals(LinearSolver.solve(a, b), x);
            assertFalse(seen.isEmpty(), "no progress reported for n = " + n);
            for (int i = 1; i < seen.size(); i++) {
                Report r = seen.get(i);
                assertTrue(r.done() >= 0 && r.done() <= r.total(), r.toString());
                if (r.phase().equals(seen.get(i - 1).phase())) {
                    assertTrue(r.done() >= seen.get(i - 1).done(), r + " after " + seen.get(i - 1));
                }
            }
        }
    }
}
