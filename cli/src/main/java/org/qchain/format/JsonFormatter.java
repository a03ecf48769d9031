package org.qchain.format;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.qchain.exact.DecimalText;
import org.qchain.exact.Rational;
import org.qchain.exact.certified.CertifiedDecimal;
import org.qchain.exact.floats.FloatText;
import org.qchain.exact.reference.Target;
import org.qchain.exact.reference.VerifyReport;
import org.qchain.result.AvailabilityResult;
import org.qchain.result.CertifiedStepResult;
import org.qchain.result.RateSensResult;
import org.qchain.result.TransientResult;
import org.qchain.result.CheckResult;
import org.qchain.result.Formula;
import org.qchain.result.DistributionResult;
import org.qchain.result.ClosedResult;
import org.qchain.result.Condition;
import org.qchain.result.Point;
import org.qchain.result.SensResult;
import org.qchain.result.StepResult;
import org.qchain.result.SymbolicStepResult;
import org.qchain.result.VerifyResult;

/**
 * One compact JSON object per result, then a line break. The keys the issues name come first, in their order; fields
 * added since come after them and are never renamed or dropped (docs/commands.md and docs/symbolic.md have the
 * schemas).
 */
final class JsonFormatter extends Layout {
    JsonFormatter(int digits) {
        super(digits);
    }

    JsonFormatter(int digits, boolean doubles) {
        super(digits, doubles);
    }

    private List<String> exact(List<Rational> row) {
        // exact values of big powers have thousands of digits: the fast conversion, on all cores
        return List.of(DecimalText.toStrings(row.toArray(new Rational[0])));
    }

    private List<String> decimals(List<Rational> row) {
        return row.stream().map(this::dec).toList();
    }

    // --- step ----------------------------------------------------------------------------------------------------

    @Override
    public String stepMatrix(StepResult.Matrix m) {
        return whole(sink -> stepMatrix(m, sink));
    }

    @Override
    void stepMatrix(StepResult.Matrix m, Sink sink) {
        StepResult.Header h = m.header();
        int size = m.states().size();
        List<Rational> all = flat(m.entries());
        Json j = Json.object(sink)
            .string("kind", h.kind())
            .number("n", h.n())
            .strings("states", m.states());
        try (AheadTexts exact = AheadTexts.exact(all)) {
            j.streamedRows("matrix", size, size, exact, sink);
        }
        try (AheadTexts decimals = AheadTexts.start(all, this::dec)) {
            j.streamedRows("decimals", size, size, decimals, sink);
        }
        if (doubles) {
            j.stringRows("doubles", m.entries().stream().map(r -> r.stream().map(Layout::shortest).toList()).toList())
                .stringRows("hex", m.entries().stream().map(r -> r.stream().map(Layout::hex).toList()).toList());
        }
        common(j, h).end();
        sink.sb.append('\n');
    }

    @Override
    public String stepRow(StepResult.Row r) {
        return whole(sink -> stepRow(r, sink));
    }

    @Override
    void stepRow(StepResult.Row r, Sink sink) {
        StepResult.Header h = r.header();
        int size = r.entries().size();
        Json j = Json.object(sink)
            .number("n", h.n())
            .string("from", r.from())
            .strings("states", r.states());
        try (AheadTexts exact = AheadTexts.exact(r.entries())) {
            j.streamed("row", size, exact, sink);
        }
        try (AheadTexts decimals = AheadTexts.start(r.entries(), this::dec)) {
            j.streamed("decimals", size, decimals, sink);
        }
        j.string("kind", h.kind());
        if (doubles) {
            j.strings("doubles", r.entries().stream().map(Layout::shortest).toList())
                .strings("hex", r.entries().stream().map(Layout::hex).toList());
        }
        common(j, h).end();
        sink.sb.append('\n');
    }

    @Override
    public String stepSingle(StepResult.Single s) {
        StepResult.Header h = s.header();
        Json j = Json.object()
            .number("n", h.n())
            .string("from", s.from())
            .string("to", s.to())
            .string("value", DecimalText.toString(s.value()))
            .string("decimal", dec(s.value()))
            .string("kind", h.kind());
        if (doubles) {
            j.string("double", shortest(s.value())).string("hex", hex(s.value()));
        }
        s.paths().ifPresent(paths -> j.objects("paths", paths, p -> Json.object()
            .strings("states", p.states())
            .string("probability", p.probability().toString())
            .string("decimal", dec(p.probability()))
            .string("share", p.share().toString())
            .string("percent", Text.percent(p.share(), digits))));
        return common(j, h).close() + "\n";
    }

    private Json common(Json j, StepResult.Header h) {
        h.point().ifPresent(p -> j.object("at", point(p)));
        return j.number("digits", digits).string("model", h.source()).strings("warnings", h.warnings());
    }

    // --- certified step ----------------------------------------------------------------------------------------

