package org.qchain.cli;

import java.util.Optional;
import java.util.concurrent.Callable;
import org.qchain.analysis.Analysis;
import org.qchain.analysis.LoadedModel;
import org.qchain.analysis.SensQuery;
import org.qchain.result.SensResult;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/**
 * {@code qchain sens}: the sensitivity of one n-step probability to a parameter. The options become a
 * {@link SensQuery}; {@link Analysis#sens} does the work.
 */
@Command(name = "sens", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class, sortOptions = false,
    description = {
        "Sensitivity of the n-step probability P^n(FROM -> TO) to a parameter: P and its exact derivative dP/dp as",
        "formulas in the parameters, their values and the elasticity (p/P) dP/dp at the nominal values (or --at),",
        "and with --sweep a table of P and dP/dp over an exact range of the parameter, exact and decimal."})
final class SensCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @ParentCommand
    QchainCommand root;

    @Mixin
    ModelOptions model;

    @Option(names = {"-n", "--steps"}, required = true, paramLabel = "N", converter = Converters.Steps.class,
        description = "Number of steps (0 or more).")
    long n;

    @Option(names = "--from", required = true, paramLabel = "STATE", description = "Starting state.")
    String from;

    @Option(names = "--to", required = true, paramLabel = "STATE", description = "State after n steps.")
    String to;

    @Option(names = "--wrt", required = true, paramLabel = "PARAM",
        description = "The parameter p of the derivative dP/dp.")
    String wrt;

    @Option(names = "--sweep", paramLabel = "NAME=START:STEP:END",
        description = "A table of P and dP/dp for NAME = START, START+STEP, ... up to END (exact rationals, e.g."
            + " p=0:1/100:1/10; at most 10001 points); the other parameters at their nominal or --at values.")
    String sweep;

    @Mixin
    OutputOptions output;

    @Mixin
    SymbolicOptions symbolicOptions;

    @Mixin
    LimitOptions.Digits digitLimit;

    @Override
    public Integer call() {
        Emitter.checkTarget(output.output(), Optional.of(model.model));
        LoadedModel loaded = model.load();
        SensQuery q = new SensQuery(n, from, to, wrt, Optional.ofNullable(sweep), symbolicOptions.factor,
            symbolicOptions.maxTerms(), digitLimit.maxDigits);
        SensResult result = root.run(spec, progress -> Analysis.sens(loaded, q, progress));
        Emitter.emit(spec, output.formatter().format(result), result.warnings(), output.output());
        return ExitCodes.OK;
    }
}
