package org.qchain.analysis;

/**
 * Structure and long run: {@code classes} and {@code longrun}.
 *
 * @param passage   whether to compute mean first-passage times (irreducible chains)
 * @param symbolic  whether to keep every parameter symbolic even where values are known
 * @param maxDigits refuse exact results estimated past this many digits
 * @param maxStates refuse symbolic solves of more states than this
 * @param brief     leave out the n x n tables (the graph, the limit of P^n, the fundamental matrix N): for large
 *                  chains, whose per-state figures are wanted and whose full matrices would be most of the work
 */
public record LongRunQuery(boolean passage, boolean symbolic, long maxDigits, int maxStates, boolean brief)
    implements Query {
    /** With every table. */
    public LongRunQuery(boolean passage, boolean symbolic, long maxDigits, int maxStates) {
        this(passage, symbolic, maxDigits, maxStates, false);
    }

    /** The default limit on the digits of an exact result. */
    public static final long DEFAULT_MAX_DIGITS = org.qchain.exact.SizeEstimate.DEFAULT_MAX_DIGITS;
    /** The default limit on the states of a symbolic solve. */
    public static final int DEFAULT_MAX_STATES = 40;

    /** The long run without passage times, default limits. */
    public static LongRunQuery plain() {
        return new LongRunQuery(false, false, DEFAULT_MAX_DIGITS, DEFAULT_MAX_STATES);
    }

    /** With mean first-passage times, default limits. */
    public static LongRunQuery withPassage() {
        return new LongRunQuery(true, false, DEFAULT_MAX_DIGITS, DEFAULT_MAX_STATES);
    }
}
