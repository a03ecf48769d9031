package org.qchain.cli;

import java.nio.file.Path;
import java.util.Optional;
import org.qchain.format.Formatter;
import org.qchain.format.OutputFormat;
import picocli.CommandLine.Option;

/** How results are printed, shared by the commands that print results. */
final class OutputOptions {
    /** Default significant digits of decimals. */
    static final int DEFAULT_DIGITS = 12;

    @Option(names = "--format", paramLabel = "FORMAT", converter = Converters.Format.class,
        completionCandidates = Converters.FormatWords.class, defaultValue = "text",
        description = "Output format: ${COMPLETION-CANDIDATES} (default: ${DEFAULT-VALUE}).")
    OutputFormat format = OutputFormat.TEXT;

    @Option(names = "--digits", paramLabel = "D", converter = Converters.Digits.class,
        defaultValue = "" + DEFAULT_DIGITS,
        description = "Significant digits of the decimals, correctly rounded (default: ${DEFAULT-VALUE}).")
    int digits = DEFAULT_DIGITS;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE",
        description = "Write the result to FILE (atomically: a temporary file, then a rename) instead of stdout;"
            + " never the model file itself.")
    Path output;

    /** The formatter of {@code --format} at {@code --digits}. */
    Formatter formatter() {
        return format.formatter(digits);
    }

    /** The output file, if given. */
    Optional<Path> output() {
        return Optional.ofNullable(output);
    }
}
