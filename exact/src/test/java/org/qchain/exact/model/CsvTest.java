package org.qchain.exact.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.qchain.exact.model.ModelErrorsTest.expect;
import static org.qchain.exact.model.ModelParserTest.matrix;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.RationalMatrix;

/**
 * CSV matrices. Field syntax follows RFC 4180 (Shafranovich, Common Format and MIME Type for Comma-Separated Values
 * (CSV) Files, section 2); header detection, S1..Sn names and the label column are the project's own rules
 * (docs/model-format.md), common practice, no source.
 */
class CsvTest {
    static final RationalMatrix ROBOT = matrix("3/5 3/10 1/10", "3/10 2/5 3/10", "1/5 2/5 2/5");

    static Model csv(String text) {
        return ModelParser.parseCsv("m.csv", text);
    }

    @Test
    void headerRowNamesTheStates() {
        Model m = csv("Charging,Picking,Idle\n3/5,3/10,1/10\n0.3,0.4,0.3\n1/5,2/5,2/5\n");
        assertEquals(List.of("Charging", "Picking", "Idle"), m.states());
        assertEquals(ChainKind.DISCRETE, m.kind());
        assertEquals(ROBOT, Chains.transitionMatrix(m));
    }

    @Test
    void withoutHeaderTheStatesAreS1ToSn() {
        Model m = csv("3/5, 3/10, 1/10\n 0.3 ,0.4,0.3\n1/5,2/5,2/5");
        assertEquals(List.of("S1", "S2", "S3"), m.states());
        assertEquals(ROBOT, Chains.transitionMatrix(m));
    }

    @Test
    void crlfLineEndingsAndAFinalLineWithoutBreak() {
        // RFC 4180 section 2, rules 1 and 2: records end with CRLF; the last record may lack a line break
        Model m = csv("A,B\r\n1/2,1/2\r\n1,0");
        assertEquals(matrix("1/2 1/2", "1 0"), Chains.transitionMatrix(m));
        assertEquals(List.of("A", "B"), m.states());
    }

    @Test
    void quotedHeaderNamesMayHoldCommasAndDoubledQuotes() {
        // RFC 4180 section 2, rules 5 to 7: quoted fields may contain commas; a quote inside is written twice
        Model m = csv("\"Worn, leaking\",\"Up \"\"A\"\"\"\r\n0.5,0.5\r\n\"1\",0\r\n");
        assertEquals(List.of("Worn, leaking", "Up \"A\""), m.states());
        assertEquals(matrix("1/2 1/2", "1 0"), Chains.transitionMatrix(m));
    }

    @Test
    void quotedNumericFirstRowIsAHeader() {
        // the project's rule: a first row with any quoted field is a header, so states can be named 0, 1, 2
        Model m = csv("\"0\",\"1\"\n0,1\n1,0\n");
        assertEquals(List.of("0", "1"), m.states());
    }

    @Test
    void firstRowMixingNumbersAndWordsIsDataWithATypo() {
        // the project's rule: such a row is not a header, so the typo is reported where it is
        expect(ErrorKey.MALFORMED_NUMBER, 1, 5, () -> csv("0.5,0.4x,0.1\n0,1,0\n0,0,1\n"));
        expect(ErrorKey.MALFORMED_NUMBER, 1, 1, () -> csv("Up,2\n1,0\n0,1\n"));
    }

    @Test
    void byteOrderMarkIsSkipped(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("M.CSV");
        Files.write(f, ("\uFEFFUp,Down\n0.9,0.1\n1/2,1/2\n").getBytes(StandardCharsets.UTF_8));
        Model m = ModelParser.parseFile(f);
        assertEquals(List.of("Up", "Down"), m.states());
        assertEquals(f.toString(), m.source());
    }

