package org.qchain.analysis;

import java.util.Optional;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.ctmc.Generators;
import org.qchain.exact.Progress;
import org.qchain.exact.QchainException;
import org.qchain.result.AvailabilityResult;
import org.qchain.result.CheckResult;
import org.qchain.result.ClosedResult;
import org.qchain.result.Result;
import org.qchain.result.SensResult;
import org.qchain.result.TransientResult;
import org.qchain.result.VerifyResult;

/**
 * Runs queries on loaded models: the one way from a query to a typed result, for the command line and for Java
 * users alike. Each method picks the route (numeric or symbolic), runs the query's size guard before any engine and
 * calls the engine; nothing here prints. The size decisions of {@code step}, {@code sens} and {@code closed} are
 * {@link SizeGuard}'s, made before any engine runs (the engines only assert them).
 *
 * <p>Routes: {@code step} is numeric when every used parameter has a nominal value and symbolic is not asked for
 * (values given for parameters without a nominal value are the point where a symbolic result is evaluated);
 * {@code check} is numeric when every used parameter has a value (nominal or given); {@code sens} and
 * {@code closed} are symbolic. Only the symbolic route loads JAS and Symja. An interruption (the thread's interrupt
 * flag, JAS's preemption) ends every query with {@link ErrorKey#INTERRUPTED}.
 */
public final class Analysis {
    private Analysis() {
    }

    /**
     * Runs any query: the one entry point a report (a list of queries) needs.
     *
     * @param model    the loaded model
     * @param query    the query
     * @param progress told about long work
     * @return the query's result
     * @throws QchainException as the query's own method
     */
    public static Result run(LoadedModel model, Query query, Progress progress) {
        if (query instanceof StepQuery q) {
            return step(model, q, progress);
        }
        if (query instanceof SensQuery q) {
            return sens(model, q, progress);
        }
        if (query instanceof ClosedQuery q) {
            return closed(model, q, progress);
        }
        if (query instanceof TransientQuery q) {
            return transientProbabilities(model, q, progress);
        }
        if (query instanceof AvailabilityQuery q) {
            return route(model, q) == Route.SYMBOLIC ? availabilityFormulas(model, q, progress)
                : availability(model, q, progress);
        }
        if (query instanceof TransientSensQuery q) {
            return transientSens(model, q, progress);
        }
        if (query instanceof RateSensQuery q) {
            return rateSens(model, q, progress);
        }
        if (query instanceof VerifyQuery q) {
            return verify(model, q, progress);
        }
        if (query instanceof DistributionQuery q) {
            return distribution(model, q, progress);
        }
        if (query instanceof LongRunQuery q) {
            return longRun(model, q, progress);
        }
        if (query instanceof AbsorbQuery q) {
            return absorb(model, q, progress);
        }
        if (query instanceof ClassesQuery q) {
            return classes(model, q.limits());
        }
        return check(model, (CheckQuery) query);
    }

    /** The route a step query takes on a model. */
    public static Route route(LoadedModel model, StepQuery q) {
        return q.symbolic() || model.hasParameterWithoutNominal() ? Route.SYMBOLIC : Route.NUMERIC;
    }

    /** The route a check query takes on a model. */
    public static Route route(LoadedModel model, CheckQuery q) {
        return q.symbolic() || !model.complete() ? Route.SYMBOLIC : Route.NUMERIC;
    }

    /**
     * n-step probabilities.
     *
     * @param model    the loaded model
     * @param q        the query
     * @param progress told about long work
     * @return a {@link org.qchain.result.StepResult} on the numeric route (a
     *         {@link org.qchain.result.CertifiedStepResult} when certified decimals are asked for), a
     *         {@link org.qchain.result.SymbolicStepResult} on the symbolic one
     * @throws QchainException for an unknown state, a result past a size limit (with the estimate), a continuous
     *                         chain, paths asked of a symbolic chain, an interruption
     */
    public static Result step(LoadedModel model, StepQuery q, Progress progress) {
        model.requireDiscrete("qchain step -n needs a discrete chain; for a continuous chain give the time: qchain step MODEL -t T");
        if (route(model, q) == Route.SYMBOLIC) {
            if (q.paths().isPresent()) {
                throw new QchainException(AnalysisKey.PATHS_NEED_VALUES, q.paths().getAsInt());
            }
            if (q.certified()) {
                throw new QchainException(ErrorKey.BAD_ARGUMENT, "option", "--certified", "needs numeric values for"
                    + " every parameter (certified decimals are of numbers, not formulas)");
            }
            SizeGuard.check(model, q);
            return Interrupts.guarded(() -> SymbolicEngine.step(model, q, progress));
        }
        if (q.certified()) {
            return NumericEngine.certifiedStep(model, q, progress);
        }
        SizeGuard.check(model, q);
        return NumericEngine.step(model, q, progress);
    }

