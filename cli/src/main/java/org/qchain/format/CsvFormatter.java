package org.qchain.format;

import java.util.ArrayList;
import java.util.List;
import org.qchain.exact.DecimalText;
import org.qchain.exact.Rational;
import org.qchain.exact.certified.CertifiedDecimal;
import org.qchain.exact.reference.EntryCheck;
import org.qchain.result.AvailabilityResult;
import org.qchain.result.CertifiedStepResult;
import org.qchain.result.RateSensResult;
import org.qchain.result.TransientResult;
import org.qchain.result.CheckResult;
import org.qchain.result.Formula;
import org.qchain.result.DistributionResult;
import org.qchain.result.ClosedResult;
import org.qchain.result.SensResult;
import org.qchain.result.StepResult;
import org.qchain.result.SymbolicStepResult;
import org.qchain.result.VerifyResult;

/**
 * Comma-separated values as RFC 4180 defines them: CRLF after every record, a header row, fields quoted when they hold
 * a comma, a quotation mark or a line break, quotation marks doubled.
 *
 * <p>The full matrix is written as a header row of state names and one row of exact values per state, which is the
 * plain CSV matrix form that the model parser reads back: the output of {@code step -n N --format csv} is itself a
 * valid model (the N-step chain).
 */
final class CsvFormatter extends DocLayout {
    CsvFormatter(int digits) {
        super(digits);
    }

    CsvFormatter(int digits, boolean doubles) {
        super(digits, doubles);
    }

    @Override
    public String stepMatrix(StepResult.Matrix m) {
        return whole(sink -> stepMatrix(m, sink));
    }

    @Override
    void stepMatrix(StepResult.Matrix m, Sink sink) {
        int size = m.states().size();
        try (AheadTexts exact = AheadTexts.exact(flat(m.entries()))) {
            if (doubles) {
                // one record per entry: a table with three columns per entry would no longer read back as a model
                Text.csvRecord(sink.sb, List.of("from", "to", "value", "double", "hex"));
                for (int i = 0; i < size; i++) {
                    for (int j = 0; j < size; j++) {
                        Rational e = m.entries().get(i).get(j);
                        Text.csvRecord(sink.sb, List.of(m.states().get(i), m.states().get(j), exact.get(i * size + j),
                            shortest(e), hex(e)));
                        sink.spill();
                    }
                }
                return;
            }
            Text.csvRecord(sink.sb, m.states());
            for (int i = 0; i < size; i++) {
                List<String> row = new ArrayList<>(size);
                for (int j = 0; j < size; j++) {
                    row.add(exact.get(i * size + j));
                }
                Text.csvRecord(sink.sb, row);
                sink.spill();
            }
        }
    }

    @Override
    public String stepRow(StepResult.Row r) {
        return whole(sink -> stepRow(r, sink));
    }

    @Override
    void stepRow(StepResult.Row r, Sink sink) {
        Text.csvRecord(sink.sb, entryHeader());
        try (AheadTexts exact = AheadTexts.exact(r.entries())) {
            for (int j = 0; j < r.states().size(); j++) {
                Text.csvRecord(sink.sb, entryRecord(r.header().n(), r.from(), r.states().get(j), r.entries().get(j),
                    exact.get(j)));
                sink.spill();
            }
        }
    }

    @Override
    public String stepSingle(StepResult.Single s) {
        StringBuilder sb = new StringBuilder();
        if (s.paths().isPresent()) {
            Text.csvRecord(sb, List.of("rank", "probability", "decimal", "share", "percent", "path"));
            List<StepResult.PathLine> paths = s.paths().get();
            for (int k = 0; k < paths.size(); k++) {
                StepResult.PathLine p = paths.get(k);
                Text.csvRecord(sb, List.of(String.valueOf(k + 1), p.probability().toString(), dec(p.probability()),
                    p.share().toString(), Text.percent(p.share(), digits), String.join(" ", p.states())));
            }
            return sb.toString();
        }
        Text.csvRecord(sb, entryHeader());
        Text.csvRecord(sb, entryRecord(s.header().n(), s.from(), s.to(), s.value(), s.value().toString()));
        return sb.toString();
    }