    @Override
    public String certifiedStep(CertifiedStepResult r) {
        StepResult.Header h = r.header();
        Json j = Json.object().string("kind", h.kind()).number("n", h.n());
        r.from().ifPresent(f -> j.string("from", f));
        r.to().ifPresent(t -> j.string("to", t));
        j.bool("certified", true);
        if (r.to().isPresent()) {
            CertifiedDecimal d = r.values().get(0).get(0);
            j.string("decimal", d.text())
                .string("status", CertifiedStepResult.statusWord(d))
                .string("enclosure_width", CertifiedStepResult.widthText(d.enclosure().width()));
        } else {
            j.strings("states", r.columns());
            List<List<String>> texts = new ArrayList<>();
            List<List<String>> status = new ArrayList<>();
            List<List<String>> widths = new ArrayList<>();
            for (List<CertifiedDecimal> row : r.values()) {
                texts.add(row.stream().map(CertifiedDecimal::text).toList());
                status.add(row.stream().map(CertifiedStepResult::statusWord).toList());
                widths.add(row.stream().map(d -> CertifiedStepResult.widthText(d.enclosure().width())).toList());
            }
            if (r.from().isPresent()) {
                j.strings("decimals", texts.get(0)).strings("status", status.get(0))
                    .strings("enclosure_widths", widths.get(0));
            } else {
                j.stringRows("decimals", texts).stringRows("status", status).stringRows("enclosure_widths", widths);
            }
        }
        j.string("max_enclosure_width", CertifiedStepResult.widthText(r.maxWidth()));
        return j.number("digits", r.digits()).string("model", h.source()).strings("warnings", h.warnings()).close()
            + "\n";
    }

    // --- symbolic step -----------------------------------------------------------------------------------------

    @Override
    public String symbolicStep(SymbolicStepResult r) {
        Json j = Json.object();
        String form = r.factored() ? "factored" : "expanded";
        List<List<String>> plain = Symbolic.plain(r.formulas());
        if (r.isSingle()) {
            j.number("n", r.n()).string("from", r.from().get()).string("to", r.to().get())
                .strings("parameters", r.parameters()).string("form", form).string("formula", plain.get(0).get(0));
            if (r.values().isPresent()) {
                Rational e = r.values().get().get(0).get(0);
                j.object("at", point(r.point().orElseThrow())).string("value", e.toString())
                    .string("decimal", dec(e));
            }
        } else if (r.isMatrix()) {
            j.string("kind", r.kind()).number("n", r.n()).strings("parameters", r.parameters())
                .strings("states", r.states()).string("form", form).stringRows("matrix", plain);
            if (r.values().isPresent()) {
                j.object("at", point(r.point().orElseThrow()))
                    .stringRows("values", r.values().get().stream().map(this::exact).toList())
                    .stringRows("decimals", r.values().get().stream().map(this::decimals).toList());
            }
        } else {
            j.number("n", r.n()).string("from", r.from().get()).strings("parameters", r.parameters())
                .strings("states", r.states()).string("form", form).strings("row", plain.get(0));
            if (r.values().isPresent()) {
                j.object("at", point(r.point().orElseThrow())).strings("values", exact(r.values().get().get(0)))
                    .strings("decimals", decimals(r.values().get().get(0)));
            }
        }
        if (!r.isMatrix()) {
            j.string("kind", r.kind());
        }
        return j.number("digits", digits).string("model", r.source()).strings("warnings", r.warnings()).close()
            + "\n";
    }

    private static Json point(Point pt) {
        Json j = Json.object();
        for (Map.Entry<String, Rational> e : pt.values().entrySet()) {
            j.string(e.getKey(), e.getValue().toString());
        }
        return j;
    }

    // --- sens --------------------------------------------------------------------------------------------------

    @Override
    public String sens(SensResult s) {
        Json j = Json.object().number("n", s.n()).string("from", s.from()).string("to", s.to()).string("wrt", s.wrt())
            .strings("parameters", s.parameters()).string("formula", s.probability().plain())
            .string("derivative", s.derivative().plain());
        if (s.at().isPresent()) {
            SensResult.AtPoint a = s.at().get();
            j.object("at", point(a.point())).string("value", a.probability().toString())
                .string("decimal", dec(a.probability()))
                .string("derivative_value", a.derivative().toString())
                .string("derivative_decimal", dec(a.derivative()));
            if (a.elasticity().isPresent()) {
                j.string("elasticity", a.elasticity().get().toString())
                    .string("elasticity_decimal", dec(a.elasticity().get()));
            }
        }
        if (s.toStates().size() > 1) {
            j.strings("to_states", s.toStates());
        }
        if (s.isGradient()) {
            j.objects("gradient", s.gradient(), g -> {
                Json o = Json.object().string("wrt", g.wrt()).string("derivative", g.derivative().plain());
                g.value().ifPresent(v -> o.string("derivative_value", v.toString())
                    .string("derivative_decimal", dec(v)));
                g.elasticity().ifPresent(e -> o.string("elasticity", e.toString())
                    .string("elasticity_decimal", dec(e)));
                return o;
            });
        }
        s.sweep().ifPresent(w -> j.object("sweep", sweep(w, java.util.Optional.empty())));
        return j.string("kind", s.kind()).number("digits", digits).string("model", s.source())
            .strings("warnings", s.warnings()).close() + "\n";
    }

