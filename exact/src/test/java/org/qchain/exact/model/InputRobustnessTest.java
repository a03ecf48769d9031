package org.qchain.exact.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.qchain.exact.model.ModelErrorsTest.expect;
import static org.qchain.exact.model.ModelErrorsTest.parseError;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.atomic.AtomicReference;
import org.junit.jupiter.api.Test;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.MessageKey;
import org.qchain.exact.InputLimits;
import org.qchain.exact.NumberGrammar;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.RationalMatrix;

/**
 * Regression tests from a corpus of extreme inputs: deep nesting, huge numbers, odd characters, misplaced lines and
 * very large models. Each must end in a located error or a correct result, never a stack overflow, an overflow of
 * an int or minutes of work. The format rules are the project's own (docs/model-format.md); the arithmetic facts
 * are common practice, no source.
 */
class InputRobustnessTest {

    /** Runs {@code body} on a thread with a small (512 KB, half the default) stack, so deep recursion fails. */
    private static <T> T onSmallStack(java.util.function.Supplier<T> body) throws InterruptedException {
        AtomicReference<T> out = new AtomicReference<>();
        AtomicReference<Throwable> err = new AtomicReference<>();
        Thread t = new Thread(null, () -> {
            try {
                out.set(body.get());
            } catch (Throwable e) {
                err.set(e);
            }
        }, "small-stack", 512 * 1024);
        t.start();
        t.join();
        if (err.get() instanceof RuntimeException r) {
            throw r;
        }
        if (err.get() != null) {
            throw new AssertionError(err.get());
        }
        return out.get();
    }

    private static String model(String expr) {
        return "param p = 1/2\nstates A B\nA B " + expr + "\n";
    }

    private static Rational entryAB(String text) {
        return Chains.transitionMatrix(ModelParser.parse("m.chain", text), Map.of()).get(0, 1);
    }

    // --- deep nesting ---------------------------------------------------------------------------------------------

    @Test
    void tenThousandParenthesesAreRefusedAtTheFirstTooDeepOne() {
        String text = model("(".repeat(10_000) + "p" + ")".repeat(10_000));
        QchainException e = parseError(ErrorKey.NESTING_TOO_DEEP, 3, 5 + ExprParser.MAX_NESTING, text);
        assertEquals("m.chain:3:205: parentheses nested more than 200 deep", e.getMessage());
    }

    @Test
    void parenthesesAtTheNestingLimitParseOnASmallStack() throws InterruptedException {
        int d = ExprParser.MAX_NESTING;
        Rational v = onSmallStack(() -> entryAB(model("(".repeat(d) + "p" + ")".repeat(d))));
        assertEquals(Rational.of(1, 2), v);
    }

    @Test
    void aHundredThousandMinusSignsParseEvaluateAndPrint() throws InterruptedException {
        // an even count of signs: the value is p itself
        String text = model("-".repeat(100_000) + "p");
        Rational v = onSmallStack(() -> entryAB(text));
        assertEquals(Rational.of(1, 2), v);
        Expr e = ModelParser.parse("m.chain", text).transitions().get(0).expr();
        String plain = onSmallStack(() -> Expr.toPlain(e));
        assertEquals("-".repeat(100_000) + "p", plain);
        assertEquals(Rational.of(1, 2), onSmallStack(() -> ModelParser.parseExpression("<plain>", plain)
            .evaluate(n -> Rational.of(1, 2))));
        assertEquals(List.of("p"), List.copyOf(e.variables()));
    }

    @Test
    void nestedPowersFoldToTheProductOfTheExponents() throws InterruptedException {
        // ((((p^2)^2)^2)^2)^2 = p^32; with p = 1/2, 2^-32
        String expr = "p";
        for (int k = 0; k < 5; k++) {
            expr = "(" + expr + ")^2";
        }
        String e = expr;
        Rational v = onSmallStack(() -> entryAB(model(e)));
        assertEquals(Rational.of(1, 1L << 32), v);
    }

