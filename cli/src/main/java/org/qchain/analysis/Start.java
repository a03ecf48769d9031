package org.qchain.analysis;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;

/**
 * Where a chain starts: one state, or a distribution over states given exactly ({@code Healthy=3/5, Ill=2/5}).
 *
 * @param weights the starting probability of each named state, in the order given; states not named start with 0
 * @param option  the option that gave it ({@code --start} or {@code --from}), for messages
 */
public record Start(Map<String, Rational> weights, String option) {
    /** Copies the map, keeping its order. */
    public Start {
        weights = Collections.unmodifiableMap(new LinkedHashMap<>(weights));
        if (weights.isEmpty()) {
            throw new IllegalArgumentException("a start needs at least one state");
        }
    }

    /**
     * The chain starts in {@code state}.
     *
     * @param state  the state
     * @param option the option that named it
     * @return the start
     */
    public static Start state(String state, String option) {
        return new Start(Map.of(state, Rational.ONE), option);
    }

    /**
     * Reads {@code --start} values: one state name ({@code Healthy}), or one {@code STATE=PROBABILITY} per state
     * ({@code Healthy=3/5}, {@code Ill=2/5}; fractions and decimals read exactly) whose probabilities sum to exactly 1.
     *
     * @param texts  the values, one per occurrence of the option
     * @param option the option's name, for messages
     * @return the start
     * @throws QchainException {@link ErrorKey#BAD_ARGUMENT} naming the option for a malformed value, a probability
     *                         outside [0, 1], a state named twice, a bare state mixed with a distribution, or
     *                         probabilities that do not sum to 1 (with their sum)
     */
    public static Start parse(List<String> texts, String option) {
        String all = String.join(" ", texts);
        if (texts.isEmpty()) {
            throw new IllegalArgumentException("no start given");
        }
        boolean bare = texts.stream().anyMatch(t -> t.indexOf('=') < 0);
        if (bare) {
            if (texts.size() > 1) {
                throw new QchainException(ErrorKey.BAD_ARGUMENT, option, all, "give one state (" + option
                    + " Healthy) or one " + option + " STATE=PROBABILITY per state, summing to 1 (" + option
                    + " Healthy=3/5 " + option + " Ill=2/5)");
            }
            String s = texts.get(0).strip();
            if (s.isEmpty()) {
                throw new QchainException(ErrorKey.BAD_ARGUMENT, option, texts.get(0), "no state named");
            }
            return state(s, option);
        }
        Map<String, Rational> w = new LinkedHashMap<>();
        Rational sum = Rational.ZERO;
        for (String t : texts) {
            int eq = t.indexOf('=');
            String name = t.substring(0, eq).strip();
            String value = t.substring(eq + 1).strip();
            if (name.isEmpty()) {
                throw new QchainException(ErrorKey.BAD_ARGUMENT, option, t, "no state before '='; write STATE=PROBABILITY");
            }
            Rational r;
            try {
                r = Rational.parse(value);
            } catch (RuntimeException e) {
                throw new QchainException(ErrorKey.BAD_ARGUMENT, option, t, "'" + value + "' is not a probability;"
                    + " write a fraction such as 3/5 or a decimal such as 0.6");
            }
            if (r.signum() < 0 || r.compareTo(Rational.ONE) > 0) {
                throw new QchainException(ErrorKey.BAD_ARGUMENT, option, t, "a probability lies in [0, 1]");
            }
            if (w.put(name, r) != null) {
                throw new QchainException(ErrorKey.BAD_ARGUMENT, option, all, "state " + name + " is given twice");
            }
            sum = sum.add(r);
        }
        if (!sum.isOne()) {
            throw new QchainException(ErrorKey.BAD_ARGUMENT, option, all, "the probabilities sum to " + sum
                + ", not exactly 1");
        }
        return new Start(w, option);
    }

    /** The one state the chain starts in, if it starts in one state with certainty. */
    public Optional<String> single() {
        if (weights.size() == 1) {
            return Optional.of(weights.keySet().iterator().next());
        }
        List<String> sure = new ArrayList<>();
        weights.forEach((k, v) -> {
            if (v.isOne()) {
                sure.add(k);
            }
        });
        return sure.size() == 1 ? Optional.of(sure.get(0)) : Optional.empty();
    }

    /** {@code Healthy}, or {@code Healthy=3/5, Ill=2/5}. */
    public String text() {
        Optional<String> one = single();
        if (one.isPresent()) {
            return one.get();
        }
        List<String> parts = new ArrayList<>();
        weights.forEach((k, v) -> parts.add(k + "=" + v));
        return String.join(", ", parts);
    }
}
