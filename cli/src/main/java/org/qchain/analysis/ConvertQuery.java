package org.qchain.analysis;

import java.util.Optional;
import org.qchain.exact.Rational;

/**
 * A continuous chain turned into a discrete one, written as a model file.
 *
 * @param target jump (the embedded jump chain) or uniformized ({@code I + Q/rate})
 * @param rate   the uniformization rate; empty for the largest total rate out of a state
 */
public record ConvertQuery(Target target, Optional<Rational> rate) {
    /** The discrete chain to write. */
    public enum Target {
        /** The embedded jump chain: where the chain goes next, {@code q_ij / q_i}. */
        JUMP,
        /** The uniformized chain {@code I + Q/rate}: steps at the events of a Poisson clock of that rate. */
        UNIFORMIZED
    }

    /**
     * Checks the combination.
     *
     * @throws IllegalArgumentException for a rate with the jump chain or a rate that is not positive
     */
    public ConvertQuery {
        if (rate.isPresent() && (target == Target.JUMP || rate.get().signum() <= 0)) {
            throw new IllegalArgumentException("a positive rate, only for the uniformized chain");
        }
    }
}
