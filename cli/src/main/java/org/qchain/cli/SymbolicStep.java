package org.qchain.cli;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.qchain.cli.result.Entry;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.MatrixPowers;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;
import org.qchain.exact.model.ChainKind;
import org.qchain.exact.model.Chains;
import org.qchain.exact.model.Model;
import org.qchain.symbolic.Formulas;
import org.qchain.symbolic.RatFun;
import org.qchain.symbolic.RatFunMatrix;
import org.qchain.symbolic.SymbolicLimits;
import org.qchain.symbolic.check.CheckReport;
import org.qchain.symbolic.check.Finding;
import org.qchain.symbolic.check.ParameterCheck;

/**
 * The symbolic path of {@code qchain step}: P^n (or a row, or an entry) as exact rational functions of the model's
 * parameters, with values at the parameter point when every parameter has one. Loaded only on that path (the class
 * references JAS through the symbolic module), so numeric runs never load it.
 */
final class SymbolicStep {
    private SymbolicStep() {
    }

    /** Runs the command on the symbolic path and prints its result; returns the exit code. */
    static int run(StepCommand c, Model m) {
        if (m.kind() != ChainKind.DISCRETE) {
            throw new QchainException(ErrorKey.WRONG_KIND, m.kind().word(),
                "qchain step needs a discrete chain (continuous chains are not supported yet)");
        }
        SymbolicContext ctx = SymbolicContext.of(m, c.model.at());
        TerminalProgress progress = c.root.progress(c.spec.commandLine().getErr());
        SymbolicResult result;
        try {
            result = compute(ctx, c, progress);
        } finally {
            progress.clear();
        }
        Emitter.emit(c.spec, SymbolicFormats.step(result, c.output.format), result.warnings(), c.output.output());
        return ExitCodes.OK;
    }

    private static SymbolicResult compute(SymbolicContext ctx, StepCommand c, TerminalProgress progress) {
        Model m = ctx.model();
        RatFunMatrix p = ctx.p();
        SymbolicLimits limits = new SymbolicLimits(c.symbolicOptions.maxTerms, c.maxDigits);
        List<String> rowNames = new ArrayList<>();
        List<String> colNames = new ArrayList<>();
        List<List<RatFun>> cells = new ArrayList<>();
        Optional<String> from = Optional.ofNullable(c.from);
        Optional<String> to = Optional.ofNullable(c.to);
        int fromIdx = from.map(f -> ctx.state("--from", f)).orElse(-1);
        int toIdx = to.map(t -> ctx.state("--to", t)).orElse(-1);
        if (from.isEmpty()) {
            RatFunMatrix pn = p.power(c.n, limits, k -> progress.update("multiplying", k, c.n - 1));
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
            List<RatFun> row = p.powerRow(fromIdx, c.n, limits, k -> progress.update("multiplying", k, c.n - 1));
            rowNames.add(from.get());
            if (toIdx >= 0) {
                cells.add(List.of(row.get(toIdx)));
                colNames.add(to.get());
            } else {
                cells.add(row);
                colNames.addAll(m.states());
            }
        }
        List<List<SymbolicResult.Formula>> formulas = new ArrayList<>();
        for (List<RatFun> row : cells) {
            List<SymbolicResult.Formula> out = new ArrayList<>();
            for (RatFun f : row) {
                out.add(formula(f, c.symbolicOptions.factor));
            }
            formulas.add(out);
        }
        Optional<List<List<Entry>>> values = Optional.empty();
        if (ctx.point().isPresent()) {
            values = Optional.of(values(ctx, cells, c.n, fromIdx, toIdx, c.output.digits));
        }
        return new SymbolicResult(m.source(), m.kind().word(), c.n, c.output.digits, ctx.parameters(), m.states(),
            c.symbolicOptions.factor, from, to, rowNames, colNames, formulas, ctx.point(), values, ctx.warnings());
    }

    static SymbolicResult.Formula formula(RatFun f, boolean factor) {
        return new SymbolicResult.Formula(Formulas.of(f, factor, false), Formulas.of(f, factor, true));
    }

    /**
     * The values at the point: each formula evaluated exactly, checked against the exact module's power of the
     * substituted chain (they must be equal; a difference is an internal error).
     */
    private static List<List<Entry>> values(SymbolicContext ctx, List<List<RatFun>> cells, long n, int from, int to,
                                            int digits) {
        Map<String, Rational> point = ctx.point().orElseThrow();
        RationalMatrix p = Chains.transitionMatrix(ctx.model(), point);
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
        List<List<Entry>> out = new ArrayList<>();
        for (int i = 0; i < cells.size(); i++) {
            List<Entry> row = new ArrayList<>();
            for (int j = 0; j < cells.get(i).size(); j++) {
                Rational v = cells.get(i).get(j).evaluate(point);
                if (!v.equals(exact.get(i).get(j))) {
                    throw new QchainException(ErrorKey.INTERNAL, "the formula's value " + v
                        + " differs from the exact engine's " + exact.get(i).get(j));
                }
                row.add(Stepper.entry(v, digits));
            }
            out.add(row);
        }
        return out;
    }

    /**
     * The model mapped into its parameter ring, validated with the parameters symbolic, and the parameter values.
     *
     * @param model      the model
     * @param p          its one-step matrix of rational functions
     * @param parameters the parameters the entries use, in declaration order
     * @param known      every value known: nominal values overridden by {@code --at}, in declaration order
     * @param point      {@code known} restricted to the used parameters, if every used parameter has a value
     * @param warnings   the range warnings of the check
     */
    record SymbolicContext(Model model, RatFunMatrix p, List<String> parameters, Map<String, Rational> known,
                           Optional<Map<String, Rational>> point, List<String> warnings) {

        static SymbolicContext of(Model m, Optional<String> at) {
            Map<String, Rational> given = at.map(text -> OptionValues.assignments(m, text)).orElse(Map.of());
            RatFunMatrix p = RatFunMatrix.fromModel(m);
            CheckReport report = ParameterCheck.check(m, p);
            report.throwIfErrors();
            List<String> warnings = new ArrayList<>();
            for (Finding f : report.warnings()) {
                warnings.add(f.located());
            }
            Map<String, Rational> known = new LinkedHashMap<>();
            for (var d : m.params()) {
                Rational v = given.containsKey(d.name()) ? given.get(d.name()) : d.nominal().orElse(null);
                if (v != null) {
                    known.put(d.name(), v);
                }
            }
            Map<String, Rational> point = new LinkedHashMap<>();
            for (String name : m.usedParameters()) {
                if (known.containsKey(name)) {
                    point.put(name, known.get(name));
                }
            }
            boolean complete = point.size() == m.usedParameters().size();
            return new SymbolicContext(m, p, m.usedParameters(), known,
                complete ? Optional.of(point) : Optional.empty(), warnings);
        }

        int state(String option, String name) {
            return OptionValues.state(model, option, name);
        }
    }}
