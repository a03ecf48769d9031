package org.qchain.exact.reference;

import java.io.IOException;
import java.io.Reader;
import java.io.UncheckedIOException;
import org.qchain.exact.SourcePos;

/**
 * Characters of a file, read through a buffer, with the line and column of the next one. A byte order mark at the
 * start is skipped. A line ends at LF, CRLF or a lone CR (counted once for CRLF).
 */
final class CharSource {
    static final int EOF = -1;
    private final String file;
    private final Reader in;
    private final char[] buf = new char[1 << 16];
    private int pos;
    private int len;
    private int line = 1;
    private int col = 1;

    CharSource(String file, Reader in) {
        this.file = file;
        this.in = in;
        fill();
        if (len > 0 && buf[0] == '\uFEFF') {
            pos = 1;
        }
    }

    private void fill() {
        try {
            int n = in.read(buf, 0, buf.length);
            len = Math.max(n, 0);
            pos = 0;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    String file() {
        return file;
    }

    /** The next character without taking it, or {@link #EOF}. */
    int peek() {
        if (pos >= len) {
            fill();
            if (len == 0) {
                return EOF;
            }
        }
        return buf[pos];
    }

    /** Takes the next character, or returns {@link #EOF}. */
    int next() {
        int c = peek();
        if (c == EOF) {
            return EOF;
        }
        pos++;
        if (c == '\n') {
            line++;
            col = 1;
        } else if (c == '\r') {
            if (peek() == '\n') {
                col++;
            } else {
                line++;
                col = 1;
            }
        } else {
            col++;
        }
        return c;
    }

    /** Where the next character is. */
    SourcePos here() {
        return new SourcePos(file, line, col);
    }

    int line() {
        return line;
    }
}
