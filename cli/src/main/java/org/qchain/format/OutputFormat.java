package org.qchain.format;

import java.util.Arrays;
import java.util.Optional;
import java.util.function.IntFunction;
import java.util.stream.Collectors;

/** The output formats (the values of {@code --format}). */
public enum OutputFormat {
    /** Human-readable tables with exact fractions and decimals. */
    TEXT("text", TextFormatter::new),
    /** One JSON object per run (RFC 8259); the schema is in docs/commands.md. */
    JSON("json", JsonFormatter::new),
    /** Comma-separated values (RFC 4180) with a header row. */
    CSV("csv", CsvFormatter::new),
    /** Markdown tables for reports. */
    MARKDOWN("markdown", MarkdownFormatter::new),
    /** LaTeX tabulars with {@code \frac}, for reports. */
    LATEX("latex", LatexFormatter::new);

    private final String word;
    private final IntFunction<Formatter> factory;

    OutputFormat(String word, IntFunction<Formatter> factory) {
        this.word = word;
        this.factory = factory;
    }

    /** The word used on the command line. */
    public String word() {
        return word;
    }

    /**
     * The formatter of this format.
     *
     * @param digits significant digits of the decimals it prints, at least 1
     * @return the formatter
     */
    public Formatter formatter(int digits) {
        return factory.apply(digits);
    }

    /**
     * The format of a word, ignoring case and surrounding spaces.
     *
     * @param word the word
     * @return the format, or empty if there is none of that name
     */
    public static Optional<OutputFormat> of(String word) {
        return Arrays.stream(values()).filter(f -> f.word.equalsIgnoreCase(word.strip())).findFirst();
    }

    /** The words of all formats, comma-separated. */
    public static String words() {
        return Arrays.stream(values()).map(OutputFormat::word).collect(Collectors.joining(", "));
    }
}
