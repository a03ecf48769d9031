package org.qchain.symbolic.check;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.SourcePos;
import org.qchain.exact.model.ChainKind;
import org.qchain.exact.model.Domain;
import org.qchain.exact.model.Model;
import org.qchain.exact.model.ParamDecl;
import org.qchain.exact.model.Transition;
import org.qchain.exact.model.ValueOrigin;
import org.qchain.symbolic.Formulas;
import org.qchain.symbolic.Poly;
import org.qchain.symbolic.RatFun;
import org.qchain.symbolic.RatFunMatrix;

/**
 * Validation of a chain with parameters, as polynomial identities and exact range arguments rather than numeric
 * spot checks.
 *
 * <ul>
 *   <li><b>Row sums</b>: each row of a discrete chain must sum to 1 identically (as rational functions); otherwise
 *       an error. (Rows with a remainder self-transition do by construction.)</li>
 *   <li><b>Range</b>: each entry of a discrete chain must lie in [0, 1], and each off-diagonal rate of a continuous
 *       chain must be at least 0, for every parameter point of the declared domains (the box that is the product of
 *       the parameter intervals). For each bound {@code g >= 0} (with {@code g = f} and {@code g = 1 - f}):
 *     <ol>
 *       <li>if {@code g} is a polynomial of degree at most 1 in each parameter (multilinear, which covers the usual
 *           {@code 1 - p - r}) and every parameter it uses has a bounded domain, its extremes over the box are at the
 *           corners: the corner values decide the bound <b>exactly</b> (a negative corner value means the bound fails
 *           at points of the domain arbitrarily close to that corner, even for open intervals);</li>
 *       <li>otherwise the box is bisected (up to {@value #MAX_BOXES} boxes): on each box an exact rational interval
 *           enclosure of numerator and denominator that is sign-definite proves the bound there, and a negative
 *           value at a box's midpoint refutes it with a witness. This is sound in both directions; when the budget
 *           runs out, or a parameter's domain is unbounded, the result is <b>undecided</b> and reported as a
 *           warning that says so.</li>
 *     </ol>
 *   </li>
 * </ul>
 * An entry that can leave the range is a <b>warning</b> (the results hold under the printed condition) when every
 * parameter it uses has a value (nominal, or given with {@code --at}) and the values satisfy the condition, or when
 * some parameter has no value; it is an <b>error</b> when the values break it. The message names the values and
 * where they came from ({@link ValueOrigin}: {@code nominal values}, {@code given with --at}, or mixed).
 */
public final class ParameterCheck {
    /** The bisection budget per bound. */
    public static final int MAX_BOXES = 2000;

    private ParameterCheck() {
    }

    /**
     * Checks a model.
     *
     * @param model the model
     * @return the findings
     * @throws QchainException for expressions that cannot be mapped (unknown parameter, division by zero)
     */
    public static CheckReport check(Model model) {
        return check(model, RatFunMatrix.fromModel(model));
    }

    /**
     * Checks a model whose one-step matrix is already mapped.
     *
     * @param model the model
     * @param p     {@code RatFunMatrix.fromModel(model)}
     * @return the findings
     */
    public static CheckReport check(Model model, RatFunMatrix p) {
        return check(model, p, model.nominalValues(), Set.of());
    }

    /**
     * Checks a model at the values a command uses: an entry's range condition is decided at them when every
     * parameter it uses has one, and the message says where they came from.
     *
     * @param model  the model
     * @param p      {@code RatFunMatrix.fromModel(model)}
     * @param values the values known (nominal ones overridden by those given with {@code --at})
     * @param given  the names whose values were given with {@code --at}
     * @return the findings
     */
    public static CheckReport check(Model model, RatFunMatrix p, Map<String, Rational> values, Set<String> given) {
        List<Finding> out = new ArrayList<>();
        int n = model.size();
        Map<String, Domain> domains = new LinkedHashMap<>();
        for (ParamDecl d : model.params()) {
            domains.put(d.name(), d.domain());
        }
        Map<String, Rational> nominal = values;
        boolean discrete = model.kind() == ChainKind.DISCRETE;
        for (int i = 0; i < n; i++) {
            if (discrete) {
                RatFun sum = p.rowSum(i);
                if (!sum.isOne()) {
                    List<Transition> ts = model.outgoing(i);
                    Optional<SourcePos> pos = ts.isEmpty() ? Optional.empty()
                        : Optional.ofNullable(ts.get(ts.size() - 1).pos());
                    int to = ts.isEmpty() ? i : ts.get(ts.size() - 1).to();
                    String f = Formulas.plain(sum);
                    String state = model.states().get(i);
                    out.add(new Finding(Finding.Severity.ERROR, ErrorKey.SYMBOLIC_ROW_SUM, i, to, state, f, "", true,
                        Optional.empty(), pos, "", ErrorKey.SYMBOLIC_ROW_SUM.format(state, f)));
                }
            }
            for (int j = 0; j < n; j++) {
                if (!discrete && i == j) {
                    continue;
                }
                RatFun f = p.get(i, j);
                Optional<SourcePos> pos = model.listed(i, j).map(Transition::pos);
                if (pos.isEmpty() && i == j) {
                    List<Transition> ts = model.outgoing(i);
                    pos = ts.isEmpty() ? Optional.empty() : Optional.ofNullable(ts.get(ts.size() - 1).pos());
                }
                String label = model.states().get(i) + "->" + model.states().get(j);
                checkEntry(out, i, j, label, f, discrete, domains, nominal, given, pos);
            }
        }
        return new CheckReport(out);
    }

