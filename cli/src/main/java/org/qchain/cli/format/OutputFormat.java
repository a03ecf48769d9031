package org.qchain.cli.format;

import java.util.Arrays;
import java.util.Iterator;
import java.util.stream.Collectors;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.TypeConversionException;

/** The values of {@code --format}. */
public enum OutputFormat {
    /** Human-readable tables with exact fractions and decimals. */
    TEXT("text", new TextFormatter()),
    /** One JSON object per run (RFC 8259); the schema is in docs/commands.md. */
    JSON("json", new JsonFormatter()),
    /** Comma-separated values (RFC 4180) with a header row. */
    CSV("csv", new CsvFormatter()),
    /** Markdown tables for reports. */
    MARKDOWN("markdown", new MarkdownFormatter()),
    /** LaTeX tabulars with {@code \frac}, for reports. */
    LATEX("latex", new LatexFormatter());

    private final String word;
    private final Formatter formatter;

    OutputFormat(String word, Formatter formatter) {
        this.word = word;
        this.formatter = formatter;
    }

    /** The word used on the command line. */
    public String word() {
        return word;
    }

    /** The formatter of this format. */
    public Formatter formatter() {
        return formatter;
    }

    /** The words of all formats, comma-separated. */
    static String words() {
        return Arrays.stream(values()).map(OutputFormat::word).collect(Collectors.joining(", "));
    }

    /** Converts the word given to {@code --format}; a bad word is a usage error naming it. */
    public static final class Converter implements ITypeConverter<OutputFormat> {
        @Override
        public OutputFormat convert(String value) {
            for (OutputFormat f : values()) {
                if (f.word.equalsIgnoreCase(value.strip())) {
                    return f;
                }
            }
            throw new TypeConversionException("unknown format '" + value + "' (expected one of: " + words() + ")");
        }
    }

    /** The words, for help texts and shell completion. */
    public static final class Candidates implements Iterable<String> {
        @Override
        public Iterator<String> iterator() {
            return Arrays.stream(values()).map(OutputFormat::word).iterator();
        }
    }
}
