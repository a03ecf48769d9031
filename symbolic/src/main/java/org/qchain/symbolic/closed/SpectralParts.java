package org.qchain.symbolic.closed;

import edu.jas.arith.BigRational;
import edu.jas.poly.GenPolynomial;
import edu.jas.ufd.Quotient;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.certified.CertifiedComplex;
import org.qchain.exact.certified.CertifiedReal;
import org.qchain.exact.certified.CertifiedRoots;
import org.qchain.exact.model.Domain;

/**
 * What the closed forms of P^n ({@link ClosedForm}) and of exp(Qt) ({@link TransientForm}) read alike from one
 * {@link Spectral} decomposition: the roots of a quadratic factor as formulas, the names of quadratic pairs, the
 * conditions (irreducible factors of every coefficient's denominator and of each discriminant under a square root),
 * the eigenvalues as formulas and at a point, and the corners of the parameters' box where a condition fails.
 */
final class SpectralParts {
    private SpectralParts() {
    }

    /** u/2 + (s/2) r and u/2 - (s/2) r, with r the square root or its name. */
    static List<Fml> quadraticRoots(ParamField field, Spectral.Group g, Fml sqrt) {
        Quotient<BigRational> half = field.of(2).inverse();
        Fml mid = field.formula(g.u.multiply(half));
        Fml w = Fml.prod(field.formula(g.scale.multiply(half)), sqrt);
        return List.of(Fml.sum(mid, w), Fml.sum(mid, Fml.neg(w)));
    }

    /** u/2 +- (s/2) sqrt(D) written out. */
    static List<Fml> quadraticRoots(ParamField field, Spectral.Group g) {
        return quadraticRoots(field, g, Fml.call("sqrt", field.formula(g.delta)));
    }

    /**
     * Names each quadratic factor's square root and its two eigenvalues ({@code s}, {@code l1}, {@code l2}; with
     * several quadratic factors {@code s1}, {@code s2}, ...), and gives each ROOTS factor its name.
     *
     * @param names receives, per quadratic group, {root, l1, l2}
     * @return the definitions in order
     */
    static List<Definition> nameGroups(ParamField field, List<Spectral.Group> groups, Symbols symbols,
                                       Map<Spectral.Group, String[]> names) {
        int named = 1;
        int quadratics = 0;
        for (Spectral.Group g : groups) {
            if (g.kind == Spectral.Kind.ROOTS) {
                g.name = symbols.factor(named++);
            }
            if (g.kind == Spectral.Kind.QUADRATIC) {
                quadratics++;
            }
        }
        int q = 0;
        List<Definition> defs = new ArrayList<>();
        for (Spectral.Group g : groups) {
            if (g.kind == Spectral.Kind.QUADRATIC) {
                q++;
                String s = quadratics == 1 ? symbols.root() : symbols.root() + q;
                String l1 = symbols.eigenvalue(2 * q - 1);
                String l2 = symbols.eigenvalue(2 * q);
                names.put(g, new String[] {s, l1, l2});
                Fml sqrt = Fml.call("sqrt", field.formula(g.delta));
                defs.add(new Definition(s, Fml.plain(sqrt), Fml.latex(sqrt), false));
                List<Fml> roots = quadraticRoots(field, g, Fml.name(s));
                defs.add(new Definition(l1, Fml.plain(roots.get(0)), Fml.latex(roots.get(0)), true));
                defs.add(new Definition(l2, Fml.plain(roots.get(1)), Fml.latex(roots.get(1)), true));
            }
        }
        return List.copyOf(defs);
    }

    /** The printed key of a polynomial, which orders and deduplicates conditions. */
    static String key(ParamField field, GenPolynomial<BigRational> p) {
        return Fml.plain(field.formula(p));
    }

