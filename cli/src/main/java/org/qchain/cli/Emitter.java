package org.qchain.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.qchain.cli.io.AtomicFiles;
import org.qchain.format.Formatter;
import org.qchain.result.Result;
import picocli.CommandLine.Model.CommandSpec;

/** Sends a command's text to stdout or to its {@code --output} file, and its warnings to stderr. */
final class Emitter {
    private Emitter() {
    }

    /**
     * Refuses an output file that is the model file; call before computing so no work is wasted.
     *
     * @param output the {@code --output} file, if any
     * @param model  the model file, if the model came from one
     */
    static void checkTarget(Optional<Path> output, Optional<Path> model) {
        if (output.isPresent() && model.isPresent()) {
            AtomicFiles.requireDistinct(output.get(), "--output", model.get());
        }
    }

    /**
     * Prints the warnings on stderr, then the text on stdout or atomically into the output file.
     *
     * @param spec     the command, for its writers
     * @param text     the formatted result
     * @param warnings warnings (one line each)
     * @param output   the {@code --output} file, if any
     */
    static void emit(CommandSpec spec, String text, List<String> warnings, Optional<Path> output) {
        warn(spec, warnings);
        if (output.isPresent()) {
            AtomicFiles.write(output.get(), "--output", text);
        } else {
            PrintWriter out = spec.commandLine().getOut();
            out.print(text);
            out.flush();
        }
    }

    /**
     * Prints the result's warnings on stderr, then writes its text as {@code formatter} lays it out on stdout or
     * atomically into the output file, streamed: large results are written while later entries are still being
     * converted, never held whole.
     *
     * @param spec      the command, for its writers
     * @param formatter the layout
     * @param result    the result
     * @param output    the {@code --output} file, if any
     */
    static void emit(CommandSpec spec, Formatter formatter, Result result, Optional<Path> output) {
        warn(spec, result.warnings());
        if (output.isPresent()) {
            AtomicFiles.write(output.get(), "--output", out -> formatter.write(result, out));
        } else {
            PrintWriter out = spec.commandLine().getOut();
            try {
                formatter.write(result, out);
            } catch (IOException e) {
                // a PrintWriter reports no IOException; kept for the interface's sake
                throw new UncheckedIOException(e);
            }
            out.flush();
        }
    }

    /** Each warning once, in order, even if two parts of a computation reported the same one. */
    private static void warn(CommandSpec spec, List<String> warnings) {
        PrintWriter err = spec.commandLine().getErr();
        for (String w : new java.util.LinkedHashSet<>(warnings)) {
            err.println("qchain: warning: " + w);
        }
        err.flush();
    }
}
