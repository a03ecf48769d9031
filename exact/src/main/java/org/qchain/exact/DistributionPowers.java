package org.qchain.exact;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;

/**
 * The distribution of a chain after n steps, the row vector {@code start · P^n}, for one n or for a whole series of
 * n that share their work.
 *
 * <p>With {@code P = A / d} ({@link CommonDenominatorForm}) and {@code start = w / e} ({@code e} the least common
 * denominator of the start, {@code w} integers), {@code start · P^n = (w · A^n) / (e d^n)}. The integer vector
 * {@code w · A^t} is carried from one requested n to the next: a short gap is bridged by vector–matrix products
 * (one per step, path sums), a long one by the integer power {@code A^m} (repeated squaring, the exact engine's
 * {@link MatrixPowers#integerPower}) and one product; the choice is {@link MatrixPowers#preferVectorSteps}'s cost
 * model. A series {@code 1..30} therefore costs what its last term costs. Each requested vector is reduced once, by the
 * known primes of {@code d} ({@link KnownDenominator}) and then by {@code e}.
 */
public final class DistributionPowers {
    private DistributionPowers() {
    }

    /**
     * {@code start · P^n} for each {@code n} of {@code ns}.
     *
     * @param p        a square matrix
     * @param start    a row vector of the matrix's size (any rationals; for a chain, a distribution)
     * @param ns       the step counts, strictly increasing, each {@code >= 0}
     * @param progress told about the work: phase {@code "distributions"}, one report per requested n
     * @return one new array per element of {@code ns}, in order, exact and reduced
     * @throws IllegalArgumentException if {@code p} is not square, {@code start} has the wrong length, or {@code ns}
     *                                  is empty, not increasing or negative
     * @throws QchainException          with {@link ErrorKey#INTERRUPTED} if the thread is interrupted
     */
    public static List<Rational[]> series(RationalMatrix p, Rational[] start, long[] ns, Progress progress) {
        CommonDenominatorForm.requireSquare(p);
        int s = p.rows();
        if (start.length != s) {
            throw new IllegalArgumentException("start has " + start.length + " entries, the matrix " + s + " rows");
        }
        if (ns.length == 0) {
            throw new IllegalArgumentException("no step count");
        }
        for (int k = 0; k < ns.length; k++) {
            if (ns[k] < 0 || k > 0 && ns[k] <= ns[k - 1]) {
                throw new IllegalArgumentException("step counts must be 0 or more and increasing: " + ns[k]);
            }
        }
        CommonDenominatorForm f = CommonDenominatorForm.of(p);
        BigInteger e = BigInteger.ONE;
        for (Rational x : start) {
            e = CommonDenominatorForm.lcm(e, x.denominator());
        }
        BigInteger[] v = new BigInteger[s];
        for (int i = 0; i < s; i++) {
            v[i] = start[i].numerator().multiply(e.divide(start[i].denominator()));
        }
        Rational eRational = Rational.of(e);
        Thread caller = Thread.currentThread();
        List<Rational[]> out = new ArrayList<>(ns.length);
        long t = 0;
        for (int k = 0; k < ns.length; k++) {
            long m = ns[k] - t;
            if (m > 0) {
                v = advance(f, v, m, caller);
            }
            t = ns[k];
            KnownDenominator den = KnownDenominator.power(f.d, t);
            Rational[] row = new Rational[s];
            for (int j = 0; j < s; j++) {
                Rational r = den.reduce(v[j]);
                row[j] = e.equals(BigInteger.ONE) ? r : r.divide(eRational);
            }
            out.add(row);
            progress.update("distributions", k + 1, ns.length);
        }
        return out;
    }

    /** {@code v · A^m}, {@code m >= 1}: m vector steps or one product with the squared-up power, whichever is cheaper. */
    private static BigInteger[] advance(CommonDenominatorForm f, BigInteger[] v, long m, Thread caller) {
        if (MatrixPowers.preferVectorSteps(f, m)) {
            BigInteger[] x = v;
            for (long step = 0; step < m; step++) {
                x = IntMatrix.rowTimes(x, IntMatrix.nonZeros(x), f.a, caller);
            }
            return x;
        }
        IntMatrix am = MatrixPowers.integerPower(f.a, m, Progress.NONE);
        return IntMatrix.rowTimes(v, IntMatrix.nonZeros(v), am, caller);
    }
}