    /** The header of one record per entry: {@code n,from,to,value,decimal}, then {@code double,hex} with doubles. */
    private List<String> entryHeader() {
        List<String> h = new ArrayList<>(List.of("n", "from", "to", "value", "decimal"));
        if (doubles) {
            h.addAll(List.of("double", "hex"));
        }
        return h;
    }

    private List<String> entryRecord(long n, String from, String to, Rational e, String exact) {
        List<String> rec = new ArrayList<>(List.of(String.valueOf(n), from, to, exact, dec(e)));
        if (doubles) {
            rec.add(shortest(e));
            rec.add(hex(e));
        }
        return rec;
    }

    @Override
    public String certifiedStep(CertifiedStepResult r) {
        StringBuilder sb = new StringBuilder();
        Text.csvRecord(sb, List.of("n", "from", "to", "decimal", "status", "enclosure_width"));
        for (int i = 0; i < r.rows().size(); i++) {
            for (int j = 0; j < r.columns().size(); j++) {
                CertifiedDecimal d = r.values().get(i).get(j);
                Text.csvRecord(sb, List.of(String.valueOf(r.header().n()), r.rows().get(i), r.columns().get(j),
                    d.text(), CertifiedStepResult.statusWord(d), CertifiedStepResult.widthText(d.enclosure().width())));
            }
        }
        return sb.toString();
    }

    @Override
    public String symbolicStep(SymbolicStepResult r) {
        StringBuilder sb = new StringBuilder();
        boolean values = r.values().isPresent();
        Text.csvRecord(sb, values ? List.of("n", "from", "to", "value", "decimal", "formula")
            : List.of("n", "from", "to", "formula"));
        Symbolic.forEachCell(r, (i, j) -> {
            List<String> rec = new ArrayList<>(List.of(String.valueOf(r.n()), r.rows().get(i), r.columns().get(j)));
            if (values) {
                Rational e = r.values().get().get(i).get(j);
                rec.add(e.toString());
                rec.add(dec(e));
            }
            rec.add(r.formulas().get(i).get(j).plain());
            Text.csvRecord(sb, rec);
        });
        return sb.toString();
    }

    @Override
    public String sens(SensResult s) {
        StringBuilder sb = new StringBuilder();
        if (s.sweep().isPresent()) {
            return sweep(sb, s.sweep().get(), java.util.Optional.empty());
        }
        Text.csvRecord(sb, List.of("quantity", "formula", "value", "decimal"));
        if (s.at().isEmpty()) {
            Text.csvRecord(sb, List.of("P", s.probability().plain(), "", ""));
            for (SensResult.Partial g : s.gradient()) {
                Text.csvRecord(sb, List.of("dP/d" + g.wrt(), g.derivative().plain(), "", ""));
            }
            return sb.toString();
        }
        SensResult.AtPoint a = s.at().get();
        Text.csvRecord(sb, List.of("P", s.probability().plain(), a.probability().toString(), dec(a.probability())));
        if (s.isGradient()) {
            for (SensResult.Partial g : s.gradient()) {
                Rational d = g.value().orElseThrow();
                Text.csvRecord(sb, List.of("dP/d" + g.wrt(), g.derivative().plain(), d.toString(), dec(d)));
            }
            for (SensResult.Partial g : s.gradient()) {
                g.elasticity().ifPresent(e -> Text.csvRecord(sb, List.of("elasticity " + g.wrt(), "", e.toString(),
                    dec(e))));
            }
            return sb.toString();
        }
        Text.csvRecord(sb, List.of("dP/d" + s.wrt(), s.derivative().plain(), a.derivative().toString(),
            dec(a.derivative())));
        a.elasticity().ifPresent(e -> Text.csvRecord(sb, List.of("elasticity", "", e.toString(), dec(e))));
        return sb.toString();
    }

    /** The columns of {@link #closed}; each record fills those that apply to its kind and leaves the others empty. */
    static final List<String> CLOSED_HEADER = List.of("record", "from", "to", "r", "name", "formula", "valid_from",
        "multiplicity", "decimal", "proved");

