package org.qchain.format;

import org.qchain.exact.Rational;
import org.qchain.exact.floats.Binary64;
import org.qchain.exact.floats.FloatText;
import org.qchain.result.CheckResult;

/** What every formatter shares: the significant digits of its decimals, and the decimal of an exact value. */
abstract class Layout implements Formatter {
    /** Significant digits of the decimals, at least 1. */
    final int digits;

    /** Whether each exact value also gets its correctly rounded binary64 (shortest decimal and hex float). */
    final boolean doubles;

    Layout(int digits) {
        this(digits, false);
    }

    Layout(int digits, boolean doubles) {
        this.digits = digits;
        this.doubles = doubles;
    }

    /** The correctly rounded double of {@code r} as its shortest round-trip decimal. */
    static String shortest(Rational r) {
        return FloatText.shortest(Binary64.round(r));
    }

    /** The correctly rounded double of {@code r} as a hexadecimal float. */
    static String hex(Rational r) {
        return FloatText.hex(Binary64.round(r));
    }

    /** {@code r} correctly rounded to {@link #digits} significant digits. */
    final String dec(Rational r) {
        return Text.decimal(r, digits);
    }

    /** A numeric check as its one-step matrix; a symbolic one through {@link #symbolicCheck}. */
    @Override
    public String check(CheckResult c) {
        if (c instanceof CheckResult.Numeric n) {
            return numericCheck(n);
        }
        return symbolicCheck((CheckResult.Symbolic) c);
    }

    /** The one-step matrix of a model checked at numeric values. */
    String numericCheck(CheckResult.Numeric n) {
        return stepMatrix(n.matrix());
    }

    /** The one-step matrix as formulas, with the conditions. */
    abstract String symbolicCheck(CheckResult.Symbolic s);
}
