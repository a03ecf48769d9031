package org.qchain.exact.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.util.List;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;

/**
 * The reference-file reader: forms, shapes and bad inputs. CSV structure as in RFC 4180 (Shafranovich), JSON as in
 * RFC 8259 (Bray); the shapes and messages are this project's own (common practice, no source).
 */
class ReferenceReaderTest {
    private static final List<String> S3 = List.of("Up", "Worn", "Down");
    private static final Target M3 = Target.matrix(S3, S3, "the model has 3 states", "the model has 3 states");
    private static final Target V3 = Target.vector(S3, "the model has 3 states");

    /** What a read produced: "row,col" -> text, plus the form. */
    private record Read(TreeMap<String, String> values, ReferenceReader.Form form) {
    }

    private static Read read(Target t, String text) {
        TreeMap<String, String> got = new TreeMap<>();
        ReferenceReader.Summary s = ReferenceReader.read("ref.csv", new StringReader(text), t,
            (i, j, v, pos) -> got.put(i + "," + j, v.text() + "@" + pos.line() + ":" + pos.column()));
        assertEquals(got.size(), s.values());
        return new Read(got, s.form());
    }

    private static QchainException fails(Target t, String text) {
        return assertThrows(QchainException.class, () -> read(t, text));
    }

    private static final String PLAIN = "0.5,0.5,0\n0,0.9,0.1\n1,0,0\n";

    @Test
    void plainTableInModelOrder() {
        Read r = read(M3, PLAIN);
        assertEquals(ReferenceReader.Form.CSV_TABLE, r.form());
        assertEquals(9, r.values().size());
        assertEquals("0.1@2:7", r.values().get("1,2"));
        assertEquals("1@3:1", r.values().get("2,0"));
    }

    // RFC 4180: CRLF ends a record; a UTF-8 byte order mark (U+FEFF) at the start is not part of the data
    @Test
    void byteOrderMarkAndCrLf() {
        Read r = read(M3, "\uFEFF" + PLAIN.replace("\n", "\r\n"));
        assertEquals(read(M3, PLAIN).values(), r.values());
    }

    // our choice (documented in docs/commands.md): a header in another order is mapped by name
    @Test
    void headerInAnotherOrderIsMappedByName() {
        Read r = read(M3, "Down,Up,Worn\n0,0.5,0.5\n0.1,0,0.9\n0,1,0\n");
        assertEquals("0.5@2:3", r.values().get("0,0"));
        assertEquals("0@2:1", r.values().get("0,2"));
        assertEquals("0.1@3:1", r.values().get("1,2"));
    }

    @Test
    void rowLabelsAfterAnEmptyHeaderCellMayComeInAnyOrder() {
        Read r = read(M3, ",Up,Worn,Down\nDown,1,0,0\nUp,0.5,0.5,0\nWorn,0,0.9,0.1\n");
        assertEquals(read(M3, PLAIN).values().keySet(), r.values().keySet());
        assertEquals("1@2:6", r.values().get("2,0"));
        assertEquals("0.1@4:12", r.values().get("1,2"));
    }

    @Test
    void rowLabelsWithoutHeader() {
        Read r = read(M3, "Up,0.5,0.5,0\nWorn,0,0.9,0.1\nDown,1,0,0\n");
        assertEquals(9, r.values().size());
        assertEquals("0.1@2:12", r.values().get("1,2"));
    }

    @Test
    void longFormAnyOrderAnySubset() {
        Read r = read(M3, "from,to,value\nDown,Up,1\nUp,Up,0.5\n");
        assertEquals(ReferenceReader.Form.CSV_LONG, r.form());
        assertEquals(2, r.values().size());
        assertEquals("1@2:9", r.values().get("2,0"));
        Read noHeader = read(M3, "Worn, Down, 0x1.999999999999ap-4\n");
        assertEquals("0x1.999999999999ap-4@1:13", noHeader.values().get("1,2"));
    }

    @Test
    void longFormRepeatedEntryIsRefused() {
        QchainException e = fails(M3, "from,to,value\nUp,Up,0.5\nWorn,Up,0\nUp,Up,0.5\n");
        assertEquals(ErrorKey.REF_DUPLICATE, e.key());
        assertEquals("ref.csv:4:7: a second value for Up -> Up (the first is on line 2)", e.getMessage());
    }

