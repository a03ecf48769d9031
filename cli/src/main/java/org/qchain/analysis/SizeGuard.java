package org.qchain.analysis;

import java.util.Optional;
import java.util.OptionalInt;

/**
 * The analysis layer's one size guard: for each query, every estimate of the work and of the result is checked
 * against the query's limits, and refused with the estimate and the option that raises the limit, before any engine
 * runs (and so before any progress report). The engines only assert that it ran. {@link Analysis} calls it first
 * in every query method, so {@link Analysis#run} never reaches an engine past a limit.
 *
 * <p>The decisions: a numeric step's digits (whole power, or the row an entry is computed through) and its path
 * search's work ({@link NumericEngine#guard}); a symbolic step's terms and digits of the power or of one row, a
 * sensitivity's row, closed forms' powers P^1 .. P^s (estimates from degrees and coefficient heights, in
 * {@link SymbolicEngine}, which alone names symbolic types). Where a symbolic query is also evaluated at a point,
 * the exact engine's estimate of that value comes first. Two engines check a figure of their own that needs their
 * work: a sweep's digits (from the formula) and a parameter-free closed form's printed digits (from the factors of
 * the characteristic polynomial). For both the guard decides first on an a-priori upper bound from the model and the
 * query ({@code SweepEstimate}, {@code ClosedForms.digitBound}), never below the engine's figure (each class gives
 * the argument; random-chain tests check it), so the engines' checks stay as a second line that does not fire here.
 */
final class SizeGuard {
    private SizeGuard() {
    }

    /** A step query on its route. */
    static void check(LoadedModel model, StepQuery q) {
        if (Analysis.route(model, q) == Route.NUMERIC) {
            NumericEngine.guard(model, q);
            return;
        }
        if (model.complete()) {
            // the values at the point come from the exact engine too: its estimate first
            NumericEngine.guard(model, q);
        }
        q.from().ifPresent(f -> model.state("--from", f));
        q.to().ifPresent(t -> model.state("--to", t));
        symbolic(() -> SymbolicEngine.requireWithin(model, q));
    }

    /** A distribution query on the symbolic route (one n): each row of P^n it needs, estimated before any product. */
    static void check(LoadedModel model, DistributionQuery q) {
        for (String s : q.start().weights().keySet()) {
            model.state(q.start().option(), s);
        }
        for (String t : q.to()) {
            model.state("--to", t);
        }
        symbolic(() -> SymbolicEngine.requireWithin(model, q));
    }

    /** A sensitivity query. */
    static void check(LoadedModel model, SensQuery q) {
        if (model.complete()) {
            // the value at the point is checked against the exact engine's entry: its estimate first
            NumericEngine.guard(model, new StepQuery(q.n(), Optional.of(q.from()), Optional.of(q.toStates().get(0)),
                OptionalInt.empty(), q.maxDigits(), Long.MAX_VALUE, true, q.factor(), q.maxTerms()));
        }
        model.state("--from", q.from());
        for (String t : q.toStates()) {
            model.state("--to", t);
        }
        symbolic(() -> SymbolicEngine.requireWithin(model, q));
    }

    /** A closed-form query. */
    static void check(LoadedModel model, ClosedQuery q) {
        q.start().ifPresent(s -> s.weights().keySet().forEach(name -> model.state(s.option(), name)));
        for (String t : q.toStates()) {
            model.state("--to", t);
        }
        symbolic(() -> SymbolicEngine.requireWithin(model, q));
    }

    /** Runs a symbolic estimate (it may touch JAS), a JAS preemption ending as an interruption. */
    private static void symbolic(Runnable estimate) {
        Interrupts.guarded(() -> {
            estimate.run();
            return null;
        });
    }
}
