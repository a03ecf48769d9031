package org.qchain.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.concurrent.Callable;
import org.qchain.cli.format.OutputFormat;
import org.qchain.cli.io.AtomicFiles;
import org.qchain.cli.result.StepResult;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code qchain demo}: runs {@code step} on the bundled example model. */
@Command(name = "demo", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class, sortOptions = false,
    description = {
        "Run qchain step on the bundled example (a pump station) and show the commands, so you can try your own model.",
        "The example ships inside the program; --save-model writes a copy to start from."})
final class DemoCommand implements Callable<Integer> {
    /** The example's file name, as in docs/examples. */
    static final String EXAMPLE = "pump-station.chain";
    /** Number of steps the demo asks for. */
    static final long N = 12;
    /** Paths the demo lists. */
    static final int PATHS = 3;

    @Spec
    CommandSpec spec;

    @ParentCommand
    QchainCommand root;

    @Option(names = "--save-model", paramLabel = "FILE",
        description = "Write the bundled example model to FILE (a new file) and stop.")
    Path saveModel;

    @Override
    public Integer call() throws IOException {
        String text = LoadedChain.resource("examples/" + EXAMPLE);
        if (saveModel != null) {
            if (Files.exists(saveModel)) {
                // the user may have edited an earlier copy: never overwrite it
                throw new QchainException(ErrorKey.BAD_ARGUMENT, "--save-model", saveModel,
                    "the file exists; choose another name");
            }
            AtomicFiles.write(saveModel, "--save-model", text);
            spec.commandLine().getErr().println("qchain: wrote the example model to " + saveModel);
            return ExitCodes.OK;
        }
        LoadedChain chain = LoadedChain.fromText(EXAMPLE, text, spec.name());
        List<String> states = chain.states();
        String from = states.get(0);
        String to = states.get(states.size() - 1);
        PrintWriter out = spec.commandLine().getOut();
        out.println("qchain demo: exact n-step probabilities of the bundled example model " + EXAMPLE + ".");
        out.println("Its source is " + where() + "; to try your own model, save a copy with");
        out.println("  qchain demo --save-model my.chain");
        out.println("edit it (the format is in docs/model-format.md) and run qchain step my.chain -n " + N + ".");
        out.println();
        out.println("The model:");
        for (String line : text.strip().split("\n")) {
            out.println("  " + line.stripTrailing());
        }
        TerminalProgress progress = root.progress(spec.commandLine().getErr());
        run(out, chain, progress, "qchain step " + EXAMPLE + " -n " + N,
            new Stepper.Query(N, Optional.empty(), Optional.empty(), OptionalInt.empty(),
                OutputOptions.DEFAULT_DIGITS, StepCommand.DEFAULT_MAX_DIGITS));
        run(out, chain, progress, "qchain step " + EXAMPLE + " -n " + N + " --from " + from + " --to " + to
                + " --paths " + PATHS,
            new Stepper.Query(N, Optional.of(from), Optional.of(to), OptionalInt.of(PATHS),
                OutputOptions.DEFAULT_DIGITS, StepCommand.DEFAULT_MAX_DIGITS));
        out.flush();
        return ExitCodes.OK;
    }

    private static void run(PrintWriter out, LoadedChain chain, TerminalProgress progress, String command,
                            Stepper.Query q) {
        StepResult r;
        try {
            r = Stepper.compute(chain, q, progress);
        } finally {
            progress.clear();
        }
        out.println();
        out.println("$ " + command);
        out.print(OutputFormat.TEXT.formatter().format(r));
    }

    /** The example's path in the repository, absolute when the launcher told us where the repository is. */
    private static String where() {
        String rel = "docs/examples/" + EXAMPLE;
        String home = System.getProperty("qchain.home");
        if (home != null && Files.isRegularFile(Path.of(home, rel))) {
            return Path.of(home, rel).toString();
        }
        return rel + " in the qchain repository";
    }
}