    // the issue's own example of a message: a ragged row names the line and what was expected
    @Test
    void raggedRowSaysWhatWasExpected() {
        List<String> s6 = List.of("A", "B", "C", "D", "E", "F");
        Target t = Target.matrix(s6, s6, "the model has 6 states", "the model has 6 states");
        String row = "0,0,0,0,0,1\n";
        QchainException e = fails(t, "A,B,C,D,E,F\n" + row + row + "0,0,0,0,1\n" + row);
        assertEquals(ErrorKey.REF_VALUE_COUNT, e.key());
        assertEquals("ref.csv:4:1: 5 values, the model has 6 states", e.getMessage());
    }

    @Test
    void unknownStateInHeader() {
        QchainException e = fails(M3, "Up,Worn,Broken\n" + PLAIN);
        assertEquals(ErrorKey.REF_UNKNOWN_STATE, e.key());
        assertEquals("ref.csv:1:9: unknown state 'Broken'; expected one of Up, Worn, Down", e.getMessage());
    }

    @Test
    void unknownRowLabel() {
        QchainException e = fails(M3, ",Up,Worn,Down\nUp,0.5,0.5,0\nBroken,0,0.9,0.1\n");
        assertEquals(ErrorKey.REF_UNKNOWN_STATE, e.key());
        assertEquals(3, e.pos().orElseThrow().line());
    }

    @Test
    void headerMissingAStateOrNamingOneTwice() {
        assertEquals(ErrorKey.REF_SHAPE, fails(M3, "Up,Worn\n0.5,0.5\n").key());
        assertEquals(ErrorKey.REF_SHAPE, fails(M3, "Up,Worn,Up\n" + PLAIN).key());
    }

    @Test
    void rowLabelGivenTwiceOrMissing() {
        QchainException twice = fails(M3, ",Up,Worn,Down\nUp,0.5,0.5,0\nUp,0.5,0.5,0\nDown,1,0,0\n");
        assertEquals(ErrorKey.REF_DUPLICATE, twice.key());
        assertEquals("ref.csv:3:1: a second value for row Up (the first is on line 2)", twice.getMessage());
        QchainException missing = fails(M3, ",Up,Worn,Down\nUp,0.5,0.5,0\nDown,1,0,0\n");
        assertEquals(ErrorKey.REF_MISSING, missing.key());
        assertTrue(missing.getMessage().endsWith("no value for row Worn"), missing.getMessage());
    }

    @Test
    void tooFewAndTooManyRows() {
        QchainException few = fails(M3, "0.5,0.5,0\n0,0.9,0.1\n");
        assertEquals(ErrorKey.REF_ROW_COUNT, few.key());
        assertEquals("ref.csv:2:1: 2 rows of values, the model has 3 states", few.getMessage());
        QchainException many = fails(M3, PLAIN + "1,0,0\n");
        assertEquals("ref.csv:4:1: 4 rows of values, the model has 3 states", many.getMessage());
    }

    @Test
    void emptyFiles() {
        assertEquals(ErrorKey.REF_EMPTY, fails(M3, "").key());
        assertEquals(ErrorKey.REF_EMPTY, fails(M3, "\uFEFF\r\n  \n").key());
        assertEquals(ErrorKey.REF_EMPTY, fails(V3, "Up,Worn,Down\n").key());
        assertEquals("ref.csv:1:1: the file has no values; expected 3 values (the model has 3 states)",
            fails(V3, "{ }").getMessage());
        assertEquals(ErrorKey.REF_EMPTY, fails(M3, "from,to,value\n").key());
    }

    @Test
    void nonNumbersAndEmptyFields() {
        QchainException e = fails(M3, "0.5,0.5,0\n0,abc,0.1\n1,0,0\n");
        assertEquals(ErrorKey.REF_NOT_A_NUMBER, e.key());
        assertTrue(e.getMessage().startsWith("ref.csv:2:3: 'abc' is not a number; expected a decimal"), e.getMessage());
        QchainException empty = fails(M3, "0.5,0.5,0\n0,,0.1\n1,0,0\n");
        assertTrue(empty.getMessage().startsWith("ref.csv:2:3: '' is not a number (an empty field)"), empty.getMessage());
    }

    // IEEE 754-2019 non-finite values are read (so they can be reported), in the spellings tools write them
    @Test
    void infinitiesAndNaNsAreRead() {
        TreeMap<String, Boolean> finite = new TreeMap<>();
        ReferenceReader.read("r.csv", new StringReader("inf,-Infinity,NaN\n"), V3,
            (i, j, v, p) -> finite.put(v.text(), v.isFinite()));
        assertEquals(3, finite.size());
        assertFalse(finite.values().stream().anyMatch(b -> b));
    }

    @Test
    void quotedFieldsAreRead() {
        Read r = read(M3, "\"Up\",\"Worn\",\"Down\"\n\"0.5\",0.5,0\n0,0.9,0.1\n1,0,0\n");
        assertEquals("0.5@2:1", r.values().get("0,0"));
    }

