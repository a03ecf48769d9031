package org.qchain.analysis;

import org.qchain.exact.MessageKey;

/**
 * Message keys of the analysis layer (the exact module's are {@link org.qchain.exact.ErrorKey}, behind the same
 * {@link MessageKey} interface). Append new keys; never rename or drop one.
 */
public enum AnalysisKey implements MessageKey {
    /** {0}: how many paths were asked for. */
    PATHS_NEED_VALUES("the {0} most probable paths need numeric values for every parameter (the most probable paths"
        + " of a symbolic chain depend on the parameters)");

    private final String pattern;

    AnalysisKey(String pattern) {
        this.pattern = pattern;
    }

    @Override
    public String pattern() {
        return pattern;
    }
}
