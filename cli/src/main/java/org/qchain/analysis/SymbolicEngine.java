package org.qchain.analysis;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.LongConsumer;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.MatrixPowers;
import org.qchain.exact.Progress;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.model.Chains;
import org.qchain.exact.model.Domain;
import org.qchain.exact.model.Model;
import org.qchain.symbolic.Formulas;
import org.qchain.symbolic.RatFun;
import org.qchain.symbolic.RatFunMatrix;
import org.qchain.symbolic.SymbolicLimits;
import org.qchain.symbolic.check.CheckReport;
import org.qchain.symbolic.check.Finding;
import org.qchain.symbolic.check.ParameterCheck;
import org.qchain.symbolic.closed.ClosedForm;
import org.qchain.symbolic.closed.ClosedForms;
import org.qchain.symbolic.closed.Eigenvalue;
import org.qchain.symbolic.closed.LongRun;
import org.qchain.symbolic.closed.Recurrence;
import org.qchain.symbolic.closed.RootPolynomial;
import org.qchain.symbolic.closed.SeriesForm;
import org.qchain.symbolic.sensitivity.EntrySensitivity;
import org.qchain.symbolic.sensitivity.PointSensitivity;
import org.qchain.symbolic.sensitivity.Sensitivity;
import org.qchain.symbolic.sensitivity.SweepRange;
import org.qchain.symbolic.sensitivity.SweepRow;
import org.qchain.result.CheckResult;
import org.qchain.exact.certified.CertifiedComplex;
import org.qchain.exact.certified.CertifiedReal;
import org.qchain.result.ClosedResult;
import org.qchain.result.Formula;
import org.qchain.result.Point;
import org.qchain.result.SensResult;
import org.qchain.result.SymbolicStepResult;

/**
 * The symbolic route: the symbolic module's engines (JAS arithmetic) on the model with its parameters as symbols.
 * The only class of the analysis layer that names symbolic types, reached only when a query takes the symbolic
 * route, so numeric runs never load it (the JVM loads classes when first used).
 */
final class SymbolicEngine {
    private SymbolicEngine() {
    }

    /**
     * The model in its parameter ring, checked with the parameters symbolic.
     *
     * @param p        the one-step matrix of rational functions
     * @param warnings the located range conditions
     */
    record Checked(RatFunMatrix p, List<String> warnings) implements SymbolicValidation {
        Checked {
            warnings = List.copyOf(warnings);
        }
    }

    /** Maps the model into its parameter ring and checks it there; throws the first error, located. */
    static SymbolicValidation validate(Model m) {
        RatFunMatrix p = RatFunMatrix.fromModel(m);
        CheckReport report = ParameterCheck.check(m, p);
        report.throwIfErrors();
        List<String> warnings = new ArrayList<>();
        for (Finding f : report.warnings()) {
            warnings.add(f.located());
        }
        return new Checked(p, warnings);
    }

    private static Checked checked(LoadedModel model) {
        return (Checked) model.symbolic();
    }

    private static LongConsumer multiplying(Progress progress, long n) {
        return k -> progress.update("multiplying", k, n - 1);
    }

    /** A formula printed on demand from an exact rational function (factored or expanded). */
    record RatFunFormula(RatFun f, boolean factored) implements Formula {
        @Override
        public String plain() {
            return Formulas.of(f, factored, false);
        }

        @Override
        public String latex() {
            return Formulas.of(f, factored, true);
        }
    }

    // --- step --------------------------------------------------------------------------------------------------

