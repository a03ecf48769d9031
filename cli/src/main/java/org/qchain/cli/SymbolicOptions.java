package org.qchain.cli;

import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * Options of symbolic results, shared by {@code step} and {@code sens}. Plain values only: building the command tree
 * must load no symbolic class.
 */
final class SymbolicOptions {
    @Option(names = "--factor",
        description = "Symbolic results: print each formula factored over the rationals instead of expanded.")
    boolean factor;

    @Mixin
    LimitOptions.Terms terms;

    /** The {@code --max-terms} limit. */
    long maxTerms() {
        return terms.maxTerms;
    }
}
