package org.qchain.cli;

import java.util.Optional;
import java.util.concurrent.Callable;
import org.qchain.analysis.Analysis;
import org.qchain.analysis.CheckQuery;
import org.qchain.analysis.LoadedModel;
import org.qchain.result.CheckResult;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code qchain check}: validates a model and prints its one-step matrix. */
@Command(name = "check", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class, sortOptions = false,
    description = {
        "Validate a model file and print its one-step matrix (exact and decimal).",
        "The last line is \"OK: ...\" when the model is valid (text); any error is reported as file:line:col.",
        "--format json, csv, markdown or latex lay the same matrix out as step does (n = 1); -o FILE writes it"
            + " atomically, never over the model file."})
final class CheckCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Mixin
    ModelOptions model;

    @Mixin
    OutputOptions output;

    @Option(names = "--symbolic",
        description = "Keep the parameters symbolic: print the entries as formulas and check, over the parameter"
            + " domains, that rows sum to 1 identically and entries stay in [0, 1] (with the conditions where they"
            + " may not). Models with a parameter without a value (none given with --at) are checked this way anyway.")
    boolean symbolic;

    @Override
    public Integer call() {
        Emitter.checkTarget(output.output(), Optional.of(model.model));
        LoadedModel loaded = model.load();
        CheckResult result = Analysis.check(loaded, new CheckQuery(symbolic));
        // a symbolic check's conditions are its report (the "Conditions" section on stdout): not again on stderr
        Emitter.emit(spec, output.formatter().format(result),
            result instanceof CheckResult.Symbolic || result instanceof CheckResult.Generator ? java.util.List.of()
                : result.warnings(), output.output());
        return ExitCodes.OK;
    }
}
