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
import org.qchain.exact.model.ChainKind;
import org.qchain.exact.model.Chains;
import org.qchain.exact.model.Model;
import org.qchain.exact.model.ModelParser;
import org.qchain.symbolic.SymbolicLimits;
import org.qchain.symbolic.sensitivity.EntrySensitivity;
import org.qchain.symbolic.sensitivity.PointSensitivity;
import org.qchain.symbolic.sensitivity.Sensitivity;
import org.qchain.symbolic.sensitivity.SweepRange;
import org.qchain.symbolic.sensitivity.SweepRow;

/** The work of {@code qchain sens}, kept apart from the command class so that picocli's reflection loads no JAS. */
final class SensRun {
    private SensRun() {
    }

    /**
     * Values at the point.
     *
     * @param point       the parameter values
     * @param probability P there
     * @param derivative  dP/dp there
     * @param elasticity  (p/P) dP/dp there; empty where P = 0
     */
    record AtPoint(Map<String, Rational> point, Entry probability, Entry derivative, Optional<Entry> elasticity) {
    }

    /**
     * One line of a sweep.
     *
     * @param value       the swept parameter's value
     * @param probability P there
     * @param derivative  dP/dp there
     */
    record SweepLine(Rational value, Entry probability, Entry derivative) {
    }

    /**
     * A sweep table.
     *
     * @param parameter the swept parameter
     * @param start     first value
     * @param step      increment
     * @param end       last value allowed
     * @param others    the values of the other parameters
     * @param lines     one line per point
     */
    record Sweep(String parameter, Rational start, Rational step, Rational end, Map<String, Rational> others,
                 List<SweepLine> lines) {
        String range() {
            return parameter + " = " + start + " : " + step + " : " + end;
        }
    }

    /**
     * What {@code sens} computed.
     *
     * @param source      the model file name
     * @param kind        the chain kind word
     * @param n           steps
     * @param digits      significant digits of decimals
     * @param from        start state
     * @param to          end state
     * @param wrt         the parameter of the derivative
     * @param parameters  the parameters the formulas are in
     * @param probability P^n(from, to) as a formula
     * @param derivative  its derivative as a formula
     * @param at          values at the point, if every parameter has a value
     * @param sweep       the sweep table, if asked for
     * @param warnings    warnings
     */
    record SensResult(String source, String kind, long n, int digits, String from, String to, String wrt,
                      List<String> parameters, SymbolicResult.Formula probability, SymbolicResult.Formula derivative,
                      Optional<AtPoint> at, Optional<Sweep> sweep, List<String> warnings) {
    }

    static int run(SensCommand c) {
        Model m = ModelParser.parseFile(c.model.model);
        if (m.kind() != ChainKind.DISCRETE) {
            throw new QchainException(ErrorKey.WRONG_KIND, m.kind().word(),
                "qchain sens needs a discrete chain (continuous chains are not supported yet)");
        }
        if (m.param(c.wrt).isEmpty()) {
            throw new QchainException(ErrorKey.BAD_ARGUMENT, "--wrt", c.wrt, m.params().isEmpty()
                ? "the model declares no parameters"
                : "not a parameter of " + m.source() + " (parameters: "
                    + String.join(", ", m.params().stream().map(d -> d.name()).toList()) + ")");
        }
        Optional<SweepRange> range = Optional.empty();
        if (c.sweep != null) {
            SweepRange r;
            try {
                r = SweepRange.parse(c.sweep);
            } catch (QchainException e) {
                // SWEEP's arguments are the text and the reason: name the option instead of repeating the text
                throw new QchainException(ErrorKey.BAD_ARGUMENT, "--sweep", c.sweep,
                    e.key() == ErrorKey.SWEEP ? String.valueOf(e.args().get(1)) : e.detail());
            }
            try {
                Sensitivity.checkSweep(m, r);
            } catch (QchainException e) {
                throw new QchainException(ErrorKey.BAD_ARGUMENT, "--sweep", c.sweep, e.detail());
            }
            range = Optional.of(r);
        }
        SymbolicStep.SymbolicContext ctx = SymbolicStep.SymbolicContext.of(m, c.model.at());
        int from = ctx.state("--from", c.from);
        int to = ctx.state("--to", c.to);
        TerminalProgress progress = c.root.progress(c.spec.commandLine().getErr());
        SensResult result;
        try {
            SymbolicLimits limits = new SymbolicLimits(c.symbolicOptions.maxTerms, c.maxDigits);
            EntrySensitivity s = Sensitivity.of(ctx.p(), c.n, from, to, c.wrt, limits,
                k -> progress.update("multiplying", k, c.n - 1));
            result = result(c, m, ctx, s, from, to, range);
        } finally {
            progress.clear();
        }
        Emitter.emit(c.spec, SymbolicFormats.sens(result, c.output.format), result.warnings(), c.output.output());
        return ExitCodes.OK;
    }

    private static SensResult result(SensCommand c, Model m, SymbolicStep.SymbolicContext ctx, EntrySensitivity s,
                                     int from, int to, Optional<SweepRange> range) {
        int digits = c.output.digits;
        Optional<AtPoint> at = Optional.empty();
        if (ctx.point().isPresent() && ctx.known().containsKey(c.wrt)) {
            Map<String, Rational> pt = new LinkedHashMap<>(ctx.point().get());
            pt.put(c.wrt, ctx.known().get(c.wrt));
            PointSensitivity ps = s.at(pt);
            // the formula's value must equal the exact engine's value of the substituted chain
            Rational exact = MatrixPowers.entryOfPower(Chains.transitionMatrix(m, ctx.point().get()), from, to, c.n);
            if (!exact.equals(ps.probability())) {
                throw new QchainException(ErrorKey.INTERNAL, "the formula's value " + ps.probability()
                    + " differs from the exact engine's " + exact);
            }
            at = Optional.of(new AtPoint(pt, Stepper.entry(ps.probability(), digits),
                Stepper.entry(ps.derivative(), digits), ps.elasticity().map(e -> Stepper.entry(e, digits))));
        }
        Optional<Sweep> sweep = Optional.empty();
        if (range.isPresent()) {
            SweepRange r = range.get();
            Map<String, Rational> others = new LinkedHashMap<>();
            List<String> missing = new ArrayList<>();
            for (String name : ctx.parameters()) {
                if (name.equals(r.parameter())) {
                    continue;
                }
                Rational v = ctx.known().get(name);
                if (v == null) {
                    missing.add(name);
                } else {
                    others.put(name, v);
                }
            }
            if (!missing.isEmpty()) {
                throw new QchainException(ErrorKey.BAD_ARGUMENT, "--sweep", c.sweep, "the other parameters need values"
                    + " (give them with --at): " + String.join(", ", missing));
            }
            List<SweepLine> lines = new ArrayList<>();
            for (SweepRow row : s.sweep(r, others)) {
                lines.add(new SweepLine(row.value(), Stepper.entry(row.probability(), digits),
                    Stepper.entry(row.derivative(), digits)));
            }
            sweep = Optional.of(new Sweep(r.parameter(), r.start(), r.step(), r.end(), others, lines));
        }
        return new SensResult(m.source(), m.kind().word(), c.n, digits, c.from, c.to, c.wrt, ctx.parameters(),
            SymbolicStep.formula(s.probability(), c.symbolicOptions.factor),
            SymbolicStep.formula(s.derivative(), c.symbolicOptions.factor), at, sweep,
            ctx.warnings());
    }
}
