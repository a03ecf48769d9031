package org.qchain.exact.model;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.SourcePos;

/**
 * Row sums of a discrete chain proved to be 1 <b>identically</b> in the parameters, without the symbolic module (so
 * without JAS or Symja, which numeric runs must not load): each row's sum becomes a rational function kept as an
 * unreduced fraction {@code N/D} of sparse polynomials over {@link Rational} ({@code a/b + c/d = (ad + cb)/(bd)}, no
 * gcd), and the row sums to 1 exactly when the polynomial {@code N - D} is zero. Two rational functions are equal
 * exactly when their cross products are equal as polynomials (common practice, no source), so this decides the
 * same identity as the symbolic module's reduced arithmetic.
 *
 * <p>Guards: a power whose degree would pass {@value #MAX_DEGREE} is refused at its position, as the symbolic module
 * refuses it; before each product the size of the result is estimated from the operands (terms of a product at most
 * the product of the term counts, and at most the number of monomials of its degree) and the check is refused,
 * with the estimate, past {@value #MAX_TERMS} terms or {@value #MAX_WORK} term multiplications for the model.
 *
 * <p>A row that does not sum to 1 is reported with its sum in lowest terms over the divisors written in the model
 * (the numerator divided by each divisor that divides it), in the plain syntax of the symbolic module's printer.
 */
public final class RowSums {
    /** The largest total degree a power written in a model may reach (the symbolic module's limit). */
    public static final int MAX_DEGREE = 10_000;
    /** The largest estimated number of terms of one polynomial. */
    public static final long MAX_TERMS = 100_000;
    /**
     * The largest estimated number of term multiplications for one model: about a second of work (measured: a
     * term multiplication of integer coefficients with its map update takes about 0.1 to 0.3 microseconds on the
     * development machine, more with coefficients of many digits).
     */
    public static final long MAX_WORK = 5_000_000;

    private RowSums() {
    }

    /**
     * Refuses a discrete model with a row that does not sum to 1 identically in its parameters. Rows without a
     * listed self-transition sum to 1 by construction (the remainder) and are skipped.
     *
     * @param model         the model
     * @param constantRows  whether to check rows that use no parameter too (false when they were already checked
     *                      exactly at a point)
     * @throws QchainException {@link ErrorKey#SYMBOLIC_ROW_SUM} at the row's last transition, with the sum;
     *                         {@link ErrorKey#DIVISION_BY_ZERO} for a division by an identically zero expression;
     *                         {@link ErrorKey#SYMBOLIC_POWER_TOO_LARGE}, {@link ErrorKey#ROW_SUM_CHECK_TOO_LARGE}
     *                         past the guards; {@link ErrorKey#UNKNOWN_PARAMETER}
     */
    public static void requireIdenticallyOne(Model model, boolean constantRows) {
        if (model.kind() != ChainKind.DISCRETE) {
            return;
        }
        List<String> names = model.params().stream().map(ParamDecl::name).toList();
        Guard guard = new Guard();
        // large models repeat their expressions from row to row: each distinct one is mapped once, and a row whose
        // expressions were all proved together before is not proved again
        Map<String, Frac> mapped = new HashMap<>();
        Set<List<String>> proved = new HashSet<>();
        for (int i = 0; i < model.size(); i++) {
            List<Transition> ts = model.outgoing(i);
            if (ts.isEmpty() || model.listed(i, i).isEmpty()) {
                continue;
            }
            if (!constantRows && ts.stream().allMatch(t -> t.expr().variables().isEmpty())) {
                continue;
            }
            List<String> texts = new ArrayList<>(ts.size());
            for (Transition t : ts) {
                texts.add(Expr.toPlain(t.expr()));
            }
            if (proved.contains(texts)) {
                continue;
            }
            Transition last = ts.get(ts.size() - 1);
            String state = model.states().get(i);
            guard.at(last.pos(), state);
            Frac sum = null;
            for (int k = 0; k < ts.size(); k++) {
                Frac f = mapped.get(texts.get(k));
                if (f == null) {
                    f = fraction(ts.get(k).expr(), names, guard);
                    mapped.put(texts.get(k), f);
                }
                sum = sum == null ? f : sum.add(f, guard);
            }
            proved.add(texts);
            if (!sum.isOne()) {
                throw new QchainException(last.pos(), ErrorKey.SYMBOLIC_ROW_SUM, state, shortened(sum.plain(names)));
            }
        }
    }

