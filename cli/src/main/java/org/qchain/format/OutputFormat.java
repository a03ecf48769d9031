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
     * The formatter of this format, adding each exact value's correctly rounded binary64 (shortest round-trip decimal
     * and hexadecimal float) where the format has room for it.
     *
     * @param digits  significant digits of the decimals it prints, at least 1
     * @param doubles whether to add the doubles
     * @return the formatter
     * @throws IllegalArgumentException if doubles are asked of a format other than JSON and CSV
     */
    public Formatter formatter(int digits, boolean doubles) {
        if (!doubles) {
            return formatter(digits);
        }
        return switch (this) {
            case JSON -> new JsonFormatter(digits, true);
            case CSV -> new CsvFormatter(digits, true);
            default -> throw new IllegalArgumentException("doubles are written in JSON and CSV only");
        };
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