    /**
     * Closed forms as one long table, one record per fact, the kind in the first column: {@code entry} (a cell of
     * P^n, its generating function or its recurrence, with valid_from), for a recurrence its {@code coefficient}
     * c_r (r = 1 .. d) and {@code initial} value u(r) records, {@code condition} (a condition of the
     * formulas and whether it is proved inside the domains), {@code factor} (an irreducible factor of det(xI - P)
     * with its multiplicity; the name of a named one, as {@code rootsum} uses it), {@code eigenvalue} (its value,
     * its name, the multiplicity of its factor and its decimal at the point), {@code limit} (the limit of each
     * printed cell, or of each subsequence r of a periodic chain, with its decimal), {@code rate} (the convergence
     * rate and its value), {@code long_run_condition}, {@code special_point}, then {@code substituted} (a value
     * given with {@code --at} and substituted before solving) and {@code point} (each parameter's value at the
     * point of the decimals). Formulas are in plain syntax, written out (no names of repeated pieces).
     */
    @Override
    public String closed(ClosedResult r) {
        StringBuilder sb = new StringBuilder();
        Text.csvRecord(sb, CLOSED_HEADER);
        for (int i = 0; i < r.rows().size(); i++) {
            for (int j = 0; j < r.cols().size(); j++) {
                String validFrom = switch (r.form()) {
                    case GF -> "";
                    case RECURRENCE -> String.valueOf(r.recurrences().get(i).get(j).validFrom());
                    case MATRIX -> String.valueOf(r.validFrom());
                };
                closedRecord(sb, "entry", closedFrom(r, i), closedTo(r, j), "", "", r.cells().get(i).get(j).plain(),
                    validFrom, "", "", "");
            }
        }
        if (r.form() == ClosedResult.Form.RECURRENCE) {
            for (int i = 0; i < r.rows().size(); i++) {
                for (int j = 0; j < r.cols().size(); j++) {
                    ClosedResult.Recurrence rec = r.recurrences().get(i).get(j);
                    for (int k = 0; k < rec.coefficients().size(); k++) {
                        closedRecord(sb, "coefficient", closedFrom(r, i), closedTo(r, j), String.valueOf(k + 1), "",
                            rec.coefficients().get(k).plain(), String.valueOf(rec.validFrom()), "", "", "");
                    }
                    for (int k = 0; k < rec.initial().size(); k++) {
                        closedRecord(sb, "initial", closedFrom(r, i), closedTo(r, j), String.valueOf(k), "",
                            rec.initial().get(k).plain(), "", "", "", "");
                    }
                }
            }
        }
        for (org.qchain.result.Condition c : r.conditions()) {
            closedRecord(sb, "condition", "", "", "", "", c.plain(), "", "", "", String.valueOf(c.proved()));
        }
        for (ClosedResult.Eigen e : r.eigenvalues()) {
            String name = e.kind().equals("roots") ? rootName(r, e) : "";
            closedRecord(sb, "factor", "", "", "", name, e.factor().plain(), "", String.valueOf(e.multiplicity()),
                "", "");
        }
        for (ClosedResult.Eigen e : r.eigenvalues()) {
            List<String> dec = Closed.eigenDecimalList(r, e);
            String m = String.valueOf(e.multiplicity());
            if (e.kind().equals("roots")) {
                // one record per root of the named factor: the decimals tell them apart
                String name = rootName(r, e);
                for (String d : dec.isEmpty() ? List.of("") : dec) {
                    closedRecord(sb, "eigenvalue", "", "", "", name, e.values().get(0).plain(), "", m, d, "");
                }
                continue;
            }
            for (int k = 0; k < e.values().size(); k++) {
                closedRecord(sb, "eigenvalue", "", "", "", k < e.names().size() ? e.names().get(k) : "",
                    e.values().get(k).plain(), "", m, k < dec.size() ? dec.get(k) : "", "");
            }
        }
        r.longRun().ifPresent(lr -> closedLongRun(sb, r, lr));
        r.substituted().forEach((name, v) -> closedRecord(sb, "substituted", "", "", "", name, v.toString(), "", "",
            "", ""));
        r.point().ifPresent(p -> p.values().forEach((name, v) -> closedRecord(sb, "point", "", "", "", name,
            v.toString(), "", "", "", "")));
        return sb.toString();
    }