    /** The longest row sum a message shows whole. */
    static final int MAX_MESSAGE_FORMULA = 200;

    /**
     * A row sum for a one-line message: whole up to {@value #MAX_MESSAGE_FORMULA} characters, else its start cut at
     * a term and its length ({@code 3/2 + 100*a + ... (5151 terms, 212004 characters)}).
     */
    static String shortened(String formula) {
        if (formula.length() <= MAX_MESSAGE_FORMULA) {
            return formula;
        }
        int cut = Math.max(formula.lastIndexOf(" + ", MAX_MESSAGE_FORMULA / 2),
            formula.lastIndexOf(" - ", MAX_MESSAGE_FORMULA / 2));
        int terms = 1;
        for (int i = formula.indexOf(" + "); i >= 0; i = formula.indexOf(" + ", i + 3)) {
            terms++;
        }
        for (int i = formula.indexOf(" - "); i >= 0; i = formula.indexOf(" - ", i + 3)) {
            terms++;
        }
        return formula.substring(0, cut > 0 ? cut : MAX_MESSAGE_FORMULA / 2) + " ... (" + terms + " terms, "
            + formula.length() + " characters)";
    }

    /**
     * Whether an expression is identically 1 as a rational function of the named variables.
     *
     * @param e         the expression
     * @param variables the variables, in order
     * @return whether it is
     * @throws QchainException as {@link #requireIdenticallyOne}
     */
    public static boolean isIdenticallyOne(Expr e, List<String> variables) {
        return fraction(e, variables, new Guard()).isOne();
    }

    /**
     * The expression expanded, in lowest terms over the divisors it is written with, in the symbolic module's plain
     * syntax (for a polynomial, or a quotient by irreducible divisors, the same text as the symbolic module prints).
     *
     * @param e         the expression
     * @param variables the variables, in printing order
     * @return the text
     */
    public static String plain(Expr e, List<String> variables) {
        return fraction(e, variables, new Guard()).plain(variables);
    }

    private static Frac fraction(Expr e, List<String> names, Guard guard) {
        int k = names.size();
        return e.fold(new Expr.Folder<Frac>() {
            @Override
            public Frac num(Expr.Num n) {
                return Frac.of(SparsePoly.constant(k, n.value()));
            }

            @Override
            public Frac var(Expr.Var v) {
                int i = names.indexOf(v.name());
                if (i < 0) {
                    throw new QchainException(v.pos(), ErrorKey.UNKNOWN_PARAMETER, v.name());
                }
                return Frac.of(SparsePoly.variable(k, i));
            }

            @Override
            public Frac neg(Expr.Neg g, Frac operand) {
                return new Frac(operand.num.negate(), operand.den, operand.factors);
            }

            @Override
            public Frac bin(Expr.Bin b, Frac l, Frac r) {
                switch (b.op()) {
                    case ADD:
                        return l.add(r, guard);
                    case SUB:
                        return l.add(new Frac(r.num.negate(), r.den, r.factors), guard);
                    case MUL:
                        return l.multiply(r, guard);
                    default:
                        if (r.num.isZero()) {
                            throw new QchainException(b.pos(), ErrorKey.DIVISION_BY_ZERO,
                                " in '" + Expr.toPlain(b) + "' (the divisor is identically 0)");
                        }
                        return l.multiply(r.inverse(guard), guard);
                }
            }

            @Override
            public Frac pow(Expr.Pow p, Frac base) {
                if (base.num.isZero() && p.exponent() < 0) {
                    throw new QchainException(p.pos(), ErrorKey.DIVISION_BY_ZERO,
                        " in '" + Expr.toPlain(p) + "' (the base is identically 0)");
                }
                long degree = Math.abs((long) p.exponent())
                    * Math.max(base.num.totalDegree(), base.den.totalDegree());
                if (degree > MAX_DEGREE) {
                    throw new QchainException(p.pos(), ErrorKey.SYMBOLIC_POWER_TOO_LARGE, Expr.toPlain(p), degree,
                        MAX_DEGREE);
                }
                Frac b = p.exponent() < 0 ? base.inverse(guard) : base;
                long e = Math.abs((long) p.exponent());
                // the whole binary powering estimated before its first product
                guard.power(b.num, e);
                guard.power(b.den, e);
                Frac result = Frac.of(SparsePoly.constant(k, Rational.ONE));
                while (e > 0) {
                    if ((e & 1) == 1) {
                        result = result.multiply(b, guard);
                    }
                    e >>= 1;
                    if (e > 0) {
                        b = b.multiply(b, guard);
                    }
                }
                return result;
            }
        });
    }

