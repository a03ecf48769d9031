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
 */
public record TransientQuery(List<Rational> times, Optional<String> from, int digits, int maxBits) implements Query {
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
    }

    /** The whole matrix at the given times, 12 digits, the default precision limit. */
    public static TransientQuery matrix(List<Rational> times) {
        return new TransientQuery(times, Optional.empty(), 12, CertifiedPowers.DEFAULT_MAX_BITS);
    }
}
