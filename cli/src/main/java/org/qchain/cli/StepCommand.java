package org.qchain.cli;

import java.util.Optional;
import java.util.OptionalInt;
import java.util.concurrent.Callable;
import org.qchain.analysis.Analysis;
import org.qchain.analysis.LoadedModel;
import org.qchain.analysis.Route;
import org.qchain.analysis.StepQuery;
import org.qchain.format.OutputFormat;
import org.qchain.result.Result;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code qchain step}: exact n-step transition probabilities. */
@Command(name = "step", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class, sortOptions = false,
    description = {
        "Exact n-step transition probabilities P^n of a discrete chain, as fractions with decimals beside them.",
        "Without --from: the whole matrix. With --from: that row (where the chain may be after n steps).",
        "With --from and --to: one probability; add --paths K for its K most probable paths.",
        "A model with a parameter that has no value (or --symbolic) gives each entry as an exact rational function",
        "of the parameters (--factor: factored), with its value at the nominal or --at point when every parameter",
        "has one."})
final class StepCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @ParentCommand
    QchainCommand root;

    @Mixin
    ModelOptions model;

    @Option(names = {"-n", "--steps"}, required = true, paramLabel = "N", converter = Converters.Steps.class,
        description = "Number of steps (0 or more).")
    long n;

    @Option(names = "--from", paramLabel = "STATE", description = "Starting state: print only its row of P^n.")
    String from;

    @Option(names = "--to", paramLabel = "STATE", description = "Final state (needs --from): print one entry.")
    String to;

    @Option(names = "--paths", paramLabel = "K", converter = Converters.PathCount.class,
        description = "Also list the K most probable paths of n steps from --from to --to, with their exact"
            + " probabilities and share of the total.")
    Integer paths;

    @Mixin
    OutputOptions output;

    @Mixin
    LimitOptions.Digits digitLimit;

    @Option(names = "--max-path-digits", paramLabel = "W", converter = Converters.DigitLimit.class,
        defaultValue = "" + org.qchain.exact.SizeEstimate.DEFAULT_MAX_PATH_DIGITS,
        description = "Refuse a --paths search estimated to process more than W digits in all; the work grows"
            + " with the square of n (default: ${DEFAULT-VALUE}).")
    long maxPathDigits = org.qchain.exact.SizeEstimate.DEFAULT_MAX_PATH_DIGITS;

    @Option(names = "--symbolic",
        description = "Keep every parameter symbolic, even those with nominal values (formulas, and values at the"
            + " nominal or --at point). Models with a parameter without a value are symbolic anyway.")
    boolean symbolic;

    @Mixin
    SymbolicOptions symbolicOptions;

    @Option(names = "--double",
        description = "With --format csv or json: add each value's correctly rounded binary64 (IEEE 754 double) as"
            + " the shortest decimal that reads back as that double and as a hexadecimal float, for pasting exact"
            + " reference values into other programs' tests.")
    boolean doubles;

    @Override
    public Integer call() {
        if (to != null && from == null) {
            throw new ParameterException(spec.commandLine(), "--to needs --from (the starting state)");
        }
        if (paths != null && (from == null || to == null)) {
            throw new ParameterException(spec.commandLine(), "--paths needs both --from and --to");
        }
        if (doubles && output.format != OutputFormat.CSV && output.format != OutputFormat.JSON) {
            throw new ParameterException(spec.commandLine(), "--double needs --format csv or --format json");
        }
        Emitter.checkTarget(output.output(), Optional.of(model.model));
        LoadedModel loaded = model.load();
        StepQuery q = new StepQuery(n, Optional.ofNullable(from), Optional.ofNullable(to),
            paths == null ? OptionalInt.empty() : OptionalInt.of(paths), digitLimit.maxDigits, maxPathDigits, symbolic,
            symbolicOptions.factor, symbolicOptions.maxTerms());
        if (Analysis.route(loaded, q) == Route.SYMBOLIC) {
            if (paths != null) {
                throw new ParameterException(spec.commandLine(), "--paths needs numeric values for every parameter"
                    + " (the most probable paths of a symbolic chain depend on the parameters)");
            }
        } else if (symbolicOptions.factor) {
            throw new ParameterException(spec.commandLine(), "--factor applies to symbolic results: the model has"
                + " values for all its parameters (use --symbolic to keep them symbolic)");
        }
        if (doubles && Analysis.route(loaded, q) == Route.SYMBOLIC) {
            throw new ParameterException(spec.commandLine(), "--double needs numeric values for every parameter"
                + " (a formula has no double; give values with --at)");
        }
        Result result = root.run(spec, progress -> Analysis.step(loaded, q, progress));
        Emitter.emit(spec, output.formatter(doubles).format(result), result.warnings(), output.output());
        return ExitCodes.OK;
    }
}