    /** The size guard of one check: the estimated work so far, and where a refusal points. */
    private static final class Guard {
        private double work;
        private SourcePos pos;
        private String state = "";

        void at(SourcePos p, String s) {
            pos = p;
            state = s;
        }

        /** Estimates {@code a * b} and refuses it past a limit; returns nothing, throws. */
        void product(SparsePoly a, SparsePoly b) {
            double ta = a.termCount();
            double tb = b.termCount();
            if (ta <= 1 || tb <= 1) {
                return;
            }
            int[] da = a.degrees();
            int[] db = b.degrees();
            double[] d = new double[da.length];
            for (int i = 0; i < d.length; i++) {
                d[i] = (double) da[i] + db[i];
            }
            double terms = Math.min(ta * tb, monomials(d, a.totalDegree() + b.totalDegree()));
            refuseIfOver(ta * tb, terms);
            work += ta * tb;
        }

        /**
         * Estimates the products of raising {@code a} to the power {@code e} by squaring and refuses the whole
         * power, before any product, past a limit.
         */
        void power(SparsePoly a, long e) {
            double t = a.termCount();
            if (t <= 1 || e <= 1) {
                return;
            }
            int[] da = a.degrees();
            double[] sqDeg = new double[da.length];
            for (int i = 0; i < da.length; i++) {
                sqDeg[i] = da[i];
            }
            double[] resDeg = new double[da.length];
            double sqTotal = a.totalDegree();
            double resTotal = 0;
            double sq = t;
            double res = 1;
            double w = 0;
            double most = t;
            for (long x = e; x > 0; x >>= 1) {
                if ((x & 1) == 1) {
                    if (res > 1) {
                        w += res * sq;
                    }
                    for (int i = 0; i < da.length; i++) {
                        resDeg[i] += sqDeg[i];
                    }
                    resTotal += sqTotal;
                    res = res <= 1 ? sq : Math.min(res * sq, monomials(resDeg, resTotal));
                    most = Math.max(most, res);
                }
                if (x > 1) {
                    w += sq * sq;
                    for (int i = 0; i < da.length; i++) {
                        sqDeg[i] *= 2;
                    }
                    sqTotal *= 2;
                    sq = Math.min(sq * sq, monomials(sqDeg, sqTotal));
                    most = Math.max(most, sq);
                }
            }
            refuseIfOver(w, most);
        }

        private void refuseIfOver(double more, double terms) {
            if (terms > MAX_TERMS || work + more > MAX_WORK) {
                throw new QchainException(pos, ErrorKey.ROW_SUM_CHECK_TOO_LARGE, state,
                    (long) Math.min(work + more, 9e18), (long) Math.min(terms, 9e18), MAX_WORK);
            }
        }

