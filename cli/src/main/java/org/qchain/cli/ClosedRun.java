package org.qchain.cli;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.qchain.cli.result.ClosedResult;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.model.Domain;
import org.qchain.exact.model.Model;
import org.qchain.exact.model.ModelParser;
import org.qchain.exact.model.ParamDecl;
import org.qchain.symbolic.SymbolicLimits;
import org.qchain.symbolic.closed.ClosedForm;
import org.qchain.symbolic.closed.ClosedForms;
import org.qchain.symbolic.closed.Eigenvalue;
import org.qchain.symbolic.closed.LongRun;
import org.qchain.symbolic.closed.Recurrence;
import org.qchain.symbolic.closed.RootPolynomial;
import org.qchain.symbolic.closed.SeriesForm;

/** The work of {@code qchain closed}, kept apart from the command class so that picocli's reflection loads no JAS. */
final class ClosedRun {
    private final ClosedCommand c;

    private ClosedRun(ClosedCommand c) {
        this.c = c;
    }

    /**
     * Reads the model, computes what the options ask for and returns it as a result value.
     *
     * @param c the parsed options
     * @return the result
     * @throws QchainException for a bad model, option value or a chain past the size limit
     */
    static ClosedResult compute(ClosedCommand c) {
        return new ClosedRun(c).run();
    }

