package org.qchain.exact.model;

import java.math.BigInteger;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;

/**
 * Equally spaced exact values of one parameter, written in the model file's interval syntax:
 * {@code p in [0, 1/10] by 1/100} (every multiple of the step from the lower end that lies in the interval: eleven
 * points here) or {@code p in [0, 1/10] with 11 points} (that many points, equally spaced). An open end is left out:
 * {@code p in (0, 1/10] by 1/100} starts at 1/100, and {@code p in (0, 1) with 9 points} is 1/10, 2/10, ..., 9/10
 * (the spacing then divides the interval into {@code points + 1} parts). Read by {@link ModelParser#parseSweep}.
 *
 * @param parameter the parameter name
 * @param interval  the interval, with a finite upper end
 * @param first     the first point
 * @param step      the spacing, positive (or 0 for a single point)
 * @param count     the number of points, at least 1
 */
public record SweepSpec(String parameter, Domain interval, Rational first, Rational step, long count) {

    /** The last point: {@code first + (count - 1) * step}. */
    public Rational last() {
        return first.add(step.multiply(Rational.of(count - 1)));
    }

    /** The {@code k}-th point (from 0), {@code first + k * step}. */
    public Rational point(long k) {
        return first.add(step.multiply(Rational.of(k)));
    }

    /** The sweep as written in the interval syntax, with the step: {@code p in [0, 1/10] by 1/100}. */
    @Override
    public String toString() {
        return parameter + " in " + interval + " by " + step;
    }

    /**
     * The points {@code lower + k * step} (from {@code k = 1} if the lower end is open) inside the interval.
     *
     * @throws QchainException {@link ErrorKey#SWEEP} if the step is not positive or no point lies in the interval
     */
    static SweepSpec byStep(String text, String parameter, Domain d, Rational step) {
        if (step.signum() <= 0) {
            throw new QchainException(ErrorKey.SWEEP, text, "the step " + step + " must be positive");
        }
        Rational upper = d.upper().orElseThrow();
        Rational first = d.lowerClosed() ? d.lower() : d.lower().add(step);
        Rational span = upper.subtract(first);
        if (span.signum() < 0 || (span.signum() == 0 && !d.upperClosed())) {
            throw new QchainException(ErrorKey.SWEEP, text, "no multiple of the step " + step + " lies in " + d);
        }
        Rational q = span.divide(step);
        // floor(q) + 1 points, without the last one when it falls on an open upper end
        BigInteger fl = q.numerator().divide(q.denominator());
        long count = fl.bitLength() > 62 ? Long.MAX_VALUE : fl.longValueExact() + 1;
        if (q.isInteger() && !d.upperClosed()) {
            count--;
        }
        return new SweepSpec(parameter, d, first, step, count);
    }

    /**
     * {@code count} equally spaced points; an open end is not one of them.
     *
     * @throws QchainException {@link ErrorKey#SWEEP} for fewer than 1 point, or one point in an interval that is not
     *                         a single value
     */
    static SweepSpec withPoints(String text, String parameter, Domain d, long count) {
        Rational upper = d.upper().orElseThrow();
        Rational width = upper.subtract(d.lower());
        if (count < 1) {
            throw new QchainException(ErrorKey.SWEEP, text, "a sweep needs at least 1 point");
        }
        if (width.isZero()) {
            if (count != 1) {
                throw new QchainException(ErrorKey.SWEEP, text, d + " holds one value: write 'with 1 point'");
            }
            return new SweepSpec(parameter, d, d.lower(), Rational.ZERO, 1);
        }
        long open = (d.lowerClosed() ? 0 : 1) + (d.upperClosed() ? 0 : 1);
        if (count - 1 + open == 0) {
            throw new QchainException(ErrorKey.SWEEP, text, "one point cannot span " + d
                + ": give 2 points or more, or a single value with --at");
        }
        Rational step = width.divide(Rational.of(count - 1 + open));
        Rational first = d.lowerClosed() ? d.lower() : d.lower().add(step);
        return new SweepSpec(parameter, d, first, step, count);
    }

}
