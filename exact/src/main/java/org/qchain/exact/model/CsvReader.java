package org.qchain.exact.model;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.InputLimits;
import org.qchain.exact.NumberGrammar;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.exact.SourcePos;

/**
 * Reads a CSV matrix: fields as in RFC 4180 (Shafranovich, Common Format and MIME Type for Comma-Separated Values
 * (CSV) Files): comma-separated, optionally enclosed in double quotes, a quote inside a quoted field written twice,
 * line breaks inside quoted fields kept; records end with CRLF (or LF, or CR); the last record may lack one. Blank
 * lines are skipped. Spaces around an unquoted field are dropped.
 */
final class CsvReader {
    private CsvReader() {
    }

    /** One field: its text (unquoted), whether it was quoted, and where it starts. */
    record Field(String text, boolean quoted, SourcePos pos) {
    }

    /** One record (row of the file). */
    record Row(List<Field> fields, SourcePos pos) {
        boolean isBlank() {
            return fields.size() == 1 && !fields.get(0).quoted() && fields.get(0).text().isEmpty();
        }
    }

    static Model read(String file, String text, InputLimits limits) {
        int maxDigits = limits.maxNumberDigits();
        List<Row> rows = records(file, text);
        if (rows.isEmpty()) {
            throw new QchainException(new SourcePos(file, 1, 1), ErrorKey.EMPTY_CHAIN);
        }
        Row first = rows.get(0);
        // a header has a quoted field or no number at all; a row mixing numbers and words is data with a typo in it
        boolean header = first.fields().stream().anyMatch(Field::quoted)
            || first.fields().stream().noneMatch(f -> NumberGrammar.isConstant(f.text()));
        boolean labels = header && first.fields().get(0).text().isEmpty();
        List<String> names = new ArrayList<>();
        if (header) {
            Set<String> seen = new HashSet<>();
            for (Field f : first.fields().subList(labels ? 1 : 0, first.fields().size())) {
                String name = f.text();
                if (name.isEmpty()) {
                    throw new QchainException(f.pos(), ErrorKey.SYNTAX, "empty state name in the header");
                }
                if (name.indexOf('\n') >= 0 || name.indexOf('\r') >= 0) {
                    throw new QchainException(f.pos(), ErrorKey.INVALID_NAME, "state", name.replaceAll("[\r\n]+", " "),
                        "a state name must be on one line");
                }
                if (!seen.add(name)) {
                    throw new QchainException(f.pos(), ErrorKey.DUPLICATE_STATE, name);
                }
                names.add(name);
            }
            if (names.isEmpty()) {
                throw new QchainException(first.pos(), ErrorKey.EMPTY_CHAIN);
            }
        } else {
            for (int j = 1; j <= first.fields().size(); j++) {
                names.add("S" + j);
            }
        }
        List<Row> data = rows.subList(header ? 1 : 0, rows.size());
        int n = names.size();
        limits.requireDense(n);
        int width = n + (labels ? 1 : 0);
        List<Transition> transitions = new ArrayList<>();
        for (int i = 0; i < data.size(); i++) {
            Row r = data.get(i);
            if (r.fields().size() != width) {
                throw new QchainException(r.pos(), ErrorKey.CSV_SHAPE, i + 1, r.fields().size(), width);
            }
            if (i >= n) {
                throw new QchainException(r.pos(), ErrorKey.CSV_NOT_SQUARE, data.size(), n);
            }
            if (labels) {
                Field label = r.fields().get(0);
                if (!label.text().equals(names.get(i))) {
                    throw new QchainException(label.pos(), ErrorKey.SYNTAX, "row label '" + label.text()
                        + "' is not '" + names.get(i) + "': rows must follow the order of the header");
                }
            }
            for (int j = 0; j < n; j++) {
                Field f = r.fields().get(j + (labels ? 1 : 0));
                if (f.text().isEmpty()) {
                    throw new QchainException(f.pos(), ErrorKey.SYNTAX, "empty entry (write 0 for no transition)");
                }
                Rational v = Lexer.constant(f.text(), f.pos(), maxDigits);
                if (!v.isZero() || i == j) {
                    transitions.add(new Transition(i, j, new Expr.Num(v, f.pos()), f.pos(), f.pos()));
                }
            }
        }
        if (data.size() < n) {
            Row last = rows.get(rows.size() - 1);
            throw new QchainException(last.pos(), ErrorKey.CSV_NOT_SQUARE, data.size(), n);
        }
        return Model.of(file, ChainKind.DISCRETE, List.of(), names, transitions, limits);
    }

    /** The records of the text, blank lines left out. */
    static List<Row> records(String file, String text) {
        List<Row> rows = new ArrayList<>();
        Columns cols = Columns.of(text);
        int line = 1;
        int lineStart = 0;
        int i = 0;
        int len = text.length();
        while (i < len) {
            SourcePos rowPos = new SourcePos(file, line, cols.column(lineStart, i));
            List<Field> fields = new ArrayList<>();
            while (true) {
                int s = i;
                while (i < len && (text.charAt(i) == ' ' || text.charAt(i) == '\t')) {
                    i++;
                }
                if (i < len && text.charAt(i) == '"') {
                    SourcePos fp = new SourcePos(file, line, cols.column(lineStart, i));
                    StringBuilder sb = new StringBuilder();
                    i++;
                    while (true) {
                        if (i >= len) {
                            throw new QchainException(fp, ErrorKey.SYNTAX, "unterminated quoted field");
                        }
                        char c = text.charAt(i);
                        if (c == '"') {
                            if (i + 1 < len && text.charAt(i + 1) == '"') {
                                sb.append('"');
                                i += 2;
                                continue;
                            }
                            i++;
                            break;
                        }
                        if (c == '\n' || (c == '\r' && !(i + 1 < len && text.charAt(i + 1) == '\n'))) {
                            line++;
                            lineStart = i + 1;
                        }
                        sb.append(c);
                        i++;
                    }
                    while (i < len && (text.charAt(i) == ' ' || text.charAt(i) == '\t')) {
                        i++;
                    }
                    if (i < len && text.charAt(i) != ',' && text.charAt(i) != '\n' && text.charAt(i) != '\r') {
                        throw new QchainException(new SourcePos(file, line, cols.column(lineStart, i)), ErrorKey.SYNTAX,
                            "unexpected text after the closing quote of a field");
                    }
                    fields.add(new Field(sb.toString(), true, fp));
                } else {
                    int e = i;
                    while (e < len && text.charAt(e) != ',' && text.charAt(e) != '\n' && text.charAt(e) != '\r') {
                        if (text.charAt(e) == '"') {
                            throw new QchainException(new SourcePos(file, line, cols.column(lineStart, e)), ErrorKey.SYNTAX,
                                "a quote inside an unquoted field: quote the whole field and double the quote");
                        }
                        e++;
                    }
                    String raw = text.substring(s, e).strip();
                    int first = s;
                    while (first < e && Character.isWhitespace(text.charAt(first))) {
                        first++;
                    }
                    fields.add(new Field(raw, false, new SourcePos(file, line, cols.column(lineStart, first))));
                    i = e;
                }
                if (i < len && text.charAt(i) == ',') {
                    i++;
                    continue;
                }
                break;
            }
            // end of record: CRLF, LF or CR, or the end of the text
            if (i < len && text.charAt(i) == '\r') {
                i++;
            }
            if (i < len && text.charAt(i) == '\n') {
                i++;
            }
            line++;
            lineStart = i;
            Row r = new Row(fields, rowPos);
            if (!r.isBlank()) {
                rows.add(r);
            }
        }
        return rows;
    }
}
