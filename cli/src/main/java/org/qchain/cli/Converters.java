package org.qchain.cli;

import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.TypeConversionException;

/** Option value converters: a bad value is a usage error (exit 2) whose message shows the value. */
final class Converters {
    private Converters() {
    }

    private static long parseLong(String value, String what) {
        try {
            return Long.parseLong(value.strip().replace("_", ""));
        } catch (NumberFormatException e) {
            throw new TypeConversionException("'" + value + "' is not " + what);
        }
    }

    /** A number of steps: an integer {@code >= 0}. */
    static final class Steps implements ITypeConverter<Long> {
        @Override
        public Long convert(String value) {
            long n = parseLong(value, "a whole number of steps");
            if (n < 0) {
                throw new TypeConversionException("'" + value + "' is negative; the number of steps must be 0 or more");
            }
            return n;
        }
    }

    /** A limit on digits: an integer {@code >= 1}. */
    static final class DigitLimit implements ITypeConverter<Long> {
        @Override
        public Long convert(String value) {
            long n = parseLong(value, "a whole number of digits");
            if (n < 1) {
                throw new TypeConversionException("'" + value + "' must be at least 1");
            }
            return n;
        }
    }

    /** Significant digits of decimals: 1 to {@value #MAX}. */
    static final class Digits implements ITypeConverter<Integer> {
        static final int MAX = 100_000;

        @Override
        public Integer convert(String value) {
            long d = parseLong(value, "a whole number of digits");
            if (d < 1 || d > MAX) {
                throw new TypeConversionException("'" + value + "' must be from 1 to " + MAX);
            }
            return (int) d;
        }
    }

    /** How many paths: 1 to {@value #MAX}. */
    static final class PathCount implements ITypeConverter<Integer> {
        static final int MAX = 10_000;

        @Override
        public Integer convert(String value) {
            long k = parseLong(value, "a whole number of paths");
            if (k < 1 || k > MAX) {
                throw new TypeConversionException("'" + value + "' must be from 1 to " + MAX);
            }
            return (int) k;
        }
    }
}
