package org.qchain.cli;

import java.util.Arrays;
import java.util.Iterator;
import org.qchain.format.OutputFormat;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.TypeConversionException;

/** Option value converters: a bad value is a usage error (exit 2) whose message shows the value. */
final class Converters {
    private Converters() {
    }

    /**
     * A whole number in {@code [min, max]}.
     *
     * @param value the option's text
     * @param what  what it counts, for the message ({@code "steps"})
     * @param range the message for a value out of range
     */
    private static long whole(String value, String what, long min, long max, String range) {
        long x;
        try {
            x = Long.parseLong(value.strip().replace("_", ""));
        } catch (NumberFormatException e) {
            throw new TypeConversionException("'" + value + "' is not a whole number of " + what);
        }
        if (x < min || x > max) {
            throw new TypeConversionException("'" + value + "' " + range);
        }
        return x;
    }

    /** A number of steps: an integer {@code >= 0}. */
    static final class Steps implements ITypeConverter<Long> {
        @Override
        public Long convert(String value) {
            return whole(value, "steps", 0, Long.MAX_VALUE, "is negative; the number of steps must be 0 or more");
        }
    }

    /** A limit on digits: an integer {@code >= 1}. */
    static final class DigitLimit implements ITypeConverter<Long> {
        @Override
        public Long convert(String value) {
            return whole(value, "digits", 1, Long.MAX_VALUE, "must be at least 1");
        }
    }

    /** Significant digits of decimals: 1 to {@value #MAX}. */
    static final class Digits implements ITypeConverter<Integer> {
        static final int MAX = 100_000;

        @Override
        public Integer convert(String value) {
            return (int) whole(value, "digits", 1, MAX, "must be from 1 to " + MAX);
        }
    }

    /** How many paths: 1 to {@value #MAX}. */
    static final class PathCount implements ITypeConverter<Integer> {
        static final int MAX = 10_000;

        @Override
        public Integer convert(String value) {
            return (int) whole(value, "paths", 1, MAX, "must be from 1 to " + MAX);
        }
    }

    /** A limit on polynomial terms of symbolic results: an integer {@code >= 1}. */
    static final class TermLimit implements ITypeConverter<Long> {
        @Override
        public Long convert(String value) {
            return whole(value, "terms", 1, Long.MAX_VALUE, "must be at least 1");
        }
    }

    /** The word given to {@code --format}; a bad word is a usage error naming it. */
    static final class Format implements ITypeConverter<OutputFormat> {
        @Override
        public OutputFormat convert(String value) {
            return OutputFormat.of(value).orElseThrow(() -> new TypeConversionException("unknown format '" + value
                + "' (expected one of: " + OutputFormat.words() + ")"));
        }
    }

    /** The words of {@code --format}, for help texts and shell completion. */
    static final class FormatWords implements Iterable<String> {
        @Override
        public Iterator<String> iterator() {
            return Arrays.stream(OutputFormat.values()).map(OutputFormat::word).iterator();
        }
    }
}
