package org.qchain.result;

import org.qchain.exact.Rational;

/**
 * An exact rational number as a {@link Formula}: {@code p/q} in plain syntax, {@code \frac{p}{q}} in LaTeX. Text
 * formatters add a decimal beside it.
 *
 * @param value the number
 */
public record ExactValue(Rational value) implements Formula {
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
