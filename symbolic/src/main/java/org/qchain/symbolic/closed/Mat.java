package org.qchain.symbolic.closed;

import edu.jas.arith.BigRational;
import edu.jas.ufd.Quotient;
import java.util.Arrays;

/** Dense square matrices over Q(parameters), as plain arrays; package-private helpers, never exposed. */
final class Mat {
    private Mat() {
    }

    @SuppressWarnings("unchecked")
    static Quotient<BigRational>[][] create(int n) {
        return (Quotient<BigRational>[][]) new Quotient[n][n];
    }

    static Quotient<BigRational>[][] zero(ParamField f, int n) {
        Quotient<BigRational>[][] z = create(n);
        for (Quotient<BigRational>[] row : z) {
            Arrays.fill(row, f.zero());
        }
        return z;
    }

    static Quotient<BigRational>[][] identity(ParamField f, int n) {
        Quotient<BigRational>[][] z = zero(f, n);
        for (int i = 0; i < n; i++) {
            z[i][i] = f.one();
        }
        return z;
    }

    static Quotient<BigRational>[][] multiply(ParamField f, Quotient<BigRational>[][] a, Quotient<BigRational>[][] b) {
        int n = a.length;
        Quotient<BigRational>[][] r = create(n);
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                Quotient<BigRational> s = f.zero();
                for (int k = 0; k < n; k++) {
                    if (!a[i][k].isZERO() && !b[k][j].isZERO()) {
                        s = s.sum(a[i][k].multiply(b[k][j]));
                    }
                }
                r[i][j] = s;
            }
        }
        return r;
    }

    /** {@code a + c * b}. */
    static Quotient<BigRational>[][] addScaled(Quotient<BigRational>[][] a, Quotient<BigRational> c, Quotient<BigRational>[][] b) {
        int n = a.length;
        Quotient<BigRational>[][] r = create(n);
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                r[i][j] = (c.isZERO() || b[i][j].isZERO()) ? a[i][j] : a[i][j].sum(c.multiply(b[i][j]));
            }
        }
        return r;
    }

    static boolean isZero(Quotient<BigRational>[][] a) {
        for (Quotient<BigRational>[] row : a) {
            for (Quotient<BigRational> x : row) {
                if (!x.isZERO()) {
                    return false;
                }
            }
        }
        return true;
    }

    static boolean equal(Quotient<BigRational>[][] a, Quotient<BigRational>[][] b) {
        for (int i = 0; i < a.length; i++) {
            for (int j = 0; j < a.length; j++) {
                if (!a[i][j].subtract(b[i][j]).isZERO()) {
                    return false;
                }
            }
        }
        return true;
    }

    static Quotient<BigRational> trace(Quotient<BigRational>[][] a) {
        Quotient<BigRational> t = a[0][0];
        for (int i = 1; i < a.length; i++) {
            t = t.sum(a[i][i]);
        }
        return t;
    }
}