    /** {@code {"parameter","start","step","end","others","rows":[{NAME,value,decimal,derivative,...}]}}. */
    private Json sweep(SensResult.Sweep w, java.util.Optional<java.util.function.Function<SensResult.SweepLine, java.util.Optional<Rational>>> elasticity) {
        return Json.object().string("parameter", w.parameter()).string("start", w.start().toString())
            .string("step", w.step().toString()).string("end", w.end().toString())
            .object("others", point(w.others()))
            .objects("rows", w.lines(), l -> {
                Json o = Json.object().string(w.parameter(), l.value().toString())
                    .string("value", l.probability().toString())
                    .string("decimal", dec(l.probability()))
                    .string("derivative", l.derivative().toString())
                    .string("derivative_decimal", dec(l.derivative()));
                elasticity.ifPresent(f -> {
                    java.util.Optional<Rational> e = f.apply(l);
                    o.string("elasticity", e.map(Rational::toString).orElse("undefined"))
                        .string("elasticity_decimal", e.map(this::dec).orElse("undefined"));
                });
                return o;
            });
    }

    // --- closed ------------------------------------------------------------------------------------------------

    @Override
    public String closed(ClosedResult r) {
        List<List<String>> cells = Symbolic.plain(r.cells());
        Json j = Json.object()
            .string("n_symbol", r.nSymbol())
            .number("valid_from", r.validFrom())
            .strings("conditions", Condition.plain(r.conditions()))
            .strings("states", r.states());
        switch (r.selection()) {
            case ENTRY:
                // with --start or a --to set, as step's entry shape: the start's probabilities and the states of --to
                j.string("from", r.rows().get(0));
                if (!r.start().isEmpty()) {
                    j.object("start", startJson(r));
                }
                j.string("to", r.toStates().isEmpty() ? r.cols().get(0) : String.join(",", r.toStates()));
                if (!r.toStates().isEmpty()) {
                    j.strings("to_states", r.toStates());
                }
                j.string("formula", cells.get(0).get(0));
                break;
            case ROW:
                // "start" is the row's start as text (a state, or Healthy=3/5, Ill=2/5); the probabilities apart
                j.string("start", r.rows().get(0));
                if (!r.start().isEmpty()) {
                    j.object("start_distribution", startJson(r));
                }
                j.strings("row", cells.get(0));
                break;
            default:
                j.stringRows("matrix", cells);
        }
        j.string("form", r.form().word()).strings("parameters", r.parameters());
        if (!r.substituted().isEmpty()) {
            Json sub = Json.object();
            r.substituted().forEach((k, v) -> sub.string(k, v.toString()));
            j.object("substituted", sub);
        }
        if (!r.isSeries()) {
            j.strings("conditions_not_proved", Condition.plain(r.notProved()));
        }
        if (r.form() == ClosedResult.Form.GF) {
            j.string("variable", r.names().series());
        }
        if (r.form() == ClosedResult.Form.RECURRENCE) {
            List<Object[]> items = new ArrayList<>();
            for (int i = 0; i < r.rows().size(); i++) {
                for (int k = 0; k < r.cols().size(); k++) {
                    String to = r.toStates().isEmpty() ? r.cols().get(k) : String.join(",", r.toStates());
                    items.add(new Object[] {r.rows().get(i), to, r.recurrences().get(i).get(k)});
                }
            }
            j.objects("recurrences", items, c -> {
                ClosedResult.Recurrence rec = (ClosedResult.Recurrence) c[2];
                return Json.object().string("from", (String) c[0]).string("to", (String) c[1])
                    .strings("coefficients", Closed.plain(rec.coefficients())).number("valid_from", rec.validFrom())
                    .strings("initial", Closed.plain(rec.initial()));
            });
        }
        if (!r.isSeries()) {
            j.objects("where", r.where(), w -> Json.object().string("name", w.name()).string("symbol", w.symbol())
                .bool("eigenvalue", w.eigenvalue()).string("value", w.value().plain()));
            j.stringRows("named_cells", Symbolic.plain(r.shownCells()));
            j.bool("factored", r.factored()).string("characteristic_polynomial", Closed.characteristicPolynomial(r));
            j.objects("eigenvalues", r.eigenvalues(), e -> Json.object().string("factor", e.factor().plain())
                .number("multiplicity", e.multiplicity()).number("jordan_index", e.jordanIndex())
                .string("kind", e.kind()).strings("values", Closed.plain(e.values())).strings("names", e.names())
                .strings("decimals", Closed.eigenDecimalList(r, e)));
            j.objects("root_polynomials", r.roots(), rt -> Json.object().string("name", rt.name())
                .string("polynomial", rt.polynomial().plain()).strings("roots", Closed.decimals(rt.roots(), r.digits())));
            r.longRun().ifPresent(lr -> {
                List<Integer> rs = new ArrayList<>();
                for (int k = 0; k < lr.limits().size(); k++) {
                    rs.add(k);
                }
                Json l = Json.object().number("period", lr.period())
                    .objects("limits", rs, k -> limitJson(r, k, Closed.plainGrid(lr.limits().get(k)), Closed.limitDecimals(r, lr)))
                    .string("rate", lr.rate().plain()).string("rate_named", Closed.rate(r, lr, false));
                lr.rateValue().ifPresent(v -> l.string("rate_value", Closed.real(r, v)));
                List<String> special = new ArrayList<>();
                for (org.qchain.result.Point p : lr.special()) {
                    special.add(p.text());
                }
                l.string("rate_of", r.continuous() ? "real_parts" : lr.periodic() ? "subsequences" : "powers").bool("exact", lr.exact())
                    .number("exact_from", lr.exactFrom()).strings("conditions", Condition.plain(lr.conditions()))
                    .strings("conditions_not_proved", Condition.plain(lr.notProved())).strings("special_points", special);
                j.object("long_run", l);
            });
            r.point().ifPresent(p -> j.string("at", p.text()));
        }
        ClosedResult.Names names = r.names();
        Json symbols = Json.object().string("step", names.step()).string("period", names.period())
            .string("variable", names.variable()).string("series", names.series())
            .string("sequence", names.sequence());
        if (r.continuous()) {
            symbols.string("time", r.timeSymbol()).string("transform", r.transformSymbol());
            j.string("t_symbol", r.timeSymbol()).string("transform_variable", r.transformSymbol());
            List<List<String>> lt = Symbolic.plain(r.transforms());
            switch (r.selection()) {
                case ENTRY:
                    j.string("transform", lt.get(0).get(0));
                    break;
                case ROW:
                    j.strings("transform_row", lt.get(0));
                    break;
                default:
                    j.stringRows("transform_matrix", lt);
            }
        }
        j.string("kind", r.kind().word()).string("model", r.source()).number("digits", r.digits())
            .strings("warnings", r.warnings())
            .object("symbols", symbols);
        return j.close() + "\n";
    }

