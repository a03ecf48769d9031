package org.qchain.result;

import java.util.List;
import java.util.Optional;

/**
 * Where the chain settles ({@code longrun}): the stationary law of each closed class, the probability of ending in
 * each closed class from each transient state, and the full limit of P^n (of its Cesàro averages when a closed class
 * is periodic); on request mean first-passage times.
 *
 * @param source     the model file name as given
 * @param states     all states, in model order
 * @param parameters free parameters the formulas use; empty for exact numbers
 * @param classes    each class with its law
 * @param absorption for each transient state, the probability of ending in each closed class (by class index)
 * @param limit      the limit matrix, rows and columns in model order
 * @param cesaro     whether {@code limit} is the limit of the Cesàro averages (a closed class is periodic)
 * @param passage    mean first-passage times m_ij (m_ii the mean recurrence time), if asked
 * @param warnings   warnings
 * @param at the parameter values used and where they came from (nominal or {@code --at}); absent for a model
 *           without parameters and on the symbolic route
 * @param continuous whether the chain is a continuous-time one (the limit is that of P(t); times in its unit)
 * @param brief the limit matrix was left out on request ({@code --brief})
 */
public record LongRunResult(String source, List<String> states, List<String> parameters, List<ClassLaw> classes,
                            List<Absorption> absorption, List<List<Formula>> limit, boolean cesaro,
                            Optional<List<List<Formula>>> passage, List<String> warnings,
    Optional<Point> at, boolean continuous, boolean brief)
    implements Result {
    /** Copies the lists. */
    public LongRunResult {
        states = List.copyOf(states);
        parameters = List.copyOf(parameters);
        classes = List.copyOf(classes);
        absorption = List.copyOf(absorption);
        limit = limit.stream().map(List::copyOf).toList();
        passage = passage.map(m -> m.stream().map(List::copyOf).toList());
        warnings = List.copyOf(warnings);
    }

    /** A discrete chain's long run (the components as above, {@code continuous} false). */
    public LongRunResult(String source, List<String> states, List<String> parameters, List<ClassLaw> classes,
                         List<Absorption> absorption, List<List<Formula>> limit, boolean cesaro,
                         Optional<List<List<Formula>>> passage, List<String> warnings) {
        this(source, states, parameters, classes, absorption, limit, cesaro, passage, warnings, Optional.empty(), false, false);
    }

    /**
     * A class with, if closed, its stationary law and mean recurrence times (same order as {@code states}).
     *
     * @param states         its states
     * @param closed         whether closed
     * @param period         its period (0: no return possible)
     * @param stationary     the stationary law on its states; empty for a transient class
     * @param meanRecurrence 1/π_i on its states; empty for a transient class
     */
    public record ClassLaw(List<String> states, boolean closed, int period, List<Formula> stationary,
                           List<Formula> meanRecurrence) {
        /** Copies the lists. */
        public ClassLaw {
            states = List.copyOf(states);
            stationary = List.copyOf(stationary);
            meanRecurrence = List.copyOf(meanRecurrence);
        }
    }

    /**
     * From one transient state, the probability of ending in each closed class.
     *
     * @param state         the transient state
     * @param classes       indices into {@link #classes()} of the closed classes
     * @param probabilities the probabilities, same order
     */
    public record Absorption(String state, List<Integer> classes, List<Formula> probabilities) {
        /** Copies the lists. */
        public Absorption {
            classes = List.copyOf(classes);
            probabilities = List.copyOf(probabilities);
        }
    }
}
