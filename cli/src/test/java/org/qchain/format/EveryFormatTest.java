package org.qchain.format;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.qchain.exact.Rational;
import org.qchain.result.CheckResult;
import org.qchain.result.ClosedResult;
import org.qchain.result.Formula;
import org.qchain.result.StepResult;

/**
 * Every formatter lays out every result type (layouts are our own: common practice, no source; JSON per RFC 8259,
 * CSV per RFC 4180). The golden files of the command tests cover the layouts the commands print; this covers the
 * rest, and that decimals come from the formatter at its own digits.
 */
class EveryFormatTest {
    private static final StepResult.Matrix ONE_STEP = new StepResult.Matrix(
        new StepResult.Header("m.chain", "discrete", 1, List.of()), List.of("A", "B"),
        List.of(List.of(Rational.of(1, 3), Rational.of(2, 3)), List.of(Rational.ONE, Rational.ZERO)));
    private static final CheckResult.Symbolic SYMBOLIC = new CheckResult.Symbolic("m.chain", "discrete",
        List.of("A", "B"), List.of("p"), List.of(List.of(Formula.of("1 - p", "1 - p"), Formula.of("p", "p")),
            List.of(Formula.of("1", "1"), Formula.of("0", "0"))), List.of("m.chain:4:1: A->B needs p <= 1"));

    @Test
    void decimalsFollowTheFormattersDigits() {
        // 1/3 correctly rounded to 3 and to 5 significant digits (common practice, no source)
        assertTrue(OutputFormat.JSON.formatter(3).format(ONE_STEP).contains("\"0.333\",\"0.667\""));
        assertTrue(OutputFormat.JSON.formatter(5).format(ONE_STEP).contains("\"0.33333\",\"0.66667\""));
        assertTrue(OutputFormat.JSON.formatter(3).format(ONE_STEP).contains("\"digits\":3"));
    }

    @Test
    void everyFormatLaysOutBothKindsOfCheck() {
        for (OutputFormat f : OutputFormat.values()) {
            Formatter fm = f.formatter(4);
            String numeric = fm.format(new CheckResult.Numeric(ONE_STEP));
            String symbolic = fm.format(SYMBOLIC);
            assertTrue(numeric.endsWith("\n") && symbolic.endsWith("\n"), f.word());
            assertTrue(symbolic.contains("1 - p"), f.word() + ": " + symbolic);
        }
        assertEquals("{\"kind\":\"discrete\",\"states\":[\"A\",\"B\"],\"parameters\":[\"p\"],"
            + "\"matrix\":[[\"1 - p\",\"p\"],[\"1\",\"0\"]],\"conditions\":[\"m.chain:4:1: A->B needs p <= 1\"],"
            + "\"model\":\"m.chain\",\"warnings\":[\"m.chain:4:1: A->B needs p <= 1\"]}\n",
            OutputFormat.JSON.formatter(4).format(SYMBOLIC));
        assertEquals("from,to,formula\r\nA,A,1 - p\r\nA,B,p\r\nB,A,1\r\nB,B,0\r\n",
            OutputFormat.CSV.formatter(4).format(SYMBOLIC));
        assertTrue(OutputFormat.TEXT.formatter(4).format(new CheckResult.Numeric(ONE_STEP))
            .endsWith("OK: 2 states, discrete, rows sum to 1\n"));
    }

    @Test
    void everyFormatLaysOutClosedForms() {
        ClosedResult r = new ClosedResult("m.chain", ClosedResult.Form.GF, "n", 0, List.of(),
            List.of("A"), List.of(), ClosedResult.Selection.MATRIX, List.of("A"), List.of("A"),
            List.of(List.of(Formula.of("1/(1 - z)", "\\frac{1}{1 - z}"))), List.of(), List.of(), Optional.empty(),
            List.of(), Optional.empty(), 12, List.of());
        assertEquals("record,from,to,r,name,formula,valid_from,multiplicity,decimal,proved\r\n"
            + "entry,A,A,,,1/(1 - z),,,,\r\n", OutputFormat.CSV.formatter(4).format(r));
        assertTrue(OutputFormat.LATEX.formatter(4).format(r)
            .contains("G_{\\text{A},\\text{A}}(z) &= \\frac{1}{1 - z}"));
    }
}
