package org.qchain.symbolic.closed;

import edu.jas.arith.BigRational;
import edu.jas.ufd.Quotient;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collection;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.qchain.exact.Rational;

/**
 * A linear combination of the entries of P^n that a closed form is asked for: {@code sum_i s_i sum_(j in To)
 * P^n(i, j)}, the probability of being in one of the states {@code To} after n steps from the initial distribution
 * s. One entry (i, j) is the case s = e_i, To = {j}. Immutable.
 *
 * <p>The closed form of a combination is built from the combined coefficient matrices of the spectral groups
 * ({@code s C 1_To} for each projector or nilpotent coefficient C), so terms whose coefficient cancels vanish and
 * the formula is as simple as the combined quantity; the generating function and the recurrence likewise come from
 * the combined adjugate coefficients, reduced afterwards.
 */
public final class Combination {
    private final int[] rows;
    private final Rational[] weights;
    private final int[] cols;

    private Combination(int[] rows, Rational[] weights, int[] cols) {
        this.rows = rows;
        this.weights = weights;
        this.cols = cols;
    }

    /**
     * Entry (i, j).
     *
     * @param i the row (from)
     * @param j the column (to)
     * @return the combination
     * @throws IllegalArgumentException if an index is negative
     */
    public static Combination entry(int i, int j) {
        if (i < 0 || j < 0) {
            throw new IllegalArgumentException("negative index: " + i + ", " + j);
        }
        return new Combination(new int[] {i}, new Rational[] {Rational.ONE}, new int[] {j});
    }

    /**
     * The start's weighted sum, over the rows, of the sum of the columns {@code to}.
     *
     * @param start the weight of each row (states not named have weight 0); weights of 0 are dropped
     * @param to    the columns, each once
     * @return the combination
     * @throws IllegalArgumentException if no row has a nonzero weight, {@code to} is empty, names a column twice,
     *                                  or an index is negative
     */
    public static Combination of(Map<Integer, Rational> start, Collection<Integer> to) {
        List<Integer> r = new ArrayList<>();
        List<Rational> w = new ArrayList<>();
        start.forEach((i, v) -> {
            if (i < 0) {
                throw new IllegalArgumentException("negative row: " + i);
            }
            if (v.signum() != 0) {
                r.add(i);
                w.add(v);
            }
        });
        if (r.isEmpty() || to.isEmpty()) {
            throw new IllegalArgumentException("a combination needs a row of nonzero weight and a column");
        }
        int[] c = to.stream().mapToInt(Integer::intValue).toArray();
        if (Arrays.stream(c).distinct().count() != c.length || Arrays.stream(c).anyMatch(j -> j < 0)) {
            throw new IllegalArgumentException("columns must be distinct and not negative: " + to);
        }
        return new Combination(r.stream().mapToInt(Integer::intValue).toArray(), w.toArray(new Rational[0]), c);
    }

    /** Whether this is one entry of P^n (one row of weight 1, one column). */
    public boolean isEntry() {
        return rows.length == 1 && cols.length == 1 && weights[0].isOne();
    }

    /** The row of an entry (the first row otherwise). */
    int row() {
        return rows[0];
    }

    /** The column of an entry (the first column otherwise). */
    int col() {
        return cols[0];
    }

    /** The combined value {@code sum_i s_i sum_(j in To) m[i][j]} of a matrix over Q(parameters). */
    Quotient<BigRational> apply(ParamField f, Quotient<BigRational>[][] m) {
        if (isEntry()) {
            return m[rows[0]][cols[0]];
        }
        Quotient<BigRational> total = f.zero();
        for (int k = 0; k < rows.length; k++) {
            Quotient<BigRational> s = f.zero();
            for (int j : cols) {
                s = s.sum(m[rows[k]][j]);
            }
            if (!s.isZERO()) {
                total = total.sum(weights[k].isOne() ? s : s.multiply(f.of(weights[k])));
            }
        }
        return total;
    }

    /** The combined value of an exact matrix given entry by entry. */
    Rational apply(java.util.function.BiFunction<Integer, Integer, Rational> m) {
        Rational total = Rational.ZERO;
        for (int k = 0; k < rows.length; k++) {
            Rational s = Rational.ZERO;
            for (int j : cols) {
                s = s.add(m.apply(rows[k], j));
            }
            total = total.add(s.multiply(weights[k]));
        }
        return total;
    }

    /** Checks the indices against a matrix of {@code size} states. */
    void check(int size) {
        for (int i : rows) {
            Objects.checkIndex(i, size);
        }
        for (int j : cols) {
            Objects.checkIndex(j, size);
        }
    }

    /** A key for caches: equal combinations give equal keys. */
    String key() {
        StringBuilder sb = new StringBuilder();
        for (int k = 0; k < rows.length; k++) {
            sb.append(rows[k]).append('=').append(weights[k]).append(' ');
        }
        sb.append("->");
        for (int j : cols) {
            sb.append(' ').append(j);
        }
        return sb.toString();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Combination c && c.key().equals(key());
    }

    @Override
    public int hashCode() {
        return key().hashCode();
    }

    @Override
    public String toString() {
        return "Combination[" + key() + "]";
    }
}
