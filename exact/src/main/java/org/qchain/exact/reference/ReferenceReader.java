package org.qchain.exact.reference;

import java.io.IOException;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.SourcePos;
import org.qchain.exact.reference.CsvRecords.Field;
import org.qchain.exact.reference.CsvRecords.Row;
import org.qchain.exact.reference.JsonTokens.Kind;
import org.qchain.exact.reference.JsonTokens.Token;

/**
 * Reads a file of numbers another tool produced, checks its shape against a {@link Target}, and hands each value,
 * read exactly, to a {@link Sink} as soon as it is read. Only one CSV record or JSON token is held at a time, so
 * memory is proportional to the target (one line number per entry, to report duplicates), not to the file.
 *
 * <h2>Forms</h2>
 * The form is recognised from the content (a file starting with {@code [} or <code>{</code> is JSON), not the file
 * name. UTF-8, with or without a byte order mark; lines end in LF, CRLF or CR.
 * <ul>
 * <li><b>CSV table</b> (matrix): one row per row state in the target's order, one value per column state. An
 * optional header row names the columns; it may list them in any order (values are mapped by name; every column
 * state must appear once). When the header's first cell is empty, every row starts with its row state's name,
 * and rows may then come in any order (every row state once). Without a header, a row may still start with its
 * state's name.</li>
 * <li><b>Long CSV</b> (matrix): records {@code from,to,value}, optionally under the header {@code from,to,value};
 * any order, any subset (each entry at most once).</li>
 * <li><b>CSV vector</b>: one row of values in the target's order, optionally under a header of names (any order);
 * or one value per line in order; or {@code state,value} records (optionally under a two-cell header such as
 * {@code state,value}), any order, any subset.</li>
 * <li><b>CSV number</b>: one value, optionally under a one-cell header.</li>
 * <li><b>JSON</b> (RFC 8259): a matrix as a nested array {@code [[...], ...]} (complete), or an object keyed by row
 * state whose values are objects keyed by column state (any subset) or complete arrays; a vector as an array
 * (complete) or an object keyed by state (any subset); a number as a number, a string, or a one-element array.
 * Numbers may also be written as strings ({@code "0x1.8p-3"}, {@code "1/3"}, {@code "inf"}).</li>
 * </ul>
 * Values are read by {@link GivenValue#parse(String)}.
 *
 * <h2>Errors</h2>
 * A wrong shape, an unknown or repeated state name or a value that is not a number stops the reading with a
 * {@link QchainException} at the place in the file: {@code ref.csv:4:1: 5 values, the model has 6 states}.
 */
public final class ReferenceReader {
    /** Receives each value as it is read. */
    @FunctionalInterface
    public interface Sink {
        /**
         * One value of the file.
         *
         * @param row   the target row index
         * @param col   the target column index
         * @param value the value as read
         * @param pos   where it is in the file
         */
        void accept(int row, int col, GivenValue value, SourcePos pos);
    }

    /** The form a file was read in. */
    public enum Form {
        /** A CSV table or row of values, complete. */
        CSV_TABLE("CSV table"),
        /** A long CSV of {@code from,to,value} records, any subset. */
        CSV_LONG("CSV from,to,value"),
        /** One value per line, complete. */
        CSV_COLUMN("CSV column"),
        /** {@code state,value} records, any subset. */
        CSV_LABELLED("CSV state,value"),
        /** A JSON array, complete. */
        JSON_ARRAY("JSON array"),
        /** A JSON object keyed by state names, any subset. */
        JSON_OBJECT("JSON object"),
        /** A single number. */
        NUMBER("single number");

        private final String description;

        Form(String description) {
            this.description = description;
        }

        /** A short description, for reports. */
        public String description() {
            return description;
        }
    }

    /**
     * What was read.
     *
     * @param form   the form recognised
     * @param values how many values were handed to the sink
     */
    public record Summary(Form form, long values) {
    }

    private final Target target;
    private final Sink sink;
    private final CharSource src;
    /** Line of the value read for each entry, 0 for none yet. */
    private final int[] seen;
    private long count;
    private Form form;

