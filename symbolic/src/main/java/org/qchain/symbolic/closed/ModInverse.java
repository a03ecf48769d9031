package org.qchain.symbolic.closed;

import edu.jas.arith.BigRational;
import edu.jas.poly.ExpVector;
import edu.jas.poly.GenPolynomial;
import edu.jas.ufd.Quotient;
import java.util.Map;

/**
 * The inverse of a modulo m in Q(parameters)[x], for a and m coprime, m monic: the solution u of the linear
 * system "a u = 1 modulo m" in the basis 1, x, ..., x^(e-1) (e the degree of m), solved fraction-free over
 * Q[parameters] (Bareiss' elimination carried on above the pivots, where every division is exact and the matrix
 * ends as det times the identity: Nakos, Turner and Williams, "Fraction-free algorithms for linear and polynomial
 * equations", SIGSAM Bulletin 31 (1997); from memory). JAS's extended Euclid over the quotient field takes a gcd in
 * every coefficient operation and ran for minutes on a quartic factor with two parameters; here one gcd per
 * coefficient of the result remains.
 */
final class ModInverse {
    private ModInverse() {
    }

    static GenPolynomial<Quotient<BigRational>> of(ParamField f, GenPolynomial<Quotient<BigRational>> a,
                                                   GenPolynomial<Quotient<BigRational>> m) {
        int e = (int) m.degree(0);
        GenPolynomial<Quotient<BigRational>> r = a.remainder(m);
        if (e <= 1) {
            Quotient<BigRational> c = r.leadingBaseCoefficient();
            return f.univariate.getONE().multiply(c.inverse());
        }
        // column j: x^j r mod m; rows cleared of denominators, one common denominator per row
        Quotient<BigRational>[][] q = Mat.zero(f, e);
        GenPolynomial<Quotient<BigRational>> col = r;
        GenPolynomial<Quotient<BigRational>> x = f.univariate.univariate(0);
        for (int j = 0; j < e; j++) {
            for (Map.Entry<ExpVector, Quotient<BigRational>> t : col.getMap().entrySet()) {
                q[(int) t.getKey().getVal(0)][j] = t.getValue();
            }
            col = col.multiply(x).remainder(m);
        }
        @SuppressWarnings("unchecked")
        GenPolynomial<BigRational>[][] w = new GenPolynomial[e][e + 1];
        for (int i = 0; i < e; i++) {
            GenPolynomial<BigRational> l = f.poly.getONE();
            for (int j = 0; j < e; j++) {
                GenPolynomial<BigRational> d = q[i][j].den;
                if (!d.isONE()) {
                    l = l.multiply(d).divide(l.gcd(d));
                }
            }
            for (int j = 0; j < e; j++) {
                w[i][j] = q[i][j].num.multiply(l.divide(q[i][j].den));
            }
            w[i][e] = i == 0 ? l : f.poly.getZERO();
        }
        GenPolynomial<BigRational> prev = f.poly.getONE();
        for (int k = 0; k < e; k++) {
            int p = k;
            while (p < e && w[p][k].isZERO()) {
                p++;
            }
            if (p == e) {
                throw new ArithmeticException("not invertible modulo the factor");
            }
            GenPolynomial<BigRational>[] tmp = w[p];
            w[p] = w[k];
            w[k] = tmp;
            for (int i = 0; i < e; i++) {
                if (i == k) {
                    continue;
                }
                for (int j = 0; j <= e; j++) {
                    if (j == k) {
                        continue;
                    }
                    w[i][j] = w[k][k].multiply(w[i][j]).subtract(w[i][k].multiply(w[k][j])).divide(prev);
                }
                w[i][k] = f.poly.getZERO();
            }
            // the pivot row itself is carried as is; rows before k were scaled by every pivot so far
            prev = w[k][k];
        }
        // now w[i][i] u_i = w[i][e] for every i (diagonal entries: det for rows eliminated after their pivot)
        GenPolynomial<Quotient<BigRational>> u = f.univariate.getZERO();
        for (int i = 0; i < e; i++) {
            if (!w[i][e].isZERO()) {
                u = u.sum(new Quotient<>(f.field, w[i][e], w[i][i]), ExpVector.create(1, 0, i));
            }
        }
        return u;
    }
}
