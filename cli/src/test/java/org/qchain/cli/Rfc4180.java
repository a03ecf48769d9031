package org.qchain.cli;

import java.util.ArrayList;
import java.util.List;

/**
 * A strict reader of comma-separated values as RFC 4180 (Shafranovich, Common Format and MIME Type for CSV Files,
 * section 2) defines them: every record ends with CRLF, fields are separated by commas, a field holding a comma, a
 * quotation mark or a line break is enclosed in quotation marks, and a quotation mark inside one is doubled. Anything
 * else (a bare CR or LF, a quotation mark inside an unquoted field, text after a closing quotation mark, an
 * unterminated quoted field, a last record without CRLF) is an error, so a test that reads output through it proves
 * the output follows the rule.
 */
final class Rfc4180 {
    private Rfc4180() {
    }

    /**
     * Reads the records.
     *
     * @param text the whole text
     * @return the records, each its fields in order
     * @throws IllegalArgumentException at the first departure from the rule, with its offset
     */
    static List<List<String>> parse(String text) {
        List<List<String>> records = new ArrayList<>();
        List<String> fields = new ArrayList<>();
        StringBuilder field = new StringBuilder();
        int i = 0;
        boolean fieldStart = true;
        while (i < text.length()) {
            char c = text.charAt(i);
            if (fieldStart && c == '"') {
                i++;
                while (true) {
                    if (i >= text.length()) {
                        throw new IllegalArgumentException("unterminated quoted field at " + i);
                    }
                    char q = text.charAt(i);
                    if (q == '"') {
                        if (i + 1 < text.length() && text.charAt(i + 1) == '"') {
                            field.append('"');
                            i += 2;
                            continue;
                        }
                        i++;
                        break;
                    }
                    field.append(q);
                    i++;
                }
                if (i < text.length() && text.charAt(i) != ',' && text.charAt(i) != '\r') {
                    throw new IllegalArgumentException("text after a closing quotation mark at " + i);
                }
                fieldStart = false;
                continue;
            }
            if (c == ',') {
                fields.add(field.toString());
                field.setLength(0);
                fieldStart = true;
                i++;
            } else if (c == '\r') {
                if (i + 1 >= text.length() || text.charAt(i + 1) != '\n') {
                    throw new IllegalArgumentException("a CR without LF at " + i);
                }
                fields.add(field.toString());
                field.setLength(0);
                records.add(List.copyOf(fields));
                fields.clear();
                fieldStart = true;
                i += 2;
            } else if (c == '\n') {
                throw new IllegalArgumentException("an LF without CR at " + i);
            } else if (c == '"') {
                throw new IllegalArgumentException("a quotation mark inside an unquoted field at " + i);
            } else {
                field.append(c);
                fieldStart = false;
                i++;
            }
        }
        if (!fields.isEmpty() || field.length() > 0 || !fieldStart) {
            throw new IllegalArgumentException("the last record does not end with CRLF");
        }
        return records;
    }
}
