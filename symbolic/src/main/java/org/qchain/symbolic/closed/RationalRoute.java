package org.qchain.symbolic.closed;

import edu.jas.arith.BigRational;
import edu.jas.poly.ExpVector;
import edu.jas.poly.GenPolynomial;
import edu.jas.poly.GenPolynomialRing;
import edu.jas.ufd.Quotient;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.Progress;
import org.qchain.exact.QchainException;
import org.qchain.symbolic.SymbolicLimits;

/**
 * The route for a chain with no free parameter: the same quantities as the general route (powers, characteristic
 * polynomial, adjugate coefficients, the parts {@code C_t} of a simple factor and its projector), in integer
 * arithmetic over one common denominator instead of {@code Quotient} arithmetic with a gcd in every operation.
 *
 * <p>Method. With {@code d} the least common denominator of P, {@code A = dP} is an integer matrix and
 * {@code P^k = A^k / d^k}. The coefficients of {@code det(xI - A) = sum_k a_k x^(s-k)} come from the traces of the
 * powers of A by Newton's identities (every division by k is exact over the integers), and those of P are
 * {@code c_k = a_k / d^k}; the adjugate coefficients are {@code B_k(P) = B_k(A) / d^k} with the integer matrices
 * {@code B_k(A) = sum_{m<=k} a_m A^(k-m)}. A simple irreducible factor g of chi contributes
 * {@code C_t = sum_k h_(k,t) B_k(P)} with {@code h_k = x^(s-1-k) chi'(x)^-1 mod g} computed in Q[x] (JAS over
 * {@code BigRational}: the univariate arithmetic modulo g is the arithmetic of the number field Q[x]/(g)); each
 * {@code C_t} is one integer combination of the {@code B_k(A)} over one common denominator, reduced once per entry at
 * the end. The projector {@code E = sum_t p_t C_t} (p_t the power sums of the roots of g) is another such
 * combination. Results are handed back as constant {@code Quotient} elements, so everything downstream of this class
 * (formulas, conditions, long run, every printed form) is the general route's code, unchanged.
 */
final class RationalRoute {
    private final ParamField field;
    private final int size;
    /** The common denominator d of P. */
    private final BigInteger d;
    /** d^k, k = 0 .. s. */
    private final List<BigInteger> dPowers;
    /** A^k, k = 0 .. s. */
    private final List<BigInteger[][]> powers;
    /** a_k, k = 0 .. s, the coefficients of det(xI - A). */
    private final List<BigInteger> charCoeffs;
    /** B_k(A), k = 0 .. s-1. */
    private final List<BigInteger[][]> adjugate;
    private final GenPolynomialRing<BigRational> qx;
    private final SymbolicLimits limits;
    /** The tables h of the simple factors (monic, over Q), made with the estimate, used once by {@link #simple}. */
    private final Map<GenPolynomial<BigRational>, BigRational[][]> tables = new java.util.HashMap<>();

    private RationalRoute(ParamField field, Quotient<BigRational>[][] p, SymbolicLimits limits, Progress progress) {
        this.field = field;
        this.limits = limits;
        int s = p.length;
        this.size = s;
        BigInteger den = BigInteger.ONE;
        for (Quotient<BigRational>[] row : p) {
            for (Quotient<BigRational> q : row) {
                BigInteger qd = ParamField.constantValue(q).denominator();
                den = den.divide(den.gcd(qd)).multiply(qd);
            }
        }
        this.d = den;
        BigInteger[][] a = new BigInteger[s][s];
        for (int i = 0; i < s; i++) {
            for (int j = 0; j < s; j++) {
                BigRational v = ParamField.constantValue(p[i][j]);
                a[i][j] = v.numerator().multiply(den.divide(v.denominator()));
            }
        }
        List<BigInteger> dk = new ArrayList<>();
        List<BigInteger[][]> pw = new ArrayList<>();
        dk.add(BigInteger.ONE);
        pw.add(identity(s));
        for (int k = 1; k <= s; k++) {
            Steps.report(progress, "powers", k - 1, s);
            dk.add(dk.get(k - 1).multiply(den));
            pw.add(multiply(pw.get(k - 1), a));
        }
        this.dPowers = List.copyOf(dk);
        this.powers = List.copyOf(pw);
        // Newton's identities over the integers: k a_k = -(a_{k-1} t_1 + ... + a_0 t_k), t_j = trace(A^j)
        List<BigInteger> c = new ArrayList<>();
        c.add(BigInteger.ONE);
        for (int k = 1; k <= s; k++) {
            BigInteger acc = BigInteger.ZERO;
            for (int j = 1; j <= k; j++) {
                acc = acc.add(c.get(k - j).multiply(trace(pw.get(j))));
            }
            BigInteger[] qr = acc.negate().divideAndRemainder(BigInteger.valueOf(k));
            if (qr[1].signum() != 0) {
                throw new QchainException(ErrorKey.INTERNAL, "Newton's identities: inexact division");
            }
            c.add(qr[0]);
        }
        this.charCoeffs = List.copyOf(c);
        List<BigInteger[][]> adj = new ArrayList<>();
        for (int k = 0; k < s; k++) {
            BigInteger[][] b = new BigInteger[s][s];
            for (int i = 0; i < s; i++) {
                for (int j = 0; j < s; j++) {
                    BigInteger v = BigInteger.ZERO;
                    for (int m = 0; m <= k; m++) {
                        BigInteger e = pw.get(k - m)[i][j];
                        if (e.signum() != 0 && c.get(m).signum() != 0) {
                            v = v.add(c.get(m).multiply(e));
                        }
                    }
                    b[i][j] = v;
                }
            }
            adj.add(b);
        }
        this.adjugate = List.copyOf(adj);
        this.qx = new GenPolynomialRing<>(BigRational.ZERO, new String[] {"x"});
    }

