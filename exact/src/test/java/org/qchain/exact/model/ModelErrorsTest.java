package org.qchain.exact.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;
import org.junit.jupiter.api.io.TempDir;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;

/**
 * Every error of the model format, with its key, line and column. The rules are the project's own format
 * (docs/model-format.md); the checks are common practice, no source, unless a comment says otherwise.
 */
class ModelErrorsTest {

    /** Runs {@code body}, expects a QchainException with this key at this position, and returns it. */
    static QchainException expect(ErrorKey key, int line, int col, Executable body) {
        QchainException e = assertThrows(QchainException.class, body);
        assertEquals(key, e.key(), e.getMessage());
        assertTrue(e.pos().isPresent(), "no position: " + e.getMessage());
        assertEquals(line, e.pos().get().line(), e.getMessage());
        assertEquals(col, e.pos().get().column(), e.getMessage());
        assertTrue(e.getMessage().startsWith(e.pos().get() + ": "), e.getMessage());
        return e;
    }

    static QchainException parseError(ErrorKey key, int line, int col, String text) {
        return expect(key, line, col, () -> ModelParser.parse("m.chain", text));
    }

    /** Parses (which must succeed) and expects the error from evaluating at the nominal values. */
    static QchainException evalError(ErrorKey key, int line, int col, String text) {
        Model m = ModelParser.parse("m.chain", text);
        return expect(key, line, col, () -> Chains.transitionMatrix(m, Map.of()));
    }

    static void assertMessage(String expected, QchainException e) {
        assertEquals(expected, e.getMessage());
    }

    @Test
    void unknownTargetStateIsReportedAtItsColumn() {
        QchainException e = parseError(ErrorKey.UNKNOWN_STATE, 2, 6, "states Up Down\nUp   Dwon 1/2\n");
        assertMessage("m.chain:2:6: unknown state 'Dwon'", e);
    }

    @Test
    void unknownSourceStateIsReportedAtItsColumn() {
        parseError(ErrorKey.UNKNOWN_STATE, 3, 3, "states Up Down\n\n  Upp Down 1/2\n");
    }

    @Test
    void duplicateStateIsReportedAtTheSecondName() {
        parseError(ErrorKey.DUPLICATE_STATE, 1, 16, "states Up Down Up\n");
    }

    @Test
    void duplicateTransitionNamesTheFirstLine() {
        QchainException e = parseError(ErrorKey.DUPLICATE_TRANSITION, 4, 1,
            "states Up Down\nUp Down 1/2\n# again:\nUp Down 1/3\n");
        assertMessage("m.chain:4:1: duplicate transition Up -> Down (first given on line 2)", e);
    }

    @Test
    void unknownParameterIsReportedAtItsColumn() {
        QchainException e = parseError(ErrorKey.UNKNOWN_PARAMETER, 3, 15,
            "param p\nstates A B\nA B 1/2 * p + q\n");
        assertEquals(List.of("q"), e.args());
    }

    @Test
    void parameterUsedBeforeItsDeclarationIsUnknown() {
        parseError(ErrorKey.UNKNOWN_PARAMETER, 2, 5, "states A B\nA B p\nparam p\n");
    }

    @Test
    void duplicateParameterIsReportedAtTheSecondName() {
        parseError(ErrorKey.DUPLICATE_PARAMETER, 2, 7, "param p\nparam p = 1/2\nstates A\n");
    }

    @Test
    void malformedNumbersAreReportedWhole() {
        assertMessage("m.chain:2:5: malformed number '1.2.3'",
            parseError(ErrorKey.MALFORMED_NUMBER, 2, 5, "states A B\nA B 1.2.3\n"));
        assertMessage("m.chain:2:9: malformed number '3p'",
            parseError(ErrorKey.MALFORMED_NUMBER, 2, 9, "states A B\nA B 1 - 3p\n"));
        parseError(ErrorKey.MALFORMED_NUMBER, 2, 5, "states A B\nA B 1e\n");
        parseError(ErrorKey.MALFORMED_NUMBER, 1, 11, "param p = 0.5.\nstates A\n");
    }

    @Test
    void rowWithListedSelfTransitionMustSumToOneAtItsLastTransition() {
        QchainException e = evalError(ErrorKey.ROW_SUM, 4, 1,
            "states A B\nA A 1/2\nB A 1\nA B 0.4   # sums to 9/10\n");
        assertMessage("m.chain:4:1: row A sums to 9/10, not 1", e);
    }