    static SymbolicStepResult step(LoadedModel model, StepQuery q, Progress progress) {
        Model m = model.model();
        Checked ctx = checked(model);
        RatFunMatrix p = ctx.p();
        SymbolicLimits limits = new SymbolicLimits(q.maxTerms(), q.maxDigits());
        int fromIdx = q.from().map(f -> model.state("--from", f)).orElse(-1);
        int toIdx = q.to().map(t -> model.state("--to", t)).orElse(-1);
        List<String> rowNames = new ArrayList<>();
        List<String> colNames = new ArrayList<>();
        List<List<RatFun>> cells = new ArrayList<>();
        if (fromIdx < 0) {
            RatFunMatrix pn = p.power(q.n(), limits, multiplying(progress, q.n()));
            for (int i = 0; i < pn.size(); i++) {
                List<RatFun> row = new ArrayList<>();
                for (int j = 0; j < pn.size(); j++) {
                    row.add(pn.get(i, j));
                }
                cells.add(row);
            }
            rowNames.addAll(m.states());
            colNames.addAll(m.states());
        } else {
            List<RatFun> row = p.powerRow(fromIdx, q.n(), limits, multiplying(progress, q.n()));
            rowNames.add(q.from().get());
            if (toIdx >= 0) {
                cells.add(List.of(row.get(toIdx)));
                colNames.add(q.to().get());
            } else {
                cells.add(row);
                colNames.addAll(m.states());
            }
        }
        List<List<Formula>> formulas = new ArrayList<>();
        for (List<RatFun> row : cells) {
            List<Formula> out = new ArrayList<>();
            for (RatFun f : row) {
                out.add(new RatFunFormula(f, q.factor()));
            }
            formulas.add(out);
        }
        Optional<Point> point = model.point();
        Optional<List<List<Rational>>> values = point.map(pt -> values(model, pt, cells, q.n(), fromIdx, toIdx));
        return new SymbolicStepResult(m.source(), m.kind().word(), q.n(), m.usedParameters(), m.states(),
            q.factor(), q.from(), q.to(), rowNames, colNames, formulas, point, values, ctx.warnings());
    }

    /**
     * The values at the point: each formula evaluated exactly, checked against the exact module's power of the
     * substituted chain (they must be equal; a difference is an internal error).
     */
    private static List<List<Rational>> values(LoadedModel model, Point point, List<List<RatFun>> cells, long n,
                                               int from, int to) {
        RationalMatrix p = Chains.transitionMatrix(model.model(), point.values());
        List<List<Rational>> exact = new ArrayList<>();
        if (from < 0) {
            RationalMatrix pn = MatrixPowers.power(p, n);
            for (int i = 0; i < pn.rows(); i++) {
                exact.add(List.of(pn.row(i)));
            }
        } else {
            Rational[] row = MatrixPowers.rowOfPower(p, from, n);
            exact.add(to >= 0 ? List.of(row[to]) : List.of(row));
        }
        List<List<Rational>> out = new ArrayList<>();
        for (int i = 0; i < cells.size(); i++) {
            List<Rational> row = new ArrayList<>();
            for (int j = 0; j < cells.get(i).size(); j++) {
                Rational v = cells.get(i).get(j).evaluate(point.values());
                requireEqual(v, exact.get(i).get(j));
                row.add(v);
            }
            out.add(row);
        }
        return out;
    }

    private static void requireEqual(Rational formula, Rational exact) {
        if (!formula.equals(exact)) {
            throw new QchainException(ErrorKey.INTERNAL, "the formula's value " + formula
                + " differs from the exact engine's " + exact);
        }
    }

    // --- sens --------------------------------------------------------------------------------------------------

