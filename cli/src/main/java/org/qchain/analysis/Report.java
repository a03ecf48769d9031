package org.qchain.analysis;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalInt;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.Progress;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.SizeEstimate;
import org.qchain.exact.certified.CertifiedPowers;
import org.qchain.exact.ctmc.RateSensitivity;
import org.qchain.exact.model.ChainKind;
import org.qchain.exact.model.Expr;
import org.qchain.exact.model.ModelParser;
import org.qchain.exact.model.ParamDecl;
import org.qchain.exact.model.SweepSpec;
import org.qchain.result.AbsorbResult;
import org.qchain.result.AvailabilityResult;
import org.qchain.result.CheckResult;
import org.qchain.result.ClassesResult;
import org.qchain.result.ClosedResult;
import org.qchain.result.ExactValue;
import org.qchain.result.Formula;
import org.qchain.result.FormulaTree;
import org.qchain.result.LongRunResult;
import org.qchain.result.RateSensResult;
import org.qchain.result.ReportResult;
import org.qchain.result.Result;
import org.qchain.result.SensResult;
import org.qchain.result.StepResult;
import org.qchain.result.TransientResult;

/**
 * A report: a list of queries run through {@link Analysis#run} on one loaded model, their results gathered into a
 * {@link ReportResult}. A query that this model or its size does not allow (a refused size, a chain without
 * absorbing states) leaves a note in its section instead of ending the report; an interruption ends it.
 */
public final class Report {
    /** Chains with more states than this show the start state's row of P^n rather than the whole matrix. */
    public static final int MAX_MATRIX_STATES = 6;

    private final LoadedModel model;
    private final ReportQuery q;
    private final Progress progress;
    private final int total;
    private final List<String> warnings = new ArrayList<>();
    private int done;

    private Report(LoadedModel model, ReportQuery q, Progress progress) {
        this.model = model;
        this.q = q;
        this.progress = progress;
        this.total = estimate();
    }

    /**
     * Runs a report.
     *
     * @param model    the loaded model
     * @param q        what the report holds
     * @param progress told about each query run
     * @return the report's results
     * @throws QchainException for an unknown state named in the query, an interruption
     */
    public static ReportResult run(LoadedModel model, ReportQuery q, Progress progress) {
        return new Report(model, q, progress).run();
    }

    private boolean continuous() {
        return model.model().kind() == ChainKind.CONTINUOUS;
    }

    private String from() {
        String f = q.from().orElse(model.states().get(0));
        model.state("--from", f);
        return f;
    }

    private List<String> targets() {
        for (String t : q.to()) {
            model.state("--to", t);
        }
        if (!q.to().isEmpty()) {
            return q.to();
        }
        List<String> s = model.states();
        return s.size() <= ReportQuery.MAX_DEFAULT_CURVES ? s : List.of(s.get(s.size() - 1));
    }

    private String sensTo() {
        String t = q.sensTo().orElse(model.states().get(model.states().size() - 1));
        model.state("--sens-to", t);
        return t;
    }

    private long sensSteps() {
        return q.sensSteps().orElse(q.steps().stream().mapToLong(Long::longValue).max().orElse(1));
    }

    private int estimate() {
        int n = 0;
        n += q.has(ReportSection.MODEL) ? 2 : 0;
        n += q.has(ReportSection.STEPS) ? (continuous() ? 1 : q.steps().size()) : 0;
        n += q.has(ReportSection.CLOSED) ? 1 : 0;
        n += q.has(ReportSection.LONGRUN) ? (continuous() ? 4 : 3) : 0;
        n += q.has(ReportSection.SENSITIVITY) ? 2 * model.model().usedParameters().size() + 2 : 0;
        n += q.has(ReportSection.PLOTS) ? (continuous() ? 2 : (int) Math.min(q.plotSteps() + 2, 10_000)) : 0;
        return Math.max(n, 1);
    }

