package org.qchain.cli.result;

import org.qchain.exact.Rational;

/**
 * An exact value as the formatters print it: plain text that our own parsers read back, and LaTeX. Numeric commands
 * use {@link #of(Rational)}; a symbolic command can supply formulas through the same interface, so the formatters
 * need no change to print them.
 */
public interface ExactValue {

    /** Plain syntax: {@code p/q}, {@code k}, or a formula in the model file's expression syntax. */
    String plain();

    /** LaTeX math-mode text, without surrounding {@code $}. */
    String latex();

    /**
     * The exact value of a rational number.
     *
     * @param r the number
     * @return its exact value
     */
    static ExactValue of(Rational r) {
        return new RationalValue(r);
    }

    /**
     * A rational number as an exact value.
     *
     * @param value the number
     */
    record RationalValue(Rational value) implements ExactValue {
        @Override
        public String plain() {
            return value.toString();
        }

        @Override
        public String latex() {
            if (value.isInteger()) {
                return value.toString();
            }
            String sign = value.signum() < 0 ? "-" : "";
            return sign + "\\frac{" + value.numerator().abs() + "}{" + value.denominator() + "}";
        }
    }
}
