package org.qchain.symbolic.closed;

import edu.jas.arith.BigRational;
import edu.jas.poly.ExpVector;
import edu.jas.poly.GenPolynomial;
import edu.jas.ufd.Quotient;
import java.util.Map;

/**
 * Whether a factor of the characteristic polynomial can have a k-th root of unity as a root: the resultant of the
 * factor f and the k-th cyclotomic polynomial Phi_k, {@code prod f(w)} over the primitive k-th roots w, which is 0
 * exactly when f and Phi_k share a root (Lang, Algebra, ch. IV, the resultant; Phi_k from
 * {@code x^k - 1 = prod over d | k of Phi_d}; common practice). Computed as the determinant of multiplication by
 * {@code f mod Phi_k} on {@code Q(parameters)[x]/Phi_k}, the norm of f(w).
 */
final class Cyclotomic {
    private Cyclotomic() {
    }

    /** Res(Phi_k, f) for a polynomial f over Q(parameters), k at least 1. */
    static Quotient<BigRational> resultant(ParamField field, GenPolynomial<Quotient<BigRational>> f, int k) {
        GenPolynomial<Quotient<BigRational>> phi = phi(field, k);
        int d = (int) phi.degree(0);
        GenPolynomial<Quotient<BigRational>> r = f.remainder(phi);
        // column j: x^j * r mod phi in the basis 1, x, ..., x^(d-1)
        Quotient<BigRational>[][] m = Mat.zero(field, d);
        GenPolynomial<Quotient<BigRational>> col = r;
        for (int j = 0; j < d; j++) {
            for (Map.Entry<ExpVector, Quotient<BigRational>> t : col.getMap().entrySet()) {
                m[(int) t.getKey().getVal(0)][j] = t.getValue();
            }
            col = col.multiply(field.univariate.univariate(0)).remainder(phi);
        }
        return determinant(field, m);
    }

    /** Phi_k over Q(parameters), from x^k - 1 divided by Phi_d for every proper divisor d of k. */
    static GenPolynomial<Quotient<BigRational>> phi(ParamField field, int k) {
        GenPolynomial<Quotient<BigRational>> x = field.univariate.univariate(0);
        GenPolynomial<Quotient<BigRational>> p = ParamField.power(x, k).subtract(field.univariate.getONE());
        for (int d = 1; d < k; d++) {
            if (k % d == 0) {
                p = p.divide(phi(field, d));
            }
        }
        return p;
    }

    /** Gaussian elimination over the field (the matrices here are at most s - 1 by s - 1). */
    static Quotient<BigRational> determinant(ParamField field, Quotient<BigRational>[][] a) {
        int n = a.length;
        Quotient<BigRational>[][] m = Mat.create(n);
        for (int i = 0; i < n; i++) {
            m[i] = a[i].clone();
        }
        Quotient<BigRational> det = field.one();
        for (int c = 0; c < n; c++) {
            int p = c;
            while (p < n && m[p][c].isZERO()) {
                p++;
            }
            if (p == n) {
                return field.zero();
            }
            if (p != c) {
                Quotient<BigRational>[] t = m[p];
                m[p] = m[c];
                m[c] = t;
                det = det.negate();
            }
            det = det.multiply(m[c][c]);
            for (int r = c + 1; r < n; r++) {
                if (m[r][c].isZERO()) {
                    continue;
                }
                Quotient<BigRational> q = m[r][c].divide(m[c][c]);
                for (int j = c; j < n; j++) {
                    m[r][j] = m[r][j].subtract(q.multiply(m[c][j]));
                }
            }
        }
        return det;
    }
}
