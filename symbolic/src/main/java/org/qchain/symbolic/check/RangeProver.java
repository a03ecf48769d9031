package org.qchain.symbolic.check;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.qchain.exact.Rational;
import org.qchain.exact.model.Domain;
import org.qchain.symbolic.BoxSign;
import org.qchain.symbolic.Poly;
import org.qchain.symbolic.RatFun;

/** Decides {@code g >= 0} on a box of parameter intervals, exactly where it can (see {@link ParameterCheck}). */
final class RangeProver {
    private RangeProver() {
    }

    static Verdict nonNegative(RatFun g, Map<String, Domain> domains) {
        List<String> vars = g.occurringVariables();
        if (vars.isEmpty()) {
            Rational c = g.constantValue().orElseThrow();
            return c.signum() >= 0 ? Verdict.holds() : Verdict.fails(Map.of(), "everywhere");
        }
        List<String> ringVars = g.ring().variables();
        if (bernsteinProof(g, vars, domains)) {
            return Verdict.holds();
        }
        int k = ringVars.size();
        Interval[] box = new Interval[k];
        for (int i = 0; i < k; i++) {
            box[i] = Interval.point(Rational.ZERO);
        }
        for (String v : vars) {
            Domain d = domains.get(v);
            if (d == null) {
                return Verdict.undecided("parameter " + v + " has no declared domain");
            }
            int idx = ringVars.indexOf(v);
            if (d.upper().isEmpty()) {
                return sampleUnbounded(g, vars, domains, v);
            }
            box[idx] = new Interval(d.lower(), d.upper().get());
        }
        // corners of the closed box: a negative corner value refutes (continuity: nearby interior points fail too)
        Map<String, Rational> worst = null;
        Rational worstVal = null;
        int c = vars.size();
        for (long mask = 0; mask < (1L << c); mask++) {
            Map<String, Rational> pt = new LinkedHashMap<>();
            for (int b = 0; b < c; b++) {
                Interval iv = box[ringVars.indexOf(vars.get(b))];
                pt.put(vars.get(b), ((mask >> b) & 1) == 0 ? iv.lo() : iv.hi());
            }
            Rational den = g.denominator().evaluate(pt);
            if (den.isZero()) {
                continue;
            }
            Rational val = g.numerator().evaluate(pt).divide(den);
            if (worstVal == null || val.compareTo(worstVal) < 0) {
                worstVal = val;
                worst = pt;
            }
        }
        if (worstVal != null && worstVal.signum() < 0) {
            return Verdict.fails(worst, "near " + ParameterCheck.pointText(worst) + " (a corner of the domain)");
        }
        if (g.isPolynomial() && multilinear(g.numerator(), vars)) {
            return Verdict.holds(); // extremes of a multilinear polynomial over a box are at its corners
        }
        return bisect(g, vars, box);
    }

    /**
     * The sign proof of {@link BoxSign} (Bernstein coefficients with subdivision, unbounded domains mapped onto
     * bounded ones): the denominator's sign is fixed throughout the domains and the numerator times that sign is
     * at least 0 on their closure.
     */
    private static boolean bernsteinProof(RatFun g, List<String> vars, Map<String, Domain> domains) {
        List<Domain> doms = new ArrayList<>();
        for (String v : vars) {
            doms.add(domains.get(v));
        }
        Map<List<Integer>, Rational> num = terms(g.numerator(), vars, g.ring().variables());
        Map<List<Integer>, Rational> den = terms(g.denominator(), vars, g.ring().variables());
        if (BoxSign.positive(den, doms)) {
            return BoxSign.nonNegative(num, doms);
        }
        Map<List<Integer>, Rational> negDen = new java.util.HashMap<>();
        den.forEach((e, c) -> negDen.put(e, c.negate()));
        if (BoxSign.positive(negDen, doms)) {
            Map<List<Integer>, Rational> negNum = new java.util.HashMap<>();
            num.forEach((e, c) -> negNum.put(e, c.negate()));
            return BoxSign.nonNegative(negNum, doms);
        }
        return false;
    }

    private static Map<List<Integer>, Rational> terms(Poly p, List<String> vars, List<String> ringVars) {
        Map<List<Integer>, Rational> out = new java.util.HashMap<>();
        for (Poly.Term t : p.terms()) {
            List<Integer> e = new ArrayList<>();
            for (String v : vars) {
                e.add(t.exponents().get(ringVars.indexOf(v)));
            }
            out.merge(e, t.coefficient(), Rational::add);
        }
        return out;
    }

    private static boolean multilinear(Poly p, List<String> vars) {
        for (String v : vars) {
            if (p.degree(v) > 1) {
                return false;
            }
        }
        return true;
    }

