package org.qchain.result;

import java.util.List;

/** A validated model and its one-step matrix ({@code check}). */
public sealed interface CheckResult extends Result permits CheckResult.Numeric, CheckResult.Symbolic,
    CheckResult.Generator {

    /**
     * A model evaluated at numeric values: its one-step matrix, every row summing to exactly 1.
     *
     * @param matrix P^1 as a step result
     */
    record Numeric(StepResult.Matrix matrix) implements CheckResult {
        @Override
        public String source() {
            return matrix.source();
        }

        @Override
        public List<String> warnings() {
            return matrix.warnings();
        }
    }

    /**
     * A model checked with its parameters symbolic: rows sum to 1 identically; the conditions under which entries
     * lie in [0, 1] are the warnings.
     *
     * @param source     the model file name
     * @param kind       the chain kind word
     * @param states     the state names
     * @param parameters the parameters the entries use
     * @param entries    the one-step matrix as formulas
     * @param warnings   the conditions on the parameters, located
     */
    record Symbolic(String source, String kind, List<String> states, List<String> parameters,
                    List<List<Formula>> entries, List<String> warnings) implements CheckResult {
        /** Copies the lists. */
        public Symbolic {
            states = List.copyOf(states);
            parameters = List.copyOf(parameters);
            entries = entries.stream().map(List::copyOf).toList();
            warnings = List.copyOf(warnings);
        }
    }

    /**
     * A continuous chain checked: its generator Q (rows sum to 0; off-diagonal rates at least 0), the total rate out
     * of each state and its mean holding time, and the operating states when the model marks them. Exact values
     * ({@link ExactValue}) at a parameter point, or formulas in the parameters with the located conditions under
     * which the rates are at least 0.
     *
     * @param source     the model file name
     * @param states     the state names
     * @param parameters the parameters the formulas use (empty for exact values)
     * @param symbolic   whether the entries are formulas in the parameters
     * @param entries    the generator, by rows
     * @param exitRates  the total rate out of each state, q_i = -Q_ii
     * @param holding    the mean holding time 1/q_i of each state; empty for a state that is never left
     * @param up         the operating states, when the model has an {@code up} line
     * @param at         the parameter values used and where they came from (exact values of a model with
     *                   parameters)
     * @param warnings   the conditions on the parameters, located
     */
    record Generator(String source, List<String> states, List<String> parameters, boolean symbolic,
                     List<List<Formula>> entries, List<Formula> exitRates, List<java.util.Optional<Formula>> holding,
                     java.util.Optional<List<String>> up, java.util.Optional<Point> at, List<String> warnings)
        implements CheckResult {
        /** Copies the lists. */
        public Generator {
            states = List.copyOf(states);
            parameters = List.copyOf(parameters);
            entries = entries.stream().map(List::copyOf).toList();
            exitRates = List.copyOf(exitRates);
            holding = List.copyOf(holding);
            up = up.map(List::copyOf);
            warnings = List.copyOf(warnings);
        }

        /** The states that are not up (empty without an {@code up} line). */
        public List<String> down() {
            return up.map(u -> states.stream().filter(s -> !u.contains(s)).toList()).orElse(List.of());
        }
    }
}