    private void closedLongRun(StringBuilder sb, ClosedResult r, ClosedResult.LongRun lr) {
        List<List<List<String>>> dec = Closed.limitDecimals(r, lr);
        for (int k = 0; k < lr.limits().size(); k++) {
            for (int i = 0; i < r.rows().size(); i++) {
                for (int j = 0; j < r.cols().size(); j++) {
                    closedRecord(sb, "limit", closedFrom(r, i), closedTo(r, j), String.valueOf(k), "",
                        lr.limits().get(k).get(i).get(j).plain(), "", "",
                        dec.isEmpty() ? "" : dec.get(k).get(i).get(j), "");
                }
            }
        }
        closedRecord(sb, "rate", "", "", "", "", lr.rate().plain(), "", "",
            lr.rateValue().map(v -> Closed.real(r, v)).orElse(""), "");
        for (org.qchain.result.Condition c : lr.conditions()) {
            closedRecord(sb, "long_run_condition", "", "", "", "", c.plain(), "", "", "", String.valueOf(c.proved()));
        }
        for (org.qchain.result.Point p : lr.special()) {
            closedRecord(sb, "special_point", "", "", "", "", p.text(), "", "", "", "");
        }
    }

    /**
     * The {@code from} field of row i: the state, or an initial distribution as {@code step}'s CSV writes it
     * ({@code Working=1/2 Failed=1/2}).
     */
    private static String closedFrom(ClosedResult r, int i) {
        boolean single = r.start().size() == 1 && r.start().values().iterator().next().equals(Rational.ONE);
        if (r.start().isEmpty() || single) {
            return r.rows().get(i);
        }
        List<String> parts = new ArrayList<>();
        r.start().forEach((state, p) -> parts.add(state + "=" + p));
        return String.join(" ", parts);
    }

    /** The {@code to} field of column j: the state, or a set of states as {@code step}'s CSV writes it ({@code Up Worn}). */
    private static String closedTo(ClosedResult r, int j) {
        return r.toStates().isEmpty() ? r.cols().get(j) : String.join(" ", r.toStates());
    }

    /** The name of a factor of degree 3 or more ({@code f1}), as the formulas' {@code rootsum} calls it. */
    private static String rootName(ClosedResult r, ClosedResult.Eigen e) {
        for (ClosedResult.Roots rt : r.roots()) {
            if (rt.polynomial().plain().equals(e.factor().plain())) {
                return rt.name();
            }
        }
        return "";
    }

    private static void closedRecord(StringBuilder sb, String... fields) {
        Text.csvRecord(sb, List.of(fields));
    }

    /**
     * {@code quantity,from,to,exact,decimal} (exact values) or {@code quantity,from,to,formula}: the rates
     * ({@code rate}), then per state the total rate out and the mean holding time ({@code to} empty).
     */
    @Override
    String generatorCheck(CheckResult.Generator g) {
        StringBuilder sb = new StringBuilder();
        Text.csvRecord(sb, g.symbolic() ? List.of("quantity", "from", "to", "formula")
            : List.of("quantity", "from", "to", "exact", "decimal"));
        for (int i = 0; i < g.states().size(); i++) {
            for (int j = 0; j < g.states().size(); j++) {
                Formula f = g.entries().get(i).get(j);
                record(sb, g, List.of("rate", g.states().get(i), g.states().get(j), f.plain(),
                    Continuous.decimalOf(f, digits)));
            }
        }
        for (List<String> r : Continuous.stateRows(g, digits)) {
            record(sb, g, List.of("total rate out", r.get(0), "", r.get(1), r.get(2)));
            record(sb, g, List.of("mean holding time", r.get(0), "", r.get(3), r.get(4)));
        }
        return sb.toString();
    }

    private static void record(StringBuilder sb, CheckResult.Generator g, List<String> cells) {
        Text.csvRecord(sb, g.symbolic() ? cells.subList(0, 4) : cells);
    }

    @Override
    String symbolicCheck(CheckResult.Symbolic s) {
        StringBuilder sb = new StringBuilder();
        Text.csvRecord(sb, List.of("from", "to", "formula"));
        for (int i = 0; i < s.states().size(); i++) {
            for (int j = 0; j < s.states().size(); j++) {
                Text.csvRecord(sb, List.of(s.states().get(i), s.states().get(j), s.entries().get(i).get(j).plain()));
            }
        }
        return sb.toString();
    }