    @Test
    void aFlatSumOfAHundredThousandTermsWorks() throws InterruptedException {
        // 100,000 terms p/200000 with p = 1/2 sum to 1/4
        StringBuilder sb = new StringBuilder("p/200000");
        for (int k = 1; k < 100_000; k++) {
            sb.append(" + p/200000");
        }
        String text = model(sb.toString());
        assertEquals(Rational.of(1, 4), onSmallStack(() -> entryAB(text)));
        Model m = ModelParser.parse("m.chain", text);
        // the remainder A -> A = 1 - (sum) is built on top of the same deep tree
        assertEquals(Rational.of(3, 4), onSmallStack(() -> Chains.transitionMatrix(m, Map.of()).get(0, 0)));
        String plain = onSmallStack(() -> Expr.toPlain(m.entry(0, 0)));
        assertTrue(plain.startsWith("1 - (p / 200000 + p / 200000"), plain.substring(0, 40));
        Expr back = ModelParser.parseExpression("<plain>", plain);
        assertEquals(Rational.of(3, 4), onSmallStack(() -> back.evaluate(n -> Rational.of(1, 2))));
    }

    @Test
    void foldVisitsLeftBeforeRightOnDeepTrees() throws InterruptedException {
        // the names in order of first appearance, through the iterative walk
        StringBuilder sb = new StringBuilder("a");
        for (int k = 0; k < 50_000; k++) {
            sb.append(" - b * c");
        }
        Expr e = ModelParser.parseExpression("<e>", sb + " + d");
        assertEquals(List.of("a", "b", "c", "d"), onSmallStack(() -> List.copyOf(e.variables())));
    }

    // --- numbers: one grammar, one set of limits ------------------------------------------------------------------

    @Test
    void anExponentBeyondTheIntegerRangeIsALocatedError() {
        QchainException e = parseError(ErrorKey.SYNTAX, 3, 5, model("1e99999999999"));
        assertTrue(e.getMessage().contains("has an exponent beyond +-10000"), e.getMessage());
        QchainException r = assertThrows(QchainException.class, () -> Rational.parse("1e99999999999"));
        assertEquals(ErrorKey.SYNTAX, r.key());
        assertThrows(QchainException.class, () -> Rational.parse("1e-99999999999999999999999999"));
    }

    @Test
    void anExponentBeyondTheIntegerRangeInAnAssignmentIsABadArgument() {
        Model m = ModelParser.parse("m.chain", "param p\nstates A B\nA B p\n");
        QchainException e = assertThrows(QchainException.class, () -> Chains.parseAssignments(m, "p=1e99999999999"));
        assertEquals(ErrorKey.BAD_ARGUMENT, e.key());
        assertTrue(e.getMessage().contains("exponent beyond"), e.getMessage());
    }

    @Test
    void aFractionWithAMillionDigitsIsRefusedBeforeAnyArithmetic() {
        String big = "1" + "0".repeat(999_999);
        QchainException e = parseError(ErrorKey.NUMBER_TOO_LONG, 3, 5, model(big + "/" + big + "3"));
        assertEquals("1000000", e.args().get(1));
        assertEquals(String.valueOf(InputLimits.DEFAULT_MAX_NUMBER_DIGITS), e.args().get(2));
        assertTrue(e.getMessage().contains("(1000000 characters)"), e.getMessage());
        assertFalse(e.getMessage().contains("--"), "the exact module names no option: " + e.getMessage());
    }

    @Test
    void aDecimalWithTenMillionDigitsIsRefusedBeforeAnyArithmetic() {
        String dec = "0." + "3".repeat(10_000_000);
        QchainException e = parseError(ErrorKey.NUMBER_TOO_LONG, 3, 5, model(dec));
        assertEquals("10000001", e.args().get(1));
    }

    @Test
    void theDigitLimitCanBeRaised() {
        String num = "1" + "0".repeat(19_999);
        String text = model("1/" + num);
        parseError(ErrorKey.NUMBER_TOO_LONG, 3, 7, text);
        Model m = ModelParser.parse("m.chain", text, InputLimits.DEFAULT.withMaxNumberDigits(20_000));
        assertEquals(Rational.of(java.math.BigInteger.ONE, new java.math.BigInteger(num)),
            Chains.transitionMatrix(m, Map.of()).get(0, 1));
        assertEquals(Rational.of(1, 5), Rational.parse(".2", InputLimits.DEFAULT.withMaxNumberDigits(1)));
        assertEquals(ErrorKey.NUMBER_TOO_LONG, assertThrows(QchainException.class,
            () -> Rational.parse("0.25", InputLimits.DEFAULT.withMaxNumberDigits(2))).key());
    }

