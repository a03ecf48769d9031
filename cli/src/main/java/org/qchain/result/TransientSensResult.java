package org.qchain.result;

import java.util.List;
import java.util.Optional;
import org.qchain.exact.Rational;
import org.qchain.exact.certified.CertifiedDecimal;

/**
 * The sensitivity of one transition probability {@code P(t)(from -> to)} of a continuous chain to a parameter of the
 * rates, at given times: the probability, its derivative and its elasticity as certified decimals.
 *
 * @param source   the model file name
 * @param from     the start state
 * @param to       the end state
 * @param wrt      the parameter
 * @param point    the parameter values used
 * @param rate     the uniformization rate
 * @param rows     one row per time, in the order given
 * @param digits   significant digits asked for
 * @param warnings warnings for the user
 */
public record TransientSensResult(String source, String from, String to, String wrt, Point point, Rational rate,
                                  List<Row> rows, int digits, List<String> warnings) implements Result {
    /** Copies the lists. */
    public TransientSensResult {
        rows = List.copyOf(rows);
        warnings = List.copyOf(warnings);
    }

    /**
     * One time.
     *
     * @param t          the time
     * @param value      {@code P(t)(from -> to)}
     * @param derivative its derivative with respect to {@code wrt}
     * @param elasticity {@code (wrt/P) dP/d(wrt)}; empty where {@code P} is exactly 0
     */
    public record Row(Rational t, CertifiedDecimal value, CertifiedDecimal derivative,
                      Optional<CertifiedDecimal> elasticity) {
    }
}