    private ReferenceReader(String file, Reader in, Target target, Sink sink) {
        this.target = target;
        this.sink = sink;
        this.src = new CharSource(file, in);
        if (target.size() > Integer.MAX_VALUE - 8) {
            throw new IllegalArgumentException("target too large: " + target.size());
        }
        this.seen = new int[(int) target.size()];
    }

    /**
     * Reads a file.
     *
     * @param file   the file
     * @param name   the file name as the user gave it, for messages
     * @param target what the file must hold
     * @param sink   receives each value
     * @return what was read
     * @throws QchainException {@link ErrorKey#CANNOT_READ} if the file cannot be read, or a shape, name or number
     *                         error at its place in the file
     */
    public static Summary read(Path file, String name, Target target, Sink sink) {
        try (Reader in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            return read(name, in, target, sink);
        } catch (IOException e) {
            throw new QchainException(ErrorKey.CANNOT_READ, name, describe(e));
        }
    }

    /**
     * Reads from a stream; the caller closes it.
     *
     * @param name   the file name, for messages
     * @param in     the characters
     * @param target what the file must hold
     * @param sink   receives each value
     * @return what was read
     * @throws QchainException {@link ErrorKey#CANNOT_READ} on an I/O error, or a shape, name or number error at its
     *                         place in the file
     */
    public static Summary read(String name, Reader in, Target target, Sink sink) {
        try {
            return new ReferenceReader(name, in, target, sink).run();
        } catch (UncheckedIOException e) {
            throw new QchainException(ErrorKey.CANNOT_READ, name, describe(e.getCause()));
        }
    }

    private static String describe(IOException e) {
        String m = e.getMessage();
        return e instanceof java.nio.charset.MalformedInputException ? "it is not UTF-8 text"
            : e instanceof java.nio.file.NoSuchFileException ? "no such file"
            : m == null ? e.getClass().getSimpleName() : m;
    }

    private Summary run() {
        int c = src.peek();
        while (c == ' ' || c == '\t' || c == '\n' || c == '\r') {
            src.next();
            c = src.peek();
        }
        if (c == CharSource.EOF) {
            throw new QchainException(src.here(), ErrorKey.REF_EMPTY, expected());
        }
        if (c == '[' || c == '{') {
            json();
        } else {
            csv();
        }
        if (count == 0) {
            throw new QchainException(new SourcePos(src.file(), 1, 1), ErrorKey.REF_EMPTY, expected());
        }
        return new Summary(form, count);
    }

    private String expected() {
        return switch (target.shape()) {
            case MATRIX -> "a table of " + target.rows().size() + " x " + target.cols().size() + " values";
            case VECTOR -> target.cols().size() + " values (" + target.colsAre() + ")";
            case SCALAR -> "one number";
        };
    }

    // --- values ----------------------------------------------------------------------------------------------

    private void put(int row, int col, String text, SourcePos pos) {
        GivenValue v = parse(text, pos);
        int k = row * target.cols().size() + col;
        if (seen[k] != 0) {
            throw new QchainException(pos, ErrorKey.REF_DUPLICATE, target.label(row, col), seen[k]);
        }
        seen[k] = pos.line();
        count++;
        sink.accept(row, col, v, pos);
    }

    private static GivenValue parse(String text, SourcePos pos) {
        if (text.isEmpty()) {
            throw new QchainException(pos, ErrorKey.REF_NOT_A_NUMBER, "", " (an empty field)");
        }
        try {
            return GivenValue.parse(text);
        } catch (NumberFormatException e) {
            String m = e.getMessage();
            String detail = m == null || m.startsWith("malformed number") ? "" : ": " + m;
            throw new QchainException(pos, ErrorKey.REF_NOT_A_NUMBER, text, detail);
        }
    }

    private static boolean isValue(String text) {
        if (text.isEmpty()) {
            return false;
        }
        try {
            GivenValue.parse(text);
            return true;
        } catch (NumberFormatException e) {
            return false;
        }
    }

