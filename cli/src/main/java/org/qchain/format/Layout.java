package org.qchain.format;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;
import java.util.stream.IntStream;
import org.qchain.exact.DecimalText;
import org.qchain.exact.Rational;
import org.qchain.exact.floats.Binary64;
import org.qchain.exact.floats.FloatText;
import org.qchain.result.CheckResult;
import org.qchain.result.ExactValue;
import org.qchain.result.Formula;
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

    /** Below this many bits in all, {@link #plainTexts} converts on the calling thread alone. */
    static final long PARALLEL_TEXT_BITS = 200_000;

    /**
     * The plain texts of many formulas, in order, each equal to its {@link Formula#plain()}: exact values by the fast
     * decimal conversion ({@link DecimalText}), each distinct denominator once (the entries of one exact solve share
     * a few denominators of thousands of digits), on all cores when there are many digits; other formulas by
     * {@code plain()}.
     */
    static List<String> plainTexts(List<? extends Formula> fs) {
        int n = fs.size();
        int[] numAt = new int[n];
        int[] denAt = new int[n];
        List<BigInteger> todo = new ArrayList<>();
        Map<BigInteger, Integer> dens = new HashMap<>();
        long bits = 0;
        for (int i = 0; i < n; i++) {
            numAt[i] = -1;
            denAt[i] = -1;
            if (fs.get(i) instanceof ExactValue e) {
                Rational r = e.value();
                numAt[i] = todo.size();
                todo.add(r.numerator());
                bits += r.numerator().bitLength();
                if (!r.isInteger()) {
                    Integer k = dens.get(r.denominator());
                    if (k == null) {
                        k = todo.size();
                        todo.add(r.denominator());
                        dens.put(r.denominator(), k);
                        bits += r.denominator().bitLength();
                    }
                    denAt[i] = k;
                }
            }
        }
        String[] texts = new String[todo.size()];
        IntStream range = IntStream.range(0, texts.length);
        (bits >= PARALLEL_TEXT_BITS ? range.parallel() : range).forEach(k -> texts[k] = DecimalText.toString(todo.get(k)));
        List<String> out = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            out.add(numAt[i] < 0 ? fs.get(i).plain() : denAt[i] < 0 ? texts[numAt[i]]
                : texts[numAt[i]] + "/" + texts[denAt[i]]);
        }
        return out;
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

    /** A sweep table's heading: the parameter, the decimals, the exact values (an elasticity column with each). */
    static List<String> sweepHead(String parameter, String value, String derivative, boolean elasticity) {
        List<String> head = new java.util.ArrayList<>(List.of(parameter, value, derivative));
        if (elasticity) {
            head.add("elasticity");
        }
        head.addAll(List.of(value + " exact", derivative + " exact"));
        if (elasticity) {
            head.add("elasticity exact");
        }
        return head;
    }

    /** A sweep table's line, in the order of {@link #sweepHead}. */
    final List<String> sweepCells(org.qchain.result.SensResult.SweepLine l,
                                  java.util.Optional<java.util.function.Function<org.qchain.result.SensResult.SweepLine, java.util.Optional<Rational>>> elasticity) {
        java.util.Optional<Rational> e = elasticity.flatMap(f -> f.apply(l));
        List<String> row = new java.util.ArrayList<>(List.of(l.value().toString(), dec(l.probability()),
            dec(l.derivative())));
        elasticity.ifPresent(f -> row.add(e.map(this::dec).orElse("undefined")));
        row.addAll(List.of(l.probability().toString(), l.derivative().toString()));
        elasticity.ifPresent(f -> row.add(e.map(Rational::toString).orElse("")));
        return row;
    }

    /** A numeric check as its one-step matrix; a symbolic one through {@link #symbolicCheck}. */
    @Override
    public String check(CheckResult c) {
        if (c instanceof CheckResult.Numeric n) {
            return numericCheck(n);
        }
        if (c instanceof CheckResult.Generator g) {
            return generatorCheck(g);
        }
        return symbolicCheck((CheckResult.Symbolic) c);
    }

    /** The generator of a continuous chain, its total rates out and mean holding times, exact or as formulas. */
    abstract String generatorCheck(CheckResult.Generator g);

    /** The one-step matrix of a model checked at numeric values. */
    String numericCheck(CheckResult.Numeric n) {
        return stepMatrix(n.matrix());
    }

    /** The one-step matrix as formulas, with the conditions. */
    abstract String symbolicCheck(CheckResult.Symbolic s);
}