    @Test
    void vectorForms() {
        Read row = read(V3, "0.2,0.3,0.5\n");
        assertEquals(ReferenceReader.Form.CSV_TABLE, row.form());
        Read named = read(V3, "Down,Up,Worn\n0.5,0.2,0.3\n");
        assertEquals("0.5@2:1", named.values().get("0,2"));
        Read column = read(V3, "0.2\n0.3\n0.5\n");
        assertEquals(ReferenceReader.Form.CSV_COLUMN, column.form());
        assertEquals("0.5@3:1", column.values().get("0,2"));
        Read labelled = read(V3, "state,value\nDown,0.5\n");
        assertEquals(ReferenceReader.Form.CSV_LABELLED, labelled.form());
        assertEquals(1, labelled.values().size());
        assertEquals(ErrorKey.REF_VALUE_COUNT, fails(V3, "0.2,0.3\n").key());
        assertEquals(ErrorKey.REF_VALUE_COUNT, fails(V3, "0.2\n0.3\n").key());
        assertEquals(ErrorKey.REF_SHAPE, fails(V3, "0.2,0.3,0.5\n0.2,0.3,0.5\n").key());
        assertEquals(ErrorKey.REF_UNKNOWN_STATE, fails(V3, "Broken,0.5\n").key());
    }

    @Test
    void scalarForms() {
        Target t = Target.scalar("availability");
        assertEquals("0.999@1:1", read(t, "0.999\n").values().get("0,0"));
        assertEquals("0.999@2:1", read(t, "availability\n0.999\n").values().get("0,0"));
        assertEquals("0.999@1:1", read(t, "0.999").values().get("0,0"));
        assertEquals("0.5@1:2", read(t, "[0.5]").values().get("0,0"));
        assertEquals(ErrorKey.REF_SHAPE, fails(t, "0.5\n0.6\n").key());
    }

    @Test
    void jsonNestedArray() {
        Read r = read(M3, "[[0.5, 0.5, 0],\n [0, 0.9, 0.1],\n [1, 0, 0]]");
        assertEquals(ReferenceReader.Form.JSON_ARRAY, r.form());
        assertEquals(read(M3, PLAIN).values().keySet(), r.values().keySet());
        assertEquals("0.1@2:11", r.values().get("1,2"));
        QchainException shortRow = fails(M3, "[[0.5, 0.5, 0],\n [0, 0.9],\n [1, 0, 0]]");
        assertEquals("ref.csv:2:2: 2 values, the model has 3 states", shortRow.getMessage());
        QchainException longRow = fails(M3, "[[0.5, 0.5, 0, 1, 2]]");
        assertEquals("ref.csv:1:2: 5 values, the model has 3 states", longRow.getMessage());
        assertEquals("ref.csv:1:1: 1 rows of values, the model has 3 states", fails(M3, "[[1,0,0]]").getMessage());
        assertEquals(ErrorKey.SYNTAX, fails(M3, "[[1,0,0] [0,1,0]]").key());
        assertEquals(ErrorKey.SYNTAX, fails(V3, "[1,0,0] x").key());
    }

    @Test
    void jsonObjectsKeyedByState() {
        Read r = read(M3, "{\"Down\": {\"Up\": 1}, \"Up\": [0.5, \"0.5\", 0]}");
        assertEquals(ReferenceReader.Form.JSON_OBJECT, r.form());
        assertEquals(4, r.values().size());
        assertEquals("1@1:17", r.values().get("2,0"));
        Read v = read(V3, "{\"Worn\": \"0x1.8p-3\", \"Up\": NaN, \"Down\": null}");
        assertEquals(3, v.values().size());
        assertEquals(ErrorKey.REF_UNKNOWN_STATE, fails(V3, "{\"Broken\": 0.5}").key());
        assertEquals(ErrorKey.REF_DUPLICATE, fails(V3, "{\"Up\": 0.5, \"Up\": 0.5}").key());
        assertEquals(ErrorKey.REF_NOT_A_NUMBER, fails(V3, "{\"Up\": true}").key());
    }

    @Test
    void valuesAreReadExactly() {
        TreeMap<Integer, Rational> got = new TreeMap<>();
        ReferenceReader.read("r.csv", new StringReader("0.1,1.5e-3,0x1.8p-3\n"), V3, (i, j, v, p) ->
            got.put(j, ((GivenValue.Finite) v).value()));
        assertEquals(Rational.of(1, 10), got.get(0));
        assertEquals(Rational.of(3, 2000), got.get(1));
        assertEquals(Rational.of(3, 16), got.get(2));
    }
}