    private int row(String label, SourcePos pos) {
        OptionalInt i = target.rowIndex(label);
        if (i.isEmpty()) {
            throw new QchainException(pos, ErrorKey.REF_UNKNOWN_STATE, label, list(target.rows()));
        }
        return i.getAsInt();
    }

    private int col(String label, SourcePos pos) {
        OptionalInt j = target.colIndex(label);
        if (j.isEmpty()) {
            throw new QchainException(pos, ErrorKey.REF_UNKNOWN_STATE, label, list(target.cols()));
        }
        return j.getAsInt();
    }

    private static String list(List<String> names) {
        int show = Math.min(names.size(), 12);
        String s = String.join(", ", names.subList(0, show));
        return names.size() > show ? s + ", ... (" + names.size() + " in all)" : s;
    }

    // --- CSV -------------------------------------------------------------------------------------------------

    private void csv() {
        CsvRecords recs = new CsvRecords(src);
        Row r0 = recs.next().orElseThrow();
        switch (target.shape()) {
            case MATRIX -> csvMatrix(recs, r0);
            case VECTOR -> csvVector(recs, r0);
            case SCALAR -> csvScalar(recs, r0);
            default -> throw new IllegalStateException();
        }
    }

    /** A header: no field is a number (the first may be empty). */
    private static boolean isHeader(Row r) {
        return r.fields().stream().noneMatch(f -> isValue(f.text()));
    }

    private void csvMatrix(CsvRecords recs, Row r0) {
        boolean longHeader = r0.width() == 3 && r0.get(0).text().equalsIgnoreCase("from")
            && r0.get(1).text().equalsIgnoreCase("to") && r0.get(2).text().equalsIgnoreCase("value");
        boolean longData = r0.width() == 3 && !r0.get(0).text().isEmpty() && !isValue(r0.get(0).text())
            && !isValue(r0.get(1).text()) && isValue(r0.get(2).text());
        if (longHeader || longData) {
            form = Form.CSV_LONG;
            csvLong(recs, longHeader ? Optional.empty() : Optional.of(r0));
            return;
        }
        form = Form.CSV_TABLE;
        int ncols = target.cols().size();
        int nrows = target.rows().size();
        boolean header = isHeader(r0);
        boolean labels;
        int[] colOf = new int[ncols];
        if (header) {
            labels = r0.get(0).text().isEmpty();
            mapHeader(r0, labels ? 1 : 0, colOf);
        } else {
            labels = r0.width() == ncols + 1 && !isValue(r0.get(0).text()) && !r0.get(0).text().isEmpty();
            for (int j = 0; j < ncols; j++) {
                colOf[j] = j;
            }
        }
        int off = labels ? 1 : 0;
        int[] rowLine = new int[nrows];
        int k = 0;
        Optional<Row> next = header ? recs.next() : Optional.of(r0);
        Row last = r0;
        while (next.isPresent()) {
            Row r = next.get();
            last = r;
            if (r.width() != ncols + off) {
                throw new QchainException(r.pos(), ErrorKey.REF_VALUE_COUNT, Math.max(0, r.width() - off),
                    target.colsAre() + (labels && r.width() == ncols ? " (and the row starts with its state's name)" : ""));
            }
            int i;
            if (labels) {
                i = row(r.get(0).text(), r.get(0).pos());
                if (rowLine[i] != 0) {
                    throw new QchainException(r.pos(), ErrorKey.REF_DUPLICATE, "row " + target.rows().get(i),
                        rowLine[i]);
                }
            } else {
                if (k >= nrows) {
                    throw new QchainException(r.pos(), ErrorKey.REF_ROW_COUNT, k + 1, target.rowsAre());
                }
                i = k;
            }
            rowLine[i] = r.pos().line();
            k++;
            for (int j = 0; j < ncols; j++) {
                Field f = r.get(j + off);
                put(i, colOf[j], f.text(), f.pos());
            }
            next = recs.next();
        }
        if (k < nrows) {
            if (labels) {
                for (int i = 0; i < nrows; i++) {
                    if (rowLine[i] == 0) {
                        throw new QchainException(src.here(), ErrorKey.REF_MISSING, "row " + target.rows().get(i));
                    }
                }
            }
            throw new QchainException(last.pos(), ErrorKey.REF_ROW_COUNT, k, target.rowsAre());
        }
    }