    @Test
    void negativeRemainderIsGivenAtTheRowsLastTransition() {
        QchainException e = evalError(ErrorKey.NEGATIVE_REMAINDER, 3, 3,
            "states A B C\nA B 2/3\n  A C 1/2\n");
        assertEquals(List.of("A", "-1/6"), e.args());
    }

    @Test
    void probabilityOutsideTheUnitIntervalIsReportedAtItsExpression() {
        QchainException e = evalError(ErrorKey.PROBABILITY_RANGE, 2, 7, "states A B\nA B   (3/2)\n");
        assertMessage("m.chain:2:7: probability A -> B is 3/2, outside [0, 1]", e);
        evalError(ErrorKey.PROBABILITY_RANGE, 2, 5, "states A B\nA B -1/4\nB A 1\n");
    }

    @Test
    void probabilityOutsideTheUnitIntervalAtGivenParameterValues() {
        Model m = ModelParser.parse("m.chain", "param a in (0, 2)\nstates A B\nA B a\n");
        expect(ErrorKey.PROBABILITY_RANGE, 3, 5, () -> Chains.transitionMatrix(m, Map.of("a", Rational.of(3, 2))));
    }

    @Test
    void negativeRateIsReportedAtItsExpression() {
        evalError(ErrorKey.NEGATIVE_RATE, 3, 5, "chain continuous\nstates A B\nA B 1/2 - 1\n");
    }

    @Test
    void divisionByZeroIsReportedAtTheDivision() {
        // parse succeeds (parsing does not evaluate); evaluation fails at the '/'
        evalError(ErrorKey.DIVISION_BY_ZERO, 2, 7, "states A B\nA B 1 / (1/2 - 0.5)\n");
        evalError(ErrorKey.DIVISION_BY_ZERO, 2, 6, "states A B\nA B 1/0\n");
        evalError(ErrorKey.DIVISION_BY_ZERO, 3, 12, "param p = 1/2\nstates A B\nA B (p-1/2)^(-2)\n");
    }

    @Test
    void divisionByZeroInANominalValueIsAParseError() {
        parseError(ErrorKey.DIVISION_BY_ZERO, 1, 12, "param p = 1/(2-2)\nstates A\n");
    }

    @Test
    void emptyStatesLineIsAnEmptyChain() {
        parseError(ErrorKey.EMPTY_CHAIN, 2, 1, "chain discrete\nstates   # none\n");
    }

    @Test
    void missingStatesLineIsReported() {
        assertMessage("m.chain:1:1: no 'states' line before the end of the file; declare the states first, e.g. 'states Up Down'",
            parseError(ErrorKey.MISSING_STATES, 1, 1, "# nothing here\nchain discrete\n"));
        parseError(ErrorKey.MISSING_STATES, 1, 1, "");
    }

    @Test
    void transitionBeforeTheStatesLineIsReported() {
        parseError(ErrorKey.MISSING_STATES, 2, 1, "chain discrete\nUp Down 1/2\nstates Up Down\n");
        parseError(ErrorKey.MISSING_STATES, 1, 1, "Up Down 1/2\n");
    }

    @Test
    void garbageAfterAnExpressionIsReportedAtItsStart() {
        QchainException e = parseError(ErrorKey.UNEXPECTED_TEXT, 2, 9, "states A B\nA B 1/2 3/4\n");
        assertMessage("m.chain:2:9: unexpected '3' after the expression (write '*' for a product)", e);
        parseError(ErrorKey.UNEXPECTED_TEXT, 2, 8, "states A B\nA B 1/2) \n");
        assertMessage("m.chain:1:15: unexpected 'in' after the nominal value",
            parseError(ErrorKey.UNEXPECTED_TEXT, 1, 15, "param p = 1/2 in (0, 1)\nstates A\n"));
        parseError(ErrorKey.UNEXPECTED_TEXT, 1, 9, "param p q\nstates A\n");
    }

    @Test
    void unknownKeywordIsReported() {
        parseError(ErrorKey.UNKNOWN_KEYWORD, 1, 1, "parm p\nstates A B\n");
        parseError(ErrorKey.UNKNOWN_KEYWORD, 2, 3, "states A B\n  foo bar\n");
        parseError(ErrorKey.UNKNOWN_KEYWORD, 1, 1, "Chain discrete\nstates A\n");
    }

