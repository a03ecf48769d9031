package org.qchain.cli;

import picocli.CommandLine.Option;

/**
 * Options of symbolic results, shared by {@code step} and {@code sens}. Plain values only: building the command tree
 * must load no symbolic class.
 */
final class SymbolicOptions {
    /** Default limit on the estimated number of polynomial terms of a symbolic power (the library's default). */
    static final long DEFAULT_MAX_TERMS = 2_000_000L;

    @Option(names = "--factor",
        description = "Symbolic results: print each formula factored over the rationals instead of expanded.")
    boolean factor;

    @Option(names = "--max-terms", paramLabel = "T", converter = Converters.TermLimit.class,
        defaultValue = "" + DEFAULT_MAX_TERMS,
        description = "Symbolic results: refuse powers estimated to need more than T polynomial terms in total"
            + " (default: ${DEFAULT-VALUE}).")
    long maxTerms = DEFAULT_MAX_TERMS;
}