    @Test
    void rationalParseReadsExactlyTheConstantsOfACsvEntry() {
        // the same grammar: every text is accepted by both readers with the same value, or refused by both
        String[] texts = {"3", "-3", "+3", "1/20", "-1/20", " 0.25 ", ".5", "5.", "1e-3", "2.5E2", "1e-3/7",
            "- 3", "1 / 4", "1e10000", "1e-10000", "1e10001", "1/-2", "--1", "1e", "e3", ".", "0x10", "1_000",
            "\u0663", "\uff13", "1.2.3", "3p", "1/0", "1//2", "", " ", "inf", "NaN", "1,5"};
        for (String t : texts) {
            Rational viaParse = null;
            Rational viaCsv = null;
            MessageKey parseKey = null;
            MessageKey csvKey = null;
            try {
                viaParse = Rational.parse(t);
            } catch (QchainException e) {
                parseKey = e.key();
            }
            try {
                viaCsv = csvEntry().constant(t);
            } catch (QchainException e) {
                csvKey = e.key();
            }
            assertEquals(viaCsv, viaParse, "'" + t + "'");
            assertEquals(csvKey, parseKey, "'" + t + "'");
        }
        assertEquals(Rational.of(1, 7000), Rational.parse("1e-3/7"));
        assertEquals(ErrorKey.MALFORMED_NUMBER, assertThrows(QchainException.class, () -> Rational.parse("\u0663")).key());
        assertEquals(ErrorKey.DIVISION_BY_ZERO, assertThrows(QchainException.class, () -> Rational.parse("1/0")).key());
    }

    /** Reads a constant the way a CSV matrix entry is read. */
    private static CsvEntry csvEntry() {
        return t -> Lexer.constant(t, null, InputLimits.DEFAULT_MAX_NUMBER_DIGITS);
    }

    private interface CsvEntry {
        Rational constant(String t);
    }

    @Test
    void wholeNumbersAreAsciiDigitsOfAnySize() {
        assertEquals(java.util.Optional.of(java.math.BigInteger.valueOf(1_000_000)), NumberGrammar.whole("1_000_000"));
        assertEquals(java.util.Optional.of(java.math.BigInteger.valueOf(-3)), NumberGrammar.whole(" -3 "));
        assertEquals(java.util.Optional.of(new java.math.BigInteger("99999999999999999999")),
            NumberGrammar.whole("99999999999999999999"));
        for (String bad : new String[]{"\u0663", "1\u0663", "\uff11", "1.0", "1e3", "_1", "1_", "1__0", "", "-", "0x1"}) {
            assertEquals(java.util.Optional.empty(), NumberGrammar.whole(bad), bad);
        }
    }

    @Test
    void theDenseLimitInStatesIsTheIntegerSquareRoot() {
        assertEquals(4096, InputLimits.DEFAULT.maxDenseStates());
        assertEquals(2, InputLimits.DEFAULT.withMaxDenseEntries(8).maxDenseStates());
        assertEquals(3_037_000_499L, InputLimits.DEFAULT.withMaxDenseEntries(Long.MAX_VALUE).maxDenseStates());
    }

    // --- columns count characters ---------------------------------------------------------------------------------

    @Test
    void aNulByteIsNamedByItsCodePointAtItsColumn() {
        QchainException e = parseError(ErrorKey.SYNTAX, 2, 8, "states A B\nA B 1/2\u0000+p\n");
        assertEquals("m.chain:2:8: unexpected character U+0000 (a NUL byte)", e.getMessage());
    }

    @Test
    void aNoBreakSpaceIsNamedByItsCodePointAtItsColumn() {
        QchainException e = parseError(ErrorKey.SYNTAX, 2, 8, "states A B\nA B 1/2\u00a0+ 1/4\n");
        assertEquals("m.chain:2:8: unexpected character U+00A0 (a no-break space; write a plain space)", e.getMessage());
    }

    @Test
    void aCharacterOutsideTheBasicPlaneIsOneColumn() {
        // U+1D465 (mathematical italic x) is two Java chars, one character
        QchainException e = parseError(ErrorKey.SYNTAX, 2, 9, "states A B\nA B p * \uD835\uDC65\n");
        assertEquals("m.chain:2:9: unexpected character '\uD835\uDC65' (U+1D465)", e.getMessage());
        // after it, columns still count characters: the unterminated quote is the 7th character
        expect(ErrorKey.SYNTAX, 1, 7, () -> ModelParser.parseCsv("m.csv", "\"\uD835\uDC65\",B,\"C\n"));
    }

