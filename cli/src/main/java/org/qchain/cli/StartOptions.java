package org.qchain.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.qchain.analysis.Start;
import picocli.CommandLine.Option;

/** {@code --start}: the initial state or an initial distribution, shared by {@code step} and {@code closed}. */
final class StartOptions {
    @Option(names = "--start", paramLabel = "STATE[=P]",
        description = "The initial state (--start Healthy), or an initial distribution, one --start STATE=P per state"
            + " (--start Healthy=3/5 --start Ill=2/5; exact fractions or decimals summing to exactly 1): print where"
            + " the chain is after n steps.")
    List<String> start = new ArrayList<>();

    /** Whether {@code --start} was given. */
    boolean given() {
        return !start.isEmpty();
    }

    /**
     * The start, read and checked.
     *
     * @throws org.qchain.exact.QchainException naming {@code --start} for a malformed value or probabilities that do
     *                                          not sum to 1
     */
    Optional<Start> start() {
        return start.isEmpty() ? Optional.empty() : Optional.of(Start.parse(start, "--start"));
    }
}