    /** Runs one query, counting it; a refusal becomes a note, an interruption ends the report. */
    private Optional<Result> ask(Query query, String what, List<String> notes) {
        if (Thread.currentThread().isInterrupted()) {
            throw new QchainException(ErrorKey.INTERRUPTED);
        }
        progress.update("report: " + what, Math.min(done, total), total);
        // the engine's own progress, shown under the report's: "report 4/9: the closed form (powers) 3/20"
        String label = "report " + Math.min(done + 1, total) + "/" + total + ": " + what;
        Progress inner = (phase, d, t) -> progress.update(label + " (" + phase + ")", d, t);
        try {
            return Optional.of(Analysis.run(model, query, inner));
        } catch (QchainException e) {
            if (e.key() == ErrorKey.INTERRUPTED) {
                throw e;
            }
            notes.add(what + ": not included (" + e.getMessage() + ")");
            return Optional.empty();
        } finally {
            done++;
        }
    }

    private ReportResult run() {
        // what the user named is checked before any work: a bad name or sweep fails the report (exit 2)
        from();
        targets();
        sensTo();
        if (q.sweep().isPresent()) {
            String p = sweepParameter(q.sweep().get());
            if (model.model().param(p).isEmpty()) {
                throw new QchainException(ErrorKey.BAD_ARGUMENT, "--sweep", q.sweep().get(), "'" + p
                    + "' is not a parameter of " + model.source());
            }
        }
        List<ReportResult.Section> sections = new ArrayList<>();
        Optional<LongRunResult> longRun = Optional.empty();
        Optional<AvailabilityResult> avail = Optional.empty();
        ReportResult.ModelSection modelSection = modelSection();
        if (q.has(ReportSection.MODEL)) {
            sections.add(modelSection);
        }
        if (q.has(ReportSection.DIAGRAM)) {
            sections.add(diagram(modelSection));
        }
        if (q.has(ReportSection.STEPS)) {
            sections.add(continuous() ? transientSteps() : steps());
        }
        if (q.has(ReportSection.CLOSED)) {
            sections.add(closed());
        }
        if (q.has(ReportSection.LONGRUN)) {
            ReportResult.LongRunSection s = continuous() ? availability() : longRun();
            longRun = s.longRun();
            avail = s.availability();
            sections.add(s);
        }
        ReportResult.SensitivitySection sens = null;
        if (q.has(ReportSection.SENSITIVITY)) {
            sens = continuous() ? rateSensitivity() : sensitivity();
            sections.add(sens);
        }
        if (q.has(ReportSection.PLOTS)) {
            sections.add(plots(longRun, avail, Optional.ofNullable(sens)));
        }
        progress.update("report", total, total);
        List<ReportResult.Parameter> params = new ArrayList<>();
        for (ParamDecl d : model.model().params()) {
            params.add(new ReportResult.Parameter(d.name(), d.domain().toString(), d.nominal(),
                Optional.ofNullable(model.known().get(d.name())), model.model().usedParameters().contains(d.name())));
        }
        return new ReportResult(model.source(), model.model().kind().word(), model.states(), params, model.point(),
            sections, q.digits(), warnings);
    }

    // --- the model ------------------------------------------------------------------------------------------------

    /** A model expression as a formula: a number prints as an exact value, anything else through its plain text. */
    static Formula formula(Expr e) {
        if (e instanceof Expr.Num n) {
            return new ExactValue(n.value());
        }
        String plain = Expr.toPlain(e);
        try {
            return Formula.of(plain, FormulaTree.parse(plain).latex());
        } catch (IllegalArgumentException unread) {
            // not in the formulas' plain syntax: shown as text
            return Formula.of(plain, "\\text{" + plain.replace("\\", "").replace("{", "").replace("}", "") + "}");
        }
    }