    /**
     * The irreducible factors of every denominator among the coefficients the groups other than {@code skip} use,
     * and of each quadratic factor's discriminant (its square root stands in a denominator), by degree.
     */
    static List<GenPolynomial<BigRational>> conditionPolys(ParamField field, List<Spectral.Group> groups,
                                                           Spectral.Group skip) {
        Map<String, GenPolynomial<BigRational>> out = new TreeMap<>();
        Map<GenPolynomial<BigRational>, Boolean> seen = new LinkedHashMap<>();
        for (Spectral.Group g : groups) {
            if (g == skip) {
                continue;
            }
            List<Quotient<BigRational>> used = new ArrayList<>(List.of(g.coeffs));
            if (g.kind == Spectral.Kind.LINEAR) {
                for (Quotient<BigRational>[][] m : g.nilpotent) {
                    addAll(used, m);
                }
            } else if (g.kind == Spectral.Kind.QUADRATIC) {
                for (int k = 0; k < g.x.size(); k++) {
                    addAll(used, g.x.get(k));
                    addAll(used, g.y.get(k));
                }
                used.add(g.delta);
                // sqrt(D) stands in a denominator: D != 0
                for (GenPolynomial<BigRational> p : field.irreducibleFactors(g.delta.num)) {
                    out.put(key(field, p), p);
                }
            } else {
                for (List<Quotient<BigRational>[][]> ck : g.c) {
                    for (Quotient<BigRational>[][] m : ck) {
                        addAll(used, m);
                    }
                }
            }
            for (Quotient<BigRational> q : used) {
                if (!q.den.isConstant() && seen.put(q.den, Boolean.TRUE) == null) {
                    for (GenPolynomial<BigRational> p : field.irreducibleFactors(q.den)) {
                        out.put(key(field, p), p);
                    }
                }
            }
        }
        List<GenPolynomial<BigRational>> list = new ArrayList<>(out.values());
        list.sort(Comparator.comparingLong((GenPolynomial<BigRational> p) -> p.totalDegree())
            .thenComparing(p -> key(field, p)));
        return List.copyOf(list);
    }

    private static void addAll(List<Quotient<BigRational>> out, Quotient<BigRational>[][] m) {
        for (Quotient<BigRational>[] row : m) {
            for (Quotient<BigRational> q : row) {
                if (!q.isZERO()) {
                    out.add(q);
                }
            }
        }
    }

    /** The factors and their eigenvalues as formulas, in the groups' order. */
    static List<Eigenvalue> describe(ParamField field, List<Spectral.Group> groups, String variable,
                                     Map<Spectral.Group, String[]> quadraticNames) {
        List<Eigenvalue> out = new ArrayList<>();
        for (Spectral.Group g : groups) {
            // a linear factor reads x - (lambda), the way its eigenvalue is printed
            Fml f = g.kind == Spectral.Kind.LINEAR && !g.lambda.isZERO()
                ? Fml.sum(Fml.name(variable), Fml.neg(field.formula(g.lambda)))
                : field.formula(g.factor, variable);
            List<String> values = new ArrayList<>();
            List<String> valuesLatex = new ArrayList<>();
            String kind;
            if (g.kind == Spectral.Kind.LINEAR) {
                kind = "rational";
                values.add(Fml.plain(field.formula(g.lambda)));
                valuesLatex.add(Fml.latex(field.formula(g.lambda)));
            } else if (g.kind == Spectral.Kind.QUADRATIC) {
                kind = "quadratic";
                for (Fml r : quadraticRoots(field, g)) {
                    values.add(Fml.plain(r));
                    valuesLatex.add(Fml.latex(r));
                }
            } else {
                kind = "roots";
                values.add("roots of " + g.name);
                valuesLatex.add("\\text{roots of } " + Fml.latex(Fml.name(g.name)));
            }
            String[] nm = quadraticNames.get(g);
            out.add(new Eigenvalue(Fml.plain(f), Fml.latex(f), g.degree, g.multiplicity, g.index(), kind, values,
                g.name, g.unitOrder, valuesLatex, nm == null ? List.of() : List.of(nm[1], nm[2])));
        }
        return List.copyOf(out);
    }

    /** A coefficient at a point, exactly; a vanishing denominator is a failed condition. */
    static BigRational substitute(ParamField field, Quotient<BigRational> q, Map<String, Rational> at) {
        BigRational d = field.evaluate(q.den, at);
        if (d.isZERO()) {
            throw new QchainException(ErrorKey.CLOSED_FORM_CONDITION, Fml.plain(field.formula(q.den)) + " != 0", at);
        }
        return field.evaluate(q.num, at).divide(d);
    }

    /** The monic factor's coefficients at a point; every parameter must have a value. */
    static BigRational[] substituted(ParamField field, Spectral.Group g, Map<String, Rational> at) {
        for (String p : field.names) {
            if (!at.containsKey(p)) {
                throw new QchainException(ErrorKey.BAD_ARGUMENT, "parameter values", at.keySet(), "no value for " + p);
            }
        }
        BigRational[] a = new BigRational[g.coeffs.length];
        for (int k = 0; k < a.length; k++) {
            a[k] = substitute(field, g.coeffs[k], at);
        }
        return a;
    }