        /**
         * A bound on the number of monomials of a polynomial with degree at most {@code degrees[i]} in variable i
         * and total degree at most {@code total}: the smaller of the box, the product of {@code degrees[i] + 1},
         * and the simplex, C(total + k, k) for the k variables that occur (common practice, no source).
         */
        private static double monomials(double[] degrees, double total) {
            double box = 1;
            int k = 0;
            for (double d : degrees) {
                if (d > 0) {
                    box *= d + 1;
                    k++;
                }
            }
            double simplex = 1;
            for (int i = 1; i <= k; i++) {
                simplex = simplex * (total + i) / i;
            }
            return Math.min(box, simplex);
        }
    }

    /**
     * {@code num / den}, unreduced; {@code den} is the product of {@code factors} (non-constant, normalised by
     * {@link SparsePoly#normalizingUnit()}, with multiplicities), 1 when there are none.
     */
    private record Frac(SparsePoly num, SparsePoly den, Map<SparsePoly, Integer> factors) {
        static Frac of(SparsePoly p) {
            return new Frac(p, SparsePoly.constant(p.variableCount(), Rational.ONE), Map.of());
        }

        boolean isOne() {
            return num.equals(den);
        }

        Frac add(Frac o, Guard g) {
            if (den.equals(o.den)) {
                return new Frac(num.add(o.num), den, factors);
            }
            g.product(num, o.den);
            g.product(o.num, den);
            g.product(den, o.den);
            return new Frac(num.multiply(o.den).add(o.num.multiply(den)), den.multiply(o.den),
                merged(factors, o.factors, 1));
        }

        Frac multiply(Frac o, Guard g) {
            g.product(num, o.num);
            g.product(den, o.den);
            return new Frac(num.multiply(o.num), den.multiply(o.den), merged(factors, o.factors, 1));
        }

        /** {@code den / num} for a non-zero numerator, the new divisor normalised and its unit moved up. */
        Frac inverse(Guard g) {
            Rational u = num.normalizingUnit();
            SparsePoly c = num.scale(u.reciprocal());
            SparsePoly top = den.scale(u.reciprocal());
            if (c.constantValue().isPresent()) {
                return of(top);
            }
            return new Frac(top, c, Map.of(c, 1));
        }

        private static Map<SparsePoly, Integer> merged(Map<SparsePoly, Integer> a, Map<SparsePoly, Integer> b,
                                                       int times) {
            if (b.isEmpty()) {
                return a;
            }
            Map<SparsePoly, Integer> m = new HashMap<>(a);
            for (Map.Entry<SparsePoly, Integer> x : b.entrySet()) {
                m.merge(x.getKey(), x.getValue() * times, Integer::sum);
            }
            return m;
        }

        /**
         * The text in lowest terms over the written divisors: each divisor is divided out of the numerator while it
         * divides it, then the denominator is normalised as the symbolic module normalises it.
         */
        String plain(List<String> names) {
            SparsePoly n = num;
            SparsePoly d = SparsePoly.constant(num.variableCount(), Rational.ONE);
            for (Map.Entry<SparsePoly, Integer> f : factors.entrySet()) {
                int left = f.getValue();
                while (left > 0 && !n.isZero()) {
                    Optional<SparsePoly> q = n.divideExact(f.getKey());
                    if (q.isEmpty()) {
                        break;
                    }
                    n = q.get();
                    left--;
                }
                for (int i = 0; i < left; i++) {
                    d = d.multiply(f.getKey());
                }
            }
            if (n.isZero()) {
                return "0";
            }
            Rational c = d.normalizingUnit();
            n = n.scale(c.reciprocal());
            d = d.scale(c.reciprocal());
            String top = n.plain(names);
            if (d.isOne()) {
                return top;
            }
            String bottom = d.plain(names);
            return (n.termCount() > 1 ? "(" + top + ")" : top) + "/"
                + (d.isVariablePower() ? bottom : "(" + bottom + ")");
        }
    }
}