    @Test
    void labelColumnAfterAnEmptyCornerCell() {
        Model m = csv(",Up,Down\nUp,0.9,0.1\nDown,1/2,1/2\n");
        assertEquals(List.of("Up", "Down"), m.states());
        assertEquals(matrix("9/10 1/10", "1/2 1/2"), Chains.transitionMatrix(m));
        expect(ErrorKey.SYNTAX, 3, 1, () -> csv(",Up,Down\nUp,0.9,0.1\nDwn,1/2,1/2\n"));
    }

    @Test
    void blankLinesAreSkippedAndLineNumbersStayTrue() {
        expect(ErrorKey.MALFORMED_NUMBER, 4, 5, () -> csv("A,B\n\n1,0\n1/2,x\n"));
    }

    @Test
    void malformedEntryIsReportedAtItsCell() {
        QchainException e = expect(ErrorKey.MALFORMED_NUMBER, 3, 7, () -> csv("A,B\n1,0\n0.5,  0.5.0\n"));
        assertEquals("m.csv:3:7: malformed number '0.5.0'", e.getMessage());
        expect(ErrorKey.SYNTAX, 2, 3, () -> csv("A,B\n1,\n0,1\n"));
        expect(ErrorKey.DIVISION_BY_ZERO, 2, 3, () -> csv("A,B\n1,1/0\n0,1\n"));
    }

    @Test
    void raggedRowIsACsvShapeError() {
        QchainException e = expect(ErrorKey.CSV_SHAPE, 3, 1, () -> csv("A,B,C\n1,0,0\n1,0\n0,0,1\n"));
        assertEquals("m.csv:3:1: row 2 has 2 entries, expected 3", e.getMessage());
    }

    @Test
    void nonSquareMatrixIsReported() {
        expect(ErrorKey.CSV_NOT_SQUARE, 3, 1, () -> csv("1,0\n0,1\n1/2,1/2\n"));
        QchainException e = expect(ErrorKey.CSV_NOT_SQUARE, 2, 1, () -> csv("A,B,C\n1,0,0\n"));
        assertEquals(List.of("1", "3"), e.args());
    }

    @Test
    void rowNotSummingToOneGivesTheExactSum() {
        QchainException e = expect(ErrorKey.ROW_SUM, 2, 11, () -> csv("A,B,C\n1/3,0.333,1/3\n0,1,0\n0,0,1\n"));
        assertEquals("m.csv:2:11: row A sums to 2999/3000, not 1", e.getMessage());
    }

    @Test
    void negativeEntryIsReportedAtItsCell() {
        QchainException e = expect(ErrorKey.PROBABILITY_RANGE, 3, 1, () -> csv("A,B\n0,1\n-1,2\n"));
        assertEquals("m.csv:3:1: probability B -> A is -1, outside [0, 1]", e.getMessage());
    }

    @Test
    void duplicateOrEmptyHeaderNames() {
        expect(ErrorKey.DUPLICATE_STATE, 1, 5, () -> csv("A,B,A\n1,0,0\n0,1,0\n0,0,1\n"));
        expect(ErrorKey.SYNTAX, 1, 3, () -> csv("A,,B\n1,0,0\n0,1,0\n0,0,1\n"));
        expect(ErrorKey.INVALID_NAME, 1, 3, () -> csv("A,\"B\nC\"\n1,0\n0,1\n"));
    }

    @Test
    void quoteErrors() {
        expect(ErrorKey.SYNTAX, 1, 3, () -> csv("A,\"B\n1,0\n"));
        expect(ErrorKey.SYNTAX, 1, 6, () -> csv("A,\"B\"x\n1,0\n0,1\n"));
        expect(ErrorKey.SYNTAX, 1, 4, () -> csv("A,B\"\n1,0\n0,1\n"));
    }

    @Test
    void emptyFileIsAnEmptyChain() {
        expect(ErrorKey.EMPTY_CHAIN, 1, 1, () -> csv("\n\n"));
        QchainException e = assertThrows(QchainException.class, () -> csv(""));
        assertEquals(ErrorKey.EMPTY_CHAIN, e.key());
    }
}
