package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import picocli.CommandLine;

/**
 * Runs qchain in-process the way picocli's "Testing your application" does: captured stdout and stderr. Holds no
 * reference values.
 */
final class Cli {
    /** Directory of the test models, relative to the module directory (surefire's working directory). */
    static final String MODELS = "src/test/resources/models/";

    private Cli() {
    }

    /** What one run printed and returned. */
    record Result(int code, String out, String err) {
        /** The stderr lines. */
        String[] errLines() {
            return err.isEmpty() ? new String[0] : err.split("\n", -1);
        }

        @Override
        public String toString() {
            return "exit " + code + "\n--- stdout ---\n" + out + "--- stderr ---\n" + err;
        }
    }

    /** Runs {@code qchain args...} with progress off. */
    static Result run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        // the tree the process builds for these arguments (only the named subcommand): building all of them for every
        // run was a quarter of the module's test time
        CommandLine cl = QchainCommand.newCommandLine(false, new Errors(), args);
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        int code = cl.execute(args);
        return new Result(code, out.toString(), err.toString());
    }

    /** A test model's path as passed on the command line. */
    static String model(String name) {
        return MODELS + name;
    }

    /**
     * Asserts that stdout equals the golden file; with {@code -Dqchain.updateGolden=true} it first rewrites the file
     * (then read the diff before committing).
     */
    static void assertMatchesGolden(Result r, Path golden) throws IOException {
        if (Boolean.getBoolean("qchain.updateGolden")) {
            Files.createDirectories(golden.getParent());
            Files.writeString(golden, r.out(), StandardCharsets.UTF_8);
        }
        assertEquals(Files.readString(golden, StandardCharsets.UTF_8), r.out(), golden.toString());
    }
}
