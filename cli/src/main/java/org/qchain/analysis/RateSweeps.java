package org.qchain.analysis;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.Progress;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.ctmc.RateSensitivity;
import org.qchain.exact.model.Domain;
import org.qchain.exact.model.ModelParser;
import org.qchain.exact.model.ParamDecl;
import org.qchain.exact.model.SweepSpec;
import org.qchain.result.Point;
import org.qchain.result.SensResult;

/**
 * The sweep of {@code qchain sens --of FIGURE}: a figure of merit of a continuous chain and its exact derivative over
 * exact values of one parameter, in the same interval syntax and table as the discrete sweep (no symbolic code: the
 * figure is solved exactly at each point).
 */
final class RateSweeps {
    /** The largest number of points, as for the discrete sweep. */
    static final int MAX_POINTS = 10_001;

    private RateSweeps() {
    }

    /** Parses and checks the sweep: a declared parameter, at most {@link #MAX_POINTS} points, inside its domain. */
    static SweepSpec parse(LoadedModel model, String text) {
        SweepSpec s;
        try {
            s = ModelParser.parseSweep("--sweep", text);
        } catch (QchainException e) {
            throw new QchainException(ErrorKey.BAD_ARGUMENT, "--sweep", text,
                e.key() == ErrorKey.SWEEP ? String.valueOf(e.args().get(1))
                    : e.pos().map(p -> "at column " + p.column() + ": ").orElse("") + e.detail());
        }
        if (s.count() > MAX_POINTS) {
            throw new QchainException(ErrorKey.BAD_ARGUMENT, "--sweep", text, "it has "
                + (s.count() == Long.MAX_VALUE ? "too many" : String.valueOf(s.count())) + " points, more than "
                + MAX_POINTS);
        }
        ParamDecl d = model.model().param(s.parameter()).orElseThrow(() -> new QchainException(
            ErrorKey.BAD_ARGUMENT, "--sweep", text, "the model declares no parameter " + s.parameter()));
        Domain dom = d.domain();
        for (Rational x : new Rational[] {s.first(), s.last()}) {
            if (x.compareTo(dom.lower()) < 0 || dom.upper().map(u -> x.compareTo(u) > 0).orElse(false)) {
                throw new QchainException(ErrorKey.BAD_ARGUMENT, "--sweep", text, s.parameter() + " = " + x
                    + " lies outside its domain " + dom);
            }
        }
        return s;
    }

    /** Every used parameter other than the swept one needs a value. */
    static void requireOthers(LoadedModel model, SweepSpec s, String text) {
        List<String> missing = new ArrayList<>();
        for (String name : model.model().usedParameters()) {
            if (!name.equals(s.parameter()) && !model.known().containsKey(name)) {
                missing.add(name);
            }
        }
        if (!missing.isEmpty()) {
            throw new QchainException(ErrorKey.BAD_ARGUMENT, "--sweep", text, "the other parameters need values"
                + " (give them with --at): " + String.join(", ", missing));
        }
    }

    /**
     * Estimates the digits of the whole sweep, refuses past the limit, then solves point by point.
     *
     * @throws QchainException SWEEP_TOO_LARGE with the estimate; INTERRUPTED between points
     */
    static SensResult.Sweep run(LoadedModel model, RateSensQuery q, SweepSpec s, int from, Progress progress) {
        Map<String, Rational> others = new LinkedHashMap<>();
        for (String name : model.model().usedParameters()) {
            if (!name.equals(s.parameter())) {
                others.put(name, model.known().get(name));
            }
        }
        int size = (int) s.count();
        long digits = 0;
        for (int k = 0; k < size; k++) {
            digits += RateSensitivity.digitEstimate(model.model(), at(model, others, s, k), q.wrt());
        }
        if (digits > q.maxDigits()) {
            throw new QchainException(ErrorKey.SWEEP_TOO_LARGE, digits, size, q.maxDigits(),
                "; raise it with " + NumericEngine.MAX_DIGITS_OPTION
                    + ", or sweep fewer points");
        }
        List<SensResult.SweepLine> lines = new ArrayList<>();
        for (int k = 0; k < size; k++) {
            if (Thread.currentThread().isInterrupted()) {
                throw new QchainException(ErrorKey.INTERRUPTED);
            }
            progress.update("sweep", k, size);
            RateSensitivity.Derivative d = RateSensitivity.of(model.model(), at(model, others, s, k), q.wrt(),
                q.figure(), from);
            lines.add(new SensResult.SweepLine(s.point(k), d.value(), d.derivative()));
        }
        progress.update("sweep", size, size);
        Rational step = s.count() == 1 ? Rational.ONE : s.step();
        return new SensResult.Sweep(s.parameter(), s.first(), step, s.last(), new Point(others), lines);
    }

    private static Map<String, Rational> at(LoadedModel model, Map<String, Rational> others, SweepSpec s, int k) {
        Map<String, Rational> v = new LinkedHashMap<>(model.given());
        v.putAll(others);
        v.put(s.parameter(), s.point(k));
        return v;
    }
}
