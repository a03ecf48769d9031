package org.qchain.symbolic.closed;

import java.util.List;
import java.util.Map;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.Progress;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.model.ChainKind;
import org.qchain.exact.model.Model;
import org.qchain.symbolic.ParamRing;
import org.qchain.symbolic.PowerEstimate;
import org.qchain.symbolic.RatFunMatrix;
import org.qchain.symbolic.SymbolicLimits;

/**
 * Closed forms of P^n in a symbolic n: the entry point of this package.
 *
 * <pre>{@code
 * Model m = ...;                                       // rows 1-a, a / b, 1-b
 * ClosedForm cf = ClosedForms.of(m, Map.of());
 * cf.formula(0, 0);      // "b/(a + b) + a/(a + b)*(1 - a - b)^n"
 * cf.conditions();       // ["a + b != 0"]
 * cf.evaluate(5, Map.of("a", Rational.of(1, 3), "b", Rational.of(1, 4)));   // exact P^5
 * }</pre>
 */
public final class ClosedForms {
    static {
        // the symbolic module's ring sets JAS up (no thread pool, quiet logging) before any JAS class is used
        ParamRing.of(List.of());
    }

    private ClosedForms() {
    }

    /**
     * The closed form of P^n for a discrete-time model, with the given parameter values substituted and every
     * other parameter that the matrix uses kept symbolic; default size limit.
     *
     * @param model a discrete-time model
     * @param at    values for some parameters (may be empty)
     * @return the closed form
     * @throws QchainException with {@link ErrorKey#WRONG_KIND} for a continuous-time model,
     *                         {@link ErrorKey#UNKNOWN_PARAMETER} for a value of an undeclared parameter,
     *                         {@link ErrorKey#SYMBOLIC_TOO_LARGE} if P^s is estimated past the limit
     */
    public static ClosedForm of(Model model, Map<String, Rational> at) {
        estimate(model, at).requireTermsWithin(SymbolicLimits.DEFAULT);
        return of(model, at, SymbolicLimits.DEFAULT);
    }

    /**
     * As {@link #of(Model, Map)} with a size limit.
     *
     * @param model  a discrete-time model
     * @param at     values for some parameters (may be empty)
     * @param limits the size limit for the powers P^1 .. P^s the method multiplies out, which the caller's guard
     *               checks first ({@link #estimate})
     * @return the closed form
     * @throws QchainException as {@link #of(Model, Map)}, except the size refusal
     * @throws IllegalStateException past the limit (the guard did not run)
     */
    public static ClosedForm of(Model model, Map<String, Rational> at, SymbolicLimits limits) {
        return of(matrix(model, at), model.states(), limits, Progress.NONE);
    }

    /**
     * As {@link #of(Model, Map, SymbolicLimits)} with progress reports (phases {@code powers}, {@code factoring},
     * {@code projectors}, {@code formulas}); an interrupt of the calling thread stops the work.
     *
     * @param model    a discrete-time model
     * @param at       values for some parameters (may be empty)
     * @param limits   the size limit for the powers P^1 .. P^s the method multiplies out
     * @param progress receives the reports
     * @return the closed form
     * @throws QchainException as {@link #of(Model, Map)}, and {@link ErrorKey#INTERRUPTED} if the thread is interrupted
     */
    public static ClosedForm of(Model model, Map<String, Rational> at, SymbolicLimits limits, Progress progress) {
        return interruptible(() -> of(matrix(model, at), model.states(), limits, progress));
    }

    /**
     * The closed form with every parameter symbolic.
     *
     * @see #of(Model, Map)
     */
    public static ClosedForm of(Model model) {
        return of(model, Map.of());
    }