    private ReportResult.ModelSection modelSection() {
        int n = model.states().size();
        List<List<Formula>> matrix = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            List<Formula> row = new ArrayList<>();
            for (int j = 0; j < n; j++) {
                row.add(formula(model.model().entry(i, j)));
            }
            matrix.add(row);
        }
        List<String> validation = new ArrayList<>();
        List<String> conditions = new ArrayList<>();
        List<String> notes = new ArrayList<>();
        Optional<List<List<Rational>>> values = Optional.empty();
        boolean asked = q.has(ReportSection.MODEL) || q.has(ReportSection.DIAGRAM);
        if (continuous()) {
            if (model.complete()) {
                RationalMatrix g = model.generator("qchain report");
                List<List<Rational>> v = new ArrayList<>();
                for (int i = 0; i < n; i++) {
                    List<Rational> row = new ArrayList<>();
                    for (int j = 0; j < n; j++) {
                        row.add(g.get(i, j));
                    }
                    v.add(row);
                }
                values = Optional.of(v);
                validation.add("Every rate is 0 or more at " + model.point().orElseThrow().text() + " ("
                    + model.point().orElseThrow().origin() + "); each diagonal entry is minus the total rate out of"
                    + " its state, so every row sums to 0.");
            } else {
                validation.add("The rates are formulas in " + String.join(", ", model.free())
                    + "; numbers need a value for every parameter.");
            }
            return new ReportResult.ModelSection(true, matrix, values, validation, conditions, notes);
        }
        if (model.complete() && asked) {
            Optional<Result> r = ask(new CheckQuery(false), "the one-step matrix", notes);
            if (r.isPresent() && r.get() instanceof CheckResult.Numeric num) {
                values = Optional.of(num.matrix().entries());
                validation.add("Every entry lies in [0, 1] and every row sums to exactly 1"
                    + model.point().filter(p -> !p.isEmpty()).map(p -> " at " + p.text() + " (" + p.origin() + ")")
                        .orElse("") + ".");
            }
        }
        if (!model.model().usedParameters().isEmpty() && asked) {
            Optional<Result> r = ask(new CheckQuery(true), "the symbolic check", notes);
            if (r.isPresent() && r.get() instanceof CheckResult.Symbolic sym) {
                validation.add("With the parameters symbolic, every row sums to 1 identically in "
                    + String.join(", ", sym.parameters()) + ".");
                conditions.addAll(sym.warnings());
                if (sym.warnings().isEmpty()) {
                    validation.add("Every entry lies in [0, 1] throughout the parameters' domains.");
                }
            }
        }
        return new ReportResult.ModelSection(false, matrix, values, validation, conditions, notes);
    }

    private ReportResult.DiagramSection diagram(ReportResult.ModelSection m) {
        List<ReportResult.Edge> edges = new ArrayList<>();
        int n = model.states().size();
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                if (continuous() && i == j) {
                    continue;
                }
                Formula f = m.matrix().get(i).get(j);
                int row = i;
                int col = j;
                boolean zero = m.values().map(v -> v.get(row).get(col).isZero()).orElse(false)
                    || f.plain().equals("0");
                if (!zero) {
                    edges.add(new ReportResult.Edge(i, j, f));
                }
            }
        }
        return new ReportResult.DiagramSection(model.states(), edges, List.of());
    }

    // --- n-step results ---------------------------------------------------------------------------------------------

    private ReportResult.StepsSection steps() {
        List<Result> results = new ArrayList<>();
        List<String> notes = new ArrayList<>();
        boolean whole = model.states().size() <= MAX_MATRIX_STATES && q.from().isEmpty();
        if (!whole) {
            notes.add("Row " + from() + " of P^n" + (q.from().isEmpty() ? " (the model has more than "
                + MAX_MATRIX_STATES + " states; choose the row with --from)" : "") + ".");
        }
        for (long n : q.steps()) {
            StepQuery s = new StepQuery(n, whole ? Optional.empty() : Optional.of(from()), Optional.empty(),
                OptionalInt.empty(), q.maxDigits(), SizeEstimate.DEFAULT_MAX_PATH_DIGITS, false, false, q.maxTerms());
            ask(s, "P^" + n, notes).ifPresent(results::add);
        }
        return new ReportResult.StepsSection(results, notes);
    }

    private ReportResult.StepsSection transientSteps() {
        List<Result> results = new ArrayList<>();
        List<String> notes = new ArrayList<>();
        boolean whole = model.states().size() <= MAX_MATRIX_STATES && q.from().isEmpty();
        TransientQuery t = new TransientQuery(q.times(), whole ? Optional.empty() : Optional.of(from()), q.digits(),
            CertifiedPowers.DEFAULT_MAX_BITS);
        ask(t, "P(t)", notes).ifPresent(results::add);
        return new ReportResult.StepsSection(results, notes);
    }

    // --- closed form --------------------------------------------------------------------------------------------------

    private ReportResult.ClosedSection closed() {
        List<String> notes = new ArrayList<>();
        if (model.states().size() > q.closedMaxStates()) {
            done++;
            notes.add("The closed form is left out for chains of more than " + q.closedMaxStates() + " states (it"
                + " takes long and fills pages); ask for it with --sections closed or qchain closed.");
            return new ReportResult.ClosedSection(Optional.empty(), notes);
        }
        List<String> to = q.to().size() == 1 ? q.to() : List.of();
        ClosedQuery c = new ClosedQuery(ClosedResult.Form.MATRIX, Optional.of(from()), "--from",
            to.stream().findFirst(), q.maxTerms(), q.digits(), q.maxDigits());
        Optional<ClosedResult> r = ask(c, "the closed form", notes).map(ClosedResult.class::cast);
        // the range conditions of the symbolic check are the model section's; the rest are the closed form's own
        r.ifPresent(x -> x.warnings().stream().filter(w -> !model.symbolic().warnings().contains(w))
            .forEach(warnings::add));
        return new ReportResult.ClosedSection(r, notes);
    }

    // --- long run -----------------------------------------------------------------------------------------------------

    private LongRunQuery limits() {
        return new LongRunQuery(false, false, q.maxDigits(), LongRunQuery.DEFAULT_MAX_STATES);
    }

    private ReportResult.LongRunSection longRun() {
        List<String> notes = new ArrayList<>();
        Optional<ClassesResult> classes = ask(new ClassesQuery(limits()), "the classes", notes)
            .map(ClassesResult.class::cast);
        Optional<LongRunResult> lr = ask(limits(), "the long run", notes).map(LongRunResult.class::cast);
        Optional<AbsorbResult> absorb = Optional.empty();
        if (classes.isPresent() && !classes.get().absorbing().isEmpty()) {
            AbsorbQuery a = new AbsorbQuery(Optional.empty(), List.of(), Map.of(), Optional.empty(),
                OptionalInt.empty(), limits());
            absorb = ask(a, "absorption", notes).map(AbsorbResult.class::cast);
        } else if (classes.isPresent()) {
            done++;
            notes.add("No state is absorbing: there is no absorption to report.");
        }
        return new ReportResult.LongRunSection(classes, lr, absorb, Optional.empty(), notes);
    }

    private ReportResult.LongRunSection availability() {
        // the classes, the long run and any absorption of the generator, then the figures of merit
        ReportResult.LongRunSection base = longRun();
        List<String> notes = new ArrayList<>(base.notes());
        Optional<AvailabilityResult> a = Optional.empty();
        if (model.model().upStates().isEmpty()) {
            notes.add("The model has no 'up' line: availability figures need the operating states.");
        } else {
            // no formulas in t: the report states the steady-state figures (and plots A(t) numerically)
            AvailabilityQuery aq = new AvailabilityQuery(q.from(), List.of(), org.qchain.exact.ctmc.Availability
                .HOURS_PER_YEAR, q.digits(), CertifiedPowers.DEFAULT_MAX_BITS, CertifiedPowers.DEFAULT_MAX_WORK,
                false, LongRunQuery.DEFAULT_MAX_STATES, 0);
            Optional<org.qchain.result.Result> r = ask(aq, "availability", notes);
            if (r.isPresent() && !(r.get() instanceof AvailabilityResult)) {
                notes.add("availability: the figures are formulas in the parameters here; qchain avail "
                    + model.source() + " prints them");
            }
            a = r.filter(AvailabilityResult.class::isInstance).map(AvailabilityResult.class::cast);
        }
        return new ReportResult.LongRunSection(base.classes(), base.longRun(), base.absorb(), a, notes);
    }

    // --- sensitivity ----------------------------------------------------------------------------------------------------

    private ReportResult.SensitivitySection sensitivity() {
        List<String> notes = new ArrayList<>();
        List<ReportResult.SensLine> lines = new ArrayList<>();
        List<String> params = model.model().usedParameters();
        if (params.isEmpty()) {
            notes.add("The model has no parameters: there is nothing to differentiate.");
            return new ReportResult.SensitivitySection(lines, Optional.empty(), notes);
        }
        if (!model.complete()) {
            notes.add("Derivatives at a point need a value for every parameter (give them with --at): "
                + String.join(", ", model.free()) + " have none.");
            return new ReportResult.SensitivitySection(lines, Optional.empty(), notes);
        }
        long n = sensSteps();
        String figure = "P^" + n + "(" + from() + " -> " + sensTo() + ")";
        for (String p : params) {
            SensQuery s = new SensQuery(n, from(), sensTo(), p, Optional.empty(), false, q.maxTerms(), q.maxDigits());
            ask(s, "d/d" + p + " " + figure, notes).map(SensResult.class::cast).flatMap(SensResult::at)
                .ifPresent(at -> lines.add(new ReportResult.SensLine(figure, p, at.probability(), at.derivative(),
                    at.elasticity())));
        }
        String range = q.sweep().orElseGet(() -> defaultSweep(params.get(0)));
        SensQuery s = new SensQuery(n, from(), sensTo(), sweepParameter(range), Optional.of(range), false,
            q.maxTerms(), q.maxDigits());
        // a sweep the user wrote is part of the question: its refusal fails the report; the default one is a note
        Optional<Result> ran = q.sweep().isPresent() ? Optional.of(Analysis.run(model, s, Progress.NONE))
            : ask(s, "the sweep", notes);
        Optional<ReportResult.SweepTable> sweep = ran.map(SensResult.class::cast)
            .flatMap(SensResult::sweep).map(sw -> new ReportResult.SweepTable(figure, sw.parameter(), range,
                sw.lines().stream().map(l -> new ReportResult.SweepRow(l.value(), l.probability(),
                    Optional.of(l.derivative()))).toList()));
        return new ReportResult.SensitivitySection(lines, sweep, notes);
    }

    private String sweepParameter(String range) {
        return ModelParser.parseSweep("--sweep", range).parameter();
    }

    /** From the domain's lower end to twice the value (within the domain), 11 points. */
    private String defaultSweep(String p) {
        ParamDecl d = model.model().param(p).orElseThrow();
        Rational v = model.known().get(p);
        Rational hi = v.isZero() ? Rational.ONE : v.add(v);
        if (d.domain().upper().isPresent() && hi.compareTo(d.domain().upper().get()) > 0) {
            hi = d.domain().upper().get();
        }
        Rational top = hi;
        boolean openTop = d.domain().upper().filter(top::equals).isPresent() && !d.domain().upperClosed();
        return p + " in " + (d.domain().lowerClosed() ? "[" : "(") + d.domain().lower() + ", " + hi
            + (openTop ? ")" : "]") + " with 11 points";
    }

    private ReportResult.SensitivitySection rateSensitivity() {
        List<String> notes = new ArrayList<>();
        List<ReportResult.SensLine> lines = new ArrayList<>();
        List<String> params = model.model().usedParameters();
        if (params.isEmpty() || !model.complete() || model.model().upStates().isEmpty()) {
            notes.add(params.isEmpty() ? "The model has no parameters: there is nothing to differentiate."
                : !model.complete() ? "Derivatives at a point need a value for every parameter (give them with --at)."
                : "The model has no 'up' line: the figures of merit need the operating states.");
            return new ReportResult.SensitivitySection(lines, Optional.empty(), notes);
        }
        for (RateSensitivity.Figure f : List.of(RateSensitivity.Figure.AVAILABILITY, RateSensitivity.Figure.MTTF)) {
            for (String p : params) {
                ask(new RateSensQuery(f, p, q.from()), "d/d" + p + " " + Figures.name(f), notes)
                    .map(RateSensResult.class::cast)
                    .ifPresent(r -> lines.add(new ReportResult.SensLine(r.figure() + r.from().map(s -> " from " + s)
                        .orElse(""), p, r.value(), r.derivative(), r.elasticity())));
            }
        }
        String range = q.sweep().orElseGet(() -> defaultSweep(params.get(0)));
        Optional<ReportResult.SweepTable> sweep = Optional.empty();
        try {
            SweepSpec spec = ModelParser.parseSweep("--sweep", range);
            model.model().param(spec.parameter()).orElseThrow(() -> new QchainException(ErrorKey.BAD_ARGUMENT,
                "--sweep", range, "not a parameter of " + model.source()));
            List<ReportResult.SweepRow> rows = new ArrayList<>();
            for (long k = 0; k < spec.count(); k++) {
                Rational v = spec.point(k);
                Map<String, Rational> at = new LinkedHashMap<>(model.given());
                at.put(spec.parameter(), v);
                LoadedModel m = LoadedModel.of(model.model(), model.file(), at);
                RateSensResult r = Analysis.rateSens(m, new RateSensQuery(RateSensitivity.Figure.AVAILABILITY,
                    spec.parameter(), q.from()));
                rows.add(new ReportResult.SweepRow(v, r.value(), Optional.of(r.derivative())));
            }
            sweep = Optional.of(new ReportResult.SweepTable("availability", spec.parameter(), range, rows));
        } catch (QchainException e) {
            if (e.key() == ErrorKey.INTERRUPTED || q.sweep().isPresent()) {
                throw e;
            }
            notes.add("the sweep: not included (" + e.getMessage() + ")");
        } finally {
            done++;
        }
        return new ReportResult.SensitivitySection(lines, sweep, notes);
    }

    // --- plots ------------------------------------------------------------------------------------------------------------

    private ReportResult.PlotsSection plots(Optional<LongRunResult> longRun, Optional<AvailabilityResult> avail,
                                            Optional<ReportResult.SensitivitySection> sens) {
        List<String> notes = new ArrayList<>();
        List<ReportResult.Plot> plots = new ArrayList<>();
        if (!model.complete()) {
            notes.add("Plots need a value for every parameter (give them with --at).");
            return new ReportResult.PlotsSection(plots, notes);
        }
        if (continuous()) {
            continuousPlot(avail, notes).ifPresent(plots::add);
        } else {
            stepPlot(longRun, notes).ifPresent(plots::add);
        }
        Optional<ReportResult.SweepTable> sweep = sens.flatMap(ReportResult.SensitivitySection::sweep);
        if (sweep.isPresent()) {
            ReportResult.SweepTable t = sweep.get();
            List<Rational> x = t.rows().stream().map(ReportResult.SweepRow::value).toList();
            List<Rational> y = t.rows().stream().map(ReportResult.SweepRow::figure).toList();
            plots.add(new ReportResult.Plot("sweep", t.figure() + " against " + t.parameter(), t.parameter(),
                t.figure(), List.of(new ReportResult.Series(t.figure(), x, y, Optional.empty()))));
        }
        return new ReportResult.PlotsSection(plots, notes);
    }

    private Optional<ReportResult.Plot> stepPlot(Optional<LongRunResult> longRun, List<String> notes) {
        String from = from();
        List<String> targets = targets();
        if (longRun.isEmpty()) {
            longRun = ask(limits(), "the long run", notes).map(LongRunResult.class::cast);
        } else {
            done++;
        }
        List<List<Rational>> ys = new ArrayList<>();
        for (int k = 0; k < targets.size(); k++) {
            ys.add(new ArrayList<>());
        }
        List<Rational> xs = new ArrayList<>();
        for (long n = 0; n <= q.plotSteps(); n++) {
            Optional<Result> r = ask(StepQuery.row(n, from), "P^" + n + " for the plot", notes);
            if (r.isEmpty()) {
                return Optional.empty();
            }
            StepResult.Row row = (StepResult.Row) r.get();
            xs.add(Rational.of(n));
            for (int k = 0; k < targets.size(); k++) {
                ys.get(k).add(row.entries().get(model.state("--to", targets.get(k))));
            }
        }
        int i = model.state("--from", from);
        List<ReportResult.Series> series = new ArrayList<>();
        for (int k = 0; k < targets.size(); k++) {
            int j = model.state("--to", targets.get(k));
            Optional<Rational> limit = longRun.filter(l -> !l.cesaro())
                .map(l -> l.limit().get(i).get(j)).filter(ExactValue.class::isInstance)
                .map(f -> ((ExactValue) f).value());
            series.add(new ReportResult.Series("P^n(" + from + " -> " + targets.get(k) + ")", xs, ys.get(k), limit));
        }
        return Optional.of(new ReportResult.Plot("steps", "P^n(" + from + " -> j) against n", "n", "probability",
            series));
    }

    private Optional<ReportResult.Plot> continuousPlot(Optional<AvailabilityResult> steady, List<String> notes) {
        Rational end = q.plotTime().orElseGet(this::defaultPlotTime);
        List<Rational> ts = new ArrayList<>();
        for (int k = 0; k < ReportQuery.CONTINUOUS_POINTS; k++) {
            ts.add(end.multiply(Rational.of(k, ReportQuery.CONTINUOUS_POINTS - 1)));
        }
        if (model.model().upStates().isPresent()) {
            AvailabilityQuery aq = new AvailabilityQuery(q.from(), ts, org.qchain.exact.ctmc.Availability
                .HOURS_PER_YEAR, 6, CertifiedPowers.DEFAULT_MAX_BITS);
            Optional<AvailabilityResult> a = ask(aq, "A(t) for the plot", notes)
                .filter(AvailabilityResult.class::isInstance).map(AvailabilityResult.class::cast);
            done++;
            if (a.isEmpty()) {
                return Optional.empty();
            }
            List<Rational> y = a.get().point().stream().map(p -> Rational.parse(p.value().text())).toList();
            Optional<Rational> limit = Optional.of(steady.orElse(a.get()).availability());
            List<ReportResult.Series> series = new ArrayList<>();
            series.add(new ReportResult.Series("A(t)", ts, y, limit));
            if (a.get().reliability().size() == ts.size()) {
                // R(t) <= A(t): the same run gives the reliability with the down states absorbing
                series.add(new ReportResult.Series("R(t)", ts, a.get().reliability().stream()
                    .map(p -> Rational.parse(p.value().text())).toList(), Optional.empty()));
            }
            return Optional.of(new ReportResult.Plot("availability", "A(t) and R(t) from " + a.get().from()
                + " against t", "t", "probability", series));
        }
        TransientQuery tq = new TransientQuery(ts, Optional.of(from()), 6, CertifiedPowers.DEFAULT_MAX_BITS);
        Optional<TransientResult> r = ask(tq, "P(t) for the plot", notes).map(TransientResult.class::cast);
        done++;
        if (r.isEmpty()) {
            return Optional.empty();
        }
        List<ReportResult.Series> series = new ArrayList<>();
        for (String target : targets()) {
            int j = model.state("--to", target);
            List<Rational> y = r.get().times().stream().map(at -> Rational.parse(at.rows().get(0).get(j).text()))
                .toList();
            series.add(new ReportResult.Series("P(t)(" + from() + " -> " + target + ")", ts, y, Optional.empty()));
        }
        return Optional.of(new ReportResult.Plot("transient", "P(t)(" + from() + " -> j) against t", "t",
            "probability", series));
    }

    /** Ten times the slowest time scale 1/(largest total rate out of a state), up to a round number. */
    private Rational defaultPlotTime() {
        RationalMatrix g = model.generator("qchain report");
        Rational max = Rational.ZERO;
        for (int i = 0; i < g.rows(); i++) {
            max = max.max(g.get(i, i).negate());
        }
        if (max.isZero()) {
            return Rational.ONE;
        }
        double t = 10 / max.doubleValue();
        double mag = Math.pow(10, Math.floor(Math.log10(t)));
        double nice = t / mag <= 1 ? 1 : t / mag <= 2 ? 2 : t / mag <= 5 ? 5 : 10;
        return Rational.of(java.math.BigDecimal.valueOf(nice * mag));
    }
}