    // --- declarations before transitions --------------------------------------------------------------------------

    @Test
    void aParamLineAfterTheTransitionsIsRefusedWithWhereToMoveIt() {
        QchainException e = parseError(ErrorKey.PARAM_AFTER_TRANSITIONS, 4, 1,
            "states A B\nA B 1/2\nB A 1/3\nparam p = 1/2\n");
        assertEquals("m.chain:4:1: a 'param' line after the transitions: declare parameters before the first"
            + " transition (line 2); move this line up", e.getMessage());
    }

    @Test
    void aParamLineBetweenStatesAndTransitionsIsAccepted() {
        Model m = ModelParser.parse("m.chain", "states A B\nparam p = 1/2\nA B p\n");
        assertEquals(Rational.of(1, 2), Chains.transitionMatrix(m, Map.of()).get(0, 1));
    }

    // --- very large models ----------------------------------------------------------------------------------------

    @Test
    void aHundredThousandStatesOnOneLineParseAndTheDenseMatrixIsRefused() {
        StringBuilder sb = new StringBuilder("states");
        for (int k = 0; k < 100_000; k++) {
            sb.append(" S").append(k);
        }
        sb.append("\nS0 S99999 1/2\nS99999 S0 1/3\n");
        Model m = ModelParser.parse("big.chain", sb.toString());
        assertEquals(100_000, m.size());
        assertEquals(99_999, m.indexOf("S99999").getAsInt());
        assertTrue(m.listed(0, 99_999).isPresent());
        assertFalse(m.listed(99_999, 99_999).isPresent());
        QchainException e = assertThrows(QchainException.class, () -> Chains.transitionMatrix(m, Map.of()));
        assertEquals(ErrorKey.DENSE_TOO_LARGE, e.key());
        assertEquals("the model has 100000 states: its dense matrix would have 10000000000 entries (at least 40.0 GB"
            + " of memory), more than the limit of 16777216 entries (4096 states)", e.getMessage());
    }

    @Test
    void aHundredThousandTransitionLinesParse() {
        int n = 100_001;
        StringBuilder sb = new StringBuilder("states");
        for (int k = 0; k < n; k++) {
            sb.append(" S").append(k);
        }
        sb.append('\n');
        for (int k = 0; k + 1 < n; k++) {
            sb.append('S').append(k).append(" S").append(k + 1).append(" 1/2\n");
        }
        Model m = ModelParser.parse("big.chain", sb.toString());
        assertEquals(100_000, m.transitions().size());
        assertEquals("1 - 1/2", Expr.toPlain(m.entry(5, 5)));
        assertEquals(ErrorKey.DENSE_TOO_LARGE,
            assertThrows(QchainException.class, () -> Chains.requireDense(m)).key());
    }

    @Test
    void theDenseLimitCanBeRaisedOrLowered() {
        String text = "states A B C\nA B 1/2\n";
        RationalMatrix p = Chains.transitionMatrix(ModelParser.parse("m.chain", text, InputLimits.DEFAULT
            .withMaxDenseEntries(9)), Map.of());
        assertEquals(3, p.rows());
        Model small = ModelParser.parse("m.chain", text, InputLimits.DEFAULT.withMaxDenseEntries(8));
        assertEquals(ErrorKey.DENSE_TOO_LARGE,
            assertThrows(QchainException.class, () -> Chains.transitionMatrix(small, Map.of())).key());
    }

    @Test
    void aWideCsvHeaderIsRefusedBeforeItsRowsAreRead() {
        List<String> names = new ArrayList<>();
        for (int k = 0; k < 11; k++) {
            names.add("S" + k);
        }
        String csv = String.join(",", names) + "\n1,0\n";
        QchainException e = assertThrows(QchainException.class,
            () -> ModelParser.parseCsv("m.csv", csv, InputLimits.DEFAULT.withMaxDenseEntries(100)));
        assertEquals(ErrorKey.DENSE_TOO_LARGE, e.key());
    }
}
