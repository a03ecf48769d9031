package org.qchain.cli;

import java.nio.file.Path;
import java.util.Optional;
import org.qchain.format.Formatter;
import org.qchain.format.OutputFormat;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** How results are printed, shared by the commands that print results. */
final class OutputOptions {
    @Option(names = "--format", paramLabel = "FORMAT", converter = Converters.Format.class,
        completionCandidates = Converters.FormatWords.class, defaultValue = "text",
        description = "Output format: ${COMPLETION-CANDIDATES} (default: ${DEFAULT-VALUE}).")
    OutputFormat format = OutputFormat.TEXT;

    @Mixin
    DigitsOption digitsOption;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE",
        description = "Write the result to FILE (atomically: a temporary file, then a rename) instead of stdout;"
            + " never the model file itself.")
    Path output;

    /** {@code --digits}. */
    int digits() {
        return digitsOption.digits;
    }

    /** The formatter of {@code --format} at {@code --digits}. */
    Formatter formatter() {
        return format.formatter(digits());
    }

    /** The formatter of {@code --format} at {@code --digits}, with binary64 columns if {@code doubles}. */
    Formatter formatter(boolean doubles) {
        return format.formatter(digits(), doubles);
    }

    /** The output file, if given. */
    Optional<Path> output() {
        return Optional.ofNullable(output);
    }
}