    private ClosedResult run() {
        Model m = ModelParser.parseFile(c.model.model);
        Map<String, Rational> at = c.model.at().map(t -> OptionValues.assignments(m, t)).orElse(Map.of());
        String first = c.start != null ? c.start : c.from;
        String rowOption = c.start != null ? "--start" : "--from";
        Optional<Integer> row = Optional.ofNullable(first).map(s -> OptionValues.state(m, rowOption, s));
        Optional<Integer> col = Optional.ofNullable(c.to).map(s -> OptionValues.state(m, "--to", s));
        SymbolicLimits limits = new SymbolicLimits(c.maxTerms);
        TerminalProgress progress = c.root.progress(c.spec.commandLine().getErr());
        try {
            return c.form == ClosedCommand.Form.MATRIX
                ? fromClosedForm(m, ClosedForms.of(m, at, limits, progress), at, row, col)
                : fromSeries(m, ClosedForms.series(m, at, limits, progress), row, col);
        } finally {
            progress.clear();
        }
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

    /** The values at which numbers are shown: --at, then nominal values; empty unless every parameter has one. */
    private static Optional<Map<String, Rational>> point(Model m, Map<String, Rational> at, List<String> params) {
        Map<String, Rational> p = new LinkedHashMap<>();
        for (String name : params) {
            Optional<Rational> v = Optional.ofNullable(at.get(name))
                .or(() -> m.param(name).flatMap(ParamDecl::nominal));
            if (v.isEmpty()) {
                return Optional.empty();
            }
            p.put(name, v.get());
        }
        return Optional.of(p);
    }

    private static String pointText(Map<String, Rational> p) {
        List<String> parts = new ArrayList<>();
        p.forEach((k, v) -> parts.add(k + "=" + v));
        return String.join(", ", parts);
    }

    private ClosedResult fromClosedForm(Model m, ClosedForm cf, Map<String, Rational> at, Optional<Integer> row,
                                        Optional<Integer> col) {
        List<Integer> ri = indices(m, row);
        List<Integer> ci = indices(m, col);
        List<List<String>> cells = new ArrayList<>();
        List<List<String>> latex = new ArrayList<>();
        int validFrom = 0;
        for (int i : ri) {
            List<String> line = new ArrayList<>();
            List<String> l = new ArrayList<>();
            for (int j : ci) {
                line.add(cf.formula(i, j));
                l.add(cf.latex(i, j));
                validFrom = Math.max(validFrom, cf.validFrom(i, j));
            }
            cells.add(line);
            latex.add(l);
        }
        List<ClosedResult.Eigen> eig = new ArrayList<>();
        for (Eigenvalue e : cf.eigenvalues()) {
            eig.add(new ClosedResult.Eigen(e.factor(), e.multiplicity(), e.jordanIndex(), e.kind(), e.values()));
        }
        List<String> warnings = new ArrayList<>();
        Optional<Map<String, Rational>> pt = point(m, at, cf.parameters());
        Optional<String> rateValue = Optional.empty();
        List<ClosedResult.Roots> roots = new ArrayList<>();
        List<RootPolynomial> named = List.of();
        if (pt.isPresent()) {
            try {
                cf.evaluate(0, pt.get()); // checks every condition at the point
                rateValue = Optional.of(cf.rate(pt.get(), c.output.digits));
                named = cf.rootPolynomials(pt.get(), c.output.digits);
            } catch (QchainException e) {
                if (e.key() != ErrorKey.CLOSED_FORM_CONDITION) {
                    throw e;
                }
                warnings.add(e.detail());
            }
        }
        if (named.isEmpty()) {
            for (Eigenvalue e : cf.eigenvalues()) {
                if (e.kind().equals("roots")) {
                    roots.add(new ClosedResult.Roots(e.name(), e.factor(), List.of()));
                }
            }
        } else {
            for (RootPolynomial r : named) {
                roots.add(new ClosedResult.Roots(r.name(), r.polynomial(), r.roots()));
            }
        }
        LongRun lr = cf.longRun();
        List<List<List<String>>> limits = new ArrayList<>();
        for (List<List<String>> full : lr.limits()) {
            limits.add(pick(full, ri, ci));
        }
        ClosedResult.LongRun longRun = new ClosedResult.LongRun(lr.period(), limits, lr.rate(), rateValue);
        Optional<String> pointText = pt.filter(p -> !p.isEmpty()).map(ClosedRun::pointText);
        Map<String, Domain> domains = new LinkedHashMap<>();
        for (String name : cf.parameters()) {
            m.param(name).ifPresent(d -> domains.put(name, d.domain()));
        }
        return new ClosedResult(m.source(), c.form.word, cf.nSymbol(), validFrom, cf.conditions(),
            cf.conditionsNotProved(domains), m.states(),
            cf.parameters(), selection(row, col), names(m, ri), names(m, ci), cells, latex, List.of(), eig,
            Optional.of(longRun), roots, pointText, c.output.digits, warnings);
    }

    private static List<List<String>> pick(List<List<String>> full, List<Integer> ri, List<Integer> ci) {
        List<List<String>> out = new ArrayList<>();
        for (int i : ri) {
            List<String> r = new ArrayList<>();
            for (int j : ci) {
                r.add(full.get(i).get(j));
            }
            out.add(r);
        }
        return out;
    }

    private ClosedResult fromSeries(Model m, SeriesForm sf, Optional<Integer> row, Optional<Integer> col) {
        List<Integer> ri = indices(m, row);
        List<Integer> ci = indices(m, col);
        List<List<String>> cells = new ArrayList<>();
        List<List<String>> latex = new ArrayList<>();
        List<List<ClosedResult.Recurrence>> recs = new ArrayList<>();
        int validFrom = 0;
        for (int i : ri) {
            List<String> line = new ArrayList<>();
            List<String> l = new ArrayList<>();
            List<ClosedResult.Recurrence> rr = new ArrayList<>();
            for (int j : ci) {
                if (c.form == ClosedCommand.Form.GF) {
                    line.add(sf.generatingFunction(i, j).plain());
                    l.add(sf.generatingFunction(i, j).latex());
                } else {
                    Recurrence r = sf.recurrence(i, j);
                    line.add(r.plain());
                    l.add(r.latex());
                    rr.add(new ClosedResult.Recurrence(r.coefficients(), r.validFrom(), r.initial()));
                    validFrom = Math.max(validFrom, r.validFrom());
                }
            }
            cells.add(line);
            latex.add(l);
            if (c.form == ClosedCommand.Form.RECURRENCE) {
                recs.add(rr);
            }
        }
        return new ClosedResult(m.source(), c.form.word, ClosedForm.N_SYMBOL, validFrom, List.of(), List.of(), m.states(),
            sf.parameters(), selection(row, col), names(m, ri), names(m, ci), cells, latex, recs, List.of(),
            Optional.empty(), List.of(), Optional.empty(), c.output.digits, List.of());
    }
}