    /** Maps the header's names from field {@code off} on to target columns; each column exactly once. */
    private void mapHeader(Row h, int off, int[] colOf) {
        int ncols = target.cols().size();
        if (h.width() - off != ncols) {
            throw new QchainException(h.pos(), ErrorKey.REF_SHAPE, "the header names " + (h.width() - off)
                + " states; expected each of " + ncols + " once (" + target.colsAre() + ")");
        }
        int[] fieldOf = new int[ncols];
        java.util.Arrays.fill(fieldOf, -1);
        for (int k = off; k < h.width(); k++) {
            Field f = h.get(k);
            int j = col(f.text(), f.pos());
            if (fieldOf[j] >= 0) {
                throw new QchainException(f.pos(), ErrorKey.REF_SHAPE, "the header names state '" + f.text()
                    + "' twice");
            }
            fieldOf[j] = k;
            colOf[k - off] = j;
        }
    }

    private void csvLong(CsvRecords recs, Optional<Row> first) {
        Optional<Row> next = first.isPresent() ? first : recs.next();
        while (next.isPresent()) {
            Row r = next.get();
            if (r.width() != 3) {
                throw new QchainException(r.pos(), ErrorKey.REF_SHAPE, "expected 3 fields from,to,value, found "
                    + r.width());
            }
            int i = row(r.get(0).text(), r.get(0).pos());
            int j = col(r.get(1).text(), r.get(1).pos());
            put(i, j, r.get(2).text(), r.get(2).pos());
            next = recs.next();
        }
    }

    private void csvVector(CsvRecords recs, Row r0) {
        int k = target.cols().size();
        boolean header = isHeader(r0);
        if (header && r0.width() == 2 && target.colIndex(r0.get(0).text()).isEmpty()) {
            form = Form.CSV_LABELLED;
            csvLabelled(recs, recs.next());
            return;
        }
        if (!header && r0.width() == 2 && !isValue(r0.get(0).text())) {
            form = Form.CSV_LABELLED;
            csvLabelled(recs, Optional.of(r0));
            return;
        }
        if (!header && r0.width() == 1 && k > 1) {
            form = Form.CSV_COLUMN;
            int n = 0;
            Optional<Row> next = Optional.of(r0);
            Row last = r0;
            while (next.isPresent()) {
                Row r = next.get();
                last = r;
                if (r.width() != 1) {
                    throw new QchainException(r.pos(), ErrorKey.REF_SHAPE, "expected one value on this line, as on"
                        + " the lines above, found " + r.width());
                }
                if (n >= k) {
                    throw new QchainException(r.pos(), ErrorKey.REF_VALUE_COUNT, n + 1, target.colsAre());
                }
                put(0, n, r.get(0).text(), r.get(0).pos());
                n++;
                next = recs.next();
            }
            if (n < k) {
                throw new QchainException(last.pos(), ErrorKey.REF_VALUE_COUNT, n, target.colsAre());
            }
            return;
        }
        form = Form.CSV_TABLE;
        int[] colOf = new int[k];
        int off = 0;
        Row data = r0;
        if (header) {
            off = r0.get(0).text().isEmpty() ? 1 : 0;
            mapHeader(r0, off, colOf);
            Optional<Row> d = recs.next();
            if (d.isEmpty()) {
                throw new QchainException(src.here(), ErrorKey.REF_EMPTY, expected() + " under the header");
            }
            data = d.get();
        } else {
            for (int j = 0; j < k; j++) {
                colOf[j] = j;
            }
        }
        if (data.width() != k + off) {
            throw new QchainException(data.pos(), ErrorKey.REF_VALUE_COUNT, Math.max(0, data.width() - off),
                target.colsAre());
        }
        for (int j = 0; j < k; j++) {
            Field f = data.get(j + off);
            put(0, colOf[j], f.text(), f.pos());
        }
        Optional<Row> extra = recs.next();
        if (extra.isPresent()) {
            throw new QchainException(extra.get().pos(), ErrorKey.REF_SHAPE, "expected one row of values ("
                + target.colsAre() + "), found another row");
        }
    }

