package org.qchain.cli;

/** Constants of the symbolic options, free of symbolic classes (the numeric path may read them). */
final class SymbolicStepOptions {
    /** Default limit on the estimated number of polynomial terms of a symbolic power (as the library's default). */
    static final long DEFAULT_MAX_TERMS = 2_000_000L;

    private SymbolicStepOptions() {
    }
}