    /**
     * The system property that, set to {@code true}, sends parameter-free chains down the general ({@code Quotient})
     * route too: the baseline of the benchmarks and of the cross-check tests.
     */
    static final String GENERAL_ROUTE_PROPERTY = "qchain.closed.generalRoute";

    /** Whether the matrix has no free parameter, so that this route applies (unless the property says otherwise). */
    static boolean applies(ParamField field) {
        return field.names.isEmpty() && !Boolean.getBoolean(GENERAL_ROUTE_PROPERTY);
    }

    /** The integer forms of the powers, characteristic polynomial and adjugate of a parameter-free matrix. */
    static RationalRoute of(ParamField field, Quotient<BigRational>[][] p, SymbolicLimits limits, Progress progress) {
        return new RationalRoute(field, p, limits, progress);
    }

    /** P^0 .. P^s as matrices of constants. */
    List<Quotient<BigRational>[][]> powers() {
        List<Quotient<BigRational>[][]> out = new ArrayList<>();
        for (int k = 0; k <= size; k++) {
            out.add(scaled(powers.get(k), dPowers.get(k)));
        }
        return List.copyOf(out);
    }

    /** c_0 .. c_s of {@code det(xI - P) = sum_k c_k x^(s-k)}. */
    List<Quotient<BigRational>> charCoeffs() {
        List<Quotient<BigRational>> out = new ArrayList<>();
        for (int k = 0; k <= size; k++) {
            out.add(constant(charCoeffs.get(k), dPowers.get(k)));
        }
        return List.copyOf(out);
    }

    /** B_0 .. B_(s-1) of {@code adj(xI - P) = sum_k B_k x^(s-1-k)}. */
    List<Quotient<BigRational>[][]> adjugate() {
        List<Quotient<BigRational>[][]> out = new ArrayList<>();
        for (int k = 0; k < size; k++) {
            out.add(scaled(adjugate.get(k), dPowers.get(k)));
        }
        return List.copyOf(out);
    }

