package org.qchain.format;

import org.qchain.exact.Rational;
import org.qchain.result.CheckResult;

/** What every formatter shares: the significant digits of its decimals, and the decimal of an exact value. */
abstract class Layout implements Formatter {
    /** Significant digits of the decimals, at least 1. */
    final int digits;

    Layout(int digits) {
        this.digits = digits;
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
