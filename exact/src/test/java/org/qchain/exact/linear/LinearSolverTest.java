package org.qchain.exact.linear;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;
import org.hipparchus.fraction.BigFraction;
import org.hipparchus.fraction.BigFractionField;
import org.hipparchus.linear.Array2DRowFieldMatrix;
import org.hipparchus.linear.FieldDecompositionSolver;
import org.hipparchus.linear.FieldLUDecomposition;
import org.hipparchus.linear.FieldMatrix;
import org.junit.jupiter.api.Test;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QuickTries;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;

/** The exact solver against Hipparchus 3.0's {@code FieldLUDecomposition} over {@code BigFraction}. */
class LinearSolverTest {

    static RationalMatrix random(Random rnd, int rows, int cols, int maxNum, int maxDen, double zeros) {
        Rational[][] e = new Rational[rows][cols];
        for (int i = 0; i < rows; i++) {
            for (int j = 0; j < cols; j++) {
                e[i][j] = rnd.nextDouble() < zeros ? Rational.ZERO
                    : Rational.of(rnd.nextInt(2 * maxNum + 1) - maxNum, 1 + rnd.nextInt(maxDen));
            }
        }
        return RationalMatrix.of(e);
    }

    static FieldMatrix<BigFraction> hip(RationalMatrix p) {
        BigFraction[][] e = new BigFraction[p.rows()][p.cols()];
        for (int i = 0; i < p.rows(); i++) {
            for (int j = 0; j < p.cols(); j++) {
                e[i][j] = new BigFraction(p.get(i, j).numerator(), p.get(i, j).denominator());
            }
        }
        return new Array2DRowFieldMatrix<>(BigFractionField.getInstance(), e, false);
    }

    static void assertSame(FieldMatrix<BigFraction> ref, RationalMatrix ours) {
        assertEquals(ref.getRowDimension(), ours.rows());
        for (int i = 0; i < ours.rows(); i++) {
            for (int j = 0; j < ours.cols(); j++) {
                BigFraction x = ref.getEntry(i, j);
                assertEquals(Rational.of(x.getNumerator(), x.getDenominator()), ours.get(i, j), "(" + i + "," + j + ")");
            }
        }
    }

    // reference library: Hipparchus 3.0, org.hipparchus.linear.FieldLUDecomposition over BigFractionField;
    // sizes on both sides of the switch to p-adic lifting (LinearSolver.DIXON_MIN_SIZE = 12), dense and sparse; up
    // to 24 states: the reference's cost grows about as n^5, so sizes 25 to 30 would be about three quarters of the
    // test's time with no code path of their own (the 200-state banded solve and the pivoting property go further)
    @Property(seed = "20261202", tries = 40)
    @QuickTries(15)
    void solveAgreesWithHipparchus(@ForAll @LongRange(min = 0, max = 1_000_000) long seed,
            @ForAll @IntRange(min = 1, max = 24) int n, @ForAll @IntRange(min = 1, max = 3) int m,
            @ForAll boolean sparse) {
        Random rnd = new Random(seed);
        RationalMatrix a = random(rnd, n, n, 9, 12, sparse ? 0.7 : 0.1);
        // keep it regular: a dominant diagonal
        Rational[][] e = a.toArray();
        for (int i = 0; i < n; i++) {
            e[i][i] = e[i][i].add(Rational.of(10L * n));
        }
        a = RationalMatrix.of(e);
        RationalMatrix b = random(rnd, n, m, 20, 7, 0.2);
        // one Hipparchus decomposition serves the solves, the inverse and the determinant (the reference's LU over
        // BigFraction is most of this test's time)
        FieldLUDecomposition<BigFraction> lu = new FieldLUDecomposition<>(hip(a));
        FieldDecompositionSolver<BigFraction> ref = lu.getSolver();
        FieldMatrix<BigFraction> inverse = ref.getInverse();
        FieldMatrix<BigFraction> refX = ref.solve(hip(b));
        assertSame(refX, LinearSolver.solve(a, b));
        // a solution over its common denominator as the right-hand side of a second solve: A y = X e_0
        CommonSolution x = LinearSolver.solveCommon(a, b, org.qchain.exact.Progress.NONE);
        assertSame(refX, x.reduced());
        CommonSolution y = LinearSolver.solveCommon(a, x.column(0), x.denominator(), org.qchain.exact.Progress.NONE);
        assertSame(ref.solve(refX.getColumnMatrix(0)), y.reduced());
        assertSame(inverse, LinearSolver.inverse(a));
        BigFraction det = lu.getDeterminant();
        assertEquals(Rational.of(det.getNumerator(), det.getDenominator()), LinearSolver.determinant(a));
        // X A = B against B A^-1, Hipparchus's product with its own inverse
        RationalMatrix bl = random(rnd, m, n, 20, 7, 0.2);
        RationalMatrix xl = LinearSolver.solveLeft(a, bl);
        assertSame(hip(bl).multiply(inverse), xl);
    }

