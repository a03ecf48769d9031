package org.qchain.exact.longrun;

import java.util.ArrayList;
import java.util.List;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
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