    /**
     * The factorisation of chi (constant coefficients) over Q, by JAS's univariate factoriser over {@code BigRational}
     * rather than over the quotient field: the same monic irreducible factors, in the same (sorted) order. Then the
     * size of the closed form is estimated from every simple factor's table h, and refused past the digit limit
     * before any part is multiplied out (factors of multiplicity above 1 take the general route and are not counted).
     *
     * @throws QchainException with {@link ErrorKey#RESULT_TOO_LARGE} past the limit
     */
    java.util.SortedMap<GenPolynomial<Quotient<BigRational>>, Long> factors(GenPolynomial<Quotient<BigRational>> chi) {
        java.util.SortedMap<GenPolynomial<BigRational>, Long> fq =
            edu.jas.ufd.FactorFactory.getImplementation(BigRational.ZERO).factors(overQ(chi));
        java.util.SortedMap<GenPolynomial<Quotient<BigRational>>, Long> out = new java.util.TreeMap<>();
        for (Map.Entry<GenPolynomial<BigRational>, Long> t : fq.entrySet()) {
            GenPolynomial<Quotient<BigRational>> g = field.univariate.getZERO();
            for (Map.Entry<ExpVector, BigRational> c : t.getKey().monic().getMap().entrySet()) {
                g = g.sum(constant(c.getValue().numerator(), c.getValue().denominator()), c.getKey());
            }
            out.merge(g, t.getValue(), Long::sum);
        }
        // the tables h of every simple factor now, so that the size of the whole result is known before any part
        GenPolynomial<BigRational> chiDeriv = Spectral.derivativeOf(overQ(chi));
        long digits = 0;
        for (Map.Entry<GenPolynomial<BigRational>, Long> t : fq.entrySet()) {
            if (t.getValue() == 1 && t.getKey().degree(0) > 0) {
                GenPolynomial<BigRational> gq = t.getKey().monic();
                BigRational[][] h = table(gq, chiDeriv);
                tables.put(gq, h);
                digits += estimate(h, (int) gq.degree(0));
            }
        }
        // the second line of defence: a caller's size guard refuses first with ClosedForms.digitBound, from P's
        // entries, which is never below this figure (DigitBound gives the argument), so this does not fire there
        if (digits > limits.maxDigits()) {
            throw new QchainException(ErrorKey.RESULT_TOO_LARGE, digits, limits.maxDigits(), SymbolicLimits.DIGITS_OPTION);
        }
        return out;
    }

    /** h[k][t]: coefficient t of {@code x^(s-1-k) chi'(x)^-1 mod g}, k = 0 .. s-1. */
    private BigRational[][] table(GenPolynomial<BigRational> gq, GenPolynomial<BigRational> chiDeriv) {
        int e = (int) gq.degree(0);
        BigRational[][] h = new BigRational[size][];
        GenPolynomial<BigRational> xk = inverse(chiDeriv.remainder(gq), gq);
        GenPolynomial<BigRational> x = qx.univariate(0);
        for (int k = size - 1; k >= 0; k--) {
            h[k] = coefficientsOf(xk, e - 1);
            xk = xk.multiply(x).remainder(gq);
        }
        return h;
    }

    /** The parts of a simple factor: {@code C_0 .. C_(e-1)} and the projector. */
    record Parts(List<Quotient<BigRational>[][]> c, Quotient<BigRational>[][] projector) {
    }

    /**
     * The parts of a factor g of multiplicity 1: {@code C_t = sum_k [x^(s-1-k) chi'(x)^-1 mod g]_t B_k} and
     * {@code E = sum_t p_t C_t}.
     *
     * @param g          the monic irreducible factor (constant coefficients)
     * @param chiDeriv   chi'
     * @param powerSums  p_0 .. p_(e-1), the power sums of the roots of g
     */
    Parts simple(GenPolynomial<Quotient<BigRational>> g, GenPolynomial<Quotient<BigRational>> chiDeriv,
                 List<Quotient<BigRational>> powerSums) {
        int s = size;
        int e = (int) g.degree(0);
        GenPolynomial<BigRational> gq = overQ(g);
        BigRational[][] h = tables.remove(gq);
        if (h == null) {
            h = table(gq, overQ(chiDeriv));
        }
        List<Quotient<BigRational>[][]> c = new ArrayList<>();
        BigRational[] proj = new BigRational[s];
        java.util.Arrays.fill(proj, BigRational.ZERO);
        for (int t = 0; t < e; t++) {
            BigRational[] coeff = new BigRational[s];
            BigRational pt = ParamField.constantValue(powerSums.get(t));
            for (int k = 0; k < s; k++) {
                coeff[k] = h[k][t];
                proj[k] = proj[k].sum(pt.multiply(h[k][t]));
            }
            c.add(combination(coeff));
        }
        return new Parts(List.copyOf(c), combination(proj));
    }