    /**
     * The closed form of the n-th power of a square matrix of rational functions (normally a stochastic matrix).
     * The formulas use the ring's variables that occur in the matrix.
     *
     * @param p      the one-step matrix
     * @param states a name per row
     * @param limits   the size limit for the powers P^1 .. P^s the method multiplies out
     * @param progress receives progress reports ({@link Progress#NONE} for none)
     * @return the closed form
     * @throws IllegalArgumentException if the number of names differs from the size
     * @throws IllegalStateException    if P^s is estimated past the limit: the caller's size guard
     *                                  ({@code p.estimatePower(p.size()).requireTermsWithin(limits)}) refuses it first
     */
    public static ClosedForm of(RatFunMatrix p, List<String> states, SymbolicLimits limits, Progress progress) {
        return interruptible(() -> new ClosedForm(Series.of(guarded(p, states, limits), limits, progress), states,
            progress));
    }

    /**
     * The generating functions and recurrences of P^n, which need no factorisation into eigenvalues (and so cost
     * less than {@link #of(Model, Map)}).
     *
     * @param model  a discrete-time model
     * @param at     values for some parameters (may be empty)
     * @param limits the size limit
     * @return the series forms
     * @throws QchainException as {@link #of(Model, Map)}
     */
    public static SeriesForm series(Model model, Map<String, Rational> at, SymbolicLimits limits) {
        return series(model, at, limits, Progress.NONE);
    }

    /**
     * As {@link #series(Model, Map, SymbolicLimits)} with progress reports; an interrupt stops the work.
     *
     * @param model    a discrete-time model
     * @param at       values for some parameters (may be empty)
     * @param limits   the size limit
     * @param progress receives the reports
     * @return the series forms
     */
    public static SeriesForm series(Model model, Map<String, Rational> at, SymbolicLimits limits, Progress progress) {
        return interruptible(() -> new SeriesForm(Series.of(guarded(matrix(model, at), model.states(), limits), limits,
            progress), model.states()));
    }

    /**
     * The closed form of P(t) = exp(Qt) for a continuous-time model, in a symbolic t, with the given parameter values
     * substituted and every other parameter the generator uses kept symbolic; default size limit. This is the entry
     * point for P(t) in closed form: {@link TransientForm#entry}, {@link TransientForm#combination} (e.g. a point
     * availability) and their values at a time.
     *
     * @param model a continuous-time model
     * @param at    values for some parameters (may be empty)
     * @return the closed form
     * @throws QchainException with {@link ErrorKey#WRONG_KIND} for a discrete-time model,
     *                         {@link ErrorKey#UNKNOWN_PARAMETER} for a value of an undeclared parameter,
     *                         {@link ErrorKey#SYMBOLIC_TOO_LARGE} if Q^s is estimated past the limit
     */
    public static TransientForm ofGenerator(Model model, Map<String, Rational> at) {
        estimate(model, at).requireTermsWithin(SymbolicLimits.DEFAULT);
        return ofGenerator(model, at, SymbolicLimits.DEFAULT, Progress.NONE);
    }

    /**
     * As {@link #ofGenerator(Model, Map)} with a size limit (which the caller's guard checks first with
     * {@link #estimate} and {@link #digitBound}) and progress reports; an interrupt of the calling thread stops the
     * work.
     *
     * @throws QchainException as {@link #ofGenerator(Model, Map)}, except the size refusal, and
     *                         {@link ErrorKey#INTERRUPTED}
     * @throws IllegalStateException past the limit (the guard did not run)
     */
    public static TransientForm ofGenerator(Model model, Map<String, Rational> at, SymbolicLimits limits,
                                            Progress progress) {
        return interruptible(() -> ofGenerator(matrix(model, at, ChainKind.CONTINUOUS), model.states(), limits,
            progress));
    }

    /**
     * The closed form of exp(Qt) for a square matrix of rational functions (normally a generator: rows summing to
     * 0, off-diagonal entries non-negative).
     *
     * @param q      the matrix
     * @param states a name per row
     * @param limits the size limit for the powers Q^1 .. Q^s
     * @param progress receives progress reports
     * @return the closed form
     * @throws IllegalArgumentException if the number of names differs from the size
     * @throws IllegalStateException    if Q^s is estimated past the limit (the caller's guard refuses it first)
     */
    public static TransientForm ofGenerator(RatFunMatrix q, List<String> states, SymbolicLimits limits,
                                            Progress progress) {
        return interruptible(() -> new TransientForm(Series.of(guarded(q, states, limits), limits, progress), states,
            progress));
    }

