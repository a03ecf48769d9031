package org.qchain.symbolic.sensitivity;

import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;

/**
 * A range of exact parameter values {@code start, start + step, ..., <= end}, written {@code p=start:step:end}
 * (for example {@code p=0:1/100:1/10}, eleven points).
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
        String text = parameter + "=" + start + ":" + step + ":" + end;
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
     * Parses {@code name=start:step:end}; numbers as in model files ({@code 1/100}, {@code 0.01}).
     *
     * @param text the text
     * @return the range
     * @throws QchainException with {@link ErrorKey#SWEEP} for malformed text or a bad range
     */
    public static SweepRange parse(String text) {
        int eq = text.indexOf('=');
        if (eq <= 0) {
            throw new QchainException(ErrorKey.SWEEP, text, "expected name=start:step:end, e.g. p=0:1/100:1/10");
        }
        String name = text.substring(0, eq).strip();
        String[] parts = text.substring(eq + 1).split(":", -1);
        if (parts.length != 3) {
            throw new QchainException(ErrorKey.SWEEP, text, "expected name=start:step:end, e.g. p=0:1/100:1/10");
        }
        Rational[] v = new Rational[3];
        for (int i = 0; i < 3; i++) {
            try {
                v[i] = Rational.parse(parts[i]);
            } catch (QchainException e) {
                throw new QchainException(ErrorKey.SWEEP, text, "'" + parts[i].strip() + "' is not a number");
            }
        }
        return new SweepRange(name, v[0], v[1], v[2]);
    }

    /** The number of points. */
    public int size() {
        return (int) countPoints(start, step, end);
    }

    /** The {@code k}-th point, {@code start + k * step}. */
    public Rational point(int k) {
        return start.add(step.multiply(Rational.of(k)));
    }

    /** {@code name=start:step:end}. */
    @Override
    public String toString() {
        return parameter + "=" + start + ":" + step + ":" + end;
    }
}