    /**
     * Where the chain is after n steps from a start (a state or a distribution): the distribution, or the total
     * probability of a set of states, for one n or a series of n. The whole series is estimated before any work; the
     * series shares its work (each n continues from the one before).
     *
     * @param model    the loaded model; for a list or range of n every used parameter needs a value (nominal or
     *                 given)
     * @param q        the query
     * @param progress told about long work (one report per n)
     * @return a {@link org.qchain.result.DistributionResult} when every parameter has a value; otherwise, for one n,
     *         a {@link org.qchain.result.SymbolicStepResult} whose one row is the start (formulas in the parameters)
     * @throws QchainException for a continuous chain, a parameter without a value, an unknown state, a series past
     *                         the size limit (with the estimate), an interruption
     */
    public static Result distribution(LoadedModel model, DistributionQuery q, Progress progress) {
        model.requireDiscrete("qchain step -n needs a discrete chain; for a continuous chain give the time: qchain step MODEL -t T");
        if (!q.series() && model.hasParameterWithoutNominal()) {
            // one n: formulas in the parameters (with their values at a --at point), as step gives a row or an entry
            if (model.complete()) {
                // the values at the point come from the exact engine too: its estimate first
                DistributionEngine.guard(model, q, DistributionEngine.startVector(model, q));
            }
            SizeGuard.check(model, q);
            return Interrupts.guarded(() -> SymbolicEngine.distribution(model, q, progress));
        }
        if (!model.complete()) {
            throw new QchainException(AnalysisKey.DISTRIBUTION_NEEDS_VALUES, "a list or range of n",
                String.join(", ", model.free()));
        }
        return DistributionEngine.run(model, q, progress);
    }

    /**
     * The sensitivity of one n-step probability.
     *
     * @param model    the loaded model
     * @param q        the query
     * @param progress told about long work
     * @return the result
     * @throws QchainException for an unknown state or parameter, a bad sweep, a power past a size limit
     */
    public static SensResult sens(LoadedModel model, SensQuery q, Progress progress) {
        model.requireDiscrete("qchain sens -n counts the steps of a discrete chain; for a continuous chain give the"
            + " time (qchain sens MODEL -t T --from A --to B --wrt P) or differentiate a figure of merit (qchain sens"
            + " MODEL --of availability|unavailability|mttf|failure-frequency --wrt P)");
        SizeGuard.check(model, q);
        return Interrupts.guarded(() -> SymbolicEngine.sens(model, q, progress));
    }

    /**
     * Closed forms in n.
     *
     * @param model    the loaded model
     * @param q        the query
     * @param progress told about long work
     * @return the result
     * @throws QchainException for an unknown state, a chain past the size limit
     */
    public static ClosedResult closed(LoadedModel model, ClosedQuery q, Progress progress) {
        model.requireDiscrete("closed forms in n are for discrete-time chains");
        SizeGuard.check(model, q);
        return Interrupts.guarded(() -> SymbolicEngine.closed(model, q, progress));
    }

    /**
     * Another tool's floating-point results checked exactly against the exact values.
     *
     * @param model    the loaded model (every used parameter needs a value)
     * @param q        the query
     * @param progress told about long work (the exact values, then the checking)
     * @return the result: counts, the worst entries, whether every value meets the tolerance
     * @throws QchainException for a quantity whose analysis this build lacks, a continuous chain, free parameters,
     *                         an unknown state, exact values past the size limit, a file of the wrong shape or with
     *                         unknown state names (at its file:line:col), an interruption
     */
    public static VerifyResult verify(LoadedModel model, VerifyQuery q, Progress progress) {
        return Verification.run(model, q, progress);
    }

    /**
     * Transition probabilities {@code P(t)} of a continuous chain at rational times, as certified decimals.
     *
     * @param model    the loaded model
     * @param q        the query
     * @param progress told about long work (one report per time)
     * @return the result
     * @throws QchainException for a discrete chain, a parameter without a value, an unknown state, an interruption
     */
    public static TransientResult transientProbabilities(LoadedModel model, TransientQuery q, Progress progress) {
        return ContinuousEngine.transientProbabilities(model, q, progress);
    }

