package org.qchain.cli;

import java.math.BigInteger;
import java.util.Arrays;
import java.util.Iterator;
import org.qchain.exact.NumberGrammar;
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
        // the one grammar of whole numbers: ASCII digits only ('-n \u0663' is no number), of any size
        BigInteger x = NumberGrammar.whole(value).orElseThrow(
            () -> new TypeConversionException("'" + value + "' is not a whole number of " + what));
        if (x.compareTo(BigInteger.valueOf(max)) > 0) {
            throw new TypeConversionException("'" + value + "' is too large: at most " + max + " " + what);
        }
        if (x.compareTo(BigInteger.valueOf(min)) < 0) {
            throw new TypeConversionException("'" + value + "' " + range);
        }
        return x.longValueExact();
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

    /** A limit on the digits of one input number: 1 to {@link Integer#MAX_VALUE}. */
    static final class InputDigits implements ITypeConverter<Integer> {
        @Override
        public Integer convert(String value) {
            return (int) whole(value, "digits", 1, Integer.MAX_VALUE, "must be at least 1");
        }
    }

    /** A limit on the states of a dense matrix: 1 to 3037000499 (its square is the largest long). */
    static final class DenseStates implements ITypeConverter<Long> {
        @Override
        public Long convert(String value) {
            return whole(value, "states", 1, 3_037_000_499L, "must be at least 1");
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
