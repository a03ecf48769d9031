package org.qchain.analysis;

import java.nio.file.Path;
import java.util.Arrays;
import java.util.Optional;
import java.util.OptionalLong;
import org.qchain.exact.Rational;
import org.qchain.exact.SizeEstimate;
import org.qchain.exact.reference.Tolerance;

/**
 * A check of another tool's floating-point results against the exact ones: which quantity, from which file, with
 * which tolerance.
 *
 * @param against     the file of float results
 * @param againstName the file name as the user gave it, for messages
 * @param what        the quantity the file holds
 * @param n           the number of steps, for {@link What#MATRIX}, {@link What#ROW} and {@link What#ENTRY}
 * @param from        the starting state of a row or an entry
 * @param to          the final state of an entry
 * @param tolerance   when a value passes
 * @param show        how many of the worst entries the result lists, at least 0
 * @param maxDigits   refuse exact values estimated to have more digits in total
 * @param t           the time of a continuous chain, for P(t) (then {@link #n} is empty)
 */
public record VerifyQuery(Path against, String againstName, What what, OptionalLong n, Optional<String> from,
                          Optional<String> to, Tolerance tolerance, int show, long maxDigits, Optional<Rational> t)
    implements Query {
    /** How many of the worst entries are listed by default. */
    public static final int DEFAULT_SHOW = 10;

    /** The quantities a file can hold. */
    public enum What {
        /** P^n, the whole matrix. */
        MATRIX("matrix"),
        /** One row of P^n. */
        ROW("row"),
        /** One entry of P^n. */
        ENTRY("entry"),
        /** The stationary law. */
        STATIONARY("stationary"),
        /** Absorption probabilities. */
        ABSORPTION("absorption"),
        /** Expected steps before absorption. */
        EXPECTED_STEPS("expected-steps"),
        /** Long-run availability. */
        AVAILABILITY("availability"),
        /** Mean time to failure. */
        MTTF("mttf");

        private final String word;

        What(String word) {
            this.word = word;
        }

        /** The word of {@code --what}. */
        public String word() {
            return word;
        }

        /** The quantity of a word, ignoring case. */
        public static Optional<What> of(String word) {
            return Arrays.stream(values()).filter(w -> w.word.equalsIgnoreCase(word.strip())).findFirst();
        }
    }

    /**
     * Checks the shape.
     *
     * @throws IllegalArgumentException for a negative {@code show}, an entry without both states, a row without its
     *                                  state, a power without n
     */
    public VerifyQuery {
        if (show < 0) {
            throw new IllegalArgumentException("show must not be negative: " + show);
        }
        if (what == What.ROW && from.isEmpty()) {
            throw new IllegalArgumentException("a row needs its starting state");
        }
        if (what == What.ENTRY && (from.isEmpty() || to.isEmpty())) {
            throw new IllegalArgumentException("an entry needs its two states");
        }
        if ((what == What.MATRIX || what == What.ROW || what == What.ENTRY) && n.isEmpty() && t.isEmpty()) {
            throw new IllegalArgumentException(what.word() + " needs the number of steps or the time");
        }
    }

    /** A query without a time (P^n or a long-run figure). */
    public VerifyQuery(Path against, String againstName, What what, OptionalLong n, Optional<String> from,
                       Optional<String> to, Tolerance tolerance, int show, long maxDigits) {
        this(against, againstName, what, n, from, to, tolerance, show, maxDigits, Optional.empty());
    }

    /**
     * P^n (or its row, or its entry, as {@code from} and {@code to} are given) checked at the default tolerance
     * ({@code 1e-9} relative) and limits.
     *
     * @param against the file
     * @param n       steps
     * @param from    starting state, for a row or an entry
     * @param to      final state, for an entry
     * @return the query
     */
    public static VerifyQuery power(Path against, long n, Optional<String> from, Optional<String> to) {
        What w = to.isPresent() ? What.ENTRY : from.isPresent() ? What.ROW : What.MATRIX;
        return new VerifyQuery(against, against.toString(), w, OptionalLong.of(n), from, to,
            Tolerance.orDefault(Optional.empty(), Optional.empty(), OptionalLong.empty()), DEFAULT_SHOW,
            SizeEstimate.DEFAULT_MAX_DIGITS);
    }

    /** This query with another tolerance. */
    public VerifyQuery withTolerance(Tolerance t) {
        return new VerifyQuery(against, againstName, what, n, from, to, t, show, maxDigits, this.t);
    }
}
