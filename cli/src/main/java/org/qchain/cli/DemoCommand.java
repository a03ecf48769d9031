package org.qchain.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.qchain.analysis.Analysis;
import org.qchain.analysis.LoadedModel;
import org.qchain.analysis.StepQuery;
import org.qchain.cli.io.AtomicFiles;
import org.qchain.format.OutputFormat;
import org.qchain.result.Result;
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
        String text = resource("examples/" + EXAMPLE);
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
        LoadedModel chain = LoadedModel.fromText(EXAMPLE, text);
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
        run(out, chain, "qchain step " + EXAMPLE + " -n " + N, StepQuery.matrix(N));
        run(out, chain, "qchain step " + EXAMPLE + " -n " + N + " --from " + from + " --to " + to + " --paths "
            + PATHS, StepQuery.entry(N, from, to).withPaths(PATHS));
        out.flush();
        return ExitCodes.OK;
    }

    private void run(PrintWriter out, LoadedModel chain, String command, StepQuery q) {
        Result r = root.run(spec, progress -> Analysis.step(chain, q, progress));
        out.println();
        out.println("$ " + command);
        out.print(OutputFormat.TEXT.formatter(DigitsOption.DEFAULT).format(r));
    }

    /** A checked read of a classpath resource as UTF-8 text. */
    static String resource(String name) throws IOException {
        try (var in = DemoCommand.class.getResourceAsStream(name)) {
            if (in == null) {
                throw new QchainException(ErrorKey.INTERNAL, "resource " + name + " is missing from the jar");
            }
            return new String(in.readAllBytes(), java.nio.charset.StandardCharsets.UTF_8);
        }
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
