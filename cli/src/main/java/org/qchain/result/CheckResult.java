package org.qchain.result;

import java.util.List;

/** A validated model and its one-step matrix ({@code check}). */
public sealed interface CheckResult extends Result permits CheckResult.Numeric, CheckResult.Symbolic {

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
}
