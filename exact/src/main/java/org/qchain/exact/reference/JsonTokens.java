package org.qchain.exact.reference;

import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.SourcePos;

/**
 * JSON tokens read one at a time from a stream (RFC 8259, Bray, The JavaScript Object Notation (JSON) Data
 * Interchange Format). Numbers keep their text, so they are read exactly later. Besides RFC 8259's literals the bare
 * words {@code NaN}, {@code Infinity} and {@code -Infinity} are accepted as values, because common JSON writers emit
 * them for non-finite doubles; they are reported as non-finite values, never accepted as numbers.
 */
final class JsonTokens {
    enum Kind { BEGIN_ARRAY, END_ARRAY, BEGIN_OBJECT, END_OBJECT, COMMA, COLON, STRING, WORD, END }

    /** A token, its text (strings unescaped; a number or word as written) and where it starts. */
    record Token(Kind kind, String text, SourcePos pos) {
        String describe() {
            return switch (kind) {
                case STRING -> "\"" + text + "\"";
                case END -> "the end of the file";
                default -> "'" + text + "'";
            };
        }
    }

    private final CharSource src;
    private Token peeked;
    private final StringBuilder sb = new StringBuilder();

    JsonTokens(CharSource src) {
        this.src = src;
    }

    Token peek() {
        if (peeked == null) {
            peeked = read();
        }
        return peeked;
    }

    Token next() {
        Token t = peek();
        peeked = null;
        return t;
    }

    /** Takes a token of the given kind or fails with what was expected. */
    Token expect(Kind kind, String what) {
        Token t = next();
        if (t.kind() != kind) {
            throw new QchainException(t.pos(), ErrorKey.SYNTAX, "expected " + what + ", found " + t.describe());
        }
        return t;
    }

    private Token read() {
        int c = src.peek();
        while (c == ' ' || c == '\t' || c == '\n' || c == '\r') {
            src.next();
            c = src.peek();
        }
        SourcePos p = src.here();
        switch (c) {
            case CharSource.EOF:
                return new Token(Kind.END, "", p);
            case '[':
                src.next();
                return new Token(Kind.BEGIN_ARRAY, "[", p);
            case ']':
                src.next();
                return new Token(Kind.END_ARRAY, "]", p);
            case '{':
                src.next();
                return new Token(Kind.BEGIN_OBJECT, "{", p);
            case '}':
                src.next();
                return new Token(Kind.END_OBJECT, "}", p);
            case ',':
                src.next();
                return new Token(Kind.COMMA, ",", p);
            case ':':
                src.next();
                return new Token(Kind.COLON, ":", p);
            case '"':
                return string(p);
            default:
                break;
        }
        sb.setLength(0);
        while (isWordChar(src.peek())) {
            sb.append((char) src.next());
        }
        if (sb.length() == 0) {
            throw new QchainException(p, ErrorKey.SYNTAX, "unexpected character '" + (char) c + "' in JSON");
        }
        return new Token(Kind.WORD, sb.toString(), p);
    }

    private static boolean isWordChar(int c) {
        return (c >= '0' && c <= '9') || (c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z')
            || c == '-' || c == '+' || c == '.' || c == '_';
    }

    private Token string(SourcePos p) {
        src.next();
        sb.setLength(0);
        while (true) {
            int c = src.next();
            if (c == CharSource.EOF || c == '\n' || c == '\r') {
                throw new QchainException(p, ErrorKey.SYNTAX, "unterminated string");
            }
            if (c == '"') {
                return new Token(Kind.STRING, sb.toString(), p);
            }
            if (c != '\\') {
                sb.append((char) c);
                continue;
            }
            SourcePos ep = src.here();
            int e = src.next();
            switch (e) {
                case '"', '\\', '/' -> sb.append((char) e);
                case 'b' -> sb.append('\b');
                case 'f' -> sb.append('\f');
                case 'n' -> sb.append('\n');
                case 'r' -> sb.append('\r');
                case 't' -> sb.append('\t');
                case 'u' -> {
                    int v = 0;
                    for (int k = 0; k < 4; k++) {
                        int d = Character.digit(src.next(), 16);
                        if (d < 0) {
                            throw new QchainException(ep, ErrorKey.SYNTAX, "a \\u escape needs four hexadecimal digits");
                        }
                        v = v * 16 + d;
                    }
                    sb.append((char) v);
                }
                default -> throw new QchainException(ep, ErrorKey.SYNTAX, "unknown escape in a string");
            }
        }
    }
}
