package org.qchain.result;

import java.util.List;
import java.util.Optional;

/**
 * Absorption ({@code absorb}): the fundamental matrix, expected steps and their variance, absorption probabilities;
 * with rewards the accumulated, long-run average and discounted rewards; on request the first-passage time
 * distribution into the absorbing set.
 *
 * @param source        the model file name as given
 * @param parameters    free parameters the formulas use
 * @param transients    the non-absorbing states (rows of every table)
 * @param absorbing     the absorbing states (given by the model or made absorbing)
 * @param made          the states made absorbing on request
 * @param fundamental   N = (I − Q)^−1, transient by transient
 * @param expectedSteps t = N·1, per transient state
 * @param variance      the variance of the number of steps, per transient state
 * @param probabilities B = N R, transient by absorbing
 * @param rewards       reward results, if rewards were given
 * @param passage       the first-passage distribution, if asked
 * @param from          the one starting state to print, if chosen
 * @param warnings      warnings
 * @param at the parameter values used and where they came from (nominal or {@code --at}); absent for a model
 *           without parameters and on the symbolic route
 * @param continuous    whether the chain is a continuous-time one: N holds expected times in each state, the
 *                      expected steps are expected times to absorption (in the model's time unit)
 * @param brief the fundamental matrix N was left out on request ({@code --brief})
 */
public record AbsorbResult(String source, List<String> parameters, List<String> transients, List<String> absorbing,
                           List<String> made, List<List<Formula>> fundamental, List<Formula> expectedSteps,
                           List<Formula> variance, List<List<Formula>> probabilities, Optional<Rewards> rewards,
                           Optional<Passage> passage, Optional<String> from, List<String> warnings,
                           Optional<Point> at, boolean continuous, boolean brief) implements Result {
    /** Copies the lists. */
    public AbsorbResult {
        parameters = List.copyOf(parameters);
        transients = List.copyOf(transients);
        absorbing = List.copyOf(absorbing);
        made = List.copyOf(made);
        fundamental = fundamental.stream().map(List::copyOf).toList();
        expectedSteps = List.copyOf(expectedSteps);
        variance = List.copyOf(variance);
        probabilities = probabilities.stream().map(List::copyOf).toList();
        warnings = List.copyOf(warnings);
    }

    /** A discrete chain's absorption (the components as above, {@code continuous} false). */
    public AbsorbResult(String source, List<String> parameters, List<String> transients, List<String> absorbing,
                        List<String> made, List<List<Formula>> fundamental, List<Formula> expectedSteps,
                        List<Formula> variance, List<List<Formula>> probabilities, Optional<Rewards> rewards,
                        Optional<Passage> passage, Optional<String> from, List<String> warnings) {
        this(source, parameters, transients, absorbing, made, fundamental, expectedSteps, variance, probabilities,
            rewards, passage, from, warnings, Optional.empty(), false, false);
    }

    /**
     * Rewards.
     *
     * @param states      all states (columns of {@code longRunAverage} and {@code discounted})
     * @param perStep     the reward per step in each state
     * @param accumulated expected reward until absorption, per transient state
     * @param longRun     long-run average reward per step, per state
     * @param discount    the discount factor, if given
     * @param discounted  expected discounted reward, per state (empty without a discount)
     */
    public record Rewards(List<String> states, List<Formula> perStep, List<Formula> accumulated,
                          List<Formula> longRun, Optional<Formula> discount, List<Formula> discounted) {
        /** Copies the lists. */
        public Rewards {
            states = List.copyOf(states);
            perStep = List.copyOf(perStep);
            accumulated = List.copyOf(accumulated);
            longRun = List.copyOf(longRun);
            discounted = List.copyOf(discounted);
        }
    }

    /**
     * The first-passage time into the absorbing set, T = min{k >= 1 : X_k absorbing}.
     *
     * @param states  the start states (all states)
     * @param exactly P(T = k) for k = 1..steps, per start state
     * @param within  P(T <= k), per start state
     */
    public record Passage(List<String> states, List<List<Formula>> exactly, List<List<Formula>> within) {
        /** Copies the lists. */
        public Passage {
            states = List.copyOf(states);
            exactly = exactly.stream().map(List::copyOf).toList();
            within = within.stream().map(List::copyOf).toList();
        }
    }
}