    static SensResult sens(LoadedModel model, SensQuery q, Progress progress) {
        Model m = model.model();
        if (m.param(q.wrt()).isEmpty()) {
            throw new QchainException(ErrorKey.BAD_ARGUMENT, "--wrt", q.wrt(), m.params().isEmpty()
                ? "the model declares no parameters"
                : "not a parameter of " + m.source() + " (parameters: "
                    + String.join(", ", m.params().stream().map(d -> d.name()).toList()) + ")");
        }
        Optional<SweepRange> range = q.sweep().map(text -> sweep(m, text));
        Checked ctx = checked(model);
        int from = model.state("--from", q.from());
        int to = model.state("--to", q.to());
        Map<String, Rational> others = range.map(r -> others(model, r, q.sweep().get())).orElse(Map.of());
        SymbolicLimits limits = new SymbolicLimits(q.maxTerms(), q.maxDigits());
        EntrySensitivity s = Sensitivity.of(ctx.p(), q.n(), from, to, q.wrt(), limits, multiplying(progress, q.n()));
        Optional<SensResult.AtPoint> at = Optional.empty();
        Optional<Point> point = model.point();
        if (point.isPresent() && model.known().containsKey(q.wrt())) {
            Map<String, Rational> pt = new LinkedHashMap<>(point.get().values());
            pt.put(q.wrt(), model.known().get(q.wrt()));
            PointSensitivity ps = s.at(pt);
            // the formula's value must equal the exact engine's value of the substituted chain
            requireEqual(ps.probability(),
                MatrixPowers.entryOfPower(Chains.transitionMatrix(m, point.get().values()), from, to, q.n()));
            at = Optional.of(new SensResult.AtPoint(new Point(pt, point.get().given()), ps.probability(), ps.derivative(),
                ps.elasticity()));
        }
        Optional<SensResult.Sweep> sweep = Optional.empty();
        if (range.isPresent()) {
            SweepRange r = range.get();
            List<SensResult.SweepLine> lines = new ArrayList<>();
            List<SweepRow> rows;
            try {
                rows = s.sweep(r, others, q.maxDigits(), progress);
            } catch (QchainException e) {
                if (e.key() != ErrorKey.SWEEP_TOO_LARGE) {
                    throw e;
                }
                throw new QchainException(ErrorKey.SWEEP_TOO_LARGE, e.args().get(0), e.args().get(1), e.args().get(2),
                    "; raise it with " + NumericEngine.MAX_DIGITS_OPTION + ", or sweep fewer points");
            }
            for (SweepRow row : rows) {
                lines.add(new SensResult.SweepLine(row.value(), row.probability(), row.derivative()));
            }
            sweep = Optional.of(new SensResult.Sweep(r.parameter(), r.start(), r.step(), r.end(), new Point(others),
                lines));
        }
        return new SensResult(m.source(), m.kind().word(), q.n(), q.from(), q.to(), q.wrt(),
            Formulas.latexName(q.wrt()), m.usedParameters(), new RatFunFormula(s.probability(), q.factor()),
            new RatFunFormula(s.derivative(), q.factor()), at, sweep, ctx.warnings());
    }

    private static SweepRange sweep(Model m, String text) {
        SweepRange r;
        try {
            r = SweepRange.parse(text);
        } catch (QchainException e) {
            // SWEEP's arguments are the text and the reason; a syntax error names its column in the option's text
            throw new QchainException(ErrorKey.BAD_ARGUMENT, "--sweep", text,
                e.key() == ErrorKey.SWEEP ? String.valueOf(e.args().get(1))
                    : e.pos().map(p -> "at column " + p.column() + ": ").orElse("") + e.detail());
        }
        try {
            Sensitivity.checkSweep(m, r);
        } catch (QchainException e) {
            throw new QchainException(ErrorKey.BAD_ARGUMENT, "--sweep", text, e.detail());
        }
        return r;
    }

    /** The values of the parameters other than the swept one; all must be known. */
    private static Map<String, Rational> others(LoadedModel model, SweepRange r, String text) {
        Map<String, Rational> others = new LinkedHashMap<>();
        List<String> missing = new ArrayList<>();
        for (String name : model.model().usedParameters()) {
            if (name.equals(r.parameter())) {
                continue;
            }
            Rational v = model.known().get(name);
            if (v == null) {
                missing.add(name);
            } else {
                others.put(name, v);
            }
        }
        if (!missing.isEmpty()) {
            throw new QchainException(ErrorKey.BAD_ARGUMENT, "--sweep", text, "the other parameters need values"
                + " (give them with --at): " + String.join(", ", missing));
        }
        return others;
    }

    // --- check -------------------------------------------------------------------------------------------------

    static CheckResult check(LoadedModel model) {
        Model m = model.model();
        Checked ctx = checked(model);
        List<List<Formula>> entries = new ArrayList<>();
        for (int i = 0; i < m.size(); i++) {
            List<Formula> row = new ArrayList<>();
            for (int j = 0; j < m.size(); j++) {
                row.add(new RatFunFormula(ctx.p().get(i, j), false));
            }
            entries.add(row);
        }
        return new CheckResult.Symbolic(m.source(), m.kind().word(), m.states(), m.usedParameters(), entries,
            ctx.warnings());
    }

