package org.qchain.analysis;

import java.util.List;
import java.util.Optional;
import org.qchain.exact.Rational;
import org.qchain.exact.certified.CertifiedPowers;

/**
 * Transition probabilities {@code P(t)} of a continuous chain at rational times, as certified decimals.
 *
 * @param times   the times, each {@code >= 0}, at least one
 * @param from    the starting state, for one row
 * @param digits  significant digits, at least 1
 * @param maxBits the largest working precision, in bits
 * @param maxWork refuse a computation estimated to need more fixed-point multiplications than this (the estimate is
 *                made before any work)
 */
public record TransientQuery(List<Rational> times, Optional<String> from, int digits, int maxBits, long maxWork)
    implements Query {
    /**
     * Checks the ranges.
     *
     * @throws IllegalArgumentException for no time, a negative time or digits below 1
     */
    public TransientQuery {
        times = List.copyOf(times);
        if (times.isEmpty() || times.stream().anyMatch(t -> t.signum() < 0)) {
            throw new IllegalArgumentException("need at least one time, none negative");
        }
        if (digits < 1) {
            throw new IllegalArgumentException("digits must be at least 1");
        }
        if (maxWork < 1) {
            throw new IllegalArgumentException("the work limit must be at least 1");
        }
    }

    /**
     * A query with the default work limit.
     *
     * @param times   the times
     * @param from    the starting state, for one row
     * @param digits  significant digits
     * @param maxBits the largest working precision
     */
    public TransientQuery(List<Rational> times, Optional<String> from, int digits, int maxBits) {
        this(times, from, digits, maxBits, CertifiedPowers.DEFAULT_MAX_WORK);
    }

    /** The whole matrix at the given times, 12 digits, the default precision limit. */
    public static TransientQuery matrix(List<Rational> times) {
        return new TransientQuery(times, Optional.empty(), 12, CertifiedPowers.DEFAULT_MAX_BITS);
    }
}