    private void csvLabelled(CsvRecords recs, Optional<Row> first) {
        Optional<Row> next = first;
        while (next.isPresent()) {
            Row r = next.get();
            if (r.width() != 2) {
                throw new QchainException(r.pos(), ErrorKey.REF_SHAPE, "expected 2 fields state,value, found "
                    + r.width());
            }
            int j = col(r.get(0).text(), r.get(0).pos());
            put(0, j, r.get(1).text(), r.get(1).pos());
            next = recs.next();
        }
    }

    private void csvScalar(CsvRecords recs, Row r0) {
        form = Form.NUMBER;
        Row data = r0;
        if (r0.width() == 1 && !isValue(r0.get(0).text()) && !r0.get(0).text().isEmpty()) {
            Optional<Row> d = recs.next();
            if (d.isEmpty()) {
                throw new QchainException(src.here(), ErrorKey.REF_EMPTY, "one number under the header");
            }
            data = d.get();
        }
        if (data.width() != 1) {
            throw new QchainException(data.pos(), ErrorKey.REF_VALUE_COUNT, data.width(), "expected one number ("
                + target.cols().get(0) + ")");
        }
        put(0, 0, data.get(0).text(), data.get(0).pos());
        Optional<Row> extra = recs.next();
        if (extra.isPresent()) {
            throw new QchainException(extra.get().pos(), ErrorKey.REF_SHAPE, "expected one number ("
                + target.cols().get(0) + "), found another line");
        }
    }

    // --- JSON ------------------------------------------------------------------------------------------------

    private void json() {
        JsonTokens t = new JsonTokens(src);
        Token top = t.peek();
        form = top.kind() == Kind.BEGIN_ARRAY ? Form.JSON_ARRAY : Form.JSON_OBJECT;
        switch (target.shape()) {
            case MATRIX -> {
                if (top.kind() == Kind.BEGIN_ARRAY) {
                    t.next();
                    int nrows = target.rows().size();
                    int i = 0;
                    while (true) {
                        if (!nextElement(t, i)) {
                            break;
                        }
                        if (i >= nrows) {
                            int more = i + countRest(t);
                            throw new QchainException(top.pos(), ErrorKey.REF_ROW_COUNT, more, target.rowsAre());
                        }
                        jsonRowArray(t, i);
                        i++;
                    }
                    if (i < nrows) {
                        throw new QchainException(top.pos(), ErrorKey.REF_ROW_COUNT, i, target.rowsAre());
                    }
                } else {
                    jsonObject(t, (label, pos) -> {
                        int i = row(label, pos);
                        Token v = t.peek();
                        if (v.kind() == Kind.BEGIN_ARRAY) {
                            jsonRowArray(t, i);
                        } else if (v.kind() == Kind.BEGIN_OBJECT) {
                            jsonObject(t, (c, cp) -> {
                                int j = col(c, cp);
                                Token x = value(t);
                                put(i, j, x.text(), x.pos());
                            });
                        } else {
                            throw new QchainException(v.pos(), ErrorKey.SYNTAX, "expected the row of " + label
                                + " as an array or an object keyed by state, found " + v.describe());
                        }
                    });
                }
            }
            case VECTOR -> {
                if (top.kind() == Kind.BEGIN_ARRAY) {
                    jsonRowArray(t, 0);
                } else {
                    jsonObject(t, (label, pos) -> {
                        int j = col(label, pos);
                        Token x = value(t);
                        put(0, j, x.text(), x.pos());
                    });
                }
            }
            case SCALAR -> {
                form = Form.NUMBER;
                if (top.kind() == Kind.BEGIN_ARRAY) {
                    jsonRowArray(t, 0);
                } else {
                    Token x = value(t);
                    put(0, 0, x.text(), x.pos());
                }
            }
            default -> throw new IllegalStateException();
        }
        Token end = t.next();
        if (end.kind() != Kind.END) {
            throw new QchainException(end.pos(), ErrorKey.SYNTAX, "expected the end of the file after the JSON value,"
                + " found " + end.describe());
        }
    }