    // --- closed ------------------------------------------------------------------------------------------------

    static ClosedResult closed(LoadedModel model, ClosedQuery q, Progress progress) {
        Model m = model.model();
        // the symbolic check, as for every symbolic query: rows must sum to 1 identically
        Checked ctx = checked(model);
        Optional<Integer> row = q.from().map(s -> model.state(q.fromName(), s));
        Optional<Integer> col = q.to().map(s -> model.state("--to", s));
        SymbolicLimits limits = new SymbolicLimits(q.maxTerms(), q.maxDigits());
        return q.form() == ClosedResult.Form.MATRIX
            ? fromClosedForm(model, q, ClosedForms.of(m, model.given(), limits, progress), row, col, ctx)
            : fromSeries(m, q, ClosedForms.series(m, model.given(), limits, progress), row, col);
    }

    private static List<Integer> indices(Model m, Optional<Integer> pick) {
        List<Integer> out = new ArrayList<>();
        if (pick.isPresent()) {
            out.add(pick.get());
        } else {
            for (int i = 0; i < m.size(); i++) {
                out.add(i);
            }
        }
        return out;
    }

    private static List<String> names(Model m, List<Integer> idx) {
        List<String> out = new ArrayList<>();
        for (int i : idx) {
            out.add(m.states().get(i));
        }
        return out;
    }

    private static ClosedResult.Selection selection(Optional<Integer> row, Optional<Integer> col) {
        return col.isPresent() ? ClosedResult.Selection.ENTRY
            : (row.isPresent() ? ClosedResult.Selection.ROW : ClosedResult.Selection.MATRIX);
    }

    /** The values at which numbers are shown: the given ones, then nominal values; empty unless all are known. */
    private static Optional<Point> point(LoadedModel model, List<String> params) {
        Map<String, Rational> p = new LinkedHashMap<>();
        for (String name : params) {
            Rational v = model.known().get(name);
            if (v == null) {
                return Optional.empty();
            }
            p.put(name, v);
        }
        return Optional.of(new Point(p, model.given().keySet()));
    }

