package org.qchain.cli;

import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.qchain.analysis.Analysis;
import org.qchain.analysis.ConvertQuery;
import org.qchain.analysis.ConvertedModel;
import org.qchain.analysis.LoadedModel;
import org.qchain.exact.Rational;
import org.qchain.format.Caution;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code qchain convert}: a continuous chain as a discrete model file. */
@Command(name = "convert", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
    sortOptions = false,
    description = {
        "Write a continuous chain as a discrete model file, so every discrete command runs on it.",
        "--to jump: the embedded jump chain (where the chain goes at its next transition, q_ij / q_i).",
        "--to uniformized: I + Q/R for a rate R at least the largest total rate out of a state (default: that"
            + " largest rate); P(t) = sum over k of e^(-Rt) (Rt)^k / k! times the k-step matrix of this chain."})
final class ConvertCommand implements Callable<Integer> {
    /** The targets, as written on the command line. */
    enum To {
        jump, uniformized
    }

    @Spec
    CommandSpec spec;

    @ParentCommand
    QchainCommand root;

    @Mixin
    ModelOptions model;

    @Option(names = "--to", required = true, paramLabel = "KIND", description = "jump or uniformized.")
    To to;

    @Option(names = "--rate", paramLabel = "R", converter = Converters.PositiveRational.class,
        description = "Uniformization rate (a rational, positive).")
    Rational rate;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE",
        description = "Write the model file here (atomically; never over the input) instead of stdout.")
    java.nio.file.Path output;

    @Override
    public Integer call() {
        if (rate != null && to != To.uniformized) {
            throw new ParameterException(spec.commandLine(), "--rate applies to --to uniformized");
        }
        Optional<Rational> r = Optional.ofNullable(rate);
        Emitter.checkTarget(Optional.ofNullable(output), Optional.of(model.model));
        LoadedModel loaded = model.load();
        ConvertQuery q = new ConvertQuery(to == To.jump ? ConvertQuery.Target.JUMP : ConvertQuery.Target.UNIFORMIZED, r);
        ConvertedModel m = root.run(spec, progress -> Analysis.convert(loaded, q));
        Emitter.emit(spec, m.text(Caution.TEXT), List.of(), Optional.ofNullable(output));
        return ExitCodes.OK;
    }
}
