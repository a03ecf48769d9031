package org.qchain.analysis;

import java.util.List;
import java.util.Optional;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;

/**
 * A discrete chain made from a continuous one, ready to be written as a model file that every discrete command
 * reads.
 *
 * @param source the continuous model's file name
 * @param query  what was made
 * @param rate   the uniformization rate used (empty for the jump chain)
 * @param states the state names
 * @param up     the operating states, if the model marks them
 * @param matrix the transition matrix
 */
public record ConvertedModel(String source, ConvertQuery query, Optional<Rational> rate, List<String> states,
                             Optional<List<String>> up, RationalMatrix matrix) {
    /** Copies the lists. */
    public ConvertedModel {
        states = List.copyOf(states);
        up = up.map(List::copyOf);
    }

    /**
     * The model file: a comment saying what it is (with the caution), {@code chain discrete}, the states, the
     * {@code up} line if any, and one line per off-diagonal transition with an exact probability (the diagonal is
     * the row's remainder).
     *
     * @param caution the caution sentence
     * @return the text, ending with a line break
     */
    public String text(String caution) {
        StringBuilder sb = new StringBuilder();
        if (query.target() == ConvertQuery.Target.JUMP) {
            sb.append("# The embedded jump chain of ").append(source)
                .append(": one step per transition of the continuous chain;\n# states without rates out are absorbing.\n");
        } else {
            sb.append("# The uniformized chain of ").append(source).append(" at rate ").append(rate.orElseThrow())
                .append(": P = I + Q/(").append(rate.orElseThrow()).append(")")
                .append(";\n# step n of this chain is the state after the n-th tick of a Poisson clock of that rate.\n");
        }
        sb.append("# Written by qchain convert. ").append(caution).append('\n');
        sb.append("chain discrete\n");
        sb.append("states ").append(String.join(" ", states)).append('\n');
        up.ifPresent(u -> sb.append("up ").append(String.join(" ", u)).append('\n'));
        for (int i = 0; i < states.size(); i++) {
            for (int j = 0; j < states.size(); j++) {
                if (i != j && !matrix.get(i, j).isZero()) {
                    sb.append(states.get(i)).append(' ').append(states.get(j)).append(' ').append(matrix.get(i, j))
                        .append('\n');
                }
            }
        }
        return sb.toString();
    }
}
