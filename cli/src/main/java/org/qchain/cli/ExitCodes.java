package org.qchain.cli;

/** The process exit codes, as every help text lists them. */
public final class ExitCodes {
    /** Success. */
    public static final int OK = 0;
    /** Internal error: a bug or an environment failure (out of memory); the message is short. */
    public static final int INTERNAL = 1;
    /** Bad input (model file, option value) or usage; the message names file:line:col or the option. */
    public static final int INPUT = 2;
    /** {@code verify}: a value is outside the tolerance (the file was read and checked). */
    public static final int OVER_TOLERANCE = 3;
    /** Stopped by Ctrl-C (128 + SIGINT, as shells report it). */
    public static final int INTERRUPTED = 130;

    private ExitCodes() {
    }
}