    /**
     * The printed digits of the parts of one simple factor, estimated from its table h. Each of the e s^2 entries of {@code C_0 .. C_(e-1)} is
     * {@code (sum_k m_k B_k(A)) / L} before reduction, with L the common denominator of {@code q_k = h_(k,t) / d^k}
     * and {@code m_k = q_k L}, so numerator and denominator together have at most about
     * {@code 2 digits(L) + max_k digits(q_k) + max digits(B_k(A))} digits. Measured: 464,400 estimated against
     * 432,397 digits printed for the dense 12-state benchmark chain, 6,596,800 against 6,357,607 for the 20-state one.
     */
    private long estimate(BigRational[][] h, int e) {
        long maxB = 0;
        for (BigInteger[][] b : adjugate) {
            for (BigInteger[] row : b) {
                for (BigInteger v : row) {
                    maxB = Math.max(maxB, v.bitLength());
                }
            }
        }
        long perEntry = 0;
        for (int t = 0; t < e; t++) {
            BigInteger l = BigInteger.ONE;
            long maxNum = 0;
            for (int k = 0; k < size; k++) {
                BigRational q = h[k][t].divide(new BigRational(dPowers.get(k)));
                l = l.divide(l.gcd(q.denominator())).multiply(q.denominator());
                maxNum = Math.max(maxNum, q.numerator().bitLength() - q.denominator().bitLength());
            }
            perEntry = Math.max(perEntry, 2 * l.bitLength() + maxNum + maxB);
        }
        // bits to decimal digits, times the entries of the parts
        return (long) Math.ceil(perEntry * 0.30103) * e * size * (long) size;
    }

    /** {@code sum_k q_k B_k(P) = sum_k (q_k / d^k) B_k(A)}, over one common denominator, reduced per entry. */
    private Quotient<BigRational>[][] combination(BigRational[] q) {
        int s = size;
        BigRational[] scaled = new BigRational[s];
        BigInteger l = BigInteger.ONE;
        for (int k = 0; k < s; k++) {
            scaled[k] = q[k].divide(new BigRational(dPowers.get(k)));
            BigInteger kd = scaled[k].denominator();
            l = l.divide(l.gcd(kd)).multiply(kd);
        }
        BigInteger[] m = new BigInteger[s];
        for (int k = 0; k < s; k++) {
            m[k] = scaled[k].numerator().multiply(l.divide(scaled[k].denominator()));
        }
        BigInteger[][] sum = new BigInteger[s][s];
        java.util.stream.IntStream.range(0, s).parallel().forEach(i -> {
            for (int j = 0; j < s; j++) {
                BigInteger v = BigInteger.ZERO;
                for (int k = 0; k < s; k++) {
                    BigInteger b = adjugate.get(k)[i][j];
                    if (m[k].signum() != 0 && b.signum() != 0) {
                        v = v.add(m[k].multiply(b));
                    }
                }
                sum[i][j] = v;
            }
        });
        // the common factor of every entry and the denominator first: the entries' own gcds then run on smaller numbers
        BigInteger g = l;
        for (int i = 0; i < s && !g.equals(BigInteger.ONE); i++) {
            for (int j = 0; j < s && !g.equals(BigInteger.ONE); j++) {
                g = g.gcd(sum[i][j]);
            }
        }
        if (!g.equals(BigInteger.ONE)) {
            for (int i = 0; i < s; i++) {
                for (int j = 0; j < s; j++) {
                    sum[i][j] = sum[i][j].divide(g);
                }
            }
        }
        return scaled(sum, l.divide(g));
    }

