package org.qchain.symbolic.closed;

import edu.jas.arith.BigRational;
import edu.jas.poly.ExpVector;
import edu.jas.poly.GenPolynomial;
import edu.jas.poly.GenPolynomialRing;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.qchain.exact.Rational;
import org.qchain.exact.model.Domain;
import org.qchain.symbolic.BoxSign;

/**
 * Proves, where it can, that a condition {@code c != 0} holds for every parameter value inside the declared domains.
 * Sound, not complete: {@code true} is a proof; {@code false} means "not shown". One parameter: Sturm sequences
 * count the real roots of c in the interval exactly. Several: a polynomial whose coefficients all have one sign is
 * nonzero where every parameter is positive; interval arithmetic on the closed box may exclude 0; otherwise the
 * sign is decided by Bernstein coefficients with subdivision ({@link BoxSign}, stated depth and box budget), which
 * also covers unbounded domains and zeros on open ends of the domains.
 */
final class DomainCheck {
    private DomainCheck() {
    }

    static boolean holdsThroughout(ParamField f, GenPolynomial<BigRational> c, Map<String, Domain> domains) {
        List<Integer> used = new ArrayList<>();
        for (int i = 0; i < f.names.size(); i++) {
            if (degreeIn(f, c, i) > 0) {
                if (!domains.containsKey(f.names.get(i))) {
                    return false;
                }
                used.add(i);
            }
        }
        if (used.isEmpty()) {
            return !c.isZERO();
        }
        if (used.size() == 1) {
            int i = used.get(0);
            return noRootIn(univariate(f, c, i), domains.get(f.names.get(i)));
        }
        return sameSignPositiveBox(f, c, used, domains) || intervalExcludesZero(f, c, used, domains)
            || BoxSign.nonZero(terms(f, c, used), domainList(f, used, domains));
    }

    /** c's terms with exponent vectors over the used parameters, for {@link BoxSign}. */
    static Map<List<Integer>, Rational> terms(ParamField f, GenPolynomial<BigRational> c, List<Integer> used) {
        Map<List<Integer>, Rational> out = new java.util.HashMap<>();
        for (Map.Entry<ExpVector, BigRational> t : c.getMap().entrySet()) {
            List<Integer> e = new ArrayList<>();
            for (int i : used) {
                e.add((int) t.getKey().getVal(f.names.size() - 1 - i));
            }
            out.merge(e, ParamField.rational(t.getValue()), Rational::add);
        }
        return out;
    }

    static List<Domain> domainList(ParamField f, List<Integer> used, Map<String, Domain> domains) {
        List<Domain> out = new ArrayList<>();
        for (int i : used) {
            out.add(domains.get(f.names.get(i)));
        }
        return out;
    }

    private static long degreeIn(ParamField f, GenPolynomial<BigRational> c, int i) {
        long d = 0;
        for (ExpVector e : c.getMap().keySet()) {
            d = Math.max(d, e.getVal(f.names.size() - 1 - i));
        }
        return d;
    }

    /** c as a polynomial in parameter i alone (the others do not occur), coefficients by power. */
    private static BigRational[] univariate(ParamField f, GenPolynomial<BigRational> c, int i) {
        int d = (int) degreeIn(f, c, i);
        BigRational[] a = new BigRational[d + 1];
        java.util.Arrays.fill(a, BigRational.ZERO);
        for (Map.Entry<ExpVector, BigRational> t : c.getMap().entrySet()) {
            int k = (int) t.getKey().getVal(f.names.size() - 1 - i);
            a[k] = a[k].sum(t.getValue());
        }
        return a;
    }

    // --- one parameter: Sturm ----------------------------------------------------------------------------------

