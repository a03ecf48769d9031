package org.qchain.exact;

import java.util.List;

/**
 * A path through a chain with its exact probability.
 *
 * @param states      the states visited, 0-based, first to last; a path of {@code n} steps has {@code n + 1} states
 * @param probability the product of the one-step probabilities along the path
 */
public record WeightedPath(List<Integer> states, Rational probability) {
    /**
     * A path (the list is copied and must not contain {@code null}).
     *
     * @param states      the states visited
     * @param probability its probability
     */
    public WeightedPath {
        states = List.copyOf(states);
        java.util.Objects.requireNonNull(probability, "probability");
    }
}
