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
import org.qchain.symbolic.PowerEstimate;
import org.qchain.symbolic.RatFun;
import org.qchain.symbolic.RatFunMatrix;
import org.qchain.symbolic.SymbolicLimits;
import org.qchain.symbolic.check.CheckReport;
import org.qchain.symbolic.check.Finding;
import org.qchain.symbolic.check.ParameterCheck;
import org.qchain.symbolic.closed.ClosedForm;
import org.qchain.symbolic.closed.Combination;
import org.qchain.symbolic.closed.ClosedForms;
import org.qchain.symbolic.closed.Eigenvalue;
import org.qchain.symbolic.closed.LongRun;
import org.qchain.symbolic.closed.Recurrence;
import org.qchain.symbolic.closed.RootPolynomial;
import org.qchain.symbolic.closed.SeriesForm;
import org.qchain.symbolic.closed.TimeFormula;
import org.qchain.symbolic.closed.TimeSymbols;
import org.qchain.symbolic.closed.TransientForm;
import org.qchain.symbolic.sensitivity.EntrySensitivity;
import org.qchain.symbolic.sensitivity.PointSensitivity;
import org.qchain.symbolic.sensitivity.Sensitivity;
import org.qchain.symbolic.sensitivity.SweepEstimate;
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

    /**
     * Maps the model into its parameter ring and checks it there, deciding range conditions at the values used
     * (nominal, overridden by those given with --at) and naming where they came from; throws the first error,
     * located.
     */
    static SymbolicValidation validate(Model m, Map<String, Rational> known, java.util.Set<String> given) {
        RatFunMatrix p = RatFunMatrix.fromModel(m);
        CheckReport report = ParameterCheck.check(m, p, known, given);
        report.throwIfErrors();
        return new Checked(p, grouped(report.warnings()));
    }

    /** How many further entries one grouped warning names before it only counts the rest. */
    static final int NAMED_ALIKE = 5;

    /**
     * The warnings, each once: entries with the same formula, condition and explanation make one warning, at the
     * first entry's position, that names the others ({@code ...; the same for B->B (m.chain:8:1)}), at most
     * {@link #NAMED_ALIKE} of them ({@code ... and 12 more entries}).
     */
    static List<String> grouped(List<Finding> findings) {
        Map<String, List<Finding>> groups = new LinkedHashMap<>();
        for (Finding f : findings) {
            String key = f.formula() + "\n" + f.condition() + "\n" + f.detail() + "\n"
                + (f.message().startsWith(f.entry()) ? f.message().substring(f.entry().length()) : f.message());
            groups.computeIfAbsent(key, k -> new ArrayList<>()).add(f);
        }
        List<String> out = new ArrayList<>();
        for (List<Finding> g : groups.values()) {
            StringBuilder sb = new StringBuilder(g.get(0).located());
            for (int k = 1; k < Math.min(g.size(), 1 + NAMED_ALIKE); k++) {
                Finding f = g.get(k);
                sb.append(k == 1 ? "; the same for " : ", ").append(f.entry());
                f.pos().ifPresent(pos -> sb.append(" (").append(pos).append(')'));
            }
            if (g.size() > 1 + NAMED_ALIKE) {
                sb.append(" and ").append(g.size() - 1 - NAMED_ALIKE).append(" more entries");
            }
            out.add(sb.toString());
        }
        return out;
    }

    private static Checked checked(LoadedModel model) {
        return (Checked) model.symbolic();
    }

    // --- size estimates, for the analysis layer's one guard (SizeGuard), before any engine runs ------------------

    /** Refuses a symbolic step whose power (or row of it) is estimated past the query's limits. */
    static void requireWithin(LoadedModel model, StepQuery q) {
        RatFunMatrix p = checked(model).p();
        PowerEstimate e = p.estimatePower(q.n());
        (q.from().isPresent() ? e.row(p.size()) : e).requireWithin(new SymbolicLimits(q.maxTerms(), q.maxDigits()));
    }

    /** Refuses a distribution whose rows of the power are estimated past the query's limits. */
    static void requireWithin(LoadedModel model, DistributionQuery q) {
        RatFunMatrix p = checked(model).p();
        p.estimatePower(q.ns().get(0)).row(p.size()).requireWithin(new SymbolicLimits(q.maxTerms(), q.maxDigits()));
    }

    /**
     * Refuses a sensitivity whose row of the power is estimated past the query's limits, then a sweep whose exact
     * values are bounded past the digit limit ({@link SweepEstimate}, from the one-step matrix: never below the
     * figure the sweep itself checks, so that check, kept as a second line, does not fire).
     */
    static void requireWithin(LoadedModel model, SensQuery q) {
        RatFunMatrix p = checked(model).p();
        p.estimatePower(q.n()).row(p.size()).requireWithin(new SymbolicLimits(q.maxTerms(), q.maxDigits()));
        Optional<SweepRange> range = sweepRange(model.model(), q);
        if (range.isPresent() && p.ring().indexOf(q.wrt()).isPresent()) {
            SweepRange r = range.get();
            int[] to = q.toStates().stream().mapToInt(t -> model.state("--to", t)).toArray();
            long digits = SweepEstimate.digits(p, q.n(), model.state("--from", q.from()), to, q.wrt(), r,
                others(model, r, q.sweep().get()));
            if (digits > q.maxDigits()) {
                throw sweepTooLarge(digits, r.size(), q.maxDigits());
            }
        }
    }

    private static QchainException sweepTooLarge(Object digits, Object points, Object limit) {
        return new QchainException(ErrorKey.SWEEP_TOO_LARGE, digits, points, limit,
            "; raise it with " + NumericEngine.MAX_DIGITS_OPTION + ", or sweep fewer points");
    }

    /** The --wrt and --sweep checks of a sensitivity query, and its sweep range if it has one. */
    private static Optional<SweepRange> sweepRange(Model m, SensQuery q) {
        for (String wrt : q.gradient()) {
            if (m.param(wrt).isEmpty()) {
                throw new QchainException(ErrorKey.BAD_ARGUMENT, "--wrt", wrt, m.params().isEmpty()
                    ? "the model declares no parameters"
                    : "not a parameter of " + m.source() + " (parameters: "
                        + String.join(", ", m.params().stream().map(d -> d.name()).toList()) + ")");
            }
        }
        if (q.sweep().isPresent() && q.gradient().size() > 1) {
            throw new QchainException(ErrorKey.BAD_ARGUMENT, "--sweep", q.sweep().get(), "a sweep tabulates one"
                + " derivative; give one --wrt parameter with --sweep (asked: " + String.join(", ", q.gradient())
                + "), or the gradient without --sweep");
        }
        return q.sweep().map(text -> sweep(m, text));
    }

    /**
     * Refuses closed forms whose powers P^1 .. P^s are estimated past the query's term limit, then, for a chain with
     * no free parameter, closed forms whose printed digits are bounded past the digit limit (the bound from P's
     * entries, {@link ClosedForms#digitBound}, is never below the figure the engine checks after factoring, which
     * stays as a second line that does not fire).
     */
    static void requireWithin(LoadedModel model, ClosedQuery q) {
        checked(model);
        ClosedForms.estimate(model.model(), model.given())
            .requireTermsWithin(new SymbolicLimits(q.maxTerms(), q.maxDigits()));
        java.util.OptionalLong digits = ClosedForms.digitBound(model.model(), model.given());
        if (digits.isPresent() && digits.getAsLong() > q.maxDigits()) {
            throw new QchainException(ErrorKey.RESULT_TOO_LARGE, digits.getAsLong(), q.maxDigits(),
                SymbolicLimits.DIGITS_OPTION);
        }
    }

    private static LongConsumer multiplying(Progress progress, long n) {
        return k -> progress.update("multiplying", k, n - 1);
    }

    /** A formula printed on demand from an exact rational function (factored or expanded). */
    /**
     * A rational function printed on demand, factored or not; the factorization (the costly part) is done once and
     * both texts are kept, since formatters and checks ask for them more than once.
     */
    static final class RatFunFormula implements Formula {
        private final RatFun f;
        private final boolean factored;
        private RatFun.Factored factors;
        private String plain;
        private String latex;

        RatFunFormula(RatFun f, boolean factored) {
            this.f = f;
            this.factored = factored;
        }

        private synchronized RatFun.Factored factors() {
            if (factors == null) {
                factors = f.factor();
            }
            return factors;
        }

        @Override
        public synchronized String plain() {
            if (plain == null) {
                plain = factored ? Formulas.plain(factors()) : Formulas.plain(f);
            }
            return plain;
        }

        @Override
        public synchronized String latex() {
            if (latex == null) {
                latex = factored ? Formulas.latex(factors()) : Formulas.latex(f);
            }
            return latex;
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof RatFunFormula r && r.factored == factored && r.f.equals(f);
        }

        @Override
        public int hashCode() {
            return 31 * f.hashCode() + Boolean.hashCode(factored);
        }

        @Override
        public String toString() {
            return plain();
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

    /**
     * The distribution after one n from a start (a state or a distribution), or the probability of a set of states,
     * as formulas in the parameters: the start's weighted sum of rows of P^n, each computed once; the values at the
     * point are checked against the exact engine's distribution of the substituted chain.
     */
    static SymbolicStepResult distribution(LoadedModel model, DistributionQuery q, Progress progress) {
        Model m = model.model();
        Checked ctx = checked(model);
        long n = q.ns().get(0);
        SymbolicLimits limits = new SymbolicLimits(q.maxTerms(), q.maxDigits());
        Rational[] start = new Rational[m.size()];
        java.util.Arrays.fill(start, Rational.ZERO);
        List<RatFun> acc = null;
        for (Map.Entry<String, Rational> w : q.start().weights().entrySet()) {
            int i = model.state(q.start().option(), w.getKey());
            start[i] = w.getValue();
            if (w.getValue().isZero()) {
                continue;
            }
            List<RatFun> row = ctx.p().powerRow(i, n, limits, multiplying(progress, n));
            List<RatFun> scaled = new ArrayList<>();
            for (int j = 0; j < row.size(); j++) {
                RatFun x = row.get(j).multiply(w.getValue());
                scaled.add(acc == null ? x : acc.get(j).add(x));
            }
            acc = scaled;
        }
        int[] to = q.to().stream().mapToInt(t -> model.state("--to", t)).toArray();
        List<RatFun> cells = new ArrayList<>();
        if (to.length == 0) {
            cells.addAll(acc);
        } else {
            RatFun sum = acc.get(to[0]);
            for (int k = 1; k < to.length; k++) {
                sum = sum.add(acc.get(to[k]));
            }
            cells.add(sum);
        }
        List<Formula> formulas = new ArrayList<>();
        for (RatFun f : cells) {
            formulas.add(new RatFunFormula(f, q.factor()));
        }
        Optional<Point> point = model.point();
        Optional<List<List<Rational>>> values = point.map(pt -> {
            Rational[] exact = org.qchain.exact.DistributionPowers.series(Chains.transitionMatrix(m, pt.values()),
                start, new long[] {n}, Progress.NONE).get(0);
            List<Rational> expected = new ArrayList<>();
            if (to.length == 0) {
                expected.addAll(List.of(exact));
            } else {
                Rational sum = Rational.ZERO;
                for (int j : to) {
                    sum = sum.add(exact[j]);
                }
                expected.add(sum);
            }
            List<Rational> row = new ArrayList<>();
            for (int j = 0; j < cells.size(); j++) {
                Rational v = cells.get(j).evaluate(pt.values());
                requireEqual(v, expected.get(j));
                row.add(v);
            }
            return List.of(row);
        });
        String from = q.start().text();
        Optional<String> toName = to.length == 0 ? Optional.empty() : Optional.of(String.join(",", q.to()));
        return new SymbolicStepResult(m.source(), m.kind().word(), n, m.usedParameters(), m.states(), q.factor(),
            Optional.of(from), toName, List.of(from), toName.map(List::of).orElse(m.states()), List.of(formulas),
            point, values, ctx.warnings());
    }

    // --- sens --------------------------------------------------------------------------------------------------

    static SensResult sens(LoadedModel model, SensQuery q, Progress progress) {
        Model m = model.model();
        Optional<SweepRange> range = sweepRange(m, q);
        Checked ctx = checked(model);
        int from = model.state("--from", q.from());
        int[] to = q.toStates().stream().mapToInt(t -> model.state("--to", t)).toArray();
        Map<String, Rational> others = range.map(r -> others(model, r, q.sweep().get())).orElse(Map.of());
        SymbolicLimits limits = new SymbolicLimits(q.maxTerms(), q.maxDigits());
        List<EntrySensitivity> partials = new ArrayList<>();
        if (to.length == 1 && q.gradient().size() == 1) {
            partials.add(Sensitivity.of(ctx.p(), q.n(), from, to[0], q.wrt(), limits, multiplying(progress, q.n())));
        } else {
            for (String wrt : q.gradient()) {
                if (ctx.p().ring().indexOf(wrt).isEmpty()) {
                    throw new QchainException(ErrorKey.UNKNOWN_PARAMETER, wrt);
                }
            }
            // one row of the power serves every final state and every parameter
            List<RatFun> row = ctx.p().powerRow(from, q.n(), limits, multiplying(progress, q.n()));
            RatFun sum = row.get(to[0]);
            for (int k = 1; k < to.length; k++) {
                sum = sum.add(row.get(to[k]));
            }
            for (String wrt : q.gradient()) {
                partials.add(new EntrySensitivity(q.n(), from, to[0], wrt, sum, sum.derivative(wrt)));
            }
        }
        EntrySensitivity s = partials.get(0);
        Optional<SensResult.AtPoint> at = Optional.empty();
        List<Optional<PointSensitivity>> atEach = new ArrayList<>();
        Optional<Point> point = model.point();
        if (point.isPresent() && q.gradient().stream().allMatch(model.known()::containsKey)) {
            Map<String, Rational> pt = new LinkedHashMap<>(point.get().values());
            q.gradient().forEach(w -> pt.put(w, model.known().get(w)));
            for (EntrySensitivity e : partials) {
                atEach.add(Optional.of(e.at(pt)));
            }
            PointSensitivity ps = atEach.get(0).orElseThrow();
            // the formula's value must equal the exact engine's value of the substituted chain
            Rational[] exactRow = MatrixPowers.rowOfPower(Chains.transitionMatrix(m, point.get().values()), from,
                q.n());
            Rational exact = Rational.ZERO;
            for (int j : to) {
                exact = exact.add(exactRow[j]);
            }
            requireEqual(ps.probability(), exact);
            at = Optional.of(new SensResult.AtPoint(new Point(pt, point.get().given()), ps.probability(), ps.derivative(),
                ps.elasticity()));
        }
        List<SensResult.Partial> gradient = new ArrayList<>();
        for (int k = 0; k < partials.size(); k++) {
            EntrySensitivity e = partials.get(k);
            Optional<PointSensitivity> ps = atEach.isEmpty() ? Optional.empty() : atEach.get(k);
            gradient.add(new SensResult.Partial(e.parameter(), Formulas.latexName(e.parameter()),
                new RatFunFormula(e.derivative(), q.factor()), ps.map(PointSensitivity::derivative),
                ps.flatMap(PointSensitivity::elasticity)));
        }
        Optional<SensResult.Sweep> sweep = Optional.empty();
        if (range.isPresent()) {
            SweepRange r = range.get();
            List<SensResult.SweepLine> lines = new ArrayList<>();
            List<SweepRow> rows;
            try {
                // the second line of defence: SizeGuard refused, before any work, every sweep whose a-priori bound
                // (never below this figure) passes the limit
                rows = s.sweep(r, others, q.maxDigits(), progress);
            } catch (QchainException e) {
                if (e.key() != ErrorKey.SWEEP_TOO_LARGE) {
                    throw e;
                }
                throw sweepTooLarge(e.args().get(0), e.args().get(1), e.args().get(2));
            }
            for (SweepRow row : rows) {
                lines.add(new SensResult.SweepLine(row.value(), row.probability(), row.derivative()));
            }
            sweep = Optional.of(new SensResult.Sweep(r.parameter(), r.start(), r.step(), r.end(), new Point(others),
                lines));
        }
        return new SensResult(m.source(), m.kind().word(), q.n(), q.from(), q.to(), q.wrt(),
            Formulas.latexName(q.wrt()), m.usedParameters(), new RatFunFormula(s.probability(), q.factor()),
            new RatFunFormula(s.derivative(), q.factor()), at, sweep, ctx.warnings(), q.toStates(), gradient);
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
        if (m.kind() == org.qchain.exact.model.ChainKind.CONTINUOUS) {
            return generatorCheck(model, ctx);
        }
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

    /**
     * The generator as formulas: rows sum to 0 identically (the diagonal is minus the row's rates; asserted), the
     * off-diagonal rates were checked to be at least 0 over the domains when the model was loaded (the located
     * conditions are the warnings), the total rate out of each state and its mean holding time.
     */
    private static CheckResult generatorCheck(LoadedModel model, Checked ctx) {
        RatFunMatrix p = ctx.p();
        List<List<Formula>> rows = new ArrayList<>();
        List<Formula> out = new ArrayList<>();
        List<Optional<Formula>> holding = new ArrayList<>();
        for (int i = 0; i < p.size(); i++) {
            if (!p.rowSum(i).isZero()) {
                throw new QchainException(ErrorKey.INTERNAL, "row " + model.states().get(i) + " of the generator sums"
                    + " to " + Formulas.plain(p.rowSum(i)) + ", not identically 0");
            }
            List<Formula> row = new ArrayList<>();
            for (int j = 0; j < p.size(); j++) {
                row.add(new RatFunFormula(p.get(i, j), false));
            }
            rows.add(row);
            RatFun q = p.get(i, i).negate();
            out.add(new RatFunFormula(q, false));
            holding.add(q.isZero() ? Optional.empty() : Optional.of(new RatFunFormula(q.reciprocal(), true)));
        }
        return new CheckResult.Generator(model.source(), model.states(), model.model().usedParameters(), true, rows,
            out, holding, NumericEngine.upNames(model), Optional.empty(), ctx.warnings());
    }

    // --- closed ------------------------------------------------------------------------------------------------

    static ClosedResult closed(LoadedModel model, ClosedQuery q, Progress progress) {
        Model m = model.model();
        // the symbolic check, as for every symbolic query: rows must sum to 1 identically
        Checked ctx = checked(model);
        Cells cells = Cells.of(model, q);
        SymbolicLimits limits = new SymbolicLimits(q.maxTerms(), q.maxDigits());
        if (m.kind() == org.qchain.exact.model.ChainKind.CONTINUOUS) {
            if (q.start().isPresent() && q.from().isEmpty()) {
                throw new QchainException(ErrorKey.BAD_ARGUMENT, q.fromName(), q.start().get().text(),
                    "a start distribution is not supported on a continuous chain yet; give one state with --from");
            }
            if (q.toStates().size() > 1) {
                throw new QchainException(ErrorKey.BAD_ARGUMENT, "--to", String.join(",", q.toStates()),
                    "a set of final states is not supported on a continuous chain yet; give one state");
            }
            Optional<Integer> row = q.from().map(s -> model.state(q.fromName(), s));
            Optional<Integer> col = q.toStates().stream().findFirst().map(s -> model.state("--to", s));
            ClosedResult r = fromTransientForm(model, q, ClosedForms.ofGenerator(m, model.given(), limits, progress),
                row, col);
            return model.given().isEmpty() ? r : substituted(r, model.given());
        }
        ClosedResult r = q.form() == ClosedResult.Form.MATRIX
            ? fromClosedForm(model, q, ClosedForms.of(m, model.given(), limits, progress), cells, ctx)
            : fromSeries(m, q, ClosedForms.series(m, model.given(), limits, progress), cells, ctx.warnings());
        r = model.given().isEmpty() ? r : substituted(r, model.given());
        return cells.combined ? r.withStart(cells.startWeights, cells.toStates) : r;
    }

    /**
     * The cells a closed-form query prints: rows (each state, one starting state, or one start distribution) by
     * columns (each state, one final state, or one set of final states), each cell one {@link Combination} of the
     * entries of P^n, with the labels the result shows.
     */
    private record Cells(List<String> rowLabels, List<String> colLabels, List<List<Combination>> grid,
                         ClosedResult.Selection selection, boolean combined, Map<String, Rational> startWeights,
                         List<String> toStates) {
        static Cells of(LoadedModel model, ClosedQuery q) {
            int s = model.model().size();
            List<Map<Integer, Rational>> rows = new ArrayList<>();
            List<String> rowLabels = new ArrayList<>();
            Map<String, Rational> weights = new LinkedHashMap<>();
            if (q.start().isPresent()) {
                Start st = q.start().get();
                Map<Integer, Rational> w = new LinkedHashMap<>();
                st.weights().forEach((name, v) -> w.put(model.state(st.option(), name), v));
                weights.putAll(st.weights());
                rows.add(w);
                rowLabels.add(st.text());
            } else {
                for (int i = 0; i < s; i++) {
                    rows.add(Map.of(i, Rational.ONE));
                    rowLabels.add(model.model().states().get(i));
                }
            }
            List<List<Integer>> cols = new ArrayList<>();
            List<String> colLabels = new ArrayList<>();
            if (!q.toStates().isEmpty()) {
                List<Integer> c = new ArrayList<>();
                for (String t : q.toStates()) {
                    c.add(model.state("--to", t));
                }
                cols.add(c);
                colLabels.add(q.toStates().size() == 1 ? q.toStates().get(0)
                    : "{" + String.join(", ", q.toStates()) + "}");
            } else {
                for (int j = 0; j < s; j++) {
                    cols.add(List.of(j));
                    colLabels.add(model.model().states().get(j));
                }
            }
            List<List<Combination>> grid = new ArrayList<>();
            for (Map<Integer, Rational> r : rows) {
                List<Combination> line = new ArrayList<>();
                for (List<Integer> c : cols) {
                    line.add(r.size() == 1 && c.size() == 1 && r.values().iterator().next().isOne()
                        ? Combination.entry(r.keySet().iterator().next(), c.get(0)) : Combination.of(r, c));
                }
                grid.add(line);
            }
            ClosedResult.Selection sel = !q.toStates().isEmpty() ? ClosedResult.Selection.ENTRY
                : (q.start().isPresent() ? ClosedResult.Selection.ROW : ClosedResult.Selection.MATRIX);
            // a start given as --start, or a set of final states: the result names them (as step does)
            boolean combined = q.start().isPresent() && (q.fromName().equals("--start") || q.toStates().size() > 1);
            return new Cells(rowLabels, colLabels, grid, sel, combined, weights, q.toStates());
        }

        /** Every cell, row by row. */
        List<Combination> all() {
            List<Combination> out = new ArrayList<>();
            grid.forEach(out::addAll);
            return out;
        }
    }

    /** The result with the values given with --at, which were substituted before the closed form was found. */
    private static ClosedResult substituted(ClosedResult r, Map<String, Rational> given) {
        Map<String, Rational> ordered = new java.util.LinkedHashMap<>();
        new java.util.TreeMap<>(given).forEach(ordered::put);
        return r.withSubstituted(ordered);
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

    private static ClosedResult fromClosedForm(LoadedModel model, ClosedQuery q, ClosedForm cf, Cells sel,
                                               Checked ctx) {
        Model m = model.model();
        List<List<Formula>> cells = new ArrayList<>();
        List<List<Formula>> namedCells = new ArrayList<>();
        int validFrom = 0;
        for (List<Combination> row : sel.grid()) {
            List<Formula> line = new ArrayList<>();
            List<Formula> named = new ArrayList<>();
            for (Combination c : row) {
                line.add(Formula.of(cf.plain(c, false, q.factor()), cf.latex(c, false, q.factor())));
                named.add(Formula.of(cf.plain(c, true, q.factor()), cf.latex(c, true, q.factor())));
                validFrom = Math.max(validFrom, cf.validFrom(c));
            }
            cells.add(line);
            namedCells.add(named);
        }
        List<ClosedResult.Where> where = where(cf.definitions(), cf.symbols().eigenPrefix());
        // the range conditions of the symbolic check first, as every symbolic command states them
        List<String> warnings = new ArrayList<>(ctx.warnings());
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
        List<ClosedResult.Eigen> eig = eigens(cf.eigenvalues(), eigenAtPoint);
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
            List<List<Formula>> picked = new ArrayList<>();
            for (List<Combination> row : sel.grid()) {
                List<Formula> r = new ArrayList<>();
                for (Combination c : row) {
                    List<String> f = cf.limits(c, q.factor()).get(k);
                    r.add(Formula.of(f.get(0), f.get(1)));
                }
                picked.add(r);
            }
            limits.add(picked);
        }
        List<List<List<Rational>>> values = new ArrayList<>();
        for (int k = 0; k < limitValues.size(); k++) {
            List<List<Rational>> picked = new ArrayList<>();
            for (List<Combination> row : sel.grid()) {
                List<Rational> r = new ArrayList<>();
                for (Combination c : row) {
                    r.add(cf.longRunAt(c, pt.orElseThrow().values()).get(k));
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
            conditions(cf.longRunConditions(domains)), special,
            lr.exact() || sel.selection() != ClosedResult.Selection.MATRIX && sel.all().stream().allMatch(cf::settled),
            // the printed cells are exactly periodic (or constant) from their own valid-from on
            Math.min(lr.exactFrom(), validFrom), values);
        // the conditions of the printed formulas only (a combination's cancelled terms need none), in the order of
        // the whole matrix's conditions
        List<org.qchain.symbolic.closed.Condition> conds = cf.conditions(domains);
        if (sel.selection() != ClosedResult.Selection.MATRIX) {
            java.util.Set<String> own = new java.util.HashSet<>();
            for (Combination c : sel.all()) {
                own.addAll(cf.conditions(c));
            }
            conds = conds.stream().filter(k -> own.contains(k.text())).toList();
        }
        return new ClosedResult(m.source(), q.form(), cf.nSymbol(), validFrom, conditions(conds),
            m.states(), cf.parameters(), sel.selection(), sel.rowLabels(),
            sel.colLabels(), cells, List.of(), eig, Optional.of(longRun), roots,
            pt.filter(p -> !p.isEmpty()), q.digits(), warnings, names(cf.symbols()), where,
            where.isEmpty() ? List.of() : namedCells, q.factor());
    }

    /** The closed-form engine's conditions as result values: {@code left != right}, the domain fact kept. */
    private static List<org.qchain.result.Condition> conditions(List<org.qchain.symbolic.closed.Condition> cs) {
        List<org.qchain.result.Condition> out = new ArrayList<>();
        for (org.qchain.symbolic.closed.Condition c : cs) {
            out.add(org.qchain.result.Condition.notEqual(Formula.of(c.left(), c.leftLatex()), c.right(),
                c.holdsThroughout()));
        }
        return out;
    }

    /**
     * P(t) with symbolic parameters: the closed form of each shown entry in t, at each asked time, with the
     * certified decimals at the point (computed by the caller, numerically) when every parameter has a value.
     */
    static org.qchain.result.SymbolicTransientResult transientForm(LoadedModel model, TransientFormQuery q,
                                                                   Optional<org.qchain.result.TransientResult> values,
                                                                   Progress progress) {
        Model m = model.model();
        Checked ctx = checked(model);
        Optional<Integer> row = q.from().map(s -> model.state("--from", s));
        SymbolicLimits limits = new SymbolicLimits(q.maxTerms(), q.maxDigits());
        TransientForm tf = ClosedForms.ofGenerator(m, model.given(), limits, progress);
        List<Integer> ri = indices(m, row);
        List<Integer> ci = indices(m, Optional.empty());
        List<List<Formula>> cells = new ArrayList<>();
        List<List<Formula>> namedCells = new ArrayList<>();
        for (int i : ri) {
            List<Formula> line = new ArrayList<>();
            List<Formula> named = new ArrayList<>();
            for (int j : ci) {
                TimeFormula f = tf.entry(i, j, q.factor());
                line.add(Formula.of(f.plain(), f.latex()));
                named.add(Formula.of(f.namedPlain(), f.namedLatex()));
            }
            cells.add(line);
            namedCells.add(named);
        }
        List<ClosedResult.Where> where = where(tf.definitions(), tf.symbols().others().eigenPrefix());
        List<org.qchain.result.SymbolicTransientResult.AtTime> times = new ArrayList<>();
        for (Rational t : q.times()) {
            List<List<Formula>> at = new ArrayList<>();
            List<List<Formula>> plain = new ArrayList<>();
            for (int i : ri) {
                List<Formula> line = new ArrayList<>();
                List<Formula> full = new ArrayList<>();
                for (int j : ci) {
                    TimeFormula f = tf.entryAt(i, j, t, q.factor());
                    line.add(where.isEmpty() ? Formula.of(f.plain(), f.latex()) : Formula.of(f.namedPlain(), f.namedLatex()));
                    full.add(Formula.of(f.plain(), f.latex()));
                }
                at.add(line);
                plain.add(full);
            }
            times.add(new org.qchain.result.SymbolicTransientResult.AtTime(t, at, plain));
        }
        Map<String, Domain> domains = new LinkedHashMap<>();
        for (String name : tf.parameters()) {
            m.param(name).ifPresent(d -> domains.put(name, d.domain()));
        }
        List<String> warnings = new ArrayList<>(ctx.warnings());
        Optional<Point> pt = checkAtPoint(model, tf, "", warnings);
        Map<String, Rational> given = new LinkedHashMap<>();
        new java.util.TreeMap<>(model.given()).forEach(given::put);
        return new org.qchain.result.SymbolicTransientResult(m.source(), m.states(), q.from(), tf.symbols().time(),
            tf.parameters(), tf.conditions(), tf.conditionsNotProved(domains), names(m, ri), cells, where,
            where.isEmpty() ? List.of() : namedCells, times, values, pt, given, q.factor(), q.digits(), warnings);
    }

    /** The factors and their eigenvalues as results, with their values at the point when there are any. */
    private static List<ClosedResult.Eigen> eigens(List<Eigenvalue> es, List<List<CertifiedComplex>> atPoint) {
        List<ClosedResult.Eigen> eig = new ArrayList<>();
        for (int k = 0; k < es.size(); k++) {
            Eigenvalue e = es.get(k);
            eig.add(new ClosedResult.Eigen(Formula.of(e.factor(), e.factorLatex()), e.multiplicity(), e.jordanIndex(),
                e.kind(), formulas(e.values(), e.valuesLatex()), atPoint.isEmpty() ? List.of() : atPoint.get(k),
                e.valueNames()));
        }
        return eig;
    }

    /** The named pieces of a closed form (a square root, eigenvalues l1, l2 printed as λ1, λ2). */
    private static List<ClosedResult.Where> where(List<org.qchain.symbolic.closed.Definition> defs, String eigenPrefix) {
        List<ClosedResult.Where> where = new ArrayList<>();
        for (org.qchain.symbolic.closed.Definition d : defs) {
            String index = d.name().substring(eigenPrefix.length());
            where.add(new ClosedResult.Where(d.name(), d.eigenvalue() ? "λ" + index : d.name(),
                d.eigenvalue() ? "\\lambda_{" + index + "}" : d.name(), d.eigenvalue(), Formula.of(d.plain(), d.latex())));
        }
        return where;
    }

    /** The rows ri and columns ci of a full grid. */
    private static <T> List<List<T>> picked(List<List<T>> full, List<Integer> ri, List<Integer> ci) {
        List<List<T>> out = new ArrayList<>();
        for (int i : ri) {
            List<T> r = new ArrayList<>();
            for (int j : ci) {
                r.add(full.get(i).get(j));
            }
            out.add(r);
        }
        return out;
    }

    /**
     * The closed form of a continuous chain's P(t) as a result: the cells in t, their Laplace transforms, the
     * eigenvalues of Q, the limit as t grows with its rate (the largest real part of the other eigenvalues), values
     * at the point when every parameter has one.
     */
    private static ClosedResult fromTransientForm(LoadedModel model, ClosedQuery q, TransientForm tf,
                                                  Optional<Integer> row, Optional<Integer> col) {
        Model m = model.model();
        List<Integer> ri = indices(m, row);
        List<Integer> ci = indices(m, col);
        List<List<Formula>> cells = new ArrayList<>();
        List<List<Formula>> namedCells = new ArrayList<>();
        List<List<Formula>> transforms = new ArrayList<>();
        for (int i : ri) {
            List<Formula> line = new ArrayList<>();
            List<Formula> named = new ArrayList<>();
            List<Formula> lt = new ArrayList<>();
            for (int j : ci) {
                TimeFormula f = tf.entry(i, j, q.factor());
                line.add(Formula.of(f.plain(), f.latex()));
                named.add(Formula.of(f.namedPlain(), f.namedLatex()));
                org.qchain.symbolic.closed.GeneratingFunction g = tf.laplaceTransform(i, j);
                lt.add(Formula.of(g.plain(), g.latex()));
            }
            cells.add(line);
            namedCells.add(named);
            transforms.add(lt);
        }
        TimeSymbols sy = tf.symbols();
        List<ClosedResult.Where> where = where(tf.definitions(), sy.others().eigenPrefix());
        List<String> warnings = new ArrayList<>();
        Optional<Point> pt = point(model, tf.parameters());
        Optional<CertifiedReal> rateValue = Optional.empty();
        List<RootPolynomial> named = List.of();
        List<List<CertifiedComplex>> eigenAtPoint = List.of();
        List<RationalMatrix> limitValues = List.of();
        if (pt.isPresent()) {
            try {
                tf.checkPoint(pt.get().values());
                rateValue = Optional.of(tf.rateAt(pt.get().values()));
                named = tf.rootPolynomials(pt.get().values());
                eigenAtPoint = tf.eigenvaluesAt(pt.get().values());
                if (tf.hasLimit()) {
                    limitValues = List.of(tf.limitAt(pt.get().values()));
                }
            } catch (QchainException e) {
                if (e.key() != ErrorKey.CLOSED_FORM_CONDITION) {
                    throw e;
                }
                warnings.add(e.detail());
            }
        }
        List<ClosedResult.Eigen> eig = eigens(tf.eigenvalues(), eigenAtPoint);
        List<ClosedResult.Roots> roots = new ArrayList<>();
        for (RootPolynomial r : named.isEmpty() ? tf.rootPolynomials(null) : named) {
            roots.add(new ClosedResult.Roots(r.name(), Formula.of(r.polynomial(), r.latex()), r.roots()));
        }
        List<List<String>> lim = tf.limit(q.factor(), false);
        List<List<String>> limLatex = tf.limit(q.factor(), true);
        List<List<Formula>> limit = new ArrayList<>();
        for (int i : ri) {
            List<Formula> r = new ArrayList<>();
            for (int j : ci) {
                r.add(Formula.of(lim.get(i).get(j), limLatex.get(i).get(j)));
            }
            limit.add(r);
        }
        List<List<List<Rational>>> values = new ArrayList<>();
        for (RationalMatrix full : limitValues) {
            List<List<Rational>> grid = new ArrayList<>();
            for (int i = 0; i < full.rows(); i++) {
                grid.add(List.of(full.row(i)));
            }
            values.add(picked(grid, ri, ci));
        }
        Map<String, Domain> domains = new LinkedHashMap<>();
        for (String name : tf.parameters()) {
            m.param(name).ifPresent(d -> domains.put(name, d.domain()));
        }
        List<Point> special = new ArrayList<>();
        for (Map<String, Rational> c : tf.specialCorners(domains)) {
            special.add(new Point(c));
        }
        Optional<ClosedResult.LongRun> longRun = tf.hasLimit() ? Optional.of(new ClosedResult.LongRun(1,
            List.of(limit), Formula.of(tf.rate(false), tf.rate(true)), rateValue,
            conditions(tf.longRunConditions(domains)), special, tf.constant(), 0, values)) : Optional.empty();
        ClosedResult.Names names = new ClosedResult.Names(sy.time(), sy.others().period(), sy.others().variable(),
            sy.transform(), sy.others().sequence());
        return new ClosedResult(m.source(), ClosedResult.Form.MATRIX, sy.time(), 0, conditions(tf.conditions(domains)),
            m.states(), tf.parameters(), selection(row, col), names(m, ri),
            names(m, ci), cells, List.of(), eig, longRun, roots, pt.filter(p -> !p.isEmpty()), q.digits(), warnings,
            names, where, where.isEmpty() ? List.of() : namedCells, q.factor(), Map.of(), Map.of(), List.of(),
            ClosedResult.Kind.CONTINUOUS, sy.time(), sy.transform(), transforms);
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

    private static ClosedResult fromSeries(Model m, ClosedQuery q, SeriesForm sf, Cells sel, List<String> warnings) {
        List<List<Formula>> cells = new ArrayList<>();
        List<List<ClosedResult.Recurrence>> recs = new ArrayList<>();
        int validFrom = 0;
        boolean gf = q.form() == ClosedResult.Form.GF;
        for (List<Combination> row : sel.grid()) {
            List<Formula> line = new ArrayList<>();
            List<ClosedResult.Recurrence> rr = new ArrayList<>();
            for (Combination c : row) {
                if (gf) {
                    org.qchain.symbolic.closed.GeneratingFunction g = sf.generatingFunction(c);
                    line.add(Formula.of(g.plain(), g.latex()));
                } else {
                    Recurrence r = sf.recurrence(c);
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
        return new ClosedResult(m.source(), q.form(), sf.symbols().step(), validFrom, List.of(),
            m.states(), sf.parameters(), sel.selection(), sel.rowLabels(), sel.colLabels(), cells, recs, List.of(),
            Optional.empty(), List.of(), Optional.empty(), q.digits(), warnings, names(sf.symbols()));
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

    static org.qchain.result.ClassesResult classes(LoadedModel model, boolean brief) {
        RatFunMatrix p = substituted(model);
        org.qchain.symbolic.linear.RatFunArithmetic f = org.qchain.symbolic.linear.RatFunArithmetic.of(p.ring());
        List<List<RatFun>> rows = rows(p);
        return ChainResults.classes(model, f, rows, x -> new RatFunFormula(x, false), p.occurringVariables(),
            specialValues(model, p, rows), checked(model).warnings(), brief);
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

    // --- avail ---------------------------------------------------------------------------------------------------

    /**
     * The figures of merit as formulas in the parameters: the exact module's one availability algorithm
     * ({@link org.qchain.exact.ctmc.Availability}) run in the rational functions of the parameters, the values
     * given with --at substituted first. The conditions are the irreducible factors of every figure's denominator
     * and of every rate (each rate is taken as positive: the structure the formulas belong to), each checked
     * throughout the domains. Where every parameter has a value, the exact figures there come from the numeric
     * engine and must equal the formulas evaluated at the point.
     */
    static org.qchain.result.SymbolicAvailabilityResult availability(LoadedModel model, AvailabilityQuery q,
            List<Integer> up, Progress progress) {
        guardStates(model, q.maxStates());
        Model m = model.model();
        RatFunMatrix p = substituted(model);
        org.qchain.symbolic.linear.RatFunArithmetic f = org.qchain.symbolic.linear.RatFunArithmetic.of(p.ring());
        List<List<RatFun>> rows = rows(p);
        org.qchain.exact.ctmc.Availability.Figures<RatFun> fig = org.qchain.exact.ctmc.Availability.of(f, rows, up,
            f.of(q.hoursPerYear()));
        List<String> states = m.states();
        Map<String, Formula> pi = new LinkedHashMap<>();
        Map<String, Optional<Formula>> mttf = new LinkedHashMap<>();
        List<RatFun> all = new ArrayList<>(List.of(fig.availability(), fig.failureFrequency()));
        for (int i = 0; i < states.size(); i++) {
            pi.put(states.get(i), new RatFunFormula(fig.stationary().get(i), true));
            all.add(fig.stationary().get(i));
        }
        for (int i : fig.up()) {
            mttf.put(states.get(i), fig.mttf().get(i).map(x -> new RatFunFormula(x, true)));
            fig.mttf().get(i).ifPresent(all::add);
        }
        fig.meanUpTime().ifPresent(all::add);
        fig.meanDownTime().ifPresent(all::add);
        java.util.LinkedHashSet<org.qchain.symbolic.Poly> factors = new java.util.LinkedHashSet<>();
        for (int i = 0; i < rows.size(); i++) {
            for (int j = 0; j < rows.size(); j++) {
                RatFun x = rows.get(i).get(j);
                if (i != j && !x.isZero()) {
                    addFactors(factors, x.numerator());
                    addFactors(factors, x.denominator());
                }
            }
        }
        for (RatFun x : all) {
            addFactors(factors, x.denominator());
        }
        Map<String, Domain> domains = new LinkedHashMap<>();
        m.params().forEach(d -> domains.put(d.name(), d.domain()));
        List<org.qchain.result.Condition> conditions = new ArrayList<>();
        for (org.qchain.symbolic.Poly c : factors) {
            conditions.add(org.qchain.result.Condition.notEqual(Formula.of(Formulas.plain(c),
                Formulas.of(RatFun.of(c), false, true)), Rational.ZERO, org.qchain.symbolic.BoxSign.nonZero(c, domains)));
        }
        Optional<org.qchain.result.AvailabilityResult> at = Optional.empty();
        if (model.complete()) {
            org.qchain.result.AvailabilityResult exact = ContinuousEngine.availability(model, q, progress);
            Map<String, Rational> pt = model.point().orElseThrow().values();
            requireEqual(fig.availability().evaluate(pt), exact.availability());
            requireEqual(fig.failureFrequency().evaluate(pt), exact.failureFrequency());
            for (int i = 0; i < states.size(); i++) {
                requireEqual(fig.stationary().get(i).evaluate(pt), exact.stationary().get(states.get(i)));
            }
            for (int i : fig.up()) {
                if (fig.mttf().get(i).isPresent() && exact.mttf().get(states.get(i)).isPresent()) {
                    requireEqual(fig.mttf().get(i).get().evaluate(pt), exact.mttf().get(states.get(i)).get());
                }
            }
            at = Optional.of(exact);
        }
        Map<String, Rational> given = new LinkedHashMap<>();
        new java.util.TreeMap<>(model.given()).forEach(given::put);
        List<String> warnings = new ArrayList<>(checked(model).warnings());
        Optional<org.qchain.result.SymbolicAvailabilityResult.InTime> inTime = inTime(model, q, p, up,
            conditions, warnings, progress);
        return new org.qchain.result.SymbolicAvailabilityResult(m.source(), p.occurringVariables(),
            fig.up().stream().map(states::get).toList(), states, pi, new RatFunFormula(fig.availability(), true),
            new RatFunFormula(fig.unavailability(), true), q.hoursPerYear(),
            new RatFunFormula(fig.downHoursPerYear(), true), new RatFunFormula(fig.failureFrequency(), true),
            fig.meanUpTime().map(x -> new RatFunFormula(x, true)),
            fig.meanDownTime().map(x -> new RatFunFormula(x, true)), mttf, conditions, given, at,
            warnings, inTime, org.qchain.exact.model.ValueOrigin.of(given.keySet(), model.explicit()));
    }

    /**
     * Checks a closed form's conditions at the model's parameter point, if every one of its parameters has a value
     * there: a condition that fails there becomes a warning (after {@code prefix}); other failures propagate.
     *
     * @return the point checked; empty when a parameter of the form has no value
     */
    private static Optional<Point> checkAtPoint(LoadedModel model, TransientForm tf, String prefix, List<String> warnings) {
        Optional<Point> pt = point(model, tf.parameters()).filter(p -> !p.isEmpty());
        if (pt.isPresent()) {
            try {
                tf.checkPoint(pt.get().values());
            } catch (QchainException e) {
                if (e.key() != ErrorKey.CLOSED_FORM_CONDITION) {
                    throw e;
                }
                warnings.add(prefix + e.detail());
            }
        }
        return pt;
    }

    /**
     * A(t) and R(t) from the query's start as closed forms in t: the combination e_start P(t) u of the generator's
     * transient form, with u the 0/1 vector of the up states, and the same for the generator whose down rows are
     * zero (the down states absorbing). Empty, with a warning, for a chain of more states than the query allows or a
     * closed form past the size limits.
     */
    private static Optional<org.qchain.result.SymbolicAvailabilityResult.InTime> inTime(LoadedModel model,
            AvailabilityQuery q, RatFunMatrix p, List<Integer> up, List<org.qchain.result.Condition> conditions,
            List<String> warnings, Progress progress) {
        List<String> states = model.model().states();
        int n = states.size();
        if (n > q.maxTimeStates()) {
            if (q.maxTimeStates() > 0) {
                warnings.add("A(t) and R(t) as formulas in t are given for chains of up to " + q.maxTimeStates()
                    + " states; this one has " + n + " (raise the limit with --max-time-states; the eigenvalues of"
                    + " larger generators take long)");
            }
            return Optional.empty();
        }
        String from = q.from().orElse(states.get(up.get(0)));
        int start = model.state("--from", from);
        List<Rational> e = new ArrayList<>();
        List<Rational> u = new ArrayList<>();
        java.util.Set<Integer> upSet = new java.util.HashSet<>(up);
        for (int i = 0; i < n; i++) {
            e.add(i == start ? Rational.ONE : Rational.ZERO);
            u.add(upSet.contains(i) ? Rational.ONE : Rational.ZERO);
        }
        RatFun zero = RatFun.of(p.ring().zero());
        RatFun[][] absorbing = new RatFun[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                absorbing[i][j] = upSet.contains(i) ? p.get(i, j) : zero;
            }
        }
        try {
            TransientForm a = ClosedForms.ofGenerator(p, states, SymbolicLimits.DEFAULT, progress);
            TransientForm r = ClosedForms.ofGenerator(RatFunMatrix.of(p.ring(), absorbing), states,
                SymbolicLimits.DEFAULT, progress);
            TimeFormula af = a.combination(e, u, false);
            TimeFormula rf = r.combination(e, u, false);
            // the closed forms' own conditions (distinct eigenvalues of the generic case), each once
            Map<String, Domain> domains = new LinkedHashMap<>();
            model.model().params().forEach(d -> domains.put(d.name(), d.domain()));
            java.util.Set<String> seen = new java.util.HashSet<>();
            conditions.forEach(c -> seen.add(c.plain()));
            for (TransientForm tf : List.of(a, r)) {
                for (org.qchain.result.Condition c : conditions(tf.conditions(domains))) {
                    if (seen.add(c.plain())) {
                        conditions.add(c);
                    }
                }
            }
            checkAtPoint(model, a, "A(t): ", warnings);
            checkAtPoint(model, r, "R(t): ", warnings);
            return Optional.of(new org.qchain.result.SymbolicAvailabilityResult.InTime(from, a.symbols().time(),
                Formula.of(af.plain(), af.latex()), Formula.of(rf.plain(), rf.latex()), rootFactors(a, af.plain()),
                rootFactors(r, rf.plain())));
        } catch (QchainException x) {
            if (x.key() == ErrorKey.INTERRUPTED) {
                throw x;
            }
            warnings.add("A(t) and R(t) as formulas in t are not given: " + x.detail());
            return Optional.empty();
        }
    }

    /**
     * The factors a transient form names (eigenvalues as the roots of a factor) that occur in a formula of it, by
     * name.
     */
    private static Map<String, Formula> rootFactors(TransientForm tf, String plain) {
        Map<String, Formula> out = new LinkedHashMap<>();
        for (Eigenvalue ev : tf.eigenvalues()) {
            if (!ev.name().isEmpty()
                && java.util.regex.Pattern.compile("\\b" + java.util.regex.Pattern.quote(ev.name()) + "\\b")
                    .matcher(plain).find()) {
                out.put(ev.name(), Formula.of(ev.factor(), ev.factorLatex()));
            }
        }
        return out;
    }

    /** The irreducible non-constant factors of a polynomial, each once, normalised by the factorisation. */
    private static void addFactors(java.util.Set<org.qchain.symbolic.Poly> out, org.qchain.symbolic.Poly p) {
        if (p.isConstant()) {
            return;
        }
        for (org.qchain.symbolic.Poly.Factor fac : p.factor().factors()) {
            if (!fac.base().isConstant()) {
                out.add(fac.base());
            }
        }
    }

    /**
     * Parameter values inside or on the edge of the domains where an entry vanishes (a root of a factor of its
     * numerator that is linear in one parameter) and the structure then differs from the generic one.
     */
    private static List<org.qchain.result.ClassesResult.SpecialValue> specialValues(LoadedModel model,
            RatFunMatrix p, List<List<RatFun>> rows) {
        Model m = model.model();
        java.util.TreeMap<String, java.util.TreeSet<Rational>> roots = new java.util.TreeMap<>();
        // factors not of the form (parameter - value): their zero sets are curves or surfaces, or irrational points
        java.util.LinkedHashSet<org.qchain.symbolic.Poly> curves = new java.util.LinkedHashSet<>();
        for (List<RatFun> row : rows) {
            for (RatFun x : row) {
                if (x.isZero() || x.numerator().isConstant()) {
                    continue;
                }
                for (org.qchain.symbolic.Poly.Factor fac : x.numerator().factor().factors()) {
                    org.qchain.symbolic.Poly b = fac.base();
                    List<String> vars = b.occurringVariables();
                    if (vars.size() != 1 || b.totalDegree() != 1) {
                        if (!vars.isEmpty()) {
                            curves.add(b);
                        }
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
        org.qchain.symbolic.linear.RatFunArithmetic f = org.qchain.symbolic.linear.RatFunArithmetic.of(p.ring());
        org.qchain.exact.longrun.Structure generic = org.qchain.exact.longrun.Structure.of(
            ChainResults.graph(model, f, rows));
        List<org.qchain.result.ClassesResult.SpecialValue> out = new ArrayList<>();
        for (Map.Entry<String, java.util.TreeSet<Rational>> e : roots.entrySet()) {
            for (Rational r : e.getValue()) {
                List<List<RatFun>> at = rows(p.substitute(Map.of(e.getKey(), r)));
                org.qchain.exact.longrun.Structure s = org.qchain.exact.longrun.Structure.of(
                    ChainResults.graph(model, f, at));
                if (!s.equals(generic)) {
                    out.add(new org.qchain.result.ClassesResult.SpecialValue(org.qchain.result.Condition.equal(
                        Formula.of(e.getKey(), org.qchain.symbolic.Formulas.latexName(e.getKey())), r, true),
                        effect(generic, s, model.states())));
                }
            }
        }
        for (org.qchain.symbolic.Poly c : curves) {
            Vanishing v = vanishing(m, c);
            if (v == Vanishing.NEVER) {
                continue;
            }
            // at a generic point of {c = 0} exactly the entries whose numerator has the factor c vanish
            List<List<RatFun>> cut = new ArrayList<>();
            for (List<RatFun> row : rows) {
                cut.add(row.stream().map(x -> !x.isZero() && x.numerator().divideExact(c).isPresent()
                    ? RatFun.of(p.ring().zero()) : x).toList());
            }
            org.qchain.exact.longrun.Structure s = org.qchain.exact.longrun.Structure.of(
                ChainResults.graph(model, f, cut));
            if (!s.equals(generic)) {
                out.add(new org.qchain.result.ClassesResult.SpecialValue(org.qchain.result.Condition.equal(
                    Formula.of(org.qchain.symbolic.Formulas.plain(c), org.qchain.symbolic.Formulas.latex(c)),
                    Rational.ZERO, v == Vanishing.SOMEWHERE), effect(generic, s, model.states())));
            }
        }
        return out;
    }

    /** Whether an irreducible polynomial vanishes inside the box of the domains. */
    enum Vanishing { SOMEWHERE, NEVER, UNDECIDED }

    /**
     * Decides whether the irreducible {@code c} vanishes inside the box of the domains (not only on its edge):
     * two signs at the points of a grid on the closed box mean two signs inside too (c is continuous), hence a zero
     * inside where c changes sign, so its zero set there is a piece of a hypersurface and the other factors do not
     * vanish at its generic points; one sign proved inside by Bernstein coefficients
     * ({@link org.qchain.symbolic.BoxSign}, its stated depth) means no zero inside; otherwise undecided. Zeros on
     * the edge only (a corner, say) are left to the values of single parameters.
     */
    static Vanishing vanishing(Model m, org.qchain.symbolic.Poly c) {
        List<String> vars = c.occurringVariables();
        List<Domain> inside = new ArrayList<>();
        List<List<Rational>> grid = new ArrayList<>();
        for (String v : vars) {
            Domain d = m.param(v).map(org.qchain.exact.model.ParamDecl::domain).orElse(Domain.defaultFor(m.kind()));
            inside.add(new Domain(d.lower(), false, d.upper(), false));
            List<Rational> pts = new ArrayList<>();
            Rational lo = d.lower();
            if (d.upper().isPresent()) {
                Rational w = d.upper().get().subtract(lo);
                for (int k = 0; k <= 8; k++) {
                    pts.add(lo.add(w.multiply(Rational.of(k, 8))));
                }
            } else {
                for (long k : new long[] {0, 1, 2, 5, 10, 100, 1000, 1_000_000}) {
                    pts.add(lo.add(Rational.of(k)));
                }
                pts.add(lo.add(Rational.of(1, 2)));
                pts.add(lo.add(Rational.of(1, 10)));
            }
            grid.add(pts);
        }
        int pos = 0;
        int neg = 0;
        // the grid's points, at most 100,000 of them
        long total = 1;
        for (List<Rational> g : grid) {
            total = Math.min(100_000, total * g.size());
        }
        for (int n = 0; n < total; n++) {
            Map<String, Rational> at = new java.util.HashMap<>();
            int q = n;
            for (int i = 0; i < vars.size(); i++) {
                at.put(vars.get(i), grid.get(i).get(q % grid.get(i).size()));
                q /= grid.get(i).size();
            }
            int sign = c.evaluate(at).signum();
            pos += sign > 0 ? 1 : 0;
            neg += sign < 0 ? 1 : 0;
            if (pos > 0 && neg > 0) {
                return Vanishing.SOMEWHERE;
            }
        }
        Map<String, Domain> open = new LinkedHashMap<>();
        for (int i = 0; i < vars.size(); i++) {
            open.put(vars.get(i), inside.get(i));
        }
        return pos + neg > 0 && org.qchain.symbolic.BoxSign.positive(pos > 0 ? c : c.negate(), open)
            ? Vanishing.NEVER : Vanishing.UNDECIDED;
    }

    /** What changes between two structures: the states that become absorbing, and the classes when they change. */
    static org.qchain.result.ClassesResult.Effect effect(org.qchain.exact.longrun.Structure generic,
            org.qchain.exact.longrun.Structure s, List<String> names) {
        List<String> absorbing = new ArrayList<>();
        for (int a : s.absorbing()) {
            if (!generic.absorbing().contains(a)) {
                absorbing.add(names.get(a));
            }
        }
        Optional<List<org.qchain.result.ClassesResult.ChainClass>> classes = Optional.empty();
        if (absorbing.isEmpty() || !generic.classes().equals(s.classes())) {
            List<org.qchain.result.ClassesResult.ChainClass> cls = new ArrayList<>();
            for (int c = 0; c < s.classes().size(); c++) {
                cls.add(new org.qchain.result.ClassesResult.ChainClass(s.classes().get(c).stream().map(names::get)
                    .toList(), s.closed().get(c), s.periods().get(c)));
            }
            classes = Optional.of(cls);
        }
        return new org.qchain.result.ClassesResult.Effect(absorbing, classes);
    }
}
