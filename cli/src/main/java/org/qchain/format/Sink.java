package org.qchain.format;

import java.io.IOException;
import java.io.UncheckedIOException;

/**
 * Where a streaming layout writes: a buffer that is passed on to the output whenever it has grown past
 * {@link #CHUNK} characters ({@link #spill}), or kept whole when the layout builds one string.
 */
final class Sink {
    /** Characters gathered before they are passed on. */
    static final int CHUNK = 1 << 16;

    /** The buffer the layout appends to. */
    final StringBuilder sb = new StringBuilder();
    /** The output, or {@code null} to keep everything in {@link #sb}. */
    private final Appendable out;

    private Sink(Appendable out) {
        this.out = out;
    }

    /** A sink that keeps all the text in its buffer. */
    static Sink buffer() {
        return new Sink(null);
    }

    /** A sink that passes the text on to {@code out} in chunks. */
    static Sink to(Appendable out) {
        return new Sink(out);
    }

    /** Passes the buffer on if it has grown past a chunk (nothing when everything is kept). */
    void spill() {
        if (out != null && sb.length() >= CHUNK) {
            flush();
        }
    }

    /** Passes whatever is buffered on (nothing when everything is kept). */
    void flush() {
        if (out == null) {
            return;
        }
        try {
            out.append(sb);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        sb.setLength(0);
    }

    /** The whole text of a keeping sink. */
    String text() {
        return sb.toString();
    }
}
