package org.qchain.symbolic.sensitivity;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.Progress;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.symbolic.RatFun;

/**
 * The n-step probability {@code P^n_ij} as a formula in the parameters and its exact derivative with respect to one
 * parameter. Immutable; evaluate it at points with {@link #at(Map)} or over a range with {@link #sweep}.
 *
 * @param n           the number of steps
 * @param from        row index
 * @param to          column index
 * @param parameter   the parameter {@code p} of the derivative
 * @param probability {@code P^n_ij}, canonical
 * @param derivative  {@code dP^n_ij / dp}, canonical
 */
public record EntrySensitivity(long n, int from, int to, String parameter, RatFun probability, RatFun derivative) {

    /**
     * Value, derivative and elasticity at a point.
     *
     * @param point values for every parameter the formulas use
     * @return the exact values
     * @throws QchainException {@link ErrorKey#FREE_PARAMETERS} if a used parameter has no value,
     *                         {@link ErrorKey#DIVISION_BY_ZERO} if a denominator vanishes there
     */
    public PointSensitivity at(Map<String, Rational> point) {
        Rational v = probability.evaluate(point);
        Rational d = derivative.evaluate(point);
        Rational p = point.get(parameter);
        Optional<Rational> el = Optional.empty();
        if (p == null) {
            throw new QchainException(ErrorKey.FREE_PARAMETERS, parameter);
        }
        if (!v.isZero()) {
            el = Optional.of(p.divide(v).multiply(d));
        }
        return new PointSensitivity(point, v, d, el);
    }

    /**
     * Value and derivative over a range of the swept parameter, the others at {@code base}.
     *
     * @param range the range (its parameter need not be the derivative's)
     * @param base  values for the other parameters the formulas use
     * @return one row per point, in order
     * @throws QchainException as {@link #at(Map)}
     */
    public List<SweepRow> sweep(SweepRange range, Map<String, Rational> base) {
        return sweep(range, base, Long.MAX_VALUE, Progress.NONE);
    }

    /**
     * As {@link #sweep(SweepRange, Map)}, refused before any value is computed when the exact values are estimated
     * past a digit limit, with progress reports (phase {@code sweep}, one step per point) and an interrupt check
     * between points. The estimate: for each point a/b, the integer coefficients' digits plus the degrees times the
     * digits of a and b, for the value and the derivative.
     *
     * @param range     the range
     * @param base      values for the other parameters
     * @param maxDigits the largest allowed estimated number of digits of all exact values together
     * @param progress  receives the reports
     * @return one row per point
     * @throws QchainException with {@link ErrorKey#SWEEP_TOO_LARGE} past the limit, {@link ErrorKey#INTERRUPTED}
     *                         if the thread is interrupted, otherwise as {@link #at(Map)}
     */
    public List<SweepRow> sweep(SweepRange range, Map<String, Rational> base, long maxDigits, Progress progress) {
        String v = range.parameter();
        Map<String, Rational> others = new LinkedHashMap<>(base);
        others.remove(v);
        RatFun pf = others.isEmpty() ? probability : probability.substitute(others);
        RatFun df = others.isEmpty() ? derivative : derivative.substitute(others);
        UnivariateValues pv = UnivariateValues.of(pf, v);
        UnivariateValues dv = UnivariateValues.of(df, v);
        int size = range.size();
        long digits = 0;
        for (int k = 0; k < size; k++) {
            Rational x = range.point(k);
            digits = Math.addExact(digits, pv.digitsAt(x) + dv.digitsAt(x));
        }
        // the second line of defence: a caller's size guard refuses first with SweepEstimate, from the one-step
        // matrix, which is never below this figure (SweepEstimate gives the argument), so this does not fire there
        if (digits > maxDigits) {
            throw new QchainException(ErrorKey.SWEEP_TOO_LARGE, digits, size, maxDigits, "");
        }
        List<SweepRow> rows = new ArrayList<>(size);
        for (int k = 0; k < size; k++) {
            if (Thread.currentThread().isInterrupted()) {
                throw new QchainException(ErrorKey.INTERRUPTED);
            }
            progress.update("sweep", k, size);
            Rational x = range.point(k);
            Map<String, Rational> pt = new LinkedHashMap<>(base);
            pt.put(v, x);
            // a vanishing denominator: the general evaluation reports it with its own message
            Rational p = pv.at(x).orElseGet(() -> probability.evaluate(pt));
            Rational d = dv.at(x).orElseGet(() -> derivative.evaluate(pt));
            rows.add(new SweepRow(x, p, d));
        }
        return rows;
    }
}