    /**
     * Branch and bound on the box. On each box: a negative value at the midpoint refutes; if the denominator's
     * enclosure is sign-definite, the sign of {@code g} is that of {@code s * N} ({@code N} the numerator, {@code s}
     * the denominator's sign) and the box is proven when (a) the enclosure of {@code s * N} is non-negative, or (b)
     * after fixing every parameter in which {@code s * N} is monotone on the box (its partial derivative's enclosure
     * is sign-definite) at its minimising end, (a) holds on the smaller box, or every parameter is fixed and the
     * exact value there is non-negative. Otherwise the widest interval is halved. The monotonicity step proves
     * bounds that are attained on the boundary, such as {@code 4*p*(1 - p) >= 0} on [0, 1].
     */
    private static Verdict bisect(RatFun g, List<String> vars, Interval[] start) {
        List<String> ringVars = g.ring().variables();
        int[] idx = new int[vars.size()];
        Poly[] dN = new Poly[vars.size()];
        for (int t = 0; t < idx.length; t++) {
            idx[t] = ringVars.indexOf(vars.get(t));
            dN[t] = g.numerator().derivative(vars.get(t));
        }
        Deque<Interval[]> queue = new ArrayDeque<>();
        queue.add(start);
        int boxes = 0;
        while (!queue.isEmpty()) {
            if (++boxes > ParameterCheck.MAX_BOXES) {
                return Verdict.undecided("no proof within " + ParameterCheck.MAX_BOXES + " boxes of interval bisection");
            }
            Interval[] box = queue.poll();
            Map<String, Rational> mid = new LinkedHashMap<>();
            for (int t = 0; t < idx.length; t++) {
                mid.put(vars.get(t), box[idx[t]].mid());
            }
            Rational dm = g.denominator().evaluate(mid);
            if (!dm.isZero() && g.numerator().evaluate(mid).divide(dm).signum() < 0) {
                return Verdict.fails(mid, "at " + ParameterCheck.pointText(mid));
            }
            Interval d = enclose(g.denominator(), box);
            int s = d.lo().signum() > 0 ? 1 : (d.hi().signum() < 0 ? -1 : 0);
            if (s != 0 && provenOnBox(g.numerator(), dN, s, idx, box)) {
                continue;
            }
            int best = -1;
            Rational width = Rational.ZERO;
            for (int i : idx) {
                Rational w = box[i].hi().subtract(box[i].lo());
                if (w.compareTo(width) > 0) {
                    width = w;
                    best = i;
                }
            }
            if (best < 0) {
                return Verdict.undecided("the denominator vanishes at a point of the domain");
            }
            Rational m = box[best].mid();
            Interval[] left = box.clone();
            Interval[] right = box.clone();
            left[best] = new Interval(box[best].lo(), m);
            right[best] = new Interval(m, box[best].hi());
            queue.add(left);
            queue.add(right);
        }
        return Verdict.holds();
    }

    private static boolean provenOnBox(Poly n, Poly[] dN, int s, int[] idx, Interval[] box) {
        Rational sign = Rational.of(s);
        if (enclose(n, box).scale(sign).lo().signum() >= 0) {
            return true;
        }
        Interval[] b = box.clone();
        boolean fixedAny = false;
        for (int t = 0; t < idx.length; t++) {
            Interval iv = b[idx[t]];
            if (iv.lo().equals(iv.hi())) {
                continue;
            }
            Interval slope = enclose(dN[t], box).scale(sign);
            if (slope.lo().signum() >= 0) {
                b[idx[t]] = Interval.point(iv.lo()); // s*N increases in this parameter: minimum at the lower end
                fixedAny = true;
            } else if (slope.hi().signum() <= 0) {
                b[idx[t]] = Interval.point(iv.hi());
                fixedAny = true;
            }
        }
        if (!fixedAny) {
            return false;
        }
        // on the reduced box (a point when every parameter was fixed, where the enclosure is the exact value)
        return enclose(n, b).scale(sign).lo().signum() >= 0;
    }

    static Interval enclose(Poly p, Interval[] box) {
        Interval acc = Interval.point(Rational.ZERO);
        for (Poly.Term t : p.terms()) {
            Interval term = Interval.point(t.coefficient());
            for (int i = 0; i < box.length; i++) {
                int e = t.exponents().get(i);
                if (e > 0) {
                    term = term.multiply(box[i].pow(e));
                }
            }
            acc = acc.add(term);
        }
        return acc;
    }

    private static Verdict sampleUnbounded(RatFun g, List<String> vars, Map<String, Domain> domains, String unbounded) {
        // no proof over an unbounded box: look for a witness on a few points, else say undecided
        List<Rational> offsets = List.of(Rational.of(1, 100), Rational.of(1, 2), Rational.ONE, Rational.of(10),
            Rational.of(1000));
        List<Map<String, Rational>> pts = new ArrayList<>();
        for (Rational off : offsets) {
            Map<String, Rational> pt = new LinkedHashMap<>();
            for (String v : vars) {
                Domain d = domains.get(v);
                Rational lo = d.lower();
                Rational x = d.upper().isPresent()
                    ? lo.add(d.upper().get().subtract(lo).multiply(Rational.of(1, 2))) : lo.add(off);
                pt.put(v, x);
            }
            pts.add(pt);
        }
        for (Map<String, Rational> pt : pts) {
            Rational den = g.denominator().evaluate(pt);
            if (!den.isZero() && g.numerator().evaluate(pt).divide(den).signum() < 0) {
                return Verdict.fails(pt, "at " + ParameterCheck.pointText(pt));
            }
        }
        return Verdict.undecided("parameter " + unbounded + " has an unbounded domain; checked " + pts.size() + " points");
    }
}
