package org.qchain.analysis;

import java.util.Optional;
import java.util.OptionalInt;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.Progress;
import org.qchain.exact.QchainException;
import org.qchain.result.CheckResult;
import org.qchain.result.ClosedResult;
import org.qchain.result.Result;
import org.qchain.result.SensResult;
import org.qchain.result.VerifyResult;

/**
 * Runs queries on loaded models: the one way from a query to a typed result, for the command line and for Java
 * users alike. Each method picks the route (numeric or symbolic), runs the query's size guard before any engine and
 * calls the engine; nothing here prints.
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
        if (query instanceof VerifyQuery q) {
            return verify(model, q, progress);
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
     * @return a {@link org.qchain.result.StepResult} on the numeric route, a
     *         {@link org.qchain.result.SymbolicStepResult} on the symbolic one
     * @throws QchainException for an unknown state, a result past a size limit (with the estimate), a continuous
     *                         chain, paths asked of a symbolic chain, an interruption
     */
    public static Result step(LoadedModel model, StepQuery q, Progress progress) {
        model.requireDiscrete("qchain step needs a discrete chain (continuous chains are not supported yet)");
        if (route(model, q) == Route.SYMBOLIC) {
            if (q.paths().isPresent()) {
                throw new QchainException(AnalysisKey.PATHS_NEED_VALUES, q.paths().getAsInt());
            }
            if (model.complete()) {
                // the values at the point come from the exact engine too: its estimate first
                NumericEngine.guard(model, q);
            }
            return Interrupts.guarded(() -> SymbolicEngine.step(model, q, progress));
        }
        return NumericEngine.step(model, q, progress);
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
        model.requireDiscrete("qchain sens needs a discrete chain (continuous chains are not supported yet)");
        if (model.complete()) {
            // the value at the point is checked against the exact engine's entry: its estimate first
            NumericEngine.guard(model, new StepQuery(q.n(), Optional.of(q.from()), Optional.of(q.to()),
                OptionalInt.empty(), q.maxDigits(), Long.MAX_VALUE, true, q.factor(), q.maxTerms()));
        }
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
     * The validated one-step matrix.
     *
     * @param model the loaded model (already validated by loading)
     * @param q     the query
     * @return the numeric or symbolic check result
     */
    public static CheckResult check(LoadedModel model, CheckQuery q) {
        model.requireDiscrete("qchain check needs a discrete chain (continuous chains are not supported yet)");
        if (route(model, q) == Route.SYMBOLIC) {
            return Interrupts.guarded(() -> SymbolicEngine.check(model));
        }
        return NumericEngine.check(model);
    }
}
