package org.qchain.exact;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/**
 * The one unchecked root of every error qchain reports on purpose. It carries a {@link MessageKey message key} (of
 * any module's key enum), the arguments of the message and, for errors in an input file, the
 * {@link SourcePos position} of the offending text.
 *
 * <p>The command-line front end prints {@link #getMessage()} on one line and exits with code 2 for errors whose key
 * is an input error ({@link #isInputError()}), 1 otherwise.
 */
public class QchainException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    private final MessageKey key;
    private final transient List<Object> args;
    private final SourcePos pos;

    /**
     * An error without a source position.
     *
     * @param key  the message key
     * @param args the message arguments
     */
    public QchainException(MessageKey key, Object... args) {
        this(null, key, args);
    }

    /**
     * An error at a position in an input file.
     *
     * @param pos  where the offending text starts, or {@code null} if there is no such place
     * @param key  the message key
     * @param args the message arguments
     */
    public QchainException(SourcePos pos, MessageKey key, Object... args) {
        super(render(pos, key, args));
        this.key = key;
        this.args = List.copyOf(Arrays.asList(args.clone()).stream().map(String::valueOf).toList());
        this.pos = pos;
    }

    private static String render(SourcePos pos, MessageKey key, Object[] args) {
        String text = key.format(args);
        return pos == null ? text : pos + ": " + text;
    }

    /** The message key. */
    public MessageKey key() {
        return key;
    }

    /** The message arguments, as strings. */
    public List<Object> args() {
        return args;
    }

    /** Where in an input file the error is, if it is in one. */
    public Optional<SourcePos> pos() {
        return Optional.ofNullable(pos);
    }

    /** The message without the position prefix. */
    public String detail() {
        return key.format(args.toArray());
    }

    /** Whether this error is the user's input (exit code 2) rather than an internal failure (exit code 1). */
    public boolean isInputError() {
        return key != ErrorKey.INTERNAL;
    }
}
