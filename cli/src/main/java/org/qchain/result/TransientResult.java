package org.qchain.result;

import java.util.List;
import java.util.Optional;
import org.qchain.exact.Rational;
import org.qchain.exact.certified.CertifiedDecimal;

/**
 * Transition probabilities {@code P(t) = exp(Qt)} of a continuous chain at rational times, as certified decimals:
 * every printed digit is proven, and the widest enclosure is the bound.
 *
 * @param source   the model file name as the user gave it
 * @param states   state names, the order of rows and columns
 * @param from     the starting state if only its row is given
 * @param times    one entry per time asked for, in order
 * @param digits   significant digits of every value
 * @param warnings warnings for the user
 */
public record TransientResult(String source, List<String> states, Optional<String> from, List<AtTime> times,
                              int digits, List<String> warnings) implements Result {
    /** Copies the lists. */
    public TransientResult {
        states = List.copyOf(states);
        times = List.copyOf(times);
        warnings = List.copyOf(warnings);
    }

    /**
     * {@code P(t)} at one time.
     *
     * @param t       the time
     * @param rows    the rows shown (all of them, or the one of {@code from}), each entry certified
     * @param bound   the widest enclosure of any entry: each true value lies within this of its printed decimal's
     *                enclosure, and the decimals are correctly rounded
     * @param uniformizationRate the rate {@code Λ = max |q_ii|} used
     */
    public record AtTime(Rational t, List<List<CertifiedDecimal>> rows, Rational bound, Rational uniformizationRate) {
        /** Copies the lists. */
        public AtTime {
            rows = rows.stream().map(List::copyOf).toList();
        }
    }
}