    /**
     * {@code u^-1 mod g} in the number field Q[x]/(g): the solution w of {@code M w = (1, 0, ..., 0)}, with column j
     * of M the coefficients of {@code x^j u mod g}, by fraction-free (Bareiss) elimination over the integers
     * (each column scaled to integers first). Euclid's extended algorithm over Q, which JAS's {@code modInverse}
     * runs, makes every remainder monic and swells the intermediate coefficients far past the result's size.
     */
    private GenPolynomial<BigRational> inverse(GenPolynomial<BigRational> u, GenPolynomial<BigRational> g) {
        int e = (int) g.degree(0);
        BigInteger[][] m = new BigInteger[e][e + 1];
        BigInteger[] scale = new BigInteger[e];
        GenPolynomial<BigRational> col = u;
        GenPolynomial<BigRational> x = qx.univariate(0);
        for (int j = 0; j < e; j++) {
            BigRational[] c = coefficientsOf(col, e - 1);
            BigInteger l = BigInteger.ONE;
            for (BigRational r : c) {
                l = l.divide(l.gcd(r.denominator())).multiply(r.denominator());
            }
            scale[j] = l;
            for (int i = 0; i < e; i++) {
                m[i][j] = c[i].numerator().multiply(l.divide(c[i].denominator()));
            }
            col = col.multiply(x).remainder(g);
        }
        for (int i = 0; i < e; i++) {
            m[i][e] = i == 0 ? BigInteger.ONE : BigInteger.ZERO;
        }
        BigInteger prev = BigInteger.ONE;
        for (int k = 0; k < e; k++) {
            int piv = k;
            while (piv < e && m[piv][k].signum() == 0) {
                piv++;
            }
            if (piv == e) {
                throw new QchainException(ErrorKey.INTERNAL, "chi' is not invertible modulo an irreducible factor");
            }
            BigInteger[] tmp = m[k];
            m[k] = m[piv];
            m[piv] = tmp;
            for (int i = k + 1; i < e; i++) {
                for (int j = k + 1; j <= e; j++) {
                    m[i][j] = m[i][j].multiply(m[k][k]).subtract(m[i][k].multiply(m[k][j])).divide(prev);
                }
                m[i][k] = BigInteger.ZERO;
            }
            prev = m[k][k];
        }
        BigRational[] w = new BigRational[e];
        for (int i = e - 1; i >= 0; i--) {
            BigRational acc = new BigRational(m[i][e]);
            for (int j = i + 1; j < e; j++) {
                if (m[i][j].signum() != 0) {
                    acc = acc.subtract(w[j].multiply(new BigRational(m[i][j])));
                }
            }
            w[i] = acc.divide(new BigRational(m[i][i]));
        }
        GenPolynomial<BigRational> r = qx.getZERO();
        for (int j = 0; j < e; j++) {
            r = r.sum(w[j].multiply(new BigRational(scale[j])), ExpVector.create(1, 0, j));
        }
        return r;
    }

    /** A polynomial with constant coefficients as a polynomial over Q. */
    private GenPolynomial<BigRational> overQ(GenPolynomial<Quotient<BigRational>> p) {
        GenPolynomial<BigRational> r = qx.getZERO();
        for (Map.Entry<ExpVector, Quotient<BigRational>> t : p.getMap().entrySet()) {
            r = r.sum(ParamField.constantValue(t.getValue()), ExpVector.create(1, 0, t.getKey().getVal(0)));
        }
        return r;
    }

    private static BigRational[] coefficientsOf(GenPolynomial<BigRational> p, int degree) {
        BigRational[] a = new BigRational[degree + 1];
        java.util.Arrays.fill(a, BigRational.ZERO);
        for (Map.Entry<ExpVector, BigRational> t : p.getMap().entrySet()) {
            a[(int) t.getKey().getVal(0)] = t.getValue();
        }
        return a;
    }

    /** An integer matrix over one denominator as a matrix of constants, each entry reduced. */
    private Quotient<BigRational>[][] scaled(BigInteger[][] m, BigInteger den) {
        int s = m.length;
        Quotient<BigRational>[][] r = Mat.create(s);
        java.util.stream.IntStream.range(0, s).parallel().forEach(i -> {
            for (int j = 0; j < s; j++) {
                r[i][j] = constant(m[i][j], den);
            }
        });
        return r;
    }

    private Quotient<BigRational> constant(BigInteger num, BigInteger den) {
        if (num.signum() == 0) {
            return field.zero();
        }
        return new Quotient<>(field.field, field.poly.getONE().multiply(BigRational.RNRED(num, den)));
    }

    private static BigInteger[][] identity(int s) {
        BigInteger[][] r = new BigInteger[s][s];
        for (int i = 0; i < s; i++) {
            for (int j = 0; j < s; j++) {
                r[i][j] = i == j ? BigInteger.ONE : BigInteger.ZERO;
            }
        }
        return r;
    }

    private static BigInteger[][] multiply(BigInteger[][] a, BigInteger[][] b) {
        int s = a.length;
        BigInteger[][] r = new BigInteger[s][s];
        for (int i = 0; i < s; i++) {
            for (int j = 0; j < s; j++) {
                BigInteger v = BigInteger.ZERO;
                for (int k = 0; k < s; k++) {
                    if (a[i][k].signum() != 0 && b[k][j].signum() != 0) {
                        v = v.add(a[i][k].multiply(b[k][j]));
                    }
                }
                r[i][j] = v;
            }
        }
        return r;
    }

    private static BigInteger trace(BigInteger[][] a) {
        BigInteger t = BigInteger.ZERO;
        for (int i = 0; i < a.length; i++) {
            t = t.add(a[i][i]);
        }
        return t;
    }
}
