package org.qchain.symbolic.sensitivity;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.qchain.exact.ErrorKey;
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
        List<SweepRow> rows = new ArrayList<>(range.size());
        for (int k = 0; k < range.size(); k++) {
            Map<String, Rational> pt = new LinkedHashMap<>(base);
            Rational x = range.point(k);
            pt.put(range.parameter(), x);
            rows.add(new SweepRow(x, probability.evaluate(pt), derivative.evaluate(pt)));
        }
        return rows;
    }
}
