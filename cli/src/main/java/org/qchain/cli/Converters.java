package org.qchain.cli;

import java.math.BigInteger;
import java.util.Arrays;
import java.util.Iterator;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.format.OutputFormat;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.TypeConversionException;

/**
 * Option value converters: a bad value is a usage error (exit 2) whose message shows the value. Every number goes
 * through {@link #whole}, which uses the exact module's reader.
 */
final class Converters {
    private Converters() {
    }

    /**
     * A whole number in {@code [min, max]}, read by the exact module's number reader ({@link Rational#parse}, the
     * grammar of numbers in model files: {@code 12}, {@code 1e6}, {@code 24/2}; {@code _} may group digits), so that
     * the command line has no number grammar of its own.
     *
     * @param value the option's text
     * @param what  what it counts, for the message ({@code "steps"})
     * @param range the message for a value below {@code min} (or above {@code max} when {@code max} is not
     *              {@code Long.MAX_VALUE})
     */
    static long whole(String value, String what, long min, long max, String range) {
        Rational r;
        try {
            r = Rational.parse(value.replace("_", ""));
        } catch (QchainException e) {
            // the exact module's reason, unless it only repeats that the text is no number
            String why = e.key() == ErrorKey.MALFORMED_NUMBER ? "" : " (" + e.detail() + ")";
            throw new TypeConversionException("'" + value + "' is not a whole number of " + what + why);
        } catch (RuntimeException e) {
            throw new TypeConversionException("'" + value + "' is not a whole number of " + what);
        }
        if (!r.isInteger()) {
            throw new TypeConversionException("'" + value + "' is not a whole number of " + what);
        }
        BigInteger x = r.numerator();
        if (x.compareTo(BigInteger.valueOf(min)) < 0
            || max != Long.MAX_VALUE && x.compareTo(BigInteger.valueOf(max)) > 0) {
            throw new TypeConversionException("'" + value + "' " + range);
        }
        if (x.compareTo(BigInteger.valueOf(Long.MAX_VALUE)) > 0) {
            throw new TypeConversionException("'" + value + "' is too large: at most " + Long.MAX_VALUE);
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

    /**
     * Numbers of steps: one ({@code 12}), a list ({@code 1,5,10}), a range ({@code 1..30}), a stepped range in the
     * sweep's words ({@code "0..100 by 10"}), or a mix ({@code 1..5,10,20}); sorted, each value once, at most
     * {@value #MAX} values.
     */
    static final class StepSeries implements ITypeConverter<StepList> {
        /** The most step counts one option may give. */
        static final int MAX = 10_000;

        @Override
        public StepList convert(String value) {
            java.util.TreeSet<Long> out = new java.util.TreeSet<>();
            String[] items = value.split(",", -1);
            boolean series = items.length > 1;
            for (String raw : items) {
                String item = raw.strip();
                int dots = item.indexOf("..");
                if (dots < 0) {
                    out.add(steps(item, value));
                } else {
                    series = true;
                    String rest = item.substring(dots + 2);
                    String where = item.equals(value.strip()) ? "'" + item + "'" : "'" + item + "' in '" + value + "'";
                    String[] byParts = rest.split("\\s+by\\s+", -1);
                    if (byParts.length > 2 || rest.strip().startsWith("by") || rest.strip().endsWith("by")) {
                        throw new TypeConversionException(where + ": a range is A..B or"
                            + " \"A..B by STEP\", e.g. 1..30 or \"0..100 by 10\"");
                    }
                    long a = steps(item.substring(0, dots), value);
                    long b = steps(byParts[0], value);
                    long step = byParts.length == 2 ? whole(byParts[1].strip(), "steps", 1, Long.MAX_VALUE,
                        "in '" + value + "': the step of a range must be at least 1") : 1;
                    if (b < a) {
                        throw new TypeConversionException(where + ": a range A..B needs A <= B");
                    }
                    for (long n = a; n <= b; n += step) {
                        out.add(n);
                        if (out.size() > MAX) {
                            break;
                        }
                        if (n > Long.MAX_VALUE - step) {
                            break;
                        }
                    }
                }
                if (out.size() > MAX) {
                    throw new TypeConversionException("'" + value + "' gives more than " + MAX + " numbers of steps");
                }
            }
            return new StepList(java.util.List.copyOf(out), series);
        }

        private static long steps(String text, String value) {
            String t = text.strip();
            if (t.isEmpty()) {
                throw new TypeConversionException("'" + value + "': a number of steps is missing (write e.g. 1,5,10,"
                    + " 1..30 or \"0..100 by 10\")");
            }
            return whole(t, "steps", 0, Long.MAX_VALUE, "is negative; the number of steps must be 0 or more");
        }
    }

    /**
     * The step counts an option gave, increasing, and whether it was a list or a range (one table over n).
     *
     * @param ns     the step counts
     * @param series whether they were given as a list or a range, even of one value
     */
    record StepList(java.util.List<Long> ns, boolean series) {
        /** The one step count of an option that gave one. */
        long single() {
            return ns.get(0);
        }

        /**
         * The record's usual text, written out: picocli takes the text of every option value it sets (for its
         * trace), and a record's generated {@code toString} links its method handles at first use, which spins
         * about forty classes at every start.
         */
        @Override
        public String toString() {
            return "StepList[ns=" + ns + ", series=" + series + "]";
        }
    }

    /** A limit on digits: an integer {@code >= 1}. */
    static final class DigitLimit implements ITypeConverter<Long> {
        @Override
        public Long convert(String value) {
            return whole(value, "digits", 1, Long.MAX_VALUE, "must be at least 1");
        }
    }

    /** A limit on multiplications (the work of a certified result): an integer {@code >= 1}. */
    static final class WorkLimit implements ITypeConverter<Long> {
        @Override
        public Long convert(String value) {
            return whole(value, "multiplications", 1, Long.MAX_VALUE, "must be at least 1");
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

    /** A tolerance: an exact number {@code >= 0} in the model's number grammar ({@code 1e-9}, {@code 1/1000}). */
    static final class Bound implements ITypeConverter<org.qchain.exact.Rational> {
        @Override
        public org.qchain.exact.Rational convert(String value) {
            org.qchain.exact.Rational r;
            try {
                r = org.qchain.exact.Rational.parse(value);
            } catch (RuntimeException e) {
                throw new TypeConversionException("'" + value + "' is not a number (write e.g. 1e-9 or 1/1000)");
            }
            if (r.signum() < 0) {
                throw new TypeConversionException("'" + value + "' is negative; a tolerance must be 0 or more");
            }
            return r;
        }
    }

    /** A tolerance in ulps: an integer {@code >= 0}. */
    static final class UlpBound implements ITypeConverter<Long> {
        @Override
        public Long convert(String value) {
            return whole(value, "ulps", 0, Long.MAX_VALUE, "is negative; a tolerance in ulps must be 0 or more");
        }
    }

    /** How many entries to list: 0 to {@value #MAX}. */
    static final class ShowCount implements ITypeConverter<Integer> {
        static final int MAX = 1_000_000;

        @Override
        public Integer convert(String value) {
            return (int) whole(value, "entries", 0, MAX, "must be from 0 to " + MAX);
        }
    }

    /** The word given to {@code --what}. */
    static final class VerifyWhat implements ITypeConverter<org.qchain.analysis.VerifyQuery.What> {
        @Override
        public org.qchain.analysis.VerifyQuery.What convert(String value) {
            return org.qchain.analysis.VerifyQuery.What.of(value).orElseThrow(() -> new TypeConversionException(
                "'" + value + "' is not a quantity verify checks (one of " + String.join(", ", new VerifyWhatWords())
                + ")"));
        }
    }

    /** The words of {@code --what}, for help and completion. */
    static final class VerifyWhatWords implements Iterable<String> {
        @Override
        public Iterator<String> iterator() {
            return Arrays.stream(org.qchain.analysis.VerifyQuery.What.values())
                .map(org.qchain.analysis.VerifyQuery.What::word).iterator();
        }
    }

    /** Times for a continuous chain: {@code 1,2,5}, ranges {@code A..B:S} (from A to B in steps of S), or a mix. */
    static final class Times implements ITypeConverter<TimeList> {
        /** The most times one option may give. */
        static final int MAX = 10_000;

        @Override
        public TimeList convert(String value) {
            java.util.List<org.qchain.exact.Rational> out = new java.util.ArrayList<>();
            for (String raw : value.split(",", -1)) {
                String item = raw.strip();
                int dots = item.indexOf("..");
                if (dots < 0) {
                    out.add(time(item, value));
                    continue;
                }
                int colon = item.indexOf(':', dots);
                if (colon < 0) {
                    throw new TypeConversionException("'" + item + "' in '" + value + "': a range is A..B:STEP, e.g. 0..10:2");
                }
                org.qchain.exact.Rational a = time(item.substring(0, dots), value);
                org.qchain.exact.Rational b = time(item.substring(dots + 2, colon), value);
                org.qchain.exact.Rational step = time(item.substring(colon + 1), value);
                if (step.signum() <= 0 || b.compareTo(a) < 0) {
                    throw new TypeConversionException("'" + item + "' in '" + value + "': a range A..B:STEP needs"
                        + " A <= B and STEP > 0");
                }
                for (org.qchain.exact.Rational t = a; t.compareTo(b) <= 0; t = t.add(step)) {
                    if (out.size() >= MAX) {
                        throw new TypeConversionException("'" + value + "' gives more than " + MAX + " times");
                    }
                    out.add(t);
                }
            }
            if (out.size() > MAX) {
                throw new TypeConversionException("'" + value + "' gives more than " + MAX + " times");
            }
            return new TimeList(out);
        }

        private static org.qchain.exact.Rational time(String text, String value) {
            String t = text.strip();
            String whole = t.equals(value.strip()) ? "" : " in '" + value + "'";
            org.qchain.exact.Rational r;
            try {
                r = org.qchain.exact.Rational.parse(t);
            } catch (RuntimeException e) {
                throw new TypeConversionException("'" + t + "'" + whole + " is not a time; write an integer,"
                    + " a fraction such as 1/2 or a decimal such as 0.25");
            }
            if (r.signum() < 0) {
                throw new TypeConversionException("'" + t + "'" + whole + " is negative; times are 0 or more");
            }
            return r;
        }
    }

    /** The times an option gave, in order. */
    record TimeList(java.util.List<org.qchain.exact.Rational> times) {
        /** The record's usual text, written out (see {@link StepList#toString()}). */
        @Override
        public String toString() {
            return "TimeList[times=" + times + "]";
        }
    }

    /** A positive rational: an integer, a fraction {@code p/q} or a decimal, read exactly. */
    static final class PositiveRational implements ITypeConverter<org.qchain.exact.Rational> {
        @Override
        public org.qchain.exact.Rational convert(String value) {
            org.qchain.exact.Rational r;
            try {
                r = org.qchain.exact.Rational.parse(value);
            } catch (RuntimeException e) {
                throw new TypeConversionException("'" + value + "' is not a number; write an integer, a fraction such"
                    + " as 1/2 or a decimal such as 0.25");
            }
            if (r.signum() <= 0) {
                throw new TypeConversionException("'" + value + "' must be positive");
            }
            return r;
        }
    }
}