    /** The start's probabilities, {@code {"Healthy":"3/5","Ill":"2/5"}}. */
    private static Json startJson(ClosedResult r) {
        Json o = Json.object();
        r.start().forEach((k, v) -> o.string(k, v.toString()));
        return o;
    }

    private static Json limitJson(ClosedResult r, int k, List<List<String>> grid, List<List<List<String>>> dec) {
        Json l = Json.object().number("r", k);
        switch (r.selection()) {
            case ENTRY:
                l.string("formula", grid.get(0).get(0));
                if (!dec.isEmpty()) {
                    l.string("decimal", dec.get(k).get(0).get(0));
                }
                return l;
            case ROW:
                l.strings("row", grid.get(0));
                if (!dec.isEmpty()) {
                    l.strings("decimals", dec.get(k).get(0));
                }
                return l;
            default:
                l.stringRows("matrix", grid);
                if (!dec.isEmpty()) {
                    l.stringRows("decimals", dec.get(k));
                }
                return l;
        }
    }

    // --- check -------------------------------------------------------------------------------------------------

    @Override
    String generatorCheck(CheckResult.Generator g) {
        List<List<String>> plain = g.entries().stream().map(r -> r.stream().map(Formula::plain).toList()).toList();
        Json out = Json.object();
        Json hold = Json.object();
        Json outDec = Json.object();
        Json holdDec = Json.object();
        for (List<String> r : Continuous.stateRows(g, digits)) {
            out.string(r.get(0), r.get(1));
            hold.string(r.get(0), g.holding().get(g.states().indexOf(r.get(0))).isPresent() ? r.get(3) : "inf");
            outDec.string(r.get(0), r.get(2));
            holdDec.string(r.get(0), r.get(4));
        }
        Json j = Json.object().string("kind", "continuous").strings("states", g.states());
        if (g.symbolic()) {
            j.strings("parameters", g.parameters());
        }
        j.stringRows("matrix", plain);
        if (!g.symbolic()) {
            j.stringRows("decimals", g.entries().stream().map(r -> r.stream()
                .map(f -> Continuous.decimalOf(f, digits)).toList()).toList());
        }
        j.object("exit_rates", out).object("mean_holding_times", hold);
        if (!g.symbolic()) {
            j.object("decimals_exit_rates", outDec).object("decimals_mean_holding_times", holdDec);
        }
        g.up().ifPresent(u -> j.strings("up", u).strings("down", g.down()));
        if (g.symbolic()) {
            j.strings("conditions", g.warnings());
        }
        g.at().ifPresent(p -> j.object("at", point(p)));
        if (!g.symbolic()) {
            j.number("digits", digits);
        }
        return j.string("model", g.source()).strings("warnings", g.warnings()).close() + "\n";
    }

    @Override
    String symbolicCheck(CheckResult.Symbolic s) {
        return Json.object().string("kind", s.kind()).strings("states", s.states())
            .strings("parameters", s.parameters()).stringRows("matrix", Symbolic.plain(s.entries()))
            .strings("conditions", s.warnings()).string("model", s.source()).strings("warnings", s.warnings())
            .close() + "\n";
    }

    // --- verify --------------------------------------------------------------------------------------------------