    /** The listed entries, worst first, one record each; the verdict is the exit code. */
    @Override
    public String verify(VerifyResult r) {
        StringBuilder sb = new StringBuilder();
        Text.csvRecord(sb, List.of("entry", "given", "exact", "decimal", "error", "relative_error", "ulps",
            "correctly_rounded", "pass", "line", "column"));
        for (EntryCheck c : r.report().worst()) {
            Text.csvRecord(sb, List.of(c.label(), c.given(), c.truth().toString(), dec(c.truth()),
                Checks.errorExact(c.error()), Checks.errorExact(c.relativeError()), c.ulps().isPresent()
                    ? String.valueOf(c.ulps().getAsLong()) : "", String.valueOf(c.isCorrectlyRounded()),
                String.valueOf(c.pass()), String.valueOf(c.pos().line()), String.valueOf(c.pos().column())));
        }
        return sb.toString();
    }

    // --- continuous chains ---------------------------------------------------------------------------------------

    @Override
    public String transientProbabilities(TransientResult r) {
        StringBuilder sb = new StringBuilder();
        Text.csvRecord(sb, List.of("t", "from", "to", "decimal", "status", "bound"));
        List<String> names = Continuous.rowNames(r);
        for (TransientResult.AtTime at : r.times()) {
            for (int i = 0; i < at.rows().size(); i++) {
                for (int j = 0; j < r.states().size(); j++) {
                    org.qchain.exact.certified.CertifiedDecimal d = at.rows().get(i).get(j);
                    Text.csvRecord(sb, List.of(at.t().toString(), names.get(i), r.states().get(j), d.text(),
                        d.status().name().toLowerCase(java.util.Locale.ROOT), Continuous.bound(at.bound())));
                }
            }
        }
        return sb.toString();
    }

    @Override
    public String symbolicTransient(org.qchain.result.SymbolicTransientResult r) {
        StringBuilder sb = new StringBuilder();
        boolean decimals = r.values().isPresent();
        Text.csvRecord(sb, decimals ? List.of("t", "from", "to", "formula", "decimal", "bound")
            : List.of("t", "from", "to", "formula"));
        for (int i = 0; i < r.rows().size(); i++) {
            for (int j = 0; j < r.states().size(); j++) {
                Text.csvRecord(sb, decimals ? List.of(r.timeSymbol(), r.rows().get(i), r.states().get(j),
                    r.cells().get(i).get(j).plain(), "", "") : List.of(r.timeSymbol(), r.rows().get(i), r.states().get(j),
                    r.cells().get(i).get(j).plain()));
            }
        }
        for (int k = 0; k < r.times().size(); k++) {
            org.qchain.result.SymbolicTransientResult.AtTime at = r.times().get(k);
            List<List<org.qchain.exact.certified.CertifiedDecimal>> dec = Continuous.symbolicDecimals(r, k);
            for (int i = 0; i < r.rows().size(); i++) {
                for (int j = 0; j < r.states().size(); j++) {
                    String f = at.plainCells().get(i).get(j).plain();
                    Text.csvRecord(sb, decimals ? List.of(at.t().toString(), r.rows().get(i), r.states().get(j), f,
                        dec.get(i).get(j).text(), Continuous.bound(r.values().get().times().get(k).bound()))
                        : List.of(at.t().toString(), r.rows().get(i), r.states().get(j), f));
                }
            }
        }
        return sb.toString();
    }

    @Override
    public String availability(AvailabilityResult r) {
        StringBuilder sb = new StringBuilder();
        Text.csvRecord(sb, List.of("figure", "exact", "decimal"));
        Continuous.figures(r, digits).forEach(f -> Text.csvRecord(sb, f));
        Continuous.points(r).forEach(p -> Text.csvRecord(sb, List.of(p.get(0), "", p.get(1))));
        return sb.toString();
    }

