package org.qchain.cli;

import java.util.Optional;
import java.util.concurrent.Callable;
import org.qchain.analysis.Analysis;
import org.qchain.analysis.LoadedModel;
import org.qchain.result.LongRunResult;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code qchain longrun}: stationary laws, absorption into closed classes, the limit of P^n. */
@Command(name = "longrun", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
    sortOptions = false, description = {
        "Where a chain settles, discrete or continuous: the stationary law of each closed class with mean"
            + " recurrence times 1/pi, the probability of ending in each closed class from each transient state, and"
            + " the full limit of P^n (of its averages when a closed class is periodic), exactly or as formulas in"
            + " the parameters.",
        "--passage adds the mean first-passage times between all states of an irreducible chain.",
        "A continuous chain (rates): the stationary law from pi Q = 0, the limit of P(t) as t grows, mean return"
            + " times 1/(pi_i q_i) and first-passage times in the model's time unit."})
final class LongRunCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @ParentCommand
    QchainCommand root;

    @Mixin
    ModelOptions model;

    @Option(names = "--passage", description = "Also the mean first-passage times m(i, j) (irreducible chains).")
    boolean passage;

    @Mixin
    OutputOptions output;

    @Mixin
    LongRunOptions options;

    @Override
    public Integer call() {
        Emitter.checkTarget(output.output(), Optional.of(model.model));
        LoadedModel loaded = model.load();
        LongRunResult result = root.run(spec, progress -> Analysis.longRun(loaded, options.query(passage), progress));
        Emitter.emit(spec, output.formatter().format(result), result.warnings(), output.output());
        return ExitCodes.OK;
    }
}
