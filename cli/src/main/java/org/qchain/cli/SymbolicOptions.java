package org.qchain.cli;

import picocli.CommandLine.Option;

/**
 * Options of symbolic results, shared by {@code step} and {@code sens}. Plain values only: building the command tree
 * must load no symbolic class.
 */
final class SymbolicOptions {
    /**
     * Default limit on the estimated number of polynomial terms of a symbolic power: the library's own. A constant
     * expression, so javac copies the value here and reading it loads no symbolic class (JLS 13.1).
     */
    static final long DEFAULT_MAX_TERMS = org.qchain.analysis.StepQuery.DEFAULT_MAX_TERMS;

    @Option(names = "--factor",
        description = "Symbolic results: print each formula factored over the rationals instead of expanded.")
    boolean factor;

    @Option(names = "--max-terms", paramLabel = "T", converter = Converters.TermLimit.class,
        defaultValue = "" + DEFAULT_MAX_TERMS,
        description = "Symbolic results: refuse powers estimated to need more than T polynomial terms in total"
            + " (default: ${DEFAULT-VALUE}).")
    long maxTerms = DEFAULT_MAX_TERMS;
}