    private static ClosedResult fromClosedForm(LoadedModel model, ClosedQuery q, ClosedForm cf,
                                               Optional<Integer> row, Optional<Integer> col, Checked ctx) {
        Model m = model.model();
        List<Integer> ri = indices(m, row);
        List<Integer> ci = indices(m, col);
        List<List<Formula>> cells = new ArrayList<>();
        List<List<Formula>> namedCells = new ArrayList<>();
        int validFrom = 0;
        for (int i : ri) {
            List<Formula> line = new ArrayList<>();
            List<Formula> named = new ArrayList<>();
            for (int j : ci) {
                line.add(Formula.of(cf.plain(i, j, false, q.factor()), cf.latex(i, j, false, q.factor())));
                named.add(Formula.of(cf.plain(i, j, true, q.factor()), cf.latex(i, j, true, q.factor())));
                validFrom = Math.max(validFrom, cf.validFrom(i, j));
            }
            cells.add(line);
            namedCells.add(named);
        }
        List<ClosedResult.Where> where = new ArrayList<>();
        String eigenPrefix = cf.symbols().eigenPrefix();
        for (org.qchain.symbolic.closed.Definition d : cf.definitions()) {
            String index = d.name().substring(eigenPrefix.length());
            where.add(new ClosedResult.Where(d.name(), d.eigenvalue() ? "λ" + index : d.name(),
                d.eigenvalue() ? "\\lambda_{" + index + "}" : d.name(), d.eigenvalue(), Formula.of(d.plain(), d.latex())));
        }
        List<String> warnings = new ArrayList<>();
        Optional<Point> pt = point(model, cf.parameters());
        Optional<CertifiedReal> rateValue = Optional.empty();
        List<RootPolynomial> named = List.of();
        List<List<CertifiedComplex>> eigenAtPoint = List.of();
        List<RationalMatrix> limitValues = List.of();
        if (pt.isPresent()) {
            try {
                if (!cf.parameters().isEmpty()) {
                    cf.evaluate(0, pt.get().values()); // checks every condition at the point (none without parameters)
                }
                rateValue = Optional.of(cf.rateAt(pt.get().values()));
                named = cf.rootPolynomials(pt.get().values());
                eigenAtPoint = cf.eigenvaluesAt(pt.get().values());
                limitValues = cf.longRunAt(pt.get().values());
            } catch (QchainException e) {
                if (e.key() != ErrorKey.CLOSED_FORM_CONDITION) {
                    throw e;
                }
                warnings.add(e.detail());
            }
        }
        List<ClosedResult.Eigen> eig = new ArrayList<>();
        for (int k = 0; k < cf.eigenvalues().size(); k++) {
            Eigenvalue e = cf.eigenvalues().get(k);
            eig.add(new ClosedResult.Eigen(Formula.of(e.factor(), e.factorLatex()), e.multiplicity(), e.jordanIndex(),
                e.kind(), formulas(e.values(), e.valuesLatex()),
                eigenAtPoint.isEmpty() ? List.of() : eigenAtPoint.get(k), e.valueNames()));
        }
        List<ClosedResult.Roots> roots = new ArrayList<>();
        if (named.isEmpty()) {
            for (Eigenvalue e : cf.eigenvalues()) {
                if (e.kind().equals("roots")) {
                    roots.add(new ClosedResult.Roots(e.name(), Formula.of(e.factor(), e.factorLatex()), List.of()));
                }
            }
        } else {
            for (RootPolynomial r : named) {
                roots.add(new ClosedResult.Roots(r.name(), Formula.of(r.polynomial(), r.latex()), r.roots()));
            }
        }
        LongRun lr = cf.longRun(q.factor());
        List<List<List<Formula>>> limits = new ArrayList<>();
        for (int k = 0; k < lr.limits().size(); k++) {
            List<List<String>> full = lr.limits().get(k);
            List<List<String>> fullLatex = lr.limitsLatex().get(k);
            List<List<Formula>> picked = new ArrayList<>();
            for (int i : ri) {
                List<Formula> r = new ArrayList<>();
                for (int j : ci) {
                    r.add(Formula.of(full.get(i).get(j), fullLatex.get(i).get(j)));
                }
                picked.add(r);
            }
            limits.add(picked);
        }
        List<List<List<Rational>>> values = new ArrayList<>();
        for (RationalMatrix full : limitValues) {
            List<List<Rational>> picked = new ArrayList<>();
            for (int i : ri) {
                List<Rational> r = new ArrayList<>();
                for (int j : ci) {
                    r.add(full.get(i, j));
                }
                picked.add(r);
            }
            values.add(picked);
        }
        Map<String, Domain> domains = new LinkedHashMap<>();
        for (String name : cf.parameters()) {
            m.param(name).ifPresent(d -> domains.put(name, d.domain()));
        }
        List<Point> special = new ArrayList<>();
        for (Map<String, Rational> c : cf.specialCorners(domains)) {
            special.add(new Point(c));
        }
        ClosedResult.LongRun longRun = new ClosedResult.LongRun(lr.period(), limits,
            Formula.of(lr.rate(), lr.rateLatex()), rateValue,
            lr.conditions(), cf.longRunNotProved(domains), special, lr.exact(), lr.exactFrom(), values);
        return new ClosedResult(m.source(), q.form(), cf.nSymbol(), validFrom, cf.conditions(),
            cf.conditionsNotProved(domains), m.states(), cf.parameters(), selection(row, col), names(m, ri),
            names(m, ci), cells, List.of(), eig, Optional.of(longRun), roots,
            pt.filter(p -> !p.isEmpty()), q.digits(), warnings, names(cf.symbols()), where,
            where.isEmpty() ? List.of() : namedCells, q.factor());
    }

    /** Formulas from the engine's two printed forms, pairwise. */
    private static List<Formula> formulas(List<String> plain, List<String> latex) {
        List<Formula> out = new ArrayList<>();
        for (int k = 0; k < plain.size(); k++) {
            out.add(Formula.of(plain.get(k), latex.get(k)));
        }
        return out;
    }