    /**
     * The route of an availability query: symbolic when asked for or when a used parameter has no value.
     *
     * @param model the loaded model
     * @param q     the query
     * @return the route
     */
    public static Route route(LoadedModel model, AvailabilityQuery q) {
        return q.symbolic() || !model.complete() ? Route.SYMBOLIC : Route.NUMERIC;
    }

    /**
     * Figures of merit of a repairable system (a continuous chain with an {@code up} line), exactly at the
     * parameter point (the numeric route; {@link #run} picks the route, {@link #availabilityFormulas} is the
     * symbolic one).
     *
     * @param model    the loaded model
     * @param q        the query
     * @param progress told about long work
     * @return the result
     * @throws QchainException NO_UP_STATES without an {@code up} line; for a discrete chain, a parameter without a
     *                         value, a chain whose long-run law depends on the start, an unknown state
     */
    public static AvailabilityResult availability(LoadedModel model, AvailabilityQuery q, Progress progress) {
        return ContinuousEngine.availability(model, q, progress);
    }

    /**
     * Figures of merit of a repairable system as formulas in its parameters (values given with {@code --at}
     * substituted first), with the conditions under which they hold and, where every parameter has a value, the
     * exact figures there (equal to the formulas evaluated at the point).
     *
     * @param model    the loaded model
     * @param q        the query
     * @param progress told about long work
     * @return the result
     * @throws QchainException NO_UP_STATES without an {@code up} line; for a discrete chain; for point availabilities
     *                         at given times while a parameter has no value; for more states than the query's limit;
     *                         for a chain whose long-run law depends on the start (for generic parameter values);
     *                         an unknown state; an interruption
     */
    public static org.qchain.result.SymbolicAvailabilityResult availabilityFormulas(LoadedModel model,
            AvailabilityQuery q, Progress progress) {
        model.requireContinuous("qchain avail needs a continuous chain");
        java.util.List<Integer> up = model.model().upStates().orElseThrow(() ->
            new QchainException(ErrorKey.NO_UP_STATES, "qchain avail"));
        q.from().ifPresent(f -> model.state("--from", f));
        if (!q.times().isEmpty() && !model.complete()) {
            throw new QchainException(AnalysisKey.NEEDS_VALUES, "the point availability A(t) at given times",
                String.join(", ", model.free()), "without -t, qchain avail gives the steady-state figures and the"
                    + " MTTF as formulas in the parameters");
        }
        return Interrupts.guarded(() -> SymbolicEngine.availability(model, q, up, progress));
    }

    /**
     * The embedded jump chain or the uniformized chain of a continuous chain.
     *
     * @param model the loaded model
     * @param q     the query
     * @return the discrete chain, to be written as a model file
     * @throws QchainException for a discrete chain, a parameter without a value, a rate below the largest total rate
     */
    public static ConvertedModel convert(LoadedModel model, ConvertQuery q) {
        org.qchain.exact.RationalMatrix g = model.generator("qchain convert");
        Optional<org.qchain.exact.Rational> rate = Optional.empty();
        org.qchain.exact.RationalMatrix p;
        if (q.target() == ConvertQuery.Target.JUMP) {
            p = Generators.jumpChain(g);
        } else {
            org.qchain.exact.Rational max = Generators.maxRate(g);
            org.qchain.exact.Rational r = q.rate().orElse(max.isZero() ? org.qchain.exact.Rational.ONE : max);
            p = Generators.uniformized(g, r);
            rate = Optional.of(r);
        }
        Optional<java.util.List<String>> up = model.model().upStates()
            .map(ix -> ix.stream().map(i -> model.states().get(i)).toList());
        return new ConvertedModel(model.source(), q, rate, model.states(), up, p);
    }

    /**
     * The exact derivative of a figure of merit of a continuous chain with respect to a parameter.
     *
     * @param model the loaded model
     * @param q     the query
     * @return the result
     * @throws QchainException for a discrete chain, no {@code up} line, an unknown parameter or state, an infinite
     *                         MTTF, a parameter without a value
     */
    public static org.qchain.result.RateSensResult rateSens(LoadedModel model, RateSensQuery q) {
        return rateSens(model, q, Progress.NONE);
    }

