package org.qchain.analysis;

import java.util.Arrays;
import java.util.Optional;
import java.util.stream.Collectors;

/** The sections a report may hold, in the order they appear; the caution is always there. */
public enum ReportSection {
    /** States, parameters, the one-step matrix or generator, validation and the conditions of validity. */
    MODEL("model"),
    /** The state diagram: Graphviz DOT, and an inline SVG drawing in HTML. */
    DIAGRAM("diagram"),
    /** n-step results (or P(t) at times), exact and decimal. */
    STEPS("steps"),
    /** The closed form in n. */
    CLOSED("closed"),
    /** Classes, long run, absorption; availability for continuous chains. */
    LONGRUN("longrun"),
    /** Derivatives and elasticities at the point, and a sweep. */
    SENSITIVITY("sensitivity"),
    /** Plots of P^n (or A(t)) and of the sweep. */
    PLOTS("plots");

    private final String word;

    ReportSection(String word) {
        this.word = word;
    }

    /** The section's name on the command line. */
    public String word() {
        return word;
    }

    /**
     * The section of a name, ignoring case and surrounding spaces.
     *
     * @param word the name
     * @return the section, or empty
     */
    public static Optional<ReportSection> of(String word) {
        return Arrays.stream(values()).filter(s -> s.word.equalsIgnoreCase(word.strip())).findFirst();
    }

    /** Every section's name, comma-separated. */
    public static String words() {
        return Arrays.stream(values()).map(ReportSection::word).collect(Collectors.joining(", "));
    }
}
