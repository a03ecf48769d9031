package org.qchain.symbolic.closed;

import edu.jas.arith.BigRational;
import edu.jas.poly.ExpVector;
import edu.jas.poly.GenPolynomial;
import edu.jas.poly.GenPolynomialRing;
import edu.jas.ufd.FactorFactory;
import edu.jas.ufd.Quotient;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.SortedMap;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.Progress;
import org.qchain.exact.QchainException;
import org.qchain.symbolic.ParamRing;
import org.qchain.symbolic.RatFunMatrix;
import org.qchain.symbolic.SymbolicLimits;

/**
 * What every chain has, before any eigenvalue is named: the powers P^0 .. P^s, the characteristic polynomial
 * {@code chi(x) = det(xI - P) = sum_k c_k x^(s-k)} (from the traces of the powers by Newton's identities, so no
 * division by a polynomial), its factorisation over Q(parameters), and the coefficients {@code B_k} of
 * {@code adj(xI - P) = sum_k B_k x^(s-1-k)} (Faddeev-LeVerrier, {@code B_k = sum_{m<=k} c_m P^(k-m)}). From these,
 * {@code det(I - zP) = sum_k c_k z^k} and {@code adj(I - zP) = sum_k B_k z^k}: the generating function.
 */
final class Series {
    final ParamField field;
    /** The ring of the input matrix, for results handed back as {@code RatFun}. */
    final ParamRing ring;
    final int size;
    final Quotient<BigRational>[][] matrix;
    final List<Quotient<BigRational>[][]> powers;
    final List<Quotient<BigRational>> charCoeffs;
    final GenPolynomial<Quotient<BigRational>> chi;
    final List<Quotient<BigRational>[][]> adjugate;
    /** Monic irreducible factors of chi and their multiplicities. */
    final List<GenPolynomial<Quotient<BigRational>>> factors;
    final List<Integer> multiplicities;
    /** The integer forms for a matrix with no free parameter (else null: the general route). */
    final RationalRoute numeric;

    private Series(ParamField field, ParamRing ring, Quotient<BigRational>[][] matrix, SymbolicLimits limits,
                   Progress progress) {
        this.field = field;
        this.ring = ring;
        this.matrix = matrix;
        ParamField f = field;
        int s = matrix.length;
        this.size = s;
        // no free parameter: integer arithmetic over a common denominator (RationalRoute), same results
        this.numeric = RationalRoute.applies(f) ? RationalRoute.of(f, matrix, limits, progress) : null;
        List<Quotient<BigRational>[][]> pw = new ArrayList<>();
        pw.add(Mat.identity(f, s));
        for (int k = 1; k <= s && numeric == null; k++) {
            Steps.report(progress, "powers", k - 1, s);
            pw.add(Mat.multiply(f, pw.get(k - 1), matrix));
        }
        this.powers = numeric != null ? numeric.powers() : List.copyOf(pw);
        // Newton's identities: k c_k = -(c_{k-1} p_1 + ... + c_0 p_k), p_j = trace(P^j)
        List<Quotient<BigRational>> c = new ArrayList<>();
        c.add(f.one());
        for (int k = 1; k <= s && numeric == null; k++) {
            Quotient<BigRational> acc = f.zero();
            for (int j = 1; j <= k; j++) {
                acc = acc.sum(c.get(k - j).multiply(Mat.trace(pw.get(j))));
            }
            c.add(acc.negate().divide(f.of(k)));
        }
        this.charCoeffs = numeric != null ? numeric.charCoeffs() : List.copyOf(c);
        c = charCoeffs;
        GenPolynomial<Quotient<BigRational>> x = f.univariate.getZERO();
        for (int k = 0; k <= s; k++) {
            x = x.sum(c.get(k), ExpVector.create(1, 0, s - k));
        }
        this.chi = x;
        List<Quotient<BigRational>[][]> adj = new ArrayList<>();
        for (int k = 0; k < s && numeric == null; k++) {
            Quotient<BigRational>[][] b = Mat.zero(f, s);
            for (int m = 0; m <= k; m++) {
                b = Mat.addScaled(b, c.get(m), pw.get(k - m));
            }
            adj.add(b);
        }
        this.adjugate = numeric != null ? numeric.adjugate() : List.copyOf(adj);
        Steps.report(progress, "factoring", 0, 1);
        SortedMap<GenPolynomial<Quotient<BigRational>>, Long> fm = numeric != null ? numeric.factors(chi)
            : factorOverParameters(f, chi);
        List<GenPolynomial<Quotient<BigRational>>> fs = new ArrayList<>();
        List<Integer> ms = new ArrayList<>();
        GenPolynomial<Quotient<BigRational>> product = f.univariate.getONE();
        for (Map.Entry<GenPolynomial<Quotient<BigRational>>, Long> e : fm.entrySet()) {
            if (e.getKey().degree(0) == 0) {
                continue; // the constant JAS reports as a factor of its own; chi is monic, checked below
            }
            GenPolynomial<Quotient<BigRational>> g = e.getKey().monic();
            fs.add(g);
            ms.add(e.getValue().intValue());
            product = product.multiply(ParamField.power(g, e.getValue()));
        }
        if (!product.subtract(chi).isZERO()) {
            throw new QchainException(ErrorKey.INTERNAL, "factors of the characteristic polynomial do not multiply back");
        }
        this.factors = List.copyOf(fs);
        this.multiplicities = List.copyOf(ms);
    }

