package org.qchain.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.qchain.cli.io.AtomicFiles;
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
        PrintWriter err = spec.commandLine().getErr();
        for (String w : warnings) {
            err.println("qchain: warning: " + w);
        }
        err.flush();
        if (output.isPresent()) {
            AtomicFiles.write(output.get(), "--output", text);
        } else {
            PrintWriter out = spec.commandLine().getOut();
            out.print(text);
            out.flush();
        }
    }
}