    @Override
    public String verify(VerifyResult r) {
        VerifyReport rep = r.report();
        Target t = r.target();
        Json j = Json.object().string("what", r.what());
        r.n().ifPresent(n -> j.number("n", n));
        r.t().ifPresent(time -> j.string("t", time.toString()));
        r.from().ifPresent(f -> j.string("from", f));
        r.to().ifPresent(x -> j.string("to", x));
        j.string("model", r.source()).string("against", r.against()).string("form", rep.form().description());
        Json tol = Json.object();
        rep.tolerance().relative().ifPresent(x -> tol.string("relative", Checks.bound(x)));
        rep.tolerance().absolute().ifPresent(x -> tol.string("absolute", Checks.bound(x)));
        rep.tolerance().ulps().ifPresent(x -> tol.number("ulps", x));
        j.object("tolerance", tol)
            .bool("passed", rep.passed())
            .number("expected", rep.expected())
            .number("checked", rep.checked())
            .number("overTolerance", rep.overTolerance())
            .number("nonFinite", rep.nonFinite())
            .number("correctlyRounded", rep.correctlyRounded())
            .bool("allCorrectlyRounded", rep.allCorrectlyRounded())
            .string("worstRelativeError", Checks.errorExact(rep.worstRelativeError()));
        rep.worstUlps().ifPresent(u -> j.number("worstUlps", u));
        j.objects("worst", rep.worst(), c -> {
            Json e = Json.object().string("entry", c.label());
            if (t.shape() == Target.Shape.MATRIX) {
                e.string("from", Checks.rowState(t, c)).string("to", Checks.colState(t, c));
            } else if (t.shape() == Target.Shape.VECTOR) {
                e.string("state", Checks.colState(t, c));
            }
            e.string("given", c.given()).string("givenDouble", Checks.errorExact(c.givenDouble()))
                .string("exact", c.truth().toString()).string("decimal", dec(c.truth()))
                .string("exactDouble", FloatText.shortest(c.truthDouble()))
                .string("error", Checks.errorExact(c.error()))
                .string("relativeError", Checks.errorExact(c.relativeError()));
            c.ulps().ifPresent(u -> e.number("ulps", u));
            return e.bool("correctlyRounded", c.isCorrectlyRounded()).bool("pass", c.pass())
                .number("line", c.pos().line()).number("column", c.pos().column());
        });
        return j.number("digits", digits).strings("warnings", r.warnings()).close() + "\n";
    }

    // --- continuous chains ---------------------------------------------------------------------------------------

    /** One object per time, one per line. */
    @Override
    public String transientProbabilities(TransientResult r) {
        StringBuilder sb = new StringBuilder();
        for (TransientResult.AtTime at : r.times()) {
            Json j = Json.object()
                .string("kind", "continuous")
                .string("t", at.t().toString())
                .stringRows("matrix", at.rows().stream().map(row -> row.stream().map(Continuous::value).toList()).toList())
                .stringRows("decimals", at.rows().stream().map(row -> row.stream()
                    .map(org.qchain.exact.certified.CertifiedDecimal::text).toList()).toList())
                .number("digits", digits)
                .string("bound", Continuous.bound(at.bound()))
                .strings("states", r.states())
                .strings("rows", Continuous.rowNames(r))
                .stringRows("status", at.rows().stream().map(row -> row.stream()
                    .map(d -> d.status().name().toLowerCase(java.util.Locale.ROOT)).toList()).toList())
                .string("uniformization_rate", at.uniformizationRate().toString())
                .string("model", r.source())
                .strings("warnings", r.warnings())
                .string("caution", Caution.TEXT);
            sb.append(j.close()).append('\n');
        }
        return sb.toString();
    }

    @Override
    public String symbolicTransient(org.qchain.result.SymbolicTransientResult r) {
        StringBuilder sb = new StringBuilder();
        for (int k = 0; k < r.times().size(); k++) {
            org.qchain.result.SymbolicTransientResult.AtTime at = r.times().get(k);
            List<List<org.qchain.exact.certified.CertifiedDecimal>> dec = Continuous.symbolicDecimals(r, k);
            Json j = Json.object()
                .string("kind", "continuous")
                .string("t", at.t().toString())
                .stringRows("matrix", Symbolic.plain(at.plainCells()));
            if (!dec.isEmpty()) {
                j.stringRows("decimals", dec.stream().map(row -> row.stream()
                    .map(org.qchain.exact.certified.CertifiedDecimal::text).toList()).toList());
                j.string("bound", Continuous.bound(r.values().get().times().get(k).bound()));
                r.point().ifPresent(p -> j.string("at", p.text()));
            }
            j.number("digits", digits)
                .bool("symbolic", true)
                .string("t_symbol", r.timeSymbol())
                .stringRows("formula", Symbolic.plain(r.cells()))
                .strings("parameters", r.parameters())
                .strings("conditions", r.conditions())
                .strings("conditions_not_proved", r.notProved())
                .strings("states", r.states())
                .strings("rows", r.rows())
                .bool("factored", r.factored());
            if (!r.substituted().isEmpty()) {
                Json sub = Json.object();
                r.substituted().forEach((name, v) -> sub.string(name, v.toString()));
                j.object("substituted", sub);
            }
            j.string("model", r.source())
                .strings("warnings", r.warnings())
                .string("caution", Caution.TEXT);
            sb.append(j.close()).append('\n');
        }
        return sb.toString();
    }

