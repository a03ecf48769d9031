package org.qchain.exact;

/**
 * Receives coarse progress reports from long computations (one call per squaring, per vector step, per reduced row).
 * Engines never print; a front end may show these on a terminal.
 *
 * <p>Calls come from the thread that started the computation, in order, with {@code 0 <= done <= total} within a
 * phase. Implementations must be cheap and must not throw.
 */
@FunctionalInterface
public interface Progress {
    /** Discards every report. */
    Progress NONE = (phase, done, total) -> { };

    /**
     * Reports that {@code done} of {@code total} steps of a phase are finished.
     *
     * @param phase a short lower-case name of the phase, such as {@code "squaring"}, {@code "path sums"} or
     *              {@code "reducing"}
     * @param done  steps finished so far in this phase
     * @param total steps in this phase
     */
    void update(String phase, long done, long total);
}