    @Test
    void functionsAreNotSupported() {
        QchainException e = parseError(ErrorKey.FUNCTION_NOT_SUPPORTED, 3, 9, "param p\nstates A B\nA B 1 - sqrt(p)\n");
        assertTrue(e.getMessage().contains("functions are not supported: sqrt"), e.getMessage());
    }

    @Test
    void continuousChainRejectsAListedSelfRate() {
        parseError(ErrorKey.SELF_RATE, 3, 1, "chain continuous\nstates A B\nA A 2\n");
    }

    @Test
    void reservedAndMalformedNames() {
        parseError(ErrorKey.RESERVED_NAME, 1, 10, "states A param\n");
        parseError(ErrorKey.RESERVED_NAME, 1, 7, "param inf\nstates A\n");
        parseError(ErrorKey.INVALID_NAME, 1, 8, "states A,B\n");
        parseError(ErrorKey.INVALID_NAME, 1, 10, "states A -B\n");
        parseError(ErrorKey.INVALID_NAME, 1, 7, "param 2p\nstates A\n");
        parseError(ErrorKey.INVALID_NAME, 1, 7, "param p-q\nstates A\n");
    }

    @Test
    void secondChainOrStatesLineNamesTheFirst() {
        assertMessage("m.chain:2:1: a second 'chain' line (the first is on line 1)",
            parseError(ErrorKey.DUPLICATE_LINE, 2, 1, "chain discrete\nchain discrete\nstates A\n"));
        parseError(ErrorKey.DUPLICATE_LINE, 3, 1, "states A\n\nstates B\n");
    }

    @Test
    void chainLineMustComeFirstAndNameAKnownKind() {
        parseError(ErrorKey.SYNTAX, 2, 1, "param p\nchain continuous\nstates A\n");
        parseError(ErrorKey.SYNTAX, 1, 7, "chain markov\nstates A\n");
        parseError(ErrorKey.SYNTAX, 1, 6, "chain\nstates A\n");
        parseError(ErrorKey.UNEXPECTED_TEXT, 1, 16, "chain discrete now\nstates A\n");
    }

    @Test
    void nominalValueMustLieInTheDomain() {
        assertMessage("m.chain:1:21: value 3/2 of parameter 'p' is outside its domain (0, 1)",
            parseError(ErrorKey.VALUE_OUTSIDE_DOMAIN, 1, 21, "param p in (0, 1) = 3/2\nstates A\n"));
        assertMessage("m.chain:1:23: value 0.6 of parameter 'p' is outside its domain (0, 1/2]",
            parseError(ErrorKey.VALUE_OUTSIDE_DOMAIN, 1, 23, "param p in (0, 1/2] = 0.6  # as written\nstates A\n"));
        // default domain of a discrete chain is (0, 1): 0 is outside
        parseError(ErrorKey.VALUE_OUTSIDE_DOMAIN, 1, 11, "param p = 0\nstates A\n");
        // default domain of a continuous chain is (0, inf): 5 is inside, -1 outside
        ModelParser.parse("m.chain", "chain continuous\nparam mu = 5\nstates A\n");
        parseError(ErrorKey.VALUE_OUTSIDE_DOMAIN, 2, 12, "chain continuous\nparam mu = -1\nstates A\n");
    }

    @Test
    void domainsMustBeWellFormed() {
        assertMessage("m.chain:1:12: invalid domain (1, 0): the lower end is above the upper end",
            parseError(ErrorKey.BAD_DOMAIN, 1, 12, "param p in (1, 0)\nstates A\n"));
        parseError(ErrorKey.BAD_DOMAIN, 1, 19, "param p in [0, inf]\nstates A\n");
        parseError(ErrorKey.BAD_DOMAIN, 1, 13, "param p in (-inf, 0)\nstates A\n");
        parseError(ErrorKey.BAD_DOMAIN, 1, 12, "param p in [1/2, 1/2)\nstates A\n");
        parseError(ErrorKey.SYNTAX, 1, 12, "param p in 0, 1\nstates A\n");
        parseError(ErrorKey.SYNTAX, 1, 14, "param p in (0; 1)\nstates A\n");
        parseError(ErrorKey.SYNTAX, 1, 17, "param p in (0, 1}\nstates A\n");
        parseError(ErrorKey.SYNTAX, 2, 16, "param q\nparam p in (0, q)\nstates A\n");
    }

