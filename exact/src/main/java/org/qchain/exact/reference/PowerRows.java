package org.qchain.exact.reference;

import java.util.LinkedHashMap;
import java.util.Map;
import org.qchain.exact.MatrixPowers;
import org.qchain.exact.Progress;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;

/**
 * The exact entries of {@code P^n} for a {@link Verifier}, computed as they are asked for. A small chain gets its
 * whole power at once (squaring is cheapest there); a large one gets row by row ({@link MatrixPowers#rowOfPower}:
 * path sums, which for a sparse chain cost far less than squaring to a dense power), keeping the most recent rows,
 * so a file that checks a few rows computes only those, and memory holds a few rows, not the whole power.
 */
public final class PowerRows implements Verifier.Truth {
    /** Chains up to this many states get the whole power at once. */
    static final int WHOLE_POWER_STATES = 64;
    /** Rows kept in the cache of a large chain. */
    static final int CACHED_ROWS = 32;

    private final RationalMatrix p;
    private final long n;
    private final Progress progress;
    private RationalMatrix whole;
    private final Map<Integer, Rational[]> rows = new LinkedHashMap<>(CACHED_ROWS * 2, 0.75f, true) {
        private static final long serialVersionUID = 1L;

        @Override
        protected boolean removeEldestEntry(Map.Entry<Integer, Rational[]> eldest) {
            return size() > CACHED_ROWS;
        }
    };

    /**
     * The entries of {@code P^n}.
     *
     * @param p        a square matrix
     * @param n        the exponent, {@code >= 0}
     * @param progress receives the engine's progress reports
     * @throws IllegalArgumentException if {@code p} is not square or {@code n < 0}
     */
    public PowerRows(RationalMatrix p, long n, Progress progress) {
        if (!p.isSquare() || n < 0) {
            throw new IllegalArgumentException("a square matrix and n >= 0 are needed");
        }
        this.p = p;
        this.n = n;
        this.progress = progress;
    }

    @Override
    public Rational get(int row, int col) {
        if (p.rows() <= WHOLE_POWER_STATES) {
            if (whole == null) {
                whole = MatrixPowers.power(p, n, progress);
            }
            return whole.get(row, col);
        }
        return rows.computeIfAbsent(row, i -> MatrixPowers.rowOfPower(p, i, n, progress))[col];
    }
}
