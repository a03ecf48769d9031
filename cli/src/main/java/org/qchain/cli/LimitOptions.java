package org.qchain.cli;

import picocli.CommandLine.Option;

/**
 * The size limits shared by the commands that compute, as mixins: each refusal names the option that raises it, with
 * the estimate. Plain values only: building the command tree loads no engine class.
 */
final class LimitOptions {
    private LimitOptions() {
    }

    /** {@code --max-digits}: the digits of a result in total (of the coefficients, for symbolic results). */
    static final class Digits {
        /** Default limit on the total digits of a result (the exact module's; a constant). */
        static final long DEFAULT = org.qchain.exact.SizeEstimate.DEFAULT_MAX_DIGITS;

        @Option(names = "--max-digits", paramLabel = "M", converter = Converters.DigitLimit.class,
            defaultValue = "" + DEFAULT,
            description = "Refuse results estimated to need more than M digits in total (symbolic results: in their"
                + " coefficients; default: ${DEFAULT-VALUE}).")
        long maxDigits = DEFAULT;
    }

    /** {@code --max-terms}: the polynomial terms of symbolic work. */
    static final class Terms {
        /** Default limit on polynomial terms (a constant, so reading it loads no symbolic class: JLS 13.1). */
        static final long DEFAULT = org.qchain.analysis.StepQuery.DEFAULT_MAX_TERMS;

        @Option(names = "--max-terms", paramLabel = "T", converter = Converters.TermLimit.class,
            defaultValue = "" + DEFAULT,
            description = "Symbolic work: refuse powers estimated to need more than T polynomial terms in total"
                + " (default: ${DEFAULT-VALUE}).")
        long maxTerms = DEFAULT;
    }
}