    /**
     * As {@link #rateSens(LoadedModel, RateSensQuery)}, with the sweep if the query has one: the digits of all its
     * exact values are estimated before any solve and refused past the query's limit; progress (phase
     * {@code sweep}, one step per point) and an interrupt check between points.
     *
     * @param model    the loaded model
     * @param q        the query
     * @param progress told about each point of the sweep
     * @return the result
     * @throws QchainException as {@link #rateSens(LoadedModel, RateSensQuery)}; BAD_ARGUMENT for a bad sweep;
     *                         SWEEP_TOO_LARGE past the limit (with the estimate); INTERRUPTED
     */
    public static org.qchain.result.RateSensResult rateSens(LoadedModel model, RateSensQuery q, Progress progress) {
        String what = "qchain sens --of " + Figures.name(q.figure());
        java.util.List<Integer> up = model.model().upStates().orElseThrow(() -> new QchainException(
            ErrorKey.NO_UP_STATES, what));
        Optional<org.qchain.exact.model.SweepSpec> range = q.sweep().map(text -> RateSweeps.parse(model, text));
        if (range.isPresent()) {
            RateSweeps.requireOthers(model, range.get(), q.sweep().get());
        }
        model.generator(what);
        int from = q.from().map(f -> model.state("--from", f)).orElse(up.get(0));
        Optional<org.qchain.result.SensResult.Sweep> sweep = range.map(r -> RateSweeps.run(model, q, r, from, progress));
        org.qchain.exact.ctmc.RateSensitivity.Derivative d = org.qchain.exact.ctmc.RateSensitivity.of(model.model(),
            model.given(), q.wrt(), q.figure(), from);
        Optional<String> start = q.figure() == org.qchain.exact.ctmc.RateSensitivity.Figure.MTTF
            ? Optional.of(model.states().get(from)) : Optional.empty();
        return new org.qchain.result.RateSensResult(model.source(), Figures.name(q.figure()), start, q.wrt(),
            model.point().orElseThrow(), d.value(), d.derivative(), d.elasticity(), java.util.List.of(), sweep);
    }

    /**
     * The derivative of a transition probability of a continuous chain with respect to a parameter, as certified
     * decimals at the given times. The work is estimated for all times before any is done.
     *
     * @param model    the loaded model
     * @param q        the query
     * @param progress told about the terms of the series and the times
     * @return the result
     * @throws QchainException for a discrete chain, a parameter without a value, an unknown parameter or state;
     *                         TRANSIENT_TOO_LARGE past the work limit (with the estimate); INTERRUPTED
     */
    public static org.qchain.result.TransientSensResult transientSens(LoadedModel model, TransientSensQuery q,
                                                                      Progress progress) {
        org.qchain.exact.RationalMatrix g = model.generator("qchain sens -t");
        if (model.model().param(q.wrt()).isEmpty()) {
            throw new QchainException(ErrorKey.BAD_ARGUMENT, "--wrt", q.wrt(), model.model().params().isEmpty()
                ? "the model declares no parameters" : "not a parameter of " + model.source());
        }
        int from = model.state("--from", q.from());
        int to = model.state("--to", q.to());
        double work = 0;
        org.qchain.exact.ctmc.TransientSensitivity.Work last = null;
        double most = 0;
        for (org.qchain.exact.Rational t : q.times()) {
            last = org.qchain.exact.ctmc.TransientSensitivity.estimate(model.model(), model.given(), q.wrt(), t,
                q.digits());
            work += last.multiplications();
            most = Math.max(most, last.rateTime());
        }
        if (last != null && work > q.maxWork()) {
            throw new QchainException(ErrorKey.TRANSIENT_TOO_LARGE,
                org.qchain.exact.certified.CertifiedTransient.WorkEstimate.roughly(work), last.bits(), last.states(),
                last.entries(), q.times().size(), org.qchain.exact.certified.CertifiedTransient.WorkEstimate.roughly(most),
                q.maxWork(), NumericEngine.MAX_WORK_OPTION);
        }
        java.util.List<org.qchain.result.TransientSensResult.Row> rows = new java.util.ArrayList<>();
        org.qchain.exact.Rational rate = org.qchain.exact.Rational.ONE;
        for (int k = 0; k < q.times().size(); k++) {
            org.qchain.exact.Rational t = q.times().get(k);
            org.qchain.exact.ctmc.TransientSensitivity.Result r = org.qchain.exact.ctmc.TransientSensitivity.of(
                model.model(), model.given(), q.wrt(), t, from, to, q.digits(), q.maxBits(), progress);
            rate = r.rate();
            rows.add(new org.qchain.result.TransientSensResult.Row(t, r.value(), r.derivative(), r.elasticity()));
            progress.update("times", k + 1, q.times().size());
        }
        java.util.List<String> warnings = new java.util.ArrayList<>();
        for (org.qchain.result.TransientSensResult.Row row : rows) {
            if (!row.value().isProven() || !row.derivative().isProven()
                || row.elasticity().map(e -> !e.isProven()).orElse(false)) {
                warnings.add("at t = " + row.t() + " some digits could not be proven at the largest working precision;"
                    + " the interval is printed instead");
            }
        }
        return new org.qchain.result.TransientSensResult(model.source(), q.from(), q.to(), q.wrt(),
            model.point().orElseThrow(), rate, rows, q.digits(), warnings);
    }