    /**
     * {@code figure,formula,latex,exact,decimal}: one record a figure (the exact value and decimal at the point when
     * every parameter has one), then one a condition ({@code condition (proved)} or {@code condition (not proved)}).
     */
    @Override
    public String symbolicAvailability(org.qchain.result.SymbolicAvailabilityResult r) {
        StringBuilder sb = new StringBuilder();
        Text.csvRecord(sb, List.of("figure", "formula", "latex", "exact", "decimal"));
        List<List<String>> at = r.atPoint().map(a -> Continuous.figures(a, digits)).orElse(List.of());
        List<Continuous.FormulaRow> rows = Continuous.formulas(r);
        for (int k = 0; k < rows.size(); k++) {
            Continuous.FormulaRow f = rows.get(k);
            // the formulas in t (after the figures) have no single value at the point
            boolean valued = k < at.size();
            Text.csvRecord(sb, List.of(f.name().strip(), f.plain(), f.latex(), valued ? at.get(k).get(1) : "",
                valued ? at.get(k).get(2) : ""));
        }
        for (org.qchain.result.Condition c : r.conditions()) {
            Text.csvRecord(sb, List.of(c.proved() ? "condition (proved)" : "condition (not proved)", c.plain(),
                c.latex(), "", ""));
        }
        r.atPoint().ifPresent(a -> Continuous.points(a).forEach(p -> Text.csvRecord(sb,
            List.of(p.get(0), "", "", "", p.get(1)))));
        return sb.toString();
    }

    @Override
    public String rateSens(RateSensResult r) {
        StringBuilder sb = new StringBuilder();
        if (r.sweep().isPresent()) {
            return sweep(sb, r.sweep().get(), java.util.Optional.of(r::elasticity));
        }
        Text.csvRecord(sb, List.of("quantity", "exact", "decimal"));
        Continuous.sensRows(r, digits).forEach(x -> Text.csvRecord(sb, x));
        return sb.toString();
    }

    /** {@code NAME,value,decimal,derivative,derivative_decimal[,elasticity,elasticity_decimal]}, one record a point. */
    private String sweep(StringBuilder sb, SensResult.Sweep w, java.util.Optional<java.util.function.Function<SensResult.SweepLine, java.util.Optional<Rational>>> elasticity) {
        List<String> head = new ArrayList<>(List.of(w.parameter(), "value", "decimal", "derivative",
            "derivative_decimal"));
        elasticity.ifPresent(f -> head.addAll(List.of("elasticity", "elasticity_decimal")));
        Text.csvRecord(sb, head);
        for (SensResult.SweepLine l : w.lines()) {
            List<String> rec = new ArrayList<>(List.of(l.value().toString(), l.probability().toString(),
                dec(l.probability()), l.derivative().toString(), dec(l.derivative())));
            elasticity.ifPresent(f -> {
                java.util.Optional<Rational> e = f.apply(l);
                rec.add(e.map(Rational::toString).orElse("undefined"));
                rec.add(e.map(this::dec).orElse("undefined"));
            });
            Text.csvRecord(sb, rec);
        }
        return sb.toString();
    }

    @Override
    public String transientSens(org.qchain.result.TransientSensResult r) {
        StringBuilder sb = new StringBuilder();
        Text.csvRecord(sb, List.of("t", "quantity", "decimal", "enclosure_width", "status"));
        Continuous.transientSensRows(r).forEach(x -> Text.csvRecord(sb, x));
        return sb.toString();
    }

    // --- classes, longrun, absorb --------------------------------------------------------------------------------

    /** One record per cell: table, row label, column heading, exact value (long form, easy to filter). */
    @Override
    String render(Sections.Doc d) {
        StringBuilder sb = new StringBuilder();
        Text.csvRecord(sb, List.of("table", "row", "column", "value"));
        for (Sections.Table t : d.tables()) {
            for (List<org.qchain.result.Formula> row : t.rows()) {
                for (int c = 1; c < row.size(); c++) {
                    Text.csvRecord(sb, List.of(t.title(), row.get(0).plain(), t.header().get(c), row.get(c).plain()));
                }
            }
        }
        return sb.toString();
    }

    // --- distributions after n steps -----------------------------------------------------------------------------

    /** {@code n,from,to,value,decimal} as for a row or an entry; a series is one record per n and column. */
    @Override
    public String distribution(DistributionResult r) {
        StringBuilder sb = new StringBuilder();
        Text.csvRecord(sb, entryHeader());
        String from = Distributions.startField(r);
        for (DistributionResult.Line line : r.lines()) {
            if (r.to().isEmpty()) {
                for (int j = 0; j < r.states().size(); j++) {
                    Rational e = line.distribution().get(j);
                    Text.csvRecord(sb, entryRecord(line.n(), from, r.states().get(j), e, e.toString()));
                }
            } else {
                Rational v = line.total().orElseThrow();
                Text.csvRecord(sb, entryRecord(line.n(), from, Distributions.toField(r), v, v.toString()));
            }
        }
        return sb.toString();
    }
}
