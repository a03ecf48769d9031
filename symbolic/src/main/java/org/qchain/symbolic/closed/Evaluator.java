package org.qchain.symbolic.closed;

import edu.jas.arith.BigRational;
import edu.jas.structure.GcdRingElem;
import edu.jas.structure.RingFactory;
import edu.jas.ufd.Quotient;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;

/**
 * Evaluates the spectral terms of a closed form at a given n, exactly, in a coefficient field C: Q(parameters)
 * itself (free parameters) or Q (parameters substituted). Square-root pairs are computed in C[sqrt(D)] as
 * {@code x + y sqrt(D)}, so the radical form is checked exactly, never through floating point.
 *
 * @param <C> the coefficient field
 */
final class Evaluator<C extends GcdRingElem<C>> {
    private final RingFactory<C> fac;
    private final Function<Quotient<BigRational>, C> conv;

    Evaluator(RingFactory<C> fac, Function<Quotient<BigRational>, C> conv) {
        this.fac = fac;
        this.conv = conv;
    }

    /** Entry (i, j) of the part of P^n that the group contributes. */
    C entry(Spectral.Group g, long n, int i, int j) {
        return entry(g, n, m -> m[i][j]);
    }

    /** The cell (an entry or a combination of entries) of the part of P^n that the group contributes. */
    C entry(Spectral.Group g, long n, ClosedForm.Cell cell) {
        switch (g.kind) {
            case LINEAR: {
                C lambda = conv.apply(g.lambda);
                C s = fac.getZERO();
                for (int k = 0; k < g.nilpotent.size() && k <= n; k++) {
                    Quotient<BigRational> nk = cell.apply(g.nilpotent.get(k));
                    if (nk.isZERO()) {
                        continue;
                    }
                    C term = conv.apply(nk).multiply(fac.fromInteger(binomial(n, k)));
                    s = s.sum(term.multiply(power(lambda, n - k)));
                }
                return s;
            }
            case QUADRATIC: {
                C d = conv.apply(g.delta);
                C half = fac.fromInteger(2).inverse();
                C two = fac.fromInteger(2);
                C s = fac.getZERO();
                for (int k = 0; k < g.x.size() && k <= n; k++) {
                    C x = conv.apply(cell.apply(g.x.get(k)));
                    C y = conv.apply(cell.apply(g.y.get(k)));
                    if (x.isZERO() && y.isZERO()) {
                        continue;
                    }
                    // l1^m = (u/2 + (s/2) sqrt(D))^m = xm + ym sqrt(D); l1^m + l2^m = 2 xm; (l1^m - l2^m)/sqrt(D) = 2 ym
                    List<C> l1m = sqrtPower(conv.apply(g.u).multiply(half), conv.apply(g.scale).multiply(half), d, n - k);
                    C term = x.multiply(two.multiply(l1m.get(0))).sum(y.multiply(two.multiply(l1m.get(1))));
                    s = s.sum(term.multiply(fac.fromInteger(binomial(n, k))));
                }
                return s;
            }
            default: {
                List<C> p = powerSums(g, n + g.degree);
                C s = fac.getZERO();
                for (int k = 0; k < g.c.size() && k <= n; k++) {
                    C b = fac.fromInteger(binomial(n, k));
                    for (int t = 0; t < g.degree; t++) {
                        Quotient<BigRational> ct = cell.apply(g.c.get(k).get(t));
                        if (!ct.isZERO()) {
                            s = s.sum(conv.apply(ct).multiply(b).multiply(p.get((int) (n - k + t))));
                        }
                    }
                }
                return s;
            }
        }
    }

    /** Power sums p_0 .. p_k of the roots of the group's monic factor, by Newton's identities. */
    List<C> powerSums(Spectral.Group g, long k) {
        int e = g.degree;
        List<C> a = new ArrayList<>();
        for (Quotient<BigRational> q : g.coeffs) {
            a.add(conv.apply(q));
        }
        List<C> p = new ArrayList<>();
        p.add(fac.fromInteger(e));
        for (int m = 1; m <= k; m++) {
            C s = fac.getZERO();
            for (int i = 1; i <= Math.min(m - 1, e); i++) {
                s = s.sum(a.get(e - i).multiply(p.get(m - i)));
            }
            if (m <= e) {
                s = s.sum(a.get(e - m).multiply(fac.fromInteger(m)));
            }
            p.add(s.negate());
        }
        return p;
    }

    /** {@code (x + y sqrt(d))^n} as the pair (xn, yn). */
    List<C> sqrtPower(C x, C y, C d, long n) {
        C rx = fac.getONE();
        C ry = fac.getZERO();
        C bx = x;
        C by = y;
        long k = n;
        while (k > 0) {
            if ((k & 1) == 1) {
                C nx = rx.multiply(bx).sum(ry.multiply(by).multiply(d));
                C ny = rx.multiply(by).sum(ry.multiply(bx));
                rx = nx;
                ry = ny;
            }
            k >>= 1;
            if (k > 0) {
                C nx = bx.multiply(bx).sum(by.multiply(by).multiply(d));
                C ny = bx.multiply(by).multiply(fac.fromInteger(2));
                bx = nx;
                by = ny;
            }
        }
        return List.of(rx, ry);
    }

    C power(C base, long e) {
        return e == 0 ? fac.getONE() : ParamField.power(base, e);
    }

    static BigInteger binomial(long n, long k) {
        if (k < 0 || k > n) {
            return BigInteger.ZERO;
        }
        BigInteger r = BigInteger.ONE;
        for (long i = 0; i < k; i++) {
            r = r.multiply(BigInteger.valueOf(n - i)).divide(BigInteger.valueOf(i + 1));
        }
        return r;
    }
}
