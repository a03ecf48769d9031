package org.qchain.symbolic.sensitivity;

import java.util.function.LongConsumer;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.model.Model;
import org.qchain.exact.model.ParamDecl;
import org.qchain.symbolic.RatFun;
import org.qchain.symbolic.RatFunMatrix;
import org.qchain.symbolic.SymbolicLimits;
import org.qchain.symbolic.check.ParamPoints;

/** Sensitivity of n-step probabilities to a parameter: exact derivative formulas, values, elasticities, sweeps. */
public final class Sensitivity {
    private Sensitivity() {
    }

    /**
     * {@code P^n_ij} and {@code dP^n_ij/dp} as formulas. Only row {@code from} of {@code P^n} is computed.
     *
     * @param p        the one-step matrix
     * @param n        the number of steps, at least 0
     * @param from     row index
     * @param to       column index
     * @param wrt      the parameter
     * @param limits   the size limit of the row of the power, which the caller's guard checks first
     *                 ({@code p.estimatePower(n).row(p.size()).requireWithin(limits)})
     * @param progress told the number of products done
     * @return the formulas
     * @throws QchainException {@link ErrorKey#UNKNOWN_PARAMETER} if {@code wrt} is not a parameter of the ring
     * @throws IllegalStateException past the limit (the guard did not run)
     */
    public static EntrySensitivity of(RatFunMatrix p, long n, int from, int to, String wrt, SymbolicLimits limits,
                                      LongConsumer progress) {
        if (p.ring().indexOf(wrt).isEmpty()) {
            throw new QchainException(ErrorKey.UNKNOWN_PARAMETER, wrt);
        }
        java.util.Objects.checkIndex(to, p.size());
        RatFun v = p.powerRow(from, n, limits, progress).get(to);
        return new EntrySensitivity(n, from, to, wrt, v, v.derivative(wrt));
    }

    /**
     * Checks a sweep against the model: the parameter must be declared and the range must lie in the closure of its
     * domain (end points of an open domain are allowed and give the formula's value there, its limit from inside).
     *
     * @param model the model
     * @param range the range
     * @throws QchainException {@link ErrorKey#UNKNOWN_PARAMETER} or {@link ErrorKey#VALUE_OUTSIDE_DOMAIN}
     */
    public static void checkSweep(Model model, SweepRange range) {
        ParamDecl d = model.param(range.parameter())
            .orElseThrow(() -> new QchainException(ErrorKey.UNKNOWN_PARAMETER, range.parameter()));
        for (Rational x : new Rational[] {range.start(), range.point(range.size() - 1)}) {
            if (!ParamPoints.inClosure(d.domain(), x)) {
                throw new QchainException(ErrorKey.VALUE_OUTSIDE_DOMAIN, range.parameter(), x, d.domain());
            }
        }
    }
}
