package org.qchain.cli;

import org.qchain.analysis.LongRunQuery;
import picocli.CommandLine.Option;

/** Options shared by {@code classes}, {@code longrun} and {@code absorb}: the route and the size limits. */
final class LongRunOptions {
    @Option(names = "--symbolic", description = "Keep every parameter symbolic, even those with nominal values."
        + " Models with a parameter without a value are symbolic anyway.")
    boolean symbolic;

    @Option(names = "--max-digits", paramLabel = "M", converter = Converters.DigitLimit.class,
        defaultValue = "" + LongRunQuery.DEFAULT_MAX_DIGITS,
        description = "Refuse exact results estimated to need more than M digits in total (default: ${DEFAULT-VALUE}).")
    long maxDigits = LongRunQuery.DEFAULT_MAX_DIGITS;

    @Option(names = "--max-states", paramLabel = "S", defaultValue = "" + LongRunQuery.DEFAULT_MAX_STATES,
        description = "Refuse symbolic solves of more than S states (default: ${DEFAULT-VALUE}).")
    int maxStates = LongRunQuery.DEFAULT_MAX_STATES;

    @Option(names = "--brief", description = "Leave out the n x n tables (classes: the graph; longrun: the limit"
        + " matrix; absorb: the fundamental matrix N) and keep the figures per state: for large chains.")
    boolean brief;

    LongRunQuery query(boolean passage) {
        return new LongRunQuery(passage, symbolic, maxDigits, maxStates, brief);
    }
}