    /** Before element {@code index} of an open array: true if one follows (its comma taken), false at the end. */
    private static boolean nextElement(JsonTokens t, int index) {
        if (t.peek().kind() == Kind.END_ARRAY) {
            t.next();
            return false;
        }
        if (index > 0) {
            Token c = t.next();
            if (c.kind() == Kind.END_ARRAY) {
                return false;
            }
            if (c.kind() != Kind.COMMA) {
                throw new QchainException(c.pos(), ErrorKey.SYNTAX, "expected ',' or ']', found " + c.describe());
            }
        }
        return true;
    }

    /** A complete array of the target's columns for row {@code i}. */
    private void jsonRowArray(JsonTokens t, int i) {
        Token open = t.expect(Kind.BEGIN_ARRAY, "'['");
        int ncols = target.cols().size();
        int j = 0;
        while (nextElement(t, j)) {
            if (j >= ncols) {
                int more = j + countRest(t);
                throw new QchainException(open.pos(), ErrorKey.REF_VALUE_COUNT, more, target.colsAre());
            }
            Token x = value(t);
            put(i, j, x.text(), x.pos());
            j++;
        }
        if (j < ncols) {
            throw new QchainException(open.pos(), ErrorKey.REF_VALUE_COUNT, j, target.colsAre());
        }
    }

    /** Skips the remaining elements of an open array (positioned before an element) and counts them. */
    private static int countRest(JsonTokens t) {
        int n = 0;
        while (nextElement(t, n)) {
            skip(t);
            n++;
        }
        return n;
    }

    private static void skip(JsonTokens t) {
        Token x = t.next();
        if (x.kind() == Kind.BEGIN_ARRAY || x.kind() == Kind.BEGIN_OBJECT) {
            int depth = 1;
            while (depth > 0) {
                Token y = t.next();
                switch (y.kind()) {
                    case BEGIN_ARRAY, BEGIN_OBJECT -> depth++;
                    case END_ARRAY, END_OBJECT -> depth--;
                    case END -> throw new QchainException(y.pos(), ErrorKey.SYNTAX, "unexpected end of the file");
                    default -> {
                    }
                }
            }
        }
    }

    private interface Member {
        void read(String key, SourcePos pos);
    }

    /** An object; for each member the key is given to {@code member}, which reads the value. */
    private static void jsonObject(JsonTokens t, Member member) {
        t.expect(Kind.BEGIN_OBJECT, "'{'");
        boolean firstMember = true;
        while (true) {
            Token k = t.next();
            if (k.kind() == Kind.END_OBJECT) {
                return;
            }
            if (!firstMember) {
                if (k.kind() != Kind.COMMA) {
                    throw new QchainException(k.pos(), ErrorKey.SYNTAX, "expected ',' or '}', found " + k.describe());
                }
                k = t.next();
            }
            if (k.kind() != Kind.STRING) {
                throw new QchainException(k.pos(), ErrorKey.SYNTAX, "expected a state name in double quotes, found "
                    + k.describe());
            }
            t.expect(Kind.COLON, "':'");
            member.read(k.text(), k.pos());
            firstMember = false;
        }
    }

    /** A number: a JSON number, a string holding one, or one of the words for a non-finite value. */
    private static Token value(JsonTokens t) {
        Token x = t.next();
        if (x.kind() == Kind.STRING || x.kind() == Kind.WORD) {
            return x;
        }
        throw new QchainException(x.pos(), ErrorKey.SYNTAX, "expected a number, found " + x.describe());
    }
}