    /**
     * The factorisation of a monic polynomial in x over Q(parameters), through Q[parameters, x]: the denominators
     * cleared, JAS's multivariate factorisation over Q, the factors of positive degree in x brought back (Gauss's
     * lemma: irreducible over Q[parameters, x] and of positive degree in x means irreducible over Q(parameters)[x];
     * Lang, Algebra, ch. IV, from memory). JAS's factorisation over the quotient field itself ran past 600 s for a
     * 4-state chain with two parameters, with its gcd in every coefficient operation; this takes well under a second.
     * The factors of degree 0 in x (the cleared denominator's content) are dropped; the caller checks the product.
     */
    static SortedMap<GenPolynomial<Quotient<BigRational>>, Long> factorOverParameters(ParamField f,
            GenPolynomial<Quotient<BigRational>> p) {
        int n = f.names.size();
        if (n == 0) {
            return FactorFactory.getImplementation(f.field).factors(p);
        }
        GenPolynomial<BigRational> l = f.poly.getONE();
        for (Quotient<BigRational> c : p.getMap().values()) {
            if (!c.den.isConstant()) {
                l = l.multiply(c.den).divide(l.gcd(c.den));
            }
        }
        String[] vars = new String[n + 1];
        for (int i = 0; i < n; i++) {
            vars[i] = "p" + i;
        }
        vars[n] = "x";
        GenPolynomialRing<BigRational> joint = new GenPolynomialRing<>(BigRational.ZERO, vars);
        GenPolynomial<BigRational> q = joint.getZERO();
        for (Map.Entry<ExpVector, Quotient<BigRational>> t : p.getMap().entrySet()) {
            Quotient<BigRational> c = t.getValue();
            // c * l is a polynomial: l is a multiple of c's denominator
            GenPolynomial<BigRational> cl = c.num.multiply(l.divide(c.den));
            for (Map.Entry<ExpVector, BigRational> u : cl.getMap().entrySet()) {
                long[] e = new long[n + 1];
                e[0] = t.getKey().getVal(0);
                for (int k = 0; k < n; k++) {
                    e[k + 1] = u.getKey().getVal(k);
                }
                q = q.sum(u.getValue(), ExpVector.create(e));
            }
        }
        SortedMap<GenPolynomial<BigRational>, Long> fm = FactorFactory.getImplementation(BigRational.ZERO).factors(q);
        SortedMap<GenPolynomial<Quotient<BigRational>>, Long> out = new java.util.TreeMap<>();
        for (Map.Entry<GenPolynomial<BigRational>, Long> e : fm.entrySet()) {
            GenPolynomial<Quotient<BigRational>> back = f.univariate.getZERO();
            for (Map.Entry<ExpVector, BigRational> t : e.getKey().getMap().entrySet()) {
                long[] c = new long[n];
                for (int k = 0; k < n; k++) {
                    c[k] = t.getKey().getVal(k + 1);
                }
                Quotient<BigRational> coef = new Quotient<>(f.field, f.poly.getONE().multiply(t.getValue(), ExpVector.create(c)));
                back = back.sum(coef, ExpVector.create(1, 0, t.getKey().getVal(0)));
            }
            if (back.degree(0) > 0) {
                out.merge(back.monic(), e.getValue(), Long::sum);
            }
        }
        return out;
    }

    /** From a matrix of the symbolic module, in the variables that occur in it. */
    static Series of(RatFunMatrix p, Progress progress) {
        return of(p, SymbolicLimits.DEFAULT, progress);
    }

    /** As {@link #of(RatFunMatrix, Progress)}; the limit bounds the printed digits (parameter-free chains). */
    static Series of(RatFunMatrix p, SymbolicLimits limits, Progress progress) {
        List<String> names = p.occurringVariables();
        ParamField f = new ParamField(names, "x");
        int s = p.size();
        Quotient<BigRational>[][] q = Mat.create(s);
        for (int i = 0; i < s; i++) {
            for (int j = 0; j < s; j++) {
                q[i][j] = Bridge.toField(f, p.get(i, j));
            }
        }
        return new Series(f, p.ring(), q, limits, progress);
    }
}
