package org.qchain.result;

import java.util.List;
import java.util.Optional;
import org.qchain.exact.Rational;

/**
 * Exact n-step transition probabilities of a chain with numeric values ({@code step}, {@code check}, {@code demo}):
 * the whole matrix, one row or one entry with its most probable paths.
 */
public sealed interface StepResult extends Result permits StepResult.Matrix, StepResult.Row, StepResult.Single {

    /** What the result is about: model name, chain kind, number of steps, warnings. */
    Header header();

    @Override
    default String source() {
        return header().source();
    }

    @Override
    default List<String> warnings() {
        return header().warnings();
    }

    /**
     * The common part of every step result.
     *
     * @param source   the model file name as the user gave it
     * @param kind     the chain kind word ({@code discrete})
     * @param n        the number of steps
     * @param warnings warnings for the user
     * @param point    the parameter values used and where they came from (nominal or {@code --at}); absent for a
     *                 model without parameters
     */
    record Header(String source, String kind, long n, List<String> warnings, Optional<Point> point) {
        /** Copies the warnings. */
        public Header {
            warnings = List.copyOf(warnings);
        }

        /**
         * A header without parameter values (a model without parameters).
         *
         * @param source   the model file name
         * @param kind     the chain kind word
         * @param n        the number of steps
         * @param warnings warnings for the user
         */
        public Header(String source, String kind, long n, List<String> warnings) {
            this(source, kind, n, warnings, Optional.empty());
        }
    }

    /**
     * The full matrix P^n.
     *
     * @param header  the common part
     * @param states  state names, the order of rows and columns
     * @param entries {@code entries.get(i).get(j)} is P^n(i, j)
     */
    record Matrix(Header header, List<String> states, List<List<Rational>> entries) implements StepResult {
        /** Copies the lists. */
        public Matrix {
            states = List.copyOf(states);
            entries = entries.stream().map(List::copyOf).toList();
        }
    }

    /**
     * One row of P^n: the distribution after n steps from one state.
     *
     * @param header  the common part
     * @param from    the starting state
     * @param states  state names, the order of the entries
     * @param entries {@code entries.get(j)} is P^n(from, j)
     */
    record Row(Header header, String from, List<String> states, List<Rational> entries) implements StepResult {
        /** Copies the lists. */
        public Row {
            states = List.copyOf(states);
            entries = List.copyOf(entries);
        }
    }

    /**
     * One entry of P^n, optionally with its most probable paths.
     *
     * @param header the common part
     * @param from   the starting state
     * @param to     the state after n steps
     * @param value  P^n(from, to)
     * @param paths  the most probable paths, best first; absent when not asked for
     */
    record Single(Header header, String from, String to, Rational value, Optional<List<PathLine>> paths)
        implements StepResult {
        /** Copies the list. */
        public Single {
            paths = paths.map(List::copyOf);
        }
    }

    /**
     * One path of n steps.
     *
     * @param states      the states visited, n + 1 of them
     * @param probability its exact probability
     * @param share       its share of the total P^n(from, to), a fraction in [0, 1]
     */
    record PathLine(List<String> states, Rational probability, Rational share) {
        /** Copies the list. */
        public PathLine {
            states = List.copyOf(states);
        }
    }
}
