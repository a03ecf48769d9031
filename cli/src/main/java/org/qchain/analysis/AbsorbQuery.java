package org.qchain.analysis;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalInt;
import org.qchain.exact.Rational;

/**
 * Absorption: {@code absorb}.
 *
 * @param from      print only this starting state, if given
 * @param absorbing states to make absorbing (for the time to first reach them)
 * @param rewards   reward per step in each named state (others 0); empty for no rewards
 * @param discount  the discount factor v, 0 < v < 1, for the expected discounted reward
 * @param steps     N, for the first-passage distribution P(T = n), n = 1..N, and P(T <= n)
 * @param limits    size limits (as for {@code longrun})
 */
public record AbsorbQuery(Optional<String> from, List<String> absorbing, Map<String, Rational> rewards,
                          Optional<Rational> discount, OptionalInt steps, LongRunQuery limits)
    implements Query {
    /** Copies. */
    public AbsorbQuery {
        absorbing = List.copyOf(absorbing);
        rewards = Map.copyOf(rewards);
    }

    /** Absorption of the model's own absorbing states, every start state, no rewards. */
    public static AbsorbQuery plain() {
        return new AbsorbQuery(Optional.empty(), List.of(), Map.of(), Optional.empty(), OptionalInt.empty(),
            LongRunQuery.plain());
    }
}