    /**
     * The eigenvalues of one factor at a point as certified numbers: a rational eigenvalue exactly, a quadratic pair
     * as {@code u/2 + (s/2) sqrt(D)} then {@code u/2 - (s/2) sqrt(D)} (exact algebraic numbers), the roots of a
     * named factor as {@link CertifiedRoots} isolates them.
     */
    static List<CertifiedComplex> valuesAt(ParamField field, Spectral.Group g, Map<String, Rational> at) {
        List<CertifiedComplex> v = new ArrayList<>();
        if (g.kind == Spectral.Kind.QUADRATIC) {
            substituted(field, g, at);
            Quotient<BigRational> half = field.of(2).inverse();
            Rational mid = ParamField.rational(substitute(field, g.u.multiply(half), at));
            Rational w = ParamField.rational(substitute(field, g.scale.multiply(half), at));
            Rational dv = ParamField.rational(substitute(field, g.delta, at));
            for (int sign : new int[] {1, -1}) {
                Rational ws = sign > 0 ? w : w.negate();
                v.add(dv.signum() >= 0 ? CertifiedComplex.real(CertifiedReal.quadratic(mid, ws, dv))
                    : new CertifiedComplex(CertifiedReal.exact(mid),
                        CertifiedReal.quadratic(Rational.ZERO, ws, dv.negate())));
            }
        } else if (g.kind == Spectral.Kind.LINEAR) {
            substituted(field, g, at);
            v.add(CertifiedComplex.real(CertifiedReal.exact(ParamField.rational(substitute(field, g.lambda, at)))));
        } else {
            List<Rational> c = new ArrayList<>();
            for (BigRational b : substituted(field, g, at)) {
                c.add(ParamField.rational(b));
            }
            v.addAll(CertifiedRoots.of(c));
        }
        return List.copyOf(v);
    }

    /**
     * The corners of the parameters' box (every parameter at a closed end of its domain) at which one of the
     * polynomials vanishes.
     */
    static List<Map<String, Rational>> corners(ParamField field, List<GenPolynomial<BigRational>> polys,
                                               Map<String, Domain> domains) {
        List<List<Rational>> ends = new ArrayList<>();
        for (String p : field.names) {
            Domain d = domains.get(p);
            List<Rational> e = new ArrayList<>();
            if (d != null && d.lowerClosed()) {
                e.add(d.lower());
            }
            if (d != null && d.upper().isPresent() && d.upperClosed()) {
                e.add(d.upper().get());
            }
            if (e.isEmpty()) {
                return List.of();
            }
            ends.add(e);
        }
        List<Map<String, Rational>> out = new ArrayList<>();
        int[] at = new int[ends.size()];
        while (!ends.isEmpty()) {
            Map<String, Rational> pt = new LinkedHashMap<>();
            for (int i = 0; i < at.length; i++) {
                pt.put(field.names.get(i), ends.get(i).get(at[i]));
            }
            for (GenPolynomial<BigRational> c : polys) {
                if (field.evaluate(c, pt).isZERO()) {
                    out.add(java.util.Collections.unmodifiableMap(pt));
                    break;
                }
            }
            int i = 0;
            while (i < at.length && ++at[i] == ends.get(i).size()) {
                at[i] = 0;
                i++;
            }
            if (i == at.length) {
                break;
            }
        }
        return List.copyOf(out);
    }

    /** The conditions among the polynomials not shown to hold throughout the domains, as {@code "POLY != 0"}. */
    static List<String> notProved(ParamField field, List<GenPolynomial<BigRational>> polys, Map<String, Domain> domains) {
        List<String> out = new ArrayList<>();
        for (GenPolynomial<BigRational> c : polys) {
            if (!DomainCheck.holdsThroughout(field, c, domains)) {
                out.add(key(field, c) + " != 0");
            }
        }
        return List.copyOf(out);
    }

    /** Every parameter has a value and no condition polynomial vanishes there. */
    static void checkPoint(ParamField field, List<GenPolynomial<BigRational>> conditionPolys, Map<String, Rational> at) {
        for (String p : field.names) {
            if (!at.containsKey(p)) {
                throw new QchainException(ErrorKey.BAD_ARGUMENT, "parameter values", at.keySet(), "no value for " + p);
            }
        }
        for (GenPolynomial<BigRational> c : conditionPolys) {
            if (field.evaluate(c, at).isZERO()) {
                throw new QchainException(ErrorKey.CLOSED_FORM_CONDITION, key(field, c) + " != 0", at);
            }
        }
    }
}