    private static ClosedResult.Names names(org.qchain.symbolic.closed.Symbols s) {
        return new ClosedResult.Names(s.step(), s.period(), s.variable(), s.series(), s.sequence());
    }

    private static ClosedResult fromSeries(Model m, ClosedQuery q, SeriesForm sf, Optional<Integer> row,
                                           Optional<Integer> col) {
        List<Integer> ri = indices(m, row);
        List<Integer> ci = indices(m, col);
        List<List<Formula>> cells = new ArrayList<>();
        List<List<ClosedResult.Recurrence>> recs = new ArrayList<>();
        int validFrom = 0;
        boolean gf = q.form() == ClosedResult.Form.GF;
        for (int i : ri) {
            List<Formula> line = new ArrayList<>();
            List<ClosedResult.Recurrence> rr = new ArrayList<>();
            for (int j : ci) {
                if (gf) {
                    line.add(Formula.of(sf.generatingFunction(i, j).plain(), sf.generatingFunction(i, j).latex()));
                } else {
                    Recurrence r = sf.recurrence(i, j);
                    line.add(Formula.of(r.plain(), r.latex()));
                    rr.add(new ClosedResult.Recurrence(formulas(r.coefficients(), r.coefficientsLatex()), r.validFrom(),
                        formulas(r.initial(), r.initialLatex())));
                    validFrom = Math.max(validFrom, r.validFrom());
                }
            }
            cells.add(line);
            if (!gf) {
                recs.add(rr);
            }
        }
        return new ClosedResult(m.source(), q.form(), sf.symbols().step(), validFrom, List.of(), List.of(),
            m.states(), sf.parameters(), selection(row, col), names(m, ri), names(m, ci), cells, recs, List.of(),
            Optional.empty(), List.of(), Optional.empty(), q.digits(), List.of(), names(sf.symbols()));
    }

    // --- classes, longrun, absorb --------------------------------------------------------------------------------

    /** The option that raises the limit on the states of a symbolic solve. */
    static final String MAX_STATES_OPTION = "--max-states";

    private static RatFunMatrix substituted(LoadedModel model) {
        RatFunMatrix p = checked(model).p();
        return model.given().isEmpty() ? p : p.substitute(model.given());
    }

    private static List<List<RatFun>> rows(RatFunMatrix p) {
        List<List<RatFun>> out = new ArrayList<>();
        for (int i = 0; i < p.size(); i++) {
            List<RatFun> row = new ArrayList<>();
            for (int j = 0; j < p.size(); j++) {
                row.add(p.get(i, j));
            }
            out.add(row);
        }
        return out;
    }

    private static void guardStates(LoadedModel model, int maxStates) {
        int n = model.states().size();
        if (n > maxStates) {
            throw new QchainException(ErrorKey.BAD_ARGUMENT, MAX_STATES_OPTION, maxStates, "the symbolic solve has "
                + n + " states, more than the limit " + maxStates + "; raise it with " + MAX_STATES_OPTION
                + " or give parameter values with --at");
        }
    }

    static org.qchain.result.ClassesResult classes(LoadedModel model) {
        RatFunMatrix p = substituted(model);
        org.qchain.symbolic.linear.RatFunArithmetic f = org.qchain.symbolic.linear.RatFunArithmetic.of(p.ring());
        List<List<RatFun>> rows = rows(p);
        return ChainResults.classes(model, f, rows, x -> new RatFunFormula(x, false), p.occurringVariables(),
            specialValues(model, p, rows), checked(model).warnings());
    }

    static org.qchain.result.LongRunResult longRun(LoadedModel model, LongRunQuery q) {
        guardStates(model, q.maxStates());
        RatFunMatrix p = substituted(model);
        return ChainResults.longRun(model, q, org.qchain.symbolic.linear.RatFunArithmetic.of(p.ring()), rows(p),
            x -> new RatFunFormula(x, false), p.occurringVariables(), checked(model).warnings());
    }

