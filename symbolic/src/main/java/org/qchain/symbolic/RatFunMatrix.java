package org.qchain.symbolic;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.LongConsumer;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.model.Chains;
import org.qchain.exact.model.Model;

/**
 * An immutable square matrix of {@link RatFun} entries over one {@link ParamRing}: a transition matrix whose
 * entries are rational functions of the model's parameters, and its powers.
 *
 * <p>{@link #power(long)} works over one common denominator: {@code P = A/d} with {@code d} the least common
 * multiple of the entry denominators and {@code A} a polynomial matrix, {@code P^n = A^n / d^n}; each entry is then
 * reduced by dividing out the known irreducible factors of {@code d} (no general gcd). The package documentation
 * explains why, with measurements.
 */
public final class RatFunMatrix {
    private final ParamRing ring;
    private final RatFun[][] a;

    private RatFunMatrix(ParamRing ring, RatFun[][] a) {
        this.ring = ring;
        this.a = a;
    }

    /**
     * A matrix from its entries (copied).
     *
     * @param ring    the ring of every entry
     * @param entries a non-empty square array without nulls
     * @return the matrix
     * @throws IllegalArgumentException if the array is empty, not square, has nulls or entries of another ring
     */
    public static RatFunMatrix of(ParamRing ring, RatFun[][] entries) {
        int n = entries.length;
        if (n == 0) {
            throw new IllegalArgumentException("empty matrix");
        }
        RatFun[][] c = new RatFun[n][];
        for (int i = 0; i < n; i++) {
            if (entries[i].length != n) {
                throw new IllegalArgumentException("not square: row " + i + " has " + entries[i].length + " entries");
            }
            for (RatFun f : entries[i]) {
                if (f == null) {
                    throw new IllegalArgumentException("null entry in row " + i);
                }
                ring.check(f.ring());
            }
            c[i] = entries[i].clone();
        }
        return new RatFunMatrix(ring, c);
    }

    /**
     * The one-step matrix of a model (probabilities for a discrete chain, the generator for a continuous one), each
     * {@link Model#entry(int, int)} mapped exactly into the ring of all the model's parameters.
     *
     * @param model the model
     * @return the matrix
     * @throws QchainException {@link ErrorKey#UNKNOWN_PARAMETER} for a name used but not declared,
     *                         {@link ErrorKey#DIVISION_BY_ZERO} for a division by an identically zero expression,
     *                         {@link ErrorKey#EMPTY_CHAIN} for a model without states
     */
    public static RatFunMatrix fromModel(Model model) {
        return fromModel(ParamRing.of(model), model);
    }