    // reference library: Hipparchus as above, on wide entries (Bareiss route) and a general (non-dominant) matrix
    @Property(seed = "77", tries = 25)
    @QuickTries(10)
    void wideEntriesAgreeWithHipparchus(@ForAll @LongRange(min = 0, max = 1_000_000) long seed,
            @ForAll @IntRange(min = 1, max = 16) int n) {
        Random rnd = new Random(seed);
        RationalMatrix a = random(rnd, n, n, 1_000_000_000, 1_000_000_007, 0.2);
        RationalMatrix b = random(rnd, n, 2, 1_000, 1_000, 0.0);
        FieldLUDecomposition<BigFraction> lu = new FieldLUDecomposition<>(hip(a));
        BigFraction det = lu.getDeterminant();
        assertEquals(Rational.of(det.getNumerator(), det.getDenominator()), LinearSolver.determinant(a));
        if (det.signum() != 0) {
            assertSame(lu.getSolver().solve(hip(b)), LinearSolver.solve(a, b));
        }
    }

    // reference library: Hipparchus as above; small sparse entries without a dominant diagonal, so the modular LU
    // must swap rows
    @Property(seed = "4242", tries = 30)
    void pivotingModularRouteAgreesWithHipparchus(@ForAll @LongRange(min = 0, max = 1_000_000) long seed,
            @ForAll @IntRange(min = 12, max = 28) int n) {
        Random rnd = new Random(seed);
        RationalMatrix a = random(rnd, n, n, 3, 4, 0.75);
        RationalMatrix b = random(rnd, n, 2, 5, 5, 0.0);
        FieldLUDecomposition<BigFraction> lu = new FieldLUDecomposition<>(hip(a));
        if (lu.getDeterminant().signum() != 0) {
            assertSame(lu.getSolver().solve(hip(b)), LinearSolver.solve(a, b));
        } else {
            assertThrows(SingularSystemException.class, () -> LinearSolver.solve(a, b));
        }
    }

    // invariant (common practice, no source): pi (P - I) = 0 and sum pi = 1 for a random irreducible chain
    @Property(seed = "5", tries = 20)
    void leftNullVectorIsStationary(@ForAll @LongRange(min = 0, max = 1_000_000) long seed,
            @ForAll @IntRange(min = 2, max = 40) int n) {
        Random rnd = new Random(seed);
        Rational[][] p = new Rational[n][n];
        for (int i = 0; i < n; i++) {
            long[] w = new long[n];
            long s = 0;
            for (int j = 0; j < n; j++) {
                w[j] = j == (i + 1) % n ? 1 + rnd.nextInt(100) : (rnd.nextDouble() < 0.5 ? rnd.nextInt(100) : 0);
                s += w[j];
            }
            for (int j = 0; j < n; j++) {
                p[i][j] = Rational.of(w[j], s).subtract(i == j ? Rational.ONE : Rational.ZERO);
            }
        }
        Rational[] pi = LinearSolver.leftNullVector(RationalMatrix.of(p));
        Rational total = Rational.ZERO;
        for (Rational x : pi) {
            total = total.add(x);
        }
        assertEquals(Rational.ONE, total);
        for (int j = 0; j < n; j++) {
            Rational s = Rational.ZERO;
            for (int i = 0; i < n; i++) {
                s = s.add(pi[i].multiply(p[i][j]));
            }
            assertEquals(Rational.ZERO, s, "column " + j);
        }
    }

    // common practice, no source: a banded 200 x 200 system (p-adic route with a banded LU) solves A x = b exactly
    @Test
    void bandedSystemSolvesExactly() {
        Random rnd = new Random(11);
        int n = 200;
        Rational[][] e = new Rational[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                e[i][j] = Math.abs(i - j) <= 2 ? Rational.of(rnd.nextInt(100) - 50, 1 + rnd.nextInt(30)) : Rational.ZERO;
            }
            e[i][i] = Rational.of(200 + rnd.nextInt(100));
        }
        RationalMatrix a = RationalMatrix.of(e);
        Rational[][] rhs = new Rational[n][1];
        for (int i = 0; i < n; i++) {
            rhs[i][0] = Rational.of(1 + rnd.nextInt(9), 1 + rnd.nextInt(9));
        }
        RationalMatrix x = LinearSolver.solve(a, RationalMatrix.of(rhs));
        assertEquals(RationalMatrix.of(rhs), a.multiply(x));
    }

    // common practice, no source: singular systems name the first unknown left undetermined
    @Test
    void singularSystemIsANamedError() {
        Rational[][] e = {{Rational.ONE, Rational.of(2)}, {Rational.of(2), Rational.of(4)}};
        SingularSystemException ex = assertThrows(SingularSystemException.class,
            () -> LinearSolver.inverse(RationalMatrix.of(e)));
        assertEquals(ErrorKey.SINGULAR_SYSTEM, ex.key());
        assertEquals(1, ex.index());
        assertEquals(Rational.ZERO, LinearSolver.determinant(RationalMatrix.of(e)));
    }

    // common practice, no source: two closed classes give a null space of dimension 2, an error
    @Test
    void twoClosedClassesHaveNoUniqueStationaryLaw() {
        Rational z = Rational.ZERO;
        Rational[][] pMinusI = {{z, z, z}, {z, z, z}, {Rational.of(1, 2), Rational.of(1, 2), Rational.ONE.negate()}};
        assertThrows(SingularSystemException.class, () -> LinearSolver.leftNullVector(RationalMatrix.of(pMinusI)));
        assertArrayEquals(new Rational[] {Rational.ONE}, LinearSolver.leftNullVector(RationalMatrix.of(new Rational[][] {{z}})));
    }
}