    @Override
    public String availability(AvailabilityResult r) {
        Json j = figures(r);
        r.at().ifPresent(p -> j.object("at", point(p)));
        j.number("digits", digits)
            .string("model", r.source())
            .strings("warnings", r.warnings())
            .string("caution", Caution.TEXT);
        return j.close() + "\n";
    }

    /** The exact figures of a numeric availability result, up to the point availabilities. */
    private Json figures(AvailabilityResult r) {
        Json mttf = Json.object();
        Json mttfDec = Json.object();
        r.mttf().forEach((s, v) -> {
            mttf.string(s, Continuous.exact(v, "inf"));
            mttfDec.string(s, Continuous.decimal(v, "inf", digits));
        });
        Json pi = Json.object();
        r.stationary().forEach((s, v) -> pi.string(s, v.toString()));
        return Json.object()
            .strings("up", r.up())
            .string("steady_state_availability", r.availability().toString())
            .object("mttf", mttf)
            .string("mean_up_time", Continuous.exact(r.meanUpTime(), "undefined"))
            .string("mean_down_time", Continuous.exact(r.meanDownTime(), "undefined"))
            .string("failure_frequency", r.failureFrequency().toString())
            .string("unavailability", r.unavailability().toString())
            .string("hours_per_year", r.hoursPerYear().toString())
            .string("down_hours_per_year", r.downHoursPerYear().toString())
            .object("stationary", pi)
            .object("decimals", Json.object()
                .string("steady_state_availability", dec(r.availability()))
                .object("mttf", mttfDec)
                .string("mean_up_time", Continuous.decimal(r.meanUpTime(), "undefined", digits))
                .string("mean_down_time", Continuous.decimal(r.meanDownTime(), "undefined", digits))
                .string("failure_frequency", dec(r.failureFrequency()))
                .string("unavailability", dec(r.unavailability()))
                .string("down_hours_per_year", dec(r.downHoursPerYear())))
            .string("from", r.from())
            .objects("point_availability_at", r.point(), JsonFormatter::certifiedAt)
            .objects("reliability_at", r.reliability(), JsonFormatter::certifiedAt);
    }

    /** Named factors as {@code {"f1":"x^3 + ..."}}, plain or LaTeX. */
    private static Json where(Map<String, org.qchain.result.Formula> defs, boolean latex) {
        Json w = Json.object();
        defs.forEach((k, v) -> w.string(k, latex ? v.latex() : v.plain()));
        return w;
    }

    /** One certified value at a time: {@code {"t","decimal","status","bound"}}. */
    private static Json certifiedAt(AvailabilityResult.PointAvailability p) {
        return Json.object()
            .string("t", p.t().toString())
            .string("decimal", p.value().text())
            .string("status", p.value().status().name().toLowerCase(java.util.Locale.ROOT))
            .string("bound", Continuous.bound(p.value().enclosure().width()));
    }

    @Override
    public String symbolicAvailability(org.qchain.result.SymbolicAvailabilityResult r) {
        Json mttf = Json.object();
        Json mttfTex = Json.object();
        r.mttf().forEach((s, v) -> {
            mttf.string(s, v.map(org.qchain.result.Formula::plain).orElse("inf"));
            mttfTex.string(s, v.map(org.qchain.result.Formula::latex).orElse("\\infty"));
        });
        Json pi = Json.object();
        Json piTex = Json.object();
        r.stationary().forEach((s, v) -> {
            pi.string(s, v.plain());
            piTex.string(s, v.latex());
        });
        Json j = Json.object()
            .strings("up", r.up())
            .string("steady_state_availability", r.availability().plain())
            .object("mttf", mttf)
            .string("mean_up_time", r.meanUpTime().map(org.qchain.result.Formula::plain).orElse("undefined"))
            .string("mean_down_time", r.meanDownTime().map(org.qchain.result.Formula::plain).orElse("undefined"))
            .string("failure_frequency", r.failureFrequency().plain())
            .string("unavailability", r.unavailability().plain())
            .string("hours_per_year", r.hoursPerYear().toString())
            .string("down_hours_per_year", r.downHoursPerYear().plain())
            .object("stationary", pi);
        r.inTime().ifPresent(t -> j.string("point_availability", t.pointAvailability().plain())
            .string("reliability", t.reliability().plain())
            .string("from", t.from())
            .string("t_symbol", t.time())
            .object("where", where(t.availabilityWhere(), false))
            .object("reliability_where", where(t.reliabilityWhere(), false)));
        Json tex = Json.object()
            .string("steady_state_availability", r.availability().latex())
            .object("mttf", mttfTex)
            .string("mean_up_time", r.meanUpTime().map(org.qchain.result.Formula::latex).orElse("undefined"))
            .string("mean_down_time", r.meanDownTime().map(org.qchain.result.Formula::latex).orElse("undefined"))
            .string("failure_frequency", r.failureFrequency().latex())
            .string("unavailability", r.unavailability().latex())
            .string("down_hours_per_year", r.downHoursPerYear().latex())
            .object("stationary", piTex);
        r.inTime().ifPresent(t -> tex.string("point_availability", t.pointAvailability().latex())
            .string("reliability", t.reliability().latex())
            .object("where", where(t.availabilityWhere(), true))
            .object("reliability_where", where(t.reliabilityWhere(), true)));
        j.string("kind", "symbolic")
            .strings("parameters", r.parameters())
            .object("latex", tex)
            .objects("conditions", r.conditions(), c -> Json.object()
                .string("condition", c.plain())
                .string("latex", c.latex())
                .bool("proved", c.proved()));
        if (!r.substituted().isEmpty()) {
            Json sub = Json.object();
            r.substituted().forEach((k, v) -> sub.string(k, v.toString()));
            j.object("substituted", sub);
        }
        r.atPoint().ifPresent(a -> {
            Json values = figures(a);
            a.at().ifPresent(p -> values.object("at", point(p)));
            j.object("values_at_point", values);
        });
        j.number("digits", digits)
            .string("model", r.source())
            .strings("warnings", r.warnings())
            .string("caution", Caution.TEXT);
        return j.close() + "\n";
    }

