package org.qchain.analysis;

import org.qchain.exact.MessageKey;

/**
 * Message keys of the analysis layer (the exact module's are {@link org.qchain.exact.ErrorKey}, behind the same
 * {@link MessageKey} interface). Append new keys; never rename or drop one.
 */
public enum AnalysisKey implements MessageKey {
    /** {0}: how many paths were asked for. */
    PATHS_NEED_VALUES("the {0} most probable paths need numeric values for every parameter (the most probable paths"
        + " of a symbolic chain depend on the parameters)"),
    /** {0}: what was asked ({@code --start}, a {@code --to} set, a list of n); {1}: the parameters without a value. */
    DISTRIBUTION_NEEDS_VALUES("{0} needs a value for every parameter (parameters without a value: {1}; give them"
        + " with --at NAME=VALUE); formulas in the parameters are given for one n at a time"),
    /**
     * {0}: what was asked; {1}: the parameters without a value; {2}: what works without the values.
     */
    NEEDS_VALUES("{0} needs a value for every parameter (parameters without a value: {1}; give them with --at"
        + " NAME=VALUE); {2}");

    private final String pattern;

    AnalysisKey(String pattern) {
        this.pattern = pattern;
    }

    @Override
    public String pattern() {
        return pattern;
    }
}
