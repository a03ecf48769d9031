package org.qchain.format;

import java.util.List;
import java.util.function.Function;

/**
 * A small writer of compact JSON text (RFC 8259), keys in the order they are added. Written by hand so that the CLI
 * needs no JSON library; mutable, one per document.
 */
public final class Json {
    private final StringBuilder sb;
    private boolean first = true;

    private Json(StringBuilder sb) {
        this.sb = sb;
    }

    /** A writer positioned inside a new top-level object. */
    public static Json object() {
        return object(new StringBuilder());
    }

    /** A writer appending to {@code sink}'s buffer, positioned inside a new top-level object; end it with {@link #end}. */
    static Json object(Sink sink) {
        return object(sink.sb);
    }

    private static Json object(StringBuilder target) {
        Json j = new Json(target);
        j.sb.append('{');
        return j;
    }

    /** Appends a string member (mutates). */
    public Json string(String key, String value) {
        key(key);
        quote(sb, value);
        return this;
    }

    /** Appends an integer member (mutates). */
    public Json number(String key, long value) {
        key(key);
        sb.append(value);
        return this;
    }

    /** Appends an array of integers (mutates). */
    public Json numbers(String key, List<Long> values) {
        key(key);
        sb.append('[');
        for (int i = 0; i < values.size(); i++) {
            sb.append(i > 0 ? "," : "").append(values.get(i));
        }
        sb.append(']');
        return this;
    }

    /** Appends a boolean member (mutates). */
    public Json bool(String key, boolean value) {
        key(key);
        sb.append(value);
        return this;
    }

    /** Appends an array of strings (mutates). */
    public Json strings(String key, List<String> values) {
        key(key);
        stringArray(sb, values);
        return this;
    }

    /** Appends an array of arrays of strings (mutates). */
    public Json stringRows(String key, List<? extends List<String>> rows) {
        key(key);
        sb.append('[');
        for (int i = 0; i < rows.size(); i++) {
            if (i > 0) {
                sb.append(',');
            }
            stringArray(sb, rows.get(i));
        }
        sb.append(']');
        return this;
    }

    /**
     * Appends an array of {@code rows} arrays of {@code cols} strings, entry {@code (i, j)} being text
     * {@code i * cols + j} of {@code texts}, passing the text on to the sink's output after every entry (mutates).
     */
    Json streamedRows(String key, int rows, int cols, AheadTexts texts, Sink sink) {
        key(key);
        sb.append('[');
        for (int i = 0; i < rows; i++) {
            if (i > 0) {
                sb.append(',');
            }
            streamedArray(i * cols, cols, texts, sink);
        }
        sb.append(']');
        return this;
    }

    /** Appends an array of the first {@code count} texts of {@code texts}, as {@link #streamedRows} (mutates). */
    Json streamed(String key, int count, AheadTexts texts, Sink sink) {
        key(key);
        streamedArray(0, count, texts, sink);
        return this;
    }

    private void streamedArray(int from, int count, AheadTexts texts, Sink sink) {
        sb.append('[');
        for (int j = 0; j < count; j++) {
            if (j > 0) {
                sb.append(',');
            }
            // texts of numbers (digits, sign, '/', '.', exponent): nothing to escape, no scan of their characters
            sb.append('"').append(texts.get(from + j)).append('"');
            sink.spill();
        }
        sb.append(']');
    }

    /** Appends an array of objects, each written by {@code body} into a fresh writer (mutates). */
    public <T> Json objects(String key, List<T> items, Function<T, Json> body) {
        key(key);
        sb.append('[');
        for (int i = 0; i < items.size(); i++) {
            if (i > 0) {
                sb.append(',');
            }
            sb.append(body.apply(items.get(i)).close());
        }
        sb.append(']');
        return this;
    }

    /** Appends a nested object written into a fresh writer by the caller (mutates). */
    public Json object(String key, Json inner) {
        key(key);
        sb.append(inner.close());
        return this;
    }

    /** Closes an object written into a sink. */
    void end() {
        sb.append('}');
    }

    /** Closes the object and returns its text. */
    public String close() {
        return sb.append('}').toString();
    }

    private void key(String key) {
        if (!first) {
            sb.append(',');
        }
        first = false;
        quote(sb, key);
        sb.append(':');
    }

    private static void stringArray(StringBuilder sb, List<String> values) {
        sb.append('[');
        for (int i = 0; i < values.size(); i++) {
            if (i > 0) {
                sb.append(',');
            }
            quote(sb, values.get(i));
        }
        sb.append(']');
    }

    /**
     * Appends {@code s} as a JSON string: quotation mark, reverse solidus and control characters escaped as RFC 8259
     * section 7 requires; characters outside ASCII as {@code \}{@code uXXXX} (UTF-16 units), so the output is plain
     * ASCII whatever the platform's encoding.
     */
    static void quote(StringBuilder sb, String s) {
        sb.append('"');
        if (plain(s)) {
            // the common case (numbers, names): nothing to escape, one bulk copy
            sb.append(s).append('"');
            return;
        }
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '"':
                    sb.append("\\\"");
                    break;
                case '\\':
                    sb.append("\\\\");
                    break;
                case '\n':
                    sb.append("\\n");
                    break;
                case '\r':
                    sb.append("\\r");
                    break;
                case '\t':
                    sb.append("\\t");
                    break;
                case '\b':
                    sb.append("\\b");
                    break;
                case '\f':
                    sb.append("\\f");
                    break;
                default:
                    if (c < 0x20 || c > 0x7e) {
                        sb.append(String.format("\\u%04x", (int) c));
                    } else {
                        sb.append(c);
                    }
            }
        }
        sb.append('"');
    }

    /** Whether {@code s} is printable ASCII without a quotation mark or reverse solidus. */
    private static boolean plain(String s) {
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c < 0x20 || c > 0x7e || c == '"' || c == '\\') {
                return false;
            }
        }
        return true;
    }

    /** {@code s} as a JSON string literal. */
    public static String quote(String s) {
        StringBuilder sb = new StringBuilder();
        quote(sb, s);
        return sb.toString();
    }
}