    private static boolean noRootIn(BigRational[] a, Domain d) {
        GenPolynomialRing<BigRational> r = new GenPolynomialRing<>(BigRational.ZERO, new String[] {"t"});
        GenPolynomial<BigRational> p = r.getZERO();
        for (int k = 0; k < a.length; k++) {
            p = p.sum(a[k], ExpVector.create(1, 0, k));
        }
        BigRational lo = ParamField.big(d.lower());
        if (d.lowerClosed() && value(p, lo).isZERO()) {
            return false;
        }
        if (d.upper().isPresent() && d.upperClosed() && value(p, ParamField.big(d.upper().get())).isZERO()) {
            return false;
        }
        // Sturm: V(x) sign changes of p, p', rem(p_(k-1), p_k) ... ; V(lo) - V(hi) = distinct roots in (lo, hi]
        List<GenPolynomial<BigRational>> seq = new ArrayList<>();
        seq.add(p);
        seq.add(Spectral.derivativeOf(p));
        while (!seq.get(seq.size() - 1).isZERO()) {
            GenPolynomial<BigRational> rem = seq.get(seq.size() - 2).remainder(seq.get(seq.size() - 1)).negate();
            if (rem.isZERO()) {
                break;
            }
            seq.add(rem);
        }
        int vLo = changes(seq, lo, false);
        int vHi;
        if (d.upper().isPresent()) {
            BigRational hi = ParamField.big(d.upper().get());
            vHi = changes(seq, hi, false);
            int roots = vLo - vHi;
            // a root at hi itself is counted in (lo, hi] but lies outside an open upper end
            if (value(p, hi).isZERO()) {
                roots--;
            }
            return roots == 0;
        }
        vHi = changes(seq, null, true);
        return vLo - vHi == 0;
    }

    private static BigRational value(GenPolynomial<BigRational> p, BigRational x) {
        BigRational s = BigRational.ZERO;
        for (Map.Entry<ExpVector, BigRational> t : p.getMap().entrySet()) {
            s = s.sum(t.getValue().multiply(ParamField.power(x, t.getKey().getVal(0))));
        }
        return s;
    }

    private static int changes(List<GenPolynomial<BigRational>> seq, BigRational x, boolean infinity) {
        int count = 0;
        int last = 0;
        for (GenPolynomial<BigRational> q : seq) {
            int s = infinity ? q.leadingBaseCoefficient().signum() : value(q, x).signum();
            if (s != 0) {
                if (last != 0 && s != last) {
                    count++;
                }
                last = s;
            }
        }
        return count;
    }

    // --- several parameters ------------------------------------------------------------------------------------

    /** All coefficients of one sign, every parameter's domain inside (0, inf): every monomial is positive there. */
    private static boolean sameSignPositiveBox(ParamField f, GenPolynomial<BigRational> c, List<Integer> used,
                                               Map<String, Domain> domains) {
        int sign = 0;
        boolean constant = false;
        for (Map.Entry<ExpVector, BigRational> t : c.getMap().entrySet()) {
            int s = t.getValue().signum();
            if (sign != 0 && s != sign) {
                return false;
            }
            sign = s;
            constant |= t.getKey().isZERO();
        }
        if (constant) {
            for (int i : used) {
                if (domains.get(f.names.get(i)).lower().signum() < 0) {
                    return false;
                }
            }
            return true; // monomials >= 0 on the box, the constant term is not 0
        }
        for (int i : used) {
            Domain d = domains.get(f.names.get(i));
            int l = d.lower().signum();
            if (l < 0 || (l == 0 && d.lowerClosed())) {
                return false;
            }
        }
        return true;
    }

    /** Interval arithmetic on the closed box: an enclosure of c that excludes 0. */
    private static boolean intervalExcludesZero(ParamField f, GenPolynomial<BigRational> c, List<Integer> used,
                                                Map<String, Domain> domains) {
        Rational lo = Rational.ZERO;
        Rational hi = Rational.ZERO;
        for (Map.Entry<ExpVector, BigRational> t : c.getMap().entrySet()) {
            Rational mlo = ParamField.rational(t.getValue());
            Rational mhi = mlo;
            for (int i : used) {
                int k = (int) t.getKey().getVal(f.names.size() - 1 - i);
                if (k == 0) {
                    continue;
                }
                Domain d = domains.get(f.names.get(i));
                if (d.upper().isEmpty()) {
                    return false;
                }
                Rational[] pw = powerRange(d.lower(), d.upper().get(), k);
                Rational[] prod = {mlo.multiply(pw[0]), mlo.multiply(pw[1]), mhi.multiply(pw[0]), mhi.multiply(pw[1])};
                mlo = prod[0].min(prod[1]).min(prod[2]).min(prod[3]);
                mhi = prod[0].max(prod[1]).max(prod[2]).max(prod[3]);
            }
            lo = lo.add(mlo);
            hi = hi.add(mhi);
        }
        return lo.signum() > 0 || hi.signum() < 0;
    }

    /** The range of x^k for x in [l, h]. */
    private static Rational[] powerRange(Rational l, Rational h, int k) {
        Rational a = l.pow(k);
        Rational b = h.pow(k);
        if (k % 2 == 0 && l.signum() < 0 && h.signum() > 0) {
            return new Rational[] {Rational.ZERO, a.max(b)};
        }
        return new Rational[] {a.min(b), a.max(b)};
    }
}
