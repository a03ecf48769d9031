package org.qchain.exact.reference;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.SourcePos;

/**
 * CSV records read one at a time from a stream, as RFC 4180 (Shafranovich, Common Format and MIME Type for
 * Comma-Separated Values (CSV) Files) describes them: comma-separated fields, optionally in double quotes (a quote
 * inside written twice), records ended by CRLF, LF or CR. Blank lines are skipped; spaces around an unquoted field
 * are dropped. Only the current record is held in memory.
 */
final class CsvRecords {
    /** One field: its text, whether it was quoted, where it starts. */
    record Field(String text, boolean quoted, SourcePos pos) {
    }

    /** One record and where it starts. */
    record Row(List<Field> fields, SourcePos pos) {
        int width() {
            return fields.size();
        }

        Field get(int i) {
            return fields.get(i);
        }
    }

    private final CharSource src;
    private final StringBuilder sb = new StringBuilder();

    CsvRecords(CharSource src) {
        this.src = src;
    }

    /** The next non-blank record, or empty at the end of the file. */
    Optional<Row> next() {
        while (src.peek() != CharSource.EOF) {
            Row r = record();
            if (!(r.width() == 1 && !r.get(0).quoted() && r.get(0).text().isEmpty())) {
                return Optional.of(r);
            }
        }
        return Optional.empty();
    }

    private Row record() {
        SourcePos rowPos = src.here();
        List<Field> fields = new ArrayList<>();
        while (true) {
            fields.add(field());
            int c = src.peek();
            if (c == ',') {
                src.next();
                continue;
            }
            if (c == '\r') {
                src.next();
                if (src.peek() == '\n') {
                    src.next();
                }
            } else if (c == '\n') {
                src.next();
            }
            return new Row(fields, rowPos);
        }
    }

    private static boolean isEnd(int c) {
        return c == ',' || c == '\n' || c == '\r' || c == CharSource.EOF;
    }

    private Field field() {
        while (src.peek() == ' ' || src.peek() == '\t') {
            src.next();
        }
        SourcePos fp = src.here();
        sb.setLength(0);
        if (src.peek() == '"') {
            src.next();
            while (true) {
                int c = src.next();
                if (c == CharSource.EOF) {
                    throw new QchainException(fp, ErrorKey.SYNTAX, "unterminated quoted field");
                }
                if (c == '"') {
                    if (src.peek() == '"') {
                        src.next();
                        sb.append('"');
                        continue;
                    }
                    break;
                }
                sb.append((char) c);
            }
            while (src.peek() == ' ' || src.peek() == '\t') {
                src.next();
            }
            if (!isEnd(src.peek())) {
                throw new QchainException(src.here(), ErrorKey.SYNTAX,
                    "unexpected text after the closing quote of a field");
            }
            return new Field(sb.toString(), true, fp);
        }
        while (!isEnd(src.peek())) {
            if (src.peek() == '"') {
                throw new QchainException(src.here(), ErrorKey.SYNTAX,
                    "a quote inside an unquoted field: quote the whole field and double the quote");
            }
            sb.append((char) src.next());
        }
        return new Field(sb.toString().strip(), false, fp);
    }
}