    /**
     * As {@link #fromModel(Model)} in a given ring (which must contain every parameter the model uses).
     *
     * @param ring  the ring
     * @param model the model
     * @return the matrix
     */
    public static RatFunMatrix fromModel(ParamRing ring, Model model) {
        int n = model.size();
        if (n == 0) {
            throw new QchainException(ErrorKey.EMPTY_CHAIN);
        }
        Chains.requireDense(model);
        RatFun[][] e = new RatFun[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                e[i][j] = ring.fromExpr(model.entry(i, j));
            }
        }
        return new RatFunMatrix(ring, e);
    }

    /**
     * The identity matrix.
     *
     * @param ring the ring
     * @param n    the size, at least 1
     * @return the identity
     */
    public static RatFunMatrix identity(ParamRing ring, int n) {
        RatFun zero = RatFun.of(ring.zero());
        RatFun one = RatFun.of(ring.one());
        RatFun[][] e = new RatFun[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                e[i][j] = i == j ? one : zero;
            }
        }
        return new RatFunMatrix(ring, e);
    }

    /** The ring of the entries. */
    public ParamRing ring() {
        return ring;
    }

    /** The number of rows (and columns). */
    public int size() {
        return a.length;
    }

    /**
     * The entry in row {@code i}, column {@code j} (0-based).
     *
     * @throws IndexOutOfBoundsException if out of range
     */
    public RatFun get(int i, int j) {
        return a[i][j];
    }

    /** The sum of row {@code i}. */
    public RatFun rowSum(int i) {
        RatFun s = RatFun.of(ring.zero());
        for (RatFun f : a[i]) {
            s = s.add(f);
        }
        return s;
    }

    /** The variables that occur in some entry, in ring order. */
    public List<String> occurringVariables() {
        Set<String> seen = new LinkedHashSet<>();
        for (RatFun[] row : a) {
            for (RatFun f : row) {
                seen.addAll(f.occurringVariables());
            }
        }
        List<String> out = new ArrayList<>();
        for (String v : ring.variables()) {
            if (seen.contains(v)) {
                out.add(v);
            }
        }
        return out;
    }

    /**
     * The product {@code this * o}, each entry reduced.
     *
     * @param o a matrix of the same size and ring
     * @return the product
     * @throws IllegalArgumentException if sizes or rings differ
     */
    public RatFunMatrix multiply(RatFunMatrix o) {
        ring.check(o.ring);
        int n = size();
        if (o.size() != n) {
            throw new IllegalArgumentException("sizes differ: " + n + " and " + o.size());
        }
        RatFun[][] r = new RatFun[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                RatFun s = RatFun.of(ring.zero());
                for (int k = 0; k < n; k++) {
                    if (!a[i][k].isZero() && !o.a[k][j].isZero()) {
                        s = s.add(a[i][k].multiply(o.a[k][j]));
                    }
                }
                r[i][j] = s;
            }
        }
        return new RatFunMatrix(ring, r);
    }

    /** The common denominator {@code d} (least common multiple of the entry denominators, normalised). */
    Poly commonDenominator() {
        Poly d = ring.one();
        for (RatFun[] row : a) {
            for (RatFun f : row) {
                Poly e = f.denominator();
                if (e.isOne() || e.equals(d)) {
                    continue;
                }
                Poly g = d.gcd(e);
                d = d.multiply(e.divideExact(g).orElseThrow());
            }
        }
        return d.normalizedAssociate();
    }

    /** {@code A = d * P}, a polynomial matrix. */
    private Poly[][] numerators(Poly d) {
        int n = size();
        Poly[][] m = new Poly[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                RatFun f = a[i][j];
                m[i][j] = f.isPolynomial() ? f.numerator().multiply(d)
                    : f.numerator().multiply(d.divideExact(f.denominator()).orElseThrow());
            }
        }
        return m;
    }

    /**
     * An upper estimate of the size of {@code P^n}, from degrees only (no multiplication): with {@code P = A/d},
     * {@code k} the number of variables that occur and {@code D = n * max deg A_ij}, each numerator of {@code A^n} has
     * at most {@code min(C(D + k, k), product over variables v of (n * deg_v + 1))} terms.
     *
     * @param n the power, at least 0
     * @return the estimate
     */
    public PowerEstimate estimatePower(long n) {
        requireNonNegative(n);
        Poly d = commonDenominator();
        Poly[][] m = numerators(d);
        int k = ring.size();
        long[] degV = new long[k];
        long deg = 0;
        for (Poly[] row : m) {
            for (Poly p : row) {
                deg = Math.max(deg, p.totalDegree());
                for (int v = 0; v < k; v++) {
                    degV[v] = Math.max(degV[v], p.degree(ring.variables().get(v)));
                }
            }
        }
        long entries = (long) size() * size();
        if (n == 0) {
            return new PowerEstimate(0, 0, 1, entries, entries);
        }
        // coefficient height: A = A'/c with A' integral; log10 of s * T * H * c bounds the digits added per step
        java.math.BigInteger c = java.math.BigInteger.ONE;
        java.math.BigInteger h = java.math.BigInteger.ONE;
        long maxTerms = 1;
        for (Poly[] row : m) {
            for (Poly p : row) {
                maxTerms = Math.max(maxTerms, p.termCount());
                for (Poly.Term t : p.terms()) {
                    java.math.BigInteger den = t.coefficient().denominator();
                    c = c.divide(c.gcd(den)).multiply(den);
                    h = h.max(t.coefficient().numerator().abs());
                }
            }
        }
        double perStep = Math.log10(size()) + Math.log10(maxTerms) + log10(h) + log10(c);
        long bigD = sat(n, deg);
        int used = 0;
        double box = 1;
        for (long dv : degV) {
            if (dv > 0) {
                used++;
                box *= (double) n * dv + 1;
            }
        }
        double simplex = binomial(bigD + used, used);
        double per = Math.min(box, simplex);
        long perEntry = per >= 9.0e18 ? Long.MAX_VALUE : (long) Math.ceil(per);
        double total = per * entries;
        double digits = total * (n * perStep + 1);
        return new PowerEstimate(n, bigD, perEntry, total >= 9.0e18 ? Long.MAX_VALUE : (long) Math.ceil(total),
            digits >= 9.0e18 ? Long.MAX_VALUE : (long) Math.ceil(digits));
    }

    private static double log10(java.math.BigInteger x) {
        int bits = x.bitLength();
        if (bits < 1000) {
            return Math.log10(x.doubleValue());
        }
        return Math.log10(x.shiftRight(bits - 64).doubleValue()) + (bits - 64) * Math.log10(2);
    }

    private static long sat(long x, long y) {
        if (y != 0 && x > Long.MAX_VALUE / y) {
            return Long.MAX_VALUE;
        }
        return x * y;
    }

    private static double binomial(long top, int k) {
        double r = 1;
        for (int i = 1; i <= k; i++) {
            r = r * (double) (top - k + i) / i;
        }
        return r;
    }

    private static void requireNonNegative(long n) {
        if (n < 0) {
            throw new QchainException(ErrorKey.BAD_ARGUMENT, "power n", n, "must be at least 0");
        }
    }

    /**
     * {@code P^n} with the {@linkplain SymbolicLimits#DEFAULT default limits}.
     *
     * @param n the power, at least 0
     * @return {@code P^n}, every entry canonical
     * @throws QchainException {@link ErrorKey#SYMBOLIC_TOO_LARGE} with the estimate if it exceeds the limit,
     *                         {@link ErrorKey#BAD_ARGUMENT} for a negative {@code n}
     */
    public RatFunMatrix power(long n) {
        estimatePower(n).requireWithin(SymbolicLimits.DEFAULT);
        return power(n, SymbolicLimits.DEFAULT, x -> { });
    }

    /**
     * {@code P^n}. The caller's size guard decides first ({@code estimatePower(n).requireWithin(limits)}, which
     * refuses with the estimate); this method only asserts that the estimate is within the limits.
     *
     * @param n        the power, at least 0
     * @param limits   the size limit
     * @param progress told the number of multiplications done so far (for a progress display); may do nothing
     * @return {@code P^n}, every entry canonical
     * @throws QchainException {@link ErrorKey#BAD_ARGUMENT} for a negative {@code n},
     *                         {@link ErrorKey#INTERRUPTED} if the thread is interrupted meanwhile
     * @throws IllegalStateException if the estimate exceeds a limit (the guard did not run)
     */
    public RatFunMatrix power(long n, SymbolicLimits limits, LongConsumer progress) {
        PowerEstimate.assertGuarded(estimatePower(n).isWithin(limits), "P^" + n);
        int s = size();
        if (n == 0) {
            return identity(ring, s);
        }
        Poly d = commonDenominator();
        Poly[][] m = numerators(d);
        Poly[][] an = constantEntries(m) ? powerBySquaring(m, n, progress) : powerByRows(m, n, progress);
        return reduce(an, d, n);
    }

    /**
     * Row {@code from} of {@code P^n} by {@code n} vector-matrix products ({@code s} times cheaper than the full
     * power for {@code s} states); equal to {@code power(n)}'s row, entry for entry.
     *
     * @param from     the row, 0-based
     * @param n        the power, at least 0
     * @param limits   the size limit (the estimate of the full power divided by the number of rows,
     *                 {@code estimatePower(n).row(size())}, which the caller's guard checks first)
     * @param progress told the number of products done so far
     * @return the row, canonical entries
     * @throws QchainException as {@link #power(long, SymbolicLimits, LongConsumer)}
     * @throws IllegalStateException as {@link #power(long, SymbolicLimits, LongConsumer)}
     * @throws IndexOutOfBoundsException if {@code from} is out of range
     */
    public List<RatFun> powerRow(int from, long n, SymbolicLimits limits, LongConsumer progress) {
        int s = size();
        java.util.Objects.checkIndex(from, s);
        PowerEstimate.assertGuarded(estimatePower(n).row(s).isWithin(limits), "row " + from + " of P^" + n);
        if (n == 0) {
            return List.of(identity(ring, s).a[from]);
        }
        Poly d = commonDenominator();
        Poly[][] m = numerators(d);
        Poly[] r = m[from];
        for (long step = 1; step < n; step++) {
            checkInterrupt();
            Poly[] next = new Poly[s];
            for (int j = 0; j < s; j++) {
                Poly acc = ring.zero();
                for (int k = 0; k < s; k++) {
                    if (!r[k].isZero() && !m[k][j].isZero()) {
                        acc = acc.add(r[k].multiply(m[k][j]));
                    }
                }
                next[j] = acc;
            }
            r = next;
            progress.accept(step);
        }
        return List.of(reduce(new Poly[][] {r}, d, n).a[0]);
    }

    private static boolean constantEntries(Poly[][] m) {
        for (Poly[] row : m) {
            for (Poly p : row) {
                if (!p.isConstant()) {
                    return false;
                }
            }
        }
        return true;
    }

    private static void checkInterrupt() {
        if (Thread.currentThread().isInterrupted()) {
            throw new QchainException(ErrorKey.INTERRUPTED);
        }
    }

    /**
     * {@code A^n} as {@code A^(k+1) = A^k * A}, using the sparsity of the one-step matrix. For entries of degree
     * {@code g > 0} in {@code v} variables this costs about {@code n^(v+1)} coefficient operations against
     * {@code n^(2v)} for repeated squaring (whose last products multiply two dense high-degree matrices).
     */
    Poly[][] powerByRows(Poly[][] m, long n, LongConsumer progress) {
        int s = m.length;
        // column lists of the non-zero one-step entries
        int[][] nzRows = new int[s][];
        for (int j = 0; j < s; j++) {
            int c = 0;
            int[] tmp = new int[s];
            for (int k = 0; k < s; k++) {
                if (!m[k][j].isZero()) {
                    tmp[c++] = k;
                }
            }
            nzRows[j] = java.util.Arrays.copyOf(tmp, c);
        }
        Poly zero = ring.zero();
        Poly[][] r = m;
        for (long step = 1; step < n; step++) {
            checkInterrupt();
            Poly[][] next = new Poly[s][s];
            for (int i = 0; i < s; i++) {
                for (int j = 0; j < s; j++) {
                    Poly acc = zero;
                    for (int k : nzRows[j]) {
                        if (!r[i][k].isZero()) {
                            acc = acc.add(r[i][k].multiply(m[k][j]));
                        }
                    }
                    next[i][j] = acc;
                }
            }
            r = next;
            progress.accept(step);
        }
        return r;
    }

    /** {@code A^n} by repeated squaring (for constant entries, where degrees do not grow). */
    Poly[][] powerBySquaring(Poly[][] m, long n, LongConsumer progress) {
        Poly[][] result = null;
        Poly[][] base = m;
        long e = n;
        long done = 0;
        while (e > 0) {
            checkInterrupt();
            if ((e & 1) == 1) {
                result = result == null ? base : mul(result, base);
            }
            e >>= 1;
            if (e > 0) {
                base = mul(base, base);
            }
            progress.accept(++done);
        }
        return result;
    }

    private Poly[][] mul(Poly[][] x, Poly[][] y) {
        int s = x.length;
        Poly[][] z = new Poly[s][s];
        for (int i = 0; i < s; i++) {
            for (int j = 0; j < s; j++) {
                Poly acc = ring.zero();
                for (int k = 0; k < s; k++) {
                    if (!x[i][k].isZero() && !y[k][j].isZero()) {
                        acc = acc.add(x[i][k].multiply(y[k][j]));
                    }
                }
                z[i][j] = acc;
            }
        }
        return z;
    }

    /**
     * {@code A^n / d^n}, reduced entry by entry: any common factor of a numerator and {@code d^n} is a power of an
     * irreducible factor {@code f} of {@code d}, so dividing each numerator by each {@code f} while it divides
     * (at most {@code n * mult(f)} times) leaves coprime parts. Exact division is much cheaper than a gcd here.
     */
    private RatFunMatrix reduce(Poly[][] an, Poly d, long n) {
        int s = an.length;
        int cols = an[0].length;
        RatFun[][] out = new RatFun[s][cols];
        if (d.isOne()) {
            for (int i = 0; i < s; i++) {
                for (int j = 0; j < cols; j++) {
                    out[i][j] = RatFun.of(an[i][j]);
                }
            }
            return new RatFunMatrix(ring, out);
        }
        Poly.Factorization fd = d.factor();
        for (int i = 0; i < s; i++) {
            for (int j = 0; j < cols; j++) {
                checkInterrupt();
                Poly num = an[i][j];
                if (num.isZero()) {
                    out[i][j] = RatFun.of(num);
                    continue;
                }
                Poly den = ring.one();
                for (Poly.Factor f : fd.factors()) {
                    long left = n * f.exponent();
                    while (left > 0) {
                        java.util.Optional<Poly> q = num.divideExact(f.base());
                        if (q.isEmpty()) {
                            break;
                        }
                        num = q.get();
                        left--;
                    }
                    if (left > 0) {
                        den = den.multiply(f.base().pow(Math.toIntExact(left)));
                    }
                }
                // d = unit * product(f^e) with unit = 1/fd.unit() folded into the numerator
                Rational unitN = fd.unit().pow(Math.toIntExact(n));
                out[i][j] = RatFun.normalizedReduced(num.multiply(unitN.reciprocal()), den);
            }
        }
        return new RatFunMatrix(ring, out);
    }

    /**
     * The exact value at a point.
     *
     * @param values a value for every variable that occurs (extra names are ignored)
     * @return the rational matrix
     * @throws QchainException {@link ErrorKey#FREE_PARAMETERS} if an occurring variable has no value,
     *                         {@link ErrorKey#DIVISION_BY_ZERO} if a denominator vanishes there
     */
    public RationalMatrix evaluate(Map<String, Rational> values) {
        int n = size();
        Rational[][] r = new Rational[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                r[i][j] = a[i][j].evaluate(values);
            }
        }
        return RationalMatrix.of(r);
    }

    /**
     * Substitutes exact values for some variables; the others stay symbolic (same ring).
     *
     * @param values values by variable name
     * @return the matrix of the remaining variables
     * @throws QchainException {@link ErrorKey#DIVISION_BY_ZERO} if a denominator becomes identically 0
     */
    public RatFunMatrix substitute(Map<String, Rational> values) {
        int n = size();
        RatFun[][] r = new RatFun[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                r[i][j] = a[i][j].substitute(values);
            }
        }
        return new RatFunMatrix(ring, r);
    }

    /**
     * The entrywise partial derivative.
     *
     * @param var a variable of the ring
     * @return {@code dP/d var}
     */
    public RatFunMatrix derivative(String var) {
        int n = size();
        RatFun[][] r = new RatFun[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                r[i][j] = a[i][j].derivative(var);
            }
        }
        return new RatFunMatrix(ring, r);
    }

    @Override
    public boolean equals(Object o) {
        if (!(o instanceof RatFunMatrix m) || !m.ring.equals(ring) || m.size() != size()) {
            return false;
        }
        for (int i = 0; i < size(); i++) {
            for (int j = 0; j < size(); j++) {
                if (!a[i][j].equals(m.a[i][j])) {
                    return false;
                }
            }
        }
        return true;
    }

    @Override
    public int hashCode() {
        int h = ring.hashCode();
        for (RatFun[] row : a) {
            for (RatFun f : row) {
                h = 31 * h + f.hashCode();
            }
        }
        return h;
    }

    /** Rows in brackets, entries in plain syntax: {@code [[1 - a, a], [b, 1 - b]]}. */
    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder("[");
        for (int i = 0; i < size(); i++) {
            sb.append(i == 0 ? "[" : ", [");
            for (int j = 0; j < size(); j++) {
                sb.append(j == 0 ? "" : ", ").append(a[i][j]);
            }
            sb.append(']');
        }
        return sb.append(']').toString();
    }
}