    /** JAS stops its own loops on an interrupt with an exception of its own: report it as ours. */
    private static <T> T interruptible(java.util.function.Supplier<T> work) {
        try {
            return work.get();
        } catch (edu.jas.kern.PreemptingException e) {
            throw new QchainException(ErrorKey.INTERRUPTED);
        }
    }

    /** As {@link #series(Model, Map, SymbolicLimits)} with the default limit. */
    public static SeriesForm series(Model model, Map<String, Rational> at) {
        return series(model, at, SymbolicLimits.DEFAULT);
    }

    private static RatFunMatrix matrix(Model model, Map<String, Rational> at) {
        return matrix(model, at, ChainKind.DISCRETE);
    }

    /** The model's matrix (one-step or generator) with values substituted; null kind accepts either. */
    private static RatFunMatrix matrix(Model model, Map<String, Rational> at, ChainKind kind) {
        if (kind != null && model.kind() != kind) {
            throw new QchainException(ErrorKey.WRONG_KIND, model.kind().word(), kind == ChainKind.DISCRETE
                ? "closed forms in n are for discrete-time chains" : "closed forms in t are for continuous-time chains");
        }
        for (String name : at.keySet()) {
            if (model.param(name).isEmpty()) {
                throw new QchainException(ErrorKey.UNKNOWN_PARAMETER, name);
            }
        }
        RatFunMatrix p = RatFunMatrix.fromModel(model);
        return at.isEmpty() ? p : p.substitute(at);
    }

    /**
     * The size estimate of the powers P^1 .. P^s that the closed forms multiply out (s states), for the caller's
     * size guard: {@code estimate(model, at).requireTermsWithin(limits)} refuses, with the estimate, before any
     * work. The closed-form methods only assert that it holds.
     *
     * @param model a discrete-time model
     * @param at    values for some parameters (may be empty)
     * @return the estimate of P^s
     * @throws QchainException as {@link #of(Model, Map)} for an undeclared parameter (a continuous model: the
     *                         estimate of Q^s, for {@link #ofGenerator})
     */
    public static PowerEstimate estimate(Model model, Map<String, Rational> at) {
        RatFunMatrix p = matrix(model, at, null);
        return p.estimatePower(p.size());
    }

    /**
     * An upper bound, computed from P's entries before any work, of the digit figure that the closed forms of a chain
     * with no free parameter check after factoring the characteristic polynomial (and refuse past
     * {@link SymbolicLimits#maxDigits()} with {@link ErrorKey#RESULT_TOO_LARGE}): for the caller's size guard, which
     * refuses past the same limit with this bound, so that the late check never fires. The bound is never below the
     * late figure (the argument is in {@code DigitBound}); on the test chains it is 2 to 5 times the late figure.
     *
     * @param model a discrete-time model
     * @param at    values for some parameters (may be empty)
     * @return the bound, or empty if a parameter stays free (then no digit check applies)
     * @throws QchainException as {@link #estimate}
     */
    public static java.util.OptionalLong digitBound(Model model, Map<String, Rational> at) {
        RatFunMatrix p = matrix(model, at, null);
        return p.occurringVariables().isEmpty() ? java.util.OptionalLong.of(DigitBound.of(p))
            : java.util.OptionalLong.empty();
    }

    /**
     * Asserts that the caller's guard ran: a matrix whose powers up to P^s (all that the method multiplies out)
     * are estimated past the limit is a programming error here, refused first by {@link #estimate}.
     */
    private static RatFunMatrix guarded(RatFunMatrix p, List<String> states, SymbolicLimits limits) {
        int s = p.size();
        if (states.size() != s) {
            throw new IllegalArgumentException(states.size() + " state names for a " + s + "x" + s + " matrix");
        }
        PowerEstimate e = p.estimatePower(s);
        if (e.totalTerms() > limits.maxTerms()) {
            throw new IllegalStateException("P^" + s + " is past the size limit: the size guard"
                + " (ClosedForms.estimate(...).requireTermsWithin) must refuse it before the engine runs");
        }
        return p;
    }
}
