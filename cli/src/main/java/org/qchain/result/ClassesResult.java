package org.qchain.result;

import java.util.List;
import java.util.Optional;

/**
 * The communicating classes of a chain ({@code classes}). For free parameters, the structure for generic values
 * inside the domains, with the parameter values that change it.
 *
 * @param source        the model file name as given
 * @param states        all states, in model order
 * @param parameters    the free parameters of a symbolic chain; empty for a numeric one
 * @param classes       the classes, in the order of their first state
 * @param absorbing     absorbing states
 * @param transients    states of classes that are not closed
 * @param specialValues parameter values inside or on the edge of the domains that change the structure
 * @param graph         the one-step matrix (the edges of the graph), {@code graph.get(i).get(j)} for i to j
 * @param warnings      warnings
 * @param at the parameter values used and where they came from (nominal or {@code --at}); absent for a model
 *           without parameters and on the symbolic route
 * @param continuous    whether the chain is a continuous-time one (the graph then holds its rates)
 * @param brief the one-step graph (or rate) table was left out on request ({@code --brief})
 */
public record ClassesResult(String source, List<String> states, List<String> parameters, List<ChainClass> classes,
                            List<String> absorbing, List<String> transients, List<SpecialValue> specialValues,
                            List<List<Formula>> graph, List<String> warnings,
    Optional<Point> at, boolean continuous, boolean brief)
    implements Result {
    /** Copies the lists. */
    public ClassesResult {
        states = List.copyOf(states);
        parameters = List.copyOf(parameters);
        classes = List.copyOf(classes);
        absorbing = List.copyOf(absorbing);
        transients = List.copyOf(transients);
        specialValues = List.copyOf(specialValues);
        graph = graph.stream().map(List::copyOf).toList();
        warnings = List.copyOf(warnings);
    }

    /** A discrete chain's structure (the components as above, {@code continuous} false). */
    public ClassesResult(String source, List<String> states, List<String> parameters, List<ChainClass> classes,
                         List<String> absorbing, List<String> transients, List<SpecialValue> specialValues,
                         List<List<Formula>> graph, List<String> warnings) {
        this(source, states, parameters, classes, absorbing, transients, specialValues, graph, warnings, Optional.empty(), false, false);
    }

    /**
     * One communicating class.
     *
     * @param states its states, in model order
     * @param closed whether no transition leaves it (recurrent)
     * @param period the gcd of its cycle lengths; 0 when no return is possible (one state without a self-loop)
     */
    public record ChainClass(List<String> states, boolean closed, int period) {
        /** Copies the list. */
        public ChainClass {
            states = List.copyOf(states);
        }
    }

    /**
     * A parameter value at which the structure differs from the generic one.
     *
     * @param condition where: {@code p = 0}, or a polynomial's zero set {@code p - r = 0}; {@link Condition#proved()}
     *                  says whether it is shown to be met inside (or on the edge of) the parameters' domains (false: a
     *                  polynomial whose zeros inside the domains were not decided)
     * @param effect    what changes there
     */
    public record SpecialValue(Condition condition, Effect effect) {
    }

    /**
     * How the structure at a special value differs from the generic one.
     *
     * @param absorbing the states that become absorbing (can no longer leave), in model order
     * @param classes   the communicating classes there, when they differ from the generic ones or no state becomes
     *                  absorbing; empty otherwise
     */
    public record Effect(List<String> absorbing, java.util.Optional<List<ChainClass>> classes) {
        /** Copies the lists. */
        public Effect {
            absorbing = List.copyOf(absorbing);
            classes = classes.map(List::copyOf);
        }
    }
}
