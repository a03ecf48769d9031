package org.qchain.cli;

import picocli.CommandLine.Option;

/** {@code --digits}: significant digits of the decimals, for every command that prints decimals. */
final class DigitsOption {
    /** Default significant digits of decimals. */
    static final int DEFAULT = 12;

    @Option(names = "--digits", paramLabel = "D", converter = Converters.Digits.class, defaultValue = "" + DEFAULT,
        description = "Significant digits of the decimals, correctly rounded (default: ${DEFAULT-VALUE}).")
    int digits = DEFAULT;
}