    @Test
    void closedAndHalfOpenDomainsAreRead() {
        Model m = ModelParser.parse("m.chain",
            "param a in [0, 1] = 0\nparam b in (0, 1/2] = 1/2\nparam c in [1, inf) = 1\nstates A\n");
        assertEquals("[0, 1]", m.param("a").orElseThrow().domain().toString());
        assertEquals("(0, 1/2]", m.param("b").orElseThrow().domain().toString());
        assertEquals("[1, inf)", m.param("c").orElseThrow().domain().toString());
        assertEquals(Rational.ZERO, m.nominalValues().get("a"));
    }

    @Test
    void expressionSyntaxErrors() {
        parseError(ErrorKey.SYNTAX, 2, 10, "states A B\nA B 1/2 +\n");
        parseError(ErrorKey.SYNTAX, 2, 15, "states A B\nA B (1/2 + 1/4\n");
        assertTrue(parseError(ErrorKey.SYNTAX, 2, 10, "states A B\nA B 1/2 ** 2\n").getMessage()
            .endsWith("found '*' (write ^ for a power)"));
        parseError(ErrorKey.SYNTAX, 3, 7, "param p\nstates A B\nA B p^q\n");
        parseError(ErrorKey.SYNTAX, 3, 7, "param p\nstates A B\nA B p^0.5\n");
        parseError(ErrorKey.SYNTAX, 3, 8, "param p\nstates A B\nA B p^2^3\n");
        parseError(ErrorKey.SYNTAX, 2, 4, "states A B\nA B\n");
        parseError(ErrorKey.SYNTAX, 2, 2, "states A B\nA\n");
        QchainException e = parseError(ErrorKey.SYNTAX, 3, 7, "param p\nstates A B\nA B 1 \u2212 p\n");
        assertTrue(e.getMessage().contains("U+2212"), e.getMessage());
    }

    @Test
    void freeParametersAreNamedWhenEvaluating() {
        Model m = ModelParser.parse("m.chain", "param p\nparam unused\nparam r\nstates A B\nA B p\nB A r\n");
        QchainException e = assertThrows(QchainException.class, () -> Chains.transitionMatrix(m, Map.of()));
        assertEquals(ErrorKey.FREE_PARAMETERS, e.key());
        assertEquals(List.of("p, r"), e.args());
        e = assertThrows(QchainException.class, () -> Chains.transitionMatrix(m, Map.of("p", Rational.of(1, 2))));
        assertEquals(List.of("r"), e.args());
    }

    @Test
    void valuesGivenInCodeAreChecked() {
        Model m = ModelParser.parse("m.chain", "param p\nstates A B\nA B p\n");
        QchainException e = assertThrows(QchainException.class,
            () -> Chains.transitionMatrix(m, Map.of("p", Rational.of(2))));
        assertEquals(ErrorKey.VALUE_OUTSIDE_DOMAIN, e.key());
        e = assertThrows(QchainException.class, () -> Chains.transitionMatrix(m, Map.of("x", Rational.of(2))));
        assertEquals(ErrorKey.BAD_ARGUMENT, e.key());
    }

    @Test
    void unreadableFileIsReportedWithItsName(@TempDir Path dir) throws Exception {
        Path missing = dir.resolve("nope.chain");
        QchainException e = assertThrows(QchainException.class, () -> ModelParser.parseFile(missing));
        assertEquals(ErrorKey.CANNOT_READ, e.key());
        assertEquals("cannot read " + missing + ": no such file", e.getMessage());
        e = assertThrows(QchainException.class, () -> ModelParser.parseFile(dir));
        assertEquals(ErrorKey.CANNOT_READ, e.key());
        Path latin1 = dir.resolve("latin1.chain");
        Files.write(latin1, new byte[] {'s', 't', 'a', 't', 'e', 's', ' ', (byte) 0xE9, '\n'});
        e = assertThrows(QchainException.class, () -> ModelParser.parseFile(latin1));
        assertEquals(ErrorKey.CANNOT_READ, e.key());
    }

    @Test
    void errorsInAFileCarryTheNameAsGiven(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("bad.chain");
        Files.writeString(f, "states A B\r\nA C 1/2\r\n");
        expect(ErrorKey.UNKNOWN_STATE, 2, 3, () -> ModelParser.parseFile(f));
        QchainException e = assertThrows(QchainException.class, () -> ModelParser.parseFile(f));
        assertEquals(f + ":2:3: unknown state 'C'", e.getMessage());
    }
}
