package org.qchain.exact.longrun;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.linear.CommonSolution;
import org.qchain.exact.linear.LinearSolver;

/**
 * The field the long-run and absorption engines compute in, with its exact linear solver: {@link #RATIONAL} here,
 * rational functions of the parameters in the symbolic module. The engines are written once against this interface.
 *
 * @param <T> the element type, immutable
 */
public interface Arithmetic<T> {
    /** 0. */
    T zero();

    /** 1. */
    T one();

    /** A rational constant. */
    T of(Rational r);

    /** a + b. */
    T add(T a, T b);

    /** a − b. */
    T subtract(T a, T b);

    /** a · b. */
    T multiply(T a, T b);

    /**
     * a / b.
     *
     * @throws ArithmeticException if b is zero
     */
    T divide(T a, T b);

    /** −a. */
    default T negate(T a) {
        return subtract(zero(), a);
    }

    /** Whether a is zero (identically, for functions). */
    boolean isZero(T a);

    /**
     * X with A X = B, exactly and fraction-free.
     *
     * @throws org.qchain.exact.linear.SingularSystemException if A is singular
     */
    List<List<T>> solve(List<List<T>> a, List<List<T>> b);

    /**
     * The solution X of A X = B and the variance of a time to absorption whose mean is X's column {@code c}.
     *
     * @param solution X
     * @param variance one value per row of X
     * @param <T>      the element type
     */
    record Moments<T>(List<List<T>> solution, List<T> variance) {
    }

    /**
     * X with A X = B for A = I − Q (steps) or −Q (continuous time) on the transient states, and the variance of the
     * time to absorption from its column t = X_c: with y = A^-1 t, {@code 2y − t − t∘t} in steps ((2N − I) t − t∘t),
     * {@code 2y − t∘t} in continuous time (E[T²] = 2 N t). This default solves twice and combines in this
     * arithmetic; the rational one keeps t over one common denominator for the second solve and reduces each
     * variance once.
     *
     * @throws org.qchain.exact.linear.SingularSystemException if A is singular
     */
    default Moments<T> solveWithVariance(List<List<T>> a, List<List<T>> b, int c, boolean continuous) {
        List<List<T>> x = solve(a, b);
        List<List<T>> tc = new ArrayList<>();
        for (List<T> row : x) {
            tc.add(List.of(row.get(c)));
        }
        List<List<T>> y = solve(a, tc);
        List<T> variance = new ArrayList<>();
        for (int i = 0; i < x.size(); i++) {
            T t = x.get(i).get(c);
            T s = y.get(i).get(0);
            s = add(s, s);
            if (!continuous) {
                s = subtract(s, t);
            }
            variance.add(subtract(s, multiply(t, t)));
        }
        return new Moments<>(x, variance);
    }

    /**
     * x with x A = 0, x·1 = 1, for A with zero row sums.
     *
     * @throws org.qchain.exact.linear.SingularSystemException if not unique
     */
    List<T> leftNullVector(List<List<T>> a);

    /** Exact rationals with {@link LinearSolver}. */
    Arithmetic<Rational> RATIONAL = rational(org.qchain.exact.Progress.NONE);

    /**
     * Exact rationals with {@link LinearSolver}, its solves reporting to {@code progress}.
     *
     * @param progress where the solves report
     * @return the arithmetic
     */
    static Arithmetic<Rational> rational(org.qchain.exact.Progress progress) {
        return new Arithmetic<>() {
            @Override
            public Rational zero() {
                return Rational.ZERO;
            }

            @Override
            public Rational one() {
                return Rational.ONE;
            }

            @Override
            public Rational of(Rational r) {
                return r;
            }

            @Override
            public Rational add(Rational a, Rational b) {
                return a.add(b);
            }

            @Override
            public Rational subtract(Rational a, Rational b) {
                return a.subtract(b);
            }

            @Override
            public Rational multiply(Rational a, Rational b) {
                return a.multiply(b);
            }

            @Override
            public Rational divide(Rational a, Rational b) {
                return a.divide(b);
            }

            @Override
            public boolean isZero(Rational a) {
                return a.isZero();
            }

            @Override
            public List<List<Rational>> solve(List<List<Rational>> a, List<List<Rational>> b) {
                return rows(LinearSolver.solve(matrix(a), matrix(b), progress));
            }

            @Override
            public Moments<Rational> solveWithVariance(List<List<Rational>> a, List<List<Rational>> b, int c,
                    boolean continuous) {
                RationalMatrix am = matrix(a);
                CommonSolution x = LinearSolver.solveCommon(am, matrix(b), progress);
                BigInteger[] t = x.column(c);
                CommonSolution y = LinearSolver.solveCommon(am, t, x.denominator(), progress);
                return new Moments<>(rows(x.reduced()), Variance.of(t, x.denominator(), y, continuous));
            }

            @Override
            public List<Rational> leftNullVector(List<List<Rational>> a) {
                return List.of(LinearSolver.leftNullVector(matrix(a), progress));
            }

            private RationalMatrix matrix(List<List<Rational>> a) {
                Rational[][] e = new Rational[a.size()][];
                for (int i = 0; i < e.length; i++) {
                    e[i] = a.get(i).toArray(new Rational[0]);
                }
                return RationalMatrix.of(e);
            }

            private List<List<Rational>> rows(RationalMatrix m) {
                List<List<Rational>> out = new ArrayList<>();
                for (int i = 0; i < m.rows(); i++) {
                    out.add(List.of(m.row(i)));
                }
                return out;
            }
        };
    }
}
