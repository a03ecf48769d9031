package org.qchain.analysis;

import org.qchain.exact.ErrorKey;
import org.qchain.exact.Progress;
import org.qchain.exact.QchainException;
import org.qchain.result.CheckResult;
import org.qchain.result.ClosedResult;
import org.qchain.result.Result;
import org.qchain.result.SensResult;

/**
 * Runs queries on loaded models: the one way from a query to a typed result, for the command line and for Java
 * users alike. Each method picks the route (numeric or symbolic), runs the query's size guard before any engine and
 * calls the engine; nothing here prints.
 *
 * <p>Routes: {@code step} is numeric when every used parameter has a nominal value and symbolic is not asked for
 * (values given for parameters without a nominal value are the point where a symbolic result is evaluated);
 * {@code check} is numeric when every used parameter has a value (nominal or given); {@code sens} and
 * {@code closed} are symbolic. Only the symbolic route loads JAS and Symja.
 */
public final class Analysis {
    private Analysis() {
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
                throw new QchainException(ErrorKey.BAD_ARGUMENT, "--paths", q.paths().getAsInt(), "needs numeric"
                    + " values for every parameter (the most probable paths of a symbolic chain depend on the"
                    + " parameters)");
            }
            return SymbolicEngine.step(model, q, progress);
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
        return SymbolicEngine.sens(model, q, progress);
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
        return SymbolicEngine.closed(model, q, progress);
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
            return SymbolicEngine.check(model);
        }
        return NumericEngine.check(model);
    }
}