    static org.qchain.result.AbsorbResult absorb(LoadedModel model, AbsorbQuery q) {
        guardStates(model, q.limits().maxStates());
        RatFunMatrix p = substituted(model);
        return ChainResults.absorb(model, q, org.qchain.symbolic.linear.RatFunArithmetic.of(p.ring()), rows(p),
            x -> new RatFunFormula(x, false), p.occurringVariables(), checked(model).warnings());
    }

    /**
     * Parameter values inside or on the edge of the domains where an entry vanishes (a root of a factor of its
     * numerator that is linear in one parameter) and the structure then differs from the generic one.
     */
    private static List<org.qchain.result.ClassesResult.SpecialValue> specialValues(LoadedModel model,
            RatFunMatrix p, List<List<RatFun>> rows) {
        Model m = model.model();
        java.util.TreeMap<String, java.util.TreeSet<Rational>> roots = new java.util.TreeMap<>();
        for (List<RatFun> row : rows) {
            for (RatFun x : row) {
                if (x.isZero() || x.numerator().isConstant()) {
                    continue;
                }
                for (org.qchain.symbolic.Poly.Factor fac : x.numerator().factor().factors()) {
                    org.qchain.symbolic.Poly b = fac.base();
                    List<String> vars = b.occurringVariables();
                    if (vars.size() != 1 || b.totalDegree() != 1) {
                        continue;
                    }
                    String v = vars.get(0);
                    Rational c0 = b.substitute(Map.of(v, Rational.ZERO)).constantValue().orElseThrow();
                    Rational c1 = b.substitute(Map.of(v, Rational.ONE)).constantValue().orElseThrow().subtract(c0);
                    Rational root = c0.negate().divide(c1);
                    Domain d = m.param(v).map(org.qchain.exact.model.ParamDecl::domain)
                        .orElse(Domain.defaultFor(m.kind()));
                    boolean edge = root.equals(d.lower()) || d.upper().map(root::equals).orElse(false);
                    if (d.contains(root) || edge) {
                        roots.computeIfAbsent(v, k -> new java.util.TreeSet<>()).add(root);
                    }
                }
            }
        }
        org.qchain.exact.longrun.Structure generic = org.qchain.exact.longrun.Structure.of(graph(rows));
        List<org.qchain.result.ClassesResult.SpecialValue> out = new ArrayList<>();
        for (Map.Entry<String, java.util.TreeSet<Rational>> e : roots.entrySet()) {
            for (Rational r : e.getValue()) {
                List<List<RatFun>> at = rows(p.substitute(Map.of(e.getKey(), r)));
                org.qchain.exact.longrun.Structure s = org.qchain.exact.longrun.Structure.of(graph(at));
                if (!s.equals(generic)) {
                    out.add(new org.qchain.result.ClassesResult.SpecialValue(e.getKey() + " = " + r,
                        effect(generic, s, model.states())));
                }
            }
        }
        return out;
    }

    private static boolean[][] graph(List<List<RatFun>> rows) {
        int n = rows.size();
        boolean[][] g = new boolean[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                g[i][j] = !rows.get(i).get(j).isZero();
            }
        }
        return g;
    }

    /** What changes between two structures, in words. */
    static String effect(org.qchain.exact.longrun.Structure generic, org.qchain.exact.longrun.Structure s,
            List<String> names) {
        List<String> parts = new ArrayList<>();
        for (int a : s.absorbing()) {
            if (!generic.absorbing().contains(a)) {
                parts.add(names.get(a) + " can no longer leave");
            }
        }
        if (parts.isEmpty() || !generic.classes().equals(s.classes())) {
            List<String> cls = new ArrayList<>();
            for (int c = 0; c < s.classes().size(); c++) {
                cls.add("{" + String.join(", ", s.classes().get(c).stream().map(names::get).toList()) + "}"
                    + (s.closed().get(c) ? " closed" : "") + (s.closed().get(c) && s.periods().get(c) > 1
                    ? " period " + s.periods().get(c) : ""));
            }
            parts.add("classes become " + String.join(", ", cls));
        }
        return String.join("; ", parts);
    }
}