    @Override
    public String rateSens(RateSensResult r) {
        Json pt = Json.object();
        r.point().values().forEach((k, v) -> pt.string(k, v.toString()));
        Json j = Json.object()
            .string("of", r.figure())
            .string("wrt", r.wrt())
            .string("value", r.value().toString())
            .string("derivative", r.derivative().toString())
            .string("elasticity", Continuous.exact(r.elasticity(), "undefined"))
            .object("decimals", Json.object()
                .string("value", dec(r.value()))
                .string("derivative", dec(r.derivative()))
                .string("elasticity", Continuous.decimal(r.elasticity(), "undefined", digits)))
            .object("at", pt);
        r.from().ifPresent(f -> j.string("from", f));
        r.sweep().ifPresent(w -> j.object("sweep", sweep(w, java.util.Optional.of(r::elasticity))));
        j.number("digits", digits).string("model", r.source()).strings("warnings", r.warnings())
            .string("caution", Caution.TEXT);
        return j.close() + "\n";
    }

    @Override
    public String transientSens(org.qchain.result.TransientSensResult r) {
        Json pt = Json.object();
        r.point().values().forEach((k, v) -> pt.string(k, v.toString()));
        Json j = Json.object()
            .string("kind", "continuous")
            .string("of", "entry")
            .string("from", r.from())
            .string("to", r.to())
            .string("wrt", r.wrt())
            .objects("rows", r.rows(), row -> {
                Json o = Json.object().string("t", row.t().toString())
                    .string("value", row.value().text())
                    .string("derivative", row.derivative().text())
                    .string("elasticity", row.elasticity().map(org.qchain.exact.certified.CertifiedDecimal::text)
                        .orElse("undefined"));
                Json b = Json.object().string("value", Continuous.bound(row.value().enclosure().width()))
                    .string("derivative", Continuous.bound(row.derivative().enclosure().width()));
                row.elasticity().ifPresent(e -> b.string("elasticity", Continuous.bound(e.enclosure().width())));
                return o.object("bound", b);
            })
            .object("at", pt)
            .string("uniformization_rate", r.rate().toString())
            .number("digits", digits)
            .string("model", r.source())
            .strings("warnings", r.warnings())
            .string("caution", Caution.TEXT);
        return j.close() + "\n";
    }

    // --- classes, longrun, absorb --------------------------------------------------------------------------------

    private static List<List<String>> plain(List<List<org.qchain.result.Formula>> m) {
        return m.stream().map(Layout::plainTexts).toList();
    }

    /** With {@code --brief}: {@code "left_out":[field]} (the field itself stays, empty). */
    private static Json leftOut(Json j, boolean brief, String field) {
        return brief ? j.strings("left_out", List.of(field)) : j;
    }

    /** An object opened with its source, and {@code "kind":"continuous"} for a continuous chain (discrete: absent). */
    private static Json kinded(String source, boolean continuous) {
        Json j = Json.object().string("source", source);
        return continuous ? j.string("kind", "continuous") : j;
    }

    private static Json byState(List<String> states, List<org.qchain.result.Formula> values) {
        Json j = Json.object();
        // values may be empty (a continuous chain's state that is never left has no mean return time); otherwise
        // there is one per state
        List<String> texts = plainTexts(values);
        for (int i = 0; i < (values.isEmpty() ? 0 : states.size()); i++) {
            j.string(states.get(i), texts.get(i));
        }
        return j;
    }

    @Override
    public String classes(org.qchain.result.ClassesResult r) {
        Json j = kinded(r.source(), r.continuous())
            .strings("states", r.states()).strings("parameters", r.parameters())
            .objects("classes", r.classes(), c -> Json.object().strings("states", c.states()).bool("closed", c.closed())
                .number("period", c.period()))
            .strings("absorbing", r.absorbing()).strings("transient", r.transients())
            .objects("special_values", r.specialValues(), v -> Json.object().string("condition", Sections.specialCondition(v))
                .string("effect", Sections.effect(v.effect())))
            .stringRows("graph", plain(r.graph()));
        r.at().ifPresent(p -> j.object("at", point(p)));
        return leftOut(j, r.brief(), "graph").strings("warnings", r.warnings()).close() + "\n";
    }