    /**
     * The validated one-step matrix, or for a continuous chain the validated generator with its total rates out
     * and mean holding times.
     *
     * @param model the loaded model (already validated by loading)
     * @param q     the query
     * @return the numeric or symbolic check result ({@link CheckResult.Generator} for a continuous chain)
     */
    public static CheckResult check(LoadedModel model, CheckQuery q) {
        if (route(model, q) == Route.SYMBOLIC) {
            return Interrupts.guarded(() -> SymbolicEngine.check(model));
        }
        return ChainResults.continuous(model) ? NumericEngine.generatorCheck(model) : NumericEngine.check(model);
    }

    /** The route of {@code classes}, {@code longrun} and {@code absorb}: numeric when every used parameter has a value. */
    public static Route route(LoadedModel model, LongRunQuery q) {
        return q.symbolic() || !model.complete() ? Route.SYMBOLIC : Route.NUMERIC;
    }

    /**
     * Communicating classes, closed and transient, periods, absorbing states, the one-step graph; for free parameters
     * the generic structure and the parameter values that change it.
     *
     * @param model the loaded model
     * @param q     the query (only its route matters)
     * @return the result
     * @throws QchainException for a bad model
     */
    public static org.qchain.result.ClassesResult classes(LoadedModel model, LongRunQuery q) {
        return route(model, q) == Route.SYMBOLIC ? SymbolicEngine.classes(model, q.brief())
            : NumericEngine.classes(model, q.brief());
    }

    /**
     * Stationary laws per closed class, absorption into closed classes, the (Cesàro) limit of P^n, mean recurrence
     * and, on request, mean first-passage times.
     *
     * @throws QchainException for a result past the size limit (with the estimate), passage
     *                         times asked of a reducible chain
     */
    public static org.qchain.result.LongRunResult longRun(LoadedModel model, LongRunQuery q) {
        return longRun(model, q, Progress.NONE);
    }

    /**
     * {@link #longRun(LoadedModel, LongRunQuery)}, the exact solves reporting to {@code progress}.
     *
     * @param model    the loaded model
     * @param q        the query
     * @param progress where long solves report
     * @return the result
     */
    public static org.qchain.result.LongRunResult longRun(LoadedModel model, LongRunQuery q, Progress progress) {
        return route(model, q) == Route.SYMBOLIC ? SymbolicEngine.longRun(model, q)
            : NumericEngine.longRun(model, q, progress);
    }

    /**
     * Absorption: N, expected steps, variance, absorption probabilities, rewards, first passage.
     *
     * @throws QchainException for an unknown state, no absorbing state, states that can never
     *                         be absorbed (naming them), a result past the size limit
     */
    public static org.qchain.result.AbsorbResult absorb(LoadedModel model, AbsorbQuery q) {
        return absorb(model, q, Progress.NONE);
    }

    /**
     * {@link #absorb(LoadedModel, AbsorbQuery)}, the exact solves reporting to {@code progress}.
     *
     * @param model    the loaded model
     * @param q        the query
     * @param progress where long solves report
     * @return the result
     */
    public static org.qchain.result.AbsorbResult absorb(LoadedModel model, AbsorbQuery q, Progress progress) {
        return route(model, q.limits()) == Route.SYMBOLIC ? SymbolicEngine.absorb(model, q)
            : NumericEngine.absorb(model, q, progress);
    }
}
