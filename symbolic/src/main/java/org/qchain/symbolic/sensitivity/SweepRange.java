package org.qchain.symbolic.sensitivity;

import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.model.ModelParser;
import org.qchain.exact.model.SweepSpec;

/**
 * A range of exact parameter values {@code start, start + step, ..., <= end}, written in the model file's interval
 * syntax ({@link ModelParser#parseSweep}): {@code p in [0, 1/10] by 1/100} or {@code p in [0, 1/10] with 11 points}
 * (eleven points each).
 *
 * @param parameter the parameter name
 * @param start     the first value
 * @param step      the increment, positive
 * @param end       the last value allowed (included when it is hit exactly), at least {@code start}
 */
public record SweepRange(String parameter, Rational start, Rational step, Rational end) {
    /** The largest number of points a sweep may have. */
    public static final int MAX_POINTS = 10_001;

    /**
     * Checks the range.
     *
     * @throws QchainException with {@link ErrorKey#SWEEP} for a step that is not positive, an end before the start,
     *                         or more than {@link #MAX_POINTS} points
     */
    public SweepRange {
        String text = parameter + " in [" + start + ", " + end + "] by " + step;
        if (step.signum() <= 0) {
            throw new QchainException(ErrorKey.SWEEP, text, "the step " + step + " must be positive");
        }
        if (end.compareTo(start) < 0) {
            throw new QchainException(ErrorKey.SWEEP, text, "the end " + end + " is before the start " + start);
        }
        long count = countPoints(start, step, end);
        if (count > MAX_POINTS) {
            throw new QchainException(ErrorKey.SWEEP, text,
                "it has " + (count == Long.MAX_VALUE ? "too many" : String.valueOf(count)) + " points, more than "
                    + MAX_POINTS);
        }
    }

    private static long countPoints(Rational start, Rational step, Rational end) {
        Rational k = end.subtract(start).divide(step);
        java.math.BigInteger fl = k.numerator().divide(k.denominator());
        return fl.bitLength() > 62 ? Long.MAX_VALUE : fl.longValueExact() + 1;
    }

    /**
     * Parses a sweep in the interval syntax, {@code p in [0, 1/10] by 1/100} or {@code p in [0, 1/10] with 11
     * points}; numbers as in model files ({@code 1/100}, {@code 0.01}). The points are counted before any is made.
     *
     * @param text the text
     * @return the range
     * @throws QchainException with {@link ErrorKey#SWEEP} for a bad range or more than {@link #MAX_POINTS}
     *                         points; the model parser's located errors for malformed text
     */
    public static SweepRange parse(String text) {
        SweepSpec s = ModelParser.parseSweep("--sweep", text);
        if (s.count() > MAX_POINTS) {
            throw new QchainException(ErrorKey.SWEEP, text.strip(), "it has "
                + (s.count() == Long.MAX_VALUE ? "too many" : String.valueOf(s.count())) + " points, more than "
                + MAX_POINTS);
        }
        // one point: any positive step gives start = end
        return new SweepRange(s.parameter(), s.first(), s.count() == 1 ? Rational.ONE : s.step(), s.last());
    }

    /** The number of points. */
    public int size() {
        return (int) countPoints(start, step, end);
    }

    /** The {@code k}-th point, {@code start + k * step}. */
    public Rational point(int k) {
        return start.add(step.multiply(Rational.of(k)));
    }

    /** {@code name in [start, end] by step}. */
    @Override
    public String toString() {
        return parameter + " in [" + start + ", " + end + "] by " + step;
    }
}
