package org.qchain.cli.io;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.InterruptedIOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.channels.Channels;
import java.nio.channels.ClosedByInterruptException;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.Set;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;

/**
 * Writes output files atomically: the text goes to a temporary file in the target's directory, is forced to disk, and
 * is then moved over the target in one step, so a reader (or an interrupted run) never sees a partial file. Only
 * regular files are replaced: a named pipe or a device file is written into directly, and a symbolic link keeps
 * pointing where it did (the file it names is replaced).
 */
public final class AtomicFiles {
    /** Characters buffered before they go to the file. */
    private static final int BUFFER = 1 << 16;

    private AtomicFiles() {
    }

    /**
     * Refuses an output file that is one of the inputs.
     *
     * @param output the output file as given
     * @param option the option that named it, for the message
     * @param input  an input file
     * @throws QchainException {@link ErrorKey#BAD_ARGUMENT} if both name the same file (same normalised absolute path,
     *                         or {@link Files#isSameFile} for existing files, which sees links)
     */
    public static void requireDistinct(Path output, String option, Path input) {
        boolean same = output.toAbsolutePath().normalize().equals(input.toAbsolutePath().normalize());
        if (!same && Files.exists(output) && Files.exists(input)) {
            try {
                same = Files.isSameFile(output, input);
            } catch (IOException e) {
                same = false;
            }
        }
        if (same) {
            throw new QchainException(ErrorKey.BAD_ARGUMENT, option, output, "it is the input model; choose another file");
        }
    }

    /**
     * Writes {@code text} (UTF-8) to {@code target} atomically, replacing it if it exists and keeping its
     * permissions; a new file gets {@code rw-r--r--}. A target that exists and is not a regular file (a named pipe,
     * a device) is written into directly and never replaced; a symbolic link is followed.
     *
     * @param target the file to write
     * @param option the option that named it, for messages
     * @param text   the content
     * @throws QchainException {@link ErrorKey#BAD_ARGUMENT} if the file cannot be written (missing directory, no
     *                         permission, full disk); the target is then unchanged and no temporary file is left
     */
    public static void write(Path target, String option, String text) {
        write(target, option, out -> out.append(text));
    }

    /** Text written in pieces to a writer (streamed, never held whole). */
    @FunctionalInterface
    public interface Content {
        /**
         * Writes the text.
         *
         * @param out where to write (buffered, UTF-8)
         * @throws IOException if writing fails
         */
        void writeTo(Writer out) throws IOException;
    }

    /**
     * Writes the text that {@code content} produces into {@code target} as {@link #write(Path, String, String)}
     * does: streamed into the temporary file, which replaces the target only when all of it is written and forced to
     * disk; on any failure (or an interrupt) the target is unchanged and the temporary file is removed.
     *
     * @param target  the file to write
     * @param option  the option that named it, for messages
     * @param content writes the content
     * @throws QchainException {@link ErrorKey#BAD_ARGUMENT} if the file cannot be written, {@link ErrorKey#INTERRUPTED}
     *                         if the thread was interrupted
     */
    public static void write(Path target, String option, Content content) {
        Path abs = target.toAbsolutePath().normalize();
        Path tmp = null;
        try {
            if (Files.isDirectory(abs)) {
                throw new QchainException(ErrorKey.BAD_ARGUMENT, option, target, "it is a directory");
            }
            if (Files.isSymbolicLink(abs) && Files.exists(abs)) {
                // replace the file the link points to, never the link itself
                abs = abs.toRealPath();
            }
            if (Files.exists(abs) && !Files.isRegularFile(abs)) {
                // a named pipe, a device (/dev/null, /dev/stdout), a socket: write into it, never replace it
                writeDirectly(abs, content);
                return;
            }
            Path dir = abs.getParent();
            tmp = Files.createTempFile(dir, "." + abs.getFileName() + ".", ".tmp");
            try (FileChannel ch = FileChannel.open(tmp, StandardOpenOption.WRITE)) {
                Writer w = new BufferedWriter(new OutputStreamWriter(Channels.newOutputStream(ch),
                    StandardCharsets.UTF_8), BUFFER);
                content.writeTo(w);
                w.flush();
                ch.force(true);
            }
            copyPermissions(abs, tmp);
            if (Thread.currentThread().isInterrupted()) {
                throw new QchainException(ErrorKey.INTERRUPTED);
            }
            Files.move(tmp, abs, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            tmp = null;
        } catch (ClosedByInterruptException | InterruptedIOException e) {
            throw new QchainException(ErrorKey.INTERRUPTED);
        } catch (AtomicMoveNotSupportedException e) {
            throw new QchainException(ErrorKey.BAD_ARGUMENT, option, target,
                "this file system cannot replace files atomically");
        } catch (NoSuchFileException e) {
            throw new QchainException(ErrorKey.BAD_ARGUMENT, option, target, "no such directory");
        } catch (IOException e) {
            throw new QchainException(ErrorKey.BAD_ARGUMENT, option, target, "cannot write it ("
                + e.getClass().getSimpleName() + (e.getMessage() == null ? "" : ": " + e.getMessage()) + ")");
        } finally {
            if (tmp != null) {
                try {
                    Files.deleteIfExists(tmp);
                } catch (IOException ignored) {
                    // best effort: the target itself is untouched either way
                }
            }
        }
    }

    private static void writeDirectly(Path target, Content content) throws IOException {
        try (Writer w = new BufferedWriter(new OutputStreamWriter(Files.newOutputStream(target,
            StandardOpenOption.WRITE), StandardCharsets.UTF_8), BUFFER)) {
            content.writeTo(w);
        }
    }

    private static void copyPermissions(Path target, Path tmp) throws IOException {
        PosixFileAttributeView view = Files.getFileAttributeView(tmp, PosixFileAttributeView.class);
        if (view == null) {
            return;
        }
        Set<PosixFilePermission> perms = Files.exists(target)
            ? Files.getPosixFilePermissions(target)
            : PosixFilePermissions.fromString("rw-r--r--");
        view.setPermissions(perms);
    }
}
