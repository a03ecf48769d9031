package org.qchain.exact;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Random;
import org.junit.jupiter.api.Test;

/** The sparse matrix form: the same entries as the dense form, zeros dropped (common practice, no source). */
class SparseRationalMatrixTest {

    @Test
    void roundTripsThroughTheDenseForm() {
        Random rnd = new Random(11);
        for (int t = 0; t < 20; t++) {
            RationalMatrix p = RandomChains.stochastic(rnd, 1 + rnd.nextInt(9), 30, 0.6);
            SparseRationalMatrix s = SparseRationalMatrix.of(p);
            assertEquals(p, s.toDense());
            long nz = 0;
            for (int i = 0; i < p.rows(); i++) {
                for (int j = 0; j < p.cols(); j++) {
                    assertEquals(p.get(i, j), s.get(i, j));
                    nz += p.get(i, j).isZero() ? 0 : 1;
                }
            }
            assertEquals(nz, s.nonZeroCount());
        }
    }

    @Test
    void dropsZerosAndChecksColumns() {
        SparseRationalMatrix s = SparseRationalMatrix.ofRows(2, new int[][] {{0, 1}, {1}},
            new Rational[][] {{Rational.ZERO, Rational.ONE}, {Rational.ONE}});
        assertArrayEquals(new int[] {1}, s.rowColumns(0));
        assertEquals("[{1: 1}, {1: 1}]", s.toString());
        assertThrows(IllegalArgumentException.class, () -> SparseRationalMatrix.ofRows(2, new int[][] {{1, 0}, {1}},
            new Rational[][] {{Rational.ONE, Rational.ONE}, {Rational.ONE}}));
        assertThrows(IllegalArgumentException.class, () -> SparseRationalMatrix.ofRows(2, new int[][] {{2}, {1}},
            new Rational[][] {{Rational.ONE}, {Rational.ONE}}));
    }
}
