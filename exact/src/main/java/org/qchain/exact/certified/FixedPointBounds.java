package org.qchain.exact.certified;

import java.math.BigInteger;
import java.util.stream.IntStream;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.SparseRationalMatrix;

/**
 * Lower and upper bound matrices of a non-negative matrix in fixed point: entries are integers {@code X} standing for
 * {@code X / 2^w}. The lower matrix is rounded down and the upper one up at every step, and all entries are
 * non-negative, so products are monotone: from {@code L <= P <= U} entrywise follows
 * {@code floor(L L') <= P P' <= ceil(U U')}, and by induction {@code L_n <= P^n <= U_n} for the bounds that repeated
 * squaring or repeated vector products produce (common practice, no source: monotonicity of products of non-negative
 * matrices). The support (entries with a positive upper bound) is exactly the support of the true matrix, because a
 * positive rational rounds up to at least {@code 2^-w}; a zero upper bound is therefore an exact zero.
 *
 * <p>Rows are sparse (columns of the positive upper bounds, ascending); a lower bound may be zero where the upper one
 * is not.
 */
final class FixedPointBounds {
    /** Products whose estimated work (entry multiplications) is at least this split their rows over the pool. */
    private static final long PARALLEL_WORK = 20_000;

    final int n;
    final int w;
    final int[][] cols;
    final BigInteger[][] lo;
    final BigInteger[][] hi;

    private FixedPointBounds(int n, int w, int[][] cols, BigInteger[][] lo, BigInteger[][] hi) {
        this.n = n;
        this.w = w;
        this.cols = cols;
        this.lo = lo;
        this.hi = hi;
    }

    /** Bounds from their rows (sparse, columns ascending; the arrays are taken, not copied). */
    static FixedPointBounds ofRows(int n, int w, int[][] cols, BigInteger[][] lo, BigInteger[][] hi) {
        return new FixedPointBounds(n, w, cols, lo, hi);
    }

    /** {@code floor(P 2^w)} and {@code ceil(P 2^w)} of a non-negative matrix. */
    static FixedPointBounds of(SparseRationalMatrix p, int w) {
        int n = p.size();
        int[][] cols = new int[n][];
        BigInteger[][] lo = new BigInteger[n][];
        BigInteger[][] hi = new BigInteger[n][];
        for (int i = 0; i < n; i++) {
            cols[i] = p.rowColumns(i);
            Rational[] v = p.rowValues(i);
            lo[i] = new BigInteger[v.length];
            hi[i] = new BigInteger[v.length];
            for (int t = 0; t < v.length; t++) {
                BigInteger[] qr = v[t].numerator().shiftLeft(w).divideAndRemainder(v[t].denominator());
                lo[i][t] = qr[0];
                hi[i][t] = qr[1].signum() == 0 ? qr[0] : qr[0].add(BigInteger.ONE);
            }
        }
        return new FixedPointBounds(n, w, cols, lo, hi);
    }

    /** Number of stored entries. */
    long nonZeroCount() {
        long z = 0;
        for (int[] c : cols) {
            z += c.length;
        }
        return z;
    }

    /** {@code floor(this.lo o.lo / 2^w)} and {@code ceil(this.hi o.hi / 2^w)}. */
    FixedPointBounds multiply(FixedPointBounds o, Thread caller) {
        int[][] c = new int[n][];
        BigInteger[][] l = new BigInteger[n][];
        BigInteger[][] h = new BigInteger[n][];
        long work = 0;
        for (int i = 0; i < n; i++) {
            for (int k : cols[i]) {
                work += o.cols[k].length;
            }
        }
        IntStream rows = IntStream.range(0, n);
        if (work >= PARALLEL_WORK && n > 1 && Runtime.getRuntime().availableProcessors() > 1) {
            rows = rows.parallel();
        }
        rows.forEach(i -> {
            Row r = rowTimes(cols[i], lo[i], hi[i], o, caller);
            c[i] = r.cols;
            l[i] = r.lo;
            h[i] = r.hi;
        });
        return new FixedPointBounds(n, w, c, l, h);
    }

    /** A sparse row of bounds. */
    record Row(int[] cols, BigInteger[] lo, BigInteger[] hi) {
    }

    /** The row of bounds {@code (vlo, vhi)} (sparse, on columns {@code idx}) times {@code m}, rounded outwards. */
    static Row rowTimes(int[] idx, BigInteger[] vlo, BigInteger[] vhi, FixedPointBounds m, Thread caller) {
        if (caller.isInterrupted()) {
            throw new QchainException(ErrorKey.INTERRUPTED);
        }
        BigInteger[] accLo = new BigInteger[m.n];
        BigInteger[] accHi = new BigInteger[m.n];
        int count = 0;
        for (int t = 0; t < idx.length; t++) {
            int k = idx[t];
            BigInteger xl = vlo[t];
            BigInteger xh = vhi[t];
            int[] mc = m.cols[k];
            BigInteger[] ml = m.lo[k];
            BigInteger[] mh = m.hi[k];
            for (int q = 0; q < mc.length; q++) {
                int j = mc[q];
                BigInteger pl = xl.signum() == 0 || ml[q].signum() == 0 ? BigInteger.ZERO : xl.multiply(ml[q]);
                BigInteger ph = xh.multiply(mh[q]);
                if (accHi[j] == null) {
                    accLo[j] = pl;
                    accHi[j] = ph;
                    count++;
                } else {
                    accLo[j] = accLo[j].add(pl);
                    accHi[j] = accHi[j].add(ph);
                }
            }
        }
        int[] c = new int[count];
        BigInteger[] l = new BigInteger[count];
        BigInteger[] h = new BigInteger[count];
        BigInteger mask = BigInteger.ONE.shiftLeft(m.w).subtract(BigInteger.ONE);
        int k = 0;
        for (int j = 0; j < m.n; j++) {
            if (accHi[j] != null) {
                c[k] = j;
                l[k] = accLo[j].shiftRight(m.w);
                h[k] = accHi[j].add(mask).shiftRight(m.w);
                k++;
            }
        }
        return new Row(c, l, h);
    }

    /** The bounds as enclosures of the dense row {@code i}. */
    Enclosure[] enclosures(int i) {
        return enclosures(n, w, cols[i], lo[i], hi[i]);
    }

    static Enclosure[] enclosures(int n, int w, int[] cols, BigInteger[] lo, BigInteger[] hi) {
        Enclosure[] out = new Enclosure[n];
        java.util.Arrays.fill(out, Enclosure.exact(Rational.ZERO));
        for (int t = 0; t < cols.length; t++) {
            out[cols[t]] = Enclosure.of(Rational.dyadic(lo[t], w), Rational.dyadic(hi[t], w));
        }
        return out;
    }
}