    static QchainException toException(Finding f) {
        if (f.key() == ErrorKey.SYMBOLIC_ROW_SUM) {
            return new QchainException(f.pos().orElse(null), f.key(), f.entry(), f.formula());
        }
        return new QchainException(f.pos().orElse(null), f.key(), f.entry(), f.formula(), f.condition(), f.detail());
    }

    private static void checkEntry(List<Finding> out, int i, int j, String label, RatFun f, boolean discrete,
                                   Map<String, Domain> domains, Map<String, Rational> nominal,
                                   Set<String> given, Optional<SourcePos> pos) {
        if (f.occurringVariables().isEmpty()) {
            return; // constants are checked by the exact module (and by the parser) with the value in the message
        }
        RatFun one = RatFun.of(f.ring().one());
        List<RatFun> bounds = new ArrayList<>();
        bounds.add(f);
        if (discrete) {
            bounds.add(one.subtract(f));
        }
        for (int b = 0; b < bounds.size(); b++) {
            RatFun g = bounds.get(b);
            Verdict v = RangeProver.nonNegative(g, domains);
            if (v.kind() == Verdict.Kind.HOLDS) {
                continue;
            }
            String condition = condition(g, b == 0, f, domains);
            StringBuilder detail = new StringBuilder();
            if (v.kind() == Verdict.Kind.FAILS) {
                detail.append("fails ").append(v.note());
            } else {
                detail.append("could not decide whether it holds on the whole domain (").append(v.note()).append(")");
            }
            List<String> used = f.occurringVariables();
            boolean allNominal = nominal.keySet().containsAll(used);
            Finding.Severity sev = Finding.Severity.WARNING;
            if (allNominal) {
                Map<String, Rational> at = new LinkedHashMap<>();
                for (String u : used) {
                    at.put(u, nominal.get(u));
                }
                Rational gv;
                try {
                    gv = g.evaluate(at);
                } catch (QchainException e) {
                    gv = null;
                }
                String origin = " (" + ValueOrigin.of(at.keySet(), given) + ")";
                if (gv == null || gv.signum() < 0) {
                    sev = Finding.Severity.ERROR;
                    detail.append("; the values ").append(pointText(at)).append(origin).append(" break it (")
                        .append(label).append(" = ").append(gv == null ? "undefined" : f.evaluate(at).toString())
                        .append(')');
                } else {
                    detail.append("; holds at ").append(pointText(at)).append(origin);
                }
            } else {
                detail.append("; results hold only where it does");
            }
            String formula = Formulas.plain(f);
            String message = ErrorKey.SYMBOLIC_RANGE.format(label, formula, condition, detail);
            out.add(new Finding(sev, ErrorKey.SYMBOLIC_RANGE, i, j, label, formula, condition,
                v.kind() == Verdict.Kind.FAILS, v.witnessOpt(), pos, detail.toString(), message));
        }
    }

    static String pointText(Map<String, Rational> p) {
        List<String> parts = new ArrayList<>();
        for (Map.Entry<String, Rational> e : p.entrySet()) {
            parts.add(e.getKey() + "=" + e.getValue());
        }
        return String.join(", ", parts);
    }

    /**
     * The condition {@code g >= 0} in readable form: for a polynomial, negative terms moved to the left and positive
     * ones to the right ({@code 1 - p - r >= 0} becomes {@code p + r <= 1}); for a rational function whose
     * denominator is positive on the domain, the same for its numerator; otherwise {@code 0 <= f} or {@code f <= 1}.
     */
    static String condition(RatFun g, boolean lower, RatFun f, Map<String, Domain> domains) {
        Poly num = g.numerator();
        boolean denPositive = g.isPolynomial()
            || RangeProver.nonNegative(RatFun.of(g.denominator()), domains).kind() == Verdict.Kind.HOLDS;
        if (!denPositive) {
            return lower ? "0 <= " + Formulas.plain(f) : Formulas.plain(f) + " <= 1";
        }
        Poly pos = num.ring().zero();
        Poly neg = num.ring().zero();
        for (Poly.Term t : num.terms()) {
            Poly term = monomial(num, t);
            if (t.coefficient().signum() > 0) {
                pos = pos.add(term);
            } else {
                neg = neg.subtract(term);
            }
        }
        return Formulas.plain(neg) + " <= " + Formulas.plain(pos);
    }

    private static Poly monomial(Poly like, Poly.Term t) {
        Poly m = like.ring().constant(t.coefficient());
        List<String> vars = like.ring().variables();
        for (int k = 0; k < vars.size(); k++) {
            int e = t.exponents().get(k);
            if (e > 0) {
                m = m.multiply(like.ring().variable(vars.get(k)).pow(e));
            }
        }
        return m;
    }
}
