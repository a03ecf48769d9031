package org.qchain.format;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.List;
import java.util.function.Consumer;
import org.qchain.exact.Rational;
import org.qchain.exact.floats.Binary64;
import org.qchain.exact.floats.FloatText;
import org.qchain.result.CheckResult;
import org.qchain.result.Result;
import org.qchain.result.StepResult;

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

    @Override
    public final void write(Result result, Appendable out) throws IOException {
        Sink sink = Sink.to(out);
        try {
            if (result instanceof StepResult.Matrix m) {
                stepMatrix(m, sink);
            } else if (result instanceof StepResult.Row r) {
                stepRow(r, sink);
            } else {
                sink.sb.append(format(result));
            }
            sink.flush();
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
    }

    /** Lays out P^n into {@code sink}; formats that stream override this, the others append {@link #stepMatrix}. */
    void stepMatrix(StepResult.Matrix m, Sink sink) {
        sink.sb.append(stepMatrix(m));
    }

    /** Lays out a row of P^n into {@code sink}, as {@link #stepMatrix(StepResult.Matrix, Sink)}. */
    void stepRow(StepResult.Row r, Sink sink) {
        sink.sb.append(stepRow(r));
    }

    /** The text of a streaming layout, gathered whole. */
    static String whole(Consumer<Sink> layout) {
        Sink sink = Sink.buffer();
        layout.accept(sink);
        return sink.text();
    }

    /** The entries of a matrix, row after row. */
    static List<Rational> flat(List<List<Rational>> rows) {
        return rows.stream().flatMap(List::stream).toList();
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

    @Override
    public String classes(org.qchain.result.ClassesResult r) {
        return render(Sections.of(r));
    }

    @Override
    public String longRun(org.qchain.result.LongRunResult r) {
        return render(Sections.of(r));
    }

    @Override
    public String absorb(org.qchain.result.AbsorbResult r) {
        return render(Sections.of(r));
    }

    /** Renders the tables of a {@code classes}, {@code longrun} or {@code absorb} result. */
    abstract String render(Sections.Doc d);
}
