package org.qchain.cli.result;

import java.util.List;
import java.util.Optional;

/**
 * What {@code qchain step} (and {@code check}) computed, ready for a formatter. Formatters never compute; they lay
 * out one of these shapes.
 */
public sealed interface StepResult permits StepResult.Matrix, StepResult.Row, StepResult.Single {

    /** What the result is about: model name, chain kind, number of steps, decimal precision, warnings. */
    Header header();

    /**
     * The common part of every result.
     *
     * @param source   the model file name as the user gave it
     * @param kind     the chain kind word ({@code discrete})
     * @param n        the number of steps
     * @param digits   significant digits of the decimals
     * @param warnings warnings for the user (also printed on stderr)
     */
    record Header(String source, String kind, long n, int digits, List<String> warnings) {
        /** Copies the warnings. */
        public Header {
            warnings = List.copyOf(warnings);
        }
    }

    /**
     * The full matrix P^n.
     *
     * @param header  the common part
     * @param states  state names, the order of rows and columns
     * @param entries {@code entries.get(i).get(j)} is P^n(i, j)
     */
    record Matrix(Header header, List<String> states, List<List<Entry>> entries) implements StepResult {
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
    record Row(Header header, String from, List<String> states, List<Entry> entries) implements StepResult {
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
     * @param paths  the most probable paths, best first; absent when not asked for ({@code --paths})
     */
    record Single(Header header, String from, String to, Entry value, Optional<List<PathLine>> paths)
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
     * @param probability its exact probability and decimal
     * @param share       its share of the total P^n(from, to), exact and as a decimal percentage (without the
     *                    {@code %} sign)
     */
    record PathLine(List<String> states, Entry probability, Entry share) {
        /** Copies the list. */
        public PathLine {
            states = List.copyOf(states);
        }
    }
}