    @Override
    public String longRun(org.qchain.result.LongRunResult r) {
        Json abs = Json.object();
        for (org.qchain.result.LongRunResult.Absorption a : r.absorption()) {
            List<Integer> idx = new ArrayList<>();
            for (int k = 0; k < a.classes().size(); k++) {
                idx.add(k);
            }
            abs.objects(a.state(), idx, k -> Json.object().number("class", a.classes().get(k))
                .string("probability", a.probabilities().get(k).plain()));
        }
        Json j = kinded(r.source(), r.continuous())
            .strings("states", r.states()).strings("parameters", r.parameters())
            .objects("classes", r.classes(), c -> {
                Json o = Json.object().strings("states", c.states()).bool("closed", c.closed())
                    .number("period", c.period());
                if (c.closed()) {
                    o.object("stationary", byState(c.states(), c.stationary()))
                        .object("mean_recurrence", byState(c.states(), c.meanRecurrence()));
                }
                return o;
            })
            .object("absorption_into_classes", abs).stringRows("limit", plain(r.limit())).bool("cesaro", r.cesaro());
        r.passage().ifPresent(m -> j.stringRows("passage", plain(m)));
        r.at().ifPresent(p -> j.object("at", point(p)));
        leftOut(j, r.brief(), "limit");
        return j.strings("warnings", r.warnings()).close() + "\n";
    }

    @Override
    public String absorb(org.qchain.result.AbsorbResult r) {
        Json probs = Json.object();
        for (int i = 0; i < r.transients().size(); i++) {
            probs.object(r.transients().get(i), byState(r.absorbing(), r.probabilities().get(i)));
        }
        Json j = kinded(r.source(), r.continuous())
            .strings("parameters", r.parameters()).strings("transient", r.transients()).strings("absorbing", r.absorbing())
            .strings("made_absorbing", r.made()).stringRows("fundamental", plain(r.fundamental()))
            .object("expected_steps", byState(r.transients(), r.expectedSteps()))
            .object("variance", byState(r.transients(), r.variance())).object("absorption", probs);
        r.from().ifPresent(f -> j.string("from", f));
        r.rewards().ifPresent(w -> {
            Json o = Json.object().object("per_step", byState(w.states(), w.perStep()))
                .object("accumulated", byState(r.transients(), w.accumulated()))
                .object("long_run_average", byState(w.states(), w.longRun()));
            w.discount().ifPresent(v -> o.string("discount", v.plain())
                .object("discounted", byState(w.states(), w.discounted())));
            j.object("rewards", o);
        });
        r.passage().ifPresent(p -> {
            Json ex = Json.object();
            Json wi = Json.object();
            for (int i = 0; i < p.states().size(); i++) {
                ex.strings(p.states().get(i), p.exactly().get(i).stream().map(org.qchain.result.Formula::plain).toList());
                wi.strings(p.states().get(i), p.within().get(i).stream().map(org.qchain.result.Formula::plain).toList());
            }
            j.object("first_passage", Json.object().object("exactly", ex).object("within", wi));
        });
        r.at().ifPresent(p -> j.object("at", point(p)));
        leftOut(j, r.brief(), "fundamental");
        return j.strings("warnings", r.warnings()).close() + "\n";
    }

    // --- distributions after n steps -----------------------------------------------------------------------------

    @Override
    public String distribution(DistributionResult r) {
        if (!r.series()) {
            return distributionStep(r, r.lines().get(0)).close() + "\n";
        }
        Json j = Json.object().string("kind", "series")
            .numbers("n", r.lines().stream().map(DistributionResult.Line::n).toList());
        j.objects("steps", r.lines(), line -> distributionStep(r, line));
        return j.number("digits", digits).string("model", r.source()).strings("warnings", r.warnings()).close() + "\n";
    }

    /**
     * One n as the row shape ({@code n, from, start, states, row, decimals, kind, ...}) or the entry shape
     * ({@code n, from, start, to, to_states, value, decimal, kind, ...}) of {@code step}, with the start added.
     */
    private Json distributionStep(DistributionResult r, DistributionResult.Line line) {
        Json j = Json.object().number("n", line.n());
        r.from().ifPresent(f -> j.string("from", f));
        Json start = Json.object();
        r.start().forEach((k, v) -> start.string(k, v.toString()));
        j.object("start", start);
        if (r.to().isEmpty()) {
            j.strings("states", r.states())
                .strings("row", line.distribution().stream().map(DecimalText::toString).toList())
                .strings("decimals", line.distribution().stream().map(this::dec).toList());
        } else {
            Rational v = line.total().orElseThrow();
            j.string("to", String.join(",", r.to())).strings("to_states", r.to())
                .string("value", DecimalText.toString(v)).string("decimal", dec(v));
        }
        j.string("kind", r.kind());
        r.point().ifPresent(p -> j.object("at", point(p)));
        return j.number("digits", digits).string("model", r.source()).strings("warnings", r.warnings());
    }
}
