package org.qchain.format;

import java.util.List;
import org.qchain.exact.Rational;
import org.qchain.result.DistributionResult;

/** What every format shares in laying out a {@link DistributionResult}: its columns, cells and descriptions. */
final class Distributions {
    private Distributions() {
    }

    /** The columns of one line: the states, or the one set of {@code to} states. */
    static List<String> columns(DistributionResult r) {
        return r.to().isEmpty() ? r.states() : List.of(r.toText());
    }

    /** The exact cells of a line, in the order of {@link #columns}. */
    static List<Rational> cells(DistributionResult r, DistributionResult.Line line) {
        return r.to().isEmpty() ? line.distribution() : List.of(line.total().orElseThrow());
    }

    /** {@code the distribution after 3 steps}, {@code the probability of being in {Up, Worn} after n steps}. */
    static String what(DistributionResult r, String steps) {
        return r.to().isEmpty() ? "probability of being in each state after " + steps
            : "probability of being in " + (r.to().size() == 1 ? r.to().get(0) : "one of " + r.toText())
                + " after " + steps;
    }

    /** {@code Distribution after 3 steps}, {@code Probability of {Up, Worn} over n}: a result's title. */
    static String title(DistributionResult r) {
        String when = r.series() ? "over n" : "after " + Text.steps(r.lines().get(0).n());
        return (r.to().isEmpty() ? "Distribution " : "Probability of " + r.toText() + " ") + when;
    }

    /** How the steps read in a sentence: {@code 3 steps}, or {@code n steps} for a series. */
    static String steps(DistributionResult r) {
        return r.series() ? "n steps" : Text.steps(r.lines().get(0).n());
    }

    /** {@code starting in Up}, or {@code starting from the distribution Healthy=3/5, Ill=2/5}. */
    static String start(DistributionResult r) {
        return r.from().isPresent() ? "starting in " + r.from().get()
            : "starting from the distribution " + r.startText();
    }

    /** {@code at w=1/20 (nominal values)}, or empty for a model without parameters. */
    static String point(DistributionResult r) {
        return r.point().map(p -> "at " + p.text() + " (" + p.origin() + ")").orElse("");
    }

    /** The start as one CSV field: {@code Up}, or {@code Healthy=3/5 Ill=2/5}. */
    static String startField(DistributionResult r) {
        return r.from().isPresent() ? r.from().get() : r.startText().replace(", ", " ");
    }

    /** The set of {@code to} states as one CSV field: {@code Down}, or {@code Up Worn}. */
    static String toField(DistributionResult r) {
        return String.join(" ", r.to());
    }
}
